// @ts-nocheck
"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import type { ActionState } from "@/lib/action-state";

type LessonMetaFormProps = { title: string; summary: string; action: (prev: ActionState | undefined, form: FormData) => Promise<ActionState> };

export function LessonMetaForm({ title, summary, action }: LessonMetaFormProps) {
  const [state, formAction, pending] = useActionState(action, undefined);
  const errors = state && !state.ok ? state.fieldErrors : undefined;
  return (
    <form action={formAction} className="flex flex-col gap-3 rounded-lg border border-line bg-panel p-4" aria-label="Title and summary">
      <Field label="Title" name="title" defaultValue={title} maxLength={120} required errors={errors?.title} />
      <div className="flex flex-col gap-1">
        <label htmlFor="lesson-summary" className="text-sm font-medium">
          Summary <span className="font-normal text-muted">(one or two sentences)</span>
        </label>
        <textarea
          id="lesson-summary"
          name="summary"
          defaultValue={summary}
          maxLength={500}
          rows={2}
          aria-invalid={errors?.summary ? true : undefined}
          aria-describedby={errors?.summary ? "lesson-summary-error" : undefined}
          className="rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm"
        />
        {errors?.summary ? (
          <p id="lesson-summary-error" role="alert" className="text-xs text-danger">
            {errors.summary.join(" ")}
          </p>
        ) : null}
      </div>
      {state ? <Notice tone={state.ok ? "ok" : "danger"}>{state.ok ? "Saved." : state.message}</Notice> : null}
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Saving…" : "Save title and summary"}
      </Button>
    </form>
  );
}
