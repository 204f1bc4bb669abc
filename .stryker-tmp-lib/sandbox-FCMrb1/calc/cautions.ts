// @ts-nocheck
// Structured cautions shown beside every result and on the printed sheet. Thresholds are
// conservative rules of thumb or demo defaults, named as such; the UI may override them.
import { z } from "zod";
import { blowerSpeedUnchecked } from "./drive";
import { MODEL_MAX_PRESSURE_RATIO } from "./range";
import { cautionOptionsSchema, combinationSchema, parseOrThrow, type CautionOptions, type Combination, type CombinationInput } from "./schema";

/** Machine-readable code of a caution. */
export type CautionCode =
  | "general"
  | "blower-overspeed"
  | "pulley-below-belt-minimum"
  | "charge-temperature-high"
  | "injector-duty-high"
  | "pressure-ratio-out-of-range"
  | "ve-implausible";

/** How serious a caution is. */
export type CautionSeverity = "info" | "warning" | "danger";

/** One caution: code, severity, a human message, and the numbers behind it (SI). */
export interface Caution {
  /** Machine-readable code. */
  readonly code: CautionCode;
  /** info, warning or danger. */
  readonly severity: CautionSeverity;
  /** Human-readable message. */
  readonly message: string;
  /** Numbers behind the message, SI (e.g. blowerRpm in rev/min, temperatures in K). */
  readonly values: Readonly<Record<string, number>>;
}

/** The general safety notice shown and printed with every result (design.md, Safety). */
export const SAFETY_NOTICE: readonly string[] = [
  "Predictions are estimates from a simplified model, not measurements.",
  "Confirm every combination on a dyno with wideband air-fuel and knock monitoring before driving it hard.",
  "Respect the blower maker's speed limit.",
  "Check belt and pulley fit, belt wrap and alignment before running the engine.",
  "Fuel quality and ignition timing must suit the boost.",
  "Follow local laws on emissions and road use, and defer to licensed professionals.",
];

/** Smallest blower pulley a belt may wrap, ≈ 3.0 in: a DEMO default, not a belt maker's figure (m). */
export const DEFAULT_BELT_MINIMUM_DIAMETER = 0.076;
/** Manifold temperature above which to warn, 60 °C: a conservative rule of thumb for knock risk on pump gasoline (common practice, no published source) (K). */
export const DEFAULT_CHARGE_TEMPERATURE_LIMIT = 333.15;
/** Highest pressure ratio the model is meant for (dimensionless): the model's own range bound. */
export const DEFAULT_MAX_MODEL_PRESSURE_RATIO = MODEL_MAX_PRESSURE_RATIO;
/** Lowest plausible wide-open-throttle VE (fraction). */
export const VE_PLAUSIBLE_MIN = 0.5;
/** Highest plausible wide-open-throttle VE (fraction). */
export const VE_PLAUSIBLE_MAX = 1.3;
/** Steepest plausible VE change between adjacent curve points (fraction per 1000 rev/min). */
export const VE_MAX_SLOPE_PER_1000_RPM = 0.2;

/** The fields of an operating point the cautions read. */
export interface CautionPoint {
  /** Engine speed (rev/min). */
  readonly rpm: number;
  /** Pressure ratio (dimensionless). */
  readonly pressureRatio: number;
  /** Manifold temperature (K). */
  readonly manifoldTemperature: number;
  /** Injector duty (fraction) or null. */
  readonly injectorDuty: number | null;
}

const cautionPointsSchema = z.array(
  z.object({
    rpm: z.number({ error: "Each point needs an engine speed" }),
    pressureRatio: z.number({ error: "Each point needs a pressure ratio" }),
    manifoldTemperature: z.number({ error: "Each point needs a manifold temperature" }),
    injectorDuty: z.number().nullable(),
  }),
  { error: "Points must be a list of operating points" },
);

/** Resolved thresholds of the cautions (SI). */
export interface CautionThresholds {
  /** Belt minimum pulley diameter (m). */
  readonly beltMinimumDiameter: number;
  /** Charge temperature limit (K). */
  readonly chargeTemperatureLimit: number;
  /** Highest pressure ratio the model is meant for (dimensionless). */
  readonly maxModelPressureRatio: number;
}

