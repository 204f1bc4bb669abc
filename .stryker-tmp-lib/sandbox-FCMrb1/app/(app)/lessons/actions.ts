// @ts-nocheck
"use server";
// Server actions of the lessons pages. Each one checks the session first; the repository checks
// ownership and role (db/repo/lessons.ts), so these are as safe as the REST routes they mirror.
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { act, formFields } from "@/app/_lib/action";
import { type ActionState } from "@/lib/action-state";
import { requireActor } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { addStep, copyStepItem, createLesson, deleteLesson, deleteStep, joinLesson, moveStep, regenerateClassCode, updateLesson, updateStep } from "@/db/repo/lessons";
import { type StepInput } from "@/lib/lessons/rules";

const field = (form: FormData, name: string) => {
  const v = formFields(form)[name];
  return typeof v === "string" ? v : undefined;
};

function refresh(id?: string) {
  revalidatePath("/lessons");
  if (id) {
    revalidatePath(`/lessons/${id}/edit`);
    revalidatePath(`/classroom/${id}`);
  }
}

export async function createLessonAction(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  const state = await act(async () => {
    const actor = await requireActor();
    return createLesson(getDb(), actor, { title: field(form, "title") ?? "", summary: field(form, "summary") ?? "" });
  });
  if (!state.ok) return state;
  refresh();
  redirect(`/lessons/${state.data!.id}/edit`);
}

export async function saveLessonAction(id: string, _prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await updateLesson(getDb(), actor, id, { title: field(form, "title") ?? "", summary: field(form, "summary") ?? "" });
    refresh(id);
  });
}

export async function setPublishedAction(id: string, published: boolean): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await updateLesson(getDb(), actor, id, { published });
    refresh(id);
  });
}

export async function regenerateCodeAction(id: string): Promise<ActionState<{ classCode: string }>> {
  return act(async () => {
    const actor = await requireActor();
    const row = await regenerateClassCode(getDb(), actor, id);
    refresh(id);
    return { classCode: row.classCode };
  });
}

export async function deleteLessonAction(id: string): Promise<ActionState> {
  const state = await act(async () => {
    const actor = await requireActor();
    await deleteLesson(getDb(), actor, id);
  });
  if (!state.ok) return state;
  refresh();
  redirect("/lessons");
}

/** Adds a step (stepId null) or replaces one; the items are snapshotted on the server. */
export async function saveStepAction(lessonId: string, stepId: string | null, input: StepInput): Promise<ActionState<{ id: string }>> {
  return act(async () => {
    const actor = await requireActor();
    const step = stepId ? await updateStep(getDb(), actor, lessonId, stepId, input) : await addStep(getDb(), actor, lessonId, input);
    refresh(lessonId);
    return { id: step.id };
  });
}

export async function deleteStepAction(lessonId: string, stepId: string): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await deleteStep(getDb(), actor, lessonId, stepId);
    refresh(lessonId);
  });
}

export async function moveStepAction(lessonId: string, stepId: string, direction: "up" | "down"): Promise<ActionState> {
  return act(async () => {
    const actor = await requireActor();
    await moveStep(getDb(), actor, lessonId, stepId, direction);
    refresh(lessonId);
  });
}

export async function joinLessonAction(_prev: ActionState | undefined, form: FormData): Promise<ActionState> {
  const state = await act(async () => {
    const actor = await requireActor();
    return joinLesson(getDb(), actor, { code: field(form, "code") ?? "" });
  });
  if (!state.ok) return state;
  refresh();
  redirect(`/classroom/${state.data!.id}`);
}

export async function copyItemAction(lessonId: string, stepId: string, item: number): Promise<ActionState<{ id: string; name: string }>> {
  return act(async () => {
    const actor = await requireActor();
    const row = await copyStepItem(getDb(), actor, lessonId, stepId, { item });
    revalidatePath("/combinations");
    return { id: row.id, name: row.name };
  });
}
