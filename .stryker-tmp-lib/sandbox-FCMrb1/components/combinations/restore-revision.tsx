// @ts-nocheck
"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { ActionState } from "@/lib/action-state";

type RestoreRevisionProps = {
  combinationId: string;
  number: number;
  currentRevision: number;
  /** The server action that restores (passed in by the page). */
  restoreAction: (id: string, number: number, baseRevision: number) => Promise<ActionState<{ revision: number }>>;
};

/** "Restore revision N", with a confirmation step; a 409 (someone saved since) is said plainly. */
export function RestoreRevision({ combinationId, number, currentRevision, restoreAction }: RestoreRevisionProps) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [pending, start] = useTransition();
  const [result, setResult] = useState<{ ok: boolean; text: string; stale?: boolean } | null>(null);

  function restore() {
    start(async () => {
      const r = await restoreAction(combinationId, number, currentRevision);
      setConfirming(false);
      if (r.ok) {
        setResult({ ok: true, text: `Restored revision ${number} as revision ${r.data?.revision}.` });
        router.refresh();
      } else {
        setResult({ ok: false, text: r.message, stale: r.status === 409 });
      }
    });
  }

  return (
    <div className="flex flex-col items-end gap-1">
      {confirming ? (
        <div role="group" aria-label={`Confirm restoring revision ${number}`} className="flex flex-wrap items-center justify-end gap-1">
          <span className="text-xs">
            Save revision {number}&apos;s spec as revision {currentRevision + 1}? Nothing is lost: the history keeps every revision.
          </span>
          <Button disabled={pending} onClick={restore}>
            {pending ? "Restoring…" : `Yes, restore revision ${number}`}
          </Button>
          <Button variant="ghost" onClick={() => setConfirming(false)}>
            Cancel
          </Button>
        </div>
      ) : (
        <Button variant="secondary" onClick={() => (setResult(null), setConfirming(true))}>
          Restore revision {number}
        </Button>
      )}
      {result ? (
        <p role={result.ok ? "status" : "alert"} className={`text-xs ${result.ok ? "text-ok" : "text-danger"}`}>
          {result.text}
          {result.stale ? (
            <>
              {" "}
              <button type="button" className="underline" onClick={() => (setResult(null), router.refresh())}>
                Reload the history
              </button>
            </>
          ) : null}
        </p>
      ) : null}
    </div>
  );
}
