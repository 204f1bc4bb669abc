// The order rules without a database: prices in the shop's currency, the deposit, and how the
// shelf's stock is shared out. References: integer minor units (BigInt), the runtime's own
// ECMA-402 Intl.NumberFormat for how a currency is written, and ISO 4217 for minor units.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { depositFor, depositRuleSchema, shopTermsSchema } from "@/lib/orders/deposit";
import { Cash, currencySymbol, formatPrice, fromMinorUnits, minorDigits, roundToCurrency, toMinorUnits } from "@/lib/orders/money";
import { allocate, canCancel, canMarkFitted, statusAfterReservation } from "@/lib/orders/status";

const amount = fc.tuple(fc.bigInt({ min: 0n, max: 9_999_999_999n }), fc.integer({ min: 0, max: 99 })).map(([w, c]) => `${w}.${String(c).padStart(2, "0")}`);
const cents = (s: string) => {
  const [w, f = ""] = s.split(".");
  return BigInt(w) * 100n + BigInt((f + "00").slice(0, 2));
};

describe("prices in the shop's currency", () => {
  it("minor units follow ISO 4217: two for USD, EUR and GBP, none for JPY, three for KWD", () => {
    // source: ISO 4217 currency code list, "minor unit" column.
    expect([minorDigits("USD"), minorDigits("EUR"), minorDigits("GBP"), minorDigits("JPY"), minorDigits("KWD")]).toEqual([2, 2, 2, 0, 3]);
  });

  it("symbols: $ for USD, € for EUR, £ for GBP (source: ECMA-402 Intl.NumberFormat narrowSymbol, CLDR data)", () => {
    expect([currencySymbol("USD"), currencySymbol("EUR"), currencySymbol("GBP")]).toEqual(["$", "€", "£"]);
  });

  it("formatPrice writes what Intl.NumberFormat writes for the same amount, without binary floating point", () => {
    // source: the runtime's ECMA-402 Intl.NumberFormat (en-US, currency, narrowSymbol) as the reference;
    // amounts kept below 2^53 cents so the reference's own doubles are exact.
    const small = fc.tuple(fc.integer({ min: 0, max: 99_999_999 }), fc.integer({ min: 0, max: 99 })).map(([w, c]) => `${w}.${String(c).padStart(2, "0")}`);
    fc.assert(
      fc.property(small, fc.constantFrom("USD", "EUR", "GBP", "CHF", "SEK"), (a, cur) => {
        const ref = new Intl.NumberFormat("en-US", { style: "currency", currency: cur, currencyDisplay: "narrowSymbol" }).format(Number(a));
        expect(formatPrice(a, cur)).toBe(ref);
      }),
    );
    expect(formatPrice("256", "USD")).toBe("$256.00");
    expect(formatPrice("1234567.5", "EUR")).toBe("€1,234,567.50");
  });

  it("formatPrice rounds half up on the exact decimal, as decimal.js does (the browser's copy loads no decimal.js)", () => {
    // source: decimal.js ROUND_HALF_UP (money.ts's Cash, roundToCurrency) as the reference, on amounts with a third
    // decimal so that ties occur; binary floating point would round 1.005 down.
    const thousandths = fc.tuple(fc.integer({ min: -9_999_999, max: 9_999_999 }), fc.integer({ min: 0, max: 999 })).map(([w, m]) => `${w}.${String(m).padStart(3, "0")}`);
    fc.assert(
      fc.property(thousandths, fc.constantFrom("USD", "JPY", "KWD"), (a, cur) => {
        const rounded = roundToCurrency(a, cur);
        expect(formatPrice(a, cur).replace(/[^\d.-]/g, "")).toBe(rounded);
      }),
    );
    expect(formatPrice("1.005", "USD")).toBe("$1.01");
    expect(formatPrice(new Cash("2.5"), "JPY")).toBe("¥3");
  });

  it("minor units round-trip exactly for every amount up to 9 999 999 999.99", () => {
    fc.assert(
      fc.property(amount, (a) => {
        expect(BigInt(toMinorUnits(a, "USD"))).toBe(cents(a));
        expect(fromMinorUnits(toMinorUnits(a, "USD"), "USD")).toBe(a);
      }),
    );
  });
});

