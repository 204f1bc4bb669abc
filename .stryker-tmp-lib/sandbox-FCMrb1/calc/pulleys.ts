// @ts-nocheck
// The pulley ladder (a row per candidate blower pulley) and the pulley finder (the exact
// blower pulley for a target boost, and the nearest stocked sizes either side).
import { SOLVER_MAX_ITERATIONS, SOLVER_RELATIVE_TOLERANCE } from "./constants";
import { overspeedAt, resolveThresholds } from "./cautions";
import { blowerSpeedUnchecked, overdrive } from "./drive";
import { CalcConvergenceError, CalcTargetUnreachableError } from "./errors";
import { brent } from "./root-finding";
import {
  cautionOptionsSchema,
  combinationSchema,
  parseOrThrow,
  pulleyDiameterListSchema,
  rpmSchema,
  targetBoostSchema,
  type CautionOptions,
  type Combination,
  type CombinationInput,
} from "./schema";
import { prepare, solvePrepared, type OperatingPoint } from "./solve";
import type { RangeReason } from "./range";

/** Smallest blower pulley the finder considers (m): the schema's lower bound. */
export const PULLEY_FINDER_MIN_DIAMETER = 0.03;
/** Largest blower pulley the finder considers (m): the schema's upper bound. */
export const PULLEY_FINDER_MAX_DIAMETER = 0.5;

/** One rung of the pulley ladder. */
export interface PulleySweepRow {
  /** Blower pulley diameter (m). */
  readonly diameter: number;
  /** Drive ratio crank/blower pulley (dimensionless). */
  readonly driveRatio: number;
  /** Overdrive r − 1 (fraction). */
  readonly overdrive: number;
  /** Blower speed at the chosen engine speed (rev/min). */
  readonly blowerRpm: number;
  /** Blower speed at redline (rev/min). */
  readonly blowerRpmAtRedline: number;
  /** Operating point at the chosen engine speed, or null when no balance exists (see problem). */
  readonly point: OperatingPoint | null;
  /** Why there is no point, or null. */
  readonly problem: string | null;
  /** Blower over its speed limit at redline. */
  readonly overspeed: boolean;
  /** Pulley smaller than the belt's minimum diameter. */
  readonly belowBeltMinimum: boolean;
  /** Charge temperature over the limit at this engine speed. */
  readonly chargeTemperatureHigh: boolean;
  /** Injector duty over its limit at this engine speed. */
  readonly injectorDutyHigh: boolean;
  /** Pressure ratio above what the model is meant for, or below 1. */
  readonly pressureRatioOutOfRange: boolean;
  /** False when the row is outside the model's range: its point's reasons, or no balance at all. */
  readonly withinRange: boolean;
  /** Why the row is outside the model's range (`no-balance` when point is null). */
  readonly rangeReasons: RangeReason[];
}

/** Boost and limits per candidate blower pulley diameter (m) at one engine speed (rev/min). */
export function pulleySweep(
  combination: CombinationInput,
  rpm: number,
  blowerPulleyDiameters: readonly number[],
  options?: CautionOptions,
): PulleySweepRow[] {
  const c = parseOrThrow(combinationSchema, combination);
  const n = parseOrThrow(rpmSchema, rpm, "rpm");
  const diameters = parseOrThrow(pulleyDiameterListSchema, blowerPulleyDiameters, "blowerPulleyDiameters");
  const t = resolveThresholds(parseOrThrow(cautionOptionsSchema, options, "options"));
  return diameters.map((d) => {
    const p = prepare(c, d);
    const cd: Combination = { ...c, drive: { ...c.drive, blowerPulleyDiameter: d } };
    let point: OperatingPoint | null = null;
    let problem: string | null = null;
    try {
      point = solvePrepared(p, n);
    } catch (e) {
      if (!(e instanceof CalcConvergenceError)) throw e;
      problem = e.message;
    }
    const speed = overspeedAt(cd, Math.max(n, c.engine.redlineRpm));
    return {
      diameter: d,
      driveRatio: p.ratio,
      overdrive: overdrive(p.ratio),
      blowerRpm: blowerSpeedUnchecked(cd, n),
      blowerRpmAtRedline: blowerSpeedUnchecked(cd, c.engine.redlineRpm),
      point,
      problem,
      overspeed: speed.over,
      belowBeltMinimum: d < t.beltMinimumDiameter,
      chargeTemperatureHigh: point !== null && point.manifoldTemperature > t.chargeTemperatureLimit,
      injectorDutyHigh: point !== null && point.injectorDuty !== null && point.injectorDuty > c.fuel.maxDuty,
      pressureRatioOutOfRange: point !== null && (point.pressureRatio > t.maxModelPressureRatio || point.pressureRatio < 1),
      withinRange: point !== null && point.withinRange,
      rangeReasons: point === null ? ["no-balance"] : point.rangeReasons,
    };
  });
}

/** A stocked pulley and its operating point. */
export interface StockedPulley {
  /** Blower pulley diameter (m). */
  readonly diameter: number;
  /** Operating point with it (SI). */
  readonly point: OperatingPoint;
}

