// @ts-nocheck
// "Outside the model's range", in words and in the person's units: the one place the UI turns
// calc's range codes into text (ladder, charts' tables, side by side, sheet, share page, lessons).
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
import { BLOWER_OVERSPEED_MARGIN, CHARGE_TEMPERATURE_BOUND, MODEL_MAX_PRESSURE_RATIO, type OperatingPoint, type RangeReason, type UnitSystem } from "@/calc";
import { quantityText } from "@/lib/units/format";
export const OUTSIDE_RANGE = stryMutAct_9fa48("3539") ? "" : (stryCov_9fa48("3539"), "Outside the model's range");

/** One reason in words, with its bound in the person's units. */
export function rangeReasonText(reason: RangeReason, system: UnitSystem): string {
  if (stryMutAct_9fa48("3540")) {
    {}
  } else {
    stryCov_9fa48("3540");
    switch (reason) {
      case stryMutAct_9fa48("3542") ? "" : (stryCov_9fa48("3542"), "pressure-ratio-above-range"):
        if (stryMutAct_9fa48("3541")) {} else {
          stryCov_9fa48("3541");
          return stryMutAct_9fa48("3543") ? `` : (stryCov_9fa48("3543"), `pressure ratio above ${MODEL_MAX_PRESSURE_RATIO.toFixed(1)}`);
        }
      case stryMutAct_9fa48("3545") ? "" : (stryCov_9fa48("3545"), "charge-temperature-above-bound"):
        if (stryMutAct_9fa48("3544")) {} else {
          stryCov_9fa48("3544");
          return stryMutAct_9fa48("3546") ? `` : (stryCov_9fa48("3546"), `charge hotter than ${quantityText(stryMutAct_9fa48("3547") ? "" : (stryCov_9fa48("3547"), "temperature"), CHARGE_TEMPERATURE_BOUND, system)}`);
        }
      case stryMutAct_9fa48("3549") ? "" : (stryCov_9fa48("3549"), "blower-overspeed-margin"):
        if (stryMutAct_9fa48("3548")) {} else {
          stryCov_9fa48("3548");
          return stryMutAct_9fa48("3550") ? `` : (stryCov_9fa48("3550"), `blower more than ${Math.round(stryMutAct_9fa48("3551") ? BLOWER_OVERSPEED_MARGIN / 100 : (stryCov_9fa48("3551"), BLOWER_OVERSPEED_MARGIN * 100))} % over its speed limit`);
        }
      case stryMutAct_9fa48("3553") ? "" : (stryCov_9fa48("3553"), "no-balance"):
        if (stryMutAct_9fa48("3552")) {} else {
          stryCov_9fa48("3552");
          return stryMutAct_9fa48("3554") ? "" : (stryCov_9fa48("3554"), "no balance of blower and engine");
        }
    }
  }
}

/** "Outside the model's range: pressure ratio above 2.5; …" (the heading alone with no reasons). */
export function outsideRangeText(reasons: readonly RangeReason[], system: UnitSystem): string {
  if (stryMutAct_9fa48("3555")) {
    {}
  } else {
    stryCov_9fa48("3555");
    return reasons.length ? stryMutAct_9fa48("3556") ? `` : (stryCov_9fa48("3556"), `${OUTSIDE_RANGE}: ${reasons.map(stryMutAct_9fa48("3557") ? () => undefined : (stryCov_9fa48("3557"), r => rangeReasonText(r, system))).join(stryMutAct_9fa48("3558") ? "" : (stryCov_9fa48("3558"), "; "))}`) : OUTSIDE_RANGE;
  }
}

/** What a screen needs of a point to know whether its figures may be shown. */
export type RangeOf = Pick<OperatingPoint, "withinRange" | "rangeReasons">;

/** A point's figures as `text()` words them, or why the model gives none there: the one rule the
 *  sheet, share page, e-mail and lessons print figures through. */
export function figureOrRange<P extends RangeOf>(point: P, system: UnitSystem, text: (point: P) => string): string {
  if (stryMutAct_9fa48("3559")) {
    {}
  } else {
    stryCov_9fa48("3559");
    return point.withinRange ? text(point) : outsideRangeText(point.rangeReasons, system);
  }
}