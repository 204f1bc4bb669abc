// lib/datalogs/analysis.ts piece by piece: each output checked whole, each branch and boundary
// taken. Predicted boosts come from calc's solvePoint (the model is the reference these functions
// wire up, not what they compute); every other figure is derived by hand in its comment.
import { describe, expect, it } from "vitest";
import { combinationSchema, exampleCombination, solvePoint, type CalibrationResidual, type Combination } from "@/calc";
import {
  compareBins,
  fitVe,
  MAX_VE_POINTS,
  NoUsableBinsError,
  predictedCurve,
  pulleyComparison,
  smallerPulleys,
  specAsLogged,
  TooManyBinsError,
  withFittedVe,
  withMeasuredTemperature,
} from "@/lib/datalogs/analysis";
import type { LogBin } from "@/lib/datalogs/parse";

const spec = exampleCombination();
// exampleCombination's VE curve (calc/defaults.ts): 1500 0.72, 2500 0.8, 3500 0.86, 4500 0.88, 5500 0.85, 6500 0.78.

/** With the plain density (exponent 1) and a 30 mm pulley the model finds no balance from about 1000 rpm up (tests/calc/range.test.ts). */
const noBalance = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, chargeTemperatureExponent: 1 }, drive: { ...c.drive, blowerPulleyDiameter: 0.03 } });

const bin = (rpm: number, boostGauge: number, extra: Partial<LogBin> = {}): LogBin => ({
  from: rpm - 125,
  to: rpm + 125,
  rpm,
  kept: 10,
  outliers: 0,
  boostGauge,
  intakeTemperature: null,
  usable: true,
  ...extra,
});

describe("specAsLogged", () => {
  it("without a logged ambient is the revision's spec as parsed", () => {
    expect(specAsLogged(spec, null)).toEqual(combinationSchema.parse(spec));
  });

  it("with one takes its barometer and air temperature and keeps the rest (the inlet loss too)", () => {
    const out = specAsLogged(spec, { pressure: 95_000, temperature: 280 });
    expect(out).toEqual({ ...combinationSchema.parse(spec), ambient: { ...spec.ambient, pressure: 95_000, temperature: 280 } });
    expect(out.ambient.inletLoss).toBe(1500);
  });
});

describe("compareBins", () => {
  it("compares usable bins only, with the difference and the percentage of the prediction", () => {
    const p3000 = solvePoint(spec, 3000).boostGauge;
    const p5000 = solvePoint(spec, 5000).boostGauge;
    const rows = compareBins(spec, [bin(3000, 1.1 * p3000), bin(4000, 50_000, { usable: false }), bin(5000, 0.9 * p5000)]);
    expect(rows.map((r) => r.rpm)).toEqual([3000, 5000]);
    expect(rows[0]).toMatchObject({ rpm: 3000, measured: 1.1 * p3000, predicted: p3000 });
    // measured 110 % of the prediction: +10 %, difference a tenth of it (hand arithmetic)
    expect(rows[0].difference).toBeCloseTo(0.1 * p3000, 6);
    expect(rows[0].percent).toBeCloseTo(10, 9);
    // 90 %: −10 %
    expect(rows[1].difference).toBeCloseTo(-0.1 * p5000, 6);
    expect(rows[1].percent).toBeCloseTo(-10, 9);
  });

  it("leaves the percentage out when the prediction is within 1000 Pa of zero, either side", () => {
    // At 300 rpm the example predicts about −11 Pa, at 200 rpm about −830 Pa, at 100 rpm about −1330 Pa.
    const p300 = solvePoint(spec, 300).boostGauge;
    const p200 = solvePoint(spec, 200).boostGauge;
    const p100 = solvePoint(spec, 100).boostGauge;
    expect(Math.abs(p300)).toBeLessThan(1000);
    expect(p200).toBeLessThan(-500);
    expect(p200).toBeGreaterThan(-1000);
    expect(p100).toBeLessThan(-1000);
    const rows = compareBins(spec, [bin(100, 1.1 * p100), bin(200, p200 + 500), bin(300, 400)]);
    expect(rows[0].percent).toBeCloseTo(10, 9); // a negative prediction past 1000 Pa still gets one
    expect(rows[1]).toEqual({ rpm: 200, measured: p200 + 500, predicted: p200, difference: expect.closeTo(500, 6), percent: null });
    expect(rows[2]).toEqual({ rpm: 300, measured: 400, predicted: p300, difference: 400 - p300, percent: null });
  });

  it("a speed with no balance has no prediction, difference or percentage", () => {
    expect(compareBins(noBalance(spec), [bin(5000, 80_000)])).toEqual([{ rpm: 5000, measured: 80_000, predicted: null, difference: null, percent: null }]);
  });

  it("no bins, no rows", () => {
    expect(compareBins(spec, [])).toEqual([]);
  });
});

