// @ts-nocheck
// The customer's deposit in Chromium against the served app: sales e-mails a sheet with a shelf
// pulley on it; the customer opens the e-mailed link signed out, accepts, pays on the local
// payment fake's hosted checkout, and comes back to a paid order; the fake's signed webhook took
// the pulley off the shelf; the receipt arrives; staff see the order paid with the part reserved.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";
import { signedIn, type Client } from "../support/http";
import { inbox } from "../support/inbox";

const PAYMENTS = process.env.PW_PAYMENT_FAKE_URL ?? "";

type Pulley = { partNumber: string; diameter: number; stock: number; price: string };
const stockOf = async (c: Client, partNumber: string) => ((await c.json(`/api/shelf/pulleys?search=${partNumber}`)).data.rows as Pulley[]).find((p) => p.partNumber === partNumber)!.stock;

describe("orders: a customer pays the deposit through the hosted checkout", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("opens the e-mailed link, pays on the fake checkout, and the order shows paid with the pulley reserved", async () => {
    expect(PAYMENTS).not.toBe("");
    const sales = await signedIn("sales@example.com");
    const combo = (await sales.json("/api/combinations?pageSize=5")).data.items[0] as { id: string };
    const pulley = ((await sales.json("/api/shelf/pulleys?position=blower&inStock=1&pageSize=50")).data.rows as Pulley[]).find((p) => p.stock >= 1)!;
    expect(pulley).toBeDefined();
    const email = `buyer-${Date.now()}@example.com`;
    const created = await sales.json("/api/recommendations", "POST", {
      combinationId: combo.id,
      customerName: "Robin Example",
      customerEmail: email,
      blowerPulleyDiameter: pulley.diameter,
      parts: [{ partNumber: pulley.partNumber, description: "x", unitPrice: "0", quantity: 1 }],
    });
    expect(created.status).toBe(201);
    const sent = await sales.json(`/api/recommendations/${created.data.id}/send`, "POST");
    expect(sent.status).toBe(200);
    const stockBefore = await stockOf(sales, pulley.partNumber);

    const [mail] = await inbox(email, { subject: /recommendation/i });
    const link = mail.text.match(/https?:\/\/\S+\/share\/\S+/)?.[0];
    expect(link).toBeDefined();

    // On a phone (375 CSS px wide, the common small viewport; author's choice): nothing runs off
    // the side, and the parts table keeps its quantity and its price apart.
    const customer = await browser.newContext({ viewport: { width: 375, height: 812 }, isMobile: true, hasTouch: true });
    const page = await customer.newPage();
    const errors = watchErrors(page);
    await page.goto(link!);
    await page.getByTestId("recommendation-sheet").locator("canvas").waitFor({ timeout: 20_000 });
    const widths = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
    const wide = await page.evaluate(() => [...document.querySelectorAll("*")].filter((e) => e.getBoundingClientRect().right > 376).slice(0, 12).map((e) => `${e.tagName}.${e.className} ${Math.round(e.getBoundingClientRect().right)}`));
    expect(widths.scroll, wide.join("\n")).toBeLessThanOrEqual(widths.client);
    const row = page.getByTestId("parts-table").locator("tbody tr").first();
    const qty = (await row.getByTestId("part-qty").boundingBox())!;
    const each = (await row.locator("td").nth(2).boundingBox())!;
    const qtyText = await row.getByTestId("part-qty").evaluate((td) => {
      const r = document.createRange();
      r.selectNodeContents(td);
      return r.getBoundingClientRect().right;
    });
    const eachText = await row.locator("td").nth(2).evaluate((td) => {
      const r = document.createRange();
      r.selectNodeContents(td);
      return r.getBoundingClientRect().left;
    });
    expect(qty.x + qty.width).toBeLessThanOrEqual(each.x + 0.5);
    expect(eachText - qtyText).toBeGreaterThanOrEqual(8);
    expect(await row.locator("td").nth(2).textContent()).toMatch(/^\$/);
    await page.getByRole("button", { name: /Accept and pay the deposit/ }).click();
    await page.waitForURL((u) => u.href.startsWith(`${PAYMENTS}/pay/`), { timeout: 20_000 });
    await page.getByRole("button", { name: "Pay" }).click();
    await page.waitForURL((u) => u.href.startsWith(BASE_URL) && u.searchParams.get("paid") === "1", { timeout: 20_000 });
    await expect(page.getByTestId("customer-order-status").textContent()).resolves.toMatch(/deposit of \$[\d,]+\.\d{2} was received.*parts reserved/i);
    expect(await page.getByRole("button", { name: /Accept and pay/ }).count()).toBe(0);
    expect(errors).toEqual([]);
    await customer.close();

    expect(await stockOf(sales, pulley.partNumber)).toBe(stockBefore - 1);
    const [receipt] = await inbox(email, { subject: /Deposit received/ });
    expect(receipt?.text).toContain(pulley.partNumber);

    const staff = await browser.newContext();
    const orders = await signIn(staff, "sales@example.com");
    await orders.goto(`${BASE_URL}/orders?search=${encodeURIComponent(email)}`);
    await expect(orders.getByTestId("order-status").first().textContent()).resolves.toBe("Parts reserved");
    await orders.getByRole("link", { name: "Robin Example" }).click();
    await orders.getByTestId("payment-trail").waitFor();
    await expect(orders.getByTestId("payment-trail").textContent()).resolves.toContain("Deposit paid.");
    await expect(orders.getByTestId("reservations").textContent()).resolves.toContain(pulley.partNumber);
    await staff.close();
  });

  it("members may not list orders (403); signed out is a 401", async () => {
    const member = await signedIn("member@example.com");
    expect((await member.json("/api/orders")).status).toBe(403);
    const r = await fetch(`${BASE_URL}/api/orders`);
    expect(r.status).toBe(401);
  });
});
