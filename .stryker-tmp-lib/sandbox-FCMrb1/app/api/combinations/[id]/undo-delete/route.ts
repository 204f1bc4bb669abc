// @ts-nocheck
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { undoDelete } from "@/db/repo/combinations";
import type { IdContext } from "../../_shared";

export const dynamic = "force-dynamic";

/** Brings a combination back from the bin. */
export const POST = route<IdContext>(async (_req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  return undoDelete(getDb(), actor, id);
});
