// @ts-nocheck
// The shop in Chromium against the served app: sales turns the demo work truck into a
// recommendation sheet, prints it to a one-page PDF, e-mails it, and the customer opens the
// link signed out; the admin edits a shelf price; a member may not write the shelf.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";
import { signedIn } from "../support/http";
import { inbox } from "../support/inbox";

/** Pages in a PDF: the page tree's /Count (ISO 32000-1 §7.7.3.2), cross-checked by the /Type /Page objects. */
function pdfPages(pdf: Buffer) {
  const text = pdf.toString("latin1");
  const count = Math.max(0, ...[...text.matchAll(/\/Type\s*\/Pages\b[^>]*?\/Count\s+(\d+)/g)].map((m) => Number(m[1])));
  const objects = [...text.matchAll(/\/Type\s*\/Page(?![a-zA-Z])/g)].length;
  return { count, objects };
}

/** "1,234.50" → 123450 (integer cents, the reference for money). */
const cents = (s: string) => {
  const [w, f = "0"] = s.replace(/,/g, "").trim().split(".");
  return Number(w) * 100 + Number((f + "0").slice(0, 2));
};
const money = (c: number) => `${Math.floor(c / 100).toLocaleString("en-US")}.${String(c % 100).padStart(2, "0")}`;

async function sheetReady(page: Page) {
  await page.getByTestId("recommendation-sheet").locator("canvas").waitFor({ timeout: 20_000 });
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
}

