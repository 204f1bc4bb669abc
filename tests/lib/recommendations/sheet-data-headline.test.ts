// What a recommendation sheet shows: its speeds, the key figures read from calc's points, the
// sold speed's headline and the speeds without a balance. Drive ratio is crank over blower
// pulley and Nb = N·r·(1 − belt slip) (calc/README.md, drive; trade fact); the 250 rpm step and
// the 1500 rpm start are the sheet's own contract (author's choice).
import { describe, expect, it } from "vitest";
import { combinationSchema, solvePoint, type Combination, type OperatingPoint } from "@/calc";
import { computeSheet, sheetRpms } from "@/lib/recommendations/sheet-data";
import { workTruckV6 } from "@/lib/combinations/demo-specs";

const base: Combination = combinationSchema.parse(workTruckV6);
const engineFrom = (veCurve: Combination["engine"]["veCurve"], redlineRpm: number): Combination => ({ ...base, engine: { ...base.engine, redlineRpm, veCurve } });
/** A 0.1 L blower on a 500 mm pulley: too slow to balance the engine from 3750 rpm up (measured). */
const slow: Combination = { ...base, blower: { ...base.blower, displacementPerRev: 0.0001 }, drive: { ...base.drive, blowerPulleyDiameter: 0.5 } };
/** A 30 mm pulley, the smallest calc takes: every point past the model's range (measured). */
const tiny: Combination = { ...base, drive: { ...base.drive, blowerPulleyDiameter: 0.03 } };

const argmax = (points: OperatingPoint[], key: "netPower" | "torque" | "manifoldTemperature") => points.reduce((m, p) => (p[key] > m[key] ? p : m));
const range = (p: OperatingPoint) => ({ withinRange: p.withinRange, rangeReasons: p.rangeReasons });

describe("sheetRpms", () => {
  it("runs every 250 rpm from the VE curve's first speed (rounded up), at most from 1500, to exactly redline", () => {
    expect(sheetRpms(engineFrom([{ rpm: 1100, ve: 0.8 }], 2000))).toEqual([1250, 1500, 1750, 2000]);
    expect(sheetRpms(engineFrom([{ rpm: 500, ve: 0.8 }], 1000))).toEqual([500, 750, 1000]);
    expect(sheetRpms(engineFrom([{ rpm: 2500, ve: 0.8 }], 2600))).toEqual([1500, 1750, 2000, 2250, 2500, 2600]);
    expect(sheetRpms(engineFrom([{ rpm: 1000, ve: 0.8 }], 1500))).toEqual([1000, 1250, 1500]);
    // An empty curve (never valid in calc, but typed) starts at 1500.
    expect(sheetRpms(engineFrom([], 2000))).toEqual([1500, 1750, 2000]);
  });
});

