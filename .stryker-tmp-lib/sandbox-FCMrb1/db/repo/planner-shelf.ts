// @ts-nocheck
import "server-only";
// The parts shelf as the planner needs it: blower pulleys and blowers with stock and price.
// A small read of its own, straight from the tables, so the planner does not wait on the
// shelf's own module. Everyone signed in may see the shelf (db/policy.ts canSeeShelf).
import { asc, eq } from "drizzle-orm";
import type { DbOrTx } from "@/db/connect";
import { assert, canSeeShelf, type Actor } from "@/db/policy";
import { blowers, pulleys } from "@/db/schema";
import type { Shelf } from "@/lib/planner/compute";

export async function readPlannerShelf(db: DbOrTx, actor: Actor): Promise<Shelf> {
  assert(canSeeShelf(actor));
  const [blowerPulleys, blowerRows] = await Promise.all([
    db
      .select({ id: pulleys.id, partNumber: pulleys.partNumber, diameter: pulleys.diameter, ribCount: pulleys.ribCount, price: pulleys.price, stock: pulleys.stock })
      .from(pulleys)
      .where(eq(pulleys.position, "blower"))
      .orderBy(asc(pulleys.diameter)),
    db
      .select({
        id: blowers.id,
        partNumber: blowers.partNumber,
        name: blowers.name,
        kind: blowers.kind,
        displacementPerRev: blowers.displacementPerRev,
        builtInVolumeRatio: blowers.builtInVolumeRatio,
        maxRpm: blowers.maxRpm,
        volumetricEfficiencyRef: blowers.volumetricEfficiencyRef,
        referenceRpm: blowers.referenceRpm,
        internalEfficiency: blowers.internalEfficiency,
        mechanicalEfficiency: blowers.mechanicalEfficiency,
        price: blowers.price,
        stock: blowers.stock,
      })
      .from(blowers)
      .orderBy(asc(blowers.name)),
  ]);
  return { blowerPulleys, blowers: blowerRows };
}
