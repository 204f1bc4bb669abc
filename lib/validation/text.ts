// Free text in a record: trimmed, bounded, and refused with a message that names the field.
import { z } from "zod";

/** Trimmed text of at most `max` characters; the messages name the field by `label`. */
export const text = (label: string, max: number) =>
  z.string({ error: `${label} must be text.` }).trim().max(max, `${label} must be at most ${max} characters.`);

// PostgreSQL text cannot hold NUL, and control characters in a name only cause trouble later
// (files, e-mails, terminals): refuse them here with a message instead of a database error.
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;
const CONTROL_OR_NEWLINE = /[\u0000-\u001F\u007F]/;

/** `text` that also refuses control characters (and line breaks unless `multiline`). */
export const plainText = (label: string, max: number, opts: { multiline?: boolean } = {}) =>
  text(label, max).refine((v) => !(opts.multiline ? CONTROL : CONTROL_OR_NEWLINE).test(v), `${label} must not contain control characters.`);
