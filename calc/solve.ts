// The balance of blower delivery and engine demand at one engine speed (calc/README.md, steps 7–8),
// and the boost curve over many. Entry points validate once, then call the unchecked core.
import {
  BRACKET_SCAN_FACTOR,
  GAMMA,
  GAS_CONSTANT,
  GASOLINE_LATENT_HEAT,
  KAPPA,
  PRESSURE_RATIO_CEILING,
  PRESSURE_RATIO_FLOOR_MARGIN,
  SOLVER_MAX_ITERATIONS,
  SOLVER_RELATIVE_TOLERANCE,
  SPECIFIC_HEAT_CP,
} from "./constants";
import { builtInPressureRatio, slipCoefficient } from "./blower";
import { driveRatioUnchecked } from "./drive";
import { engineAirflowUnchecked, veAt } from "./engine";
import { CalcConvergenceError } from "./errors";
import { NO_REASONS, rangeReasonsOf, type RangeReason } from "./range";
import { brent } from "./root-finding";
import { REFINEMENT_DEFAULTS, combinationSchema, parseOrThrow, rpmListSchema, rpmSchema, type Combination, type CombinationInput } from "./schema";

/** Everything the model predicts at one engine speed (SI). */
export interface OperatingPoint {
  /** Engine speed (rev/min). */
  readonly rpm: number;
  /** Drive ratio crank/blower pulley diameter (dimensionless). */
  readonly driveRatio: number;
  /** Blower pulley-shaft speed, belt slip included (rev/min). */
  readonly blowerRpm: number;
  /** Pressure ratio across the blower P2/P1 (dimensionless). */
  readonly pressureRatio: number;
  /** Manifold absolute pressure after any intercooler (Pa). */
  readonly manifoldPressure: number;
  /** Boost: manifold pressure minus ambient pressure (Pa, gauge). */
  readonly boostGauge: number;
  /** Blower volumetric efficiency, delivered over swept volume at inlet conditions (fraction). */
  readonly blowerVolumetricEfficiency: number;
  /** Equivalent adiabatic efficiency of the blower (fraction). */
  readonly adiabaticEfficiency: number;
  /** Blower discharge temperature (K). */
  readonly dischargeTemperature: number;
  /** Manifold (charge) temperature after any intercooler (K). */
  readonly manifoldTemperature: number;
  /** Air mass flow through blower and engine (kg/s). */
  readonly airMassFlow: number;
  /** Power taken from the crank to drive the blower (W). */
  readonly drivePower: number;
  /** Fuel mass flow ṁ/afr (kg/s). */
  readonly fuelMassFlow: number;
  /** Engine power before the blower drive is taken off, ṁ/(afr·bsfc) (W). */
  readonly grossPower: number;
  /** Gross power minus drive power (W). */
  readonly netPower: number;
  /** Net torque at the crank (N·m). */
  readonly torque: number;
  /** Injector duty cycle (fraction), null without injector data. */
  readonly injectorDuty: number | null;
  /** Engine volumetric efficiency used at this speed (fraction). */
  readonly engineVolumetricEfficiency: number;
  /**
   * VE the engine shows referenced to manifold pressure and temperature, with the charge
   * temperature, residual gas and port cooling refinements applied (fraction): the mass
   * balance is ṁ = Pm/(R·Tm)·Vd·(N/120)·this.
   */
  readonly effectiveVolumetricEfficiency: number;
  /** Blower discharge absolute pressure, before any intercooler (Pa). */
  readonly dischargePressure: number;
  /** Blower inlet absolute pressure after the fixed and the flow-dependent inlet loss (Pa). */
  readonly blowerInletPressure: number;
  /** Engine airflow expressed at blower inlet pressure and ambient temperature (m³/s; shown as cfm). */
  readonly inletAirflow: number;
  /** False when the point lies outside the model's range (see rangeReasons); show no figures then. */
  readonly withinRange: boolean;
  /** Why the point is outside the model's range (empty when within it). */
  readonly rangeReasons: RangeReason[];
}

