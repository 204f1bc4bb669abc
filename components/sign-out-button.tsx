"use client";
import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/" })} className="rounded-md px-2 py-1 hover:bg-bg">
      Sign out
    </button>
  );
}
