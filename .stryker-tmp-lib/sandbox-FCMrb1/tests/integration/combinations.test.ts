// @ts-nocheck
// Saved combinations against a real database: parallel saves never overwrite each other, bad
// input is refused without touching stored data, and export → import keeps everything.
import { asc, eq } from "drizzle-orm";
import fc from "fast-check";
import { ZodError } from "zod";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination, exampleTwinScrewCombination, type Combination } from "@/calc";
import { ConflictError, FieldError } from "@/lib/errors";
import type { Actor } from "@/db/policy";
import {
  createCombination,
  exportCombinations,
  getCombination,
  importCombinations,
  listCombinations,
  listRevisions,
  saveCombination,
} from "@/db/repo/combinations";
import { combinationRevisions, combinations } from "@/db/schema";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

let t: TestDb;
let tuner: Actor;
let member: Actor;

beforeAll(async () => {
  t = await freshDatabase();
  tuner = await makeUser(t.db, "tuner");
  member = await makeUser(t.db, "member");
});
afterAll(async () => {
  await t?.drop();
});

const withPulley = (d: number): Combination => {
  const s = exampleCombination();
  return { ...s, drive: { ...s.drive, blowerPulleyDiameter: d } };
};

describe("parallel saves on one combination", () => {
  it("exactly one of N saves from the same base wins; the rest get a 409; retries on fresh bases lose nothing", async () => {
    const N = 8;
    const c = await createCombination(t.db, member, { name: "Race", spec: withPulley(0.08) });
    // Each save puts a distinct pulley, so every update can be found in the history afterwards.
    const pulleys = Array.from({ length: N }, (_, i) => 0.06 + i * 0.002);
    const outcomes = await Promise.allSettled(pulleys.map((d, i) => saveCombination(t.db, member, c.id, { spec: withPulley(d), note: `save ${i}`, baseRevision: 1 })));
    const won = outcomes.filter((o) => o.status === "fulfilled");
    const lost = outcomes.flatMap((o, i) => (o.status === "rejected" ? [{ i, reason: o.reason }] : []));
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(N - 1);
    for (const l of lost) {
      expect(l.reason).toBeInstanceOf(ConflictError);
      expect((l.reason as ConflictError).details?.currentRevision).toBe(2);
      expect(String(l.reason.message)).toMatch(/revision 2/);
    }

    // Each loser reloads and saves again on the fresh revision, one after another.
    let successes = 1;
    for (const l of lost) {
      const fresh = await getCombination(t.db, member, c.id);
      await saveCombination(t.db, member, c.id, { spec: withPulley(pulleys[l.i]), note: `retry ${l.i}`, baseRevision: fresh.revision });
      successes++;
    }
    const final = await getCombination(t.db, member, c.id);
    const revs = await listRevisions(t.db, member, c.id);
    expect(final.revision).toBe(successes + 1);
    expect(revs).toHaveLength(successes + 1);
    expect(revs.map((r) => r.number).sort((a, b) => a - b)).toEqual(Array.from({ length: successes + 1 }, (_, i) => i + 1));
    // No update lost: every one of the N pulleys is in exactly one revision.
    const saved = revs.map((r) => (r.spec as Combination).drive.blowerPulleyDiameter);
    for (const d of pulleys) expect(saved.filter((x) => x === d)).toHaveLength(1);
    // The row holds what the newest revision holds.
    expect((final.spec as Combination).drive.blowerPulleyDiameter).toBe((revs[0].spec as Combination).drive.blowerPulleyDiameter);
    expect(final.blowerPulleyDiameter).toBe((revs[0].spec as Combination).drive.blowerPulleyDiameter);
  });
});

// ---- bad payloads --------------------------------------------------------------------------

