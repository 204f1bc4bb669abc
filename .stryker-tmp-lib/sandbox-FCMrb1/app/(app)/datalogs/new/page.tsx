// @ts-nocheck
import type { Metadata } from "next";
import type { Combination } from "@/calc";
import { requirePageUser } from "@/app/_lib/session";
import { UploadForm, type UploadCombination } from "@/components/datalogs/upload-form";
import { getDb } from "@/db/client";
import { canWriteOwned } from "@/db/policy";
import { getCombination, listCombinations } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { BackLink } from "@/components/ui/back-link";
import { personUnits } from "@/lib/units/person";

export const metadata: Metadata = { title: "Upload a log" };

export default async function NewDatalogPage({ searchParams }: { searchParams: Promise<{ combination?: string }> }) {
  const user = await requirePageUser();
  const actor = toActor(user);
  const { combination } = await searchParams;
  const db = getDb();
  const { items } = await listCombinations(db, actor, { pageSize: 100, sort: "name", dir: "asc" });
  // Members upload for their own combinations; staff for the shop's.
  const writable = items.filter((c) => canWriteOwned(actor, c.ownerId));
  const full = await Promise.all(writable.map((c) => getCombination(db, actor, c.id)));
  const combos: UploadCombination[] = full.map((c) => ({
    id: c.id,
    name: c.name,
    revision: c.revision,
    ambient: { pressure: (c.spec as Combination).ambient.pressure, temperature: (c.spec as Combination).ambient.temperature },
  }));
  const initial = combos.some((c) => c.id === combination) ? combination! : null;
  return (
    <div className="flex max-w-4xl flex-col gap-4">
      <BackLink href="/datalogs" label="Datalogs" />
      <h1 className="text-2xl font-semibold">Upload a log</h1>
      <UploadForm combinations={combos} initialCombinationId={initial} unitSystem={personUnits(user)} />
    </div>
  );
}
