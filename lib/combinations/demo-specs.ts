// Invented demo engines and blowers for the demo shop's own storylines: generic shapes, not taken
// from any test or product. Values are SI like calc/ (m, m³, Pa, K, kg/s, kg/J).
//
// - a 4.3 L V6 work truck on a Roots blower: a datalog, then a smaller blower pulley;
// - a 7.4 L V8 on a twin-screw: an intercooler added, then larger injectors;
// - a 5.7 L vintage V8 on a draw-through Roots under a carburettor: a cam-only change;
// - a 2.4 L four-cylinder road car on a small twin-screw: its owner moves to altitude.
import { BLOWER_DEMO_DEFAULTS, engineOf, type CombinationInput } from "@/calc";

const inch = 0.0254;
const litre = 0.001;
/** 0.5 lb/(hp·h) in kg/J: 0.45359237 kg / (745.6999 W · 3600 s). */
const bsfcHalf = (0.5 * 0.45359237) / (745.6999 * 3600);
/** lb/h of fuel in kg/s. */
const lbPerHour = (x: number) => (x * 0.45359237) / 3600;
/** cfm in m³/s. */
const cfm = (x: number) => x * 0.00047194745;

// Blowers start from their kind's demo defaults (calc/defaults.ts) and state only where they differ.
const seaLevel = { pressure: 101_325, temperature: 298.15, inletLoss: 1_500 };

/** Work truck: a 4.3 L V6 under a 1.6 L Roots, as it came in (3.4 in blower pulley). */
export const workTruckV6: CombinationInput = {
  engine: engineOf(4.3 * litre, 6, 5200, [[1500, 0.8], [2500, 0.86], [3500, 0.88], [4500, 0.85], [5200, 0.8]]),
  blower: { kind: "roots", ...BLOWER_DEMO_DEFAULTS.roots, displacementPerRev: 1.6 * litre, maxRpm: 14_000, volumetricEfficiencyRef: 0.82, referenceRpm: 10_000 },
  drive: { crankPulleyDiameter: 6.0 * inch, blowerPulleyDiameter: 3.4 * inch, beltSlip: 0.02 },
  ambient: seaLevel,
  intercooler: null,
  fuel: { afr: 11.8, bsfc: bsfcHalf * 1.1, injectorCount: 6, injectorFlow: lbPerHour(36), maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};

/** The work truck after its datalog: a 3.0 in blower pulley to win back what the blower slips. */
export const workTruckV6SmallerPulley: CombinationInput = {
  ...workTruckV6,
  drive: { ...workTruckV6.drive, blowerPulleyDiameter: 3.0 * inch },
};

/** Big-inch V8: 7.4 L under a 2.9 L twin-screw, first without an intercooler. */
export const bigInchTwinScrew: CombinationInput = {
  engine: engineOf(7.4 * litre, 8, 6000, [[2000, 0.82], [3000, 0.88], [4000, 0.91], [5000, 0.9], [6000, 0.84]]),
  blower: { kind: "twin-screw", ...BLOWER_DEMO_DEFAULTS["twin-screw"], displacementPerRev: 2.9 * litre, maxRpm: 16_000, internalEfficiency: 0.88 },
  drive: { crankPulleyDiameter: 7.0 * inch, blowerPulleyDiameter: 3.8 * inch, beltSlip: 0.02 },
  ambient: seaLevel,
  intercooler: null,
  fuel: { afr: 11.5, bsfc: bsfcHalf * 1.1, injectorCount: 8, injectorFlow: lbPerHour(42), maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};

/** The big-inch V8 with an air-to-water intercooler added. */
export const bigInchIntercooled: CombinationInput = {
  ...bigInchTwinScrew,
  intercooler: { effectiveness: 0.7, pressureDrop: 7_000, coolantTemperature: 308.15 },
};

/** The intercooled big-inch V8 on larger injectors. */
export const bigInchLargerInjectors: CombinationInput = {
  ...bigInchIntercooled,
  fuel: { ...bigInchIntercooled.fuel, injectorFlow: lbPerHour(60) },
};

/** Vintage V8: 5.7 L with a 2.3 L Roots drawing through a carburettor, mild cam. */
export const vintageV8DrawThrough: CombinationInput = {
  engine: engineOf(5.7 * litre, 8, 5500, [[1500, 0.8], [2500, 0.85], [3500, 0.86], [4500, 0.82], [5500, 0.76]]),
  blower: { kind: "roots", ...BLOWER_DEMO_DEFAULTS.roots, displacementPerRev: 2.3 * litre, referenceRpm: 9_000 },
  drive: { crankPulleyDiameter: 7.0 * inch, blowerPulleyDiameter: 3.6 * inch, beltSlip: 0.02 },
  ambient: { ...seaLevel, inletLoss: 0, inletRestriction: { ratedFlow: cfm(1000), ratingDepression: 5079 } },
  intercooler: null,
  fuel: { afr: 12.0, bsfc: bsfcHalf * 1.1, evaporatedBeforeBlower: 0.3, evaporatedInBlower: 0.5 },
};

/** The vintage V8 after a cam-only change: it breathes better from the middle up, same pulleys. */
export const vintageV8Cam: CombinationInput = {
  ...vintageV8DrawThrough,
  engine: {
    ...vintageV8DrawThrough.engine,
    redlineRpm: 6000,
    veCurve: [
      { rpm: 1500, ve: 0.77 },
      { rpm: 2500, ve: 0.84 },
      { rpm: 3500, ve: 0.9 },
      { rpm: 4500, ve: 0.92 },
      { rpm: 5500, ve: 0.88 },
      { rpm: 6000, ve: 0.84 },
    ],
  },
};

/** Road car: a 2.4 L four-cylinder under a 1.2 L twin-screw, at its owner's old home by the coast. */
export const roadCarFour: CombinationInput = {
  engine: engineOf(2.4 * litre, 4, 6800, [[2000, 0.82], [3500, 0.9], [5000, 0.93], [6000, 0.9], [6800, 0.84]]),
  blower: { kind: "twin-screw", ...BLOWER_DEMO_DEFAULTS["twin-screw"], displacementPerRev: 1.2 * litre, builtInVolumeRatio: 1.5, volumetricEfficiencyRef: 0.9, referenceRpm: 12_000, internalEfficiency: 0.86 },
  drive: { crankPulleyDiameter: 5.5 * inch, blowerPulleyDiameter: 3.2 * inch, beltSlip: 0.02 },
  ambient: { pressure: 101_325, temperature: 293.15, inletLoss: 1_000 },
  intercooler: { effectiveness: 0.65, pressureDrop: 5_000, coolantTemperature: 308.15 },
  fuel: { afr: 12.0, bsfc: bsfcHalf, injectorCount: 4, injectorFlow: lbPerHour(48), maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};

/** The road car after the move to 1,600 m: 1,600 m standard atmosphere (ISO 2533), a cooler 15 °C day. */
export const roadCarFourAtAltitude: CombinationInput = {
  ...roadCarFour,
  ambient: { pressure: 83_527, temperature: 288.15, inletLoss: 1_000 },
};
