// Cleaning options in the address (shared by the server pages and the client controls).
import { cleaningSchema, type CleaningOptions } from "@/lib/datalogs/parse";

export type CleaningQuery = Partial<Record<keyof CleaningOptions, string>>;

/** Cleaning options from the page's search params; bad values fall back to the defaults. */
export function cleaningFromQuery(q: CleaningQuery): CleaningOptions {
  const defaults = cleaningSchema.parse({});
  const out = { ...defaults };
  // A missing option parses to its default too.
  for (const k of Object.keys(defaults) as (keyof CleaningOptions)[]) {
    const r = cleaningSchema.shape[k].safeParse(q[k]);
    if (r.success) out[k] = r.data;
  }
  return out;
}

export function cleaningToQuery(o: CleaningOptions): string {
  return new URLSearchParams(Object.entries(o).map(([k, v]) => [k, String(v)])).toString();
}
