// @ts-nocheck
import { ZodError } from "zod";
import { isDatabaseUnavailable } from "@/db/errors";
import { ConflictError, FieldError, ForbiddenError, NotFoundError, UnauthorizedError, UpstreamError } from "@/lib/errors";

/** What a client sees of a failure: a status, a message safe to show, and per-field messages (dotted paths). */
export type Failure = { status: number; message: string; fieldErrors?: Record<string, string[]>; details?: Record<string, unknown> };

export function fieldErrorsOf(err: ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** Maps any thrown error to a Failure; unknown errors are logged and hidden behind a plain message. */
export function toFailure(err: unknown): Failure {
  if (err instanceof ZodError) {
    const fieldErrors = fieldErrorsOf(err);
    const [first] = Object.entries(fieldErrors);
    return { status: 400, message: first ? `${first[0] === "_" ? "Input" : first[0]}: ${first[1][0]}` : "Invalid input.", fieldErrors };
  }
  if (err instanceof FieldError) return { status: 400, message: err.message, fieldErrors: { [err.field]: [err.message] } };
  // calc/ raises typed errors that carry the field they are about.
  const calcField = (err as { field?: unknown })?.field;
  if (err instanceof Error && typeof calcField === "string" && /Calc/.test(err.name + err.constructor.name)) {
    return { status: 400, message: err.message, fieldErrors: { [calcField]: [err.message] } };
  }
  if (err instanceof UnauthorizedError) return { status: 401, message: err.message };
  if (err instanceof ForbiddenError) return { status: 403, message: err.message };
  if (err instanceof NotFoundError) return { status: 404, message: err.message };
  if (err instanceof ConflictError) return { status: 409, message: err.message, details: err.details };
  if (err instanceof UpstreamError) return { status: err.status, message: err.message };
  // PostgreSQL's "data exception" class (22…): a value it cannot store or read, such as a NUL
  // character or a malformed id that got past the schemas. The request is at fault, not the server.
  const pgCode = (err as { code?: unknown; cause?: { code?: unknown } })?.code ?? (err as { cause?: { code?: unknown } })?.cause?.code;
  if (typeof pgCode === "string" && pgCode.startsWith("22")) {
    return { status: 400, message: "A value in the request has characters or a form that cannot be stored (for example a NUL character)." };
  }
  if (isDatabaseUnavailable(err)) {
    return { status: 503, message: "The database is not reachable right now. Nothing was changed; please try again in a moment." };
  }
  console.error("[unexpected]", err);
  return { status: 500, message: "Something went wrong on our side. Nothing was changed." };
}
