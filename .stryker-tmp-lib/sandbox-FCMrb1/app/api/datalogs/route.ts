// @ts-nocheck
import { NextResponse } from "next/server";
import { z } from "zod";
import { readJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createDatalog, listDatalogs, MAX_UPLOAD_JSON_BYTES } from "@/db/repo/datalogs";

const listQuery = z.object({ combinationId: z.string().optional() });

/** The logs the signed-in user may see (their own; staff: the shop's), newest first. */
export const GET = route(async (req) => {
  const actor = await requireActor();
  const q = listQuery.parse(Object.fromEntries(new URL(req.url).searchParams));
  return { items: await listDatalogs(getDb(), actor, q) };
});

/**
 * Uploads a log: { combinationId, name, fileName, text, mapping, ambient?, skipUnreadable? }. All
 * points or none; with skipUnreadable every readable row is kept and `skipped` lists the others.
 */
export const POST = route(async (req) => {
  const actor = await requireActor();
  const body = await readJson(req, MAX_UPLOAD_JSON_BYTES);
  const log = await createDatalog(getDb(), actor, body as never);
  return NextResponse.json({ id: log.id, name: log.name, revision: log.revision, pointCount: log.pointCount, skipped: log.skipped }, { status: 201 });
});
