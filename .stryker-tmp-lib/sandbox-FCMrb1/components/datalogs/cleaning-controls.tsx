// @ts-nocheck
"use client";
// The cleaning settings (wide-open-throttle rule, bin width, samples per bin, outlier limit),
// kept in the address so the compare and calibrate pages use the same ones.
import { useEffect, useState } from "react";
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import { cleaningSchema, type CleaningOptions } from "@/lib/datalogs/parse";
import { cleaningToQuery } from "@/lib/datalogs/cleaning-query";
import { Field } from "@/components/ui/field";

type Draft = Record<keyof CleaningOptions, string>;

export type CleaningControlsProps = { value: CleaningOptions; onChange: (o: CleaningOptions) => void; unitSystem: UnitSystem; hasThrottle: boolean };

export function CleaningControls({ value, onChange, unitSystem, hasThrottle }: CleaningControlsProps) {
  const pUnit = unitLabel("pressure", unitSystem);
  const toDraft = (o: CleaningOptions): Draft => ({
    minThrottle: String(o.minThrottle),
    minBoost: String(Math.round(fromSI("pressure", o.minBoost, unitSystem) * 100) / 100),
    binWidth: String(o.binWidth),
    minSamples: String(o.minSamples),
    madLimit: String(o.madLimit),
  });
  const [draft, setDraft] = useState<Draft>(() => toDraft(value));
  const [errors, setErrors] = useState<Partial<Record<keyof CleaningOptions, string>>>({});

  useEffect(() => {
    window.history.replaceState(null, "", `${window.location.pathname}?${cleaningToQuery(value)}`);
  }, [value]);

  function edit(k: keyof CleaningOptions, text: string) {
    const next = { ...draft, [k]: text };
    setDraft(next);
    const raw = { ...next, minBoost: text.trim() === "" && k === "minBoost" ? "" : String(toSI("pressure", Number(next.minBoost), unitSystem)) };
    const r = cleaningSchema.safeParse(Object.fromEntries(Object.entries(raw).map(([kk, v]) => [kk, v.trim() === "" ? undefined : v])));
    if (r.success && Object.values(next).every((v) => v.trim() !== "")) {
      setErrors({});
      onChange(r.data);
    } else {
      const e: Partial<Record<keyof CleaningOptions, string>> = {};
      for (const i of r.success ? [] : r.error.issues) e[i.path[0] as keyof CleaningOptions] ??= i.message;
      for (const [kk, v] of Object.entries(next)) if (v.trim() === "") e[kk as keyof CleaningOptions] = "Give a value.";
      setErrors(e);
    }
  }

  return (
    <fieldset className="grid gap-3 rounded-md border border-line bg-panel p-3 sm:grid-cols-5">
      <legend className="px-1 text-sm font-medium">Cleaning</legend>
      <Field
        label="Minimum throttle"
        name="minThrottle"
        unit="%"
        inputMode="decimal"
        value={draft.minThrottle}
        onChange={(e) => edit("minThrottle", e.target.value)}
        errors={errors.minThrottle}
        disabled={!hasThrottle}
        hint={hasThrottle ? "Wide-open-throttle rule." : "No throttle column: the boost rule applies."}
      />
      <Field label="Minimum boost" name="minBoost" unit={pUnit} inputMode="decimal" value={draft.minBoost} onChange={(e) => edit("minBoost", e.target.value)} errors={errors.minBoost} hint={hasThrottle ? "Used when a log has no throttle." : "Wide-open-throttle rule."} />
      <Field label="Bin width" name="binWidth" unit="rpm" inputMode="numeric" value={draft.binWidth} onChange={(e) => edit("binWidth", e.target.value)} errors={errors.binWidth} />
      <Field label="Samples per bin" name="minSamples" inputMode="numeric" value={draft.minSamples} onChange={(e) => edit("minSamples", e.target.value)} errors={errors.minSamples} hint="Fewer: the bin is not used." />
      <Field label="Outlier limit" name="madLimit" unit="MAD" inputMode="decimal" value={draft.madLimit} onChange={(e) => edit("madLimit", e.target.value)} errors={errors.madLimit} hint="From the bin's median boost." />
    </fieldset>
  );
}
