// @ts-nocheck
// Prices written for people: the currency's symbol, thousands grouped, its own minor units.
// Kept apart from money.ts (decimal.js, zod) so the browser can show prices without loading either:
// every signed-in page provides the currency through components/price.tsx.
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
function numberFormat(currency: string) {
  if (stryMutAct_9fa48("3095")) {
    {}
  } else {
    stryCov_9fa48("3095");
    return new Intl.NumberFormat(stryMutAct_9fa48("3096") ? "" : (stryCov_9fa48("3096"), "en-US"), stryMutAct_9fa48("3097") ? {} : (stryCov_9fa48("3097"), {
      style: stryMutAct_9fa48("3098") ? "" : (stryCov_9fa48("3098"), "currency"),
      currency,
      currencyDisplay: stryMutAct_9fa48("3099") ? "" : (stryCov_9fa48("3099"), "narrowSymbol")
    }));
  }
}

/** Digits after the decimal point in this currency (2 for USD, 0 for JPY). */
export function minorDigits(currency: string): number {
  if (stryMutAct_9fa48("3100")) {
    {}
  } else {
    stryCov_9fa48("3100");
    return stryMutAct_9fa48("3101") ? numberFormat(currency).resolvedOptions().maximumFractionDigits && 2 : (stryCov_9fa48("3101"), numberFormat(currency).resolvedOptions().maximumFractionDigits ?? 2);
  }
}

/** The symbol shown before a price: "$", "€", "£", "¥". */
export function currencySymbol(currency: string): string {
  if (stryMutAct_9fa48("3102")) {
    {}
  } else {
    stryCov_9fa48("3102");
    return stryMutAct_9fa48("3103") ? numberFormat(currency).formatToParts(0).find(p => p.type === "currency")?.value && currency : (stryCov_9fa48("3103"), (stryMutAct_9fa48("3104") ? numberFormat(currency).formatToParts(0).find(p => p.type === "currency").value : (stryCov_9fa48("3104"), numberFormat(currency).formatToParts(0).find(stryMutAct_9fa48("3105") ? () => undefined : (stryCov_9fa48("3105"), p => stryMutAct_9fa48("3108") ? p.type !== "currency" : stryMutAct_9fa48("3107") ? false : stryMutAct_9fa48("3106") ? true : (stryCov_9fa48("3106", "3107", "3108"), p.type === (stryMutAct_9fa48("3109") ? "" : (stryCov_9fa48("3109"), "currency")))))?.value)) ?? currency);
  }
}

/** An amount (a decimal string, a number, or a decimal.js value) as exact decimal text. */
type Amount = string | number | {
  toFixed(): string;
};

/** "1234.5", "USD" → "$1,234.50": the symbol, thousands grouped, the currency's decimals. Rounds
 *  half away from zero (a till's half-up) on the exact decimal: Intl formats a decimal string
 *  without going through binary floating point. */
export function formatPrice(amount: Amount, currency: string): string {
  if (stryMutAct_9fa48("3110")) {
    {}
  } else {
    stryCov_9fa48("3110");
    const digits = minorDigits(currency);
    const exact = (stryMutAct_9fa48("3113") ? typeof amount !== "object" : stryMutAct_9fa48("3112") ? false : stryMutAct_9fa48("3111") ? true : (stryCov_9fa48("3111", "3112", "3113"), typeof amount === (stryMutAct_9fa48("3114") ? "" : (stryCov_9fa48("3114"), "object")))) ? amount.toFixed() : String(amount);
    const fixed = new Intl.NumberFormat(stryMutAct_9fa48("3115") ? "" : (stryCov_9fa48("3115"), "en-US"), stryMutAct_9fa48("3116") ? {} : (stryCov_9fa48("3116"), {
      useGrouping: stryMutAct_9fa48("3117") ? true : (stryCov_9fa48("3117"), false),
      minimumFractionDigits: digits,
      maximumFractionDigits: digits,
      roundingMode: stryMutAct_9fa48("3118") ? "" : (stryCov_9fa48("3118"), "halfExpand")
    })).format(exact as unknown as number);
    const negative = stryMutAct_9fa48("3119") ? fixed.endsWith("-") : (stryCov_9fa48("3119"), fixed.startsWith(stryMutAct_9fa48("3120") ? "" : (stryCov_9fa48("3120"), "-")));
    const [whole, frac] = (negative ? stryMutAct_9fa48("3121") ? fixed : (stryCov_9fa48("3121"), fixed.slice(1)) : fixed).split(stryMutAct_9fa48("3122") ? "" : (stryCov_9fa48("3122"), "."));
    const grouped = whole.replace(stryMutAct_9fa48("3128") ? /\B(?=(\d{3})+(?!\D))/g : stryMutAct_9fa48("3127") ? /\B(?=(\d{3})+(?=\d))/g : stryMutAct_9fa48("3126") ? /\B(?=(\D{3})+(?!\d))/g : stryMutAct_9fa48("3125") ? /\B(?=(\d)+(?!\d))/g : stryMutAct_9fa48("3124") ? /\B(?=(\d{3})(?!\d))/g : stryMutAct_9fa48("3123") ? /\B(?!(\d{3})+(?!\d))/g : (stryCov_9fa48("3123", "3124", "3125", "3126", "3127", "3128"), /\B(?=(\d{3})+(?!\d))/g), stryMutAct_9fa48("3129") ? "" : (stryCov_9fa48("3129"), ","));
    const symbol = currencySymbol(currency);
    // CLDR currency spacing, as Intl applies it: a symbol ending in a letter ("CHF", "kr") is kept
    // off the digits by a no-break space; "$", "€" and "£" are not.
    const gap = (stryMutAct_9fa48("3131") ? /\P{L}$/u : stryMutAct_9fa48("3130") ? /\p{L}/u : (stryCov_9fa48("3130", "3131"), /\p{L}$/u)).test(symbol) ? stryMutAct_9fa48("3132") ? "" : (stryCov_9fa48("3132"), "\u00a0") : stryMutAct_9fa48("3133") ? "Stryker was here!" : (stryCov_9fa48("3133"), "");
    return stryMutAct_9fa48("3134") ? `` : (stryCov_9fa48("3134"), `${negative ? stryMutAct_9fa48("3135") ? "" : (stryCov_9fa48("3135"), "-") : stryMutAct_9fa48("3136") ? "Stryker was here!" : (stryCov_9fa48("3136"), "")}${symbol}${gap}${grouped}${frac ? stryMutAct_9fa48("3137") ? `` : (stryCov_9fa48("3137"), `.${frac}`) : stryMutAct_9fa48("3138") ? "Stryker was here!" : (stryCov_9fa48("3138"), "")}`);
  }
}