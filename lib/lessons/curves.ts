// Pure helpers of the classroom view: the "what if" adjustment and the curves and deltas of a
// step's items, computed in the browser with calc/ (nothing is saved).
import { boostCurve, combinationSchema, type Combination, type OperatingPoint } from "@/calc";
import type { LessonSeries, StepItemSnapshot } from "@/lib/lessons/rules";

/** The chart metric (an OperatingPoint field) behind each lesson series. */
export const SERIES_METRIC = {
  boost: "boostGauge",
  netPower: "netPower",
  torque: "torque",
  chargeTemperature: "manifoldTemperature",
  blowerSpeed: "blowerRpm",
} as const satisfies Record<LessonSeries, keyof OperatingPoint>;

export const SERIES_LABEL: Record<LessonSeries, string> = {
  boost: "Boost",
  netPower: "Net power",
  torque: "Torque",
  chargeTemperature: "Charge temperature",
  blowerSpeed: "Blower speed",
};

/** A what-if: nothing, one blower pulley for every item (m), or a VE scale (fraction, 1 = as built). */
export type WhatIf = { kind: "none" } | { kind: "pulley"; diameter: number } | { kind: "ve"; scale: number };

export const VE_SCALE_MIN = 0.8;
export const VE_SCALE_MAX = 1.2;

/** The item's spec with the what-if applied; VE stays inside the model's accepted range. */
export function applyWhatIf(spec: Combination, w: WhatIf): Combination {
  if (w.kind === "pulley") return { ...spec, drive: { ...spec.drive, blowerPulleyDiameter: w.diameter } };
  if (w.kind === "ve") {
    const veCurve = spec.engine.veCurve.map((p) => ({ rpm: p.rpm, ve: Math.min(2, Math.max(0.2, p.ve * w.scale)) }));
    return { ...spec, engine: { ...spec.engine, veCurve } };
  }
  return spec;
}

/** Engine speeds for a step's chart: every 250 rpm from 1500 rpm to the highest redline. */
export function rpmGrid(specs: readonly Combination[]): number[] {
  const top = Math.max(...specs.map((s) => s.engine.redlineRpm));
  const out: number[] = [];
  for (let r = 1500; r < top; r += 250) out.push(r);
  out.push(top);
  return out;
}

export type ItemCurve = { label: string; spec: Combination; points: OperatingPoint[]; error: string | null };

/** Each item's curve up to its own redline; an item the model cannot solve reports why instead of throwing. */
export function stepCurves(items: readonly StepItemSnapshot[], w: WhatIf): ItemCurve[] {
  const specs = items.map((it) => applyWhatIf(it.spec, w));
  const grid = rpmGrid(specs);
  return items.map((it, i) => {
    const spec = specs[i];
    try {
      const valid = combinationSchema.parse(spec);
      return { label: it.label, spec: valid, points: boostCurve(valid, [...grid.filter((r) => r < valid.engine.redlineRpm), valid.engine.redlineRpm]), error: null };
    } catch (e) {
      const issue = (e as { issues?: { message: string }[] }).issues?.[0]?.message;
      return { label: it.label, spec, points: [], error: issue ?? (e instanceof Error ? e.message : String(e)) };
    }
  });
}

/** The engine speeds of the deltas table: mid-range and near the lowest redline, rounded to 500 rpm. */
export function deltaSpeeds(specs: readonly Combination[]): number[] {
  const low = Math.min(...specs.map((s) => s.engine.redlineRpm));
  const top = Math.max(2000, Math.floor((low - 250) / 500) * 500);
  const mid = Math.max(1500, Math.round(top / 2 / 500) * 500);
  return mid === top ? [top] : [mid, top];
}

/** The point of a curve at an engine speed (the grid holds every 250 rpm), or null. */
export function pointAt(points: readonly OperatingPoint[], rpm: number): OperatingPoint | null {
  return points.find((p) => Math.abs(p.rpm - rpm) < 1e-6) ?? null;
}
