// @ts-nocheck
// The reader's units beyond the planner, in Chromium: the recommendation sheet (with its e-mail
// preview), its print view, the customer's share page and the classroom show an imperial reader
// no metric unit and a metric reader no imperial one. Words people typed (notes, names, the
// shop's details) may say anything and are taken out before the scan; every figure the app
// writes must be in the reader's units. Which units each page uses:
// - sheet page and print view (signed in): the signed-in person's own (`loadForStaff`, personUnits);
// - share page: the `units` parameter of the link. The staff page's link (and the sent e-mail's)
//   carries the units of the person who shows (sends) it (`sentVersionLink`), so the customer
//   reads the sheet as the shop's person does; "Show in metric/imperial units" flips it;
// - classroom: the viewer's own (personUnits), whoever made the lesson.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { combinationSchema, type Combination, type CombinationInput } from "@/calc";
import { connect } from "@/db/connect";
import { createCombination } from "@/db/repo/combinations";
import { addStep, createLesson } from "@/db/repo/lessons";
import { createRecommendation, getRecommendation } from "@/db/repo/recommendations";
import { recordSentVersion } from "@/db/repo/sheet-versions";
import { getShopDetails, getShopTerms } from "@/db/repo/shop";
import { createMember, toActor } from "@/db/repo/users";
import { users, type Role } from "@/db/schema";
import { bigInchTwinScrew, workTruckV6 } from "@/lib/combinations/demo-specs";
import { BASE_URL, DEMO_PASSWORD, launchBrowser, signIn, watchErrors } from "../support/browser";
import { firstMatch, IMPERIAL, METRIC, readerText } from "../support/unit-words";

const { pool, db } = connect(process.env.DATABASE_URL!, 2);
const stamp = Date.now().toString(36);

type Preset = "imperial" | "metric";
const WRONG: Record<Preset, RegExp> = { imperial: METRIC, metric: IMPERIAL };

// Expected figures, worked out here from SI (NIST SP 811: 1 in = 0.0254 m, 1 ft = 0.3048 m, both
// exact) and shown with the app's display precision (two decimals for in, one for mm, none for ft, m).
// 0.072 m is below calc's 76 mm demo belt minimum, so the belt caution shows a length.
const PULLEY = 0.072;
const pulleyText: Record<Preset, string> = { imperial: "2.83 in", metric: "72.0 mm" }; // 0.072 / 0.0254 = 2.8346
const beltCaution: Record<Preset, string> = {
  imperial: "The 2.83 in blower pulley is below the 2.99 in", // 0.076 / 0.0254 = 2.9921
  metric: "The 72.0 mm blower pulley is below the 76.0 mm",
};
// Each kind's unit in each preset (calc/units.ts, UNIT_PRESETS).
const UNIT: Record<Preset, Record<"pressure" | "power" | "torque" | "temperature" | "blower", RegExp>> = {
  imperial: { pressure: /\d psi\b/, power: /\d hp\b/, torque: /\d lb·ft/, temperature: /\d °F/, blower: /\d in³\/rev/ },
  metric: { pressure: /\d kPa\b/, power: /\d kW\b/, torque: /\d N·m/, temperature: /\d °C/, blower: /\d L\/rev/ },
};

/** A fresh person of a role who can sign in, with a unit preset. */
async function person(role: Role, name: string) {
  const email = `units-pages-${role}-${stamp}@example.com`;
  const u = await createMember(db, { email, name, password: DEMO_PASSWORD });
  const [row] = await db.update(users).set({ role, emailVerifiedAt: new Date() }).where(eq(users.id, u.id)).returning();
  return { email, actor: toActor(row), setUnits: (unitSystem: Preset) => db.update(users).set({ unitSystem, unitChoices: {} }).where(eq(users.id, u.id)) };
}

const spec = (s: CombinationInput, pulley?: number): Combination => {
  const c = combinationSchema.parse(s);
  return pulley === undefined ? c : { ...c, drive: { ...c.drive, blowerPulleyDiameter: pulley } };
};

