// @ts-nocheck
// The parts shelf as files: CSV import (preview, then all rows or none) and export, in the
// columns lib/shelf/csv.ts reads. The same admin-only rule as the shelf's other edits.
import Papa from "papaparse";
import { asc, inArray, sql, type Column } from "drizzle-orm";
import type { DbOrTx } from "@/db/connect";
import { assert, canEditShelf, canSeeShelf, type Actor } from "@/db/policy";
import { ONLY_ADMIN } from "@/db/repo/shelf";
import { blowers, pulleys } from "@/db/schema";
import { litres, mm, parseShelfCsv, safeText } from "@/lib/shelf/csv";
import { BLOWER_CSV_COLUMNS, PULLEY_CSV_COLUMNS, type BlowerRecord, type CsvPreviewRow, type CsvRowError, type PulleyRecord, type ShelfKind } from "@/lib/shelf/rules";

/** An upsert's SET list: each named column takes the value of the row that was refused (`excluded`). */
function excludedOf<T extends typeof pulleys | typeof blowers>(table: T, keys: readonly (keyof T["_"]["columns"])[]) {
  const columns = table as unknown as Record<string, Column>;
  return Object.fromEntries(keys.map((k) => [k, sql`excluded.${sql.identifier(columns[k as string].name)}`]));
}

export type ImportOutcome = {
  kind: ShelfKind;
  committed: boolean;
  rows: CsvPreviewRow<PulleyRecord | BlowerRecord>[];
  errors: CsvRowError[];
  inserted: number;
  updated: number;
};

/**
 * CSV import: `commit: false` is the preview; `commit: true` writes every row (upsert by part
 * number) in one transaction, or nothing at all if any row has an error.
 */
export async function importShelfCsv(db: DbOrTx, actor: Actor, kind: ShelfKind, csv: string, opts: { commit: boolean }): Promise<ImportOutcome> {
  assert(canEditShelf(actor), ONLY_ADMIN);
  const { rows, errors } = parseShelfCsv(kind, csv);
  const outcome: ImportOutcome = { kind, committed: false, rows, errors, inserted: 0, updated: 0 };
  if (!opts.commit || errors.length) return outcome;

  // A part number is one thing: a pulley's number may not name a blower and the other way round.
  const numbers = rows.map((r) => r.record.partNumber);
  const other = kind === "pulleys" ? blowers : pulleys;
  const clashes = await db.select({ partNumber: other.partNumber }).from(other).where(inArray(other.partNumber, numbers));
  if (clashes.length) {
    const lineOf = new Map(rows.map((r) => [r.record.partNumber, r.line]));
    outcome.errors = clashes.map((c) => ({ line: lineOf.get(c.partNumber) ?? 0, column: "part_number", message: `Part number ${c.partNumber} belongs to a ${kind === "pulleys" ? "blower" : "pulley"} on the shelf.` }));
    return outcome;
  }

  const CHUNK = 500;
  await db.transaction(async (tx) => {
    for (let i = 0; i < rows.length; i += CHUNK) {
      const chunk = rows.slice(i, i + CHUNK).map((r) => r.record);
      const now = new Date();
      const written =
        kind === "pulleys"
          ? await tx
              .insert(pulleys)
              .values(chunk as PulleyRecord[])
              .onConflictDoUpdate({
                target: pulleys.partNumber,
                set: { ...excludedOf(pulleys, ["position", "diameter", "ribCount", "minBeltDiameter", "price", "stock", "notes"]), updatedAt: now },
              })
              .returning({ inserted: sql<boolean>`(xmax = 0)` })
          : await tx
              .insert(blowers)
              .values(chunk as BlowerRecord[])
              .onConflictDoUpdate({
                target: blowers.partNumber,
                set: {
                  ...excludedOf(blowers, [
                    "name",
                    "kind",
                    "displacementPerRev",
                    "builtInVolumeRatio",
                    "maxRpm",
                    "volumetricEfficiencyRef",
                    "referenceRpm",
                    "internalEfficiency",
                    "mechanicalEfficiency",
                    "price",
                    "stock",
                    "notes",
                  ]),
                  updatedAt: now,
                },
              })
              .returning({ inserted: sql<boolean>`(xmax = 0)` });
      for (const w of written) {
        if (w.inserted) outcome.inserted++;
        else outcome.updated++;
      }
    }
  });
  outcome.committed = true;
  return outcome;
}

/** The whole shelf of one kind as CSV, in the import's columns. */
export async function exportShelfCsv(db: DbOrTx, actor: Actor, kind: ShelfKind): Promise<string> {
  assert(canSeeShelf(actor));
  if (kind === "pulleys") {
    const rows = await db.select().from(pulleys).orderBy(asc(pulleys.position), asc(pulleys.diameter), asc(pulleys.partNumber));
    return Papa.unparse({
      fields: [...PULLEY_CSV_COLUMNS],
      data: rows.map((p) => [p.partNumber, p.position, mm(p.diameter), p.ribCount, p.minBeltDiameter === null ? "" : mm(p.minBeltDiameter), p.price, p.stock, safeText(p.notes)]),
    });
  }
  const rows = await db.select().from(blowers).orderBy(asc(blowers.partNumber));
  return Papa.unparse({
    fields: [...BLOWER_CSV_COLUMNS],
    data: rows.map((b) => [
      b.partNumber,
      safeText(b.name),
      b.kind,
      litres(b.displacementPerRev),
      b.builtInVolumeRatio,
      b.maxRpm,
      b.volumetricEfficiencyRef,
      b.referenceRpm,
      b.internalEfficiency,
      b.mechanicalEfficiency,
      b.price,
      b.stock,
      safeText(b.notes),
    ]),
  });
}
