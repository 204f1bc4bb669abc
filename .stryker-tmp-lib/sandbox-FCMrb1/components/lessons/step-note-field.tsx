// @ts-nocheck
"use client";
// A step's note in the editor: Markdown, the live-figure tokens it may quote, and a preview.
import { useState } from "react";
import { NOTE_FIGURE_HELP } from "@/lib/lessons/note-figures";
import { LessonNote } from "./lesson-note";

type StepNoteFieldProps = { id: string; value: string; errors?: string[]; onChange: (v: string) => void };

export function StepNoteField({ id, value, errors, onChange }: StepNoteFieldProps) {
  const [preview, setPreview] = useState(false);
  const describedBy = [`${id}-help`, errors ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        Note <span className="font-normal text-muted">(Markdown: **bold**, lists, links)</span>
      </label>
      <textarea
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        rows={6}
        maxLength={5000}
        aria-invalid={errors ? true : undefined}
        aria-describedby={describedBy}
        className="rounded-md border border-line bg-panel px-2.5 py-1.5 font-mono text-sm"
      />
      <p id={`${id}-help`} className="text-xs text-muted" data-testid="note-figure-help">
        {NOTE_FIGURE_HELP} Curves are counted as the classroom lists them: an item with a what-if counts twice (as built, then changed).
      </p>
      {errors ? (
        <p id={`${id}-error`} role="alert" className="text-xs text-danger">
          {errors.join(" ")}
        </p>
      ) : null}
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={preview} onChange={(e) => setPreview(e.target.checked)} /> Show a preview (figures are filled in the classroom)
      </label>
      {preview ? <LessonNote markdown={value} className="rounded-md border border-line p-3 text-sm" /> : null}
    </div>
  );
}
