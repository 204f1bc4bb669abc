import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { loadShelfForForm } from "@/app/(app)/recommendations/form-data";
import { RecommendationForm } from "@/components/recommendation/recommendation-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getCombination, listCombinations } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";

export const metadata: Metadata = { title: "New recommendation" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const looksLikeEmail = (s: string | null) => (s && /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(s) ? s : "");

/** "Make a recommendation": from ?combination=<id>, or first choose the combination. */
export default async function NewRecommendationPage({ searchParams }: Props) {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const actor = toActor(user);
  const db = getDb();
  const sp = await searchParams;
  const comboId = typeof sp.combination === "string" ? sp.combination : "";

  if (!comboId) {
    const { items: rows } = await listCombinations(db, actor, { pageSize: 100, sort: "name", dir: "asc" });
    return (
      <div className="flex max-w-xl flex-col gap-4">
        <h1 className="text-2xl font-semibold">New recommendation</h1>
        <form method="get" className="flex flex-col gap-3">
          <div className="flex flex-col gap-1">
            <label htmlFor="combination" className="text-sm font-medium">
              Combination
            </label>
            <select id="combination" name="combination" required className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm">
              {rows.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                  {c.customerName ? ` (${c.customerName})` : ""}
                </option>
              ))}
            </select>
          </div>
          {rows.length === 0 ? <Notice>There are no combinations yet. Save one first.</Notice> : null}
          <Button type="submit" className="self-start" disabled={rows.length === 0}>
            Continue
          </Button>
        </form>
      </div>
    );
  }

  let combo;
  try {
    combo = await getCombination(db, actor, comboId);
  } catch (e) {
    if (!(e instanceof NotFoundError)) throw e;
    return (
      <div className="flex max-w-xl flex-col gap-3">
        <h1 className="text-2xl font-semibold">New recommendation</h1>
        <Notice tone="danger">That combination does not exist or is not yours to see.</Notice>
        <Link href="/recommendations/new" className="underline">
          Choose another combination
        </Link>
      </div>
    );
  }
  const shelf = await loadShelfForForm(db, actor);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">New recommendation</h1>
        <p className="text-sm text-muted">For {combo.name}. The sheet keeps this revision ({combo.revision}) even if the combination changes later.</p>
      </div>
      <RecommendationForm
        mode="create"
        combination={{ id: combo.id, name: combo.name, revision: combo.revision, spec: combo.spec }}
        pulleys={shelf.pulleys}
        parts={shelf.parts}
        unitSystem={user.unitSystem}
        initial={{
          customerName: combo.customerName ?? "",
          customerEmail: looksLikeEmail(combo.customerContact),
          vehicleNotes: "",
          notes: "",
          blowerPulleyDiameter: combo.spec.drive.blowerPulleyDiameter,
          parts: [],
        }}
      />
    </div>
  );
}
