// @ts-nocheck
import Link from "next/link";

export default function PlannerNotFound() {
  return (
    <div className="flex flex-col items-start gap-2">
      <h1 className="text-xl font-semibold">No such combination</h1>
      <p className="text-sm text-muted">It may have been deleted, or it belongs to someone else.</p>
      <Link href="/combinations" className="text-sm text-accent underline">
        Back to combinations
      </Link>
    </div>
  );
}
