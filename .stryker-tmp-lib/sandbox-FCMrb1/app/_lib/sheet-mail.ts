// @ts-nocheck
import "server-only";
// The e-mail that carries a sheet, as previewed and as sent: the same builder, the shop's details
// and currency, and (when sent) the one-page PDF of the sheet attached.
import { nearestPreset, unitsToParam, type UnitSystem } from "@/calc";
import { FALLBACK_LOCALE } from "@/lib/format/dates";
import { buildSheetEmail } from "./recommendation-email";
import type { DbOrTx } from "@/db/connect";
import type { Recommendation } from "@/db/repo/recommendations";
import { getShopDetails, getShopTerms } from "@/db/repo/shop";
import { appUrl } from "./mail";
import { renderPdf, type Paper } from "./pdf";
import { makeShareToken, PRINT_TOKEN_TTL_SECONDS } from "./share-link";

export async function composeSheetMail(db: DbOrTx, rec: Recommendation, unitSystem: UnitSystem, link: { url: string; expiresAt: Date }, locale?: string) {
  const [shop, terms] = await Promise.all([getShopDetails(db), getShopTerms(db)]);
  return { currency: terms.currency, mail: buildSheetEmail({ sheet: rec, shop, currency: terms.currency, unitSystem, link: link.url, expiresAt: link.expiresAt, locale }) };
}

/**
 * The sheet as a one-page PDF, printed by Chromium on the server from the print page. The
 * headless browser gets a two-minute signed token for this one sheet, never the user's cookie.
 */
export async function sheetPdf(rec: Recommendation, unitSystem: UnitSystem, paper: Paper = nearestPreset(unitSystem) === "metric" ? "a4" : "letter", locale = FALLBACK_LOCALE) {
  const { token } = makeShareToken(rec.id, rec.shareVersion, PRINT_TOKEN_TTL_SECONDS);
  const pdf = await renderPdf(appUrl(`/recommendations/${rec.id}/print?t=${encodeURIComponent(token)}&units=${encodeURIComponent(unitsToParam(unitSystem))}&lang=${encodeURIComponent(locale)}`), paper);
  const name = rec.customerName.replace(/[^A-Za-z0-9]+/g, "-").replace(/^-|-$/g, "").toLowerCase() || "customer";
  return { filename: `recommendation-${name}.pdf`, content: pdf, contentType: "application/pdf" };
}

/** The sheet's PDF for the e-mail; null (and logged) when it cannot be made. */
export async function sheetPdfAttachment(rec: Recommendation, unitSystem: UnitSystem, locale?: string) {
  try {
    return await sheetPdf(rec, unitSystem, undefined, locale);
  } catch (err) {
    console.error("[pdf] the sheet's PDF could not be attached:", err instanceof Error ? err.message : err);
    return null;
  }
}
