"use client";
import Link from "next/link";
import { Button } from "@/components/ui/button";

export default function CombinationsError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-lg border border-danger bg-danger-bg p-4 text-danger">
      <h2 className="font-semibold">Your combinations could not be shown.</h2>
      <p className="text-sm">
        {/database|reach/i.test(error.message) ? error.message : "Something went wrong on our side. Nothing you saved was changed."}
        {error.digest ? <span className="ml-1 text-xs">(reference {error.digest})</span> : null}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={reset}>
          Try again
        </Button>
        <Link href="/combinations" className="rounded-md px-3 py-1.5 text-sm underline">
          Back to the list
        </Link>
      </div>
    </div>
  );
}