/** Result of the pulley finder. */
export interface PulleyForBoostResult {
  /** Exact blower pulley diameter for the target boost (m). */
  readonly diameter: number;
  /** Operating point with that diameter (SI). */
  readonly point: OperatingPoint;
  /** Nearest stocked pulley at or below the exact diameter (more boost), or null. */
  readonly below: StockedPulley | null;
  /** Nearest stocked pulley at or above the exact diameter (less boost), or null. */
  readonly above: StockedPulley | null;
}

/** Solve a candidate pulley; no balance on the fast side counts as +∞ boost, too slow as −∞. */
function boostWith(c: Combination, rpm: number, diameter: number): number {
  try {
    return solvePrepared(prepare(c, diameter), rpm).boostGauge;
  } catch (e) {
    if (e instanceof CalcConvergenceError && e.reason === "no-balance") return Number.POSITIVE_INFINITY;
    if (e instanceof CalcConvergenceError && e.reason === "blower-too-slow") return Number.NEGATIVE_INFINITY;
    throw e;
  }
}

interface FinderContext {
  readonly c: Combination;
  readonly rpm: number;
  readonly dc: number;
  readonly target: number;
}

/** Boost at drive ratio r minus the target (Pa). */
function boostGap(k: FinderContext, r: number): number {
  return boostWith(k.c, k.rpm, k.dc / r) - k.target;
}

function trySolve(c: Combination, rpm: number, diameter: number): StockedPulley | null {
  try {
    return { diameter, point: solvePrepared(prepare(c, diameter), rpm) };
  } catch (e) {
    if (e instanceof CalcConvergenceError) return null;
    throw e;
  }
}

const kpaText = (pa: number): string => `${(pa / 1000).toFixed(1)} kPa`;

/** Exact blower pulley diameter (m) for a target boost (Pa gauge) at an engine speed (rev/min), plus nearest stocked sizes (m). */
export function pulleyForBoost(
  combination: CombinationInput,
  rpm: number,
  targetBoostGaugePa: number,
  stockDiameters?: readonly number[],
): PulleyForBoostResult {
  const c = parseOrThrow(combinationSchema, combination);
  const n = parseOrThrow(rpmSchema, rpm, "rpm");
  const target = parseOrThrow(targetBoostSchema, targetBoostGaugePa, "targetBoostGauge");
  const stock = stockDiameters === undefined ? [] : parseOrThrow(pulleyDiameterListSchema, stockDiameters, "stockDiameters");
  const dc = c.drive.crankPulleyDiameter;

  // Solve in drive ratio r = Dc/D, in which boost rises monotonically and nearly linearly.
  const context: FinderContext = { c, rpm: n, dc, target };
  const g = (r: number): number => boostGap(context, r);
  let a = dc / PULLEY_FINDER_MAX_DIAMETER;
  let b = dc / PULLEY_FINDER_MIN_DIAMETER;
  let ga = g(a);
  let gb = g(b);
  if (ga > 0 || gb < 0) {
    const min = Number.isFinite(ga) ? ga + target : null;
    const max = Number.isFinite(gb) ? gb + target : null;
    const range = `${min === null ? "no balance" : kpaText(min)} to ${max === null ? "no balance" : kpaText(max)}`;
    throw new CalcTargetUnreachableError(
      `A boost of ${kpaText(target)} cannot be reached at ${Math.round(n)} rpm with blower pulleys from ${PULLEY_FINDER_MIN_DIAMETER * 1000} to ${PULLEY_FINDER_MAX_DIAMETER * 1000} mm; the reachable range there is ${range}.`,
      "targetBoostGauge",
      min,
      max,
    );
  }
  let root: number | null = ga === 0 ? a : gb === 0 ? b : null;
  // Where an end has no balance, halve the bracket until both ends are finite.
  for (let i = 0; root === null && (!Number.isFinite(ga) || !Number.isFinite(gb)); i++) {
    if (i >= SOLVER_MAX_ITERATIONS) {
      throw new CalcConvergenceError(`The pulley finder could not bracket ${kpaText(target)} at ${Math.round(n)} rpm.`, "not-converged", n, "targetBoostGauge");
    }
    const m = 0.5 * (a + b);
    const gm = g(m);
    if (gm === 0) root = m;
    else if (gm > 0) {
      b = m;
      gb = gm;
    } else {
      a = m;
      ga = gm;
    }
  }
  if (root === null) {
    const result = brent(boostGap, context, a, b, ga, gb, SOLVER_RELATIVE_TOLERANCE, SOLVER_MAX_ITERATIONS);
    if (!result.converged) {
      throw new CalcConvergenceError(`The pulley finder did not converge on ${kpaText(target)} at ${Math.round(n)} rpm.`, "not-converged", n, "targetBoostGauge");
    }
    root = result.root;
  }
  const diameter = dc / root;
  const point = solvePrepared(prepare(c, diameter), n);

  const sorted = [...new Set(stock)].sort((x, y) => x - y);
  let below: StockedPulley | null = null;
  for (let i = sorted.length - 1; i >= 0 && below === null; i--) {
    if (sorted[i] <= diameter) below = trySolve(c, n, sorted[i]);
  }
  let above: StockedPulley | null = null;
  for (let i = 0; i < sorted.length && above === null; i++) {
    if (sorted[i] >= diameter) above = trySolve(c, n, sorted[i]);
  }
  return { diameter, point, below, above };
}
