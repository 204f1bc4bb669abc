// @ts-nocheck
// The one data table every list uses (`DataTable`: columns, rows, caption, empty state, optional
// sort), and its pieces for the tables that lay out their own rows: sortable column headers, the
// row a table shows when empty, and a total under a money column. No hooks, so server pages may
// use them too (a sortable table needs a client parent for `onChange`).

export type SortState<K extends string> = { sort: K; dir: "asc" | "desc" };

type SortHeaderProps<K extends string> = { label: string; unit?: string; column: K; state: SortState<K>; onChange: (s: SortState<K>) => void; align?: "left" | "right" };

/** A column header that sorts by its column; a second press reverses the order. */
export function SortHeader<K extends string>({ label, unit, column, state, onChange, align = "left" }: SortHeaderProps<K>) {
  const active = state.sort === column;
  return (
    <th scope="col" aria-sort={active ? (state.dir === "asc" ? "ascending" : "descending") : "none"} className={`px-2 py-1.5 font-medium ${align === "right" ? "text-right" : "text-left"}`}>
      <button
        type="button"
        className="inline-flex items-center gap-1 hover:underline"
        onClick={() => onChange({ sort: column, dir: active && state.dir === "asc" ? "desc" : "asc" })}
      >
        {label}
        {unit ? <span className="font-normal text-muted">({unit})</span> : null}
        <span aria-hidden="true" className="text-muted">
          {active ? (state.dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
      </button>
    </th>
  );
}

/** The one row of an empty table: a message across every column. */
export function EmptyRow({ colSpan, className = "px-3 py-6 text-center text-muted", children }: { colSpan: number; className?: string; children: React.ReactNode }) {
  return (
    <tr>
      <td colSpan={colSpan} className={className}>
        {children}
      </td>
    </tr>
  );
}

/** A table's foot with "Total" under the labels and the amount in the last column (`trailing` cells after it). */
export function TotalFoot({ labelSpan, testId, trailing = 0, children }: { labelSpan: number; testId: string; trailing?: number; children: React.ReactNode }) {
  return (
    <tfoot>
      <tr>
        <th scope="row" colSpan={labelSpan} className="py-1 text-right">
          Total
        </th>
        <td className="whitespace-nowrap py-1 pl-3 text-right font-semibold tabular-nums" data-testid={testId}>
          {children}
        </td>
        {Array.from({ length: trailing }, (_, i) => (
          <td key={i} />
        ))}
      </tr>
    </tfoot>
  );
}

/** A plain column: its label, right-aligned when it holds numbers or money, or its own classes. */
export type HeadColumn = string | { label: React.ReactNode; right?: boolean; key?: string; className?: string };

/** The unlabelled column of a row's buttons, named for screen readers. */
export const ACTIONS_COLUMN = { label: <span className="sr-only">Actions</span>, key: "actions" } as const;

/**
 * Plain (unsorted) column headers: `cell` on each, `right` added on the right-aligned ones; a
 * `false` column (one the viewer's role does not see) is left out.
 */
export function HeadCells({ columns, cell, right = "text-right" }: { columns: readonly (HeadColumn | false)[]; cell: string; right?: string }) {
  return columns.map((c, i) => {
    if (c === false) return null;
    const col = typeof c === "string" ? { label: c, key: c } : c;
    return (
      <th key={col.key ?? i} scope="col" className={col.className ?? (col.right ? `${cell} ${right}` : cell)}>
        {col.label}
      </th>
    );
  });
}

/** One column of a DataTable: its header, and what each row shows in it. */
export type Column<R, K extends string = string> = {
  /** The header; a string label is also the column's key unless `key` is given. */
  label: React.ReactNode;
  key?: string;
  /** Shown muted after the label, in brackets: the unit, or a word of explanation. */
  unit?: string;
  /** A tooltip on the header. */
  title?: string;
  align?: "left" | "right";
  /** Sortable by this key (needs the table's `sort`). */
  sortBy?: K;
  /** What a row shows here (unused where the table's `renderRow` lays out whole rows). */
  cell?: (row: R) => React.ReactNode;
  cellClassName?: string | ((row: R) => string);
  testId?: string;
};

/** How roomy the cells are: "compact" for dense staff lists, "roomy" for the rest, "figures" for a table of results. */
const PADDING = { compact: "px-2 py-1.5", roomy: "px-3 py-2", figures: "pr-5" } as const;

export type DataTableProps<R, K extends string = string> = {
  /** Columns in order; a `false` one (a column the viewer's role does not see) is left out. */
  columns: readonly (Column<R, K> | false)[];
  /** The rows; undefined while the first page loads. */
  rows: readonly R[] | undefined;
  rowKey: (row: R) => string;
  /** The table's caption, for screen readers. */
  caption: React.ReactNode;
  /** The one row shown across every column when `rows` is empty. */
  empty: React.ReactNode;
  loading?: boolean;
  sort?: { state: SortState<K>; onChange: (s: SortState<K>) => void };
  density?: keyof typeof PADDING;
  /** Extra classes on the table (e.g. tabular-nums) and on its head row (e.g. text-muted). */
  className?: string;
  headClassName?: string;
  /** Attributes of a row's `<tr>` beyond its border (e.g. a data attribute tests read). */
  rowProps?: (row: R) => React.HTMLAttributes<HTMLTableRowElement> & Record<`data-${string}`, string>;
  /** A whole `<tr>` per row, for rows with state of their own (rename in place); the columns then give the headers only. */
  renderRow?: (row: R) => React.ReactNode;
  testId?: string;
};

/** A framed, scrollable table of rows under column headers, with its caption and empty state. */
export function DataTable<R, K extends string = string>(props: DataTableProps<R, K>) {
  const { rows, rowKey, caption, empty, loading, sort, density = "compact", className = "", headClassName = "", rowProps, renderRow, testId } = props;
  const columns = props.columns.filter((c): c is Column<R, K> => c !== false);
  const pad = PADDING[density];
  // A table of results sits bare in its section: no frame, no rules between rows.
  const bare = density === "figures";
  const keyOf = (c: Column<R, K>, i: number) => c.key ?? (typeof c.label === "string" ? c.label : String(i));
  const whole = (text: React.ReactNode) => (
    <EmptyRow colSpan={columns.length} className={`${pad} py-4 text-center text-muted`}>
      {text}
    </EmptyRow>
  );
  return (
    // relative: a visually hidden header label is absolutely placed and must scroll with the table.
    <div className={bare ? "overflow-x-auto" : "relative overflow-x-auto rounded-md border border-line bg-panel"}>
      <table className={`${bare ? "" : "w-full"} text-sm ${className}`} aria-busy={loading || undefined} data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead className={`${bare ? "text-muted" : "border-b border-line"} text-left ${headClassName}`}>
          <tr>
            {columns.map((c, i) =>
              c.sortBy && sort ? (
                <SortHeader key={keyOf(c, i)} label={String(c.label)} unit={c.unit} column={c.sortBy} state={sort.state} onChange={sort.onChange} align={c.align} />
              ) : (
                <th key={keyOf(c, i)} scope="col" title={c.title} className={`${pad} font-medium ${c.align === "right" ? "text-right" : ""}`}>
                  {c.label}
                  {c.unit ? <span className="font-normal text-muted"> ({c.unit})</span> : null}
                </th>
              ),
            )}
          </tr>
        </thead>
        <tbody>
          {rows?.map((row) => {
            if (renderRow) return renderRow(row);
            const extra = rowProps?.(row) ?? {};
            return (
              <tr key={rowKey(row)} {...extra} className={`${bare ? "" : "border-b border-line last:border-0"} ${extra.className ?? ""}`}>
                {columns.map((c, i) => {
                  const own = typeof c.cellClassName === "function" ? c.cellClassName(row) : (c.cellClassName ?? "");
                  return (
                    <td key={keyOf(c, i)} className={`${pad} ${c.align === "right" ? "text-right" : ""} ${own}`} data-testid={c.testId}>
                      {c.cell?.(row)}
                    </td>
                  );
                })}
              </tr>
            );
          })}
          {rows && rows.length === 0 ? whole(empty) : null}
          {loading && !rows ? whole("Loading…") : null}
        </tbody>
      </table>
    </div>
  );
}
