// @ts-nocheck
"use client";
// The admin's pulley form: diameters in the user's units, stored SI; the same zod schema as the API.
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { fromSI, type UnitSystem, unitLabel } from "@/calc";
import { Field } from "@/components/ui/field";
import { pulleyFormSchema } from "@/lib/shelf/rules";
import type { PulleyRow } from "@/db/schema";
import { FormSelect, ShelfFormFrame, useShelfSave } from "./shelf-form";
import { digitsOf } from "@/lib/units/format";

export type PulleyJson = Omit<PulleyRow, "createdAt" | "updatedAt">;
type Props = { system: UnitSystem; row?: PulleyJson; onDone: (message: string) => void; onCancel: () => void };

const shown = (m: number, system: UnitSystem) => String(Number(fromSI("length-small", m, system).toFixed(digitsOf("length-small", system) + 1)));

export function PulleyForm({ system, row, onDone, onCancel }: Props) {
  const schema = useMemo(() => pulleyFormSchema(system), [system]);
  const unit = unitLabel("length-small", system);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: {
      partNumber: row?.partNumber ?? "",
      position: row?.position ?? "blower",
      diameter: row ? shown(row.diameter, system) : "",
      ribCount: row ? String(row.ribCount) : "8",
      minBeltDiameter: row?.minBeltDiameter != null ? shown(row.minBeltDiameter, system) : "",
      price: row?.price ?? "",
      stock: row ? String(row.stock) : "0",
      notes: row?.notes ?? "",
    },
  });
  const { errors, isSubmitting } = form.formState;
  const err = (k: keyof typeof errors) => errors[k]?.message as string | undefined;

  const submit = useShelfSave("pulleys", row, form, onDone);

  return (
    <ShelfFormFrame noun="pulley" row={row} onSubmit={submit} onCancel={onCancel} isSubmitting={isSubmitting} rootError={errors.root?.message}>
      <Field label="Part number" {...form.register("partNumber")} errors={err("partNumber")} placeholder="PW-BP-0340-8" />
      <FormSelect id="f-position" label="Position" field={form.register("position")} error={err("position")} options={[["blower", "Blower"], ["crank", "Crank"]]} />
      <Field label="Diameter" unit={unit} inputMode="decimal" {...form.register("diameter")} errors={err("diameter")} />
      <Field label="Rib count" inputMode="numeric" {...form.register("ribCount")} errors={err("ribCount")} />
      <Field label="Minimum belt diameter" unit={unit} inputMode="decimal" hint="Smallest pulley this belt should wrap; leave empty if unknown." {...form.register("minBeltDiameter")} errors={err("minBeltDiameter")} />
      <Field label="Price" inputMode="decimal" placeholder="89.00" {...form.register("price")} errors={err("price")} />
      <Field label="Stock" inputMode="numeric" {...form.register("stock")} errors={err("stock")} />
      <Field label="Notes" {...form.register("notes")} errors={err("notes")} />
    </ShelfFormFrame>
  );
}
