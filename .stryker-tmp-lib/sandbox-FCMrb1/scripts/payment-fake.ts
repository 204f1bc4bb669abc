// @ts-nocheck
// A local stand-in for the hosted payment service, on 127.0.0.1, for `npm start` and the tests.
// It answers the few SDK calls the app makes (checkout sessions created and read, refunds), serves
// a hosted checkout page with Pay and Cancel, and POSTs `checkout.session.completed` to the app's
// webhook signed as the SDK verifies it: `Stripe-Signature: t=<unix time>,v1=<hex HMAC-SHA256 of
// "<t>.<body>" keyed with the webhook secret>`. Everything is kept in memory.
import crypto from "node:crypto";
import http from "node:http";

export type FakeSession = {
  id: string;
  object: "checkout.session";
  mode: string;
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  amount_subtotal: number;
  currency: string;
  description: string;
  customer_email: string | null;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  success_url: string;
  cancel_url: string;
  url: string;
  created: number;
  livemode: false;
};
export type FakeEvent = { id: string; body: string; deliveries: { status: number | string; at: string }[] };
export type FakeRefund = { id: string; object: "refund"; amount: number; currency: string; payment_intent: string; status: "succeeded"; metadata: Record<string, string>; created: number };

export type PaymentFake = {
  url: string;
  secretKey: string;
  webhookSecret: string;
  sessions: Map<string, FakeSession>;
  events: FakeEvent[];
  refunds: FakeRefund[];
  /** Delivers a stored event again, byte for byte with a fresh signature (a replay). */
  redeliver: (eventId: string) => Promise<number | string>;
  stop: () => Promise<void>;
};

const id = (prefix: string) => `${prefix}_fake_${crypto.randomBytes(12).toString("hex")}`;
const now = () => Math.floor(Date.now() / 1000);

/** `a[b][0][c]=1` form fields, as the SDK encodes its parameters, into a nested object. */
export function parseForm(body: string): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of new URLSearchParams(body)) {
    const path = key.split(/\[|\]\[|\]/).filter((p) => p !== "");
    let node = out as Record<string, unknown>;
    path.forEach((p, i) => {
      if (i === path.length - 1) node[p] = value;
      else node = (node[p] ??= {}) as Record<string, unknown>;
    });
  }
  return out;
}

