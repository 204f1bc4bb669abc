// @ts-nocheck
// Calibration from logged runs, one per blower pulley size. With one size only the engine's VE
// curve can be told apart (calibrateVe). With two or more, the same engine speed seen at two
// blower speeds separates the blower's slip from the engine's breathing: a wrong slip makes the
// VE implied at the smaller pulley disagree with the VE implied at the larger one. The fit
// finds the slip (blower.volumetricEfficiencyRef) at which one VE curve serves every run.
// Runs logged at different speeds are compared by interpolation where their spans overlap.
import { CalcConvergenceError, CalcInputError } from "./errors";
import { calibrateVe, impliedVe } from "./calibrate";
import { veAt } from "./engine";
import {
  calibrationRunsSchema,
  combinationSchema,
  parseOrThrow,
  type CalibrationRun,
  type Combination,
  type CombinationInput,
  type VePoint,
} from "./schema";
import { newState, prepare, solvePrepared, type PreparedCombination } from "./solve";

/** Spread of a VE implied by one logged point, from the noise of a boost sensor (fraction): an author's choice. */
export const CALIBRATION_VE_SIGMA = 0.01;
/** Spread allowed to the blower's reference VE about its catalogue value (fraction): an author's choice that keeps noise from swinging the slip. */
export const CALIBRATION_SLIP_PRIOR_SIGMA = 0.2;
/** Range searched for the blower's reference VE (fraction): the schema's bounds. */
const SLIP_SEARCH = { min: 0.3, max: 1, step: 0.02, tolerance: 1e-6 } as const;

/** A parameter the calibration moved, from what to what. */
export type FittedParameter =
  | { readonly parameter: "engine.veCurve"; readonly from: VePoint[]; readonly to: VePoint[] }
  | { readonly parameter: "blower.volumetricEfficiencyRef"; readonly from: number; readonly to: number };

/** How the model meets one logged point before and after calibration (SI; boost gauge in Pa). */
export interface RunResidual {
  /** Index of the run in the input. */
  readonly run: number;
  /** Blower pulley diameter of the run (m). */
  readonly blowerPulleyDiameter: number;
  /** Engine speed (rev/min). */
  readonly rpm: number;
  /** Measured boost (Pa, gauge). */
  readonly measuredBoostGauge: number;
  /** Boost the model predicted before calibration (Pa, gauge); null if it found no balance. */
  readonly predictedBefore: number | null;
  /** Boost the calibrated model predicts (Pa, gauge); null if it finds no balance. */
  readonly predictedAfter: number | null;
  /** Predicted minus measured boost before calibration (Pa); null if no balance. */
  readonly residualBefore: number | null;
  /** Predicted minus measured boost after calibration (Pa); null if no balance. */
  readonly residualAfter: number | null;
  /** Measured manifold temperature (K), or null. */
  readonly measuredManifoldTemperature: number | null;
  /** Manifold temperature the calibrated model predicts (K); null if no balance. */
  readonly modelManifoldTemperature: number | null;
}

/** The calibrated combination, the residuals before and after, and what was moved. */
export interface RunsCalibrationResult {
  /** The input combination with the fitted parameters (SI). */
  readonly combination: Combination;
  /** One entry per logged point, in input order of runs and points. */
  readonly residuals: RunResidual[];
  /** Each parameter moved, from what to what. */
  readonly fitted: FittedParameter[];
}

interface ParsedRun {
  readonly blowerPulleyDiameter: number;
  readonly measured: { rpm: number; boostGauge: number; manifoldTemperature?: number | null }[];
}

/** A joint VE curve for a trial slip and the cost of the runs' disagreement about it. */
interface JointFit {
  readonly cost: number;
  readonly veCurve: VePoint[];
}

const withSlip = (c: Combination, eta: number): Combination => ({ ...c, blower: { ...c.blower, volumetricEfficiencyRef: eta } });

/** Piecewise-linear value of points sorted by rpm at an engine speed, or null outside their span. */
function within(points: readonly VePoint[], rpm: number): number | null {
  if (rpm < points[0].rpm || rpm > points[points.length - 1].rpm) return null;
  return veAt(points, rpm);
}

