// @ts-nocheck
import { combinationSchema, type Combination } from "@/calc";
import { requirePageUser } from "@/app/_lib/session";
import { Notice } from "@/components/ui/notice";
import { getDb } from "@/db/client";
import { getCombination, getRevision, listCombinations, listRevisions } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { CompareView, type ResolvedItem } from "./compare-view";
import { parseItems, parseSpeeds } from "./items";
import { personUnits } from "@/lib/units/person";

export const metadata = { title: "Side by side · Pulleywright" };

type SearchParams = Promise<Record<string, string | string[] | undefined>>;

export default async function ComparePage({ searchParams }: { searchParams: SearchParams }) {
  const sp = await searchParams;
  const user = await requirePageUser();
  const actor = toActor(user);
  const db = getDb();
  const { items, ignored } = parseItems(sp.items);
  const speeds = parseSpeeds(sp.at);

  const ids = [...new Set(items.map((i) => i.combinationId))];
  const [list, resolved, revisionLists] = await Promise.all([
    listCombinations(db, actor, { pageSize: 100, sort: "name", dir: "asc" }),
    Promise.allSettled(
      items.map(async (item): Promise<ResolvedItem> => {
        const c = await getCombination(db, actor, item.combinationId);
        if (item.revision === "current") {
          return { key: `${c.id}:current`, combinationId: c.id, revision: "current", label: `${c.name} · current (revision ${c.revision})`, spec: c.spec };
        }
        const r = await getRevision(db, actor, item.combinationId, item.revision);
        return { key: `${c.id}:${r.number}`, combinationId: c.id, revision: r.number, label: `${c.name} · revision ${r.number}${r.note ? ` (${r.note})` : ""}`, spec: r.spec };
      }),
    ),
    Promise.allSettled(ids.map((id) => listRevisions(db, actor, id))),
  ]);

  const shown: ResolvedItem[] = [];
  let missing = ignored;
  for (const r of resolved) {
    if (r.status === "rejected") {
      missing++;
      continue;
    }
    const parsed = combinationSchema.safeParse(r.value.spec);
    if (parsed.success) shown.push({ ...r.value, spec: parsed.data as Combination });
    else missing++;
  }
  // One item alone: its previous revision against it, the question a side by side usually asks.
  if (shown.length === 1 && items.length === 1) {
    const only = shown[0];
    const rev = only.revision === "current" ? (await getCombination(db, actor, only.combinationId)).revision : only.revision;
    if (rev > 1) {
      const prev = await getRevision(db, actor, only.combinationId, rev - 1).catch(() => null);
      const parsed = prev ? combinationSchema.safeParse(prev.spec) : null;
      if (prev && parsed?.success) {
        const name = only.label.split(" · ")[0];
        shown.unshift({ key: `${only.combinationId}:${prev.number}`, combinationId: only.combinationId, revision: prev.number, label: `${name} · revision ${prev.number}${prev.note ? ` (${prev.note})` : ""}`, spec: parsed.data as Combination });
      }
    }
  }
  const revisionsFor: Record<string, { number: number; note: string | null }[]> = {};
  ids.forEach((id, i) => {
    const r = revisionLists[i];
    if (r.status === "fulfilled") revisionsFor[id] = r.value.map((v) => ({ number: v.number, note: v.note }));
  });

  return (
    <div className="flex flex-col gap-4">
      <div>
        <h1 className="text-xl font-semibold">Side by side</h1>
        <p className="text-sm text-muted">Two to four combinations or revisions overlaid, with the differences from the first one.</p>
      </div>
      {missing > 0 ? (
        <Notice tone="warning">
          {missing === 1 ? "One item could not be shown" : `${missing} items could not be shown`}: it does not exist, is not yours to see, or the link is malformed.
        </Notice>
      ) : null}
      <CompareView
        items={shown}
        combinations={list.items.map((c) => ({ id: c.id, name: c.name, revision: c.revision, customerName: c.customerName, ownerEmail: c.ownerEmail }))}
        revisionsFor={revisionsFor}
        unitSystem={personUnits(user)}
        speeds={speeds}
      />
    </div>
  );
}
