"use client";
// Step 3 of the log upload: the delimiter, the header, and which column holds what.
import { delimiterNames, DELIMITERS, type DatalogMappingInput, type Delimiter } from "@/lib/datalogs/parse";
import { ColumnSelect, selectClass } from "./upload-parts";

type ColumnMappingProps = { mapping: DatalogMappingInput; columns: string[]; set: (patch: Partial<DatalogMappingInput>) => void };

export function ColumnMapping({ mapping, columns, set }: ColumnMappingProps) {
  return (
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
  );
}
