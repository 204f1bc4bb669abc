// What the planner computes from a valid combination, in the browser, on every change:
// curves for the current and neighbouring blower pulleys, the pulley ladder and the finder.
// Pure (calc only), so tests can run it in node.
import {
  CalcConvergenceError,
  CalcInputError,
  CalcTargetUnreachableError,
  inToM,
  pulleyForBoost,
  pulleySweep,
  trySolveCurve,
  type Combination,
  type OperatingPoint,
  type PulleyForBoostResult,
  type PulleySweepRow,
  type RangeReason,
  type UnitSystem, unitLabel } from "@/calc";
import { quantityText } from "@/lib/units/format";
import { calcErrorText } from "@/lib/units/caution-text";

/** A blower pulley on the parts shelf (diameter in m; price a decimal string). */
export type ShelfPulley = { id: string; partNumber: string; diameter: number; ribCount: number; price: string; stock: number };
/** A blower on the parts shelf with the fields calc needs (SI). */
export type ShelfBlower = Combination["blower"] & { id: string; partNumber: string; name: string; price: string; stock: number };
export type Shelf = { blowerPulleys: ShelfPulley[]; blowers: ShelfBlower[] };

/** Engine speeds of the curves: every 250 rpm from about the start of the VE curve to redline. */
export function rpmGrid(spec: Combination, step = 250): number[] {
  const first = Math.max(1000, Math.min(1500, spec.engine.veCurve[0].rpm));
  const start = Math.ceil(first / step) * step;
  const out: number[] = [];
  for (let n = start; n < spec.engine.redlineRpm; n += step) out.push(n);
  out.push(spec.engine.redlineRpm);
  return out;
}

/** The combination with another blower pulley (m). */
export const withPulley = (spec: Combination, diameter: number): Combination => ({ ...spec, drive: { ...spec.drive, blowerPulleyDiameter: diameter } });

/** The curve at each speed; speeds with no balance (a blower too slow, say) are left out rather than failing the chart. */
export const safeCurve = (spec: Combination, rpms: readonly number[]): OperatingPoint[] => trySolveCurve(spec, rpms);

/** Engine speed of highest net power on a curve (redline when the curve is empty). */
export function peakPowerRpm(points: readonly OperatingPoint[], fallback: number): number {
  let best: OperatingPoint | null = null;
  for (const p of points) if (!best || p.netPower > best.netPower) best = p;
  return best ? best.rpm : fallback;
}

const near = (a: number, b: number) => Math.abs(a - b) < 1e-6;

/** Step between neighbouring pulleys when the shelf has none: 0.1 in, or 2.5 mm. */
export const neighbourStep = (system: UnitSystem) => (unitLabel("length-small", system) === "in" ? inToM(0.1) : 0.0025);

/**
 * The next smaller and next larger blower pulleys to overlay: stocked sizes first, then any on
 * the shelf, else one step either side.
 */
export function neighbourPulleys(current: number, shelf: readonly ShelfPulley[], system: UnitSystem): { smaller: number | null; larger: number | null } {
  const pick = (list: readonly ShelfPulley[]) => {
    const ds = [...new Set(list.map((p) => p.diameter))].sort((a, b) => a - b);
    const smaller = [...ds].reverse().find((d) => d < current - 1e-6) ?? null;
    const larger = ds.find((d) => d > current + 1e-6) ?? null;
    return { smaller, larger };
  };
  const stocked = pick(shelf.filter((p) => p.stock > 0));
  const any = pick(shelf);
  const step = neighbourStep(system);
  const fallbackSmaller = current - step >= 0.03 ? current - step : null;
  const fallbackLarger = current + step <= 0.5 ? current + step : null;
  return {
    smaller: stocked.smaller ?? any.smaller ?? fallbackSmaller,
    larger: stocked.larger ?? any.larger ?? fallbackLarger,
  };
}

/** Candidate blower pulleys for the ladder (m): the shelf's sizes when it has any, else 2.5–4.5 in by 0.1 in; the current one always included. */
export function ladderDiameters(current: number, shelf: readonly ShelfPulley[]): number[] {
  const base = shelf.length ? shelf.map((p) => p.diameter) : Array.from({ length: 21 }, (_, i) => inToM(2.5 + i * 0.1));
  // The current size itself (not a near copy), then every other size once.
  const out = [current];
  for (const d of base) if (!out.some((x) => near(x, d))) out.push(d);
  return out.sort((a, b) => a - b);
}

