// Starting shapes for the VE table, from mild to wild. Invented, generic curves for a first
// guess only (not measured on any engine): the tuner replaces them with their own figures.

/** A VE shape: points of (engine speed as a fraction of redline, VE as a fraction). */
export type VeShape = { id: string; label: string; points: readonly (readonly [number, number])[] };

export const VE_SHAPES: readonly VeShape[] = [
  { id: "mild", label: "Mild street (early, flat torque)", points: [[0.2, 0.78], [0.45, 0.86], [0.65, 0.87], [0.85, 0.83], [1, 0.77]] },
  { id: "street-strip", label: "Street/strip (fuller top end)", points: [[0.2, 0.74], [0.45, 0.85], [0.7, 0.92], [0.85, 0.91], [1, 0.86]] },
  { id: "wild", label: "Wild (soft low end, strong top)", points: [[0.2, 0.66], [0.45, 0.8], [0.7, 0.94], [0.88, 0.99], [1, 0.95]] },
  { id: "race", label: "Race (peaky, high speed)", points: [[0.2, 0.6], [0.5, 0.78], [0.75, 0.96], [0.92, 1.04], [1, 1.01]] },
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
