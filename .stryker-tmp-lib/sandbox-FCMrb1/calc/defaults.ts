// @ts-nocheck
// DEMO defaults. Every number here is invented for demonstration, generic, and describes no
// real product; the UI must label them as demo values.
import type { BlowerKind, Combination } from "./schema";
import { bsfcImperialToSI, cToK, lbPerHourToKgS } from "./units";

/** Blower fields a form may pre-fill for a kind of blower (DEMO values, SI). */
export interface BlowerDemoDefaults {
  /** Swept volume per pulley-shaft revolution (m³/rev). */
  readonly displacementPerRev: number;
  /** Built-in volume ratio (dimensionless). */
  readonly builtInVolumeRatio: number;
  /** Pulley-shaft speed limit (rev/min). */
  readonly maxRpm: number;
  /** Volumetric efficiency at referenceRpm and PR 1.5 (fraction). */
  readonly volumetricEfficiencyRef: number;
  /** Speed of the reference point (rev/min). */
  readonly referenceRpm: number;
  /** Internal efficiency (fraction). */
  readonly internalEfficiency: number;
  /** Drive mechanical efficiency (fraction). */
  readonly mechanicalEfficiency: number;
}

/** True for every value in this module: they are demo data and must be shown as such. */
export const DEMO_DEFAULTS_ARE_INVENTED = true;

/** DEMO blower defaults per kind (invented, generic). */
export const BLOWER_DEMO_DEFAULTS: Readonly<Record<BlowerKind, BlowerDemoDefaults>> = {
  roots: {
    displacementPerRev: 0.0016,
    builtInVolumeRatio: 1,
    maxRpm: 13_000,
    volumetricEfficiencyRef: 0.8,
    referenceRpm: 8000,
    internalEfficiency: 0.85,
    mechanicalEfficiency: 0.95,
  },
  "twin-screw": {
    displacementPerRev: 0.0012,
    builtInVolumeRatio: 1.6,
    maxRpm: 18_000,
    volumetricEfficiencyRef: 0.92,
    referenceRpm: 10_000,
    internalEfficiency: 0.85,
    mechanicalEfficiency: 0.95,
  },
};

/** DEMO drive defaults: belt slip (fraction). */
export const DRIVE_DEMO_DEFAULTS = { beltSlip: 0.02 } as const;

/** DEMO intercooler (air-to-water) defaults: effectiveness (fraction), pressure drop (Pa), coolant (K). */
export const INTERCOOLER_DEMO_DEFAULTS = {
  effectiveness: 0.7,
  pressureDrop: 3000,
  coolantTemperature: cToK(35),
} as const;

/** DEMO fuel defaults: gasoline under boost, afr (–), bsfc (kg/J), max duty (fraction). */
export const FUEL_DEMO_DEFAULTS = {
  afr: 11.8,
  bsfc: bsfcImperialToSI(0.5),
  maxDuty: 0.85,
  evaporatedBeforeBlower: 0,
} as const;

/**
 * An engine as a tuner writes it down: displacement (m³), cylinders, redline (rev/min) and the VE
 * curve as [engine speed (rev/min), VE (fraction)] pairs. Demo data and test engines use it.
 */
export function engineOf(displacement: number, cylinders: number, redlineRpm: number, curve: readonly (readonly [number, number])[]): Combination["engine"] {
  return { displacement, cylinders, redlineRpm, veCurve: curve.map(([rpm, ve]) => ({ rpm, ve })) };
}

/** DEMO combination: a generic ~4.6 L V8 under a generic Roots blower, sea level, 25 °C (fresh object, SI). */
export function exampleCombination(): Combination {
  return {
    engine: engineOf(0.0046, 8, 6500, [[1500, 0.72], [2500, 0.8], [3500, 0.86], [4500, 0.88], [5500, 0.85], [6500, 0.78]]),
    blower: { kind: "roots", ...BLOWER_DEMO_DEFAULTS.roots },
    drive: { crankPulleyDiameter: 0.16, blowerPulleyDiameter: 0.08, beltSlip: DRIVE_DEMO_DEFAULTS.beltSlip },
    ambient: { pressure: 101_325, temperature: cToK(25), inletLoss: 1500 },
    intercooler: null,
    fuel: {
      afr: FUEL_DEMO_DEFAULTS.afr,
      bsfc: FUEL_DEMO_DEFAULTS.bsfc,
      injectorCount: 8,
      injectorFlow: lbPerHourToKgS(36),
      maxDuty: FUEL_DEMO_DEFAULTS.maxDuty,
      evaporatedBeforeBlower: 0,
    },
  };
}

/** DEMO combination with a generic twin-screw blower and an air-to-water intercooler on the same engine (fresh object, SI). */
export function exampleTwinScrewCombination(): Combination {
  const c = exampleCombination();
  return {
    ...c,
    blower: { kind: "twin-screw", ...BLOWER_DEMO_DEFAULTS["twin-screw"] },
    drive: { ...c.drive, blowerPulleyDiameter: 0.06 },
    intercooler: { ...INTERCOOLER_DEMO_DEFAULTS },
  };
}
