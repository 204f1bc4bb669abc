// @ts-nocheck
"use client";
// The shop's currency for every price shown in the browser: the signed-in layout provides it
// from the shop's terms, and `usePrice()` writes an amount with its symbol ("$1,234.50").
import { createContext, useContext } from "react";
import { formatPrice } from "@/lib/orders/price-text";

const CurrencyContext = createContext("USD");

export function CurrencyProvider({ currency, children }: { currency: string; children: React.ReactNode }) {
  return <CurrencyContext.Provider value={currency}>{children}</CurrencyContext.Provider>;
}

/** A formatter for amounts (decimal strings) in the shop's currency. */
export function usePrice(): (amount: string) => string {
  const currency = useContext(CurrencyContext);
  return (amount) => formatPrice(amount, currency);
}
