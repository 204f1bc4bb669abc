import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { appUrl } from "@/app/_lib/mail";
import { queueAndTry } from "@/app/_lib/mail-sender";
import { getCurrentUser, requireActor } from "@/app/_lib/session";
import { makeShareToken } from "@/app/_lib/share-link";
import { buildSheetEmail } from "@/app/_lib/recommendation-email";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { getRecommendation } from "@/db/repo/recommendations";
import { takeHit } from "@/db/repo/rate-limits";
import { getShopDetails } from "@/db/repo/shop";

type Ctx = { params: Promise<{ id: string }> };

/**
 * E-mails the sheet to the customer with a signed read-only link (30 days), through the outbox,
 * trying at once. Success records the time and status "sent"; a failure keeps the status, records
 * the error to show, and leaves the mail queued: the sender retries it and marks the sheet sent
 * when it goes. Limited per account and per recipient (the app's own numbers, common practice).
 */
export const POST = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const db = getDb();
  const rec = await getRecommendation(db, actor, id);
  if (!rec.customerEmail) throw new FieldError("customerEmail", "Add the customer's e-mail address to the sheet before sending it.");
  const unitSystem = (await getCurrentUser())?.unitSystem ?? "imperial";
  const { token, expiresAt } = makeShareToken(rec.id, rec.shareVersion);
  const link = appUrl(`/share/${token}?units=${unitSystem}`);
  const mail = buildSheetEmail({ sheet: rec, shop: await getShopDetails(db), unitSystem, link, expiresAt });
  const allowed = (await takeHit(db, `mail-account:${actor.id}`, 100, 3600_000)) && (await takeHit(db, `mail-to:${rec.customerEmail.toLowerCase()}`, 10, 3600_000));
  if (!allowed) return NextResponse.json({ error: "Too many e-mails were sent in the last hour; try again later." }, { status: 429, headers: { "Retry-After": "600" } });
  const sent = await queueAndTry({ to: rec.customerEmail, ...mail, purpose: `recommendation:${id}` }, db);
  if (sent.status !== "sent") {
    const message = `The e-mail to ${rec.customerEmail} could not be sent yet (${sent.lastError ?? "unknown error"}). It stays queued and is retried automatically; check the mail settings.`;
    return NextResponse.json({ error: message }, { status: 502 });
  }
  const after = await getRecommendation(db, actor, id);
  return { id, status: after.status, sentAt: after.sentAt };
});
