// Calibration from runs: how the joint VE curve is made where runs do not overlap, runs that share
// a pulley size, a starting model that finds no balance, and VEs outside the model's range. The
// oracle is calibrateVe (the one-run calibration, tested against Heywood's mass balance in
// calibrate.test.ts) at the fitted slip: calc/README.md states the joint curve as the average, at
// each logged speed, of the runs whose logged span covers it. The engines are invented test cases.
import { describe, expect, it } from "vitest";
import { boostCurve, calibrate, calibrateVe, exampleCombination, veAt, type Combination } from "@/calc";
import { withPulley } from "./support/arbitraries";
import { inputError } from "./support/input-error";

const base = exampleCombination();
const d = base.drive.blowerPulleyDiameter;

const withSlip = (c: Combination, eta: number): Combination => ({ ...c, blower: { ...c.blower, volumetricEfficiencyRef: eta } });
const flatVe = (c: Combination, ve: number): Combination => ({ ...c, engine: { ...c.engine, veCurve: c.engine.veCurve.map((p) => ({ ...p, ve })) } });

/** A run logged at the given speeds (in the order given) from a true combination. */
const logged = (truth: Combination, diameter: number, speeds: number[]) => ({
  blowerPulleyDiameter: diameter,
  measured: boostCurve(withPulley(truth, diameter), speeds).map((p) => ({ rpm: p.rpm, boostGauge: p.boostGauge })),
});

describe("the joint VE curve", () => {
  it("takes a run's own VE where only it was logged, and the average where both were (a run logged high to low)", () => {
    const truth = withSlip(base, 0.72);
    const large = logged(truth, d * 1.1, [4000, 3500, 3000, 2500, 2000]);
    const small = logged(truth, d, [3000, 4000, 5000, 6000]);
    const result = calibrate(base, [large, small]);
    const eta = result.combination.blower.volumetricEfficiencyRef;
    // Each run alone at the fitted slip: the VE it implies at its own speeds.
    const own = (run: typeof large) => calibrateVe(withPulley(withSlip(base, eta), run.blowerPulleyDiameter), run.measured).veCurve;
    const a = own(large);
    const b = own(small);
    const expected = new Map<number, number>([
      [2000, veAt(a, 2000)],
      [2500, veAt(a, 2500)],
      [3000, (veAt(a, 3000) + veAt(b, 3000)) / 2],
      [3500, (veAt(a, 3500) + veAt(b, 3500)) / 2],
      [4000, (veAt(a, 4000) + veAt(b, 4000)) / 2],
      [5000, veAt(b, 5000)],
      [6000, veAt(b, 6000)],
    ]);
    expect(result.combination.engine.veCurve.map((p) => p.rpm)).toEqual([...expected.keys()]);
    for (const p of result.combination.engine.veCurve) expect(p.ve, `${p.rpm} rpm`).toBeCloseTo(expected.get(p.rpm)!, 9);
    // And the fit lands near the truth (the issue's slip target, 0.03).
    expect(Math.abs(eta - 0.72)).toBeLessThan(0.03);
  });

  it("two runs at one pulley size move the VE curve only: the slip cannot be told apart", () => {
    const truth = withSlip(base, 0.72);
    const run = logged(truth, d, [2000, 3000, 4000, 5000]);
    const result = calibrate(base, [run, run]);
    expect(result.fitted.map((f) => f.parameter)).toEqual(["engine.veCurve"]);
    expect(result.combination.blower.volumetricEfficiencyRef).toBe(base.blower.volumetricEfficiencyRef);
    // Two copies of one log: their average is that log's own curve at the catalogue slip.
    const alone = calibrateVe(withPulley(base, d), run.measured).veCurve;
    result.combination.engine.veCurve.forEach((p, i) => {
      expect(p.rpm).toBe(alone[i].rpm);
      expect(p.ve).toBeCloseTo(alone[i].ve, 12);
    });
    expect(result.residuals).toHaveLength(8);
    for (const r of result.residuals) expect(Math.abs(r.residualAfter!)).toBeLessThan(1e-6 * base.ambient.pressure);
  });
  it("runs at one pulley size logged at different speeds keep the catalogue slip exactly", () => {
    // With one size the slip cannot be told from the VE (calc/README.md), so none is fitted, even
    // where the two runs' curves overlap and a slip search could trade one against the other.
    const truth = withSlip(base, 0.72);
    const result = calibrate(base, [logged(truth, d, [2000, 4000]), logged(truth, d, [3000, 5000])]);
    expect(result.combination.blower.volumetricEfficiencyRef).toBe(base.blower.volumetricEfficiencyRef);
    expect(result.fitted.map((f) => f.parameter)).toEqual(["engine.veCurve"]);
  });
});

