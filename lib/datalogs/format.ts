// Figures of the datalog pages in the user's units (boost gauge, temperatures, pulley sizes).
import { fromSI, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";
import { digitsOf } from "@/lib/units/format";

/** Logged boost reads to a hundredth of a psi; everything else as the planner shows it. */
export const logDigits = (kind: QuantityKind, system: UnitSystem) => (unitLabel(kind, system) === "psi" ? 2 : digitsOf(kind, system));

/** A SI value as text in the user's units, without the unit ("—" for null). */
export function fig(kind: QuantityKind, si: number | null, system: UnitSystem, digits = logDigits(kind, system)): string {
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