/** Required numeric fields of a spec with their allowed ranges (calc/schema.ts). */
const NUMERIC: [string, number, number][] = [
  ["engine.displacement", 0.0002, 0.02],
  ["engine.cylinders", 1, 16],
  ["engine.redlineRpm", 1000, 20_000],
  ["blower.displacementPerRev", 0.0001, 0.01],
  ["blower.maxRpm", 1000, 40_000],
  ["blower.referenceRpm", 500, 40_000],
  ["drive.crankPulleyDiameter", 0.03, 0.5],
  ["drive.blowerPulleyDiameter", 0.03, 0.5],
  ["ambient.pressure", 30_000, 110_000],
  ["ambient.temperature", 220, 330],
  ["fuel.afr", 4, 25],
  ["fuel.bsfc", 3e-8, 3e-7],
];

function setPath(obj: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let o = obj;
  for (const k of keys.slice(0, -1)) o = o[k] as Record<string, unknown>;
  if (value === MISSING) delete o[keys.at(-1)!];
  else o[keys.at(-1)!] = value;
}
const MISSING = Symbol("missing");

/** A value that can never be valid for a required, bounded number. */
const badNumberFor = (min: number, max: number) =>
  fc.oneof(
    fc.double({ max: min, maxExcluded: true, noNaN: true }),
    fc.double({ min: max, minExcluded: true, noNaN: true }),
    fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, null, MISSING, true, {}, [], "5"),
    fc.string(),
  );

/** A spec with exactly one required number made bad. */
const badSpec = fc.constantFrom(...NUMERIC).chain(([path, min, max]) =>
  badNumberFor(min, max).map((bad) => {
    const s = JSON.parse(JSON.stringify(exampleCombination())) as Record<string, unknown>;
    setPath(s, path, bad);
    return s;
  }),
);

/** Names no combination may have: empty, too long, with control characters (NUL breaks PostgreSQL text). */
const hostileName = fc.oneof(
  fc.constantFrom("", "   ", "\u0000", "a\u0000b", "line\nbreak", "\u001b[31mred", "x".repeat(121)),
  fc.tuple(fc.string({ maxLength: 20 }), fc.constantFrom("\u0000", "\u0007", "\u001f", "\u007f"), fc.string({ maxLength: 20 })).map(([a, c, b]) => a + c + b),
  fc.string({ minLength: 121, maxLength: 400 }).filter((s) => s.trim().length > 120),
  fc.oneof(fc.integer(), fc.boolean(), fc.constant(null), fc.array(fc.string()), fc.object()),
);

const badCreate = fc.oneof(
  badSpec.map((spec) => ({ name: "Fine name", spec })),
  hostileName.map((name) => ({ name, spec: exampleCombination() })),
  fc.record({ name: fc.constant("Fine"), spec: fc.anything() }),
  fc.anything().filter((x) => typeof x !== "object" || x === null || Array.isArray(x)),
  fc.constant({ spec: exampleCombination() }),
  fc.string({ minLength: 501, maxLength: 700 }).map((note) => ({ name: "Fine", spec: exampleCombination(), note })),
);

const badSave = fc.oneof(
  badSpec.map((spec) => ({ spec, baseRevision: 1 })),
  hostileName.filter((n) => n !== null).map((name) => ({ name, baseRevision: 1 })),
  fc.oneof(fc.constantFrom(0, -1, 1.5, "1", null, undefined, Number.NaN), fc.integer({ max: 0 })).map((baseRevision) => ({ name: "Fine", baseRevision })),
  fc.anything().filter((x) => typeof x !== "object" || x === null || Array.isArray(x)),
);

const exportDoc = (combos: unknown[]) => ({ format: "pulleywright.combinations", version: 1, combinations: combos });
const goodEntry = () => ({ name: "Imported fine", spec: exampleCombination() });
const badImport = fc.oneof(
  // One bad combination among good ones: nothing at all may be imported.
  fc.tuple(badSpec, fc.nat(3)).map(([spec, i]) => {
    const list: unknown[] = [goodEntry(), goodEntry(), goodEntry()];
    list.splice(i, 0, { name: "Bad one", spec });
    return exportDoc(list);
  }),
  hostileName.map((name) => exportDoc([goodEntry(), { name, spec: exampleCombination() }])),
  badSpec.map((spec) => exportDoc([{ ...goodEntry(), revisions: [{ number: 1, name: "r1", spec: exampleCombination() }, { number: 2, name: "r2", spec }] }])),
  fc.constantFrom(exportDoc([]), { ...exportDoc([goodEntry()]), format: "something-else" }, { ...exportDoc([goodEntry()]), version: 2 }, exportDoc(Array.from({ length: 201 }, goodEntry))),
  fc.anything(),
);

