// Solve a symmetric positive-definite system whose matrix has two bands either side of the
// diagonal (as a curvature penalty gives), by Cholesky factorisation: O(n) time and memory.

/**
 * Solve A·x = b with A symmetric positive definite and A(i, j) = 0 for |i − j| > 2, given as
 * band[i][d] = A(i, i + d) for d = 0, 1, 2. Returns null if A is not positive definite.
 */
export function solveBandedSpd(band: readonly Float64Array[], b: Float64Array): Float64Array | null {
  const n = b.length;
  // l[i][d] = L(i, i − d), the Cholesky factor's band.
  const l = Array.from({ length: n }, () => new Float64Array(3));
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(0, i - 2); j <= i; j++) {
      let s = band[j][i - j];
      for (let k = Math.max(0, i - 2); k < j; k++) s -= l[i][i - k] * l[j][j - k];
      if (i === j) {
        if (!(s > 0)) return null;
        l[i][0] = Math.sqrt(s);
      } else {
        l[i][i - j] = s / l[j][0];
      }
    }
  }
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let k = Math.max(0, i - 2); k < i; k++) s -= l[i][i - k] * y[k];
    y[i] = s / l[i][0];
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i];
    for (let k = i + 1; k <= Math.min(n - 1, i + 2); k++) s -= l[k][k - i] * x[k];
    x[i] = s / l[i][0];
  }
  return x;
}
