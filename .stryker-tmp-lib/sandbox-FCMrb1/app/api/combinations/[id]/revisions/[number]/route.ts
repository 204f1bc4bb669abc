// @ts-nocheck
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getRevision } from "@/db/repo/combinations";
import { revisionNumberSchema, type RevisionContext } from "../../../_shared";

export const dynamic = "force-dynamic";

export const GET = route<RevisionContext>(async (_req, ctx) => {
  const actor = await requireActor();
  const { id, number } = await ctx.params;
  return getRevision(getDb(), actor, id, revisionNumberSchema.parse(number));
});
