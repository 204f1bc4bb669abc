// @ts-nocheck
// One way to write a date (and a date with its time) across the app, in the person's locale:
// from the browser's Accept-Language, else a fixed fallback. Times are in UTC and say so, so a
// page rendered on the server and hydrated in any browser reads the same.
/** The locale used when a request names none the runtime knows. */function stryNS_9fa48() {
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
export const FALLBACK_LOCALE = stryMutAct_9fa48("2392") ? "" : (stryCov_9fa48("2392"), "en-GB");
const TZ = stryMutAct_9fa48("2393") ? "" : (stryCov_9fa48("2393"), "UTC");

/** The first locale of an Accept-Language header that Intl supports (quality order), else the fallback. */
export function resolveLocale(acceptLanguage: string | null | undefined): string {
  if (stryMutAct_9fa48("2394")) {
    {}
  } else {
    stryCov_9fa48("2394");
    if (stryMutAct_9fa48("2397") ? false : stryMutAct_9fa48("2396") ? true : stryMutAct_9fa48("2395") ? acceptLanguage : (stryCov_9fa48("2395", "2396", "2397"), !acceptLanguage)) return FALLBACK_LOCALE;
    const tags = stryMutAct_9fa48("2399") ? acceptLanguage.split(",").map((part, i) => {
      const [tag, ...params] = part.trim().split(";");
      const q = params.map(p => /^\s*q=([\d.]+)\s*$/.exec(p)).find(Boolean);
      return {
        tag: tag.trim(),
        q: q ? Number(q[1]) : 1,
        i
      };
    }).sort((a, b) => b.q - a.q || a.i - b.i) : stryMutAct_9fa48("2398") ? acceptLanguage.split(",").map((part, i) => {
      const [tag, ...params] = part.trim().split(";");
      const q = params.map(p => /^\s*q=([\d.]+)\s*$/.exec(p)).find(Boolean);
      return {
        tag: tag.trim(),
        q: q ? Number(q[1]) : 1,
        i
      };
    }).filter(t => t.tag && t.tag !== "*" && t.q > 0 && /^[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*$/.test(t.tag)) : (stryCov_9fa48("2398", "2399"), acceptLanguage.split(stryMutAct_9fa48("2400") ? "" : (stryCov_9fa48("2400"), ",")).map((part, i) => {
      if (stryMutAct_9fa48("2401")) {
        {}
      } else {
        stryCov_9fa48("2401");
        const [tag, ...params] = stryMutAct_9fa48("2402") ? part.split(";") : (stryCov_9fa48("2402"), part.trim().split(stryMutAct_9fa48("2403") ? "" : (stryCov_9fa48("2403"), ";")));
        const q = params.map(stryMutAct_9fa48("2404") ? () => undefined : (stryCov_9fa48("2404"), p => (stryMutAct_9fa48("2413") ? /^\s*q=([\d.]+)\S*$/ : stryMutAct_9fa48("2412") ? /^\s*q=([\d.]+)\s$/ : stryMutAct_9fa48("2411") ? /^\s*q=([\D.]+)\s*$/ : stryMutAct_9fa48("2410") ? /^\s*q=([^\d.]+)\s*$/ : stryMutAct_9fa48("2409") ? /^\s*q=([\d.])\s*$/ : stryMutAct_9fa48("2408") ? /^\S*q=([\d.]+)\s*$/ : stryMutAct_9fa48("2407") ? /^\sq=([\d.]+)\s*$/ : stryMutAct_9fa48("2406") ? /^\s*q=([\d.]+)\s*/ : stryMutAct_9fa48("2405") ? /\s*q=([\d.]+)\s*$/ : (stryCov_9fa48("2405", "2406", "2407", "2408", "2409", "2410", "2411", "2412", "2413"), /^\s*q=([\d.]+)\s*$/)).exec(p))).find(Boolean);
        return stryMutAct_9fa48("2414") ? {} : (stryCov_9fa48("2414"), {
          tag: stryMutAct_9fa48("2415") ? tag : (stryCov_9fa48("2415"), tag.trim()),
          q: q ? Number(q[1]) : 1,
          i
        });
      }
    }).filter(stryMutAct_9fa48("2416") ? () => undefined : (stryCov_9fa48("2416"), t => stryMutAct_9fa48("2419") ? t.tag && t.tag !== "*" && t.q > 0 || /^[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*$/.test(t.tag) : stryMutAct_9fa48("2418") ? false : stryMutAct_9fa48("2417") ? true : (stryCov_9fa48("2417", "2418", "2419"), (stryMutAct_9fa48("2421") ? t.tag && t.tag !== "*" || t.q > 0 : stryMutAct_9fa48("2420") ? true : (stryCov_9fa48("2420", "2421"), (stryMutAct_9fa48("2423") ? t.tag || t.tag !== "*" : stryMutAct_9fa48("2422") ? true : (stryCov_9fa48("2422", "2423"), t.tag && (stryMutAct_9fa48("2425") ? t.tag === "*" : stryMutAct_9fa48("2424") ? true : (stryCov_9fa48("2424", "2425"), t.tag !== (stryMutAct_9fa48("2426") ? "" : (stryCov_9fa48("2426"), "*")))))) && (stryMutAct_9fa48("2429") ? t.q <= 0 : stryMutAct_9fa48("2428") ? t.q >= 0 : stryMutAct_9fa48("2427") ? true : (stryCov_9fa48("2427", "2428", "2429"), t.q > 0)))) && (stryMutAct_9fa48("2436") ? /^[A-Za-z]{2,8}(-[^A-Za-z0-9]{1,8})*$/ : stryMutAct_9fa48("2435") ? /^[A-Za-z]{2,8}(-[A-Za-z0-9])*$/ : stryMutAct_9fa48("2434") ? /^[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})$/ : stryMutAct_9fa48("2433") ? /^[^A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*$/ : stryMutAct_9fa48("2432") ? /^[A-Za-z](-[A-Za-z0-9]{1,8})*$/ : stryMutAct_9fa48("2431") ? /^[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*/ : stryMutAct_9fa48("2430") ? /[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*$/ : (stryCov_9fa48("2430", "2431", "2432", "2433", "2434", "2435", "2436"), /^[A-Za-z]{2,8}(-[A-Za-z0-9]{1,8})*$/)).test(t.tag)))).sort(stryMutAct_9fa48("2437") ? () => undefined : (stryCov_9fa48("2437"), (a, b) => stryMutAct_9fa48("2440") ? b.q - a.q && a.i - b.i : stryMutAct_9fa48("2439") ? false : stryMutAct_9fa48("2438") ? true : (stryCov_9fa48("2438", "2439", "2440"), (stryMutAct_9fa48("2441") ? b.q + a.q : (stryCov_9fa48("2441"), b.q - a.q)) || (stryMutAct_9fa48("2442") ? a.i + b.i : (stryCov_9fa48("2442"), a.i - b.i))))));
    for (const t of tags) {
      if (stryMutAct_9fa48("2443")) {
        {}
      } else {
        stryCov_9fa48("2443");
        try {
          if (stryMutAct_9fa48("2444")) {
            {}
          } else {
            stryCov_9fa48("2444");
            const [supported] = Intl.DateTimeFormat.supportedLocalesOf(t.tag);
            if (stryMutAct_9fa48("2446") ? false : stryMutAct_9fa48("2445") ? true : (stryCov_9fa48("2445", "2446"), supported)) return supported;
          }
        } catch {
          // a malformed tag: try the next
        }
      }
    }
    return FALLBACK_LOCALE;
  }
}
const cache = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string, withTime: boolean): Intl.DateTimeFormat {
  if (stryMutAct_9fa48("2447")) {
    {}
  } else {
    stryCov_9fa48("2447");
    const key = stryMutAct_9fa48("2448") ? `` : (stryCov_9fa48("2448"), `${locale}|${withTime}`);
    let f = cache.get(key);
    if (stryMutAct_9fa48("2451") ? false : stryMutAct_9fa48("2450") ? true : stryMutAct_9fa48("2449") ? f : (stryCov_9fa48("2449", "2450", "2451"), !f)) {
      if (stryMutAct_9fa48("2452")) {
        {}
      } else {
        stryCov_9fa48("2452");
        f = new Intl.DateTimeFormat(locale, withTime ? stryMutAct_9fa48("2453") ? {} : (stryCov_9fa48("2453"), {
          dateStyle: stryMutAct_9fa48("2454") ? "" : (stryCov_9fa48("2454"), "medium"),
          timeStyle: stryMutAct_9fa48("2455") ? "" : (stryCov_9fa48("2455"), "short"),
          timeZone: TZ
        }) : stryMutAct_9fa48("2456") ? {} : (stryCov_9fa48("2456"), {
          dateStyle: stryMutAct_9fa48("2457") ? "" : (stryCov_9fa48("2457"), "medium"),
          timeZone: TZ
        }));
        cache.set(key, f);
      }
    }
    return f;
  }
}
const asDate = stryMutAct_9fa48("2458") ? () => undefined : (stryCov_9fa48("2458"), (() => {
  const asDate = (d: Date | string | number): Date => d instanceof Date ? d : new Date(d);
  return asDate;
})());

/** A day, e.g. "2 Dec 2026" (en-GB), "Dec 2, 2026" (en-US), "02.12.2026" (de-DE). */
export function dateText(d: Date | string | number, locale: string = FALLBACK_LOCALE): string {
  if (stryMutAct_9fa48("2459")) {
    {}
  } else {
    stryCov_9fa48("2459");
    const date = asDate(d);
    return Number.isNaN(date.getTime()) ? stryMutAct_9fa48("2460") ? "" : (stryCov_9fa48("2460"), "–") : formatter(locale, stryMutAct_9fa48("2461") ? true : (stryCov_9fa48("2461"), false)).format(date);
  }
}

/** A day and time in UTC, e.g. "2 Dec 2026, 14:05 UTC". */
export function dateTimeText(d: Date | string | number, locale: string = FALLBACK_LOCALE): string {
  if (stryMutAct_9fa48("2462")) {
    {}
  } else {
    stryCov_9fa48("2462");
    const date = asDate(d);
    return Number.isNaN(date.getTime()) ? stryMutAct_9fa48("2463") ? "" : (stryCov_9fa48("2463"), "–") : stryMutAct_9fa48("2464") ? `` : (stryCov_9fa48("2464"), `${formatter(locale, stryMutAct_9fa48("2465") ? false : (stryCov_9fa48("2465"), true)).format(date)} ${TZ}`);
  }
}

/** A count in the same locale, e.g. 12,345 or 12.345. */
export function countText(n: number, locale: string = FALLBACK_LOCALE): string {
  if (stryMutAct_9fa48("2466")) {
    {}
  } else {
    stryCov_9fa48("2466");
    return new Intl.NumberFormat(locale, stryMutAct_9fa48("2467") ? {} : (stryCov_9fa48("2467"), {
      maximumFractionDigits: 0
    })).format(n);
  }
}