/** The shop's details as the sheet shows them: the admin's words, not the app's. */
async function shopWords(): Promise<string[]> {
  const shop = await getShopDetails(db);
  return [shop.name, shop.address, shop.phone, shop.email, shop.website];
}

/** A sheet's server-rendered figures are in; its chart has drawn. */
async function sheetReady(page: Page) {
  await page.getByTestId("recommendation-sheet").locator("canvas").waitFor({ timeout: 30_000 });
}

function expectOnly(text: string, system: Preset, kinds: (keyof (typeof UNIT)[Preset])[]) {
  expect(firstMatch(text, WRONG[system])).toBeNull();
  for (const k of kinds) expect(text, `${k} in ${system} units`).toMatch(UNIT[system][k]);
}

describe("the reader's units on the sheet, the share page and the classroom", () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await pool.end();
  });

  describe("recommendation sheet, print view and share page", () => {
    let staff: Awaited<ReturnType<typeof person>>;
    let context: BrowserContext;
    let page: Page;
    let errors: string[];
    let sheetId = "";
    // What people typed, in both systems' words on purpose: the scan must not read them.
    const typed = {
      combination: `Units sheet wagon ${stamp}`,
      customer: "Units Sheet Customer",
      title: "A smaller pulley for the units wagon",
      vehicle: "Owner says: 2.5 in exhaust, 76 mm intake spacer, ran 8 psi (0.55 bar) on the old setup.",
      notes: "Fit on a 1,000 m test loop; keep 3 ft of spare hose.",
      part: "Belt for a 3 in pulley, 1.2 m long, 120 hp rated",
    };

    beforeAll(async () => {
      staff = await person("tuner", "Units Sheet Tuner");
      const combo = await createCombination(db, staff.actor, { name: typed.combination, spec: spec(workTruckV6), note: "Units pages e2e" });
      const rec = await createRecommendation(db, staff.actor, {
        combinationId: combo.id,
        title: typed.title,
        customerName: typed.customer,
        customerEmail: `units-pages-customer-${stamp}@example.com`,
        vehicleNotes: typed.vehicle,
        notes: typed.notes,
        blowerPulleyDiameter: PULLEY,
        targetRpm: 4500,
        parts: [{ description: typed.part, unitPrice: "19.99", quantity: 1 }],
      });
      sheetId = rec.id;
      // Sent (frozen) without an e-mail: the sheet page then shows the customer's link.
      await recordSentVersion(db, staff.actor, await getRecommendation(db, staff.actor, rec.id), (await getShopTerms(db)).currency);
      context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
      page = await signIn(context, staff.email);
      errors = watchErrors(page);
    });
    afterAll(async () => {
      await context?.close();
    });

    const words = async () => [...Object.values(typed), ...(await shopWords())];

    it.each<Preset>(["imperial", "metric"])("the sheet page and its e-mail preview speak only %s units", async (system) => {
      await staff.setUnits(system);
      await page.goto(`${BASE_URL}/recommendations/${sheetId}`);
      await sheetReady(page);
      await page.getByRole("button", { name: "Preview the e-mail" }).click();
      await page.getByTestId("email-preview").waitFor({ timeout: 30_000 });
      const text = await readerText(page, await words());
      expectOnly(text, system, ["pressure", "power", "torque", "temperature", "blower"]);
      expect(text).toContain(`Recommended blower pulley: ${pulleyText[system]}`); // the e-mail
      await expect(page.getByTestId("recommended-pulley").textContent()).resolves.toBe(pulleyText[system]);
      expect(text).toContain(beltCaution[system]);
      expect(errors).toEqual([]);
    });

    it.each<Preset>(["imperial", "metric"])("the print view speaks only %s units", async (system) => {
      await staff.setUnits(system);
      const print = await context.newPage();
      const printErrors = watchErrors(print);
      await print.goto(`${BASE_URL}/recommendations/${sheetId}/print`);
      await sheetReady(print);
      const text = await readerText(print, await words());
      expectOnly(text, system, ["pressure", "power", "torque", "temperature", "blower"]);
      expect(text).toContain(beltCaution[system]);
      expect(printErrors).toEqual([]);
      await print.close();
    });

    it.each<Preset>(["imperial", "metric"])("the customer's link shown to someone with %s units opens the share page in those units", async (system) => {
      await staff.setUnits(system);
      await page.goto(`${BASE_URL}/recommendations/${sheetId}`);
      const link = new URL(await page.getByLabel(/The customer's link/).inputValue());
      expect(link.searchParams.get("units")).toBe(system);
      const stranger = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
      const shared = await stranger.newPage();
      const sharedErrors = watchErrors(shared);
      await shared.goto(`${BASE_URL}${link.pathname}${link.search}`);
      await sheetReady(shared);
      const text = await readerText(shared, await words());
      expectOnly(text, system, ["pressure", "power", "torque", "temperature", "blower"]);
      expect(text).toContain(beltCaution[system]);
      // The page's own switch to the other system turns every figure over.
      const other: Preset = system === "imperial" ? "metric" : "imperial";
      await shared.getByRole("link", { name: `Show in ${other} units` }).click();
      await shared.waitForURL(new RegExp(`units=${other}`));
      await sheetReady(shared);
      const flipped = await readerText(shared, await words());
      expectOnly(flipped, other, ["pressure", "power", "torque", "temperature", "blower"]);
      expect(flipped).toContain(beltCaution[other]);
      expect(sharedErrors).toEqual([]);
      await stranger.close();
    });
  });

  describe("classroom", () => {
    let teacher: Awaited<ReturnType<typeof person>>;
    let context: BrowserContext;
    let page: Page;
    let errors: string[];
    let lessonId = "";
    // What people typed; the step title and the combinations' names use unit words on purpose.
    const typed = {
      lesson: `Units classroom ${stamp}`,
      owner: "Units Lesson Teacher",
      step: "Sea level against 1,600 m up, and a 3.5 in pulley",
      truckName: `Units truck 4.3 L ${stamp}`,
      eightName: `Units eight 7.4 L, 450 hp ${stamp}`,
      smallName: `Units eight, 0.3 L blower ${stamp}`,
      truck: "Truck",
      eight: "Eight",
      small: "Small",
      slowStep: "A blower driven far too slowly",
    };
    // Only the {…} figures of the note are the app's; its own words carry no unit word.
    const note = "Boost {boost@4500}, power {power@peak}, torque {torque@redline#3}, charge {charge@peak}, blower {blower@peak}.";
    // 1,600 m = 5,249 ft (1600 / 0.3048 = 5249.3); 0.09 m = 3.54 in (0.09 / 0.0254 = 3.543).
    // (The items' labels are typed words and taken out before the scan: what is left is the app's.)
    const changes: Record<Preset, string[]> = { imperial: ["— at 5,249 ft", "— blower pulley 3.54 in"], metric: ["— at 1,600 m", "— blower pulley 90.0 mm"] };

    beforeAll(async () => {
      teacher = await person("instructor", typed.owner);
      const truck = await createCombination(db, teacher.actor, { name: typed.truckName, spec: spec(workTruckV6, PULLEY), note: "Units pages e2e" });
      const eight = await createCombination(db, teacher.actor, { name: typed.eightName, spec: spec(bigInchTwinScrew), note: "Units pages e2e" });
      const lesson = await createLesson(db, teacher.actor, { title: typed.lesson });
      lessonId = lesson.id;
      await addStep(db, teacher.actor, lessonId, {
        title: typed.step,
        items: [
          { combinationId: truck.id, revision: "current", label: typed.truck, change: { kind: "altitude", altitude: 1600 } },
          { combinationId: eight.id, revision: "current", label: typed.eight, change: { kind: "pulley", diameter: 0.09 } },
        ],
        series: ["boost", "netPower", "torque", "chargeTemperature"],
        note,
      });
      // Step 2: a 7.4 L under a 0.3 L/rev blower, with the largest blower pulley a what-if takes
      // (0.5 m, calc's pulleyDiameterSchema): the model cannot balance it and says why.
      const small = await createCombination(db, teacher.actor, { name: typed.smallName, spec: spec({ ...bigInchTwinScrew, blower: { ...bigInchTwinScrew.blower, displacementPerRev: 0.0003 } }), note: "Units pages e2e" });
      await addStep(db, teacher.actor, lessonId, {
        title: typed.slowStep,
        items: [
          { combinationId: small.id, revision: "current", label: typed.small, change: { kind: "pulley", diameter: 0.5 } },
          { combinationId: truck.id, revision: "current", label: typed.truck },
        ],
        series: ["boost", "netPower"],
      });
      context = await browser.newContext({ viewport: { width: 1600, height: 1000 } });
      page = await signIn(context, teacher.email);
      errors = watchErrors(page);
    });
    afterAll(async () => {
      await context?.close();
    });

    it.each<Preset>(["imperial", "metric"])("someone with %s units sees only those, the what-if slider included", async (system) => {
      await teacher.setUnits(system);
      await page.goto(`${BASE_URL}/classroom/${lessonId}`, { waitUntil: "networkidle" });
      await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });
      const text = await readerText(page, Object.values(typed));
      expectOnly(text, system, ["pressure", "power", "torque", "temperature"]);
      for (const label of changes[system]) expect(text).toContain(label);
      expect(text).toContain(beltCaution[system]);
      // Every live figure of the note was filled (none left as a code span).
      await expect(page.locator(".lesson-note code").count()).resolves.toBe(0);
      await expect(page.locator(".lesson-note").textContent()).resolves.toMatch(
        system === "imperial" ? /^Boost [\d.]+ psi, power [\d,]+ hp, torque [\d,]+ lb·ft, charge [\d,]+ °F, blower [\d,]+ rpm\.$/ : /^Boost [\d.]+ kPa, power [\d,.]+ kW, torque [\d,]+ N·m, charge [\d,]+ °C, blower [\d,]+ rpm\.$/,
      );

      // The live what-if: one blower pulley for every item, moved with the keys.
      await page.getByLabel("Blower pulley for all").check();
      const slider = page.getByRole("slider", { name: /Blower pulley diameter/ });
      await slider.focus();
      await page.keyboard.press("ArrowRight");
      await expect.poll(() => page.getByText(system === "imperial" ? /^\d\.\d\d in$/ : /^\d+\.\d mm$/).count()).toBe(1);
      const moved = await readerText(page, Object.values(typed));
      expect(firstMatch(moved, WRONG[system])).toBeNull();
      expect(moved).toContain(`Blower pulley diameter (${system === "imperial" ? "in" : "mm"})`);
      expect(errors).toEqual([]);
    });

    it.each<Preset>(["imperial", "metric"])("someone with %s units reads why the model has no answer in those units too", async (system) => {
      await teacher.setUnits(system);
      await page.goto(`${BASE_URL}/classroom/${lessonId}?step=2`, { waitUntil: "networkidle" });
      await page.locator("[data-keys=on]").waitFor({ timeout: 30_000 });
      const text = await readerText(page, Object.values(typed));
      expect(firstMatch(text, WRONG[system])).toBeNull();
      const alert = page.getByRole("alert").filter({ hasText: "the model has no answer" });
      await expect(alert.textContent()).resolves.toMatch(system === "imperial" ? /cannot feed the engine: .* below [\d.]+ psi absolute/ : /cannot feed the engine: .* below [\d.]+ kPa absolute/);
      // 0.5 m = 19.69 in (0.5 / 0.0254 = 19.685).
      expect(text).toContain(system === "imperial" ? "— blower pulley 19.69 in" : "— blower pulley 500.0 mm");
      expect(errors).toEqual([]);
    });
  });
});
