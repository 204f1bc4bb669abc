// Starting shapes for the VE table, named for what they look like: where the curve peaks (as a
// share of redline) and how broad the peak is. Invented, generic curves for a first guess only
// (not measured on any engine): the tuner replaces them with their own figures.

/** A VE shape: points of (engine speed as a fraction of redline, VE as a fraction). */
export type VeShape = { id: string; label: string; points: readonly (readonly [number, number])[] };

export const VE_SHAPES: readonly VeShape[] = [
  { id: "peak-65-broad", label: "Peak at 65 % of redline, broad and flat", points: [[0.2, 0.78], [0.45, 0.86], [0.65, 0.87], [0.85, 0.83], [1, 0.77]] },
  { id: "peak-70-plateau", label: "Peak at 70 % of redline, held to 85 %", points: [[0.2, 0.74], [0.45, 0.85], [0.7, 0.92], [0.85, 0.91], [1, 0.86]] },
  { id: "peak-88-late", label: "Peak at 88 % of redline, low at the bottom", points: [[0.2, 0.66], [0.45, 0.8], [0.7, 0.94], [0.88, 0.99], [1, 0.95]] },
  { id: "peak-92-narrow", label: "Peak at 92 % of redline, narrow", points: [[0.2, 0.6], [0.5, 0.78], [0.75, 0.96], [0.92, 1.04], [1, 1.01]] },
];

/** VE (fraction) of a shape at a fraction of redline, piecewise-linear and flat outside. */
export function shapeAt(shape: VeShape, x: number): number {
  const p = shape.points;
  if (x <= p[0][0]) return p[0][1];
  for (let i = 1; i < p.length; i++) {
    if (x <= p[i][0]) {
      const t = (x - p[i - 1][0]) / (p[i][0] - p[i - 1][0]);
      return p[i - 1][1] + t * (p[i][1] - p[i - 1][1]);
    }
  }
  return p[p.length - 1][1];
}

/**
 * The VE table re-filled from a shape for this redline: the rows' own engine speeds when there
 * are at least three distinct ones, else six speeds from a quarter of redline to redline.
 */
export function applyShape(shape: VeShape, redlineRpm: number, rows: readonly { rpm: number }[]): { rpm: number; ve: number }[] {
  const speeds = [...new Set(rows.map((r) => r.rpm).filter((n) => Number.isFinite(n) && n > 0))].sort((a, b) => a - b);
  const grid = speeds.length >= 3 ? speeds : Array.from({ length: 6 }, (_, i) => Math.round((redlineRpm * (0.25 + (0.75 * i) / 5)) / 100) * 100);
  return grid.map((rpm) => ({ rpm, ve: Math.round(shapeAt(shape, rpm / redlineRpm) * 1000) / 10 }));
}

/**
 * The whole VE curve scaled by a percentage ("+8 % with the new heads"): each VE (in %) times
 * (1 + percent/100), to 0.1 %. Speeds stay; rows not yet filled in stay as they are.
 */
export function scaleVe<R extends { rpm: number; ve: number }>(rows: readonly R[], percent: number): R[] {
  const f = 1 + percent / 100;
  return rows.map((r) => (Number.isFinite(r.ve) ? { ...r, ve: Math.round(r.ve * f * 10) / 10 } : { ...r }));
}
