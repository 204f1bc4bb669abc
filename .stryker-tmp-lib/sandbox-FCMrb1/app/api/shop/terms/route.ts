// @ts-nocheck
import { readJson, route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { getShopTerms, updateShopTerms } from "@/db/repo/shop";

/** The shop's currency and deposit rule (any signed-in user reads them: prices show the currency). */
export const GET = route(async () => {
  await requireActor();
  return getShopTerms(getDb());
});

/** The admin sets them; orders already made keep theirs. */
export const PUT = route(async (req) => {
  const actor = await requireActor(["admin"]);
  return updateShopTerms(getDb(), actor, await readJson(req));
});
