// @ts-nocheck
// Orders and deposits end to end through the real route handlers, the real payment SDK and our
// local payment fake (scripts/payment-fake.ts), against a real database: the fake delivers its
// signed webhook to a tiny bridge that hands it to the webhook handler, so the signature is made
// by the fake and checked by the SDK. Expected amounts are worked by hand from the sheet's prices
// and the deposit rule; the half-up rounding of a part-cent is common practice, no published source.
import http from "node:http";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { exampleCombination } from "@/calc";
import { freePort } from "@/scripts/cluster";
import type { Actor } from "@/db/policy";
import { createCombination } from "@/db/repo/combinations";
import { createRecommendation, setRecommendationStatus, updateRecommendation } from "@/db/repo/recommendations";
import { updateShopTerms } from "@/db/repo/shop";
import { orders, pulleys, recommendations, shopSettings } from "@/db/schema";
import { signPayload, startPaymentFake, type PaymentFake } from "@/scripts/payment-fake";
import { freshDatabase, makeUser, type TestDb } from "../support/db";
import { mockSession } from "../support/session-mock";

const ctx = mockSession();
// No app is served here for Chromium to print: the sheet's PDF is a stand-in of a few bytes.
vi.doMock("@/app/_lib/pdf", () => ({ renderPdf: async () => Buffer.from("%PDF-1.7 stand-in") }));

// The webhook bridge: the fake POSTs here, the handler answers.
let webhookHandler: (req: Request) => Promise<Response> = async () => new Response("not ready", { status: 503 });
const bridge = http.createServer(async (req, res) => {
  const chunks: Buffer[] = [];
  for await (const c of req) chunks.push(c as Buffer);
  const r = await webhookHandler(new Request("http://test.local/api/payments/webhook", { method: "POST", headers: req.headers as Record<string, string>, body: Buffer.concat(chunks) }));
  res.writeHead(r.status, { "content-type": "application/json" }).end(await r.text());
});
await new Promise<void>((resolve) => bridge.listen(0, "127.0.0.1", () => resolve()));
const fake: PaymentFake = await startPaymentFake({ port: await freePort(), webhookUrl: `http://127.0.0.1:${(bridge.address() as { port: number }).port}/hook` });
process.env.STRIPE_SECRET_KEY = fake.secretKey;
process.env.STRIPE_WEBHOOK_SECRET = fake.webhookSecret;
process.env.STRIPE_API_URL = fake.url;

const webhook = await import("@/app/api/payments/webhook/route");
webhookHandler = (req) => webhook.POST(req, undefined as never);
const send = await import("@/app/api/recommendations/[id]/send/route");
const sheet = await import("@/app/api/recommendations/[id]/route");
const stopLinks = await import("@/app/api/recommendations/[id]/share-links/route");
const checkout = await import("@/app/api/share/[token]/checkout/route");
const decline = await import("@/app/api/share/[token]/decline/route");
const list = await import("@/app/api/orders/route");
const one = await import("@/app/api/orders/[id]/route");
const cancel = await import("@/app/api/orders/[id]/cancel/route");
const fitted = await import("@/app/api/orders/[id]/fitted/route");
const terms = await import("@/app/api/shop/terms/route");
const preview = await import("@/app/api/recommendations/[id]/email-preview/route");

