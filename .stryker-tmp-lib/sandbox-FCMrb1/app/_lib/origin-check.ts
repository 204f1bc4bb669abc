// @ts-nocheck
import "server-only";
import { env } from "./env";
import { isCrossSiteBy } from "./origin-rule";

export class CrossSiteRequest extends Error {
  readonly status = 403;
  constructor() {
    super("This request came from another site and was refused. Use the app's own pages.");
  }
}

/** Throws CrossSiteRequest for a write that a browser says came from another site's page. */
export function assertSameOrigin(req: Request) {
  if (isCrossSiteBy(req.method, req.headers, env().NEXTAUTH_URL, new URL(req.url).protocol)) throw new CrossSiteRequest();
}
