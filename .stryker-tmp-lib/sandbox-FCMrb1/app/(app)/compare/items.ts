// @ts-nocheck
// The query string of Side by side: ?items=<combinationId>:<revision|current>,…&at=<rpm>,…
// Pure, so the page and the tests read it the same way.
import { z } from "zod";

export type CompareItem = { combinationId: string; revision: number | "current" };

export const MAX_ITEMS = 4;
export const MAX_SPEEDS = 6;

const itemSchema = z.string().regex(/^[0-9a-f-]{36}:(current|[1-9][0-9]{0,5})$/i);

/** Items from the query: well-formed ones (at most four, no repeats) and the count of ignored ones. */
export function parseItems(raw: string | string[] | undefined): { items: CompareItem[]; ignored: number } {
  const text = Array.isArray(raw) ? raw.join(",") : (raw ?? "");
  const parts = text.split(",").map((s) => s.trim()).filter(Boolean);
  const items: CompareItem[] = [];
  let ignored = 0;
  for (const p of parts) {
    if (!itemSchema.safeParse(p).success || items.length >= MAX_ITEMS) {
      ignored++;
      continue;
    }
    const [combinationId, rev] = p.split(":");
    const item: CompareItem = { combinationId: combinationId.toLowerCase(), revision: rev === "current" ? "current" : Number(rev) };
    if (items.some((i) => i.combinationId === item.combinationId && i.revision === item.revision)) continue;
    items.push(item);
  }
  return { items, ignored };
}

/** Engine speeds for the deltas table from the query (100–20 000 rpm, at most six, sorted). */
export function parseSpeeds(raw: string | string[] | undefined): number[] {
  const text = Array.isArray(raw) ? raw.join(",") : (raw ?? "");
  const speeds = text
    .split(",")
    .map((s) => Number(s.trim()))
    .filter((n) => Number.isFinite(n) && n >= 100 && n <= 20_000)
    .map((n) => Math.round(n));
  return [...new Set(speeds)].sort((a, b) => a - b).slice(0, MAX_SPEEDS);
}

/** The query string for a set of items and speeds. */
export function compareQuery(items: readonly CompareItem[], speeds: readonly number[]): string {
  const q = new URLSearchParams();
  if (items.length) q.set("items", items.map((i) => `${i.combinationId}:${i.revision}`).join(","));
  if (speeds.length) q.set("at", speeds.join(","));
  return q.toString();
}
