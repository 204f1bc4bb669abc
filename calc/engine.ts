// The engine's side: volumetric efficiency against speed and four-stroke airflow
// (Heywood 1988, ch. 2: volume flow = Vd · N/2 per revolution pair · VE).
import { parseOrThrow, positiveSchema, type VePoint } from "./schema";
import { z } from "zod";

/** VE at an engine speed: piecewise-linear between points sorted by rpm, held flat outside (fraction). */
export function veAt(curve: readonly VePoint[], rpm: number): number {
  const n = curve.length;
  if (rpm <= curve[0].rpm) return curve[0].ve;
  if (rpm >= curve[n - 1].rpm) return curve[n - 1].ve;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (curve[mid].rpm <= rpm) lo = mid;
    else hi = mid;
  }
  const a = curve[lo];
  const b = curve[hi];
  return a.ve + ((b.ve - a.ve) * (rpm - a.rpm)) / (b.rpm - a.rpm);
}

/** Four-stroke volume flow Vd·(N/120)·VE (m³, rev/min, fraction → m³/s). */
export function engineAirflowUnchecked(displacement: number, rpm: number, ve: number): number {
  return (displacement * rpm * ve) / 120;
}

const veSchema = z.number({ error: "Volumetric efficiency must be a non-negative number" }).min(0, {
  error: "Volumetric efficiency must be a non-negative number",
});

/** Engine airflow (m³/s) at the density its VE refers to, from displacement (m³), speed (rev/min) and VE (fraction). */
export function engineAirflow(displacement: number, rpm: number, ve: number): number {
  return engineAirflowUnchecked(
    parseOrThrow(positiveSchema("Engine displacement", "m³"), displacement, "displacement"),
    parseOrThrow(positiveSchema("Engine speed", "rpm"), rpm, "rpm"),
    parseOrThrow(veSchema, ve, "ve"),
  );
}
