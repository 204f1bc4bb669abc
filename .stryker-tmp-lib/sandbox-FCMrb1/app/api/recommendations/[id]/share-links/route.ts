// @ts-nocheck
// Stops every share link sent so far for one sheet (sales, tuners, admin).
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { revokeShareLinks } from "@/db/repo/recommendations";

type Ctx = { params: Promise<{ id: string }> };

export const DELETE = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  return revokeShareLinks(getDb(), actor, id);
});
