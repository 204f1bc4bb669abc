// @ts-nocheck
// Change one account's role or disable/enable it (admin only; never your own admin access).
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { updateUserAccess, userAccessSchema } from "@/db/repo/users";

export const dynamic = "force-dynamic";

export const PATCH = route<{ params: Promise<{ id: string }> }>(async (req, ctx) => {
  const actor = await requireActor(["admin"]);
  const { id } = await ctx.params;
  const u = await updateUserAccess(getDb(), actor, id, await parseJson(req, userAccessSchema));
  return { id: u.id, email: u.email, name: u.name, role: u.role, disabled: u.disabled };
});
