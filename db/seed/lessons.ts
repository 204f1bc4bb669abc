import { and, eq } from "drizzle-orm";
import type { Db } from "../connect";
import { addStep, createLesson, updateLesson } from "../repo/lessons";
import type { StepInput } from "@/lib/lessons/rules";
import { lessons } from "../schema";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";

/** The demo lesson's fixed class code, named in the README so a class can try it at once. */
export const DEMO_CLASS_CODE = "DEMO42";
export const DEMO_LESSON_TITLE = "What a blower pulley and a head-and-cam change do";

const STEP_1_NOTE = `Two engines, two kinds of blower. Look at the **boost** line of each one.

- The small-block's **Roots** blower makes more boost the faster the engine turns.
- The big V8's **twin-screw** squeezes the air inside the blower, so its boost stays much flatter across the rev range.

Boost is not a dial on the blower: it is what is left over when the blower pushes more air than the engine can swallow.`;

const STEP_2_NOTE = `Same blower, same pulleys. Only the **heads and cam** changed.

- The engine now breathes better, so it swallows more of the air the blower pushes.
- Less air is left over, so **boost falls** through the middle and the top of the rev range.
- Yet **power rises**: more air goes through the engine, and the blower works less hard to make it.

A lower boost figure after a head or cam job is not a fault. Judge the engine by power, not by the gauge.`;

const STEP_3_NOTE = `Heads and cam as before, now with a **smaller blower pulley**.

- A smaller blower pulley spins the blower faster at every engine speed (a higher drive ratio).
- The blower pushes more air, so **boost rises everywhere**, and power with it.
- Watch the **blower speed** at redline: it must stay under the blower maker's limit. Check belt wrap and fit before you order a smaller pulley.

Try the slider: move the blower pulley and see how far the boost moves for each size.`;

/** A published demo lesson by the instructor, on the demo small-block's three revisions. Idempotent by owner and title. */
export async function seedLessons(db: Db, people: DemoUsers, combos: DemoCombinations) {
  const instructor = people.instructor;
  const [existing] = await db.select({ id: lessons.id }).from(lessons).where(and(eq(lessons.ownerId, instructor.id), eq(lessons.title, DEMO_LESSON_TITLE)));
  if (existing) return existing.id;

  const lesson = await createLesson(db, instructor, {
    title: DEMO_LESSON_TITLE,
    summary: "Baseline, then better heads and cam, then a smaller blower pulley: what each does to boost and power.",
  });
  // The fixed code lets the README say which code to type; skip it if someone already took it.
  const [taken] = await db.select({ id: lessons.id }).from(lessons).where(eq(lessons.classCode, DEMO_CLASS_CODE));
  if (!taken) await db.update(lessons).set({ classCode: DEMO_CLASS_CODE }).where(eq(lessons.id, lesson.id));

  const sb = combos.smallBlock;
  const item = (combinationId: string, revision: number, label: string) => ({ combinationId, revision, label });
  const steps: StepInput[] = [
    { title: "Roots and twin-screw: how boost builds", items: [item(sb, 1, "Small-block, Roots"), item(combos.bigBlock, 1, "Big V8, twin-screw")], series: ["boost", "netPower"], note: STEP_1_NOTE },
    { title: "Better heads and cam: boost falls, power rises", items: [item(sb, 1, "Baseline"), item(sb, 2, "Heads and cam")], series: ["boost", "netPower"], note: STEP_2_NOTE },
    { title: "A smaller blower pulley: boost rises everywhere", items: [item(sb, 2, "Heads and cam"), item(sb, 3, "Smaller pulley")], series: ["boost", "netPower", "blowerSpeed"], note: STEP_3_NOTE },
  ];
  for (const step of steps) await addStep(db, instructor, lesson.id, step);
  await updateLesson(db, instructor, lesson.id, { published: true });
  return lesson.id;
}
