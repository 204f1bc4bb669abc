// @ts-nocheck
"use client";
// What the admin's blower and pulley forms share: saving through the shelf API (the server's
// per-field messages land on their fields), the frame with its heading and buttons, and a
// labelled select with its error.
import { useQueryClient } from "@tanstack/react-query";
import type { ReactNode } from "react";
import type { FieldValues, Path, UseFormRegisterReturn, UseFormReturn } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ApiError, apiJson } from "@/components/client-json";
import type { ShelfKind } from "./shelf-list";
import { FieldError } from "@/components/ui/field";

/** The submit handler: POST a new part or PUT an edited one, then refresh every shelf list. */
export function useShelfSave<In extends FieldValues, Out extends { partNumber: string }>(
  kind: ShelfKind,
  row: { id: string } | undefined,
  form: UseFormReturn<In, unknown, Out>,
  onDone: (message: string) => void,
) {
  const qc = useQueryClient();
  return form.handleSubmit(async (values) => {
    try {
      await apiJson(row ? `/api/shelf/${kind}/${row.id}` : `/api/shelf/${kind}`, { method: row ? "PUT" : "POST", json: values });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      onDone(row ? `Saved ${values.partNumber}.` : `Added ${values.partNumber}.`);
    } catch (e) {
      const fieldErrors = e instanceof ApiError ? e.fieldErrors : {};
      for (const [k, msgs] of Object.entries(fieldErrors)) form.setError(k as Path<In>, { message: msgs.join(" ") });
      form.setError("root", { message: e instanceof Error ? e.message : "Could not save." });
    }
  });
}

type FrameProps = {
  /** "blower" or "pulley". */
  noun: string;
  row?: { partNumber: string };
  onSubmit: () => void;
  onCancel: () => void;
  isSubmitting: boolean;
  rootError?: string;
  children: ReactNode;
};

export function ShelfFormFrame({ noun, row, onSubmit, onCancel, isSubmitting, rootError, children }: FrameProps) {
  const title = row ? `Edit ${noun} ${row.partNumber}` : `Add a ${noun}`;
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
      noValidate
      className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4"
      aria-label={title}
    >
      <h3 className="font-semibold">{title}</h3>
      <div className="grid gap-3 sm:grid-cols-4">{children}</div>
      {rootError ? <Notice tone="danger">{rootError}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : row ? `Save ${noun}` : `Add ${noun}`}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** A labelled select bound to react-hook-form, with its error tied to it for screen readers. */
export function FormSelect({ id, label, field, error, options }: { id: string; label: string; field: UseFormRegisterReturn; error?: string; options: [string, string][] }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} {...field} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
        {options.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
      <FieldError id={`${id}-error`}>{error}</FieldError>
    </div>
  );
}
