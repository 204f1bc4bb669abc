// Pure helpers of the classroom view: the "what if" adjustments (a step's stored change per item
// and the live one for every item) and the curves and deltas of a step's items, computed in the
// browser with calc/.
import { INTERCOOLER_DEMO_DEFAULTS, boostCurve, combinationSchema, standardAtmosphere, type Combination, type OperatingPoint, type UnitSystem } from "@/calc";
import { VE_SCALE_MAX, VE_SCALE_MIN, type ItemChange, type LessonSeries, type StepItemSnapshot } from "@/lib/lessons/rules";
import { calcErrorText } from "@/lib/units/caution-text";
import { variantLabel } from "./change-text";

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

/** A what-if: nothing, or one change (the live control uses one pulley or a VE scale for every item). */
export type WhatIf = { kind: "none" } | ItemChange;

export { VE_SCALE_MAX, VE_SCALE_MIN };

/**
 * The item's spec with the what-if applied (a new object; the stored spec is left alone). VE stays
 * inside the model's accepted range; an intercooler keeps the item's own pressure drop and coolant
 * if it has one, else calc's defaults; altitude sets the barometer from the standard atmosphere and
 * keeps the ambient temperature as built, so only the thinner air changes.
 */
export function applyWhatIf(spec: Combination, w: WhatIf): Combination {
  switch (w.kind) {
    case "pulley":
      return { ...spec, drive: { ...spec.drive, blowerPulleyDiameter: w.diameter } };
    case "ve": {
      const veCurve = spec.engine.veCurve.map((p) => ({ rpm: p.rpm, ve: Math.min(2, Math.max(0.2, p.ve * w.scale)) }));
      return { ...spec, engine: { ...spec.engine, veCurve } };
    }
    case "intercooler":
      return { ...spec, intercooler: { ...INTERCOOLER_DEMO_DEFAULTS, ...spec.intercooler, effectiveness: w.effectiveness } };
    case "altitude":
      return { ...spec, ambient: { ...spec.ambient, pressure: standardAtmosphere(w.altitude).pressure } };
    default:
      return spec;
  }
}

/** Engine speeds for a step's chart: every 250 rpm from 1500 rpm to the highest redline. */
export function rpmGrid(specs: readonly Combination[]): number[] {
  const top = Math.max(...specs.map((s) => s.engine.redlineRpm));
  const out: number[] = [];
  for (let r = 1500; r < top; r += 250) out.push(r);
  out.push(top);
  return out;
}

/**
 * One curve of a step. An item with a stored change gives two: as built, then changed (`base` is
 * the index of its as-built curve); `item` is the item's index in the step.
 */
export type ItemCurve = { label: string; item: number; base: number | null; spec: Combination; points: OperatingPoint[]; error: string | null };

type Variant = { label: string; item: number; base: number | null; spec: Combination };

/** The curves a step shows: each item, and beside an item with a change its changed copy; the live what-if applies to all. */
export function stepVariants(items: readonly StepItemSnapshot[], live: WhatIf, system: UnitSystem): Variant[] {
  const out: Variant[] = [];
  items.forEach((it, item) => {
    if (!it.change) {
      out.push({ label: it.label, item, base: null, spec: applyWhatIf(it.spec, live) });
      return;
    }
    const base = out.length;
    out.push({ label: variantLabel(it.label, null, system), item, base: null, spec: applyWhatIf(it.spec, live) });
    out.push({ label: variantLabel(it.label, it.change, system), item, base, spec: applyWhatIf(applyWhatIf(it.spec, it.change), live) });
  });
  return out;
}

/** Each curve up to its own redline; one the model cannot solve reports why (in the viewer's units) instead of throwing. */
export function stepCurves(items: readonly StepItemSnapshot[], live: WhatIf, system: UnitSystem = "imperial"): ItemCurve[] {
  const variants = stepVariants(items, live, system);
  const grid = rpmGrid(variants.map((v) => v.spec));
  return variants.map((v) => {
    try {
      const valid = combinationSchema.parse(v.spec);
      return { ...v, spec: valid, points: boostCurve(valid, [...grid.filter((r) => r < valid.engine.redlineRpm), valid.engine.redlineRpm]), error: null };
    } catch (e) {
      const issue = (e as { issues?: { message: string }[] }).issues?.[0]?.message;
      return { ...v, points: [], error: issue ?? calcErrorText(e, system, String(e)) };
    }
  });
}

/**
 * The engine speeds of the deltas table: mid-range and near the lowest redline, rounded to 500 rpm.
 * Always two: the top is at least 2000 rpm and the middle at most half of it plus 250, or 1500.
 */
export function deltaSpeeds(specs: readonly Combination[]): number[] {
  const low = Math.min(...specs.map((s) => s.engine.redlineRpm));
  const top = Math.max(2000, Math.floor((low - 250) / 500) * 500);
  const mid = Math.max(1500, Math.round(top / 2 / 500) * 500);
  return [mid, top];
}

/** The point of a curve at an engine speed (the grid holds every 250 rpm), or null. */
export function pointAt(points: readonly OperatingPoint[], rpm: number): OperatingPoint | null {
  return points.find((p) => Math.abs(p.rpm - rpm) < 1e-6) ?? null;
}
