// @ts-nocheck
// Imports an exported file, all or nothing: every combination in it becomes a new one of the caller's.
import { NextResponse } from "next/server";
import { readJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { importCombinations } from "@/db/repo/combinations";

export const dynamic = "force-dynamic";

export const POST = route(async (req) => {
  const actor = await requireActor();
  const rows = await importCombinations(getDb(), actor, await readJson(req));
  return NextResponse.json({ imported: rows.length, items: rows.map((r) => ({ id: r.id, name: r.name, revision: r.revision })) }, { status: 201 });
});
