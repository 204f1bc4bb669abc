// @ts-nocheck
"use client";
import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { joinLessonAction } from "../actions";

export function JoinForm({ initialCode }: { initialCode: string }) {
  const [state, action, pending] = useActionState(joinLessonAction, undefined);
  // Held here, not in the form: React resets a form after its action, and a wrong code must
  // stay on screen to be corrected.
  const [code, setCode] = useState(initialCode);
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
        value={code}
        onChange={(e) => setCode(e.target.value)}
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