describe("computeSheet", () => {
  it("reads the drive and every figure from calc's points at the sheet's speeds", () => {
    const sheet = computeSheet(base);
    expect(sheet.points.map((p) => p.rpm)).toEqual(sheetRpms(base));
    expect(sheet.skipped).toEqual([]);
    expect(sheet.points[4]).toEqual(solvePoint(base, 2500));
    const top = sheet.points.at(-1)!;
    expect(top.rpm).toBe(5200);
    const power = argmax(sheet.points, "netPower");
    const torque = argmax(sheet.points, "torque");
    const hot = argmax(sheet.points, "manifoldTemperature");
    expect(torque.rpm).not.toBe(power.rpm); // so a swap of the two would show
    const f = sheet.figures;
    expect(f.driveRatio).toBeCloseTo(6 / 3.4, 12); // 6.0 in crank over 3.4 in blower pulley
    expect(f.overdrive).toBeCloseTo(6 / 3.4 - 1, 12);
    expect(f.blowerRpmAtRedline).toBeCloseTo(5200 * (6 / 3.4) * 0.98, 6); // 2 % belt slip
    expect(f).toEqual({
      crankPulleyDiameter: base.drive.crankPulleyDiameter,
      blowerPulleyDiameter: base.drive.blowerPulleyDiameter,
      driveRatio: f.driveRatio,
      overdrive: f.overdrive,
      redlineRpm: 5200,
      peakPower: { rpm: power.rpm, netPower: power.netPower, boostGauge: power.boostGauge },
      peakTorque: { rpm: torque.rpm, torque: torque.torque },
      atRedline: { boostGauge: top.boostGauge, manifoldTemperature: top.manifoldTemperature, withinRange: true, rangeReasons: [] },
      headline: { rpm: 5200, boostGauge: top.boostGauge, netPower: top.netPower, sold: false, withinRange: true, rangeReasons: [] },
      blowerRpmAtRedline: f.blowerRpmAtRedline,
      blowerMaxRpm: 14_000,
      maxChargeTemperature: { rpm: hot.rpm, manifoldTemperature: hot.manifoldTemperature, withinRange: true, rangeReasons: [] },
    });
  });

  it("carries calc's cautions for the points it drew", () => {
    // The demo truck at redline: 350 K, past the 333.15 K (60 °C) charge limit of calc's cautions.
    expect(computeSheet(base).figures.atRedline!.manifoldTemperature).toBeGreaterThan(333.15);
    expect(computeSheet(base).cautions.map((c) => c.code)).toContain("charge-temperature-high");
  });

  it("reads the headline at the sold speed, on the grid or between its speeds", () => {
    const onGrid = computeSheet(base, 4000).figures.headline!;
    const at4000 = solvePoint(base, 4000);
    expect(onGrid).toEqual({ rpm: 4000, boostGauge: at4000.boostGauge, netPower: at4000.netPower, sold: true, ...range(at4000) });
    const between = computeSheet(base, 4100).figures.headline!;
    const at4100 = solvePoint(base, 4100);
    expect(between).toEqual({ rpm: 4100, boostGauge: at4100.boostGauge, netPower: at4100.netPower, sold: true, ...range(at4100) });
    // The rest of the sheet stays on its grid.
    expect(computeSheet(base, 4100).points.map((p) => p.rpm)).toEqual(sheetRpms(base));
  });

  it("leaves out the speeds without a balance, and has no redline figures or headline when redline is one of them", () => {
    const sheet = computeSheet(slow);
    expect(sheet.skipped).toEqual([3750, 4000, 4250, 4500, 4750, 5000, 5200]);
    expect(sheet.points.map((p) => p.rpm)).toEqual([1500, 1750, 2000, 2250, 2500, 2750, 3000, 3250, 3500]);
    expect(sheet.figures.atRedline).toBeNull();
    expect(sheet.figures.headline).toBeNull();
    // The blower is still named at redline: 5200 × 0.1524/0.5 × 0.98.
    expect(sheet.figures.blowerRpmAtRedline).toBeCloseTo(5200 * (0.1524 / 0.5) * 0.98, 6);
    // Its hottest charge is at the lowest speed: the maximum, not the first or last point read.
    const hot = argmax(sheet.points, "manifoldTemperature");
    expect(sheet.figures.maxChargeTemperature).toEqual({ rpm: hot.rpm, manifoldTemperature: hot.manifoldTemperature, ...range(hot) });
    // A sold speed with a balance is the headline; one without leaves none.
    expect(computeSheet(slow, 3000).figures.headline).toMatchObject({ rpm: 3000, sold: true });
    expect(computeSheet(slow, 4000).figures.headline).toBeNull();
  });

  it("gives no peaks when no point is within the model's range, but still the hottest point and why it is out", () => {
    const f = computeSheet(tiny).figures;
    expect(f.peakPower).toBeNull();
    expect(f.peakTorque).toBeNull();
    expect(f.maxChargeTemperature).toMatchObject({ rpm: 5200, withinRange: false });
    expect(f.maxChargeTemperature!.rangeReasons).toContain("charge-temperature-above-bound");
    expect(f.headline).toMatchObject({ rpm: 5200, sold: false, withinRange: false });
    expect(f.atRedline).toMatchObject({ withinRange: false });
  });
});
