"use client";
import { signIn } from "next-auth/react";
import { useActionState, useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { signUp } from "../actions";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUp, undefined);
  const formRef = useRef<HTMLFormElement>(null);
  const fe = state && !state.ok ? state.fieldErrors ?? {} : {};

  useEffect(() => {
    if (state?.ok && formRef.current) {
      const f = new FormData(formRef.current);
      void signIn("password", { email: f.get("email"), password: f.get("password"), redirect: false }).then(() =>
        window.location.assign("/combinations"),
      );
    }
  }, [state]);

  return (
    <form ref={formRef} action={action} className="flex flex-col gap-3">
      <Field label="Name" name="name" autoComplete="name" required errors={fe.name} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={fe.email} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required minLength={10} hint="At least 10 characters." errors={fe.password} />
      {state && !state.ok && !Object.keys(fe).length ? (
        <p role="alert" className="text-sm text-danger">
          {state.message}
        </p>
      ) : null}
      <Button type="submit" disabled={pending || state?.ok}>
        {pending || state?.ok ? "Creating…" : "Create account"}
      </Button>
    </form>
  );
}
