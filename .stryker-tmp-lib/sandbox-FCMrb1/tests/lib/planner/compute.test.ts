// @ts-nocheck
// What the planner, the ladder, the finder and Side by side compute from a combination.
import { describe, expect, it } from "vitest";
import { cautions, combinationSchema, inToM, solvePoint, type Combination } from "@/calc";
import { compareQuery, parseItems, parseSpeeds } from "@/app/(app)/compare/items";
import { exposeSeries } from "@/lib/charts/metrics";
import { findPulley, ladder, finderStock, ladderDiameters, neighbourPulleys, peakPowerRpm, rpmGrid, safeCurve, withPulley, type ShelfPulley } from "@/lib/planner/compute";
import { explainSentence } from "@/lib/planner/explain-words";
import { outsideRangeText } from "@/lib/planner/range-words";
import { DELTA_QUANTITIES, deltaRows, deltaTone } from "@/lib/planner/side-by-side";
import { matchesSearch } from "@/app/(app)/compare/compare-pickers";
import { applyShape, scaleVe, VE_SHAPES } from "@/lib/planner/ve-shapes";
import fc from "fast-check";
import { deltaText, displayValue } from "@/lib/units/format";
import { vintageV8Cam, vintageV8DrawThrough, workTruckV6 } from "@/lib/combinations/demo-specs";

const base: Combination = combinationSchema.parse(workTruckV6);
const shelfPulley = (inches: number, stock: number): ShelfPulley => ({ id: `p${inches}`, partNumber: `BP-${inches}`, diameter: inToM(inches), ribCount: 8, price: "49.00", stock });

