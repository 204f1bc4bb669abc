// @ts-nocheck
// Over https the session cookie must also be Secure (next-auth's __Secure- prefixed cookies).
import { afterEach, describe, expect, it, vi } from "vitest";

describe("auth options", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });

  it("uses secure cookies when the public URL is https", async () => {
    vi.stubEnv("DATABASE_URL", "postgres://unused@127.0.0.1:1/none");
    vi.stubEnv("AUTH_SECRET", "x".repeat(32));
    vi.stubEnv("NEXTAUTH_URL", "https://shop.example.com");
    const { authOptions } = await import("@/app/_lib/auth-options");
    expect(authOptions().useSecureCookies).toBe(true);
    expect(authOptions().session?.strategy).toBe("jwt");
  });

  it("does not ask for secure cookies on plain http (local use)", async () => {
    vi.stubEnv("DATABASE_URL", "postgres://unused@127.0.0.1:1/none");
    vi.stubEnv("AUTH_SECRET", "x".repeat(32));
    vi.stubEnv("NEXTAUTH_URL", "http://localhost:3000");
    const { authOptions } = await import("@/app/_lib/auth-options");
    expect(authOptions().useSecureCookies).toBe(false);
  });
});
