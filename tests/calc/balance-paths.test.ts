// The balance on the paths the property tests seldom take: charge-temperature exponents other
// than 0.5 and 1, fuel evaporating in the blower and the port, a manifold below ambient (PR < 1),
// a blower too slow to feed the engine, and an inlet restriction, in the solver and in
// calibration. Each is checked against calc/README.md's equations restated by hand (R = 287.05,
// cp = R/κ); the engines are invented test cases.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { CalcConvergenceError, INTERCOOLER_DEMO_DEFAULTS, boostCurve, calibrateVe, exampleCombination, exampleTwinScrewCombination, solvePoint, type Combination } from "@/calc";
import { blowerState, effectiveVe, newState, pointFromState, prepare, solvePrepared, toU } from "@/calc/solve";
import { KAPPA_MODEL, R_MODEL, combinationArb, relDiff, rpmArb, veOf } from "./support/arbitraries";
import { thrown } from "../support/thrown";
import { inputError } from "./support/input-error";

const base = exampleCombination();
const CP = R_MODEL / KAPPA_MODEL;

/** Engine demand ṁe = Pm/(R·Td)·Vd·(N/120)·VE with Td = T0·((Tm − ΔTport)/T0)^n (calc/README.md step 7). */
function demand(c: Combination, rpm: number, pm: number, tm: number, n = 0.5, portCooling = 0): number {
  const t0 = c.ambient.temperature;
  const td = t0 * ((tm - portCooling) / t0) ** n;
  return (pm / (R_MODEL * td)) * c.engine.displacement * (rpm / 120) * veOf(c.engine.veCurve, rpm);
}

const convergenceError = (f: () => unknown): CalcConvergenceError => thrown(CalcConvergenceError, f);

describe("the balance holds on the less travelled paths", () => {
  it.each([0, 0.25, 0.75])("with a charge temperature exponent n = %s", (n) => {
    const c: Combination = { ...base, engine: { ...base.engine, chargeTemperatureExponent: n } };
    for (const rpm of [2000, 4500, 6500]) {
      const p = solvePoint(c, rpm);
      expect(relDiff(p.airMassFlow, demand(c, rpm, p.manifoldPressure, p.manifoldTemperature, n))).toBeLessThan(1e-9);
    }
  });

  it("with fuel evaporating in the blower (draw-through) and in the port", () => {
    const c: Combination = { ...base, fuel: { ...base.fuel, evaporatedInBlower: 0.5, evaporatedInPort: 0.3 } };
    const cooling = (x: number) => (350e3 * x) / (c.fuel.afr * CP); // L·x/(afr·cp), L ≈ 350 kJ/kg (from memory)
    for (const rpm of [2500, 5500]) {
      const p = solvePoint(c, rpm);
      expect(relDiff(p.airMassFlow, demand(c, rpm, p.manifoldPressure, p.manifoldTemperature, 0.5, cooling(0.3)))).toBeLessThan(1e-9);
      // The discharge temperature by the energy balance, less the blower's share of evaporation:
      // T2 = T1 + (PR − 1)·P1·Qs/(ηint·ṁ·cp) − ΔT (a Roots blower: w/P1 = PR − 1).
      const qs = (c.blower.displacementPerRev * p.blowerRpm) / 60;
      const t2 = c.ambient.temperature + ((p.pressureRatio - 1) * p.blowerInletPressure * qs) / (c.blower.internalEfficiency * p.airMassFlow * CP) - cooling(0.5);
      expect(relDiff(p.dischargeTemperature, t2)).toBeLessThan(1e-9);
    }
  });

  it("below ambient (PR < 1): a large blower pulley at low speed", () => {
    const c: Combination = { ...base, drive: { ...base.drive, blowerPulleyDiameter: 0.3 } };
    const p = solvePoint(c, 2000);
    expect(p.pressureRatio).toBeLessThan(1);
    expect(relDiff(p.airMassFlow, demand(c, 2000, p.manifoldPressure, p.manifoldTemperature))).toBeLessThan(1e-9);
  });
});

