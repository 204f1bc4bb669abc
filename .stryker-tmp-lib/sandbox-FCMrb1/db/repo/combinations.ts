// @ts-nocheck
// Saved combinations and their revisions. Every function takes the acting user and checks the
// role rules of db/policy.ts before it reads or writes; every save writes a revision, and a save
// based on an out-of-date revision is refused (409) instead of overwriting someone else's edit.
import { and, asc, count, desc, eq, ilike, isNull, or, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { plainText } from "@/lib/validation/text";
import { combinationSchema, type Combination } from "@/calc";
import type { DbOrTx } from "../connect";
import { preparedFor } from "../prepared";
import { ConflictError, FieldError, ForbiddenError, NotFoundError } from "@/lib/errors";
import { assert, canCreateForCustomer, canReadOwned, canSeeCustomer, canWriteOwned, isShopStaff, type Actor } from "../policy";
import { combinationRevisions, combinations, users, type CombinationRow } from "../schema";

/** Fields a person edits besides the spec. */
export const combinationMetaSchema = z.object({
  name: plainText("Name", 120).min(1, "Give the combination a name."),
  customerName: plainText("Customer name", 120).nullish().transform((v) => v || null),
  customerContact: plainText("Customer contact", 200).nullish().transform((v) => v || null),
});

export const createCombinationSchema = combinationMetaSchema.extend({
  spec: combinationSchema,
  note: plainText("Note", 500, { multiline: true }).nullish(),
});

export const saveCombinationSchema = combinationMetaSchema.partial().extend({
  spec: combinationSchema.optional(),
  note: plainText("Note", 500, { multiline: true }).nullish(),
  /** The revision the edit started from; the save is refused if someone saved since. */
  baseRevision: z
    .number({ error: "baseRevision (the revision you started from) is required." })
    .int("baseRevision must be a whole number.")
    .min(1, "baseRevision must be 1 or more."),
});

/** A restore request: which revision to bring back, and the revision the person was looking at. */
export const restoreRevisionSchema = z.object({
  action: z.literal("restore", { error: 'action must be "restore"' }),
  number: z.number({ error: "number (the revision to restore) is required." }).int("number must be a whole number.").min(1, "number must be 1 or more."),
  baseRevision: saveCombinationSchema.shape.baseRevision,
});

export const listQuerySchema = z.object({
  search: plainText("Search", 100).optional(),
  sort: z.enum(["name", "updatedAt", "createdAt", "displacement", "blowerPulleyDiameter"]).default("updatedAt"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  page: z.coerce.number().int().min(1, "page must be 1 or more").default(1),
  pageSize: z.coerce.number().int().min(1).max(100, "pageSize must be at most 100").default(20),
  /** mine: owned by me; shop: every visible combination but the demo ones; demo: the shop's examples. */
  scope: z.enum(["mine", "shop", "demo"], { error: "scope must be mine, shop or demo" }).optional(),
});

export type CreateCombinationInput = z.input<typeof createCombinationSchema>;
export type SaveCombinationInput = z.input<typeof saveCombinationSchema>;
export type ListQuery = z.input<typeof listQuerySchema>;

const listed = (spec: Combination) => ({
  displacement: spec.engine.displacement,
  blowerKind: spec.blower.kind,
  blowerPulleyDiameter: spec.drive.blowerPulleyDiameter,
});

/** Which combinations `actor` may see: their own; staff see the shop's; instructors also see the demo ones. */
function visibilityOf(actor: Actor) {
  if (isShopStaff(actor)) return "all" as const;
  return actor.role === "instructor" ? ("own-and-demo" as const) : ("own" as const);
}

type ListShape = Required<Pick<z.output<typeof listQuerySchema>, "sort" | "dir">> &
  Pick<z.output<typeof listQuerySchema>, "scope"> & { visibility: ReturnType<typeof visibilityOf>; search: boolean };

const actorId = sql.placeholder("actorId");

/** The list query for one shape, with the actor, search text and page as placeholders; `key` names the shape. */
function buildListQuery(db: DbOrTx, shape: ListShape, key: string) {
  const conds: (SQL | undefined)[] = [isNull(combinations.deletedAt)];
  if (shape.visibility === "own") conds.push(eq(combinations.ownerId, actorId));
  if (shape.visibility === "own-and-demo") conds.push(or(eq(combinations.ownerId, actorId), eq(combinations.isDemo, true)));
  if (shape.scope === "mine") conds.push(eq(combinations.ownerId, actorId));
  if (shape.scope === "shop") conds.push(eq(combinations.isDemo, false));
  if (shape.scope === "demo") conds.push(eq(combinations.isDemo, true));
  if (shape.search) {
    const like = sql.placeholder("like");
    // Customer fields are searched only where the searcher may see them (else a match would tell).
    const customerMatch = or(ilike(combinations.customerName, like), ilike(combinations.customerContact, like));
    conds.push(or(ilike(combinations.name, like), shape.visibility === "all" ? customerMatch : and(eq(combinations.ownerId, actorId), customerMatch)));
  }
  const where = and(...conds);
  const col = combinations[shape.sort];
  // One query for the page and the total (a window count), so a list costs one round trip.
  const page = db
    .select({
      id: combinations.id,
      name: combinations.name,
      ownerId: combinations.ownerId,
      ownerName: users.name,
      ownerEmail: users.email,
      customerName: combinations.customerName,
      customerContact: combinations.customerContact,
      displacement: combinations.displacement,
      blowerKind: combinations.blowerKind,
      blowerPulleyDiameter: combinations.blowerPulleyDiameter,
      revision: combinations.revision,
      isDemo: combinations.isDemo,
      createdAt: combinations.createdAt,
      updatedAt: combinations.updatedAt,
      total: sql<number>`count(*) over ()`.mapWith(Number),
    })
    .from(combinations)
    .innerJoin(users, eq(users.id, combinations.ownerId))
    .where(where)
    .orderBy(shape.dir === "asc" ? asc(col) : desc(col), asc(combinations.id))
    .limit(sql.placeholder("limit"))
    .offset(sql.placeholder("offset"));
  // Past the last page there is no row to carry the total: that rare case counts separately.
  const total = db.select({ n: count() }).from(combinations).where(where);
  return { page: page.prepare(`list ${key}`), total: total.prepare(`count ${key}`) };
}

// The list is the busiest query in the app. Its shapes are few (visibility × scope × search × sort
// × direction), so each is a named prepared statement (db/prepared.ts).
export async function listCombinations(db: DbOrTx, actor: Actor, query: ListQuery = {}) {
  const q = listQuerySchema.parse(query);
  const shape: ListShape = { visibility: visibilityOf(actor), scope: q.scope, search: !!q.search, sort: q.sort, dir: q.dir };
  const key = [shape.visibility, shape.scope ?? "any", shape.search ? "search" : "all", shape.sort, shape.dir].join(" "); // at most 50 characters
  const prepared = preparedFor(db, `list ${key}`, () => buildListQuery(db, shape, key));
  const params = {
    actorId: actor.id,
    like: q.search ? `%${q.search.replace(/[%_\\]/g, (c) => "\\" + c)}%` : undefined,
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  };
  const rows = await prepared.page.execute(params);
  const total = rows.length ? rows[0].total : (await prepared.total.execute(params))[0].n;
  return { items: rows.map(({ total: _t, ...r }) => maskCustomer(actor, r)), total, page: q.page, pageSize: q.pageSize };
}

/** Hides the customer fields of a row the actor may read but whose customer is not theirs to know. */
function maskCustomer<T extends { ownerId: string; customerName: string | null; customerContact: string | null }>(actor: Actor, row: T): T {
  return canSeeCustomer(actor, row.ownerId) ? row : { ...row, customerName: null, customerContact: null };
}

async function findRow(db: DbOrTx, id: string, opts: { includeDeleted?: boolean } = {}) {
  if (!z.uuid().safeParse(id).success) return undefined;
  const [row] = await db
    .select()
    .from(combinations)
    .where(and(eq(combinations.id, id), opts.includeDeleted ? undefined : isNull(combinations.deletedAt)));
  return row;
}

/** A combination `actor` may read; 404 when it does not exist or is not theirs to see (no hint which). */
export async function getCombination(db: DbOrTx, actor: Actor, id: string): Promise<CombinationRow & { spec: Combination }> {
  const row = await findRow(db, id);
  if (!row || !canReadOwned(actor, row.ownerId, { isDemo: row.isDemo })) throw new NotFoundError("No such combination.");
  return maskCustomer(actor, row) as CombinationRow & { spec: Combination };
}

async function getWritable(db: DbOrTx, actor: Actor, id: string, opts: { includeDeleted?: boolean } = {}) {
  const row = await findRow(db, id, opts);
  if (!row || !canReadOwned(actor, row.ownerId, { isDemo: row.isDemo })) throw new NotFoundError("No such combination.");
  assert(canWriteOwned(actor, row.ownerId), "You can view this combination but not change it. Duplicate it to make your own copy.");
  return row;
}

/** Customer details are the shop's business: only staff may set them (refused, not silently dropped). */
function assertMayKeepCustomer(actor: Actor, v: { customerName?: string | null; customerContact?: string | null }) {
  if ((v.customerName || v.customerContact) && !canCreateForCustomer(actor)) {
    throw new ForbiddenError("Only shop staff (tuner, sales, admin) can keep a combination for a customer.");
  }
}

export async function createCombination(db: DbOrTx, actor: Actor, input: CreateCombinationInput, opts: { isDemo?: boolean } = {}) {
  const v = createCombinationSchema.parse(input);
  assertMayKeepCustomer(actor, v);
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(combinations)
      .values({ ownerId: actor.id, name: v.name, customerName: v.customerName, customerContact: v.customerContact, spec: v.spec, ...listed(v.spec), revision: 1, isDemo: !!opts.isDemo })
      .returning();
    await tx.insert(combinationRevisions).values({ combinationId: row.id, number: 1, name: v.name, spec: v.spec, note: v.note || "First version", authorId: actor.id });
    // The stored spec is the one calc's schema just parsed.
    return row as CombinationRow & { spec: Combination };
  });
}