/** The header value the SDK's webhook verification accepts for `body` at time `t`. */
export function signPayload(body: string, secret: string, t = now()): string {
  return `t=${t},v1=${crypto.createHmac("sha256", secret).update(`${t}.${body}`).digest("hex")}`;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export async function startPaymentFake(opts: { port: number; webhookUrl: string; secretKey?: string; webhookSecret?: string }): Promise<PaymentFake> {
  const secretKey = opts.secretKey ?? `sk_test_local_${crypto.randomBytes(12).toString("hex")}`;
  const webhookSecret = opts.webhookSecret ?? `whsec_local_${crypto.randomBytes(16).toString("hex")}`;
  const base = `http://127.0.0.1:${opts.port}`;
  const sessions = new Map<string, FakeSession>();
  const events: FakeEvent[] = [];
  const refunds: FakeRefund[] = [];
  const idempotent = new Map<string, string>();

  async function deliver(ev: FakeEvent): Promise<number | string> {
    let status: number | string;
    try {
      const r = await fetch(opts.webhookUrl, {
        method: "POST",
        headers: { "content-type": "application/json", "stripe-signature": signPayload(ev.body, webhookSecret) },
        body: ev.body,
        signal: AbortSignal.timeout(15_000),
      });
      status = r.status;
    } catch (err) {
      status = err instanceof Error ? err.message : String(err);
    }
    ev.deliveries.push({ status, at: new Date().toISOString() });
    return status;
  }

  function json(res: http.ServerResponse, status: number, body: unknown, headers: Record<string, string> = {}) {
    res.writeHead(status, { "content-type": "application/json", ...headers }).end(JSON.stringify(body));
  }
  const apiError = (res: http.ServerResponse, status: number, message: string, param?: string) =>
    json(res, status, { error: { type: status === 401 ? "authentication_error" : "invalid_request_error", message, ...(param ? { param } : {}) } });

  function createSession(p: Record<string, unknown>): FakeSession | string {
    const items = Object.values((p.line_items ?? {}) as Record<string, { quantity?: string; price_data?: { currency?: string; unit_amount?: string; product_data?: { name?: string } } }>);
    if (!items.length) return "line_items";
    let amount = 0;
    const currency = items[0].price_data?.currency;
    for (const it of items) {
      const unit = Number(it.price_data?.unit_amount);
      const q = Number(it.quantity ?? 1);
      if (!Number.isInteger(unit) || unit <= 0 || !Number.isInteger(q) || q <= 0) return "line_items[0][price_data][unit_amount]";
      amount += unit * q;
    }
    if (!currency || !/^[a-z]{3}$/.test(currency)) return "line_items[0][price_data][currency]";
    if (typeof p.success_url !== "string" || typeof p.cancel_url !== "string") return "success_url";
    const sid = id("cs");
    return {
      id: sid,
      object: "checkout.session",
      mode: String(p.mode ?? "payment"),
      status: "open",
      payment_status: "unpaid",
      amount_total: amount,
      amount_subtotal: amount,
      currency,
      description: items.map((i) => i.price_data?.product_data?.name ?? "").join(", "),
      customer_email: typeof p.customer_email === "string" ? p.customer_email : null,
      client_reference_id: typeof p.client_reference_id === "string" ? p.client_reference_id : null,
      metadata: (p.metadata ?? {}) as Record<string, string>,
      payment_intent: null,
      success_url: p.success_url,
      cancel_url: p.cancel_url,
      url: `${base}/pay/${sid}`,
      created: now(),
      livemode: false,
    };
  }

  const money = (s: FakeSession) => `${(s.amount_total / 100).toFixed(2)} ${s.currency.toUpperCase()}`;
  const page = (s: FakeSession) => `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Local test checkout</title>
<style>body{font-family:sans-serif;max-width:28rem;margin:3rem auto;padding:0 1rem;color:#111}button{font:inherit;padding:.6rem 1.2rem;margin-right:.5rem}</style></head>
<body><p><small>Local payment fake: no real money moves.</small></p><h1>Pay ${escapeHtml(money(s))}</h1><p>${escapeHtml(s.description)}</p>
${s.status === "open" ? `<form method="post" action="/pay/${s.id}/pay" style="display:inline"><button type="submit">Pay</button></form><form method="post" action="/pay/${s.id}/cancel" style="display:inline"><button type="submit">Cancel</button></form>` : `<p>This checkout is ${s.status}.</p>`}
</body></html>`;

  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", base);
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const body = Buffer.concat(chunks).toString("utf8");
    const parts = url.pathname.split("/").filter(Boolean);
    if (url.pathname === "/favicon.ico") return res.writeHead(204).end();

    // The hosted checkout page, for the customer's browser.
    if (parts[0] === "pay") {
      const s = sessions.get(parts[1] ?? "");
      if (!s) return res.writeHead(404, { "content-type": "text/plain" }).end("No such checkout.");
      if (req.method === "GET" && parts.length === 2) return res.writeHead(200, { "content-type": "text/html; charset=utf-8" }).end(page(s));
      if (req.method === "POST" && parts[2] === "cancel") return res.writeHead(303, { location: s.cancel_url }).end();
      if (req.method === "POST" && parts[2] === "pay") {
        if (s.status === "open") {
          s.status = "complete";
          s.payment_status = "paid";
          s.payment_intent = id("pi");
          const ev: FakeEvent = {
            id: id("evt"),
            body: JSON.stringify({ id: "", object: "event", api_version: null, created: now(), livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null }, type: "checkout.session.completed", data: { object: s } }),
            deliveries: [],
          };
          ev.body = ev.body.replace('"id":""', `"id":"${ev.id}"`);
          events.push(ev);
          await deliver(ev);
        }
        return res.writeHead(303, { location: s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) }).end();
      }
      return res.writeHead(405).end();
    }

    // The API, for the SDK: a bearer secret key, form-encoded parameters.
    if (parts[0] === "v1") {
      if (req.headers.authorization !== `Bearer ${secretKey}`) return apiError(res, 401, "Invalid API key provided.");
      const key = req.headers["idempotency-key"];
      const replay = typeof key === "string" ? idempotent.get(`${req.method} ${url.pathname} ${key}`) : undefined;
      if (replay) return res.writeHead(200, { "content-type": "application/json", "idempotent-replayed": "true" }).end(replay);
      const remember = (status: number, out: unknown) => {
        const text = JSON.stringify(out);
        if (typeof key === "string" && status === 200) idempotent.set(`${req.method} ${url.pathname} ${key}`, text);
        res.writeHead(status, { "content-type": "application/json" }).end(text);
      };
      if (req.method === "POST" && url.pathname === "/v1/checkout/sessions") {
        const s = createSession(parseForm(body));
        if (typeof s === "string") return apiError(res, 400, `Missing or invalid parameter: ${s}.`, s);
        sessions.set(s.id, s);
        return remember(200, s);
      }
      if (req.method === "GET" && parts[1] === "checkout" && parts[2] === "sessions" && parts[3]) {
        const s = sessions.get(parts[3]);
        return s ? json(res, 200, s) : apiError(res, 404, `No such checkout.session: '${parts[3]}'`, "id");
      }
      if (req.method === "POST" && url.pathname === "/v1/refunds") {
        const p = parseForm(body);
        const paid = [...sessions.values()].find((s) => s.payment_intent && s.payment_intent === p.payment_intent);
        if (!paid) return apiError(res, 404, `No such payment_intent: '${String(p.payment_intent)}'`, "payment_intent");
        const amount = p.amount === undefined ? paid.amount_total : Number(p.amount);
        const before = refunds.filter((r) => r.payment_intent === paid.payment_intent).reduce((n, r) => n + r.amount, 0);
        if (!Number.isInteger(amount) || amount <= 0 || before + amount > paid.amount_total) return apiError(res, 400, "Refund amount is greater than the unrefunded amount of the charge.", "amount");
        const r: FakeRefund = { id: id("re"), object: "refund", amount, currency: paid.currency, payment_intent: paid.payment_intent!, status: "succeeded", metadata: (p.metadata ?? {}) as Record<string, string>, created: now() };
        refunds.push(r);
        return remember(200, r);
      }
      return apiError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
    }
    res.writeHead(404).end();
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });

  return {
    url: base,
    secretKey,
    webhookSecret,
    sessions,
    events,
    refunds,
    redeliver: async (eventId) => {
      const ev = events.find((e) => e.id === eventId);
      if (!ev) throw new Error(`No such event ${eventId}`);
      return deliver(ev);
    },
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
