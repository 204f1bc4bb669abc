"use client";
// The admin's blower form: displacement in the user's units, efficiencies in percent, stored SI.
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useMemo } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { fromSI, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { blowerFormSchema } from "@/db/shelf-rules";
import type { BlowerRow } from "@/db/schema";
import { ApiError, apiJson } from "./api";

export type BlowerJson = Omit<BlowerRow, "createdAt" | "updatedAt">;
type Props = { system: UnitSystem; row?: BlowerJson; onDone: (message: string) => void; onCancel: () => void };

const pct = (f: number) => String(Number((f * 100).toFixed(1)));

export function BlowerForm({ system, row, onDone, onCancel }: Props) {
  const schema = useMemo(() => blowerFormSchema(system), [system]);
  const unit = system === "metric" ? "L/rev" : "in³/rev";
  const qc = useQueryClient();
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      partNumber: row?.partNumber ?? "",
      name: row?.name ?? "",
      kind: row?.kind ?? "roots",
      displacementPerRev: row ? String(Number(fromSI("blower-displacement", row.displacementPerRev, system).toFixed(system === "metric" ? 3 : 1))) : "",
      builtInVolumeRatio: row ? String(row.builtInVolumeRatio) : "1",
      maxRpm: row ? String(row.maxRpm) : "",
      volumetricEfficiencyRef: row ? pct(row.volumetricEfficiencyRef) : "",
      referenceRpm: row ? String(row.referenceRpm) : "",
      internalEfficiency: row ? pct(row.internalEfficiency) : "85",
      mechanicalEfficiency: row ? pct(row.mechanicalEfficiency) : "95",
      notes: row?.notes ?? "",
      price: row?.price ?? "",
      stock: row ? String(row.stock) : "0",
    },
  });
  const { errors, isSubmitting } = form.formState;
  const err = (k: keyof typeof errors) => errors[k]?.message as string | undefined;

  const submit = form.handleSubmit(async (values) => {
    try {
      await apiJson(row ? `/api/shelf/blowers/${row.id}` : "/api/shelf/blowers", { method: row ? "PUT" : "POST", json: values });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      onDone(row ? `Saved ${values.partNumber}.` : `Added ${values.partNumber}.`);
    } catch (e) {
      const fe = e instanceof ApiError ? e.fieldErrors : {};
      for (const [k, msgs] of Object.entries(fe)) form.setError(k as "partNumber", { message: msgs.join(" ") });
      form.setError("root", { message: e instanceof Error ? e.message : "Could not save." });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4" aria-label={row ? `Edit blower ${row.partNumber}` : "Add a blower"}>
      <h3 className="font-semibold">{row ? `Edit blower ${row.partNumber}` : "Add a blower"}</h3>
      <div className="grid gap-3 sm:grid-cols-4">
        <Field label="Part number" {...form.register("partNumber")} errors={err("partNumber")} placeholder="PW-BL-R190" />
        <Field label="Name" {...form.register("name")} errors={err("name")} placeholder="Roots 1.9 L/rev" />
        <div className="flex flex-col gap-1">
          <label htmlFor="f-kind" className="text-sm font-medium">
            Kind
          </label>
          <select id="f-kind" {...form.register("kind")} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
            <option value="roots">Roots</option>
            <option value="twin-screw">Twin-screw</option>
          </select>
        </div>
        <Field label="Displacement" unit={unit} inputMode="decimal" {...form.register("displacementPerRev")} errors={err("displacementPerRev")} />
        <Field label="Built-in volume ratio" hint="1 for a Roots blower" inputMode="decimal" {...form.register("builtInVolumeRatio")} errors={err("builtInVolumeRatio")} />
        <Field label="Speed limit" unit="rpm" inputMode="numeric" {...form.register("maxRpm")} errors={err("maxRpm")} />
        <Field label="Reference volumetric efficiency" unit="%" inputMode="decimal" {...form.register("volumetricEfficiencyRef")} errors={err("volumetricEfficiencyRef")} />
        <Field label="Reference speed" unit="rpm" inputMode="numeric" {...form.register("referenceRpm")} errors={err("referenceRpm")} />
        <Field label="Internal efficiency" unit="%" inputMode="decimal" {...form.register("internalEfficiency")} errors={err("internalEfficiency")} />
        <Field label="Drive mechanical efficiency" unit="%" inputMode="decimal" {...form.register("mechanicalEfficiency")} errors={err("mechanicalEfficiency")} />
        <Field label="Price" inputMode="decimal" {...form.register("price")} errors={err("price")} />
        <Field label="Stock" inputMode="numeric" {...form.register("stock")} errors={err("stock")} />
        <Field label="Notes" className="sm:col-span-4" {...form.register("notes")} errors={err("notes")} />
      </div>
      {errors.root?.message ? <Notice tone="danger">{errors.root.message}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : row ? "Save blower" : "Add blower"}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
