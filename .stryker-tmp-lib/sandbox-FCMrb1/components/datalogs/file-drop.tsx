// @ts-nocheck
"use client";
// The log file: a button that opens the picker and a zone a file can be dropped on. The input
// itself stays in the page (visually hidden), so the keyboard and the label still reach it.
import { forwardRef, useState, type ReactNode } from "react";

type FileDropProps = { fileName: string | null; onFile: (f: File) => void; hint: ReactNode };

export const FileDrop = forwardRef<HTMLInputElement, FileDropProps>(function FileDrop({ fileName, onFile, hint }, ref) {
  const [over, setOver] = useState(false);
  return (
    <div
      data-testid="log-drop-zone"
      className={`flex flex-col items-center gap-2 rounded-md border-2 border-dashed p-6 text-center ${over ? "border-accent bg-accent/10" : "border-line bg-panel"}`}
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={(e) => {
        e.preventDefault();
        setOver(false);
        const f = e.dataTransfer.files?.[0];
        if (f) onFile(f);
      }}
    >
      <input
        id="log-file"
        ref={ref}
        type="file"
        accept=".csv,.txt,.tsv,.log,text/csv,text/plain"
        aria-describedby="log-file-hint"
        className="peer sr-only"
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (f) onFile(f);
        }}
      />
      <label
        htmlFor="log-file"
        className="cursor-pointer rounded-md bg-accent px-4 py-2 font-semibold text-accent-fg peer-focus-visible:outline peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2"
      >
        {fileName ? "Choose another log file (CSV)" : "Choose a log file (CSV)"}
      </label>
      <span className="text-sm">{fileName ? <>Read: <strong>{fileName}</strong></> : "or drop it here"}</span>
      <p id="log-file-hint" className="text-xs text-muted">
        {hint}
      </p>
    </div>
  );
});
