// @ts-nocheck
"use client";
// Side by side's pickers: per item a search (name, customer or owner) narrowing the combinations,
// then the combination and its revision.
import { useState } from "react";
import { Button } from "@/components/ui/button";

export type PickerCombination = { id: string; name: string; revision: number; customerName: string | null; ownerEmail: string };
export type PickerRow = { combinationId: string; revision: string };

type PickersProps = {
  rows: PickerRow[];
  onRows: (rows: PickerRow[]) => void;
  combinations: PickerCombination[];
  revisionOptions: (id: string) => { value: string; label: string }[];
};

/** Whether a combination matches a search by name, customer or owner (case-insensitive). */
export function matchesSearch(c: PickerCombination, search: string): boolean {
  const q = search.trim().toLowerCase();
  if (!q) return true;
  return [c.name, c.customerName ?? "", c.ownerEmail].some((t) => t.toLowerCase().includes(q));
}

export function ComparePickers({ rows, onRows, combinations, revisionOptions }: PickersProps) {
  const [searches, setSearches] = useState<string[]>(rows.map(() => ""));
  const set = (i: number, row: PickerRow) => onRows(rows.map((x, k) => (k === i ? row : x)));
  return (
    <fieldset className="flex min-w-0 flex-col gap-2">
      <legend className="text-sm font-semibold">Compare</legend>
      {rows.map((r, i) => {
        const search = searches[i] ?? "";
        // The chosen one stays listed even when the search would hide it.
        const shown = combinations.filter((c) => c.id === r.combinationId || matchesSearch(c, search));
        return (
          <div key={i} className="flex min-w-0 flex-wrap items-end gap-2">
            <label className="flex min-w-0 flex-col gap-1 text-sm">
              <span className="font-medium">Search item {i + 1}</span>
              <input
                type="search"
                value={search}
                placeholder="Name, customer or owner"
                onChange={(e) => setSearches(rows.map((_, k) => (k === i ? e.target.value : (searches[k] ?? ""))))}
                className="w-56 max-w-full rounded-md border border-line bg-bg px-2 py-1.5"
              />
            </label>
            <label className="flex min-w-0 flex-col gap-1 text-sm">
              <span className="font-medium">Item {i + 1}</span>
              <select value={r.combinationId} onChange={(e) => set(i, { combinationId: e.target.value, revision: "current" })} className="w-64 max-w-full rounded-md border border-line bg-bg px-2 py-1.5">
                <option value="">{shown.length ? "Choose a combination…" : "No combination matches"}</option>
                {shown.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                    {c.customerName ? ` · ${c.customerName}` : ""}
                  </option>
                ))}
              </select>
            </label>
            <label className="flex min-w-0 flex-col gap-1 text-sm">
              <span className="font-medium">Revision of item {i + 1}</span>
              <select value={r.revision} onChange={(e) => set(i, { ...r, revision: e.target.value })} className="w-56 max-w-full rounded-md border border-line bg-bg px-2 py-1.5" disabled={!r.combinationId}>
                <option value="current">Current</option>
                {revisionOptions(r.combinationId).map((o) => (
                  <option key={o.value} value={o.value}>
                    {o.label}
                  </option>
                ))}
              </select>
            </label>
            {rows.length > 2 ? (
              <Button type="button" variant="ghost" onClick={() => onRows(rows.filter((_, k) => k !== i))} aria-label={`Remove item ${i + 1}`}>
                Remove
              </Button>
            ) : null}
          </div>
        );
      })}
    </fieldset>
  );
}
