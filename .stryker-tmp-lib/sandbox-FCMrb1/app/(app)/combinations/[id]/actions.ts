// @ts-nocheck
"use server";
// Mutations of the planner. Each starts with the session check; the repository checks that the
// actor may write this combination and that nobody saved since the edit began (409).
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { act } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { duplicateCombination, saveCombination } from "@/db/repo/combinations";
import { setUnitPreferences } from "@/db/repo/users";
import { toPreferences, unitsParamSchema } from "@/lib/units/person";

/** Saves the planner's spec as a new revision; `id` is bound on the server. */
export async function saveRevision(
  id: string,
  input: { spec: unknown; note: string; baseRevision: number },
): Promise<ActionState<{ revision: number }>> {
  return act(async () => {
    const actor = await requireActor();
    // saveCombination validates spec, note and baseRevision with its zod schema (400 naming the field).
    const row = await saveCombination(getDb(), actor, id, {
      spec: input?.spec as never,
      note: typeof input?.note === "string" ? input.note : null,
      baseRevision: input?.baseRevision,
    });
    revalidatePath(`/combinations/${id}`);
    revalidatePath("/combinations");
    return { revision: row.revision };
  });
}

/** A copy the viewer owns, opened in the planner. */
export async function duplicateToEdit(id: string): Promise<ActionState> {
  const state = await act(async () => {
    const actor = await requireActor();
    return duplicateCombination(getDb(), actor, id);
  });
  if (!state.ok) return state;
  const row = state.data as { id: string };
  revalidatePath("/combinations");
  redirect(`/combinations/${row.id}`);
}

/** Remembers the user's choice of units from the planner's switch (a preset, or their own mix back). */
export async function savePlannerUnits(units: string): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    const chosen = unitsParamSchema.parse(units);
    await setUnitPreferences(getDb(), actor, toPreferences(chosen));
  });
}