async function snapshot() {
  const rows = await t.db.select().from(combinations).orderBy(asc(combinations.id));
  const revs = await t.db.select().from(combinationRevisions).orderBy(asc(combinationRevisions.id));
  return JSON.stringify({ rows, revs });
}

const isInputError = (e: unknown) => e instanceof ZodError || e instanceof FieldError;

describe("bad payloads are refused and change nothing", () => {
  let target: { id: string };
  beforeAll(async () => {
    target = await createCombination(t.db, tuner, { name: "Keep me", spec: exampleTwinScrewCombination(), customerName: "Lee Example" });
  });

  it("createCombination", async () => {
    const before = await snapshot();
    await fc.assert(
      fc.asyncProperty(badCreate, async (input) => {
        const err = await createCombination(t.db, tuner, input as never).then(() => null, (e: unknown) => e);
        expect(isInputError(err), `accepted or wrong error: ${String(err)}`).toBe(true);
      }),
      { numRuns: 150 },
    );
    expect(await snapshot()).toBe(before);
  });

  it("saveCombination", async () => {
    const before = await snapshot();
    await fc.assert(
      fc.asyncProperty(badSave, async (input) => {
        const err = await saveCombination(t.db, tuner, target.id, input as never).then(() => null, (e: unknown) => e);
        expect(isInputError(err), `accepted or wrong error: ${String(err)}`).toBe(true);
      }),
      { numRuns: 150 },
    );
    expect(await snapshot()).toBe(before);
  });

  it("importCombinations (all or nothing)", async () => {
    const before = await snapshot();
    await fc.assert(
      fc.asyncProperty(badImport, async (doc) => {
        const err = await importCombinations(t.db, tuner, doc).then(() => null, (e: unknown) => e);
        expect(isInputError(err), `accepted or wrong error: ${String(err)}`).toBe(true);
      }),
      { numRuns: 100 },
    );
    expect(await snapshot()).toBe(before);
  });

  it("a field error names the field by its dotted path", async () => {
    const spec = withPulley(5); // 5 m: far outside 0.03–0.5 m
    const err = await createCombination(t.db, tuner, { name: "x", spec }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ZodError);
    expect((err as ZodError).issues.map((i) => i.path.join("."))).toContain("spec.drive.blowerPulleyDiameter");
  });
});

describe("export and import", () => {
  it("round-trips a combination with its history and customer, and imports as new rows owned by the importer", async () => {
    const c = await createCombination(t.db, tuner, { name: "Round trip", spec: withPulley(0.085), customerName: "Kim Example", customerContact: "kim@example.com", note: "Baseline" });
    await saveCombination(t.db, tuner, c.id, { spec: withPulley(0.08), note: "Smaller blower pulley", baseRevision: 1 });
    await saveCombination(t.db, tuner, c.id, { name: "Round trip, renamed", baseRevision: 2 });

    // Through a file: JSON text, as a person would download and upload it.
    const file = JSON.stringify(await exportCombinations(t.db, tuner, [c.id]));
    const otherTuner = await makeUser(t.db, "tuner");
    const [imported] = await importCombinations(t.db, otherTuner, JSON.parse(file));
    expect(imported.id).not.toBe(c.id);
    expect(imported.ownerId).toBe(otherTuner.id);
    expect(imported.revision).toBe(3);

    const again = await exportCombinations(t.db, otherTuner, [imported.id]);
    const first = JSON.parse(file);
    expect(again.combinations).toEqual(first.combinations);
    expect(again.combinations[0]).toMatchObject({ name: "Round trip, renamed", customerName: "Kim Example", customerContact: "kim@example.com" });
    expect(again.combinations[0].revisions.map((r: { note: string | null }) => r.note)).toEqual(["Baseline", "Smaller blower pulley", null]);

    // A member importing the shop's file gets the engine, not the customer's details.
    const [mine] = await importCombinations(t.db, member, JSON.parse(file));
    expect(mine.ownerId).toBe(member.id);
    expect(mine.customerName).toBeNull();
    expect((await getCombination(t.db, member, mine.id)).spec).toEqual((await getCombination(t.db, tuner, c.id)).spec);
  });

  it("exports all of the caller's own, and nobody else's", async () => {
    const someone = await makeUser(t.db, "member");
    await createCombination(t.db, someone, { name: "Someone's A", spec: exampleCombination() });
    await createCombination(t.db, someone, { name: "Someone's B", spec: exampleCombination() });
    await createCombination(t.db, member, { name: "Not someone's", spec: exampleCombination() });
    const doc = await exportCombinations(t.db, someone);
    expect(doc.combinations.map((x) => x.name).sort()).toEqual(["Someone's A", "Someone's B"]);
  });
});

