// How prices and deposit rules read, beyond the en-US dollar: a currency without minor units,
// one with three, negative amounts (refunds), and the rule's own wording. Reference: the runtime's
// ECMA-402 Intl.NumberFormat (en-US, narrowSymbol) and ISO 4217's minor-unit column.
import { describe, expect, it } from "vitest";
import { describeDeposit, shopTermsSchema } from "@/lib/orders/deposit";
import { currencySchema, currencySymbol, formatPrice, fromMinorUnits, roundToCurrency, toMinorUnits } from "@/lib/orders/money";

const intl = (amount: number, currency: string) => new Intl.NumberFormat("en-US", { style: "currency", currency, currencyDisplay: "narrowSymbol" }).format(amount);

describe("prices in other currencies", () => {
  it("yen have no minor unit: 1234.5 JPY is ¥1,235 (half-up), as Intl writes it", () => {
    expect(formatPrice("1234.5", "JPY")).toBe("¥1,235");
    expect(formatPrice("1234.5", "JPY")).toBe(intl(1235, "JPY"));
    expect(toMinorUnits("1234.5", "JPY")).toBe(1235);
    expect(fromMinorUnits(1235, "JPY")).toBe("1235");
    expect(currencySymbol("JPY")).toBe("¥");
  });

  it("Kuwaiti dinar keep three decimals (ISO 4217)", () => {
    expect(roundToCurrency("1.2345", "KWD")).toBe("1.235");
    expect(toMinorUnits("1.2345", "KWD")).toBe(1235);
    expect(fromMinorUnits(1235, "KWD")).toBe("1.235");
    // A symbol made of letters stands off the digits by a no-break space, as Intl (CLDR currency spacing) writes it.
    expect(formatPrice("1234.5", "KWD")).toBe(intl(1234.5, "KWD"));
    expect(formatPrice("1234.5", "KWD")).toBe("KWD\u00a01,234.500");
    expect(formatPrice("-1234.5", "CHF")).toBe(intl(-1234.5, "CHF"));
    expect(formatPrice("99", "SEK")).toBe(intl(99, "SEK"));
  });

  it("a symbol with a letter before its sign keeps to the digits; one ending in a letter does not (CLDR currency spacing)", () => {
    // Intl, en-US narrowSymbol: "R$1,234,567.50" (BRL), "R 1,234,567.50" (ZAR), "kr 1,234,567.50" (NOK).
    for (const c of ["BRL", "ZAR", "NOK", "INR"]) expect(formatPrice("1234567.5", c), c).toBe(intl(1234567.5, c));
    expect(formatPrice("1234567.5", "BRL")).toBe("R$1,234,567.50");
  });

  it("a negative amount (a refund) puts its sign before the symbol, as Intl does", () => {
    expect(formatPrice("-1234.5", "USD")).toBe("-$1,234.50");
    expect(formatPrice("-1234.5", "USD")).toBe(intl(-1234.5, "USD"));
    expect(formatPrice("-0.5", "EUR")).toBe(intl(-0.5, "EUR"));
  });

  it("a currency is a known ISO 4217 code, upper-cased", () => {
    expect(currencySchema.parse(" gbp ")).toBe("GBP");
    for (const bad of ["US", "USDX", "XYZ", "12A"]) expect(currencySchema.safeParse(bad).error?.issues[0].message, bad).toBe("Currency must be a three-letter ISO 4217 code like USD, EUR or GBP.");
    expect(currencySchema.safeParse(5).error?.issues[0].message).toBe("Currency must be a three-letter code like USD.");
  });
});

describe("the deposit rule in words and in the admin's form", () => {
  it("a percentage reads as a share of the total; a fixed amount as the formatted amount or the total", () => {
    const fmt = (a: string) => formatPrice(a, "USD");
    expect(describeDeposit({ kind: "percent", value: "25.50" }, fmt)).toBe("25.5% of the total");
    expect(describeDeposit({ kind: "fixed", value: "150" }, fmt)).toBe("$150.00 (or the total, when less)");
  });

  it("the form's errors land on depositKind and depositValue; a good form keeps the value to two decimals", () => {
    const kind = shopTermsSchema.safeParse({ currency: "USD", depositKind: "share", depositValue: "10" });
    expect(kind.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([["depositKind", "Deposit kind must be percent or fixed."]]);
    const pct = shopTermsSchema.safeParse({ currency: "USD", depositKind: "percent", depositValue: "0" });
    expect(pct.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([["depositValue", "A percentage deposit must be more than 0 and at most 100."]]);
    const fixed = shopTermsSchema.safeParse({ currency: "USD", depositKind: "fixed", depositValue: "0" });
    expect(fixed.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([["depositValue", "A fixed deposit must be more than 0."]]);
    const text = shopTermsSchema.safeParse({ currency: "USD", depositKind: "fixed", depositValue: "ten" });
    expect(text.error?.issues[0].path).toEqual(["depositValue"]);
    expect(text.error?.issues[0].message).toBe("Deposit must be a number with at most two decimals, like 25 or 150.00.");
    expect(shopTermsSchema.parse({ currency: "eur", depositKind: "percent", depositValue: " 100 " })).toEqual({ currency: "EUR", depositKind: "percent", depositValue: "100.00" });
  });
});
