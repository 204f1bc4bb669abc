import { NextResponse } from "next/server";
import { z } from "zod";
import { route, parseQuery } from "@/app/_lib/http";
import { appUrl } from "@/app/_lib/mail";
import { renderPdf } from "@/app/_lib/pdf";
import { getCurrentUser, requireActor } from "@/app/_lib/session";
import { makeShareToken, PRINT_TOKEN_TTL_SECONDS } from "@/app/_lib/share-link";
import { getDb } from "@/db/client";
import { getRecommendation } from "@/db/repo/recommendations";

type Ctx = { params: Promise<{ id: string }> };
const querySchema = z.object({ paper: z.enum(["a4", "letter"], { error: "paper must be a4 or letter." }).optional() });

/**
 * The sheet as a one-page PDF, printed by Chromium on the server from the print page. The
 * headless browser gets a two-minute signed token for this one sheet, never the user's cookie.
 */
export const GET = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const rec = await getRecommendation(getDb(), actor, id);
  const units = (await getCurrentUser())?.unitSystem ?? "imperial";
  const paper = parseQuery(req, querySchema).paper ?? (units === "metric" ? "a4" : "letter");
  const { token } = makeShareToken(rec.id, rec.shareVersion, PRINT_TOKEN_TTL_SECONDS);
  let pdf: Buffer;
  try {
    pdf = await renderPdf(appUrl(`/recommendations/${rec.id}/print?t=${encodeURIComponent(token)}&units=${units}`), paper);
  } catch (err) {
    console.error("[pdf]", err);
    return NextResponse.json({ error: "The PDF could not be made right now. Use Print on the sheet instead, or try again in a moment." }, { status: 503 });
  }
  const name = rec.customerName.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "customer";
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="recommendation-${name}.pdf"`,
      "cache-control": "no-store",
    },
  });
});
