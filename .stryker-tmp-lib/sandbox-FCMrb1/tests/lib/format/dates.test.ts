// @ts-nocheck
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
  });
  it("groups counts per locale", () => {
    expect(countText(12345, "en-GB")).toBe("12,345");
    expect(countText(12345, "de-DE")).toBe("12.345");
  });
});
