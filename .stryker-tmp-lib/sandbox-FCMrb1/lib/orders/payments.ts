// @ts-nocheck
// What the order rules need from a payment service; app/_lib/payments.ts provides it through the
// payment SDK (the hosted service, or the local fake in development and tests).

export type CheckoutRequest = {
  orderId: string;
  /** Deposit in the currency's minor units (cents). */
  amountMinor: number;
  currency: string;
  description: string;
  customerEmail: string | null;
  successUrl: string;
  cancelUrl: string;
};
export type PaymentGateway = {
  createCheckout(req: CheckoutRequest): Promise<{
    id: string;
    url: string;
  }>;
  refund(req: {
    paymentIntentId: string;
    amountMinor: number;
    orderId: string;
  }): Promise<{
    id: string;
    status: string;
  }>;
};

/** The part of a completed checkout session the webhook acts on. */
export type PaidCheckout = {
  eventId: string;
  sessionId: string;
  paymentIntentId: string | null;
  amountMinor: number | null;
  currency: string | null;
};