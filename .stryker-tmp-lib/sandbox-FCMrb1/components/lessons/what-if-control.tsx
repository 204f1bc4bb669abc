// @ts-nocheck
"use client";
// The step's "what if": one blower pulley for every item, or a scale on every VE curve. It only
// changes what the chart and table show; nothing is saved.
import { useId } from "react";
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import { figure } from "@/lib/units/format";
import type { StepItemSnapshot } from "@/lib/lessons/rules";
import { VE_SCALE_MAX, VE_SCALE_MIN, type WhatIf } from "@/lib/lessons/curves";

type WhatIfControlProps = { items: StepItemSnapshot[]; unitSystem: UnitSystem; value: WhatIf; onChange: (w: WhatIf) => void };

/** Slider range of the blower pulley, in the user's units (a span most street pulleys fall in). */
const PULLEY_RANGE = { in: { min: 2.4, max: 5, step: 0.05 }, mm: { min: 60, max: 128, step: 1 } } as const;

export function WhatIfControl({ items, unitSystem, value, onChange }: WhatIfControlProps) {
  const id = useId();
  const unit = unitLabel("length-small", unitSystem);
  const range = unit === "mm" ? PULLEY_RANGE.mm : PULLEY_RANGE.in;
  const asBuilt = items[0]?.spec.drive.blowerPulleyDiameter ?? 0.08;
  const pulleyShown = value.kind === "pulley" ? fromSI("length-small", value.diameter, unitSystem) : fromSI("length-small", asBuilt, unitSystem);
  const clamp = (v: number) => Math.min(range.max, Math.max(range.min, v));
  const vePercent = value.kind === "ve" ? Math.round(value.scale * 100) : 100;

  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3">
      <legend className="px-1 text-lg font-semibold">What if… (not saved)</legend>
      <div className="flex flex-wrap gap-4 text-base">
        <label className="flex items-center gap-2">
          <input type="radio" name={`${id}-kind`} checked={value.kind === "none"} onChange={() => onChange({ kind: "none" })} /> As built
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name={`${id}-kind`} checked={value.kind === "pulley"} onChange={() => onChange({ kind: "pulley", diameter: asBuilt })} /> Blower pulley for all
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name={`${id}-kind`} checked={value.kind === "ve"} onChange={() => onChange({ kind: "ve", scale: 1 })} /> Engine breathing (VE scale)
        </label>
      </div>
      {value.kind === "ve" ? (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-ve`} className="text-base font-medium">
            VE scale <span className="font-normal text-muted">(%)</span>
          </label>
          <div className="flex items-center gap-3">
            <input
              id={`${id}-ve`}
              type="range"
              min={VE_SCALE_MIN * 100}
              max={VE_SCALE_MAX * 100}
              step={1}
              value={vePercent}
              aria-valuetext={`${vePercent} % of the VE as built`}
              onChange={(e) => onChange({ kind: "ve", scale: Number(e.target.value) / 100 })}
              className="w-full accent-[var(--pw-accent)]"
            />
            <output htmlFor={`${id}-ve`} className="min-w-[6ch] text-right text-lg tabular-nums">
              {vePercent} %
            </output>
          </div>
        </div>
      ) : (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-pulley`} className="text-base font-medium">
            Blower pulley diameter <span className="font-normal text-muted">({unit})</span>
          </label>
          <div className="flex items-center gap-3">
            <input
              id={`${id}-pulley`}
              type="range"
              min={range.min}
              max={range.max}
              step={range.step}
              value={clamp(pulleyShown)}
              aria-valuetext={`${figure("length-small", toSI("length-small", clamp(pulleyShown), unitSystem), unitSystem)} ${unit}`}
              onChange={(e) => onChange({ kind: "pulley", diameter: toSI("length-small", Number(e.target.value), unitSystem) })}
              className="w-full accent-[var(--pw-accent)]"
            />
            <output htmlFor={`${id}-pulley`} className="min-w-[8ch] text-right text-lg tabular-nums">
              {value.kind === "pulley" ? `${figure("length-small", value.diameter, unitSystem)} ${unit}` : "as built"}
            </output>
          </div>
        </div>
      )}
      {value.kind !== "none" ? (
        <button type="button" onClick={() => onChange({ kind: "none" })} className="self-start rounded-md border border-line bg-panel px-3 py-1.5 text-base">
          Back to as built
        </button>
      ) : null}
    </fieldset>
  );
}
