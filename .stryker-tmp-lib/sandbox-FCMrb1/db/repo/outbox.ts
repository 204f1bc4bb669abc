// @ts-nocheck
import { desc, eq, sql } from "drizzle-orm";
import type { DbOrTx } from "../connect";
import { mailOutbox } from "../schema";
import { assert, canManageUsers, type Actor } from "../policy";

export type OutboxAttachment = { filename: string; contentType: string; base64: string };
export type OutgoingMail = { to: string; subject: string; text: string; html?: string; attachments?: OutboxAttachment[]; purpose?: string };
export type OutboxRow = typeof mailOutbox.$inferSelect;

/** How many tries before a message is marked failed, and the wait before try n+1 (doubling, capped). */
export const MAX_ATTEMPTS = 6;
export const backoffMs = (attempts: number) => Math.min(30_000 * 2 ** (attempts - 1), 30 * 60_000);
/** A claimed message not settled within this time (its sender died) is claimed again. */
export const CLAIM_MS = 2 * 60_000;

/** Queues a message; the sender (app/_lib/mail-sender.ts) delivers it. Returns its id. */
export async function enqueueMail(db: DbOrTx, m: OutgoingMail): Promise<string> {
  const [row] = await db
    .insert(mailOutbox)
    .values({ toAddress: m.to, subject: m.subject, textBody: m.text, htmlBody: m.html ?? null, attachments: m.attachments ?? null, purpose: m.purpose ?? null })
    .returning({ id: mailOutbox.id });
  return row.id;
}

/**
 * Claims up to `limit` messages that are due (or whose earlier claim ran out), counting the try.
 * SKIP LOCKED lets several instances work through one outbox without taking the same message.
 * `onlyId` claims just that message (a request that wants its own mail tried at once).
 */
export async function claimDueMail(db: DbOrTx, limit = 10, onlyId?: string): Promise<OutboxRow[]> {
  const only = onlyId ? sql`and id = ${onlyId}` : sql``;
  const res = await db.execute(sql`
    update mail_outbox set status = 'sending', attempts = attempts + 1, locked_until = now() + ${`${CLAIM_MS} milliseconds`}::interval
    where id in (
      select id from mail_outbox
      where ((status = 'queued' and next_attempt_at <= now()) or (status = 'sending' and locked_until < now())) ${only}
      order by next_attempt_at limit ${limit} for update skip locked)
    returning id`);
  const ids = (res.rows as { id: string }[]).map((r) => r.id);
  if (!ids.length) return [];
  return db.select().from(mailOutbox).where(sql`${mailOutbox.id} in ${ids}`);
}

export async function markMailSent(db: DbOrTx, id: string) {
  await db.update(mailOutbox).set({ status: "sent", sentAt: new Date(), lockedUntil: null, lastError: null }).where(eq(mailOutbox.id, id));
}

/** After a failed try: back to the queue with a longer wait, or failed for good after MAX_ATTEMPTS. Returns the new status. */
export async function markMailFailed(db: DbOrTx, row: Pick<OutboxRow, "id" | "attempts">, error: string) {
  const gaveUp = row.attempts >= MAX_ATTEMPTS;
  await db
    .update(mailOutbox)
    .set({
      status: gaveUp ? "failed" : "queued",
      lockedUntil: null,
      lastError: error.slice(0, 500),
      nextAttemptAt: new Date(Date.now() + backoffMs(row.attempts)),
    })
    .where(eq(mailOutbox.id, row.id));
  return gaveUp ? "failed" : "queued";
}

export async function getMail(db: DbOrTx, id: string) {
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id));
  return row;
}

/** The admin's mailbox: newest first, with status, tries and the last error. */
export async function listOutbox(db: DbOrTx, actor: Actor, limit = 100) {
  assert(canManageUsers(actor));
  return db
    .select({
      id: mailOutbox.id,
      to: mailOutbox.toAddress,
      subject: mailOutbox.subject,
      text: mailOutbox.textBody,
      status: mailOutbox.status,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      nextAttemptAt: mailOutbox.nextAttemptAt,
      sentAt: mailOutbox.sentAt,
      createdAt: mailOutbox.createdAt,
    })
    .from(mailOutbox)
    .orderBy(desc(mailOutbox.createdAt))
    .limit(limit);
}
