// @ts-nocheck
// The combinations REST API against the served app: status codes, field errors naming the
// field, ownership, optimistic concurrency, and generated bad payloads that must get a 4xx and
// leave the stored row exactly as it was.
import crypto from "node:crypto";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination, exampleTwinScrewCombination } from "@/calc";
import { connect } from "@/db/connect";
import { createMember } from "@/db/repo/users";
import { Client, signedIn } from "../support/http";

const PASSWORD = "api-test-password-1";
let alice: Client; // a member
let bob: Client; // another member
let tuner: Client;
let pool: { end: () => Promise<void> } | undefined;

async function newMember(tag: string) {
  const { pool: p, db } = connect(process.env.DATABASE_URL!, 1);
  pool = p;
  const email = `api-${tag}-${crypto.randomBytes(4).toString("hex")}@example.com`;
  await createMember(db, { email, name: `API ${tag}`, password: PASSWORD });
  await p.end();
  pool = undefined;
  return signedIn(email, PASSWORD);
}

beforeAll(async () => {
  alice = await newMember("alice");
  bob = await newMember("bob");
  tuner = await signedIn("tuner@example.com");
});
afterAll(async () => {
  await pool?.end();
});

async function create(c: Client, name = `api-${crypto.randomBytes(3).toString("hex")}`, spec: unknown = exampleCombination()) {
  const r = await c.json("/api/combinations", "POST", { name, spec });
  expect(r.status).toBe(201);
  return r.data as { id: string; name: string; revision: number };
}

describe("signed out", () => {
  it("answers 401 on every route", async () => {
    const anon = new Client();
    const id = crypto.randomUUID();
    const calls: [string, string, unknown?][] = [
      ["/api/combinations", "GET"],
      ["/api/combinations", "POST", { name: "x", spec: exampleCombination() }],
      [`/api/combinations/${id}`, "GET"],
      [`/api/combinations/${id}`, "PATCH", { name: "x", baseRevision: 1 }],
      [`/api/combinations/${id}`, "DELETE"],
      [`/api/combinations/${id}/revisions`, "GET"],
      [`/api/combinations/${id}/revisions`, "POST", { action: "restore", number: 1, baseRevision: 1 }],
      [`/api/combinations/${id}/revisions/1`, "GET"],
      [`/api/combinations/${id}/duplicate`, "POST"],
      [`/api/combinations/${id}/undo-delete`, "POST"],
      ["/api/combinations/export", "GET"],
      ["/api/combinations/import", "POST", {}],
      ["/api/me", "GET"],
    ];
    for (const [path, method, body] of calls) {
      const r = await anon.json(path, method, body);
      expect(r.status, `${method} ${path}`).toBe(401);
      expect(r.data.error).toMatch(/sign in/i);
    }
  });
});

