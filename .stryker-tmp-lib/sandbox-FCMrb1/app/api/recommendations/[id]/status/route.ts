// @ts-nocheck
import { route, parseJson } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { setRecommendationStatus } from "@/db/repo/recommendations";
import { statusChangeSchema } from "@/lib/recommendations/rules";

type Ctx = { params: Promise<{ id: string }> };

/** Sets a sheet back to draft, or records the customer's answer (accepted or declined). */
export const POST = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const rec = await setRecommendationStatus(getDb(), actor, id, await parseJson(req, statusChangeSchema));
  return { id: rec.id, status: rec.status };
});
