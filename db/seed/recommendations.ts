// One demo recommendation: the small-block street build with the smaller blower pulley, written
// by the demo salesperson for the (invented) customer, still a draft. Added only when that
// combination has no sheet yet.
import { eq } from "drizzle-orm";
import type { Db } from "../connect";
import { createRecommendation } from "../repo/recommendations";
import { recommendations } from "../schema";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";
import { demoPartNumber } from "./shelf";

export async function seedRecommendations(db: Db, people: DemoUsers, combos: DemoCombinations) {
  const [existing] = await db.select({ id: recommendations.id }).from(recommendations).where(eq(recommendations.combinationId, combos.smallBlock)).limit(1);
  if (existing) return;
  await createRecommendation(db, people.sales, {
    combinationId: combos.smallBlock,
    title: "A smaller blower pulley for the street small-block",
    targetRpm: 5500,
    customerName: "Jordan Example",
    customerEmail: "jordan@example.com",
    vehicleNotes: "Street car, pump fuel, weekend use. Heads and cam already done.",
    blowerPulleyDiameter: 3.1 * 0.0254,
    parts: [
      { partNumber: demoPartNumber("blower", 3.1, 8), description: "Blower pulley", unitPrice: "0.00", quantity: 1 },
      { partNumber: null, description: "Belt, 8-rib (length to suit)", unitPrice: "38.50", quantity: 1 },
      { partNumber: null, description: "Fitting and dyno check, 2 h", unitPrice: "120.00", quantity: 2 },
    ],
    notes: "Book a dyno session with wideband and knock monitoring before the first hard run.",
  });
}
