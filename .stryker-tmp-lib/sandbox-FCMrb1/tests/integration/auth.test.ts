// @ts-nocheck
// Sign-in defences against a real database: wrong passwords from one address stop that address
// for the account, failures from many addresses slow the account without locking its owner out,
// an address that keeps failing is stopped across accounts, the limits hold under parallel tries,
// and e-mailed tokens work once, expire, and a newer one replaces the older. Limits are the app's own (db/repo/users.ts); common practice, no published source.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ConflictError } from "@/lib/errors";
import {
  ACCOUNT_THROTTLE_MS,
  consumeToken,
  createMember,
  issueToken,
  MAX_FAILURES_PER_ACCOUNT,
  MAX_FAILURES_PER_ADDRESS,
  verifyPassword,
} from "@/db/repo/users";
import { authTokens, signInAttempts, users } from "@/db/schema";
import { freshDatabase, type TestDb } from "../support/db";

let t: TestDb;
let n = 0;
const PASSWORD = "correct horse battery";
async function member() {
  n++;
  return createMember(t.db, { email: `Person${n}@Example.com`, name: `Person ${n}`, password: PASSWORD });
}

beforeAll(async () => {
  t = await freshDatabase();
});
afterAll(async () => {
  await t?.drop();
});

describe("password sign-in", () => {
  it("accepts the right password (e-mail in any case) and refuses a wrong one without saying which part was wrong", async () => {
    const u = await member();
    expect(await verifyPassword(t.db, u.email.toUpperCase(), PASSWORD, "10.0.0.1")).toMatchObject({ id: u.id });
    expect(await verifyPassword(t.db, u.email, "wrong password", "10.0.0.1")).toBeNull();
    expect(await verifyPassword(t.db, "nobody@example.com", PASSWORD, "10.0.0.1")).toBeNull();
  });

  it(`after ${MAX_FAILURES_PER_ACCOUNT} wrong passwords from one address that address waits out the window for that account`, async () => {
    expect(MAX_FAILURES_PER_ACCOUNT).toBe(5);
    const u = await member();
    for (let i = 0; i < 5; i++) expect(await verifyPassword(t.db, u.email, `guess ${i}`, "10.1.0.1")).toBeNull();
    await t.db.update(signInAttempts).set({ createdAt: new Date(Date.now() - ACCOUNT_THROTTLE_MS - 1000) }).where(eq(signInAttempts.email, u.email));
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.1.0.1")).toBe("rate-limited");
    // Another account is not affected.
    const other = await member();
    expect(await verifyPassword(t.db, other.email, PASSWORD, "10.9.9.9")).toMatchObject({ id: other.id });
    // Move the failures 16 minutes into the past: the 15-minute window is over.
    await t.db.update(signInAttempts).set({ createdAt: new Date(Date.now() - 16 * 60_000) }).where(eq(signInAttempts.email, u.email));
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.1.0.1")).toMatchObject({ id: u.id });
  });

  it("failures spread over many addresses slow the account to one try per 30 s but never lock its owner out", async () => {
    const u = await member();
    for (let i = 0; i < 5; i++) expect(await verifyPassword(t.db, u.email, `guess ${i}`, `10.5.0.${i}`)).toBeNull();
    // Right after them, even the right password waits for the throttle (and spends no bcrypt).
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.9.9.8")).toBe("rate-limited");
    // 31 s later the owner, from their own address, gets in with the right password.
    await t.db.update(signInAttempts).set({ createdAt: new Date(Date.now() - ACCOUNT_THROTTLE_MS - 1000) }).where(eq(signInAttempts.email, u.email));
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.9.9.8")).toMatchObject({ id: u.id });
  });

  it("30 parallel wrong passwords for one account: at most 5 reach the password check (reserved under a lock)", async () => {
    const u = await member();
    const results = await Promise.all(Array.from({ length: 30 }, (_, i) => verifyPassword(t.db, u.email, `parallel ${i}`, "10.6.0.1")));
    const checked = await t.db.select().from(signInAttempts).where(eq(signInAttempts.email, u.email));
    expect(checked.length).toBeLessThanOrEqual(MAX_FAILURES_PER_ACCOUNT);
    expect(results.filter((r) => r === "rate-limited").length).toBeGreaterThanOrEqual(30 - MAX_FAILURES_PER_ACCOUNT);
  });

  it("30 parallel tries from one address over many accounts: at most 20 reach the password check", async () => {
    const ip = "10.7.0.1";
    await Promise.all(Array.from({ length: 30 }, (_, i) => verifyPassword(t.db, `parallel-spray${i}@example.com`, "guess", ip)));
    const checked = await t.db.select().from(signInAttempts).where(eq(signInAttempts.ip, ip));
    expect(checked.length).toBeLessThanOrEqual(MAX_FAILURES_PER_ADDRESS);
  });

  it("a successful sign-in starts the count again", async () => {
    const u = await member();
    for (let i = 0; i < 4; i++) await verifyPassword(t.db, u.email, "nope", "10.2.0.1");
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.2.0.1")).toMatchObject({ id: u.id });
    for (let i = 0; i < 4; i++) expect(await verifyPassword(t.db, u.email, "nope", "10.2.0.1")).toBeNull();
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.2.0.1")).toMatchObject({ id: u.id });
  });

  it(`slows an address after ${MAX_FAILURES_PER_ADDRESS} failures across accounts, not other addresses`, async () => {
    const ip = "10.3.0.1";
    for (let i = 0; i < MAX_FAILURES_PER_ADDRESS; i++) await verifyPassword(t.db, `spray${i}@example.com`, "guess", ip);
    const u = await member();
    expect(await verifyPassword(t.db, u.email, PASSWORD, ip)).toBe("rate-limited");
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.3.0.2")).toMatchObject({ id: u.id });
  });

  it("a disabled account cannot sign in", async () => {
    const u = await member();
    await t.db.update(users).set({ disabled: true }).where(eq(users.id, u.id));
    expect(await verifyPassword(t.db, u.email, PASSWORD, "10.4.0.1")).toBeNull();
  });
});

