// Table pieces every list uses: sortable column headers, the row a table shows when empty, and
// a total under a money column. No hooks, so server pages may use them too.

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