describe("predictedCurve", () => {
  it("steps evenly from the lower to the upper speed, both ends included", () => {
    const out = predictedCurve(spec, 2000, 4000, 4);
    expect(out.map((p) => p.rpm)).toEqual([2000, 2500, 3000, 3500, 4000]);
    for (const p of out) expect(p.boost).toBe(solvePoint(spec, p.rpm).boostGauge);
  });

  it("takes 40 steps by default", () => {
    const out = predictedCurve(spec, 1000, 5000);
    expect(out).toHaveLength(41);
    expect(out[1].rpm).toBe(1100); // (5000 − 1000) / 40
    expect(out[40].rpm).toBe(5000);
  });

  it("starts no lower than 100 rpm and spans at least 1 rpm", () => {
    // from 50 → 100 (author's floor); to 50 is below it → 101
    expect(predictedCurve(spec, 50, 50, 2).map((p) => p.rpm)).toEqual([100, 100.5, 101]);
    // from exactly 100 stays 100; to exactly 101 stays 101
    expect(predictedCurve(spec, 100, 101, 1).map((p) => p.rpm)).toEqual([100, 101]);
    expect(predictedCurve(spec, 150, 152, 2).map((p) => p.rpm)).toEqual([150, 151, 152]);
  });

  it("leaves out the speeds with no balance", () => {
    const c = noBalance(spec);
    expect(predictedCurve(c, 100, 1900, 2)).toEqual([{ rpm: 100, boost: solvePoint(c, 100).boostGauge }]);
  });
});

