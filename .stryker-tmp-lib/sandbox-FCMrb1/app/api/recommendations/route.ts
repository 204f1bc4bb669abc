// @ts-nocheck
import { route, parseJson, parseQuery } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createRecommendation, listRecommendations } from "@/db/repo/recommendations";
import { recommendationInputSchema, recommendationListQuerySchema } from "@/lib/recommendations/rules";

const STAFF = ["sales", "tuner", "admin"] as const;

/** The shop's recommendation sheets, newest first (search by customer or combination, filter by status). */
export const GET = route(async (req) => {
  const actor = await requireActor(STAFF);
  return listRecommendations(getDb(), actor, parseQuery(req, recommendationListQuerySchema));
});

/** A new draft sheet from a combination; the server copies the spec and prices the parts. */
export const POST = route(async (req) => {
  const actor = await requireActor(STAFF);
  const rec = await createRecommendation(getDb(), actor, await parseJson(req, recommendationInputSchema));
  return Response.json({ id: rec.id, status: rec.status, total: rec.total }, { status: 201 });
});
