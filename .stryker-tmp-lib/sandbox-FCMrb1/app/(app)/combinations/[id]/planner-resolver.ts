// @ts-nocheck
// calc's combinationSchema behind react-hook-form's zodResolver, with the messages put in the user's units.
import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldErrors, Resolver } from "react-hook-form";
import { z } from "zod";
import { combinationSchema, type Combination, type UnitSystem } from "@/calc";
import { localizeMessage, toSpec, type PlannerForm } from "@/lib/combinations/form-model";

/** `base`: the stored spec, whose untouched values are checked as stored, not as their rounded figures. */
export function plannerResolver(s: UnitSystem, base?: Combination): Resolver<PlannerForm> {
  return async (values, context, options) => {
    const schema = z.preprocess((v) => toSpec(v as PlannerForm, s, base), combinationSchema);
    const result = await (zodResolver(schema as never) as unknown as Resolver<PlannerForm>)(values, context, options);
    const walk = (node: unknown, path: string[]) => {
      if (!node || typeof node !== "object") return;
      const e = node as { message?: unknown; type?: unknown };
      if (typeof e.message === "string" && typeof e.type === "string") e.message = localizeMessage(path.join("."), e.message, s);
      for (const [k, v] of Object.entries(node)) if (k !== "ref" && k !== "message" && k !== "type") walk(v, [...path, k]);
    };
    walk(result.errors, []);
    return Object.keys(result.errors).length ? { values: {}, errors: result.errors as FieldErrors<PlannerForm> } : { values, errors: {} };
  };
}
