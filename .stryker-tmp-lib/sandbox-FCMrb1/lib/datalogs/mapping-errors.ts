// @ts-nocheck
// The column mapping's problems by the field they concern, for the form to show beside each one.
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
import { datalogMappingSchema, type DatalogMappingInput } from "./parse";
export type MappingErrors = Partial<Record<keyof DatalogMappingInput, string[]>>;

/** Every problem of the mapping, keyed by its field ("time": ["Column 1 is already used for engine speed; …"]). */
export function mappingFieldErrors(mapping: DatalogMappingInput): MappingErrors {
  if (stryMutAct_9fa48("1610")) {
    {}
  } else {
    stryCov_9fa48("1610");
    const r = datalogMappingSchema.safeParse(mapping);
    if (stryMutAct_9fa48("1612") ? false : stryMutAct_9fa48("1611") ? true : (stryCov_9fa48("1611", "1612"), r.success)) return {};
    const out: MappingErrors = {};
    for (const issue of r.error.issues) {
      if (stryMutAct_9fa48("1613")) {
        {}
      } else {
        stryCov_9fa48("1613");
        const key = (issue.path[0] ?? "delimiter") as keyof DatalogMappingInput;
        (stryMutAct_9fa48("1614") ? out[key] &&= [] : (stryCov_9fa48("1614"), out[key] ??= stryMutAct_9fa48("1615") ? ["Stryker was here"] : (stryCov_9fa48("1615"), []))).push(issue.message);
      }
    }
    return out;
  }
}