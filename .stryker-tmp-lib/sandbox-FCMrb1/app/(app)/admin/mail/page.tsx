// @ts-nocheck
// The local mail fake's inbox, for an admin in development and demos: sign-in links, password
// resets and recommendation sheets "sent" by the app land here instead of in real mailboxes.
import type { Metadata } from "next";
import { env } from "@/app/_lib/env";
import { requirePageUser } from "@/app/_lib/session";
import { toActor } from "@/db/repo/users";
import { OutboxList } from "./outbox-list";
import { Notice } from "@/components/ui/notice";
import { dateTimeText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Mailbox" };
export const dynamic = "force-dynamic";

type Captured = { id: number; from: string; to: string[]; subject: string; text: string; date: string };

async function readInbox(base: string): Promise<{ messages: Captured[] } | { error: string }> {
  try {
    const res = await fetch(`${base.replace(/\/$/, "")}/messages`, { cache: "no-store", signal: AbortSignal.timeout(5_000) });
    if (!res.ok) return { error: `The mail fake answered HTTP ${res.status}.` };
    const list = (await res.json()) as Captured[];
    return { messages: Array.isArray(list) ? list.slice(0, 100) : [] };
  } catch {
    return { error: "The local mail fake is not answering. Is it running (npm start starts it)?" };
  }
}

export default async function MailboxPage() {
  const user = await requirePageUser(["admin"]);
  const base = env().MAIL_FAKE_URL;
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">Mailbox</h1>
        <p className="text-sm text-muted">What the app queued, sent and gave up on, newest first. Failed sends are retried with a growing wait.</p>
      </div>
      <OutboxList actor={toActor(user)} />
      <h2 className="mt-4 text-lg font-semibold">Captured by the local mail fake</h2>
      {!base ? (
        <Notice tone="info" title="No local mail fake is configured">
          MAIL_FAKE_URL is not set, so mail goes to the real SMTP server ({env().SMTP_URL.replace(/\/\/[^@/]*@/, "//")}) and
          nothing is captured here.
        </Notice>
      ) : (
        <Inbox base={base} />
      )}
    </div>
  );
}

async function Inbox({ base }: { base: string }) {
  const [inbox, locale] = await Promise.all([readInbox(base), requestLocale()]);
  if ("error" in inbox) return <Notice tone="danger">{inbox.error}</Notice>;
  if (!inbox.messages.length) return <p className="text-sm">No messages yet.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {inbox.messages.map((m) => (
        <li key={m.id} className="rounded-lg border border-line bg-panel">
          <details>
            <summary className="cursor-pointer px-3 py-2">
              <span className="font-medium">{m.subject || "(no subject)"}</span>
              <span className="ml-2 text-sm text-muted">
                to {m.to.join(", ")} · <time dateTime={m.date}>{dateTimeText(m.date, locale)}</time>
              </span>
            </summary>
            <pre className="overflow-x-auto border-t border-line px-3 py-2 text-xs whitespace-pre-wrap">{m.text}</pre>
          </details>
        </li>
      ))}
    </ul>
  );
}
