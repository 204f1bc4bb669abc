// @ts-nocheck
"use client";
// Step 3 of the log upload: the delimiter, the header, and which column holds what. Each field
// shows its own problem ("column 1 is already used for engine speed") and how it was guessed.
import { delimiterNames, DELIMITERS, temperatureUnitText, TEMPERATURE_UNITS, type DatalogMappingInput, type Delimiter, type PressureUnit, type TemperatureUnit } from "@/lib/datalogs/parse";
import type { GuessNotes } from "@/lib/datalogs/guess-mapping";
import type { MappingErrors } from "@/lib/datalogs/mapping-errors";
import { ColumnSelect, Picker } from "./upload-parts";

type ColumnMappingProps = { mapping: DatalogMappingInput; columns: string[]; set: (patch: Partial<DatalogMappingInput>) => void; errors: MappingErrors; notes: GuessNotes };

export function ColumnMapping({ mapping, columns, set, errors, notes }: ColumnMappingProps) {
  const column = (key: "rpm" | "pressure" | "intakeTemperature" | "throttle" | "time", id: string, label: string, optional = false) => (
    <ColumnSelect
      id={id}
      label={label}
      value={mapping[key] ?? null}
      columns={columns}
      optional={optional}
      errors={errors[key]}
      note={notes[key]}
      onChange={(v) => set({ [key]: optional ? v : (v ?? 0) })}
    />
  );
  return (
    <section aria-labelledby="step-3" className="flex flex-col gap-3">
      <h2 id="step-3" className="text-lg font-semibold">
        3. Columns
      </h2>
      <div className="grid gap-3 sm:grid-cols-3">
        <Picker id="delimiter" label="Delimiter" value={mapping.delimiter} errors={errors.delimiter} onChange={(v) => set({ delimiter: v as Delimiter, decimalComma: v === "," ? false : mapping.decimalComma })}>
          {DELIMITERS.map((d) => (
            <option key={d} value={d}>
              {delimiterNames[d]}
            </option>
          ))}
        </Picker>
        <div className="flex flex-col gap-1 self-end">
          <label className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={!!mapping.decimalComma}
              disabled={mapping.delimiter === ","}
              aria-invalid={errors.decimalComma ? true : undefined}
              aria-describedby={errors.decimalComma ? "decimal-comma-error" : undefined}
              onChange={(e) => set({ decimalComma: e.target.checked })}
            />{" "}
            Decimal commas (5,25)
          </label>
          {errors.decimalComma ? (
            <p id="decimal-comma-error" className="text-xs text-danger" role="alert">
              {errors.decimalComma.join(" ")}
            </p>
          ) : null}
        </div>
        <label className="flex items-center gap-2 self-end text-sm">
          <input type="checkbox" checked={mapping.hasHeader !== false} onChange={(e) => set({ hasHeader: e.target.checked })} /> First line is a header
        </label>
        {column("rpm", "col-rpm", "Engine speed (rpm)")}
        {column("pressure", "col-pressure", "Manifold pressure")}
        <div className="grid grid-cols-2 gap-2">
          <Picker id="pressure-kind" label="Pressure is" value={mapping.pressureKind} errors={errors.pressureKind} onChange={(v) => set({ pressureKind: v as "gauge" | "absolute" })}>
            <option value="gauge">boost (gauge)</option>
            <option value="absolute">absolute</option>
          </Picker>
          <Picker id="pressure-unit" label="Pressure unit" value={mapping.pressureUnit} errors={errors.pressureUnit} onChange={(v) => set({ pressureUnit: v as PressureUnit })}>
            <option value="psi">psi</option>
            <option value="kPa">kPa</option>
            <option value="bar">bar</option>
          </Picker>
          {notes.pressureUnit ? <p className="col-span-2 text-xs text-muted" id="pressure-unit-note">{notes.pressureUnit}</p> : null}
        </div>
        {column("intakeTemperature", "col-iat", "Intake air temperature (optional)", true)}
        <Picker id="temperature-unit" label="Temperature unit" value={mapping.temperatureUnit ?? "F"} errors={errors.temperatureUnit} note={notes.temperatureUnit} onChange={(v) => set({ temperatureUnit: v as TemperatureUnit })}>
          {TEMPERATURE_UNITS.map((u) => (
            <option key={u} value={u}>
              {temperatureUnitText(u)}
            </option>
          ))}
        </Picker>
        {column("throttle", "col-throttle", "Throttle % (optional)", true)}
        {column("time", "col-time", "Time, s (optional)", true)}
      </div>
    </section>
  );
}
