// The planner's helpers at their edges: the speed grid's first and last speed, the neighbour
// pulleys' fallbacks and bounds, the ladder's sizes, warnings and stock, and the finder's
// messages. Bounds of 30–500 mm are calc's finder range (calc/README.md, schema); drive ratio is
// crank over blower pulley and Nb = N·r·(1 − belt slip) (calc/README.md, drive; trade fact).
import { describe, expect, it } from "vitest";
import { combinationSchema, inToM, type Combination, type OperatingPoint } from "@/calc";
import { finderStock, findPulley, ladder, ladderDiameters, ladderSpeed, neighbourPulleys, neighbourStep, peakPowerRpm, rpmGrid, type ShelfPulley } from "@/lib/planner/compute";
import { workTruckV6 } from "@/lib/combinations/demo-specs";

const base: Combination = combinationSchema.parse(workTruckV6);
const pulley = (inches: number, stock: number, partNumber = `BP-${inches}`, price = "49.00"): ShelfPulley => ({ id: partNumber, partNumber, diameter: inToM(inches), ribCount: 8, price, stock });
/** The demo engine with its VE curve starting at `firstRpm` and another redline. */
const engineFrom = (firstRpm: number, redlineRpm: number): Combination => ({ ...base, engine: { ...base.engine, redlineRpm, veCurve: [{ rpm: firstRpm, ve: 0.8 }, { rpm: redlineRpm, ve: 0.8 }] } });
/** The demo engine under a blower of another displacement (m³/rev) and pulley (m). */
const blowerOf = (displacementPerRev: number, blowerPulleyDiameter = base.drive.blowerPulleyDiameter): Combination => ({ ...base, blower: { ...base.blower, displacementPerRev }, drive: { ...base.drive, blowerPulleyDiameter } });
const point = (rpm: number, netPower: number) => ({ rpm, netPower }) as OperatingPoint;

describe("rpmGrid", () => {
  it("starts at the VE curve's first speed rounded up to the step, never below 1000 or above 1500 rpm, and ends exactly at redline", () => {
    // Bounds 1000 and 1500 rpm and the 250 rpm step: author's choice (the function's contract).
    expect(rpmGrid(engineFrom(1200, 2000))).toEqual([1250, 1500, 1750, 2000]);
    expect(rpmGrid(engineFrom(800, 1600))).toEqual([1000, 1250, 1500, 1600]);
    expect(rpmGrid(engineFrom(1000, 1500))).toEqual([1000, 1250, 1500]);
    expect(rpmGrid(engineFrom(2500, 2600))).toEqual([1500, 1750, 2000, 2250, 2500, 2600]);
    expect(rpmGrid(engineFrom(1200, 2000), 500)).toEqual([1500, 2000]);
  });
});

describe("peakPowerRpm and ladderSpeed", () => {
  it("reads the speed of the highest net power, the first of equal ones, and the fallback on an empty curve", () => {
    expect(peakPowerRpm([point(3000, 100), point(4000, 300), point(5000, 200)], 5200)).toBe(4000);
    expect(peakPowerRpm([point(3000, 300), point(4000, 300)], 5200)).toBe(3000);
    expect(peakPowerRpm([point(3000, -50), point(4000, -20)], 5200)).toBe(4000);
    expect(peakPowerRpm([], 5200)).toBe(5200);
  });

  it("uses the finder's chosen speed, else the peak's", () => {
    expect(ladderSpeed(3000, 4750)).toBe(3000);
    expect(ladderSpeed(null, 4750)).toBe(4750);
  });
});

