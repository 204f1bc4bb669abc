// The classroom's "what if" and its curves without a database: the adjustment applied to every
// item, the engine-speed grid, the deltas' speeds, and that each curve is calc's own boost curve.
import { describe, expect, it } from "vitest";
import { CalcConvergenceError, boostCurve, combinationSchema, exampleCombination, exampleTwinScrewCombination, type Combination } from "@/calc";
import { bigInchTwinScrew } from "@/lib/combinations/demo-specs";
import { SERIES_LABEL, SERIES_METRIC, VE_SCALE_MAX, VE_SCALE_MIN, applyWhatIf, deltaSpeeds, pointAt, rpmGrid, stepCurves } from "@/lib/lessons/curves";
import { LESSON_SERIES, type StepItemSnapshot } from "@/lib/lessons/rules";

const withRedline = (c: Combination, redlineRpm: number): Combination => ({ ...c, engine: { ...c.engine, redlineRpm } });
const item = (label: string, spec: Combination): StepItemSnapshot => ({ combinationId: "00000000-0000-4000-8000-000000000001", revision: 1, label, name: label, spec });

describe("the what-if", () => {
  it("none returns the spec itself; a pulley changes only the blower pulley", () => {
    const c = exampleCombination();
    expect(applyWhatIf(c, { kind: "none" })).toBe(c);
    const p = applyWhatIf(c, { kind: "pulley", diameter: 0.07 });
    expect(p).toEqual({ ...c, drive: { ...c.drive, blowerPulleyDiameter: 0.07 } });
    expect(c.drive.blowerPulleyDiameter).toBe(0.08);
  });

  it("a VE scale multiplies every point and clamps to calc's accepted 0.2–2", () => {
    const c = exampleCombination();
    const up = applyWhatIf(c, { kind: "ve", scale: 1.1 });
    expect(up.engine.veCurve.map((p) => p.rpm)).toEqual(c.engine.veCurve.map((p) => p.rpm));
    up.engine.veCurve.forEach((p, i) => expect(p.ve).toBeCloseTo(c.engine.veCurve[i].ve * 1.1, 12));
    expect(up.blower).toBe(c.blower);
    expect(applyWhatIf(c, { kind: "ve", scale: 10 }).engine.veCurve.every((p) => p.ve === 2)).toBe(true);
    expect(applyWhatIf(c, { kind: "ve", scale: 0.01 }).engine.veCurve.every((p) => p.ve === 0.2)).toBe(true);
    expect([VE_SCALE_MIN, VE_SCALE_MAX]).toEqual([0.8, 1.2]);
  });
});

describe("speeds", () => {
  it("the grid runs every 250 rpm from 1500 to the highest redline, which is always last", () => {
    expect(rpmGrid([withRedline(exampleCombination(), 2000)])).toEqual([1500, 1750, 2000]);
    expect(rpmGrid([withRedline(exampleCombination(), 2100), withRedline(exampleCombination(), 1900)])).toEqual([1500, 1750, 2000, 2100]);
  });

  it("the deltas are read mid-range and 250 rpm or more below the lowest redline, on 500 rpm steps", () => {
    expect(deltaSpeeds([withRedline(exampleCombination(), 6500), withRedline(exampleCombination(), 6000)])).toEqual([3000, 5500]);
    expect(deltaSpeeds([withRedline(exampleCombination(), 6300)])).toEqual([3000, 6000]);
    // Low redlines: never below 2000 at the top and 1500 mid (worked by hand from the rule above).
    expect(deltaSpeeds([withRedline(exampleCombination(), 2200)])).toEqual([1500, 2000]);
    expect(deltaSpeeds([withRedline(exampleCombination(), 3750)])).toEqual([2000, 3500]);
  });

  it("pointAt finds the grid point within 1e-6 rpm, or null", () => {
    const pts = boostCurve(exampleCombination(), [2000, 3000]);
    expect(pointAt(pts, 3000)).toBe(pts[1]);
    expect(pointAt(pts, 3000 + 5e-7)).toBe(pts[1]);
    expect(pointAt(pts, 3000.001)).toBeNull();
    // The bound itself is outside: a point at 0 rpm and a speed of exactly 1e-6 rpm (1e-6 − 0 is exact in binary floating point).
    const zero = [{ ...pts[0], rpm: 0 }];
    expect(pointAt(zero, 1e-6)).toBeNull();
    expect(pointAt(zero, 5e-7)).toBe(zero[0]);
  });

  it("the deltas always hold two speeds, the middle one below the top", () => {
    // Worked by hand: top = max(2000, ⌊(redline − 250)/500⌋·500), middle = max(1500, top/2 to 500, halves up as Math.round does).
    for (const [redline, speeds] of [[1000, [1500, 2000]], [2749, [1500, 2000]], [2750, [1500, 2500]], [4750, [2500, 4500]], [20000, [10000, 19500]]] as const) {
      expect(deltaSpeeds([withRedline(exampleCombination(), redline)]), String(redline)).toEqual(speeds);
    }
  });
});

