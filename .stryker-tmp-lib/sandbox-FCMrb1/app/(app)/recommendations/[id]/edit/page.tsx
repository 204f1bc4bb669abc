// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { loadShelfForForm } from "@/app/(app)/recommendations/form-data";
import { loadForStaff } from "@/app/_lib/recommendation-load";
import { RecommendationForm } from "@/components/recommendation/recommendation-form";
import { requirePageUser } from "@/app/_lib/session";
import { getDb } from "@/db/client";
import { toActor } from "@/db/repo/users";

export const metadata: Metadata = { title: "Edit recommendation" };

export default async function EditRecommendationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const { sheet, unitSystem } = await loadForStaff(id);
  if (sheet.status !== "draft") redirect(`/recommendations/${id}`);
  const shelf = await loadShelfForForm(getDb(), toActor(user));
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">Edit recommendation for {sheet.customerName}</h1>
        <p className="text-sm text-muted">
          {sheet.combinationName}, as it was at revision {sheet.revision}. <Link href={`/recommendations/${id}`} className="underline">Back to the sheet</Link>
        </p>
      </div>
      <RecommendationForm
        mode="edit"
        id={id}
        combination={{ id: sheet.combinationId, name: sheet.combinationName, revision: sheet.revision, spec: sheet.spec }}
        pulleys={shelf.pulleys}
        parts={shelf.parts}
        unitSystem={unitSystem}
        initial={{
          title: sheet.title,
          targetRpm: sheet.targetRpm,
          customerName: sheet.customerName,
          customerEmail: sheet.customerEmail ?? "",
          vehicleNotes: sheet.vehicleNotes,
          notes: sheet.notes,
          blowerPulleyDiameter: sheet.blowerPulleyDiameter,
          parts: sheet.parts.map((p) => ({ partNumber: p.partNumber, description: p.description, unitPrice: p.unitPrice, quantity: p.quantity })),
        }}
      />
    </div>
  );
}