describe("neighbourPulleys", () => {
  it("steps 0.1 in for imperial and 2.5 mm for metric when the shelf has none", () => {
    // 0.1 in = 2.54 mm exactly (NIST SP 811, inch).
    expect(neighbourStep("imperial")).toBeCloseTo(0.00254, 12);
    expect(neighbourStep("metric")).toBe(0.0025);
    const m = neighbourPulleys(0.08, [], "metric");
    expect(m.smaller).toBeCloseTo(0.0775, 12);
    expect(m.larger).toBeCloseTo(0.0825, 12);
  });

  it("falls back to out-of-stock shelf sizes when none in stock is smaller or larger, and never offers the current size", () => {
    const shelf = [pulley(3.0, 0), pulley(3.2, 0), pulley(3.4, 4), pulley(3.6, 0), pulley(3.8, 2)];
    const n = neighbourPulleys(inToM(3.4), shelf, "imperial");
    expect(n.smaller).toBe(inToM(3.2)); // the nearest smaller, though out of stock: none smaller is stocked
    expect(n.larger).toBe(inToM(3.8)); // the stocked one before the nearer out-of-stock 3.6
    const stockedBoth = neighbourPulleys(inToM(3.4), [pulley(4.0, 1), pulley(2.8, 1), pulley(3.6, 1), pulley(3.0, 1)], "imperial");
    expect(stockedBoth).toEqual({ smaller: inToM(3.0), larger: inToM(3.6) });
    // Only the current size on the shelf: the steps either side.
    const alone = neighbourPulleys(inToM(3.4), [pulley(3.4, 1)], "imperial");
    expect(alone.smaller).toBeCloseTo(inToM(3.3), 12);
    expect(alone.larger).toBeCloseTo(inToM(3.5), 12);
  });

  it("offers no fallback step below 30 mm or above 500 mm (the finder's range)", () => {
    expect(neighbourPulleys(0.03254, [], "imperial").smaller).toBe(0.03); // 32.54 mm − 0.1 in lands on 30 mm exactly: allowed
    expect(neighbourPulleys(0.03253, [], "imperial").smaller).toBeNull();
    expect(neighbourPulleys(0.032, [], "metric")).toEqual({ smaller: null, larger: 0.0345 });
    expect(neighbourPulleys(0.4975, [], "metric").larger).toBeCloseTo(0.5, 12); // lands on 500 mm: allowed
    expect(neighbourPulleys(0.498, [], "metric")).toEqual({ smaller: 0.4955, larger: null });
  });
});

describe("ladderDiameters and finderStock", () => {
  it("keeps the current size itself, each shelf size once, in ascending order", () => {
    const current = inToM(3.4) + 5e-7; // within a micrometre of the shelf's 3.4 in
    const ds = ladderDiameters(current, [pulley(3.8, 1), pulley(3.4, 1), pulley(3.0, 0), pulley(3.0, 2)]);
    expect(ds).toEqual([inToM(3.0), current, inToM(3.8)]);
    // A size two micrometres away is another rung.
    expect(ladderDiameters(inToM(3.4) + 2e-6, [pulley(3.4, 1)])).toEqual([inToM(3.4), inToM(3.4) + 2e-6]);
  });

  it("lists each stocked size once", () => {
    expect(finderStock([pulley(3.2, 1, "A"), pulley(3.2, 4, "B"), pulley(3.6, 0)])).toEqual([inToM(3.2)]);
    expect(finderStock([])).toEqual([]);
  });
});

