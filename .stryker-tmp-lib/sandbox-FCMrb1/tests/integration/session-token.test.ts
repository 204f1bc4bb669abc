// @ts-nocheck
// The session cookie is opened once per process and remembered; these checks show the memory never
// lets through what a fresh decode would refuse (next-auth's own encode() makes the tokens).
import { encode } from "next-auth/jwt";
import { afterEach, describe, expect, it, vi } from "vitest";
import { tokenSubject } from "@/app/_lib/session-token";

const secret = "a-test-secret-of-reasonable-length-0123456789";

afterEach(() => vi.useRealTimers());

describe("tokenSubject", () => {
  it("opens a token and answers the same from memory", async () => {
    const token = await encode({ token: { sub: "user-1" }, secret, maxAge: 3600 });
    expect(await tokenSubject(token, secret)).toBe("user-1");
    expect(await tokenSubject(token, secret)).toBe("user-1");
  });

  it("refuses a remembered token under another secret (a rotated secret signs everyone out)", async () => {
    const token = await encode({ token: { sub: "user-2" }, secret, maxAge: 3600 });
    expect(await tokenSubject(token, secret)).toBe("user-2");
    expect(await tokenSubject(token, secret + "-rotated")).toBeNull();
  });

  it("refuses a remembered token once it has expired", async () => {
    const token = await encode({ token: { sub: "user-3" }, secret, maxAge: 60 });
    expect(await tokenSubject(token, secret)).toBe("user-3");
    vi.useFakeTimers({ now: Date.now() + 60_000 + 16_000, toFake: ["Date"] }); // past exp and next-auth's 15 s tolerance
    expect(await tokenSubject(token, secret)).toBeNull();
  });

  it("refuses an expired, a tampered and a malformed token", async () => {
    const expired = await encode({ token: { sub: "user-4" }, secret, maxAge: -60 });
    expect(await tokenSubject(expired, secret)).toBeNull();
    const good = await encode({ token: { sub: "user-5" }, secret, maxAge: 3600 });
    const parts = good.split(".");
    parts[3] = parts[3].slice(0, -2) + (parts[3].endsWith("AA") ? "BB" : "AA");
    expect(await tokenSubject(parts.join("."), secret)).toBeNull();
    expect(await tokenSubject("not-a-token", secret)).toBeNull();
  });

  it("refuses a token without a subject", async () => {
    const token = await encode({ token: { name: "no sub" }, secret, maxAge: 3600 });
    expect(await tokenSubject(token, secret)).toBeNull();
  });
});
