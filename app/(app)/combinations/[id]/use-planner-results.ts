"use client";
// The planner's results, recomputed from the deferred spec so typing stays responsive: the curve,
// the neighbouring pulleys, the ladder, the cautions, and the chart's series and metrics.
import { useMemo } from "react";
import { cautions as calcCautions, type Caution, type Combination, type UnitSystem } from "@/calc";
import type { CurveMetric, CurveSeries } from "@/components/charts/curve-chart";
import { fieldFromSI } from "@/lib/combinations/form-model";
import { ladder, ladderDiameters, neighbourPulleys, peakPowerRpm, rpmGrid, safeCurve, withPulley, type ShelfPulley } from "@/lib/planner/compute";
import { quantityText } from "@/lib/units/format";

const BASE_METRICS: CurveMetric[] = ["boostGauge", "netPower", "torque"];

export type ChartOptions = { showNeighbours: boolean; showTemperature: boolean; showBlowerSpeed: boolean };

export function usePlannerResults(deferredSpec: Combination, blowerPulleys: ShelfPulley[], system: UnitSystem) {
  return useMemo(() => {
    try {
      const s = deferredSpec;
      const rpms = rpmGrid(s);
      const current = safeCurve(s, rpms);
      const peak = peakPowerRpm(current, s.engine.redlineRpm);
      const n = neighbourPulleys(s.drive.blowerPulleyDiameter, blowerPulleys, system);
      const smaller = n.smaller === null ? null : { d: n.smaller, points: safeCurve(withPulley(s, n.smaller), rpms) };
      const larger = n.larger === null ? null : { d: n.larger, points: safeCurve(withPulley(s, n.larger), rpms) };
      const rows = ladder(s, peak, blowerPulleys);
      const list: Caution[] = calcCautions(s, current);
      return { ok: true as const, spec: s, rpms, curve: current, peak, smaller, larger, rows, cautions: list };
    } catch (e) {
      return { ok: false as const, message: e instanceof Error ? e.message : "The model could not solve this combination." };
    }
  }, [deferredSpec, blowerPulleys, system]);
}

export type PlannerResults = ReturnType<typeof usePlannerResults>;
export type SolvedResults = Extract<PlannerResults, { ok: true }>;

export function useChartSetup(results: PlannerResults, options: ChartOptions, system: UnitSystem) {
  const { showNeighbours, showTemperature, showBlowerSpeed } = options;
  const series = useMemo((): CurveSeries[] => {
    if (!results.ok) return [];
    const d = results.spec.drive.blowerPulleyDiameter;
    const out: CurveSeries[] = [{ label: `Current ${quantityText("length-small", d, system)}`, points: results.curve, colorIndex: 0 }];
    if (showNeighbours && results.smaller) out.push({ label: `${quantityText("length-small", results.smaller.d, system)} (smaller)`, points: results.smaller.points, dashed: true, colorIndex: 5 });
    if (showNeighbours && results.larger) out.push({ label: `${quantityText("length-small", results.larger.d, system)} (larger)`, points: results.larger.points, dashed: true, colorIndex: 2 });
    return out;
  }, [results, showNeighbours, system]);
  const metrics = useMemo(
    (): CurveMetric[] => [...BASE_METRICS, ...(showTemperature ? (["manifoldTemperature"] as const) : []), ...(showBlowerSpeed ? (["blowerRpm"] as const) : [])],
    [showTemperature, showBlowerSpeed],
  );
  return { series, metrics };
}

/** The pulley slider's range: the ladder's sizes and the current one, in the user's units. */
export function usePulleySlider(current: number, blowerPulleys: ShelfPulley[], system: UnitSystem) {
  return useMemo(() => {
    const ds = ladderDiameters(current, blowerPulleys);
    const lo = Math.min(ds[0], current);
    const hi = Math.max(ds[ds.length - 1], current);
    return { min: fieldFromSI("length-small", lo, system), max: fieldFromSI("length-small", hi, system), step: system === "imperial" ? 0.05 : 1 };
  }, [current, blowerPulleys, system]);
}
