// Calibrate the engine's VE curve from measured boost (calc/README.md): at a measured pressure
// ratio the blower's delivery is known, so VE follows in closed form, point by point.
import { GAS_CONSTANT } from "./constants";
import { CalcConvergenceError, CalcInputError } from "./errors";
import {
  combinationSchema,
  measuredListSchema,
  parseOrThrow,
  type CombinationInput,
  type MeasuredPoint,
  type VePoint,
} from "./schema";
import { RESTRICTION_TOO_SMALL, blowerStateAtManifold, effectiveVe, newState, prepare, solvePrepared, type PreparedCombination, type TrialState } from "./solve";

/** How well the calibrated curve reproduces one measured point. */
export interface CalibrationResidual {
  /** Engine speed (rev/min). */
  readonly rpm: number;
  /** Measured boost (Pa, gauge). */
  readonly measuredBoostGauge: number;
  /** Boost the model predicts with the calibrated curve (Pa, gauge); null if it finds no balance. */
  readonly predictedBoostGauge: number | null;
  /** Predicted minus measured boost (Pa); null if no balance. */
  readonly boostResidual: number | null;
  /** Manifold temperature the model predicts at the measured boost (K). */
  readonly modelManifoldTemperature: number;
  /** Measured manifold temperature (K), or null. */
  readonly measuredManifoldTemperature: number | null;
  /** Model minus measured manifold temperature (K), or null. */
  readonly temperatureResidual: number | null;
}

/** Calibrated VE curve (one point per measured speed, sorted by rpm) and residuals. */
export interface CalibrationResult {
  /** VE curve referenced to manifold conditions. */
  readonly veCurve: VePoint[];
  /** Residuals per measured point, sorted by rpm. */
  readonly residuals: CalibrationResidual[];
}

/**
 * The VE (fraction) at which the model meets one measured point, in closed form: at the
 * measured boost the blower's delivery is known, and the engine must swallow it. Returns a
 * message instead when the boost is impossible for this blower (state holds the model's state).
 */
export function impliedVe(p: PreparedCombination, m: { rpm: number; boostGauge: number; manifoldTemperature?: number | null }, state: TrialState): number | string {
  const pm = p.p0 + m.boostGauge;
  // pm > 0 is enough: the intercooler's drop is never negative, so the discharge is above it.
  if (!(pm > 0)) return `The boost measured at ${m.rpm} rpm gives a manifold pressure at or below zero`;
  if (blowerStateAtManifold(p, m.rpm, pm, state) === null) {
    return `At the boost measured at ${m.rpm} rpm ${RESTRICTION_TOO_SMALL}`;
  }
  if (!(state.deliveredFlow > 0)) {
    return `The boost measured at ${m.rpm} rpm is beyond what this blower can hold at that speed (dead-head). Check the blower data and pulleys.`;
  }
  // Only below ambient can the charge come out at or below 0 K: the blower then expands the air
  // and gives work back, and a vacuum deep enough for a slow blower takes more heat than it has.
  if (!(state.tm > 0)) {
    return `The vacuum measured at ${m.rpm} rpm is deeper than the model can follow at that speed (its charge would cool below absolute zero). Check the measurement and the ambient pressure.`;
  }
  const tm = m.manifoldTemperature ?? state.tm;
  // ṁ = Pm/(R·Tm)·Vd·(N/120)·VE·(refinements at Pm, Tm): solve for VE.
  return (state.massFlow * GAS_CONSTANT * tm) / (pm * ((p.combination.engine.displacement * m.rpm) / 120) * effectiveVe(p, 1, pm, tm));
}

/** VE curve that reproduces measured boost (Pa gauge) at each measured speed (rev/min), using measured manifold temperature (K) when given. */
export function calibrateVe(combination: CombinationInput, measured: readonly MeasuredPoint[]): CalibrationResult {
  const c = parseOrThrow(combinationSchema, combination);
  const list = parseOrThrow(measuredListSchema, measured, "measured");
  const p = prepare(c);
  const order = list.map((m, index) => ({ m, index })).sort((x, y) => x.m.rpm - y.m.rpm);
  const state = newState();
  const veCurve: VePoint[] = [];
  const modelTm: number[] = [];
  for (const { m, index } of order) {
    const field = `measured.${index}.boostGauge`;
    const implied = impliedVe(p, m, state);
    if (typeof implied === "string") throw new CalcInputError([{ field, message: implied }]);
    if (!(implied >= 0.2 && implied <= 2)) {
      throw new CalcInputError([
        { field, message: `The boost measured at ${m.rpm} rpm implies a VE of ${implied.toFixed(2)}, outside 0.2–2. Check the blower data, the pulleys and the measurement.` },
      ]);
    }
    veCurve.push({ rpm: m.rpm, ve: implied });
    modelTm.push(state.tm);
  }
  const calibrated = prepare({ ...c, engine: { ...c.engine, veCurve } });
  const residuals = order.map(({ m }, i): CalibrationResidual => {
    let predicted: number | null = null;
    try {
      predicted = solvePrepared(calibrated, m.rpm).boostGauge;
    } catch (e) {
      if (!(e instanceof CalcConvergenceError)) throw e;
    }
    const measuredTm = m.manifoldTemperature ?? null;
    return {
      rpm: m.rpm,
      measuredBoostGauge: m.boostGauge,
      predictedBoostGauge: predicted,
      boostResidual: predicted === null ? null : predicted - m.boostGauge,
      modelManifoldTemperature: modelTm[i],
      measuredManifoldTemperature: measuredTm,
      temperatureResidual: measuredTm === null ? null : modelTm[i] - measuredTm,
    };
  });
  return { veCurve, residuals };
}
