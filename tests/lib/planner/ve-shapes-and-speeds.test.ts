// The VE shapes read between their points, and the side-by-side table's default speeds.
// Interpolation reference: linear interpolation between tabulated points, y = y0 + (x − x0)(y1 − y0)/(x1 − x0).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { exampleCombination, type Combination } from "@/calc";
import { defaultSpeeds } from "@/lib/planner/side-by-side";
import { VE_SHAPES, applyShape, shapeAt } from "@/lib/planner/ve-shapes";

const withRedline = (redlineRpm: number): Combination => ({ ...exampleCombination(), engine: { ...exampleCombination().engine, redlineRpm } });

describe("VE shapes", () => {
  it("each shape passes through its own points, is flat outside them and linear between", () => {
    for (const s of VE_SHAPES) {
      for (const [x, y] of s.points) expect(shapeAt(s, x), `${s.id} at ${x}`).toBeCloseTo(y, 12);
      expect(shapeAt(s, 0)).toBe(s.points[0][1]);
      expect(shapeAt(s, 1.5)).toBe(s.points[s.points.length - 1][1]);
    }
    // Halfway between (0.45, 0.86) and (0.65, 0.87) of the first shape: 0.865.
    expect(shapeAt(VE_SHAPES[0], 0.55)).toBeCloseTo(0.865, 12);
    // A quarter of the way from (0.2, 0.6) to (0.5, 0.78) of the last: 0.6 + 0.25 × 0.18 = 0.645.
    expect(shapeAt(VE_SHAPES[3], 0.275)).toBeCloseTo(0.645, 12);
  });

  it("between two points the value lies between theirs (property)", () => {
    fc.assert(
      fc.property(fc.constantFrom(...VE_SHAPES), fc.double({ min: 0, max: 1.2, noNaN: true }), (s, x) => {
        const i = s.points.findIndex((p) => p[0] >= x);
        const end = i === -1 ? s.points[s.points.length - 1][1] : s.points[0][1];
        const [lo, hi] = i <= 0 ? [end, end] : [s.points[i - 1][1], s.points[i][1]];
        const v = shapeAt(s, x);
        expect(v).toBeGreaterThanOrEqual(Math.min(lo, hi) - 1e-12);
        expect(v).toBeLessThanOrEqual(Math.max(lo, hi) + 1e-12);
      }),
    );
  });

  it("applyShape keeps three or more distinct typed speeds (sorted, blanks and zeros left out)", () => {
    const rows = [{ rpm: 4000 }, { rpm: 2000 }, { rpm: 0 }, { rpm: Number.NaN }, { rpm: 6000 }, { rpm: 2000 }];
    expect(applyShape(VE_SHAPES[0], 6000, rows).map((r) => r.rpm)).toEqual([2000, 4000, 6000]);
    expect(applyShape(VE_SHAPES[0], 6000, [{ rpm: 2000 }, { rpm: 4000 }]).map((r) => r.rpm)).toEqual([1500, 2400, 3300, 4200, 5100, 6000]);
    expect(applyShape(VE_SHAPES[0], 6000, [])[5].ve).toBe(77);
  });

  it("applyShape leaves out an infinite speed, so two real speeds still fall back to the six-speed grid", () => {
    expect(applyShape(VE_SHAPES[0], 6000, [{ rpm: 2000 }, { rpm: Number.POSITIVE_INFINITY }, { rpm: 4000 }]).map((r) => r.rpm)).toEqual([1500, 2400, 3300, 4200, 5100, 6000]);
  });
});

describe("side-by-side speeds", () => {
  it("3000, 4500 and the lowest redline, each at or under it; 3000/4500/6000 with nothing to compare", () => {
    expect(defaultSpeeds([])).toEqual([3000, 4500, 6000]);
    expect(defaultSpeeds([withRedline(6500), withRedline(5200)])).toEqual([3000, 4500, 5200]);
    expect(defaultSpeeds([withRedline(4500)])).toEqual([3000, 4500]);
    expect(defaultSpeeds([withRedline(4000)])).toEqual([3000, 4000]);
    expect(defaultSpeeds([withRedline(2800)])).toEqual([2800]);
  });
});
