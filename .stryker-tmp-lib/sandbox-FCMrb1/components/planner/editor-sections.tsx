// @ts-nocheck
"use client";
// The editor's blower (with fill from the shelf or a kind's demo defaults) and ambient sections.
import { useState } from "react";
import { BLOWER_DEMO_DEFAULTS, standardAtmosphere, unitLabel } from "@/calc";
import { Button } from "@/components/ui/button";
import { editorLabelOf } from "@/lib/combinations/field-table";
import { fieldFromSI, fieldToSI } from "@/lib/combinations/form-model";
import type { EditorProps } from "./editor";
import { EditorBox, grid } from "./editor-box";
import { NumField } from "./num-field";

export function BlowerSection({ form, system, errors, blowers, values }: EditorProps) {
  const { register, setValue } = form;
  const common = { system, register, errors, values };
  const [picked, setPicked] = useState("");
  const [filledBy, setFilledBy] = useState<string | null>(null);
  const fill = (b: { kind: "roots" | "twin-screw"; displacementPerRev: number; builtInVolumeRatio: number; maxRpm: number; volumetricEfficiencyRef: number; referenceRpm: number; internalEfficiency: number; mechanicalEfficiency: number }) => {
    const opts = { shouldDirty: true, shouldValidate: false } as const;
    setValue("blower.kind", b.kind, opts);
    setValue("blower.displacementPerRev", fieldFromSI("blower-displacement", b.displacementPerRev, system), opts);
    setValue("blower.builtInVolumeRatio", b.builtInVolumeRatio, opts);
    setValue("blower.maxRpm", b.maxRpm, opts);
    setValue("blower.volumetricEfficiencyRef", fieldFromSI("percent", b.volumetricEfficiencyRef, system), opts);
    setValue("blower.referenceRpm", b.referenceRpm, opts);
    setValue("blower.internalEfficiency", fieldFromSI("percent", b.internalEfficiency, system), opts);
    setValue("blower.mechanicalEfficiency", fieldFromSI("percent", b.mechanicalEfficiency, system), opts);
  };
  const kind = register("blower.kind");
  return (
    <EditorBox legend="Blower">
      <div className={grid}>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Blower from the parts shelf</span>
          <select
            value={picked}
            onChange={(e) => {
              setPicked(e.target.value);
              const b = blowers.find((x) => x.id === e.target.value);
              if (b) {
                fill(b);
                setFilledBy(`Filled from the parts shelf: ${b.name}.`);
              }
            }}
            className="rounded-md border border-line bg-panel px-2 py-1.5"
          >
            <option value="">{blowers.length ? "Entered by hand" : "The parts shelf has no blowers yet"}</option>
            {blowers.map((b) => (
              <option key={b.id} value={b.id}>
                {b.name} ({b.kind === "roots" ? "Roots" : "twin-screw"}, {fieldFromSI("blower-displacement", b.displacementPerRev, system)} {unitLabel("blower-displacement", system)}){b.stock > 0 ? "" : " · out of stock"}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">{editorLabelOf("blower.kind")}</span>
          <select
            defaultValue={values.blower.kind}
            {...kind}
            onChange={(e) => {
              void kind.onChange(e);
              const opts = { shouldDirty: true } as const;
              if (e.target.value === "roots") setValue("blower.builtInVolumeRatio", 1, opts);
              else if (values.blower.builtInVolumeRatio === 1) setValue("blower.builtInVolumeRatio", BLOWER_DEMO_DEFAULTS["twin-screw"].builtInVolumeRatio, opts);
              setPicked("");
            }}
            className="rounded-md border border-line bg-panel px-2 py-1.5"
          >
            <option value="roots">Roots</option>
            <option value="twin-screw">Twin-screw</option>
          </select>
        </label>
        <NumField path="blower.displacementPerRev" {...common} />
        <NumField path="blower.builtInVolumeRatio" hint="1 for a Roots blower; above 1 for a twin-screw." readOnly={values.blower.kind === "roots"} {...common} />
        <NumField path="blower.maxRpm" step="100" hint="The blower maker's limit, at the pulley shaft." {...common} />
        <NumField path="blower.volumetricEfficiencyRef" hint="At the reference speed and pressure ratio 1.5." {...common} />
        <NumField path="blower.referenceRpm" step="100" {...common} />
        <NumField path="blower.internalEfficiency" {...common} />
        <NumField path="blower.mechanicalEfficiency" {...common} />
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <Button
          type="button"
          variant="secondary"
          onClick={() => {
            fill({ kind: values.blower.kind, ...BLOWER_DEMO_DEFAULTS[values.blower.kind] });
            setPicked("");
            setFilledBy(`Filled with DEMO values for a generic ${values.blower.kind === "roots" ? "Roots" : "twin-screw"} blower: invented, not any maker's figures.`);
          }}
        >
          Fill demo values for this kind
        </Button>
        {filledBy ? (
          <p role="status" className="text-xs text-muted">
            {filledBy}
          </p>
        ) : null}
      </div>
    </EditorBox>
  );
}

export function AmbientSection({ form, system, errors, values }: Omit<EditorProps, "blowers">) {
  const { register, setValue } = form;
  const common = { system, register, errors, values };
  const [note, setNote] = useState<string | null>(null);
  return (
    <EditorBox legend="Ambient air">
      <div className={grid}>
        <NumField path="ambient.altitude" hint="Only used to fill the barometer (standard atmosphere)." {...common} />
        <div className="flex items-end">
          <Button
            type="button"
            variant="secondary"
            onClick={() => {
              const alt = fieldToSI("altitude", values.ambient.altitude, system);
              if (!Number.isFinite(alt) || alt < -1000 || alt > 11_000) {
                setNote("Give an altitude between −1,000 and 11,000 m (about −3,300 to 36,000 ft) first.");
                return;
              }
              const atm = standardAtmosphere(alt);
              setValue("ambient.pressure", fieldFromSI("pressure", atm.pressure, system), { shouldDirty: true });
              setNote("Barometer set from the standard atmosphere at that altitude.");
            }}
          >
            Set barometer from altitude
          </Button>
        </div>
        <NumField path="ambient.pressure" {...common} />
        <NumField path="ambient.temperature" {...common} />
        <NumField path="ambient.inletLoss" hint="Filter, throttle body or carburettor ahead of the blower." {...common} />
      </div>
      {note ? (
        <p role="status" className="text-xs text-muted">
          {note}
        </p>
      ) : null}
    </EditorBox>
  );
}
