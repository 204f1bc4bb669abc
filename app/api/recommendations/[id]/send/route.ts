import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { appUrl, sendMail } from "@/app/_lib/mail";
import { getCurrentUser, requireActor } from "@/app/_lib/session";
import { makeShareToken } from "@/app/_lib/share-link";
import { buildSheetEmail } from "@/app/_lib/recommendation-email";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { getRecommendation, markRecommendationSent, recordSendFailure } from "@/db/repo/recommendations";
import { getShopDetails } from "@/db/repo/shop";

type Ctx = { params: Promise<{ id: string }> };

/**
 * E-mails the sheet to the customer with a signed read-only link (30 days). Success records the
 * time and status "sent"; a failure keeps the status and records the error to show.
 */
export const POST = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const db = getDb();
  const rec = await getRecommendation(db, actor, id);
  if (!rec.customerEmail) throw new FieldError("customerEmail", "Add the customer's e-mail address to the sheet before sending it.");
  const unitSystem = (await getCurrentUser())?.unitSystem ?? "imperial";
  const { token, expiresAt } = makeShareToken(rec.id);
  const link = appUrl(`/share/${token}?units=${unitSystem}`);
  const mail = buildSheetEmail({ sheet: rec, shop: await getShopDetails(db), unitSystem, link, expiresAt });
  try {
    await sendMail({ to: rec.customerEmail, ...mail });
  } catch (err) {
    const message = `The e-mail to ${rec.customerEmail} could not be sent (${err instanceof Error ? err.message : String(err)}). The sheet was not sent; check the mail settings and try again.`;
    await recordSendFailure(db, actor, id, message);
    return NextResponse.json({ error: message }, { status: 502 });
  }
  const row = await markRecommendationSent(db, actor, id);
  return { id, status: row.status, sentAt: row.sentAt };
});
