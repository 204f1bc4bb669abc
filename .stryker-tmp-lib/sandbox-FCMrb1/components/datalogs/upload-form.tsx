// @ts-nocheck
"use client";
// Upload a log: pick the combination, read the file (progress), map its columns, preview what
// will be stored and every bad line, then send it (upload progress). The server parses it again.
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { fromSI, toSI, unitLabel, type UnitSystem } from "@/calc";
import {
  DATALOG_LIMITS,
  decodeLogBytes,
  guessLayout,
  logLines,
  parseLog,
  splitLine,
  type DatalogMappingInput,
  type Delimiter,
} from "@/lib/datalogs/parse";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { withUnit, logDigits } from "@/lib/datalogs/format";
import { guessMapping, type GuessNotes } from "@/lib/datalogs/guess-mapping";
import { mappingFieldErrors } from "@/lib/datalogs/mapping-errors";
import { ColumnMapping } from "./column-mapping";
import { LogPreview } from "./log-preview";
import { FileDrop } from "./file-drop";
import { postLog } from "./post-log";
import { ProgressBar, selectClass, type Progress } from "./upload-parts";

export type UploadCombination = { id: string; name: string; revision: number; ambient: { pressure: number; temperature: number } };
export type UploadFormProps = { combinations: UploadCombination[]; initialCombinationId: string | null; unitSystem: UnitSystem };

export function UploadForm({ combinations, initialCombinationId, unitSystem }: UploadFormProps) {
  const router = useRouter();
  const [comboId, setComboId] = useState(initialCombinationId ?? combinations[0]?.id ?? "");
  const combo = combinations.find((c) => c.id === comboId);
  const [name, setName] = useState("");
  const [baro, setBaro] = useState(() => (combo ? fromSI("pressure", combo.ambient.pressure, unitSystem).toFixed(logDigits("pressure", unitSystem)) : ""));
  const [airT, setAirT] = useState(() => (combo ? fromSI("temperature", combo.ambient.temperature, unitSystem).toFixed(0) : ""));
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [mapping, setMapping] = useState<DatalogMappingInput | null>(null);
  const [notes, setNotes] = useState<GuessNotes>({});
  const [progress, setProgress] = useState<Progress>(null);
  const [serverError, setServerError] = useState<{ message: string; lines: string[] } | null>(null);
  const [busy, setBusy] = useState(false);
  const [skipUnreadable, setSkipUnreadable] = useState(false);

  const pressureUnit = unitLabel("pressure", unitSystem);
  const temperatureUnit = unitLabel("temperature", unitSystem);

  function pickCombination(id: string) {
    setComboId(id);
    const c = combinations.find((x) => x.id === id);
    if (c) {
      setBaro(fromSI("pressure", c.ambient.pressure, unitSystem).toFixed(logDigits("pressure", unitSystem)));
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
      const { notes: why, ...guessed } = guessMapping(guessLayout(decoded.text), decoded.text);
      setMapping(guessed);
      setNotes(why);
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

  // Mapping errors stand beside their fields; the preview waits until there are none.
  const mappingErrors = useMemo(() => (mapping ? mappingFieldErrors(mapping) : {}), [mapping]);
  const mappingProblem = Object.keys(mappingErrors).length > 0;
  const parsed = useMemo(() => {
    if (!file || !mapping || ambientErrors.baro) return null;
    if (mappingProblem) return { result: null, mappingError: "Fix the column choices marked above; the preview follows." };
    return { result: parseLog(file.text, mapping, ambientPa), mappingError: null };
  }, [file, mapping, ambientPa, ambientErrors.baro, mappingProblem]);

  // A field the person changes is theirs: its "guessed from the values" note goes.
  const set = (patch: Partial<DatalogMappingInput>) => {
    setMapping((m) => (m ? { ...m, ...patch } : m));
    setNotes((n) => Object.fromEntries(Object.entries(n).filter(([k]) => !(k in patch))));
  };
  const ready = !!(combo && file && mapping && parsed?.result && !parsed.result.fatal && (parsed.result.errors.length === 0 || skipUnreadable) && parsed.result.points.length > 0 && name.trim() && !ambientErrors.baro && !ambientErrors.airT);

  function upload() {
    if (!ready || !combo || !file || !mapping) return;
    setBusy(true);
    setServerError(null);
    const body = JSON.stringify({ combinationId: combo.id, name: name.trim(), fileName: file.name, text: file.text, mapping, ambient: { pressure: ambientPa, temperature: ambientK }, skipUnreadable });
    void postLog(body, (fraction) => setProgress({ label: "Uploading…", fraction })).then((outcome) => {
      setProgress(null);
      if (outcome.ok) {
        router.push(`/datalogs/${outcome.id}`);
        return;
      }
      setBusy(false);
      setServerError({ message: outcome.message, lines: outcome.lines });
    });
  }

  if (combinations.length === 0) {
    return <Notice tone="warning">You have no combination you may upload a log for. Save a combination first.</Notice>;
  }

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
        <FileDrop
          ref={fileInput}
          fileName={file?.name ?? null}
          onFile={readFile}
          hint={
            <>
              UTF-8 text with comma, semicolon, tab or pipe between fields; up to {DATALOG_LIMITS.maxBytes / 1024 / 1024} MB and {DATALOG_LIMITS.maxRows.toLocaleString("en-US")} rows. Try{" "}
              <a className="underline" href="/samples/demo-datalog.csv" download>
                the demo log
              </a>
              .
            </>
          }
        />
        <ProgressBar progress={progress} />
        {fileError ? <Notice tone="danger">{fileError}</Notice> : null}
        {file ? <Field label="Log name" name="name" value={name} onChange={(e) => setName(e.target.value)} maxLength={120} errors={name.trim() ? undefined : "Give the log a name."} /> : null}
      </section>

      {file && mapping ? (
        <ColumnMapping mapping={mapping} columns={columns} set={set} errors={mappingErrors} notes={notes} />
      ) : null}

      {file && mapping && parsed ? (
        <LogPreview parsed={parsed} skip={{ value: skipUnreadable, set: setSkipUnreadable }} ambientPa={ambientPa} unitSystem={unitSystem} pressureUnit={pressureUnit} temperatureUnit={temperatureUnit} />
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
