// @ts-nocheck
import { route } from "@/app/_lib/http";
import { appUrl } from "@/app/_lib/mail";
import { gateway } from "@/app/_lib/payments";
import { shareGrant } from "@/app/_lib/share-grant";
import { getDb } from "@/db/client";
import { startCheckout } from "@/db/repo/orders";

type Ctx = { params: Promise<{ token: string }> };

/**
 * "Accept and pay the deposit": public, but only for the holder of a valid link to the newest
 * sent version. Answers `{ url }` of the hosted checkout; the webhook records the payment.
 */
export const POST = route(async (_req, { params }: Ctx) => {
  const { token } = await params;
  const grant = shareGrant(token);
  const back = `/share/${encodeURIComponent(decodeURIComponent(token))}`;
  const { url } = await startCheckout(getDb(), gateway, grant, { successUrl: appUrl(`${back}?paid=1`), cancelUrl: appUrl(`${back}?checkout=cancelled`) });
  return { url };
});
