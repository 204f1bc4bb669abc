import Link from "next/link";

export default function RecommendationNotFound() {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-2xl font-semibold">No such recommendation</h1>
      <p className="text-muted">It may have been removed along with its combination.</p>
      <Link href="/recommendations" className="underline">
        All recommendations
      </Link>
    </div>
  );
}
