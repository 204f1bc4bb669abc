// @ts-nocheck
// axe-core in Chromium over every main page, signed out and for each role: no serious or critical
// violations. And a keyboard walk: Tab reaches the skip link first, then moves through the page
// without getting stuck.
import { createRequire } from "node:module";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { BASE_URL, launchBrowser, signIn } from "../support/browser";
import { signedIn } from "../support/http";

const require = createRequire(import.meta.url);
const axePath = require.resolve("axe-core/axe.min.js");

type AxeResult = { violations: { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] }[] };

async function axe(page: Page) {
  await page.addScriptTag({ path: axePath });
  const r = (await page.evaluate(async () => {
    //  injected global
    return window.axe.run(document, { resultTypes: ["violations"] });
  })) as AxeResult;
  return r.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.map((n) => JSON.stringify(n.target)).slice(0, 3).join(", ")}`);
}

async function keyboardWalk(page: Page) {
  await page.keyboard.press("Tab");
  const first = await page.evaluate(() => document.activeElement?.textContent?.trim());
  expect(first).toMatch(/skip to content/i);
  // Every visible tabbable element of the page, so the walk can demand that Tab reaches each
  // one in turn rather than merely "more than a few".
  const tabbable = await page.evaluate(() => {
    const stops = new Set<Element | string>();
    const selector = 'a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';
    for (const el of document.querySelectorAll<HTMLElement>(selector)) {
      if (el.tabIndex < 0 || !el.checkVisibility() || el.getClientRects().length === 0) continue;
      // A radio group is one tab stop, however many buttons it has.
      stops.add(el instanceof HTMLInputElement && el.type === "radio" ? `radio:${el.name}` : el);
    }
    return stops.size;
  });
  const presses = Math.min(25, tabbable - 1);
  const seen = new Set<string>();
  for (let i = 0; i < presses; i++) {
    await page.keyboard.press("Tab");
    const id = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      if (!el || el === document.body) return "body";
      return `${el.tagName}:${el.id}:${el.getAttribute("name") ?? ""}:${el.getAttribute("href") ?? ""}:${el.textContent?.trim().slice(0, 30) ?? ""}:${el.getBoundingClientRect().top.toFixed(0)}:${el.getBoundingClientRect().left.toFixed(0)}`;
    });
    seen.add(id);
  }
  // Every page has a real walk (skip link, navigation and the page's own controls), and each
  // press lands on an element not visited before: nothing traps focus or drops it to the body.
  // Slack of 2 for two stops that happen to print alike (author's choice).
  expect(tabbable).toBeGreaterThanOrEqual(5);
  expect(seen.has("body")).toBe(false);
  expect(seen.size).toBeGreaterThanOrEqual(presses - 2);
}

async function demoIds() {
  const tuner = await signedIn("tuner@example.com");
  const list = await tuner.json("/api/combinations?search=Work%20truck&pageSize=5");
  const demo = (list.data.items as { id: string; name: string }[]).find((c) => c.name.startsWith("Work truck"));
  const orders = await tuner.json("/api/orders?search=Casey");
  return { demo: demo!.id, order: (orders.data.rows as { id: string }[])[0].id };
}

describe("accessibility", () => {
  let browser: Browser;
  let ids: { demo: string; order: string };
  beforeAll(async () => {
    browser = await launchBrowser();
    ids = await demoIds();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it.each(["/", "/sign-in", "/sign-up", "/forgot-password"])("signed out: %s", async (path) => {
    const page = await browser.newPage();
    await page.goto(BASE_URL + path, { waitUntil: "networkidle" });
    expect(await axe(page)).toEqual([]);
    await keyboardWalk(page);
    await page.close();
  });

  const pagesFor = (role: string, demo: string, order: string): string[] => {
    const common = ["/combinations", "/combinations/new", "/compare", "/datalogs", "/shelf", "/lessons", "/settings"];
    const staff = [`/combinations/${demo}`, `/combinations/${demo}/revisions`, `/compare?items=${demo}:1,${demo}:2`, "/recommendations", "/recommendations/new", `/recommendations/new?combination=${demo}`, "/orders", `/orders/${order}`];
    if (role === "member") return common;
    if (role === "instructor") return [...common, `/combinations/${demo}`];
    if (role === "admin") return [...common, ...staff, "/admin/users", "/admin/mail"];
    return [...common, ...staff];
  };

  for (const role of ["member", "tuner", "sales", "instructor", "admin"]) {
    it(`${role}: main pages have no serious or critical violations`, async () => {
      const context = await browser.newContext();
      const page = await signIn(context, `${role}@example.com`);
      const failures: string[] = [];
      for (const path of pagesFor(role, ids.demo, ids.order)) {
        const res = await page.goto(BASE_URL + path, { waitUntil: "networkidle" });
        expect(res?.status(), path).toBeLessThan(400);
        for (const v of await axe(page)) failures.push(`${path}: ${v}`);
      }
      expect(failures).toEqual([]);
      await page.goto(BASE_URL + "/combinations", { waitUntil: "networkidle" });
      await keyboardWalk(page);
      await context.close();
    });
  }
});
