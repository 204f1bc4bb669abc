// @ts-nocheck
// Ending sessions (issue: a signed-out cookie kept working and /api/auth/session renewed it).
// Every cookie carries the account's session version; signing out, "sign out everywhere", a new
// password and disabling the account bump it, and an older cookie is refused by every entry
// point and by next-auth's own session endpoint (the jwt callback), which would renew it.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { UnauthorizedError } from "@/lib/errors";
import { mockSession } from "../support/session-mock";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const ctx = mockSession();
// The real auth options (the mock above stubs them for other files); only the database is the test's.
vi.doUnmock("@/app/_lib/auth-options");

const { requireActor } = await import("@/app/_lib/session");
const { authOptions } = await import("@/app/_lib/auth-options");
const { endAllSessions, getUserById, setPassword, updateUserAccess } = await import("@/db/repo/users");
const settings = await import("@/app/(app)/settings/actions");
const me = await import("@/app/api/me/route");

let t: TestDb;
beforeAll(async () => {
  t = await freshDatabase();
  ctx.db = t.db;
});
afterAll(async () => {
  await t?.drop();
});

const sv = async (id: string) => (await getUserById(t.db, id))!.sessionVersion;
/** What next-auth's /api/auth/session does with a cookie: run the jwt callback, and renew only if it returns. */
const renew = (token: { sub: string; sv?: number }) => authOptions().callbacks!.jwt!({ token, account: null } as never);

describe("session versions", () => {
  it("a cookie of the current version works; after sign-out everywhere it is refused by requireActor and /api/me", async () => {
    const m = await makeUser(t.db, "member");
    ctx.userId = m.id;
    ctx.sv = await sv(m.id);
    await expect(requireActor()).resolves.toMatchObject({ id: m.id });
    const form = new FormData();
    const r = await settings.signOutEverywhere(undefined, form);
    expect(r.ok).toBe(true);
    expect(await sv(m.id)).toBe(ctx.sv + 1);
    await expect(requireActor()).rejects.toBeInstanceOf(UnauthorizedError);
    expect((await me.GET(new Request("http://t/api/me"), undefined as never)).status).toBe(401);
    // A cookie made after the bump works again.
    ctx.sv = await sv(m.id);
    expect((await me.GET(new Request("http://t/api/me"), undefined as never)).status).toBe(200);
  });

  it("next-auth's sign-out event ends every session of the account", async () => {
    const m = await makeUser(t.db, "member");
    const before = await sv(m.id);
    await authOptions().events!.signOut!({ token: { sub: m.id, sv: before }, session: undefined as never });
    expect(await sv(m.id)).toBe(before + 1);
    await expect(renew({ sub: m.id, sv: before })).rejects.toThrow(/session was ended/);
  });

  it("a new password (reset or change) ends the sessions made with the old one", async () => {
    const m = await makeUser(t.db, "member");
    const before = await sv(m.id);
    await expect(renew({ sub: m.id, sv: before })).resolves.toMatchObject({ sub: m.id });
    await setPassword(t.db, m.id, "a-new-long-password");
    await expect(renew({ sub: m.id, sv: before })).rejects.toThrow();
    await setPassword(t.db, m.id, "another-long-password");
    expect(await sv(m.id)).toBe(before + 2);
  });

  it("a disabled account's cookie is not renewed, and re-enabling does not bring it back", async () => {
    const admin = await makeUser(t.db, "admin");
    const m = await makeUser(t.db, "member");
    const before = await sv(m.id);
    await updateUserAccess(t.db, admin, m.id, { disabled: true });
    await expect(renew({ sub: m.id, sv: before })).rejects.toThrow();
    await updateUserAccess(t.db, admin, m.id, { disabled: false });
    await expect(renew({ sub: m.id, sv: before })).rejects.toThrow();
    await expect(renew({ sub: m.id, sv: before + 1 })).resolves.toMatchObject({ sub: m.id });
  });

  it("a role change alone keeps the session (only ending events bump the version)", async () => {
    const admin = await makeUser(t.db, "admin");
    const m = await makeUser(t.db, "member");
    const before = await sv(m.id);
    await updateUserAccess(t.db, admin, m.id, { role: "tuner" });
    expect(await sv(m.id)).toBe(before);
    await endAllSessions(t.db, m.id);
    expect(await sv(m.id)).toBe(before + 1);
  });

  it("sign-in puts the account's current version in the new cookie", async () => {
    const m = await makeUser(t.db, "member");
    await endAllSessions(t.db, m.id);
    const token = await authOptions().callbacks!.jwt!({ token: {}, user: { id: m.id, sv: await sv(m.id) }, account: null } as never);
    expect(token).toMatchObject({ sub: m.id, sv: 1 });
  });
});
