// @ts-nocheck
import { NextResponse } from "next/server";
import { z } from "zod";
import { PayloadTooLarge, readBodyCapped, withBody } from "@/app/_lib/body-limit";
import { route, parseQuery } from "@/app/_lib/http";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import { importShelfCsv } from "@/db/repo/shelf-csv";
import { MAX_CSV_BYTES, MAX_CSV_ROWS, shelfKindSchema } from "@/lib/shelf/rules";

const querySchema = z.object({
  kind: shelfKindSchema,
  commit: z.enum(["0", "1"], { error: "commit must be 0 (preview) or 1 (write)." }).default("0"),
});

const TOO_LARGE = `The file is larger than 1 MB; the limit is 1 MB and ${MAX_CSV_ROWS.toLocaleString("en-US")} rows. Split it into smaller files.`;
const tooLarge = () => NextResponse.json({ error: TOO_LARGE, fieldErrors: { file: [TOO_LARGE] } }, { status: 413 });

/** The CSV as text: a raw text/csv body, or the "file" field of a multipart form. */
async function readCsv(req: Request): Promise<string | null> {
  // Room for multipart framing around a file of the largest allowed size; counted while it streams.
  let body: Buffer;
  try {
    body = await readBodyCapped(req, MAX_CSV_BYTES + 16_384);
  } catch (e) {
    if (e instanceof PayloadTooLarge) return null;
    throw e;
  }
  if ((req.headers.get("content-type") ?? "").startsWith("multipart/form-data")) {
    const form = await withBody(req, body)
      .formData()
      .catch(() => {
        throw new FieldError("file", "The upload is not a well-formed multipart form (missing or broken boundary). Choose the file again.");
      });
    const file = form.get("file");
    if (!(file instanceof File)) throw new FieldError("file", "Choose a CSV file to upload.");
    if (file.size > MAX_CSV_BYTES) return null;
    return file.text();
  }
  return body.length > MAX_CSV_BYTES ? null : body.toString("utf8");
}

/**
 * CSV import (admin): `commit=0` parses and returns a preview with per-line errors; `commit=1`
 * writes every row in one transaction (upsert by part number), or nothing if any row is wrong.
 */
export const POST = route(async (req) => {
  const actor = await requireActor(["admin"]);
  const q = parseQuery(req, querySchema);
  const csv = await readCsv(req);
  if (csv === null) return tooLarge();
  const out = await importShelfCsv(getDb(), actor, q.kind, csv, { commit: q.commit === "1" });
  const body = { ...out, rows: out.rows.slice(0, 500), rowCount: out.rows.length };
  if (q.commit === "1" && !out.committed) {
    return NextResponse.json({ error: `Nothing was imported: ${out.errors.length} line${out.errors.length === 1 ? " has a problem" : "s have problems"}. Fix them and try again.`, ...body }, { status: 400 });
  }
  return body;
});
