// @ts-nocheck
// Display rounding for quantities in the user's units. Pure: used by the planner, the charts,
// side by side and their tests, so the figure on screen and the figure a test expects agree.
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
import { formatQuantity, unitLabel, type QuantityKind, type UnitSystem } from "@/calc";

/**
 * Decimal places per unit (by label): [shown in readouts, shown in input boxes]. Readouts show
 * enough to see a 0.1 in pulley change; boxes are finer, so a typed 2.875 in pulley survives,
 * but never conversion noise such as 14.6959 psi or 280.709 in³.
 */
const DIGITS: Readonly<Record<string, readonly [number, number]>> = stryMutAct_9fa48("4550") ? {} : (stryCov_9fa48("4550"), {
  in: stryMutAct_9fa48("4551") ? [] : (stryCov_9fa48("4551"), [2, 3]),
  mm: stryMutAct_9fa48("4552") ? [] : (stryCov_9fa48("4552"), [1, 2]),
  ft: stryMutAct_9fa48("4553") ? [] : (stryCov_9fa48("4553"), [0, 0]),
  m: stryMutAct_9fa48("4554") ? [] : (stryCov_9fa48("4554"), [0, 0]),
  "in³": stryMutAct_9fa48("4555") ? [] : (stryCov_9fa48("4555"), [0, 1]),
  L: stryMutAct_9fa48("4556") ? [] : (stryCov_9fa48("4556"), [2, 3]),
  cc: stryMutAct_9fa48("4557") ? [] : (stryCov_9fa48("4557"), [0, 0]),
  "in³/rev": stryMutAct_9fa48("4558") ? [] : (stryCov_9fa48("4558"), [0, 1]),
  "L/rev": stryMutAct_9fa48("4559") ? [] : (stryCov_9fa48("4559"), [2, 3]),
  "cc/rev": stryMutAct_9fa48("4560") ? [] : (stryCov_9fa48("4560"), [0, 0]),
  psi: stryMutAct_9fa48("4561") ? [] : (stryCov_9fa48("4561"), [1, 2]),
  kPa: stryMutAct_9fa48("4562") ? [] : (stryCov_9fa48("4562"), [1, 1]),
  bar: stryMutAct_9fa48("4563") ? [] : (stryCov_9fa48("4563"), [2, 3]),
  "°F": stryMutAct_9fa48("4564") ? [] : (stryCov_9fa48("4564"), [0, 1]),
  "°C": stryMutAct_9fa48("4565") ? [] : (stryCov_9fa48("4565"), [0, 1]),
  hp: stryMutAct_9fa48("4566") ? [] : (stryCov_9fa48("4566"), [0, 0]),
  kW: stryMutAct_9fa48("4567") ? [] : (stryCov_9fa48("4567"), [0, 1]),
  "lb·ft": stryMutAct_9fa48("4568") ? [] : (stryCov_9fa48("4568"), [0, 0]),
  "N·m": stryMutAct_9fa48("4569") ? [] : (stryCov_9fa48("4569"), [0, 0]),
  cfm: stryMutAct_9fa48("4570") ? [] : (stryCov_9fa48("4570"), [0, 0]),
  "m³/min": stryMutAct_9fa48("4571") ? [] : (stryCov_9fa48("4571"), [1, 2]),
  "m³/h": stryMutAct_9fa48("4572") ? [] : (stryCov_9fa48("4572"), [0, 0]),
  rpm: stryMutAct_9fa48("4573") ? [] : (stryCov_9fa48("4573"), [0, 0]),
  "lb/h": stryMutAct_9fa48("4574") ? [] : (stryCov_9fa48("4574"), [0, 1]),
  "kg/h": stryMutAct_9fa48("4575") ? [] : (stryCov_9fa48("4575"), [0, 2]),
  "cc/min": stryMutAct_9fa48("4576") ? [] : (stryCov_9fa48("4576"), [0, 0]),
  "lb/(hp·h)": stryMutAct_9fa48("4577") ? [] : (stryCov_9fa48("4577"), [2, 3]),
  "g/(kW·h)": stryMutAct_9fa48("4578") ? [] : (stryCov_9fa48("4578"), [0, 0])
});

/** Decimal places of an input box of a kind in the person's units. */
export function inputDigitsOf(kind: QuantityKind, system: UnitSystem): number {
  if (stryMutAct_9fa48("4579")) {
    {}
  } else {
    stryCov_9fa48("4579");
    return stryMutAct_9fa48("4580") ? DIGITS[unitLabel(kind, system)]?.[1] && 3 : (stryCov_9fa48("4580"), (stryMutAct_9fa48("4581") ? DIGITS[unitLabel(kind, system)][1] : (stryCov_9fa48("4581"), DIGITS[unitLabel(kind, system)]?.[1])) ?? 3);
  }
}

/** A number rounded to `digits` decimals by an exact power of ten (no 1.2000000000000002). */
export function roundTo(v: number, digits: number): number {
  if (stryMutAct_9fa48("4582")) {
    {}
  } else {
    stryCov_9fa48("4582");
    if (stryMutAct_9fa48("4585") ? false : stryMutAct_9fa48("4584") ? true : stryMutAct_9fa48("4583") ? Number.isFinite(v) : (stryCov_9fa48("4583", "4584", "4585"), !Number.isFinite(v))) return v;
    const f = 10 ** digits;
    return stryMutAct_9fa48("4586") ? Math.round(v * f) * f : (stryCov_9fa48("4586"), Math.round(stryMutAct_9fa48("4587") ? v / f : (stryCov_9fa48("4587"), v * f)) / f);
  }
}

