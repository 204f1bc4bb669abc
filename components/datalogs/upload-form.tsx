"use client";
// Upload a log: pick the combination, read the file (progress), map its columns, preview what
// will be stored and every bad line, then send it (upload progress). The server parses it again.
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import {
  DATALOG_LIMITS,
  decodeLogBytes,
  delimiterNames,
  DELIMITERS,
  guessLayout,
  guessMapping,
  logLines,
  parseLog,
  splitLine,
  type DatalogMappingInput,
  type Delimiter,
} from "@/lib/datalogs/parse";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { fig, rpmText, withUnit } from "@/lib/datalogs/format";

export type UploadCombination = { id: string; name: string; revision: number; ambient: { pressure: number; temperature: number } };
export type UploadFormProps = { combinations: UploadCombination[]; initialCombinationId: string | null; unitSystem: UnitSystem };

type Progress = { label: string; fraction: number } | null;

const selectClass = "rounded-md border border-line bg-panel px-2.5 py-1.5 text-sm";

function ProgressBar({ progress }: { progress: Progress }) {
  if (!progress) return null;
  const pct = Math.round(progress.fraction * 100);
  return (
    <div className="flex flex-col gap-1">
      <span className="text-sm" id="upload-progress-label">
        {progress.label} {pct} %
      </span>
      <progress aria-labelledby="upload-progress-label" className="h-2 w-full" max={100} value={pct} />
    </div>
  );
}

function ColumnSelect({ id, label, value, columns, optional, onChange }: { id: string; label: string; value: number | null; columns: string[]; optional?: boolean; onChange: (v: number | null) => void }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} className={selectClass} value={value === null ? "" : String(value)} onChange={(e) => onChange(e.target.value === "" ? null : Number(e.target.value))}>
        {optional ? <option value="">(none)</option> : null}
        {columns.map((c, i) => (
          <option key={i} value={i}>
            {i + 1}: {c}
          </option>
        ))}
      </select>
    </div>
  );
}

