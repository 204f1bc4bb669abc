// @ts-nocheck
// Lessons: an instructor's ordered steps, each a side-by-side of two to four combinations. A step
// stores a snapshot of every item's spec when it is saved, so it keeps showing exactly what it was
// built on, and members who joined with the class code can see those specs without being able to
// read the instructor's combinations. Only the owner (or an admin) changes a lesson; a class code
// gives read-only access to that one lesson, and only while it is published.
import crypto from "node:crypto";
import { and, asc, count, desc, eq, inArray, sql } from "drizzle-orm";
import { z } from "zod";
import { combinationSchema, type UnitSystem } from "@/calc";
import { changeText } from "@/lib/lessons/change-text";
import { applyWhatIf } from "@/lib/lessons/curves";
import {
  copySchema,
  joinSchema,
  lessonMetaSchema,
  moveSchema,
  stepInputSchema,
  updateLessonSchema,
  type LessonMetaInput,
  type LessonSeries,
  type StepInput,
  type StepItemSnapshot,
  type UpdateLessonInput,
  stepItemInputSchema,
} from "@/lib/lessons/rules";
import type { DbOrTx } from "../connect";
import { ConflictError, FieldError, NotFoundError } from "@/lib/errors";
import { assert, canAuthorLessons, type Actor } from "../policy";
import { combinationRevisions, lessonMembers, lessonSteps, lessons, users, type LessonRow, type LessonStepRow } from "../schema";
import { createCombination, getCombination, getRevision, listCombinations } from "@/db/repo/combinations";

export type LessonStep = Omit<LessonStepRow, "items" | "series"> & { items: StepItemSnapshot[]; series: LessonSeries[] };
export type LessonView = LessonRow & { ownerName: string; steps: LessonStep[]; canEdit: boolean };

// ---------------------------------------------------------------------------------------------
// Class codes

/** No 0/O, 1/I/L: a code read off a projector must not be misread. */
export const CLASS_CODE_ALPHABET = "ABCDEFGHJKMNPQRSTUVWXYZ23456789";
export const CLASS_CODE_LENGTH = 6;

export function newClassCode(): string {
  let s = "";
  for (let i = 0; i < CLASS_CODE_LENGTH; i++) s += CLASS_CODE_ALPHABET[crypto.randomInt(CLASS_CODE_ALPHABET.length)];
  return s;
}

const isUniqueViolation = (e: unknown) => {
  for (let x: unknown = e, i = 0; x && i < 4; i++, x = (x as { cause?: unknown }).cause) if ((x as { code?: string }).code === "23505") return true;
  return false;
};

/** Runs `write` with fresh codes until one is not taken (a clash is rare: 31⁶ ≈ 8.9 × 10⁸ codes). */
async function withFreshCode<T>(write: (code: string) => Promise<T>): Promise<T> {
  for (let attempt = 0; attempt < 8; attempt++) {
    try {
      return await write(newClassCode());
    } catch (e) {
      if (!isUniqueViolation(e)) throw e;
    }
  }
  throw new ConflictError("Could not find a free class code; try again.");
}

// ---------------------------------------------------------------------------------------------
// Reading

const validId = (id: string) => z.uuid().safeParse(id).success;

async function findLesson(db: DbOrTx, id: string) {
  if (!validId(id)) return undefined;
  const [row] = await db.select().from(lessons).where(eq(lessons.id, id));
  return row;
}

const isAuthorOf = (actor: Actor, lesson: LessonRow) => actor.id === lesson.ownerId || actor.role === "admin";

async function isMember(db: DbOrTx, actor: Actor, lessonId: string) {
  const [m] = await db
    .select({ userId: lessonMembers.userId })
    .from(lessonMembers)
    .where(and(eq(lessonMembers.lessonId, lessonId), eq(lessonMembers.userId, actor.id)));
  return !!m;
}

/**
 * A lesson `actor` may see: the owner and admins always; someone who joined with the class code
 * only while it is published. Anyone else gets the same 404 as for a lesson that does not exist.
 */
async function getReadable(db: DbOrTx, actor: Actor, id: string) {
  const row = await findLesson(db, id);
  if (row && isAuthorOf(actor, row)) return { row, canEdit: true };
  if (row && row.published && (await isMember(db, actor, row.id))) return { row, canEdit: false };
  throw new NotFoundError("No such lesson.");
}

