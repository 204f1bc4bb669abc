// @ts-nocheck
// One demo recommendation: the work truck's smaller blower pulley after its first datalog, written
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
  const [existing] = await db.select({ id: recommendations.id }).from(recommendations).where(eq(recommendations.combinationId, combos.workTruck)).limit(1);
  if (existing) return;
  await createRecommendation(db, people.sales, {
    combinationId: combos.workTruck,
    title: "A smaller blower pulley for the work truck",
    targetRpm: 4500,
    customerName: "Riley Example",
    customerEmail: "riley@example.com",
    vehicleNotes: "Work truck, pump fuel, tows a trailer most weeks. The first dyno log read below the prediction.",
    blowerPulleyDiameter: 3.0 * 0.0254,
    parts: [
      { partNumber: demoPartNumber("blower", 3.0, 8), description: "Blower pulley", unitPrice: "0.00", quantity: 1 },
      { partNumber: null, description: "Belt, 8-rib (length to suit)", unitPrice: "38.50", quantity: 1 },
      { partNumber: null, description: "Fitting and dyno check, 2 h", unitPrice: "120.00", quantity: 2 },
    ],
    notes: "Book a dyno session with wideband and knock monitoring before the first hard run, and a second log to confirm the new pulley before towing.",
  });
}
