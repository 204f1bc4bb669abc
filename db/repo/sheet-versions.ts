// What the customer was sent. Each send freezes the sheet as it stood into a new version; the
// share link names that version, so edits made after sending never change what the customer
// reads. Sending again makes a new version (older links show a notice and cannot be paid);
// staff can revoke every link of a sheet at once.
import { and, desc, eq, isNull, max } from "drizzle-orm";
import type { Combination } from "@/calc";
import type { DbOrTx } from "../connect";
import { ConflictError, NotFoundError } from "../errors";
import { assert, canWriteRecommendations, type Actor } from "../policy";
import { recommendations, sheetVersions, type SheetVersionRow } from "../schema";
import { defaultSheetTitle, type PartLine } from "../recommendation-rules";
import { getRecommendation, type Recommendation } from "./recommendations";

/** The sheet as sent: what the customer's link shows and what an order is made from. */
export type SheetSnapshot = {
  id: string;
  title: string;
  customerName: string;
  customerEmail: string | null;
  vehicleNotes: string;
  notes: string;
  revision: number;
  /** The combination's internal name: kept for staff, never shown to the customer. */
  combinationName: string;
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

/** Freezes the sheet as it is now into the next version (call it when the e-mail went out). */
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
  // Two sends at once: the unique (sheet, version) index turns the loser into a retry.
  for (let attempt = 0; ; attempt++) {
    const [{ n }] = await db.select({ n: max(sheetVersions.version) }).from(sheetVersions).where(eq(sheetVersions.recommendationId, rec.id));
    const rows = await db
      .insert(sheetVersions)
      .values({ recommendationId: rec.id, version: (n ?? 0) + 1, snapshot, sentAt: at })
      .onConflictDoNothing()
      .returning();
    if (rows[0]) return rows[0];
    if (attempt > 5) throw new ConflictError("The sheet is being sent by someone else right now; try again.");
  }
}

async function loadVersion(db: DbOrTx, versionId: string): Promise<SentVersion | undefined> {
  const [row] = await db
    .select({ v: sheetVersions, status: recommendations.status })
    .from(sheetVersions)
    .innerJoin(recommendations, eq(recommendations.id, sheetVersions.recommendationId))
    .where(eq(sheetVersions.id, versionId));
  if (!row) return undefined;
  const [{ n }] = await db.select({ n: max(sheetVersions.version) }).from(sheetVersions).where(eq(sheetVersions.recommendationId, row.v.recommendationId));
  return { ...row.v, snapshot: revive(row.v.snapshot as StoredSnapshot), latest: row.v.version === n, recommendationStatus: row.status };
}

/**
 * One sent version for the holder of a verified share token naming it. Undefined when the token
 * names something else (an older link naming the sheet itself); NotFound once revoked.
 */
export async function getSentVersion(db: DbOrTx, grant: { versionId: string }): Promise<SentVersion | undefined> {
  const v = await loadVersion(db, grant.versionId);
  if (v?.revokedAt) throw new NotFoundError("This link was withdrawn by the shop.");
  return v;
}

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

/** Withdraws every link of a sheet; the customer's page then says so. Returns how many were live. */
export async function revokeSheetLinks(db: DbOrTx, actor: Actor, recommendationId: string, at = new Date()): Promise<number> {
  await getRecommendation(db, actor, recommendationId);
  const rows = await db
    .update(sheetVersions)
    .set({ revokedAt: at })
    .where(and(eq(sheetVersions.recommendationId, recommendationId), isNull(sheetVersions.revokedAt)))
    .returning({ id: sheetVersions.id });
  return rows.length;
}

/** The customer's "no, thank you", with an optional reason; the sheet becomes declined. */
export async function declineSentVersion(db: DbOrTx, grant: { versionId: string }, reason: string, at = new Date()) {
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

/** Undoes a version whose e-mail could not be sent: the customer never got its link. */
export async function discardSentVersion(db: DbOrTx, actor: Actor, versionId: string) {
  assert(canWriteRecommendations(actor), "Only the shop's sales, tuners and admin send sheets.");
  await db.delete(sheetVersions).where(eq(sheetVersions.id, versionId));
}
