// @ts-nocheck
"use client";
// Small pieces of the log upload: the progress bar and a labelled picker with its error and note.
import type { ReactNode } from "react";

export type Progress = { label: string; fraction: number } | null;

export const selectClass = "rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm aria-[invalid=true]:border-danger";

export function ProgressBar({ progress }: { progress: Progress }) {
  if (!progress) return null;
  const pct = Math.round(progress.fraction * 100);
  return (
    <div className="flex flex-col gap-1">
      <span className="text-sm" id="upload-progress-label">
        {progress.label} {pct} %
      </span>
      <progress aria-labelledby="upload-progress-label" className="h-2 w-full" max={100} value={pct} />
    </div>
  );
}

type PickerProps = { id: string; label: string; value: string; errors?: string[]; note?: string; onChange: (v: string) => void; children: ReactNode };

/** A select with its label, its errors (aria-invalid, aria-describedby) and a note on how it was guessed. */
export function Picker({ id, label, value, errors, note, onChange, children }: PickerProps) {
  const errorId = `${id}-error`;
  const noteId = `${id}-note`;
  const describedBy = [errors?.length ? errorId : null, note ? noteId : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} className={selectClass} value={value} aria-invalid={errors?.length ? true : undefined} aria-describedby={describedBy} onChange={(e) => onChange(e.target.value)}>
        {children}
      </select>
      {note ? (
        <p id={noteId} className="text-xs text-muted">
          {note}
        </p>
      ) : null}
      {errors?.length ? (
        <p id={errorId} className="text-xs text-danger" role="alert">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

type ColumnSelectProps = { id: string; label: string; value: number | null; columns: string[]; optional?: boolean; errors?: string[]; note?: string; onChange: (v: number | null) => void };

export function ColumnSelect({ id, label, value, columns, optional, errors, note, onChange }: ColumnSelectProps) {
  return (
    <Picker id={id} label={label} value={value === null ? "" : String(value)} errors={errors} note={note} onChange={(v) => onChange(v === "" ? null : Number(v))}>
      {optional ? <option value="">(none)</option> : null}
      {columns.map((c, i) => (
        <option key={i} value={i}>
          {i + 1}: {c}
        </option>
      ))}
    </Picker>
  );
}