/** Fill defaults into validated caution options. */
export function resolveThresholds(options: z.output<typeof cautionOptionsSchema>): CautionThresholds {
  return {
    beltMinimumDiameter: options.beltMinimumDiameter ?? DEFAULT_BELT_MINIMUM_DIAMETER,
    chargeTemperatureLimit: options.chargeTemperatureLimit ?? DEFAULT_CHARGE_TEMPERATURE_LIMIT,
    maxModelPressureRatio: options.maxModelPressureRatio ?? DEFAULT_MAX_MODEL_PRESSURE_RATIO,
  };
}

const SEVERITY_ORDER: Record<CautionSeverity, number> = { danger: 0, warning: 1, info: 2 };
const celsius = (k: number): string => `${(k - 273.15).toFixed(0)} °C`;
const percent = (f: number): string => `${(f * 100).toFixed(0)} %`;
const rpmText = (n: number): string => `${Math.round(n).toLocaleString("en-US")} rpm`;

/** Blower speed at the highest engine speed considered (rev/min) and whether it exceeds the limit. */
export function overspeedAt(c: Combination, topRpm: number): { blowerRpm: number; over: boolean } {
  const blowerRpm = blowerSpeedUnchecked(c, topRpm);
  return { blowerRpm, over: blowerRpm > c.blower.maxRpm };
}

/** VE-curve plausibility: extremes (fraction) and steepest slope (fraction per 1000 rev/min). */
export function veCurveStats(c: Combination): { minVe: number; maxVe: number; maxSlopePer1000Rpm: number; implausible: boolean } {
  const curve = c.engine.veCurve;
  let minVe = Infinity;
  let maxVe = -Infinity;
  let maxSlope = 0;
  for (let i = 0; i < curve.length; i++) {
    minVe = Math.min(minVe, curve[i].ve);
    maxVe = Math.max(maxVe, curve[i].ve);
    if (i > 0) {
      const slope = Math.abs(curve[i].ve - curve[i - 1].ve) / ((curve[i].rpm - curve[i - 1].rpm) / 1000);
      maxSlope = Math.max(maxSlope, slope);
    }
  }
  const implausible = minVe < VE_PLAUSIBLE_MIN || maxVe > VE_PLAUSIBLE_MAX || maxSlope > VE_MAX_SLOPE_PER_1000_RPM;
  return { minVe, maxVe, maxSlopePer1000Rpm: maxSlope, implausible };
}

