import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { sendMail } from "@/app/_lib/mail";
import { getCurrentUser, requireActor } from "@/app/_lib/session";
import { composeSheetMail, sheetPdfAttachment } from "@/app/_lib/sheet-mail";
import { sentVersionLink } from "@/app/_lib/share-url";
import { getDb } from "@/db/client";
import { FieldError } from "@/db/errors";
import { getRecommendation, markRecommendationSent, recordSendFailure } from "@/db/repo/recommendations";
import { discardSentVersion, recordSentVersion } from "@/db/repo/sheet-versions";
import { getShopTerms } from "@/db/repo/shop";

type Ctx = { params: Promise<{ id: string }> };

/**
 * E-mails the sheet to the customer, with its PDF attached and a link (30 days) to a frozen copy
 * of it as it is now: each send is a new version, and later edits never change what the link
 * shows. Success records the time and status "sent"; a failure keeps the status, discards the
 * version and records the error.
 */
export const POST = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const db = getDb();
  const rec = await getRecommendation(db, actor, id);
  if (!rec.customerEmail) throw new FieldError("customerEmail", "Add the customer's e-mail address to the sheet before sending it.");
  const unitSystem = (await getCurrentUser())?.unitSystem ?? "imperial";
  const version = await recordSentVersion(db, actor, rec, (await getShopTerms(db)).currency);
  const link = sentVersionLink(version, unitSystem);
  const [{ mail }, pdf] = await Promise.all([composeSheetMail(db, rec, unitSystem, link), sheetPdfAttachment(rec, unitSystem)]);
  try {
    await sendMail({ to: rec.customerEmail, ...mail, ...(pdf ? { attachments: [pdf] } : {}) });
  } catch (err) {
    await discardSentVersion(db, actor, version.id);
    const message = `The e-mail to ${rec.customerEmail} could not be sent (${err instanceof Error ? err.message : String(err)}). The sheet was not sent; check the mail settings and try again.`;
    await recordSendFailure(db, actor, id, message);
    return NextResponse.json({ error: message }, { status: 502 });
  }
  const row = await markRecommendationSent(db, actor, id, version.sentAt);
  return { id, status: row.status, sentAt: row.sentAt, version: version.version, shareUrl: link.url, pdfAttached: pdf !== null };
});
