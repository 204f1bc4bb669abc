// @ts-nocheck
"use server";
// The accounts table's changes. Admin only (checked here and again in the repository); an admin
// cannot demote or disable themselves, so the shop never loses its last admin by accident.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { updateUserAccess, userAccessSchema } from "@/db/repo/users";

const userId = z.string().min(1).max(64);

export async function setUserRoleAction(id: string, _prev: ActionState | undefined, form: FormData): Promise<ActionState<{ role: string }>> {
  return act(async () => {
    const actor = await requireActor(["admin"]);
    const u = await updateUserAccess(getDb(), actor, userId.parse(id), userAccessSchema.parse({ role: formFields(form).role ?? undefined }));
    revalidatePath("/admin/users");
    return { role: u.role };
  });
}

export async function setUserDisabledAction(id: string, disabled: boolean): Promise<ActionState<{ disabled: boolean }>> {
  return act(async () => {
    const actor = await requireActor(["admin"]);
    const u = await updateUserAccess(getDb(), actor, userId.parse(id), { disabled: z.boolean().parse(disabled) });
    revalidatePath("/admin/users");
    return { disabled: u.disabled };
  });
}