/** Cautions of a validated combination and its points with resolved thresholds (unchecked). */
export function cautionsUnchecked(c: Combination, points: readonly CautionPoint[], t: CautionThresholds): Caution[] {
  const out: Caution[] = [];
  const topRpm = points.reduce((m, p) => Math.max(m, p.rpm), c.engine.redlineRpm);
  const speed = overspeedAt(c, topRpm);
  if (speed.over) {
    out.push({
      code: "blower-overspeed",
      severity: "danger",
      message: `At ${rpmText(topRpm)} the blower turns ${rpmText(speed.blowerRpm)}, over its ${rpmText(c.blower.maxRpm)} limit. Use a larger blower pulley or a smaller crank pulley.`,
      values: { engineRpm: topRpm, blowerRpm: speed.blowerRpm, maxRpm: c.blower.maxRpm },
    });
  }
  const db = c.drive.blowerPulleyDiameter;
  if (db < t.beltMinimumDiameter) {
    out.push({
      code: "pulley-below-belt-minimum",
      severity: "warning",
      message: `The ${(db * 1000).toFixed(0)} mm blower pulley is below the ${(t.beltMinimumDiameter * 1000).toFixed(0)} mm the belt should wrap; expect belt slip, heat and wear. Check the belt maker's minimum.`,
      values: { blowerPulleyDiameter: db, beltMinimumDiameter: t.beltMinimumDiameter },
    });
  }
  if (points.length > 0) {
    let hot = points[0];
    let prHigh = points[0];
    let prLow = points[0];
    let duty: CautionPoint | null = null;
    for (const p of points) {
      if (p.manifoldTemperature > hot.manifoldTemperature) hot = p;
      if (p.pressureRatio > prHigh.pressureRatio) prHigh = p;
      if (p.pressureRatio < prLow.pressureRatio) prLow = p;
      if (p.injectorDuty != null && (duty === null || p.injectorDuty > (duty.injectorDuty ?? 0))) duty = p;
    }
    if (hot.manifoldTemperature > t.chargeTemperatureLimit) {
      out.push({
        code: "charge-temperature-high",
        severity: "warning",
        message: `Charge temperature reaches ${celsius(hot.manifoldTemperature)} at ${rpmText(hot.rpm)}, above ${celsius(t.chargeTemperatureLimit)} (a conservative rule of thumb for knock risk). Consider an intercooler, less boost, better fuel or less ignition advance.`,
        values: { manifoldTemperature: hot.manifoldTemperature, limit: t.chargeTemperatureLimit, rpm: hot.rpm },
      });
    }
    if (duty !== null && duty.injectorDuty !== null && duty.injectorDuty > c.fuel.maxDuty) {
      out.push({
        code: "injector-duty-high",
        severity: "danger",
        message: `Injector duty reaches ${percent(duty.injectorDuty)} at ${rpmText(duty.rpm)}, above the ${percent(c.fuel.maxDuty)} limit: the engine may run lean. Use larger injectors or more fuel pressure.`,
        values: { injectorDuty: duty.injectorDuty, limit: c.fuel.maxDuty, rpm: duty.rpm },
      });
    }
    if (prHigh.pressureRatio > t.maxModelPressureRatio) {
      out.push({
        code: "pressure-ratio-out-of-range",
        severity: "warning",
        message: `Pressure ratio reaches ${prHigh.pressureRatio.toFixed(2)} at ${rpmText(prHigh.rpm)}; the model is meant for ratios up to about ${t.maxModelPressureRatio}, so treat these figures as rough.`,
        values: { pressureRatio: prHigh.pressureRatio, limit: t.maxModelPressureRatio, rpm: prHigh.rpm },
      });
    }
    if (prLow.pressureRatio < 1) {
      out.push({
        code: "pressure-ratio-out-of-range",
        severity: "info",
        message: `At ${rpmText(prLow.rpm)} the blower delivers less than the engine would draw on its own (pressure ratio ${prLow.pressureRatio.toFixed(2)}): it restricts the engine there.`,
        values: { pressureRatio: prLow.pressureRatio, limit: 1, rpm: prLow.rpm },
      });
    }
  }
  const ve = veCurveStats(c);
  if (ve.implausible) {
    out.push({
      code: "ve-implausible",
      severity: "warning",
      message: `The VE curve looks implausible (from ${ve.minVe.toFixed(2)} to ${ve.maxVe.toFixed(2)}, steepest change ${ve.maxSlopePer1000Rpm.toFixed(2)} per 1000 rpm); wide-open-throttle VE usually lies between ${VE_PLAUSIBLE_MIN} and ${VE_PLAUSIBLE_MAX} and changes smoothly. Check the curve.`,
      values: { minVe: ve.minVe, maxVe: ve.maxVe, maxSlopePer1000Rpm: ve.maxSlopePer1000Rpm },
    });
  }
  out.sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
  out.push({ code: "general", severity: "info", message: SAFETY_NOTICE.join(" "), values: {} });
  return out;
}

/** Cautions for a combination and its operating points; always ends with the 'general' safety notice. */
export function cautions(combination: CombinationInput, points: readonly CautionPoint[], options?: CautionOptions): Caution[] {
  const c = parseOrThrow(combinationSchema, combination);
  const p = parseOrThrow(cautionPointsSchema, points, "points");
  const o = parseOrThrow(cautionOptionsSchema, options, "options");
  return cautionsUnchecked(c, p, resolveThresholds(o));
}
