// @ts-nocheck
"use client";
import Link from "next/link";
import { signIn } from "next-auth/react";
import { useActionState, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { requestSignInLink } from "../actions";

const messages: Record<string, string> = {
  CredentialsSignin: "That e-mail and password do not match an account.",
  RateLimited: "Too many failed attempts. Wait 15 minutes, or sign in with an e-mailed link.",
};

export function SignInForm({ initialError, callbackUrl }: { initialError?: string; callbackUrl: string }) {
  const [error, setError] = useState(initialError ? (messages[initialError] ?? "Sign-in failed. Try again.") : "");
  const [pending, setPending] = useState(false);
  const [linkState, linkAction, linkPending] = useActionState(requestSignInLink, undefined);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setPending(true);
    setError("");
    const res = await signIn("password", { email: form.get("email"), password: form.get("password"), redirect: false });
    setPending(false);
    if (res?.ok && !res.error) {
      window.location.assign(callbackUrl);
    } else {
      setError(messages[res?.error ?? ""] ?? "That e-mail and password do not match an account.");
    }
  }

  return (
    <div className="flex flex-col gap-8">
      <form onSubmit={onSubmit} className="flex flex-col gap-3" aria-describedby={error ? "sign-in-error" : undefined}>
        <Field label="E-mail" name="email" type="email" autoComplete="email" required />
        <Field label="Password" name="password" type="password" autoComplete="current-password" required />
        {error ? (
          <p id="sign-in-error" role="alert" className="text-sm text-danger">
            {error}
          </p>
        ) : null}
        <Button type="submit" disabled={pending}>
          {pending ? "Signing in…" : "Sign in"}
        </Button>
        <p className="text-sm">
          <Link href="/forgot-password" className="underline">
            Forgot your password?
          </Link>{" "}
          · New here?{" "}
          <Link href="/sign-up" className="underline">
            Create an account
          </Link>
        </p>
      </form>
      <form action={linkAction} className="flex flex-col gap-3 border-t border-line pt-6">
        <h2 className="text-sm font-semibold">Or get a one-time sign-in link by e-mail</h2>
        <Field label="E-mail for the link" name="email" id="link-email" type="email" autoComplete="email" required errors={linkState && !linkState.ok ? linkState.fieldErrors?.email ?? linkState.message : undefined} />
        {linkState?.ok ? <Notice tone="ok">{linkState.message}</Notice> : null}
        <Button type="submit" variant="secondary" disabled={linkPending}>
          {linkPending ? "Sending…" : "E-mail me a link"}
        </Button>
      </form>
    </div>
  );
}
