// @ts-nocheck
import "server-only";
// The app's mail sender: works through the outbox table (db/repo/outbox.ts). Every instance runs
// one; claims use SKIP LOCKED, so a message is taken by one instance at a time. A message that
// fails goes back to the queue with a growing wait and is marked failed after MAX_ATTEMPTS. A
// message is marked sent only after the SMTP server accepted it, so a crash in between can send
// it again when its claim runs out (at least once, never silently lost).
import { getDb } from "@/db/client";
import type { DbOrTx } from "@/db/connect";
import { claimDueMail, enqueueMail, getMail, markMailFailed, markMailSent, type OutboxRow, type OutgoingMail } from "@/db/repo/outbox";
import { pruneHits } from "@/db/repo/rate-limits";
import { settleRecommendationMail } from "@/db/repo/recommendations";
import { sendMail } from "./mail";

type Send = typeof sendMail;

async function settle(db: DbOrTx, row: OutboxRow, outcome: { ok: true } | { ok: false; error: string; final: boolean }) {
  const [kind, id] = (row.purpose ?? "").split(":");
  if (kind === "recommendation" && id) await settleRecommendationMail(db, id, outcome.ok ? null : outcome.error);
}

/** Tries every due message once (or only `onlyId`). Returns how many went and how many failed. */
export async function deliverDue(db: DbOrTx, send: Send = sendMail, onlyId?: string) {
  let sent = 0;
  let failed = 0;
  for (const row of await claimDueMail(db, 10, onlyId)) {
    try {
      await send({
        to: row.toAddress,
        subject: row.subject,
        text: row.textBody,
        html: row.htmlBody ?? undefined,
        attachments: (row.attachments as OutgoingMail["attachments"])?.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.base64, "base64") })),
      });
    } catch (err) {
      failed++;
      const error = err instanceof Error ? err.message : String(err);
      const status = await markMailFailed(db, row, error);
      await settle(db, row, { ok: false, error, final: status === "failed" });
      continue;
    }
    sent++;
    await markMailSent(db, row.id);
    await settle(db, row, { ok: true });
  }
  return { sent, failed };
}

/** Queues a message and tries it at once; returns the message as it stands after that try. */
export async function queueAndTry(m: OutgoingMail, db: DbOrTx = getDb(), send: Send = sendMail) {
  const id = await enqueueMail(db, m);
  await deliverDue(db, send, id);
  return (await getMail(db, id))!;
}

/** Queues a message and lets the sender deliver it in the background (the caller does not wait for SMTP). */
export async function queueMail(m: OutgoingMail, db: DbOrTx = getDb()) {
  const id = await enqueueMail(db, m);
  void deliverDue(db, sendMail, id).catch((e) => console.error("[mail] send failed:", e instanceof Error ? e.message : e));
  return id;
}

const POLL_MS = Number(process.env.MAIL_POLL_MS ?? 2_000);

/** Starts the background loop (once per process): due and retried messages, and old rate-limit rows. */
export function startMailSender() {
  const g = globalThis as { __pwMailSender?: NodeJS.Timeout };
  if (g.__pwMailSender) return;
  let busy = false;
  let ticks = 0;
  g.__pwMailSender = setInterval(async () => {
    if (busy) return;
    busy = true;
    try {
      await deliverDue(getDb());
      if (ticks++ % 1800 === 0) await pruneHits(getDb());
    } catch (e) {
      // The database may be down for a while; the next tick tries again.
      console.error("[mail] sender:", e instanceof Error ? e.message : e);
    } finally {
      busy = false;
    }
  }, POLL_MS);
  g.__pwMailSender.unref();
}
