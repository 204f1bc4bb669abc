// @ts-nocheck
"use client";
// Import an exported JSON file: pick it, see what it holds, then import all of it or nothing.
import { useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import type { ActionState } from "@/lib/action-state";

type Preview = { text: string; fileName: string; count: number; names: string[] } | { error: string };

/** Reads what a chosen file holds without sending it: the count and names, or why it is not an export. */
export function previewImport(text: string, fileName: string): Preview {
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch {
    return { error: `${fileName} is not valid JSON.` };
  }
  const list = (doc as { combinations?: unknown })?.combinations;
  if ((doc as { format?: unknown })?.format !== "pulleywright.combinations" || !Array.isArray(list)) {
    return { error: `${fileName} is not a Pulleywright combinations export.` };
  }
  const names = list.map((c) => String((c as { name?: unknown })?.name ?? "(no name)"));
  return { text, fileName, count: list.length, names };
}

type ImportCombinationsProps = {
  /** The server action that imports the file (passed in by the page). */
  importAction: (fileText: string) => Promise<ActionState<{ imported: number }>>;
  onImported: (count: number) => void;
};

export function ImportCombinations({ importAction, onImported }: ImportCombinationsProps) {
  const [open, setOpen] = useState(false);
  const [preview, setPreview] = useState<Preview | null>(null);
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<{ message: string; fields?: Record<string, string[]> } | null>(null);
  const fileRef = useRef<HTMLInputElement>(null);
  const id = useId();

  function reset() {
    setPreview(null);
    setError(null);
    if (fileRef.current) fileRef.current.value = "";
  }

  async function onFile(file: File | undefined) {
    setError(null);
    if (!file) return setPreview(null);
    if (file.size > 2_000_000) return setPreview({ error: `${file.name} is larger than 2 MB.` });
    setPreview(previewImport(await file.text(), file.name));
  }

  async function doImport() {
    if (!preview || "error" in preview) return;
    setPending(true);
    const r = await importAction(preview.text);
    setPending(false);
    if (r.ok) {
      onImported(r.data?.imported ?? 0);
      reset();
      setOpen(false);
    } else {
      setError({ message: r.message, fields: r.fieldErrors });
    }
  }

  if (!open) {
    return (
      <Button variant="secondary" onClick={() => setOpen(true)}>
        Import JSON…
      </Button>
    );
  }
  return (
    <div role="group" aria-labelledby={`${id}-title`} className="flex w-full flex-col gap-2 rounded-lg border border-line bg-panel p-3 text-sm sm:w-96">
      <p id={`${id}-title`} className="font-medium">
        Import combinations from a JSON export
      </p>
      <label htmlFor={`${id}-file`} className="text-sm">
        File
      </label>
      <input id={`${id}-file`} ref={fileRef} type="file" accept="application/json,.json" onChange={(e) => void onFile(e.target.files?.[0])} />
      {preview && "error" in preview ? (
        <p role="alert" className="text-danger">
          {preview.error}
        </p>
      ) : preview ? (
        <div role="status">
          <p>
            {preview.fileName} holds <strong>{preview.count}</strong> combination{preview.count === 1 ? "" : "s"}
            {preview.count ? ": " : "."}
            {preview.names.slice(0, 5).join(", ")}
            {preview.count > 5 ? `, and ${preview.count - 5} more` : ""}.
          </p>
          <p className="text-muted">Each becomes a new combination of yours, with its history. If any one is invalid, nothing is imported.</p>
        </div>
      ) : null}
      {error ? (
        <div role="alert" className="text-danger">
          <p>Nothing was imported. {error.message}</p>
          {error.fields ? (
            <ul className="list-disc pl-5 text-xs">
              {Object.entries(error.fields)
                .slice(0, 8)
                .map(([k, v]) => (
                  <li key={k}>
                    {k}: {v.join(" ")}
                  </li>
                ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <div className="flex gap-2">
        <Button disabled={!preview || "error" in preview || pending} onClick={() => void doImport()}>
          {pending ? "Importing…" : preview && !("error" in preview) ? `Import ${preview.count}` : "Import"}
        </Button>
        <Button variant="ghost" onClick={() => (reset(), setOpen(false))}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