/** Decimal places shown for a kind in the person's units. */
export function digitsOf(kind: QuantityKind, system: UnitSystem): number {
  if (stryMutAct_9fa48("4588")) {
    {}
  } else {
    stryCov_9fa48("4588");
    return stryMutAct_9fa48("4589") ? DIGITS[unitLabel(kind, system)]?.[0] && 1 : (stryCov_9fa48("4589"), (stryMutAct_9fa48("4590") ? DIGITS[unitLabel(kind, system)][0] : (stryCov_9fa48("4590"), DIGITS[unitLabel(kind, system)]?.[0])) ?? 1);
  }
}

/** A SI value in the user's units, rounded for display (a number, for tables and tests). */
export function displayValue(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): number {
  if (stryMutAct_9fa48("4591")) {
    {}
  } else {
    stryCov_9fa48("4591");
    const v = formatQuantity(kind, si, system).value;
    const f = 10 ** digits;
    return stryMutAct_9fa48("4592") ? Math.round(v * f) * f : (stryCov_9fa48("4592"), Math.round(stryMutAct_9fa48("4593") ? v / f : (stryCov_9fa48("4593"), v * f)) / f);
  }
}

/** The figure as text without its unit, e.g. "7.4" (psi) or "6,200" (rpm). */
export function figure(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  if (stryMutAct_9fa48("4594")) {
    {}
  } else {
    stryCov_9fa48("4594");
    const v = formatQuantity(kind, si, system).value;
    return v.toLocaleString(stryMutAct_9fa48("4595") ? "" : (stryCov_9fa48("4595"), "en-US"), stryMutAct_9fa48("4596") ? {} : (stryCov_9fa48("4596"), {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits
    }));
  }
}

/** The figure with its unit, e.g. "7.4 psi". */
export function quantityText(kind: QuantityKind, si: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  if (stryMutAct_9fa48("4597")) {
    {}
  } else {
    stryCov_9fa48("4597");
    return stryMutAct_9fa48("4598") ? `` : (stryCov_9fa48("4598"), `${figure(kind, si, system, digits)} ${unitLabel(kind, system)}`);
  }
}

/** A signed difference in the user's units, e.g. "+1.2 psi" (affine temperatures use the size of a degree). */
export function deltaText(kind: QuantityKind, siDelta: number, system: UnitSystem, digits = digitsOf(kind, system)): string {
  if (stryMutAct_9fa48("4599")) {
    {}
  } else {
    stryCov_9fa48("4599");
    const size = (stryMutAct_9fa48("4602") ? kind !== "temperature" : stryMutAct_9fa48("4601") ? false : stryMutAct_9fa48("4600") ? true : (stryCov_9fa48("4600", "4601", "4602"), kind === (stryMutAct_9fa48("4603") ? "" : (stryCov_9fa48("4603"), "temperature")))) ? (stryMutAct_9fa48("4606") ? unitLabel(kind, system) !== "°F" : stryMutAct_9fa48("4605") ? false : stryMutAct_9fa48("4604") ? true : (stryCov_9fa48("4604", "4605", "4606"), unitLabel(kind, system) === (stryMutAct_9fa48("4607") ? "" : (stryCov_9fa48("4607"), "°F")))) ? stryMutAct_9fa48("4608") ? siDelta / 1.8 : (stryCov_9fa48("4608"), siDelta * 1.8) : siDelta : formatQuantity(kind, siDelta, system).value;
    const rounded = Number(size.toFixed(digits));
    const sign = (stryMutAct_9fa48("4612") ? rounded <= 0 : stryMutAct_9fa48("4611") ? rounded >= 0 : stryMutAct_9fa48("4610") ? false : stryMutAct_9fa48("4609") ? true : (stryCov_9fa48("4609", "4610", "4611", "4612"), rounded > 0)) ? stryMutAct_9fa48("4613") ? "" : (stryCov_9fa48("4613"), "+") : (stryMutAct_9fa48("4617") ? rounded >= 0 : stryMutAct_9fa48("4616") ? rounded <= 0 : stryMutAct_9fa48("4615") ? false : stryMutAct_9fa48("4614") ? true : (stryCov_9fa48("4614", "4615", "4616", "4617"), rounded < 0)) ? stryMutAct_9fa48("4618") ? "" : (stryCov_9fa48("4618"), "−") : stryMutAct_9fa48("4619") ? "" : (stryCov_9fa48("4619"), "±");
    return stryMutAct_9fa48("4620") ? `` : (stryCov_9fa48("4620"), `${sign}${Math.abs(rounded).toLocaleString(stryMutAct_9fa48("4621") ? "" : (stryCov_9fa48("4621"), "en-US"), stryMutAct_9fa48("4622") ? {} : (stryCov_9fa48("4622"), {
      minimumFractionDigits: digits,
      maximumFractionDigits: digits
    }))} ${unitLabel(kind, system)}`);
  }
}

/** A fraction as a percentage, e.g. 0.853 → "85 %". */
export function percentText(fraction: number, digits = 0): string {
  if (stryMutAct_9fa48("4623")) {
    {}
  } else {
    stryCov_9fa48("4623");
    return stryMutAct_9fa48("4624") ? `` : (stryCov_9fa48("4624"), `${(stryMutAct_9fa48("4625") ? fraction / 100 : (stryCov_9fa48("4625"), fraction * 100)).toFixed(digits)} %`);
  }
}