import { route, parseJson } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getRecommendation, updateRecommendation } from "@/db/repo/recommendations";
import { updateRecommendationSchema } from "@/lib/recommendations/rules";

const STAFF = ["sales", "tuner", "admin"] as const;
type Ctx = { params: Promise<{ id: string }> };

export const GET = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(STAFF);
  const { id } = await params;
  return getRecommendation(getDb(), actor, id);
});

/** Edits a draft sheet (409 once it was sent: set it back to draft first). */
export const PUT = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(STAFF);
  const { id } = await params;
  const rec = await updateRecommendation(getDb(), actor, id, await parseJson(req, updateRecommendationSchema));
  return { id: rec.id, status: rec.status, total: rec.total };
});
