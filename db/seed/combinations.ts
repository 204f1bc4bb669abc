import { and, eq } from "drizzle-orm";
import type { Db } from "../connect";
import { toActor } from "../repo/users";
import { createCombination, saveCombination } from "../repo/combinations";
import { combinations, users } from "../schema";
import { bigBlockTwinScrew, fourCylinderRoots, smallBlockBaseline, smallBlockHeadsCam, smallBlockSmallerPulley } from "@/lib/combinations/demo-specs";
import type { DemoUsers } from "./index";

/** Ids of the demo combinations, by role in the scenario. */
export type DemoCombinations = { smallBlock: string; bigBlock: string; fourCylinder: string; memberCar: string };

async function ensure(db: Db, ownerId: string, name: string, make: () => Promise<{ id: string }>) {
  const [existing] = await db.select({ id: combinations.id }).from(combinations).where(and(eq(combinations.ownerId, ownerId), eq(combinations.name, name)));
  return existing ? existing.id : (await make()).id;
}

export async function seedCombinations(db: Db, people: DemoUsers): Promise<DemoCombinations> {
  const [tunerRow] = await db.select().from(users).where(eq(users.id, people.tuner.id));
  const [memberRow] = await db.select().from(users).where(eq(users.id, people.member.id));
  const tuner = toActor(tunerRow);
  const member = toActor(memberRow);

  // Three revisions: baseline, heads and cam (boost falls), smaller pulley (boost rises again).
  const smallBlock = await ensure(db, tuner.id, "Small-block 5.0 L street build", async () => {
    const c = await createCombination(
      db,
      tuner,
      { name: "Small-block 5.0 L street build", spec: smallBlockBaseline, customerName: "Jordan Example", customerContact: "jordan@example.com", note: "Baseline as it came in" },
      { isDemo: true },
    );
    await saveCombination(db, tuner, c.id, { spec: smallBlockHeadsCam, baseRevision: 1, note: "Ported heads and bigger cam" });
    await saveCombination(db, tuner, c.id, { spec: smallBlockSmallerPulley, baseRevision: 2, note: "Smaller blower pulley" });
    return c;
  });
  const bigBlock = await ensure(db, tuner.id, "Big V8 7.0 L twin-screw, intercooled", () =>
    createCombination(db, tuner, { name: "Big V8 7.0 L twin-screw, intercooled", spec: bigBlockTwinScrew, note: "Shop example" }, { isDemo: true }),
  );
  const fourCylinder = await ensure(db, tuner.id, "Four-cylinder 2.0 L Roots", () =>
    createCombination(db, tuner, { name: "Four-cylinder 2.0 L Roots", spec: fourCylinderRoots, note: "Shop example" }, { isDemo: true }),
  );
  const memberCar = await ensure(db, member.id, "My weekend small-block", () =>
    createCombination(db, member, { name: "My weekend small-block", spec: smallBlockBaseline, note: "As bought" }),
  );
  return { smallBlock, bigBlock, fourCylinder, memberCar };
}
