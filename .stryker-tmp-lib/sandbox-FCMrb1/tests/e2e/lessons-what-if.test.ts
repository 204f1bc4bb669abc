// @ts-nocheck
// A what-if step in Chromium: the instructor adds a step with a smaller blower pulley on one item
// (a bad value is named beside its field first), typed as "1. …" but listed once numbered; the
// classroom shows the item as built and changed on the chart and in the deltas table, cautions
// labelled by item without repeats, and a note whose live figure matches the table; a student's
// copy has a short name and opens with the change applied.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser } from "playwright-core";
import { combinationSchema, inToM } from "@/calc";
import { bigInchTwinScrew, workTruckV6 } from "@/lib/combinations/demo-specs";
import { stepCurves } from "@/lib/lessons/curves";
import { quantityText } from "@/lib/units/format";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";
import { createLessonInUi, fillItem } from "../support/lesson-form";

const WORK_TRUCK = "Work truck V6 4.3 L, Roots";
const BIG_INCH = "Big-inch V8 7.4 L, twin-screw";
const CHANGED = "Truck — blower pulley 2.80 in";

describe("what-if steps in Chromium", () => {
  let browser: Browser;
  const title = `What-if class ${Date.now().toString(36)}`;
  let lessonId = "";
  let classCode = "";

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("an instructor adds a what-if step; a bad value is named beside its field; the title is numbered once", async () => {
    const context = await browser.newContext();
    const page = await signIn(context, "instructor@example.com");
    const errors = watchErrors(page);
    lessonId = await createLessonInUi(page, BASE_URL, title);

    const form = page.getByRole("form", { name: "Add a step" });
    await form.getByLabel("Step title").fill("1. Smaller pulley");
    const truck = await fillItem(page, 0, { combination: WORK_TRUCK, revision: "1", label: "Truck" });
    // The revision picker names number and date, not "Revision 1" as a field label.
    expect(await truck.getByLabel("Saved revision").locator("option[value='1']").textContent()).toMatch(/^Revision 1 · \d{1,2} [A-Z][a-z]{2} \d{4}/);
    await fillItem(page, 1, { combination: BIG_INCH, revision: "1", label: "V8" });
    await truck.getByLabel("What-if").selectOption("pulley");
    const value = truck.getByLabel("Blower pulley diameter");
    await value.fill("abc");
    await form.getByLabel("Note").fill("With the smaller pulley the truck makes {boost@4500#2} at 4,500 rpm. {nonsense}");
    await form.getByRole("button", { name: "Add step" }).click();
    await expect.poll(() => truck.getByRole("alert").first().textContent(), { timeout: 15_000 }).toMatch(/Blower pulley diameter must be between/);
    await value.fill("2.8");
    await form.getByRole("button", { name: "Add step" }).click();
    const listed = page.getByRole("listitem", { name: "Step 1: Smaller pulley" });
    await listed.waitFor({ timeout: 30_000 });
    expect(await listed.textContent()).not.toMatch(/1\.\s*1\./);
    expect(await listed.textContent()).toContain("what-if: blower pulley 2.80 in");

    await page.getByRole("button", { name: "Publish", exact: true }).click();
    await expect.poll(() => page.getByTestId("lesson-status").textContent(), { timeout: 15_000 }).toContain("Published");
    classCode = ((await page.getByTestId("class-code").textContent()) ?? "").trim();
    expect(errors).toEqual([]);
    await context.close();
  });

  it("the classroom shows the item as built and changed, cautions by item, and the note's live figure", async () => {
    expect(lessonId).not.toBe("");
    const context = await browser.newContext();
    const page = await signIn(context, "instructor@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/classroom/${lessonId}`, { waitUntil: "networkidle" });
    await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });

    const rows = await page.getByTestId("deltas-table").locator("tbody th").allTextContents();
    expect(rows).toEqual(["Truck — as built", CHANGED, "V8"]);
    const legend = await page.getByTestId("curve-chart-table").locator("caption").textContent();
    expect(legend).toContain(`Truck — as built against ${CHANGED} against V8`);

    // The figure in the note is the same points' figure (demo specs: lib/combinations/demo-specs.ts).
    const item = (label: string, spec: typeof workTruckV6, change: { kind: "pulley"; diameter: number } | null = null) => ({ combinationId: "x", revision: 1, label, name: label, spec: combinationSchema.parse(spec), change });
    const curves = stepCurves([item("Truck", workTruckV6, { kind: "pulley", diameter: inToM(2.8) }), item("V8", bigInchTwinScrew)], { kind: "none" }, "imperial");
    const boost = quantityText("pressure", curves[1].points.find((p) => p.rpm === 4500)!.boostGauge, "imperial");
    const note = page.locator(".lesson-note");
    await expect(note.textContent()).resolves.toContain(`the truck makes ${boost} at 4,500 rpm`);
    await expect(note.locator("code").textContent()).resolves.toBe("{nonsense}: unknown figure");

    const cautions = page.getByTestId("cautions-panel").locator("li[data-item]");
    const keys = await cautions.evaluateAll((els) => els.map((e) => `${e.getAttribute("data-item")}|${e.textContent}`));
    expect(keys.length).toBeGreaterThan(0);
    expect(new Set(keys).size).toBe(keys.length);
    const items = await cautions.evaluateAll((els) => els.map((e) => e.getAttribute("data-item")));
    for (const it of items) expect(["Truck — as built", CHANGED, "V8"]).toContain(it);
    // A 2.80 in pulley is below the belt's minimum, on the changed truck only (calc's default minimum, 76 mm).
    expect(keys.filter((k) => /belt/i.test(k)).map((k) => k.split("|")[0])).toEqual([CHANGED]);
    expect(await page.getByText("Always", { exact: true }).count()).toBe(1);
    expect(errors).toEqual([]);
    await context.close();
  });

  it("a student's copy has a short name and opens with the what-if applied", async () => {
    expect(classCode).toMatch(/^[A-Z2-9]{6}$/);
    const context = await browser.newContext();
    const page = await signIn(context, "member@example.com");
    await page.goto(`${BASE_URL}/lessons/join`, { waitUntil: "networkidle" });
    await page.getByLabel("Class code").fill(classCode);
    await page.getByRole("button", { name: "Join" }).click();
    await page.waitForURL(new RegExp(`/classroom/${lessonId}`), { timeout: 30_000 });
    await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });
    await page.getByRole("button", { name: "Copy “Truck” to my combinations" }).click();
    const open = page.getByRole("link", { name: "Open in the planner" });
    await open.waitFor({ timeout: 30_000 });
    expect(await page.getByText("Copied as “Step 1 — Truck, blower pulley 2.80 in”.").count()).toBe(1);
    const res = await context.request.get(`${BASE_URL}/api${await open.getAttribute("href")}`);
    const copy = (await res.json()) as { name: string; spec: { drive: { blowerPulleyDiameter: number } } };
    expect(copy.name).toBe("Step 1 — Truck, blower pulley 2.80 in");
    expect(copy.spec.drive.blowerPulleyDiameter).toBeCloseTo(inToM(2.8), 9);
    // The planner opens on the changed spec.
    await open.click();
    await page.waitForURL(/\/combinations\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await expect.poll(() => page.getByLabel(/Blower pulley diameter/).first().inputValue(), { timeout: 30_000 }).toMatch(/^2\.80?$/);
    await context.close();
  });
});
