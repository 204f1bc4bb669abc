// @ts-nocheck
// The app's own record of what it sends: every message in the outbox with its status (queued,
// sending, sent, failed), tries and last error. Works with any SMTP server, fake or real.
import { getDb } from "@/db/client";
import type { Actor } from "@/db/policy";
import { listOutbox } from "@/db/repo/outbox";
import { dateTimeText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";
import { DataTable } from "@/components/ui/data-table";

const when = (d: Date | null, locale: string) => (d ? dateTimeText(d, locale) : "");
const TONE: Record<string, string> = { queued: "text-muted", sending: "text-muted", sent: "text-ok", failed: "text-danger" };

export async function OutboxList({ actor }: { actor: Actor }) {
  const locale = await requestLocale();
  const rows = await listOutbox(getDb(), actor);
  return (
    <DataTable
      caption="Outbox"
      rows={rows}
      rowKey={(m) => m.id}
      rowProps={() => ({ className: "align-top" })}
      empty="Nothing sent or queued yet."
      headClassName="text-muted"
      columns={[
        { label: "Status", cell: (m) => m.status, cellClassName: (m) => `font-medium ${TONE[m.status] ?? ""}` },
        { label: "To", cell: (m) => m.to },
        { label: "Subject", cell: (m) => m.subject },
        { label: "Tries", cell: (m) => m.attempts },
        { label: "Queued", cell: (m) => <time dateTime={m.createdAt.toISOString()}>{when(m.createdAt, locale)}</time> },
        {
          label: "Sent, or next try and last error",
          cell: (m) => (m.status === "sent" ? when(m.sentAt, locale) : m.status === "failed" ? `Gave up: ${m.lastError ?? ""}` : `${when(m.nextAttemptAt, locale)}${m.lastError ? ` · ${m.lastError}` : ""}`),
        },
      ]}
    />
  );
}
