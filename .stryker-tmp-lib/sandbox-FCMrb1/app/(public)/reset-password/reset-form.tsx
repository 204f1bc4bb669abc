// @ts-nocheck
"use client";
import Link from "next/link";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { resetPassword } from "../actions";

export function ResetForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState(resetPassword, undefined);
  if (state?.ok) {
    return (
      <Notice tone="ok">
        Your password is changed. <Link href="/sign-in" className="underline">Sign in</Link>.
      </Notice>
    );
  }
  const fe = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} className="flex flex-col gap-3">
      <input type="hidden" name="token" value={token} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" required minLength={10} errors={fe.password} />
      <Field label="New password again" name="confirm" type="password" autoComplete="new-password" required errors={fe.confirm} />
      {fe.token ? <Notice tone="danger">{fe.token.join(" ")}</Notice> : null}
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save new password"}
      </Button>
    </form>
  );
}
