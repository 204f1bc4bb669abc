// @ts-nocheck
import { parseJson, route } from "@/app/_lib/http";
import { shareGrant } from "@/app/_lib/share-grant";
import { getDb } from "@/db/client";
import { declineSentVersion } from "@/db/repo/sheet-versions";
import { declineSheetSchema } from "@/lib/orders/status";

type Ctx = { params: Promise<{ token: string }> };

/** The customer's "Decline", with an optional reason (public, token-checked). */
export const POST = route(async (req, { params }: Ctx) => {
  const { token } = await params;
  const grant = shareGrant(token);
  const { reason } = await parseJson(req, declineSheetSchema);
  return declineSentVersion(getDb(), grant, reason);
});
