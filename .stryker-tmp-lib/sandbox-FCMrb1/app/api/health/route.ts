// @ts-nocheck
import { NextResponse } from "next/server";

// A trivial route: the readiness probe of the start and test scripts, and the baseline of the HTTP benchmark.
export const dynamic = "force-dynamic";

export function GET() {
  return NextResponse.json({ ok: true });
}
