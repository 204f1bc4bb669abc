// From binned measurements to the model: the prediction for the combination as logged, the
// error per speed bin, the VE fit (calc.calibrateVe) and what a smaller pulley would give with
// the measured engine. Pure: the pages use it live in the browser, the calibrate route on the server.
import {
  calibrateVe,
  combinationSchema,
  pulleySweep,
  trySolvePoint,
  veAt,
  type CalibrationResidual,
  type Combination,
  type CombinationInput,
  type VePoint,
} from "@/calc";
import { binsToMeasured, type LogAmbient, type LogBin } from "@/lib/datalogs/parse";

/** The revision's spec with the ambient of the log (its pulley is the revision's own). */
export function specAsLogged(revisionSpec: CombinationInput, ambient: LogAmbient | null): Combination {
  const c = combinationSchema.parse(revisionSpec);
  return ambient ? { ...c, ambient: { ...c.ambient, pressure: ambient.pressure, temperature: ambient.temperature } } : c;
}

export interface BinComparison {
  rpm: number;
  measured: number;
  predicted: number | null;
  /** Measured minus predicted (Pa). */
  difference: number | null;
  /** Difference as a percentage of the predicted boost; null when the prediction is near zero. */
  percent: number | null;
}

/** Measured against predicted boost (Pa gauge) per usable bin. */
export function compareBins(spec: Combination, bins: readonly LogBin[]): BinComparison[] {
  return bins
    .filter((b) => b.usable)
    .map((b) => {
      const predicted = trySolvePoint(spec, b.rpm)?.boostGauge ?? null;
      const difference = predicted === null ? null : b.boostGauge - predicted;
      const percent = predicted === null || Math.abs(predicted) < 1000 ? null : (100 * (difference as number)) / predicted;
      return { rpm: b.rpm, measured: b.boostGauge, predicted, difference, percent };
    });
}

/** Predicted boost curve (Pa gauge) over a range of engine speeds, for the overlay. */
export function predictedCurve(spec: Combination, fromRpm: number, toRpm: number, steps = 40): { rpm: number; boost: number }[] {
  const out: { rpm: number; boost: number }[] = [];
  const lo = Math.max(100, fromRpm);
  const hi = Math.max(lo + 1, toRpm);
  for (let i = 0; i <= steps; i++) {
    const rpm = lo + ((hi - lo) * i) / steps;
    const point = trySolvePoint(spec, rpm);
    if (point) out.push({ rpm, boost: point.boostGauge });
  }
  return out;
}

export interface VeFit {
  veCurve: VePoint[];
  residuals: CalibrationResidual[];
  /** Per fitted point: the old curve's VE at the same speed. */
  rows: { rpm: number; oldVe: number; fittedVe: number }[];
}

/** At most this many VE points: calc's VE curve schema holds 64. */
export const MAX_VE_POINTS = 64;

/**
 * Fits the VE curve to the usable bins with calc.calibrateVe. The fit uses the model's own charge
 * temperature, not the logged intake temperature: the saved curve is read back by the model with
 * its own temperature, so a VE fitted at the sensor's temperature would miss the very boost it was
 * fitted to (a sensor 20 °F off left 0.27 psi of bias). The logged temperature is kept for the
 * temperature residuals, where a disagreement belongs.
 */
export function fitVe(specLogged: Combination, bins: readonly LogBin[]): VeFit {
  const measured = binsToMeasured(bins);
  if (measured.length === 0) throw new NoUsableBinsError();
  if (measured.length > MAX_VE_POINTS) throw new TooManyBinsError(measured.length);
  const r = calibrateVe(
    specLogged,
    measured.map((m) => ({ rpm: m.rpm, boostGauge: m.boostGauge })),
  );
  const residuals = r.residuals.map((res, i) => withMeasuredTemperature(res, measured[i].manifoldTemperature));
  return { veCurve: r.veCurve, residuals, rows: r.veCurve.map((p) => ({ rpm: p.rpm, oldVe: veAt(specLogged.engine.veCurve, p.rpm), fittedVe: p.ve })) };
}

