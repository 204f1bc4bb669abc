// @ts-nocheck
// A copy owned by the caller (of the current spec, or of one revision), with a fresh history.
import { NextResponse } from "next/server";
import { readJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { duplicateCombination } from "@/db/repo/combinations";
import { duplicateSchema, type IdContext } from "../../_shared";

export const dynamic = "force-dynamic";

export const POST = route<IdContext>(async (req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  // The body is optional: no body means "copy the current spec, name it … (copy)".
  const hasBody = Number(req.headers.get("content-length") ?? "0") > 0 || req.headers.get("transfer-encoding") === "chunked";
  const opts = duplicateSchema.parse(hasBody ? await readJson(req) : {});
  const row = await duplicateCombination(getDb(), actor, id, opts);
  return NextResponse.json(row, { status: 201, headers: { Location: `/api/combinations/${row.id}` } });
});