/** A lesson `actor` may change: the owner's or, for an admin, anyone's. */
async function getWritable(db: DbOrTx, actor: Actor, id: string) {
  assert(canAuthorLessons(actor), "Only instructors can change lessons.");
  const row = await findLesson(db, id);
  if (!row) throw new NotFoundError("No such lesson.");
  if (!isAuthorOf(actor, row)) {
    // A member of the class may know it exists; everyone else learns nothing.
    if (row.published && (await isMember(db, actor, row.id))) assert(false, "This lesson is read-only for you: only its instructor can change it.");
    throw new NotFoundError("No such lesson.");
  }
  return row;
}

function toStep(row: LessonStepRow): LessonStep {
  return { ...row, items: row.items as StepItemSnapshot[], series: row.series as LessonSeries[] };
}

async function stepsOf(db: DbOrTx, lessonId: string) {
  const rows = await db.select().from(lessonSteps).where(eq(lessonSteps.lessonId, lessonId)).orderBy(asc(lessonSteps.position), asc(lessonSteps.id));
  return rows.map(toStep);
}

/** A lesson with its steps, for the classroom view or the editor; `canEdit` says which. */
export async function getLesson(db: DbOrTx, actor: Actor, id: string): Promise<LessonView> {
  const { row, canEdit } = await getReadable(db, actor, id);
  const [[owner], steps] = await Promise.all([db.select({ name: users.name }).from(users).where(eq(users.id, row.ownerId)), stepsOf(db, row.id)]);
  return { ...row, ownerName: owner?.name ?? "", steps, canEdit };
}

/** The lessons page: what `actor` authored (admins: every lesson) and the published lessons they joined. */
export async function listLessons(db: DbOrTx, actor: Actor) {
  const stepCount = db
    .select({ lessonId: lessonSteps.lessonId, n: count().as("n") })
    .from(lessonSteps)
    .groupBy(lessonSteps.lessonId)
    .as("step_count");
  const cols = {
    id: lessons.id,
    title: lessons.title,
    summary: lessons.summary,
    classCode: lessons.classCode,
    published: lessons.published,
    ownerId: lessons.ownerId,
    ownerName: users.name,
    updatedAt: lessons.updatedAt,
    steps: sql<number>`coalesce(${stepCount.n}, 0)`.mapWith(Number),
  };
  const authored = canAuthorLessons(actor)
    ? await db
        .select(cols)
        .from(lessons)
        .innerJoin(users, eq(users.id, lessons.ownerId))
        .leftJoin(stepCount, eq(stepCount.lessonId, lessons.id))
        .where(actor.role === "admin" ? undefined : eq(lessons.ownerId, actor.id))
        .orderBy(desc(lessons.updatedAt))
    : [];
  const joinedRows = await db
    .select(cols)
    .from(lessonMembers)
    .innerJoin(lessons, eq(lessons.id, lessonMembers.lessonId))
    .innerJoin(users, eq(users.id, lessons.ownerId))
    .leftJoin(stepCount, eq(stepCount.lessonId, lessons.id))
    .where(and(eq(lessonMembers.userId, actor.id), eq(lessons.published, true)))
    .orderBy(desc(lessonMembers.joinedAt));
  // Members never see another lesson's class code.
  const joined = joinedRows.map((r) => ({ ...r, classCode: r.ownerId === actor.id ? r.classCode : null }));
  return { authored, joined };
}

/**
 * What an author may put in a step: the combinations they can read (their own and the shop's demo
 * ones, per listCombinations) with each revision's number and note, for the step editor.
 */
export async function listStepSources(db: DbOrTx, actor: Actor) {
  assert(canAuthorLessons(actor), "Only instructors can build lessons.");
  const { items } = await listCombinations(db, actor, { pageSize: 100, sort: "name", dir: "asc" });
  const revs = items.length
    ? await db
        .select({ combinationId: combinationRevisions.combinationId, number: combinationRevisions.number, note: combinationRevisions.note, createdAt: combinationRevisions.createdAt })
        .from(combinationRevisions)
        .where(inArray(combinationRevisions.combinationId, items.map((c) => c.id)))
        .orderBy(asc(combinationRevisions.number))
    : [];
  return items.map((c) => ({
    id: c.id,
    name: c.name,
    isDemo: c.isDemo,
    ownerName: c.ownerName,
    revision: c.revision,
    revisions: revs.filter((r) => r.combinationId === c.id).map((r) => ({ number: r.number, note: r.note ?? "", date: SAVED_ON.format(r.createdAt) })),
  }));
}
/** "2 Dec 2026": the day a revision was saved, the same for every viewer. */
const SAVED_ON = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
export type StepSource = Awaited<ReturnType<typeof listStepSources>>[number];

