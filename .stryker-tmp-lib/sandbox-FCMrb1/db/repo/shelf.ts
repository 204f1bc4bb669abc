// @ts-nocheck
// The parts shelf: the shop's blowers and pulleys with price and stock. Everyone signed in reads
// it; only the admin changes it (db/policy.ts canEditShelf). Quantities are SI like calc/, money
// is numeric in the database (read back as strings) and decimal.js here, never binary floats.
// The rules (zod schemas, money) live in lib/shelf/rules.ts; CSV import and export in shelf-csv.ts.
import { and, asc, count, desc, eq, gt, ilike, inArray, or, type SQL } from "drizzle-orm";
import { z } from "zod";
import { fromSI } from "@/calc";
import type { DbOrTx } from "../connect";
import { FieldError, NotFoundError } from "@/lib/errors";
import {
  type BlowerListQuery,
  type BlowerRecordInput,
  type Page,
  type PulleyListQuery,
  type PulleyRecordInput,
  blowerListQuerySchema,
  blowerRecordSchema,
  pulleyListQuerySchema,
  pulleyRecordSchema,
} from "@/lib/shelf/rules";
import { assert, canEditShelf, canSeeShelf, type Actor } from "../policy";
import { blowers, pulleys, type BlowerRow, type PulleyRow } from "../schema";

const likeOf = (s: string) => `%${s.replace(/[%_\\]/g, (c) => "\\" + c)}%`;

export async function listPulleys(db: DbOrTx, actor: Actor, query: PulleyListQuery = {}): Promise<Page<PulleyRow>> {
  assert(canSeeShelf(actor));
  const q = pulleyListQuerySchema.parse(query);
  const conds: (SQL | undefined)[] = [];
  if (q.search) conds.push(or(ilike(pulleys.partNumber, likeOf(q.search)), ilike(pulleys.notes, likeOf(q.search))));
  if (q.position) conds.push(eq(pulleys.position, q.position));
  if (typeof q.ribCount === "number") conds.push(eq(pulleys.ribCount, q.ribCount));
  if (q.inStock) conds.push(gt(pulleys.stock, 0));
  const where = and(...conds);
  const col = pulleys[q.sort];
  const [rows, [{ n }]] = await Promise.all([
    db
      .select()
      .from(pulleys)
      .where(where)
      .orderBy(q.dir === "asc" ? asc(col) : desc(col), asc(pulleys.partNumber))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(pulleys).where(where),
  ]);
  return { rows, total: n, page: q.page, pageSize: q.pageSize };
}

export async function listBlowers(db: DbOrTx, actor: Actor, query: BlowerListQuery = {}): Promise<Page<BlowerRow>> {
  assert(canSeeShelf(actor));
  const q = blowerListQuerySchema.parse(query);
  const conds: (SQL | undefined)[] = [];
  if (q.search) conds.push(or(ilike(blowers.partNumber, likeOf(q.search)), ilike(blowers.name, likeOf(q.search)), ilike(blowers.notes, likeOf(q.search))));
  if (q.kind) conds.push(eq(blowers.kind, q.kind));
  if (q.inStock) conds.push(gt(blowers.stock, 0));
  const where = and(...conds);
  const col = blowers[q.sort];
  const [rows, [{ n }]] = await Promise.all([
    db
      .select()
      .from(blowers)
      .where(where)
      .orderBy(q.dir === "asc" ? asc(col) : desc(col), asc(blowers.partNumber))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(blowers).where(where),
  ]);
  return { rows, total: n, page: q.page, pageSize: q.pageSize };
}

/** Every blower pulley on the shelf, smallest first: the candidates of the pulley ladder. */
export async function listBlowerPulleys(db: DbOrTx, actor: Actor): Promise<PulleyRow[]> {
  assert(canSeeShelf(actor));
  return db.select().from(pulleys).where(eq(pulleys.position, "blower")).orderBy(asc(pulleys.diameter), asc(pulleys.ribCount));
}

/** Everything on the shelf as parts-list choices: pulleys by position and size, then blowers. */
export async function listShelfParts(db: DbOrTx, actor: Actor) {
  assert(canSeeShelf(actor));
  const [ps, bs] = await Promise.all([
    db.select().from(pulleys).orderBy(asc(pulleys.position), asc(pulleys.diameter), asc(pulleys.ribCount)),
    db.select().from(blowers).orderBy(asc(blowers.displacementPerRev)),
  ]);
  return [
    ...ps.map((p) => ({ partNumber: p.partNumber, description: describePulley(p), price: p.price, stock: p.stock, position: p.position as string, diameter: p.diameter })),
    ...bs.map((b) => ({ partNumber: b.partNumber, description: `Blower, ${b.name}`, price: b.price, stock: b.stock, position: "blower-unit" })),
  ];
}

