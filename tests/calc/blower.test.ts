// The blower's helpers one by one (calc/README.md, steps 3–5): orifice-law slip, ideal-cycle
// work, dead-head ratio, discharge temperature by the energy balance and the equivalent
// adiabatic efficiency. Values worked by hand from the textbook relations named beside them.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  adiabaticEfficiency,
  builtInPressureRatio,
  compressionWorkPerVolume,
  deadHeadPressureRatio,
  dischargeTemperature,
  isentropicTemperature,
  isentropicWorkPerVolume,
  slipCoefficient,
  slipFlow,
} from "@/calc";
import { relDiff } from "./support/arbitraries";

describe("slip", () => {
  it("sets Ks so that at the reference point (PR 1.5 from 101 325 Pa) the slip is (1 − ηv) of the swept flow", () => {
    // source: calc/README.md step 3 (the definition of Ks). 1 L/rev at 10 000 rpm sweeps
    // 0.16667 m³/s; 20 % of it, 0.033333 m³/s, through √50 662.5 Pa = 225.083: Ks = 1.48093e-4 (by hand).
    const ks = slipCoefficient(0.001, 0.8, 10_000);
    expect(ks).toBeCloseTo(1.48093e-4, 9);
    expect(relDiff(slipFlow(ks, 50_662.5), 0.2 * (0.001 * 10_000) / 60)).toBeLessThan(1e-12);
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 0.01, noNaN: true }), fc.double({ min: 0.3, max: 0.99, noNaN: true }), fc.double({ min: 1000, max: 20_000, noNaN: true }), (vb, eta, n) => {
        expect(relDiff(slipFlow(slipCoefficient(vb, eta, n), 101_325 * 0.5), ((1 - eta) * vb * n) / 60)).toBeLessThan(1e-12);
      }),
    );
  });

  it("follows the orifice law Ks·sign(ΔP)·√|ΔP|: back through the clearances, or forward when the outlet is lower", () => {
    // source: orifice equation, flow ∝ √ΔP (any fluid mechanics text); 2 × √100 = 20.
    expect(slipFlow(2, 100)).toBe(20);
    expect(slipFlow(2, -100)).toBe(-20);
    expect(slipFlow(2, 0)).toBe(0);
    expect(slipFlow(0.5, 400)).toBe(10);
  });

  it("dead-heads where the slip eats the whole swept flow, and never without slip", () => {
    // 1 + (0.1 / 1e-4)² / 1e5 = 1 + 10 = 11 (by hand); at that ratio the slip equals the swept flow.
    expect(deadHeadPressureRatio(0.1, 1e-4, 1e5)).toBeCloseTo(11, 12);
    expect(relDiff(slipFlow(1e-4, 1e5 * (deadHeadPressureRatio(0.1, 1e-4, 1e5) - 1)), 0.1)).toBeLessThan(1e-12);
    expect(deadHeadPressureRatio(0.1, 0, 1e5)).toBe(Number.POSITIVE_INFINITY);
    expect(deadHeadPressureRatio(0, 0, 1e5)).toBe(Number.POSITIVE_INFINITY);
    expect(deadHeadPressureRatio(0.1, -1e-4, 1e5)).toBe(Number.POSITIVE_INFINITY);
  });
});

describe("work of the ideal cycle", () => {
  it("a built-in volume ratio Vi compresses to Vi^γ: 1.5^1.4 = 1.7641, and 1 for a Roots blower", () => {
    // source: isentropic relation P·V^γ = const (any thermodynamics text); by hand.
    expect(builtInPressureRatio(1.5)).toBeCloseTo(1.76412, 5);
    expect(builtInPressureRatio(1)).toBe(1);
  });

  it("a Roots blower's work per swept volume is P1·(PR − 1)", () => {
    // source: constant-volume (Roots) compression, compressor texts: 1e5 × 0.5 = 50 000 J/m³.
    expect(compressionWorkPerVolume(1e5, 1.5, 1)).toBeCloseTo(50_000, 6);
    expect(compressionWorkPerVolume(2e5, 2, 1)).toBeCloseTo(200_000, 6);
  });

  it("a screw with Vi = 1.5: isentropic to PRi, then constant volume at 1/Vi of the inlet volume", () => {
    // By hand: 1.5^0.4 = 1.176079, (0.176079)/0.285714 = 0.616277; + (2 − 1.764119)/1.5 = 0.157254.
    expect(compressionWorkPerVolume(1e5, 2, 1.5)).toBeCloseTo(77_353.1, 1);
    // At PR = PRi only the isentropic part remains.
    expect(compressionWorkPerVolume(1e5, builtInPressureRatio(1.5), 1.5)).toBeCloseTo(61_627.7, 1);
  });

  it("isentropic work per inlet volume is P1·(PR^κ − 1)/κ: 76 655 J/m³ for PR 2 from 1 bar", () => {
    // source: ideal-gas isentropic compression (e.g. Çengel & Boles); 2^(2/7) = 1.219014, 0.219014/0.285714 = 0.766548.
    expect(isentropicWorkPerVolume(1e5, 2)).toBeCloseTo(76_654.8, 1);
    expect(isentropicWorkPerVolume(1e5, 1)).toBe(0);
  });
});

describe("temperatures", () => {
  it("discharge temperature by the energy balance T1 + P/(ṁ·cp), cp = R·γ/(γ − 1) = 1004.675 J/(kg·K)", () => {
    // source: steady-flow energy equation; R = 287.05 J/(kg·K), γ = 1.4 (calc/README.md): 287.05 × 3.5 = 1004.675.
    // 5 023.375 W into 0.1 kg/s: 5 023.375 / 100.4675 = 50 K.
    expect(dischargeTemperature(300, 5023.375, 0.1)).toBeCloseTo(350, 9);
    expect(dischargeTemperature(300, 0, 0.1)).toBe(300);
  });

  it("adiabatic efficiency is the isentropic rise over the actual rise: 0.6 when the rise is 63.109/0.6 K at PR 2 from 288.15 K", () => {
    // source: definition of adiabatic (isentropic) efficiency, compressor texts; 288.15 × 0.219014 = 63.109 K by hand.
    expect(adiabaticEfficiency(288.15, 2, 288.15 + 63.1088 / 0.6)).toBeCloseTo(0.6, 5);
    expect(adiabaticEfficiency(288.15, 2, 288.15 + 2 * 63.1088)).toBeCloseTo(0.5, 5);
    fc.assert(
      fc.property(fc.double({ min: 230, max: 330, noNaN: true }), fc.double({ min: 1.05, max: 3, noNaN: true }), (t1, pr) => {
        expect(adiabaticEfficiency(t1, pr, isentropicTemperature(t1, pr))).toBeCloseTo(1, 9);
      }),
    );
  });
});
