// A combination's spec as rows people can read (in their units), and the fields that differ
// between two specs. Pure: used by the revisions page on the server and by tests.
import { formatQuantity, type Combination, type CombinationInput, type QuantityKind, type UnitSystem } from "@/calc";

type Spec = Combination | CombinationInput;

type FieldDef = {
  /** Dotted path in the spec, as the API's field errors name it. */
  path: string;
  label: string;
  /** How to show the value: a quantity in the user's units, a percentage of a fraction, or as is. */
  show: { kind: QuantityKind; digits: number } | "percent" | "count" | "text" | "ve-curve" | { plain: number };
};

export const SPEC_FIELDS: readonly FieldDef[] = [
  { path: "engine.displacement", label: "Engine displacement", show: { kind: "displacement", digits: 2 } },
  { path: "engine.cylinders", label: "Cylinders", show: "count" },
  { path: "engine.redlineRpm", label: "Redline", show: { kind: "speed", digits: 0 } },
  { path: "engine.veCurve", label: "Volumetric efficiency curve", show: "ve-curve" },
  { path: "blower.kind", label: "Blower kind", show: "text" },
  { path: "blower.displacementPerRev", label: "Blower displacement", show: { kind: "blower-displacement", digits: 2 } },
  { path: "blower.builtInVolumeRatio", label: "Built-in volume ratio", show: { plain: 2 } },
  { path: "blower.maxRpm", label: "Blower speed limit", show: { kind: "speed", digits: 0 } },
  { path: "blower.volumetricEfficiencyRef", label: "Blower reference volumetric efficiency", show: "percent" },
  { path: "blower.referenceRpm", label: "Blower reference speed", show: { kind: "speed", digits: 0 } },
  { path: "blower.internalEfficiency", label: "Blower internal efficiency", show: "percent" },
  { path: "blower.mechanicalEfficiency", label: "Drive mechanical efficiency", show: "percent" },
  { path: "drive.crankPulleyDiameter", label: "Crank pulley diameter", show: { kind: "length-small", digits: 2 } },
  { path: "drive.blowerPulleyDiameter", label: "Blower pulley diameter", show: { kind: "length-small", digits: 2 } },
  { path: "drive.beltSlip", label: "Belt slip", show: "percent" },
  { path: "ambient.pressure", label: "Ambient pressure (absolute)", show: { kind: "pressure", digits: 1 } },
  { path: "ambient.temperature", label: "Ambient temperature", show: { kind: "temperature", digits: 0 } },
  { path: "ambient.inletLoss", label: "Inlet pressure loss", show: { kind: "pressure", digits: 2 } },
  { path: "intercooler.effectiveness", label: "Intercooler effectiveness", show: "percent" },
  { path: "intercooler.pressureDrop", label: "Intercooler pressure drop", show: { kind: "pressure", digits: 2 } },
  { path: "intercooler.coolantTemperature", label: "Intercooler coolant temperature", show: { kind: "temperature", digits: 0 } },
  { path: "fuel.afr", label: "Air-fuel ratio", show: { plain: 1 } },
  { path: "fuel.bsfc", label: "BSFC", show: { kind: "bsfc", digits: 2 } },
  { path: "fuel.injectorCount", label: "Injectors", show: "count" },
  { path: "fuel.injectorFlow", label: "Injector flow (each)", show: { kind: "injector-flow", digits: 0 } },
  { path: "fuel.maxDuty", label: "Maximum injector duty", show: "percent" },
  { path: "fuel.evaporatedBeforeBlower", label: "Fuel evaporated before the blower", show: "percent" },
];

function at(spec: Spec, path: string): unknown {
  let v: unknown = spec;
  for (const k of path.split(".")) v = v == null ? undefined : (v as Record<string, unknown>)[k];
  return v;
}

const num = (v: number, digits: number) => v.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** One value as text in the user's units ("—" when absent, e.g. no intercooler). */
export function showValue(def: FieldDef, value: unknown, system: UnitSystem): string {
  if (value === undefined || value === null) return def.path.startsWith("intercooler.") ? "no intercooler" : "—";
  const s = def.show;
  if (s === "text") return String(value);
  if (s === "count") return typeof value === "number" ? num(value, 0) : String(value);
  if (s === "percent") return typeof value === "number" ? `${num(value * 100, 1)} %` : String(value);
  if (s === "ve-curve") {
    if (!Array.isArray(value)) return String(value);
    return value.map((p: { rpm: number; ve: number }) => `${num(p.rpm, 0)} rpm: ${num(p.ve * 100, 0)} %`).join(", ");
  }
  if (typeof value !== "number") return String(value);
  if ("plain" in s) return num(value, s.plain);
  const q = formatQuantity(s.kind, value, system);
  return `${num(q.value, s.digits)} ${q.unit}`;
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
