// Side by side's table: each item's figure at each speed and its difference from the first item,
// with no figure (and the reason) where an item does not balance or leaves the model's range.
import { describe, expect, it } from "vitest";
import { combinationSchema, trySolvePoint, type Combination } from "@/calc";
import { workTruckV6, workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import { DELTA_QUANTITIES, deltaRows, deltaTone } from "@/lib/planner/side-by-side";

const a: Combination = combinationSchema.parse(workTruckV6);
const b: Combination = combinationSchema.parse(workTruckV6SmallerPulley);
// The starved blower of tests/calc/solve.test.ts: a tiny blower turned slowly cannot balance.
const starved: Combination = { ...a, blower: { ...a.blower, displacementPerRev: 0.0001 }, drive: { ...a.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 } };

describe("deltaRows", () => {
  it("one row per quantity and speed; the first item's delta is zero, the others' their difference", () => {
    const rows = deltaRows([a, b], [3000, 4500]);
    expect(rows.map((r) => `${r.quantity.key}@${r.rpm}`)).toEqual(DELTA_QUANTITIES.flatMap((q) => [`${q.key}@3000`, `${q.key}@4500`]));
    const boost = rows.find((r) => r.quantity.key === "boostGauge" && r.rpm === 4500)!;
    const pa = trySolvePoint(a, 4500)!.boostGauge;
    const pb = trySolvePoint(b, 4500)!.boostGauge;
    expect(boost.cells).toEqual([
      { value: pa, delta: 0, outside: null },
      { value: pb, delta: pb - pa, outside: null },
    ]);
    // A smaller pulley spins the blower faster: more boost (common practice, no published source).
    expect(boost.cells[1].delta).toBeGreaterThan(0);
  });

  it("an item that does not balance has no figure, says why, and leaves the others' deltas empty when it is first", () => {
    expect(trySolvePoint(starved, 3000)).toBeNull();
    const [row] = deltaRows([starved, a], [3000]);
    expect(row.cells[0]).toEqual({ value: null, delta: null, outside: ["no-balance"] });
    expect(row.cells[1].value).not.toBeNull();
    expect(row.cells[1].delta).toBeNull();
    const [second] = deltaRows([a, starved], [3000]);
    expect(second.cells[1]).toEqual({ value: null, delta: null, outside: ["no-balance"] });
  });

  it("no items: rows with no cells", () => {
    const rows = deltaRows([], [3000]);
    expect(rows).toHaveLength(DELTA_QUANTITIES.length);
    expect(rows.every((r) => r.cells.length === 0)).toBe(true);
  });

  it("tones: better or worse by each quantity's own direction, neutral for no change", () => {
    expect([deltaTone("higher", 1), deltaTone("higher", -1), deltaTone("lower", 1), deltaTone("lower", -1)]).toEqual(["better", "worse", "worse", "better"]);
    expect([deltaTone("higher", 0), deltaTone("lower", 0), deltaTone("neutral", 5)]).toEqual(["neutral", "neutral", "neutral"]);
  });
});
