"use client";

export default function ClassroomError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <div role="alert" className="m-6 flex flex-col items-start gap-3 rounded-lg border border-danger bg-danger-bg p-4 text-danger">
      <h2 className="font-semibold">This lesson could not be shown.</h2>
      <p className="text-sm">
        {/database|reach/i.test(error.message) ? error.message : "Something went wrong on our side. Nothing was changed."}
        {error.digest ? <span className="ml-1 text-xs">(reference {error.digest})</span> : null}
      </p>
      <button type="button" onClick={reset} className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm">
        Try again
      </button>
    </div>
  );
}
