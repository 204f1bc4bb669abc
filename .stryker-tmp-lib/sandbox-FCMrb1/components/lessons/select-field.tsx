// @ts-nocheck
// A labelled select with its errors tied to it for screen readers (the step editor's pickers).
import type { ReactNode, SelectHTMLAttributes } from "react";

type SelectFieldProps = { id: string; label: string; errors?: string[]; children: ReactNode } & SelectHTMLAttributes<HTMLSelectElement>;

export function SelectField({ id, label, errors, children, ...rest }: SelectFieldProps) {
  const errorId = `${id}-error`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? errorId : undefined}
        className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm aria-[invalid=true]:border-danger"
        {...rest}
      >
        {children}
      </select>
      {errors?.length ? (
        <p id={errorId} role="alert" className="text-xs text-danger">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
