// @ts-nocheck
import "server-only";
import { env } from "./env";
import { peerHeaderName } from "./peer-stamp";

type HeaderBag = Headers | Record<string, unknown> | undefined;
function header(h: HeaderBag, name: string): string | undefined {
  if (!h) return undefined;
  const v = h instanceof Headers ? h.get(name) : h[name];
  return typeof v === "string" ? v : Array.isArray(v) ? String(v[0]) : undefined;
}

/**
 * The client's address for rate limits: the socket's (see peer-stamp.ts), or with
 * TRUSTED_PROXY_HOPS = n the entry the n-th proxy in front of us appended to X-Forwarded-For
 * (entries further left were written by the client and are ignored).
 */
export function clientAddress(h: HeaderBag): string {
  const name = peerHeaderName();
  const peer = (name && header(h, name)) || "unknown";
  const hops = env().TRUSTED_PROXY_HOPS;
  if (hops === 0) return peer;
  const chain = (header(h, "x-forwarded-for") ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  return chain.length >= hops ? chain[chain.length - hops] : peer;
}
