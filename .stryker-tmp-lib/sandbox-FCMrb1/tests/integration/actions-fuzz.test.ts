// @ts-nocheck
// Every server action, called the way a hostile client could call it (a server action is a public
// POST endpoint): random FormData, random JSON values, odd ids, hostile strings, as a member, as an
// admin and signed out. An action may refuse, redirect or answer with field errors; it must never
// throw anything else (that would reach the person as a 500).
import fs from "node:fs";
import path from "node:path";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seedDemo } from "@/db/seed";
import { mockSession } from "../support/session-mock";
import { freshDatabase, type TestDb } from "../support/db";

const ctx = mockSession();

const appDir = path.resolve(import.meta.dirname, "../../app");
function actionFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return actionFiles(full);
    return e.name === "actions.ts" ? [full] : [];
  });
}

const hostile = fc.constantFrom("<script>alert(1)</script>", "'; DROP TABLE users; --", "\u0000", "x".repeat(3000), "00000000-0000-4000-8000-000000000000", "-1", "NaN", "1e309");
const text = fc.oneof(fc.string(), hostile);
const formData = fc
  .dictionary(fc.oneof(fc.constantFrom("name", "email", "password", "confirm", "token", "note", "id", "role", "unitSystem", "baseRevision", "number", "spec", "title", "code", "summary", "items", "customerName", "disabled", "combinationId"), fc.string()), text)
  .map((o) => {
    const f = new FormData();
    for (const [k, v] of Object.entries(o)) f.append(k, v);
    return f;
  });
const arg = fc.oneof(fc.constant(undefined), formData, fc.jsonValue(), text, fc.integer());

const isNextControlFlow = (e: unknown) => {
  const d = (e as { digest?: unknown })?.digest;
  return typeof d === "string" && (d.startsWith("NEXT_REDIRECT") || d.startsWith("NEXT_HTTP_ERROR_FALLBACK") || d.startsWith("NEXT_NOT_FOUND"));
};

describe("server actions under fuzzing", () => {
  let t: TestDb;
  const people: Record<string, string | null> = { signedOut: null };
  beforeAll(async () => {
    t = await freshDatabase();
    ctx.db = t.db;
    await seedDemo(t.db);
    const { users } = await import("@/db/schema");
    for (const u of await t.db.select().from(users)) people[u.role] = u.id;
  });
  afterAll(async () => {
    await t?.drop();
  });

  const files = actionFiles(appDir);
  it("finds the app's action modules", () => {
    expect(files.length).toBeGreaterThanOrEqual(5);
  });

  for (const file of files) {
    const rel = path.relative(appDir, file);
    it(`${rel}: every action answers or refuses, never throws`, async () => {
      const mod = (await import(/* @vite-ignore */ file)) as Record<string, unknown>;
      const actions = Object.entries(mod).filter(([, v]) => typeof v === "function") as [string, (...a: unknown[]) => Promise<unknown>][];
      expect(actions.length).toBeGreaterThan(0);
      for (const [name, fn] of actions) {
        await fc.assert(
          fc.asyncProperty(fc.constantFrom("signedOut", "member", "admin"), fc.array(arg, { maxLength: 3 }), async (who, args) => {
            ctx.userId = people[who] ?? null;
            try {
              const out = (await fn(...args)) as { ok?: boolean; message?: unknown; status?: number } | undefined;
              if (out && typeof out === "object" && out.ok === false) {
                expect(typeof out.message, `${name} message`).toBe("string");
                // A refusal names the problem (4xx); "something went wrong on our side" is a bug.
                expect(out.status, `${rel} ${name}(${who}) with ${JSON.stringify(args, (_k, v) => (v instanceof FormData ? Object.fromEntries(v) : v)).slice(0, 300)} → ${out.message}`).toBeLessThan(500);
              }
            } catch (e) {
              if (!isNextControlFlow(e)) throw new Error(`${rel} ${name}(${who}) threw: ${(e as Error)?.message ?? e}`);
            }
          }),
          { numRuns: 15 },
        );
      }
    });
  }
});
