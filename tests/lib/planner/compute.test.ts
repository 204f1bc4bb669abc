// What the planner, the ladder, the finder and Side by side compute from a combination.
import { describe, expect, it } from "vitest";
import { cautions, combinationSchema, inToM, solvePoint, type Combination } from "@/calc";
import { compareQuery, parseItems, parseSpeeds } from "@/app/(app)/compare/items";
import { exposeSeries } from "@/lib/charts/metrics";
import { findPulley, ladder, ladderDiameters, neighbourPulleys, peakPowerRpm, rpmGrid, safeCurve, type ShelfPulley } from "@/lib/planner/compute";
import { deltaRows } from "@/lib/planner/side-by-side";
import { finderStock } from "@/lib/planner/compute";
import { applyShape, VE_SHAPES } from "@/lib/planner/ve-shapes";
import { deltaText, displayValue } from "@/lib/units/format";
import { smallBlockBaseline, smallBlockHeadsCam, smallBlockSmallerPulley } from "@/lib/combinations/demo-specs";

const base: Combination = combinationSchema.parse(smallBlockBaseline);
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
      expect(rows[i].boostAtRedline!).toBeLessThan(rows[i - 1].boostAtRedline!);
      expect(rows[i].blowerRpmAtRedline).toBeLessThan(rows[i - 1].blowerRpmAtRedline);
    }
    expect(rows.filter((r) => r.current).map((r) => r.diameter)).toEqual([base.drive.blowerPulleyDiameter]); // the current size exactly, not a rounded copy
    expect(rows.find((r) => r.current)!.stock).toEqual({ inStock: true, price: "49.00", partNumber: "BP-3.4" });
    expect(rows[1].stock?.inStock).toBe(false);
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
  it("fill the table's speeds with plausible VE that calc does not question", () => {
    for (const shape of VE_SHAPES) {
      const rows = applyShape(shape, base.engine.redlineRpm, base.engine.veCurve);
      expect(rows.map((r) => r.rpm)).toEqual(base.engine.veCurve.map((p) => p.rpm));
      const spec = combinationSchema.parse({ ...base, engine: { ...base.engine, veCurve: rows.map((r) => ({ rpm: r.rpm, ve: r.ve / 100 })) } });
      const codes = cautions(spec, []).map((c) => c.code);
      expect(codes).not.toContain("ve-implausible");
    }
  });

  it("make six speeds up to redline from a table that is too short", () => {
    const rows = applyShape(VE_SHAPES[1], 6000, [{ rpm: 3000 }]);
    expect(rows.length).toBe(6);
    expect(rows[5].rpm).toBe(6000);
  });
});

describe("Side by side", () => {
  it("reads heads and cam as less boost, and the smaller pulley as more, at 4500 rpm", () => {
    // common practice, no published source: better breathing lowers boost under the same blower and pulley
    const specs = [smallBlockBaseline, smallBlockHeadsCam, smallBlockSmallerPulley].map((s) => combinationSchema.parse(s));
    const rows = deltaRows(specs, [3000, 4500]);
    const boost = rows.find((r) => r.quantity.key === "boostGauge" && r.rpm === 4500)!;
    expect(boost.cells[0].delta).toBe(0);
    expect(boost.cells[1].delta!).toBeLessThan(0);
    expect(boost.cells[2].value!).toBeGreaterThan(boost.cells[1].value!);
    expect(boost.cells[1].value).toBe(solvePoint(specs[1], 4500).boostGauge);
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
