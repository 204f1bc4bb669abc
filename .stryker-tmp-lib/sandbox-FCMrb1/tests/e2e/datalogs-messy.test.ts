// @ts-nocheck
// Datalogs with messy files in Chromium and over HTTP: a file dropped on the drop zone, two
// unreadable cells ("n/a", "ERR") skipped by choice and listed by line on the log page, the
// API's skipUnreadable answer, and the calibrate page's log picker (residuals, what changed,
// the next pulley).
import path from "node:path";
import { readFileSync } from "node:fs";
import { eq } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { connect } from "@/db/connect";
import { createCombination } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { users } from "@/db/schema";
import { DEMO_DATALOG_MAPPING } from "@/db/seed/datalogs";
import { workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";
import { signedIn } from "../support/http";

const SAMPLE = readFileSync(path.join(import.meta.dirname, "../../public/samples/demo-datalog.csv"), "utf8");
const { pool, db } = connect(process.env.DATABASE_URL!, 2);

/** The demo log with two unreadable cells, on file lines 11 and 21. */
function messy(): string {
  const lines = SAMPLE.split("\n");
  lines[10] = lines[10].replace(/^([^,]*),[^,]*/, "$1,n/a");
  lines[20] = lines[20].split(",").map((c, i) => (i === 3 ? "ERR" : c)).join(",");
  return lines.join("\n");
}

async function freshCombination(email: string) {
  const [u] = await db.select().from(users).where(eq(users.email, email));
  return createCombination(db, toActor(u), { name: `Messy e2e ${Date.now()}`, spec: workTruckV6SmallerPulley });
}

afterAll(async () => {
  await pool.end();
});

describe("messy logs", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("the upload API keeps the readable rows with skipUnreadable and lists the skipped lines", async () => {
    const combo = await freshCombination("member@example.com");
    const member = await signedIn("member@example.com");
    const body = { combinationId: combo.id, name: "messy", fileName: "messy.csv", text: messy(), mapping: DEMO_DATALOG_MAPPING };
    const refused = await member.json("/api/datalogs", "POST", body);
    expect(refused.status).toBe(400);
    const kept = await member.json("/api/datalogs", "POST", { ...body, skipUnreadable: true });
    expect(kept.status).toBe(201);
    const rows = SAMPLE.trim().split("\n").length - 1;
    expect(kept.data.pointCount).toBe(rows - 2);
    expect(kept.data.skipped).toEqual([
      { line: 11, reason: "engine speed 'n/a' is not a number" },
      { line: 21, reason: "manifold pressure 'ERR' is not a number" },
    ]);
    expect((await member.json("/api/datalogs", "POST", { ...body, skipUnreadable: "yes" })).status).toBe(400);
  });

  it("a dropped file, skipped lines by choice, the log page lists them, and the calibrate page's picker", async () => {
    const combo = await freshCombination("tuner@example.com");
    const context = await browser.newContext();
    const page = await signIn(context, "tuner@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/datalogs/new?combination=${combo.id}`, { waitUntil: "networkidle" });
    const drop = page.getByTestId("log-drop-zone");
    await expect(drop.textContent()).resolves.toContain("or drop it here");
    const dt = await page.evaluateHandle((text) => {
      const d = new DataTransfer();
      d.items.add(new File([text], "messy.csv", { type: "text/csv" }));
      return d;
    }, messy());
    await drop.dispatchEvent("drop", { dataTransfer: dt });
    await expect.poll(() => drop.textContent()).toContain("messy.csv");
    await page.getByLabel("Intake air temperature (optional)", { exact: true }).selectOption(String(DEMO_DATALOG_MAPPING.intakeTemperature));
    const upload = page.getByRole("button", { name: "Upload log" });
    await page.getByRole("list", { name: "Line errors" }).locator("li").first().waitFor();
    expect(await upload.isDisabled()).toBe(true);
    await page.getByLabel("Skip unreadable lines").check();
    expect(await upload.isDisabled()).toBe(false);
    await upload.click();
    await page.waitForURL(/\/datalogs\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    const skipped = page.getByRole("list", { name: "Skipped lines" }).locator("li");
    await skipped.first().waitFor();
    expect(await skipped.allTextContents()).toEqual(["line 11: engine speed 'n/a' is not a number", "line 21: manifold pressure 'ERR' is not a number"]);

    await page.getByRole("link", { name: "Calibrate the engine from this log" }).click();
    await page.waitForURL(/\/calibrate\?/);
    const picker = page.getByTestId("runs-calibration");
    await picker.waitFor();
    expect(await picker.getByRole("checkbox").count()).toBe(1);
    await expect(page.getByTestId("fitted-changes").textContent()).resolves.toMatch(/Engine VE at .* → /);
    expect(await page.getByRole("table", { name: "Residuals before and after the fit" }).locator("tbody tr").count()).toBeGreaterThan(5);
    await expect(page.getByTestId("next-pulley").textContent()).resolves.toMatch(/^Next pulley/);
    expect(errors).toEqual([]);
    await context.close();
  });
});
