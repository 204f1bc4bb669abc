"use client";
import { Button } from "@/components/ui/button";

export default function CompareError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-lg border border-danger bg-danger-bg p-4 text-danger">
      <h2 className="font-semibold">Side by side could not be shown.</h2>
      <p className="text-sm">
        {/database|reach/i.test(error.message) ? error.message : "Something went wrong on our side. Nothing you saved was changed."}
        {error.digest ? <span className="ml-1 text-xs">(reference {error.digest})</span> : null}
      </p>
      <Button variant="secondary" onClick={reset}>
        Try again
      </Button>
    </div>
  );
}
