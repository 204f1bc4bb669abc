// The blower's side: slip through the clearances, compression work of the ideal cycle with a
// built-in volume ratio, and the discharge temperature from the energy balance (calc/README.md).
import {
  KAPPA,
  GAMMA,
  SLIP_REFERENCE_INLET_PRESSURE,
  SLIP_REFERENCE_PRESSURE_RATIO,
  SPECIFIC_HEAT_CP,
} from "./constants";

/** Orifice-law slip coefficient Ks from the reference point (m³/rev, fraction, rev/min → m³/(s·√Pa)). */
export function slipCoefficient(displacementPerRev: number, volumetricEfficiencyRef: number, referenceRpm: number): number {
  const referenceDeltaP = SLIP_REFERENCE_INLET_PRESSURE * (SLIP_REFERENCE_PRESSURE_RATIO - 1);
  return ((1 - volumetricEfficiencyRef) * displacementPerRev * referenceRpm) / 60 / Math.sqrt(referenceDeltaP);
}

/** Slip flow back through the clearances Ks·sign(ΔP)·√|ΔP| (m³/(s·√Pa), Pa → m³/s at inlet conditions). */
export function slipFlow(slipCoeff: number, deltaP: number): number {
  return Math.sign(deltaP) * slipCoeff * Math.sqrt(Math.abs(deltaP));
}

/** Built-in pressure ratio PRi = Vi^γ of a built-in volume ratio Vi (dimensionless). */
export function builtInPressureRatio(builtInVolumeRatio: number): number {
  return builtInVolumeRatio ** GAMMA;
}

/** Ideal-cycle work per unit swept volume w = P1·[(PRi^κ − 1)/κ + (PR − PRi)/Vi] (Pa, –, – → J/m³). */
export function compressionWorkPerVolume(inletPressure: number, pressureRatio: number, builtInVolumeRatio: number): number {
  const pri = builtInPressureRatio(builtInVolumeRatio);
  return inletPressure * ((pri ** KAPPA - 1) / KAPPA + (pressureRatio - pri) / builtInVolumeRatio);
}

/** Isentropic work per unit inlet volume ws = P1·(PR^κ − 1)/κ (Pa, – → J/m³). */
export function isentropicWorkPerVolume(inletPressure: number, pressureRatio: number): number {
  return (inletPressure * (pressureRatio ** KAPPA - 1)) / KAPPA;
}

/** Efficiency of the ideal cycle ws/w at a pressure ratio and built-in volume ratio (fraction; 0.86 for a Roots blower at PR 1.5). */
export function idealCycleEfficiency(pressureRatio: number, builtInVolumeRatio: number): number {
  return isentropicWorkPerVolume(1, pressureRatio) / compressionWorkPerVolume(1, pressureRatio, builtInVolumeRatio);
}

/** Dead-head pressure ratio 1 + (Qs/Ks)²/P1, where slip eats the whole swept flow (m³/s, m³/(s·√Pa), Pa → –). */
export function deadHeadPressureRatio(sweptFlow: number, slipCoeff: number, inletPressure: number): number {
  if (slipCoeff <= 0) return Number.POSITIVE_INFINITY;
  return 1 + (sweptFlow / slipCoeff) ** 2 / inletPressure;
}

/** Isentropic discharge temperature T1·PR^κ (K, – → K). */
export function isentropicTemperature(inletTemperature: number, pressureRatio: number): number {
  return inletTemperature * pressureRatio ** KAPPA;
}

/** Discharge temperature from the energy balance T1 + Pair/(ṁ·cp) (K, W, kg/s → K). */
export function dischargeTemperature(inletTemperature: number, airPower: number, massFlow: number): number {
  return inletTemperature + airPower / (massFlow * SPECIFIC_HEAT_CP);
}

/** Equivalent adiabatic efficiency T1·(PR^κ − 1)/(T2 − T1) (K, –, K → fraction). */
export function adiabaticEfficiency(inletTemperature: number, pressureRatio: number, dischargeTemp: number): number {
  return (inletTemperature * (pressureRatio ** KAPPA - 1)) / (dischargeTemp - inletTemperature);
}
