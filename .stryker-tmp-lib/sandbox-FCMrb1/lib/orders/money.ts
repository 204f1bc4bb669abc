// @ts-nocheck
// Prices in the shop's currency: exact decimal arithmetic (decimal.js), the currency's own minor
// units (ISO 4217, as the runtime's Intl data states them) and its symbol wherever a price shows.
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
import Decimal from "decimal.js";
import { z } from "zod";
import { currencySymbol, formatPrice, minorDigits } from "./price-text";
export { currencySymbol, formatPrice, minorDigits };

/** Decimal arithmetic for money: plenty of digits, half-up rounding like a till. */
export const Cash = Decimal.clone(stryMutAct_9fa48("3077") ? {} : (stryCov_9fa48("3077"), {
  precision: 40,
  rounding: Decimal.ROUND_HALF_UP
}));
const CURRENCY = stryMutAct_9fa48("3081") ? /^[^A-Z]{3}$/ : stryMutAct_9fa48("3080") ? /^[A-Z]$/ : stryMutAct_9fa48("3079") ? /^[A-Z]{3}/ : stryMutAct_9fa48("3078") ? /[A-Z]{3}$/ : (stryCov_9fa48("3078", "3079", "3080", "3081"), /^[A-Z]{3}$/);

/** An ISO 4217 code the runtime knows, e.g. "USD", "EUR", "JPY". */
export const currencySchema = stryMutAct_9fa48("3083") ? z.string({
  error: "Currency must be a three-letter code like USD."
}).toUpperCase().refine(c => CURRENCY.test(c) && Intl.supportedValuesOf("currency").includes(c), "Currency must be a three-letter ISO 4217 code like USD, EUR or GBP.") : stryMutAct_9fa48("3082") ? z.string({
  error: "Currency must be a three-letter code like USD."
}).trim().toLowerCase().refine(c => CURRENCY.test(c) && Intl.supportedValuesOf("currency").includes(c), "Currency must be a three-letter ISO 4217 code like USD, EUR or GBP.") : (stryCov_9fa48("3082", "3083"), z.string(stryMutAct_9fa48("3084") ? {} : (stryCov_9fa48("3084"), {
  error: stryMutAct_9fa48("3085") ? "" : (stryCov_9fa48("3085"), "Currency must be a three-letter code like USD.")
})).trim().toUpperCase().refine(stryMutAct_9fa48("3086") ? () => undefined : (stryCov_9fa48("3086"), c => stryMutAct_9fa48("3089") ? CURRENCY.test(c) || Intl.supportedValuesOf("currency").includes(c) : stryMutAct_9fa48("3088") ? false : stryMutAct_9fa48("3087") ? true : (stryCov_9fa48("3087", "3088", "3089"), CURRENCY.test(c) && Intl.supportedValuesOf(stryMutAct_9fa48("3090") ? "" : (stryCov_9fa48("3090"), "currency")).includes(c))), stryMutAct_9fa48("3091") ? "" : (stryCov_9fa48("3091"), "Currency must be a three-letter ISO 4217 code like USD, EUR or GBP.")));

/** An amount rounded half-up to the currency's minor unit, as a string ("12.5" → "12.50"). */
export function roundToCurrency(amount: Decimal.Value, currency: string): string {
  if (stryMutAct_9fa48("3092")) {
    {}
  } else {
    stryCov_9fa48("3092");
    return new Cash(amount).toDecimalPlaces(minorDigits(currency)).toFixed(minorDigits(currency));
  }
}

/** The integer count of minor units a payment service takes ("12.34" USD → 1234). */
export function toMinorUnits(amount: Decimal.Value, currency: string): number {
  if (stryMutAct_9fa48("3093")) {
    {}
  } else {
    stryCov_9fa48("3093");
    const minor = new Cash(roundToCurrency(amount, currency)).times(new Cash(10).pow(minorDigits(currency)));
    return minor.toNumber();
  }
}

/** Back from minor units to a decimal string (1234, "USD" → "12.34"). */
export function fromMinorUnits(minor: number, currency: string): string {
  if (stryMutAct_9fa48("3094")) {
    {}
  } else {
    stryCov_9fa48("3094");
    return new Cash(minor).div(new Cash(10).pow(minorDigits(currency))).toFixed(minorDigits(currency));
  }
}