describe("shop: recommendation sheet and parts shelf", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("sales makes a sheet from the demo work truck, prints one PDF page, e-mails it, and the link opens signed out", async () => {
    const context = await browser.newContext();
    const page = await signIn(context, "sales@example.com");
    const errors = watchErrors(page);
    const email = `e2e-${Date.now()}@example.com`;

    await page.goto(`${BASE_URL}/recommendations/new`);
    // The searchable picker: find the combination by a word of its name, then open it.
    await page.getByLabel("Find the combination").fill("Work truck");
    await page.getByRole("button", { name: "Search" }).click();
    await page.waitForURL(/search=Work/);
    await page.getByTestId("combination-choices").getByRole("link", { name: /^Work truck V6 4\.3 L, Roots/ }).click();
    await page.waitForURL(/\/recommendations\/new\?combination=/);
    // It has two revisions; the newest is preselected.
    await expect(page.getByLabel("Revision to use").inputValue()).resolves.toBe("2");

    // The ladder (the planner's own) lists the shelf's blower pulleys; use 2.90 in from it (3.00 in is already the current row).
    await page.getByRole("button", { name: "Use the 2.90 in pulley" }).click();
    await expect(page.getByLabel("Recommended blower pulley").inputValue()).resolves.toBe(String(Number((2.9 * 0.0254).toFixed(6))));
    // The finder answers for a target boost.
    await page.getByLabel("Target boost").fill("8");
    await page.getByRole("button", { name: "Find pulley" }).click();
    await expect(page.getByTestId("finder-result").textContent()).resolves.toMatch(/For 8\.0 psi at [\d,]+ rpm the blower pulley is [\d.]+ in/);

    // A new customer's fields start empty: nothing of the combination's own customer carries over.
    await expect(page.getByLabel("Customer name").inputValue()).resolves.toBe("");
    await page.getByLabel("Customer name").fill("Riley Example");
    await page.getByLabel("Title on the sheet").fill("A smaller pulley for your work truck");
    await page.getByLabel(/Boost quoted at/).fill("4500");
    await page.getByLabel("Customer e-mail").fill(email);
    await page.getByLabel("Vehicle notes").fill("Street car <on pump fuel> & weekends");
    await page.getByRole("button", { name: "Add this pulley to the parts" }).click();
    await page.getByRole("button", { name: "Add a free line" }).click();
    await page.getByLabel("Description of line 2").fill("Belt, 8-rib");
    await page.getByLabel("Price each, line 2").fill("19.99");
    await page.getByLabel("Quantity, line 2").fill("3");
    const pulleyPrice = await page.getByLabel("Price each, line 1").inputValue();
    // source: integer-cents arithmetic, the reference for money.
    const expectedTotal = money(cents(pulleyPrice) + 3 * 1999);
    await expect(page.getByTestId("form-total").textContent()).resolves.toBe(`$${expectedTotal}`);
    await page.getByRole("button", { name: "Save draft sheet" }).click();
    await page.waitForURL(/\/recommendations\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    const id = page.url().split("/").pop()!;

    await sheetReady(page);
    await expect(page.getByTestId("recommended-pulley").textContent()).resolves.toBe("2.90 in");
    // The shop's currency (USD in the demo) is shown with its symbol.
    await expect(page.getByTestId("sheet-total").textContent()).resolves.toBe(`$${expectedTotal}`);
    await expect(page.getByTestId("sheet-status").textContent()).resolves.toBe("Draft");
    await expect(page.getByTestId("cautions-panel").isVisible()).resolves.toBe(true);
    expect(await page.getByText("Street car <on pump fuel> & weekends").count()).toBe(1);

    // Print to PDF through the browser: one page on Letter and on A4.
    const print = await context.newPage();
    await print.goto(`${BASE_URL}/recommendations/${id}/print`);
    await sheetReady(print);
    for (const format of ["Letter", "A4"] as const) {
      const pdf = await print.pdf({ preferCSSPageSize: true, format, printBackground: true });
      expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
      expect(pdfPages(pdf), format).toEqual({ count: 1, objects: 1 });
    }
    await print.close();

    // The server's PDF: the same sheet printed by Chromium on the server, as an attachment.
    const res = await context.request.get(`${BASE_URL}/api/recommendations/${id}/pdf`, { timeout: 60_000 });
    expect(res.status()).toBe(200);
    expect(res.headers()["content-type"]).toBe("application/pdf");
    expect(res.headers()["content-disposition"]).toMatch(/^attachment; filename="recommendation-riley-example\.pdf"$/);
    expect(pdfPages(await res.body())).toEqual({ count: 1, objects: 1 });

    // E-mail it.
    // The e-mail is previewed before it goes; the PDF goes attached; the link then shows on the page.
    await page.getByRole("button", { name: "Preview the e-mail" }).click();
    await expect(page.getByTestId("email-preview").textContent()).resolves.toContain(`Total: $${expectedTotal}`);
    await page.getByRole("button", { name: "Send to customer" }).click();
    await page.getByTestId("sheet-status").filter({ hasText: "Sent" }).waitFor({ timeout: 60_000 });
    await expect(page.getByLabel(/The customer's link/).inputValue()).resolves.toMatch(/\/share\//);
    const mails = await inbox(email);
    expect(mails).toHaveLength(1);
    const [mail] = mails;
    expect(mail.subject).toMatch(/recommendation/i);
    expect(mail.text).toContain("Recommended blower pulley: 2.90 in");
    expect(mail.text).toContain(`Total: $${expectedTotal}`);
    expect(mail.html).toContain("Open the recommendation sheet");
    const link = mail.text.match(/https?:\/\/\S+\/share\/\S+/)?.[0];
    expect(link).toBeDefined();
    expect(mail.html).toContain(link!.replace(/&/g, "&amp;"));
    expect(errors).toEqual([]);

    // The link opens that one sheet in a fresh, signed-out browser.
    const stranger = await browser.newContext();
    const shared = await stranger.newPage();
    const sharedErrors = watchErrors(shared);
    await shared.goto(link!);
    await sheetReady(shared);
    await expect(shared.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("A smaller pulley for your work truck");
    await expect(shared.getByTestId("headline-boost").textContent()).resolves.toMatch(/psi boost at 4,500 rpm, predicted$/);
    // The combination's internal name (and its customer's surname in it) never reaches the customer.
    expect(await shared.getByText("Work truck V6 4.3 L, Roots").count()).toBe(0);
    await expect(shared.getByTestId("sheet-total").textContent()).resolves.toBe(`$${expectedTotal}`);
    expect(await shared.getByRole("button", { name: /send|edit|mark/i }).count()).toBe(0);
    expect(sharedErrors).toEqual([]);
    // Change one character of the signature: the page refuses, plainly.
    const tampered = link!.replace(/\?.*$/, "").replace(/.(?=$)/, (c) => (c === "A" ? "B" : "A"));
    await shared.goto(tampered);
    await expect(shared.getByTestId("link-refused").getAttribute("data-reason")).resolves.toBe("forged");
    await expect(shared.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("This link is not valid");
    // And the signed-out browser cannot reach the staff pages or APIs.
    const api = await stranger.request.get(`${BASE_URL}/api/recommendations/${id}`);
    expect(api.status()).toBe(401);
    await stranger.close();
    await context.close();
  });

  it("the shelf pages, filters and sorts; the admin adds a blower, is told what is wrong, and removes it", async () => {
    const context = await browser.newContext();
    const page = await signIn(context, "admin@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/shelf`);
    const pager = page.getByRole("navigation", { name: "Pulleys pages" });
    // The demo shelf has 29 pulleys (23 blower, 6 crank): two pages of 15.
    await pager.getByText("Page 1 of 2 · 29 items").waitFor();
    await pager.getByRole("button", { name: "Next" }).click();
    await pager.getByText("Page 2 of 2 · 29 items").waitFor();
    // A new filter starts again at page 1.
    await page.getByLabel("Position").selectOption("crank");
    await pager.getByText("Page 1 of 1 · 6 items").waitFor();
    // Diameter is the default order, smallest first; a press on its header reverses it.
    const diameters = async () => (await page.locator("tbody tr[data-part] td:nth-child(3)").allTextContents()).map(Number);
    const diameterHeader = page.locator("th", { has: page.getByRole("button", { name: /^Diameter/ }) });
    await expect(diameterHeader.getAttribute("aria-sort")).resolves.toBe("ascending");
    const up = await diameters();
    expect(up).toHaveLength(6);
    expect([...up].sort((a, b) => a - b)).toEqual(up);
    await page.getByRole("button", { name: /^Diameter/ }).click();
    await expect.poll(() => diameterHeader.getAttribute("aria-sort")).toBe("descending");
    await expect.poll(diameters).toEqual([...up].sort((a, b) => b - a));

    await page.getByRole("tab", { name: "Blowers" }).click();
    await page.getByLabel("Kind").selectOption("twin-screw");
    await expect.poll(async () => (await page.locator("tbody tr[data-part]").allTextContents()).every((t) => t.includes("Twin-screw"))).toBe(true);
    await page.getByLabel("Kind").selectOption("");

    await page.getByRole("button", { name: "Add blower" }).click();
    const form = page.getByRole("form", { name: "Add a blower" });
    await form.getByLabel("Part number").fill("PW-BL-E2E1");
    await form.getByLabel("Name").fill("Test twin-screw");
    await form.getByLabel("Kind").selectOption("twin-screw");
    await form.getByRole("button", { name: "Add blower" }).click();
    // Required figures left empty: the form names them and nothing is saved.
    await expect(page.locator("#f-displacementPerRev-error").textContent()).resolves.not.toBe("");
    // The demo admin works in imperial: a displacement in litres is out of range, said in in³/rev.
    await page.locator("#f-displacementPerRev").fill("2");
    await form.getByRole("button", { name: "Add blower" }).click();
    await expect.poll(() => page.locator("#f-displacementPerRev-error").textContent()).toMatch(/between [\d.]+ and [\d.]+ in³\/rev/);
    await page.locator("#f-displacementPerRev").fill("120");
    await page.locator("#f-builtInVolumeRatio").fill("1.5");
    await page.locator("#f-maxRpm").fill("15000");
    await page.locator("#f-volumetricEfficiencyRef").fill("90");
    await page.locator("#f-referenceRpm").fill("10000");
    await page.locator("#f-price").fill("3999.5");
    await form.getByRole("button", { name: "Add blower" }).click();
    await page.getByText("Added PW-BL-E2E1.").waitFor();
    const row = page.locator('tr[data-part="PW-BL-E2E1"]');
    await row.waitFor();
    await expect(row.getByTestId("price").textContent()).resolves.toBe("$3,999.50");
    page.once("dialog", (d) => void d.accept());
    await row.getByRole("button", { name: "Remove PW-BL-E2E1" }).click();
    await page.getByText("Removed PW-BL-E2E1.").waitFor();
    await row.waitFor({ state: "detached" });
    expect(errors).toEqual([]);
    await context.close();
  });

  it("the admin edits a shelf price; a member reads the shelf but gets 403 on every shelf write", async () => {
    const context = await browser.newContext();
    const page = await signIn(context, "admin@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/shelf`);
    await page.getByLabel("Search pulleys").fill("PW-BP-0320-8");
    const row = page.locator('tr[data-part="PW-BP-0320-8"]');
    await row.waitFor();
    await row.getByRole("button", { name: "Edit PW-BP-0320-8" }).click();
    const price = page.getByLabel("Price", { exact: true });
    await price.fill("123.4");
    await page.getByRole("button", { name: "Save pulley" }).click();
    await page.getByText("Saved PW-BP-0320-8.").waitFor();
    await expect(row.getByTestId("price").textContent()).resolves.toBe("$123.40");
    // A bad price is refused in the form, naming the field.
    await row.getByRole("button", { name: "Edit PW-BP-0320-8" }).click();
    await price.fill("12.345");
    await page.getByRole("button", { name: "Save pulley" }).click();
    await expect(page.locator("#f-price-error").textContent()).resolves.toMatch(/two decimals/);
    expect(errors).toEqual([]);
    await context.close();

    const member = await signedIn("member@example.com");
    const list = await member.json("/api/shelf/pulleys?search=PW-BP-0320-8");
    expect(list.status).toBe(200);
    const pulley = list.data.rows[0];
    expect(pulley.price).toBe("123.40");
    const put = await member.json(`/api/shelf/pulleys/${pulley.id}`, "PUT", { ...pulley, price: "0.01" });
    expect(put.status).toBe(403);
    expect((await member.json("/api/shelf/pulleys", "POST", { ...pulley, partNumber: "PW-HACK-1" })).status).toBe(403);
    expect((await member.json(`/api/shelf/pulleys/${pulley.id}`, "DELETE")).status).toBe(403);
    const imp = await member.fetch("/api/shelf/import?kind=pulleys&commit=1", { method: "POST", headers: { "content-type": "text/csv" }, body: "x" });
    expect(imp.status).toBe(403);
    expect((await member.json("/api/recommendations")).status).toBe(403);
    const again = await member.json("/api/shelf/pulleys?search=PW-BP-0320-8");
    expect(again.data.rows[0].price).toBe("123.40");
  });

  it("CSV import over HTTP: preview with line numbers, an all-or-nothing commit, 413 for an oversize file, 400 for a wrong query", async () => {
    const admin = await signedIn("admin@example.com");
    const header = "part_number,position,diameter_mm,rib_count,min_belt_diameter_mm,price,stock,notes";
    const bad = `${header}\nPW-BP-0399-8,blower,99,8,,10.00,1,\nPW-BP-0398-8,blower,98,8,,ten,1,\n`;
    const post = (csv: string, q: string) => admin.fetch(`/api/shelf/import?${q}`, { method: "POST", headers: { "content-type": "text/csv" }, body: csv });
    const preview = await post(bad, "kind=pulleys");
    expect(preview.status).toBe(200);
    const p = await preview.json();
    expect(p.errors).toEqual([{ line: 3, column: "price", message: expect.stringMatching(/two decimals/) }]);
    const commit = await post(bad, "kind=pulleys&commit=1");
    expect(commit.status).toBe(400);
    expect((await admin.json("/api/shelf/pulleys?search=PW-BP-0399-8")).data.total).toBe(0);
    const huge = await post(header + "\n" + "x".repeat(1_100_000), "kind=pulleys");
    expect(huge.status).toBe(413);
    expect((await huge.json()).error).toMatch(/1 MB/);
    expect((await post(bad, "kind=belts")).status).toBe(400);
    const good = await post(bad.replace("ten", "10.50"), "kind=pulleys&commit=1");
    expect(good.status).toBe(200);
    expect(await good.json()).toMatchObject({ committed: true, inserted: 2, updated: 0 });
    const csv = await admin.fetch("/api/shelf/export?kind=pulleys");
    expect(csv.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(await csv.text()).toMatch(/PW-BP-0398-8,blower,98,8,,10\.50,1,/);
  });
});