/**
 * The runs' agreement at a trial slip. Each run implies a VE at each of its speeds (closed
 * form); where another run's speeds span the same engine speed, the two must agree if the
 * slip is right. The cost is the sum of squared disagreements over 2·σv² (two noisy values)
 * plus a prior holding the slip near the catalogue value. The joint VE curve averages, at
 * every logged speed, the curves of the runs that span it.
 */
function jointFit(c: Combination, runs: readonly ParsedRun[], eta: number, eta0: number, knots: readonly number[]): JointFit | null {
  const state = newState();
  const trial = withSlip(c, eta);
  const curves: VePoint[][] = [];
  for (const run of runs) {
    const p = prepare(trial, run.blowerPulleyDiameter);
    const curve: VePoint[] = [];
    for (const m of run.measured) {
      const ve = impliedVe(p, m, state);
      if (typeof ve === "string" || !Number.isFinite(ve)) return null;
      curve.push({ rpm: m.rpm, ve });
    }
    curves.push(curve.sort((a, b) => a.rpm - b.rpm));
  }
  let cost = ((eta - eta0) / CALIBRATION_SLIP_PRIOR_SIGMA) ** 2;
  const weight = 1 / (2 * CALIBRATION_VE_SIGMA ** 2);
  curves.forEach((own, j) => {
    curves.forEach((other, i) => {
      if (i === j) return;
      for (const point of own) {
        const there = within(other, point.rpm);
        if (there !== null) cost += (weight * (point.ve - there) ** 2) / 2; // each pair is seen from both sides
      }
    });
  });
  const veCurve = knots.map((rpm) => {
    let sum = 0;
    let n = 0;
    for (const curve of curves) {
      const v = within(curve, rpm);
      if (v !== null) {
        sum += v;
        n += 1;
      }
    }
    return { rpm, ve: sum / n };
  });
  return { cost, veCurve };
}

