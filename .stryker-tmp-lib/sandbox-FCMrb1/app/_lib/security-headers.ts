// @ts-nocheck
// The per-request security headers that proxy.ts sets: a Content-Security-Policy whose scripts
// must carry this response's nonce (Next adds it to its own scripts when it finds the policy on
// the request), and Strict-Transport-Security when the app is served over https.
// Kept free of server-only imports: proxy.ts runs before the app's modules.

export function makeNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
}

export function contentSecurityPolicy(nonce: string): string {
  return [
    "default-src 'self'",
    // No 'unsafe-inline' for scripts: only ours, and inline ones only with this response's nonce.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    // Styles stay inline-capable: React style attributes and chart sizes are set inline.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** HSTS=on always, off never, auto (the default) when the public URL or the request is https. */
export function wantsHsts(setting: string | undefined, publicUrl: string | undefined, forwardedProto: string | null): boolean {
  if (setting === "on") return true;
  if (setting === "off") return false;
  return (publicUrl ?? "").startsWith("https://") || forwardedProto === "https";
}

export const HSTS_VALUE = "max-age=31536000; includeSubDomains";
