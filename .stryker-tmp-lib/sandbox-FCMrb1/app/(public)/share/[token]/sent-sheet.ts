// @ts-nocheck
import "server-only";
// The sheet behind a customer's link: the version frozen when it was sent, with what the customer
// may do about it (accept and pay the deposit, or decline). Links from before versions existed
// name no sent version; they open the sheet as it is, while their share version is current.
import type { UnitSystem } from "@/calc";
import { verifyShareToken } from "@/app/_lib/share-link";
import { loadByToken, unitsParam, type Refused } from "@/app/_lib/recommendation-load";
import type { SheetRecord } from "@/components/recommendation/sheet-view";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getCustomerOrder } from "@/db/repo/orders";
import { getSentVersion } from "@/db/repo/sheet-versions";
import { getShopDetails, getShopTerms, type ShopDetails } from "@/db/repo/shop";
import { depositFor } from "@/lib/orders/deposit";
import type { OrderStatus } from "@/lib/orders/status";

export type CustomerAnswer =
  | { kind: "open"; deposit: string; currency: string }
  | { kind: "superseded" }
  | { kind: "declined" }
  | { kind: "ordered"; status: OrderStatus; deposit: string; currency: string; paid: boolean }
  | { kind: "none" };

export type SentSheet = { ok: true; sheet: SheetRecord; title: string; currency: string; shop: ShopDetails; unitSystem: UnitSystem; expiresAt: Date; version: number | null; answer: CustomerAnswer };

export async function loadSentSheet(token: string, units: unknown): Promise<SentSheet | Refused> {
  const v = verifyShareToken(token);
  if (!v.ok) return { ok: false, reason: v.reason };
  const db = getDb();
  const grant = { recommendationId: v.recommendationId, version: v.version };
  const sent = await getSentVersion(db, grant).catch((e) => {
    if (e instanceof NotFoundError) return "revoked" as const;
    throw e;
  });
  if (sent === "revoked") return { ok: false, reason: "revoked" };
  if (!sent) {
    const legacy = await loadByToken(token, units);
    if (!legacy.ok) return legacy;
    return { ...legacy, ok: true, title: legacy.sheet.title, expiresAt: v.expiresAt, version: null, answer: { kind: "none" } };
  }
  const [shop, terms, order] = await Promise.all([getShopDetails(db), getShopTerms(db), getCustomerOrder(db, grant)]);
  const s = sent.snapshot;
  let answer: CustomerAnswer;
  if (order && order.status !== "awaiting-payment") answer = { kind: "ordered", status: order.status, deposit: order.deposit, currency: order.currency, paid: !!order.paidAt };
  else if (!sent.latest) answer = { kind: "superseded" };
  else if (sent.declinedAt || sent.recommendationStatus === "declined") answer = { kind: "declined" };
  else answer = { kind: "open", deposit: depositFor(s.total, terms.deposit, s.currency), currency: s.currency };
  return { ok: true, sheet: s, title: s.title, currency: s.currency, shop, unitSystem: unitsParam(units), expiresAt: v.expiresAt, version: sent.version, answer };
}
