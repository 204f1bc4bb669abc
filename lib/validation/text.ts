// The one rule for text a person types (names, titles, notes): trimmed, bounded, refused with a
// message that names the field, and free of characters that only cause trouble later.
// - Control characters: PostgreSQL text cannot hold NUL, and the rest break files, e-mails, terminals.
// - Bidirectional overrides and isolates (U+202A–U+202E, U+2066–U+2069): they make text display
//   in another order than it is stored, so a name could read as something else (Unicode TR #36 §2.1).
import { z } from "zod";

/** Trimmed text of at most `max` characters; the messages name the field by `label`. */
export const text = (label: string, max: number) =>
  z.string({ error: `${label} must be text.` }).trim().max(max, `${label} must be at most ${max} characters.`);

const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;
const CONTROL_OR_NEWLINE = /[\u0000-\u001F\u007F]/;
export const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;

/** `text` that also refuses control characters (and line breaks unless `multiline`) and direction overrides. */
export const plainText = (label: string, max: number, opts: { multiline?: boolean } = {}) =>
  text(label, max)
    .refine((v) => !(opts.multiline ? CONTROL : CONTROL_OR_NEWLINE).test(v), `${label} must not contain control characters.`)
    .refine((v) => !BIDI_CONTROL.test(v), `${label} must not contain text-direction override characters.`);
