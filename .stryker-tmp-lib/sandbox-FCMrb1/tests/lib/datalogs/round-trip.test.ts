// @ts-nocheck
// A log made by calc from a known VE curve is parsed, cleaned, binned and fitted with
// calibrateVe; the fit must give that VE back. The known curves are invented test data.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { combinationSchema, exampleCombination, paToPsi, solvePoint, veAt, type VePoint } from "@/calc";
import { cleanLog, guessLayout, parseLog } from "@/lib/datalogs/parse";
import { guessMapping } from "@/lib/datalogs/guess-mapping";
import { compareBins, fitVe, pulleyComparison, smallerPulleys, specAsLogged, withFittedVe } from "@/lib/datalogs/analysis";
import { DEMO_DATALOG_MAPPING, DEMO_DATALOGS, demoDatalogCsv, demoTrueVeCurve, demoTruth, synthesizeLogCsv } from "@/db/seed/datalogs";
import { bigInchTwinScrew } from "@/lib/combinations/demo-specs";

const spec = combinationSchema.parse(bigInchTwinScrew);
const trueVe: VePoint[] = [
  { rpm: 1500, ve: 0.74 },
  { rpm: 3000, ve: 0.86 },
  { rpm: 4500, ve: 1.0 },
  { rpm: 6500, ve: 0.9 },
];

function fitFrom(text: string) {
  const mapping = guessMapping(guessLayout(text), text);
  const parsed = parseLog(text, mapping, spec.ambient.pressure);
  expect(parsed.errors).toEqual([]);
  const cleaned = cleanLog(parsed.points, spec.ambient.pressure, { binWidth: 250, minThrottle: 90 });
  return { cleaned, fit: fitVe(specAsLogged(spec, null), cleaned.bins) };
}

/** Largest relative VE error of the fit against the true curve, at the fitted speeds. */
const worst = (fit: { veCurve: VePoint[] }, truth: VePoint[]) => Math.max(...fit.veCurve.map((p) => Math.abs(p.ve / veAt(truth, p.rpm) - 1)));

describe("calibration round trip", () => {
  it("recovers a known VE curve within 0.5 % from a noiseless log", () => {
    const text = synthesizeLogCsv(spec, { trueVeCurve: trueVe, noisePsi: 0, pressureDigits: 4, intakeTemperature: false });
    const { cleaned, fit } = fitFrom(text);
    expect(cleaned.bins.filter((b) => b.usable).length).toBe(16); // 2000–6000 rpm in 250 rpm bins; the lone 6000 rpm sample is too few to count
    // tolerance: binning pairs the mean boost with the mean speed of ~25 samples; the boost curve is
    // nearly straight within 250 rpm, so the error is well under 0.5 %.
    expect(worst(fit, trueVe)).toBeLessThan(0.005);
    // and the fitted curve reproduces the measured boost (calc's residuals) within 0.01 psi
    for (const r of fit.residuals) expect(Math.abs(r.boostResidual!)).toBeLessThan(70);
  });

  it("recovers it within 2 % with noise (σ 0.2 psi, 1.5 °F) and a measured intake temperature", () => {
    const text = synthesizeLogCsv(spec, { trueVeCurve: trueVe, noisePsi: 0.2, noiseF: 1.5, seed: 99, partThrottleRows: 10, outlierRows: [40, 200] });
    const { cleaned, fit } = fitFrom(text);
    expect(cleaned.counts.partThrottle).toBe(10);
    expect(cleaned.counts.outliers).toBeGreaterThanOrEqual(2);
    expect(worst(fit, trueVe)).toBeLessThan(0.02);
  });

  it("the stored VE is visibly off before the fit, and the prediction error shrinks after it", () => {
    const text = synthesizeLogCsv(spec, { trueVeCurve: trueVe, noisePsi: 0, pressureDigits: 4 });
    const { cleaned, fit } = fitFrom(text);
    const before = compareBins(spec, cleaned.bins);
    const after = compareBins(withFittedVe(spec, fit.veCurve), cleaned.bins);
    const rms = (xs: { difference: number | null }[]) => Math.sqrt(xs.reduce((s, x) => s + x.difference! ** 2, 0) / xs.length);
    // > 0.29 psi off with the stored curve (an author's bound; with the charge-temperature
    // refinement of calc/ a VE error shows as less boost error than before, about 0.37 psi here).
    expect(rms(before)).toBeGreaterThan(2000);
    expect(rms(after)).toBeLessThan(rms(before) / 10);
  });

  it("a smaller pulley gives more boost with either engine (common practice, no published source)", () => {
    const text = synthesizeLogCsv(spec, { trueVeCurve: trueVe, noisePsi: 0, pressureDigits: 4 });
    const { fit } = fitFrom(text);
    const rows = pulleyComparison(spec, withFittedVe(spec, fit.veCurve), 5000, smallerPulleys(spec.drive.blowerPulleyDiameter));
    expect(rows).toHaveLength(4);
    for (let i = 1; i < rows.length; i++) {
      expect(rows[i].diameter).toBeLessThan(rows[i - 1].diameter);
      expect(rows[i].oldBoost!).toBeGreaterThan(rows[i - 1].oldBoost!);
      expect(rows[i].measuredBoost!).toBeGreaterThan(rows[i - 1].measuredBoost!);
    }
    // At 5000 rpm the true engine breathes better than the stored one (VE 0.983 vs ~0.97), so
    // with the measured engine the same pulley gives less boost (design.md trade fact).
    expect(rows[0].measuredBoost!).toBeLessThan(rows[0].oldBoost!);
  });
});

