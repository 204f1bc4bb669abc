// @ts-nocheck
// The combinations a person may see (paginated, searchable, sortable) and creating a new one.
import { NextResponse } from "next/server";
import { parseJson, parseQuery, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createCombination, createCombinationSchema, listCombinations, listQuerySchema } from "@/db/repo/combinations";

export const dynamic = "force-dynamic";

export const GET = route(async (req) => {
  const actor = await requireActor();
  return listCombinations(getDb(), actor, parseQuery(req, listQuerySchema));
});

export const POST = route(async (req) => {
  const actor = await requireActor();
  const row = await createCombination(getDb(), actor, await parseJson(req, createCombinationSchema));
  return NextResponse.json(row, { status: 201, headers: { Location: `/api/combinations/${row.id}` } });
});
