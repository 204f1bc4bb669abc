// @ts-nocheck
"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { createLessonAction } from "./actions";

export function NewLessonForm() {
  const [state, action, pending] = useActionState(createLessonAction, undefined);
  const errors = state && !state.ok ? state.fieldErrors : undefined;
  return (
    <form action={action} className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-panel p-3">
      <Field label="New lesson title" name="title" required maxLength={120} errors={errors?.title} className="min-w-[18rem] flex-1" />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create lesson"}
      </Button>
      {state && !state.ok && !errors?.title ? <Notice tone="danger" className="w-full">{state.message}</Notice> : null}
    </form>
  );
}
