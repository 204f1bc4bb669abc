// @ts-nocheck
"use client";
// The admin's currency and deposit rule (PUT /api/shop/terms), with per-field messages.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

type Terms = { currency: string; depositKind: "percent" | "fixed"; depositValue: string };

export function ShopTermsForm({ initial }: { initial: Terms }) {
  const router = useRouter();
  const [v, setV] = useState(initial);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    const r = await fetch("/api/shop/terms", { method: "PUT", headers: { "content-type": "application/json" }, body: JSON.stringify(v) });
    const out = await r.json().catch(() => ({}));
    setBusy(false);
    setErrors(r.ok ? {} : (out.fieldErrors ?? {}));
    setMessage(r.ok ? { tone: "ok", text: "Saved. New checkouts use these terms." } : { tone: "danger", text: out.error ?? `The server answered ${r.status}.` });
    if (r.ok) router.refresh();
  }

  const err = (k: keyof Terms) =>
    errors[k] ? (
      <p id={`${k}-error`} className="text-xs text-danger">
        {errors[k][0]}
      </p>
    ) : null;
  const input = "rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm";
  return (
    <form onSubmit={save} className="mt-8 flex flex-col gap-3" aria-labelledby="terms-title" noValidate>
      <h2 id="terms-title" className="text-lg font-semibold">
        Shop terms
      </h2>
      <p className="text-sm text-muted">The currency of every price, and the deposit a customer pays to accept a sheet.</p>
      <div className="flex flex-col gap-1">
        <label htmlFor="currency" className="text-sm font-medium">
          Currency (ISO code)
        </label>
        <input id="currency" value={v.currency} maxLength={3} onChange={(e) => setV({ ...v, currency: e.target.value })} aria-describedby={errors.currency ? "currency-error" : undefined} className={`${input} w-24 uppercase`} />
        {err("currency")}
      </div>
      <fieldset className="flex flex-col gap-1">
        <legend className="text-sm font-medium">Deposit</legend>
        <div className="flex flex-wrap items-center gap-2">
          <select aria-label="Deposit kind" value={v.depositKind} onChange={(e) => setV({ ...v, depositKind: e.target.value as Terms["depositKind"] })} className={input}>
            <option value="percent">Percentage of the total</option>
            <option value="fixed">Fixed amount</option>
          </select>
          <input aria-label={v.depositKind === "percent" ? "Deposit percentage" : "Deposit amount"} inputMode="decimal" value={v.depositValue} onChange={(e) => setV({ ...v, depositValue: e.target.value })} aria-describedby={errors.depositValue ? "depositValue-error" : undefined} className={`${input} w-32`} />
          <span className="text-sm text-muted">{v.depositKind === "percent" ? "%" : v.currency}</span>
        </div>
        {err("depositValue")}
      </fieldset>
      <div>
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : "Save shop terms"}
        </Button>
      </div>
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
    </form>
  );
}