// ---------------------------------------------------------------------------------------------
// Writing

export async function createLesson(db: DbOrTx, actor: Actor, input: LessonMetaInput) {
  assert(canAuthorLessons(actor), "Only instructors can create lessons.");
  const v = lessonMetaSchema.parse(input);
  return withFreshCode(async (classCode) => {
    const [row] = await db.insert(lessons).values({ ownerId: actor.id, title: v.title, summary: v.summary, classCode }).returning();
    return row;
  });
}

export async function updateLesson(db: DbOrTx, actor: Actor, id: string, input: UpdateLessonInput) {
  const v = updateLessonSchema.parse(input);
  const current = await getWritable(db, actor, id);
  if (v.published === true && !(await stepsOf(db, id)).length) throw new FieldError("published", "Add at least one step before publishing the lesson.");
  const [row] = await db
    .update(lessons)
    .set({ title: v.title ?? current.title, summary: v.summary ?? current.summary, published: v.published ?? current.published, updatedAt: new Date() })
    .where(eq(lessons.id, id))
    .returning();
  return row;
}

/** A new class code: the old one stops working for people who have not joined yet. */
export async function regenerateClassCode(db: DbOrTx, actor: Actor, id: string) {
  await getWritable(db, actor, id);
  return withFreshCode(async (classCode) => {
    const [row] = await db.update(lessons).set({ classCode, updatedAt: new Date() }).where(eq(lessons.id, id)).returning();
    return row;
  });
}

export async function deleteLesson(db: DbOrTx, actor: Actor, id: string) {
  await getWritable(db, actor, id);
  await db.delete(lessons).where(eq(lessons.id, id));
}

/**
 * Resolves each picked item to a snapshot. An item already in the step at the same revision keeps
 * its snapshot (only the label may change), so editing a note never needs the source again.
 */
async function snapshotItems(db: DbOrTx, actor: Actor, items: z.output<typeof stepItemInputSchema>[], previous: StepItemSnapshot[] = []) {
  const out: StepItemSnapshot[] = [];
  for (const [i, it] of items.entries()) {
    const kept = it.revision !== "current" && previous.find((p) => p.combinationId === it.combinationId && p.revision === it.revision);
    if (kept) {
      out.push({ ...kept, label: it.label, change: it.change });
      continue;
    }
    let combo;
    try {
      combo = await getCombination(db, actor, it.combinationId);
    } catch (e) {
      if (e instanceof NotFoundError) throw new FieldError(`items.${i}.combinationId`, "No such combination, or not one you can use.");
      throw e;
    }
    if (it.revision === "current") {
      out.push({ combinationId: combo.id, revision: combo.revision, label: it.label, name: combo.name, spec: combinationSchema.parse(combo.spec), change: it.change });
      continue;
    }
    if (it.revision > combo.revision) throw new FieldError(`items.${i}.revision`, `“${combo.name}” has no revision ${it.revision} (latest is ${combo.revision}).`);
    const rev = await getRevision(db, actor, combo.id, it.revision);
    out.push({ combinationId: combo.id, revision: rev.number, label: it.label, name: rev.name, spec: combinationSchema.parse(rev.spec), change: it.change });
  }
  return out;
}

