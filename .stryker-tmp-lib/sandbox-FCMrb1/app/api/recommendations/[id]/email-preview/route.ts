// @ts-nocheck
import { route } from "@/app/_lib/http";
import { currentUnits, requireActor } from "@/app/_lib/session";
import { composeSheetMail } from "@/app/_lib/sheet-mail";
import { SHARE_LINK_TTL_SECONDS } from "@/app/_lib/share-link";
import { getDb } from "@/db/client";
import { getRecommendation } from "@/db/repo/recommendations";
import { requestLocale } from "@/app/_lib/locale";

type Ctx = { params: Promise<{ id: string }> };

/** The e-mail as it would go now, before it goes; the real link is made when it is sent. */
export const GET = route(async (_req, { params }: Ctx) => {
  const actor = await requireActor(["sales", "tuner", "admin"]);
  const { id } = await params;
  const db = getDb();
  const rec = await getRecommendation(db, actor, id);
  const unitSystem = await currentUnits();
  const placeholder = { url: "(the customer's own link is made when you send)", expiresAt: new Date(Date.now() + SHARE_LINK_TTL_SECONDS * 1000) };
  const { mail } = await composeSheetMail(db, rec, unitSystem, placeholder, await requestLocale());
  return { to: rec.customerEmail, subject: mail.subject, text: mail.text, html: mail.html, attachment: "the sheet as a one-page PDF" };
});
