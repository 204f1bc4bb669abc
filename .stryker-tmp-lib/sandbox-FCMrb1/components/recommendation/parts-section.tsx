// @ts-nocheck
"use client";
// Step 3 of the sheet: add parts from the shelf or free lines; the table prices them.
import { useState } from "react";
import { usePrice } from "@/components/price";
import { Button } from "@/components/ui/button";
import { PartsTable } from "./parts-table";
import type { RecommendationFormState, ShelfPart } from "./use-recommendation-form";

export function PartsSection({ state, parts }: { state: RecommendationFormState; parts: ShelfPart[] }) {
  const price = usePrice();
  const [pick, setPick] = useState("");
  const { form, lines, watched, amounts, total, lineError, addShelfPart } = state;
  return (
    <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
      <h2 className="text-lg font-semibold">3. Parts</h2>
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="add-part" className="text-sm font-medium">
            Add a part from the shelf
          </label>
          <select id="add-part" value={pick} onChange={(e) => setPick(e.target.value)} className="max-w-md rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
            <option value="">Choose a part…</option>
            {parts.map((p) => (
              <option key={p.partNumber} value={p.partNumber}>
                {p.partNumber}: {p.description}, {price(p.price)}
                {p.stock === 0 ? " (out of stock)" : ""}
              </option>
            ))}
          </select>
        </div>
        <Button
          type="button"
          variant="secondary"
          disabled={!pick}
          onClick={() => {
            addShelfPart(pick);
            setPick("");
          }}
        >
          Add part
        </Button>
        <Button type="button" variant="secondary" onClick={() => lines.append({ partNumber: null, description: "", unitPrice: "", quantity: 1 })}>
          Add a free line
        </Button>
      </div>
      {lines.fields.length === 0 ? <p className="text-sm text-muted">No parts yet.</p> : null}
      {lines.fields.length ? <PartsTable form={form} lines={lines} watched={watched} amounts={amounts} total={total} lineError={lineError} /> : null}
    </section>
  );
}
