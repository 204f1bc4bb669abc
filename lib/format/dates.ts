// One way to write a date (and a date with its time) across the app, in the person's locale:
// from the browser's Accept-Language, else a fixed fallback. Times are in UTC and say so, so a
// page rendered on the server and hydrated in any browser reads the same.
/** The locale used when a request names none the runtime knows. */
export const FALLBACK_LOCALE = "en-GB";

const TZ = "UTC";

/** The first locale of an Accept-Language header that Intl supports (quality order), else the fallback. */
export function resolveLocale(acceptLanguage: string | null | undefined): string {
  if (!acceptLanguage) return FALLBACK_LOCALE;
  const tags = acceptLanguage
    .split(",")
    .map((part) => {
      const [tag, ...params] = part.split(";");
      const q = params.map((p) => /^\s*q=([\d.]+)\s*$/.exec(p)).find(Boolean);
      return { tag: tag.trim(), q: q ? Number(q[1]) : 1 };
    })
    .filter((t) => t.q > 0)
    // Array.prototype.sort is stable (ECMA-262 since 2019): equal weights keep the header's order.
    .sort((a, b) => b.q - a.q);
  for (const t of tags) {
    try {
      const [supported] = Intl.DateTimeFormat.supportedLocalesOf(t.tag);
      if (supported) return supported;
    } catch {
      // Intl refuses a tag that is not well-formed BCP 47 ("", the wildcard "*", "en_US"): try the next
    }
  }
  return FALLBACK_LOCALE;
}

const cache = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string, withTime: boolean): Intl.DateTimeFormat {
  const key = `${locale}|${withTime}`;
  let f = cache.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, withTime ? { dateStyle: "medium", timeStyle: "short", timeZone: TZ } : { dateStyle: "medium", timeZone: TZ });
    cache.set(key, f);
  }
  return f;
}

const asDate = (d: Date | string | number): Date => (d instanceof Date ? d : new Date(d));

/** A day, e.g. "2 Dec 2026" (en-GB), "Dec 2, 2026" (en-US), "02.12.2026" (de-DE). */
export function dateText(d: Date | string | number, locale: string = FALLBACK_LOCALE): string {
  const date = asDate(d);
  return Number.isNaN(date.getTime()) ? "–" : formatter(locale, false).format(date);
}

/** A day and time in UTC, e.g. "2 Dec 2026, 14:05 UTC". */
export function dateTimeText(d: Date | string | number, locale: string = FALLBACK_LOCALE): string {
  const date = asDate(d);
  return Number.isNaN(date.getTime()) ? "–" : `${formatter(locale, true).format(date)} ${TZ}`;
}

/** A count in the same locale, e.g. 12,345 or 12.345. */
export function countText(n: number, locale: string = FALLBACK_LOCALE): string {
  return new Intl.NumberFormat(locale, { maximumFractionDigits: 0 }).format(n);
}
