"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { endAllSessions, setUnitSystem } from "@/db/repo/users";

const schema = z.object({ unitSystem: z.enum(["imperial", "metric"], { error: "Units must be imperial or metric." }) });

/** Saves the user's choice of units (imperial or metric), used on every screen. */
export async function saveUnitSystem(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    const { unitSystem } = schema.parse(formFields(form));
    await setUnitSystem(getDb(), actor, unitSystem);
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
