// @ts-nocheck
// Orders: a customer accepted a sent sheet and pays its deposit through the payment service.
// The payment service's webhook marks the order paid and takes the parts off the shelf in the
// same transaction (never below zero; what the shelf lacks is back-ordered). Staff follow orders,
// mark them fitted, or cancel them, which refunds the deposit and puts the parts back.
import { and, count, desc, eq, ilike, inArray, isNull, or, sql, type SQL } from "drizzle-orm";
import { z } from "zod";
import { depositFor } from "@/lib/orders/deposit";
import { toMinorUnits } from "@/lib/orders/money";
import type { PaidCheckout, PaymentGateway } from "@/lib/orders/payments";
import {
  ORDER_STATUS_LABELS,
  allocate,
  canCancel,
  canMarkFitted,
  cancelOrderSchema,
  isPaidOpen,
  markFittedSchema,
  orderListQuerySchema,
  statusAfterReservation,
  type OrderListQuery,
} from "@/lib/orders/status";
import type { DbOrTx } from "../connect";
import { ConflictError, FieldError, NotFoundError } from "@/lib/errors";
import { assert, canRefundOrders, canSeeOrders, type Actor } from "../policy";
import { blowers, datalogs, orderEvents, orderReservations, orders, paymentEvents, pulleys, recommendations, sheetVersions, type OrderReservationRow, type OrderRow } from "../schema";
import { getShopTerms } from "./shop";
import { getSentVersion, getSentVersionById, type SentGrant, type SheetSnapshot } from "./sheet-versions";

const NOT_FOUND = "No such order.";
const isUuid = (id: string) => z.uuid().safeParse(id).success;

type Trail = { kind: string; message: string; amount?: string | null; reference?: string | null; actorId?: string | null };

async function trail(db: DbOrTx, orderId: string, e: Trail) {
  await db.insert(orderEvents).values({ orderId, kind: e.kind, message: e.message, amount: e.amount ?? null, reference: e.reference ?? null, actorId: e.actorId ?? null });
}

// ---------------------------------------------------------------- the customer's checkout

/**
 * Opens (or re-opens) the order for one sent version and a checkout session for its deposit.
 * Refused for a withdrawn, superseded, declined or already paid sheet.
 */
export async function startCheckout(db: DbOrTx, gateway: PaymentGateway, grant: SentGrant, urls: { successUrl: string; cancelUrl: string }) {
  const v = await getSentVersion(db, grant);
  if (!v) throw new NotFoundError("No such sheet.");
  if (!v.latest) throw new ConflictError("A newer version of this sheet was sent; accept it from the newest e-mail.", { field: "version" });
  if (v.recommendationStatus === "declined") throw new ConflictError("This sheet was declined; ask the shop to send it again.", { field: "status" });
  const s = v.snapshot;
  const terms = await getShopTerms(db);
  const deposit = depositFor(s.total, terms.deposit, s.currency);
  if (toMinorUnits(deposit, s.currency) <= 0) throw new ConflictError("This sheet has nothing to pay: ask the shop to add the parts and send it again.", { field: "total" });

  await db
    .insert(orders)
    .values({ recommendationId: v.recommendationId, sheetVersionId: v.id, customerName: s.customerName, customerEmail: s.customerEmail, currency: s.currency, total: s.total, deposit })
    .onConflictDoNothing();
  const [order] = await db.select().from(orders).where(eq(orders.sheetVersionId, v.id));
  if (order.status !== "awaiting-payment") throw new ConflictError(`This sheet was already accepted (order ${ORDER_STATUS_LABELS[order.status].toLowerCase()}).`, { field: "status" });

  const session = await gateway.createCheckout({
    orderId: order.id,
    amountMinor: toMinorUnits(order.deposit, order.currency),
    currency: order.currency,
    description: `Deposit: ${s.title}`,
    customerEmail: order.customerEmail,
    ...urls,
  });
  await db.update(orders).set({ checkoutSessionId: session.id, updatedAt: new Date() }).where(eq(orders.id, order.id));
  await trail(db, order.id, { kind: "checkout", message: "The customer accepted the sheet and opened the deposit checkout.", amount: order.deposit, reference: session.id });
  return { orderId: order.id, url: session.url };
}