describe("fitVe", () => {
  const rpms = (n: number) => Array.from({ length: n }, (_, i) => 2000 + 50 * i);

  it("refuses a log with no usable bin, naming the bin width field", () => {
    const bins = [bin(3000, 50_000, { usable: false }), bin(3500, 60_000, { usable: false })];
    expect(() => fitVe(spec, bins)).toThrow(NoUsableBinsError);
    const e = new NoUsableBinsError();
    expect(e.field).toBe("binWidth");
    expect(e.message).toBe("No speed bin has enough wide-open-throttle samples to fit. Lower the minimum throttle or boost, or the samples per bin.");
    expect(() => fitVe(spec, [])).toThrow(e.message);
  });

  it("takes 64 bins and refuses 65, with the count in the message", () => {
    const at = (n: number) => rpms(n).map((r) => bin(r, solvePoint(spec, r).boostGauge));
    expect(fitVe(spec, at(MAX_VE_POINTS)).veCurve).toHaveLength(64);
    let caught: unknown;
    try {
      fitVe(spec, at(65));
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(TooManyBinsError);
    expect((caught as TooManyBinsError).field).toBe("binWidth");
    expect((caught as TooManyBinsError).message).toBe("The log gives 65 speed bins; a VE curve holds at most 64 points. Make the bins wider.");
  });

  it("a log made by the model gives its own VE back, with old and fitted VE per row and the logged temperature beside the model's", () => {
    const speeds = [2500, 3000, 4000];
    const bins = [
      bin(2500, solvePoint(spec, 2500).boostGauge, { intakeTemperature: 310 }),
      bin(3000, solvePoint(spec, 3000).boostGauge),
      bin(3500, 1, { usable: false }),
      bin(4000, solvePoint(spec, 4000).boostGauge, { intakeTemperature: 330 }),
    ];
    const fit = fitVe(spec, bins);
    // VE by linear interpolation of the example's curve: 2500 0.8, 3000 0.83, 4000 0.87
    const ve = [0.8, 0.83, 0.87];
    expect(fit.veCurve.map((p) => p.rpm)).toEqual(speeds);
    fit.veCurve.forEach((p, i) => expect(p.ve).toBeCloseTo(ve[i], 6));
    expect(fit.rows.map((r) => r.rpm)).toEqual(speeds);
    fit.rows.forEach((r, i) => {
      expect(r.oldVe).toBeCloseTo(ve[i], 12);
      expect(r.fittedVe).toBe(fit.veCurve[i].ve);
    });
    expect(fit.residuals.map((r) => r.measuredManifoldTemperature)).toEqual([310, null, 330]);
    expect(fit.residuals[0].temperatureResidual).toBeCloseTo(fit.residuals[0].modelManifoldTemperature - 310, 9);
    expect(fit.residuals[1].temperatureResidual).toBeNull();
    expect(fit.residuals[2].temperatureResidual).toBeCloseTo(fit.residuals[2].modelManifoldTemperature - 330, 9);
  });
});

describe("withMeasuredTemperature", () => {
  const res: CalibrationResidual = {
    rpm: 3000,
    measuredBoostGauge: 40_000,
    predictedBoostGauge: 40_010,
    boostResidual: 10,
    modelManifoldTemperature: 325,
    measuredManifoldTemperature: null,
    temperatureResidual: null,
  };
  it("sets the logged temperature and model minus logged", () => {
    expect(withMeasuredTemperature(res, 315)).toEqual({ ...res, measuredManifoldTemperature: 315, temperatureResidual: 10 });
    expect(withMeasuredTemperature(res, 335)).toEqual({ ...res, measuredManifoldTemperature: 335, temperatureResidual: -10 });
  });
  it("without one both stay null", () => {
    expect(withMeasuredTemperature({ ...res, measuredManifoldTemperature: 1, temperatureResidual: 1 }, null)).toEqual({ ...res, measuredManifoldTemperature: null, temperatureResidual: null });
  });
});

describe("withFittedVe", () => {
  const curve = (c: Combination) => c.engine.veCurve.map((p) => [p.rpm, p.ve]);

  it("no fitted points: the current spec as parsed", () => {
    expect(withFittedVe(spec, [])).toEqual(combinationSchema.parse(spec));
  });

  it("sorts the fit and scales the stored curve outside it to join at each end, the rest of the spec kept", () => {
    // Fit at 2500 (1.0 = 1.25 × 0.8) and 4500 (0.66 = 0.75 × 0.88), given out of order.
    const out = withFittedVe(spec, [
      { rpm: 4500, ve: 0.66 },
      { rpm: 2500, ve: 1.0 },
      { rpm: 3500, ve: 1.1 },
    ]);
    expect(out).toEqual({ ...combinationSchema.parse(spec), engine: { ...spec.engine, veCurve: expect.any(Array) } });
    expect(out.engine.veCurve.map((p) => p.rpm)).toEqual([1500, 2500, 3500, 4500, 5500, 6500]);
    // below: 0.72 × 1.25 = 0.9; above: 0.85 × 0.75 = 0.6375, 0.78 × 0.75 = 0.585 (hand arithmetic)
    const ve = [0.9, 1.0, 1.1, 0.66, 0.6375, 0.585];
    out.engine.veCurve.forEach((p, i) => expect(p.ve).toBeCloseTo(ve[i], 12));
  });

  it("holds each point within 0.2–2", () => {
    // One point at 3500, where the stored VE is 0.86: 2.15 scales by 2.5, 0.215 by 0.25.
    const high = withFittedVe(spec, [{ rpm: 3500, ve: 2.15 }]);
    // 0.72×2.5 = 1.8, 0.8×2.5 = 2.0, 2.15 → 2, 2.2 → 2, 2.125 → 2, 0.78×2.5 = 1.95
    expect(curve(high).map(([r, v]) => [r, Number(v.toFixed(9))])).toEqual([[1500, 1.8], [2500, 2], [3500, 2], [4500, 2], [5500, 2], [6500, 1.95]]);
    const low = withFittedVe(spec, [{ rpm: 3500, ve: 0.215 }]);
    // 0.18 → 0.2, 0.2, 0.215, 0.22, 0.2125, 0.195 → 0.2
    expect(curve(low).map(([r, v]) => [r, Number(v.toFixed(9))])).toEqual([[1500, 0.2], [2500, 0.2], [3500, 0.215], [4500, 0.22], [5500, 0.2125], [6500, 0.2]]);
  });

  // A bug found here: with room for fewer than two, slice(-0) kept every stored point below the fit
  // (66 points for 63 fitted), which calc's 64-point VE schema refuses.
  it("keeps the whole curve within 64 points, sharing the room left between the ends", () => {
    // The stored curve has 1500 and 2500 below a fit from 3000 up, 6500 above a fit up to 6000.
    const fitOf = (n: number, step: number) => Array.from({ length: n }, (_, i) => ({ rpm: 3000 + step * i, ve: 0.85 }));
    // 62 fitted (3000…6050 by 50): room 2, one below (2500, the nearer) and one above (6500)
    const two = withFittedVe(spec, fitOf(62, 50));
    expect(two.engine.veCurve).toHaveLength(64);
    expect(two.engine.veCurve[0].rpm).toBe(2500);
    expect(two.engine.veCurve[63].rpm).toBe(6500);
    // 63 fitted: room 1, the odd point goes above
    const one = withFittedVe(spec, fitOf(63, 50));
    expect(one.engine.veCurve).toHaveLength(64);
    expect(one.engine.veCurve[0].rpm).toBe(3000);
    expect(one.engine.veCurve[63].rpm).toBe(6500);
    // 64 fitted: no room, nothing from the stored curve
    const none = withFittedVe(spec, fitOf(64, 50));
    expect(none.engine.veCurve.map((p) => p.rpm)).toEqual(fitOf(64, 50).map((p) => p.rpm));
    expect(combinationSchema.safeParse(none).success).toBe(true);
    // more than 64 fitted (66, 3000…4300 by 20; a caller past fitVe's check): none either side
    expect(withFittedVe(spec, fitOf(66, 20)).engine.veCurve.map((p) => p.rpm)).toEqual(fitOf(66, 20).map((p) => p.rpm));
    // 4 fitted (3000…4500 by 500, the last on a stored point): room 60, all stored points outside kept
    const few = withFittedVe(spec, fitOf(4, 500));
    expect(few.engine.veCurve.map((p) => p.rpm)).toEqual([1500, 2500, 3000, 3500, 4000, 4500, 5500, 6500]);
  });
});

describe("smallerPulleys", () => {
  it("the current size and three sizes 0.1 in (2.54 mm) smaller, rounded to the micrometre", () => {
    // 80 mm − 2.54, − 5.08, − 7.62 mm (hand arithmetic)
    expect(smallerPulleys(0.08)).toEqual([0.08, 0.07746, 0.07492, 0.07238]);
  });

  it("takes the count and step given", () => {
    expect(smallerPulleys(0.05, 1, 0.005)).toEqual([0.05, 0.045]);
    expect(smallerPulleys(0.05, 0)).toEqual([0.05]);
  });

  it("stops at 30 mm: a size of exactly 30 mm is kept, a smaller one is not", () => {
    expect(smallerPulleys(0.03254)).toEqual([0.03254, 0.03]);
    expect(smallerPulleys(0.03253)).toEqual([0.03253]);
  });
});

describe("pulleyComparison", () => {
  it("the boost with the old and the calibrated engine per size, with the calibrated side's blower speed and flags", () => {
    const calibrated = withFittedVe(spec, [{ rpm: 3500, ve: 0.9 }]);
    const rows = pulleyComparison(spec, calibrated, 5000, [0.08, 0.05]);
    const at = (c: Combination, d: number) => solvePoint({ ...c, drive: { ...c.drive, blowerPulleyDiameter: d } }, 5000);
    expect(rows).toEqual([
      { diameter: 0.08, oldBoost: at(spec, 0.08).boostGauge, measuredBoost: at(calibrated, 0.08).boostGauge, blowerRpm: at(calibrated, 0.08).blowerRpm, overspeed: false, belowBeltMinimum: false },
      { diameter: 0.05, oldBoost: at(spec, 0.05).boostGauge, measuredBoost: at(calibrated, 0.05).boostGauge, blowerRpm: at(calibrated, 0.05).blowerRpm, overspeed: true, belowBeltMinimum: true },
    ]);
    // the calibrated engine breathes better (VE 0.9 / 0.86 scaled), so it makes less boost on the same pulley
    expect(rows[0].measuredBoost!).toBeLessThan(rows[0].oldBoost!);
  });

  it("a size with no balance on either side is null on that side only", () => {
    const plain = { ...spec, engine: { ...spec.engine, chargeTemperatureExponent: 1 } };
    const a = pulleyComparison(plain, spec, 5000, [0.03]);
    expect(a[0].oldBoost).toBeNull();
    expect(a[0].measuredBoost).toBe(solvePoint({ ...spec, drive: { ...spec.drive, blowerPulleyDiameter: 0.03 } }, 5000).boostGauge);
    const b = pulleyComparison(spec, plain, 5000, [0.03]);
    expect(b[0].oldBoost).toBe(a[0].measuredBoost);
    expect(b[0].measuredBoost).toBeNull();
  });
});
