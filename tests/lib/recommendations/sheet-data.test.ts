// The sheet's engine speeds and its headline figures: every 250 rpm from 1,500 (or the VE
// curve's first point, if lower) to redline, the headline at the speed the boost was sold at.
// The 250 rpm step and the 1,500 rpm start are the product's own choice.
import { describe, expect, it } from "vitest";
import { combinationSchema, solvePoint, type Combination } from "@/calc";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { computeSheet, sheetRpms } from "@/lib/recommendations/sheet-data";

const demo: Combination = combinationSchema.parse(workTruckV6);
const withCurve = (firstRpm: number, redlineRpm: number): Combination => ({
  ...demo,
  engine: { ...demo.engine, redlineRpm, veCurve: [{ rpm: firstRpm, ve: 0.8 }, { rpm: redlineRpm, ve: 0.85 }] },
});
const grid = (from: number, to: number) => Array.from({ length: Math.floor((to - from) / 250) + 1 }, (_, i) => from + 250 * i);

describe("sheetRpms", () => {
  it("starts at 1,500 rpm when the VE curve starts above it", () => {
    expect(sheetRpms(withCurve(2000, 5200))).toEqual([...grid(1500, 5000), 5200]);
  });

  it("starts at the VE curve's first point when it is lower, rounded up to the 250 rpm grid", () => {
    expect(sheetRpms(withCurve(1000, 3000))).toEqual(grid(1000, 3000));
    expect(sheetRpms(withCurve(1100, 3000))).toEqual(grid(1250, 3000));
    expect(sheetRpms(withCurve(900, 2000))).toEqual(grid(1000, 2000));
  });

  it("ends at redline once, on the grid or off it", () => {
    expect(sheetRpms(withCurve(1500, 5000)).slice(-2)).toEqual([4750, 5000]);
    expect(sheetRpms(withCurve(1500, 5100)).slice(-2)).toEqual([5000, 5100]);
    // A curve with no points (refused by calc's schema, but the function does not depend on it).
    expect(sheetRpms({ ...demo, engine: { ...demo.engine, redlineRpm: 2000, veCurve: [] } })).toEqual([1500, 1750, 2000]);
  });
});

describe("computeSheet's headline", () => {
  it("without a sold speed the headline is the redline point", () => {
    const s = computeSheet(demo);
    const top = solvePoint(demo, demo.engine.redlineRpm);
    expect(s.figures.headline).toMatchObject({ rpm: 5200, sold: false, boostGauge: top.boostGauge, netPower: top.netPower });
    expect(s.figures.atRedline?.boostGauge).toBe(top.boostGauge);
  });

  it("a sold speed on the grid reads that point; one off the grid is solved on its own", () => {
    const on = computeSheet(demo, 4500);
    expect(on.figures.headline).toMatchObject({ rpm: 4500, sold: true, boostGauge: solvePoint(demo, 4500).boostGauge });
    const off = computeSheet(demo, 4321);
    expect(off.points.some((p) => p.rpm === 4321)).toBe(false);
    expect(off.figures.headline).toMatchObject({ rpm: 4321, sold: true, boostGauge: solvePoint(demo, 4321).boostGauge, netPower: solvePoint(demo, 4321).netPower });
  });

  it("the peaks are points of the curve no other trusted point beats", () => {
    const s = computeSheet(demo);
    const trusted = s.points.filter((p) => p.withinRange);
    const power = s.figures.peakPower!;
    const torque = s.figures.peakTorque!;
    expect(trusted.some((p) => p.rpm === power.rpm && p.netPower === power.netPower)).toBe(true);
    expect(trusted.every((p) => p.netPower <= power.netPower)).toBe(true);
    expect(trusted.some((p) => p.rpm === torque.rpm && p.torque === torque.torque)).toBe(true);
    expect(trusted.every((p) => p.torque <= torque.torque)).toBe(true);
    // Power peaks at a higher speed than torque (power = torque × speed with a flat-ish torque curve).
    expect(power.rpm).toBeGreaterThan(torque.rpm);
    const hot = s.figures.maxChargeTemperature!;
    expect(s.points.every((p) => p.manifoldTemperature <= hot.manifoldTemperature)).toBe(true);
  });
});
