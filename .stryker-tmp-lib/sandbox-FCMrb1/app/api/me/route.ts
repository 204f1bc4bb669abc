// @ts-nocheck
// Who the caller is right now (read fresh from the database: a role change shows at once), and
// their units: GET reads them, PATCH sets a preset and optionally a unit per quantity kind.
import { parseJson, route } from "@/app/_lib/http";
import { getCurrentUser, requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { setUnitPreferences } from "@/db/repo/users";
import type { Actor } from "@/db/policy";
import { resolveUnits } from "@/calc";
import { toPreferences, unitPreferencesSchema } from "@/lib/units/person";

export const dynamic = "force-dynamic";

type Prefs = { unitSystem: "imperial" | "metric"; unitChoices: Record<string, string> | null };

const answer = (actor: Actor, p: Prefs) => ({ id: actor.id, email: actor.email, name: actor.name, role: actor.role, unitSystem: p.unitSystem, units: resolveUnits(p.unitSystem, p.unitChoices) });

export const GET = route(async () => {
  const actor = await requireActor();
  const u = await getCurrentUser();
  return answer(actor, { unitSystem: u?.unitSystem ?? "imperial", unitChoices: u?.unitChoices ?? null });
});

export const PATCH = route(async (req) => {
  const actor = await requireActor();
  const body = await parseJson(req, unitPreferencesSchema);
  const prefs = toPreferences(resolveUnits(body.unitSystem, body.units), body.unitSystem);
  await setUnitPreferences(getDb(), actor, prefs);
  return answer(actor, prefs);
});
