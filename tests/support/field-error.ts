import { FieldError } from "@/lib/errors";
import { thrown } from "./thrown";

/** The FieldError `f` throws; the test fails if it throws anything else or nothing. */
export const fieldError = (f: () => unknown): FieldError => thrown(FieldError, f);