/** Constants of one validated combination, computed once per entry-point call. */
export interface PreparedCombination {
  /** The validated combination (SI). */
  readonly combination: Combination;
  /** Ambient absolute pressure (Pa). */
  readonly p0: number;
  /** Ambient temperature (K). */
  readonly t0: number;
  /** Blower inlet pressure before any flow-dependent restriction (Pa). */
  readonly p1: number;
  /** Blower inlet temperature, after any fuel evaporated ahead of it (K). */
  readonly t1: number;
  /** Blower inlet density (kg/m³). */
  readonly rho1: number;
  /** Slip coefficient (m³/(s·√Pa)). */
  readonly ks: number;
  /** Blower displacement (m³/rev). */
  readonly vb: number;
  /** 1/Vi (dimensionless). */
  readonly invVi: number;
  /** (PRi^κ − 1)/κ − PRi/Vi, so that w/P1 = workOffset + PR/Vi (dimensionless). */
  readonly workOffset: number;
  /** Built-in volume ratio (dimensionless). */
  readonly vi: number;
  /** Drive ratio (dimensionless). */
  readonly ratio: number;
  /** Blower speed per engine speed r·(1 − s) (dimensionless). */
  readonly speedFactor: number;
  /** Intercooler effectiveness, 0 without one (fraction). */
  readonly eps: number;
  /** Intercooler pressure drop, 0 without one (Pa). */
  readonly dpic: number;
  /** Intercooler coolant temperature (K). */
  readonly tcool: number;
  /** Cooling of the charge by fuel evaporated inside the blower (K). */
  readonly blowerCooling: number;
  /** Cooling of the trapped charge by fuel evaporated in the port (K). */
  readonly portCooling: number;
  /** Exponent n of the charge temperature in the trapped mass (dimensionless). */
  readonly tempExponent: number;
  /** Temperature the VE curve refers to: ambient (K). */
  readonly tref: number;
  /** 1/(γ·(rc − 1)), 0 without residual gas (dimensionless). */
  readonly residualK: number;
  /** Exhaust absolute pressure (Pa). */
  readonly pe: number;
  /** 1/(ideal-cycle VE factor unboosted at ambient pressure) (dimensionless). */
  readonly residualRefInv: number;
  /** Flow-dependent inlet loss ΔP = this·Q0², 0 without a rated restriction (Pa·s²/m⁶). */
  readonly restrictionK: number;
  /** Ambient density, at which the restriction's flow is counted (kg/m³). */
  readonly rho0: number;
}

/** Temperature drop of a charge by fuel evaporating, L·x/(afr·cp) (fraction, – → K). */
export function evaporativeCooling(fraction: number, afr: number): number {
  return (GASOLINE_LATENT_HEAT * fraction) / (afr * SPECIFIC_HEAT_CP);
}

/** Prepare a validated combination, optionally with another blower pulley diameter (m). */
export function prepare(c: Combination, blowerPulleyDiameter = c.drive.blowerPulleyDiameter): PreparedCombination {
  const p0 = c.ambient.pressure;
  const t0 = c.ambient.temperature;
  const p1 = p0 - c.ambient.inletLoss;
  const t1 = t0 - evaporativeCooling(c.fuel.evaporatedBeforeBlower, c.fuel.afr);
  const vi = c.blower.builtInVolumeRatio;
  const pri = builtInPressureRatio(vi);
  const ratio = driveRatioUnchecked(c.drive.crankPulleyDiameter, blowerPulleyDiameter);
  const ic = c.intercooler;
  const e = c.engine;
  const rc = e.compressionRatio ?? REFINEMENT_DEFAULTS.compressionRatio;
  const residualK = rc == null ? 0 : 1 / (GAMMA * (rc - 1));
  const pe = p0 + (e.exhaustBackPressure ?? REFINEMENT_DEFAULTS.exhaustBackPressure);
  const restriction = c.ambient.inletRestriction;
  return {
    combination: c,
    p0,
    t0,
    p1,
    t1,
    rho1: p1 / (GAS_CONSTANT * t1),
    ks: slipCoefficient(c.blower.displacementPerRev, c.blower.volumetricEfficiencyRef, c.blower.referenceRpm),
    vb: c.blower.displacementPerRev,
    vi,
    invVi: 1 / vi,
    workOffset: (pri ** KAPPA - 1) / KAPPA - pri / vi,
    ratio,
    speedFactor: ratio * (1 - c.drive.beltSlip),
    eps: ic ? ic.effectiveness : 0,
    dpic: ic ? ic.pressureDrop : 0,
    tcool: ic ? ic.coolantTemperature : t0,
    blowerCooling: evaporativeCooling(c.fuel.evaporatedInBlower ?? REFINEMENT_DEFAULTS.evaporatedInBlower, c.fuel.afr),
    portCooling: evaporativeCooling(c.fuel.evaporatedInPort ?? REFINEMENT_DEFAULTS.evaporatedInPort, c.fuel.afr),
    tempExponent: e.chargeTemperatureExponent ?? REFINEMENT_DEFAULTS.chargeTemperatureExponent,
    tref: t0,
    residualK,
    pe,
    residualRefInv: 1 / (1 - (pe / p0 - 1) * residualK),
    restrictionK: restriction ? (restriction.ratingDepression ?? REFINEMENT_DEFAULTS.ratingDepression) / restriction.ratedFlow ** 2 : 0,
    rho0: p0 / (GAS_CONSTANT * t0),
  };
}

