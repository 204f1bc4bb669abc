// @ts-nocheck
// What-if steps against a real database: a step stores a change per item in its JSON (no saved
// revision needed), the API's schema names a bad change's field, editing keeps or drops the
// change, a student's copy is the changed spec with a short name, and step titles are not numbered twice.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { combinationSchema, inToM } from "@/calc";
import { getCombination, getRevision } from "@/db/repo/combinations";
import { addStep, copyStepItem, createLesson, getLesson, joinLesson, listStepSources, updateLesson, updateStep } from "@/db/repo/lessons";
import { seedCombinations, type DemoCombinations } from "@/db/seed/combinations";
import type { DemoUsers } from "@/db/seed/index";
import { users } from "@/db/schema";
import { eq } from "drizzle-orm";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { applyWhatIf } from "@/lib/lessons/curves";
import { stepInputSchema } from "@/lib/lessons/rules";
import { freshDatabase, makeRoleUsers, makeUser, type TestDb } from "../support/db";

describe("what-if steps", () => {
  let t: TestDb;
  let people: DemoUsers;
  let combos: DemoCombinations;

  beforeAll(async () => {
    t = await freshDatabase();
    people = await makeRoleUsers(t.db);
    combos = await seedCombinations(t.db, people);
  });
  afterAll(async () => {
    await t?.drop();
  });

  const pulley = { kind: "pulley" as const, diameter: inToM(2.8) };

  async function lessonWithWhatIf() {
    const l = await createLesson(t.db, people.instructor, { title: "Smaller pulley " + Math.random().toString(36).slice(2, 6) });
    await addStep(t.db, people.instructor, l.id, { title: "Intro", items: [{ combinationId: combos.workTruck, revision: 1, label: "Truck" }, { combinationId: combos.bigInch, revision: 1, label: "V8" }], series: ["boost"] });
    const step = await addStep(t.db, people.instructor, l.id, {
      title: "2. Smaller pulley",
      items: [
        { combinationId: combos.workTruck, revision: 1, label: "Truck", change: pulley },
        { combinationId: combos.bigInch, revision: 1, label: "V8", change: { kind: "intercooler" } },
      ],
      series: ["boost", "netPower"],
    });
    await updateLesson(t.db, people.instructor, l.id, { published: true });
    return { l, step };
  }

  it("stores each item's change in the step, with calc's default intercooler effectiveness, and no new revision", async () => {
    const { l, step } = await lessonWithWhatIf();
    expect(step.title).toBe("Smaller pulley");
    const stored = (await getLesson(t.db, people.instructor, l.id)).steps[1];
    expect(stored.items[0].change).toEqual(pulley);
    // Default from calc/defaults.ts (INTERCOOLER_DEMO_DEFAULTS.effectiveness = 0.7).
    expect(stored.items[1].change).toEqual({ kind: "intercooler", effectiveness: 0.7 });
    // The snapshot is the item as built; the change is applied when shown.
    expect(stored.items[0].spec).toEqual(combinationSchema.parse(workTruckV6));
    expect((await listStepSources(t.db, people.instructor)).find((s) => s.id === combos.workTruck)!.revisions.map((r) => r.number)).toEqual([1, 2]);
  });

  it("the picker lists each revision with its date", async () => {
    const src = (await listStepSources(t.db, people.instructor)).find((s) => s.id === combos.workTruck)!;
    for (const r of src.revisions) expect(r.date).toMatch(/^\d{1,2} [A-Z][a-z]{2} \d{4}$/);
  });

  it("refuses a bad change naming its field, as the API does (one schema)", async () => {
    const l = await createLesson(t.db, people.instructor, { title: "Bad change" });
    const input = (change: unknown) => ({ title: "X", items: [{ combinationId: combos.workTruck, revision: 1, label: "A", change }, { combinationId: combos.bigInch, revision: 1, label: "B" }], series: ["boost"] });
    for (const [change, path] of [
      [{ kind: "pulley", diameter: 5 }, "items.0.change.diameter"],
      [{ kind: "ve", scale: "lots" }, "items.0.change.scale"],
      [{ kind: "altitude", altitude: 20_000 }, "items.0.change.altitude"],
      [{ kind: "turbo" }, "items.0.change.kind"],
    ] as const) {
      const err = await addStep(t.db, people.instructor, l.id, input(change) as never).catch((e: unknown) => e);
      expect(err, JSON.stringify(change)).toBeInstanceOf(ZodError);
      expect((err as ZodError).issues.map((i) => i.path.join("."))).toContain(path);
      expect(stepInputSchema.safeParse(input(change)).success).toBe(false);
    }
    await expect(addStep(t.db, people.instructor, l.id, { ...input(null), title: "1." } as never)).rejects.toBeInstanceOf(ZodError);
  });

  it("editing keeps the snapshot and sets or drops the change", async () => {
    const { l, step } = await lessonWithWhatIf();
    const edited = await updateStep(t.db, people.instructor, l.id, step.id, {
      title: "Step 2: breathing",
      items: [
        { combinationId: combos.workTruck, revision: 1, label: "Truck", change: { kind: "ve", scale: 1.08 } },
        { combinationId: combos.bigInch, revision: 1, label: "V8", change: null },
      ],
      series: ["boost"],
    });
    expect(edited.title).toBe("breathing");
    expect(edited.items[0].change).toEqual({ kind: "ve", scale: 1.08 });
    expect(edited.items[1].change).toBeNull();
    expect(edited.items[0].spec).toEqual(step.items[0].spec);
  });

  it("a student's copy is the changed spec, with a short name and the lesson and step in its revision note", async () => {
    const { l, step } = await lessonWithWhatIf();
    const student = await makeUser(t.db, "member");
    await joinLesson(t.db, student, { code: l.classCode });
    const copy = await copyStepItem(t.db, student, l.id, step.id, { item: 0 });
    expect(copy.name).toBe("Step 2 — Truck, blower pulley 2.80 in");
    const mine = await getCombination(t.db, student, copy.id);
    expect(mine.spec.drive.blowerPulleyDiameter).toBeCloseTo(inToM(2.8), 12);
    expect(mine.spec).toEqual(combinationSchema.parse(applyWhatIf(step.items[0].spec, pulley)));
    expect((await getRevision(t.db, student, copy.id, 1)).note).toBe(`From the lesson “${l.title}”, step 2 “Smaller pulley”, with blower pulley 2.80 in`);
    // In the copier's own units.
    const metric = await makeUser(t.db, "member");
    await t.db.update(users).set({ unitSystem: "metric" }).where(eq(users.id, metric.id));
    await joinLesson(t.db, metric, { code: l.classCode });
    expect((await copyStepItem(t.db, metric, l.id, step.id, { item: 0 })).name).toBe("Step 2 — Truck, blower pulley 71.1 mm");
    const cooled = await getCombination(t.db, student, (await copyStepItem(t.db, student, l.id, step.id, { item: 1 })).id);
    expect(cooled.spec.intercooler?.effectiveness).toBe(0.7);
  });
});
