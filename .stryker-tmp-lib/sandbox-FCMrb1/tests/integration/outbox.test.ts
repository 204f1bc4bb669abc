// @ts-nocheck
// Mail goes through an outbox table: a failed send is retried with a growing wait and marked
// failed after a few tries, a message survives a restart (a claim whose sender died is taken
// again), two senders working at once never send one message twice, and limits hold per
// recipient. Backoff numbers are the app's own (common practice, no published source).
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mockSession } from "../support/session-mock";
import { freshDatabase, type TestDb } from "../support/db";

mockSession();
const { deliverDue, queueAndTry } = await import("@/app/_lib/mail-sender");
const { backoffMs, claimDueMail, enqueueMail, getMail, MAX_ATTEMPTS } = await import("@/db/repo/outbox");
const { takeHit } = await import("@/db/repo/rate-limits");
const { mailOutbox } = await import("@/db/schema");

let t: TestDb;
beforeAll(async () => {
  t = await freshDatabase();
});
afterAll(async () => {
  await t?.drop();
});

type Sent = { to: string; subject: string };
const recorder = () => {
  const sent: Sent[] = [];
  return { sent, send: async (m: Sent) => void sent.push({ to: m.to, subject: m.subject }) };
};
const failing = async () => {
  throw new Error("SMTP said 451 try later");
};
const makeDue = (id: string) => t.db.update(mailOutbox).set({ nextAttemptAt: new Date(Date.now() - 1000) }).where(eq(mailOutbox.id, id));

describe("mail outbox", () => {
  it("a send that fails is retried later with a doubling wait, then sent once", async () => {
    const id = await enqueueMail(t.db, { to: "retry@example.com", subject: "Retry me", text: "body" });
    expect(await deliverDue(t.db, failing as never, id)).toEqual({ sent: 0, failed: 1 });
    let row = (await getMail(t.db, id))!;
    expect(row).toMatchObject({ status: "queued", attempts: 1, lastError: "SMTP said 451 try later" });
    const wait = row.nextAttemptAt.getTime() - Date.now();
    expect(wait).toBeGreaterThan(backoffMs(1) - 5_000);
    // Not due yet: nothing is tried.
    const r = recorder();
    expect(await deliverDue(t.db, r.send as never, id)).toEqual({ sent: 0, failed: 0 });
    await makeDue(id);
    await deliverDue(t.db, failing as never, id);
    row = (await getMail(t.db, id))!;
    expect(row.attempts).toBe(2);
    expect(row.nextAttemptAt.getTime() - Date.now()).toBeGreaterThan(backoffMs(2) - 5_000);
    expect(backoffMs(2)).toBe(2 * backoffMs(1));
    await makeDue(id);
    expect(await deliverDue(t.db, r.send as never, id)).toEqual({ sent: 1, failed: 0 });
    expect(r.sent).toEqual([{ to: "retry@example.com", subject: "Retry me" }]);
    expect(await getMail(t.db, id)).toMatchObject({ status: "sent", lastError: null });
    // Sent is final.
    await makeDue(id);
    expect(await deliverDue(t.db, r.send as never, id)).toEqual({ sent: 0, failed: 0 });
  });

  it(`is marked failed after ${MAX_ATTEMPTS} tries`, async () => {
    const id = await enqueueMail(t.db, { to: "never@example.com", subject: "Never", text: "body" });
    for (let i = 0; i < MAX_ATTEMPTS; i++) {
      await makeDue(id);
      await deliverDue(t.db, failing as never, id);
    }
    expect(await getMail(t.db, id)).toMatchObject({ status: "failed", attempts: MAX_ATTEMPTS });
  });

  it("a message claimed by a sender that died is sent after the claim runs out (none lost across a restart)", async () => {
    const id = await enqueueMail(t.db, { to: "restart@example.com", subject: "Restart", text: "body" });
    const [claimed] = await claimDueMail(t.db, 10, id);
    expect(claimed.status).toBe("sending");
    // The process ends here. A new one finds it still claimed, so leaves it alone…
    const r = recorder();
    expect(await deliverDue(t.db, r.send as never, id)).toEqual({ sent: 0, failed: 0 });
    // …until the claim has run out.
    await t.db.update(mailOutbox).set({ lockedUntil: new Date(Date.now() - 1000) }).where(eq(mailOutbox.id, id));
    expect(await deliverDue(t.db, r.send as never, id)).toEqual({ sent: 1, failed: 0 });
    expect(r.sent).toHaveLength(1);
  });

  it("two senders working at once send each message exactly once", async () => {
    const ids = [];
    for (let i = 0; i < 12; i++) ids.push(await enqueueMail(t.db, { to: `once-${i}@example.com`, subject: `Once ${i}`, text: "body" }));
    const r = recorder();
    const slow = async (m: Sent) => {
      await new Promise((ok) => setTimeout(ok, 20));
      await r.send(m);
    };
    await Promise.all([deliverDue(t.db, slow as never), deliverDue(t.db, slow as never), deliverDue(t.db, slow as never), deliverDue(t.db, slow as never)]);
    await Promise.all([deliverDue(t.db, slow as never), deliverDue(t.db, slow as never)]);
    const mine = r.sent.filter((m) => m.to.startsWith("once-"));
    expect(mine).toHaveLength(12);
    expect(new Set(mine.map((m) => m.to)).size).toBe(12);
  });

  it("queueAndTry reports the outcome of the first try and keeps a failed one queued", async () => {
    const row = await queueAndTry({ to: "now@example.com", subject: "Now", text: "body" }, t.db, failing as never);
    expect(row).toMatchObject({ status: "queued", attempts: 1 });
  });
});

describe("rate-limit buckets", () => {
  it("allow `max` hits per window, also when asked in parallel", async () => {
    const results = await Promise.all(Array.from({ length: 12 }, () => takeHit(t.db, "test-bucket", 3, 60_000)));
    expect(results.filter(Boolean)).toHaveLength(3);
    expect(await takeHit(t.db, "other-bucket", 3, 60_000)).toBe(true);
  });
});
