// @ts-nocheck
// Recommendation sheets: a combination at one revision, the blower pulley chosen for it, the
// customer, a priced parts list and notes. Only the shop's sales, tuners and admin read or write
// them (db/policy.ts canWriteRecommendations); a customer reaches one sheet only through a signed
// link, which the route verifies before calling getSharedRecommendation. The spec is copied into
// the sheet so later edits to the combination never change what a customer was sent.
import { and, count, desc, eq, ilike, isNull, or, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { combinationSchema, type Combination } from "@/calc";
import type { DbOrTx } from "../connect";
import { ConflictError, FieldError, NotFoundError } from "@/lib/errors";
import { assert, canWriteRecommendations, type Actor } from "../policy";
import { combinations, recommendations, sheetVersions, users, type RecommendationRow } from "../schema";
import { partLineSchema, recommendationInputSchema, updateRecommendationSchema, statusChangeSchema, recommendationListQuerySchema, type RecommendationInput, type PartLine } from "@/lib/recommendations/rules";
import { getCombination, getRevision } from "@/db/repo/combinations";
import { findParts } from "@/db/repo/shelf";
import { lineTotal, sumMoney } from "@/lib/shelf/rules";

export type Recommendation = Omit<RecommendationRow, "spec" | "parts"> & { spec: Combination; parts: PartLine[]; combinationName: string };

/** Line totals and the sheet total, exact (decimal.js through lineTotal/sumMoney). */
export function priceLines(lines: readonly { partNumber: string | null; description: string; unitPrice: string; quantity: number }[]) {
  const parts: PartLine[] = lines.map((l) => ({ ...l, lineTotal: lineTotal(l.unitPrice, l.quantity) }));
  return { parts, total: sumMoney(parts.map((p) => p.lineTotal)) };
}

const NOT_FOUND = "No such recommendation.";
const isUuid = (id: string) => z.uuid().safeParse(id).success;

/** Shelf lines take the shelf's description and price at the time of writing; free lines keep theirs. */
async function resolveLines(db: DbOrTx, actor: Actor, lines: z.output<typeof partLineSchema>[]) {
  const shelf = await findParts(db, actor, lines.flatMap((l) => (l.partNumber ? [l.partNumber] : [])));
  const resolved = lines.map((l, i) => {
    if (!l.partNumber) return l;
    const item = shelf.get(l.partNumber);
    if (!item) throw new FieldError(`parts.${i}.partNumber`, `Part number ${l.partNumber} is not on the shelf.`);
    return { ...l, description: item.description, unitPrice: item.price };
  });
  return priceLines(resolved);
}

/** The combination with the chosen blower pulley, validated again by calc's schema. */
function withPulley(spec: unknown, diameter: number): Combination {
  const c = combinationSchema.parse(spec);
  return { ...c, drive: { ...c.drive, blowerPulleyDiameter: diameter } };
}

/** The speed the boost was sold at must lie on the engine's curve (up to its redline). */
function checkTarget(spec: Combination, targetRpm: number | null) {
  if (targetRpm !== null && targetRpm > spec.engine.redlineRpm) {
    throw new FieldError("targetRpm", `The target engine speed must be at most the redline, ${Math.round(spec.engine.redlineRpm)} rpm.`);
  }
}

export async function createRecommendation(db: DbOrTx, actor: Actor, input: RecommendationInput): Promise<Recommendation> {
  assert(canWriteRecommendations(actor), "Only the shop's sales, tuners and admin write recommendations.");
  const v = recommendationInputSchema.parse(input);
  const combo = await getCombination(db, actor, v.combinationId).catch((e) => {
    if (e instanceof NotFoundError) throw new FieldError("combinationId", "That combination does not exist or is not yours to see.");
    throw e;
  });
  let source: { spec: unknown; revision: number } = { spec: combo.spec, revision: combo.revision };
  if (v.revision !== undefined && v.revision !== combo.revision) {
    const rev = await getRevision(db, actor, combo.id, v.revision).catch((e) => {
      if (e instanceof NotFoundError) throw new FieldError("revision", `The combination has no revision ${v.revision}.`);
      throw e;
    });
    source = { spec: rev.spec, revision: rev.number };
  }
  const spec = withPulley(source.spec, v.blowerPulleyDiameter);
  checkTarget(spec, v.targetRpm);
  const { parts, total } = await resolveLines(db, actor, v.parts);
  const [row] = await db
    .insert(recommendations)
    .values({
      combinationId: combo.id,
      revision: source.revision,
      authorId: actor.id,
      title: v.title,
      targetRpm: v.targetRpm,
      customerName: v.customerName,
      customerEmail: v.customerEmail,
      vehicleNotes: v.vehicleNotes,
      notes: v.notes,
      blowerPulleyDiameter: v.blowerPulleyDiameter,
      spec,
      parts,
      total,
    })
    .returning();
  return { ...(row as Recommendation), combinationName: combo.name };
}

async function findRow(db: DbOrTx, id: string): Promise<Recommendation | undefined> {
  if (!isUuid(id)) return undefined;
  const [r] = await db
    .select({ rec: recommendations, combinationName: combinations.name })
    .from(recommendations)
    .innerJoin(combinations, eq(combinations.id, recommendations.combinationId))
    .where(eq(recommendations.id, id));
  return r ? ({ ...r.rec, combinationName: r.combinationName } as Recommendation) : undefined;
}

/** One sheet for the shop's staff; members get 403 (they never see customers' sheets). */
export async function getRecommendation(db: DbOrTx, actor: Actor, id: string): Promise<Recommendation> {
  assert(canWriteRecommendations(actor), "Recommendation sheets are for the shop's sales, tuners and admin.");
  const r = await findRow(db, id);
  if (!r) throw new NotFoundError(NOT_FOUND);
  return r;
}

/**
 * One sheet for the holder of a verified share token. The token (app/_lib/share-link.ts) names
 * the one sheet it opens; this never lists or reveals any other.
 */
export async function getSharedRecommendation(db: DbOrTx, grant: { recommendationId: string }): Promise<Recommendation> {
  const r = await findRow(db, grant.recommendationId);
  if (!r) throw new NotFoundError(NOT_FOUND);
  return r;
}

export async function listRecommendations(db: DbOrTx, actor: Actor, query: z.input<typeof recommendationListQuerySchema> = {}) {
  assert(canWriteRecommendations(actor), "Recommendation sheets are for the shop's sales, tuners and admin.");
  const q = recommendationListQuerySchema.parse(query);
  const conds: (SQL | undefined)[] = [];
  if (q.status) conds.push(eq(recommendations.status, q.status));
  if (q.search) {
    const like = `%${q.search.replace(/[%_\\]/g, (c) => "\\" + c)}%`;
    conds.push(or(ilike(recommendations.title, like), ilike(recommendations.customerName, like), ilike(recommendations.customerEmail, like), ilike(combinations.name, like)));
  }
  const where = and(...conds);
  const [rows, [{ n }]] = await Promise.all([
    db
      .select({
        id: recommendations.id,
        title: recommendations.title,
        customerName: recommendations.customerName,
        customerEmail: recommendations.customerEmail,
        status: recommendations.status,
        total: recommendations.total,
        blowerPulleyDiameter: recommendations.blowerPulleyDiameter,
        revision: recommendations.revision,
        sentAt: recommendations.sentAt,
        updatedAt: recommendations.updatedAt,
        combinationId: recommendations.combinationId,
        combinationName: combinations.name,
        authorName: users.name,
      })
      .from(recommendations)
      .innerJoin(combinations, eq(combinations.id, recommendations.combinationId))
      .innerJoin(users, eq(users.id, recommendations.authorId))
      .where(where)
      .orderBy(desc(recommendations.updatedAt))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(recommendations).innerJoin(combinations, eq(combinations.id, recommendations.combinationId)).where(where),
  ]);
  return { rows, total: n, page: q.page, pageSize: q.pageSize };
}

/** Edits a draft. A sent sheet is what the customer holds: set it back to draft first. */
export async function updateRecommendation(db: DbOrTx, actor: Actor, id: string, input: z.input<typeof updateRecommendationSchema>): Promise<Recommendation> {
  const current = await getRecommendation(db, actor, id);
  const v = updateRecommendationSchema.parse(input);
  if (current.status !== "draft") throw new ConflictError(`This sheet is ${current.status}; set it back to draft before you change it.`, { field: "status" });
  const spec = withPulley(current.spec, v.blowerPulleyDiameter);
  checkTarget(spec, v.targetRpm);
  const { parts, total } = await resolveLines(db, actor, v.parts);
  const [row] = await db
    .update(recommendations)
    .set({ title: v.title, targetRpm: v.targetRpm, customerName: v.customerName, customerEmail: v.customerEmail, vehicleNotes: v.vehicleNotes, notes: v.notes, blowerPulleyDiameter: v.blowerPulleyDiameter, spec, parts, total, updatedAt: new Date() })
    .where(and(eq(recommendations.id, id), eq(recommendations.status, "draft")))
    .returning();
  if (!row) throw new ConflictError("This sheet changed status while you were editing it; reload it.", { field: "status" });
  return { ...(row as Recommendation), combinationName: current.combinationName };
}

/** Draft, accepted or declined by hand; accepted and declined need a sheet that went out. */
export async function setRecommendationStatus(db: DbOrTx, actor: Actor, id: string, input: z.input<typeof statusChangeSchema>): Promise<Recommendation> {
  const current = await getRecommendation(db, actor, id);
  const { status } = statusChangeSchema.parse(input);
  if ((status === "accepted" || status === "declined") && current.status === "draft") {
    throw new ConflictError("Send the sheet to the customer before marking it accepted or declined.", { field: "status" });
  }
  const [row] = await db.update(recommendations).set({ status, updatedAt: new Date() }).where(eq(recommendations.id, id)).returning();
  return { ...(row as Recommendation), combinationName: current.combinationName };
}

/** After a successful send: status sent, when, and no error. */
export async function markRecommendationSent(db: DbOrTx, actor: Actor, id: string, at = new Date()) {
  await getRecommendation(db, actor, id);
  const [row] = await db.update(recommendations).set({ status: "sent", sentAt: at, lastError: null, updatedAt: at }).where(eq(recommendations.id, id)).returning();
  return row;
}

/** After a failed send: the status stays as it was (a draft stays a draft) and the error is kept to show. */
export async function recordSendFailure(db: DbOrTx, actor: Actor, id: string, message: string) {
  await getRecommendation(db, actor, id);
  const [row] = await db
    .update(recommendations)
    .set({ lastError: message.slice(0, 500), updatedAt: new Date() })
    .where(eq(recommendations.id, id))
    .returning();
  return row;
}

/**
 * The outbox's report on a sheet's e-mail (no actor: the mail sender reports what happened to a
 * send that a permitted user started). Success marks it sent; a failure keeps the status and the error.
 */
export async function settleRecommendationMail(db: DbOrTx, id: string, error: string | null, at = new Date()) {
  const set = error === null ? { status: "sent" as const, sentAt: at, lastError: null, updatedAt: at } : { lastError: error.slice(0, 500), updatedAt: at };
  await db.update(recommendations).set(set).where(eq(recommendations.id, id));
}

/** Stops every share link sent so far for a sheet (its share version moves on); a new send makes a new link. */
export async function revokeShareLinks(db: DbOrTx, actor: Actor, id: string) {
  await getRecommendation(db, actor, id);
  const at = new Date();
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(recommendations)
      .set({ shareVersion: sql`${recommendations.shareVersion} + 1`, updatedAt: at })
      .where(eq(recommendations.id, id))
      .returning({ shareVersion: recommendations.shareVersion });
    // The frozen copies behind those links are withdrawn too (db/repo/sheet-versions.ts).
    await tx.update(sheetVersions).set({ revokedAt: at }).where(and(eq(sheetVersions.recommendationId, id), isNull(sheetVersions.revokedAt)));
    return row;
  });
}
