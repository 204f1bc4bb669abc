// @ts-nocheck
import { parseJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { markOrderFitted } from "@/db/repo/orders";
import { markFittedSchema } from "@/lib/orders/status";

type Ctx = { params: Promise<{ id: string }> };

/** The pulley is on the car; `datalogId` optionally names the dyno log that verified it. */
export const POST = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const row = await markOrderFitted(getDb(), actor, id, await parseJson(req, markFittedSchema));
  return { id: row.id, status: row.status, fittedDatalogId: row.fittedDatalogId };
});
