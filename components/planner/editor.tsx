"use client";
// The combination editor: engine with its VE table, blower, drive, ambient, intercooler, fuel.
// Every field is in the user's units; calc's schema gives the errors (see form-model.ts).
import { useState } from "react";
import { useFieldArray, type UseFormReturn } from "react-hook-form";
import { BLOWER_DEMO_DEFAULTS, standardAtmosphere, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { fieldFromSI, fieldToSI, type PlannerForm } from "@/lib/combinations/form-model";
import { NumField } from "./num-field";
import type { ShelfBlower } from "@/lib/planner/compute";
import { applyShape, VE_SHAPES } from "@/lib/planner/ve-shapes";

export type EditorProps = {
  form: UseFormReturn<PlannerForm>;
  system: UnitSystem;
  errors: Record<string, string>;
  blowers: ShelfBlower[];
  values: PlannerForm;
};

const box = "flex flex-col gap-3 rounded-lg border border-line bg-panel p-3";
const grid = "grid grid-cols-1 gap-3 sm:grid-cols-2";
const legend = "px-1 text-sm font-semibold";

export function Editor({ form, system, errors, blowers, values }: EditorProps) {
  const { register } = form;
  const common = { system, register, errors };
  return (
    <div className="flex flex-col gap-3">
      <fieldset className={box}>
        <legend className={legend}>Engine</legend>
        <div className={grid}>
          <NumField path="engine.displacement" label="Engine displacement" {...common} />
          <NumField path="engine.cylinders" label="Cylinders" step="1" {...common} />
          <NumField path="engine.redlineRpm" label="Redline" step="50" {...common} />
        </div>
        <VeTable form={form} system={system} errors={errors} values={values} />
      </fieldset>
      <BlowerSection form={form} system={system} errors={errors} blowers={blowers} values={values} />
      <fieldset className={box}>
        <legend className={legend}>Drive</legend>
        <div className={grid}>
          <NumField path="drive.crankPulleyDiameter" label="Crank pulley diameter" step="0.01" {...common} />
          <NumField path="drive.blowerPulleyDiameter" label="Blower pulley diameter" step="0.01" {...common} />
          <NumField path="drive.beltSlip" label="Belt slip" hint="Demo default 2 %." {...common} />
        </div>
      </fieldset>
      <AmbientSection form={form} system={system} errors={errors} values={values} />
      <fieldset className={box}>
        <legend className={legend}>Intercooler</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" {...register("intercoolerOn")} /> Intercooler fitted
        </label>
        {values.intercoolerOn ? (
          <div className={grid}>
            <NumField path="intercooler.effectiveness" label="Intercooler effectiveness" {...common} />
            <NumField path="intercooler.pressureDrop" label="Intercooler pressure drop" {...common} />
            <NumField path="intercooler.coolantTemperature" label="Coolant temperature" {...common} />
          </div>
        ) : null}
      </fieldset>
      <fieldset className={box}>
        <legend className={legend}>Fuel</legend>
        <div className={grid}>
          <NumField path="fuel.afr" label="Air-fuel ratio" hint="By mass, e.g. 11.8 under boost on gasoline." {...common} />
          <NumField path="fuel.bsfc" label="BSFC" hint="The engine's own, before the blower drive." {...common} />
          <NumField path="fuel.evaporatedBeforeBlower" label="Fuel evaporated before the blower" hint="Draw-through only; 0 for port injection." {...common} />
        </div>
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" {...register("fuel.injectorsOn")} /> Check injector duty
        </label>
        {values.fuel.injectorsOn ? (
          <div className={grid}>
            <NumField path="fuel.injectorCount" label="Number of injectors" step="1" {...common} />
            <NumField path="fuel.injectorFlow" label="Flow of one injector" {...common} />
            <NumField path="fuel.maxDuty" label="Maximum injector duty" {...common} />
          </div>
        ) : null}
      </fieldset>
    </div>
  );
}

function VeTable({ form, system, errors, values }: Omit<EditorProps, "blowers">) {
  const { fields, append, remove, replace } = useFieldArray({ control: form.control, name: "engine.veCurve" });
  const [shapeId, setShapeId] = useState(VE_SHAPES[0].id);
  const rows = values.engine.veCurve;
  const lastRpm = rows.reduce((m, r) => (Number.isFinite(r.rpm) ? Math.max(m, r.rpm) : m), 0);
  const tableError = errors["engine.veCurve"];
  return (
    <div className="flex flex-col gap-2">
      <p id="ve-help" className="text-sm font-medium">
        Volumetric efficiency at wide-open throttle <span className="font-normal text-muted">(referenced to the manifold, after any intercooler)</span>
      </p>
      <div className="flex flex-wrap gap-3">
        <table className="text-sm" aria-describedby="ve-help">
          <caption className="sr-only">VE table</caption>
          <thead>
            <tr className="text-left text-muted">
              <th scope="col" className="pr-2 font-normal">Engine speed (rpm)</th>
              <th scope="col" className="pr-2 font-normal">VE (%)</th>
              <th scope="col" className="sr-only">Remove</th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => {
              const rpmErr = errors[`engine.veCurve.${i}.rpm`];
              const veErr = errors[`engine.veCurve.${i}.ve`];
              return (
                <tr key={f.id} className="align-top">
                  <td className="pr-2 pb-1">
                    <input
                      type="number"
                      step="any"
                      aria-label={`Engine speed, VE row ${i + 1} (rpm)`}
                      aria-invalid={rpmErr ? true : undefined}
                      aria-describedby={rpmErr ? `ve-${i}-rpm-error` : undefined}
                      className="w-24 rounded-md border border-line bg-panel px-2 py-1 aria-[invalid=true]:border-danger"
                      {...form.register(`engine.veCurve.${i}.rpm`, { valueAsNumber: true })}
                    />
                    {rpmErr ? (
                      <p id={`ve-${i}-rpm-error`} className="max-w-40 text-xs text-danger">
                        {rpmErr}
                      </p>
                    ) : null}
                  </td>
                  <td className="pr-2 pb-1">
                    <input
                      type="number"
                      step="any"
                      aria-label={`VE, row ${i + 1} (%)`}
                      aria-invalid={veErr ? true : undefined}
                      aria-describedby={veErr ? `ve-${i}-ve-error` : undefined}
                      className="w-20 rounded-md border border-line bg-panel px-2 py-1 aria-[invalid=true]:border-danger"
                      {...form.register(`engine.veCurve.${i}.ve`, { valueAsNumber: true })}
                    />
                    {veErr ? (
                      <p id={`ve-${i}-ve-error`} className="max-w-40 text-xs text-danger">
                        {veErr}
                      </p>
                    ) : null}
                  </td>
                  <td className="pb-1">
                    <Button type="button" variant="ghost" onClick={() => remove(i)} disabled={fields.length <= 1} aria-label={`Remove VE row ${i + 1}`}>
                      ✕
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <VePreview rows={rows} />
      </div>
      {tableError ? (
        <p className="text-xs text-danger" role="alert">
          {tableError}
        </p>
      ) : null}
      <div className="flex flex-wrap items-end gap-2">
        <Button type="button" variant="secondary" onClick={() => append({ rpm: lastRpm ? lastRpm + 500 : 3000, ve: rows[rows.length - 1]?.ve ?? 85 })} disabled={fields.length >= 64}>
          Add VE row
        </Button>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Starting shape</span>
          <select value={shapeId} onChange={(e) => setShapeId(e.target.value)} className="rounded-md border border-line bg-panel px-2 py-1.5">
            {VE_SHAPES.map((s) => (
              <option key={s.id} value={s.id}>
                {s.label}
              </option>
            ))}
          </select>
        </label>
        <Button
          type="button"
          variant="secondary"
          onClick={() => {
            const shape = VE_SHAPES.find((s) => s.id === shapeId) ?? VE_SHAPES[0];
            const redline = Number.isFinite(values.engine.redlineRpm) ? values.engine.redlineRpm : 6000;
            replace(applyShape(shape, redline, rows));
          }}
        >
          Fill VE from shape
        </Button>
      </div>
      <p className="text-xs text-muted">The starting shapes are invented, generic guesses: replace them with your engine&apos;s figures.</p>
    </div>
  );
}

/** A small picture of the VE curve; the numbers are in the table beside it. */
function VePreview({ rows }: { rows: { rpm: number; ve: number }[] }) {
  const pts = rows.filter((r) => Number.isFinite(r.rpm) && Number.isFinite(r.ve)).sort((a, b) => a.rpm - b.rpm);
  if (pts.length < 2) return null;
  const w = 200;
  const h = 90;
  const x0 = pts[0].rpm;
  const x1 = pts[pts.length - 1].rpm;
  const lo = Math.min(60, ...pts.map((p) => p.ve));
  const hi = Math.max(110, ...pts.map((p) => p.ve));
  const x = (r: number) => 6 + ((r - x0) / Math.max(1, x1 - x0)) * (w - 12);
  const y = (v: number) => h - 6 - ((v - lo) / (hi - lo)) * (h - 12);
  return (
    <svg width={w} height={h} aria-hidden="true" className="self-start rounded-md border border-line">
      <line x1={6} x2={w - 6} y1={y(100)} y2={y(100)} stroke="currentColor" strokeOpacity={0.25} strokeDasharray="3 3" />
      <polyline fill="none" stroke="#0072B2" strokeWidth={2} points={pts.map((p) => `${x(p.rpm)},${y(p.ve)}`).join(" ")} />
      {pts.map((p) => (
        <circle key={p.rpm} cx={x(p.rpm)} cy={y(p.ve)} r={2.5} fill="#0072B2" />
      ))}
    </svg>
  );
}

function BlowerSection({ form, system, errors, blowers, values }: EditorProps) {
  const { register, setValue } = form;
  const common = { system, register, errors };
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
    <fieldset className={box}>
      <legend className={legend}>Blower</legend>
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
                {b.name} ({b.kind === "roots" ? "Roots" : "twin-screw"}, {fieldFromSI("blower-displacement", b.displacementPerRev, system)} {system === "imperial" ? "in³/rev" : "L/rev"}){b.stock > 0 ? "" : " · out of stock"}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Blower kind</span>
          <select
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
        <NumField path="blower.displacementPerRev" label="Blower displacement" {...common} />
        <NumField path="blower.builtInVolumeRatio" label="Built-in volume ratio" hint="1 for a Roots blower; above 1 for a twin-screw." readOnly={values.blower.kind === "roots"} {...common} />
        <NumField path="blower.maxRpm" label="Blower speed limit" step="100" hint="The blower maker's limit, at the pulley shaft." {...common} />
        <NumField path="blower.volumetricEfficiencyRef" label="Blower volumetric efficiency" hint="At the reference speed and pressure ratio 1.5." {...common} />
        <NumField path="blower.referenceRpm" label="Reference blower speed" step="100" {...common} />
        <NumField path="blower.internalEfficiency" label="Blower internal efficiency" {...common} />
        <NumField path="blower.mechanicalEfficiency" label="Drive mechanical efficiency" {...common} />
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
    </fieldset>
  );
}

function AmbientSection({ form, system, errors, values }: Omit<EditorProps, "blowers">) {
  const { register, setValue } = form;
  const common = { system, register, errors };
  const [note, setNote] = useState<string | null>(null);
  return (
    <fieldset className={box}>
      <legend className={legend}>Ambient air</legend>
      <div className={grid}>
        <NumField path="ambient.altitude" label="Altitude" hint="Only used to fill the barometer (standard atmosphere)." {...common} />
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
        <NumField path="ambient.pressure" label="Barometer (absolute)" {...common} />
        <NumField path="ambient.temperature" label="Ambient temperature" {...common} />
        <NumField path="ambient.inletLoss" label="Inlet pressure loss" hint="Filter, throttle body or carburettor ahead of the blower." {...common} />
      </div>
      {note ? (
        <p role="status" className="text-xs text-muted">
          {note}
        </p>
      ) : null}
    </fieldset>
  );
}
