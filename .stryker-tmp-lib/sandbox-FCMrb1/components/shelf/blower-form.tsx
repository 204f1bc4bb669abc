// @ts-nocheck
"use client";
// The admin's blower form: displacement in the user's units, efficiencies in percent, stored SI.
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { fromSI, type UnitSystem, unitLabel } from "@/calc";
import { Field } from "@/components/ui/field";
import { blowerFormSchema } from "@/lib/shelf/rules";
import type { BlowerRow } from "@/db/schema";
import { FormSelect, ShelfFormFrame, useShelfSave } from "./shelf-form";
import { digitsOf } from "@/lib/units/format";

export type BlowerJson = Omit<BlowerRow, "createdAt" | "updatedAt">;
type Props = { system: UnitSystem; row?: BlowerJson; onDone: (message: string) => void; onCancel: () => void };

const pct = (f: number) => String(Number((f * 100).toFixed(1)));

export function BlowerForm({ system, row, onDone, onCancel }: Props) {
  const schema = useMemo(() => blowerFormSchema(system), [system]);
  const unit = unitLabel("blower-displacement", system);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      partNumber: row?.partNumber ?? "",
      name: row?.name ?? "",
      kind: row?.kind ?? "roots",
      displacementPerRev: row ? String(Number(fromSI("blower-displacement", row.displacementPerRev, system).toFixed(digitsOf("blower-displacement", system) + 1))) : "",
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

  const submit = useShelfSave("blowers", row, form, onDone);

  return (
    <ShelfFormFrame noun="blower" row={row} onSubmit={submit} onCancel={onCancel} isSubmitting={isSubmitting} rootError={errors.root?.message}>
      <Field label="Part number" {...form.register("partNumber")} errors={err("partNumber")} placeholder="PW-BL-R160" />
      <Field label="Name" {...form.register("name")} errors={err("name")} placeholder="Roots 1.9 L/rev" />
      <FormSelect id="f-kind" label="Kind" field={form.register("kind")} error={err("kind")} options={[["roots", "Roots"], ["twin-screw", "Twin-screw"]]} />
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
    </ShelfFormFrame>
  );
}
