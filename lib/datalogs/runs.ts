// Calibration from several logs of one combination (calc.calibrate): each log is a run at the
// blower pulley of the revision it was logged with; logs at the same pulley pool their bins. With
// two or more pulley sizes the blower's slip is fitted as well as the VE curve. Pure: the page
// uses it live in the browser, the calibrate route on the server.
import { calibrate, pulleySweep, type CalibrationRun, type Combination, type FittedParameter, type RunResidual } from "@/calc";
import { withFittedVe } from "@/lib/datalogs/analysis";
import { binsToMeasured, type LogBin } from "@/lib/datalogs/parse";

export type LogRun = { id: string; name: string; blowerPulleyDiameter: number; bins: readonly LogBin[] };

/**
 * One run per pulley size, its points the usable bins of every log at that size (a speed logged
 * twice is averaged). Boost only: the fit reads the charge temperature from the model, as fitVe does,
 * so the saved revision gives back the boost it was fitted to.
 */
export function runsFromLogs(logs: readonly LogRun[]): CalibrationRun[] {
  const bySize = new Map<number, Map<number, number[]>>();
  for (const log of logs) {
    const speeds = bySize.get(log.blowerPulleyDiameter) ?? new Map<number, number[]>();
    for (const m of binsToMeasured(log.bins)) speeds.set(m.rpm, [...(speeds.get(m.rpm) ?? []), m.boostGauge]);
    bySize.set(log.blowerPulleyDiameter, speeds);
  }
  return [...bySize.entries()]
    .filter(([, speeds]) => speeds.size > 0)
    .map(([d, speeds]) => ({
      blowerPulleyDiameter: d,
      measured: [...speeds.entries()].sort((a, b) => a[0] - b[0]).map(([rpm, boosts]) => ({ rpm, boostGauge: boosts.reduce((s, b) => s + b, 0) / boosts.length })),
    }));
}

export type RunsFit = {
  runs: CalibrationRun[];
  residuals: RunResidual[];
  fitted: FittedParameter[];
  /** The current spec with the fitted slip and VE (the stored shape kept outside the logged speeds, as withFittedVe). */
  calibrated: Combination;
};

/** Fits the current combination to the chosen logs; throws calc's CalcInputError naming the run and point. */
export function fitRuns(current: Combination, logs: readonly LogRun[]): RunsFit {
  const runs = runsFromLogs(logs);
  if (runs.length === 0) throw new Error("None of the chosen logs has a usable speed bin. Loosen the cleaning or choose other logs.");
  const r = calibrate(current, runs);
  const ve = r.fitted.find((f) => f.parameter === "engine.veCurve");
  const slip = r.fitted.find((f) => f.parameter === "blower.volumetricEfficiencyRef");
  const withSlip: Combination = slip ? { ...current, blower: { ...current.blower, volumetricEfficiencyRef: slip.to } } : current;
  const calibrated = ve ? withFittedVe(withSlip, ve.to) : withSlip;
  return { runs, residuals: r.residuals, fitted: r.fitted, calibrated };
}

export type NextPulley = { diameter: number; before: number | null; after: number | null; withinRange: boolean };

/** Boost at `rpm` on the next smaller pulley (0.1 in, 2.54 mm, below the smallest logged), before and after the fit. */
export function predictNextPulley(current: Combination, calibrated: Combination, runs: readonly CalibrationRun[], rpm: number): NextPulley {
  const smallest = Math.min(...runs.map((r) => r.blowerPulleyDiameter));
  const diameter = Math.round((smallest - 0.00254) * 1e6) / 1e6;
  const [before] = pulleySweep(current, rpm, [diameter]);
  const [after] = pulleySweep(calibrated, rpm, [diameter]);
  return { diameter, before: before.point?.boostGauge ?? null, after: after.point?.boostGauge ?? null, withinRange: after.withinRange };
}
