// @ts-nocheck
import Link from "next/link";

export default function DatalogNotFound() {
  return (
    <div className="flex flex-col gap-2">
      <h1 className="text-2xl font-semibold">No such log</h1>
      <p className="text-sm">It does not exist, was deleted, or is not yours to see.</p>
      <Link href="/datalogs" className="text-sm underline">
        Back to the datalogs
      </Link>
    </div>
  );
}
