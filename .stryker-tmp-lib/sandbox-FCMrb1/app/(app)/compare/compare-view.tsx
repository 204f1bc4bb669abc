// @ts-nocheck
"use client";
// Side by side: pickers for two to four combinations or revisions, their curves overlaid and a
// table of differences from the first, all computed in the browser with calc/.
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import type { Combination, UnitSystem } from "@/calc";
import { BoostPowerCharts } from "@/components/charts/boost-power-charts";
import type { CurveSeries } from "@/components/charts/curve-chart";
import { rpmGrid, safeCurve } from "@/lib/planner/compute";
import { outsideRangeText } from "@/lib/planner/range-words";
import { defaultSpeeds, deltaRows, deltaTone } from "@/lib/planner/side-by-side";
import { Button } from "@/components/ui/button";
import { deltaText, quantityText } from "@/lib/units/format";
import { ComparePickers, type PickerCombination, type PickerRow } from "./compare-pickers";
import { compareQuery, MAX_ITEMS, parseSpeeds, type CompareItem } from "./items";

export type ResolvedItem = { key: string; combinationId: string; revision: number | "current"; label: string; spec: Combination };

export type CompareViewProps = {
  items: ResolvedItem[];
  combinations: PickerCombination[];
  revisionsFor: Record<string, { number: number; note: string | null }[]>;
  unitSystem: UnitSystem;
  speeds: number[];
};

// Better or worse for the quantity, not up or down; words (not colour alone) in the header say which way is better.
const TONE_CLASS = { better: "text-ok", worse: "text-danger", neutral: "text-muted" } as const;