describe("ladder", () => {
  const rows = ladder(base, 5200, [pulley(1.6, 1), pulley(2.8, 0, "BP-2.8-old", "41.00"), pulley(2.8, 3, "BP-2.8-new", "42.00"), pulley(3.0, 0, "BP-3.0-a", "43.00"), pulley(3.0, 0, "BP-3.0-b", "44.00")]);
  const at = (inches: number) => rows.find((r) => Math.abs(r.diameter - inToM(inches)) < 1e-9)!;

  it("gives each rung its drive ratio, overdrive, blower speeds and the blower's limit", () => {
    expect(rows.map((r) => r.diameter)).toEqual([inToM(1.6), inToM(2.8), inToM(3.0), base.drive.blowerPulleyDiameter]);
    const current = at(3.4);
    expect(current.rpm).toBe(5200);
    expect(current.driveRatio).toBeCloseTo(6 / 3.4, 12); // 6.0 in crank over 3.4 in blower pulley
    expect(current.overdrive).toBeCloseTo(6 / 3.4 - 1, 12);
    expect(current.blowerRpm).toBeCloseTo(5200 * (6 / 3.4) * 0.98, 6); // Nb = N·r·(1 − 2 % slip)
    expect(current.blowerRpmAtRedline).toBeCloseTo(5200 * (6 / 3.4) * 0.98, 6);
    expect(at(1.6).blowerMaxRpm).toBe(14_000);
    expect(current.current).toBe(true);
    expect(rows.filter((r) => r.current).length).toBe(1);
  });

  it("names each limit a rung breaks, in a fixed order", () => {
    // 1.6 in at 5200 rpm: blower at 5200 × 6/1.6 × 0.98 = 19 110 rpm, over its 14 000; under the
    // belt's 76 mm minimum (calc's demo default); a charge past 60 °C and injectors past 85 % duty
    // (calc's cautions, checked on the same point through its figures below).
    const tiny = at(1.6);
    expect(tiny.blowerRpmAtRedline).toBeCloseTo(19_110, 6);
    expect(tiny.chargeTemperature!).toBeGreaterThan(333.15);
    expect(tiny.warnings).toEqual(["Blower over its speed limit at redline", "Below belt minimum", "Hot charge", "Injectors at limit"]);
    // 2.8 in: 71 mm is under the belt minimum, the blower (10 920 rpm) under its limit.
    expect(at(2.8).blowerRpmAtRedline).toBeCloseTo(5200 * (6 / 2.8) * 0.98, 6);
    expect(at(2.8).warnings).toEqual(["Below belt minimum", "Hot charge"]);
    expect(at(3.4).warnings).toEqual(["Hot charge"]);
  });

  it("carries the point's figures and range, and none where there is no balance", () => {
    const tiny = at(1.6);
    expect(tiny.withinRange).toBe(false);
    expect(tiny.rangeReasons).toEqual(["pressure-ratio-above-range", "charge-temperature-above-bound", "blower-overspeed-margin"]);
    expect(at(3.4).withinRange).toBe(true);
    expect(at(3.4).rangeReasons).toEqual([]);
    for (const r of rows) {
      expect(r.boost).toEqual(expect.any(Number));
      expect(r.netPower).toEqual(expect.any(Number));
      expect(r.chargeTemperature).toEqual(expect.any(Number));
    }
    // A 0.1 L blower on a 500 mm pulley at redline cannot keep up with the engine: no balance.
    const slow = ladder(blowerOf(0.0001, 0.5), 5200, []).find((r) => r.current)!;
    expect(slow).toMatchObject({ boost: null, netPower: null, chargeTemperature: null, withinRange: false, rangeReasons: ["no-balance"], stock: null });
  });

  it("shows an in-stock shelf entry before an out-of-stock one of the same size, else the first, and none off the shelf", () => {
    expect(at(2.8).stock).toEqual({ inStock: true, price: "42.00", partNumber: "BP-2.8-new" });
    expect(at(3.0).stock).toEqual({ inStock: false, price: "43.00", partNumber: "BP-3.0-a" });
    expect(at(1.6).stock).toEqual({ inStock: true, price: "49.00", partNumber: "BP-1.6" });
    expect(at(3.4).stock).toBeNull();
  });
});

describe("findPulley's messages", () => {
  it("says the reachable range, in the person's units, with the finder's pulley range", () => {
    // 0 Pa target; the finder's 30 and 500 mm are 1.18 and 19.69 in (÷ 25.4 mm/in, NIST SP 811).
    const slowMetric = findPulley(blowerOf(0.0001), 5200, 0, [], "metric");
    expect(slowMetric.ok).toBe(false);
    if (!slowMetric.ok) expect(slowMetric.message).toMatch(/^A boost of 0\.0 kPa cannot be reached at 5200 rpm with any blower pulley from 30\.0 mm to 500\.0 mm\. The reachable range there is no balance to -\d+\.\d kPa\.$/);
    const bigImperial = findPulley(blowerOf(0.01), 5200, 0, [], "imperial");
    expect(bigImperial.ok).toBe(false);
    if (!bigImperial.ok) expect(bigImperial.message).toMatch(/^A boost of 0\.0 psi cannot be reached at 5200 rpm with any blower pulley from 1\.18 in to 19\.69 in\. The reachable range there is \d+\.\d psi to no balance\.$/);
  });

  it("rounds the engine speed in the message", () => {
    const out = findPulley(blowerOf(0.0001), 5199.6, 0, [], "metric");
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toContain(" at 5200 rpm ");
  });

  it("returns calc's words for an input it refuses, and lets any other error through", () => {
    // Bounds from calc's schema (targetBoostSchema, rpmSchema).
    expect(findPulley(base, 4000, 500_000, [], "metric")).toEqual({ ok: false, message: "Target boost must be between -50000 and 400000 Pa (gauge)" });
    expect(findPulley(base, 50, 0, [], "imperial")).toEqual({ ok: false, message: "Engine speed must be between 100 and 20000 rpm" });
    const broken = { ...base, get engine(): never { throw new RangeError("not a model error"); } };
    expect(() => findPulley(broken as unknown as Combination, 4000, 0, [], "metric")).toThrow(RangeError);
  });
});
