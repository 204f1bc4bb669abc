// @ts-nocheck
import "server-only";
import crypto from "node:crypto";
import { authSecret, env } from "./env";

// Signed, expiring read-only links to one recommendation sheet: `<id>.<version>.<expiry>.<signature>`,
// the signature an HMAC-SHA256 over "<id>.<version>.<expiry>" with the share secret. The version
// is the sheet's share version: bumping it ("stop the links") revokes every link sent so far.
// The share secret is SHARE_SECRET (npm start makes and keeps one), so rotating the auth secret
// signs people out but leaves customers' links working; rotating SHARE_SECRET revokes all links.

/** How long an e-mailed link stays valid. */
export const SHARE_LINK_TTL_SECONDS = 30 * 24 * 3600;
/** How long the token lent to the server's own headless browser (PDF) stays valid. */
export const PRINT_TOKEN_TTL_SECONDS = 120;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export type ShareVerdict =
  | { ok: true; recommendationId: string; version: number; expiresAt: Date }
  | { ok: false; reason: "malformed" | "forged" | "expired" };

/** SHARE_SECRET, or (when unset) a key derived from the auth secret for this one purpose. */
function shareSecret(): string {
  return env().SHARE_SECRET ?? crypto.createHmac("sha256", authSecret()).update("pulleywright share links").digest("base64url");
}

function sign(payload: string, secret: string): string {
  return crypto.createHmac("sha256", secret).update(payload).digest("base64url");
}

/** A token for one sheet at one share version, valid until `expiresAt` (seconds kept, milliseconds dropped). */
export function signShareToken(recommendationId: string, version: number, expiresAt: Date, secret = shareSecret()): string {
  if (!UUID.test(recommendationId)) throw new Error("A share token needs a recommendation id (uuid).");
  if (!Number.isInteger(version) || version < 0) throw new Error("A share version is a whole number, 0 or more.");
  const exp = Math.floor(expiresAt.getTime() / 1000);
  const payload = `${recommendationId}.${version}.${exp}`;
  return `${payload}.${sign(payload, secret)}`;
}

/** A token valid for `ttlSeconds` from now. */
export function makeShareToken(recommendationId: string, version: number, ttlSeconds = SHARE_LINK_TTL_SECONDS, secret?: string) {
  const expiresAt = new Date(Date.now() + ttlSeconds * 1000);
  return { token: signShareToken(recommendationId, version, expiresAt, secret), expiresAt };
}

/** Checks the signature (constant-time) and then the expiry; never throws. The version is checked against the sheet by the caller. */
export function verifyShareToken(token: string, secret = shareSecret(), now = new Date()): ShareVerdict {
  const parts = typeof token === "string" ? token.split(".") : [];
  if (parts.length !== 4) return { ok: false, reason: "malformed" };
  const [id, versionText, expText, sig] = parts;
  if (!UUID.test(id) || !/^\d{1,9}$/.test(versionText) || !/^\d{1,12}$/.test(expText) || !/^[A-Za-z0-9_-]{43}$/.test(sig)) return { ok: false, reason: "malformed" };
  // Compared as text: decoding first would accept other spellings of the same bytes (the last
  // character of a 43-character base64url string carries two unused bits).
  const expected = Buffer.from(sign(`${id}.${versionText}.${expText}`, secret), "ascii");
  const given = Buffer.from(sig, "ascii");
  if (given.length !== expected.length || !crypto.timingSafeEqual(given, expected)) return { ok: false, reason: "forged" };
  const expiresAt = new Date(Number(expText) * 1000);
  if (expiresAt.getTime() <= now.getTime()) return { ok: false, reason: "expired" };
  return { ok: true, recommendationId: id, version: Number(versionText), expiresAt };
}
