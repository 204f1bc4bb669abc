// @ts-nocheck
import type { Metadata } from "next";
import { safeCallback } from "@/app/_lib/safe-callback";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ error?: string; callbackUrl?: string }> }) {
  const sp = await searchParams;
  return (
    <div className="mx-auto max-w-sm">
      <h1 className="mb-6 text-2xl font-semibold">Sign in</h1>
      <SignInForm initialError={sp.error} callbackUrl={safeCallback(sp.callbackUrl)} />
    </div>
  );
}
