// @ts-nocheck
// Security headers on every response, and the session cookie's flags.
import { describe, expect, it } from "vitest";
import { Client } from "../support/http";

describe("security headers", () => {
  it.each(["/", "/sign-in", "/api/health"])("%s carries the policy headers", async (path) => {
    const res = await new Client().fetch(path);
    const csp = res.headers.get("content-security-policy") ?? "";
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("x-frame-options")).toBe("DENY");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });
});

describe("session cookie", () => {
  it("is httpOnly, SameSite=Lax and scoped to the whole site", async () => {
    const c = new Client();
    const csrf = (await (await c.fetch("/api/auth/csrf")).json()) as { csrfToken: string };
    const res = await c.fetch("/api/auth/callback/password", {
      method: "POST",
      headers: { "content-type": "application/x-www-form-urlencoded" },
      body: new URLSearchParams({ csrfToken: csrf.csrfToken, email: "member@example.com", password: "pulleywright-demo", json: "true" }),
    });
    const session = res.headers.getSetCookie().find((s) => /session-token=/.test(s));
    expect(session, "a session cookie is set").toBeTruthy();
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
    expect(session).toMatch(/Path=\//);
  });

  it("refuses a wrong password without setting a session", async () => {
    const c = new Client();
    expect(await c.signIn("member@example.com", "not-the-password")).toBe(false);
    expect((await c.json("/api/combinations")).status).toBe(401);
  });
});

describe("stored text renders as text", () => {
  it("markup saved as a name shows literally and runs nothing, in the list and the planner", async () => {
    const { exampleCombination } = await import("@/calc");
    const { signedIn } = await import("../support/http");
    const { launchBrowser, signIn, BASE_URL } = await import("../support/browser");
    const hostile = `<img src=x onerror="window.__pwned=1">"'; DROP TABLE combinations; --`;
    const member = await signedIn("member@example.com");
    const created = await member.json("/api/combinations", "POST", { name: hostile, spec: exampleCombination() });
    expect(created.status).toBe(201);
    const id = created.data.id;
    const browser = await launchBrowser();
    try {
      const context = await browser.newContext();
      const page = await signIn(context, "member@example.com");
      let dialog = false;
      page.on("dialog", async (d) => {
        dialog = true;
        await d.dismiss();
      });
      for (const path of ["/combinations", `/combinations/${id}`, `/combinations/${id}/revisions`]) {
        await page.goto(BASE_URL + path, { waitUntil: "networkidle" });
        await page.getByText(hostile, { exact: false }).first().waitFor({ timeout: 15_000 });
        expect(await page.evaluate(() => (window as unknown as { __pwned?: number }).__pwned)).toBeUndefined();
        expect(await page.locator('img[src="x"]').count()).toBe(0);
      }
      expect(dialog).toBe(false);
    } finally {
      await browser.close();
      await member.json(`/api/combinations/${id}`, "DELETE");
    }
  });
});
