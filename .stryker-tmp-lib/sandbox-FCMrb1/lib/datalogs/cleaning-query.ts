// @ts-nocheck
// Cleaning options in the address (shared by the server pages and the client controls).
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
import { cleaningSchema, type CleaningOptions } from "@/lib/datalogs/parse";
export type CleaningQuery = Partial<Record<keyof CleaningOptions, string>>;

/** Cleaning options from the page's search params; bad values fall back to the defaults. */
export function cleaningFromQuery(q: CleaningQuery): CleaningOptions {
  if (stryMutAct_9fa48("1151")) {
    {}
  } else {
    stryCov_9fa48("1151");
    const defaults = cleaningSchema.parse({});
    const out = stryMutAct_9fa48("1152") ? {} : (stryCov_9fa48("1152"), {
      ...defaults
    });
    for (const k of Object.keys(defaults) as (keyof CleaningOptions)[]) {
      if (stryMutAct_9fa48("1153")) {
        {}
      } else {
        stryCov_9fa48("1153");
        if (stryMutAct_9fa48("1156") ? q[k] !== undefined : stryMutAct_9fa48("1155") ? false : stryMutAct_9fa48("1154") ? true : (stryCov_9fa48("1154", "1155", "1156"), q[k] === undefined)) continue;
        const r = cleaningSchema.shape[k].safeParse(q[k]);
        if (stryMutAct_9fa48("1159") ? r.success || r.data !== undefined : stryMutAct_9fa48("1158") ? false : stryMutAct_9fa48("1157") ? true : (stryCov_9fa48("1157", "1158", "1159"), r.success && (stryMutAct_9fa48("1161") ? r.data === undefined : stryMutAct_9fa48("1160") ? true : (stryCov_9fa48("1160", "1161"), r.data !== undefined)))) out[k] = r.data;
      }
    }
    return out;
  }
}
export function cleaningToQuery(o: CleaningOptions): string {
  if (stryMutAct_9fa48("1162")) {
    {}
  } else {
    stryCov_9fa48("1162");
    return new URLSearchParams(Object.entries(o).map(stryMutAct_9fa48("1163") ? () => undefined : (stryCov_9fa48("1163"), ([k, v]) => stryMutAct_9fa48("1164") ? [] : (stryCov_9fa48("1164"), [k, String(v)])))).toString();
  }
}