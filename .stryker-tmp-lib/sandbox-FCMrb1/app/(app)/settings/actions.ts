// @ts-nocheck
"use server";
import { revalidatePath } from "next/cache";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { endAllSessions, setUnitPreferences } from "@/db/repo/users";
import { resolveUnits } from "@/calc";
import { toPreferences, unitPreferencesSchema } from "@/lib/units/person";

/** The form's "units.<kind>" fields folded into the shape /api/me takes. */
function unitFields(fields: Record<string, unknown>) {
  const units: Record<string, unknown> = {};
  const rest: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(fields)) {
    if (k.startsWith("units.")) units[k.slice("units.".length)] = v;
    else rest[k] = v;
  }
  return { ...rest, units };
}

/** Saves the person's units (a preset and a unit per kind), used on every screen. */
export async function saveUnitPreferences(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    const body = unitPreferencesSchema.parse(unitFields(formFields(form)));
    await setUnitPreferences(getDb(), actor, toPreferences(resolveUnits(body.unitSystem, body.units), body.unitSystem));
    revalidatePath("/", "layout");
  });
}

/** Ends every session of the account, this one included ("sign out everywhere"). */
export async function signOutEverywhere(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    formFields(form);
    await endAllSessions(getDb(), actor.id);
  });
}