/** A residual with the logged temperature set beside the model's (both sorted by rpm already). */
export function withMeasuredTemperature(res: CalibrationResidual, measured: number | null): CalibrationResidual {
  return { ...res, measuredManifoldTemperature: measured, temperatureResidual: measured === null ? null : res.modelManifoldTemperature - measured };
}

export class NoUsableBinsError extends Error {
  readonly field = "binWidth";
  constructor() {
    super("No speed bin has enough wide-open-throttle samples to fit. Lower the minimum throttle or boost, or the samples per bin.");
  }
}

export class TooManyBinsError extends Error {
  readonly field = "binWidth";
  constructor(n: number) {
    super(`The log gives ${n} speed bins; a VE curve holds at most ${MAX_VE_POINTS} points. Make the bins wider.`);
  }
}

/**
 * The current spec with the fitted VE curve: the engine as measured, everything else as it is now.
 * Outside the logged speeds the log says nothing, so the stored curve's shape is kept there,
 * scaled to join the fit at its ends (holding the end value flat would, for a log that stops short
 * of redline, predict a boost at redline that nothing measured).
 */
export function withFittedVe(current: CombinationInput, veCurve: readonly VePoint[]): Combination {
  const c = combinationSchema.parse(current);
  const fitted = [...veCurve].sort((a, b) => a.rpm - b.rpm);
  if (fitted.length === 0) return c;
  const first = fitted[0];
  const last = fitted[fitted.length - 1];
  const old = c.engine.veCurve;
  const lowScale = first.ve / veAt(old, first.rpm);
  const highScale = last.ve / veAt(old, last.rpm);
  const below = old.filter((p) => p.rpm < first.rpm).map((p) => ({ rpm: p.rpm, ve: p.ve * lowScale }));
  const above = old.filter((p) => p.rpm > last.rpm).map((p) => ({ rpm: p.rpm, ve: p.ve * highScale }));
  const room = MAX_VE_POINTS - fitted.length;
  // The nearest points on each side. Below, slice from an index: slice(-0) would keep them all.
  const merged = [...below.slice(below.length - Math.floor(room / 2)), ...fitted.map((p) => ({ rpm: p.rpm, ve: p.ve })), ...above.slice(0, Math.max(0, Math.ceil(room / 2)))];
  return { ...c, engine: { ...c.engine, veCurve: merged.map((p) => ({ rpm: p.rpm, ve: Math.min(2, Math.max(0.2, p.ve)) })) } };
}

/** The current blower pulley and the next smaller sizes, in 0.1 in (2.54 mm) steps (m). */
export function smallerPulleys(current: number, count = 3, step = 0.00254): number[] {
  const out = [current];
  for (let i = 1; i <= count; i++) {
    const d = Math.round((current - i * step) * 1e6) / 1e6;
    if (d >= 0.03) out.push(d);
  }
  return out;
}

export interface PulleyComparisonRow {
  diameter: number;
  oldBoost: number | null;
  measuredBoost: number | null;
  blowerRpm: number;
  overspeed: boolean;
  belowBeltMinimum: boolean;
}

/** Boost at `rpm` per pulley with the old VE curve and with the calibrated one. */
export function pulleyComparison(oldSpec: Combination, calibratedSpec: Combination, rpm: number, diameters: readonly number[]): PulleyComparisonRow[] {
  const before = pulleySweep(oldSpec, rpm, diameters);
  const after = pulleySweep(calibratedSpec, rpm, diameters);
  return diameters.map((d, i) => ({
    diameter: d,
    oldBoost: before[i].point?.boostGauge ?? null,
    measuredBoost: after[i].point?.boostGauge ?? null,
    blowerRpm: after[i].blowerRpm,
    overspeed: after[i].overspeed,
    belowBeltMinimum: after[i].belowBeltMinimum,
  }));
}
