// @ts-nocheck
// Writes must come from our own pages. Browsers say where a request comes from (Sec-Fetch-Site,
// and Origin on every cross-origin request and every POST); a page on another site, or on another
// port of this host, is refused. Requests with neither header are not sent by a browser page
// (scripts, curl, the tests). Kept free of server-only imports: proxy.ts uses it too.

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The origins our pages are served from: the configured public URL and the Host the request was sent to. */
function ownOrigins(headers: Headers, publicUrl: string | undefined, protocol: string): Set<string> {
  const out = new Set<string>();
  try {
    if (publicUrl) out.add(new URL(publicUrl).origin);
  } catch {}
  const host = headers.get("x-forwarded-host") ?? headers.get("host");
  const proto = headers.get("x-forwarded-proto") ?? protocol.replace(":", "");
  if (host) out.add(`${proto}://${host}`);
  return out;
}

/** True when a browser says this write came from a page that is not ours. */
export function isCrossSiteBy(method: string, headers: Headers, publicUrl: string | undefined, protocol: string): boolean {
  if (SAFE_METHODS.has(method.toUpperCase())) return false;
  const site = headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return true;
  const origin = headers.get("origin");
  return !!origin && !ownOrigins(headers, publicUrl, protocol).has(origin);
}
