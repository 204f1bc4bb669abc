// @ts-nocheck
"use client";
// What staff do with a sheet: print it, download the PDF, edit a draft, record the answer by hand.
// Sending (with its preview) and the customer's link are in the sheet page's link panel.
import Link from "next/link";
import { apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useAction } from "@/components/ui/use-action";
import { useDates } from "@/components/locale";

type Props = { id: string; status: "draft" | "sent" | "accepted" | "declined"; customerEmail: string | null; sentAt: string | null; lastError: string | null };

const STATUS_TEXT = { draft: "Draft", sent: "Sent", accepted: "Accepted", declined: "Declined" } as const;

export function SheetActions({ id, status, customerEmail, sentAt, lastError }: Props) {
  const dates = useDates();
  const { busy, message, run } = useAction();
  const setStatus = (next: "draft" | "accepted" | "declined") =>
    run(next, async () => {
      await apiJson(`/api/recommendations/${id}/status`, { method: "POST", json: { status: next } });
      return `Marked ${STATUS_TEXT[next].toLowerCase()}.`;
    });

  return (
    <div className="no-print flex flex-col gap-3 rounded-md border border-line bg-panel p-3">
      <div className="flex flex-wrap items-center gap-2">
        <span className="text-sm">
          Status: <strong data-testid="sheet-status">{STATUS_TEXT[status]}</strong>
          {sentAt ? <span className="text-muted"> · sent {dates.dateTime(sentAt)}</span> : null}
        </span>
        <span className="flex-1" />
        <Link href={`/recommendations/${id}/print`} className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
          Print
        </Link>
        <a href={`/api/recommendations/${id}/pdf`} className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg" download>
          Download PDF
        </a>
        {status === "draft" ? (
          <Link href={`/recommendations/${id}/edit`} className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
            Edit
          </Link>
        ) : null}
        {status !== "draft" ? (
          <>
            <Button type="button" variant="secondary" onClick={() => setStatus("accepted")} disabled={!!busy || status === "accepted"}>
              Mark accepted
            </Button>
            <Button type="button" variant="secondary" onClick={() => setStatus("declined")} disabled={!!busy || status === "declined"}>
              Mark declined
            </Button>
            <Button type="button" variant="ghost" onClick={() => setStatus("draft")} disabled={!!busy}>
              Back to draft
            </Button>
          </>
        ) : null}
      </div>
      {!customerEmail ? <p className="text-xs text-muted">Add the customer&apos;s e-mail (Edit) to send the sheet.</p> : null}
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {lastError && message?.tone !== "danger" ? (
        <Notice tone="danger" title="The last send failed">
          {lastError}
        </Notice>
      ) : null}
    </div>
  );
}
