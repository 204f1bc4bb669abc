// @ts-nocheck
import "server-only";
import type { ActionState } from "@/lib/action-state";
import { FieldError } from "@/lib/errors";
import { toFailure } from "./errors";


/** Runs an action body and turns any error into a state the form can show; never throws to the client. */
export async function act<T>(fn: () => Promise<T>): Promise<ActionState<T>> {
  try {
    return { ok: true, data: await fn() };
  } catch (err) {
    // Let Next's redirect() and notFound() through.
    const digest = (err as { digest?: unknown })?.digest;
    if (typeof digest === "string" && (digest.startsWith("NEXT_REDIRECT") || digest.startsWith("NEXT_HTTP_ERROR_FALLBACK"))) throw err;
    const f = toFailure(err);
    return { ok: false, message: f.message, fieldErrors: f.fieldErrors, status: f.status };
  }
}

/**
 * The fields of a submitted form. A server action is a public endpoint: a hand-made request can
 * send anything in place of the form, and that is a 400, not a crash.
 */
export function formFields(form: unknown): Record<string, FormDataEntryValue> {
  if (!(form instanceof FormData)) throw new FieldError("_", "The request did not carry a form.");
  return Object.fromEntries(form);
}
