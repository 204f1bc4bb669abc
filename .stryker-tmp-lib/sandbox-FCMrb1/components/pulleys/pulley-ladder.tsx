// @ts-nocheck
"use client";
// The pulley ladder: one row per candidate blower pulley, sortable by any column.
import { useEffect, useMemo, useRef, useState } from "react";
import { unitLabel, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { figure, quantityText } from "@/lib/units/format";
import type { LadderRow } from "@/lib/planner/compute";
import { outsideRangeText } from "@/lib/planner/range-words";

type SortKey = "diameter" | "overdrive" | "boost" | "blowerRpm" | "chargeTemperature" | "netPower";

export type PulleyLadderProps = {
  rows: LadderRow[];
  system: UnitSystem;
  /** The one engine speed of every figure (the finder's). */
  rpm: number;
  fromShelf: boolean;
  onUse?: (diameter: number) => void;
};

// Prices come from the database as exact decimal strings (numeric), shown as they are.
const money = (price: string) => `$${price}`;

export function PulleyLadder({ rows, system, rpm, fromShelf, onUse }: PulleyLadderProps) {
  const [sort, setSort] = useState<{ key: SortKey; dir: "ascending" | "descending" }>({ key: "diameter", dir: "ascending" });
  const sorted = useMemo(() => {
    const out = [...rows];
    const sign = sort.dir === "ascending" ? 1 : -1;
    // Rows outside the model's range sort as having no figure.
    const key = (r: LadderRow) => (r.withinRange || sort.key === "diameter" || sort.key === "overdrive" || sort.key === "blowerRpm" ? (r[sort.key] ?? Number.NEGATIVE_INFINITY) : Number.NEGATIVE_INFINITY);
    out.sort((a, b) => {
      const x = key(a);
      const y = key(b);
      return (x - y) * sign || a.diameter - b.diameter;
    });
    return out;
  }, [rows, sort]);

  const head = (key: SortKey, label: string) => {
    const active = sort.key === key;
    return (
      <th scope="col" aria-sort={active ? sort.dir : "none"} className="px-2 py-1 text-left align-bottom font-medium">
        <button
          type="button"
          className="inline-flex items-center gap-1 text-left hover:underline"
          onClick={() => setSort({ key, dir: active && sort.dir === "ascending" ? "descending" : "ascending" })}
        >
          {label}
          <span aria-hidden="true" className="text-muted">
            {active ? (sort.dir === "ascending" ? "▲" : "▼") : "↕"}
          </span>
        </button>
      </th>
    );
  };

  // Keep the current row in view inside the ladder's own scroll box (never scrolls the page).
  const box = useRef<HTMLDivElement>(null);
  const currentDiameter = rows.find((r) => r.current)?.diameter;
  useEffect(() => {
    const el = box.current;
    const row = el?.querySelector<HTMLElement>('tr[aria-current="true"]');
    if (!el || !row) return;
    const top = row.offsetTop - el.clientHeight / 2 + row.offsetHeight / 2;
    el.scrollTop = Math.max(0, top);
  }, [currentDiameter, sort]);

  const dash = "–";
  return (
    <section aria-labelledby="ladder-heading" className="flex flex-col gap-2">
      <h2 id="ladder-heading" className="text-base font-semibold">
        Pulley ladder
      </h2>
      <p className="text-xs text-muted">
        {fromShelf ? "Blower pulleys on the parts shelf" : "The parts shelf has no blower pulleys yet: a range of sizes"}. Every figure at{" "}
        <span data-testid="ladder-rpm">{figure("speed", rpm, system)}</span> rpm, the finder&apos;s engine speed.
      </p>
      <div ref={box} className="relative max-h-96 overflow-auto">
        <table className="w-full border-collapse text-sm" data-testid="pulley-ladder" data-rpm={rpm}>
          <thead className="sticky top-0 border-b border-line bg-panel text-muted">
            <tr>
              {head("diameter", `Blower pulley (${unitLabel("length-small", system)})`)}
              <th scope="col" className="px-2 py-1 text-left align-bottom font-medium">
                Drive ratio
              </th>
              {head("overdrive", "Overdrive (%)")}
              {head("boost", `Boost (${unitLabel("pressure", system)})`)}
              {head("netPower", `Net power (${unitLabel("power", system)})`)}
              {head("chargeTemperature", `Charge temperature (${unitLabel("temperature", system)})`)}
              {head("blowerRpm", "Blower speed (rpm)")}
              <th scope="col" className="px-2 py-1 text-left align-bottom font-medium">
                Stock
              </th>
              <th scope="col" className="px-2 py-1 text-left align-bottom font-medium">
                Warnings
              </th>
              {onUse ? (
                <th scope="col" className="px-2 py-1 align-bottom font-medium">
                  <span className="sr-only">Use</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {sorted.map((r) => (
              <tr
                key={r.diameter}
                aria-current={r.current ? "true" : undefined}
                data-testid="ladder-row"
                data-diameter-m={r.diameter}
                data-within-range={r.withinRange ? "true" : "false"}
                className={`border-b border-line ${r.current ? "bg-accent/10 font-semibold" : ""}`}
              >
                <th scope="row" className="px-2 py-1 text-left">
                  {figure("length-small", r.diameter, system)}
                  {r.current ? <span className="text-xs font-normal text-accent"> (current)</span> : null}
                </th>
                <td className="px-2 py-1">{r.driveRatio.toFixed(2)}</td>
                <td className="px-2 py-1">{(r.overdrive * 100).toFixed(0)}</td>
                {r.withinRange && r.boost !== null ? (
                  <>
                    <td className="px-2 py-1" data-testid="ladder-boost" data-boost-pa={r.boost}>
                      {figure("pressure", r.boost, system)}
                    </td>
                    <td className="px-2 py-1">{r.netPower === null ? dash : figure("power", r.netPower, system)}</td>
                    <td className="px-2 py-1">{r.chargeTemperature === null ? dash : figure("temperature", r.chargeTemperature, system)}</td>
                  </>
                ) : (
                  <td colSpan={3} className="px-2 py-1 text-xs text-warn" data-testid="ladder-outside-range">
                    {outsideRangeText(r.rangeReasons, system)}
                  </td>
                )}
                <td className={`px-2 py-1 ${r.blowerRpmAtRedline > r.blowerMaxRpm ? "text-danger" : ""}`}>
                  {figure("speed", r.blowerRpm, system)}
                  <span className="text-xs text-muted"> of {figure("speed", r.blowerMaxRpm, system)}</span>
                </td>
                <td className="px-2 py-1">
                  {r.stock ? (r.stock.inStock ? <span className="text-ok">In stock · {money(r.stock.price)}</span> : <span className="text-muted">Out of stock · {money(r.stock.price)}</span>) : <span className="text-muted">{dash}</span>}
                </td>
                <td className="px-2 py-1 text-xs">{r.warnings.length ? <span className="text-warn">{r.warnings.join("; ")}</span> : <span className="text-muted">None</span>}</td>
                {onUse ? (
                  <td className="px-2 py-1">
                    {r.current ? null : (
                      <Button type="button" variant="ghost" className="px-2 py-0.5 text-xs" onClick={() => onUse(r.diameter)} aria-label={`Use the ${quantityText("length-small", r.diameter, system)} pulley`}>
                        Use
                      </Button>
                    )}
                  </td>
                ) : null}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
