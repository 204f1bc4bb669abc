"use client";
// The admin's pulley form: diameters in the user's units, stored SI; the same zod schema as the API.
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useMemo } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { fromSI, type UnitSystem } from "@/calc";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { pulleyFormSchema } from "@/db/shelf-rules";
import type { PulleyRow } from "@/db/schema";
import { ApiError, apiJson } from "./api";

export type PulleyJson = Omit<PulleyRow, "createdAt" | "updatedAt">;
type Props = { system: UnitSystem; row?: PulleyJson; onDone: (message: string) => void; onCancel: () => void };

const shown = (m: number, system: UnitSystem) => String(Number(fromSI("length-small", m, system).toFixed(system === "metric" ? 1 : 3)));

export function PulleyForm({ system, row, onDone, onCancel }: Props) {
  const schema = useMemo(() => pulleyFormSchema(system), [system]);
  const unit = system === "metric" ? "mm" : "in";
  const qc = useQueryClient();
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

  const submit = form.handleSubmit(async (values) => {
    try {
      await apiJson(row ? `/api/shelf/pulleys/${row.id}` : "/api/shelf/pulleys", { method: row ? "PUT" : "POST", json: values });
      await qc.invalidateQueries({ queryKey: ["shelf"] });
      onDone(row ? `Saved ${values.partNumber}.` : `Added ${values.partNumber}.`);
    } catch (e) {
      const fe = e instanceof ApiError ? e.fieldErrors : {};
      for (const [k, msgs] of Object.entries(fe)) form.setError(k as "partNumber", { message: msgs.join(" ") });
      form.setError("root", { message: e instanceof Error ? e.message : "Could not save." });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3 rounded-md border border-line bg-panel p-4" aria-label={row ? `Edit pulley ${row.partNumber}` : "Add a pulley"}>
      <h3 className="font-semibold">{row ? `Edit pulley ${row.partNumber}` : "Add a pulley"}</h3>
      <div className="grid gap-3 sm:grid-cols-4">
        <Field label="Part number" {...form.register("partNumber")} errors={err("partNumber")} placeholder="PW-BP-0340-8" />
        <div className="flex flex-col gap-1">
          <label htmlFor="f-position" className="text-sm font-medium">
            Position
          </label>
          <select id="f-position" {...form.register("position")} aria-describedby={err("position") ? "f-position-error" : undefined} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
            <option value="blower">Blower</option>
            <option value="crank">Crank</option>
          </select>
          {err("position") ? (
            <p id="f-position-error" role="alert" className="text-xs text-danger">
              {err("position")}
            </p>
          ) : null}
        </div>
        <Field label="Diameter" unit={unit} inputMode="decimal" {...form.register("diameter")} errors={err("diameter")} />
        <Field label="Rib count" inputMode="numeric" {...form.register("ribCount")} errors={err("ribCount")} />
        <Field label="Minimum belt diameter" unit={unit} inputMode="decimal" hint="Smallest pulley this belt should wrap; leave empty if unknown." {...form.register("minBeltDiameter")} errors={err("minBeltDiameter")} />
        <Field label="Price" inputMode="decimal" placeholder="89.00" {...form.register("price")} errors={err("price")} />
        <Field label="Stock" inputMode="numeric" {...form.register("stock")} errors={err("stock")} />
        <Field label="Notes" {...form.register("notes")} errors={err("notes")} />
      </div>
      {errors.root?.message ? <Notice tone="danger">{errors.root.message}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : row ? "Save pulley" : "Add pulley"}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
