// @ts-nocheck
"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { requestPasswordReset } from "../actions";

export default function ForgotPasswordPage() {
  const [state, action, pending] = useActionState(requestPasswordReset, undefined);
  return (
    <div className="mx-auto max-w-sm">
      <h1 className="mb-6 text-2xl font-semibold">Reset your password</h1>
      <form action={action} className="flex flex-col gap-3">
        <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={state && !state.ok ? state.fieldErrors?.email ?? state.message : undefined} />
        {state?.ok ? <Notice tone="ok">{state.message}</Notice> : null}
        <Button type="submit" disabled={pending}>
          {pending ? "Sending…" : "E-mail me a reset link"}
        </Button>
      </form>
    </div>
  );
}
