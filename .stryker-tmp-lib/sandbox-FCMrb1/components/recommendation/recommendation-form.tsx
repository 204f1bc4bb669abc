// @ts-nocheck
"use client";
// Making or editing a recommendation sheet: pick the blower pulley (ladder and finder help), the
// customer, the vehicle, a parts list priced from the shelf, and notes. The server re-prices the
// shelf lines and computes the total; the total shown here uses the same decimal.js helpers
// (use-recommendation-form.ts).
import type { UseFormRegisterReturn } from "react-hook-form";
import type { Combination, UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { ShelfPulley } from "@/lib/planner/compute";
import { PartsSection } from "./parts-section";
import { PulleyChoice } from "./pulley-choice";
import { useRecommendationForm, type FormIn, type ShelfPart } from "./use-recommendation-form";

export type { ShelfPart } from "./use-recommendation-form";

export type RecommendationFormProps = {
  mode: "create" | "edit";
  id?: string;
  combination: { id: string; name: string; revision: number; spec: Combination };
  pulleys: ShelfPulley[];
  parts: ShelfPart[];
  unitSystem: UnitSystem;
  initial: Omit<FormIn, "combinationId">;
};

export function RecommendationForm({ mode, id, combination, pulleys, parts, unitSystem, initial }: RecommendationFormProps) {
  const state = useRecommendationForm({ mode, id, combinationId: combination.id, initial, parts });
  const { form, submit, cancel } = state;
  const { errors, isSubmitting } = form.formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6" aria-label="Recommendation">
      <PulleyChoice state={state} combination={combination} pulleys={pulleys} unitSystem={unitSystem} initialDiameter={initial.blowerPulleyDiameter} />

      <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">2. Customer and vehicle</h2>
        <Field
          label="Title on the sheet"
          autoComplete="off"
          {...form.register("title")}
          errors={errors.title?.message}
          hint="What the customer reads at the top of the sheet, the e-mail and the link (the combination's own name stays internal). Empty: “Blower pulley recommendation for” the customer's name."
        />
        <div className="grid gap-3 sm:grid-cols-2">
          <Field label="Customer name" autoComplete="off" {...form.register("customerName")} errors={errors.customerName?.message} />
          <Field label="Customer e-mail" type="email" autoComplete="off" {...form.register("customerEmail")} errors={errors.customerEmail?.message} hint="Needed to send the sheet." />
        </div>
        <NotesField id="f-vehicleNotes" label="Vehicle notes" rows={2} registration={form.register("vehicleNotes")} error={errors.vehicleNotes?.message} />
      </section>

      <PartsSection state={state} parts={parts} />

      <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">4. Notes</h2>
        <NotesField id="f-notes" label="Notes for the customer" rows={3} registration={form.register("notes")} error={errors.notes?.message} />
      </section>

      {errors.root?.message ? <Notice tone="danger">{errors.root.message}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : mode === "create" ? "Save draft sheet" : "Save changes"}
        </Button>
        <Button type="button" variant="secondary" onClick={cancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** A labelled text area with its error tied to it. */
function NotesField({ id, label, rows, registration, error }: { id: string; label: string; rows: number; registration: UseFormRegisterReturn; error?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <textarea id={id} rows={rows} {...registration} aria-describedby={error ? `${id}-error` : undefined} className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
      <FieldError id={`${id}-error`}>{error}</FieldError>
    </div>
  );
}
