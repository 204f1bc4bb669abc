// Figures of the datalog pages in the user's units (boost gauge, temperatures, pulley sizes).
import { fromSI, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";

const DIGITS: Partial<Record<QuantityKind, Record<UnitSystem, number>>> = {
  pressure: { imperial: 2, metric: 1 },
  temperature: { imperial: 0, metric: 0 },
  "length-small": { imperial: 2, metric: 1 },
  speed: { imperial: 0, metric: 0 },
};

/** A SI value as text in the user's units, without the unit ("—" for null). */
export function fig(kind: QuantityKind, si: number | null, system: UnitSystem, digits = DIGITS[kind]?.[system] ?? 1): string {
  if (si === null || !Number.isFinite(si)) return "—";
  return fromSI(kind, si, system).toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });
}

/** The same with its unit, e.g. "7.42 psi". */
export function withUnit(kind: QuantityKind, si: number | null, system: UnitSystem, digits?: number): string {
  const f = fig(kind, si, system, digits);
  return f === "—" ? f : `${f} ${unitLabel(kind, system)}`;
}

export const rpmText = (rpm: number) => Math.round(rpm).toLocaleString("en-US");

/** Okabe–Ito colours in their order (colour-blind safe). */
export const PALETTE = ["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000"] as const;
