// @ts-nocheck
"use client";
// "Copy to my combinations": the step's snapshot becomes a combination the viewer owns, to
// experiment with in the planner.
import Link from "next/link";
import { useState, useTransition } from "react";

type CopyResult = { ok: true; data?: { id: string; name: string } } | { ok: false; message: string };
export type CopyItemAction = (stepId: string, item: number) => Promise<CopyResult>;

type CopyItemButtonProps = { action: CopyItemAction; stepId: string; item: number; label: string };

export function CopyItemButton({ action, stepId, item, label }: CopyItemButtonProps) {
  const [pending, start] = useTransition();
  const [result, setResult] = useState<CopyResult | null>(null);
  const copied = result?.ok ? result.data : undefined;
  return (
    <div className="flex flex-col items-end gap-1 text-base" aria-live="polite">
      {copied ? (
        <p className="text-ok">
          Copied as “{copied.name}”.{" "}
          <Link href={`/combinations/${copied.id}`} className="font-medium text-accent underline">
            Open in the planner
          </Link>
        </p>
      ) : (
        <button
          type="button"
          disabled={pending}
          onClick={() => start(async () => setResult(await action(stepId, item)))}
          aria-label={`Copy “${label}” to my combinations`}
          className="rounded-md border border-line bg-bg px-3 py-1.5 font-medium hover:bg-panel disabled:opacity-50"
        >
          {pending ? "Copying…" : "Copy to my combinations"}
        </button>
      )}
      {result && !result.ok ? (
        <p role="alert" className="text-danger">
          {result.message}
        </p>
      ) : null}
    </div>
  );
}
