// @ts-nocheck
// A combination's history: every revision with its note, any one's spec, any two compared, and
// restore (saved as the newest revision, so nothing is lost).
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import type { Combination } from "@/calc";
import { requirePageUser } from "@/app/_lib/session";
import { RestoreRevision } from "@/components/combinations/restore-revision";
import { restoreRevisionAction } from "./actions";
import { specChanges, specRows } from "@/lib/combinations/spec-fields";
import { getDb } from "@/db/client";
import { NotFoundError } from "@/lib/errors";
import { canWriteOwned } from "@/db/policy";
import { getCombination, listRevisions } from "@/db/repo/combinations";
import { toActor } from "@/db/repo/users";
import { personUnits, unitsName } from "@/lib/units/person";
import { dateTimeText } from "@/lib/format/dates";
import { requestLocale } from "@/app/_lib/locale";
import { ACTIONS_COLUMN, DataTable } from "@/components/ui/data-table";

export const metadata: Metadata = { title: "History" };

type Search = { view?: string; a?: string; b?: string };

const int = (s: string | undefined) => (s && /^\d{1,6}$/.test(s) ? Number(s) : undefined);

export default async function RevisionsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Search> }) {
  const user = await requirePageUser();
  const locale = await requestLocale();
  const actor = toActor(user);
  const [{ id }, sp] = await Promise.all([params, searchParams]);
  const db = getDb();
  let combination;
  try {
    combination = await getCombination(db, actor, id);
  } catch (e) {
    if (e instanceof NotFoundError) notFound();
    throw e;
  }
  const revisions = await listRevisions(db, actor, id);
  const writable = canWriteOwned(actor, combination.ownerId);
  const byNumber = new Map(revisions.map((r) => [r.number, r]));
  const current = combination.revision;
  const units = personUnits(user);

  const viewed = int(sp.view) !== undefined ? byNumber.get(int(sp.view)!) : undefined;
  const newest = revisions[0]?.number ?? current;
  const a = byNumber.get(int(sp.a) ?? newest - 1) ?? revisions[1];
  const b = byNumber.get(int(sp.b) ?? newest) ?? revisions[0];
  const changes = a && b ? specChanges(a.spec as Combination, b.spec as Combination, units) : [];
  if (a && b && a.name !== b.name) changes.unshift({ path: "name", label: "Name", before: a.name, after: b.name });

  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="mb-2 text-sm">
          <Link href={`/combinations/${id}`} className="underline">
            ← Back to the planner
          </Link>
        </p>
        <h1 className="text-2xl font-semibold">History of “{combination.name}”</h1>
        <p className="text-sm text-muted">
          Now at revision {current}. Each save is a revision; restoring one saves its spec again as the newest, so nothing is
          lost. Values in {unitsName(units)}.
        </p>
        {!writable ? <p className="mt-1 text-sm text-muted">You can view this history but not change it. Duplicate the combination to make your own copy.</p> : null}
      </div>

      <section aria-labelledby="revisions-title">
        <h2 id="revisions-title" className="mb-2 text-lg font-semibold">
          Revisions
        </h2>
        <DataTable
          caption="Revisions"
          density="roomy"
          className="tabular-nums"
          headClassName="text-muted"
          rows={revisions}
          rowKey={(r) => String(r.number)}
          rowProps={(r) => ({ className: "align-top", "aria-current": r.number === current ? "true" : undefined })}
          empty="No revisions."
          columns={[
            {
              label: "Revision",
              align: "right",
              cellClassName: "font-medium",
              cell: (r) => (
                <>
                  {r.number}
                  {r.number === current ? <span className="ml-1 rounded border border-line px-1 text-xs font-normal text-muted">current</span> : null}
                </>
              ),
            },
            { label: "Note", cell: (r) => r.note ?? <span className="text-muted">—</span> },
            { label: "By", cell: (r) => r.authorName ?? <span className="text-muted">a removed account</span> },
            {
              label: "Saved",
              cellClassName: "whitespace-nowrap",
              cell: (r) => <time dateTime={r.createdAt.toISOString()}>{dateTimeText(r.createdAt, locale)}</time>,
            },
            {
              ...ACTIONS_COLUMN,
              cell: (r) => (
                <div className="flex flex-wrap items-start justify-end gap-2">
                  <Link href={`?view=${r.number}#view`} className="rounded-md px-2 py-1 hover:bg-bg" aria-label={`View revision ${r.number}`}>
                    View
                  </Link>
                  {writable && r.number !== current ? <RestoreRevision combinationId={id} number={r.number} currentRevision={current} restoreAction={restoreRevisionAction} /> : null}
                </div>
              ),
            },
          ]}
        />
      </section>

      {viewed ? (
        <section id="view" aria-labelledby="view-title">
          <h2 id="view-title" className="mb-2 text-lg font-semibold">
            Revision {viewed.number}: “{viewed.name}”
          </h2>
          <table className="w-full max-w-2xl text-sm tabular-nums" aria-labelledby="view-title">
            <tbody>
              {specRows(viewed.spec as Combination, units).map((row) => (
                <tr key={row.path} className="border-b border-line">
                  <th scope="row" className="py-1.5 pr-4 text-left font-normal text-muted">{row.label}</th>
                  <td className="py-1.5">{row.value}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ) : null}

      {revisions.length > 1 ? (
        <section aria-labelledby="compare-title" className="flex flex-col gap-3">
          <h2 id="compare-title" className="text-lg font-semibold">
            Compare two revisions
          </h2>
          <form method="get" className="flex flex-wrap items-end gap-3">
            {sp.view ? <input type="hidden" name="view" value={sp.view} /> : null}
            <RevisionSelect label="From revision" name="a" value={a?.number} revisions={revisions} />
            <RevisionSelect label="To revision" name="b" value={b?.number} revisions={revisions} />
            <button type="submit" className="rounded-md border border-line bg-panel px-3 py-1.5 text-sm font-medium hover:bg-bg">
              Compare
            </button>
          </form>
          {a && b ? (
            changes.length ? (
              <table className="w-full max-w-3xl text-sm tabular-nums">
                <caption className="mb-1 text-left text-sm text-muted">
                  What changed from revision {a.number} to revision {b.number}
                </caption>
                <thead className="border-b border-line text-left text-muted">
                  <tr>
                    <th scope="col" className="py-1.5 pr-4 font-medium">Field</th>
                    <th scope="col" className="py-1.5 pr-4 font-medium">Revision {a.number}</th>
                    <th scope="col" className="py-1.5 font-medium">Revision {b.number}</th>
                  </tr>
                </thead>
                <tbody>
                  {changes.map((c) => (
                    <tr key={c.path} className="border-b border-line">
                      <th scope="row" className="py-1.5 pr-4 text-left font-normal">{c.label}</th>
                      <td className="py-1.5 pr-4 text-muted">{c.before}</td>
                      <td className="py-1.5">
                        <span aria-hidden="true">→ </span>
                        {c.after}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            ) : (
              <p className="text-sm">Revisions {a.number} and {b.number} hold the same spec.</p>
            )
          ) : null}
        </section>
      ) : null}
    </div>
  );
}

function RevisionSelect({ label, name, value, revisions }: { label: string; name: string; value?: number; revisions: { number: number; note: string | null }[] }) {
  return (
    <label className="flex flex-col gap-1 text-sm font-medium">
      {label}
      <select name={name} defaultValue={value} className="rounded-md border border-line bg-panel px-2 py-1.5 text-sm font-normal">
        {revisions.map((r) => (
          <option key={r.number} value={r.number}>
            {r.number}
            {r.note ? ` · ${r.note.slice(0, 40)}` : ""}
          </option>
        ))}
      </select>
    </label>
  );
}
