// @ts-nocheck
// The classroom read from the back of the room and on a phone: at 1,920×1,080 the chart is at
// least 560 px and 60 % of the screen tall with 20 px labels or more, the class code is large,
// the keys are listed, arrows on a focused slider move the slider (not the step); at 390 px wide
// no page is wider than the window and no axis title overlaps its tick labels; a wrong class code
// keeps what the student typed. Bounds from the issue (the author's, for a projector).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import type { AxisReport } from "@/components/charts/axes-report";
import { DEMO_LESSON_TITLE } from "@/db/seed/lessons";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";

/**
 * Each axis's box holds its tick labels, tick marks and title side by side (half a pixel for
 * rounding), and each title fits along its axis: nothing overlaps.
 */
async function expectAxesClear(page: Page) {
  const canvas = page.getByTestId("curve-chart").locator("canvas");
  await expect.poll(() => canvas.getAttribute("data-axes")).not.toBeNull();
  const axes = JSON.parse((await canvas.getAttribute("data-axes")) ?? "[]") as AxisReport[];
  expect(axes.filter((a) => a.axis === "x")).toHaveLength(1);
  expect(axes.filter((a) => a.axis === "y").length).toBeGreaterThanOrEqual(1);
  for (const a of axes) {
    const across = a.axis === "y" ? a.right - a.left : a.bottom - a.top;
    const along = a.axis === "y" ? a.bottom - a.top : a.right - a.left;
    const labels = a.axis === "y" ? a.labelWidth : a.labelHeight;
    expect(across + 0.5, `${a.id}: room across the axis`).toBeGreaterThanOrEqual(labels + a.tickSpace + a.titleHeight);
    expect(a.titleWidth, `${a.id}: title along the axis`).toBeLessThanOrEqual(along);
  }
}

describe("the classroom in the room and on a phone", () => {
  let browser: Browser;
  let lessonId = "";

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("fills a 1,920×1,080 projector, shows the class code large and the keys", async () => {
    const context = await browser.newContext({ viewport: { width: 1920, height: 1080 } });
    const page = await signIn(context, "instructor@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/lessons`, { waitUntil: "networkidle" });
    const href = (await page.getByRole("link", { name: DEMO_LESSON_TITLE }).first().getAttribute("href")) ?? "";
    lessonId = href.split("/")[2];
    expect(lessonId).toMatch(/^[0-9a-f-]{36}$/);
    await page.goto(`${BASE_URL}/classroom/${lessonId}`, { waitUntil: "networkidle" });
    await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });

    const chart = page.getByTestId("curve-chart");
    const box = await chart.locator("canvas").boundingBox();
    expect(box?.height ?? 0).toBeGreaterThanOrEqual(560);
    expect(box?.height ?? 0).toBeGreaterThanOrEqual(0.6 * 1080);
    expect(Number(await chart.getAttribute("data-font-size"))).toBeGreaterThanOrEqual(20);
    await expectAxesClear(page);

    const code = page.getByTestId("classroom-class-code").locator("span.font-mono");
    expect(await code.textContent()).toMatch(/^[A-Z2-9]{6}$/);
    const codeSize = await code.evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(codeSize).toBeGreaterThanOrEqual(48);

    const guide = page.getByTestId("key-guide");
    await expect(guide.textContent()).resolves.toMatch(/Page Down.*next step/);
    await expect(guide.textContent()).resolves.toMatch(/focused slider/);

    // Arrows on a focused slider move it and leave the step alone.
    const counter = page.getByTestId("step-counter");
    const before = await counter.textContent();
    await page.getByLabel("Engine breathing (VE scale)").check();
    const slider = page.getByRole("slider", { name: "VE scale" });
    await slider.focus();
    await page.keyboard.press("ArrowRight");
    await page.keyboard.press("ArrowRight");
    await expect.poll(() => slider.inputValue()).toBe("102");
    expect(await counter.textContent()).toBe(before);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("works on a phone: no page wider than the window", async () => {
    expect(lessonId).not.toBe("");
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await signIn(context, "instructor@example.com");
    await page.goto(`${BASE_URL}/classroom/${lessonId}`, { waitUntil: "networkidle" });
    await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });
    const widths = await page.evaluate(() => ({ doc: document.documentElement.scrollWidth, win: window.innerWidth }));
    expect(widths.doc).toBeLessThanOrEqual(widths.win);
    const box = await page.getByTestId("curve-chart").locator("canvas").boundingBox();
    expect(box?.width ?? 999).toBeLessThanOrEqual(390);
    expect(box?.height ?? 0).toBeGreaterThanOrEqual(300);
    await expectAxesClear(page);
    await context.close();
  });

  it("a wrong class code keeps what was typed, with the error beside the field", async () => {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await signIn(context, "member@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/lessons/join`, { waitUntil: "networkidle" });
    const code = page.getByLabel("Class code");
    // Six characters no class code uses (codes avoid 0, 1, I and O).
    await code.fill("OO1I0Q");
    await page.getByRole("button", { name: "Join" }).click();
    const error = page.locator("#f-code-error");
    await error.waitFor({ timeout: 30_000 });
    expect(await error.textContent()).toMatch(/class code/i);
    expect(await code.inputValue()).toBe("OO1I0Q");
    expect(await code.getAttribute("aria-invalid")).toBe("true");
    expect(await code.getAttribute("aria-describedby")).toBe("f-code-error");
    expect(page.url()).toMatch(/\/lessons\/join/);
    expect(errors).toEqual([]);
    await context.close();
  });
});