export function CompareView({ items, combinations, revisionsFor, unitSystem, speeds }: CompareViewProps) {
  const router = useRouter();
  const initialRows: PickerRow[] = items.map((i) => ({ combinationId: i.combinationId, revision: String(i.revision) }));
  while (initialRows.length < 2) initialRows.push({ combinationId: "", revision: "current" });
  const [rows, setRows] = useState<PickerRow[]>(initialRows);
  const tableSpeeds = speeds.length ? speeds : defaultSpeeds(items.map((i) => i.spec));
  const [speedText, setSpeedText] = useState(tableSpeeds.join(", "));
  const [message, setMessage] = useState<string | null>(null);
  const [showTemperature, setShowTemperature] = useState(false);

  const series = useMemo(
    (): CurveSeries[] => items.map((it, i) => ({ label: it.label, points: safeCurve(it.spec, rpmGrid(it.spec)), colorIndex: i })),
    [items],
  );
  const redline = items.length ? Math.max(...items.map((i) => i.spec.engine.redlineRpm)) : undefined;
  const speedsKey = tableSpeeds.join(",");
  const deltas = useMemo(() => deltaRows(items.map((i) => i.spec), speedsKey.split(",").map(Number)), [items, speedsKey]);

  const show = () => {
    const chosen: CompareItem[] = rows
      .filter((r) => r.combinationId)
      .map((r) => ({ combinationId: r.combinationId, revision: r.revision === "current" ? "current" : Number(r.revision) }));
    if (chosen.length < 2) return setMessage("Pick at least two combinations or revisions.");
    const at = parseSpeeds(speedText);
    if (speedText.trim() && !at.length) return setMessage("Give engine speeds between 100 and 20,000 rpm, separated by commas.");
    setMessage(null);
    router.push(`/compare?${compareQuery(chosen, at)}`);
  };

  const revisionOptions = (id: string) => {
    const c = combinations.find((x) => x.id === id);
    const known = revisionsFor[id];
    if (known) return known.map((r) => ({ value: String(r.number), label: `Revision ${r.number}${r.note ? `: ${r.note}` : ""}` }));
    return c ? Array.from({ length: c.revision }, (_, k) => c.revision - k).map((n) => ({ value: String(n), label: `Revision ${n}` })) : [];
  };

  return (
    <div className="flex flex-col gap-4">
      <form
        className="flex flex-col gap-3 rounded-lg border border-line bg-panel p-3"
        onSubmit={(e) => {
          e.preventDefault();
          show();
        }}
      >
        <ComparePickers rows={rows} onRows={setRows} combinations={combinations} revisionOptions={revisionOptions} />
        <div className="flex flex-wrap items-end gap-3">
          {rows.length < MAX_ITEMS ? (
            <Button type="button" variant="secondary" onClick={() => setRows([...rows, { combinationId: "", revision: "current" }])}>
              Add an item
            </Button>
          ) : null}
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">
              Engine speeds for the table <span className="font-normal text-muted">(rpm, separated by commas)</span>
            </span>
            <input value={speedText} onChange={(e) => setSpeedText(e.target.value)} className="rounded-md border border-line bg-bg px-2 py-1.5" />
          </label>
          <Button type="submit">Show side by side</Button>
        </div>
        {message ? (
          <p role="alert" className="text-sm text-danger">
            {message}
          </p>
        ) : null}
      </form>

      {items.length >= 2 ? (
        <>
          <section aria-labelledby="compare-chart-heading" className="flex flex-col gap-2">
            <h2 id="compare-chart-heading" className="text-base font-semibold">
              Curves
            </h2>
            <label className="flex items-center gap-1 text-sm">
              <input type="checkbox" checked={showTemperature} onChange={(e) => setShowTemperature(e.target.checked)} /> Charge temperature
            </label>
            <BoostPowerCharts series={series} unitSystem={unitSystem} redlineRpm={redline} extra={showTemperature ? "manifoldTemperature" : "none"} subject="side by side" />
          </section>
          <section aria-labelledby="deltas-heading" className="flex flex-col gap-2">
            <h2 id="deltas-heading" className="text-base font-semibold">
              Differences from the first
            </h2>
            <div className="relative overflow-x-auto">
              <table className="w-full border-collapse text-sm" data-testid="deltas-table">
                <thead className="border-b border-line text-left text-muted">
                  <tr>
                    <th scope="col" className="px-2 py-1 font-medium">
                      Quantity
                    </th>
                    <th scope="col" className="px-2 py-1 font-medium">
                      Engine speed (rpm)
                    </th>
                    {items.map((it, i) => (
                      <th key={it.key} scope="col" className="px-2 py-1 font-medium">
                        {i === 0 ? `${it.label} (reference)` : it.label}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {deltas.map((row) => (
                    <tr key={`${row.quantity.key}-${row.rpm}`} className="border-b border-line">
                      <th scope="row" className="px-2 py-1 text-left font-medium">
                        {row.quantity.label}
                        <span className="block text-xs font-normal text-muted">{row.quantity.better === "higher" ? "higher is better" : row.quantity.better === "lower" ? "lower is better" : "neither better nor worse"}</span>
                      </th>
                      <td className="px-2 py-1">{row.rpm.toLocaleString("en-US")}</td>
                      {row.cells.map((cell, i) => (
                        <td
                          key={i}
                          className="px-2 py-1"
                          data-testid={`delta-${row.quantity.key}-${row.rpm}-${i}`}
                          data-value-si={cell.value ?? ""}
                          data-delta-si={cell.delta ?? ""}
                        >
                          {cell.outside ? <span className="text-xs text-warn">{outsideRangeText(cell.outside, unitSystem)}</span> : cell.value === null ? "–" : quantityText(row.quantity.kind, cell.value, unitSystem)}
                          {i > 0 && cell.delta !== null ? " " : null}
                          {i > 0 && cell.delta !== null ? (
                            <span className={`ml-1 text-xs ${TONE_CLASS[deltaTone(row.quantity.better, cell.delta)]}`} data-tone={deltaTone(row.quantity.better, cell.delta)}>
                              ({deltaText(row.quantity.kind, cell.delta, unitSystem)})
                            </span>
                          ) : null}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            <p className="text-xs text-muted">Predictions are estimates from a simplified model; confirm on a dyno.</p>
          </section>
        </>
      ) : (
        <p className="text-sm text-muted">Pick two to four combinations or revisions, then choose “Show side by side”.</p>
      )}
    </div>
  );
}
