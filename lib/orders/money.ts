// Prices in the shop's currency: exact decimal arithmetic (decimal.js), the currency's own minor
// units (ISO 4217, as the runtime's Intl data states them) and its symbol wherever a price shows.
import Decimal from "decimal.js";
import { z } from "zod";

/** Decimal arithmetic for money: plenty of digits, half-up rounding like a till. */
export const Cash = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_UP });

const CURRENCY = /^[A-Z]{3}$/;

function numberFormat(currency: string) {
  return new Intl.NumberFormat("en-US", { style: "currency", currency, currencyDisplay: "narrowSymbol" });
}

/** An ISO 4217 code the runtime knows, e.g. "USD", "EUR", "JPY". */
export const currencySchema = z
  .string({ error: "Currency must be a three-letter code like USD." })
  .trim()
  .toUpperCase()
  .refine((c) => CURRENCY.test(c) && Intl.supportedValuesOf("currency").includes(c), "Currency must be a three-letter ISO 4217 code like USD, EUR or GBP.");

/** Digits after the decimal point in this currency (2 for USD, 0 for JPY). */
export function minorDigits(currency: string): number {
  return numberFormat(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

/** The symbol shown before a price: "$", "€", "£", "¥". */
export function currencySymbol(currency: string): string {
  return numberFormat(currency).formatToParts(0).find((p) => p.type === "currency")?.value ?? currency;
}

/** An amount rounded half-up to the currency's minor unit, as a string ("12.5" → "12.50"). */
export function roundToCurrency(amount: Decimal.Value, currency: string): string {
  return new Cash(amount).toDecimalPlaces(minorDigits(currency)).toFixed(minorDigits(currency));
}

/** "1234.5", "USD" → "$1,234.50": the symbol, thousands grouped, the currency's decimals. */
export function formatPrice(amount: Decimal.Value, currency: string): string {
  const fixed = roundToCurrency(amount, currency);
  const negative = fixed.startsWith("-");
  const [whole, frac] = (negative ? fixed.slice(1) : fixed).split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
  const symbol = currencySymbol(currency);
  // CLDR currency spacing, as Intl applies it: a symbol ending in a letter ("CHF", "kr") is kept
  // off the digits by a no-break space; "$", "€" and "£" are not.
  const gap = /\p{L}$/u.test(symbol) ? "\u00a0" : "";
  return `${negative ? "-" : ""}${symbol}${gap}${grouped}${frac ? `.${frac}` : ""}`;
}

/** The integer count of minor units a payment service takes ("12.34" USD → 1234). */
export function toMinorUnits(amount: Decimal.Value, currency: string): number {
  const minor = new Cash(roundToCurrency(amount, currency)).times(new Cash(10).pow(minorDigits(currency)));
  return minor.toNumber();
}

/** Back from minor units to a decimal string (1234, "USD" → "12.34"). */
export function fromMinorUnits(minor: number, currency: string): string {
  return new Cash(minor).div(new Cash(10).pow(minorDigits(currency))).toFixed(minorDigits(currency));
}
