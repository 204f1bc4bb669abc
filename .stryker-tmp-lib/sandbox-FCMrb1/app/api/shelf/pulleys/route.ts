// @ts-nocheck
import { route, parseJson, parseQuery } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createPulley, listPulleys } from "@/db/repo/shelf";
import { pulleyListQuerySchema, pulleyRecordSchema } from "@/lib/shelf/rules";

/** The shelf's pulleys: search, filters (position, rib count, in stock), sort and pages. */
export const GET = route(async (req) => {
  const actor = await requireActor();
  return listPulleys(getDb(), actor, parseQuery(req, pulleyListQuerySchema));
});

/** Adds a pulley (admin). Lengths in m, price as "19.99". */
export const POST = route(async (req) => {
  const actor = await requireActor(["admin"]);
  const row = await createPulley(getDb(), actor, await parseJson(req, pulleyRecordSchema));
  return Response.json(row, { status: 201 });
});
