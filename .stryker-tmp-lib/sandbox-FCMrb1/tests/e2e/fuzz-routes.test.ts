// @ts-nocheck
// Every route handler under app/api, fuzzed over HTTP with fast-check: random and malformed JSON,
// wrong types, hostile strings (markup, SQL-ish text), oversize bodies and odd path parameters.
// The answer is always a 4xx with a message (or a 2xx for harmless reads), never a 5xx, and no
// stored row changes.
import fs from "node:fs";
import path from "node:path";
import fc from "fast-check";
import pg from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signedIn, type Client } from "../support/http";

const apiRoot = path.resolve(import.meta.dirname, "../../app/api");

type RouteFile = { template: string; methods: string[] };

function findRoutes(dir: string, prefix = "/api"): RouteFile[] {
  const out: RouteFile[] = [];
  for (const e of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) out.push(...findRoutes(full, `${prefix}/${e.name}`));
    else if (e.name === "route.ts") {
      const src = fs.readFileSync(full, "utf8");
      const methods = ["GET", "POST", "PUT", "PATCH", "DELETE"].filter((m) =>
        new RegExp(`export\\s+(const|async function|function)\\s+${m}\\b|as ${m}\\b|export\\s*\\{[^}]*\\b${m}\\b`).test(src),
      );
      out.push({ template: prefix, methods });
    }
  }
  return out;
}

const routes = findRoutes(apiRoot).filter((r) => !r.template.includes("[...nextauth]"));

const hostile = fc.constantFrom(
  "<script>alert(1)</script>",
  "'; DROP TABLE users; --",
  "\" OR 1=1 --",
  "../../etc/passwd",
  "\u0000\u0001",
  "𝔘𝔫𝔦𝔠𝔬𝔡𝔢 ✓",
  "%s%n%x",
  "a".repeat(5000),
);
const value = fc.oneof(fc.jsonValue(), hostile, fc.constant(null), fc.double(), fc.constant(Number.MAX_SAFE_INTEGER));
const body = fc.oneof(
  fc.jsonValue().map((v) => JSON.stringify(v)),
  fc.dictionary(fc.oneof(fc.constantFrom("name", "spec", "id", "baseRevision", "combinationId", "email", "role", "items", "code", "text", "mapping", "number", "action", "price", "stock"), fc.string()), value).map((o) => JSON.stringify(o)),
  fc.string(), // not JSON at all
  hostile.map((h) => `{"name": ${JSON.stringify(h)}, "spec": {"engine": ${JSON.stringify(h)}}}`),
);
const segment = fc.constantFrom("00000000-0000-4000-8000-000000000000", "not-a-uuid", "1", "-1", "abc", "%3Cscript%3E", "9999999999");

function fill(template: string, seg: string) {
  return template.replace(/\[[^\]]+\]/g, seg);
}

async function rowCounts(url: string) {
  const c = new pg.Client({ connectionString: url });
  await c.connect();
  const tables = (await c.query("SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename NOT IN ('sign_in_attempts', 'auth_tokens')")).rows.map((r) => r.tablename as string);
  const out: Record<string, number> = {};
  for (const t of tables) out[t] = Number((await c.query(`SELECT count(*) FROM "${t}"`)).rows[0].count);
  await c.end();
  return out;
}

describe("route handlers under fuzzing", () => {
  let clients: Record<string, Client>;
  let before: Record<string, number>;
  beforeAll(async () => {
    clients = { member: await signedIn("member@example.com"), admin: await signedIn("admin@example.com") };
    before = await rowCounts(process.env.DATABASE_URL!);
  });
  afterAll(async () => {
    // Nothing the fuzzing sent was stored.
    expect(await rowCounts(process.env.DATABASE_URL!)).toEqual(before);
  });

  it("finds the app's route handlers", () => {
    expect(routes.length).toBeGreaterThan(5);
  });

  for (const r of routes) {
    for (const method of r.methods.filter((m) => m !== "GET")) {
      it(`${method} ${r.template} answers 4xx to bad bodies`, async () => {
        await fc.assert(
          fc.asyncProperty(fc.constantFrom("member", "admin"), segment, body, async (who, seg, b) => {
            const res = await clients[who].fetch(fill(r.template, seg), { method, headers: { "content-type": "application/json" }, body: b });
            const text = await res.text();
            expect(res.status, `${method} ${fill(r.template, seg)} as ${who} with ${b.slice(0, 200)} → ${text.slice(0, 300)}`).toBeLessThan(500);
            if (res.status === 400) expect(JSON.parse(text).error).toEqual(expect.any(String));
          }),
          { numRuns: 25 },
        );
      });
    }
    if (r.methods.includes("GET")) {
      it(`GET ${r.template} never fails on odd parameters`, async () => {
        await fc.assert(
          fc.asyncProperty(fc.constantFrom("member", "admin"), segment, fc.dictionary(fc.constantFrom("page", "pageSize", "sort", "dir", "search", "ids", "scope", "q"), fc.oneof(fc.string(), hostile)), async (who, seg, q) => {
            const res = await clients[who].fetch(`${fill(r.template, seg)}?${new URLSearchParams(q)}`);
            expect(res.status, `GET ${fill(r.template, seg)}?${new URLSearchParams(q)} as ${who}`).toBeLessThan(500);
          }),
          { numRuns: 15 },
        );
      });
    }
  }

  it("refuses an oversize body with 413 (or 400), not a 5xx", async () => {
    const big = JSON.stringify({ name: "x", spec: "y".repeat(6 * 1024 * 1024) });
    for (const r of routes.filter((x) => x.methods.includes("POST"))) {
      const res = await clients.admin.fetch(fill(r.template, "00000000-0000-4000-8000-000000000000"), { method: "POST", headers: { "content-type": "application/json" }, body: big });
      expect(res.status, `POST ${r.template}`).toBeGreaterThanOrEqual(400);
      expect(res.status, `POST ${r.template}`).toBeLessThan(500);
    }
  });

  it("answers 401 to every route when signed out", async () => {
    const { Client } = await import("../support/http");
    const anon = new Client();
    // Public on purpose: the health probe, the customer's token-checked share routes, and the
    // payment webhook, whose credential is its signature (an unsigned call is a 400).
    const open = ["/api/health", "/api/share", "/api/payments/webhook"];
    for (const r of routes.filter((x) => !open.some((p) => x.template.startsWith(p)))) {
      for (const method of r.methods) {
        const res = await anon.fetch(fill(r.template, "00000000-0000-4000-8000-000000000000"), { method, headers: { "content-type": "application/json" }, body: method === "GET" ? undefined : "{}" });
        expect([401, 404], `${method} ${r.template}`).toContain(res.status);
      }
    }
    const unsigned = await anon.fetch("/api/payments/webhook", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(unsigned.status).toBe(400);
    expect(await unsigned.json()).toMatchObject({ fieldErrors: { "stripe-signature": [expect.any(String)] } });
  });
});
