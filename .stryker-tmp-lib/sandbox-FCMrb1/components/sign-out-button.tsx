// @ts-nocheck
"use client";
import { useState } from "react";

/**
 * Signs out through next-auth's own endpoint with its CSRF token. Plain fetch rather than
 * next-auth/react keeps that library out of every signed-in page's JavaScript.
 */
export function SignOutButton() {
  const [pending, setPending] = useState(false);
  async function signOut() {
    setPending(true);
    try {
      const { csrfToken } = (await (await fetch("/api/auth/csrf")).json()) as { csrfToken: string };
      await fetch("/api/auth/signout", {
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded" },
        body: new URLSearchParams({ csrfToken, callbackUrl: "/", json: "true" }),
      });
    } finally {
      window.location.replace("/");
    }
  }
  return (
    <button type="button" onClick={signOut} disabled={pending} className="rounded-md px-2 py-1 hover:bg-bg">
      {pending ? "Signing out…" : "Sign out"}
    </button>
  );
}
