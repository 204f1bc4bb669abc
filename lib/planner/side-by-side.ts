// Side by side: the figures of each item at chosen engine speeds and their differences from
// the first item. Pure (calc only).
import { trySolvePoint, type Combination, type OperatingPoint, type QuantityKind } from "@/calc";

export type DeltaQuantity = { key: "boostGauge" | "netPower" | "torque" | "manifoldTemperature" | "drivePower"; label: string; kind: QuantityKind };

export const DELTA_QUANTITIES: readonly DeltaQuantity[] = [
  { key: "boostGauge", label: "Boost", kind: "pressure" },
  { key: "netPower", label: "Net power", kind: "power" },
  { key: "torque", label: "Net torque", kind: "torque" },
  { key: "manifoldTemperature", label: "Charge temperature", kind: "temperature" },
  { key: "drivePower", label: "Blower drive power", kind: "power" },
];

export type DeltaCell = { value: number | null; delta: number | null };
export type DeltaRow = { quantity: DeltaQuantity; rpm: number; cells: DeltaCell[] };

/** One row per quantity and speed; each cell holds the item's value (SI) and its difference from the first item. */
export function deltaRows(specs: readonly Combination[], speeds: readonly number[]): DeltaRow[] {
  const points = specs.map((s) => speeds.map((n) => trySolvePoint(s, n)));
  const rows: DeltaRow[] = [];
  for (const quantity of DELTA_QUANTITIES) {
    speeds.forEach((rpm, j) => {
      const first = points[0]?.[j]?.[quantity.key] ?? null;
      rows.push({
        quantity,
        rpm,
        cells: points.map((ps) => {
          const v = ps[j]?.[quantity.key] ?? null;
          return { value: v, delta: v === null || first === null ? null : v - first };
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
  return [...new Set([3000, 4500, top].filter((n) => n <= top))].sort((a, b) => a - b);
}
