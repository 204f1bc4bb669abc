// @ts-nocheck
import type { Metadata } from "next";
import { cleaningFromQuery, type CleaningQuery } from "@/lib/datalogs/cleaning-query";
import { DeleteLogButton } from "@/components/datalogs/delete-log-button";
import { LogAnalysis } from "@/components/datalogs/log-analysis";
import { LogHeader } from "@/components/datalogs/log-header";
import { SafetyNotes } from "@/components/datalogs/safety";
import { canWriteOwned } from "@/db/policy";
import { Notice } from "@/components/ui/notice";
import { datalogMappingSchema, parseLog } from "@/lib/datalogs/parse";
import { loadAnalysis } from "./load";
import { personUnits } from "@/lib/units/person";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Datalog" };

export default async function DatalogPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<CleaningQuery> }) {
  const [{ id }, query] = await Promise.all([params, searchParams]);
  const { user, actor, log, points, ambient, combination, loggedSpec } = await loadAnalysis(id);
  // Lines left out at upload ("skip unreadable lines"): read again from the stored file, so the list never drifts from it.
  const mapping = datalogMappingSchema.safeParse(log.mapping);
  const skipped = mapping.success ? parseLog(log.rawText, mapping.data, ambient.pressure).skipped : [];
  return (
    <div className="flex flex-col gap-5">
      <LogHeader title={log.name} log={log} combination={combination} ambient={ambient} unitSystem={personUnits(user)} locale={await requestLocale()} />
      {skipped.length ? (
        <Notice tone="warning" title={`${skipped.length} unreadable ${skipped.length === 1 ? "line was" : "lines were"} left out at upload; ${log.pointCount} rows kept.`}>
          <ul className="list-disc pl-5" aria-label="Skipped lines">
            {skipped.slice(0, 50).map((l) => (
              <li key={l.line}>
                line {l.line}: {l.reason}
              </li>
            ))}
          </ul>
          {skipped.length > 50 ? <p>…and {skipped.length - 50} more.</p> : null}
        </Notice>
      ) : null}
      <LogAnalysis logId={log.id} points={points} ambient={ambient} loggedSpec={loggedSpec} unitSystem={personUnits(user)} initial={cleaningFromQuery(query)} />
      <SafetyNotes />
      {canWriteOwned(actor, log.ownerId) ? (
        <div>
          <DeleteLogButton id={log.id} name={log.name} />
        </div>
      ) : null}
    </div>
  );
}