/**
 * Temperature at which the engine's demand counts the charge's density (K): Tref·(Tc/Tref)^n
 * with Tc the trapped charge's temperature. n = 1 is the plain density; n < 1 lets VE rise
 * with a hotter charge, as heat picked up in port and cylinder matters less (Heywood ch. 6).
 */
function demandTemperature(n: number, tref: number, tc: number): number {
  if (n === 1) return tc;
  if (n === 0.5) return Math.sqrt(tc * tref);
  return tref * (tc / tref) ** n;
}

/**
 * Ideal-cycle residual-gas factor on VE at a manifold pressure, relative to unboosted at
 * ambient (Heywood ch. 6: ηv = 1 − (Pe/Pi − 1)/(γ·(rc − 1))) (dimensionless; 1 when off).
 */
function residualFactor(residualK: number, pe: number, refInv: number, pm: number): number {
  return residualK === 0 ? 1 : (1 - (pe / pm - 1) * residualK) * refInv;
}

/** VE the engine shows referenced to manifold pressure and temperature, all refinements included (fraction). */
export function effectiveVe(p: PreparedCombination, ve: number, pm: number, tm: number): number {
  const tc = tm - p.portCooling;
  return (ve * residualFactor(p.residualK, p.pe, p.residualRefInv, pm) * tm) / demandTemperature(p.tempExponent, p.tref, tc);
}

/** The same prepared combination with another blower inlet pressure (Pa), for a flow-dependent restriction. */
function withInletPressure(p: PreparedCombination, p1: number): PreparedCombination {
  return { ...p, p1, rho1: p1 / (GAS_CONSTANT * p.t1) };
}

/** State of blower and engine at one engine speed and one trial pressure ratio (SI). */
export interface TrialState {
  /** Swept flow Vb·Nb/60 (m³/s). */
  sweptFlow: number;
  /** Delivered flow at inlet conditions (m³/s). */
  deliveredFlow: number;
  /** Blower mass flow (kg/s). */
  massFlow: number;
  /** w/P1 (dimensionless). */
  workRatio: number;
  /** Shaft power into the air (W). */
  airPower: number;
  /** Discharge temperature (K). */
  t2: number;
  /** Manifold temperature (K). */
  tm: number;
  /** Discharge pressure (Pa). */
  p2: number;
  /** Manifold pressure (Pa). */
  pm: number;
}

/** Blower side of the balance at a pressure ratio: delivery, work and temperatures (m³/s swept → SI state). */
export function blowerState(p: PreparedCombination, sweptFlow: number, pr: number, out: TrialState): TrialState {
  const p2 = pr * p.p1;
  const dp = p2 - p.p1;
  const slip = dp >= 0 ? p.ks * Math.sqrt(dp) : -p.ks * Math.sqrt(-dp);
  const delivered = sweptFlow - slip;
  const massFlow = p.rho1 * delivered;
  const workRatio = p.workOffset + pr * p.invVi;
  const airPower = (workRatio * p.p1 * sweptFlow) / p.combination.blower.internalEfficiency;
  const t2 = p.t1 + airPower / (massFlow * SPECIFIC_HEAT_CP) - p.blowerCooling;
  out.sweptFlow = sweptFlow;
  out.deliveredFlow = delivered;
  out.massFlow = massFlow;
  out.workRatio = workRatio;
  out.airPower = airPower;
  out.t2 = t2;
  out.tm = t2 - p.eps * (t2 - p.tcool);
  out.p2 = p2;
  out.pm = p2 - p.dpic;
  return out;
}

