// @ts-nocheck
// What the database layer adds to lib/errors.ts: telling an outage from a bad request.

const UNAVAILABLE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P02", "57P03", "08006", "08001", "08003"]);

/** True when an error means the database cannot be reached right now (answer 503, retry later). */
export function isDatabaseUnavailable(err: unknown): boolean {
  let e: unknown = err;
  for (let i = 0; i < 4 && e; i++) {
    const anyE = e as { code?: string; message?: string; cause?: unknown };
    if (anyE.code && UNAVAILABLE_CODES.has(anyE.code)) return true;
    if (typeof anyE.message === "string" && /Connection terminated|connection timeout|timeout exceeded when trying to connect|Client has encountered a connection error/i.test(anyE.message)) return true;
    e = anyE.cause;
  }
  return false;
}
