// The step editor's drafts: what the form holds per item (strings, in the author's units) and how
// it becomes the API's input (SI), so the form and its tests share one conversion.
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import { localizeMessage } from "@/lib/combinations/form-model";
import { displayValue, quantityText } from "@/lib/units/format";
import { WHAT_IF_ALTITUDE_MAX, WHAT_IF_ALTITUDE_MIN, type ItemChange, type ItemChangeInput, type StepInput } from "./rules";

export type ChangeKind = "none" | ItemChange["kind"];
/** The what-if as typed: VE change in %, pulley in in/mm, intercooler effectiveness in %, altitude in ft/m. */
export type ChangeDraft = { kind: ChangeKind; value: string };
export type ItemDraft = { combinationId: string; revision: string; label: string; autoLabel: boolean; change: ChangeDraft };

export const NO_CHANGE: ChangeDraft = { kind: "none", value: "" };
export const blankItem = (): ItemDraft => ({ combinationId: "", revision: "current", label: "", autoLabel: true, change: NO_CHANGE });

/** What the value of each kind is typed in, and a value to start from. */
export const CHANGE_KINDS: Record<Exclude<ChangeKind, "none">, { label: string; unit: (s: UnitSystem) => string; start: (s: UnitSystem) => string }> = {
  ve: { label: "VE scaled by", unit: () => "% change, e.g. 8 or −5", start: () => "8" },
  pulley: { label: "Blower pulley diameter", unit: (s) => unitLabel("length-small", s), start: (s) => String(displayValue("length-small", 0.0711, s)) },
  intercooler: { label: "Intercooler added, effectiveness", unit: () => "%", start: () => "70" },
  altitude: { label: "Altitude", unit: (s) => unitLabel("altitude", s), start: (s) => String(Math.round(fromSI("altitude", 1524, s) / 100) * 100) },
};

/** A typed number ("−5" and "2,8" allowed), or NaN, which the schema refuses naming the field. */
function numberOf(text: string): number {
  return text.trim() === "" ? NaN : Number(text.trim().replace(/^[−–]/, "-").replace(",", "."));
}

/** The draft as the API's change (SI), or null for none. Bad numbers are left for the schema to name. */
export function changeInput(d: ChangeDraft, system: UnitSystem): ItemChangeInput | null {
  const v = numberOf(d.value);
  switch (d.kind) {
    case "ve":
      return { kind: "ve", scale: 1 + v / 100 };
    case "pulley":
      return { kind: "pulley", diameter: toSI("length-small", v, system) };
    case "intercooler":
      // Left empty: calc's default effectiveness.
      return { kind: "intercooler", effectiveness: d.value.trim() === "" ? undefined : v / 100 };
    case "altitude":
      return { kind: "altitude", altitude: toSI("altitude", v, system) };
    default:
      return null;
  }
}

/** A stored change back in the author's units, for editing. */
export function changeDraft(c: ItemChange | null | undefined, system: UnitSystem): ChangeDraft {
  if (!c) return NO_CHANGE;
  switch (c.kind) {
    case "ve":
      return { kind: "ve", value: String(Math.round((c.scale - 1) * 1000) / 10) };
    case "pulley":
      return { kind: "pulley", value: String(displayValue("length-small", c.diameter, system)) };
    case "intercooler":
      return { kind: "intercooler", value: String(Math.round(c.effectiveness * 100)) };
    case "altitude":
      return { kind: "altitude", value: String(Math.round(fromSI("altitude", c.altitude, system))) };
  }
}

/** The form's drafts as the API's step input. */
export function stepInput(title: string, items: ItemDraft[], series: StepInput["series"], note: string, system: UnitSystem): StepInput {
  return {
    title,
    items: items.map((it) => ({
      combinationId: it.combinationId,
      revision: it.revision === "current" ? "current" : Number(it.revision),
      label: it.label,
      change: changeInput(it.change, system),
    })),
    series,
    note,
  };
}

/**
 * The server's field errors for a step with the what-if limits in the author's units: the rules
 * state them in SI ("Altitude must be between -500 and 6000 m"), the boxes take ft or in.
 */
export function localizeStepErrors(errors: Record<string, string[]>, system: UnitSystem): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const [path, messages] of Object.entries(errors)) {
    if (/^items\.\d+\.change\.altitude$/.test(path)) {
      out[path] = messages.map(() => `Altitude must be between ${quantityText("altitude", WHAT_IF_ALTITUDE_MIN, system, 0)} and ${quantityText("altitude", WHAT_IF_ALTITUDE_MAX, system, 0)}.`);
    } else if (/^items\.\d+\.change\.diameter$/.test(path)) {
      out[path] = messages.map((m) => localizeMessage("drive.blowerPulleyDiameter", m.replace(/\.$/, ""), system));
    } else out[path] = messages;
  }
  return out;
}