/** Shelf items by part number (for parts lists). */
export async function findParts(db: DbOrTx, actor: Actor, partNumbers: readonly string[]) {
  assert(canSeeShelf(actor));
  const wanted = [...new Set(partNumbers.map((p) => p.toUpperCase()))];
  if (!wanted.length) return new Map<string, { partNumber: string; description: string; price: string }>();
  const [ps, bs] = await Promise.all([
    db.select().from(pulleys).where(inArray(pulleys.partNumber, wanted)),
    db.select().from(blowers).where(inArray(blowers.partNumber, wanted)),
  ]);
  const out = new Map<string, { partNumber: string; description: string; price: string }>();
  for (const p of ps) out.set(p.partNumber, { partNumber: p.partNumber, description: describePulley(p), price: p.price });
  for (const b of bs) out.set(b.partNumber, { partNumber: b.partNumber, description: `Blower, ${b.name}`, price: b.price });
  return out;
}

/** "Blower pulley 3.40 in (86.4 mm), 8-rib". */
export function describePulley(p: Pick<PulleyRow, "position" | "diameter" | "ribCount">): string {
  const inches = fromSI("length-small", p.diameter, "imperial");
  const mm = fromSI("length-small", p.diameter, "metric");
  return `${p.position === "crank" ? "Crank" : "Blower"} pulley ${inches.toFixed(2)} in (${mm.toFixed(1)} mm), ${p.ribCount}-rib`;
}

// ---------------------------------------------------------------- edits (admin)

export const ONLY_ADMIN = "Only the admin changes the parts shelf.";
const isUuid = (id: string) => z.uuid().safeParse(id).success;

async function partNumberTaken(db: DbOrTx, partNumber: string, exceptId?: string) {
  const [p] = await db.select({ id: pulleys.id }).from(pulleys).where(eq(pulleys.partNumber, partNumber));
  const [b] = await db.select({ id: blowers.id }).from(blowers).where(eq(blowers.partNumber, partNumber));
  const hit = p?.id ?? b?.id;
  return hit !== undefined && hit !== exceptId;
}

export async function createPulley(db: DbOrTx, actor: Actor, input: PulleyRecordInput): Promise<PulleyRow> {
  assert(canEditShelf(actor), ONLY_ADMIN);
  const v = pulleyRecordSchema.parse(input);
  if (await partNumberTaken(db, v.partNumber)) throw new FieldError("partNumber", `Part number ${v.partNumber} is already on the shelf.`);
  const [row] = await db.insert(pulleys).values(v).returning();
  return row;
}

export async function updatePulley(db: DbOrTx, actor: Actor, id: string, input: PulleyRecordInput): Promise<PulleyRow> {
  assert(canEditShelf(actor), ONLY_ADMIN);
  const v = pulleyRecordSchema.parse(input);
  if (!isUuid(id)) throw new NotFoundError("No such pulley.");
  if (await partNumberTaken(db, v.partNumber, id)) throw new FieldError("partNumber", `Part number ${v.partNumber} is already on the shelf.`);
  const [row] = await db.update(pulleys).set({ ...v, updatedAt: new Date() }).where(eq(pulleys.id, id)).returning();
  if (!row) throw new NotFoundError("No such pulley.");
  return row;
}

export async function deletePulley(db: DbOrTx, actor: Actor, id: string) {
  assert(canEditShelf(actor), ONLY_ADMIN);
  if (!isUuid(id)) throw new NotFoundError("No such pulley.");
  const [row] = await db.delete(pulleys).where(eq(pulleys.id, id)).returning({ id: pulleys.id });
  if (!row) throw new NotFoundError("No such pulley.");
}

export async function createBlower(db: DbOrTx, actor: Actor, input: BlowerRecordInput): Promise<BlowerRow> {
  assert(canEditShelf(actor), ONLY_ADMIN);
  const v = blowerRecordSchema.parse(input);
  if (await partNumberTaken(db, v.partNumber)) throw new FieldError("partNumber", `Part number ${v.partNumber} is already on the shelf.`);
  const [row] = await db.insert(blowers).values(v).returning();
  return row;
}

export async function updateBlower(db: DbOrTx, actor: Actor, id: string, input: BlowerRecordInput): Promise<BlowerRow> {
  assert(canEditShelf(actor), ONLY_ADMIN);
  const v = blowerRecordSchema.parse(input);
  if (!isUuid(id)) throw new NotFoundError("No such blower.");
  if (await partNumberTaken(db, v.partNumber, id)) throw new FieldError("partNumber", `Part number ${v.partNumber} is already on the shelf.`);
  const [row] = await db.update(blowers).set({ ...v, updatedAt: new Date() }).where(eq(blowers.id, id)).returning();
  if (!row) throw new NotFoundError("No such blower.");
  return row;
}

export async function deleteBlower(db: DbOrTx, actor: Actor, id: string) {
  assert(canEditShelf(actor), ONLY_ADMIN);
  if (!isUuid(id)) throw new NotFoundError("No such blower.");
  const [row] = await db.delete(blowers).where(eq(blowers.id, id)).returning({ id: blowers.id });
  if (!row) throw new NotFoundError("No such blower.");
}
