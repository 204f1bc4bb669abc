// @ts-nocheck
// Lessons end to end: the instructor builds a three-step lesson from the shop's demo combinations
// through the UI and publishes it; a member joins with the class code, steps through it with the
// keyboard, moves the what-if slider and copies an item into their own combinations. Then the REST
// routes' role rules and bad input.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";
import { Client, signedIn } from "../support/http";
import { createLessonInUi, fillItem, type Item } from "../support/lesson-form";

const WORK_TRUCK = "Work truck V6 4.3 L, Roots";
const BIG_INCH = "Big-inch V8 7.4 L, twin-screw";

async function addStep(page: Page, title: string, items: Item[]) {
  const form = page.getByRole("form", { name: "Add a step" });
  await form.getByLabel("Step title").fill(title);
  for (const [i, it] of items.entries()) await fillItem(page, i, it);
  await form.getByRole("button", { name: "Add step" }).click();
  await page.getByRole("listitem", { name: new RegExp(`^Step \\d+: ${title}$`) }).waitFor({ timeout: 30_000 });
}

describe("lessons in Chromium", () => {
  let browser: Browser;
  const title = `Pulley class ${Date.now().toString(36)}`;
  let lessonId = "";
  let classCode = "";

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("an instructor builds a three-step lesson from demo combinations and publishes it", async () => {
    const context = await browser.newContext();
    const page = await signIn(context, "instructor@example.com");
    const errors = watchErrors(page);
    lessonId = await createLessonInUi(page, BASE_URL, title);

    await addStep(page, "Two engines", [
      { combination: WORK_TRUCK, revision: "1", label: "Work truck" },
      { combination: BIG_INCH, revision: "current", label: "Big-inch V8" },
    ]);
    await addStep(page, "Pulley change", [
      { combination: WORK_TRUCK, revision: "1", label: "3.4 in pulley" },
      { combination: WORK_TRUCK, revision: "2", label: "3.0 in pulley" },
    ]);
    await addStep(page, "Intercooler and injectors", [
      { combination: BIG_INCH, revision: "1", label: "No intercooler" },
      { combination: BIG_INCH, revision: "2", label: "Intercooled" },
      { combination: BIG_INCH, revision: "3", label: "Larger injectors" },
    ]);
    // Put "Intercooler and injectors" before "Pulley change" with the keyboard.
    const moveUp = page.getByRole("button", { name: "Move step 3 up" });
    await moveUp.focus();
    await page.keyboard.press("Enter");
    await expect
      .poll(() => page.getByRole("listitem", { name: /^Step \d+:/ }).evaluateAll((els) => els.map((e) => e.getAttribute("aria-label"))), { timeout: 15_000 })
      .toEqual(["Step 1: Two engines", "Step 2: Intercooler and injectors", "Step 3: Pulley change"]);

    await page.getByRole("button", { name: "Publish", exact: true }).click();
    await expect.poll(() => page.getByTestId("lesson-status").textContent(), { timeout: 15_000 }).toContain("Published");
    classCode = ((await page.getByTestId("class-code").textContent()) ?? "").trim();
    expect(classCode).toMatch(/^[A-Z2-9]{6}$/);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("a member joins with the code, steps with the keyboard, moves the what-if slider and copies an item", async () => {
    expect(classCode).not.toBe("");
    const context = await browser.newContext();
    const page = await signIn(context, "member@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/lessons/join`, { waitUntil: "networkidle" });
    await page.getByLabel("Class code").fill(classCode.toLowerCase());
    await page.getByRole("button", { name: "Join" }).click();
    await page.waitForURL(new RegExp(`/classroom/${lessonId}`), { timeout: 30_000 });
    // Keyboard navigation is on once the view has hydrated.
    await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });

    const counter = page.getByTestId("step-counter");
    await expect.poll(() => counter.textContent()).toBe("Step 1 of 3");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toBe("Two engines");
    // Read-only: no edit link, and the editor is closed to a member.
    expect(await page.getByRole("link", { name: "Edit this lesson" }).count()).toBe(0);

    await page.keyboard.press("ArrowRight");
    await expect.poll(() => counter.textContent()).toBe("Step 2 of 3");
    await expect.poll(() => page.getByRole("heading", { level: 1 }).textContent()).toBe("Intercooler and injectors");
    await page.keyboard.press("End");
    await expect.poll(() => counter.textContent()).toBe("Step 3 of 3");
    await page.getByRole("button", { name: "← Previous" }).click();
    await expect.poll(() => counter.textContent()).toBe("Step 2 of 3");

    // The what-if slider: a smaller pulley for all items raises the boost in the table.
    const table = page.getByTestId("deltas-table");
    const before = await table.textContent();
    const slider = page.getByLabel(/Blower pulley diameter/);
    await slider.focus();
    for (let i = 0; i < 6; i++) await page.keyboard.press("ArrowLeft");
    await expect.poll(() => table.textContent()).not.toBe(before);
    // Arrow keys on the slider move the slider, not the step.
    expect(await counter.textContent()).toBe("Step 2 of 3");
    const boostOf = (text: string | null) => Number(/Intercooled([\d.]+) (?:psi|kPa)/.exec(text ?? "")?.[1]);
    const [was, now] = [boostOf(before), boostOf(await table.textContent())];
    expect(Number.isFinite(was)).toBe(true);
    expect(now).toBeGreaterThan(was);

    // Copy the second item into the member's own combinations.
    await page.getByRole("button", { name: "Copy “Intercooled” to my combinations" }).click();
    const open = page.getByRole("link", { name: "Open in the planner" });
    await open.waitFor({ timeout: 30_000 });
    const href = (await open.getAttribute("href")) ?? "";
    expect(href).toMatch(/^\/combinations\/[0-9a-f-]{36}$/);
    const res = await context.request.get(`${BASE_URL}/api${href}`);
    expect(res.status()).toBe(200);
    const copy = (await res.json()) as { name: string; spec: { drive: { blowerPulleyDiameter: number } } };
    expect(copy.name).toBe("Step 2 — Intercooled");
    expect(copy.spec.drive.blowerPulleyDiameter).toBeCloseTo(3.8 * 0.0254, 9); // the big-inch V8 keeps its 3.8 in pulley (lib/combinations/demo-specs.ts)
    expect(errors).toEqual([]);
    await context.close();
  });

  it("the REST routes keep the role rules and name bad fields", async () => {
    const anon = new Client();
    expect((await anon.json("/api/lessons")).status).toBe(401);

    const member = await signedIn("member@example.com");
    expect((await member.json("/api/lessons", "POST", { title: "Not mine to make" })).status).toBe(403);
    expect((await member.json(`/api/lessons/${lessonId}`, "PATCH", { title: "Taken over" })).status).toBe(403);
    const seen = await member.json(`/api/lessons/${lessonId}`);
    expect(seen.status).toBe(200);
    expect(seen.data.canEdit).toBe(false);
    expect(seen.data.classCode).toBeNull();
    const wrong = await member.json("/api/lessons/join", "POST", { code: "ZZZZZZ" });
    expect(wrong.status).toBe(400);
    expect(wrong.data.fieldErrors.code[0]).toMatch(/No such published lesson/);

    const tuner = await signedIn("tuner@example.com");
    expect((await tuner.json(`/api/lessons/${lessonId}`)).status).toBe(404);

    const instructor = await signedIn("instructor@example.com");
    const bad = await instructor.json(`/api/lessons/${lessonId}/steps`, "POST", { title: "", items: [], series: ["lap time"] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.data.fieldErrors)).toEqual(expect.arrayContaining(["title", "items", "series.0"]));
    expect((await instructor.json("/api/lessons", "POST", "{not json")).status).toBe(400);
    const made = await instructor.json("/api/lessons", "POST", { title: "Scratch lesson" });
    expect(made.status).toBe(201);
    expect((await instructor.json(`/api/lessons/${made.data.id}`, "DELETE")).status).toBe(204);
    expect((await instructor.json(`/api/lessons/${made.data.id}`)).status).toBe(404);
  });
});
