// @ts-nocheck
// Loaded from instrumentation.ts at start-up, so it stays free of server-only modules.
// Next passes a client's own X-Forwarded-For through untouched and does not hand the socket
// address to route handlers, so each process stamps every incoming request with its socket
// address under a header name only this process knows (a client cannot forge it).
import crypto from "node:crypto";
import type http from "node:http";

const KEY = Symbol.for("pulleywright.peer-header");
type Global = typeof globalThis & { [KEY]?: string };

/** Stamps each request's socket address onto it (once per process; later calls do nothing). */
export function stampPeerAddress(server: typeof http.Server) {
  const g = globalThis as Global;
  if (g[KEY]) return;
  const header = `x-pw-peer-${crypto.randomBytes(8).toString("hex")}`;
  const emit = server.prototype.emit;
  server.prototype.emit = function (this: http.Server, event: string, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      req.headers[header] = req.socket?.remoteAddress ?? "unknown";
    }
    return emit.apply(this, [event, ...args] as Parameters<typeof emit>);
  } as typeof emit;
  g[KEY] = header;
}

/** The secret header name, or undefined when no stamp was installed (the address is then unknown). */
export function peerHeaderName(): string | undefined {
  return (globalThis as Global)[KEY];
}