// ---------------------------------------------------------------- the payment service's webhook

type PartNeed = { partNumber: string; description: string; quantity: number };

/** Shelf lines of the sheet, one per part number (quantities added up), in a fixed order so locks never deadlock. */
function partsNeeded(s: SheetSnapshot): PartNeed[] {
  const byPart = new Map<string, PartNeed>();
  for (const p of s.parts) {
    if (!p.partNumber) continue;
    const had = byPart.get(p.partNumber);
    byPart.set(p.partNumber, { partNumber: p.partNumber, description: p.description, quantity: (had?.quantity ?? 0) + p.quantity });
  }
  return [...byPart.values()].sort((a, b) => a.partNumber.localeCompare(b.partNumber));
}

/** Takes what the shelf has of one part, locking its row; the rest is back-ordered. */
async function reservePart(tx: DbOrTx, need: PartNeed) {
  for (const table of [pulleys, blowers] as const) {
    const [row] = await tx.select({ id: table.id, stock: table.stock }).from(table).where(eq(table.partNumber, need.partNumber)).for("update");
    if (!row) continue;
    const a = allocate(need.quantity, row.stock);
    if (a.reserved > 0) await tx.update(table).set({ stock: sql`${table.stock} - ${a.reserved}`, updatedAt: new Date() }).where(eq(table.id, row.id));
    return a;
  }
  return allocate(need.quantity, 0); // no longer on the shelf at all
}

export type PaymentOutcome =
  | { kind: "duplicate" }
  | { kind: "ignored"; reason: string }
  | { kind: "paid"; order: OrderRow; reservations: OrderReservationRow[]; snapshot: SheetSnapshot };

/**
 * A completed checkout, once: the event id is stored in the same transaction, so a replayed or
 * duplicated delivery changes nothing. Marks the order paid and the sheet accepted, and takes the
 * parts off the shelf.
 */
export async function recordPaidCheckout(db: DbOrTx, paid: PaidCheckout): Promise<PaymentOutcome> {
  return db.transaction(async (tx) => {
    const fresh = await tx.insert(paymentEvents).values({ eventId: paid.eventId, type: "checkout.session.completed" }).onConflictDoNothing().returning();
    if (!fresh.length) return { kind: "duplicate" } as const;
    const [order] = await tx.select().from(orders).where(eq(orders.checkoutSessionId, paid.sessionId)).for("update");
    if (!order) return { kind: "ignored", reason: "no order has this checkout session" } as const;
    if (order.status !== "awaiting-payment") {
      await trail(tx, order.id, { kind: "note", message: `A further payment notice arrived while the order was ${ORDER_STATUS_LABELS[order.status].toLowerCase()}; nothing changed.`, reference: paid.eventId });
      return { kind: "ignored", reason: `order is ${order.status}` } as const;
    }
    const expected = toMinorUnits(order.deposit, order.currency);
    if (paid.amountMinor !== expected || (paid.currency ?? "").toUpperCase() !== order.currency) {
      await trail(tx, order.id, { kind: "mismatch", message: `The payment service reported ${paid.amountMinor} ${paid.currency} (minor units) instead of ${expected} ${order.currency}; the order was left unpaid for staff to check.`, reference: paid.eventId });
      return { kind: "ignored", reason: "amount or currency differs from the deposit" } as const;
    }
    const v = await getSentVersionById(tx, order.sheetVersionId);
    if (!v) return { kind: "ignored", reason: "the sheet version is gone" } as const;
    const now = new Date();
    await trail(tx, order.id, { kind: "paid", message: "Deposit paid.", amount: order.deposit, reference: paid.paymentIntentId ?? paid.eventId });

    const reservations: OrderReservationRow[] = [];
    for (const need of partsNeeded(v.snapshot)) {
      const a = await reservePart(tx, need);
      const [r] = await tx.insert(orderReservations).values({ orderId: order.id, ...need, ...a }).returning();
      reservations.push(r);
    }
    const short = reservations.reduce((n, r) => n + r.backOrdered, 0);
    const status = statusAfterReservation(short);
    const [updated] = await tx
      .update(orders)
      .set({ status, paidAt: now, paymentIntentId: paid.paymentIntentId, updatedAt: now })
      .where(eq(orders.id, order.id))
      .returning();
    await tx.update(recommendations).set({ status: "accepted", updatedAt: now }).where(eq(recommendations.id, order.recommendationId));
    await trail(tx, order.id, {
      kind: status,
      message: reservations.length === 0 ? "No shelf parts on the sheet." : reservations.map((r) => `${r.partNumber}: ${r.reserved} reserved${r.backOrdered ? `, ${r.backOrdered} back-ordered` : ""}`).join("; "),
    });
    return { kind: "paid", order: updated, reservations, snapshot: v.snapshot } as const;
  });
}

