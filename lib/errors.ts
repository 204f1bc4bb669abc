// Errors raised below the app (repositories and domain rules); route handlers and actions map
// them to status codes and messages (app/_lib/errors.ts).

export class NotFoundError extends Error {
  readonly status = 404;
  constructor(what = "Not found") { super(what); }
}

export class ForbiddenError extends Error {
  readonly status = 403;
  constructor(message = "You do not have permission to do that.") { super(message); }
}

export class UnauthorizedError extends Error {
  readonly status = 401;
  constructor(message = "Please sign in.") { super(message); }
}

/** A save based on an out-of-date revision, or a duplicate key. */
export class ConflictError extends Error {
  readonly status = 409;
  constructor(message: string, readonly details?: Record<string, unknown>) { super(message); }
}

/** Input that passed the schema but breaks a rule of the data (names the field). */
export class FieldError extends Error {
  readonly status = 400;
  constructor(readonly field: string, message: string) { super(message); }
}

/** Another service the request needed failed (502) or is not set up (503); nothing was changed. */
export class UpstreamError extends Error {
  constructor(message: string, readonly status: 502 | 503 = 502) {
    super(message);
  }
}
