// @ts-nocheck
import { and, count, desc, eq, gt, ilike, isNull, or, sql } from "drizzle-orm";
import bcrypt from "bcryptjs";
import crypto from "node:crypto";
import { z } from "zod";
import type { DbOrTx } from "../connect";
import { inKeyOrder } from "../keyed-queue";
import { preparedFor } from "../prepared";
import { authTokens, signInAttempts, users, type Role, type User } from "../schema";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { assert, canManageUsers, ROLES, type Actor } from "../policy";

export const normalizeEmail = (e: string) => e.trim().toLowerCase();

export async function hashPassword(password: string) {
  return bcrypt.hash(password, 10);
}

export async function getUserByEmail(db: DbOrTx, email: string): Promise<User | undefined> {
  const [u] = await db.select().from(users).where(eq(users.email, normalizeEmail(email)));
  return u;
}

// Every signed-in request looks its user up, so that query is a named prepared statement.
export async function getUserById(db: DbOrTx, id: string): Promise<User | undefined> {
  const query = preparedFor(db, "user_by_id", () => db.select().from(users).where(eq(users.id, sql.placeholder("id"))).prepare("user_by_id"));
  const [u] = await query.execute({ id });
  return u;
}

/** A session is alive while its account exists, is enabled, and has not moved to a newer session version. */
export function sessionIsAlive(u: User | undefined, sv: number): u is User {
  return !!u && !u.disabled && u.sessionVersion === sv;
}

