// @ts-nocheck
import type { Metadata } from "next";
import Link from "next/link";
import { requirePageUser } from "@/app/_lib/session";
import { loadShelfForForm } from "@/app/(app)/recommendations/form-data";
import { RecommendationForm } from "@/components/recommendation/recommendation-form";
import { Notice } from "@/components/ui/notice";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { getCombination, getRevision, listCombinations, listRevisions } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { personUnits } from "@/lib/units/person";

export const metadata: Metadata = { title: "New recommendation" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v) ?? "";
const input = "rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm";

/**
 * "Make a recommendation": first find the combination (search by name or customer), then the
 * revision to use (the newest unless chosen), then the sheet itself. The customer's details start
 * empty: the combination's name and customer are the shop's own notes, not this sheet's customer.
 */
export default async function NewRecommendationPage({ searchParams }: Props) {
  const user = await requirePageUser(["sales", "tuner", "admin"]);
  const actor = toActor(user);
  const db = getDb();
  const sp = await searchParams;
  const comboId = one(sp.combination);

  if (!comboId) {
    const search = one(sp.search).slice(0, 100);
    const { items: rows, total } = await listCombinations(db, actor, { search: search || undefined, pageSize: 50, sort: "name", dir: "asc" });
    return (
      <div className="flex max-w-2xl flex-col gap-4">
        <h1 className="text-2xl font-semibold">New recommendation</h1>
        <form method="get" role="search" className="flex flex-wrap items-end gap-2">
          <div className="flex flex-col gap-1">
            <label htmlFor="combination-search" className="text-sm font-medium">
              Find the combination
            </label>
            <input id="combination-search" name="search" type="search" defaultValue={search} placeholder="Name or customer" className={`${input} w-72`} />
          </div>
          <button type="submit" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
            Search
          </button>
        </form>
        {rows.length === 0 ? (
          <Notice>{search ? "No combination matches; try another word." : "There are no combinations yet. Save one first."}</Notice>
        ) : (
          <ul aria-label="Combinations" className="flex flex-col divide-y divide-line rounded-md border border-line bg-panel" data-testid="combination-choices">
            {rows.map((c) => (
              <li key={c.id} className="flex flex-wrap items-baseline justify-between gap-2 px-3 py-2 text-sm">
                <Link href={`/recommendations/new?combination=${c.id}`} className="font-medium underline">
                  {c.name}
                </Link>
                <span className="text-muted">
                  {c.customerName ? `${c.customerName} · ` : ""}revision {c.revision}
                </span>
              </li>
            ))}
          </ul>
        )}
        {total > rows.length ? <p className="text-sm text-muted">Showing {rows.length} of {total}; search to narrow them down.</p> : null}
      </div>
    );
  }

  let combo, revisions;
  try {
    [combo, revisions] = await Promise.all([getCombination(db, actor, comboId), listRevisions(db, actor, comboId)]);
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
  const wanted = Number(one(sp.revision)) || combo.revision;
  const rev = wanted === combo.revision ? null : await getRevision(db, actor, combo.id, wanted).catch(() => null);
  const revision = rev ? rev.number : combo.revision;
  const spec = rev ? rev.spec : combo.spec;
  const shelf = await loadShelfForForm(db, actor);
  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-2xl font-semibold">New recommendation</h1>
        <p className="text-sm text-muted">
          From {combo.name} (internal; the customer sees the sheet&apos;s title). The sheet keeps revision {revision} even if the combination changes later.{" "}
          <Link href="/recommendations/new" className="underline">
            Choose another combination
          </Link>
        </p>
      </div>
      {revisions.length > 1 ? (
        <form method="get" className="flex flex-wrap items-end gap-2">
          <input type="hidden" name="combination" value={combo.id} />
          <div className="flex flex-col gap-1">
            <label htmlFor="revision" className="text-sm font-medium">
              Revision to use
            </label>
            <select id="revision" name="revision" defaultValue={String(revision)} className={input}>
              {revisions.map((r) => (
                <option key={r.number} value={r.number}>
                  {r.number}
                  {r.number === combo.revision ? " (newest)" : ""}
                  {r.note ? `: ${r.note}` : ""}
                </option>
              ))}
            </select>
          </div>
          <button type="submit" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
            Use this revision
          </button>
        </form>
      ) : null}
      <RecommendationForm
        key={revision}
        mode="create"
        combination={{ id: combo.id, name: combo.name, revision, spec }}
        pulleys={shelf.pulleys}
        parts={shelf.parts}
        unitSystem={personUnits(user)}
        initial={{
          revision,
          title: "",
          customerName: "",
          customerEmail: "",
          vehicleNotes: "",
          notes: "",
          blowerPulleyDiameter: spec.drive.blowerPulleyDiameter,
          targetRpm: null,
          parts: [],
        }}
      />
    </div>
  );
}