/**
 * Saves an edit as a new revision. The update only matches when the stored revision is still the
 * one the edit started from, so two people saving at once cannot overwrite each other: the second
 * gets a 409 naming the revision it missed.
 */
export async function saveCombination(db: DbOrTx, actor: Actor, id: string, input: SaveCombinationInput) {
  const v = saveCombinationSchema.parse(input);
  const current = await getWritable(db, actor, id);
  assertMayKeepCustomer(actor, v);
  const spec = (v.spec ?? current.spec) as Combination;
  const name = v.name ?? current.name;
  const customer = canCreateForCustomer(actor)
    ? { customerName: v.customerName === undefined ? current.customerName : v.customerName, customerContact: v.customerContact === undefined ? current.customerContact : v.customerContact }
    : {};
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(combinations)
      .set({ name, spec, ...listed(spec), ...customer, revision: sql`${combinations.revision} + 1`, updatedAt: new Date() })
      .where(and(eq(combinations.id, id), eq(combinations.revision, v.baseRevision), isNull(combinations.deletedAt)))
      .returning();
    if (!row) {
      const [now] = await tx.select({ revision: combinations.revision }).from(combinations).where(eq(combinations.id, id));
      throw new ConflictError(
        `This combination was saved by someone else (now revision ${now?.revision ?? "?"}) after you opened revision ${v.baseRevision}. Reload it, then make your change again.`,
        { field: "baseRevision", currentRevision: now?.revision },
      );
    }
    await tx.insert(combinationRevisions).values({ combinationId: id, number: row.revision, name, spec, note: v.note || null, authorId: actor.id });
    return row as CombinationRow & { spec: Combination };
  });
}

