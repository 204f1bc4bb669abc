// @ts-nocheck
"use client";
// Step 4 of the log upload: what will be stored, and every line that cannot be read.
import type { UnitSystem } from "@/calc";
import { DataTable } from "@/components/ui/data-table";
import { Notice } from "@/components/ui/notice";
import { fig, rpmText } from "@/lib/datalogs/format";
import type { parseLog } from "@/lib/datalogs/parse";

type LogPreviewProps = {
  parsed: { result: ReturnType<typeof parseLog> | null; mappingError: string | null };
  /** "Skip unreadable lines": keep every readable row and leave the listed lines out. */
  skip: { value: boolean; set: (v: boolean) => void };
  ambientPa: number;
  unitSystem: UnitSystem;
  pressureUnit: string;
  temperatureUnit: string;
};

export function LogPreview({ parsed, skip, ambientPa, unitSystem, pressureUnit, temperatureUnit }: LogPreviewProps) {
  const r = parsed.result;
  return (
    <section aria-labelledby="step-4" className="flex flex-col gap-3">
      <h2 id="step-4" className="text-lg font-semibold">
        4. Preview
      </h2>
      {parsed.mappingError ? <Notice tone="danger">{parsed.mappingError}</Notice> : null}
      {r?.fatal ? <Notice tone="danger">{r.fatal}</Notice> : null}
      {r && !r.fatal ? (
        <p className="text-sm" role="status">
          {r.dataLines.toLocaleString("en-US")} data rows; {r.points.length.toLocaleString("en-US")} read; {r.errors.length + r.moreErrors} with errors.
        </p>
      ) : null}
      {r && r.errors.length ? (
        <Notice
          tone={skip.value ? "warning" : "danger"}
          title={skip.value ? `These ${r.skipped.length} lines will be left out; every other row is kept:` : "These lines cannot be read; nothing is stored until they are fixed (or the mapping is), or you skip them:"}
        >
          <label className="my-2 flex items-center gap-2 font-medium">
            <input type="checkbox" checked={skip.value} onChange={(e) => skip.set(e.target.checked)} /> Skip unreadable lines
          </label>
          <ul className="list-disc pl-5" aria-label="Line errors">
            {r.errors.map((e) => (
              <li key={e.line}>{e.message}</li>
            ))}
          </ul>
          {r.moreErrors ? <p>…and {r.moreErrors} more lines.</p> : null}
        </Notice>
      ) : null}
      {r && r.points.length ? (
        <DataTable
          density="figures"
          caption="First rows as they will be stored"
          rows={r.points.slice(0, 8)}
          rowKey={(p) => String(p.line)}
          empty="No rows."
          columns={[
            { label: "Line", cell: (p) => p.line },
            { label: "Engine speed (rpm)", cell: (p) => rpmText(p.rpm) },
            { label: `Boost (${pressureUnit})`, cell: (p) => fig("pressure", p.manifoldPressure - ambientPa, unitSystem) },
            { label: `Manifold absolute (${pressureUnit})`, cell: (p) => fig("pressure", p.manifoldPressure, unitSystem) },
            { label: `Intake air (${temperatureUnit})`, cell: (p) => fig("temperature", p.intakeTemperature, unitSystem) },
            { label: "Throttle (%)", cell: (p) => p.throttle ?? "—" },
            { label: "Time (s)", cell: (p) => p.time ?? "—" },
          ]}
        />
      ) : null}
    </section>
  );
}