export function UploadForm({ combinations, initialCombinationId, unitSystem }: UploadFormProps) {
  const router = useRouter();
  const [comboId, setComboId] = useState(initialCombinationId ?? combinations[0]?.id ?? "");
  const combo = combinations.find((c) => c.id === comboId);
  const [name, setName] = useState("");
  const [baro, setBaro] = useState(() => (combo ? fromSI("pressure", combo.ambient.pressure, unitSystem).toFixed(unitSystem === "imperial" ? 2 : 1) : ""));
  const [airT, setAirT] = useState(() => (combo ? fromSI("temperature", combo.ambient.temperature, unitSystem).toFixed(0) : ""));
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [mapping, setMapping] = useState<DatalogMappingInput | null>(null);
  const [progress, setProgress] = useState<Progress>(null);
  const [serverError, setServerError] = useState<{ message: string; lines: string[] } | null>(null);
  const [busy, setBusy] = useState(false);

  const pressureUnit = unitLabel("pressure", unitSystem);
  const temperatureUnit = unitLabel("temperature", unitSystem);

  function pickCombination(id: string) {
    setComboId(id);
    const c = combinations.find((x) => x.id === id);
    if (c) {
      setBaro(fromSI("pressure", c.ambient.pressure, unitSystem).toFixed(unitSystem === "imperial" ? 2 : 1));
      setAirT(fromSI("temperature", c.ambient.temperature, unitSystem).toFixed(0));
    }
  }

  const ambientPa = toSI("pressure", Number(baro), unitSystem);
  const ambientK = toSI("temperature", Number(airT), unitSystem);
  const ambientErrors = {
    baro: baro.trim() === "" || !(ambientPa >= 30_000 && ambientPa <= 110_000) ? `Barometer must be between ${withUnit("pressure", 30_000, unitSystem, 1)} and ${withUnit("pressure", 110_000, unitSystem, 1)}` : null,
    airT: airT.trim() === "" || !(ambientK >= 220 && ambientK <= 330) ? `Air temperature must be between ${withUnit("temperature", 220, unitSystem)} and ${withUnit("temperature", 330, unitSystem)}` : null,
  };

  // A file picked before the page finished loading raised its change event before React was
  // listening: read it once the form is live.
  const fileInput = useRef<HTMLInputElement>(null);
  useEffect(() => {
    const early = fileInput.current?.files?.[0];
    if (early) queueMicrotask(() => readFile(early));
  }, []);

  function readFile(f: File) {
    setFile(null);
    setMapping(null);
    setFileError(null);
    setServerError(null);
    if (f.size > DATALOG_LIMITS.maxBytes) {
      setFileError(`The file is ${(f.size / 1024 / 1024).toFixed(1)} MB; the limit is ${DATALOG_LIMITS.maxBytes / 1024 / 1024} MB. Trim the log to the pulls you want to compare.`);
      return;
    }
    const reader = new FileReader();
    reader.onprogress = (e) => setProgress({ label: "Reading the file…", fraction: e.lengthComputable ? e.loaded / e.total : 0 });
    reader.onerror = () => {
      setProgress(null);
      setFileError("The file could not be read.");
    };
    reader.onload = () => {
      setProgress(null);
      const decoded = decodeLogBytes(new Uint8Array(reader.result as ArrayBuffer));
      if (!decoded.ok) {
        setFileError(decoded.message);
        return;
      }
      if (!decoded.text.trim()) {
        setFileError("The file is empty.");
        return;
      }
      setFile({ name: f.name, text: decoded.text });
      setMapping(guessMapping(guessLayout(decoded.text)));
      setName((n) => n || f.name.replace(/\.[^.]+$/, ""));
    };
    reader.readAsArrayBuffer(f);
  }

  // Column names under the chosen delimiter and header setting.
  const columns = useMemo(() => {
    if (!file || !mapping) return [];
    const lines = logLines(file.text).slice(0, 2);
    const first = lines[0] ? splitLine(lines[0].text, mapping.delimiter as Delimiter) : [];
    const count = Math.max(first.length, lines[1] ? splitLine(lines[1].text, mapping.delimiter as Delimiter).length : 0);
    return Array.from({ length: count }, (_, i) => (mapping.hasHeader && first[i] ? first[i] : `Column ${i + 1}`));
  }, [file, mapping]);

  const parsed = useMemo(() => {
    if (!file || !mapping || ambientErrors.baro) return null;
    try {
      return { result: parseLog(file.text, mapping, ambientPa), mappingError: null };
    } catch (e) {
      const issues = (e as { issues?: { message: string }[] }).issues;
      return { result: null, mappingError: issues?.map((i) => i.message).join(" ") ?? "Check the column mapping." };
    }
  }, [file, mapping, ambientPa, ambientErrors.baro]);

  const set = (patch: Partial<DatalogMappingInput>) => setMapping((m) => (m ? { ...m, ...patch } : m));
  const ready = !!(combo && file && mapping && parsed?.result && !parsed.result.fatal && parsed.result.errors.length === 0 && parsed.result.points.length > 0 && name.trim() && !ambientErrors.baro && !ambientErrors.airT);

  function upload() {
    if (!ready || !combo || !file || !mapping) return;
    setBusy(true);
    setServerError(null);
    const body = JSON.stringify({ combinationId: combo.id, name: name.trim(), fileName: file.name, text: file.text, mapping, ambient: { pressure: ambientPa, temperature: ambientK } });
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/datalogs");
    xhr.setRequestHeader("content-type", "application/json");
    xhr.upload.onprogress = (e) => setProgress({ label: "Uploading…", fraction: e.lengthComputable ? e.loaded / e.total : 0 });
    xhr.onerror = () => {
      setBusy(false);
      setProgress(null);
      setServerError({ message: "The upload did not reach the server. Check the connection and try again.", lines: [] });
    };
    xhr.onload = () => {
      setProgress(null);
      let data: { id?: string; error?: string; fieldErrors?: Record<string, string[]> } = {};
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        /* not JSON: handled below */
      }
      if (xhr.status === 201 && data.id) {
        router.push(`/datalogs/${data.id}`);
        return;
      }
      setBusy(false);
      const lines = Object.entries(data.fieldErrors ?? {}).flatMap(([k, v]) => (k === "text" ? v : v.map((m) => `${k}: ${m}`)));
      setServerError({ message: data.error ?? `The upload failed (status ${xhr.status}).`, lines });
    };
    xhr.send(body);
  }

  if (combinations.length === 0) {
    return <Notice tone="warning">You have no combination you may upload a log for. Save a combination first.</Notice>;
  }

  const r = parsed?.result;
  return (
    <form
      className="flex flex-col gap-6"
      onSubmit={(e) => {
        e.preventDefault();
        upload();
      }}
    >
      <section aria-labelledby="step-1" className="flex flex-col gap-3">
        <h2 id="step-1" className="text-lg font-semibold">
          1. Combination and conditions
        </h2>
        <div className="flex flex-col gap-1">
          <label htmlFor="combination" className="text-sm font-medium">
            Combination
          </label>
          <select id="combination" className={selectClass} value={comboId} onChange={(e) => pickCombination(e.target.value)}>
            {combinations.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name} (revision {c.revision})
              </option>
            ))}
          </select>
          <p className="text-xs text-muted">The log is tied to the combination&rsquo;s current revision: its pulley and engine as logged.</p>
        </div>
        <div className="grid gap-3 sm:grid-cols-2">
          <Field label="Barometer at the time of the log" name="barometer" unit={`${pressureUnit} absolute`} inputMode="decimal" value={baro} onChange={(e) => setBaro(e.target.value)} errors={ambientErrors.baro ?? undefined} hint="Defaults to the combination's ambient; gauge readings are turned into absolute with it." />
          <Field label="Air temperature at the time of the log" name="airTemperature" unit={temperatureUnit} inputMode="decimal" value={airT} onChange={(e) => setAirT(e.target.value)} errors={ambientErrors.airT ?? undefined} />
        </div>
      </section>

      <section aria-labelledby="step-2" className="flex flex-col gap-3">
        <h2 id="step-2" className="text-lg font-semibold">
          2. File
        </h2>
        <div className="flex flex-col gap-1">
          <label htmlFor="log-file" className="text-sm font-medium">
            Log file (CSV)
          </label>
          <input
            id="log-file"
            ref={fileInput}
            type="file"
            accept=".csv,.txt,.tsv,.log,text/csv,text/plain"
            aria-describedby="log-file-hint"
            className="text-sm"
            onChange={(e) => {
              const f = e.target.files?.[0];
              if (f) readFile(f);
            }}
          />
          <p id="log-file-hint" className="text-xs text-muted">
            UTF-8 text with comma, semicolon, tab or pipe between fields; up to {DATALOG_LIMITS.maxBytes / 1024 / 1024} MB and {DATALOG_LIMITS.maxRows.toLocaleString("en-US")} rows. Try{" "}
            <a className="underline" href="/samples/demo-datalog.csv" download>
              the demo log
            </a>
            .
          </p>
        </div>
        <ProgressBar progress={progress} />
        {fileError ? <Notice tone="danger">{fileError}</Notice> : null}
        {file ? <Field label="Log name" name="name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} errors={name.trim() ? undefined : "Give the log a name."} /> : null}
      </section>

      {file && mapping ? (
        <section aria-labelledby="step-3" className="flex flex-col gap-3">
          <h2 id="step-3" className="text-lg font-semibold">
            3. Columns
          </h2>
          <div className="grid gap-3 sm:grid-cols-3">
            <div className="flex flex-col gap-1">
              <label htmlFor="delimiter" className="text-sm font-medium">
                Delimiter
              </label>
              <select id="delimiter" className={selectClass} value={mapping.delimiter} onChange={(e) => set({ delimiter: e.target.value as Delimiter, decimalComma: e.target.value === "," ? false : mapping.decimalComma })}>
                {DELIMITERS.map((d) => (
                  <option key={d} value={d}>
                    {delimiterNames[d]}
                  </option>
                ))}
              </select>
            </div>
            <label className="flex items-center gap-2 self-end text-sm">
              <input type="checkbox" checked={!!mapping.decimalComma} disabled={mapping.delimiter === ","} onChange={(e) => set({ decimalComma: e.target.checked })} /> Decimal commas (5,25)
            </label>
            <label className="flex items-center gap-2 self-end text-sm">
              <input type="checkbox" checked={mapping.hasHeader !== false} onChange={(e) => set({ hasHeader: e.target.checked })} /> First line is a header
            </label>
            <ColumnSelect id="col-rpm" label="Engine speed (rpm)" value={mapping.rpm} columns={columns} onChange={(v) => set({ rpm: v ?? 0 })} />
            <ColumnSelect id="col-pressure" label="Manifold pressure" value={mapping.pressure} columns={columns} onChange={(v) => set({ pressure: v ?? 0 })} />
            <div className="grid grid-cols-2 gap-2">
              <div className="flex flex-col gap-1">
                <label htmlFor="pressure-kind" className="text-sm font-medium">
                  Pressure is
                </label>
                <select id="pressure-kind" className={selectClass} value={mapping.pressureKind} onChange={(e) => set({ pressureKind: e.target.value as "gauge" | "absolute" })}>
                  <option value="gauge">boost (gauge)</option>
                  <option value="absolute">absolute</option>
                </select>
              </div>
              <div className="flex flex-col gap-1">
                <label htmlFor="pressure-unit" className="text-sm font-medium">
                  Pressure unit
                </label>
                <select id="pressure-unit" className={selectClass} value={mapping.pressureUnit} onChange={(e) => set({ pressureUnit: e.target.value as "psi" | "kPa" | "bar" })}>
                  <option value="psi">psi</option>
                  <option value="kPa">kPa</option>
                  <option value="bar">bar</option>
                </select>
              </div>
            </div>
            <ColumnSelect id="col-iat" label="Intake air temperature (optional)" value={mapping.intakeTemperature ?? null} columns={columns} optional onChange={(v) => set({ intakeTemperature: v })} />
            <div className="flex flex-col gap-1">
              <label htmlFor="temperature-unit" className="text-sm font-medium">
                Temperature unit
              </label>
              <select id="temperature-unit" className={selectClass} value={mapping.temperatureUnit ?? "F"} onChange={(e) => set({ temperatureUnit: e.target.value as "F" | "C" })}>
                <option value="F">°F</option>
                <option value="C">°C</option>
              </select>
            </div>
            <ColumnSelect id="col-throttle" label="Throttle % (optional)" value={mapping.throttle ?? null} columns={columns} optional onChange={(v) => set({ throttle: v })} />
            <ColumnSelect id="col-time" label="Time, s (optional)" value={mapping.time ?? null} columns={columns} optional onChange={(v) => set({ time: v })} />
          </div>
        </section>
      ) : null}

      {file && mapping && parsed ? (
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
            <Notice tone="danger" title="These lines cannot be read; nothing is stored until they are fixed (or the mapping is):">
              <ul className="list-disc pl-5" aria-label="Line errors">
                {r.errors.map((e) => (
                  <li key={e.line}>{e.message}</li>
                ))}
              </ul>
              {r.moreErrors ? <p>…and {r.moreErrors} more lines.</p> : null}
            </Notice>
          ) : null}
          {r && r.points.length ? (
            <div className="overflow-x-auto">
              <table className="text-sm" aria-label="First rows as they will be stored">
                <thead>
                  <tr className="text-left text-muted">
                    <th className="pr-4 font-medium">Line</th>
                    <th className="pr-4 font-medium">Engine speed (rpm)</th>
                    <th className="pr-4 font-medium">Boost ({pressureUnit})</th>
                    <th className="pr-4 font-medium">Manifold absolute ({pressureUnit})</th>
                    <th className="pr-4 font-medium">Intake air ({temperatureUnit})</th>
                    <th className="pr-4 font-medium">Throttle (%)</th>
                    <th className="pr-4 font-medium">Time (s)</th>
                  </tr>
                </thead>
                <tbody>
                  {r.points.slice(0, 8).map((p) => (
                    <tr key={p.line}>
                      <td className="pr-4">{p.line}</td>
                      <td className="pr-4">{rpmText(p.rpm)}</td>
                      <td className="pr-4">{fig("pressure", p.manifoldPressure - ambientPa, unitSystem)}</td>
                      <td className="pr-4">{fig("pressure", p.manifoldPressure, unitSystem)}</td>
                      <td className="pr-4">{fig("temperature", p.intakeTemperature, unitSystem)}</td>
                      <td className="pr-4">{p.throttle ?? "—"}</td>
                      <td className="pr-4">{p.time ?? "—"}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
        </section>
      ) : null}

      {serverError ? (
        <Notice tone="danger" title={serverError.message}>
          {serverError.lines.length ? (
            <ul className="list-disc pl-5">
              {serverError.lines.map((l) => (
                <li key={l}>{l}</li>
              ))}
            </ul>
          ) : null}
        </Notice>
      ) : null}
      <div>
        <Button type="submit" disabled={!ready || busy}>
          {busy ? "Uploading…" : "Upload log"}
        </Button>
      </div>
    </form>
  );
}
