// @ts-nocheck
// A JSON file of combinations with their history: all of the caller's own, or ?ids=a,b (any they may read).
import { NextResponse } from "next/server";
import { parseQuery, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { exportCombinations } from "@/db/repo/combinations";
import { exportQuerySchema } from "../_shared";

export const dynamic = "force-dynamic";

export const GET = route(async (req) => {
  const actor = await requireActor();
  const { ids } = parseQuery(req, exportQuerySchema);
  const doc = await exportCombinations(getDb(), actor, ids);
  const stem = doc.combinations.length === 1 ? slug(doc.combinations[0].name) : "combinations";
  return NextResponse.json(doc, {
    headers: { "Content-Disposition": `attachment; filename="pulleywright-${stem}-${doc.exportedAt.slice(0, 10)}.json"` },
  });
});

const slug = (s: string) => s.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "combination";
