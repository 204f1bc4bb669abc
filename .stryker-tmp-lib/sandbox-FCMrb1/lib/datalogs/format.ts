// @ts-nocheck
// Figures of the datalog pages in the user's units (boost gauge, temperatures, pulley sizes).
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
import { fromSI, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";
import { digitsOf } from "@/lib/units/format";

/** Logged boost reads to a hundredth of a psi; everything else as the planner shows it. */
export const logDigits = stryMutAct_9fa48("1165") ? () => undefined : (stryCov_9fa48("1165"), (() => {
  const logDigits = (kind: QuantityKind, system: UnitSystem) => (stryMutAct_9fa48("1168") ? unitLabel(kind, system) !== "psi" : stryMutAct_9fa48("1167") ? false : stryMutAct_9fa48("1166") ? true : (stryCov_9fa48("1166", "1167", "1168"), unitLabel(kind, system) === (stryMutAct_9fa48("1169") ? "" : (stryCov_9fa48("1169"), "psi")))) ? 2 : digitsOf(kind, system);
  return logDigits;
})());

/** A SI value as text in the user's units, without the unit ("—" for null). */
export function fig(kind: QuantityKind, si: number | null, system: UnitSystem, digits = logDigits(kind, system)): string {
  if (stryMutAct_9fa48("1170")) {
    {}
  } else {
    stryCov_9fa48("1170");
    if (stryMutAct_9fa48("1173") ? si === null && !Number.isFinite(si) : stryMutAct_9fa48("1172") ? false : stryMutAct_9fa48("1171") ? true : (stryCov_9fa48("1171", "1172", "1173"), (stryMutAct_9fa48("1175") ? si !== null : stryMutAct_9fa48("1174") ? false : (stryCov_9fa48("1174", "1175"), si === null)) || (stryMutAct_9fa48("1176") ? Number.isFinite(si) : (stryCov_9fa48("1176"), !Number.isFinite(si))))) return stryMutAct_9fa48("1177") ? "" : (stryCov_9fa48("1177"), "—");
    return fromSI(kind, si, system).toLocaleString(stryMutAct_9fa48("1178") ? "" : (stryCov_9fa48("1178"), "en-US"), stryMutAct_9fa48("1179") ? {} : (stryCov_9fa48("1179"), {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits
    }));
  }
}

/** The same with its unit, e.g. "7.42 psi". */
export function withUnit(kind: QuantityKind, si: number | null, system: UnitSystem, digits?: number): string {
  if (stryMutAct_9fa48("1180")) {
    {}
  } else {
    stryCov_9fa48("1180");
    const f = fig(kind, si, system, digits);
    return (stryMutAct_9fa48("1183") ? f !== "—" : stryMutAct_9fa48("1182") ? false : stryMutAct_9fa48("1181") ? true : (stryCov_9fa48("1181", "1182", "1183"), f === (stryMutAct_9fa48("1184") ? "" : (stryCov_9fa48("1184"), "—")))) ? f : stryMutAct_9fa48("1185") ? `` : (stryCov_9fa48("1185"), `${f} ${unitLabel(kind, system)}`);
  }
}
export const rpmText = stryMutAct_9fa48("1186") ? () => undefined : (stryCov_9fa48("1186"), (() => {
  const rpmText = (rpm: number) => Math.round(rpm).toLocaleString(stryMutAct_9fa48("1187") ? "" : (stryCov_9fa48("1187"), "en-US"));
  return rpmText;
})());

/** Okabe–Ito colours in their order (colour-blind safe). */
export const PALETTE = ["#0072B2", "#E69F00", "#009E73", "#CC79A7", "#56B4E9", "#D55E00", "#F0E442", "#000000"] as const;