describe("the balance the solver returns is the lowest one", () => {
  it("no pressure ratio between the search floor and the answer balances (property)", () => {
    // Above the stable balance a second, unstable one can exist near dead-head (calc/README.md);
    // the answer must be the first where delivery falls to the engine's demand. The surplus is
    // taken as the model defines it (blowerState, effectiveVe), at 40 ratios below the answer.
    fc.assert(
      fc.property(combinationArb, rpmArb, (c, rpm) => {
        const answer = solvePoint(c, rpm);
        const p = prepare(c);
        const swept = (p.vb * rpm * p.speedFactor) / 60;
        const demandFactor = (c.engine.displacement * rpm * veOf(c.engine.veCurve, rpm)) / 120 / R_MODEL;
        const floor = 0.05 + p.dpic / p.p1;
        for (let i = 0; i < 40; i++) {
          const pr = floor + ((answer.pressureRatio - floor) * i) / 40;
          const s = blowerState(p, swept, pr, newState());
          const surplus = s.massFlow - (s.pm / s.tm) * effectiveVe(p, 1, s.pm, s.tm) * demandFactor;
          expect(surplus, `PR ${pr}`).toBeGreaterThan(0);
        }
      }),
      { numRuns: 200 },
    );
  });
});

describe("no stable balance: which limit the message names", () => {
  // Dead-head by hand (calc/README.md step 3): Ks = (1 − ηv,ref)·Vb·Nref/60/√(101 325·0.5), the
  // swept flow Qs = Vb·Nb/60 with Nb = N·(crank/blower)·(1 − slip), and PRdh = 1 + (Qs/Ks)²/P1.
  const deadHeadOf = (c: Combination, rpm: number) => {
    const ks = ((1 - c.blower.volumetricEfficiencyRef) * c.blower.displacementPerRev * c.blower.referenceRpm) / 60 / Math.sqrt(101_325 * 0.5);
    const qs = (c.blower.displacementPerRev * rpm * (c.drive.crankPulleyDiameter / c.drive.blowerPulleyDiameter) * (1 - c.drive.beltSlip)) / 60;
    return 1 + (qs / ks) ** 2 / (c.ambient.pressure - c.ambient.inletLoss);
  };
  // The plain density (n = 1) and no intercooler, where the charge heats fastest (calc/README.md).
  const plain = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, chargeTemperatureExponent: 1 } });

  it("the dead-head ratio, when slip sets one below pressure ratio 50", () => {
    // A leaky demo blower on a 0.5 L engine at 1000 rpm with a 30 mm pulley (invented test case).
    const c = plain({ ...base, engine: { ...base.engine, displacement: 0.0005 }, blower: { ...base.blower, volumetricEfficiencyRef: 0.3 }, drive: { ...base.drive, blowerPulleyDiameter: 0.03 } });
    const deadHead = deadHeadOf(c, 1000);
    expect(deadHead).toBeLessThan(50);
    const e = convergenceError(() => solvePoint(c, 1000));
    expect(e.message).toBe(
      `At 1000 rpm the blower reaches its dead-head pressure ratio (${deadHead.toFixed(2)}) before the engine swallows its delivery: the charge heats faster than the engine can take it, so the model finds no stable balance. The blower is far too large or too fast for this engine; check the blower data and drive ratio.`,
    );
    expect([e.reason, e.field]).toEqual(["no-balance", "drive.blowerPulleyDiameter"]);
  });

  it("pressure ratio 50, when the blower does not leak", () => {
    // A slip-free demo blower (ηv,ref = 1: no dead-head) at 5000 rpm with a 30 mm pulley.
    const c = plain({ ...base, blower: { ...base.blower, volumetricEfficiencyRef: 1 }, drive: { ...base.drive, blowerPulleyDiameter: 0.03 } });
    const e = convergenceError(() => solvePoint(c, 5000));
    expect(e.message).toBe("At 5000 rpm no balance exists below pressure ratio 50: the blower is far too large or too fast for this engine. Check the blower data and drive ratio.");
    expect([e.reason, e.field]).toEqual(["no-balance", "drive.blowerPulleyDiameter"]);
  });
});

