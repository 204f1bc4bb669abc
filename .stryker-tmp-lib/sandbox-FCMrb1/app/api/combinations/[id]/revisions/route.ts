// @ts-nocheck
// A combination's history: list its revisions, or restore one (saved as the newest revision).
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { listRevisions, restoreRevision, restoreRevisionSchema } from "@/db/repo/combinations";
import type { IdContext } from "../../_shared";

export const dynamic = "force-dynamic";

export const GET = route<IdContext>(async (_req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  const items = await listRevisions(getDb(), actor, id);
  return { items };
});

export const POST = route<IdContext>(async (req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  const body = await parseJson(req, restoreRevisionSchema);
  return restoreRevision(getDb(), actor, id, body.number, body.baseRevision);
});
