"use client";
// One shelf table, whichever part it lists: the filter bar (search, in stock, and the part's own
// filters), the admin's add/edit form and remove button, sortable columns, and paging, fetched
// page by page from GET /api/shelf/<kind> through react-query.
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { apiJson, queryString } from "@/components/client-json";
import { SortHeader, type SortState } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";

export type ShelfKind = "blowers" | "pulleys";

/** A column: its header (sortable when `sortBy` is given) and how a row fills its cell. */
export type ShelfColumn<Row, Sort extends string> = {
  label: string;
  unit?: string;
  /** Shown after the label in the muted style, for headers that need a word of explanation. */
  note?: string;
  title?: string;
  sortBy?: Sort;
  align?: "left" | "right";
  cell: (row: Row) => ReactNode;
  cellClassName?: (row: Row) => string;
  testId?: string;
};

type Part = { id: string; partNumber: string };
type PageOf<T> = { rows: T[]; total: number; page: number; pageSize: number };
type FormProps<Row> = { row?: Row; onDone: (message: string) => void; onCancel: () => void };

type Props<Row extends Part, Sort extends string> = {
  kind: ShelfKind;
  /** Singular and plural, capitalised as at the start of a sentence: ["Blower", "Blowers"]. */
  names: [string, string];
  searchHint: string;
  /** The part's own filters, already bound to their state; a change to `filterParams` goes back to page 1. */
  filters?: ReactNode;
  filterParams?: Record<string, string | boolean>;
  defaultSort: SortState<Sort>;
  columns: ShelfColumn<Row, Sort>[];
  rowClassName?: string;
  form: (props: FormProps<Row>) => ReactNode;
  isAdmin: boolean;
};

const PAGE_SIZE = 15;

export function ShelfList<Row extends Part, Sort extends string>(props: Props<Row, Sort>) {
  const { kind, names, columns, isAdmin } = props;
  const [one, many] = names;
  const [search, setSearch] = useState("");
  const [inStock, setInStock] = useState(false);
  const [sort, setSort] = useState(props.defaultSort);
  const [editing, setEditing] = useState<Row | "new" | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const qc = useQueryClient();

  // Any change of filter or order starts again at page 1: the page is kept together with the
  // filters it was chosen under, and a page chosen under other filters reads as page 1.
  const filters = { search: search.trim(), inStock, ...props.filterParams, sort: sort.sort, dir: sort.dir };
  const filterKey = JSON.stringify(filters);
  const [paging, setPaging] = useState({ filterKey, page: 1 });
  const page = paging.filterKey === filterKey ? paging.page : 1;
  const setPage = (p: number) => setPaging({ filterKey, page: p });

  const params = { ...filters, page, pageSize: PAGE_SIZE };
  const q = useQuery({
    queryKey: ["shelf", kind, params],
    queryFn: () => apiJson<PageOf<Row>>(`/api/shelf/${kind}${queryString(params)}`),
    placeholderData: keepPreviousData,
  });

  async function remove(row: Row) {
    if (!window.confirm(`Remove ${row.partNumber} from the shelf?`)) return;
    try {
      await apiJson(`/api/shelf/${kind}/${row.id}`, { method: "DELETE" });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      setMessage({ tone: "ok", text: `Removed ${row.partNumber}.` });
    } catch (e) {
      setMessage({ tone: "danger", text: e instanceof Error ? e.message : "Could not remove it." });
    }
  }

  const span = columns.length + (isAdmin ? 1 : 0);
  const wholeRow = (text: string) => (
    <tr>
      <td colSpan={span} className="px-2 py-4 text-center text-muted">
        {text}
      </td>
    </tr>
  );
  const alignClass = (c: ShelfColumn<Row, Sort>) => (c.align === "right" ? "text-right" : "text-left");

  return (
    <section aria-labelledby={`${kind}-heading`} className="flex flex-col gap-3">
      <h2 id={`${kind}-heading`} className="sr-only">
        {many}
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${one.toLowerCase()}-search`} className="text-sm font-medium">
            Search {many.toLowerCase()}
          </label>
          <input
            id={`${one.toLowerCase()}-search`}
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder={props.searchHint}
            className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm"
          />
        </div>
        {props.filters}
        <label className="flex items-center gap-2 pb-1.5 text-sm">
          <input type="checkbox" checked={inStock} onChange={(e) => setInStock(e.target.checked)} /> In stock only
        </label>
        <div className="ml-auto flex gap-2">
          <a href={`/api/shelf/export?kind=${kind}`} className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg" download>
            Export CSV
          </a>
          {isAdmin ? (
            <Button type="button" onClick={() => setEditing("new")}>
              Add {one.toLowerCase()}
            </Button>
          ) : null}
        </div>
      </div>
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {editing ? (
        <div key={editing === "new" ? "new" : editing.id}>
          {props.form({
            row: editing === "new" ? undefined : editing,
            onCancel: () => setEditing(null),
            onDone: (text) => {
              setEditing(null);
              setMessage({ tone: "ok", text });
            },
          })}
        </div>
      ) : null}
      {q.isError ? <Notice tone="danger">{q.error.message}</Notice> : null}
      <div className="overflow-x-auto rounded-md border border-line bg-panel">
        <table className="w-full text-sm" aria-busy={q.isFetching}>
          <caption className="sr-only">{many} on the shelf</caption>
          <thead className="border-b border-line">
            <tr>
              {columns.map((c) =>
                c.sortBy ? (
                  <SortHeader key={c.label} label={c.label} unit={c.unit} column={c.sortBy} state={sort} onChange={setSort} align={c.align} />
                ) : (
                  <th key={c.label} scope="col" title={c.title} className={`px-2 py-1.5 font-medium ${alignClass(c)}`}>
                    {c.label}
                    {c.unit || c.note ? <span className="font-normal text-muted"> ({c.unit ?? c.note})</span> : null}
                  </th>
                ),
              )}
              {isAdmin ? (
                <th scope="col" className="px-2 py-1.5">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {q.data?.rows.map((row) => (
              <tr key={row.id} className={`border-b border-line last:border-0 ${props.rowClassName ?? ""}`} data-part={row.partNumber}>
                {columns.map((c) => (
                  <td key={c.label} className={`px-2 py-1.5 ${c.align === "right" ? "text-right" : ""} ${c.cellClassName?.(row) ?? ""}`} data-testid={c.testId}>
                    {c.cell(row)}
                  </td>
                ))}
                {isAdmin ? (
                  <td className="whitespace-nowrap px-2 py-1.5 text-right">
                    <Button type="button" variant="ghost" onClick={() => setEditing(row)} aria-label={`Edit ${row.partNumber}`}>
                      Edit
                    </Button>
                    <Button type="button" variant="ghost" onClick={() => remove(row)} aria-label={`Remove ${row.partNumber}`}>
                      Remove
                    </Button>
                  </td>
                ) : null}
              </tr>
            ))}
            {q.data && q.data.rows.length === 0 ? wholeRow(`No ${many.toLowerCase()} match.`) : null}
            {q.isPending ? wholeRow("Loading…") : null}
          </tbody>
        </table>
      </div>
      {q.data ? <Pager label={many} page={page} pageSize={PAGE_SIZE} total={q.data.total} onPage={setPage} /> : null}
    </section>
  );
}
