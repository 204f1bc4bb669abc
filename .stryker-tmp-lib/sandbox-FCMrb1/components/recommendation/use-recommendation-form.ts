// @ts-nocheck
"use client";
// The sheet form's state: the react-hook-form instance, its parts lines with their amounts and
// total (the same decimal.js helpers the server uses), and saving through the API.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { ApiError, apiJson } from "@/components/client-json";
import { recommendationInputSchema } from "@/lib/recommendations/rules";
import { lineTotal, sumMoney } from "@/lib/shelf/rules";
import type { LineField } from "./parts-table";

export type ShelfPart = { partNumber: string; description: string; price: string; stock: number; diameter?: number; position?: string };
export type FormIn = z.input<typeof recommendationInputSchema>;
export type FormOut = z.output<typeof recommendationInputSchema>;

const MONEY = /^\d{1,10}(\.\d{1,2})?$/;

type Options = { mode: "create" | "edit"; id?: string; combinationId: string; initial: Omit<FormIn, "combinationId">; parts: ShelfPart[] };

export function useRecommendationForm({ mode, id, combinationId, initial, parts }: Options) {
  const router = useRouter();
  const form = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(recommendationInputSchema),
    defaultValues: { ...initial, combinationId },
  });
  const lines = useFieldArray({ control: form.control, name: "parts" });
  const chosen = Number(useWatch({ control: form.control, name: "blowerPulleyDiameter" }));
  const watched = useWatch({ control: form.control, name: "parts" }) ?? [];

  const amounts = watched.map((l) => {
    const unit = String(l?.unitPrice ?? "").trim();
    const qty = Number(l?.quantity);
    return MONEY.test(unit) && Number.isInteger(qty) && qty >= 1 && qty <= 999 ? lineTotal(unit, qty) : null;
  });
  const total = amounts.every((a) => a !== null) ? sumMoney(amounts as string[]) : null;

  const choose = (d: number) => form.setValue("blowerPulleyDiameter", d, { shouldDirty: true, shouldValidate: true });

  function addShelfPart(partNumber: string) {
    const p = parts.find((x) => x.partNumber === partNumber);
    if (p) lines.append({ partNumber: p.partNumber, description: p.description, unitPrice: p.price, quantity: 1 });
  }

  const submit = form.handleSubmit(async (values) => {
    try {
      if (mode === "create") {
        const out = await apiJson<{ id: string }>("/api/recommendations", { method: "POST", json: values });
        router.push(`/recommendations/${out.id}`);
      } else {
        await apiJson(`/api/recommendations/${id}`, { method: "PUT", json: values });
        router.push(`/recommendations/${id}`);
      }
      router.refresh();
    } catch (e) {
      if (e instanceof ApiError) for (const [k, msgs] of Object.entries(e.fieldErrors)) form.setError(k as "customerName", { message: msgs.join(" ") });
      form.setError("root", { message: e instanceof Error ? e.message : "Could not save the sheet." });
    }
  });

  const lineError = (i: number, k: LineField) => form.formState.errors.parts?.[i]?.[k]?.message as string | undefined;
  return { form, lines, chosen, watched, amounts, total, choose, addShelfPart, submit, lineError, cancel: () => router.back() };
}

export type RecommendationFormState = ReturnType<typeof useRecommendationForm>;
