import type { Metadata } from "next";
import { cleaningFromQuery, type CleaningQuery } from "@/lib/datalogs/cleaning-query";
import { DeleteLogButton } from "@/components/datalogs/delete-log-button";
import { LogAnalysis } from "@/components/datalogs/log-analysis";
import { LogHeader } from "@/components/datalogs/log-header";
import { SafetyNotes } from "@/components/datalogs/safety";
import { canWriteOwned } from "@/db/policy";
import { loadAnalysis } from "./load";

export const metadata: Metadata = { title: "Datalog" };

export default async function DatalogPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<CleaningQuery> }) {
  const [{ id }, query] = await Promise.all([params, searchParams]);
  const { user, actor, log, points, ambient, combination, loggedSpec } = await loadAnalysis(id);
  return (
    <div className="flex flex-col gap-5">
      <LogHeader title={log.name} log={log} combination={combination} ambient={ambient} unitSystem={user.unitSystem} />
      <LogAnalysis logId={log.id} points={points} ambient={ambient} loggedSpec={loggedSpec} unitSystem={user.unitSystem} initial={cleaningFromQuery(query)} />
      <SafetyNotes />
      {canWriteOwned(actor, log.ownerId) ? (
        <div>
          <DeleteLogButton id={log.id} name={log.name} />
        </div>
      ) : null}
    </div>
  );
}
