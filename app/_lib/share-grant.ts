import "server-only";
import { ForbiddenError } from "@/db/errors";
import { verifyShareToken } from "./share-link";

const REFUSED = { malformed: "This link is not complete; open it again from the e-mail.", forged: "This link is not valid.", expired: "This link has expired; ask the shop to send the sheet again." } as const;

/** The sent sheet version a customer's link names; a bad link is a 403 saying why. */
export function shareGrant(token: string): { versionId: string } {
  const v = verifyShareToken(decodeURIComponent(token));
  if (!v.ok) throw new ForbiddenError(REFUSED[v.reason]);
  return { versionId: v.recommendationId };
}
