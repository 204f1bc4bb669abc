// @ts-nocheck
"use client";
import { signIn } from "next-auth/react";
import { useActionState, useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { signUp } from "../actions";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUp, undefined);
  // Controlled: React resets a form's fields once its action answers, and the sign-in that
  // follows a successful sign-up needs the e-mail and password that were typed.
  const [v, setV] = useState({ name: "", email: "", password: "" });
  const bind = (k: keyof typeof v) => ({ value: v[k], onChange: (e: React.ChangeEvent<HTMLInputElement>) => setV((old) => ({ ...old, [k]: e.target.value })) });
  const fe = state && !state.ok ? state.fieldErrors ?? {} : {};

  useEffect(() => {
    if (state?.ok) {
      void signIn("password", { email: v.email, password: v.password, redirect: false }).then((res) =>
        // Should the automatic sign-in fail, the account exists: send them to sign in by hand.
        window.location.assign(res?.ok && !res.error ? "/combinations" : "/sign-in"),
      );
    }
    // Only when the action answers; the typed values are read at that moment.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [state]);

  return (
    <form action={action} className="flex flex-col gap-3">
      <Field label="Name" name="name" autoComplete="name" required errors={fe.name} {...bind("name")} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required errors={fe.email} {...bind("email")} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" required minLength={10} hint="At least 10 characters." errors={fe.password} {...bind("password")} />
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
