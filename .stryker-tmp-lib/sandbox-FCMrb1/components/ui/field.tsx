// @ts-nocheck
import type { InputHTMLAttributes, ReactNode } from "react";

type FieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  name: string;
  unit?: string;
  hint?: ReactNode;
  errors?: string[] | string;
};

/** A field's error message, tied to it by `id` (its `aria-describedby`); nothing when there is none. */
export function FieldError({ id, children }: { id?: string; children: ReactNode }) {
  if (!children) return null;
  return (
    <p id={id} role="alert" className="text-xs text-danger">
      {children}
    </p>
  );
}

/** A labelled input with its unit and its error messages tied to it for screen readers. */
export function Field({ label, name, unit, hint, errors, id, className = "", ...input }: FieldProps) {
  const inputId = id ?? `f-${name}`;
  const list = errors === undefined ? [] : Array.isArray(errors) ? errors : [errors];
  const errorId = `${inputId}-error`;
  const hintId = `${inputId}-hint`;
  const describedBy = [list.length ? errorId : null, hint ? hintId : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="text-sm font-medium">
        {label}
        {unit ? (
          <>
            {" "}
            <span className="font-normal text-muted">({unit})</span>
          </>
        ) : null}
      </label>
      <input
        id={inputId}
        name={name}
        aria-invalid={list.length ? true : undefined}
        aria-describedby={describedBy}
        className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm aria-[invalid=true]:border-danger"
        {...input}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      <FieldError id={errorId}>{list.join(" ")}</FieldError>
    </div>
  );
}
