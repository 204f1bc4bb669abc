// @ts-nocheck
"use client";
// CSV import (admin): choose a file → the server checks every line → preview with per-line
// errors → import all rows in one go, or nothing.
import { useQueryClient } from "@tanstack/react-query";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { BLOWER_CSV_COLUMNS, MAX_CSV_BYTES, PULLEY_CSV_COLUMNS, type CsvRowError, type ShelfKind } from "@/lib/shelf/rules";
import { ApiError, apiJson } from "@/components/client-json";

type Preview = { rowCount: number; errors: CsvRowError[]; committed: boolean; inserted: number; updated: number; rows: { line: number; record: { partNumber: string } }[] };

async function post(kind: ShelfKind, commit: boolean, file: File): Promise<Preview> {
  try {
    return await apiJson<Preview>(`/api/shelf/import?kind=${kind}&commit=${commit ? 1 : 0}`, { method: "POST", headers: { "content-type": "text/csv" }, body: file });
  } catch (e) {
    // A refused commit still answers with the per-line errors to show.
    if (commit && e instanceof ApiError && Array.isArray((e.body as { errors?: unknown } | null)?.errors)) return e.body as Preview;
    throw e;
  }
}

export function CsvImport({ kind }: { kind: ShelfKind }) {
  const id = useId();
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const qc = useQueryClient();
  const columns = kind === "pulleys" ? PULLEY_CSV_COLUMNS : BLOWER_CSV_COLUMNS;

  async function run(commit: boolean) {
    if (!file) return;
    setBusy(true);
    setProblem(null);
    setDone(null);
    try {
      if (file.size > MAX_CSV_BYTES) throw new Error("The file is larger than 1 MB; the limit is 1 MB and 5,000 rows. Split it into smaller files.");
      const out = await post(kind, commit, file);
      setPreview(out);
      if (commit && out.committed) {
        setDone(`Imported ${out.rowCount} rows: ${out.inserted} new, ${out.updated} updated.`);
        setPreview(null);
        setFile(null);
        await qc.invalidateQueries({ queryKey: ["shelf"] });
      }
    } catch (e) {
      setPreview(null);
      setProblem(e instanceof Error ? e.message : "The file could not be read.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <details className="rounded-md border border-line bg-panel p-3">
      <summary className="cursor-pointer text-sm font-medium">Import {kind} from CSV</summary>
      <div className="mt-3 flex flex-col gap-3 text-sm">
        <p className="text-muted">
          Columns: <code className="text-xs">{columns.join(",")}</code>. Lengths in mm, displacement in L/rev, efficiencies as fractions (0.85), prices like 89.00. Rows are matched by part
          number: new ones are added, existing ones replaced. Up to 1 MB and 5,000 rows.
        </p>
        <div className="flex flex-wrap items-end gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-file`} className="font-medium">
              CSV file
            </label>
            <input
              id={`${id}-file`}
              type="file"
              accept=".csv,text/csv"
              onChange={(e) => {
                setFile(e.target.files?.[0] ?? null);
                setPreview(null);
                setProblem(null);
                setDone(null);
              }}
            />
          </div>
          <Button type="button" variant="secondary" disabled={!file || busy} onClick={() => run(false)}>
            {busy ? "Checking…" : "Check file"}
          </Button>
        </div>
        {problem ? <Notice tone="danger">{problem}</Notice> : null}
        {done ? <Notice tone="ok">{done}</Notice> : null}
        {preview ? (
          <div className="flex flex-col gap-2" data-testid="import-preview">
            <p>
              {preview.rowCount} row{preview.rowCount === 1 ? "" : "s"} ready; {preview.errors.length} problem{preview.errors.length === 1 ? "" : "s"}.
            </p>
            {preview.errors.length ? (
              <>
                <Notice tone="danger" title="Nothing will be imported until every line is right">
                  <ul className="list-disc pl-4">
                    {preview.errors.slice(0, 50).map((e, i) => (
                      <li key={i}>
                        Line {e.line}
                        {e.column ? `, ${e.column}` : ""}: {e.message}
                      </li>
                    ))}
                  </ul>
                  {preview.errors.length > 50 ? <p>…and {preview.errors.length - 50} more.</p> : null}
                </Notice>
              </>
            ) : (
              <Button type="button" disabled={busy} onClick={() => run(true)} className="self-start">
                Import {preview.rowCount} rows
              </Button>
            )}
            <p className="text-xs text-muted">
              First rows: {preview.rows.slice(0, 10).map((r) => `${r.record.partNumber} (line ${r.line})`).join(", ")}
            </p>
          </div>
        ) : null}
      </div>
    </details>
  );
}