describe("curves and the ladder", () => {
  it("the finder's nearest sizes are only pulleys in stock: an out-of-stock size is never offered as available", () => {
    expect(finderStock([shelfPulley(3.0, 0), shelfPulley(3.2, 2), shelfPulley(3.4, 0)])).toEqual([inToM(3.2)]);
    expect(finderStock([shelfPulley(3.0, 0)])).toEqual([]);
  });

  it("runs the curve from low speed to exactly redline", () => {
    const rpms = rpmGrid(base);
    expect(rpms[0]).toBe(1500);
    expect(rpms[rpms.length - 1]).toBe(base.engine.redlineRpm);
    const curve = safeCurve(base, rpms);
    expect(curve.length).toBe(rpms.length);
    // The curve is calc's own answer at each speed.
    expect(curve[3].boostGauge).toBe(solvePoint(base, rpms[3]).boostGauge);
  });

  it("offers 2.5–4.5 in by 0.1 in when the shelf is empty, and the shelf's sizes when it is not", () => {
    const empty = ladderDiameters(base.drive.blowerPulleyDiameter, []);
    expect(empty.length).toBe(21);
    expect(empty[0]).toBeCloseTo(inToM(2.5), 9);
    expect(empty[20]).toBeCloseTo(inToM(4.5), 9);
    const shelf = [shelfPulley(3.0, 2), shelfPulley(3.2, 0), shelfPulley(3.6, 1)];
    const ds = ladderDiameters(base.drive.blowerPulleyDiameter, shelf);
    expect(ds.map((d) => Number((d / 0.0254).toFixed(2)))).toEqual([3.0, 3.2, 3.4, 3.6]);
  });

  it("overlays the next stocked sizes, else ±0.1 in", () => {
    const shelf = [shelfPulley(3.0, 2), shelfPulley(3.2, 0), shelfPulley(3.6, 1)];
    const n = neighbourPulleys(inToM(3.4), shelf, "imperial");
    expect(n.smaller).toBeCloseTo(inToM(3.0), 9); // 3.2 is out of stock
    expect(n.larger).toBeCloseTo(inToM(3.6), 9);
    const none = neighbourPulleys(inToM(3.4), [], "imperial");
    expect(none.smaller).toBeCloseTo(inToM(3.3), 9);
    expect(none.larger).toBeCloseTo(inToM(3.5), 9);
  });

  it("shows more boost and blower speed for every smaller pulley, marks the current one and the stock", () => {
    // common practice, no published source: a smaller blower pulley raises boost at every engine speed
    const shelf = [shelfPulley(2.8, 1), shelfPulley(3.1, 0), shelfPulley(3.4, 3), shelfPulley(3.8, 2)];
    const rows = ladder(base, peakPowerRpm(safeCurve(base, rpmGrid(base)), base.engine.redlineRpm), shelf);
    for (let i = 1; i < rows.length; i++) {
      expect(rows[i].boost!).toBeLessThan(rows[i - 1].boost!);
      expect(rows[i].blowerRpmAtRedline).toBeLessThan(rows[i - 1].blowerRpmAtRedline);
    }
    expect(rows.filter((r) => r.current).map((r) => r.diameter)).toEqual([base.drive.blowerPulleyDiameter]); // the current size exactly, not a rounded copy
    expect(rows.find((r) => r.current)!.stock).toEqual({ inStock: true, price: "49.00", partNumber: "BP-3.4" });
    expect(rows[1].stock?.inStock).toBe(false);
  });

  it("gives the same boost as the finder for the same pulley and engine speed", () => {
    // One speed for both (issue: the ladder read 11.9 psi at redline beside the finder's 8.8 psi at 5,500 rpm).
    const shelf = [shelfPulley(2.9, 1), shelfPulley(3.1, 1), shelfPulley(3.4, 3), shelfPulley(3.8, 2)];
    for (const rpm of [3000, 4500, base.engine.redlineRpm]) {
      const rows = ladder(base, rpm, shelf);
      const row = rows.find((r) => Math.abs(r.diameter - inToM(3.1)) < 1e-9)!;
      expect(row.rpm).toBe(rpm);
      const found = findPulley(base, rpm, row.boost!, [], "imperial");
      expect(found.ok).toBe(true);
      if (found.ok) {
        expect(found.result.diameter).toBeCloseTo(inToM(3.1), 5);
        expect(found.result.point.boostGauge).toBeCloseTo(row.boost!, 0);
      }
      expect(row.boost).toBe(solvePoint(withPulley(base, inToM(3.1)), rpm).boostGauge);
    }
  });

  it("marks rungs outside the model's range with calc's reasons", () => {
    // A tiny pulley on the demo engine at redline drives the pressure ratio past the model's 2.5 (calc/README.md, Range).
    const rows = ladder(base, base.engine.redlineRpm, [shelfPulley(1.6, 1), shelfPulley(3.4, 1)]);
    const tiny = rows[0];
    expect(tiny.withinRange).toBe(false);
    expect(tiny.rangeReasons.length).toBeGreaterThan(0);
    expect(outsideRangeText(tiny.rangeReasons, "imperial")).toMatch(/^Outside the model's range: /);
    expect(rows.find((r) => r.current)!.withinRange).toBe(true);
    expect(outsideRangeText(["charge-temperature-above-bound"], "imperial")).toBe("Outside the model's range: charge hotter than 392 °F");
    expect(outsideRangeText(["charge-temperature-above-bound"], "metric")).toBe("Outside the model's range: charge hotter than 200 °C");
  });

  it("explains a smaller pulley in one sentence, in the person's units", () => {
    const rpm = 4500;
    const a = solvePoint(base, rpm);
    const b = solvePoint(withPulley(base, base.drive.blowerPulleyDiameter * 0.9), rpm);
    const imperial = explainSentence(a, b, "imperial")!;
    expect(imperial).toMatch(/^Against the saved revision at 4,500 rpm: boost \+\d+\.\d psi and net power \+\d+ hp; boost rose with blower speed \+11\.1 %/);
    expect(imperial).not.toMatch(/kPa|kW|°C/);
    const metric = explainSentence(a, b, "metric")!;
    expect(metric).toMatch(/kPa/);
    expect(metric).not.toMatch(/psi|hp|°F/);
    expect(explainSentence(a, a, "imperial")).toBeNull();
  });

  it("explains an unreachable target in the user's units", () => {
    const out = findPulley(base, 4000, 50_000, [], "imperial");
    expect(out.ok).toBe(true);
    // Even the largest pulley cannot pull the manifold 49 kPa below the barometer at 4000 rpm.
    const far = findPulley(base, 4000, -49_000, [], "imperial");
    expect(far.ok).toBe(false);
    // The top of the range is the smallest pulley's boost, or "no balance" where it has none
    // (with the charge-temperature refinement of calc/ it balances, far outside the model's range).
    if (!far.ok) expect(far.message).toMatch(/^A boost of −?-?7\.1 psi cannot be reached at 4000 rpm .* The reachable range there is -6\.\d psi to (no balance|\d+\.\d psi)\.$/);
  });
});

describe("VE starting shapes", () => {
  it("are named for where they peak: the label's share of redline is the curve's highest point", () => {
    for (const shape of VE_SHAPES) {
      const top = shape.points.reduce((a, b) => (b[1] > a[1] ? b : a));
      expect(shape.label).toContain(`Peak at ${Math.round(top[0] * 100)} % of redline`);
      expect(shape.id).toBe(`peak-${Math.round(top[0] * 100)}-${shape.id.split("-").at(-1)}`);
    }
  });

  it("fill the table's speeds with plausible VE that calc does not question", () => {
    for (const shape of VE_SHAPES) {
      const rows = applyShape(shape, base.engine.redlineRpm, base.engine.veCurve);
      expect(rows.map((r) => r.rpm)).toEqual(base.engine.veCurve.map((p) => p.rpm));
      const spec = combinationSchema.parse({ ...base, engine: { ...base.engine, veCurve: rows.map((r) => ({ rpm: r.rpm, ve: r.ve / 100 })) } });
      const codes = cautions(spec, []).map((c) => c.code);
      expect(codes).not.toContain("ve-implausible");
    }
  });

  it("scale the whole curve by a percentage, to 0.1 %, keeping the speeds", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ rpm: fc.integer({ min: 500, max: 9000 }), ve: fc.double({ min: 30, max: 130, noNaN: true }) }), { minLength: 1, maxLength: 12 }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        (rows, pct) => {
          const out = scaleVe(rows, pct);
          out.forEach((r, i) => {
            expect(r.rpm).toBe(rows[i].rpm);
            expect(Math.abs(r.ve - rows[i].ve * (1 + pct / 100))).toBeLessThanOrEqual(0.05 + 1e-9);
          });
        },
      ),
    );
    // source: arithmetic, 85 % × 1.08 = 91.8 %
    expect(scaleVe([{ rpm: 3000, ve: 85 }, { rpm: 4000, ve: Number.NaN }], 8).map((r) => r.ve)).toEqual([91.8, Number.NaN]);
  });

  it("make six speeds up to redline from a table that is too short", () => {
    const rows = applyShape(VE_SHAPES[1], 6000, [{ rpm: 3000 }]);
    expect(rows.length).toBe(6);
    expect(rows[5].rpm).toBe(6000);
  });
});

