// What a recommendation sheet shows, computed from its frozen spec: the curves, the key figures
// and the cautions. Pure, so the sheet, the print view, the share page and the e-mail agree.
import { blowerSpeed, cautions, driveRatio, overdrive, trySolvePoint, type Caution, type Combination, type OperatingPoint } from "@/calc";
import type { RangeOf } from "@/lib/planner/range-words";

export type KeyFigures = {
  crankPulleyDiameter: number;
  blowerPulleyDiameter: number;
  driveRatio: number;
  overdrive: number;
  redlineRpm: number;
  /** Peaks are read among the points within the model's range only. */
  peakPower: { rpm: number; netPower: number; boostGauge: number } | null;
  peakTorque: { rpm: number; torque: number } | null;
  /** Figures read at a fixed speed carry that point's range: not to be shown outside it. */
  atRedline: ({ boostGauge: number; manifoldTemperature: number } & RangeOf) | null;
  /** The headline: boost where it was sold (the target speed), or at redline when none was given. */
  headline: ({ rpm: number; boostGauge: number; netPower: number; sold: boolean } & RangeOf) | null;
  blowerRpmAtRedline: number;
  blowerMaxRpm: number;
  /** Read among all points: the hottest may be the one outside the range, and then it says so. */
  maxChargeTemperature: ({ rpm: number; manifoldTemperature: number } & RangeOf) | null;
};

export type SheetData = { points: OperatingPoint[]; cautions: Caution[]; figures: KeyFigures; skipped: number[] };

/** Engine speeds of the curves: every 250 rpm from 1 500 (or the VE curve's first point) to redline. */
export function sheetRpms(spec: Combination): number[] {
  const start = Math.min(1500, spec.engine.veCurve[0]?.rpm ?? 1500);
  const top = spec.engine.redlineRpm;
  const out: number[] = [];
  for (let n = Math.ceil(start / 250) * 250; n < top; n += 250) out.push(n);
  out.push(top);
  return out;
}

/** `targetRpm`: the engine speed the boost was sold at (rpm); the headline figures are read there. */
export function computeSheet(spec: Combination, targetRpm: number | null = null): SheetData {
  const points: OperatingPoint[] = [];
  const skipped: number[] = [];
  // A slow, leaky blower can fail to balance at the lowest speeds; the sheet shows the rest.
  for (const rpm of sheetRpms(spec)) {
    const point = trySolvePoint(spec, rpm);
    if (point) points.push(point);
    else skipped.push(rpm);
  }
  const redline = spec.engine.redlineRpm;
  const trusted = points.filter((p) => p.withinRange);
  const best = <K extends keyof OperatingPoint>(key: K, among: OperatingPoint[]) =>
    among.reduce<OperatingPoint | null>((m, p) => (m === null || (p[key] as number) > (m[key] as number) ? p : m), null);
  // A "peak" beyond the model's range is no peak: an out-of-range point's figures are not trusted.
  const power = best("netPower", trusted);
  const torque = best("torque", trusted);
  const hot = best("manifoldTemperature", points);
  const range = (p: OperatingPoint): RangeOf => ({ withinRange: p.withinRange, rangeReasons: p.rangeReasons });
  const top = points.find((p) => p.rpm === redline) ?? null;
  const sold = targetRpm === null ? null : (points.find((p) => p.rpm === targetRpm) ?? trySolvePoint(spec, targetRpm));
  const head = sold ?? top;
  const ratio = driveRatio(spec.drive.crankPulleyDiameter, spec.drive.blowerPulleyDiameter);
  return {
    points,
    skipped,
    cautions: cautions(spec, points),
    figures: {
      crankPulleyDiameter: spec.drive.crankPulleyDiameter,
      blowerPulleyDiameter: spec.drive.blowerPulleyDiameter,
      driveRatio: ratio,
      overdrive: overdrive(ratio),
      redlineRpm: redline,
      peakPower: power && { rpm: power.rpm, netPower: power.netPower, boostGauge: power.boostGauge },
      peakTorque: torque && { rpm: torque.rpm, torque: torque.torque },
      atRedline: top && { boostGauge: top.boostGauge, manifoldTemperature: top.manifoldTemperature, ...range(top) },
      headline: head && { rpm: head.rpm, boostGauge: head.boostGauge, netPower: head.netPower, sold: sold !== null, ...range(head) },
      blowerRpmAtRedline: blowerSpeed(spec, redline),
      blowerMaxRpm: spec.blower.maxRpm,
      maxChargeTemperature: hot && { rpm: hot.rpm, manifoldTemperature: hot.manifoldTemperature, ...range(hot) },
    },
  };
}