/** What is wrong when the restriction would lose more than half the ambient pressure (solver and calibration). */
export const RESTRICTION_TOO_SMALL = "the throttle body or carburettor would lose more than half the ambient pressure; its rated flow is far too small for this engine.";

/**
 * Blower inlet pressure behind a flow-dependent restriction (Pa): the root of
 * x − (P1 − K·Q0(x)²), with Q0(x) the delivery at ambient density when the blower's inlet is at
 * x (`massFlowAt` gives it in kg/s). More inlet pressure means more delivery and more loss, so
 * the left side rises with x and has one root. One plain pass from P1 lands at or below it, so
 * Brent brackets it between that pass and P1, and the balance is only solved near its answer
 * (at half the ambient a slow blower behind a large intercooler drop may not balance at all).
 * A plain fixed point would not do: its slope is about −2·loss/x, so it oscillates without
 * settling once the loss passes a third of the inlet pressure. Null when even at half the
 * ambient pressure the loss is more than the rest.
 */
function settledInletPressure(p: PreparedCombination, rpm: number, massFlowAt: (p1: number) => number): number | null {
  const excess = (k: typeof p, x: number): number => {
    const q0 = massFlowAt(x) / k.rho0;
    return x - (k.p1 - k.restrictionK * q0 * q0);
  };
  const half = 0.5 * p.p0;
  const atP1 = excess(p, p.p1);
  let a = Math.max(p.p1 - atP1, half);
  let fa = excess(p, a);
  // Above the root only by rounding, or if the loss did not rise with x: then half the ambient decides.
  if (fa > 0 && a > half) fa = excess(p, (a = half));
  if (fa > 0) return null;
  const r = brent(excess, p, a, p.p1, fa, atP1, SOLVER_RELATIVE_TOLERANCE, SOLVER_MAX_ITERATIONS);
  if (!r.converged) throw new CalcConvergenceError(`At ${Math.round(rpm)} rpm the inlet restriction's loss did not settle.`, "not-converged", rpm, "ambient.inletRestriction");
  return r.root;
}

/**
 * Blower state that yields a given manifold pressure (Pa) at an engine speed (rev/min), with
 * the inlet pressure behind any flow-dependent restriction settled; returns the prepared
 * combination at that inlet pressure (its state is in `out`), or null when the restriction
 * would lose more than half the ambient pressure. Used where boost is measured.
 */
export function blowerStateAtManifold(p: PreparedCombination, rpm: number, pm: number, out: TrialState): PreparedCombination | null {
  const sweptFlow = (p.vb * rpm * p.speedFactor) / 60;
  const at = (q: PreparedCombination) => blowerState(q, sweptFlow, (pm + q.dpic) / q.p1, out);
  if (p.restrictionK === 0) {
    at(p);
    return p;
  }
  const p1 = settledInletPressure(p, rpm, (x) => at(withInletPressure(p, x)).massFlow);
  if (p1 === null) return null;
  const q = withInletPressure(p, p1);
  at(q);
  return q;
}

/** A zeroed trial state to fill. */
export function newState(): TrialState {
  return { sweptFlow: 0, deliveredFlow: 0, massFlow: 0, workRatio: 0, airPower: 0, t2: 0, tm: 0, p2: 0, pm: 0 };
}

