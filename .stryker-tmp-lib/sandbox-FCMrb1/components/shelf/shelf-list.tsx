// @ts-nocheck
"use client";
// One shelf table, whichever part it lists: the filter bar (search, in stock, and the part's own
// filters), the admin's add/edit form and remove button, sortable columns, and paging, fetched
// page by page from GET /api/shelf/<kind> through react-query.
import { keepPreviousData, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { apiJson, queryString } from "@/components/client-json";
import { ACTIONS_COLUMN, DataTable, type Column, type SortState } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";

export type ShelfKind = "blowers" | "pulleys";

/** A column: its header (sortable when `sortBy` is given) and how a row fills its cell. */
export type ShelfColumn<Row, Sort extends string> = Column<Row, Sort>;

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
      <DataTable
        caption={`${many} on the shelf`}
        rows={q.data?.rows}
        rowKey={(row) => row.id}
        loading={q.isFetching}
        empty={`No ${many.toLowerCase()} match.`}
        sort={{ state: sort, onChange: setSort }}
        rowProps={(row) => ({ className: props.rowClassName, "data-part": row.partNumber })}
        columns={[
          ...columns,
          isAdmin && {
            ...ACTIONS_COLUMN,
            align: "right",
            cellClassName: "whitespace-nowrap",
            cell: (row: Row) => (
              <>
                <Button type="button" variant="ghost" onClick={() => setEditing(row)} aria-label={`Edit ${row.partNumber}`}>
                  Edit
                </Button>
                <Button type="button" variant="ghost" onClick={() => remove(row)} aria-label={`Remove ${row.partNumber}`}>
                  Remove
                </Button>
              </>
            ),
          },
        ]}
      />
      {q.data ? <Pager label={many} page={page} pageSize={PAGE_SIZE} total={q.data.total} onPage={setPage} /> : null}
    </section>
  );
}
