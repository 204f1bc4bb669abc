// @ts-nocheck
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { BASE_URL, launchBrowser, watchErrors } from "../support/browser";

describe("home page in Chromium", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("renders with the shipped font and no console errors", async () => {
    const page = await browser.newPage();
    const errors = watchErrors(page);
    const fontRequests: string[] = [];
    page.on("requestfinished", (r) => {
      if (r.resourceType() === "font") fontRequests.push(r.url());
    });
    await page.goto(BASE_URL + "/", { waitUntil: "networkidle" });
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(/pulley/i);
    // The font is served by the app itself, never from another host.
    const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(family).toMatch(/Inter Variable/);
    const loaded = await page.evaluate(async () => {
      await document.fonts.ready;
      return [...document.fonts].filter((f) => f.status === "loaded").map((f) => f.family);
    });
    expect(loaded.some((f) => /Inter Variable/.test(f))).toBe(true);
    expect(fontRequests.length).toBeGreaterThan(0);
    for (const u of fontRequests) expect(new URL(u).origin).toBe(new URL(BASE_URL).origin);
    expect(errors).toEqual([]);
  });
});