// ---------------------------------------------------------------- staff

export async function listOrders(db: DbOrTx, actor: Actor, query: OrderListQuery = {}) {
  assert(canSeeOrders(actor), "Orders are for the shop's sales, tuners and admin.");
  const q = orderListQuerySchema.parse(query);
  const conds: (SQL | undefined)[] = [];
  if (q.status) conds.push(eq(orders.status, q.status));
  if (q.search) {
    const like = `%${q.search.replace(/[%_\\]/g, (c) => "\\" + c)}%`;
    conds.push(or(ilike(orders.customerName, like), ilike(orders.customerEmail, like), ilike(recommendations.title, like)));
  }
  const where = and(...conds);
  const [rows, [{ n }]] = await Promise.all([
    db
      .select({
        id: orders.id,
        status: orders.status,
        customerName: orders.customerName,
        customerEmail: orders.customerEmail,
        title: recommendations.title,
        recommendationId: orders.recommendationId,
        currency: orders.currency,
        total: orders.total,
        deposit: orders.deposit,
        paidAt: orders.paidAt,
        createdAt: orders.createdAt,
        updatedAt: orders.updatedAt,
      })
      .from(orders)
      .innerJoin(recommendations, eq(recommendations.id, orders.recommendationId))
      .where(where)
      .orderBy(desc(orders.updatedAt))
      .limit(q.pageSize)
      .offset((q.page - 1) * q.pageSize),
    db.select({ n: count() }).from(orders).innerJoin(recommendations, eq(recommendations.id, orders.recommendationId)).where(where),
  ]);
  return { rows, total: n, page: q.page, pageSize: q.pageSize };
}

/** One order with its parts held and its payment trail, oldest first. */
export async function getOrder(db: DbOrTx, actor: Actor, id: string) {
  assert(canSeeOrders(actor), "Orders are for the shop's sales, tuners and admin.");
  if (!isUuid(id)) throw new NotFoundError(NOT_FOUND);
  const [row] = await db
    .select({ order: orders, title: recommendations.title, combinationId: recommendations.combinationId })
    .from(orders)
    .innerJoin(recommendations, eq(recommendations.id, orders.recommendationId))
    .where(eq(orders.id, id));
  if (!row) throw new NotFoundError(NOT_FOUND);
  const [reservations, events] = await Promise.all([
    db.select().from(orderReservations).where(eq(orderReservations.orderId, id)).orderBy(orderReservations.partNumber),
    db.select().from(orderEvents).where(eq(orderEvents.orderId, id)).orderBy(orderEvents.id),
  ]);
  return { ...row.order, title: row.title, combinationId: row.combinationId, reservations, events };
}

/** The pulley is on the car; optionally the datalog that verified it on the dyno. */
export async function markOrderFitted(db: DbOrTx, actor: Actor, id: string, input: z.input<typeof markFittedSchema>) {
  const order = await getOrder(db, actor, id);
  const { datalogId } = markFittedSchema.parse(input);
  if (!canMarkFitted(order.status)) throw new ConflictError(`An order that is ${ORDER_STATUS_LABELS[order.status].toLowerCase()} cannot be marked fitted.`, { field: "status" });
  if (datalogId) {
    const [log] = await db.select({ id: datalogs.id }).from(datalogs).where(eq(datalogs.id, datalogId));
    if (!log) throw new FieldError("datalogId", "No such datalog.");
  }
  const now = new Date();
  const [row] = await db
    .update(orders)
    .set({ status: "fitted", fittedAt: now, fittedDatalogId: datalogId, updatedAt: now })
    .where(and(eq(orders.id, id), inArray(orders.status, ["paid", "parts-reserved", "back-ordered"])))
    .returning();
  if (!row) throw new ConflictError("The order changed while you were looking at it; reload it.", { field: "status" });
  await trail(db, id, { kind: "fitted", message: datalogId ? "Fitted; verified by a datalog." : "Fitted.", reference: datalogId, actorId: actor.id });
  return row;
}

