// @ts-nocheck
import "server-only";
import { decode } from "next-auth/jwt";

// Opening the cookie (a key derivation, then AES-GCM) costs more than a small API request's own
// work, and a browser sends the same cookie every time, so each process remembers what recent
// cookies opened to. Only cookies that opened with the current secret are remembered, expiry is
// still checked on every use, and the user (with its session version) is still read from the
// database on every request.
const OPENED_MAX = 2_000;
const CLOCK_TOLERANCE_S = 15; // next-auth's own allowance in decode()

/** What a session cookie says: whose it is, and the account's session version when it was made. */
export type SessionClaims = { sub: string; sv: number };
const opened = new Map<string, { secret: string; claims: SessionClaims; exp: number }>();

/** The claims of a session token, or null when it is forged, expired or sealed with another secret. */
export async function tokenClaims(token: string, secret: string): Promise<SessionClaims | null> {
  const nowS = Date.now() / 1000;
  const hit = opened.get(token);
  if (hit && hit.secret === secret && nowS <= hit.exp + CLOCK_TOLERANCE_S) return hit.claims;
  if (hit) opened.delete(token);
  try {
    const payload = await decode({ token, secret });
    if (typeof payload?.sub !== "string") return null;
    // Cookies made before session versions existed carry none: they count as version 0.
    const claims = { sub: payload.sub, sv: typeof payload.sv === "number" ? payload.sv : 0 };
    if (typeof payload.exp === "number") {
      if (opened.size >= OPENED_MAX) opened.delete(opened.keys().next().value!);
      opened.set(token, { secret, claims, exp: payload.exp });
    }
    return claims;
  } catch {
    // Forged, expired or made with an old secret: treat as signed out.
    return null;
  }
}

/** The subject of a session token, or null (see tokenClaims). */
export async function tokenSubject(token: string, secret: string): Promise<string | null> {
  return (await tokenClaims(token, secret))?.sub ?? null;
}