/** Renames without changing the spec (still a revision, so the history shows it). */
export async function renameCombination(db: DbOrTx, actor: Actor, id: string, name: string, baseRevision: number) {
  return saveCombination(db, actor, id, { name, baseRevision, note: `Renamed to “${name}”` });
}

/** A copy owned by `actor`, starting a fresh history. */
export async function duplicateCombination(db: DbOrTx, actor: Actor, id: string, opts: { name?: string; revision?: number } = {}) {
  const src = await getCombination(db, actor, id);
  const spec = opts.revision ? (await getRevision(db, actor, id, opts.revision)).spec : src.spec;
  return createCombination(db, actor, {
    name: (opts.name ?? `${src.name} (copy)`).slice(0, 120),
    spec: spec as Combination,
    customerName: isShopStaff(actor) ? src.customerName : null,
    customerContact: isShopStaff(actor) ? src.customerContact : null,
    note: opts.revision ? `Copied from “${src.name}”, revision ${opts.revision}` : `Copied from “${src.name}”`,
  });
}

/** Moves a combination to the bin; `undoDelete` brings it back. */
export async function deleteCombination(db: DbOrTx, actor: Actor, id: string) {
  await getWritable(db, actor, id);
  await db.update(combinations).set({ deletedAt: new Date() }).where(eq(combinations.id, id));
}

export async function undoDelete(db: DbOrTx, actor: Actor, id: string) {
  const row = await getWritable(db, actor, id, { includeDeleted: true });
  if (!row.deletedAt) return row;
  const [r] = await db.update(combinations).set({ deletedAt: null }).where(eq(combinations.id, id)).returning();
  return r;
}

