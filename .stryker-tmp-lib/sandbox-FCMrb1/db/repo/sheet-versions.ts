// @ts-nocheck
// What the customer was sent. Each send freezes the sheet as it stood into a new version and
// makes that number the sheet's share version; the share link names (sheet, version), so edits
// made after sending never change what the customer reads. Sending again makes a new version
// (older links still open their copy, with a notice, but cannot be paid); stopping the links
// (revokeShareLinks) withdraws every version sent so far.
import { and, desc, eq, isNull, max, type SQL } from "drizzle-orm";
import type { Combination } from "@/calc";
import type { DbOrTx } from "../connect";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { assert, canWriteRecommendations, type Actor } from "../policy";
import { recommendations, sheetVersions, type SheetVersionRow } from "../schema";
import { defaultSheetTitle, type PartLine } from "@/lib/recommendations/rules";
import { getRecommendation, type Recommendation } from "./recommendations";

/** The sheet as sent: what the customer's link shows and what an order is made from. */
export type SheetSnapshot = {
  id: string;
  /** The customer-facing title (empty: a default built from the customer's name). */
  title: string;
  customerName: string;
  customerEmail: string | null;
  vehicleNotes: string;
  notes: string;
  revision: number;
  /** The combination's internal name: kept for staff, never shown to the customer. */
  combinationName: string;
  /** The engine speed the boost was sold at (rpm), or null for redline. */
  targetRpm: number | null;
  blowerPulleyDiameter: number;
  parts: PartLine[];
  total: string;
  currency: string;
  spec: Combination;
  status: string;
  createdAt: Date;
  sentAt: Date | null;
};

export type SentVersion = Omit<SheetVersionRow, "snapshot"> & { snapshot: SheetSnapshot; latest: boolean; recommendationStatus: string };

type StoredSnapshot = Omit<SheetSnapshot, "createdAt" | "sentAt"> & { createdAt: string; sentAt: string | null };

function revive(s: StoredSnapshot): SheetSnapshot {
  return { ...s, createdAt: new Date(s.createdAt), sentAt: s.sentAt ? new Date(s.sentAt) : null };
}

export type SentGrant = { recommendationId: string; version: number };

/** Freezes the sheet as it is now into the next version, which becomes its share version (call it as the e-mail is queued). */
export async function recordSentVersion(db: DbOrTx, actor: Actor, rec: Recommendation, currency: string, at = new Date()): Promise<SheetVersionRow> {
  assert(canWriteRecommendations(actor), "Only the shop's sales, tuners and admin send sheets.");
  const snapshot: StoredSnapshot = {
    id: rec.id,
    title: rec.title || defaultSheetTitle(rec.customerName),
    customerName: rec.customerName,
    customerEmail: rec.customerEmail,
    vehicleNotes: rec.vehicleNotes,
    notes: rec.notes,
    revision: rec.revision,
    combinationName: rec.combinationName,
    targetRpm: rec.targetRpm ?? null,
    blowerPulleyDiameter: rec.blowerPulleyDiameter,
    parts: rec.parts,
    total: rec.total,
    currency,
    spec: rec.spec,
    status: "sent",
    createdAt: rec.createdAt.toISOString(),
    sentAt: at.toISOString(),
  };
  // Past every version and share version so far: a stopped link's number is never reused.
  return db.transaction(async (tx) => {
    const [sheet] = await tx.select({ shareVersion: recommendations.shareVersion }).from(recommendations).where(eq(recommendations.id, rec.id)).for("update");
    if (!sheet) throw new NotFoundError("No such recommendation.");
    const [{ n }] = await tx.select({ n: max(sheetVersions.version) }).from(sheetVersions).where(eq(sheetVersions.recommendationId, rec.id));
    const version = Math.max(n ?? 0, sheet.shareVersion) + 1;
    const [row] = await tx.insert(sheetVersions).values({ recommendationId: rec.id, version, snapshot, sentAt: at }).returning();
    await tx.update(recommendations).set({ shareVersion: version }).where(eq(recommendations.id, rec.id));
    return row;
  });
}

async function loadVersion(db: DbOrTx, where: SQL | undefined): Promise<SentVersion | undefined> {
  const [row] = await db
    .select({ v: sheetVersions, status: recommendations.status })
    .from(sheetVersions)
    .innerJoin(recommendations, eq(recommendations.id, sheetVersions.recommendationId))
    .where(where);
  if (!row) return undefined;
  const [{ n }] = await db.select({ n: max(sheetVersions.version) }).from(sheetVersions).where(eq(sheetVersions.recommendationId, row.v.recommendationId));
  return { ...row.v, snapshot: revive(row.v.snapshot as StoredSnapshot), latest: row.v.version === n, recommendationStatus: row.status };
}

/**
 * One sent version for the holder of a verified share token naming it. Undefined when the token
 * names no sent version (a print token, or a link from before versions); NotFound once stopped.
 */
export async function getSentVersion(db: DbOrTx, grant: SentGrant): Promise<SentVersion | undefined> {
  const v = await loadVersion(db, and(eq(sheetVersions.recommendationId, grant.recommendationId), eq(sheetVersions.version, grant.version)));
  if (v?.revokedAt) throw new NotFoundError("This link was withdrawn by the shop.");
  return v;
}

/** One version by its id, withdrawn or not (an order keeps the version it was made from). */
export const getSentVersionById = (db: DbOrTx, id: string) => loadVersion(db, eq(sheetVersions.id, id));

/** The newest version of a sheet, for staff (its link is shown on the sheet page). */
export async function getLatestSentVersion(db: DbOrTx, actor: Actor, recommendationId: string): Promise<SheetVersionRow | undefined> {
  await getRecommendation(db, actor, recommendationId);
  const [row] = await db
    .select()
    .from(sheetVersions)
    .where(and(eq(sheetVersions.recommendationId, recommendationId), isNull(sheetVersions.revokedAt)))
    .orderBy(desc(sheetVersions.version))
    .limit(1);
  return row;
}

/** The customer's "no, thank you", with an optional reason; the sheet becomes declined. */
export async function declineSentVersion(db: DbOrTx, grant: SentGrant, reason: string, at = new Date()) {
  const v = await getSentVersion(db, grant);
  if (!v) throw new NotFoundError("No such sheet.");
  if (!v.latest) throw new ConflictError("A newer version of this sheet was sent; answer on the newest e-mail.", { field: "version" });
  if (v.recommendationStatus !== "sent") throw new ConflictError(`This sheet is already ${v.recommendationStatus}.`, { field: "status" });
  return db.transaction(async (tx) => {
    await tx.update(sheetVersions).set({ declinedAt: at, declineReason: reason || null }).where(eq(sheetVersions.id, v.id));
    await tx.update(recommendations).set({ status: "declined", updatedAt: at }).where(and(eq(recommendations.id, v.recommendationId), eq(recommendations.status, "sent")));
    return { status: "declined" as const };
  });
}