/**
 * Cancels an order. An unpaid one just closes; a paid one is refunded through the payment service
 * (admin and sales only) and its parts go back on the shelf. The refund carries an idempotency key,
 * so a double click or a retry never refunds twice.
 */
export async function cancelOrder(db: DbOrTx, actor: Actor, gateway: PaymentGateway, id: string, input: z.input<typeof cancelOrderSchema>) {
  const order = await getOrder(db, actor, id);
  const { reason } = cancelOrderSchema.parse(input);
  if (!canCancel(order.status)) throw new ConflictError(`An order that is ${ORDER_STATUS_LABELS[order.status].toLowerCase()} cannot be cancelled.`, { field: "status" });
  const now = new Date();
  const because = reason ? ` Reason: ${reason}` : "";

  if (!isPaidOpen(order.status)) {
    const [row] = await db.update(orders).set({ status: "cancelled", cancelledAt: now, updatedAt: now }).where(and(eq(orders.id, id), eq(orders.status, "awaiting-payment"))).returning();
    if (!row) throw new ConflictError("The order changed while you were looking at it (was it just paid?); reload it.", { field: "status" });
    await trail(db, id, { kind: "cancelled", message: `Cancelled before payment.${because}`, actorId: actor.id });
    return row;
  }

  assert(canRefundOrders(actor), "Only the admin and sales refund a paid order.");
  if (!order.paymentIntentId) throw new ConflictError("This order has no payment to refund; ask the admin to check the payment trail.", { field: "status" });
  const refund = await gateway.refund({ paymentIntentId: order.paymentIntentId, amountMinor: toMinorUnits(order.deposit, order.currency), orderId: id });
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(orders)
      .set({ status: "refunded", refundId: refund.id, cancelledAt: now, updatedAt: now })
      .where(and(eq(orders.id, id), inArray(orders.status, ["paid", "parts-reserved", "back-ordered"])))
      .returning();
    if (!row) return (await tx.select().from(orders).where(eq(orders.id, id)))[0]; // refunded by a concurrent click
    const held = await tx.select().from(orderReservations).where(and(eq(orderReservations.orderId, id), isNull(orderReservations.releasedAt))).orderBy(orderReservations.partNumber);
    for (const r of held) {
      if (r.reserved > 0) {
        for (const table of [pulleys, blowers] as const) {
          const put = await tx.update(table).set({ stock: sql`${table.stock} + ${r.reserved}`, updatedAt: now }).where(eq(table.partNumber, r.partNumber)).returning({ id: table.id });
          if (put.length) break;
        }
      }
      await tx.update(orderReservations).set({ releasedAt: now }).where(eq(orderReservations.id, r.id));
    }
    await trail(tx, id, { kind: "refunded", message: `Cancelled; deposit refunded (${refund.status}) and ${held.reduce((n, r) => n + r.reserved, 0)} part(s) put back on the shelf.${because}`, amount: order.deposit, reference: refund.id, actorId: actor.id });
    return row;
  });
}

/** What the customer's link shows of their order for one sent version (no trail, no other orders). */
export async function getCustomerOrder(db: DbOrTx, grant: SentGrant) {
  const [row] = await db
    .select({ status: orders.status, deposit: orders.deposit, currency: orders.currency, paidAt: orders.paidAt })
    .from(orders)
    .innerJoin(sheetVersions, eq(sheetVersions.id, orders.sheetVersionId))
    .where(and(eq(sheetVersions.recommendationId, grant.recommendationId), eq(sheetVersions.version, grant.version)));
  return row ?? null;
}
