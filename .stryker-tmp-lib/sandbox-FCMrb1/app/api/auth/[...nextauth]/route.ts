// @ts-nocheck
import NextAuth from "next-auth";
import { NextRequest, NextResponse } from "next/server";
import { authOptions } from "@/app/_lib/auth-options";
import { PayloadTooLarge, readBodyCapped } from "@/app/_lib/body-limit";

type Ctx = { params: Promise<{ nextauth: string[] }> };

/** Sign-in, sign-out and CSRF posts are a few hundred bytes; more is refused while it streams. */
const MAX_AUTH_BODY_BYTES = 16 * 1024;

async function handler(req: NextRequest, ctx: Ctx) {
  if (req.method === "POST") {
    try {
      const body = await readBodyCapped(req, MAX_AUTH_BODY_BYTES);
      req = new NextRequest(req.url, { method: req.method, headers: req.headers, body: body.length ? new Uint8Array(body) : undefined });
    } catch (e) {
      if (e instanceof PayloadTooLarge) return NextResponse.json({ error: e.message }, { status: 413 });
      throw e;
    }
  }
  return NextAuth(authOptions())(req, ctx);
}

export { handler as GET, handler as POST };
