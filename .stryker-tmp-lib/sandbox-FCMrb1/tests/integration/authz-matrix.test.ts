// @ts-nocheck
// Who may do what to which combination: every role × every action × own / another member's /
// a staff-owned / a demo row, through the repository (error classes) and through the real route
// handlers (status codes), against a real database. Expectations follow design.md ("Members see
// only their own. Tuners and sales staff see the shop's combinations"; instructors also read the
// shop's demo examples to teach with) — the product's own rules, no external source.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { ForbiddenError, NotFoundError } from "@/lib/errors";
import type { Actor } from "@/db/policy";
import * as repo from "@/db/repo/combinations";
import { combinations } from "@/db/schema";
import { mockSession } from "../support/session-mock";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const ctx = mockSession();

const collection = await import("@/app/api/combinations/route");
const one = await import("@/app/api/combinations/[id]/route");
const revisions = await import("@/app/api/combinations/[id]/revisions/route");
const revision = await import("@/app/api/combinations/[id]/revisions/[number]/route");
const duplicate = await import("@/app/api/combinations/[id]/duplicate/route");
const undoRoute = await import("@/app/api/combinations/[id]/undo-delete/route");
const exportRoute = await import("@/app/api/combinations/export/route");
const importRoute = await import("@/app/api/combinations/import/route");
const actions = await import("@/app/(app)/combinations/actions");

type Role = Actor["role"];
type Target = "own" | "member" | "staff" | "demo";
type Outcome = "ok" | "404" | "403";
const ROLES: Role[] = ["member", "tuner", "sales", "instructor", "admin"];
const TARGETS: Target[] = ["own", "member", "staff", "demo"];
const staff = (r: Role) => r === "tuner" || r === "sales" || r === "admin";

/** The rule under test, written out independently of db/policy.ts. */
function mayRead(role: Role, t: Target): Outcome {
  if (t === "own" || staff(role)) return "ok";
  if (t === "demo" && role === "instructor") return "ok";
  return "404"; // not theirs to see: no hint that it exists
}
function mayWrite(role: Role, t: Target): Outcome {
  const r = mayRead(role, t);
  if (r !== "ok") return r;
  return t === "own" || staff(role) ? "ok" : "403"; // an instructor reads the demo rows but may not change them
}

