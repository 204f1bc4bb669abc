// @ts-nocheck
// Why boost and power moved between two operating points, as data for a one-sentence "why".
// The balance Pm = ṁ·R·Tm/(VEeff·Vd·N/120) with ṁ = ρ1·ηv·Vb·Nb/60 splits the change in
// ln Pm exactly into signed shares, one per driver; the UI words and formats them.
import type { OperatingPoint } from "./solve";

/** What moved manifold pressure between two points. */
export type ChangeDriverCode =
  /** Blower speed: pulley, belt slip or engine speed. */
  | "blower-speed"
  /** The blower's own volumetric efficiency: slip through its clearances. */
  | "blower-slip"
  /** The charge temperature as the engine takes it (with residual gas and port cooling). */
  | "charge-temperature"
  /** The engine's VE curve at this speed. */
  | "engine-breathing"
  /** Engine speed itself (the engine swallows more per minute). */
  | "engine-speed"
  /** Everything else: inlet density, displacement, blower size (zero for a pulley change). */
  | "other";

/** One driver's signed part in a change. */
export interface ChangeDriver {
  /** Which driver. */
  readonly driver: ChangeDriverCode;
  /** Its own change, in its own unit: relative for blower speed, engine speed and VE (b/a − 1), fraction points for slip, K for temperature. */
  readonly change: number;
  /** Its share of ln(Pm_b/Pm_a); the shares add up to that exactly (dimensionless). */
  readonly manifoldPressureShare: number;
}

/** The change from point a to point b and what drove it (SI). */
export interface ChangeExplanation {
  /** Boost b − a (Pa). */
  readonly boostChange: number;
  /** Manifold absolute pressure b/a (dimensionless). */
  readonly manifoldPressureRatio: number;
  /** Air mass flow b/a (dimensionless): gross power moves with it. */
  readonly airMassFlowRatio: number;
  /** Gross power b − a (W). */
  readonly grossPowerChange: number;
  /** Blower drive power b − a (W): what the extra boost costs. */
  readonly drivePowerChange: number;
  /** Net power b − a (W). */
  readonly netPowerChange: number;
  /** The drivers, largest |share| first. */
  readonly drivers: ChangeDriver[];
}

/** Why boost and power moved from operating point a to b (same engine speed or not). */
export function explainChange(a: OperatingPoint, b: OperatingPoint): ChangeExplanation {
  const ln = (x: number, y: number): number => Math.log(y / x);
  const total = ln(a.manifoldPressure, b.manifoldPressure);
  const speed = ln(a.blowerRpm, b.blowerRpm);
  const slip = ln(a.blowerVolumetricEfficiency, b.blowerVolumetricEfficiency);
  // Tm/(VEeff/VE) is the temperature the engine's demand counts (with residual gas, port cooling).
  const temperature = ln(a.manifoldTemperature, b.manifoldTemperature) - ln(a.effectiveVolumetricEfficiency / a.engineVolumetricEfficiency, b.effectiveVolumetricEfficiency / b.engineVolumetricEfficiency);
  const breathing = -ln(a.engineVolumetricEfficiency, b.engineVolumetricEfficiency);
  const engineSpeed = -ln(a.rpm, b.rpm);
  const other = total - speed - slip - temperature - breathing - engineSpeed;
  const drivers: ChangeDriver[] = [
    { driver: "blower-speed", change: b.blowerRpm / a.blowerRpm - 1, manifoldPressureShare: speed },
    { driver: "blower-slip", change: b.blowerVolumetricEfficiency - a.blowerVolumetricEfficiency, manifoldPressureShare: slip },
    { driver: "charge-temperature", change: b.manifoldTemperature - a.manifoldTemperature, manifoldPressureShare: temperature },
    { driver: "engine-breathing", change: b.engineVolumetricEfficiency / a.engineVolumetricEfficiency - 1, manifoldPressureShare: breathing },
    { driver: "engine-speed", change: b.rpm / a.rpm - 1, manifoldPressureShare: engineSpeed },
    { driver: "other", change: Math.exp(other) - 1, manifoldPressureShare: other },
  ];
  drivers.sort((x, y) => Math.abs(y.manifoldPressureShare) - Math.abs(x.manifoldPressureShare));
  return {
    boostChange: b.boostGauge - a.boostGauge,
    manifoldPressureRatio: b.manifoldPressure / a.manifoldPressure,
    airMassFlowRatio: b.airMassFlow / a.airMassFlow,
    grossPowerChange: b.grossPower - a.grossPower,
    drivePowerChange: b.drivePower - a.drivePower,
    netPowerChange: b.netPower - a.netPower,
    drivers,
  };
}
