// @ts-nocheck
// A person's units and locale in Chromium: an imperial person sees no metric unit on the planner
// (cautions included), a metric person no imperial one, a mixed person (litres and psi) exactly
// those; a unit round trip leaves the stored spec byte-identical; two pages write a date alike.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { combinationSchema, type Combination } from "@/calc";
import { connect } from "@/db/connect";
import { createCombination } from "@/db/repo/combinations";
import { createMember, toActor } from "@/db/repo/users";
import { combinations, users } from "@/db/schema";
import { workTruckV6 } from "@/lib/combinations/demo-specs";
import { dateTimeText } from "@/lib/format/dates";
import { BASE_URL, DEMO_PASSWORD, launchBrowser, signIn, watchErrors } from "../support/browser";
import { Client, signedIn } from "../support/http";
import { firstMatch, IMPERIAL, METRIC } from "../support/unit-words";

const { pool, db } = connect(process.env.DATABASE_URL!, 2);

/** The planner's visible text, with every input's value, once hydrated. */
async function plannerText(page: Page): Promise<string> {
  await page.waitForFunction(() => {
    // Hydrated: the planner's fieldset is enabled (it is disabled in the server's HTML, which may
    // still sit hidden in a streamed boundary) and the cautions are listed.
    return !!document.querySelector('[data-testid="planner"]:enabled') && !!document.querySelector('[data-testid="cautions-panel"] li');
  });
  // A shelf item's name is the shop's own words (the demo's may say "1.6 L/rev"): keep only the
  // figures the app adds after it in parentheses.
  return page.evaluate(() => {
    let text = document.body.innerText;
    for (const o of document.querySelectorAll("option")) {
      const t = o.textContent ?? "";
      if (t.includes("(")) text = text.replace(t, t.slice(t.lastIndexOf("(")));
    }
    return text;
  });
}

