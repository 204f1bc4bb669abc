// @ts-nocheck
"use client";
// The person's units: a preset to start from, then a unit per quantity kind.
import { useActionState, useState } from "react";
import { nearestPreset, resolveUnits, unitChoices, UNIT_PRESETS, type UnitPreset, type Units } from "@/calc";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { CHOOSABLE_KINDS, KIND_NAMES } from "@/lib/units/person";
import { saveUnitPreferences } from "./actions";

export function UnitsForm({ preset, choices }: { preset: UnitPreset; choices: Readonly<Record<string, string>> }) {
  const [state, action, pending] = useActionState(saveUnitPreferences, undefined);
  const [units, setUnits] = useState<Units>(() => resolveUnits(preset, choices));
  return (
    <form action={action} id="units" className="flex flex-col gap-3" data-testid="units-form">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-medium">Units</legend>
        <p className="text-sm text-muted">Start from a preset, then pick the unit you think in for each quantity. Saved figures never change; only how they are shown.</p>
        <div className="flex gap-2">
          {(["imperial", "metric"] as const).map((p) => (
            <Button key={p} type="button" variant="secondary" onClick={() => setUnits(UNIT_PRESETS[p])}>
              {p === "imperial" ? "Imperial" : "Metric"}
            </Button>
          ))}
        </div>
        <input type="hidden" name="unitSystem" value={nearestPreset(units)} />
        <div className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-x-3 gap-y-1.5 text-sm">
          {CHOOSABLE_KINDS.map((k) => (
            <label key={k} className="contents">
              <span>{KIND_NAMES[k]}</span>
              <select name={`units.${k}`} value={units[k]} onChange={(e) => setUnits({ ...units, [k]: e.target.value })} className="rounded-md border border-line bg-panel px-2 py-1">
                {unitChoices(k).map((u) => (
                  <option key={u.id} value={u.id}>
                    {u.unit}
                  </option>
                ))}
              </select>
            </label>
          ))}
        </div>
      </fieldset>
      {state ? <Notice tone={state.ok ? "ok" : "danger"}>{state.ok ? "Saved." : state.message}</Notice> : null}
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save units"}
      </Button>
    </form>
  );
}
