// @ts-nocheck
// A new member, by hand in Chromium: signs up, saves a combination, edits it twice in the
// planner, restores the first revision; then an admin promotes them to tuner and their very
// next request carries the new role.
import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";

const T = { timeout: 30_000 };

describe("accounts and history in the browser", () => {
  let browser: Browser;
  let member: BrowserContext;
  let admin: BrowserContext;
  beforeAll(async () => {
    browser = await launchBrowser();
    member = await browser.newContext();
    admin = await browser.newContext();
  });
  afterAll(async () => {
    await browser?.close();
  });

  const email = `new-member-${crypto.randomBytes(4).toString("hex")}@example.com`;
  let page: Page;
  let errors: string[];
  let planner = "";
  let original = "";

  it("a new member signs up through the form and lands on their (empty) combinations", async () => {
    page = await member.newPage();
    errors = watchErrors(page);
    await page.goto(`${BASE_URL}/sign-up`);
    await page.getByLabel("Name", { exact: true }).fill("Riley Newcomer");
    await page.getByLabel("E-mail", { exact: true }).fill(email);
    await page.getByLabel("Password", { exact: true }).fill("a-long-enough-password");
    await page.getByRole("button", { name: "Create account" }).click();
    await page.waitForURL((u) => u.pathname === "/combinations", T);
    await page.getByText("Nothing saved yet.").waitFor(T);
    await expect(page.locator("header").textContent()).resolves.toMatch(/Member/);
  });

  it("saves a new combination from a starting point and it opens in the planner", async () => {
    await page.getByRole("link", { name: "New combination", exact: true }).click();
    await page.waitForURL((u) => u.pathname === "/combinations/new", T);
    await page.getByLabel("Name", { exact: true }).fill("Riley's street car");
    await page.getByLabel("V6 ~4.3 L, Roots").check();
    await page.getByRole("button", { name: "Create and open in the planner" }).click();
    await page.waitForURL((u) => /^\/combinations\/[0-9a-f-]{36}$/.test(u.pathname), T);
    planner = new URL(page.url()).pathname;
  });

  it("edits it twice in the planner: each save is a new revision", async () => {
    const pulley = page.getByLabel("Blower pulley diameter").first();
    await pulley.waitFor(T);
    // The planner's controls are enabled once it has hydrated.
    await page.locator('[data-testid="planner"]:enabled').waitFor(T);
    original = await pulley.inputValue();
    expect(Number(original)).toBeGreaterThan(0);
    const smaller = (Number(original) - 0.2).toFixed(2);
    const smallest = (Number(original) - 0.4).toFixed(2);

    await pulley.fill(smaller);
    await page.getByRole("textbox", { name: "Revision note" }).fill("Smaller blower pulley");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved revision 2").waitFor(T);

    await pulley.fill(smallest);
    await page.getByRole("textbox", { name: "Revision note" }).fill("Even smaller");
    await page.getByRole("button", { name: "Save revision" }).click();
    await page.getByText("Saved revision 3").waitFor(T);
  });

  it("restores the first revision on the revisions page and gets its spec back", async () => {
    await page.goto(`${BASE_URL}${planner}/revisions`);
    await page.getByRole("heading", { name: /History of/ }).waitFor(T);
    const rows = page.getByRole("region", { name: "Revisions", exact: true }).locator("tbody tr");
    await expect(rows.count()).resolves.toBe(3);
    await expect(page.getByRole("row").filter({ hasText: "Smaller blower pulley" }).count()).resolves.toBe(1);

    // Comparing 2 → 3 lists the pulley change.
    await page.getByLabel("From revision").selectOption("2");
    await page.getByLabel("To revision").selectOption("3");
    await page.getByRole("button", { name: "Compare" }).click();
    await page.getByRole("table", { name: /What changed from revision 2 to revision 3/ }).getByText("Blower pulley diameter").waitFor(T);

    await page.getByRole("button", { name: "Restore revision 1", exact: true }).click();
    await page.getByRole("button", { name: "Yes, restore revision 1" }).click();
    await page.getByText("Restored revision 1 as revision 4.").waitFor(T);
    await page.getByRole("row").filter({ hasText: "Restored revision 1" }).first().waitFor(T);

    // The newest revision holds revision 1's spec: compare them, nothing differs.
    await page.goto(`${BASE_URL}${planner}/revisions?a=1&b=4`);
    await page.getByText("Revisions 1 and 4 hold the same spec.").waitFor(T);

    // And the planner shows the first pulley again.
    await page.goto(`${BASE_URL}${planner}`);
    const pulley = page.getByLabel("Blower pulley diameter").first();
    await pulley.waitFor(T);
    await expect.poll(async () => Number(await pulley.inputValue()), T).toBeCloseTo(Number(original), 6);
    expect(errors.filter((e) => /^5\d\d /.test(e))).toEqual([]);
  });

  it("on the list: renames inline, duplicates, deletes with Undo", async () => {
    await page.goto(`${BASE_URL}/combinations`);
    await page.getByRole("button", { name: "Rename Riley's street car" }).click();
    await page.getByLabel("New name for Riley's street car").fill("Riley's weekend car");
    await page.getByRole("button", { name: "Save name" }).click();
    await page.getByRole("link", { name: "Riley's weekend car", exact: true }).waitFor(T);

    await page.getByRole("button", { name: "Duplicate Riley's weekend car" }).click();
    await page.getByText("Made a copy: “Riley's weekend car (copy)”.").waitFor(T);
    await page.getByRole("link", { name: "Riley's weekend car (copy)", exact: true }).waitFor(T);

    await page.getByRole("button", { name: "Delete Riley's weekend car (copy)" }).click();
    await page.getByRole("button", { name: "Yes, delete Riley's weekend car (copy)" }).click();
    await page.getByText("Deleted “Riley's weekend car (copy)”.").waitFor(T);
    await page.getByRole("link", { name: "Riley's weekend car (copy)", exact: true }).waitFor({ state: "detached", ...T });
    await page.getByRole("button", { name: "Undo" }).click();
    await page.getByRole("link", { name: "Riley's weekend car (copy)", exact: true }).waitFor(T);

    // The search narrows the list to the copy: the header row and one row.
    await page.getByRole("searchbox", { name: "Search" }).fill("(copy)");
    await expect.poll(() => page.getByRole("row").count(), T).toBe(2);
  });

  it("an admin promotes the member to tuner, and the member's next request shows it", async () => {
    const adminPage = await signIn(admin, "admin@example.com");
    await adminPage.goto(`${BASE_URL}/admin/users?q=${encodeURIComponent(email)}`);
    await adminPage.getByLabel(`Role of ${email}`, { exact: true }).selectOption("tuner");
    await adminPage.getByRole("button", { name: `Save role of ${email}` }).click();
    await adminPage.getByText(`Saved: ${email} is now Tuner.`).waitFor(T);

    const me = await page.request.get(`${BASE_URL}/api/me`);
    expect(me.status()).toBe(200);
    expect(await me.json()).toMatchObject({ email, role: "tuner" });
    await page.goto(`${BASE_URL}/combinations`);
    await expect(page.locator("header").textContent()).resolves.toMatch(/Tuner/);
    // A tuner sees the shop's combinations, the demo examples among them.
    await page.getByLabel("Show").selectOption("demo");
    await page.getByRole("link", { name: "Work truck V6 4.3 L, Roots", exact: true }).waitFor(T);
  });

  it("the admin's mailbox page shows a sign-in link e-mailed to the member; other roles are turned away", async () => {
    const anon = await (await browser.newContext()).newPage();
    await anon.goto(`${BASE_URL}/sign-in`);
    await anon.getByLabel("E-mail for the link").fill(email);
    await anon.getByRole("button", { name: "E-mail me a link" }).click();
    await anon.getByText("If an account exists for that address").waitFor(T);

    // The mail is queued and sent in the background: reload the mailbox until it has arrived.
    const adminPage = admin.pages()[0];
    const message = adminPage.getByRole("listitem").filter({ hasText: `to ${email}` }).first();
    await expect
      .poll(async () => {
        await adminPage.goto(`${BASE_URL}/admin/mail`);
        await adminPage.getByRole("heading", { name: "Mailbox" }).waitFor(T);
        return message.getByText("Your Pulleywright sign-in link").count();
      }, { timeout: 20_000, interval: 500 })
      .toBeGreaterThan(0);
    // The app's own outbox lists it as sent. The fake has the message as soon as the SMTP server
    // took it, a moment before the outbox row is marked sent: reload until it is.
    const sentRow = adminPage.getByRole("table", { name: "Outbox" }).getByRole("row").filter({ hasText: email }).filter({ hasText: "sent" });
    await expect
      .poll(async () => {
        await adminPage.goto(`${BASE_URL}/admin/mail`);
        await adminPage.getByRole("heading", { name: "Mailbox" }).waitFor(T);
        return sentRow.count();
      }, { timeout: 20_000, interval: 500 })
      .toBeGreaterThan(0);
    await page.goto(`${BASE_URL}/admin/mail`);
    await page.waitForURL((u) => u.pathname === "/combinations", T);
    await page.getByText("That page is not open to your role").waitFor(T);
  });
});
