// A combination's spec as rows people can read (in their units), and the fields that differ
// between two specs. Pure: used by the revisions page on the server and by tests.
import { formatQuantity, type Combination, type CombinationInput, type UnitSystem } from "@/calc";
import { SPEC_FIELDS, valueAt as at, type SpecField } from "./field-table";

type Spec = Combination | CombinationInput;

const num = (v: number, digits: number) => v.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** One value as text in the user's units ("—" when absent, e.g. no intercooler). */
export function showValue(def: SpecField, value: unknown, system: UnitSystem): string {
  if (value === undefined || value === null) return def.absent ?? "—";
  const s = def.quantity;
  if (s === "text") return String(value);
  if (s === "count") return typeof value === "number" ? num(value, 0) : String(value);
  if (s === "percent") return typeof value === "number" ? `${num(value * 100, 1)} %` : String(value);
  if (s === "ve-curve") {
    if (!Array.isArray(value)) return String(value);
    return value.map((p: { rpm: number; ve: number }) => `${num(p.rpm, 0)} rpm: ${num(p.ve * 100, 0)} %`).join(", ");
  }
  if (typeof value !== "number") return String(value);
  if (s === "plain") return num(value, def.digits ?? 0);
  const q = formatQuantity(s, value, system);
  return `${num(q.value, def.digits ?? 0)} ${q.unit}`;
}

export type SpecRow = { path: string; label: string; value: string };

/** Every field of a spec as a readable row. */
export function specRows(spec: Spec, system: UnitSystem): SpecRow[] {
  return SPEC_FIELDS.map((d) => ({ path: d.path, label: d.label, value: showValue(d, at(spec, d.path), system) }));
}

export type SpecChange = { path: string; label: string; before: string; after: string };

/**
 * The fields that differ between two specs, old → new. Compared on the stored SI values (so a
 * change too small to show in the rounded figures is still listed), shown in the user's units.
 */
export function specChanges(before: Spec, after: Spec, system: UnitSystem): SpecChange[] {
  const out: SpecChange[] = [];
  for (const d of SPEC_FIELDS) {
    const a = at(before, d.path);
    const b = at(after, d.path);
    if (JSON.stringify(a ?? null) !== JSON.stringify(b ?? null)) {
      out.push({ path: d.path, label: d.label, before: showValue(d, a, system), after: showValue(d, b, system) });
    }
  }
  return out;
}
