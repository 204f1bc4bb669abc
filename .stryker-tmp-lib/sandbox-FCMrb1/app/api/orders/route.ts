// @ts-nocheck
import { parseQuery, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { listOrders } from "@/db/repo/orders";
import { orderListQuerySchema } from "@/lib/orders/status";

/** The shop's orders, newest activity first (filter by status, search by customer or sheet title). Staff only. */
export const GET = route(async (req) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  return listOrders(getDb(), actor, parseQuery(req, orderListQuerySchema));
});
