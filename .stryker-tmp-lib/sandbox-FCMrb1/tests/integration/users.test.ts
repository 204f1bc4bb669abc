// @ts-nocheck
// The accounts table and the one entry check (requireActor): only admins manage accounts, nobody
// removes their own admin access, and a role change or a disabled account applies on the very
// next request because the session's user is reloaded every time.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ZodError } from "zod";
import { ConflictError, ForbiddenError, NotFoundError, UnauthorizedError } from "@/lib/errors";
import type { Actor } from "@/db/policy";
import { listUsers, updateUserAccess } from "@/db/repo/users";
import { mockSession } from "../support/session-mock";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const ctx = mockSession();

const { requireActor } = await import("@/app/_lib/session");
const adminRoutes = { list: await import("@/app/api/admin/users/route"), one: await import("@/app/api/admin/users/[id]/route") };
const me = await import("@/app/api/me/route");
const adminActions = await import("@/app/(app)/admin/users/actions");

let t: TestDb;
let admin: Actor;

beforeAll(async () => {
  t = await freshDatabase();
  ctx.db = t.db;
  admin = await makeUser(t.db, "admin", "boss@example.com");
});
afterAll(async () => {
  await t?.drop();
});

describe("accounts table", () => {
  it("is for admins only", async () => {
    for (const role of ["member", "tuner", "sales", "instructor"] as const) {
      const a = await makeUser(t.db, role);
      await expect(listUsers(t.db, a, {})).rejects.toBeInstanceOf(ForbiddenError);
      await expect(updateUserAccess(t.db, a, admin.id, { disabled: true })).rejects.toBeInstanceOf(ForbiddenError);
      ctx.userId = a.id;
      expect((await adminRoutes.list.GET(new Request("http://t/api/admin/users"), undefined as never)).status).toBe(403);
      const r = await adminActions.setUserDisabledAction(admin.id, true);
      expect(!r.ok && r.status).toBe(403);
    }
    ctx.userId = null;
    expect((await adminRoutes.list.GET(new Request("http://t/api/admin/users"), undefined as never)).status).toBe(401);
  });

  it("searches (wildcards literal) and pages", async () => {
    for (let i = 0; i < 5; i++) await makeUser(t.db, "member", `page-test-${i}@example.com`);
    await makeUser(t.db, "member", "odd_one@example.com");
    const p1 = await listUsers(t.db, admin, { search: "page-test", page: 1, pageSize: 2 });
    const p3 = await listUsers(t.db, admin, { search: "page-test", page: 3, pageSize: 2 });
    expect(p1.total).toBe(5);
    expect(p1.rows.map((r) => r.email)).toEqual(["page-test-0@example.com", "page-test-1@example.com"]);
    expect(p3.rows.map((r) => r.email)).toEqual(["page-test-4@example.com"]);
    expect((await listUsers(t.db, admin, { search: "d_o" })).rows.map((r) => r.email)).toEqual(["odd_one@example.com"]);
    expect((await listUsers(t.db, admin, { search: "%" })).total).toBe(0);
  });

  it("changes a role and disables an account; both apply on the next request", async () => {
    const m = await makeUser(t.db, "member");
    ctx.userId = m.id;
    expect((await requireActor()).role).toBe("member");
    await expect(requireActor(["tuner", "sales", "admin"])).rejects.toBeInstanceOf(ForbiddenError);

    ctx.userId = admin.id;
    const form = new FormData();
    form.set("role", "tuner");
    expect(await adminActions.setUserRoleAction(m.id, undefined, form)).toMatchObject({ ok: true, data: { role: "tuner" } });

    ctx.userId = m.id;
    expect((await requireActor(["tuner"])).role).toBe("tuner");
    const meRes = await me.GET(new Request("http://t/api/me"), undefined as never);
    expect(await meRes.json()).toMatchObject({ id: m.id, role: "tuner" });

    ctx.userId = admin.id;
    const res = await adminRoutes.one.PATCH(
      new Request(`http://t/api/admin/users/${m.id}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ disabled: true }) }),
      { params: Promise.resolve({ id: m.id }) },
    );
    expect(res.status).toBe(200);
    ctx.userId = m.id;
    await expect(requireActor()).rejects.toBeInstanceOf(UnauthorizedError);
  });

  it("an admin cannot demote or disable themselves", async () => {
    await expect(updateUserAccess(t.db, admin, admin.id, { role: "member" })).rejects.toBeInstanceOf(ConflictError);
    await expect(updateUserAccess(t.db, admin, admin.id, { disabled: true })).rejects.toBeInstanceOf(ConflictError);
    ctx.userId = admin.id;
    const form = new FormData();
    form.set("role", "sales");
    const r = await adminActions.setUserRoleAction(admin.id, undefined, form);
    expect(r.ok).toBe(false);
    expect((await requireActor()).role).toBe("admin");
  });

  it("refuses a bad role or id with a field error, not a database error", async () => {
    const m = await makeUser(t.db, "member");
    await expect(updateUserAccess(t.db, admin, m.id, { role: "owner" as never })).rejects.toBeInstanceOf(ZodError);
    await expect(updateUserAccess(t.db, admin, m.id, { disabled: "yes" as never })).rejects.toBeInstanceOf(ZodError);
    await expect(updateUserAccess(t.db, admin, "not-a-uuid", { role: "tuner" })).rejects.toBeInstanceOf(NotFoundError);
    await expect(updateUserAccess(t.db, admin, "00000000-0000-4000-8000-000000000000", { role: "tuner" })).rejects.toBeInstanceOf(NotFoundError);
    ctx.userId = admin.id;
    const res = await adminRoutes.one.PATCH(
      new Request(`http://t/api/admin/users/${m.id}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ role: "owner" }) }),
      { params: Promise.resolve({ id: m.id }) },
    );
    expect(res.status).toBe(400);
    expect(((await res.json()) as { fieldErrors: Record<string, string[]> }).fieldErrors.role).toBeTruthy();
  });
});