/** Assemble the operating point from a converged state (SI). */
export function pointFromState(p: PreparedCombination, rpm: number, blowerRpm: number, ve: number, pr: number, s: TrialState): OperatingPoint {
  const c = p.combination;
  const etaInt = c.blower.internalEfficiency;
  const flowRatio = s.sweptFlow / s.deliveredFlow;
  // ηad = T1(PR^κ − 1)/(T2 − T1) with T2 − T1 = κ·T1·(w/P1)·(Qs/Q1)/ηint. PR^κ − 1 is taken as
  // expm1(κ·log1p(PR − 1)), exact to rounding however close PR is to 1, where a Roots blower's
  // w/P1 = PR − 1 is exact too; at PR = 1 itself (0/0) it takes its limit, 1.
  // Fuel evaporating in the blower cools the charge but is no part of the blower's efficiency.
  const idealOverActual = p.vi === 1 && pr === 1 ? 1 : Math.expm1(KAPPA * Math.log1p(pr - 1)) / KAPPA / s.workRatio;
  const adiabaticEfficiency = (idealOverActual * etaInt) / flowRatio;
  const drivePower = s.airPower / c.blower.mechanicalEfficiency;
  const fuelMassFlow = s.massFlow / c.fuel.afr;
  const grossPower = fuelMassFlow / c.fuel.bsfc;
  const netPower = grossPower - drivePower;
  const injectorDuty =
    c.fuel.injectorCount != null && c.fuel.injectorFlow != null
      ? fuelMassFlow / (c.fuel.injectorCount * c.fuel.injectorFlow)
      : null;
  const point: OperatingPoint = {
    rpm,
    driveRatio: p.ratio,
    blowerRpm,
    pressureRatio: pr,
    manifoldPressure: s.pm,
    boostGauge: s.pm - p.p0,
    blowerVolumetricEfficiency: s.deliveredFlow / s.sweptFlow,
    adiabaticEfficiency,
    dischargeTemperature: s.t2,
    manifoldTemperature: s.tm,
    airMassFlow: s.massFlow,
    drivePower,
    fuelMassFlow,
    grossPower,
    netPower,
    torque: netPower / ((2 * Math.PI * rpm) / 60),
    injectorDuty,
    engineVolumetricEfficiency: ve,
    effectiveVolumetricEfficiency: effectiveVe(p, ve, s.pm, s.tm),
    dischargePressure: s.p2,
    blowerInletPressure: p.p1,
    inletAirflow: (s.massFlow * GAS_CONSTANT * p.t0) / p.p1,
    withinRange: true,
    rangeReasons: NO_REASONS,
  };
  const reasons = rangeReasonsOf(pr, s.tm, blowerRpm, c.blower.maxRpm);
  if (reasons.length > 0) return { ...point, withinRange: false, rangeReasons: reasons };
  return point;
}

const kpa = (pa: number): string => (pa / 1000).toFixed(1);

/** Everything the balance's surplus needs at one engine speed (SI). */
// Fields as in PreparedCombination, plus the two per-speed factors below.
interface SurplusContext {
  p1: number;
  ks: number;
  rho1: number;
  t1: number;
  workOffset: number;
  invVi: number;
  eps: number;
  tcool: number;
  dpic: number;
  blowerCooling: number;
  portCooling: number;
  tempExponent: number;
  tref: number;
  residualK: number;
  pe: number;
  residualRefInv: number;
  sweptFlow: number;
  /** P1·Qs/ηint, so that Pair = (w/P1)·this (W). */
  airPowerPerWorkRatio: number;
  /** Vd·(N/120)·VE/R, so that ṁe = (Pm/Td)·residual factor·this (kg·K/(s·Pa)). */
  demandFactor: number;
}

/** Surplus ṁ − ṁe at a pressure ratio (kg/s): blowerState's and effectiveVe's arithmetic, inlined for the hot loop. */
function surplusAt(k: SurplusContext, pr: number): number {
  const dp = pr * k.p1 - k.p1;
  const slip = dp >= 0 ? k.ks * Math.sqrt(dp) : -k.ks * Math.sqrt(-dp);
  const massFlow = k.rho1 * (k.sweptFlow - slip);
  const t2 = k.t1 + ((k.workOffset + pr * k.invVi) * k.airPowerPerWorkRatio) / (massFlow * SPECIFIC_HEAT_CP) - k.blowerCooling;
  const tm = t2 - k.eps * (t2 - k.tcool);
  const pm = pr * k.p1 - k.dpic;
  const td = demandTemperature(k.tempExponent, k.tref, tm - k.portCooling);
  return massFlow - (pm / td) * residualFactor(k.residualK, k.pe, k.residualRefInv, pm) * k.demandFactor;
}

