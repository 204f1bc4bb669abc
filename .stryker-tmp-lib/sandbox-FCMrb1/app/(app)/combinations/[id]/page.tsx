// @ts-nocheck
import { notFound } from "next/navigation";
import { combinationSchema, type Combination } from "@/calc";
import { requirePageUser } from "@/app/_lib/session";
import { readPlannerShelf } from "@/db/repo/planner-shelf";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { canWriteOwned } from "@/db/policy";
import { getCombination } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { duplicateToEdit, savePlannerUnits, saveRevision } from "./actions";
import { PlannerIsland } from "./planner-island";
import { Breadcrumb } from "@/components/ui/breadcrumb";
import { personUnits } from "@/lib/units/person";

export async function generateMetadata({ params }: { params: Promise<{ id: string }> }) {
  void params;
  return { title: "Planner · Pulleywright" };
}

export default async function PlannerPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageUser();
  const actor = toActor(user);
  const db = getDb();
  const [row, shelf] = await Promise.all([
    getCombination(db, actor, id).catch((e: unknown) => {
      if (e instanceof NotFoundError) notFound();
      throw e;
    }),
    readPlannerShelf(db, actor),
  ]);
  // Stored specs were validated on save; parsing again fills defaults added since.
  const parsed = combinationSchema.safeParse(row.spec);
  const spec: Combination = parsed.success ? parsed.data : row.spec;
  const canWrite = canWriteOwned(actor, row.ownerId);
  return (
    <div className="flex flex-col gap-4">
      <Breadcrumb href="/combinations" label="Combinations" here={row.name} className="text-sm text-muted" linkClassName="hover:underline" markCurrent />
      <PlannerIsland
        key={row.id}
        combinationId={row.id}
        name={row.name}
        revision={row.revision}
        isDemo={row.isDemo}
        spec={spec}
        unitSystem={personUnits(user)}
        canWrite={canWrite}
        shelf={shelf}
        save={saveRevision.bind(null, row.id)}
        duplicate={duplicateToEdit.bind(null, row.id)}
        saveUnits={savePlannerUnits}
      />
    </div>
  );
}
