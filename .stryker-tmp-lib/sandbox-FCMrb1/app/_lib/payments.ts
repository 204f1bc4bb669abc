// @ts-nocheck
import "server-only";
import Stripe from "stripe";
import type { PaidCheckout, PaymentGateway } from "@/lib/orders/payments";
import { UpstreamError } from "@/lib/errors";
import { env } from "./env";

// The payment service through its SDK. STRIPE_API_URL points it elsewhere than the hosted
// service: the start command and the test runner point it at the local fake (scripts/payment-fake.ts).

let client: Stripe | undefined;

export function paymentsConfigured(): boolean {
  return Boolean(env().STRIPE_SECRET_KEY && env().STRIPE_WEBHOOK_SECRET);
}

function stripe(): Stripe {
  const e = env();
  if (!e.STRIPE_SECRET_KEY) throw new PaymentsUnavailable();
  if (!client) {
    const api = e.STRIPE_API_URL ? new URL(e.STRIPE_API_URL) : undefined;
    client = new Stripe(e.STRIPE_SECRET_KEY, {
      maxNetworkRetries: 1,
      timeout: 15_000,
      telemetry: false,
      ...(api ? { host: api.hostname, port: api.port || (api.protocol === "https:" ? 443 : 80), protocol: api.protocol === "https:" ? "https" : "http" } : {}),
    });
  }
  return client;
}

/** No payment settings: the checkout answers 503 with this message instead of failing obscurely. */
class PaymentsUnavailable extends UpstreamError {
  constructor() {
    super("Online payment is not set up for this shop; please call the shop to accept the sheet.", 503);
  }
}

/** An SDK failure as a 502 that says what the payment service answered; nothing was changed here. */
async function viaService<T>(what: string, call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof UpstreamError) throw err;
    const detail = err instanceof Stripe.errors.StripeError ? err.message : "no answer";
    console.error(`[payments] ${what} failed:`, err instanceof Error ? err.message : err);
    throw new UpstreamError(`The payment service could not ${what} (${detail}). Nothing was changed; please try again.`);
  }
}

export const gateway: PaymentGateway = {
  async createCheckout(req) {
    const session = await viaService("open the checkout", () => stripe().checkout.sessions.create(
      {
        mode: "payment",
        line_items: [{ quantity: 1, price_data: { currency: req.currency.toLowerCase(), unit_amount: req.amountMinor, product_data: { name: req.description } } }],
        ...(req.customerEmail ? { customer_email: req.customerEmail } : {}),
        client_reference_id: req.orderId,
        metadata: { orderId: req.orderId },
        success_url: req.successUrl,
        cancel_url: req.cancelUrl,
      },
      { idempotencyKey: `checkout-${req.orderId}-${Date.now()}` },
    ));
    if (!session.url) throw new Error("The payment service returned a checkout session without a URL.");
    return { id: session.id, url: session.url };
  },
  async refund(req) {
    const r = await viaService("refund the deposit", () =>
      stripe().refunds.create({ payment_intent: req.paymentIntentId, amount: req.amountMinor, metadata: { orderId: req.orderId } }, { idempotencyKey: `refund-${req.orderId}` }),
    );
    return { id: r.id, status: r.status ?? "pending" };
  },
};

/**
 * The event in a webhook delivery, verified with the SDK against STRIPE_WEBHOOK_SECRET (signature
 * and a 5-minute tolerance on its timestamp). Throws Stripe's signature error when forged or stale.
 */
export function verifyWebhook(payload: string, signature: string): Stripe.Event {
  const secret = env().STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new PaymentsUnavailable();
  return Stripe.webhooks.constructEvent(payload, signature, secret);
}

/** The completed checkout in an event, in our own terms. */
export function paidCheckoutOf(event: Stripe.Event): PaidCheckout | null {
  if (event.type !== "checkout.session.completed") return null;
  const s = event.data.object;
  if (s.payment_status !== "paid") return null;
  return {
    eventId: event.id,
    sessionId: s.id,
    paymentIntentId: typeof s.payment_intent === "string" ? s.payment_intent : (s.payment_intent?.id ?? null),
    amountMinor: s.amount_total,
    currency: s.currency ? s.currency.toUpperCase() : null,
  };
}
