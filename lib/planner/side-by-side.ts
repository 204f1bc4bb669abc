// Side by side: the figures of each item at chosen engine speeds and their differences from
// the first item. Pure (calc only).
import { trySolvePoint, type Combination, type QuantityKind, type RangeReason } from "@/calc";

/**
 * Which way is better for a quantity: more net power and torque; a cooler charge and less power
 * taken to drive the blower. Boost itself is neither (it is the means, not the goal).
 */
export type BetterWhen = "higher" | "lower" | "neutral";

export type DeltaQuantity = { key: "boostGauge" | "netPower" | "torque" | "manifoldTemperature" | "drivePower"; label: string; kind: QuantityKind; better: BetterWhen };

export const DELTA_QUANTITIES: readonly DeltaQuantity[] = [
  { key: "boostGauge", label: "Boost", kind: "pressure", better: "neutral" },
  { key: "netPower", label: "Net power", kind: "power", better: "higher" },
  { key: "torque", label: "Net torque", kind: "torque", better: "higher" },
  { key: "manifoldTemperature", label: "Charge temperature", kind: "temperature", better: "lower" },
  { key: "drivePower", label: "Blower drive power", kind: "power", better: "lower" },
];

/** Whether a difference is better, worse or neither for its quantity. */
export function deltaTone(better: BetterWhen, delta: number): "better" | "worse" | "neutral" {
  if (better === "neutral" || delta === 0) return "neutral";
  return (delta > 0) === (better === "higher") ? "better" : "worse";
}

/** A cell's value (SI) and difference from the first item; null figures where there is none or the point is outside the model's range (`outside` says why). */
export type DeltaCell = { value: number | null; delta: number | null; outside: readonly RangeReason[] | null };
export type DeltaRow = { quantity: DeltaQuantity; rpm: number; cells: DeltaCell[] };

/** One row per quantity and speed; each cell holds the item's value (SI) and its difference from the first item. */
export function deltaRows(specs: readonly Combination[], speeds: readonly number[]): DeltaRow[] {
  const solved = specs.map((s) => speeds.map((n) => trySolvePoint(s, n)));
  // Points outside the model's range give no figures (and no differences).
  const points = solved.map((ps) => ps.map((p) => (p?.withinRange ? p : null)));
  const outsideOf = (i: number, j: number): readonly RangeReason[] | null => {
    const p = solved[i][j];
    return p === null ? ["no-balance"] : p.withinRange ? null : p.rangeReasons;
  };
  const rows: DeltaRow[] = [];
  for (const quantity of DELTA_QUANTITIES) {
    speeds.forEach((rpm, j) => {
      const first = points[0]?.[j]?.[quantity.key] ?? null;
      rows.push({
        quantity,
        rpm,
        cells: points.map((ps, i) => {
          const v = ps[j]?.[quantity.key] ?? null;
          return { value: v, delta: v === null || first === null ? null : v - first, outside: outsideOf(i, j) };
        }),
      });
    });
  }
  return rows;
}

/** Default speeds for the table: 3000 and 4500 rpm and the lowest redline, within every engine's range. */
export function defaultSpeeds(specs: readonly Combination[]): number[] {
  if (!specs.length) return [3000, 4500, 6000];
  const top = Math.min(...specs.map((s) => s.engine.redlineRpm));
  // Ascending as written: top is the largest speed kept.
  return [...new Set([3000, 4500, top].filter((n) => n <= top))];
}
