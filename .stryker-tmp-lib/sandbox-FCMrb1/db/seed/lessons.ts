// @ts-nocheck
import { and, eq } from "drizzle-orm";
import type { Db } from "../connect";
import { addStep, createLesson, updateLesson } from "../repo/lessons";
import type { StepInput } from "@/lib/lessons/rules";
import { lessons } from "../schema";
import { bigInchIntercooled, vintageV8Cam, vintageV8DrawThrough, workTruckV6, workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import { camChangeNote, rootsAgainstTwinScrewNote, smallerPulleyNote } from "./lesson-notes";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";

/** The demo lesson's fixed class code, named in the README so a class can try it at once. */
export const DEMO_CLASS_CODE = "DEMO42";
export const DEMO_LESSON_TITLE = "Reading boost: blower kind, a cam change and a pulley swap";

/** The speeds the notes quote figures at (rev/min): within every demo engine's range. */
export const DEMO_LESSON_SPEEDS = { low: 2000, high: 5000, cam: 4500 } as const;

/** A published demo lesson by the instructor on the shop's combinations. Idempotent by owner and title. */
export async function seedLessons(db: Db, people: DemoUsers, combos: DemoCombinations) {
  const instructor = people.instructor;
  const [existing] = await db.select({ id: lessons.id }).from(lessons).where(and(eq(lessons.ownerId, instructor.id), eq(lessons.title, DEMO_LESSON_TITLE)));
  if (existing) return existing.id;

  const lesson = await createLesson(db, instructor, {
    title: DEMO_LESSON_TITLE,
    summary: "How a Roots and a twin-screw build boost, what a cam-only change does to boost and power, and what a smaller blower pulley does.",
  });
  // The fixed code lets the README say which code to type; skip it if someone already took it.
  const [taken] = await db.select({ id: lessons.id }).from(lessons).where(eq(lessons.classCode, DEMO_CLASS_CODE));
  if (!taken) await db.update(lessons).set({ classCode: DEMO_CLASS_CODE }).where(eq(lessons.id, lesson.id));

  const { low, high, cam } = DEMO_LESSON_SPEEDS;
  const item = (combinationId: string, revision: number, label: string) => ({ combinationId, revision, label });
  // Each note is written from the same specs the step's revisions hold (db/seed/combinations.ts).
  const steps: StepInput[] = [
    {
      title: "Roots and twin-screw: how each builds boost",
      items: [item(combos.workTruck, 1, "Work truck V6, Roots"), item(combos.bigInch, 2, "Big-inch V8, twin-screw")],
      series: ["boost", "netPower"],
      note: rootsAgainstTwinScrewNote(workTruckV6, bigInchIntercooled, low, high),
    },
    {
      title: "A cam-only change: read power, not the gauge",
      items: [item(combos.vintage, 1, "Original cam"), item(combos.vintage, 2, "New cam")],
      series: ["boost", "netPower"],
      note: camChangeNote(vintageV8DrawThrough, vintageV8Cam, cam),
    },
    {
      title: "After the datalog: a smaller blower pulley",
      items: [item(combos.workTruck, 1, "3.4 in pulley"), item(combos.workTruck, 2, "3.1 in pulley")],
      series: ["boost", "netPower", "blowerSpeed"],
      note: smallerPulleyNote(workTruckV6, workTruckV6SmallerPulley, low, high),
    },
  ];
  for (const step of steps) await addStep(db, instructor, lesson.id, step);
  await updateLesson(db, instructor, lesson.id, { published: true });
  return lesson.id;
}
