// Brent's bracketed root finder on functions with known roots (Brent 1973, "Algorithms for
// Minimization without Derivatives", ch. 4): the root to the tolerance asked, the bracket's ends,
// no root without a sign change, and an honest "not converged" when out of iterations or when f
// gives no number. Evaluations are counted through the context the finder passes to f.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { brent } from "@/calc/root-finding";

type Counter = { calls: number; f: (x: number) => number };
const counted = (f: (x: number) => number): Counter => ({ calls: 0, f });
const call = (k: Counter, x: number) => {
  k.calls++;
  return k.f(x);
};
const solve = (f: (x: number) => number, a: number, b: number, rel = 1e-12, max = 200, abs = 0) => {
  const k = counted(f);
  const r = brent(call, k, a, b, f(a), f(b), rel, max, abs);
  return { ...r, calls: k.calls };
};

describe("brent", () => {
  it("finds √2 as the root of x² − 2 on [0, 2], and counts its evaluations", () => {
    // source: √2 = 1.4142135623730951 (to double precision; any table of constants).
    const r = solve((x) => x * x - 2, 0, 2);
    expect(r.converged).toBe(true);
    expect(r.root).toBeCloseTo(Math.SQRT2, 11);
    expect(r.evaluations).toBe(r.calls);
    expect(r.evaluations).toBeGreaterThan(0);
    // Bisection alone would need log2(2 / 1e-12) ≈ 41 halvings; Brent's interpolation converges
    // superlinearly near a simple root (Brent 1973, ch. 4), so 10 is a generous bound (author's choice).
    expect(r.evaluations).toBeLessThanOrEqual(10);
  });

  it("finds Newton's root of x³ − 2x − 5 = 0 and the fixed point of cos", () => {
    // source: x³ − 2x − 5 has its real root at 2.0945514815423265 (Newton's and Wallis's example);
    // cos x = x at 0.7390851332151607 (the Dottie number, OEIS A003957).
    const newton = solve((x) => x ** 3 - 2 * x - 5, 2, 3);
    const dottie = solve((x) => Math.cos(x) - x, 0, 1);
    // A falling function, with its bracket given high end first.
    const falling = solve((x) => 2 - x * x, 2, 0);
    expect(newton.root).toBeCloseTo(2.0945514815423265, 11);
    expect(dottie.root).toBeCloseTo(0.7390851332151607, 11);
    expect(falling.root).toBeCloseTo(Math.SQRT2, 11);
    // Superlinear, as above: far fewer steps than bisection's 40 (author's bound).
    for (const r of [newton, dottie, falling]) expect(r.evaluations).toBeLessThanOrEqual(10);
  });

  it("lands within the relative tolerance asked for any root in the bracket (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 100, noNaN: true }), (root) => {
        const r = solve((x) => Math.atan(x - root), 0, 200, 1e-10);
        expect(r.converged).toBe(true);
        expect(r.evaluations).toBeLessThanOrEqual(30); // bisection: log2(200 / 1e-10) ≈ 41 (author's bound)
        expect(Math.abs(r.root - root)).toBeLessThanOrEqual(1e-10 * root + 4 * Number.EPSILON * root);
      }),
    );
  });

  it("returns an end of the bracket where f is already 0 there, without evaluating", () => {
    expect(solve((x) => x - 1, 1, 3)).toEqual({ root: 1, evaluations: 0, converged: true, calls: 0 });
    expect(solve((x) => x - 3, 1, 3)).toEqual({ root: 3, evaluations: 0, converged: true, calls: 0 });
  });

  it("accepts a bracket whose ends are tiny numbers of opposite sign (their product underflows to −0)", () => {
    // −1e-200 × 1e-200 is below the smallest double (about 4.9e-324, IEEE 754) and rounds to −0;
    // the signs still differ, so the root of 1e-200·(x − 1) on [0, 2] is 1.
    const r = solve((x) => 1e-200 * (x - 1), 0, 2);
    expect(r.converged).toBe(true);
    expect(r.root).toBeCloseTo(1, 11);
  });

  it("lands exactly on the root of a straight line in one step, and stops there", () => {
    // source: the secant through two points of a line meets its zero exactly (any numerical-methods text).
    expect(solve((x) => x - 1, 0, 3)).toEqual({ root: 1, evaluations: 1, converged: true, calls: 1 });
    // A bracket symmetric about 0, where b + a = 0 but the step b − a = 4: still one step.
    expect(solve((x) => x - 1, -2, 2)).toEqual({ root: 1, evaluations: 1, converged: true, calls: 1 });
  });

  it("converges with no relative tolerance at all, on the machine precision (2ε|b|) alone", () => {
    const r = solve((x) => x * x - 2, 0, 2, 0);
    expect(r.converged).toBe(true);
    expect(r.root).toBeCloseTo(Math.SQRT2, 14);
    expect(r.evaluations).toBeLessThanOrEqual(12); // author's bound, as above
  });

  it("refuses a bracket without a sign change", () => {
    const r = solve((x) => x * x + 1, -1, 2);
    expect(r).toEqual({ root: Number.NaN, evaluations: 0, converged: false, calls: 0 });
    expect(solve((x) => x * x - 2, 2, 3).converged).toBe(false);
    // Both ends below zero as well as both above.
    expect(solve((x) => -x * x - 1, -1, 2)).toEqual({ root: Number.NaN, evaluations: 0, converged: false, calls: 0 });
    expect(solve((x) => x - 5, 1, 3)).toEqual({ root: Number.NaN, evaluations: 0, converged: false, calls: 0 });
    // An end where f gives no number has no sign either.
    expect(solve((x) => (x < 0 ? Number.NaN : x - 1), -1, 2)).toEqual({ root: Number.NaN, evaluations: 0, converged: false, calls: 0 });
    expect(solve((x) => (x > 1.5 ? Number.NaN : x - 1), 0, 2)).toEqual({ root: Number.NaN, evaluations: 0, converged: false, calls: 0 });
  });

  it("says 'not converged' when out of iterations, with the best estimate inside the bracket", () => {
    const r = solve((x) => x ** 3 - 2 * x - 5, 2, 3, 1e-15, 3);
    expect(r.converged).toBe(false);
    expect(r.evaluations).toBe(3);
    expect(r.calls).toBe(3);
    expect(r.root).toBeGreaterThan(2);
    expect(r.root).toBeLessThan(3);
    expect(Math.abs(r.root - 2.0945514815423265)).toBeGreaterThan(1e-12);
  });

  it("says 'not converged' as soon as f gives no number", () => {
    // Finite at the ends, NaN inside: the first step inside fails.
    const r = solve((x) => (x === 0 || x === 2 ? x - 1 : Number.NaN), 0, 2);
    expect(r).toEqual({ root: Number.NaN, evaluations: 1, converged: false, calls: 1 });
  });

  it("stops at the absolute floor for a root at 0, where a relative tolerance alone asks for ever more digits", () => {
    // x³ is flat at its root 0, so the finder creeps towards it; the floor ends the search early.
    const relOnly = solve((x) => x ** 3, -1, 2, 1e-12, 200, 0);
    const floored = solve((x) => x ** 3, -1, 2, 1e-12, 200, 1e-6);
    expect(floored.converged).toBe(true);
    expect(Math.abs(floored.root)).toBeLessThan(1e-6);
    expect(floored.evaluations).toBeLessThan(relOnly.evaluations);
  });
});
