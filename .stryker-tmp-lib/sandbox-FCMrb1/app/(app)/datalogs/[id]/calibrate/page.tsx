// @ts-nocheck
import type { Metadata } from "next";
import { CalibrateView } from "@/components/datalogs/calibrate-view";
import { cleaningFromQuery, type CleaningQuery } from "@/lib/datalogs/cleaning-query";
import { LogHeader } from "@/components/datalogs/log-header";
import { SafetyNotes } from "@/components/datalogs/safety";
import { combinationSchema } from "@/calc";
import { canWriteOwned } from "@/db/policy";
import { loadAnalysis, loadCombinationLogs } from "../load";
import { personUnits } from "@/lib/units/person";
import { requestLocale } from "@/app/_lib/locale";

export const metadata: Metadata = { title: "Calibrate from a log" };

export default async function CalibratePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<CleaningQuery> }) {
  const [{ id }, query] = await Promise.all([params, searchParams]);
  const { user, actor, log, points, ambient, combination, loggedSpec } = await loadAnalysis(id);
  const logs = await loadCombinationLogs(actor, combination.id);
  return (
    <div className="flex flex-col gap-5">
      <LogHeader title={`Calibrate from “${log.name}”`} log={log} combination={combination} ambient={ambient} unitSystem={personUnits(user)} locale={await requestLocale()} />
      <CalibrateView
        logId={log.id}
        logName={log.name}
        points={points}
        ambient={ambient}
        loggedSpec={loggedSpec}
        current={{ id: combination.id, name: combination.name, revision: combination.revision, spec: combinationSchema.parse(combination.spec) }}
        loggedRevision={log.revision}
        canSave={canWriteOwned(actor, combination.ownerId)}
        unitSystem={personUnits(user)}
        initial={cleaningFromQuery(query)}
        logs={logs}
      />
      <SafetyNotes />
    </div>
  );
}
