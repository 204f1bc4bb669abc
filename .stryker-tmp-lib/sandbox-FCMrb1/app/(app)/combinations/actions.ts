// @ts-nocheck
"use server";
// The forms' side of the combinations: the same repository functions the REST routes call,
// each starting with the signed-in actor (a server action is a public POST endpoint).
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { BLANK_START, startingSpec, TEMPLATE_KEYS } from "@/lib/combinations/templates";
import { getDb } from "@/db/client";
import { FieldError } from "@/lib/errors";
import {
  createCombination,
  deleteCombination,
  duplicateCombination,
  importCombinations,
  renameCombination,
  undoDelete,
} from "@/db/repo/combinations";
import { unitsParamSchema } from "@/lib/units/person";

const figure = z.string().max(40).optional();
const newCombinationForm = z.object({
  name: z.string({ error: "Give the combination a name." }),
  template: z.enum([...TEMPLATE_KEYS, BLANK_START], { error: "Choose a starting point." }),
  units: unitsParamSchema.optional(),
  displacement: figure,
  cylinders: figure,
  redlineRpm: figure,
  blowerKind: figure,
  blowerDisplacement: figure,
  crankPulley: figure,
  blowerPulley: figure,
  customerName: z.string().optional(),
  customerContact: z.string().optional(),
  note: z.string().optional(),
});

/** Figures typed without saying their units are ambiguous; with none typed the units do not matter. */
function figuresUnits(f: Record<string, unknown>): "metric" {
  const typed = ["displacement", "blowerDisplacement", "crankPulley", "blowerPulley"].some((k) => typeof f[k] === "string" && (f[k] as string).trim() !== "");
  if (typed) throw new FieldError("units", "Say which units the figures are in (imperial or metric).");
  return "metric";
}

/** Creates a combination from a starting point, then opens it in the planner. */
export async function createCombinationAction(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  let id = "";
  const state = await act(async () => {
    const actor = await requireActor();
    const f = newCombinationForm.parse(formFields(form));
    const row = await createCombination(getDb(), actor, {
      name: f.name,
      // The main figures go into the first revision itself, so its note describes what was typed.
      spec: startingSpec(f.template, f, f.units ?? figuresUnits(f)),
      customerName: f.customerName,
      customerContact: f.customerContact,
      note: f.note,
    });
    id = row.id;
  });
  if (!state.ok) return state;
  revalidatePath("/combinations");
  redirect(`/combinations/${id}`);
}

const idSchema = z.string().min(1).max(64);

export async function renameCombinationAction(id: string, name: string, baseRevision: number): Promise<ActionState<{ revision: number }>> {
  return act(async () => {
    const actor = await requireActor();
    const base = z.number({ error: "baseRevision must be a number" }).int().min(1).parse(baseRevision);
    const row = await renameCombination(getDb(), actor, idSchema.parse(id), z.string({ error: "Name must be text." }).parse(name), base);
    revalidatePath("/combinations");
    return { revision: row.revision };
  });
}

export async function duplicateCombinationAction(id: string): Promise<ActionState<{ id: string; name: string }>> {
  return act(async () => {
    const actor = await requireActor();
    const row = await duplicateCombination(getDb(), actor, idSchema.parse(id));
    revalidatePath("/combinations");
    return { id: row.id, name: row.name };
  });
}

export async function deleteCombinationAction(id: string): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await deleteCombination(getDb(), actor, idSchema.parse(id));
    revalidatePath("/combinations");
  });
}

export async function undoDeleteAction(id: string): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await undoDelete(getDb(), actor, idSchema.parse(id));
    revalidatePath("/combinations");
  });
}

/** Imports an exported JSON file (as text), all or nothing. */
export async function importCombinationsAction(fileText: string): Promise<ActionState<{ imported: number }>> {
  return act(async () => {
    const actor = await requireActor();
    const text = z.string({ error: "Choose a JSON file." }).max(2_000_000, "The file is larger than 2 MB.").parse(fileText);
    let doc: unknown;
    try {
      doc = JSON.parse(text);
    } catch {
      throw new FieldError("file", "The file is not valid JSON.");
    }
    const rows = await importCombinations(getDb(), actor, doc);
    revalidatePath("/combinations");
    return { imported: rows.length };
  });
}
