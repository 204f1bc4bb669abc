"use client";
import Link from "next/link";
import { Button } from "@/components/ui/button";

export default function PlannerError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-lg border border-danger bg-danger-bg p-4 text-danger">
      <h2 className="font-semibold">The planner could not be shown.</h2>
      <p className="text-sm">
        {/database|reach/i.test(error.message) ? error.message : "Something went wrong on our side. Nothing you saved was changed; unsaved edits are kept in this browser."}
        {error.digest ? <span className="ml-1 text-xs">(reference {error.digest})</span> : null}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={reset}>
          Try again
        </Button>
        <Link href="/combinations" className="self-center text-sm underline">
          Back to combinations
        </Link>
      </div>
    </div>
  );
}