export async function addStep(db: DbOrTx, actor: Actor, lessonId: string, input: StepInput) {
  const v = stepInputSchema.parse(input);
  await getWritable(db, actor, lessonId);
  const items = await snapshotItems(db, actor, v.items);
  return db.transaction(async (tx) => {
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${lessonSteps.position}), 0) + 1`.mapWith(Number) })
      .from(lessonSteps)
      .where(eq(lessonSteps.lessonId, lessonId));
    const [row] = await tx.insert(lessonSteps).values({ lessonId, position: next, title: v.title, note: v.note, items, series: v.series }).returning();
    await tx.update(lessons).set({ updatedAt: new Date() }).where(eq(lessons.id, lessonId));
    return toStep(row);
  });
}

async function getStep(db: DbOrTx, lessonId: string, stepId: string) {
  if (!validId(stepId)) throw new NotFoundError("No such step.");
  const [row] = await db.select().from(lessonSteps).where(and(eq(lessonSteps.id, stepId), eq(lessonSteps.lessonId, lessonId)));
  if (!row) throw new NotFoundError("No such step.");
  return toStep(row);
}

export async function updateStep(db: DbOrTx, actor: Actor, lessonId: string, stepId: string, input: StepInput) {
  const v = stepInputSchema.parse(input);
  await getWritable(db, actor, lessonId);
  const current = await getStep(db, lessonId, stepId);
  const items = await snapshotItems(db, actor, v.items, current.items);
  const [row] = await db.update(lessonSteps).set({ title: v.title, note: v.note, items, series: v.series }).where(eq(lessonSteps.id, stepId)).returning();
  await db.update(lessons).set({ updatedAt: new Date() }).where(eq(lessons.id, lessonId));
  return toStep(row);
}

export async function deleteStep(db: DbOrTx, actor: Actor, lessonId: string, stepId: string) {
  await getWritable(db, actor, lessonId);
  await getStep(db, lessonId, stepId);
  const remaining = await db.transaction(async (tx) => {
    await tx.delete(lessonSteps).where(eq(lessonSteps.id, stepId));
    const rest = await tx.select({ id: lessonSteps.id }).from(lessonSteps).where(eq(lessonSteps.lessonId, lessonId)).orderBy(asc(lessonSteps.position), asc(lessonSteps.id));
    // Keep positions 1..n so "Step 2 of 3" stays true.
    for (const [i, s] of rest.entries()) await tx.update(lessonSteps).set({ position: i + 1 }).where(eq(lessonSteps.id, s.id));
    return rest.length;
  });
  if (remaining === 0) await db.update(lessons).set({ published: false, updatedAt: new Date() }).where(eq(lessons.id, lessonId));
}

/** Swaps a step with its neighbour; moving the first up or the last down changes nothing. */
export async function moveStep(db: DbOrTx, actor: Actor, lessonId: string, stepId: string, direction: "up" | "down") {
  const { direction: dir } = moveSchema.parse({ direction });
  await getWritable(db, actor, lessonId);
  await getStep(db, lessonId, stepId);
  return db.transaction(async (tx) => {
    const rows = await tx.select({ id: lessonSteps.id }).from(lessonSteps).where(eq(lessonSteps.lessonId, lessonId)).orderBy(asc(lessonSteps.position), asc(lessonSteps.id));
    const ids = rows.map((r) => r.id);
    const i = ids.indexOf(stepId);
    const j = dir === "up" ? i - 1 : i + 1;
    if (j >= 0 && j < ids.length) [ids[i], ids[j]] = [ids[j], ids[i]];
    for (const [k, id] of ids.entries()) await tx.update(lessonSteps).set({ position: k + 1 }).where(eq(lessonSteps.id, id));
    return ids;
  });
}

/** Joins the published lesson with this class code; joining twice is harmless. */
export async function joinLesson(db: DbOrTx, actor: Actor, input: { code: unknown }) {
  const { code } = joinSchema.parse(input);
  const [row] = await db.select().from(lessons).where(eq(lessons.classCode, code));
  // An unpublished lesson answers exactly like a wrong code.
  if (!row || (!row.published && !isAuthorOf(actor, row))) throw new FieldError("code", "No such published lesson. Check the class code with your instructor.");
  await db.insert(lessonMembers).values({ lessonId: row.id, userId: actor.id }).onConflictDoNothing();
  return { id: row.id, title: row.title };
}

/**
 * Copies one item of a step into `actor`'s own combinations with the spec the step shows: an item
 * with a what-if is copied changed. A short name ("Step 2 — Truck, blower pulley 2.80 in"); the
 * lesson and step go in the revision note.
 */
export async function copyStepItem(db: DbOrTx, actor: Actor, lessonId: string, stepId: string, input: { item: unknown }) {
  const { item } = copySchema.parse(input);
  const { row } = await getReadable(db, actor, lessonId);
  const step = await getStep(db, lessonId, stepId);
  const it = step.items[item];
  if (!it) throw new FieldError("item", `This step has ${step.items.length} items; there is no item ${item + 1}.`);
  // The name speaks the copier's units, like the classroom they copied from.
  const [me] = await db.select({ unitSystem: users.unitSystem }).from(users).where(eq(users.id, actor.id));
  const change = it.change ? changeText(it.change, (me?.unitSystem ?? "imperial") as UnitSystem) : null;
  const name = `Step ${step.position} — ${change ? `${it.label}, ${change}` : it.label}`.slice(0, 120);
  const note = `From the lesson “${row.title}”, step ${step.position} “${step.title}”${change ? `, with ${change}` : ""}`.slice(0, 500);
  return createCombination(db, actor, { name, spec: it.change ? applyWhatIf(it.spec, it.change) : it.spec, note });
}
