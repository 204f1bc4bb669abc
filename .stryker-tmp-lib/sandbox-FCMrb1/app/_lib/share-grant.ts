// @ts-nocheck
import "server-only";
import { ForbiddenError } from "@/lib/errors";
import { verifyShareToken } from "./share-link";

const REFUSED = { malformed: "This link is not complete; open it again from the e-mail.", forged: "This link is not valid.", expired: "This link has expired; ask the shop to send the sheet again." } as const;

/** The sent version of a sheet a customer's link names; a bad link is a 403 saying why. */
export function shareGrant(token: string): { recommendationId: string; version: number } {
  let raw = token;
  try {
    raw = decodeURIComponent(token);
  } catch {
    /* a broken %-escape is simply not a token: refused below */
  }
  const v = verifyShareToken(raw);
  if (!v.ok) throw new ForbiddenError(REFUSED[v.reason]);
  return { recommendationId: v.recommendationId, version: v.version };
}
