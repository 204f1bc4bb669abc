// @ts-nocheck
import Link from "next/link";

export default function CompareNotFound() {
  return (
    <div className="flex flex-col items-start gap-2">
      <h1 className="text-xl font-semibold">Nothing to compare here</h1>
      <Link href="/compare" className="text-sm text-accent underline">
        Start a new side by side
      </Link>
    </div>
  );
}
