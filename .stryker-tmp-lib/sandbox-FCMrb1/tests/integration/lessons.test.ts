// @ts-nocheck
// Lessons against a real database: who may edit, what a class code opens (that lesson alone, and
// only while published), that a step keeps the spec it was built on, and copying an item.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { boostCurve, combinationSchema, paToPsi, solvePoint, wToHp } from "@/calc";
import { FieldError, ForbiddenError, NotFoundError } from "@/lib/errors";
import { createCombination, getCombination, getRevision, saveCombination } from "@/db/repo/combinations";
import {
  CLASS_CODE_ALPHABET,
  addStep,
  copyStepItem,
  createLesson,
  deleteStep,
  getLesson,
  joinLesson,
  listLessons,
  listStepSources,
  moveStep,
  regenerateClassCode,
  updateLesson,
  updateStep,
} from "@/db/repo/lessons";
import { DEMO_COMBINATION_NAMES, seedCombinations, type DemoCombinations } from "@/db/seed/combinations";
import { bigInchIntercooled, bigInchLargerInjectors, workTruckV6, workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import type { DemoUsers } from "@/db/seed/index";
import { DEMO_CLASS_CODE, DEMO_LESSON_SPEEDS, DEMO_LESSON_TITLE, seedLessons } from "@/db/seed/lessons";
import { freshDatabase, makeRoleUsers, makeUser, type TestDb } from "../support/db";

type Person = Awaited<ReturnType<typeof makeUser>>;

describe("lessons", () => {
  let t: TestDb;
  let people: DemoUsers;
  let combos: DemoCombinations;
  let instructor: Person, otherInstructor: Person, member: Person, outsider: Person, admin: Person;

  beforeAll(async () => {
    t = await freshDatabase();
    people = await makeRoleUsers(t.db);
    combos = await seedCombinations(t.db, people);
    instructor = people.instructor;
    admin = people.admin;
    member = people.member;
    otherInstructor = await makeUser(t.db, "instructor");
    outsider = await makeUser(t.db, "member");
  });
  afterAll(async () => {
    await t?.drop();
  });

  const twoItems = () => [
    { combinationId: combos.bigInch, revision: 1 as const, label: "Baseline" },
    { combinationId: combos.bigInch, revision: 2 as const, label: "Intercooled" },
  ];

  async function publishedLesson(title = "Pulleys " + Math.random().toString(36).slice(2, 7)) {
    const l = await createLesson(t.db, instructor, { title });
    await addStep(t.db, instructor, l.id, { title: "Step one", items: twoItems(), series: ["boost", "netPower"], note: "Look at **boost**." });
    await updateLesson(t.db, instructor, l.id, { published: true });
    return l;
  }

  describe("authoring", () => {
    it("only instructors and admins create lessons; a new lesson gets a 6-character code from the unambiguous alphabet", async () => {
      // Every role but instructor and admin is refused (db/policy.ts canAuthorLessons; design.md).
      for (const role of ["member", "tuner", "sales"] as const) {
        const actor = role === "member" ? member : await makeUser(t.db, role);
        await expect(createLesson(t.db, actor, { title: "Mine" }), role).rejects.toBeInstanceOf(ForbiddenError);
        await expect(listStepSources(t.db, actor), role).rejects.toBeInstanceOf(ForbiddenError);
      }
      const l = await createLesson(t.db, instructor, { title: "Boost basics" });
      expect(l.classCode).toHaveLength(6);
      for (const ch of l.classCode) expect(CLASS_CODE_ALPHABET).toContain(ch);
      expect(l.classCode).not.toMatch(/[01OIL]/);
      expect(l.published).toBe(false);
      const a = await createLesson(t.db, admin, { title: "Admin's lesson" });
      expect(a.ownerId).toBe(admin.id);
    });

    it("the step editor offers the instructor's own and the shop's demo combinations with their revisions", async () => {
      const own = await createCombination(t.db, instructor, { name: "Instructor's own", spec: workTruckV6 });
      const sources = await listStepSources(t.db, instructor);
      const ids = sources.map((s) => s.id);
      expect(ids).toContain(own.id);
      expect(ids).toContain(combos.bigInch);
      // The member's own car is neither the instructor's nor a demo.
      expect(ids).not.toContain(combos.memberCar);
      expect(sources.find((s) => s.id === combos.bigInch)!.revisions.map((r) => r.number)).toEqual([1, 2, 3]);
      await expect(listStepSources(t.db, member)).rejects.toBeInstanceOf(ForbiddenError);
    });

    it("a step stores a snapshot of each item: the chosen revision's spec, and the current one resolved to its number", async () => {
      const l = await createLesson(t.db, instructor, { title: "Snapshots" });
      const step = await addStep(t.db, instructor, l.id, {
        title: "Intercooler against larger injectors",
        items: [
          { combinationId: combos.bigInch, revision: 2, label: "Intercooled" },
          { combinationId: combos.bigInch, revision: "current", label: "Now" },
        ],
        series: ["boost", "blowerSpeed", "boost"],
      });
      expect(step.items.map((i) => i.revision)).toEqual([2, 3]);
      expect(step.items[0].spec).toEqual(combinationSchema.parse(bigInchIntercooled));
      expect(step.items[1].spec).toEqual(combinationSchema.parse(bigInchLargerInjectors));
      expect(step.items[0].name).toBe(DEMO_COMBINATION_NAMES.bigInch);
      expect(step.series).toEqual(["boost", "blowerSpeed"]);
    });

    it("a step keeps showing the spec it was built on after its source changes", async () => {
      const own = await createCombination(t.db, instructor, { name: "Changing", spec: workTruckV6 });
      const l = await createLesson(t.db, instructor, { title: "Stable" });
      const step = await addStep(t.db, instructor, l.id, {
        title: "Before",
        items: [
          { combinationId: own.id, revision: "current", label: "Own" },
          { combinationId: combos.bigInch, revision: 3, label: "Demo" },
        ],
        series: ["boost"],
      });
      await saveCombination(t.db, instructor, own.id, { spec: workTruckV6SmallerPulley, baseRevision: 1 });
      const again = (await getLesson(t.db, instructor, l.id)).steps[0];
      expect(again.items[0].revision).toBe(1);
      expect(again.items[0].spec.drive.blowerPulleyDiameter).toBeCloseTo(workTruckV6.drive.blowerPulleyDiameter, 12);
      // Editing only the label keeps the snapshot even though "current" has moved on.
      const edited = await updateStep(t.db, instructor, l.id, step.id, {
        title: "Before, relabelled",
        items: [
          { combinationId: own.id, revision: 1, label: "Own, as it was" },
          { combinationId: combos.bigInch, revision: 3, label: "Demo" },
        ],
        series: ["boost"],
      });
      expect(edited.items[0].label).toBe("Own, as it was");
      expect(edited.items[0].spec).toEqual(again.items[0].spec);
    });

    it("bad steps are refused with the field named", async () => {
      const l = await createLesson(t.db, instructor, { title: "Validation" });
      const paths = async (input: unknown) => {
        try {
          await addStep(t.db, instructor, l.id, input as never);
        } catch (e) {
          if (e instanceof ZodError) return e.issues.map((i) => i.path.join("."));
          if (e instanceof FieldError) return [e.field];
          throw e;
        }
        return [];
      };
      expect(await paths({ title: "One", items: twoItems().slice(0, 1), series: ["boost"] })).toContain("items");
      expect(await paths({ title: "Five", items: [...twoItems(), ...twoItems(), twoItems()[0]], series: ["boost"] })).toContain("items");
      expect(await paths({ title: "Long", items: [twoItems()[0], { ...twoItems()[1], label: "x".repeat(41) }], series: ["boost"] })).toContain("items.1.label");
      expect(await paths({ title: "Series", items: twoItems(), series: ["lap time"] })).toContain("series.0");
      expect(await paths({ title: "No series", items: twoItems(), series: [] })).toContain("series");
      expect(await paths({ title: "", items: twoItems(), series: ["boost"] })).toContain("title");
      expect(await paths({ title: "Rev", items: [twoItems()[0], { ...twoItems()[1], revision: 9 }], series: ["boost"] })).toContain("items.1.revision");
      // Someone else's own combination is not the instructor's to use.
      expect(await paths({ title: "Theirs", items: [twoItems()[0], { combinationId: combos.memberCar, revision: "current", label: "Member car" }], series: ["boost"] })).toContain(
        "items.1.combinationId",
      );
      expect((await getLesson(t.db, instructor, l.id)).steps).toHaveLength(0);
    });

    it("steps move up and down, and deleting one closes the gap", async () => {
      const l = await createLesson(t.db, instructor, { title: "Order" });
      const a = await addStep(t.db, instructor, l.id, { title: "A", items: twoItems(), series: ["boost"] });
      const b = await addStep(t.db, instructor, l.id, { title: "B", items: twoItems(), series: ["boost"] });
      const c = await addStep(t.db, instructor, l.id, { title: "C", items: twoItems(), series: ["boost"] });
      const titles = async () => (await getLesson(t.db, instructor, l.id)).steps.map((s) => s.title);
      await moveStep(t.db, instructor, l.id, c.id, "up");
      expect(await titles()).toEqual(["A", "C", "B"]);
      await moveStep(t.db, instructor, l.id, a.id, "up"); // already first: no change
      expect(await titles()).toEqual(["A", "C", "B"]);
      await moveStep(t.db, instructor, l.id, a.id, "down");
      expect(await titles()).toEqual(["C", "A", "B"]);
      await deleteStep(t.db, instructor, l.id, a.id);
      const steps = (await getLesson(t.db, instructor, l.id)).steps;
      expect(steps.map((s) => [s.title, s.position])).toEqual([
        ["C", 1],
        ["B", 2],
      ]);
      void b;
    });

    it("a lesson without steps cannot be published", async () => {
      const l = await createLesson(t.db, instructor, { title: "Empty" });
      await expect(updateLesson(t.db, instructor, l.id, { published: true })).rejects.toBeInstanceOf(FieldError);
    });
  });

  describe("role rules", () => {
    it("only the owner (or an admin) edits: another instructor gets 404, a member of the class 403", async () => {
      const l = await publishedLesson();
      await joinLesson(t.db, member, { code: l.classCode });
      const stepId = (await getLesson(t.db, instructor, l.id)).steps[0].id;
      const input = { title: "Hijacked", items: twoItems(), series: ["boost" as const] };

      await expect(updateLesson(t.db, otherInstructor, l.id, { title: "Mine now" })).rejects.toBeInstanceOf(NotFoundError);
      await expect(addStep(t.db, otherInstructor, l.id, input)).rejects.toBeInstanceOf(NotFoundError);
      await expect(getLesson(t.db, otherInstructor, l.id)).rejects.toBeInstanceOf(NotFoundError);
      await expect(updateLesson(t.db, member, l.id, { title: "Mine now" })).rejects.toBeInstanceOf(ForbiddenError);
      await expect(updateStep(t.db, member, l.id, stepId, input)).rejects.toBeInstanceOf(ForbiddenError);
      await expect(deleteStep(t.db, member, l.id, stepId)).rejects.toBeInstanceOf(ForbiddenError);
      await expect(moveStep(t.db, member, l.id, stepId, "down")).rejects.toBeInstanceOf(ForbiddenError);
      await expect(regenerateClassCode(t.db, member, l.id)).rejects.toBeInstanceOf(ForbiddenError);

      const after = await getLesson(t.db, instructor, l.id);
      expect(after.title).toBe(l.title);
      expect(after.steps.map((s) => s.title)).toEqual(["Step one"]);

      const byAdmin = await updateLesson(t.db, admin, l.id, { title: "Renamed by the shop owner" });
      expect(byAdmin.title).toBe("Renamed by the shop owner");
    });

    it("a class code gives read-only access to that lesson alone, with the specs the member cannot otherwise read", async () => {
      const first = await publishedLesson("First class");
      const second = await publishedLesson("Second class");
      const joined = await joinLesson(t.db, outsider, { code: ` ${first.classCode.slice(0, 3).toLowerCase()}-${first.classCode.slice(3)} ` });
      expect(joined.id).toBe(first.id);

      const view = await getLesson(t.db, outsider, first.id);
      expect(view.canEdit).toBe(false);
      expect(view.steps[0].items[1].spec).toEqual(combinationSchema.parse(bigInchIntercooled));
      // The source combination itself stays closed to them.
      await expect(getCombination(t.db, outsider, combos.bigInch)).rejects.toBeInstanceOf(NotFoundError);

      await expect(getLesson(t.db, outsider, second.id)).rejects.toBeInstanceOf(NotFoundError);
      const list = await listLessons(t.db, outsider);
      expect(list.authored).toEqual([]);
      expect(list.joined.map((l) => l.id)).toEqual([first.id]);
      expect(list.joined[0].classCode).toBeNull();
    });

    it("unpublished lessons are invisible to members, even with the right code", async () => {
      const draft = await createLesson(t.db, instructor, { title: "Draft" });
      await addStep(t.db, instructor, draft.id, { title: "S", items: twoItems(), series: ["boost"] });
      const viewer = await makeUser(t.db, "member");
      await expect(joinLesson(t.db, viewer, { code: draft.classCode })).rejects.toThrow(/No such published lesson/);
      await expect(getLesson(t.db, viewer, draft.id)).rejects.toBeInstanceOf(NotFoundError);

      await updateLesson(t.db, instructor, draft.id, { published: true });
      await joinLesson(t.db, viewer, { code: draft.classCode });
      expect((await getLesson(t.db, viewer, draft.id)).steps).toHaveLength(1);

      // Unpublishing closes it again for those who joined.
      await updateLesson(t.db, instructor, draft.id, { published: false });
      await expect(getLesson(t.db, viewer, draft.id)).rejects.toBeInstanceOf(NotFoundError);
      await expect(copyStepItem(t.db, viewer, draft.id, (await getLesson(t.db, instructor, draft.id)).steps[0].id, { item: 0 })).rejects.toBeInstanceOf(NotFoundError);
      expect((await listLessons(t.db, viewer)).joined).toEqual([]);
    });

    it("a new class code stops the old one working for new joiners", async () => {
      const l = await publishedLesson();
      const { classCode } = await regenerateClassCode(t.db, instructor, l.id);
      expect(classCode).not.toBe(l.classCode);
      const viewer = await makeUser(t.db, "member");
      await expect(joinLesson(t.db, viewer, { code: l.classCode })).rejects.toBeInstanceOf(FieldError);
      expect((await joinLesson(t.db, viewer, { code: classCode })).id).toBe(l.id);
    });

    it("a bad class code is a field error on the code", async () => {
      await expect(joinLesson(t.db, member, { code: "" })).rejects.toBeInstanceOf(ZodError);
      await expect(joinLesson(t.db, member, { code: "<script>" })).rejects.toBeInstanceOf(ZodError);
      await expect(joinLesson(t.db, member, { code: "ZZZZZZ" })).rejects.toMatchObject({ field: "code" });
    });
  });

  describe("copying an item", () => {
    it("a member's copy is a combination they own, with the snapshot spec and a name that says where it came from", async () => {
      const l = await publishedLesson("Pulley night");
      const viewer = await makeUser(t.db, "member");
      await joinLesson(t.db, viewer, { code: l.classCode });
      const step = (await getLesson(t.db, viewer, l.id)).steps[0];
      const copy = await copyStepItem(t.db, viewer, l.id, step.id, { item: 1 });
      expect(copy.ownerId).toBe(viewer.id);
      expect(copy.isDemo).toBe(false);
      // A short name (the step's number and the item); the lesson and step are in the revision note.
      expect(copy.name).toBe("Step 1 — Intercooled");
      expect((await getRevision(t.db, viewer, copy.id, 1)).note).toBe("From the lesson “Pulley night”, step 1 “Step one”");
      const mine = await getCombination(t.db, viewer, copy.id);
      expect(mine.spec).toEqual(step.items[1].spec);
      // Not the source's current revision (3, larger injectors): the step's revision 2.
      expect(mine.spec.fuel.injectorFlow).toBeCloseTo(bigInchIntercooled.fuel.injectorFlow!, 12);
      expect(mine.spec.fuel.injectorFlow).not.toBeCloseTo(bigInchLargerInjectors.fuel.injectorFlow!, 6);

      await expect(copyStepItem(t.db, viewer, l.id, step.id, { item: 3 })).rejects.toMatchObject({ field: "item" });
      const stranger = await makeUser(t.db, "member");
      await expect(copyStepItem(t.db, stranger, l.id, step.id, { item: 0 })).rejects.toBeInstanceOf(NotFoundError);
    });
  });

  describe("demo seed", () => {
    it("seeds one published three-step lesson with the fixed code, once", async () => {
      const id = await seedLessons(t.db, people, combos);
      expect(await seedLessons(t.db, people, combos)).toBe(id);
      const lessons = (await listLessons(t.db, instructor)).authored.filter((l) => l.title === DEMO_LESSON_TITLE);
      expect(lessons).toHaveLength(1);
      expect(lessons[0].classCode).toBe(DEMO_CLASS_CODE);
      expect(lessons[0].published).toBe(true);

      const viewer = await makeUser(t.db, "member");
      expect((await joinLesson(t.db, viewer, { code: "demo42" })).id).toBe(id);
      const { steps } = await getLesson(t.db, viewer, id);
      expect(steps).toHaveLength(3);
      for (const s of steps) expect(s.items.length).toBeGreaterThanOrEqual(2);
      expect(steps.map((st) => st.items.map((i) => i.combinationId))).toEqual([
        [combos.workTruck, combos.bigInch],
        [combos.vintage, combos.vintage],
        [combos.workTruck, combos.workTruck],
      ]);
      expect(steps[1].items.map((i) => i.revision)).toEqual([1, 2]);
      expect(steps[2].items.map((i) => i.revision)).toEqual([1, 2]);
    });

    it("the demo lesson's notes quote the model's own figures for the specs each step shows", async () => {
      const { steps } = await getLesson(t.db, instructor, await seedLessons(t.db, people, combos));
      const { low, high, cam } = DEMO_LESSON_SPEEDS;
      const psi = (spec: Parameters<typeof solvePoint>[0], rpm: number) => `${paToPsi(solvePoint(spec, rpm).boostGauge).toFixed(1)} psi`;
      const hp = (spec: Parameters<typeof solvePoint>[0], rpm: number) => `${Math.round(wToHp(solvePoint(spec, rpm).netPower))} hp`;
      // Step 1: Roots and twin-screw, each at a low and a high speed.
      const [roots, screw] = steps[0].items.map((i) => i.spec);
      for (const f of [psi(roots, low), psi(roots, high), psi(screw, low), psi(screw, high)]) expect(steps[0].note).toContain(f);
      // The Roots climbs more across the range than the twin-screw (trade fact, calc/README.md).
      const climb = (spec: typeof roots) => solvePoint(spec, high).boostGauge - solvePoint(spec, low).boostGauge;
      expect(climb(roots)).toBeGreaterThan(climb(screw));
      // Step 2: the cam: boost and net power before and after, with the direction the model gives.
      const [before, after] = steps[1].items.map((i) => i.spec);
      for (const f of [psi(before, cam), psi(after, cam), hp(before, cam), hp(after, cam)]) expect(steps[1].note).toContain(f);
      // source: calc/README.md, trade facts (common practice, no published source): better breathing,
      // same blower and pulley: less boost, usually more power.
      expect(solvePoint(after, cam).boostGauge).toBeLessThan(solvePoint(before, cam).boostGauge);
      expect(solvePoint(after, cam).netPower).toBeGreaterThan(solvePoint(before, cam).netPower);
      expect(steps[1].note).toContain("boost drops");
      expect(steps[1].note).toContain("Net power goes up");
      // Step 3: the smaller pulley, and the blower's speed at redline against its limit.
      const [big, small] = steps[2].items.map((i) => i.spec);
      for (const f of [psi(big, low), psi(small, low), psi(big, high), psi(small, high), hp(big, high), hp(small, high)]) expect(steps[2].note).toContain(f);
      expect(steps[2].note).toContain(`${small.blower.maxRpm.toLocaleString("en-US")} rpm`);
      // source: calc/README.md, trade facts: a smaller blower pulley raises boost at every engine speed.
      const rpms = [2000, 3000, 4000, 5000];
      const [b, a] = [boostCurve(big, rpms), boostCurve(small, rpms)];
      rpms.forEach((_, k) => expect(a[k].boostGauge).toBeGreaterThan(b[k].boostGauge));
    });
  });
});
