// @ts-nocheck
// Signed share links: HMAC-SHA256 over id, share version and expiry. A link opens its one sheet
// until it expires or the shop stops the sheet's links; a changed id, version, expiry or
// signature, or another secret, opens nothing.
import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exampleCombination } from "@/calc";
import { makeShareToken, signShareToken, verifyShareToken } from "@/app/_lib/share-link";
import { ForbiddenError, NotFoundError } from "@/lib/errors";
import { createCombination } from "@/db/repo/combinations";
import { createRecommendation, getSharedRecommendation, revokeShareLinks } from "@/db/repo/recommendations";
import { freshDatabase, makeUser, type TestDb } from "../support/db";

const SECRET = "test-share-secret-0123456789abcdef";
const id = "0b6c7a3e-2f4d-4c1a-9a57-5f2e8d1c0b9a";
const other = "7d2e1f0a-3b4c-4d5e-8f60-718293a4b5c6";

describe("share tokens", () => {
  it("a fresh token verifies and names its sheet and expiry", () => {
    const { token, expiresAt } = makeShareToken(id, 0, 3600, SECRET);
    const v = verifyShareToken(token, SECRET);
    expect(v).toEqual({ ok: true, recommendationId: id, version: 0, expiresAt: new Date(Math.floor(expiresAt.getTime() / 1000) * 1000) });
  });

  it("the signature is HMAC-SHA256 of '<id>.<version>.<expiry>' (RFC 2104, computed independently here)", () => {
    const exp = new Date("2031-01-02T03:04:05Z");
    const token = signShareToken(id, 3, exp, SECRET);
    // source: RFC 2104 HMAC via node:crypto, base64url (RFC 4648 §5).
    const mac = crypto.createHmac("sha256", SECRET).update(`${id}.3.${Math.floor(exp.getTime() / 1000)}`).digest("base64url");
    expect(token).toBe(`${id}.3.${Math.floor(exp.getTime() / 1000)}.${mac}`);
  });

  it("an expired token is refused as expired, even with a good signature", () => {
    const token = signShareToken(id, 0, new Date(Date.now() - 1000), SECRET);
    expect(verifyShareToken(token, SECRET)).toEqual({ ok: false, reason: "expired" });
    const later = signShareToken(id, 0, new Date("2030-01-01T00:00:00Z"), SECRET);
    expect(verifyShareToken(later, SECRET, new Date("2030-01-01T00:00:01Z"))).toEqual({ ok: false, reason: "expired" });
    expect(verifyShareToken(later, SECRET, new Date("2029-12-31T23:59:59Z")).ok).toBe(true);
  });

  it("a token moved to another sheet or version, stretched in time, re-signed with another secret or mangled is refused", () => {
    const token = signShareToken(id, 0, new Date(Date.now() + 86_400_000), SECRET);
    const [, ver, exp, sig] = token.split(".");
    expect(verifyShareToken(`${other}.${ver}.${exp}.${sig}`, SECRET)).toEqual({ ok: false, reason: "forged" });
    expect(verifyShareToken(`${id}.1.${exp}.${sig}`, SECRET)).toEqual({ ok: false, reason: "forged" });
    expect(verifyShareToken(`${id}.${ver}.${Number(exp) + 86_400 * 365}.${sig}`, SECRET)).toEqual({ ok: false, reason: "forged" });
    expect(verifyShareToken(signShareToken(id, 0, new Date(Date.now() + 1000_000), "another-secret-0123456789abcdef"), SECRET)).toEqual({ ok: false, reason: "forged" });
    const flipped = sig.slice(0, -2) + (sig.at(-2) === "A" ? "B" : "A") + sig.at(-1);
    expect(verifyShareToken(`${id}.${ver}.${exp}.${flipped}`, SECRET)).toEqual({ ok: false, reason: "forged" });
    // Another spelling of the same bytes: the last character's two unused bits flipped (RFC 4648 §3.5).
    const last = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_".indexOf(sig.at(-1)!);
    const respelled = sig.slice(0, -1) + "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_"[last ^ 1];
    expect(Buffer.from(respelled, "base64url")).toEqual(Buffer.from(sig, "base64url"));
    expect(verifyShareToken(`${id}.${ver}.${exp}.${respelled}`, SECRET)).toEqual({ ok: false, reason: "forged" });
    for (const bad of ["", "abc", `${id}.${exp}.${sig}`, `${id}.${ver}.${exp}.${sig}.x`, `not-a-uuid.${ver}.${exp}.${sig}`, `${id}.${ver}.soon.${sig}`, `${id}.-1.${exp}.${sig}`, `${id}.${ver}.${exp}.${sig.slice(1)}`]) {
      expect(verifyShareToken(bad, SECRET), bad).toEqual({ ok: false, reason: "malformed" });
    }
  });

  describe("with the database", () => {
    let t: TestDb;
    beforeAll(async () => {
      t = await freshDatabase();
    });
    afterAll(async () => {
      await t?.drop();
    });

    it("a verified token opens exactly its own sheet; a vanished sheet is a 404, not another one", async () => {
      const sales = await makeUser(t.db, "sales");
      const combo = await createCombination(t.db, sales, { name: "Share test", spec: exampleCombination() });
      const a = await createRecommendation(t.db, sales, { combinationId: combo.id, customerName: "Customer A", blowerPulleyDiameter: 0.08 });
      const b = await createRecommendation(t.db, sales, { combinationId: combo.id, customerName: "Customer B", blowerPulleyDiameter: 0.075 });
      const v = verifyShareToken(makeShareToken(a.id, 0, 60, SECRET).token, SECRET);
      if (!v.ok) throw new Error("token should verify");
      const seen = await getSharedRecommendation(t.db, v);
      expect(seen.id).toBe(a.id);
      expect(seen.customerName).toBe("Customer A");
      expect(seen.id).not.toBe(b.id);
      await expect(getSharedRecommendation(t.db, { recommendationId: other })).rejects.toBeInstanceOf(NotFoundError);
    });

    it("stopping a sheet's links moves its share version on: links sent before no longer match it", async () => {
      const sales = await makeUser(t.db, "sales");
      const combo = await createCombination(t.db, sales, { name: "Revoke test", spec: exampleCombination() });
      const rec = await createRecommendation(t.db, sales, { combinationId: combo.id, customerName: "Customer R", blowerPulleyDiameter: 0.08 });
      const sent = verifyShareToken(makeShareToken(rec.id, rec.shareVersion, 60, SECRET).token, SECRET);
      if (!sent.ok) throw new Error("token should verify");
      expect((await getSharedRecommendation(t.db, sent)).shareVersion).toBe(sent.version);
      expect(await revokeShareLinks(t.db, sales, rec.id)).toEqual({ shareVersion: sent.version + 1 });
      expect((await getSharedRecommendation(t.db, sent)).shareVersion).not.toBe(sent.version);
      // Only staff who may work on the sheet can stop its links.
      await expect(revokeShareLinks(t.db, await makeUser(t.db, "member"), rec.id)).rejects.toBeInstanceOf(ForbiddenError);
    });
  });
});
