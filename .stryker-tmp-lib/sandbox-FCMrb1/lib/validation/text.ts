// @ts-nocheck
// The one rule for text a person types (names, titles, notes): trimmed, bounded, refused with a
// message that names the field, and free of characters that only cause trouble later.
// - Control characters: PostgreSQL text cannot hold NUL, and the rest break files, e-mails, terminals.
// - Bidirectional overrides and isolates (U+202A–U+202E, U+2066–U+2069): they make text display
//   in another order than it is stored, so a name could read as something else (Unicode TR #36 §2.1).
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import { z } from "zod";

/** Trimmed text of at most `max` characters; the messages name the field by `label`. */
export const text = stryMutAct_9fa48("4687") ? () => undefined : (stryCov_9fa48("4687"), (() => {
  const text = (label: string, max: number) => stryMutAct_9fa48("4689") ? z.string({
    error: `${label} must be text.`
  }).max(max, `${label} must be at most ${max} characters.`) : stryMutAct_9fa48("4688") ? z.string({
    error: `${label} must be text.`
  }).trim().min(max, `${label} must be at most ${max} characters.`) : (stryCov_9fa48("4688", "4689"), z.string(stryMutAct_9fa48("4690") ? {} : (stryCov_9fa48("4690"), {
    error: stryMutAct_9fa48("4691") ? `` : (stryCov_9fa48("4691"), `${label} must be text.`)
  })).trim().max(max, stryMutAct_9fa48("4692") ? `` : (stryCov_9fa48("4692"), `${label} must be at most ${max} characters.`)));
  return text;
})());
const CONTROL = stryMutAct_9fa48("4693") ? /[^\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/ : (stryCov_9fa48("4693"), /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/);
const CONTROL_OR_NEWLINE = stryMutAct_9fa48("4694") ? /[^\u0000-\u001F\u007F]/ : (stryCov_9fa48("4694"), /[\u0000-\u001F\u007F]/);
export const BIDI_CONTROL = stryMutAct_9fa48("4695") ? /[^\u202A-\u202E\u2066-\u2069]/ : (stryCov_9fa48("4695"), /[\u202A-\u202E\u2066-\u2069]/);

/** `text` that also refuses control characters (and line breaks unless `multiline`) and direction overrides. */
export const plainText = stryMutAct_9fa48("4696") ? () => undefined : (stryCov_9fa48("4696"), (() => {
  const plainText = (label: string, max: number, opts: {
    multiline?: boolean;
  } = {}) => text(label, max).refine(stryMutAct_9fa48("4697") ? () => undefined : (stryCov_9fa48("4697"), v => stryMutAct_9fa48("4698") ? (opts.multiline ? CONTROL : CONTROL_OR_NEWLINE).test(v) : (stryCov_9fa48("4698"), !(opts.multiline ? CONTROL : CONTROL_OR_NEWLINE).test(v))), stryMutAct_9fa48("4699") ? `` : (stryCov_9fa48("4699"), `${label} must not contain control characters.`)).refine(stryMutAct_9fa48("4700") ? () => undefined : (stryCov_9fa48("4700"), v => stryMutAct_9fa48("4701") ? BIDI_CONTROL.test(v) : (stryCov_9fa48("4701"), !BIDI_CONTROL.test(v))), stryMutAct_9fa48("4702") ? `` : (stryCov_9fa48("4702"), `${label} must not contain text-direction override characters.`));
  return plainText;
})());