// @ts-nocheck
// The accounts table for admins (the /admin/users page reads it through server code; this is its JSON twin).
import { parseQuery, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { listUsers, listUsersQuerySchema } from "@/db/repo/users";

export const dynamic = "force-dynamic";

export const GET = route(async (req) => {
  const actor = await requireActor(["admin"]);
  return listUsers(getDb(), actor, parseQuery(req, listUsersQuerySchema));
});