describe("the balance in thin air behind an intercooler that loses more than the inlet pressure", () => {
  it("still holds when the search must start above pressure ratio 1", () => {
    // 40 kPa ambient (about 7 km up) and a 50 kPa intercooler drop: the manifold is only above 0
    // once the blower passes PR (0.05·P1 + 50 kPa)/P1 ≈ 1.35, so the search starts there.
    const c: Combination = { ...base, ambient: { ...base.ambient, pressure: 40_000 }, intercooler: { ...INTERCOOLER_DEMO_DEFAULTS, pressureDrop: 50_000 } };
    for (const rpm of [2500, 5000]) {
      const p = solvePoint(c, rpm);
      expect(p.dischargePressure - p.manifoldPressure).toBeCloseTo(50_000, 6);
      expect(relDiff(p.airMassFlow, demand(c, rpm, p.manifoldPressure, p.manifoldTemperature))).toBeLessThan(1e-9);
    }
  });
});

describe("a twin-screw blower at pressure ratio exactly 1", () => {
  it("has adiabatic efficiency 0: it compresses inside and blows back, doing work for no rise", () => {
    // Ideal work at PR 1 is 0 while the built-in compression's is not (calc/README.md step 4), so
    // ηad = 0, where a Roots blower's 0/0 has the limit ηint·Qd/Qs (below).
    const c = exampleTwinScrewCombination();
    expect(c.blower.builtInVolumeRatio).toBeGreaterThan(1);
    const p = prepare(c);
    const swept = (p.vb * 3000 * p.speedFactor) / 60;
    const s = blowerState(p, swept, 1, newState());
    expect(s.workRatio).toBeGreaterThan(0);
    expect(pointFromState(p, 3000, 3000 * p.speedFactor, 0.85, 1, s).adiabaticEfficiency).toBe(0);
  });
});

describe("the solver's variable u = sign(PR − 1)·√|PR − 1|", () => {
  it.each([
    [0.75, -0.5],
    [1, 0],
    [1.25, 0.5],
    [5, 2],
  ])("PR %s is u %s, and back", (pr, u) => {
    expect(toU(pr)).toBeCloseTo(u, 15);
    expect(1 + toU(pr) * Math.abs(toU(pr))).toBe(pr);
  });
});

describe("a blower too slow to feed the engine", () => {
  // The floor the solver searches from is a manifold at 5 % of the blower inlet pressure, with or
  // without an intercooler's drop after the blower: 0.05 × (101 325 − 1 500) Pa = 4.99 kPa.
  const starved: Combination = {
    ...base,
    engine: { ...base.engine, displacement: 0.02 },
    blower: { ...base.blower, displacementPerRev: 0.0001 },
    drive: { ...base.drive, crankPulleyDiameter: 0.03, blowerPulleyDiameter: 0.5 },
  };
  it.each([
    ["without an intercooler", null],
    ["with an intercooler", { ...INTERCOOLER_DEMO_DEFAULTS }],
  ])("names the blower speed and the floor, %s", (_, intercooler) => {
    const e = convergenceError(() => solvePoint({ ...starved, intercooler }, 6000));
    // Blower speed 6000 × 0.03/0.5 × (1 − 0.02) = 352.8 rpm.
    expect(e.message).toBe(
      "At 6000 rpm the blower (353 rpm) cannot feed the engine: manifold pressure would fall below 5.0 kPa. Choose a smaller blower pulley or a larger blower.",
    );
    expect([e.reason, e.field]).toEqual(["blower-too-slow", "drive.blowerPulleyDiameter"]);
  });
  it("says so, too, when the blower dead-heads below that floor: thin air behind a lossy intercooler", () => {
    // 40 kPa ambient and a 50 kPa intercooler drop put the floor at PR 0.05 + 50/38.5 ≈ 1.35; a leaky
    // blower at 600 rpm dead-heads at about PR 1.04, so no ratio it can hold reaches the floor.
    const c: Combination = {
      ...base,
      engine: { ...base.engine, chargeTemperatureExponent: 1 },
      ambient: { ...base.ambient, pressure: 40_000 },
      intercooler: { ...INTERCOOLER_DEMO_DEFAULTS, pressureDrop: 50_000 },
      blower: { ...base.blower, volumetricEfficiencyRef: 0.3 },
      drive: { ...base.drive, blowerPulleyDiameter: 0.1 },
    };
    const blowerRpm = 600 * (c.drive.crankPulleyDiameter / 0.1) * (1 - c.drive.beltSlip);
    const floor = 0.05 * (40_000 - c.ambient.inletLoss);
    const e = convergenceError(() => solvePoint(c, 600));
    expect(e.message).toBe(
      `At 600 rpm the blower (${Math.round(blowerRpm)} rpm) cannot feed the engine: manifold pressure would fall below ${(floor / 1000).toFixed(1)} kPa. Choose a smaller blower pulley or a larger blower.`,
    );
    expect(e.reason).toBe("blower-too-slow");
  });
});

