// @ts-nocheck
"use client";
import { useActionState, useEffect } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { signOutEverywhere } from "./actions";

/** Ends the account's sessions on every device (a lost phone, a shared computer), then goes to sign-in. */
export function SignOutEverywhere() {
  const [state, action, pending] = useActionState(signOutEverywhere, undefined);
  useEffect(() => {
    // A full load: every cached page and client state of the ended session goes with it.
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination
    if (state?.ok) window.location.assign("/sign-in");
  }, [state]);
  return (
    <form action={action} className="mt-8 flex flex-col gap-2 border-t border-line pt-6">
      <h2 className="font-medium">Sessions</h2>
      <p className="text-sm text-muted">Signs this account out on every device and browser, this one included.</p>
      {state && !state.ok ? <Notice tone="danger">{state.message}</Notice> : null}
      <Button type="submit" variant="secondary" disabled={pending || state?.ok} className="self-start">
        {pending || state?.ok ? "Signing out…" : "Sign out everywhere"}
      </Button>
    </form>
  );
}
