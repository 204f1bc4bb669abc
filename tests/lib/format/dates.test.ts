// One date format per locale: the formatter pages, lists, the sheet, the share page and the e-mail use.
import { describe, expect, it } from "vitest";
import { countText, dateText, dateTimeText, FALLBACK_LOCALE, resolveLocale } from "@/lib/format/dates";

// 2026-03-04 05:06 UTC: day, month and hour all different, so an order mix-up cannot pass.
const when = new Date(Date.UTC(2026, 2, 4, 5, 6, 0));

describe("resolveLocale", () => {
  it("takes the best-quality tag the runtime supports", () => {
    expect(resolveLocale("de-DE,de;q=0.9,en;q=0.8")).toBe("de-DE");
    expect(resolveLocale("en;q=0.5, fr-CA;q=0.9")).toBe("fr-CA");
  });
  it("falls back for nothing, a wildcard or junk", () => {
    expect(resolveLocale(undefined)).toBe(FALLBACK_LOCALE);
    expect(resolveLocale("")).toBe(FALLBACK_LOCALE);
    expect(resolveLocale("*")).toBe(FALLBACK_LOCALE);
    expect(resolveLocale("<script>,;;q=x")).toBe(FALLBACK_LOCALE);
  });
  // source: ECMA-402 §9.2.1 (CanonicalizeLocaleList throws a RangeError for a tag that is not
  // well-formed BCP 47, RFC 5646): such a tag is skipped for the next one.
  it("skips a tag that is not well-formed BCP 47 and takes the next", () => {
    expect(resolveLocale("en_US, de")).toBe("de");
    expect(resolveLocale("*, x-private, fr-CA;q=0.5")).toBe("fr-CA");
  });
  // source: RFC 9110 §12.5.4 (Accept-Language; q=0 means "not acceptable", equal weights keep
  // the sender's order) and §12.4.2 (quality values, optional whitespace around the ";").
  it("never takes a tag weighted q=0", () => {
    expect(resolveLocale("fr-CA;q=0")).toBe(FALLBACK_LOCALE);
    expect(resolveLocale("fr-CA;q=0, de-DE;q=0.1")).toBe("de-DE");
  });
  it("keeps the header's order between tags of equal weight, whichever comes first", () => {
    expect(resolveLocale("de-DE;q=0.8,fr-CA;q=0.8")).toBe("de-DE");
    expect(resolveLocale("fr-CA;q=0.8,de-DE;q=0.8")).toBe("fr-CA");
    expect(resolveLocale("fr-CA,de-DE")).toBe("fr-CA");
  });
  it("reads a weight written with spaces around it", () => {
    expect(resolveLocale("de-DE;q=0.5 ,  fr-CA ;  q=0.9  ")).toBe("fr-CA");
    // A parameter that only ends in "q=" is not the weight: fr-CA keeps q=1.
    expect(resolveLocale("fr-CA;xq=0.1, de-DE;q=0.5")).toBe("fr-CA");
    // Nor is a weight with anything but spaces after its digits: de-DE keeps q=1.
    expect(resolveLocale("de-DE;q=0.5x, fr-CA;q=0.9")).toBe("de-DE");
  });
  it("passes over tags the runtime does not know or refuses, and takes its own spelling of the next", () => {
    // Node's ICU: "xx-YY" is well formed but unknown (no locale), "root" is refused with a RangeError.
    expect(resolveLocale("xx-YY,de-DE;q=0.5")).toBe("de-DE");
    expect(resolveLocale("root,de-DE;q=0.5")).toBe("de-DE");
    expect(resolveLocale("EN-us")).toBe("en-US");
    expect(resolveLocale("xx-YY")).toBe(FALLBACK_LOCALE);
    expect(resolveLocale(",, de-DE")).toBe("de-DE");
  });
});

describe("dateText and dateTimeText", () => {
  // source: CLDR medium date patterns as shipped in Node's ICU (en-GB "d MMM y", en-US "MMM d, y", de "dd.MM.y").
  it("writes a day in the locale's own order", () => {
    expect(dateText(when, "en-GB")).toBe("4 Mar 2026");
    expect(dateText(when, "en-US")).toBe("Mar 4, 2026");
    expect(dateText(when, "de-DE")).toBe("04.03.2026");
  });
  it("writes a time in UTC and says so, whatever the server's zone", () => {
    expect(dateTimeText(when, "en-GB")).toBe("4 Mar 2026, 05:06 UTC");
    expect(dateTimeText(when.toISOString(), "de-DE")).toMatch(/^04\.03\.2026, 05:06 UTC$/);
  });
  it("accepts strings and numbers alike, and marks a bad date", () => {
    expect(dateText(when.toISOString())).toBe(dateText(when.getTime()));
    expect(dateText("not a date")).toBe("–");
    expect(dateTimeText("not a date")).toBe("–");
    expect(dateTimeText(Number.NaN, "de-DE")).toBe("–");
  });
  it("groups counts per locale", () => {
    expect(countText(12345, "en-GB")).toBe("12,345");
    expect(countText(12345, "de-DE")).toBe("12.345");
    // Whole numbers only: 12 345.6 rounds half away from zero to 12 346 (ECMA-402 default rounding).
    expect(countText(12345.6, "en-GB")).toBe("12,346");
    expect(countText(12345.4)).toBe("12,345");
  });
});
