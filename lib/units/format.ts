// Display rounding for quantities in the user's units. Pure: used by the planner, the charts,
// side by side and their tests, so the figure on screen and the figure a test expects agree.
import { formatQuantity, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";

/** Decimal places shown per kind and system: enough to see a 0.1 in pulley change, no noise. */
const DIGITS: Record<QuantityKind, Record<UnitSystem, number>> = {
  "length-small": { imperial: 2, metric: 1 },
  altitude: { imperial: 0, metric: 0 },
  displacement: { imperial: 0, metric: 2 },
  "blower-displacement": { imperial: 0, metric: 2 },
  pressure: { imperial: 1, metric: 1 },
  temperature: { imperial: 0, metric: 0 },
  power: { imperial: 0, metric: 0 },
  torque: { imperial: 0, metric: 0 },
  airflow: { imperial: 0, metric: 1 },
  speed: { imperial: 0, metric: 0 },
  "fuel-flow": { imperial: 0, metric: 0 },
  "injector-flow": { imperial: 0, metric: 0 },
  bsfc: { imperial: 2, metric: 0 },
};

/** Decimal places shown for a kind in a system. */
export function digitsOf(kind: QuantityKind, system: UnitSystem): number {
  return DIGITS[kind][system];
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
  const size = kind === "temperature" ? (system === "imperial" ? siDelta * 1.8 : siDelta) : formatQuantity(kind, siDelta, system).value;
  const rounded = Number(size.toFixed(digits));
  const sign = rounded > 0 ? "+" : rounded < 0 ? "−" : "±";
  return `${sign}${Math.abs(rounded).toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits })} ${unitLabel(kind, system)}`;
}

/** A fraction as a percentage, e.g. 0.853 → "85 %". */
export function percentText(fraction: number, digits = 0): string {
  return `${(fraction * 100).toFixed(digits)} %`;
}
