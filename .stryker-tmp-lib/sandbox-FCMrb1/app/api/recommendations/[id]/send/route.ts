// @ts-nocheck
import { NextResponse } from "next/server";
import { route } from "@/app/_lib/http";
import { queueAndTry } from "@/app/_lib/mail-sender";
import { currentUnits, requireActor } from "@/app/_lib/session";
import { composeSheetMail, sheetPdfAttachment } from "@/app/_lib/sheet-mail";
import { sentVersionLink } from "@/app/_lib/share-url";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { getRecommendation } from "@/db/repo/recommendations";
import { takeHit } from "@/db/repo/rate-limits";
import { recordSentVersion } from "@/db/repo/sheet-versions";
import { getShopTerms } from "@/db/repo/shop";
import { requestLocale } from "@/app/_lib/locale";

type Ctx = { params: Promise<{ id: string }> };

/**
 * E-mails the sheet to the customer through the outbox, trying at once, with its PDF attached and
 * a link (30 days) to a frozen copy of it as it is now: each send is a new version, and later
 * edits never change what the link shows. Success records the time and status "sent"; a failure
 * keeps the status, records the error to show, and leaves the mail queued: the sender retries it
 * and marks the sheet sent when it goes. Limited per account and per recipient (the app's own
 * numbers, common practice).
 */
export const POST = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const db = getDb();
  const draft = await getRecommendation(db, actor, id);
  if (!draft.customerEmail) throw new FieldError("customerEmail", "Add the customer's e-mail address to the sheet before sending it.");
  const to = draft.customerEmail;
  const unitSystem = await currentUnits();
  const allowed = (await takeHit(db, `mail-account:${actor.id}`, 100, 3600_000)) && (await takeHit(db, `mail-to:${to.toLowerCase()}`, 10, 3600_000));
  if (!allowed) return NextResponse.json({ error: "Too many e-mails were sent in the last hour; try again later." }, { status: 429, headers: { "Retry-After": "600" } });
  const version = await recordSentVersion(db, actor, draft, (await getShopTerms(db)).currency);
  // Read again: the send moved the sheet's share version, which the PDF's print token must carry.
  const rec = await getRecommendation(db, actor, id);
  const link = sentVersionLink(version, unitSystem);
  const locale = await requestLocale();
  const [{ mail }, pdf] = await Promise.all([composeSheetMail(db, rec, unitSystem, link, locale), sheetPdfAttachment(rec, unitSystem, locale)]);
  const attachments = pdf ? [{ filename: pdf.filename, contentType: pdf.contentType, base64: pdf.content.toString("base64") }] : undefined;
  const sent = await queueAndTry({ to, ...mail, attachments, purpose: `recommendation:${id}` }, db);
  if (sent.status !== "sent") {
    const message = `The e-mail to ${to} could not be sent yet (${sent.lastError ?? "unknown error"}). It stays queued and is retried automatically; check the mail settings.`;
    return NextResponse.json({ error: message }, { status: 502 });
  }
  const after = await getRecommendation(db, actor, id);
  return { id, status: after.status, sentAt: after.sentAt, version: version.version, shareUrl: link.url, pdfAttached: pdf !== null };
});
