import { expect } from "vitest";
import { FieldError } from "@/lib/errors";

/** The FieldError `f` throws; the test fails if it throws anything else or nothing. */
export function fieldError(f: () => unknown): FieldError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(FieldError);
    return e as FieldError;
  }
  return expect.unreachable("expected a FieldError");
}
