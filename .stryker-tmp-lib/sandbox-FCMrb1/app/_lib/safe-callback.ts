// @ts-nocheck
// Where to go after signing in: only a path on this site. Browsers read "/\host", "/<tab>/host"
// and similar as another host, so backslashes, control characters and whitespace are refused
// outright, and what is left must resolve to our own origin.
const BASE = "http://pulleywright.invalid";
export const DEFAULT_AFTER_SIGN_IN = "/combinations";

export function safeCallback(url: unknown): string {
  if (typeof url !== "string" || !url.startsWith("/") || url.length > 2000) return DEFAULT_AFTER_SIGN_IN;
  if (/[\\\s\u0000-\u001f\u007f]/.test(url) || /^\/[/\\]/.test(url) || /%(2f|5c|09|0a|0d|00)/i.test(url.slice(0, 4))) return DEFAULT_AFTER_SIGN_IN;
  let resolved: URL;
  try {
    resolved = new URL(url, BASE);
  } catch {
    return DEFAULT_AFTER_SIGN_IN;
  }
  if (resolved.origin !== BASE) return DEFAULT_AFTER_SIGN_IN;
  const out = resolved.pathname + resolved.search + resolved.hash;
  // Dot segments can fold "/.//host" into "//host", which a browser reads as another host:
  // what we hand back must itself resolve to our own origin.
  if (out.startsWith("//") || new URL(out, BASE).origin !== BASE) return DEFAULT_AFTER_SIGN_IN;
  return out;
}
