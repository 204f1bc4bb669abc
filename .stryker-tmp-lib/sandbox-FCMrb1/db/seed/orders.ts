// @ts-nocheck
// One demo order: the big-inch V8 customer accepted a sheet and paid the deposit, so the shelf now
// holds their blower pulley. Made through the same rules as a real one (a sent version, a checkout,
// the payment notice), with a stand-in payment service that only this seed uses. Added only when
// there is no order yet.
import { eq } from "drizzle-orm";
import type { Db } from "../connect";
import { toMinorUnits } from "@/lib/orders/money";
import type { PaymentGateway } from "@/lib/orders/payments";
import { recordPaidCheckout, startCheckout } from "../repo/orders";
import { createRecommendation, markRecommendationSent } from "../repo/recommendations";
import { recordSentVersion } from "../repo/sheet-versions";
import { getShopTerms } from "../repo/shop";
import { orders } from "../schema";
import type { DemoCombinations } from "./combinations";
import type { DemoUsers } from "./index";
import { demoPartNumber } from "./shelf";

const SESSION = "cs_demo_order_1";

/** Records a checkout without a payment service: the demo's money never moved. */
const demoGateway: PaymentGateway = {
  createCheckout: async () => ({ id: SESSION, url: "about:blank" }),
  refund: async () => {
    throw new Error("The demo order was never paid through a payment service; there is nothing to refund.");
  },
};

export async function seedOrders(db: Db, people: DemoUsers, combos: DemoCombinations) {
  const [existing] = await db.select({ id: orders.id }).from(orders).limit(1);
  if (existing) return;
  const rec = await createRecommendation(db, people.sales, {
    combinationId: combos.bigInch,
    title: "A milder blower pulley for the tow vehicle",
    customerName: "Casey Example",
    customerEmail: "casey@example.com",
    vehicleNotes: "Tows a trailer on long grades; wants cooler charge temperatures.",
    blowerPulleyDiameter: 4.0 * 0.0254,
    targetRpm: 4000,
    parts: [
      { partNumber: demoPartNumber("blower", 4.0, 8), description: "Blower pulley", unitPrice: "0.00", quantity: 1 },
      { partNumber: null, description: "Fitting and dyno check, 2 h", unitPrice: "120.00", quantity: 2 },
    ],
  });
  const { currency } = await getShopTerms(db);
  const version = await recordSentVersion(db, people.sales, rec, currency);
  await markRecommendationSent(db, people.sales, rec.id, version.sentAt);
  const { orderId } = await startCheckout(db, demoGateway, { recommendationId: rec.id, version: version.version }, { successUrl: "about:blank", cancelUrl: "about:blank" });
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
  await recordPaidCheckout(db, { eventId: "evt_demo_order_1", sessionId: SESSION, paymentIntentId: "pi_demo_order_1", amountMinor: toMinorUnits(order.deposit, order.currency), currency: order.currency });
}
