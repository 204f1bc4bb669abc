// @ts-nocheck
// Summaries of benchmark samples, one definition for every bench script.

/** The q-quantile by nearest rank: the value at floor(q·n) of the sorted sample (the last for q = 1). */
export function quantile(xs: ArrayLike<number>, q: number): number {
  const sorted = Array.from(xs).sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
}
