// @ts-nocheck
"use client";
import Link from "next/link";
import { Button } from "@/components/ui/button";

export type SegmentErrorProps = {
  error: Error & { digest?: string };
  reset: () => void;
  title: string;
  /** What is safe, said after the generic message, e.g. "unsaved edits are kept in this browser". */
  reassurance?: string;
  back?: { href: string; label: string };
  className?: string;
};

/**
 * The body of every error.tsx: what failed, a message safe to show (the database outage message
 * is passed through, anything else stays generic), the reference for the logs, and a retry.
 */
export function SegmentError({ error, reset, title, reassurance = "Nothing you saved was changed.", back, className = "" }: SegmentErrorProps) {
  return (
    <div role="alert" className={`flex flex-col items-start gap-3 rounded-lg border border-danger bg-danger-bg p-4 text-danger ${className}`}>
      <h2 className="font-semibold">{title}</h2>
      <p className="text-sm">
        {/database|reach/i.test(error.message) ? error.message : `Something went wrong on our side. ${reassurance}`}
        {error.digest ? <span className="ml-1 text-xs">(reference {error.digest})</span> : null}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={reset}>
          Try again
        </Button>
        {back ? (
          <Link href={back.href} className="self-center text-sm underline">
            {back.label}
          </Link>
        ) : null}
      </div>
    </div>
  );
}
