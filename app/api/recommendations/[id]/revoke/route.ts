import { route } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { revokeSheetLinks } from "@/db/repo/sheet-versions";

type Ctx = { params: Promise<{ id: string }> };

/** Withdraws every link the customer was sent for this sheet. */
export const POST = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  return { id, revoked: await revokeSheetLinks(getDb(), actor, id) };
});
