// @ts-nocheck
import type { Metadata } from "next";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <div className="mx-auto max-w-sm">
      <h1 className="mb-2 text-2xl font-semibold">Create a member account</h1>
      <p className="mb-6 text-sm text-muted">Save your own combinations, their history and your datalogs.</p>
      <SignUpForm />
    </div>
  );
}
