"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { saveUnitSystem } from "./actions";

export function UnitsForm({ current }: { current: "imperial" | "metric" }) {
  const [state, action, pending] = useActionState(saveUnitSystem, undefined);
  return (
    <form action={action} className="flex flex-col gap-3">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-medium">Units</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name="unitSystem" value="imperial" defaultChecked={current === "imperial"} /> Imperial (in, in³, psi, °F, hp, lb·ft)
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name="unitSystem" value="metric" defaultChecked={current === "metric"} /> Metric (mm, L, kPa, °C, kW, N·m)
        </label>
      </fieldset>
      {state ? <Notice tone={state.ok ? "ok" : "danger"}>{state.ok ? "Saved." : state.message}</Notice> : null}
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save"}
      </Button>
    </form>
  );
}
