"use client";
// What staff do with a sheet: send it, print it, download the PDF, edit a draft, record the answer.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

type Props = { id: string; status: "draft" | "sent" | "accepted" | "declined"; customerEmail: string | null; sentAt: string | null; lastError: string | null };

const STATUS_TEXT = { draft: "Draft", sent: "Sent", accepted: "Accepted", declined: "Declined" } as const;

export function SheetActions({ id, status, customerEmail, sentAt, lastError }: Props) {
  const router = useRouter();
  const [busy, setBusy] = useState<string | null>(null);
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);

  async function run(label: string, fn: () => Promise<string>) {
    setBusy(label);
    setMessage(null);
    try {
      setMessage({ tone: "ok", text: await fn() });
    } catch (e) {
      setMessage({ tone: "danger", text: e instanceof Error ? e.message : "That did not work." });
    } finally {
      setBusy(null);
      router.refresh();
    }
  }

  const send = () =>
    run("send", async () => {
      await apiJson(`/api/recommendations/${id}/send`, { method: "POST" });
      return `Sent to ${customerEmail}.`;
    });
  const stopLinks = () =>
    run("stop-links", async () => {
      await apiJson(`/api/recommendations/${id}/share-links`, { method: "DELETE" });
      return "The links sent so far no longer open this sheet. Send it again to give the customer a new one.";
    });
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
          {sentAt ? <span className="text-muted"> · sent {new Date(sentAt).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short" })}</span> : null}
        </span>
        <span className="flex-1" />
        <Button type="button" onClick={send} disabled={!!busy || !customerEmail} title={customerEmail ? undefined : "Add the customer's e-mail first"}>
          {busy === "send" ? "Sending…" : status === "draft" ? "Send to customer" : "Send again"}
        </Button>
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
            <Button type="button" variant="ghost" onClick={stopLinks} disabled={!!busy}>
              {busy === "stop-links" ? "Stopping…" : "Stop sent links"}
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
