"use client";
// Pieces shared by the shelf tables: sortable column headers and the pager.
import { Button } from "@/components/ui/button";

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

type PagerProps = { page: number; pageSize: number; total: number; onPage: (p: number) => void; label: string };

export function Pager({ page, pageSize, total, onPage, label }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav aria-label={`${label} pages`} className="flex items-center gap-3 text-sm">
      <Button type="button" variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      <span className="num">
        Page {Math.min(page, pages)} of {pages} · {total} {total === 1 ? "item" : "items"}
      </span>
      <Button type="button" variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next
      </Button>
    </nav>
  );
}

/** A small labelled select. */
export function SelectField({ label, value, onChange, options, id }: { label: string; value: string; onChange: (v: string) => void; options: [string, string][]; id: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
    </div>
  );
}