/** Surplus as a function of u = sign(PR − 1)·√|PR − 1| (kg/s). */
function surplusAtU(k: SurplusContext, u: number): number {
  return surplusAt(k, 1 + u * Math.abs(u));
}

/** u = sign(PR − 1)·√|PR − 1|, in which the orifice-law slip is linear (dimensionless); PR = 1 + u·|u|. */
export function toU(pr: number): number {
  return pr >= 1 ? Math.sqrt(pr - 1) : -Math.sqrt(1 - pr);
}

function tooSlowError(rpm: number, blowerRpm: number, floorPressure: number): CalcConvergenceError {
  return new CalcConvergenceError(
    `At ${Math.round(rpm)} rpm the blower (${Math.round(blowerRpm)} rpm) cannot feed the engine: manifold pressure would fall below ${kpa(floorPressure)} kPa. Choose a smaller blower pulley or a larger blower.`,
    "blower-too-slow",
    rpm,
    "drive.blowerPulleyDiameter",
    { blowerRpm, floorPressure },
  );
}

/**
 * Solve one engine speed of a prepared combination (unchecked). Finds the lowest pressure
 * ratio at which blower delivery falls to engine demand: the stable balance. Above it the
 * surplus is negative; a second, unstable crossing can exist near the dead-head ratio where
 * the charge grows very hot, and is not the answer.
 */
export function solvePrepared(p: PreparedCombination, rpm: number): OperatingPoint {
  if (p.restrictionK === 0) return solveAtInletPressure(p, rpm);
  const p1 = settledInletPressure(p, rpm, (x) => solveAtInletPressure(withInletPressure(p, x), rpm).airMassFlow);
  if (p1 === null) throw new CalcConvergenceError(`At ${Math.round(rpm)} rpm ${RESTRICTION_TOO_SMALL}`, "no-balance", rpm, "ambient.inletRestriction.ratedFlow");
  return solveAtInletPressure(withInletPressure(p, p1), rpm);
}

/** Solve one engine speed at the prepared combination's blower inlet pressure (unchecked). */
function solveAtInletPressure(p: PreparedCombination, rpm: number): OperatingPoint {
  const c = p.combination;
  const blowerRpm = rpm * p.speedFactor;
  const sweptFlow = (p.vb * blowerRpm) / 60;
  const ve = veAt(c.engine.veCurve, rpm);
  const k: SurplusContext = {
    p1: p.p1,
    ks: p.ks,
    rho1: p.rho1,
    t1: p.t1,
    workOffset: p.workOffset,
    invVi: p.invVi,
    eps: p.eps,
    tcool: p.tcool,
    dpic: p.dpic,
    blowerCooling: p.blowerCooling,
    portCooling: p.portCooling,
    tempExponent: p.tempExponent,
    tref: p.tref,
    residualK: p.residualK,
    pe: p.pe,
    residualRefInv: p.residualRefInv,
    sweptFlow,
    airPowerPerWorkRatio: (p.p1 * sweptFlow) / c.blower.internalEfficiency,
    demandFactor: engineAirflowUnchecked(c.engine.displacement, rpm, ve) / GAS_CONSTANT,
  };

  // Bracket: scan upward from a floor (manifold at 5 % of inlet pressure) to the first point
  // where the surplus turns negative, stopping just short of the dead-head ratio.
  const lo = PRESSURE_RATIO_FLOOR_MARGIN + p.dpic / p.p1;
  const deadHead = p.ks > 0 ? 1 + (sweptFlow / p.ks) ** 2 / p.p1 : Number.POSITIVE_INFINITY;
  const ceilingIsDeadHead = deadHead <= PRESSURE_RATIO_CEILING;
  const hi = ceilingIsDeadHead ? 1 + (deadHead - 1) * (1 - 1e-9) : PRESSURE_RATIO_CEILING;
  if (hi <= lo) throw tooSlowError(rpm, blowerRpm, lo * p.p1 - p.dpic);
  let a = lo;
  let fa = surplusAt(k, lo);
  if (!(fa > 0)) throw tooSlowError(rpm, blowerRpm, lo * p.p1 - p.dpic);
  let b = lo < 1 ? 1 : lo * BRACKET_SCAN_FACTOR;
  let fb: number;
  for (;;) {
    if (b >= hi) b = hi;
    fb = surplusAt(k, b);
    if (!Number.isFinite(fb)) {
      throw new CalcConvergenceError(`At ${Math.round(rpm)} rpm the balance could not be evaluated at pressure ratio ${b.toFixed(3)}.`, "not-converged", rpm);
    }
    if (fb <= 0) break;
    if (b === hi) {
      throw new CalcConvergenceError(
        ceilingIsDeadHead
          ? `At ${Math.round(rpm)} rpm the blower reaches its dead-head pressure ratio (${deadHead.toFixed(2)}) before the engine swallows its delivery: the charge heats faster than the engine can take it, so the model finds no stable balance. The blower is far too large or too fast for this engine; check the blower data and drive ratio.`
          : `At ${Math.round(rpm)} rpm no balance exists below pressure ratio ${PRESSURE_RATIO_CEILING}: the blower is far too large or too fast for this engine. Check the blower data and drive ratio.`,
        "no-balance",
        rpm,
        "drive.blowerPulleyDiameter",
      );
    }
    a = b;
    fa = fb;
    b *= BRACKET_SCAN_FACTOR;
  }
  // Refine in u, where the surplus is smooth through PR = 1 (√ΔP has an infinite slope in PR
  // there). |δPR| ≤ 2·|PR − 1|·|δu/u|, so the relative tolerance on u bounds the one on PR.
  const ru = brent(surplusAtU, k, toU(a), toU(b), fa, fb, SOLVER_RELATIVE_TOLERANCE, SOLVER_MAX_ITERATIONS, 1e-16);
  if (!ru.converged) {
    throw new CalcConvergenceError(
      `At ${Math.round(rpm)} rpm the solver did not converge on a pressure ratio between ${a.toFixed(4)} and ${b.toFixed(4)}.`,
      "not-converged",
      rpm,
    );
  }
  const pr = 1 + ru.root * Math.abs(ru.root);
  const state = blowerState(p, sweptFlow, pr, newState());
  return pointFromState(p, rpm, blowerRpm, ve, pr, state);
}