describe("listing", () => {
  it("searches name and customer, sorts, and pages", async () => {
    const owner = await makeUser(t.db, "sales");
    const names = ["Alpha 100% build", "Bravo_build", "Charlie build"];
    for (const [i, n] of names.entries()) await createCombination(t.db, owner, { name: n, spec: withPulley(0.07 + i * 0.01), customerName: i === 2 ? "Dana Example" : null });
    const mine = { scope: "mine" as const };
    // LIKE wildcards in the search are literal characters.
    expect((await listCombinations(t.db, owner, { ...mine, search: "100%" })).items.map((i) => i.name)).toEqual(["Alpha 100% build"]);
    expect((await listCombinations(t.db, owner, { ...mine, search: "o_b" })).items.map((i) => i.name)).toEqual(["Bravo_build"]);
    expect((await listCombinations(t.db, owner, { ...mine, search: "dana" })).items.map((i) => i.name)).toEqual(["Charlie build"]);
    const byPulley = await listCombinations(t.db, owner, { ...mine, sort: "blowerPulleyDiameter", dir: "desc" });
    expect(byPulley.items.map((i) => i.name)).toEqual(["Charlie build", "Bravo_build", "Alpha 100% build"]);
    const page2 = await listCombinations(t.db, owner, { ...mine, sort: "name", dir: "asc", pageSize: 2, page: 2 });
    expect(page2.total).toBe(3);
    expect(page2.items.map((i) => i.name)).toEqual(["Charlie build"]);
    await expect(listCombinations(t.db, owner, { pageSize: 1000 })).rejects.toBeInstanceOf(ZodError);
  });

  it("the prepared list statements answer exactly what a plain query does, for every shape (property)", async () => {
    // A shop of its own: three owners with customers, a demo row, a deleted row; then random
    // queries as each role, compared with the list written out the plain way (the query the
    // prepared statements replaced, rebuilt here with literal values).
    const { and, asc: up, count: countOf, desc: down, eq: is, ilike, isNull, or, sql } = await import("drizzle-orm");
    const { users } = await import("@/db/schema");
    const s = await freshDatabase();
    try {
      const actors = { member: await makeUser(s.db, "member"), instructor: await makeUser(s.db, "instructor"), sales: await makeUser(s.db, "sales"), tuner: await makeUser(s.db, "tuner") };
      const words = ["Street", "Strip", "Tow_rig", "100% pump", "Cruiser"];
      let n = 0;
      for (const who of [actors.member, actors.instructor, actors.sales, actors.member, actors.tuner, actors.member, actors.instructor]) {
        const c = await createCombination(s.db, who, { name: `${words[n % words.length]} ${n}`, spec: withPulley(0.06 + (n % 4) * 0.01), customerName: who.role === "sales" || who.role === "tuner" ? `Customer ${n}` : null });
        if (n === 4) await s.db.update(combinations).set({ isDemo: true }).where(is(combinations.id, c.id));
        if (n === 5) await s.db.update(combinations).set({ deletedAt: new Date() }).where(is(combinations.id, c.id));
        n++;
      }
      const plain = async (actor: Actor, q: { scope?: "mine" | "shop" | "demo"; search?: string; sort: "name" | "updatedAt" | "createdAt" | "displacement" | "blowerPulleyDiameter"; dir: "asc" | "desc"; page: number; pageSize: number }) => {
        const conds = [isNull(combinations.deletedAt)];
        if (actor.role === "instructor") conds.push(or(is(combinations.ownerId, actor.id), is(combinations.isDemo, true))!);
        else if (actor.role === "member") conds.push(is(combinations.ownerId, actor.id));
        if (q.scope === "mine") conds.push(is(combinations.ownerId, actor.id));
        if (q.scope === "shop") conds.push(is(combinations.isDemo, false));
        if (q.scope === "demo") conds.push(is(combinations.isDemo, true));
        if (q.search) {
          const like = `%${q.search.replace(/[%_\\]/g, (c) => "\\" + c)}%`;
          // Customer fields are searched only where the actor may see them: staff, or their own rows.
          const customer = or(ilike(combinations.customerName, like), ilike(combinations.customerContact, like))!;
          const staff = actor.role === "sales" || actor.role === "tuner";
          conds.push(or(ilike(combinations.name, like), staff ? customer : and(is(combinations.ownerId, actor.id), customer))!);
        }
        const col = combinations[q.sort];
        const rows = await s.db
          .select({ id: combinations.id, ownerEmail: users.email })
          .from(combinations)
          .innerJoin(users, is(users.id, combinations.ownerId))
          .where(and(...conds))
          .orderBy(q.dir === "asc" ? up(col) : down(col), up(combinations.id))
          .limit(q.pageSize)
          .offset((q.page - 1) * q.pageSize);
        const [{ total }] = await s.db.select({ total: countOf() }).from(combinations).where(and(...conds));
        return { ids: rows.map((r) => r.id), total, emails: rows.map((r) => r.ownerEmail) };
      };
      await fc.assert(
        fc.asyncProperty(
          fc.constantFrom(...Object.values(actors)),
          fc.record({
            scope: fc.constantFrom(undefined, "mine" as const, "shop" as const, "demo" as const),
            search: fc.constantFrom(undefined, "st", "100%", "w_r", "customer", "zzz"),
            sort: fc.constantFrom("name" as const, "updatedAt" as const, "createdAt" as const, "displacement" as const, "blowerPulleyDiameter" as const),
            dir: fc.constantFrom("asc" as const, "desc" as const),
            page: fc.integer({ min: 1, max: 4 }),
            pageSize: fc.integer({ min: 1, max: 4 }),
          }),
          async (actor, q) => {
            const got = await listCombinations(s.db, actor, q);
            const want = await plain(actor, q);
            expect(got.items.map((i) => i.id)).toEqual(want.ids);
            expect(got.items.map((i) => i.ownerEmail)).toEqual(want.emails);
            expect(got.total).toBe(want.total);
          },
        ),
        { numRuns: 150 },
      );
    } finally {
      await s.drop();
    }
  });

  it("a deleted combination leaves the list and reads until undone", async () => {
    const c = await createCombination(t.db, member, { name: "Bin me", spec: exampleCombination() });
    const { deleteCombination, undoDelete } = await import("@/db/repo/combinations");
    await deleteCombination(t.db, member, c.id);
    expect((await listCombinations(t.db, member, { search: "Bin me" })).total).toBe(0);
    await expect(getCombination(t.db, member, c.id)).rejects.toThrow(/No such combination/);
    await expect(saveCombination(t.db, member, c.id, { name: "x", baseRevision: 1 })).rejects.toThrow(/No such combination/);
    await undoDelete(t.db, member, c.id);
    expect((await listCombinations(t.db, member, { search: "Bin me" })).total).toBe(1);
    const [row] = await t.db.select().from(combinations).where(eq(combinations.id, c.id));
    expect(row.deletedAt).toBeNull();
  });
});
