// @ts-nocheck
import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { deleteDatalog, getDatalog } from "@/db/repo/datalogs";

type Ctx = { params: Promise<{ id: string }> };

/** One log's record; the raw file text only with ?raw=1. */
export const GET = route(async (req, { params }: Ctx) => {
  const actor = await requireActor();
  const { id } = await params;
  const { rawText, ...log } = await getDatalog(getDb(), actor, id);
  return new URL(req.url).searchParams.get("raw") === "1" ? { ...log, rawText } : log;
});

export const DELETE = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor();
  const { id } = await params;
  await deleteDatalog(getDb(), actor, id);
  return new NextResponse(null, { status: 204 });
});
