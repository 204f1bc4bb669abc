// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { RecommendationsList } from "@/components/recommendation/recommendations-list";
import { personUnits } from "@/lib/units/person";
import { QueryProvider } from "@/components/query-provider";

export const metadata: Metadata = { title: "Recommendations" };

export default async function RecommendationsPage() {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">Recommendations</h1>
          <p className="text-sm text-muted">Sheets for customers: the pulley, the predicted curves, the parts and the cautions.</p>
        </div>
        <Link href="/recommendations/new" className="rounded-md bg-accent px-3 py-1.5 text-sm font-medium text-accent-fg">
          Make a recommendation
        </Link>
      </div>
      <QueryProvider><RecommendationsList unitSystem={personUnits(user)} /></QueryProvider>
    </div>
  );
}
