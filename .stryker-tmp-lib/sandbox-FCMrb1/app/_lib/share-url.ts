// @ts-nocheck
import "server-only";
import { unitsToParam, type UnitSystem } from "@/calc";
import { appUrl } from "./mail";
import { SHARE_LINK_TTL_SECONDS, signShareToken } from "./share-link";

/** The customer's link to one sent version: valid for the link lifetime from when it was sent. */
export function sentVersionLink(version: { recommendationId: string; version: number; sentAt: Date }, unitSystem: UnitSystem) {
  const expiresAt = new Date(version.sentAt.getTime() + SHARE_LINK_TTL_SECONDS * 1000);
  const token = signShareToken(version.recommendationId, version.version, expiresAt);
  return { url: appUrl(`/share/${token}?units=${encodeURIComponent(unitsToParam(unitSystem))}`), token, expiresAt };
}
