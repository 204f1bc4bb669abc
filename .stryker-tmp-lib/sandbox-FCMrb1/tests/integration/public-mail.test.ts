// @ts-nocheck
// Reset and sign-in-link requests: the same words and (near enough) the same time whether or not
// the address has an account, the mail is queued rather than sent while the visitor waits, and a
// recipient gets at most 3 such e-mails an hour. The SMTP stand-in below takes 250 ms, as a real
// server across a network can; the app's answer must not wait for it. Bounds are the author's.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { mockSession } from "../support/session-mock";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const ctx = mockSession();
const sent: string[] = [];
vi.doMock("@/app/_lib/mail", () => ({
  sendMail: async (m: { to: string }) => {
    await new Promise((r) => setTimeout(r, 250));
    sent.push(m.to);
    return {};
  },
  appUrl: (p: string) => `http://127.0.0.1:1${p}`,
}));
const { requestPasswordReset, requestSignInLink, signUp } = await import("@/app/(public)/actions");
const { mailOutbox, rateLimitHits } = await import("@/db/schema");
const { like } = await import("drizzle-orm");

let t: TestDb;
beforeAll(async () => {
  t = await freshDatabase();
  ctx.db = t.db;
});
afterAll(async () => {
  // Let background sends finish before the database goes.
  await new Promise((r) => setTimeout(r, 600));
  await t?.drop();
});

const form = (email: string) => {
  const f = new FormData();
  f.set("email", email);
  return f;
};
async function timed<T>(fn: () => Promise<T>) {
  const t0 = performance.now();
  const out = await fn();
  return { out, ms: performance.now() - t0 };
}
const settle = () => new Promise((r) => setTimeout(r, 400));
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

// Every request here comes from one (unknown) client address, whose own limit (20 an hour) is not
// under test: start each test with it empty.
beforeEach(async () => {
  await t.db.delete(rateLimitHits).where(like(rateLimitHits.bucket, "public-mail-from:%"));
});

describe.each([
  ["password reset", requestPasswordReset],
  ["sign-in link", requestSignInLink],
])("%s request", (_label, action) => {
  it("answers the same words, without waiting for SMTP, for an existing and an unknown address", async () => {
    const known: number[] = [];
    const unknown: number[] = [];
    let words: string | undefined;
    for (let i = 0; i < 5; i++) {
      const u = await makeUser(t.db, "member");
      const a = await timed(() => action(undefined, form(u.email)));
      await settle(); // the queued work of the known address must not slow the next measurement
      const b = await timed(() => action(undefined, form(`nobody-${i}-${Date.now()}@example.com`)));
      await settle();
      expect(a.out).toEqual(b.out);
      words ??= (a.out as { message: string }).message;
      expect((a.out as { message: string }).message).toBe(words);
      known.push(a.ms);
      unknown.push(b.ms);
    }
    expect(median(known)).toBeLessThan(200); // the 250 ms SMTP stand-in is not awaited
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(60);
  });

  it("queues at most 3 e-mails an hour for one recipient; the answer stays the same", async () => {
    const u = await makeUser(t.db, "member");
    const answers = [];
    for (let i = 0; i < 6; i++) answers.push(await action(undefined, form(u.email)));
    expect(new Set(answers.map((a) => JSON.stringify(a))).size).toBe(1);
    // The mail is queued after the answer: give it a moment.
    const queued = async () => (await t.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, u.email))).length;
    await expect.poll(queued, { timeout: 5_000 }).toBe(3);
    await new Promise((r) => setTimeout(r, 300));
    expect(await queued()).toBe(3);
  });
});

describe("sign-up", () => {
  const signUpForm = (email: string) => {
    const f = new FormData();
    f.set("name", "Pat Newcomer");
    f.set("email", email);
    f.set("password", "a-long-enough-password");
    return f;
  };

  it("answers a taken address as it answers a new one, and tells the owner by e-mail instead", async () => {
    const owner = await makeUser(t.db, "member");
    const fresh = `fresh-${Date.now()}@example.com`;
    const forNew = await signUp(undefined, signUpForm(fresh));
    const forTaken = await signUp(undefined, signUpForm(owner.email));
    expect(forTaken).toEqual(forNew);
    expect(forNew.ok).toBe(true);
    await expect.poll(async () => (await t.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, owner.email))).map((m) => m.subject), { timeout: 5_000 }).toEqual([
      "Someone tried to make a Pulleywright account with your address",
    ]);
  });

  it("is limited to 10 accounts an hour from one client address", async () => {
    await t.db.delete(rateLimitHits).where(like(rateLimitHits.bucket, "sign-up-from:%"));
    const results = [];
    for (let i = 0; i < 11; i++) results.push(await signUp(undefined, signUpForm(`burst-${i}-${Date.now()}@example.com`)));
    expect(results.slice(0, 10).every((r) => r.ok)).toBe(true);
    expect(results[10]).toMatchObject({ ok: false, status: 400 });
  });
});
