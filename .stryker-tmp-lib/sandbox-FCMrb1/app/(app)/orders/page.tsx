// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { listOrders } from "@/db/repo/orders";
import { toActor } from "@/db/repo/users";
import { formatPrice } from "@/lib/orders/money";
import { ORDER_STATUSES, ORDER_STATUS_LABELS, orderListQuerySchema } from "@/lib/orders/status";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";
import { DataTable } from "@/components/ui/data-table";
import { Pager } from "@/components/ui/pager";

export const metadata: Metadata = { title: "Orders" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

/** The shop's orders: a customer accepted a sheet and paid (or is paying) its deposit. */
export default async function OrdersPage({ searchParams }: Props) {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const locale = await requestLocale();
  const sp = await searchParams;
  const parsed = orderListQuerySchema.safeParse({ status: one(sp.status) ?? "", search: one(sp.search) ?? "", page: one(sp.page) ?? 1 });
  const q = parsed.success ? parsed.data : orderListQuerySchema.parse({});
  const list = await listOrders(getDb(), toActor(user), q);
  const pageHref = (p: number) => `/orders?${new URLSearchParams({ status: q.status ?? "", search: q.search ?? "", page: String(p) })}`;
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">Orders</h1>
        <p className="text-sm text-muted">Sheets a customer accepted: the deposit, the parts held for them, and where each job stands.</p>
      </div>
      <form className="flex flex-wrap items-end gap-3" role="search">
        <div className="flex flex-col gap-1">
          <label htmlFor="order-search" className="text-sm font-medium">
            Search
          </label>
          <input id="order-search" name="search" type="search" defaultValue={q.search ?? ""} placeholder="Customer, e-mail or sheet title" className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="order-status" className="text-sm font-medium">
            Status
          </label>
          <select id="order-status" name="status" defaultValue={q.status ?? ""} className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm">
            <option value="">Any</option>
            {ORDER_STATUSES.map((s) => (
              <option key={s} value={s}>
                {ORDER_STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
          Show
        </button>
      </form>
      <DataTable
        testId="orders-table"
        caption="Orders"
        rows={list.rows}
        rowKey={(o) => o.id}
        empty="No orders match."
        columns={[
          {
            label: "Customer",
            cell: (o) => (
              <>
                <Link href={`/orders/${o.id}`} className="font-medium underline">
                  {o.customerName}
                </Link>
                {o.customerEmail ? <span className="block text-xs text-muted">{o.customerEmail}</span> : null}
              </>
            ),
          },
          { label: "Sheet", cell: (o) => o.title || "–" },
          { label: "Status", cell: (o) => ORDER_STATUS_LABELS[o.status], testId: "order-status" },
          { label: "Deposit", align: "right", cellClassName: "tabular-nums", cell: (o) => formatPrice(o.deposit, o.currency) },
          { label: "Total", align: "right", cellClassName: "tabular-nums", cell: (o) => formatPrice(o.total, o.currency) },
          { label: "Updated", cell: (o) => dateText(o.updatedAt, locale) },
        ]}
      />
      <Pager label="Orders" page={list.page} pageSize={list.pageSize} total={list.total} href={pageHref} noun={["order", "orders"]} />
    </div>
  );
}
