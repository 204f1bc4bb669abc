// @ts-nocheck
import "server-only";
import { z } from "zod";

/** Route context of /api/combinations/[id]/… (params are a Promise in current Next.js). */
export type IdContext = { params: Promise<{ id: string }> };
export type RevisionContext = { params: Promise<{ id: string; number: string }> };

/** A revision number from the URL: a whole number from 1. */
export const revisionNumberSchema = z.coerce
  .number({ error: "number must be a revision number" })
  .int("number must be a whole number")
  .min(1, "number must be 1 or more");

/** Optional body of a duplicate request. */
export const duplicateSchema = z
  .object({
    name: z.string().trim().min(1, "Give the copy a name.").max(120, "Name must be at most 120 characters.").optional(),
    revision: revisionNumberSchema.optional(),
  })
  .strict();

/** ?ids=a,b,c of the export: combination ids. */
export const exportQuerySchema = z.object({
  ids: z
    .string()
    .max(200 * 40, "Too many ids.")
    .transform((s) => s.split(",").map((x) => x.trim()).filter(Boolean))
    .pipe(z.array(z.uuid("Each id must be a combination id.")).max(200, "Export at most 200 combinations at a time."))
    .optional(),
});