const spec = () => exampleCombination();
const url = (p: string) => `http://test.local${p}`;
const json = (method: string, p: string, body?: unknown) =>
  new Request(url(p), { method, headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
const params = <T,>(p: T) => ({ params: Promise.resolve(p) });

type Row = { id: string; revision: number };
type Action = {
  name: string;
  expect: (role: Role, t: Target) => Outcome;
  /** Prepares the target (e.g. deletes it first for "undo"). */
  prepare?: (row: Row) => Promise<void>;
  repo: (actor: Actor, row: Row) => Promise<unknown>;
  http: (row: Row) => Promise<Response>;
};

let t: TestDb;
const people = {} as Record<Role, Actor>;
let otherMember: Actor;
let otherTuner: Actor;

async function makeTarget(actor: Actor, target: Target): Promise<Row> {
  const owner = target === "own" ? actor : target === "member" ? otherMember : otherTuner;
  const row = await repo.createCombination(t.db, owner, { name: `${target} of ${owner.role}`, spec: spec() }, { isDemo: target === "demo" });
  return { id: row.id, revision: row.revision };
}

const ACTIONS: Action[] = [
  {
    name: "get",
    expect: mayRead,
    repo: (a, r) => repo.getCombination(t.db, a, r.id),
    http: (r) => one.GET(json("GET", `/api/combinations/${r.id}`), params({ id: r.id })),
  },
  {
    name: "save",
    expect: mayWrite,
    repo: (a, r) => repo.saveCombination(t.db, a, r.id, { spec: spec(), note: "edit", baseRevision: r.revision }),
    http: (r) => one.PATCH(json("PATCH", `/api/combinations/${r.id}`, { spec: spec(), note: "edit", baseRevision: r.revision }), params({ id: r.id })),
  },
  {
    name: "rename",
    expect: mayWrite,
    repo: (a, r) => repo.renameCombination(t.db, a, r.id, "Renamed", r.revision),
    http: (r) => one.PATCH(json("PATCH", `/api/combinations/${r.id}`, { name: "Renamed", baseRevision: r.revision }), params({ id: r.id })),
  },
  {
    name: "duplicate",
    expect: mayRead,
    repo: (a, r) => repo.duplicateCombination(t.db, a, r.id),
    http: (r) => duplicate.POST(json("POST", `/api/combinations/${r.id}/duplicate`), params({ id: r.id })),
  },
  {
    name: "delete",
    expect: mayWrite,
    repo: (a, r) => repo.deleteCombination(t.db, a, r.id),
    http: (r) => one.DELETE(json("DELETE", `/api/combinations/${r.id}`), params({ id: r.id })),
  },
  {
    name: "undo delete",
    expect: mayWrite,
    prepare: async (r) => {
      await t.db.update(combinations).set({ deletedAt: new Date() }).where(eq(combinations.id, r.id));
    },
    repo: (a, r) => repo.undoDelete(t.db, a, r.id),
    http: (r) => undoRoute.POST(json("POST", `/api/combinations/${r.id}/undo-delete`), params({ id: r.id })),
  },
  {
    name: "list revisions",
    expect: mayRead,
    repo: (a, r) => repo.listRevisions(t.db, a, r.id),
    http: (r) => revisions.GET(json("GET", `/api/combinations/${r.id}/revisions`), params({ id: r.id })),
  },
  {
    name: "get revision",
    expect: mayRead,
    repo: (a, r) => repo.getRevision(t.db, a, r.id, 1),
    http: (r) => revision.GET(json("GET", `/api/combinations/${r.id}/revisions/1`), params({ id: r.id, number: "1" })),
  },
  {
    name: "restore",
    expect: mayWrite,
    repo: (a, r) => repo.restoreRevision(t.db, a, r.id, 1, r.revision),
    http: (r) => revisions.POST(json("POST", `/api/combinations/${r.id}/revisions`, { action: "restore", number: 1, baseRevision: r.revision }), params({ id: r.id })),
  },
  {
    name: "export one",
    expect: mayRead,
    repo: (a, r) => repo.exportCombinations(t.db, a, [r.id]),
    http: (r) => exportRoute.GET(json("GET", `/api/combinations/export?ids=${r.id}`), undefined as never),
  },
];

const asOutcome = (e: unknown): Outcome | string =>
  e instanceof NotFoundError ? "404" : e instanceof ForbiddenError ? "403" : `unexpected ${(e as Error)?.constructor?.name}: ${(e as Error)?.message}`;
const statusOutcome = (s: number): Outcome | string => (s >= 200 && s < 300 ? "ok" : s === 404 ? "404" : s === 403 ? "403" : `status ${s}`);

beforeAll(async () => {
  t = await freshDatabase();
  ctx.db = t.db;
  for (const r of ROLES) people[r] = await makeUser(t.db, r);
  otherMember = await makeUser(t.db, "member");
  otherTuner = await makeUser(t.db, "tuner");
});
afterAll(async () => {
  await t?.drop();
});

describe.each(ROLES)("as a %s", (role) => {
  for (const action of ACTIONS) {
    it.each(TARGETS)(`${action.name} on %s rows`, async (target) => {
      const actor = people[role];
      const expected = action.expect(role, target);

      const viaRepo = await makeTarget(actor, target);
      await action.prepare?.(viaRepo);
      const repoOutcome = await action.repo(actor, viaRepo).then(() => "ok" as const, asOutcome);
      expect(repoOutcome).toBe(expected);

      const viaHttp = await makeTarget(actor, target);
      await action.prepare?.(viaHttp);
      ctx.userId = actor.id;
      const res = await action.http(viaHttp);
      expect(statusOutcome(res.status), await res.clone().text()).toBe(expected);

      // A refused change leaves the row as it was.
      if (expected !== "ok") {
        const [after] = await t.db.select().from(combinations).where(eq(combinations.id, viaHttp.id));
        expect(after.revision).toBe(viaHttp.revision);
        expect(after.name).not.toBe("Renamed");
        expect(after.deletedAt === null).toBe(action.name !== "undo delete");
      }
    });
  }

  it("list shows exactly the rows the role may read", async () => {
    const actor = people[role];
    const rows = Object.fromEntries(await Promise.all(TARGETS.map(async (tg) => [tg, await makeTarget(actor, tg)] as const))) as Record<Target, Row>;
    ctx.userId = actor.id;
    const res = await collection.GET(json("GET", "/api/combinations?pageSize=100"), undefined as never);
    expect(res.status).toBe(200);
    const ids = new Set(((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id));
    const repoIds = new Set((await repo.listCombinations(t.db, actor, { pageSize: 100 })).items.map((i) => i.id));
    for (const tg of TARGETS) {
      expect(ids.has(rows[tg].id), `${tg} in the list`).toBe(mayRead(role, tg) === "ok");
      expect(repoIds.has(rows[tg].id)).toBe(mayRead(role, tg) === "ok");
    }
  });

  it("create for themselves is allowed; create for a customer only for staff", async () => {
    const actor = people[role];
    ctx.userId = actor.id;
    const plain = await collection.POST(json("POST", "/api/combinations", { name: "Mine", spec: spec() }), undefined as never);
    expect(plain.status).toBe(201);
    expect(((await plain.json()) as { ownerId: string }).ownerId).toBe(actor.id);

    const forCustomer = { name: "For a customer", spec: spec(), customerName: "Pat Example", customerContact: "pat@example.com" };
    const res = await collection.POST(json("POST", "/api/combinations", forCustomer), undefined as never);
    expect(statusOutcome(res.status)).toBe(staff(role) ? "ok" : "403");
    const viaRepo = await repo.createCombination(t.db, actor, forCustomer).then((r) => r.customerName, asOutcome);
    expect(viaRepo).toBe(staff(role) ? "Pat Example" : "403");
  });

  it("export of all of mine holds only the caller's own combinations; import makes them the caller's", async () => {
    const actor = people[role];
    const mine = await makeTarget(actor, "own");
    const theirs = await makeTarget(actor, "member");
    ctx.userId = actor.id;
    const res = await exportRoute.GET(json("GET", "/api/combinations/export"), undefined as never);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/attachment/);
    const doc = (await res.json()) as { combinations: { name: string }[] };
    const own = await repo.listCombinations(t.db, actor, { scope: "mine", pageSize: 100 });
    expect(doc.combinations.length).toBe(own.total);
    expect(own.items.some((i) => i.id === mine.id)).toBe(true);
    expect(own.items.some((i) => i.id === theirs.id)).toBe(false);

    const imported = await importRoute.POST(json("POST", "/api/combinations/import", doc), undefined as never);
    expect(imported.status).toBe(201);
    const after = await repo.listCombinations(t.db, actor, { scope: "mine", pageSize: 100 });
    expect(after.total).toBe(own.total * 2);
  });

  it("server actions follow the same rules", async () => {
    const actor = people[role];
    ctx.userId = actor.id;
    const target = await makeTarget(actor, "member");
    const r = await actions.duplicateCombinationAction(target.id);
    expect(r.ok ? "ok" : String(r.status)).toBe(mayRead(role, "member"));
    const d = await actions.deleteCombinationAction(target.id);
    expect(d.ok ? "ok" : String(d.status)).toBe(mayWrite(role, "member"));
  });
});

describe("signed out", () => {
  it("every route answers 401 and every action refuses", async () => {
    const row = await makeTarget(people.member, "own");
    ctx.userId = null;
    const p = params({ id: row.id });
    const answers = await Promise.all([
      collection.GET(json("GET", "/api/combinations"), undefined as never),
      collection.POST(json("POST", "/api/combinations", { name: "x", spec: spec() }), undefined as never),
      one.GET(json("GET", `/api/combinations/${row.id}`), p),
      one.PATCH(json("PATCH", `/api/combinations/${row.id}`, { name: "x", baseRevision: 1 }), p),
      one.DELETE(json("DELETE", `/api/combinations/${row.id}`), p),
      revisions.GET(json("GET", "/"), p),
      revisions.POST(json("POST", "/", { action: "restore", number: 1, baseRevision: 1 }), p),
      revision.GET(json("GET", "/"), params({ id: row.id, number: "1" })),
      duplicate.POST(json("POST", "/"), p),
      undoRoute.POST(json("POST", "/"), p),
      exportRoute.GET(json("GET", "/api/combinations/export"), undefined as never),
      importRoute.POST(json("POST", "/", {}), undefined as never),
    ]);
    expect(answers.map((a) => a.status)).toEqual(answers.map(() => 401));
    const r = await actions.deleteCombinationAction(row.id);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.status).toBe(401);
    await expect(repo.getCombination(t.db, people.member, row.id)).resolves.toMatchObject({ deletedAt: null });
  });
});
