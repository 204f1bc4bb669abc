// Invented demo engines and blowers: generic shapes for the demo only, not taken from any test
// or product. Values are SI like calc/ (m, m³, Pa, K, kg/s, kg/J).
import type { CombinationInput } from "@/calc";

const inch = 0.0254;
const litre = 0.001;
/** 0.5 lb/(hp·h) in kg/J: 0.45359237 kg / (745.6999 W · 3600 s). */
const bsfcHalf = (0.5 * 0.45359237) / (745.6999 * 3600);

const seaLevel = { pressure: 101_325, temperature: 298.15, inletLoss: 1_500 };

/** A mild small-block V8 of about five litres under a generic Roots blower. */
export const smallBlockBaseline: CombinationInput = {
  engine: {
    displacement: 5.0 * litre,
    cylinders: 8,
    redlineRpm: 6200,
    veCurve: [
      { rpm: 1500, ve: 0.78 },
      { rpm: 2500, ve: 0.84 },
      { rpm: 3500, ve: 0.88 },
      { rpm: 4500, ve: 0.9 },
      { rpm: 5500, ve: 0.87 },
      { rpm: 6200, ve: 0.82 },
    ],
  },
  blower: {
    kind: "roots",
    displacementPerRev: 1.9 * litre,
    builtInVolumeRatio: 1,
    maxRpm: 14_000,
    volumetricEfficiencyRef: 0.82,
    referenceRpm: 10_000,
    internalEfficiency: 0.85,
    mechanicalEfficiency: 0.95,
  },
  drive: { crankPulleyDiameter: 6.5 * inch, blowerPulleyDiameter: 3.4 * inch, beltSlip: 0.02 },
  ambient: seaLevel,
  intercooler: null,
  fuel: { afr: 11.8, bsfc: bsfcHalf * 1.1, injectorCount: 8, injectorFlow: (42 * 0.45359237) / 3600, maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};

/** The same engine after ported heads and a bigger cam: it breathes better at speed. */
export const smallBlockHeadsCam: CombinationInput = {
  ...smallBlockBaseline,
  engine: {
    ...smallBlockBaseline.engine,
    redlineRpm: 6500,
    veCurve: [
      { rpm: 1500, ve: 0.76 },
      { rpm: 2500, ve: 0.85 },
      { rpm: 3500, ve: 0.92 },
      { rpm: 4500, ve: 0.97 },
      { rpm: 5500, ve: 0.97 },
      { rpm: 6500, ve: 0.92 },
    ],
  },
};

/** Heads and cam, then a smaller blower pulley to win back the boost. */
export const smallBlockSmallerPulley: CombinationInput = {
  ...smallBlockHeadsCam,
  drive: { ...smallBlockHeadsCam.drive, blowerPulleyDiameter: 3.1 * inch },
};

/** A larger V8 of about seven litres under a generic twin-screw with an air-to-water intercooler. */
export const bigBlockTwinScrew: CombinationInput = {
  engine: {
    displacement: 7.0 * litre,
    cylinders: 8,
    redlineRpm: 6500,
    veCurve: [
      { rpm: 2000, ve: 0.82 },
      { rpm: 3000, ve: 0.88 },
      { rpm: 4000, ve: 0.92 },
      { rpm: 5000, ve: 0.93 },
      { rpm: 6000, ve: 0.9 },
      { rpm: 6500, ve: 0.86 },
    ],
  },
  blower: {
    kind: "twin-screw",
    displacementPerRev: 2.9 * litre,
    builtInVolumeRatio: 1.6,
    maxRpm: 16_000,
    volumetricEfficiencyRef: 0.92,
    referenceRpm: 10_000,
    internalEfficiency: 0.88,
    mechanicalEfficiency: 0.95,
  },
  drive: { crankPulleyDiameter: 8.0 * inch, blowerPulleyDiameter: 3.8 * inch, beltSlip: 0.02 },
  ambient: seaLevel,
  intercooler: { effectiveness: 0.7, pressureDrop: 7_000, coolantTemperature: 308.15 },
  fuel: { afr: 11.5, bsfc: bsfcHalf * 1.1, injectorCount: 8, injectorFlow: (60 * 0.45359237) / 3600, maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};

/** A two-litre four-cylinder with a small generic Roots blower. */
export const fourCylinderRoots: CombinationInput = {
  engine: {
    displacement: 2.0 * litre,
    cylinders: 4,
    redlineRpm: 7200,
    veCurve: [
      { rpm: 2000, ve: 0.8 },
      { rpm: 3500, ve: 0.88 },
      { rpm: 5000, ve: 0.93 },
      { rpm: 6500, ve: 0.9 },
      { rpm: 7200, ve: 0.85 },
    ],
  },
  blower: {
    kind: "roots",
    displacementPerRev: 0.9 * litre,
    builtInVolumeRatio: 1,
    maxRpm: 16_000,
    volumetricEfficiencyRef: 0.8,
    referenceRpm: 11_000,
    internalEfficiency: 0.85,
    mechanicalEfficiency: 0.95,
  },
  drive: { crankPulleyDiameter: 5.5 * inch, blowerPulleyDiameter: 2.9 * inch, beltSlip: 0.02 },
  ambient: { pressure: 98_000, temperature: 293.15, inletLoss: 1_000 },
  intercooler: null,
  fuel: { afr: 12.0, bsfc: bsfcHalf, injectorCount: 4, injectorFlow: (30 * 0.45359237) / 3600, maxDuty: 0.85, evaporatedBeforeBlower: 0 },
};
