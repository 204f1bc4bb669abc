"use client";
// Making or editing a recommendation sheet: pick the blower pulley (ladder and finder help), the
// customer, the vehicle, a parts list priced from the shelf, and notes. The server re-prices the
// shelf lines and computes the total; the total shown here uses the same decimal.js helpers.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch, type UseFormRegisterReturn } from "react-hook-form";
import type { z } from "zod";
import { fromSI, unitLabel, type Combination, type UnitSystem } from "@/calc";
import { ApiError, apiJson } from "@/components/client-json";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { recommendationInputSchema } from "@/lib/recommendations/rules";
import { usePrice } from "@/components/price";
import { lineTotal, sumMoney } from "@/lib/shelf/rules";
import { PulleyHelp } from "@/components/pulleys/pulley-help";
import { PartsTable } from "./parts-table";
import type { ShelfPulley } from "@/lib/planner/compute";
import { digitsOf } from "@/lib/units/format";

export type ShelfPart = { partNumber: string; description: string; price: string; stock: number; diameter?: number; position?: string };
type FormIn = z.input<typeof recommendationInputSchema>;
type FormOut = z.output<typeof recommendationInputSchema>;

export type RecommendationFormProps = {
  mode: "create" | "edit";
  id?: string;
  combination: { id: string; name: string; revision: number; spec: Combination };
  pulleys: ShelfPulley[];
  parts: ShelfPart[];
  unitSystem: UnitSystem;
  initial: Omit<FormIn, "combinationId">;
};

const MONEY = /^\d{1,10}(\.\d{1,2})?$/;
const same = (a: number, b: number) => Math.abs(a - b) < 1e-6;

