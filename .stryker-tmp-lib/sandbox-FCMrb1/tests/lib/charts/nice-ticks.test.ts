// @ts-nocheck
// The static first-frame chart's axis ticks (components/charts/curve-preview.tsx).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { niceTicks } from "@/components/charts/curve-preview";

describe("niceTicks", () => {
  it("covers the range with evenly spaced 1, 2 or 5 × 10^n steps, at most seven ticks", () => {
    // The 1-2-5 series is the usual choice for axis steps (common practice, no published source);
    // the bound of seven ticks is the author's choice for a chart a few hundred pixels tall.
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), fc.double({ min: 1e-3, max: 1e5, noNaN: true }), (lo, span) => {
        const hi = lo + span;
        const t = niceTicks(lo, hi);
        expect(t.length).toBeGreaterThanOrEqual(2);
        expect(t.length).toBeLessThanOrEqual(7);
        // Ticks are rounded to 12 significant digits, so far from zero a step read back from them
        // carries a relative error of about 1e-8 (lo −94,704.593, span 0.003 gives 0.00099999999):
        // the exponent and the checks allow for that (tolerances chosen by the author).
        const step = t[1] - t[0];
        const slack = Math.max(Math.abs(lo), Math.abs(hi)) * 1e-11;
        const mantissa = step / 10 ** Math.floor(Math.log10(step) + 1e-6);
        expect([1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6 + slack / step)).toBe(true);
        for (let i = 1; i < t.length; i++) expect(t[i] - t[i - 1]).toBeCloseTo(step, 6);
        // Every tick inside the range, and the range's ends no more than one step from a tick.
        expect(t[0]).toBeGreaterThanOrEqual(lo - step * 1e-6 - slack);
        expect(t[t.length - 1]).toBeLessThanOrEqual(hi + step * 1e-6 + slack);
        expect(t[0] - lo).toBeLessThan(step + 1e-9 + slack);
        expect(hi - t[t.length - 1]).toBeLessThan(step + 1e-9 + slack);
      }),
      { examples: [[-94704.59300000001, 0.0030000000042491592]] },
    );
  });

  it("gives 0, 1,000 … 6,000 for an engine speed axis to 6,000 rpm", () => {
    expect(niceTicks(0, 6000)).toEqual([0, 1000, 2000, 3000, 4000, 5000, 6000]);
  });
});
