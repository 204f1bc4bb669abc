// @ts-nocheck
"use client";
// The planner's results, recomputed from the deferred spec so typing stays responsive: the curve,
// the neighbouring pulleys, the ladder at the one chosen speed, the cautions, the what-if pulley
// and the chart's series.
import { useMemo } from "react";
import { cautions as calcCautions, trySolvePoint, type Caution, type Combination, type UnitSystem, unitLabel } from "@/calc";
import type { BoostExtra } from "@/components/charts/boost-power-charts";
import type { CurveSeries } from "@/components/charts/curve-chart";
import { fieldFromSI } from "@/lib/combinations/form-model";
import { ladder, ladderDiameters, ladderSpeed, neighbourPulleys, peakPowerRpm, rpmGrid, safeCurve, withPulley, type ShelfPulley } from "@/lib/planner/compute";
import { explainSentence } from "@/lib/planner/explain-words";
import { quantityText } from "@/lib/units/format";
import { calcErrorText } from "@/lib/units/caution-text";

export type ChartOptions = { showNeighbours: boolean; extra: BoostExtra };

type ResultsInput = { spec: Combination; baseSpec: Combination; chosenRpm: number | null; whatIf: number | null; blowerPulleys: ShelfPulley[]; system: UnitSystem };

const unsolved = (e: unknown, system: UnitSystem) => ({ ok: false as const, message: calcErrorText(e, system) });

export function usePlannerResults({ spec: s, baseSpec, chosenRpm, whatIf, blowerPulleys, system }: ResultsInput) {
  // Everything but the what-if, so a slider move recomputes only the what-if curve and the why.
  const fixed = useMemo(() => {
    try {
      const rpms = rpmGrid(s);
      const current = safeCurve(s, rpms);
      const peak = peakPowerRpm(current, s.engine.redlineRpm);
      const rpm = ladderSpeed(chosenRpm, peak);
      const n = neighbourPulleys(s.drive.blowerPulleyDiameter, blowerPulleys, system);
      const smaller = n.smaller === null ? null : { d: n.smaller, points: safeCurve(withPulley(s, n.smaller), rpms) };
      const larger = n.larger === null ? null : { d: n.larger, points: safeCurve(withPulley(s, n.larger), rpms) };
      const rows = ladder(s, rpm, blowerPulleys);
      const list: Caution[] = calcCautions(s, current);
      return { ok: true as const, spec: s, rpms, curve: current, peak, rpm, smaller, larger, rows, cautions: list, here: trySolvePoint(s, rpm) };
    } catch (e) {
      return unsolved(e, system);
    }
  }, [s, chosenRpm, blowerPulleys, system]);
  return useMemo(() => {
    if (!fixed.ok) return fixed;
    try {
      const { spec, rpms, rpm, here } = fixed;
      const what = whatIf === null ? null : { d: whatIf, points: safeCurve(withPulley(spec, whatIf), rpms) };
      // The why: the what-if against the current pulley, else the current spec against the saved one.
      const why =
        whatIf !== null
          ? explainSentence(here, trySolvePoint(withPulley(spec, whatIf), rpm), system, `the ${quantityText("length-small", spec.drive.blowerPulleyDiameter, system)} pulley`)
          : explainSentence(trySolvePoint(baseSpec, rpm), here, system);
      return { ...fixed, whatIf: what, why };
    } catch (e) {
      return unsolved(e, system);
    }
  }, [fixed, baseSpec, whatIf, system]);
}

export type PlannerResults = ReturnType<typeof usePlannerResults>;
export type SolvedResults = Extract<PlannerResults, { ok: true }>;

export function useChartSeries(results: PlannerResults, showNeighbours: boolean, system: UnitSystem) {
  return useMemo((): CurveSeries[] => {
    if (!results.ok) return [];
    const d = results.spec.drive.blowerPulleyDiameter;
    const len = (x: number) => quantityText("length-small", x, system);
    const out: CurveSeries[] = [{ label: `Current ${len(d)}`, points: results.curve, colorIndex: 0 }];
    if (results.whatIf) out.push({ label: `What-if ${len(results.whatIf.d)}`, points: results.whatIf.points, colorIndex: 5, dashed: true });
    if (showNeighbours && results.smaller) out.push({ label: `${len(results.smaller.d)} smaller`, points: results.smaller.points, muted: true });
    if (showNeighbours && results.larger) out.push({ label: `${len(results.larger.d)} larger`, points: results.larger.points, muted: true });
    return out;
  }, [results, showNeighbours, system]);
}

/** The pulley slider's range: the ladder's sizes and the current one, in the user's units. */
export function usePulleySlider(current: number, blowerPulleys: ShelfPulley[], system: UnitSystem) {
  return useMemo(() => {
    const ds = ladderDiameters(current, blowerPulleys);
    const lo = Math.min(ds[0], current);
    const hi = Math.max(ds[ds.length - 1], current);
    return { min: fieldFromSI("length-small", lo, system), max: fieldFromSI("length-small", hi, system), step: unitLabel("length-small", system) === "in" ? 0.05 : 1 };
  }, [current, blowerPulleys, system]);
}
