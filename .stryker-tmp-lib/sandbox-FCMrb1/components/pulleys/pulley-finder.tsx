// @ts-nocheck
"use client";
// The pulley finder: the exact blower pulley for a target boost at an engine speed, the nearest
// stocked sizes either side, and their predicted curves. Used by the planner and the
// recommendation sheet; inside another form (`nested`) it is a group with a plain button.
import { useMemo, useState, type FormEvent } from "react";
import { toSI, unitLabel, type Combination, type UnitSystem } from "@/calc";
import type { CurveSeries } from "@/components/charts/curve-chart";
import { LazyCurveChart } from "@/components/charts/curve-chart-lazy";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { figure, quantityText } from "@/lib/units/format";
import { findPulley, safeCurve, withPulley } from "@/lib/planner/compute";
import { figureOrRange } from "@/lib/planner/range-words";

export type PulleyFinderProps = {
  spec: Combination;
  system: UnitSystem;
  rpms: number[];
  stock: number[];
  /** The engine speed shown (the ladder's too, when onRpm is given). */
  defaultRpm: number;
  /** A valid speed typed here becomes the ladder's speed as well. */
  onRpm?: (rpm: number) => void;
  onApply?: (diameter: number) => void;
  /** Rendered inside another form: a group instead of a form of its own. */
  nested?: boolean;
};

const validRpm = (n: number) => Number.isFinite(n) && n >= 100 && n <= 20_000;

export function PulleyFinder({ spec, system, rpms, stock, defaultRpm, onRpm, onApply, nested }: PulleyFinderProps) {
  const [target, setTarget] = useState("");
  const [rpm, setRpmText] = useState(String(Math.round(defaultRpm)));
  // Follow the default (peak power speed moves with the spec) unless the field already says it
  // (state adjusted during render, React's pattern for derived state).
  const [seenDefault, setSeenDefault] = useState(defaultRpm);
  if (seenDefault !== defaultRpm) {
    setSeenDefault(defaultRpm);
    if (Number(rpm) !== Math.round(defaultRpm)) setRpmText(String(Math.round(defaultRpm)));
  }
  const setRpm = (text: string) => {
    setRpmText(text);
    const n = Number(text);
    if (onRpm && text.trim() !== "" && validRpm(n)) onRpm(n);
  };
  const [request, setRequest] = useState<{ boost: number; rpm: number } | null>(null);
  const [error, setError] = useState<{ field: "target" | "rpm"; message: string } | null>(null);
  const pressureUnit = unitLabel("pressure", system);

  const outcome = useMemo(() => (request ? findPulley(spec, request.rpm, request.boost, stock, system) : null), [request, spec, stock, system]);
  const series = useMemo((): CurveSeries[] => {
    if (!outcome?.ok) return [];
    const r = outcome.result;
    const out: CurveSeries[] = [{ label: `Exact ${quantityText("length-small", r.diameter, system)}`, points: safeCurve(withPulley(spec, r.diameter), rpms), colorIndex: 0 }];
    if (r.below) out.push({ label: `Stocked ${quantityText("length-small", r.below.diameter, system)} (smaller)`, points: safeCurve(withPulley(spec, r.below.diameter), rpms), colorIndex: 5, dashed: true });
    if (r.above) out.push({ label: `Stocked ${quantityText("length-small", r.above.diameter, system)} (larger)`, points: safeCurve(withPulley(spec, r.above.diameter), rpms), colorIndex: 2, dashed: true });
    return out;
  }, [outcome, spec, rpms, system]);

  const submit = (e?: FormEvent) => {
    e?.preventDefault();
    const t = Number(target);
    const n = Number(rpm);
    if (target.trim() === "" || !Number.isFinite(t)) return setError({ field: "target", message: `Give a target boost in ${pressureUnit}.` });
    if (rpm.trim() === "" || !validRpm(n)) return setError({ field: "rpm", message: "Give an engine speed between 100 and 20,000 rpm." });
    setError(null);
    setRequest({ boost: toSI("pressure", t, system), rpm: n });
  };

  const Wrapper = nested ? "div" : "form";
  const wrapperProps = nested
    ? { role: "group", "aria-labelledby": "finder-heading", className: "flex flex-wrap items-end gap-3" }
    : { onSubmit: submit, noValidate: true, className: "flex flex-wrap items-end gap-3" };

  return (
    <section aria-labelledby="finder-heading" className="flex flex-col gap-3">
      <h2 id="finder-heading" className="text-base font-semibold">
        Pulley finder
      </h2>
      <Wrapper {...wrapperProps}>
        <Field
          name="finderTarget"
          label="Target boost"
          unit={pressureUnit}
          type="number"
          step="any"
          inputMode="decimal"
          value={target}
          onChange={(e) => setTarget(e.target.value)}
          errors={error?.field === "target" ? error.message : undefined}
        />
        <Field
          name="finderRpm"
          label="At engine speed"
          unit="rpm"
          type="number"
          step="50"
          inputMode="numeric"
          value={rpm}
          onChange={(e) => setRpm(e.target.value)}
          errors={error?.field === "rpm" ? error.message : undefined}
        />
        <Button type={nested ? "button" : "submit"} onClick={nested ? () => submit() : undefined}>
          Find pulley
        </Button>
      </Wrapper>
      {outcome && !outcome.ok ? (
        <Notice tone="warning" title="Target out of reach">
          {outcome.message}
        </Notice>
      ) : null}
      {outcome?.ok ? (
        <div className="flex flex-col gap-2" data-testid="finder-result">
          <p role="status" className="text-sm">
            For {quantityText("pressure", outcome.result.point.boostGauge, system)} at {figure("speed", outcome.result.point.rpm, system)} rpm the blower pulley is{" "}
            <strong data-testid="finder-exact" data-diameter-m={outcome.result.diameter}>
              {quantityText("length-small", outcome.result.diameter, system)}
            </strong>{" "}
            (drive ratio {outcome.result.point.driveRatio.toFixed(2)}).
          </p>
          <ul className="text-sm">
            {(
              [
                ["below", "Nearest in stock, smaller (more boost)", outcome.result.below],
                ["above", "Nearest in stock, larger (less boost)", outcome.result.above],
              ] as const
            ).map(([side, label, s]) => (
              <li key={side} data-testid={`finder-${side}`} data-diameter-m={s?.diameter ?? ""}>
                {label}:{" "}
                {s ? `${quantityText("length-small", s.diameter, system)}, ${figureOrRange(s.point, system, (p) => quantityText("pressure", p.boostGauge, system))}` : stock.length ? "none in stock on that side" : "no blower pulley is in stock"}
              </li>
            ))}
          </ul>
          {onApply ? (
            <div className="flex flex-wrap gap-2">
              <Button type="button" variant="secondary" onClick={() => onApply(outcome.result.diameter)}>
                Use the exact size in the editor
              </Button>
              {outcome.result.below ? (
                <Button type="button" variant="secondary" onClick={() => onApply(outcome.result.below!.diameter)}>
                  Use the smaller stocked size
                </Button>
              ) : null}
              {outcome.result.above ? (
                <Button type="button" variant="secondary" onClick={() => onApply(outcome.result.above!.diameter)}>
                  Use the larger stocked size
                </Button>
              ) : null}
            </div>
          ) : null}
          <LazyCurveChart series={series} metrics={["boostGauge"]} unitSystem={system} redlineRpm={spec.engine.redlineRpm} height={240} ariaLabel="Predicted boost with the found pulley and the nearest stocked sizes" />
        </div>
      ) : null}
    </section>
  );
}