const req = (method: string, path: string, body?: unknown) =>
  new Request(`http://test.local${path}`, { method, headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
const params = <T,>(p: T) => ({ params: Promise.resolve(p) });
const as = (a: Actor | null) => {
  ctx.userId = a?.id ?? null;
};

let t: TestDb;
let admin: Actor, sales: Actor, tuner: Actor, member: Actor, instructor: Actor;
let comboId: string;
let partSeq = 0;

/** A blower pulley on the shelf with `stock` on hand; returns its part number. */
async function shelfPulley(stock: number, price = "135.00") {
  const partNumber = `PW-TEST-${String(++partSeq).padStart(4, "0")}`;
  await t.db.insert(pulleys).values({ partNumber, position: "blower", diameter: 0.08, ribCount: 8, price, stock });
  return partNumber;
}
const stockOf = async (partNumber: string) => (await t.db.select({ s: pulleys.stock }).from(pulleys).where(eq(pulleys.partNumber, partNumber)))[0].s;

/** A sheet with the pulley and a free belt line, sent to the customer; returns its id and link token. */
async function sentSheet(partNumber: string, customer = "Dana Example") {
  const rec = await createRecommendation(t.db, sales, {
    combinationId: comboId,
    customerName: customer,
    customerEmail: "customer@example.com",
    blowerPulleyDiameter: 0.08,
    parts: [
      { partNumber, description: "x", unitPrice: "0", quantity: 1 },
      { partNumber: null, description: "Belt, 8-rib", unitPrice: "45.50", quantity: 1 },
    ],
  });
  as(sales);
  const r = await send.POST(req("POST", `/api/recommendations/${rec.id}/send`), params({ id: rec.id }));
  expect(r.status).toBe(200);
  const { shareUrl } = await r.json();
  const token = decodeURIComponent(new URL(shareUrl).pathname.split("/").pop()!);
  return { id: rec.id, token };
}

async function startCheckout(token: string) {
  as(null); // the customer has no account
  const r = await checkout.POST(req("POST", `/api/share/${token}/checkout`), params({ token: encodeURIComponent(token) }));
  return { status: r.status, body: await r.json() };
}

/** The customer presses Pay on the hosted checkout page. */
async function pay(url: string) {
  const r = await fetch(`${url}/pay`, { method: "POST", redirect: "manual" });
  expect(r.status).toBe(303);
  return r.headers.get("location");
}

/** Mail goes through the outbox in the background: wait until `n` messages have gone. */
async function mailsSent(n: number) {
  for (let i = 0; i < 100 && ctx.mails.length < n; i++) await new Promise((r) => setTimeout(r, 20));
  return ctx.mails;
}

const orderFor = async (recommendationId: string) => (await t.db.select().from(orders).where(eq(orders.recommendationId, recommendationId)))[0];

beforeAll(async () => {
  t = await freshDatabase();
  ctx.db = t.db;
  [admin, sales, tuner, member, instructor] = await Promise.all((["admin", "sales", "tuner", "member", "instructor"] as const).map((r) => makeUser(t.db, r)));
  await t.db.insert(shopSettings).values({ id: 1, name: "Test shop", email: "shop@example.com" }).onConflictDoUpdate({ target: shopSettings.id, set: { email: "shop@example.com" } });
  await updateShopTerms(t.db, admin, { currency: "USD", depositKind: "percent", depositValue: "25" });
  comboId = (await createCombination(t.db, sales, { name: "Internal: Smith small-block", spec: exampleCombination() })).id;
});
afterAll(async () => {
  await fake?.stop();
  bridge.close();
  await t?.drop();
});

describe("the customer's deposit through the payment fake", () => {
  let paid: { id: string; token: string; part: string; eventId: string; orderId: string };

  it("checkout answers the hosted page's URL for 25 % of the total, half-up to the cent", async () => {
    const part = await shelfPulley(3);
    const s = await sentSheet(part);
    const { status, body } = await startCheckout(s.token);
    expect(status).toBe(200);
    expect(body.url).toMatch(new RegExp(`^${fake.url}/pay/cs_fake_`));
    const session = fake.sessions.get(body.url.split("/").pop());
    // 135.00 + 45.50 = 180.50; 25 % = 45.125 → 45.13 half-up → 4513 cents.
    expect(session?.amount_total).toBe(4513);
    expect(session?.currency).toBe("usd");
    const order = await orderFor(s.id);
    expect(order.status).toBe("awaiting-payment");
    expect(order.deposit).toBe("45.13");

    ctx.mails.length = 0;
    const back = await pay(body.url);
    expect(back).toContain("?paid=1");
    const ev = fake.events.at(-1)!;
    expect(ev.deliveries.at(-1)?.status).toBe(200);
    paid = { ...s, part, eventId: ev.id, orderId: order.id };
  });

  it("the webhook marked the order paid, the sheet accepted, took the pulley off the shelf and mailed both sides", async () => {
    const order = await orderFor(paid.id);
    expect(order.status).toBe("parts-reserved");
    expect(order.paidAt).not.toBeNull();
    expect(order.paymentIntentId).toMatch(/^pi_fake_/);
    expect(await stockOf(paid.part)).toBe(2);
    const [rec] = await t.db.select({ status: recommendations.status }).from(recommendations).where(eq(recommendations.id, paid.id));
    expect(rec.status).toBe("accepted");
    expect((await mailsSent(2)).map((m) => m.to).sort()).toEqual(["customer@example.com", "shop@example.com"]);
    expect(ctx.mails.find((m) => m.to === "customer@example.com")?.text).toContain("$45.13");
  });

  it("a replayed event changes nothing: same order, same stock, no second mail, no second trail entry", async () => {
    as(sales);
    const before = await (await one.GET(req("GET", `/api/orders/${paid.orderId}`), params({ id: paid.orderId }))).json();
    ctx.mails.length = 0;
    expect(await fake.redeliver(paid.eventId)).toBe(200);
    expect(await fake.redeliver(paid.eventId)).toBe(200);
    const after = await (await one.GET(req("GET", `/api/orders/${paid.orderId}`), params({ id: paid.orderId }))).json();
    expect(after.events).toEqual(before.events);
    expect(after.status).toBe("parts-reserved");
    expect(await stockOf(paid.part)).toBe(2);
    await new Promise((r) => setTimeout(r, 300));
    expect(ctx.mails).toEqual([]);
  });

  it("a forged, tampered, stale or missing signature is a 400 and changes nothing", async () => {
    const part = await shelfPulley(1);
    const s = await sentSheet(part, "Forged Example");
    const { body } = await startCheckout(s.token);
    const session = fake.sessions.get(body.url.split("/").pop())!;
    const event = JSON.stringify({ id: "evt_forged_1", object: "event", type: "checkout.session.completed", data: { object: { ...session, status: "complete", payment_status: "paid", payment_intent: "pi_forged" } } });
    const hook = (sig: string | null, payload = event) =>
      webhook.POST(new Request("http://test.local/api/payments/webhook", { method: "POST", headers: sig ? { "stripe-signature": sig } : {}, body: payload }), undefined as never);
    const forged = await hook(signPayload(event, "whsec_someone_else_0123456789"));
    expect(forged.status).toBe(400);
    expect((await forged.json()).fieldErrors).toHaveProperty("stripe-signature");
    const good = signPayload(event, fake.webhookSecret);
    expect((await hook(good, event.replace("pi_forged", "pi_forgex"))).status).toBe(400);
    // The SDK's default tolerance is 300 s (source: the stripe package's Webhooks.DEFAULT_TOLERANCE).
    expect((await hook(signPayload(event, fake.webhookSecret, Math.floor(Date.now() / 1000) - 3600))).status).toBe(400);
    expect((await hook(null)).status).toBe(400);
    expect((await orderFor(s.id)).status).toBe("awaiting-payment");
    expect(await stockOf(part)).toBe(1);
  });

  it("cancelling a paid order refunds the deposit through the SDK once and puts the parts back", async () => {
    as(tuner);
    const refused = await cancel.POST(req("POST", `/api/orders/${paid.orderId}/cancel`, {}), params({ id: paid.orderId }));
    expect(refused.status).toBe(403);
    expect(fake.refunds).toHaveLength(0);
    as(sales);
    const r = await cancel.POST(req("POST", `/api/orders/${paid.orderId}/cancel`, { reason: "Customer changed plans" }), params({ id: paid.orderId }));
    expect(r.status).toBe(200);
    expect((await r.json()).status).toBe("refunded");
    expect(fake.refunds).toHaveLength(1);
    expect(fake.refunds[0].amount).toBe(4513);
    expect(await stockOf(paid.part)).toBe(3);
    const again = await cancel.POST(req("POST", `/api/orders/${paid.orderId}/cancel`, {}), params({ id: paid.orderId }));
    expect(again.status).toBe(409);
    expect(fake.refunds).toHaveLength(1);
    const detail = await (await one.GET(req("GET", `/api/orders/${paid.orderId}`), params({ id: paid.orderId }))).json();
    expect(detail.events.map((e: { kind: string }) => e.kind)).toEqual(["checkout", "paid", "parts-reserved", "refunded"]);
    expect(detail.reservations[0].releasedAt).not.toBeNull();
  });
});

describe("two customers race for the last pulley", () => {
  it("one order gets it reserved, the other is back-ordered, and the shelf never goes below zero", async () => {
    const part = await shelfPulley(1);
    const a = await sentSheet(part, "Racer One");
    const b = await sentSheet(part, "Racer Two");
    const [ca, cb] = await Promise.all([startCheckout(a.token), startCheckout(b.token)]);
    await Promise.all([pay(ca.body.url), pay(cb.body.url)]);
    const statuses = [(await orderFor(a.id)).status, (await orderFor(b.id)).status].sort();
    expect(statuses).toEqual(["back-ordered", "parts-reserved"]);
    expect(await stockOf(part)).toBe(0);
  });
});

describe("the sheet as sent", () => {
  it("the e-mail can be previewed before it goes, and goes with the sheet's PDF attached", async () => {
    const part = await shelfPulley(5);
    const rec = await createRecommendation(t.db, sales, { combinationId: comboId, title: "Pulley for the blue wagon", customerName: "Preview Example", customerEmail: "preview@example.com", blowerPulleyDiameter: 0.08, parts: [{ partNumber: part, description: "x", unitPrice: "0", quantity: 2 }] });
    as(member);
    expect((await preview.GET(req("GET", `/api/recommendations/${rec.id}/email-preview`), params({ id: rec.id }))).status).toBe(403);
    as(sales);
    const p = await (await preview.GET(req("GET", `/api/recommendations/${rec.id}/email-preview`), params({ id: rec.id }))).json();
    expect(p.to).toBe("preview@example.com");
    expect(p.subject).toContain("Pulley for the blue wagon");
    expect(p.text).toContain("Total: $270.00");
    expect(p.text).not.toContain("Internal: Smith");
    ctx.mails.length = 0;
    const r = await (await send.POST(req("POST", `/api/recommendations/${rec.id}/send`), params({ id: rec.id }))).json();
    expect(r.pdfAttached).toBe(true);
    expect(ctx.mails[0].subject).toBe(p.subject);
    expect(ctx.mails[0].attachments).toEqual([{ filename: "recommendation-preview-example.pdf" }]);
  });

  it("edits after sending never change the sent version; sending again makes a new one and the old link cannot be paid", async () => {
    const part = await shelfPulley(5);
    const s = await sentSheet(part, "Original Name");
    await setRecommendationStatus(t.db, sales, s.id, { status: "draft" });
    await updateRecommendation(t.db, sales, s.id, { customerName: "Edited Name", customerEmail: "customer@example.com", blowerPulleyDiameter: 0.07, parts: [] });
    const { getSentVersion } = await import("@/db/repo/sheet-versions");
    const { verifyShareToken } = await import("@/app/_lib/share-link");
    const v = verifyShareToken(s.token);
    if (!v.ok) throw new Error("the link should verify");
    const sent = await getSentVersion(t.db, { recommendationId: v.recommendationId, version: v.version });
    expect(sent?.snapshot.customerName).toBe("Original Name");
    expect(sent?.snapshot.total).toBe("180.50");
    expect(sent?.snapshot.blowerPulleyDiameter).toBe(0.08);
    expect(sent?.version).toBe(1);

    as(sales);
    const r2 = await send.POST(req("POST", `/api/recommendations/${s.id}/send`), params({ id: s.id }));
    expect((await r2.json()).version).toBe(2);
    expect((await getSentVersion(t.db, { recommendationId: v.recommendationId, version: v.version }))?.latest).toBe(false);
    expect((await startCheckout(s.token)).status).toBe(409);
    as(sales);
    const shown = await (await sheet.GET(req("GET", `/api/recommendations/${s.id}`), params({ id: s.id }))).json();
    expect(shown.shareUrl).toMatch(/^http:\/\/127\.0\.0\.1:1\/share\//);
    expect(shown.shareUrl).not.toContain(encodeURIComponent(s.token));
  });

  it("a revoked link opens nothing and cannot be paid; the customer may decline with a reason", async () => {
    const part = await shelfPulley(5);
    const s = await sentSheet(part, "Revoke Example");
    as(member);
    expect((await stopLinks.DELETE(req("DELETE", `/api/recommendations/${s.id}/share-links`), params({ id: s.id }))).status).toBe(403);
    as(sales);
    expect((await stopLinks.DELETE(req("DELETE", `/api/recommendations/${s.id}/share-links`), params({ id: s.id }))).status).toBe(200);
    const { getSentVersion } = await import("@/db/repo/sheet-versions");
    await expect(getSentVersion(t.db, { recommendationId: s.id, version: 1 })).rejects.toThrow(/withdrawn/);
    expect((await startCheckout(s.token)).status).toBe(404);

    const d = await sentSheet(part, "Decline Example");
    as(null);
    const r = await decline.POST(req("POST", `/api/share/${d.token}/decline`, { reason: "Too much boost for my fuel" }), params({ token: d.token }));
    expect(r.status).toBe(200);
    const [rec] = await t.db.select({ status: recommendations.status }).from(recommendations).where(eq(recommendations.id, d.id));
    expect(rec.status).toBe("declined");
    expect((await startCheckout(d.token)).status).toBe(409);
    const bad = await decline.POST(req("POST", `/api/share/${d.token}/decline`, { reason: 42 }), params({ token: d.token }));
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors).toHaveProperty("reason");
    expect((await startCheckout("not-a-token")).status).toBe(403);
  });
});

describe("role rules for orders and refunds", () => {
  it("orders are for staff: members and instructors get 403, signed out 401", async () => {
    for (const [who, status] of [[null, 401], [member, 403], [instructor, 403], [tuner, 200], [sales, 200], [admin, 200]] as const) {
      as(who);
      const r = await list.GET(req("GET", "/api/orders"), undefined as never);
      expect(r.status, who?.role ?? "signed out").toBe(status);
    }
    as(admin);
    const r = await list.GET(req("GET", "/api/orders?status=refunded"), undefined as never);
    const body = await r.json();
    expect(body.rows.length).toBeGreaterThan(0);
    expect(body.rows.every((o: { status: string }) => o.status === "refunded")).toBe(true);
    expect((await list.GET(req("GET", "/api/orders?status=lost"), undefined as never)).status).toBe(400);
  });

  it("an unpaid order any staff may cancel (no refund); fitted needs a paid order; only the admin sets the deposit rule", async () => {
    const part = await shelfPulley(2);
    const s = await sentSheet(part, "Unpaid Example");
    await startCheckout(s.token);
    const order = await orderFor(s.id);
    as(tuner);
    expect((await fitted.POST(req("POST", `/api/orders/${order.id}/fitted`, {}), params({ id: order.id }))).status).toBe(409);
    expect((await (await cancel.POST(req("POST", `/api/orders/${order.id}/cancel`, {}), params({ id: order.id }))).json()).status).toBe("cancelled");
    as(member);
    expect((await one.GET(req("GET", `/api/orders/${order.id}`), params({ id: order.id }))).status).toBe(403);

    as(sales);
    expect((await terms.PUT(req("PUT", "/api/shop/terms", { currency: "EUR", depositKind: "fixed", depositValue: "100" }), undefined as never)).status).toBe(403);
    as(admin);
    const bad = await terms.PUT(req("PUT", "/api/shop/terms", { currency: "XYZ", depositKind: "percent", depositValue: "150" }), undefined as never);
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).fieldErrors).sort()).toEqual(["currency"]);
    const bad2 = await terms.PUT(req("PUT", "/api/shop/terms", { currency: "EUR", depositKind: "percent", depositValue: "150" }), undefined as never);
    expect(Object.keys((await bad2.json()).fieldErrors)).toEqual(["depositValue"]);
    expect((await terms.PUT(req("PUT", "/api/shop/terms", { currency: "USD", depositKind: "percent", depositValue: "25" }), undefined as never)).status).toBe(200);
  });

  it("marking a paid order fitted links the verifying datalog; an unknown datalog is a 400 naming it", async () => {
    const part = await shelfPulley(2);
    const s = await sentSheet(part, "Fitted Example");
    const { body } = await startCheckout(s.token);
    await pay(body.url);
    const order = await orderFor(s.id);
    as(tuner);
    const bad = await fitted.POST(req("POST", `/api/orders/${order.id}/fitted`, { datalogId: "7d2e1f0a-3b4c-4d5e-8f60-718293a4b5c6" }), params({ id: order.id }));
    expect(bad.status).toBe(400);
    expect((await bad.json()).fieldErrors).toHaveProperty("datalogId");
    const ok = await fitted.POST(req("POST", `/api/orders/${order.id}/fitted`, {}), params({ id: order.id }));
    expect((await ok.json()).status).toBe("fitted");
  });
});
