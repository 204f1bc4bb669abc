// @ts-nocheck
import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getOrder } from "@/db/repo/orders";

type Ctx = { params: Promise<{ id: string }> };

/** One order with its reserved parts and payment trail. Staff only. */
export const GET = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  return getOrder(getDb(), actor, id);
});