/** Slip that minimises the joint misfit: a coarse scan, then golden-section refinement. */
function fitSlip(c: Combination, runs: readonly ParsedRun[], knots: readonly number[]): number {
  const eta0 = c.blower.volumetricEfficiencyRef;
  const cost = (eta: number): number => jointFit(c, runs, eta, eta0, knots)?.cost ?? Number.POSITIVE_INFINITY;
  let best = eta0;
  let bestCost = cost(eta0);
  for (let eta = SLIP_SEARCH.min; eta <= SLIP_SEARCH.max + 1e-12; eta += SLIP_SEARCH.step) {
    const value = cost(eta);
    if (value < bestCost) {
      best = eta;
      bestCost = value;
    }
  }
  if (!Number.isFinite(bestCost)) {
    throw new CalcInputError([{ field: "runs", message: "No blower slip lets one VE curve meet these runs. Check the pulley sizes and the logs." }]);
  }
  let lo = Math.max(SLIP_SEARCH.min, best - SLIP_SEARCH.step);
  let hi = Math.min(SLIP_SEARCH.max, best + SLIP_SEARCH.step);
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - g * (hi - lo);
  let x2 = lo + g * (hi - lo);
  let f1 = cost(x1);
  let f2 = cost(x2);
  while (hi - lo > SLIP_SEARCH.tolerance) {
    if (f1 <= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - g * (hi - lo);
      f1 = cost(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + g * (hi - lo);
      f2 = cost(x2);
    }
  }
  const refined = f1 <= f2 ? x1 : x2;
  return Math.min(f1, f2) <= bestCost ? refined : best;
}

function solveOrNull(p: PreparedCombination, rpm: number): { boostGauge: number; manifoldTemperature: number } | null {
  try {
    return solvePrepared(p, rpm);
  } catch (e) {
    if (e instanceof CalcConvergenceError) return null;
    throw e;
  }
}

/** Re-key a calibrateVe input error from `measured.i…` to `runs.j.measured.i…`. */
function underRun(e: unknown, run: number): unknown {
  if (!(e instanceof CalcInputError)) return e;
  return new CalcInputError(e.issues.map((x) => ({ field: `runs.${run}.${x.field}`, message: x.message })));
}

/**
 * Calibrate a combination from logged runs, one per blower pulley size (diameters m, boost Pa
 * gauge, temperatures K). One size: the VE curve alone, exactly as calibrateVe. Two or more
 * sizes: the blower's reference VE (its slip) and one VE curve at every logged speed, by
 * regularised least squares. Throws CalcInputError naming `runs.j.…` fields.
 */
export function calibrate(combination: CombinationInput, runs: readonly CalibrationRun[]): RunsCalibrationResult {
  const c = parseOrThrow(combinationSchema, combination);
  const parsed: ParsedRun[] = parseOrThrow(calibrationRunsSchema, runs, "runs");
  // Every point must be possible for the blower as given, field by field.
  const state = newState();
  parsed.forEach((run, j) => {
    const p = prepare(c, run.blowerPulleyDiameter);
    run.measured.forEach((m, i) => {
      const ve = impliedVe(p, m, state);
      if (typeof ve === "string") throw new CalcInputError([{ field: `runs.${j}.measured.${i}.boostGauge`, message: ve }]);
    });
  });

  const fitted: FittedParameter[] = [];
  let result: Combination;
  const sizes = new Set(parsed.map((r) => r.blowerPulleyDiameter));
  if (parsed.length === 1) {
    let veCurve: VePoint[];
    try {
      veCurve = calibrateVe({ ...c, drive: { ...c.drive, blowerPulleyDiameter: parsed[0].blowerPulleyDiameter } }, parsed[0].measured).veCurve;
    } catch (e) {
      throw underRun(e, 0);
    }
    result = { ...c, engine: { ...c.engine, veCurve } };
  } else {
    const knots = [...new Set(parsed.flatMap((r) => r.measured.map((m) => m.rpm)))].sort((a, b) => a - b);
    const eta0 = c.blower.volumetricEfficiencyRef;
    const eta = sizes.size >= 2 ? fitSlip(c, parsed, knots) : eta0;
    const fit = jointFit(c, parsed, eta, eta0, knots);
    if (fit === null) throw new CalcInputError([{ field: "runs", message: "The runs could not be fitted. Check the pulley sizes and the logs." }]);
    const bad = fit.veCurve.find((p) => !(p.ve >= 0.2 && p.ve <= 2));
    if (bad) {
      throw new CalcInputError([
        { field: "runs", message: `The runs imply a VE of ${bad.ve.toFixed(2)} at ${bad.rpm} rpm, outside 0.2–2. Check the blower data, the pulleys and the logs.` },
      ]);
    }
    result = { ...withSlip(c, eta), engine: { ...c.engine, veCurve: fit.veCurve } };
    if (sizes.size >= 2) fitted.push({ parameter: "blower.volumetricEfficiencyRef", from: eta0, to: eta });
  }
  fitted.unshift({ parameter: "engine.veCurve", from: c.engine.veCurve, to: result.engine.veCurve });

  const residuals: RunResidual[] = [];
  parsed.forEach((run, j) => {
    const before = prepare(c, run.blowerPulleyDiameter);
    const after = prepare(result, run.blowerPulleyDiameter);
    for (const m of run.measured) {
      const b = solveOrNull(before, m.rpm);
      const a = solveOrNull(after, m.rpm);
      residuals.push({
        run: j,
        blowerPulleyDiameter: run.blowerPulleyDiameter,
        rpm: m.rpm,
        measuredBoostGauge: m.boostGauge,
        predictedBefore: b?.boostGauge ?? null,
        predictedAfter: a?.boostGauge ?? null,
        residualBefore: b === null ? null : b.boostGauge - m.boostGauge,
        residualAfter: a === null ? null : a.boostGauge - m.boostGauge,
        measuredManifoldTemperature: m.manifoldTemperature ?? null,
        modelManifoldTemperature: a?.manifoldTemperature ?? null,
      });
    }
  });
  return { combination: result, residuals, fitted };
}
