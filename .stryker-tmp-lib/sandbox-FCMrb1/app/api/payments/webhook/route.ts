// @ts-nocheck
import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { readBodyCapped } from "@/app/_lib/body-limit";
import { appUrl } from "@/app/_lib/mail";
import { queueMail } from "@/app/_lib/mail-sender";
import { paidCheckoutOf, verifyWebhook } from "@/app/_lib/payments";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { recordPaidCheckout } from "@/db/repo/orders";
import { getShopDetails } from "@/db/repo/shop";
import { customerReceipt, shopNotice } from "@/lib/orders/receipt";

const MAX_EVENT_BYTES = 256 * 1024;

/**
 * The payment service's notices. No session: the signature (verified by the SDK against the
 * webhook secret) is the credential. A replayed or duplicated event changes nothing.
 */
export const POST = route(async (req) => {
  const signature = req.headers.get("stripe-signature");
  if (!signature) throw new FieldError("stripe-signature", "The Stripe-Signature header is missing.");
  const payload = (await readBodyCapped(req, MAX_EVENT_BYTES)).toString("utf8");
  let event;
  try {
    event = verifyWebhook(payload, signature);
  } catch (err) {
    if (err instanceof FieldError || (err as { status?: number }).status === 503) throw err;
    return NextResponse.json({ error: "The event's signature does not verify.", fieldErrors: { "stripe-signature": ["The signature does not verify."] } }, { status: 400 });
  }
  const paid = paidCheckoutOf(event);
  if (!paid) return { received: true, outcome: "not handled" };
  const db = getDb();
  const outcome = await recordPaidCheckout(db, paid);
  if (outcome.kind === "paid") {
    // The payment is recorded whatever happens to the mail: the outbox sends (and retries) it in the background.
    const shop = await getShopDetails(db);
    const { order, reservations, snapshot } = outcome;
    const mails = [];
    if (order.customerEmail) mails.push({ to: order.customerEmail, ...customerReceipt({ order, title: snapshot.title, reservations, shopName: shop.name }) });
    if (shop.email) mails.push({ to: shop.email, ...shopNotice({ order, title: snapshot.title, reservations, orderUrl: appUrl(`/orders/${order.id}`) }) });
    for (const m of mails) await queueMail({ ...m, purpose: `order:${order.id}` }, db);
  }
  return { received: true, outcome: outcome.kind };
});