export function RecommendationForm({ mode, id, combination, pulleys, parts, unitSystem, initial }: RecommendationFormProps) {
  const router = useRouter();
  const price = usePrice();
  const [pick, setPick] = useState("");
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(recommendationInputSchema),
    defaultValues: { ...initial, combinationId: combination.id },
  });
  const lines = useFieldArray({ control: form.control, name: "parts" });
  const { errors, isSubmitting } = form.formState;
  const chosen = Number(useWatch({ control: form.control, name: "blowerPulleyDiameter" }));
  const watched = useWatch({ control: form.control, name: "parts" }) ?? [];
  const unit = unitLabel("length-small", unitSystem);
  const size = (m: number) => `${fromSI("length-small", m, unitSystem).toFixed(digitsOf("length-small", unitSystem))} ${unit}`;

  const amounts = watched.map((l) => {
    const unit = String(l?.unitPrice ?? "").trim();
    const qty = Number(l?.quantity);
    return MONEY.test(unit) && Number.isInteger(qty) && qty >= 1 && qty <= 999 ? lineTotal(unit, qty) : null;
  });
  const total = amounts.every((a) => a !== null) ? sumMoney(amounts as string[]) : null;

  const sizes = [...new Set([...pulleys.map((p) => Number(p.diameter.toFixed(6))), Number(combination.spec.drive.blowerPulleyDiameter.toFixed(6)), Number(initial.blowerPulleyDiameter.toFixed(6))])].sort((a, b) => a - b);

  function choose(d: number) {
    form.setValue("blowerPulleyDiameter", d, { shouldDirty: true, shouldValidate: true });
  }

  function addShelfPart(partNumber: string) {
    const p = parts.find((x) => x.partNumber === partNumber);
    if (!p) return;
    lines.append({ partNumber: p.partNumber, description: p.description, unitPrice: p.price, quantity: 1 });
  }

  // Pulleys that fit the customer's belt (rib count); the ladder, finder and "add" use only these.
  const ribCounts = [...new Set(pulleys.map((p) => p.ribCount))].sort((a, b) => b - a);
  const [ribs, setRibs] = useState(ribCounts[0] ?? 0);
  const fitting = pulleys.filter((p) => p.ribCount === ribs);
  const candidates = fitting.filter((p) => same(p.diameter, chosen));
  const [variant, setVariant] = useState("");

  /** Adds the chosen size; when the shelf holds several variants of it, the one picked in "Which one?". */
  function addChosenPulley() {
    const pick = candidates.length === 1 ? candidates[0] : candidates.find((p) => p.partNumber === variant);
    if (pick) addShelfPart(pick.partNumber);
  }

  const submit = form.handleSubmit(async (values) => {
    try {
      if (mode === "create") {
        const out = await apiJson<{ id: string }>("/api/recommendations", { method: "POST", json: values });
        router.push(`/recommendations/${out.id}`);
      } else {
        await apiJson(`/api/recommendations/${id}`, { method: "PUT", json: values });
        router.push(`/recommendations/${id}`);
      }
      router.refresh();
    } catch (e) {
      if (e instanceof ApiError) for (const [k, msgs] of Object.entries(e.fieldErrors)) form.setError(k as "customerName", { message: msgs.join(" ") });
      form.setError("root", { message: e instanceof Error ? e.message : "Could not save the sheet." });
    }
  });

  const lineError = (i: number, k: "description" | "unitPrice" | "quantity" | "partNumber") => errors.parts?.[i]?.[k]?.message as string | undefined;
  const hasChosenOnShelf = candidates.length === 1 || candidates.some((p) => p.partNumber === variant);

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6" aria-label="Recommendation">
      <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">1. Blower pulley</h2>
        <p className="text-sm text-muted">
          {combination.name}, revision {combination.revision}: today it runs a {size(combination.spec.drive.blowerPulleyDiameter)} blower pulley on a {size(combination.spec.drive.crankPulleyDiameter)} crank pulley.
        </p>
        <div className="flex flex-wrap items-end gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor="f-blowerPulleyDiameter" className="text-sm font-medium">
              Recommended blower pulley <span className="font-normal text-muted">({unit})</span>
            </label>
            <select
              id="f-blowerPulleyDiameter"
              value={String(Number(chosen.toFixed(6)))}
              onChange={(e) => choose(Number(e.target.value))}
              aria-describedby={errors.blowerPulleyDiameter ? "f-blowerPulleyDiameter-error" : undefined}
              className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm"
            >
              {sizes.map((d) => (
                <option key={d} value={String(d)}>
                  {size(d)}
                  {same(d, combination.spec.drive.blowerPulleyDiameter) ? " (fitted now)" : ""}
                  {pulleys.some((p) => same(p.diameter, d)) ? "" : " (not on the shelf)"}
                </option>
              ))}
            </select>
            {errors.blowerPulleyDiameter ? (
              <p id="f-blowerPulleyDiameter-error" role="alert" className="text-xs text-danger">
                {errors.blowerPulleyDiameter.message}
              </p>
            ) : null}
          </div>
          {ribCounts.length > 1 ? (
            <div className="flex flex-col gap-1">
              <label htmlFor="f-ribs" className="text-sm font-medium">
                Belt
              </label>
              <select id="f-ribs" value={ribs} onChange={(e) => (setRibs(Number(e.target.value)), setVariant(""))} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
                {ribCounts.map((n) => (
                  <option key={n} value={n}>
                    {n}-rib
                  </option>
                ))}
              </select>
            </div>
          ) : null}
          {candidates.length > 1 ? (
            <div className="flex flex-col gap-1">
              <label htmlFor="f-variant" className="text-sm font-medium">
                Which one?
              </label>
              <select id="f-variant" value={variant} onChange={(e) => setVariant(e.target.value)} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
                <option value="">Choose the pulley…</option>
                {candidates.map((p) => (
                  <option key={p.partNumber} value={p.partNumber}>
                    {p.partNumber}, {price(p.price)}, {p.stock > 0 ? `${p.stock} in stock` : "out of stock: it will be ordered in"}
                  </option>
                ))}
              </select>
            </div>
          ) : candidates.length === 1 ? (
            <p className="text-sm text-muted" data-testid="chosen-stock">
              {candidates[0].partNumber}: {candidates[0].stock > 0 ? `${candidates[0].stock} in stock` : "out of stock: it will be ordered in"}
            </p>
          ) : null}
          <Button type="button" variant="secondary" onClick={addChosenPulley} disabled={!hasChosenOnShelf}>
            Add this pulley to the parts
          </Button>
        </div>
        <Field
          label="Boost quoted at"
          unit="rpm"
          type="number"
          inputMode="numeric"
          className="max-w-xs"
          {...form.register("targetRpm", { setValueAs: (v) => (v === "" || v === null || v === undefined ? null : Number(v)) })}
          errors={errors.targetRpm?.message}
          hint={`The engine speed the customer was sold the boost at; the sheet's headline is read there. Empty: redline (${Math.round(combination.spec.engine.redlineRpm)} rpm).`}
        />
        <PulleyHelp spec={combination.spec} shelf={fitting} system={unitSystem} onChoose={choose} />
      </section>

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
        <div className="flex flex-col gap-1">
          <NotesField id="f-vehicleNotes" label="Vehicle notes" rows={2} registration={form.register("vehicleNotes")} error={errors.vehicleNotes?.message} />
        </div>
      </section>

      <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">3. Parts</h2>
        <div className="flex flex-wrap items-end gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor="add-part" className="text-sm font-medium">
              Add a part from the shelf
            </label>
            <select id="add-part" value={pick} onChange={(e) => setPick(e.target.value)} className="max-w-md rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
              <option value="">Choose a part…</option>
              {parts.map((p) => (
                <option key={p.partNumber} value={p.partNumber}>
                  {p.partNumber}: {p.description}, {price(p.price)}
                  {p.stock === 0 ? " (out of stock)" : ""}
                </option>
              ))}
            </select>
          </div>
          <Button
            type="button"
            variant="secondary"
            disabled={!pick}
            onClick={() => {
              addShelfPart(pick);
              setPick("");
            }}
          >
            Add part
          </Button>
          <Button type="button" variant="secondary" onClick={() => lines.append({ partNumber: null, description: "", unitPrice: "", quantity: 1 })}>
            Add a free line
          </Button>
        </div>
        {lines.fields.length === 0 ? <p className="text-sm text-muted">No parts yet.</p> : null}
        {lines.fields.length ? <PartsTable form={form} lines={lines} watched={watched} amounts={amounts} total={total} lineError={lineError} /> : null}
      </section>

      <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">4. Notes</h2>
        <div className="flex flex-col gap-1">
          <NotesField id="f-notes" label="Notes for the customer" rows={3} registration={form.register("notes")} error={errors.notes?.message} />
        </div>
      </section>

      {errors.root?.message ? <Notice tone="danger">{errors.root.message}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : mode === "create" ? "Save draft sheet" : "Save changes"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** A labelled text area with its error tied to it. */
function NotesField({ id, label, rows, registration, error }: { id: string; label: string; rows: number; registration: UseFormRegisterReturn; error?: string }) {
  return (
    <>
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <textarea id={id} rows={rows} {...registration} aria-describedby={error ? `${id}-error` : undefined} className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm" />
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-xs text-danger">
          {error}
        </p>
      ) : null}
    </>
  );
}
