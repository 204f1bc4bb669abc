import "server-only";
// What the recommendation form needs from the shelf: the blower pulleys (ladder and finder) and
// every part as a parts-list choice.
import type { DbOrTx } from "@/db/connect";
import type { Actor } from "@/db/policy";
import { listBlowerPulleys, listShelfParts } from "@/db/repo/shelf";
import type { ShelfPulley } from "@/components/recommendation/pulley-help";
import type { ShelfPart } from "@/components/recommendation/recommendation-form";

export async function loadShelfForForm(db: DbOrTx, actor: Actor): Promise<{ pulleys: ShelfPulley[]; parts: ShelfPart[] }> {
  const [blowerPulleys, parts] = await Promise.all([listBlowerPulleys(db, actor), listShelfParts(db, actor)]);
  return {
    pulleys: blowerPulleys.map((p) => ({ partNumber: p.partNumber, diameter: p.diameter, ribCount: p.ribCount, price: p.price, stock: p.stock, minBeltDiameter: p.minBeltDiameter })),
    parts,
  };
}
