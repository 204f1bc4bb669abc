// @ts-nocheck
"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { act } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { restoreRevision } from "@/db/repo/combinations";

const input = z.object({
  id: z.string().min(1).max(64),
  number: z.number().int().min(1),
  baseRevision: z.number().int().min(1),
});

/** Brings back an old revision as the newest one; refused (409) if someone saved after `baseRevision`. */
export async function restoreRevisionAction(id: string, number: number, baseRevision: number): Promise<ActionState<{ revision: number }>> {
  return act(async () => {
    const actor = await requireActor();
    const v = input.parse({ id, number, baseRevision });
    const row = await restoreRevision(getDb(), actor, v.id, v.number, v.baseRevision);
    revalidatePath(`/combinations/${v.id}`, "layout");
    revalidatePath("/combinations");
    return { revision: row.revision };
  });
}