export async function listRevisions(db: DbOrTx, actor: Actor, id: string) {
  await getCombination(db, actor, id);
  return db
    .select({
      number: combinationRevisions.number,
      name: combinationRevisions.name,
      note: combinationRevisions.note,
      createdAt: combinationRevisions.createdAt,
      authorName: users.name,
      spec: combinationRevisions.spec,
    })
    .from(combinationRevisions)
    .leftJoin(users, eq(users.id, combinationRevisions.authorId))
    .where(eq(combinationRevisions.combinationId, id))
    .orderBy(desc(combinationRevisions.number));
}

export async function getRevision(db: DbOrTx, actor: Actor, id: string, number: number) {
  await getCombination(db, actor, id);
  const [rev] = await db
    .select()
    .from(combinationRevisions)
    .where(and(eq(combinationRevisions.combinationId, id), eq(combinationRevisions.number, number)));
  if (!rev) throw new NotFoundError(`No revision ${number} of this combination.`);
  return rev as typeof rev & { spec: Combination };
}

/** Restores an old revision by saving its spec (and name) as the newest revision. */
export async function restoreRevision(db: DbOrTx, actor: Actor, id: string, number: number, baseRevision: number) {
  const rev = await getRevision(db, actor, id, number);
  return saveCombination(db, actor, id, { spec: rev.spec, name: rev.name, baseRevision, note: `Restored revision ${number}` });
}

// Export and import: a versioned JSON document, readable by people and by this app.
export const EXPORT_FORMAT = "pulleywright.combinations";
export const EXPORT_VERSION = 1;

export const importDocumentSchema = z.object({
  format: z.literal(EXPORT_FORMAT, { error: `format must be "${EXPORT_FORMAT}"` }),
  version: z.literal(EXPORT_VERSION, { error: `version must be ${EXPORT_VERSION}` }),
  combinations: z
    .array(
      combinationMetaSchema.extend({
        spec: combinationSchema,
        revisions: z
          .array(z.object({ number: z.number().int().min(1), name: plainText("Revision name", 120).min(1, "Each revision needs a name."), note: plainText("Revision note", 500, { multiline: true }).nullish(), spec: combinationSchema }))
          .max(500, "At most 500 revisions per combination.")
          .optional(),
      }),
    )
    .min(1, "The file holds no combinations.")
    .max(200, "At most 200 combinations per import."),
});

export async function exportCombinations(db: DbOrTx, actor: Actor, ids?: string[]) {
  if (ids && ids.length > 200) throw new FieldError("ids", "Export at most 200 combinations at a time.");
  const targets = ids?.length
    ? await Promise.all(ids.map((id) => getCombination(db, actor, id)))
    : await db.select().from(combinations).where(and(eq(combinations.ownerId, actor.id), isNull(combinations.deletedAt))).orderBy(asc(combinations.name));
  const out = [];
  for (const c of targets) {
    const revs = await db.select().from(combinationRevisions).where(eq(combinationRevisions.combinationId, c.id)).orderBy(asc(combinationRevisions.number));
    out.push({
      name: c.name,
      customerName: c.customerName,
      customerContact: c.customerContact,
      spec: c.spec,
      revisions: revs.map((r) => ({ number: r.number, name: r.name, note: r.note, spec: r.spec })),
    });
  }
  return { format: EXPORT_FORMAT, version: EXPORT_VERSION, exportedAt: new Date().toISOString(), combinations: out };
}

/** Imports all or nothing: each combination becomes a new one owned by `actor`, its history kept. */
export async function importCombinations(db: DbOrTx, actor: Actor, doc: unknown) {
  const v = importDocumentSchema.parse(doc);
  return db.transaction(async (tx) => {
    const created: CombinationRow[] = [];
    for (const c of v.combinations) {
      const staff = canCreateForCustomer(actor);
      const revs = c.revisions?.length ? [...c.revisions].sort((a, b) => a.number - b.number) : [{ number: 1, name: c.name, note: "Imported", spec: c.spec }];
      // The newest revision is what the combination holds now.
      const spec = revs[revs.length - 1].spec;
      const [row] = await tx
        .insert(combinations)
        .values({ ownerId: actor.id, name: c.name, customerName: staff ? c.customerName : null, customerContact: staff ? c.customerContact : null, spec, ...listed(spec), revision: revs.length })
        .returning();
      await tx.insert(combinationRevisions).values(revs.map((r, i) => ({ combinationId: row.id, number: i + 1, name: r.name, note: r.note ?? null, spec: r.spec, authorId: actor.id })));
      created.push(row);
    }
    return created;
  });
}
