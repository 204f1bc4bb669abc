// @ts-nocheck
import type { Metadata } from "next";
import { LinkSignIn } from "./link-sign-in";

export const metadata: Metadata = { title: "Sign in with a link" };

/** The page an e-mailed link opens. Signing in takes a click, so mail scanners that follow links do not spend the token. */
export default async function LinkPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return (
    <div className="mx-auto max-w-sm">
      <h1 className="mb-6 text-2xl font-semibold">Sign in with your link</h1>
      {token ? <LinkSignIn token={token} /> : <p>This link is incomplete. Ask for a new one from the sign-in page.</p>}
    </div>
  );
}
