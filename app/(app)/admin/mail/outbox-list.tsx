// The app's own record of what it sends: every message in the outbox with its status (queued,
// sending, sent, failed), tries and last error. Works with any SMTP server, fake or real.
import { getDb } from "@/db/client";
import type { Actor } from "@/db/policy";
import { listOutbox } from "@/db/repo/outbox";
import { dateTimeText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

const when = (d: Date | null, locale: string) => (d ? dateTimeText(d, locale) : "");
const TONE: Record<string, string> = { queued: "text-muted", sending: "text-muted", sent: "text-ok", failed: "text-danger" };

export async function OutboxList({ actor }: { actor: Actor }) {
  const locale = await requestLocale();
  const rows = await listOutbox(getDb(), actor);
  if (!rows.length) return <p className="text-sm">Nothing sent or queued yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" aria-label="Outbox">
        <thead>
          <tr className="text-left text-muted">
            <th className="py-1 pr-3 font-medium">Status</th>
            <th className="py-1 pr-3 font-medium">To</th>
            <th className="py-1 pr-3 font-medium">Subject</th>
            <th className="py-1 pr-3 font-medium">Tries</th>
            <th className="py-1 pr-3 font-medium">Queued</th>
            <th className="py-1 font-medium">Sent, or next try and last error</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((m) => (
            <tr key={m.id} className="border-t border-line align-top">
              <td className={`py-1 pr-3 font-medium ${TONE[m.status] ?? ""}`}>{m.status}</td>
              <td className="py-1 pr-3">{m.to}</td>
              <td className="py-1 pr-3">{m.subject}</td>
              <td className="py-1 pr-3">{m.attempts}</td>
              <td className="py-1 pr-3">
                <time dateTime={m.createdAt.toISOString()}>{when(m.createdAt, locale)}</time>
              </td>
              <td className="py-1">
                {m.status === "sent" ? when(m.sentAt, locale) : m.status === "failed" ? `Gave up: ${m.lastError ?? ""}` : `${when(m.nextAttemptAt, locale)}${m.lastError ? ` · ${m.lastError}` : ""}`}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
