// @ts-nocheck
import { and, eq } from "drizzle-orm";
import type { Db } from "../connect";
import { toActor } from "../repo/users";
import type { Actor } from "../policy";
import { createCombination, saveCombination } from "../repo/combinations";
import { combinations, users } from "../schema";
import type { CombinationInput } from "@/calc";
import {
  bigInchIntercooled,
  bigInchLargerInjectors,
  bigInchTwinScrew,
  roadCarFour,
  roadCarFourAtAltitude,
  vintageV8Cam,
  vintageV8DrawThrough,
  workTruckV6,
  workTruckV6SmallerPulley,
} from "@/lib/combinations/demo-specs";
import type { DemoUsers } from "./index";

/** Names of the demo combinations, which tests and the README refer to. */
export const DEMO_COMBINATION_NAMES = {
  workTruck: "Work truck V6 4.3 L, Roots",
  bigInch: "Big-inch V8 7.4 L, twin-screw",
  vintage: "Vintage V8 5.7 L, draw-through Roots",
  memberCar: "My road car, 2.4 L four",
} as const;

/** Ids of the demo combinations, by role in the scenario. */
export type DemoCombinations = Record<keyof typeof DEMO_COMBINATION_NAMES, string>;

type Story = { customerName?: string; customerContact?: string; revisions: readonly [CombinationInput, string][] };

/** The shop's (or member's) combination with its history, added once by owner and name. */
async function ensure(db: Db, owner: Actor, name: string, story: Story, isDemo: boolean) {
  const [existing] = await db.select({ id: combinations.id }).from(combinations).where(and(eq(combinations.ownerId, owner.id), eq(combinations.name, name)));
  if (existing) return existing.id;
  const [[first, firstNote], ...rest] = story.revisions;
  const c = await createCombination(db, owner, { name, spec: first, customerName: story.customerName, customerContact: story.customerContact, note: firstNote }, { isDemo });
  let revision = 1;
  for (const [spec, note] of rest) await saveCombination(db, owner, c.id, { spec, baseRevision: revision++, note });
  return c.id;
}

export async function seedCombinations(db: Db, people: DemoUsers): Promise<DemoCombinations> {
  const [tunerRow] = await db.select().from(users).where(eq(users.id, people.tuner.id));
  const [memberRow] = await db.select().from(users).where(eq(users.id, people.member.id));
  const tuner = toActor(tunerRow);
  const member = toActor(memberRow);
  const N = DEMO_COMBINATION_NAMES;

  // A datalog showed less boost than the catalogue promised; the smaller pulley wins it back.
  const workTruck = await ensure(db, tuner, N.workTruck, {
    customerName: "Riley Example",
    customerContact: "riley@example.com",
    revisions: [
      [workTruckV6, "As it came in: 3.4 in blower pulley, catalogue blower figures"],
      [workTruckV6SmallerPulley, "3.0 in blower pulley after the first dyno log read low"],
    ],
  }, true);
  // Hot charge and high injector duty: an intercooler first, then larger injectors.
  const bigInch = await ensure(db, tuner, N.bigInch, {
    customerName: "Casey Example",
    customerContact: "casey@example.com",
    revisions: [
      [bigInchTwinScrew, "Twin-screw without an intercooler"],
      [bigInchIntercooled, "Air-to-water intercooler added"],
      [bigInchLargerInjectors, "Larger injectors for the top end"],
    ],
  }, true);
  // Same blower and pulleys, a cam that breathes better from the middle up.
  const vintage = await ensure(db, tuner, N.vintage, {
    customerName: "Avery Example",
    customerContact: "avery@example.com",
    revisions: [
      [vintageV8DrawThrough, "As restored, original mild cam"],
      [vintageV8Cam, "Cam-only change, same blower and pulleys"],
    ],
  }, true);
  // The member's own car, before and after moving to 1,600 m.
  const memberCar = await ensure(db, member, N.memberCar, {
    revisions: [
      [roadCarFour, "At sea level, as bought"],
      [roadCarFourAtAltitude, "Moved to 1,600 m"],
    ],
  }, false);
  return { workTruck, bigInch, vintage, memberCar };
}
