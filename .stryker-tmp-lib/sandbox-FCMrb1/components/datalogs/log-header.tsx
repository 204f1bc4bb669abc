// @ts-nocheck
import Link from "next/link";
import type { UnitSystem } from "@/calc";
import type { LogAmbient } from "@/lib/datalogs/parse";
import { withUnit } from "@/lib/datalogs/format";
import { BackLink } from "@/components/ui/back-link";
import { countText, dateText } from "@/lib/format/dates";

export type LogHeaderProps = {
  title: string;
  /** Locale of the dates shown (lib/format/dates). */
  locale?: string;
  log: { id: string; name: string; fileName: string; revision: number; pointCount: number; createdAt: Date };
  combination: { id: string; name: string; revision: number };
  ambient: LogAmbient;
  unitSystem: UnitSystem;
};

/** What the log is: its file, the combination and revision it was logged with, and the conditions. */
export function LogHeader({ title, log, combination, ambient, unitSystem, locale }: LogHeaderProps) {
  return (
    <header className="flex flex-col gap-2">
      <BackLink href="/datalogs" label="Datalogs" />
      <h1 className="text-2xl font-semibold">{title}</h1>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">File</dt>
        <dd>
          {log.fileName} · {countText(log.pointCount, locale)} samples · uploaded {dateText(log.createdAt, locale)}
        </dd>
        <dt className="text-muted">Combination</dt>
        <dd>
          <Link href={`/combinations/${combination.id}`} className="underline-offset-2 hover:underline">
            {combination.name}
          </Link>
          , logged with revision {log.revision}
          {combination.revision !== log.revision ? <span className="text-muted"> (now at revision {combination.revision})</span> : null}
        </dd>
        <dt className="text-muted">Conditions</dt>
        <dd>
          barometer {withUnit("pressure", ambient.pressure, unitSystem)} absolute, air {withUnit("temperature", ambient.temperature, unitSystem)}
        </dd>
      </dl>
    </header>
  );
}