describe("Side by side", () => {
  it("reads a cam change as less boost, and then a smaller pulley as more, at 4500 rpm", () => {
    // common practice, no published source: better breathing lowers boost under the same blower and pulley
    const camAndPulley = { ...vintageV8Cam, drive: { ...vintageV8Cam.drive, blowerPulleyDiameter: vintageV8Cam.drive.blowerPulleyDiameter * 0.9 } };
    const specs = [vintageV8DrawThrough, vintageV8Cam, camAndPulley].map((s) => combinationSchema.parse(s));
    const rows = deltaRows(specs, [3000, 4500]);
    const boost = rows.find((r) => r.quantity.key === "boostGauge" && r.rpm === 4500)!;
    expect(boost.cells[0].delta).toBe(0);
    expect(boost.cells[1].delta!).toBeLessThan(0);
    expect(boost.cells[2].value!).toBeGreaterThan(boost.cells[1].value!);
    expect(boost.cells[1].value).toBe(solvePoint(specs[1], 4500).boostGauge);
  });

  it("colours a difference by better or worse for its quantity, not by its sign", () => {
    // Trade fact (common practice, no published source): a cooler charge and less drive power are better; boost alone is neither.
    const by = Object.fromEntries(DELTA_QUANTITIES.map((q) => [q.key, q.better]));
    expect(deltaTone(by.manifoldTemperature, -5)).toBe("better");
    expect(deltaTone(by.drivePower, -500)).toBe("better");
    expect(deltaTone(by.drivePower, 500)).toBe("worse");
    expect(deltaTone(by.netPower, 500)).toBe("better");
    expect(deltaTone(by.torque, -1)).toBe("worse");
    expect(deltaTone(by.boostGauge, 1000)).toBe("neutral");
    expect(deltaTone(by.netPower, 0)).toBe("neutral");
  });

  it("finds combinations by name, customer or owner", () => {
    const c = { id: "x", name: "Street small-block", revision: 2, customerName: "Ada Example", ownerEmail: "tuner@example.test" };
    expect(matchesSearch(c, "small")).toBe(true);
    expect(matchesSearch(c, "ADA")).toBe(true);
    expect(matchesSearch(c, "tuner@")).toBe(true);
    expect(matchesSearch(c, "twin-screw")).toBe(false);
    expect(matchesSearch(c, "  ")).toBe(true);
  });

  it("gives no figures for points outside the model's range, and says why", () => {
    const tiny = combinationSchema.parse(withPulley(base, inToM(1.6)));
    const rows = deltaRows([base, tiny], [base.engine.redlineRpm]);
    const boost = rows.find((r) => r.quantity.key === "boostGauge")!;
    expect(boost.cells[0].outside).toBeNull();
    expect(boost.cells[1].outside!.length).toBeGreaterThan(0);
    expect(boost.cells[1].value).toBeNull();
    expect(boost.cells[1].delta).toBeNull();
  });

  it("parses the query, dropping malformed and repeated items", () => {
    const id = "0a1b2c3d-0000-4000-8000-000000000001";
    const { items, ignored } = parseItems(`${id}:1,${id}:2,${id}:1,nonsense,${id}:current`);
    expect(items).toEqual([
      { combinationId: id, revision: 1 },
      { combinationId: id, revision: 2 },
      { combinationId: id, revision: "current" },
    ]);
    expect(ignored).toBe(1);
    expect(parseSpeeds("4500, 3000, 50, abc, 3000")).toEqual([3000, 4500]);
    expect(decodeURIComponent(compareQuery(items.slice(0, 2), [3000]))).toBe(`items=${id}:1,${id}:2&at=3000`);
  });
});

describe("display rounding", () => {
  it("writes differences with a sign and the size of a degree", () => {
    // source: a temperature difference of 1 K is 1.8 °F (definition of the Fahrenheit degree)
    expect(deltaText("temperature", 10, "imperial")).toBe("+18 °F");
    expect(deltaText("pressure", -6894.757, "imperial")).toBe("−1.0 psi");
    expect(displayValue("length-small", 0.0762, "imperial")).toBe(3);
  });

  it("exposes the chart's boost in the user's units", () => {
    const pts = safeCurve(base, [3000]);
    const [s] = exposeSeries([{ label: "x", points: pts }], ["boostGauge"], "metric");
    expect(s.boost[0]).toBe(Math.round((pts[0].boostGauge / 1000) * 10) / 10);
    expect(s.boostUnit).toBe("kPa");
  });
});
