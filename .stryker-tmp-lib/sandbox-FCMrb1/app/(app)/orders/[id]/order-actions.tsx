// @ts-nocheck
"use client";
// What staff do with an order: mark it fitted (with the datalog that verified it), or cancel it,
// which refunds a paid deposit through the payment service and puts the parts back on the shelf.
import { useState } from "react";
import { apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useAction } from "@/components/ui/use-action";

type Props = { id: string; canFit: boolean; canCancel: boolean; refunds: boolean; deposit: string; datalogs: { id: string; name: string }[] };

const post = (url: string, json: unknown) => apiJson<{ status: string }>(url, { method: "POST", json });

export function OrderActions({ id, canFit, canCancel, refunds, deposit, datalogs }: Props) {
  const { busy, message, run } = useAction();
  const [datalogId, setDatalogId] = useState("");
  const [reason, setReason] = useState("");
  if (!canFit && !canCancel) return null;

  return (
    <section aria-labelledby="order-actions-title" className="flex max-w-2xl flex-col gap-3 rounded-md border border-line bg-panel p-3">
      <h2 id="order-actions-title" className="text-lg font-semibold">
        Next step
      </h2>
      {canFit ? (
        <div className="flex flex-wrap items-end gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor="fit-log" className="text-sm font-medium">
              Verified by datalog (optional)
            </label>
            <select id="fit-log" value={datalogId} onChange={(e) => setDatalogId(e.target.value)} className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm">
              <option value="">None</option>
              {datalogs.map((l) => (
                <option key={l.id} value={l.id}>
                  {l.name}
                </option>
              ))}
            </select>
          </div>
          <Button type="button" disabled={!!busy} onClick={() => run("fit", async () => (await post(`/api/orders/${id}/fitted`, { datalogId }), "Marked fitted."))}>
            Mark fitted
          </Button>
        </div>
      ) : null}
      {canCancel ? (
        <div className="flex flex-wrap items-end gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor="cancel-reason" className="text-sm font-medium">
              Reason (optional)
            </label>
            <input id="cancel-reason" value={reason} maxLength={500} onChange={(e) => setReason(e.target.value)} className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
          </div>
          <Button
            type="button"
            variant="danger"
            disabled={!!busy}
            onClick={() => {
              if (refunds && !window.confirm(`Cancel the order and refund the deposit of ${deposit}?`)) return;
              void run("cancel", async () => ((await post(`/api/orders/${id}/cancel`, { reason })).status === "refunded" ? `Cancelled; ${deposit} refunded and the parts put back on the shelf.` : "Cancelled."));
            }}
          >
            {refunds ? `Cancel and refund ${deposit}` : "Cancel the order"}
          </Button>
        </div>
      ) : null}
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
    </section>
  );
}
