// @ts-nocheck
// Runs before page and API requests without a body, and before server actions (Next's proxy):
// refuses requests Next would otherwise answer with a 500 (a path that is not valid
// percent-encoding, a server action posted from another site or larger than Next accepts), and
// sets the per-request security headers on pages.
import { NextResponse, type NextRequest } from "next/server";
import { isCrossSiteBy } from "@/app/_lib/origin-rule";
import { contentSecurityPolicy, HSTS_VALUE, makeNonce, wantsHsts } from "@/app/_lib/security-headers";

/** Next's own limit for a server action's body (serverActions.bodySizeLimit, 1 MB by default). */
const ACTION_MAX_BYTES = 1024 * 1024;

function refuse(status: number, error: string) {
  return NextResponse.json({ error }, { status, headers: { "Cache-Control": "no-store" } });
}

export function proxy(req: NextRequest) {
  try {
    decodeURIComponent(req.nextUrl.pathname);
  } catch {
    return refuse(400, "The address is not valid: it has a stray or broken %-escape.");
  }
  if (req.method === "POST" && req.headers.has("next-action")) {
    if (isCrossSiteBy(req.method, req.headers, process.env.NEXTAUTH_URL, req.nextUrl.protocol)) {
      return refuse(403, "This request came from another site and was refused. Use the app's own pages.");
    }
    // Browsers always declare a form's length; without it the size could not be checked before reading.
    const length = req.headers.get("content-length");
    if (length === null) return refuse(411, "A form must be sent with its length (Content-Length).");
    if (Number(length) > ACTION_MAX_BYTES) return refuse(413, "The form is larger than 1 MB.");
  }
  // API answers get their fixed policy from next.config.ts.
  if (req.nextUrl.pathname.startsWith("/api/")) return NextResponse.next();
  const nonce = makeNonce();
  const csp = contentSecurityPolicy(nonce);
  const headers = new Headers(req.headers);
  headers.set("content-security-policy", csp);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set("Content-Security-Policy", csp);
  if (wantsHsts(process.env.HSTS, process.env.NEXTAUTH_URL, req.headers.get("x-forwarded-proto"))) res.headers.set("Strict-Transport-Security", HSTS_VALUE);
  return res;
}

// Static files carry no data and run no script of their own. Requests with a body pass through
// here only when they are server actions: Next reads the whole body of any request it hands to a
// proxy (to clone it) before the route's own streaming limit could stop it.
// (Next reads this object without running the file: the patterns must be written out.)
export const config = {
  matcher: [
    {
      source: "/((?!_next/static|_next/image|favicon.ico|icon.svg).*)",
      missing: [
        { type: "header", key: "content-length" },
        { type: "header", key: "transfer-encoding" },
      ],
    },
    { source: "/((?!_next/static|_next/image|favicon.ico|icon.svg).*)", has: [{ type: "header", key: "next-action" }] },
  ],
};