describe("an inlet restriction (rated flow at 1.5 inHg, common practice, no published source)", () => {
  const restricted = (ratedFlow: number, c: Combination = base): Combination => ({ ...c, ambient: { ...c.ambient, inletRestriction: { ratedFlow } } });
  const ve2 = (c: Combination): Combination => ({ ...c, engine: { ...c.engine, veCurve: c.engine.veCurve.map((p) => ({ ...p, ve: 2 })) } });
  const p0 = base.ambient.pressure;
  const rho0 = p0 / (R_MODEL * base.ambient.temperature);
  const pAfterFixedLoss = p0 - base.ambient.inletLoss;
  /** calc/README.md: ΔP = ΔPrating·(Q0/Qrated)², Q0 = ṁ/ρ0 at ambient density, ΔPrating = 1.5 inHg = 5079 Pa. */
  const loss = (massFlow: number, ratedFlow: number) => 5079 * (massFlow / rho0 / ratedFlow) ** 2;
  /** Air mass flow of the balance with the blower's inlet held at x (Pa), the restriction set aside. */
  const massFlowAt = (c: Combination, rpm: number, x: number) => {
    const q = prepare(c);
    return solvePrepared({ ...q, p1: x, rho1: x / (R_MODEL * q.t1), restrictionK: 0 }, rpm).airMassFlow;
  };

  it("one far too small for the engine is refused, naming its rated flow", () => {
    // 0.04 m³/s (about 85 cfm) on a 4.6 L engine at VE 2 and 6000 rpm.
    const c = ve2(restricted(0.04));
    const e = convergenceError(() => solvePoint(c, 6000));
    expect(e.message).toBe("At 6000 rpm the throttle body or carburettor would lose more than half the ambient pressure; its rated flow is far too small for this engine.");
    expect([e.reason, e.field]).toEqual(["no-balance", "ambient.inletRestriction.ratedFlow"]);
    // Rightly: at every inlet pressure from half the ambient up, the loss that flow brings is
    // more than the pressure it leaves (x > P1 − ΔP), so none balances there.
    for (let x = p0 / 2; x <= pAfterFixedLoss; x += 1000) expect(x - (pAfterFixedLoss - loss(massFlowAt(c, 6000, x), 0.04)), `${x} Pa`).toBeGreaterThan(0);
  });

  it("one losing over a third of the inlet pressure settles where the loss and the flow agree", () => {
    // 0.08 m³/s at VE 2 and 6000 rpm: a plain fixed point on the inlet pressure oscillates here
    // (its slope is about −2·loss/P1, past −1), so this is where the bracketed solve earns its keep.
    const p = solvePoint(ve2(restricted(0.08)), 6000);
    const lost = pAfterFixedLoss - p.blowerInletPressure;
    expect(lost).toBeGreaterThan(pAfterFixedLoss / 3);
    expect(relDiff(lost, loss(p.airMassFlow, 0.08))).toBeLessThan(1e-9);
  });

  it("a nearly lossless one changes nothing where the blower would starve at half the ambient", () => {
    // The largest rated flow the schema takes (2 m³/s) in front of a leaky blower at 600 rpm behind
    // a 50 kPa intercooler drop: at half the ambient the search floor, PR 0.05 + 50/50.7 ≈ 1.04,
    // lies past the blower's dead-head (≈ 1.03), so the solve must stay near its answer, PR ≈ 1.006.
    const c: Combination = {
      ...base,
      intercooler: { ...INTERCOOLER_DEMO_DEFAULTS, pressureDrop: 50_000 },
      blower: { ...base.blower, volumetricEfficiencyRef: 0.3 },
      drive: { ...base.drive, blowerPulleyDiameter: 0.1 },
    };
    const open = solvePoint(c, 600);
    const p = solvePoint(restricted(2, c), 600);
    const lost = pAfterFixedLoss - p.blowerInletPressure;
    expect(lost).toBeGreaterThan(0);
    expect(relDiff(lost, loss(p.airMassFlow, 2))).toBeLessThan(1e-6);
    expect(relDiff(p.manifoldPressure, open.manifoldPressure)).toBeLessThan(1e-4);
  });

  it.each([
    ["without an intercooler", null],
    ["with an intercooler", { ...INTERCOOLER_DEMO_DEFAULTS }],
  ])("calibration sees the same loss, %s: logs from a restricted engine give back its VE curve", (_, intercooler) => {
    // The measured boost fixes the blower's delivery only once the inlet pressure behind the
    // restriction is settled (it depends on that delivery): a round trip to 1e-9.
    const truth = restricted(0.2, { ...base, intercooler });
    const rpms = [2500, 4500, 6500];
    const logged = boostCurve(truth, rpms).map((p) => ({ rpm: p.rpm, boostGauge: p.boostGauge }));
    const flat: Combination = { ...truth, engine: { ...truth.engine, veCurve: [{ rpm: 3000, ve: 1 }] } };
    const { veCurve } = calibrateVe(flat, logged);
    veCurve.forEach((p, i) => expect(relDiff(p.ve, veOf(truth.engine.veCurve, rpms[i])), `${p.rpm} rpm`).toBeLessThan(1e-9));
  });

  it("calibration refuses a logged boost at which the restriction would lose more than half the ambient pressure", () => {
    // 0.02 m³/s (about 40 cfm) in front of the demo blower at 6000 rpm and 50 kPa of boost.
    const e = inputError(() => calibrateVe(restricted(0.02), [{ rpm: 6000, boostGauge: 50_000 }]));
    expect(e.issues).toEqual([
      {
        field: "measured.0.boostGauge",
        message: "At the boost measured at 6000 rpm the throttle body or carburettor would lose more than half the ambient pressure; its rated flow is far too small for this engine.",
      },
    ]);
  });
});

describe("a Roots blower's adiabatic efficiency at a pressure ratio next to 1", () => {
  // (PR^κ − 1)/(κ·(PR − 1)) → 1 + (κ − 1)(PR − 1)/2 as PR → 1 (Taylor series, by hand): the
  // efficiency is then ηint·Qd/Qs times that, with no 0/0 at PR = 1 itself.
  const p = prepare(base);
  const swept = (p.vb * 3000 * p.speedFactor) / 60;
  const at = (pr: number) => {
    const s = blowerState(p, swept, pr, newState());
    return { eta: pointFromState(p, 3000, 3000 * p.speedFactor, 0.85, pr, s).adiabaticEfficiency, flow: s.deliveredFlow / s.sweptFlow };
  };
  it.each([1, 1 + 1e-12, 1 - 1e-9, 1 + 1e-6, 1.01])("PR = %s", (pr) => {
    const { eta, flow } = at(pr);
    const limit = 1 + ((KAPPA_MODEL - 1) * (pr - 1)) / 2;
    expect(relDiff(eta, base.blower.internalEfficiency * flow * limit)).toBeLessThan(pr === 1.01 ? 1e-4 : 1e-12);
  });
});
