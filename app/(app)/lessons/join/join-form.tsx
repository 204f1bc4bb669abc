"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { joinLessonAction } from "../actions";

export function JoinForm({ initialCode }: { initialCode: string }) {
  const [state, action, pending] = useActionState(joinLessonAction, undefined);
  const errors = state && !state.ok ? state.fieldErrors : undefined;
  return (
    <form action={action} className="flex flex-col gap-3">
      <Field
        label="Class code"
        name="code"
        required
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        maxLength={16}
        defaultValue={initialCode}
        errors={errors?.code}
        className="max-w-[14rem] [&_input]:font-mono [&_input]:text-lg [&_input]:tracking-widest"
      />
      {state && !state.ok && !errors?.code ? <Notice tone="danger">{state.message}</Notice> : null}
      <Button type="submit" disabled={pending} className="self-start">
        {pending ? "Joining…" : "Join"}
      </Button>
    </form>
  );
}