/** Solve every engine speed of a prepared combination (unchecked). */
export function boostCurvePrepared(p: PreparedCombination, rpms: readonly number[]): OperatingPoint[] {
  const out = new Array<OperatingPoint>(rpms.length);
  for (let i = 0; i < rpms.length; i++) out[i] = solvePrepared(p, rpms[i]);
  return out;
}

/** Operating point of a combination at an engine speed (rev/min); throws CalcInputError or CalcConvergenceError. */
export function solvePoint(combination: CombinationInput, rpm: number): OperatingPoint {
  const c = parseOrThrow(combinationSchema, combination);
  return solvePrepared(prepare(c), parseOrThrow(rpmSchema, rpm, "rpm"));
}

/** Operating points at each engine speed (rev/min), in the order given. */
export function boostCurve(combination: CombinationInput, rpms: readonly number[]): OperatingPoint[] {
  const c = parseOrThrow(combinationSchema, combination);
  return boostCurvePrepared(prepare(c), parseOrThrow(rpmListSchema, rpms, "rpms"));
}

/** Ratio-rule manifold pressure P1·Vb·Nb/(Vd·(N/2)·VE) of a prepared combination (Pa, absolute). */
export function idealRatioRulePrepared(p: PreparedCombination, rpm: number): number {
  const c = p.combination;
  const blowerRpm = rpm * p.speedFactor;
  // Both flows per second: the blower's swept Vb·Nb/60 over the engine's Vd·(N/120)·VE.
  return (p.p1 * ((p.vb * blowerRpm) / 60)) / engineAirflowUnchecked(c.engine.displacement, rpm, veAt(c.engine.veCurve, rpm));
}

/** The trade's closed-form ratio rule Pm = P1·Vb·Nb/(Vd·(N/2)·VE) at an engine speed (rev/min → Pa, absolute). */
export function idealRatioRuleManifoldPressure(combination: CombinationInput, rpm: number): number {
  const c = parseOrThrow(combinationSchema, combination);
  return idealRatioRulePrepared(prepare(c), parseOrThrow(rpmSchema, rpm, "rpm"));
}
