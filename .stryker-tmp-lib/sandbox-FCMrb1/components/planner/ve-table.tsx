// @ts-nocheck
"use client";
// The engine's VE table: rows of speed and VE, shapes to start from, and a small preview.
import { useState } from "react";
import { useFieldArray } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { applyShape, scaleVe, VE_SHAPES } from "@/lib/planner/ve-shapes";
import type { EditorProps } from "./editor";

export function VeTable({ form, system, errors, values }: Omit<EditorProps, "blowers">) {
  const { fields, append, remove, replace } = useFieldArray({ control: form.control, name: "engine.veCurve" });
  const [shapeId, setShapeId] = useState(VE_SHAPES[0].id);
  const [scaleText, setScaleText] = useState("");
  const scale = Number(scaleText);
  // A whole-curve change such as "+8 % with the new heads"; ±50 % keeps a slip of the finger from emptying the curve.
  const scaleOk = scaleText.trim() !== "" && Number.isFinite(scale) && scale !== 0 && Math.abs(scale) <= 50;
  const rows = values.engine.veCurve;
  const lastRpm = rows.reduce((m, r) => (Number.isFinite(r.rpm) ? Math.max(m, r.rpm) : m), 0);
  const tableError = errors["engine.veCurve"];
  return (
    <div className="flex flex-col gap-2">
      <p id="ve-help" className="text-sm font-medium">
        Volumetric efficiency at wide-open throttle <span className="font-normal text-muted">(referenced to the manifold, after any intercooler)</span>
      </p>
      <div className="flex flex-wrap gap-3">
        <table className="text-sm" aria-describedby="ve-help">
          <caption className="sr-only">VE table</caption>
          <thead>
            <tr className="text-left text-muted">
              <th scope="col" className="pr-2 font-normal">Engine speed (rpm)</th>
              <th scope="col" className="pr-2 font-normal">VE (%)</th>
              <th scope="col" className="sr-only">Remove</th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => {
              const rpmErr = errors[`engine.veCurve.${i}.rpm`];
              const veErr = errors[`engine.veCurve.${i}.ve`];
              return (
                <tr key={f.id} className="align-top">
                  <td className="pr-2 pb-1">
                    <input
                      type="number"
                      step="any"
                      aria-label={`Engine speed, VE row ${i + 1} (rpm)`}
                      aria-invalid={rpmErr ? true : undefined}
                      aria-describedby={rpmErr ? `ve-${i}-rpm-error` : undefined}
                      className="w-24 rounded-md border border-line bg-panel px-2 py-1 aria-[invalid=true]:border-danger"
                      defaultValue={values.engine.veCurve[i]?.rpm}
                      {...form.register(`engine.veCurve.${i}.rpm`, { valueAsNumber: true })}
                    />
                    {rpmErr ? (
                      <p id={`ve-${i}-rpm-error`} className="max-w-40 text-xs text-danger">
                        {rpmErr}
                      </p>
                    ) : null}
                  </td>
                  <td className="pr-2 pb-1">
                    <input
                      type="number"
                      step="any"
                      aria-label={`VE, row ${i + 1} (%)`}
                      aria-invalid={veErr ? true : undefined}
                      aria-describedby={veErr ? `ve-${i}-ve-error` : undefined}
                      className="w-20 rounded-md border border-line bg-panel px-2 py-1 aria-[invalid=true]:border-danger"
                      defaultValue={values.engine.veCurve[i]?.ve}
                      {...form.register(`engine.veCurve.${i}.ve`, { valueAsNumber: true })}
                    />
                    {veErr ? (
                      <p id={`ve-${i}-ve-error`} className="max-w-40 text-xs text-danger">
                        {veErr}
                      </p>
                    ) : null}
                  </td>
                  <td className="pb-1">
                    <Button type="button" variant="ghost" onClick={() => remove(i)} disabled={fields.length <= 1} aria-label={`Remove VE row ${i + 1}`}>
                      ✕
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <VePreview rows={rows} />
      </div>
      {tableError ? (
        <p className="text-xs text-danger" role="alert">
          {tableError}
        </p>
      ) : null}
      <div className="flex flex-wrap items-end gap-2">
        <Button type="button" variant="secondary" onClick={() => append({ rpm: lastRpm ? lastRpm + 500 : 3000, ve: rows[rows.length - 1]?.ve ?? 85 })} disabled={fields.length >= 64}>
          Add VE row
        </Button>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Starting shape</span>
          <select value={shapeId} onChange={(e) => setShapeId(e.target.value)} className="rounded-md border border-line bg-panel px-2 py-1.5">
            {VE_SHAPES.map((s) => (
              <option key={s.id} value={s.id}>
                {s.label}
              </option>
            ))}
          </select>
        </label>
        <Button
          type="button"
          variant="secondary"
          onClick={() => {
            const shape = VE_SHAPES.find((s) => s.id === shapeId) ?? VE_SHAPES[0];
            const redline = Number.isFinite(values.engine.redlineRpm) ? values.engine.redlineRpm : 6000;
            replace(applyShape(shape, redline, rows));
          }}
        >
          Fill VE from shape
        </Button>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Scale all VE by (%)</span>
          <input type="number" step="any" inputMode="decimal" value={scaleText} onChange={(e) => setScaleText(e.target.value)} placeholder="e.g. 8 or -5" className="w-28 rounded-md border border-line bg-panel px-2 py-1.5" />
        </label>
        <Button
          type="button"
          variant="secondary"
          disabled={!scaleOk}
          onClick={() => {
            replace(scaleVe(rows, scale));
            setScaleText("");
          }}
        >
          Scale VE
        </Button>
      </div>
      <p className="text-xs text-muted">The starting shapes are invented, generic guesses: replace them with your engine&apos;s figures.</p>
    </div>
  );
}

/** A small picture of the VE curve; the numbers are in the table beside it. */
function VePreview({ rows }: { rows: { rpm: number; ve: number }[] }) {
  const pts = rows.filter((r) => Number.isFinite(r.rpm) && Number.isFinite(r.ve)).sort((a, b) => a.rpm - b.rpm);
  if (pts.length < 2) return null;
  const w = 200;
  const h = 90;
  const x0 = pts[0].rpm;
  const x1 = pts[pts.length - 1].rpm;
  const lo = Math.min(60, ...pts.map((p) => p.ve));
  const hi = Math.max(110, ...pts.map((p) => p.ve));
  const x = (r: number) => 6 + ((r - x0) / Math.max(1, x1 - x0)) * (w - 12);
  const y = (v: number) => h - 6 - ((v - lo) / (hi - lo)) * (h - 12);
  return (
    <svg width={w} height={h} aria-hidden="true" className="self-start rounded-md border border-line">
      <line x1={6} x2={w - 6} y1={y(100)} y2={y(100)} stroke="currentColor" strokeOpacity={0.25} strokeDasharray="3 3" />
      <polyline fill="none" stroke="#0072B2" strokeWidth={2} points={pts.map((p) => `${x(p.rpm)},${y(p.ve)}`).join(" ")} />
      {pts.map((p) => (
        <circle key={p.rpm} cx={x(p.rpm)} cy={y(p.ve)} r={2.5} fill="#0072B2" />
      ))}
    </svg>
  );
}
