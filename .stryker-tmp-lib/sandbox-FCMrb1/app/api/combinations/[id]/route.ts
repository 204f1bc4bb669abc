// @ts-nocheck
// One combination: read it, save an edit (a new revision, refused with 409 when based on an
// out-of-date revision), or move it to the bin (undo with POST …/undo-delete).
import { NextResponse } from "next/server";
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deleteCombination, getCombination, saveCombination, saveCombinationSchema } from "@/db/repo/combinations";
import type { IdContext } from "../_shared";

export const dynamic = "force-dynamic";

export const GET = route<IdContext>(async (_req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  return getCombination(getDb(), actor, id);
});

export const PATCH = route<IdContext>(async (req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  return saveCombination(getDb(), actor, id, await parseJson(req, saveCombinationSchema));
});

export const DELETE = route<IdContext>(async (_req, ctx) => {
  const actor = await requireActor();
  const { id } = await ctx.params;
  await deleteCombination(getDb(), actor, id);
  return NextResponse.json({ ok: true, id, undo: `/api/combinations/${id}/undo-delete` });
});
