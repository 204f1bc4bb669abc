import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { listOrders } from "@/db/repo/orders";
import { toActor } from "@/db/repo/users";
import { formatPrice } from "@/lib/orders/money";
import { ORDER_STATUSES, ORDER_STATUS_LABELS, orderListQuerySchema } from "@/lib/orders/status";
import { HeadCells } from "@/components/ui/data-table";
import { dateText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";

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
  const pages = Math.max(1, Math.ceil(list.total / list.pageSize));
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
      <div className="overflow-x-auto rounded-md border border-line bg-panel">
        <table className="w-full text-sm" data-testid="orders-table">
          <caption className="sr-only">Orders</caption>
          <thead className="border-b border-line text-left">
            <tr>
              <HeadCells cell="px-2 py-1.5 font-medium" columns={["Customer", "Sheet", "Status", { label: "Deposit", right: true }, { label: "Total", right: true }, "Updated"]} />
            </tr>
          </thead>
          <tbody>
            {list.rows.map((o) => (
              <tr key={o.id} className="border-b border-line last:border-0">
                <td className="px-2 py-1.5">
                  <Link href={`/orders/${o.id}`} className="font-medium underline">
                    {o.customerName}
                  </Link>
                  {o.customerEmail ? <span className="block text-xs text-muted">{o.customerEmail}</span> : null}
                </td>
                <td className="px-2 py-1.5">{o.title || "–"}</td>
                <td className="px-2 py-1.5" data-testid="order-status">
                  {ORDER_STATUS_LABELS[o.status]}
                </td>
                <td className="px-2 py-1.5 text-right tabular-nums">{formatPrice(o.deposit, o.currency)}</td>
                <td className="px-2 py-1.5 text-right tabular-nums">{formatPrice(o.total, o.currency)}</td>
                <td className="px-2 py-1.5">{dateText(o.updatedAt, locale)}</td>
              </tr>
            ))}
            {list.rows.length === 0 ? (
              <tr>
                <td colSpan={6} className="px-2 py-4 text-center text-muted">
                  No orders match.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      {pages > 1 ? (
        <nav aria-label="Orders pages" className="flex items-center gap-3 text-sm">
          {list.page > 1 ? <Link href={pageHref(list.page - 1)}>Previous</Link> : null}
          <span>
            Page {list.page} of {pages}
          </span>
          {list.page < pages ? <Link href={pageHref(list.page + 1)}>Next</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
