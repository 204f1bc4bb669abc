// @ts-nocheck
// Pure request rules: where to go after sign-in, which address a request came from, who may
// write, and when to send HSTS. Browsers' URL parsing per the WHATWG URL Standard (§ 4.4, which
// treats "\" as "/" in special schemes and strips tabs and newlines), checked with Node's URL.
import { afterEach, describe, expect, it, vi } from "vitest";
import fc from "fast-check";
import { DEFAULT_AFTER_SIGN_IN, safeCallback } from "@/app/_lib/safe-callback";
import { isCrossSiteBy } from "@/app/_lib/origin-rule";
import { wantsHsts } from "@/app/_lib/security-headers";

describe("safeCallback", () => {
  it.each(["/\\evil.example/phish", "/\tevil.example", "/\t/evil.example/phish", "//evil.example", "/\\/evil.example", "https://evil.example", "javascript:alert(1)", "/%5Cevil.example", " /combinations", "/\n/evil.example", ""])(
    "refuses %j",
    (url) => {
      expect(safeCallback(url)).toBe(DEFAULT_AFTER_SIGN_IN);
    },
  );

  it.each(["/.//evil.example/phish", "/././/evil.example", "/a/..//evil.example"])("refuses %j, whose dot segments fold into another host", (url) => {
    expect(safeCallback(url)).toBe("/combinations");
  });

  it.each(["/combinations", "/combinations/abc?tab=2#x", "/lessons/join?code=AB12", "/"])("keeps %j", (url) => {
    expect(safeCallback(url)).toBe(url);
  });

  it("whatever it returns, a browser resolves it to our own origin (property; WHATWG URL parsing via Node)", () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom("/", "\\", "\t", "\n", "e", ".", ":", "%", "5", "c", "?", "#", "@", " ") , maxLength: 24 }), (s) => {
        const out = safeCallback(s);
        expect(new URL(out, "https://shop.example").origin).toBe("https://shop.example");
      }),
      { numRuns: 2000 },
    );
  });
});

describe("isCrossSiteBy", () => {
  const h = (o: Record<string, string>) => new Headers({ host: "shop.example", ...o });
  it("lets reads through and writes from our own pages or non-browser clients", () => {
    expect(isCrossSiteBy("GET", h({ origin: "https://evil.example" }), "https://shop.example", "https:")).toBe(false);
    expect(isCrossSiteBy("POST", h({}), "https://shop.example", "https:")).toBe(false);
    expect(isCrossSiteBy("POST", h({ origin: "https://shop.example", "sec-fetch-site": "same-origin" }), "https://shop.example", "https:")).toBe(false);
  });
  it("refuses writes another site's page (or another port of this host) sends", () => {
    expect(isCrossSiteBy("POST", h({ origin: "https://evil.example" }), "https://shop.example", "https:")).toBe(true);
    expect(isCrossSiteBy("DELETE", h({ origin: "https://shop.example:8443" }), "https://shop.example", "https:")).toBe(true);
    expect(isCrossSiteBy("PUT", h({ "sec-fetch-site": "same-site" }), "https://shop.example", "https:")).toBe(true);
    expect(isCrossSiteBy("POST", h({ "sec-fetch-site": "cross-site" }), "https://shop.example", "https:")).toBe(true);
  });
});

describe("wantsHsts", () => {
  it("is on for https deployments by default, and can be forced either way", () => {
    expect(wantsHsts(undefined, "https://shop.example", null)).toBe(true);
    expect(wantsHsts("auto", "http://localhost:3000", "https")).toBe(true);
    expect(wantsHsts("auto", "http://localhost:3000", null)).toBe(false);
    expect(wantsHsts("off", "https://shop.example", "https")).toBe(false);
    expect(wantsHsts("on", "http://localhost:3000", null)).toBe(true);
  });
});

describe("clientAddress", () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.resetModules();
  });
  async function load(hops: string) {
    vi.stubEnv("DATABASE_URL", "postgres://unused@127.0.0.1:1/none");
    vi.stubEnv("TRUSTED_PROXY_HOPS", hops);
    vi.resetModules();
    const http = await import("node:http");
    const { stampPeerAddress, peerHeaderName } = await import("@/app/_lib/peer-stamp");
    stampPeerAddress(http.Server);
    const { clientAddress } = await import("@/app/_lib/client-address");
    return { clientAddress, name: peerHeaderName()! };
  }

  it("without trusted proxies: the socket address, whatever X-Forwarded-For says", async () => {
    const { clientAddress, name } = await load("0");
    expect(clientAddress(new Headers({ [name]: "192.0.2.10", "x-forwarded-for": "203.0.113.5" }))).toBe("192.0.2.10");
    // A client cannot send the stamp itself: its name is a per-process secret.
    expect(clientAddress(new Headers({ "x-pw-peer": "203.0.113.9" }))).toBe("unknown");
  });

  it("behind n trusted proxies: the entry the n-th appended; entries the client wrote are ignored", async () => {
    const one = await load("1");
    expect(one.clientAddress(new Headers({ [one.name]: "10.0.0.2", "x-forwarded-for": "203.0.113.5, 198.51.100.7" }))).toBe("198.51.100.7");
    const two = await load("2");
    expect(two.clientAddress(new Headers({ [two.name]: "10.0.0.2", "x-forwarded-for": "1.2.3.4, 198.51.100.7, 10.0.0.3" }))).toBe("198.51.100.7");
    expect(two.clientAddress(new Headers({ [two.name]: "10.0.0.2", "x-forwarded-for": "10.0.0.3" }))).toBe("10.0.0.2");
  });

  it("the stamp is the socket's address on a real server", async () => {
    const { clientAddress } = await load("0");
    const http = await import("node:http");
    const server = http.createServer((req, res) => res.end(clientAddress(req.headers as Record<string, unknown>)));
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    const port = (server.address() as { port: number }).port;
    const body = await new Promise<string>((resolve, reject) => {
      http.get({ host: "127.0.0.1", port, localAddress: "127.0.0.9", headers: { "x-forwarded-for": "203.0.113.5" } }, (res) => {
        let b = "";
        res.on("data", (c) => (b += c));
        res.on("end", () => resolve(b));
      }).on("error", reject);
    });
    server.close();
    expect(body).toBe("127.0.0.9");
  });
});