describe("the demo log", () => {
  it("public/samples/demo-datalog.csv fitted alone: the VE takes up the blower's extra slip", () => {
    // Not compared byte for byte with demoDatalogCsv(): a refinement of calc/ may move its figures a
    // little. Regenerate it with `npx tsx scripts/write-demo-datalog.ts` after such a change.
    const file = fs.readFileSync(path.join(import.meta.dirname, "../../../public/samples/demo-datalog.csv"), "utf8");
    expect(file.split("\n")[0]).toBe(demoDatalogCsv().split("\n")[0]);
    const mapping = guessMapping(guessLayout(file), file);
    expect(mapping).toMatchObject(DEMO_DATALOG_MAPPING);
    const truck = combinationSchema.parse(DEMO_DATALOGS[0].spec);
    const parsed = parseLog(file, mapping, truck.ambient.pressure);
    const cleaned = cleanLog(parsed.points, truck.ambient.pressure, { binWidth: 250, minThrottle: 90 });
    expect(cleaned.counts).toMatchObject({ partThrottle: 8 });
    expect(cleaned.counts.outliers).toBeGreaterThanOrEqual(2);
    const fit = fitVe(specAsLogged(truck, null), cleaned.bins);
    // One pulley cannot tell slip from breathing: the fitted VE reproduces the logged boost at this
    // pulley (within 0.3 psi of the stated truth, an author's bound for σ 0.15 psi noise) ...
    const fitted = withFittedVe(truck, fit.veCurve);
    const truth = demoTruth(truck.drive.blowerPulleyDiameter);
    for (const rpm of [2500, 3500, 4500]) expect(Math.abs(paToPsi(solvePoint(fitted, rpm).boostGauge - solvePoint(truth, rpm).boostGauge))).toBeLessThan(0.3);
    // ... but lies well below the true VE, since it also carries the blower's extra slip; the
    // second log at another pulley separates them (tests/lib/datalogs/demo-logs.test.ts).
    expect(worst(fit, demoTrueVeCurve())).toBeGreaterThan(0.05);
  });
});

describe("the fitted engine beyond the logged speeds", () => {
  it("keeps the stored curve's shape past the log, joined to the fit at its ends", () => {
    const spec = exampleCombination();
    const redline = spec.engine.redlineRpm;
    // A fit that covers only the middle of the range, 5 % above the stored curve.
    const fit = [3000, 3500, 4000].map((rpm) => ({ rpm, ve: veAt(spec.engine.veCurve, rpm) * 1.05 }));
    const out = withFittedVe(spec, fit);
    // Inside the log: the fit itself.
    for (const p of fit) expect(veAt(out.engine.veCurve, p.rpm)).toBeCloseTo(p.ve, 12);
    // Past it: the stored shape scaled by the same 5 % at the joining end (not held flat).
    expect(veAt(out.engine.veCurve, redline)).toBeCloseTo(veAt(spec.engine.veCurve, redline) * 1.05, 9);
  });
});
