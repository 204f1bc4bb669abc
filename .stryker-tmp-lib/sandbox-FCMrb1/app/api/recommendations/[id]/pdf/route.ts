// @ts-nocheck
import { NextResponse } from "next/server";
import { z } from "zod";
import { route, parseQuery } from "@/app/_lib/http";
import { currentUnits, requireActor } from "@/app/_lib/session";
import { sheetPdf } from "@/app/_lib/sheet-mail";
import { requestLocale } from "@/app/_lib/locale";
import { getDb } from "@/db/client";
import { getRecommendation } from "@/db/repo/recommendations";

type Ctx = { params: Promise<{ id: string }> };
const querySchema = z.object({ paper: z.enum(["a4", "letter"], { error: "paper must be a4 or letter." }).optional() });

/** The sheet as a one-page PDF download (A4 for metric users, Letter otherwise, unless `paper` says). */
export const GET = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const rec = await getRecommendation(getDb(), actor, id);
  const units = await currentUnits();
  const { paper } = parseQuery(req, querySchema);
  let pdf;
  try {
    pdf = await sheetPdf(rec, units, paper, await requestLocale());
  } catch (err) {
    console.error("[pdf]", err);
    return NextResponse.json({ error: "The PDF could not be made right now. Use Print on the sheet instead, or try again in a moment." }, { status: 503 });
  }
  return new Response(new Uint8Array(pdf.content), {
    headers: { "content-type": "application/pdf", "content-disposition": `attachment; filename="${pdf.filename}"`, "cache-control": "no-store" },
  });
});
