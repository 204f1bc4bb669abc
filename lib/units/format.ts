// Display rounding for quantities in the user's units. Pure: used by the planner, the charts,
// side by side and their tests, so the figure on screen and the figure a test expects agree.
import { formatQuantity, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";

/**
 * Decimal places per unit (by label): [shown in readouts, shown in input boxes]. Readouts show
 * enough to see a 0.1 in pulley change; boxes are finer, so a typed 2.875 in pulley survives,
 * but never conversion noise such as 14.6959 psi or 280.709 in³.
 */
const DIGITS: Readonly<Record<string, readonly [number, number]>> = {
  in: [2, 3], mm: [1, 2], ft: [0, 0], m: [0, 0],
  "in³": [0, 1], L: [2, 3], cc: [0, 0], "in³/rev": [0, 1], "L/rev": [2, 3], "cc/rev": [0, 0],
  psi: [1, 2], kPa: [1, 1], bar: [2, 3],
  "°F": [0, 1], "°C": [0, 1], hp: [0, 0], kW: [0, 1], "lb·ft": [0, 0], "N·m": [0, 0],
  cfm: [0, 0], "m³/min": [1, 2], "m³/h": [0, 0], rpm: [0, 0],
  "lb/h": [0, 1], "kg/h": [0, 2], "cc/min": [0, 0], "lb/(hp·h)": [2, 3], "g/(kW·h)": [0, 0],
};

/** Decimal places of an input box of a kind in the person's units. */
export function inputDigitsOf(kind: QuantityKind, system: UnitSystem): number {
  return DIGITS[unitLabel(kind, system)]?.[1] ?? 3;
}

/** A number rounded to `digits` decimals by an exact power of ten (no 1.2000000000000002). */
export function roundTo(v: number, digits: number): number {
  if (!Number.isFinite(v)) return v;
  const f = 10 ** digits;
  return Math.round(v * f) / f;
}

/** Decimal places shown for a kind in the person's units. */
export function digitsOf(kind: QuantityKind, system: UnitSystem): number {
  return DIGITS[unitLabel(kind, system)]?.[0] ?? 1;
}

/** A SI value in the user's units, rounded for display (a number, for tables and tests). */
export function displayValue(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): number {
  const v = formatQuantity(kind, si, system).value;
  const f = 10 ** digits;
  return Math.round(v * f) / f;
}

/** The figure as text without its unit, e.g. "7.4" (psi) or "6,200" (rpm). */
export function figure(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  const v = formatQuantity(kind, si, system).value;
  return v.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** The figure with its unit, e.g. "7.4 psi". */
export function quantityText(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  return `${figure(kind, si, system, digits)} ${unitLabel(kind, system)}`;
}

/** A signed difference in the user's units, e.g. "+1.2 psi" (affine temperatures use the size of a degree). */
export function deltaText(kind: QuantityKind, siDelta: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  const size = kind === "temperature" ? (unitLabel(kind, system) === "°F" ? siDelta * 1.8 : siDelta) : formatQuantity(kind, siDelta, system).value;
  const rounded = Number(size.toFixed(digits));
  const sign = rounded > 0 ? "+" : rounded < 0 ? "−" : "±";
  return `${sign}${Math.abs(rounded).toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits })} ${unitLabel(kind, system)}`;
}

/** A fraction as a percentage, e.g. 0.853 → "85 %". */
export function percentText(fraction: number, digits = 0): string {
  return `${(fraction * 100).toFixed(digits)} %`;
}