describe("a member's own combinations", () => {
  it("creates, reads, lists, saves, restores, duplicates, deletes and undoes", async () => {
    const c = await create(alice, "Alice's build");
    expect(c.revision).toBe(1);
    expect((await alice.json(`/api/combinations/${c.id}`)).data).toMatchObject({ id: c.id, name: "Alice's build", revision: 1 });
    const list = await alice.json(`/api/combinations?search=${encodeURIComponent("Alice's")}`);
    expect(list.status).toBe(200);
    expect(list.data).toMatchObject({ total: 1, page: 1 });

    const saved = await alice.json(`/api/combinations/${c.id}`, "PATCH", { spec: exampleTwinScrewCombination(), note: "Twin-screw now", baseRevision: 1 });
    expect(saved.status).toBe(200);
    expect(saved.data.revision).toBe(2);

    const revs = await alice.json(`/api/combinations/${c.id}/revisions`);
    expect(revs.data.items.map((r: { number: number; note: string }) => [r.number, r.note])).toEqual([
      [2, "Twin-screw now"],
      [1, "First version"],
    ]);
    expect((await alice.json(`/api/combinations/${c.id}/revisions/1`)).data.spec.blower.kind).toBe("roots");
    expect((await alice.json(`/api/combinations/${c.id}/revisions/9`)).status).toBe(404);

    const restored = await alice.json(`/api/combinations/${c.id}/revisions`, "POST", { action: "restore", number: 1, baseRevision: 2 });
    expect(restored.status).toBe(200);
    expect(restored.data.revision).toBe(3);
    expect((await alice.json(`/api/combinations/${c.id}`)).data.spec.blower.kind).toBe("roots");

    const copy = await alice.json(`/api/combinations/${c.id}/duplicate`, "POST", { name: "Alice's copy" });
    expect(copy.status).toBe(201);
    expect(copy.data).toMatchObject({ name: "Alice's copy", revision: 1 });

    expect((await alice.json(`/api/combinations/${c.id}`, "DELETE")).status).toBe(200);
    expect((await alice.json(`/api/combinations/${c.id}`)).status).toBe(404);
    expect((await alice.json(`/api/combinations/${c.id}/undo-delete`, "POST")).status).toBe(200);
    expect((await alice.json(`/api/combinations/${c.id}`)).status).toBe(200);
  });

  it("exports one or all as a JSON file and imports it back as new combinations", async () => {
    const c = await create(alice, "Exported one");
    const res = await alice.fetch(`/api/combinations/export?ids=${c.id}`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/attachment; filename="pulleywright-exported-one-/);
    const doc = await res.json();
    expect(doc.combinations).toHaveLength(1);
    const before = (await alice.json("/api/combinations?scope=mine")).data.total;
    const imported = await alice.json("/api/combinations/import", "POST", doc);
    expect(imported.status).toBe(201);
    expect(imported.data.imported).toBe(1);
    expect((await alice.json("/api/combinations?scope=mine")).data.total).toBe(before + 1);
    const all = await alice.json("/api/combinations/export");
    expect(all.data.combinations.length).toBe(before + 1);
    expect((await alice.json("/api/combinations/export?ids=nope")).status).toBe(400);
  });
});

describe("errors", () => {
  it("400 names the field, e.g. spec.drive.blowerPulleyDiameter", async () => {
    const spec = exampleCombination();
    spec.drive.blowerPulleyDiameter = 5; // metres: outside 0.03–0.5 m
    const r = await alice.json("/api/combinations", "POST", { name: "Too big a pulley", spec });
    expect(r.status).toBe(400);
    expect(Object.keys(r.data.fieldErrors)).toContain("spec.drive.blowerPulleyDiameter");
    expect(r.data.fieldErrors["spec.drive.blowerPulleyDiameter"][0]).toMatch(/Blower pulley diameter/);

    const c = await create(alice);
    const p = await alice.json(`/api/combinations/${c.id}`, "PATCH", { spec, baseRevision: 1 });
    expect(p.status).toBe(400);
    expect(p.data.fieldErrors).toHaveProperty(["spec.drive.blowerPulleyDiameter"]);
    const noBase = await alice.json(`/api/combinations/${c.id}`, "PATCH", { name: "x" });
    expect(noBase.status).toBe(400);
    expect(noBase.data.fieldErrors).toHaveProperty("baseRevision");
    expect((await alice.json("/api/combinations?pageSize=500")).data.fieldErrors).toHaveProperty("pageSize");
    expect((await alice.json("/api/combinations", "POST", "{not json")).status).toBe(400);
  });

  it("404 for another member's combination, for reads and writes alike; staff may read it", async () => {
    const c = await create(alice, "Alice's private build");
    for (const [path, method, body] of [
      [`/api/combinations/${c.id}`, "GET"],
      [`/api/combinations/${c.id}`, "PATCH", { name: "Bob was here", baseRevision: 1 }],
      [`/api/combinations/${c.id}`, "DELETE"],
      [`/api/combinations/${c.id}/revisions`, "GET"],
      [`/api/combinations/${c.id}/revisions`, "POST", { action: "restore", number: 1, baseRevision: 1 }],
      [`/api/combinations/${c.id}/duplicate`, "POST"],
      [`/api/combinations/export?ids=${c.id}`, "GET"],
    ] as [string, string, unknown?][]) {
      expect((await bob.json(path, method, body)).status, `${method} ${path}`).toBe(404);
    }
    const bobs = await bob.json(`/api/combinations?search=${encodeURIComponent("Alice's private")}`);
    expect(bobs.data.total).toBe(0);
    expect((await alice.json(`/api/combinations/${c.id}`)).data).toMatchObject({ name: "Alice's private build", revision: 1, deletedAt: null });
    expect((await tuner.json(`/api/combinations/${c.id}`)).status).toBe(200);
  });

  it("409 on a stale baseRevision, naming the current revision; nothing overwritten", async () => {
    const c = await create(alice);
    expect((await alice.json(`/api/combinations/${c.id}`, "PATCH", { name: "First edit", baseRevision: 1 })).status).toBe(200);
    const stale = await alice.json(`/api/combinations/${c.id}`, "PATCH", { name: "Second edit from an old tab", baseRevision: 1 });
    expect(stale.status).toBe(409);
    expect(stale.data.error).toMatch(/revision 2/);
    expect(stale.data.details).toMatchObject({ currentRevision: 2 });
    const restore = await alice.json(`/api/combinations/${c.id}/revisions`, "POST", { action: "restore", number: 1, baseRevision: 1 });
    expect(restore.status).toBe(409);
    expect((await alice.json(`/api/combinations/${c.id}`)).data).toMatchObject({ name: "First edit", revision: 2 });
  });
});

describe("generated bad payloads", () => {
  const spec = () => JSON.parse(JSON.stringify(exampleCombination()));
  const badNumber = fc.oneof(fc.constantFrom(-1, 0, 1e9, null, "0.08", true, [], {}), fc.double({ min: 0.6, max: 1e6, noNaN: true }), fc.double({ min: -1e6, max: 0.0299, noNaN: true }));
  const specWithBadPulley = badNumber.map((v) => {
    const s = spec();
    s.drive.blowerPulleyDiameter = v;
    return s;
  });
  const badName = fc.oneof(fc.constantFrom("", "   ", "a\u0000b", "\u0007bell", "x".repeat(121)), fc.integer(), fc.constant(null), fc.array(fc.string(), { maxLength: 3 }));
  const notAnObject = fc.oneof(fc.constantFrom("null", "[]", "42", '"text"', "{", "not json", ""), fc.string({ maxLength: 30 }).filter((s) => {
    try {
      const v = JSON.parse(s);
      return typeof v !== "object" || v === null || Array.isArray(v);
    } catch {
      return true;
    }
  }));

  it("every mutating route answers 4xx and leaves the row and its history as they were", async () => {
    const c = await create(alice, "Fuzz target");
    expect((await alice.json(`/api/combinations/${c.id}`, "PATCH", { note: "second", baseRevision: 1 })).status).toBe(200);
    const snapshot = async () => JSON.stringify([(await alice.json(`/api/combinations/${c.id}`)).data, (await alice.json(`/api/combinations/${c.id}/revisions`)).data]);
    const count = async () => (await alice.json("/api/combinations?scope=mine")).data.total as number;
    const before = await snapshot();
    const total = await count();

    const routes: { path: string; method: string; body: fc.Arbitrary<unknown> }[] = [
      { path: "/api/combinations", method: "POST", body: fc.oneof(specWithBadPulley.map((s) => ({ name: "ok", spec: s })), badName.map((name) => ({ name, spec: spec() })), notAnObject, fc.constant({ name: "no spec" })) },
      {
        path: `/api/combinations/${c.id}`,
        method: "PATCH",
        body: fc.oneof(
          specWithBadPulley.map((s) => ({ spec: s, baseRevision: 2 })),
          badName.filter((n) => n !== null).map((name) => ({ name, baseRevision: 2 })),
          fc.constantFrom(0, -3, 2.5, "2", null).map((baseRevision) => ({ name: "ok", baseRevision })),
          notAnObject,
        ),
      },
      {
        path: `/api/combinations/${c.id}/revisions`,
        method: "POST",
        body: fc.oneof(
          fc.record({ action: fc.constantFrom("restore", "delete", "", 1), number: fc.constantFrom(0, -1, 1.5, "1", null), baseRevision: fc.constant(2) }),
          fc.record({ action: fc.constant("restore"), number: fc.constant(1), baseRevision: fc.constantFrom(0, "2", null, 1.5) }),
          fc.record({ action: fc.constant("restore"), number: fc.integer({ min: 3, max: 1000 }), baseRevision: fc.constant(2) }),
          notAnObject,
        ),
      },
      { path: `/api/combinations/${c.id}/duplicate`, method: "POST", body: fc.oneof(badName.map((name) => ({ name })), fc.constantFrom({ revision: 0 }, { revision: 99 }, { extra: true }), notAnObject.filter((s) => s !== "")) },
      {
        path: "/api/combinations/import",
        method: "POST",
        body: fc.oneof(
          specWithBadPulley.map((s) => ({ format: "pulleywright.combinations", version: 1, combinations: [{ name: "good", spec: spec() }, { name: "bad", spec: s }] })),
          badName.map((name) => ({ format: "pulleywright.combinations", version: 1, combinations: [{ name, spec: spec() }] })),
          fc.constantFrom({ format: "other", version: 1, combinations: [{ name: "x", spec: spec() }] }, { format: "pulleywright.combinations", version: 1, combinations: [] }),
          notAnObject,
        ),
      },
    ];
    for (const r of routes) {
      await fc.assert(
        fc.asyncProperty(r.body, async (body) => {
          const res = await alice.json(r.path, r.method, typeof body === "string" ? body : JSON.stringify(body));
          expect(res.status, `${r.method} ${r.path} ${JSON.stringify(body)?.slice(0, 200)}`).toBeGreaterThanOrEqual(400);
          expect(res.status).toBeLessThan(500);
          expect(typeof res.data.error).toBe("string");
        }),
        { numRuns: 25 },
      );
    }
    expect(await snapshot()).toBe(before);
    expect(await count()).toBe(total);
  });
});
