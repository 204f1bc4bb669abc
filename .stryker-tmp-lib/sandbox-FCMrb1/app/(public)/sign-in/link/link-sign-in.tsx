// @ts-nocheck
"use client";
import { useRouter } from "next/navigation";
import { signIn } from "next-auth/react";
import { useState } from "react";
import { Button } from "@/components/ui/button";

export function LinkSignIn({ token }: { token: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState("");
  async function go() {
    setPending(true);
    const res = await signIn("link", { token, redirect: false });
    setPending(false);
    if (res?.ok && !res.error) {
      router.replace("/combinations");
      router.refresh();
    }
    else setError("This link has expired or was already used. Ask for a new one from the sign-in page.");
  }
  return (
    <div className="flex flex-col gap-3">
      <Button onClick={go} disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
      {error ? (
        <p role="alert" className="text-sm text-danger">
          {error}
        </p>
      ) : null}
    </div>
  );
}
