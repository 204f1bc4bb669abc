// @ts-nocheck
// Unit words of each system, to scan a page for the wrong system's units, and the page's text
// with the words people typed taken out (a customer's note may well say "2.5 in exhaust" on a
// metric sheet: only the figures the app writes must follow the reader's units).
import type { Page } from "playwright-core";

// Unit words of each side, as they would appear after a figure or on their own (author's list,
// from calc/units.ts). "in" and "m" only after a number, since both are also English words.
export const METRIC = /\d\s?mm\b|\bkPa\b|°C|\bkW\b|N·m|m³|\d\s?L\b|\bL\/rev\b|\(L\)|cc\/min|kg\/h|g\/\(kW·h\)|\bbar\b|\d\s?m\b/;
export const IMPERIAL = /\d\s?in\b|\(in\)|\bpsi\b|°F|\bhp\b|lb·ft|in³|\bcfm\b|lb\/h|lb\/\(hp·h\)|\d\s?ft\b/;

/** The first match of `re` in `text` with some text around it (for the failure message), or null. */
export const firstMatch = (text: string, re: RegExp) => {
  const m = re.exec(text);
  return m ? text.slice(Math.max(0, m.index - 40), m.index + 20) : null;
};

const oneLine = (s: string) => s.replace(/\s+/g, " ").trim();

/** `text` with every occurrence of each of `typed` removed (white space compared as single spaces, longest first). */
export function withoutTyped(text: string, typed: readonly string[]): string {
  let out = oneLine(text);
  const words = typed.map(oneLine).filter(Boolean);
  for (const w of [...words].sort((a, b) => b.length - a.length)) out = out.split(w).join(" ");
  return out;
}

/**
 * What a reader of the page gets: its visible text (hidden chart tables included), each slider's
 * spoken value (aria-valuetext), each image's label (a chart's aria-label), less the words people typed.
 */
export async function readerText(page: Page, typed: readonly string[]): Promise<string> {
  const text = await page.evaluate(() => {
    const spoken = [...document.querySelectorAll("[aria-valuetext], [role=img][aria-label]")].map((e) => e.getAttribute("aria-valuetext") ?? e.getAttribute("aria-label") ?? "");
    return [document.body.innerText, ...spoken].join("\n");
  });
  return withoutTyped(text, typed);
}
