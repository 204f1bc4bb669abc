// @ts-nocheck
// Debian's Chromium driven by playwright-core (no browser download).
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { CHROMIUM_ARGS } from "../../app/_lib/chromium-args";

export const BASE_URL = process.env.PW_BASE_URL ?? "http://127.0.0.1:3000";

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: CHROMIUM_ARGS,
  });
}

/** Console errors and failed page loads collected for a page, to assert there are none. */
export function watchErrors(page: Page) {
  const errors: string[] = [];
  page.on("console", (m) => {
    if (m.type() === "error") errors.push(`${m.text()} (${m.location().url})`);
  });
  page.on("pageerror", (e) => errors.push(String(e)));
  page.on("response", (r) => {
    if (r.status() >= 400) errors.push(`${r.status()} ${r.url()}`);
  });
  return errors;
}

export const DEMO_PASSWORD = "pulleywright-demo";

/** Signs in through the real sign-in form. */
export async function signIn(context: BrowserContext, email: string, password = DEMO_PASSWORD): Promise<Page> {
  const page = await context.newPage();
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"), { timeout: 30_000 });
  return page;
}
