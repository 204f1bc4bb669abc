// @ts-nocheck
import { route, parseJson } from "@/app/_lib/http";
import { currentUnits, requireActor } from "@/app/_lib/session";
import { sentVersionLink } from "@/app/_lib/share-url";
import { getDb } from "@/db/client";
import { getRecommendation, updateRecommendation } from "@/db/repo/recommendations";
import { getLatestSentVersion } from "@/db/repo/sheet-versions";
import { updateRecommendationSchema } from "@/lib/recommendations/rules";

const STAFF = ["sales", "tuner", "admin"] as const;
type Ctx = { params: Promise<{ id: string }> };

/** One sheet; once sent, `shareUrl` is the customer's link to the newest version (null before, or when revoked). */
export const GET = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(STAFF);
  const { id } = await params;
  const db = getDb();
  const rec = await getRecommendation(db, actor, id);
  const version = await getLatestSentVersion(db, actor, id);
  const unitSystem = await currentUnits();
  return { ...rec, shareUrl: version ? sentVersionLink(version, unitSystem).url : null };
});

/** Edits a draft sheet (409 once it was sent: set it back to draft first). */
export const PUT = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(STAFF);
  const { id } = await params;
  const rec = await updateRecommendation(getDb(), actor, id, await parseJson(req, updateRecommendationSchema));
  return { id: rec.id, status: rec.status, total: rec.total };
});