describe("stepCurves", () => {
  it("each item's curve is calc's boost curve on the shared grid, stopping at its own redline", () => {
    const a = withRedline(exampleCombination(), 2400);
    const b = withRedline(exampleTwinScrewCombination(), 2000);
    const [ca, cb] = stepCurves([item("A", a), item("B", b)], { kind: "none" });
    expect(ca.error).toBeNull();
    expect(ca.points.map((p) => p.rpm)).toEqual([1500, 1750, 2000, 2250, 2400]);
    expect(cb.points.map((p) => p.rpm)).toEqual([1500, 1750, 2000]);
    expect(ca.points).toEqual(boostCurve(a, [1500, 1750, 2000, 2250, 2400]));
    expect([ca.label, cb.label]).toEqual(["A", "B"]);
  });

  it("the what-if applies to every item; an item the model refuses reports the schema's message", () => {
    const a = withRedline(exampleCombination(), 2000);
    const [smaller] = stepCurves([item("A", a)], { kind: "pulley", diameter: 0.07 });
    expect(smaller.spec.drive.blowerPulleyDiameter).toBe(0.07);
    expect(smaller.points[0].boostGauge).toBeGreaterThan(stepCurves([item("A", a)], { kind: "none" })[0].points[0].boostGauge);
    const [bad] = stepCurves([item("bad", a)], { kind: "pulley", diameter: -1 });
    expect(bad.points).toEqual([]);
    expect(bad.error).toMatch(/pulley/i);
  });

  it("a curve the blower cannot feed says why in the viewer's units", () => {
    // A 7.4 L under a 0.3 L/rev blower on a 0.5 m pulley: too slow to feed the engine.
    const base = combinationSchema.parse(bigInchTwinScrew);
    const slow: Combination = { ...base, blower: { ...base.blower, displacementPerRev: 0.0003 }, drive: { ...base.drive, blowerPulleyDiameter: 0.5 } };
    let floor = NaN;
    try {
      boostCurve(slow, rpmGrid([slow]));
    } catch (e) {
      if (e instanceof CalcConvergenceError && e.reason === "blower-too-slow") floor = e.values.floorPressure;
    }
    expect(floor).toBeGreaterThan(0);
    const [imperial] = stepCurves([item("Slow", slow)], { kind: "none" }, "imperial");
    const [metric] = stepCurves([item("Slow", slow)], { kind: "none" }, "metric");
    expect(imperial.points).toEqual([]);
    // source: 1 psi = 6,894.757 Pa (NIST SP 811); calc's own message says kPa whatever the viewer reads.
    expect(imperial.error).toContain(`below ${(floor / 6894.757).toFixed(1)} psi absolute`);
    expect(imperial.error).not.toMatch(/kPa/);
    expect(metric.error).toContain(`below ${(floor / 1000).toFixed(1)} kPa absolute`);
  });

  it("every lesson series maps to a field of an operating point with a label", () => {
    const p = boostCurve(exampleCombination(), [3000])[0];
    for (const s of LESSON_SERIES) {
      expect(typeof p[SERIES_METRIC[s]], s).toBe("number");
      expect(SERIES_LABEL[s]).toBeTruthy();
    }
    expect(SERIES_METRIC.chargeTemperature).toBe("manifoldTemperature");
  });
});
