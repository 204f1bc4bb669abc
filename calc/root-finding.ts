// Brent's bracketed root finder (Brent 1973, "Algorithms for Minimization without
// Derivatives", ch. 4): inverse quadratic interpolation, secant and bisection steps,
// never leaving the bracket.

/** Result of a bracketed solve. */
export interface RootResult {
  /** Best estimate of the root (unit of x). */
  readonly root: number;
  /** Function evaluations used (count). */
  readonly evaluations: number;
  /** True when the bracket shrank below the tolerance (or f hit exactly 0). */
  readonly converged: boolean;
}

const EPSILON = Number.EPSILON;

/**
 * Root of f on [a, b] where fa = f(a) and fb = f(b) have opposite signs (or one is 0), to a
 * relative tolerance on x (dimensionless) plus an absolute floor (unit of x) for roots at 0.
 * Returns converged=false rather than a silent guess. `f` takes an explicit context rather than
 * being a fresh closure per solve, which keeps the hot loop free of per-call allocations.
 */
export function brent<C>(
  f: (context: C, x: number) => number,
  context: C,
  a: number,
  b: number,
  fa: number,
  fb: number,
  relativeTolerance: number,
  maxIterations: number,
  absoluteTolerance = 0,
): RootResult {
  if (fa === 0) return { root: a, evaluations: 0, converged: true };
  if (fb === 0) return { root: b, evaluations: 0, converged: true };
  // Compare signs, not the product: the product of two tiny values underflows to ±0. A NaN end
  // has no sign, so it is refused too.
  if (Math.sign(fa) !== -Math.sign(fb)) return { root: Number.NaN, evaluations: 0, converged: false };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < maxIterations; i++) {
    // The new point is on c's side: the other end of the bracket is now a.
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPSILON * Math.abs(b) + 0.5 * (relativeTolerance * Math.abs(b) + absoluteTolerance);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { root: b, evaluations: i, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(context, b);
    if (!Number.isFinite(fb)) return { root: Number.NaN, evaluations: i + 1, converged: false };
  }
  return { root: b, evaluations: maxIterations, converged: false };
}
