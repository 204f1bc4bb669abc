// @ts-nocheck
"use client";
// The combination editor: engine with its VE table, blower, drive, ambient, intercooler, fuel.
// Every field is in the user's units; calc's schema gives the errors (see form-model.ts).
import type { UseFormReturn } from "react-hook-form";
import type { UnitSystem } from "@/calc";
import type { PlannerForm } from "@/lib/combinations/form-model";
import type { ShelfBlower } from "@/lib/planner/compute";
import { AdvancedSection } from "./advanced-section";
import { AmbientSection, BlowerSection } from "./editor-sections";
import { EditorBox, grid } from "./editor-box";
import { NumField } from "./num-field";
import { VeTable } from "./ve-table";

export type EditorProps = {
  form: UseFormReturn<PlannerForm>;
  system: UnitSystem;
  errors: Record<string, string>;
  blowers: ShelfBlower[];
  values: PlannerForm;
};

export function Editor({ form, system, errors, blowers, values }: EditorProps) {
  const { register } = form;
  const common = { system, register, errors, values };
  return (
    <div className="flex flex-col gap-3">
      <EditorBox legend="Engine">
        <div className={grid}>
          <NumField path="engine.displacement" {...common} />
          <NumField path="engine.cylinders" step="1" {...common} />
          <NumField path="engine.redlineRpm" step="50" {...common} />
        </div>
        <VeTable form={form} system={system} errors={errors} values={values} />
      </EditorBox>
      <BlowerSection form={form} system={system} errors={errors} blowers={blowers} values={values} />
      <EditorBox legend="Drive">
        <div className={grid}>
          <NumField path="drive.crankPulleyDiameter" step="0.01" {...common} />
          <NumField path="drive.blowerPulleyDiameter" step="0.01" {...common} />
          <NumField path="drive.beltSlip" hint="Demo default 2 %." {...common} />
        </div>
      </EditorBox>
      <AmbientSection form={form} system={system} errors={errors} values={values} />
      <EditorBox legend="Intercooler">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" defaultChecked={values.intercoolerOn} {...register("intercoolerOn")} /> Intercooler fitted
        </label>
        {values.intercoolerOn ? (
          <div className={grid}>
            <NumField path="intercooler.effectiveness" {...common} />
            <NumField path="intercooler.pressureDrop" {...common} />
            <NumField path="intercooler.coolantTemperature" {...common} />
          </div>
        ) : null}
      </EditorBox>
      <EditorBox legend="Fuel">
        <div className={grid}>
          <NumField path="fuel.afr" hint="By mass, e.g. 11.8 under boost on gasoline." {...common} />
          <NumField path="fuel.bsfc" hint="The engine's own, before the blower drive." {...common} />
          <NumField path="fuel.evaporatedBeforeBlower" hint="Draw-through only; 0 for port injection." {...common} />
        </div>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" defaultChecked={values.fuel.injectorsOn} {...register("fuel.injectorsOn")} /> Check injector duty
        </label>
        {values.fuel.injectorsOn ? (
          <div className={grid}>
            <NumField path="fuel.injectorCount" step="1" {...common} />
            <NumField path="fuel.injectorFlow" {...common} />
            <NumField path="fuel.maxDuty" {...common} />
          </div>
        ) : null}
      </EditorBox>
      <AdvancedSection form={form} system={system} errors={errors} values={values} />
    </div>
  );
}