describe("sign-up", () => {
  it("makes a member and refuses a taken e-mail, also when two sign up at the same moment", async () => {
    const u = await createMember(t.db, { email: "  New.Person@Example.com ", name: " New ", password: PASSWORD });
    expect(u).toMatchObject({ email: "new.person@example.com", name: "New", role: "member" });
    expect(u.passwordHash).not.toContain(PASSWORD);
    await expect(createMember(t.db, { email: "new.person@example.com", name: "Again", password: PASSWORD })).rejects.toBeInstanceOf(ConflictError);
    const race = await Promise.allSettled([0, 1, 2].map((i) => createMember(t.db, { email: "racer@example.com", name: `Racer ${i}`, password: PASSWORD })));
    expect(race.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    for (const r of race) if (r.status === "rejected") expect(r.reason).toBeInstanceOf(ConflictError);
  });
});

describe("one-time tokens", () => {
  it("work once, for their own kind only", async () => {
    const u = await member();
    const token = await issueToken(t.db, u.id, "magic-link", 15);
    expect(await consumeToken(t.db, token, "password-reset")).toBeNull();
    expect(await consumeToken(t.db, token, "magic-link")).toMatchObject({ id: u.id });
    expect(await consumeToken(t.db, token, "magic-link")).toBeNull();
    // Only a hash is stored.
    const rows = await t.db.select().from(authTokens).where(eq(authTokens.userId, u.id));
    expect(rows.some((r) => r.tokenHash === token)).toBe(false);
  });

  it("are spent once even when used twice at the same moment", async () => {
    const u = await member();
    const token = await issueToken(t.db, u.id, "password-reset", 30);
    const both = await Promise.all([consumeToken(t.db, token, "password-reset"), consumeToken(t.db, token, "password-reset")]);
    expect(both.filter(Boolean)).toHaveLength(1);
  });

  it("a newer reset link replaces the older one, and using one spends every other", async () => {
    const u = await member();
    const older = await issueToken(t.db, u.id, "password-reset", 30);
    const newer = await issueToken(t.db, u.id, "password-reset", 30);
    expect(await consumeToken(t.db, older, "password-reset")).toBeNull();
    // Two outstanding links (as left by an earlier version of the app): using the newer spends the older.
    await t.db.update(authTokens).set({ usedAt: null }).where(eq(authTokens.userId, u.id));
    expect(await consumeToken(t.db, newer, "password-reset")).toMatchObject({ id: u.id });
    expect(await consumeToken(t.db, older, "password-reset")).toBeNull();
    // Sign-in links are their own kind: a reset does not spend them.
    const link = await issueToken(t.db, u.id, "magic-link", 15);
    await issueToken(t.db, u.id, "password-reset", 30);
    expect(await consumeToken(t.db, link, "magic-link")).toMatchObject({ id: u.id });
  });

  it("expire", async () => {
    const u = await member();
    const token = await issueToken(t.db, u.id, "magic-link", 15);
    await t.db.update(authTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(authTokens.userId, u.id));
    expect(await consumeToken(t.db, token, "magic-link")).toBeNull();
  });

  it("do not sign in a disabled account, and an unknown token is refused", async () => {
    const u = await member();
    const token = await issueToken(t.db, u.id, "magic-link", 15);
    await t.db.update(users).set({ disabled: true }).where(eq(users.id, u.id));
    expect(await consumeToken(t.db, token, "magic-link")).toBeNull();
    expect(await consumeToken(t.db, "not-a-real-token-at-all", "magic-link")).toBeNull();
  });
});
