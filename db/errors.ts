// Errors the data layer raises; route handlers and actions map them to status codes and messages.

export class NotFoundError extends Error {
  readonly status = 404;
  constructor(what = "Not found") {
    super(what);
  }
}

export class ForbiddenError extends Error {
  readonly status = 403;
  constructor(message = "You do not have permission to do that.") {
    super(message);
  }
}

export class UnauthorizedError extends Error {
  readonly status = 401;
  constructor(message = "Please sign in.") {
    super(message);
  }
}

/** A save based on an out-of-date revision, or a duplicate key. */
export class ConflictError extends Error {
  readonly status = 409;
  constructor(message: string, readonly details?: Record<string, unknown>) {
    super(message);
  }
}

/** Input that passed the schema but breaks a rule of the data (names the field). */
export class FieldError extends Error {
  readonly status = 400;
  constructor(readonly field: string, message: string) {
    super(message);
  }
}

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

/** Another service the request needed failed (502) or is not set up (503); nothing was changed. */
export class UpstreamError extends Error {
  constructor(message: string, readonly status: 502 | 503 = 502) {
    super(message);
  }
}
