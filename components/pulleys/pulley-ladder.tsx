"use client";
// The pulley ladder: one row per candidate blower pulley, sortable by any column.
import { useMemo, useState } from "react";
import { unitLabel, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { figure, quantityText } from "@/lib/units/format";
import type { LadderRow } from "@/lib/planner/compute";

type SortKey = "diameter" | "overdrive" | "boostAtPeak" | "boostAtRedline" | "blowerRpmAtRedline" | "chargeTemperature" | "netPower";

export type PulleyLadderProps = {
  rows: LadderRow[];
  system: UnitSystem;
  peakRpm: number;
  redlineRpm: number;
  fromShelf: boolean;
  onUse?: (diameter: number) => void;
};

// Prices come from the database as exact decimal strings (numeric), shown as they are.
const money = (price: string) => `$${price}`;

export function PulleyLadder({ rows, system, peakRpm, redlineRpm, fromShelf, onUse }: PulleyLadderProps) {
  const [sort, setSort] = useState<{ key: SortKey; dir: "ascending" | "descending" }>({ key: "diameter", dir: "ascending" });
  const sorted = useMemo(() => {
    const out = [...rows];
    const sign = sort.dir === "ascending" ? 1 : -1;
    out.sort((a, b) => {
      const x = a[sort.key] ?? Number.NEGATIVE_INFINITY;
      const y = b[sort.key] ?? Number.NEGATIVE_INFINITY;
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

  const dash = "–";
  return (
    <section aria-labelledby="ladder-heading" className="flex flex-col gap-2">
      <h2 id="ladder-heading" className="text-base font-semibold">
        Pulley ladder
      </h2>
      <p className="text-xs text-muted">
        {fromShelf ? "Blower pulleys on the parts shelf" : "The parts shelf has no blower pulleys yet: a range of sizes"}. Boost and power at the
        peak-power speed ({figure("speed", peakRpm, system)} rpm) and at redline ({figure("speed", redlineRpm, system)} rpm).
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" data-testid="pulley-ladder">
          <thead className="border-b border-line text-muted">
            <tr>
              {head("diameter", `Blower pulley (${unitLabel("length-small", system)})`)}
              <th scope="col" className="px-2 py-1 text-left align-bottom font-medium">
                Drive ratio
              </th>
              {head("overdrive", "Overdrive (%)")}
              {head("boostAtPeak", `Boost at peak power (${unitLabel("pressure", system)})`)}
              {head("boostAtRedline", `Boost at redline (${unitLabel("pressure", system)})`)}
              {head("blowerRpmAtRedline", "Blower speed at redline (rpm)")}
              {head("chargeTemperature", `Charge temperature at redline (${unitLabel("temperature", system)})`)}
              {head("netPower", `Net power at peak (${unitLabel("power", system)})`)}
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
                data-boost-redline-pa={r.boostAtRedline ?? ""}
                className={`border-b border-line ${r.current ? "bg-accent/10 font-semibold" : ""}`}
              >
                <th scope="row" className="px-2 py-1 text-left">
                  {figure("length-small", r.diameter, system)}
                  {r.current ? <span className="text-xs font-normal text-accent"> (current)</span> : null}
                </th>
                <td className="px-2 py-1">{r.driveRatio.toFixed(2)}</td>
                <td className="px-2 py-1">{(r.overdrive * 100).toFixed(0)}</td>
                <td className="px-2 py-1">{r.boostAtPeak === null ? dash : figure("pressure", r.boostAtPeak, system)}</td>
                <td className="px-2 py-1" data-testid="ladder-boost-redline">
                  {r.boostAtRedline === null ? dash : figure("pressure", r.boostAtRedline, system)}
                </td>
                <td className={`px-2 py-1 ${r.blowerRpmAtRedline > r.blowerMaxRpm ? "text-danger" : ""}`}>
                  {figure("speed", r.blowerRpmAtRedline, system)}
                  <span className="text-xs text-muted"> of {figure("speed", r.blowerMaxRpm, system)}</span>
                </td>
                <td className="px-2 py-1">{r.chargeTemperature === null ? dash : figure("temperature", r.chargeTemperature, system)}</td>
                <td className="px-2 py-1">{r.netPower === null ? dash : figure("power", r.netPower, system)}</td>
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
