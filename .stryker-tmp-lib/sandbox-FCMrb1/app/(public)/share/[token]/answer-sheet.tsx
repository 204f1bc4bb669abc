// @ts-nocheck
"use client";
// The customer's answer to a sheet: accept and pay the deposit (through the hosted checkout), or
// decline with an optional reason.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

const post = <T,>(url: string, json: unknown = {}) => apiJson<T>(url, { method: "POST", json });

export function AnswerSheet({ token, deposit }: { token: string; deposit: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState("");
  const [error, setError] = useState<string | null>(null);
  const base = `/api/share/${encodeURIComponent(token)}`;

  async function accept() {
    setBusy(true);
    setError(null);
    try {
      const { url } = await post<{ url: string }>(`${base}/checkout`);
      window.location.assign(url);
    } catch (e) {
      setError(e instanceof Error ? e.message : "That did not work.");
      setBusy(false);
    }
  }

  async function decline(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setError(null);
    try {
      await post(`${base}/decline`, { reason });
      router.refresh();
    } catch (err) {
      setError(err instanceof Error ? err.message : "That did not work.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="answer-title" className="no-print flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
      <h2 id="answer-title" className="text-lg font-semibold">
        Your answer
      </h2>
      <p className="text-sm">Accepting asks a deposit of {deposit}; we then hold the parts for you or order them in.</p>
      <div className="flex flex-wrap gap-2">
        <Button type="button" onClick={accept} disabled={busy}>
          {busy && !declining ? "Opening the checkout…" : `Accept and pay the deposit (${deposit})`}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setDeclining((d) => !d)} disabled={busy} aria-expanded={declining}>
          Decline
        </Button>
      </div>
      {declining ? (
        <form onSubmit={decline} className="flex flex-col gap-2">
          <label htmlFor="decline-reason" className="text-sm font-medium">
            Why not? (optional)
          </label>
          <textarea id="decline-reason" value={reason} maxLength={1000} rows={3} onChange={(e) => setReason(e.target.value)} className="rounded-md border border-line bg-bg px-2.5 py-1.5 text-sm" />
          <div>
            <Button type="submit" variant="danger" disabled={busy}>
              Decline this recommendation
            </Button>
          </div>
        </form>
      ) : null}
      {error ? <Notice tone="danger">{error}</Notice> : null}
    </section>
  );
}