describe("the person's units in Chromium", () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  let errors: string[];
  let userId: string;
  let comboId: string;
  const email = `units-${Date.now()}@example.com`;

  beforeAll(async () => {
    const u = await createMember(db, { email, name: "Units Check", password: DEMO_PASSWORD });
    await db.update(users).set({ emailVerifiedAt: new Date() }).where(eq(users.id, u.id));
    userId = u.id;
    // A 72 mm blower pulley: below calc's 76 mm demo belt minimum, so a caution with a length shows.
    const spec: Combination = combinationSchema.parse({ ...workTruckV6, drive: { ...workTruckV6.drive, blowerPulleyDiameter: 0.072 } });
    const row = await createCombination(db, toActor(u), { name: "Units check", spec, note: "Units e2e" });
    comboId = row.id;
    browser = await launchBrowser();
    context = await browser.newContext({ viewport: { width: 1400, height: 1000 }, locale: "de-DE" });
    page = await signIn(context, email);
    errors = watchErrors(page);
  });

  afterAll(async () => {
    await browser?.close();
    await pool.end();
  });

  const setUnits = (unitSystem: "imperial" | "metric", unitChoices: Record<string, string> = {}) =>
    db.update(users).set({ unitSystem, unitChoices }).where(eq(users.id, userId));

  it("shows an imperial person no metric unit, cautions included", async () => {
    await setUnits("imperial");
    await page.goto(`${BASE_URL}/combinations/${comboId}`);
    const text = await plannerText(page);
    expect(firstMatch(text, METRIC)).toBeNull();
    // source: 0.072 m / 0.0254 m/in = 2.83 in; 0.076 m = 2.99 in (NIST SP 811, 1 in = 0.0254 m exactly)
    expect(text).toContain("The 2.83 in blower pulley is below the 2.99 in");
  });

  it("shows a metric person no imperial unit", async () => {
    await setUnits("metric");
    await page.goto(`${BASE_URL}/combinations/${comboId}`);
    const text = await plannerText(page);
    expect(firstMatch(text, IMPERIAL)).toBeNull();
    expect(text).toContain("The 72.0 mm blower pulley is below the 76.0 mm");
  });

  it("lets a person choose litres and psi in Settings, and shows exactly those", async () => {
    await setUnits("imperial");
    await page.goto(`${BASE_URL}/settings`);
    const form = page.getByTestId("units-form");
    await form.getByRole("button", { name: "Metric" }).click();
    await form.getByLabel("Pressure (boost, barometer)").selectOption("psi");
    await form.getByRole("button", { name: "Save units" }).click();
    await form.getByText("Saved.").waitFor();
    const [u] = await db.select().from(users).where(eq(users.id, userId));
    expect({ unitSystem: u.unitSystem, unitChoices: u.unitChoices }).toEqual({ unitSystem: "metric", unitChoices: { pressure: "psi" } });

    await page.goto(`${BASE_URL}/combinations/${comboId}`);
    const text = await plannerText(page);
    await expect(page.getByLabel(/^Engine displacement\s*\(L\)/).count()).resolves.toBe(1);
    expect(text).toMatch(/\bpsi\b/);
    expect(firstMatch(text, /\bkPa\b|\bbar\b|in³/)).toBeNull();
    // The planner offers the person's own mix beside the presets.
    await expect(page.getByRole("radio", { name: "My units" }).isChecked()).resolves.toBe(true);
  });

  it("leaves the stored spec byte-identical and records no revision through a unit round trip", async () => {
    await setUnits("imperial");
    const [before] = await db.select().from(combinations).where(eq(combinations.id, comboId));
    await page.goto(`${BASE_URL}/combinations/${comboId}`);
    await plannerText(page);
    await page.getByRole("radio", { name: "Metric" }).check();
    await page.getByText(/Units set to metric/).waitFor();
    await page.getByRole("radio", { name: "Imperial" }).check();
    await page.getByText(/Units set to imperial/).waitFor();
    // Sensible precision in every box: at most three decimals, never 14.6959 or 0.550001.
    const values = await page.$$eval('main input[type="number"], main input[inputmode="decimal"]', (els) => els.map((e) => (e as HTMLInputElement).value));
    expect(values.length).toBeGreaterThan(5);
    expect(values.filter((v) => /\.\d{4,}/.test(v))).toEqual([]);
    await expect(page.getByRole("button", { name: "Save revision" }).isDisabled()).resolves.toBe(true);
    const [after] = await db.select().from(combinations).where(eq(combinations.id, comboId));
    expect(after.revision).toBe(before.revision);
    expect(JSON.stringify(after.spec)).toBe(JSON.stringify(before.spec));
    expect(errors).toEqual([]);
  });

  it("PATCH /api/me sets a preset and units per kind, checks the session and names a bad field", async () => {
    const anon = new Client();
    expect((await anon.json("/api/me", "PATCH", { unitSystem: "metric" })).status).toBe(401);
    const me = await signedIn(email, DEMO_PASSWORD);
    const ok = await me.json("/api/me", "PATCH", { unitSystem: "imperial", units: { displacement: "L", airflow: "m3h" } });
    expect(ok.status).toBe(200);
    expect(ok.data.units).toMatchObject({ displacement: "L", airflow: "m3h", pressure: "psi" });
    const [u] = await db.select().from(users).where(eq(users.id, userId));
    expect(u.unitChoices).toEqual({ displacement: "L", airflow: "m3h" });
    const bad = await me.json("/api/me", "PATCH", { unitSystem: "imperial", units: { pressure: "atm" } });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.data)).toMatch(/pressure/);
    expect((await me.json("/api/me", "PATCH", { unitSystem: "furlongs" })).status).toBe(400);
    expect((await me.json("/api/me")).data.units.displacement).toBe("L");
  });

  it("writes a date the same way on the list and in the history (de-DE browser)", async () => {
    const [row] = await db.select().from(combinations).where(eq(combinations.id, comboId));
    const want = dateTimeText(row.updatedAt, "de-DE");
    expect(want).toMatch(/^\d\d\.\d\d\.\d{4}, \d\d:\d\d UTC$/);
    await page.goto(`${BASE_URL}/combinations/${comboId}/revisions`);
    await page.getByText(want).first().waitFor();
    await page.goto(`${BASE_URL}/combinations`);
    await page.getByText(want).first().waitFor();
  });
});
