// @ts-nocheck
import { route, parseJson, parseQuery } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { createBlower, listBlowers } from "@/db/repo/shelf";
import { blowerListQuerySchema, blowerRecordSchema } from "@/lib/shelf/rules";

/** The shelf's blowers: search, filters (kind, in stock), sort and pages. */
export const GET = route(async (req) => {
  const actor = await requireActor();
  return listBlowers(getDb(), actor, parseQuery(req, blowerListQuerySchema));
});

/** Adds a blower (admin). Displacement in m³/rev, price as "19.99". */
export const POST = route(async (req) => {
  const actor = await requireActor(["admin"]);
  const row = await createBlower(getDb(), actor, await parseJson(req, blowerRecordSchema));
  return Response.json(row, { status: 201 });
});
