// @ts-nocheck
"use client";
// The person's locale for dates shown in the browser: the signed-in layout provides it from the
// request, and `useDates()` writes days and times the same way the server-rendered pages do.
import { createContext, useContext } from "react";
import { dateText, dateTimeText, FALLBACK_LOCALE } from "@/lib/format/dates";

const LocaleContext = createContext(FALLBACK_LOCALE);

export function LocaleProvider({ locale, children }: { locale: string; children: React.ReactNode }) {
  return <LocaleContext.Provider value={locale}>{children}</LocaleContext.Provider>;
}

/** Date writers in the person's locale. */
export function useDates() {
  const locale = useContext(LocaleContext);
  return { date: (d: Date | string | number) => dateText(d, locale), dateTime: (d: Date | string | number) => dateTimeText(d, locale) };
}
