// @ts-nocheck
import { parseJson, route } from "@/app/_lib/http";
import { gateway } from "@/app/_lib/payments";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { cancelOrder } from "@/db/repo/orders";
import { cancelOrderSchema } from "@/lib/orders/status";

type Ctx = { params: Promise<{ id: string }> };

/** Cancels an order; a paid one is refunded through the payment service (admin and sales) and its parts released. */
export const POST = route(async (req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const row = await cancelOrder(getDb(), actor, gateway, id, await parseJson(req, cancelOrderSchema));
  return { id: row.id, status: row.status, refundId: row.refundId };
});
