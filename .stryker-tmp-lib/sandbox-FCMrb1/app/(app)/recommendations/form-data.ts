// @ts-nocheck
import "server-only";
// What the recommendation form needs from the shelf: the blower pulleys (ladder and finder) and
// every part as a parts-list choice.
import type { DbOrTx } from "@/db/connect";
import type { Actor } from "@/db/policy";
import { readPlannerShelf } from "@/db/repo/planner-shelf";
import { listShelfParts } from "@/db/repo/shelf";
import type { ShelfPart } from "@/components/recommendation/recommendation-form";
import type { ShelfPulley } from "@/lib/planner/compute";

export async function loadShelfForForm(db: DbOrTx, actor: Actor): Promise<{ pulleys: ShelfPulley[]; parts: ShelfPart[] }> {
  // The same shelf read as the planner's, so the ladder and finder see the same pulleys.
  const [shelf, parts] = await Promise.all([readPlannerShelf(db, actor), listShelfParts(db, actor)]);
  return { pulleys: shelf.blowerPulleys, parts };
}
