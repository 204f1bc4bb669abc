// @ts-nocheck
// Invented test engines (numbers are made up; check values come from the sources named in the
// tests). Each is a plausible street set-up of a kind the trade fits blowers to.
import { engineOf, exampleCombination, exampleTwinScrewCombination, type Combination } from "@/calc";

const noIntercooler = (c: Combination): Combination => ({ ...c, intercooler: null });

/** A 2.0 L four-cylinder under a 1.0 L/rev Roots, no intercooler. */
export function smallFourRoots(): Combination {
  const c = exampleCombination();
  return {
    ...c,
    engine: engineOf(0.002, 4, 7200, [[2000, 0.78], [4000, 0.9], [6000, 0.88], [7200, 0.8]]),
    blower: { ...c.blower, displacementPerRev: 0.001, maxRpm: 16_000, volumetricEfficiencyRef: 0.78, referenceRpm: 10_000 },
    drive: { crankPulleyDiameter: 0.14, blowerPulleyDiameter: 0.085, beltSlip: 0.02 },
  };
}

/** A 7.0 L V8 under a 2.4 L/rev twin-screw, no intercooler. */
export function bigEightScrew(): Combination {
  const c = noIntercooler(exampleTwinScrewCombination());
  return {
    ...c,
    engine: engineOf(0.007, 8, 6200, [[1500, 0.8], [3000, 0.88], [4500, 0.9], [6200, 0.82]]),
    blower: { ...c.blower, displacementPerRev: 0.0024, maxRpm: 15_000 },
    drive: { crankPulleyDiameter: 0.17, blowerPulleyDiameter: 0.095, beltSlip: 0.02 },
  };
}

/** A 3.8 L V6 under a 1.5 L/rev Roots with an air-to-water intercooler. */
export function midSixRootsIntercooled(): Combination {
  const c = exampleCombination();
  return {
    ...c,
    engine: engineOf(0.0038, 6, 6000, [[2000, 0.8], [4000, 0.86], [6000, 0.8]]),
    blower: { ...c.blower, displacementPerRev: 0.0015 },
    drive: { crankPulleyDiameter: 0.15, blowerPulleyDiameter: 0.085, beltSlip: 0.02 },
    intercooler: { effectiveness: 0.7, pressureDrop: 3000, coolantTemperature: 308.15 },
  };
}

/** The street case: a 5 L V8 under a 2 L/rev Roots making about 7 psi at 6000 rpm, no intercooler. */
export function streetFiveLitreRoots(): Combination {
  const c = exampleCombination();
  // Its own 5 L, not the demo's size: the case is stated for a 5 L engine.
  return { ...c, engine: { ...c.engine, displacement: 0.005 }, blower: { ...c.blower, displacementPerRev: 0.002 }, drive: { ...c.drive, blowerPulleyDiameter: 0.0945 } };
}

/** Test engines without an intercooler, Roots and twin-screw. */
export const withoutIntercooler: [string, () => Combination][] = [
  ["demo 4.6 L V8, Roots", exampleCombination],
  ["demo 4.6 L V8, twin-screw without its intercooler", () => noIntercooler(exampleTwinScrewCombination())],
  ["2.0 L four, Roots", smallFourRoots],
  ["7.0 L V8, twin-screw", bigEightScrew],
  ["street 5 L V8, 2 L Roots", streetFiveLitreRoots],
];

/** Test engines with an intercooler. */
export const withIntercooler: [string, () => Combination][] = [
  ["demo 4.6 L V8, twin-screw, intercooled", exampleTwinScrewCombination],
  ["3.8 L V6, Roots, intercooled", midSixRootsIntercooled],
];
