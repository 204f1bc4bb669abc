"use client";
// One numeric field of the planner: calc's rule as the error, the unit beside the label.
import type { UseFormRegister } from "react-hook-form";
import type { UnitSystem } from "@/calc";
import { Field } from "@/components/ui/field";
import { editorLabelOf } from "@/lib/combinations/field-table";
import { unitOf, type PlannerForm } from "@/lib/combinations/form-model";

export type NumFieldProps = {
  path: string;
  /** Defaults to the field table's editor label. */
  label?: string;
  system: UnitSystem;
  register: UseFormRegister<PlannerForm>;
  errors: Record<string, string>;
  hint?: string;
  step?: string;
  readOnly?: boolean;
  className?: string;
};

export function NumField({ path, label, system, register, errors, hint, step = "any", readOnly, className }: NumFieldProps) {
  const unit = unitOf(path, system);
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
      {...register(path as never, { valueAsNumber: true })}
    />
  );
}
