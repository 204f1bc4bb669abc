// @ts-nocheck
"use client";
// Step 1 of the sheet: the recommended blower pulley (the shelf's sizes that fit the customer's
// belt, which variant, add it to the parts), the speed the boost is quoted at, and the ladder and
// finder to help choose.
import { useState } from "react";
import { fromSI, unitLabel, type Combination, type UnitSystem } from "@/calc";
import { usePrice } from "@/components/price";
import { PulleyHelp } from "@/components/pulleys/pulley-help";
import { Button } from "@/components/ui/button";
import { Field, FieldError } from "@/components/ui/field";
import { digitsOf } from "@/lib/units/format";
import type { ShelfPulley } from "@/lib/planner/compute";
import type { RecommendationFormState } from "./use-recommendation-form";

type PulleyChoiceProps = {
  state: RecommendationFormState;
  combination: { name: string; revision: number; spec: Combination };
  pulleys: ShelfPulley[];
  unitSystem: UnitSystem;
  /** The size the sheet was opened with, listed even when the shelf no longer holds it. */
  initialDiameter: number;
};

const same = (a: number, b: number) => Math.abs(a - b) < 1e-6;
const select = "rounded-md border border-line bg-panel px-2 py-1.5 text-sm";

export function PulleyChoice({ state, combination, pulleys, unitSystem, initialDiameter }: PulleyChoiceProps) {
  const price = usePrice();
  const { form, chosen, choose, addShelfPart } = state;
  const { errors } = form.formState;
  const unit = unitLabel("length-small", unitSystem);
  const size = (m: number) => `${fromSI("length-small", m, unitSystem).toFixed(digitsOf("length-small", unitSystem))} ${unit}`;
  const fitted = combination.spec.drive.blowerPulleyDiameter;
  const sizes = [...new Set([...pulleys.map((p) => p.diameter), fitted, initialDiameter].map((d) => Number(d.toFixed(6))))].sort((a, b) => a - b);

  // Pulleys that fit the customer's belt (rib count); the ladder, finder and "add" use only these.
  const ribCounts = [...new Set(pulleys.map((p) => p.ribCount))].sort((a, b) => b - a);
  const [ribs, setRibs] = useState(ribCounts[0] ?? 0);
  const [variant, setVariant] = useState("");
  const fitting = pulleys.filter((p) => p.ribCount === ribs);
  const candidates = fitting.filter((p) => same(p.diameter, chosen));
  // The chosen size, or when the shelf holds several variants of it, the one picked in "Which one?".
  const onShelf = candidates.length === 1 ? candidates[0] : candidates.find((p) => p.partNumber === variant);
  const stockText = (stock: number) => (stock > 0 ? `${stock} in stock` : "out of stock: it will be ordered in");

  return (
    <section className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4">
      <h2 className="text-lg font-semibold">1. Blower pulley</h2>
      <p className="text-sm text-muted">
        {combination.name}, revision {combination.revision}: today it runs a {size(fitted)} blower pulley on a {size(combination.spec.drive.crankPulleyDiameter)} crank pulley.
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
            className={select}
          >
            {sizes.map((d) => (
              <option key={d} value={String(d)}>
                {size(d)}
                {same(d, fitted) ? " (fitted now)" : ""}
                {pulleys.some((p) => same(p.diameter, d)) ? "" : " (not on the shelf)"}
              </option>
            ))}
          </select>
          <FieldError id="f-blowerPulleyDiameter-error">{errors.blowerPulleyDiameter?.message}</FieldError>
        </div>
        {ribCounts.length > 1 ? (
          <div className="flex flex-col gap-1">
            <label htmlFor="f-ribs" className="text-sm font-medium">
              Belt
            </label>
            <select id="f-ribs" value={ribs} onChange={(e) => (setRibs(Number(e.target.value)), setVariant(""))} className={select}>
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
            <select id="f-variant" value={variant} onChange={(e) => setVariant(e.target.value)} className={select}>
              <option value="">Choose the pulley…</option>
              {candidates.map((p) => (
                <option key={p.partNumber} value={p.partNumber}>
                  {p.partNumber}, {price(p.price)}, {stockText(p.stock)}
                </option>
              ))}
            </select>
          </div>
        ) : candidates.length === 1 ? (
          <p className="text-sm text-muted" data-testid="chosen-stock">
            {candidates[0].partNumber}: {stockText(candidates[0].stock)}
          </p>
        ) : null}
        <Button type="button" variant="secondary" onClick={() => onShelf && addShelfPart(onShelf.partNumber)} disabled={!onShelf}>
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
  );
}
