// The person's units: a preset plus a unit per quantity kind where they depart from it, as
// stored on users (unit_system, unit_choices) and as carried in links and forms.
import { z } from "zod";
import { QUANTITY_KINDS, nearestPreset, presetOf, resolveUnits, unitChoices, unitsFromParam, UNIT_PRESETS, type QuantityKind, type UnitPreset, type Units, type UnitSystem } from "@/calc";

/** The stored shape: the preset and the per-kind departures from it. */
export type UnitPreferences = { unitSystem: UnitPreset; unitChoices: Readonly<Record<string, string>> | null };

/** A person's units as one record per kind (what every display helper accepts). */
export function personUnits(u: UnitPreferences): UnitSystem {
  const units = resolveUnits(u.unitSystem, u.unitChoices);
  return presetOf(units) ?? units;
}

/** How a choice is named in messages: a preset's name, else "your own units". */
export function unitsName(system: UnitSystem): string {
  return presetOf(system) ?? "your own units";
}

/** What each kind is called on the settings page. */
export const KIND_NAMES: Readonly<Record<QuantityKind, string>> = {
  "length-small": "Pulleys and small lengths",
  altitude: "Altitude",
  displacement: "Engine displacement",
  "blower-displacement": "Blower displacement",
  pressure: "Pressure (boost, barometer)",
  temperature: "Temperature",
  power: "Power",
  torque: "Torque",
  airflow: "Airflow",
  speed: "Engine and blower speed",
  "fuel-flow": "Fuel flow",
  "injector-flow": "Injector flow",
  bsfc: "Fuel consumption (BSFC)",
};

/** Kinds a person may choose (those with more than one unit). */
export const CHOOSABLE_KINDS: readonly QuantityKind[] = QUANTITY_KINDS.filter((k) => unitChoices(k).length > 1);

/** A choice as what is stored: a preset (given, else the nearest) and only the kinds that differ from it. */
export function toPreferences(system: UnitSystem, preset: UnitPreset = nearestPreset(system)): { unitSystem: UnitPreset; unitChoices: Record<string, string> } {
  const units: Units = typeof system === "string" ? UNIT_PRESETS[system] : system;
  const choices: Record<string, string> = {};
  for (const k of QUANTITY_KINDS) if (units[k] !== UNIT_PRESETS[preset][k]) choices[k] = units[k];
  return { unitSystem: preset, unitChoices: choices };
}

const kindSchema = (k: QuantityKind) => {
  const ids = unitChoices(k).map((u) => u.id) as [string, ...string[]];
  return z.enum(ids, { error: `${k} must be one of ${ids.join(", ")}` }).optional();
};

/** What /api/me and the settings form accept: a preset, and optionally a unit per kind. */
export const unitPreferencesSchema = z
  .object({
    unitSystem: z.enum(["imperial", "metric"], { error: "unitSystem must be imperial or metric" }),
    units: z.object(Object.fromEntries(QUANTITY_KINDS.map((k) => [k, kindSchema(k)])), { error: "units must be an object of unit ids per kind" }).strict().optional(),
  });

/** A units link or form parameter ("imperial", "metric~pressure.psi"), validated. */
export const unitsParamSchema = z
  .string({ error: "Units must be imperial or metric." })
  .max(400)
  .regex(/^(imperial|metric)(~[a-z-]+\.[A-Za-z0-9]+)*$/, { error: "Units must be imperial or metric." })
  .transform((p) => unitsFromParam(p));
