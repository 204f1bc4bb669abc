// @ts-nocheck
"use client";
// One numeric field of the planner: calc's rule as the error, the unit beside the label.
import type { UseFormRegister } from "react-hook-form";
import type { UnitSystem } from "@/calc";
import { Field } from "@/components/ui/field";
import { editorLabelOf, valueAt } from "@/lib/combinations/field-table";
import { unitOf, type PlannerForm } from "@/lib/combinations/form-model";

export type NumFieldProps = {
  path: string;
  /** Defaults to the field table's editor label. */
  label?: string;
  system: UnitSystem;
  register: UseFormRegister<PlannerForm>;
  /** The form's values: the input's value in the server's HTML, before the form library runs. */
  values: PlannerForm;
  errors: Record<string, string>;
  hint?: string;
  step?: string;
  readOnly?: boolean;
  className?: string;
};

export function NumField({ path, label, system, register, values, errors, hint, step = "any", readOnly, className }: NumFieldProps) {
  const unit = unitOf(path, system);
  const shown = valueAt(values, path);
  return (
    <Field
      label={label ?? editorLabelOf(path)}
      unit={unit || undefined}
      type="number"
      inputMode="decimal"
      step={step}
      hint={hint}
      errors={errors[path]}
      readOnly={readOnly}
      className={className}
      defaultValue={typeof shown === "number" && Number.isFinite(shown) ? shown : undefined}
      {...register(path as never, { valueAsNumber: true })}
    />
  );
}