describe("what the residuals say", () => {
  it("a starting model with no balance at a logged speed shows no prediction there, and the calibrated one meets the log", () => {
    // A throttle body rated at 0.045 m³/s (about 95 cfm) and a starting VE of 2: at 6000 rpm the
    // model's engine would draw so much that the inlet loses over half the ambient pressure.
    const restricted: Combination = { ...base, ambient: { ...base.ambient, inletRestriction: { ratedFlow: 0.045 } } };
    const truth = flatVe(restricted, 0.5);
    const result = calibrate(flatVe(restricted, 2), [logged(truth, 0.08, [2000, 6000]), logged(truth, 0.09, [2000, 6000])]);
    const at6000 = result.residuals.filter((r) => r.rpm === 6000);
    expect(at6000).toHaveLength(2);
    for (const r of at6000) {
      expect(r.predictedBefore).toBeNull();
      expect(r.residualBefore).toBeNull();
      expect(r.predictedAfter).not.toBeNull();
      expect(Math.abs(r.residualAfter!)).toBeLessThan(0.02 * r.measuredBoostGauge);
      expect(r.modelManifoldTemperature).toBeGreaterThan(base.ambient.temperature);
    }
    // Where the starting model balances, its residual is its prediction minus the log.
    const at2000 = result.residuals.filter((r) => r.rpm === 2000);
    expect(at2000).toHaveLength(2);
    for (const r of at2000) {
      expect(r.predictedBefore).not.toBeNull();
      expect(r.residualBefore).toBe(r.predictedBefore! - r.measuredBoostGauge);
      expect(r.residualAfter).toBe(r.predictedAfter! - r.measuredBoostGauge);
      expect(r.measuredManifoldTemperature).toBeNull();
    }
  });
});

describe("VEs outside 0.2–2 are refused, naming the runs", () => {
  // The logs come from an engine three times the size described: at the same boost it swallows
  // three times the air, so the described engine would need a VE near 2.5.
  const bigger: Combination = { ...base, engine: { ...base.engine, displacement: base.engine.displacement * 3 } };

  it("with one run: calibrateVe's field, under the run", () => {
    const e = inputError(() => calibrate(base, [logged(bigger, d, [3000, 4000])]));
    expect(e.issues).toHaveLength(1);
    expect(e.issues[0].field).toBe("runs.0.measured.0.boostGauge");
    expect(e.issues[0].message).toMatch(/^The boost measured at 3000 rpm implies a VE of 2\.\d\d, outside 0\.2–2\./);
  });

  it("with two runs implying a VE below 0.2: the joint curve's speed and value", () => {
    // The logs come from a blower three times the size described on an engine 1.5 times smaller:
    // the delivery scales with the blower (calc/calibrate.test.ts), so the described engine would
    // need about 0.83 / 3 / 1.5 ≈ 0.18 at 3000 rpm (the example's VE there: 0.83, halfway between
    // its 0.80 at 2500 and 0.86 at 3500).
    const truth: Combination = { ...base, blower: { ...base.blower, displacementPerRev: base.blower.displacementPerRev * 3 } };
    const described: Combination = { ...base, engine: { ...base.engine, displacement: base.engine.displacement * 1.5 } };
    const e = inputError(() => calibrate(described, [logged(truth, d, [3000]), logged(truth, d, [4000])]));
    expect(e.issues).toEqual([
      { field: "runs", message: expect.stringMatching(/^The runs imply a VE of 0\.1\d at 3000 rpm, outside 0\.2–2\. Check the blower data, the pulleys and the logs\.$/) },
    ]);
  });

  it("with two runs: the joint curve's speed and value", () => {
    const e = inputError(() => calibrate(base, [logged(bigger, d, [3000]), logged(bigger, d, [4000])]));
    expect(e.issues).toEqual([
      { field: "runs", message: expect.stringMatching(/^The runs imply a VE of 2\.\d\d at 3000 rpm, outside 0\.2–2\. Check the blower data, the pulleys and the logs\.$/) },
    ]);
  });
});
