// @ts-nocheck
// The step editor as a person fills it in Chromium (shared by the lessons browser tests).
import type { Page } from "playwright-core";

export type Item = { combination: string; revision: string; label: string };

/** Fills one item of the "Add a step" form: its group is "Item N", its pickers name the revision's number, date and note. */
export async function fillItem(page: Page, i: number, it: Item) {
  const form = page.getByRole("form", { name: "Add a step" });
  if (i >= 2 && !(await form.getByRole("group", { name: `Item ${i + 1}` }).count())) await form.getByRole("button", { name: "Add an item" }).click();
  const group = form.getByRole("group", { name: `Item ${i + 1}` });
  const combination = group.getByLabel("Combination");
  const value = await combination.locator("option", { hasText: it.combination }).first().getAttribute("value");
  await combination.selectOption(value ?? "");
  await group.getByLabel("Saved revision").selectOption(it.revision);
  await group.getByLabel("Label in the chart").fill(it.label);
  return group;
}

/** Creates a lesson from the lessons page and returns its id once its editor has loaded. */
export async function createLessonInUi(page: Page, baseUrl: string, title: string) {
  await page.goto(`${baseUrl}/lessons`, { waitUntil: "networkidle" });
  await page.getByLabel("New lesson title").fill(title);
  await page.getByRole("button", { name: "Create lesson" }).click();
  await page.waitForURL(/\/lessons\/[0-9a-f-]{36}\/edit$/, { timeout: 30_000 });
  await page.waitForLoadState("networkidle");
  return new URL(page.url()).pathname.split("/")[2];
}
