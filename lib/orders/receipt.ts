// The two e-mails a paid deposit sends: a receipt for the customer and a notice for the shop.
import { formatPrice } from "./money";
import { ORDER_STATUS_LABELS, type OrderStatus } from "./status";

type PaidOrder = { id: string; customerName: string; currency: string; deposit: string; total: string; status: OrderStatus; paymentIntentId: string | null };
type Held = { partNumber: string; description: string; quantity: number; reserved: number; backOrdered: number };
export type OrderMail = { subject: string; text: string };

const partLine = (r: Held) => `  ${r.quantity} × ${r.description} (${r.partNumber}): ${r.backOrdered === 0 ? "reserved for you" : r.reserved === 0 ? "ordered in for you" : `${r.reserved} reserved, ${r.backOrdered} ordered in`}`;

export function customerReceipt(o: { order: PaidOrder; title: string; reservations: Held[]; shopName: string }): OrderMail {
  const price = (a: string) => formatPrice(a, o.order.currency);
  const text = [
    `Hello ${o.order.customerName},`,
    "",
    `thank you: we received your deposit of ${price(o.order.deposit)} for "${o.title}".`,
    `The quoted total is ${price(o.order.total)}; the rest is due when the work is done.`,
    "",
    ...(o.reservations.length ? ["Your parts:", ...o.reservations.map(partLine), ""] : []),
    `Payment reference: ${o.order.paymentIntentId ?? "–"}`,
    `Order: ${o.order.id}`,
    "",
    "We will be in touch to book the fitting and the dyno session.",
    "",
    o.shopName,
  ].join("\n");
  return { subject: `Deposit received: ${o.title}`, text };
}

export function shopNotice(o: { order: PaidOrder; title: string; reservations: Held[]; orderUrl: string }): OrderMail {
  const price = (a: string) => formatPrice(a, o.order.currency);
  const short = o.reservations.filter((r) => r.backOrdered > 0);
  const text = [
    `${o.order.customerName} paid a deposit of ${price(o.order.deposit)} (total ${price(o.order.total)}) for "${o.title}".`,
    `Status: ${ORDER_STATUS_LABELS[o.order.status]}.`,
    "",
    ...(o.reservations.length ? ["Parts:", ...o.reservations.map(partLine), ""] : []),
    ...(short.length ? [`To order in: ${short.map((r) => `${r.backOrdered} × ${r.partNumber}`).join(", ")}.`, ""] : []),
    `Open the order: ${o.orderUrl}`,
  ].join("\n");
  return { subject: `${short.length ? "Back-order needed" : "Deposit paid"}: ${o.order.customerName}`, text };
}