/** Ends every session of an account (sign-out, "sign out everywhere", new password, disabled). */
export async function endAllSessions(db: DbOrTx, userId: string) {
  await db.update(users).set({ sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
}

export function toActor(u: User): Actor {
  return { id: u.id, role: u.role, email: u.email, name: u.name };
}

/** Sign-up: always a member. Refuses an e-mail already taken (409). */
export async function createMember(db: DbOrTx, input: { email: string; name: string; password: string }) {
  const email = normalizeEmail(input.email);
  const taken = () => new ConflictError("An account with that e-mail already exists.", { field: "email" });
  if (await getUserByEmail(db, email)) throw taken();
  try {
    const [u] = await db
      .insert(users)
      .values({ email, name: input.name.trim(), passwordHash: await hashPassword(input.password), role: "member" })
      .returning();
    return u;
  } catch (e) {
    // Two sign-ups with one address at the same moment: the unique index decides, the loser gets a 409.
    if (pgCode(e) === "23505") throw taken();
    throw e;
  }
}

function pgCode(e: unknown): string | undefined {
  for (let x: unknown = e, i = 0; x && i < 4; i++) {
    const c = (x as { code?: unknown }).code;
    if (typeof c === "string") return c;
    x = (x as { cause?: unknown }).cause;
  }
  return undefined;
}

// Sign-in limits, in a 15-minute sliding window (the app's own numbers; common practice, no
// published source). Failures count since the account's last success.
// - per address: 20 failures, then that address waits out the window;
// - per account and address: 5 failures, then that pair waits out the window;
// - per account from anywhere: after 5 failures, one try per 30 s. This slows a guesser who
//   spreads over many addresses without ever locking the owner out of their own account.
const WINDOW_MS = 15 * 60 * 1000;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;
export const ACCOUNT_THROTTLE_MS = 30_000;

// Advisory-lock classes (first key of pg_advisory_xact_lock(int, int)); always taken in this order.
const LOCK_ACCOUNT = 71;
const LOCK_ADDRESS = 72;

/**
 * Checks the limits and reserves one attempt (recorded as a failure until it succeeds) under
 * advisory locks on the account and the address, so parallel tries cannot all slip under a
 * limit. Returns the attempt's id, or "rate-limited".
 */
export async function reserveSignInAttempt(db: DbOrTx, email: string, ip: string): Promise<number | "rate-limited"> {
  const addr = normalizeEmail(email);
  // Few round trips while the locks are held; tries on one account or address queue in this
  // process first (keyed-queue.ts), so a burst does not take every pooled connection.
  return inKeyOrder([`account:${addr}`, `address:${ip}`], () => db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(${LOCK_ACCOUNT}, hashtext(${addr})), pg_advisory_xact_lock(${LOCK_ADDRESS}, hashtext(${ip}))`);
    const windowStart = new Date(Date.now() - WINDOW_MS);
    // Failures count since the account's last success within the window (or the window's start).
    const since = sql`greatest(${windowStart}::timestamptz, coalesce((select max(created_at) from sign_in_attempts where email = ${addr} and success), ${windowStart}::timestamptz))`;
    const res = await tx.execute(sql`
      select
        count(*) filter (where email = ${addr} and created_at > ${since})::int as account,
        max(created_at) filter (where email = ${addr} and created_at > ${since}) as last,
        count(*) filter (where email = ${addr} and ip = ${ip} and created_at > ${since})::int as pair,
        count(*) filter (where ip = ${ip})::int as address
      from sign_in_attempts
      where not success and created_at > ${windowStart}::timestamptz and (email = ${addr} or ip = ${ip})`);
    const c = res.rows[0] as { account: number; last: string | Date | null; pair: number; address: number };
    const last = c.last ? new Date(c.last).getTime() : 0;
    const throttled = c.account >= MAX_FAILURES_PER_ACCOUNT && Date.now() - last < ACCOUNT_THROTTLE_MS;
    if (c.address >= MAX_FAILURES_PER_ADDRESS || c.pair >= MAX_FAILURES_PER_ACCOUNT || throttled) return "rate-limited" as const;
    const [row] = await tx.insert(signInAttempts).values({ email: addr, ip, success: false }).returning({ id: signInAttempts.id });
    return row.id;
  }));
}

const DUMMY_HASH = bcrypt.hashSync("not-a-password-" + crypto.randomBytes(8).toString("hex"), 10);

/** Checks a password sign-in. Returns the user, or null for any failure (without saying which). */
export async function verifyPassword(db: DbOrTx, email: string, password: string, ip: string): Promise<User | null | "rate-limited"> {
  const attempt = await reserveSignInAttempt(db, email, ip);
  if (attempt === "rate-limited") return attempt;
  const u = await getUserByEmail(db, email);
  // Always pay for one bcrypt comparison, so the answer time does not tell which addresses have accounts.
  const hash = u && !u.disabled && u.passwordHash ? u.passwordHash : DUMMY_HASH;
  const matches = await bcrypt.compare(password, hash);
  const ok = matches && hash !== DUMMY_HASH;
  if (ok) await db.update(signInAttempts).set({ success: true, createdAt: new Date() }).where(eq(signInAttempts.id, attempt));
  return ok ? u! : null;
}

// One-time tokens (sign-in links and password resets). The e-mailed token is random; only its hash is stored.
const sha256 = (s: string) => crypto.createHash("sha256").update(s).digest("hex");

async function spendOutstandingTokens(db: DbOrTx, userId: string, kind: "magic-link" | "password-reset") {
  await db
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(authTokens.userId, userId), eq(authTokens.kind, kind), isNull(authTokens.usedAt)));
}

/** A new token of a kind replaces the account's outstanding ones: only the latest e-mailed link works. */
export async function issueToken(db: DbOrTx, userId: string, kind: "magic-link" | "password-reset", ttlMinutes: number) {
  await spendOutstandingTokens(db, userId, kind);
  const token = crypto.randomBytes(32).toString("base64url");
  await db.insert(authTokens).values({
    userId,
    kind,
    tokenHash: sha256(token),
    expiresAt: new Date(Date.now() + ttlMinutes * 60_000),
  });
  return token;
}

/** Uses a token once; returns its user when it is valid, unexpired and unused. */
export async function consumeToken(db: DbOrTx, token: string, kind: "magic-link" | "password-reset"): Promise<User | null> {
  const [row] = await db
    .update(authTokens)
    .set({ usedAt: new Date() })
    .where(
      and(
        eq(authTokens.tokenHash, sha256(token)),
        eq(authTokens.kind, kind),
        isNull(authTokens.usedAt),
        gt(authTokens.expiresAt, new Date()),
      ),
    )
    .returning();
  if (!row) return null;
  // Using one token of a kind spends every other outstanding one: an older reset link left in a
  // mailbox must not work after the password was chosen with a newer one.
  await spendOutstandingTokens(db, row.userId, kind);
  const u = await getUserById(db, row.userId);
  return u && !u.disabled ? u : null;
}

/** A new password also ends every session: whoever knew the old one is signed out. */
export async function setPassword(db: DbOrTx, userId: string, password: string) {
  const passwordHash = await hashPassword(password);
  await db.update(users).set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, userId));
}

/** A preset alone (the planner's Imperial/Metric buttons): every kind follows it. */
export async function setUnitSystem(db: DbOrTx, actor: Actor, unitSystem: "imperial" | "metric") {
  await db.update(users).set({ unitSystem, unitChoices: {} }).where(eq(users.id, actor.id));
}

/** A preset and the kinds that depart from it (settings, PATCH /api/me). Only ever the actor's own row. */
export async function setUnitPreferences(db: DbOrTx, actor: Actor, prefs: { unitSystem: "imperial" | "metric"; unitChoices: Record<string, string> }) {
  await db.update(users).set({ unitSystem: prefs.unitSystem, unitChoices: prefs.unitChoices }).where(eq(users.id, actor.id));
}

// Admin: the accounts table.
export const listUsersQuerySchema = z.object({
  search: z.string().trim().max(100, "Search must be at most 100 characters.").optional(),
  page: z.coerce.number().int().min(1, "page must be 1 or more").default(1),
  pageSize: z.coerce.number().int().min(1).max(100, "pageSize must be at most 100").default(25),
});

export const userAccessSchema = z
  .object({
    role: z.enum(ROLES as [Role, ...Role[]], { error: `role must be one of ${ROLES.join(", ")}` }).optional(),
    disabled: z.boolean({ error: "disabled must be true or false" }).optional(),
  })
  .strict();

export async function listUsers(db: DbOrTx, actor: Actor, query: { search?: string; page?: number; pageSize?: number }) {
  assert(canManageUsers(actor));
  const q = listUsersQuerySchema.parse(query);
  const like = q.search ? `%${q.search.replace(/[%_\\]/g, (c) => "\\" + c)}%` : undefined;
  const where = like ? or(ilike(users.email, like), ilike(users.name, like)) : undefined;
  const [rows, [{ n }]] = await Promise.all([
    db
      .select({ id: users.id, email: users.email, name: users.name, role: users.role, disabled: users.disabled, createdAt: users.createdAt })
      .from(users)
      .where(where)
      .orderBy(users.email)
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(users).where(where),
  ]);
  return { rows, total: n, page: q.page, pageSize: q.pageSize };
}

export async function updateUserAccess(db: DbOrTx, actor: Actor, userId: string, input: { role?: Role; disabled?: boolean }) {
  assert(canManageUsers(actor));
  const patch = userAccessSchema.parse(input);
  if (!z.uuid().safeParse(userId).success) throw new NotFoundError("No such user.");
  if (patch.role === undefined && patch.disabled === undefined) {
    const u = await getUserById(db, userId);
    if (!u) throw new NotFoundError("No such user.");
    return u;
  }
  if (userId === actor.id && (patch.role !== undefined && patch.role !== "admin" || patch.disabled)) {
    throw new ConflictError("You cannot remove your own admin access.", { field: "role" });
  }
  // Disabling ends the account's sessions, so re-enabling it does not bring old cookies back.
  const set = patch.disabled ? { ...patch, sessionVersion: sql`${users.sessionVersion} + 1` } : patch;
  const [u] = await db.update(users).set(set).where(eq(users.id, userId)).returning();
  if (!u) throw new NotFoundError("No such user.");
  return u;
}