/** One rung of the ladder as the planner shows it, all at one engine speed (`rpm`). */
export type LadderRow = {
  diameter: number;
  driveRatio: number;
  overdrive: number;
  rpm: number;
  /** Figures at `rpm`; null where there is no balance. Not to be shown when `withinRange` is false. */
  boost: number | null;
  netPower: number | null;
  chargeTemperature: number | null;
  blowerRpm: number;
  blowerRpmAtRedline: number;
  blowerMaxRpm: number;
  withinRange: boolean;
  rangeReasons: readonly RangeReason[];
  warnings: string[];
  current: boolean;
  stock: { inStock: boolean; price: string; partNumber: string } | null;
};

function warningsOf(row: PulleySweepRow): string[] {
  const w: string[] = [];
  if (row.overspeed) w.push("Blower over its speed limit at redline");
  if (row.belowBeltMinimum) w.push("Below belt minimum");
  if (row.chargeTemperatureHigh) w.push("Hot charge");
  if (row.injectorDutyHigh) w.push("Injectors at limit");
  return w;
}

/**
 * The pulley ladder at one engine speed, the same speed the finder uses, so that both give the
 * same boost for the same pulley: boost, power and charge at that speed, limits and stock.
 */
export function ladder(spec: Combination, rpm: number, shelf: readonly ShelfPulley[]): LadderRow[] {
  const ds = ladderDiameters(spec.drive.blowerPulleyDiameter, shelf);
  const sweep = pulleySweep(spec, rpm, ds);
  return ds.map((d, i) => {
    const r = sweep[i];
    const onShelf = shelf.filter((s) => near(s.diameter, d));
    const best = onShelf.find((s) => s.stock > 0) ?? onShelf[0];
    return {
      diameter: d,
      driveRatio: r.driveRatio,
      overdrive: r.overdrive,
      rpm,
      boost: r.point?.boostGauge ?? null,
      netPower: r.point?.netPower ?? null,
      chargeTemperature: r.point?.manifoldTemperature ?? null,
      blowerRpm: r.blowerRpm,
      blowerRpmAtRedline: r.blowerRpmAtRedline,
      blowerMaxRpm: spec.blower.maxRpm,
      withinRange: r.withinRange,
      rangeReasons: r.rangeReasons,
      warnings: warningsOf(r),
      current: near(d, spec.drive.blowerPulleyDiameter),
      stock: best ? { inStock: best.stock > 0, price: best.price, partNumber: best.partNumber } : null,
    };
  });
}

/** The ladder and finder's default speed: the finder's target speed when given, else peak power speed. */
export const ladderSpeed = (chosen: number | null, peakRpm: number): number => chosen ?? peakRpm;

/** Sizes the finder offers as "nearest in stock": only pulleys with stock on the shelf (an empty shelf offers none). */
export function finderStock(shelf: readonly ShelfPulley[]): number[] {
  return [...new Set(shelf.filter((p) => p.stock > 0).map((p) => p.diameter))];
}

export type FinderOutcome = { ok: true; result: PulleyForBoostResult } | { ok: false; message: string };

/** The pulley finder, with an unreachable target explained in the user's units. */
export function findPulley(spec: Combination, rpm: number, targetBoostGauge: number, stock: readonly number[], system: UnitSystem): FinderOutcome {
  try {
    return { ok: true, result: pulleyForBoost(spec, rpm, targetBoostGauge, stock) };
  } catch (e) {
    if (e instanceof CalcTargetUnreachableError) {
      const lo = e.minimum === null ? "no balance" : quantityText("pressure", e.minimum, system);
      const hi = e.maximum === null ? "no balance" : quantityText("pressure", e.maximum, system);
      return {
        ok: false,
        message: `A boost of ${quantityText("pressure", targetBoostGauge, system)} cannot be reached at ${Math.round(rpm)} rpm with any blower pulley from ${quantityText("length-small", 0.03, system)} to ${quantityText("length-small", 0.5, system)}. The reachable range there is ${lo} to ${hi}.`,
      };
    }
    if (e instanceof CalcConvergenceError || e instanceof CalcInputError) return { ok: false, message: calcErrorText(e, system) };
    throw e;
  }
}
