"use client";
// Small pieces of the log upload: the progress bar and a column picker.

export type Progress = { label: string; fraction: number } | null;

export const selectClass = "rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm";

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

export function ColumnSelect({ id, label, value, columns, optional, onChange }: { id: string; label: string; value: number | null; columns: string[]; optional?: boolean; onChange: (v: number | null) => void }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} className={selectClass} value={value === null ? "" : String(value)} onChange={(e) => onChange(e.target.value === "" ? null : Number(e.target.value))}>
        {optional ? <option value="">(none)</option> : null}
        {columns.map((c, i) => (
          <option key={i} value={i}>
            {i + 1}: {c}
          </option>
        ))}
      </select>
    </div>
  );
}
