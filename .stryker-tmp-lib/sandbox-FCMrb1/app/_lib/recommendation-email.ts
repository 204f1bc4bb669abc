// @ts-nocheck
// The e-mail that carries a recommendation sheet to the customer: a plain-text body and an HTML
// body with the same content. Every piece of text a person typed is escaped in the HTML.
import { SAFETY_NOTICE, type UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";
import { defaultSheetTitle } from "@/lib/recommendations/rules";
import type { ShopDetails } from "@/db/repo/shop";
import { formatPrice } from "@/lib/orders/money";
import { computeSheet } from "@/lib/recommendations/sheet-data";
import { figureOrRange } from "@/lib/planner/range-words";
import type { SheetRecord } from "@/components/recommendation/sheet-view";
import { dateText } from "@/lib/format/dates";

const ENTITIES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/** Text made safe to place in HTML element content and attribute values. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ENTITIES[c]);
}

export type SheetEmail = { subject: string; text: string; html: string };

export function buildSheetEmail(opts: { sheet: SheetRecord; shop: ShopDetails; currency: string; unitSystem: UnitSystem; link: string; expiresAt: Date; locale?: string }): SheetEmail {
  const { sheet, shop, currency, unitSystem, link, expiresAt, locale } = opts;
  const f = computeSheet(sheet.spec, sheet.targetRpm).figures;
  const formatMoney = (a: string) => formatPrice(a, currency);
  const title = sheet.title || defaultSheetTitle(sheet.customerName);
  const pulley = quantityText("length-small", f.blowerPulleyDiameter, unitSystem);
  const until = dateText(expiresAt, locale);
  const summary = [
    `Recommended blower pulley: ${pulley}`,
    f.headline
      ? `Predicted boost: ${figureOrRange(f.headline, unitSystem, (h) => quantityText("pressure", h.boostGauge, unitSystem))} at ${Math.round(f.headline.rpm)} rpm${f.headline.sold ? "" : " (redline)"}`
      : null,
    f.peakPower ? `Predicted peak net power: ${quantityText("power", f.peakPower.netPower, unitSystem)} at ${Math.round(f.peakPower.rpm)} rpm, with ${quantityText("pressure", f.peakPower.boostGauge, unitSystem)} boost` : null,
    f.peakTorque ? `Predicted peak net torque: ${quantityText("torque", f.peakTorque.torque, unitSystem)} at ${Math.round(f.peakTorque.rpm)} rpm` : null,
  ].filter((s): s is string => s !== null);
  const lines = sheet.parts.map((p) => `  ${p.quantity} × ${p.description}${p.partNumber ? ` (${p.partNumber})` : ""}: ${formatMoney(p.lineTotal)}`);
  const shopLines = [shop.name, shop.address, [shop.phone, shop.email].filter(Boolean).join(" · "), shop.website].filter(Boolean);

  const text = [
    `Hello ${sheet.customerName},`,
    "",
    `here is our recommendation: ${title}.`,
    "",
    ...summary,
    "",
    ...(lines.length ? ["Parts:", ...lines, `  Total: ${formatMoney(sheet.total)}`, ""] : []),
    ...(sheet.notes ? [sheet.notes, ""] : []),
    `See the whole sheet with its curves and cautions (valid until ${until}):`,
    link,
    "",
    "Please note:",
    ...SAFETY_NOTICE.map((s) => `- ${s}`),
    "",
    ...shopLines,
  ].join("\n");

  const e = escapeHtml;
  const html = `<!doctype html><html><body style="font-family:sans-serif;color:#111;line-height:1.45">
<p>Hello ${e(sheet.customerName)},</p>
<p>here is our recommendation: ${e(title)}.</p>
<ul>${summary.map((s) => `<li>${e(s)}</li>`).join("")}</ul>
${
  sheet.parts.length
    ? `<table cellpadding="4" style="border-collapse:collapse"><thead><tr><th align="left">Part</th><th align="right">Qty</th><th align="right">Amount</th></tr></thead><tbody>${sheet.parts
        .map((p) => `<tr><td>${e(p.description)}${p.partNumber ? ` <small>(${e(p.partNumber)})</small>` : ""}</td><td align="right">${p.quantity}</td><td align="right">${e(formatMoney(p.lineTotal))}</td></tr>`)
        .join("")}</tbody><tfoot><tr><th colspan="2" align="right">Total</th><th align="right">${e(formatMoney(sheet.total))}</th></tr></tfoot></table>`
    : ""
}
${sheet.notes ? `<p style="white-space:pre-line">${e(sheet.notes)}</p>` : ""}
<p><a href="${e(link)}">Open the recommendation sheet</a> (valid until ${e(until)}).</p>
<p style="font-size:12px;color:#444">Please note:</p><ul style="font-size:12px;color:#444">${SAFETY_NOTICE.map((s) => `<li>${e(s)}</li>`).join("")}</ul>
<p>${shopLines.map(e).join("<br>")}</p>
</body></html>`;

  return { subject: `Your recommendation from ${shop.name}: ${title}`, text, html };
}