describe("the deposit", () => {
  it("25 % of 180.50 is 45.13 (45.125 rounded half-up, common practice for a till, no published source)", () => {
    expect(depositFor("180.50", { kind: "percent", value: "25" }, "USD")).toBe("45.13");
    expect(depositFor("180.50", { kind: "fixed", value: "100" }, "USD")).toBe("100.00");
    expect(depositFor("80.00", { kind: "fixed", value: "100" }, "USD")).toBe("80.00");
    expect(depositFor("1000", { kind: "percent", value: "33.33" }, "JPY")).toBe("333");
  });

  it("a percentage deposit is within one half cent of the exact share, never above the total, and grows with the total", () => {
    const pct = fc.integer({ min: 1, max: 10_000 }).map((n) => (n / 100).toFixed(2));
    fc.assert(
      fc.property(amount, amount, pct, (a, b, p) => {
        const d = cents(depositFor(a, { kind: "percent", value: p }, "USD"));
        // exact share in hundredths of a cent: total (cents) × percent (hundredths) / 100 / 100
        const exact4 = cents(a) * cents(p);
        expect(d * 10_000n - exact4 <= 5_000n && exact4 - d * 10_000n < 5_000n).toBe(true);
        expect(d <= cents(a)).toBe(true);
        const [lo, hi] = cents(a) <= cents(b) ? [a, b] : [b, a];
        expect(cents(depositFor(lo, { kind: "percent", value: p }, "USD")) <= cents(depositFor(hi, { kind: "percent", value: p }, "USD"))).toBe(true);
      }),
    );
  });

  it("a fixed deposit is the smaller of the amount and the total; 100 % is the whole total", () => {
    fc.assert(
      fc.property(amount, amount, (total, fixed) => {
        const d = cents(depositFor(total, { kind: "fixed", value: fixed }, "USD"));
        expect(d).toBe(cents(total) < cents(fixed) ? cents(total) : cents(fixed));
        expect(depositFor(total, { kind: "percent", value: "100" }, "USD")).toBe(total);
      }),
    );
  });

  it("the rule's bounds name the field: a percentage above 100 or a zero deposit is refused", () => {
    expect(depositRuleSchema.safeParse({ kind: "percent", value: "100.01" }).error?.issues[0].path).toEqual(["value"]);
    expect(depositRuleSchema.safeParse({ kind: "fixed", value: "0" }).error?.issues).toEqual([expect.objectContaining({ path: ["value"], message: "A fixed deposit must be more than 0." })]);
    expect(depositRuleSchema.safeParse({ kind: "fixed", value: "-5" }).success).toBe(false);
    expect(shopTermsSchema.safeParse({ currency: "usd", depositKind: "fixed", depositValue: 150 }).data).toEqual({ currency: "USD", depositKind: "fixed", depositValue: "150.00" });
    expect(shopTermsSchema.safeParse({ currency: "XXQ", depositKind: "fixed", depositValue: 150 }).error?.issues[0].path).toEqual(["currency"]);
  });
});

describe("sharing out the shelf", () => {
  it("reserves what is there, back-orders the rest, never takes more than the shelf holds", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999 }), fc.integer({ min: 0, max: 999 }), (want, have) => {
        const a = allocate(want, have);
        expect(a.reserved + a.backOrdered).toBe(want);
        expect(a.reserved).toBeLessThanOrEqual(have);
        expect(a.reserved).toBe(Math.min(want, have));
        expect(statusAfterReservation(a.backOrdered)).toBe(want > have ? "back-ordered" : "parts-reserved");
      }),
    );
  });

  it("fitted and cancelled orders are closed to further moves", () => {
    expect([canCancel("fitted"), canCancel("refunded"), canCancel("cancelled"), canMarkFitted("awaiting-payment")]).toEqual([false, false, false, false]);
    expect([canCancel("awaiting-payment"), canCancel("back-ordered"), canMarkFitted("parts-reserved")]).toEqual([true, true, true]);
  });
});
