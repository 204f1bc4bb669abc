// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { canRefundOrders } from "@/db/policy";
import { listDatalogs } from "@/db/repo/datalogs";
import { getOrder } from "@/db/repo/orders";
import { toActor } from "@/db/repo/users";
import { formatPrice } from "@/lib/orders/money";
import { ORDER_STATUS_LABELS, canCancel, canMarkFitted, isPaidOpen } from "@/lib/orders/status";
import { OrderActions } from "./order-actions";
import { dateText, dateTimeText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Order" };

type Props = { params: Promise<{ id: string }> };



export default async function OrderPage({ params }: Props) {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const locale = await requestLocale();
  const actor = toActor(user);
  const { id } = await params;
  const db = getDb();
  const order = await getOrder(db, actor, id).catch((e) => {
    if (e instanceof NotFoundError) notFound();
    throw e;
  });
  const logs = canMarkFitted(order.status) ? await listDatalogs(db, actor, { combinationId: order.combinationId }) : [];
  const price = (a: string) => formatPrice(a, order.currency);
  return (
    <div className="flex flex-col gap-5">
      <div>
        <Link href="/orders" className="text-sm underline">
          All orders
        </Link>
        <h1 className="text-2xl font-semibold">{order.customerName}</h1>
        <p className="text-sm text-muted">
          {order.title || "Recommendation"} ·{" "}
          <Link href={`/recommendations/${order.recommendationId}`} className="underline">
            the sheet
          </Link>
        </p>
      </div>
      <dl className="grid max-w-xl grid-cols-[10rem_1fr] gap-y-1 text-sm">
        <dt className="text-muted">Status</dt>
        <dd data-testid="order-status">
          <strong>{ORDER_STATUS_LABELS[order.status]}</strong>
        </dd>
        <dt className="text-muted">Deposit</dt>
        <dd className="tabular-nums">
          {price(order.deposit)} {order.paidAt ? <span className="text-muted">paid {dateTimeText(order.paidAt, locale)}</span> : <span className="text-muted">not paid</span>}
        </dd>
        <dt className="text-muted">Quoted total</dt>
        <dd className="tabular-nums">{price(order.total)}</dd>
        <dt className="text-muted">Customer e-mail</dt>
        <dd>{order.customerEmail ?? "–"}</dd>
        {order.fittedAt ? (
          <>
            <dt className="text-muted">Fitted</dt>
            <dd>
              {dateTimeText(order.fittedAt, locale)}
              {order.fittedDatalogId ? (
                <>
                  {" · "}
                  <Link href={`/datalogs/${order.fittedDatalogId}`} className="underline">
                    verifying datalog
                  </Link>
                </>
              ) : null}
            </dd>
          </>
        ) : null}
      </dl>

      <section aria-labelledby="parts-title" className="flex flex-col gap-2">
        <h2 id="parts-title" className="text-lg font-semibold">
          Parts held
        </h2>
        {order.reservations.length === 0 ? (
          <p className="text-sm text-muted">{order.paidAt ? "No shelf parts on this sheet." : "Parts are taken off the shelf when the deposit is paid."}</p>
        ) : (
          <table className="w-full max-w-2xl text-sm" data-testid="reservations">
            <thead className="border-b border-line text-left">
              <tr>
                <th scope="col" className="py-1 font-medium">Part</th>
                <th scope="col" className="py-1 text-right font-medium">Qty</th>
                <th scope="col" className="py-1 text-right font-medium">Reserved</th>
                <th scope="col" className="py-1 text-right font-medium">Back-ordered</th>
              </tr>
            </thead>
            <tbody>
              {order.reservations.map((r) => (
                <tr key={r.id} className="border-b border-line last:border-0">
                  <td className="py-1">
                    {r.description} <span className="text-xs text-muted">{r.partNumber}</span>
                    {r.releasedAt ? <span className="text-xs text-muted"> · back on the shelf</span> : null}
                  </td>
                  <td className="py-1 text-right tabular-nums">{r.quantity}</td>
                  <td className="py-1 text-right tabular-nums">{r.reserved}</td>
                  <td className="py-1 text-right tabular-nums">{r.backOrdered}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>

      <section aria-labelledby="trail-title" className="flex flex-col gap-2">
        <h2 id="trail-title" className="text-lg font-semibold">
          Payment trail
        </h2>
        <ol className="flex max-w-2xl flex-col gap-1 text-sm" data-testid="payment-trail">
          {order.events.map((e) => (
            <li key={e.id} className="border-l-2 border-line pl-3">
              <span className="text-muted">{dateTimeText(e.createdAt, locale)}</span> · {e.message}
              {e.amount ? <span className="tabular-nums"> ({price(e.amount)})</span> : null}
              {e.reference ? <span className="block text-xs text-muted">ref. {e.reference}</span> : null}
            </li>
          ))}
        </ol>
      </section>

      <OrderActions
        id={order.id}
        canFit={canMarkFitted(order.status)}
        canCancel={canCancel(order.status) && (!isPaidOpen(order.status) || canRefundOrders(actor))}
        refunds={isPaidOpen(order.status)}
        deposit={price(order.deposit)}
        datalogs={logs.map((l) => ({ id: l.id, name: `${l.name} (rev. ${l.revision}, ${dateText(l.createdAt, locale)})` }))}
      />
    </div>
  );
}
