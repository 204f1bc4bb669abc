// @ts-nocheck
import "server-only";
// Loads a sheet for a page, either for a signed-in member of staff or for the holder of a signed
// token (share link, or the server's own headless browser making the PDF).
import { notFound } from "next/navigation";
import { unitsFromParam, type UnitSystem } from "@/calc";
import { requirePageUser } from "@/app/_lib/session";
import { verifyShareToken, type ShareVerdict } from "@/app/_lib/share-link";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getRecommendation, getSharedRecommendation, type Recommendation } from "@/db/repo/recommendations";
import { getShopDetails, getShopTerms, type ShopDetails } from "@/db/repo/shop";
import { toActor } from "@/db/repo/users";
import { personUnits } from "@/lib/units/person";

export type Loaded = { ok: true; sheet: Recommendation; shop: ShopDetails; currency: string; unitSystem: UnitSystem; expiresAt?: Date };
export type Refused = { ok: false; reason: Extract<ShareVerdict, { ok: false }>["reason"] | "gone" | "revoked" };

/** The units of a link ("imperial", "metric~pressure.psi"); anything unreadable reads as imperial. */
export const unitsParam = (v: unknown): UnitSystem => unitsFromParam(v);

/** By token: the token must be genuine, unexpired, of the sheet's current share version and (when `id` is given) for this very sheet. */
export async function loadByToken(token: string, units: unknown, id?: string): Promise<Loaded | Refused> {
  const v = verifyShareToken(token);
  if (!v.ok) return { ok: false, reason: v.reason };
  if (id !== undefined && v.recommendationId !== id) return { ok: false, reason: "forged" };
  const db = getDb();
  try {
    const [sheet, shop, terms] = await Promise.all([getSharedRecommendation(db, v), getShopDetails(db), getShopTerms(db)]);
    // The shop stopped the links sent before (the sheet's share version moved on).
    if (sheet.shareVersion !== v.version) return { ok: false, reason: "revoked" };
    return { ok: true, sheet, shop, currency: terms.currency, unitSystem: unitsParam(units), expiresAt: v.expiresAt };
  } catch (e) {
    if (e instanceof NotFoundError) return { ok: false, reason: "gone" };
    throw e;
  }
}

/** By session: sales, tuners and admin only; others are sent away by requirePageUser. */
export async function loadForStaff(id: string): Promise<Loaded> {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const db = getDb();
  try {
    const [sheet, shop, terms] = await Promise.all([getRecommendation(db, toActor(user), id), getShopDetails(db), getShopTerms(db)]);
    return { ok: true, sheet, shop, currency: terms.currency, unitSystem: personUnits(user) };
  } catch (e) {
    if (e instanceof NotFoundError) notFound();
    throw e;
  }
}
