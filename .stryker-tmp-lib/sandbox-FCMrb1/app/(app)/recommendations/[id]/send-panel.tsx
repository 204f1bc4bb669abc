// @ts-nocheck
"use client";
// Sending a sheet: preview the e-mail as it will go (the PDF goes attached), send it, and once
// sent, the customer's link to copy, or to withdraw.
import { useState } from "react";
import { apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useAction } from "@/components/ui/use-action";

type Preview = { to: string | null; subject: string; text: string; attachment: string };
type Props = { id: string; status: string; customerEmail: string | null; shareUrl: string | null; version: number | null };

export function SendPanel({ id, status, customerEmail, shareUrl, version }: Props) {
  const { busy, message, run } = useAction();
  const [preview, setPreview] = useState<Preview | null>(null);
  const [copied, setCopied] = useState(false);

  const showPreview = () =>
    run("preview", async () => {
      setPreview(await apiJson<Preview>(`/api/recommendations/${id}/email-preview`));
      return "This is the e-mail as it will go.";
    });
  const send = () =>
    run("send", async () => {
      const out = await apiJson<{ pdfAttached: boolean }>(`/api/recommendations/${id}/send`, { method: "POST" });
      setPreview(null);
      return `Sent to ${customerEmail}${out.pdfAttached ? ", with the PDF attached" : " (the PDF could not be made, so the e-mail went without it)"}.`;
    });
  const revoke = () => {
    if (!window.confirm("Withdraw the customer's link? It will stop opening the sheet; send the sheet again to give them a new one.")) return;
    void run("revoke", async () => {
      await apiJson(`/api/recommendations/${id}/share-links`, { method: "DELETE" });
      return "The link was withdrawn.";
    });
  };
  async function copy() {
    if (!shareUrl) return;
    await navigator.clipboard.writeText(shareUrl).catch(() => undefined);
    setCopied(true);
    setTimeout(() => setCopied(false), 2000);
  }

  return (
    <section aria-labelledby="send-title" className="no-print flex flex-col gap-3 rounded-md border border-line bg-panel p-3">
      <h2 id="send-title" className="text-base font-semibold">
        E-mail and link
      </h2>
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant={preview ? "secondary" : "primary"} onClick={showPreview} disabled={!!busy || !customerEmail} title={customerEmail ? undefined : "Add the customer's e-mail first"}>
          {status === "draft" ? "Preview the e-mail" : "Preview and send again"}
        </Button>
      </div>
      {preview ? (
        <div className="flex flex-col gap-2 rounded-md border border-line p-3 text-sm" data-testid="email-preview">
          <p>
            <span className="text-muted">To:</span> {preview.to}
          </p>
          <p>
            <span className="text-muted">Subject:</span> <strong>{preview.subject}</strong>
          </p>
          <p className="text-muted">Attached: {preview.attachment}</p>
          <pre className="max-h-80 overflow-auto whitespace-pre-wrap rounded bg-bg p-2 font-sans text-sm">{preview.text}</pre>
          <div className="flex gap-2">
            <Button type="button" onClick={send} disabled={!!busy}>
              {busy === "send" ? "Sending…" : "Send to customer"}
            </Button>
            <Button type="button" variant="ghost" onClick={() => setPreview(null)} disabled={!!busy}>
              Close
            </Button>
          </div>
        </div>
      ) : null}
      {shareUrl ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="share-url" className="text-sm font-medium">
            The customer&apos;s link{version ? ` (version ${version}, as sent)` : ""}
          </label>
          <div className="flex flex-wrap gap-2">
            <input id="share-url" readOnly value={shareUrl} onFocus={(e) => e.target.select()} className="min-w-0 flex-1 rounded-md border border-line bg-bg px-2.5 py-1.5 font-mono text-xs" />
            <Button type="button" variant="secondary" onClick={copy}>
              {copied ? "Copied" : "Copy link"}
            </Button>
            <Button type="button" variant="danger" onClick={revoke} disabled={!!busy}>
              Withdraw the link
            </Button>
          </div>
        </div>
      ) : null}
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
    </section>
  );
}
