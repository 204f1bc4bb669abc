// Prices written for people: the currency's symbol, thousands grouped, its own minor units.
// Kept apart from money.ts (decimal.js, zod) so the browser can show prices without loading either:
// every signed-in page provides the currency through components/price.tsx.

function numberFormat(currency: string) {
  return new Intl.NumberFormat("en-US", { style: "currency", currency, currencyDisplay: "narrowSymbol" });
}

/** Digits after the decimal point in this currency (2 for USD, 0 for JPY). */
export function minorDigits(currency: string): number {
  return numberFormat(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

/** The symbol shown before a price: "$", "€", "£", "¥". */
export function currencySymbol(currency: string): string {
  return numberFormat(currency).formatToParts(0).find((p) => p.type === "currency")?.value ?? currency;
}

/** An amount (a decimal string, a number, or a decimal.js value) as exact decimal text. */
type Amount = string | number | { toFixed(): string };

/** "1234.5", "USD" → "$1,234.50": the symbol, thousands grouped, the currency's decimals. Rounds
 *  half away from zero (a till's half-up) on the exact decimal: Intl formats a decimal string
 *  without going through binary floating point. */
export function formatPrice(amount: Amount, currency: string): string {
  const digits = minorDigits(currency);
  const exact = typeof amount === "object" ? amount.toFixed() : String(amount);
  const fixed = new Intl.NumberFormat("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits, roundingMode: "halfExpand" }).format(exact as unknown as number);
  const negative = fixed.startsWith("-");
  const [grouped, frac] = (negative ? fixed.slice(1) : fixed).split(".");
  const symbol = currencySymbol(currency);
  // CLDR currency spacing, as Intl applies it: a symbol ending in a letter ("CHF", "kr") is kept
  // off the digits by a no-break space; "$", "€" and "£" are not.
  const gap = /\p{L}$/u.test(symbol) ? "\u00a0" : "";
  return `${negative ? "-" : ""}${symbol}${gap}${grouped}${frac ? `.${frac}` : ""}`;
}
