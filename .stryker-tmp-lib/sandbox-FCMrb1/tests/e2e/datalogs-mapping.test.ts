// @ts-nocheck
// The upload's column mapping in Chromium: a semicolon, decimal-comma log with German headings is
// mapped from its values and headings (time, engine speed, boost in bar, intake air in °C with the
// guess shown), and a column picked twice is marked beside the later field, naming both.
import { eq } from "drizzle-orm";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { connect } from "@/db/connect";
import { createCombination } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { users } from "@/db/schema";
import { workTruckV6SmallerPulley } from "@/lib/combinations/demo-specs";
import { BASE_URL, launchBrowser, signIn, watchErrors } from "../support/browser";

const { pool, db } = connect(process.env.DATABASE_URL!, 2);

/** An invented pull at 20 Hz: engine speed rising, boost (bar gauge) rising with noise, intake air about 31 °C. */
function germanLog(rows = 80): string {
  const lines = ["Zeit;Drehzahl;Ladedruck;Ansauglufttemperatur"];
  for (let i = 0; i < rows; i++) {
    const fields = [(i * 0.05).toFixed(2), String(1800 + i * 50 + (i % 4) * 6), (0.15 + (0.55 * i) / rows + [0, 0.02, -0.01, 0.015][i % 4]).toFixed(3), (30 + (i % 5) * 0.4).toFixed(1)];
    lines.push(fields.map((f) => f.replace(".", ",")).join(";"));
  }
  return lines.join("\n") + "\n";
}

afterAll(async () => {
  await pool.end();
});

describe("the column mapping", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it("guesses a German semicolon log right, shows the temperature guess, and marks a clash beside the later field", async () => {
    const [u] = await db.select().from(users).where(eq(users.email, "tuner@example.com"));
    const combo = await createCombination(db, toActor(u), { name: `Mapping e2e ${Date.now()}`, spec: workTruckV6SmallerPulley });
    const context = await browser.newContext();
    const page = await signIn(context, "tuner@example.com");
    const errors = watchErrors(page);
    await page.goto(`${BASE_URL}/datalogs/new?combination=${combo.id}`, { waitUntil: "networkidle" });
    await page.locator("input[type=file]").setInputFiles({ name: "zug.csv", mimeType: "text/csv", buffer: Buffer.from(germanLog()) });

    const rpm = page.locator("#col-rpm");
    await rpm.waitFor();
    expect(await page.locator("#delimiter").inputValue()).toBe(";");
    expect(await page.getByLabel("Decimal commas (5,25)").isChecked()).toBe(true);
    expect(await page.locator("#col-time").inputValue()).toBe("0");
    expect(await rpm.inputValue()).toBe("1");
    expect(await page.locator("#col-pressure").inputValue()).toBe("2");
    expect(await page.locator("#pressure-unit").inputValue()).toBe("bar");
    expect(await page.locator("#pressure-kind").inputValue()).toBe("gauge");
    expect(await page.locator("#col-iat").inputValue()).toBe("3");
    const tempUnit = page.locator("#temperature-unit");
    expect(await tempUnit.inputValue()).toBe("C");
    // The temperature guess is shown and tied to its field, and can be changed (to kelvin here and back).
    const noteId = await tempUnit.getAttribute("aria-describedby");
    expect(noteId).toBe("temperature-unit-note");
    await expect(page.locator(`#${noteId}`).textContent()).resolves.toMatch(/Guessed from the values \(median 30\.\d\): °C/);
    expect(await tempUnit.locator("option").allTextContents()).toEqual(["°F", "°C", "K"]);
    await tempUnit.selectOption("K");
    await expect.poll(() => page.getByRole("list", { name: "Line errors" }).locator("li").first().textContent()).toMatch(/intake air temperature 30 K is outside/);
    await tempUnit.selectOption("C");

    // Time on engine speed's column: the error stands beside the time field and names both.
    const time = page.locator("#col-time");
    await time.selectOption("1");
    await expect.poll(() => time.getAttribute("aria-invalid")).toBe("true");
    expect(await time.getAttribute("aria-describedby")).toBe("col-time-error");
    expect(await page.locator("#col-time-error").textContent()).toBe("Column 2 is already used for engine speed; pick another column for time");
    expect(await rpm.getAttribute("aria-invalid")).toBeNull();
    const upload = page.getByRole("button", { name: "Upload log" });
    expect(await upload.isDisabled()).toBe(true);

    await time.selectOption("0");
    await expect.poll(() => time.getAttribute("aria-invalid")).toBeNull();
    expect(await page.locator("#col-time-error").count()).toBe(0);
    await expect.poll(() => page.getByRole("status").filter({ hasText: "data rows" }).textContent()).toBe("80 data rows; 80 read; 0 with errors.");
    expect(await upload.isDisabled()).toBe(false);
    await upload.click();
    await page.waitForURL(/\/datalogs\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    expect(errors).toEqual([]);
    await context.close();
  });
});
