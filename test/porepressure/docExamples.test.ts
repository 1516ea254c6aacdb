/**
 * The @example lines of src/porepressure, run. Expected values are hand calculations from
 * the published equations (Eaton 1975, SPE-5544; Bowers 1995, SPE-27488, from memory) and
 * the legal gallon (12/231 psi/ft per ppg), written beside each check.
 */
import { describe, expect, it } from "vitest";
import {
  bowersCrossplot,
  bowersUnloadingEffectiveStress,
  describePorePressureFlags,
  eatonDexponentPorePressure,
  eatonPorePressure,
  eatonResistivityPorePressure,
  eatonSonicPorePressure,
  equivalentDepthPorePressure,
  porePressureMisfitTable,
  requireBowersParameters,
} from "../../src/porepressure/index.js";

describe("doc examples", () => {
  it("eatonPorePressure: 10000 − 5350·(10/12)³ = 6903.9 psi (hand calculation, own case)", () => {
    const r = eatonPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [10000 / 12000], exponent: 3 });
    expect(r.ppPsi[0]).toBeCloseTo(6903.94, 2);
  });
  it("eatonSonicPorePressure: 66 − 36·(100/120)³ = 45.1667 MPa = 6550.8 psi (CHECK-VALUES §3, own case)", () => {
    const r = eatonSonicPorePressure({ overburdenPsi: [66e6 / 6894.757], hydrostaticPsi: [30e6 / 6894.757], dtUsPerFt: [120], dtTrendUsPerFt: [100] });
    expect(r.ppPsi[0]).toBeCloseTo(45.16667e6 / 6894.757, 1);
  });
  it("eatonResistivityPorePressure: 10000 − 5350·0.6^1.2 = 7101.8 psi (hand calculation, own case)", () => {
    const r = eatonResistivityPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], resistivityOhmM: [1.2], resistivityTrendOhmM: [2.0] });
    expect(r.ppPsi[0]).toBeCloseTo(7101.78, 1);
  });
  it("eatonDexponentPorePressure: 10400 − 5880·(1.75/1.85)^1.2 = 4899.3 psi (hand calculation, own case)", () => {
    const r = eatonDexponentPorePressure({ overburdenPsi: [10400], hydrostaticPsi: [4520], dcObserved: [1.75], dcTrend: [1.85] });
    expect(r.ppPsi[0]).toBeCloseTo(4899.31, 1);
  });
  it("bowersUnloadingEffectiveStress(8906) ≈ 2000 psi (CHECK-VALUES §4, own case; ±1.1 psi for V rounded to ±0.5 ft/s)", () => {
    const s = bowersUnloadingEffectiveStress({ velocityFtPerS: 8906, sigmaMaxPsi: 2202.4, u: 3.13, a: 10.11, b: 0.777 });
    expect(Math.abs(s - 2000)).toBeLessThan(1.1);
  });
  it("bowersCrossplot: Sv 5650 − Pref 4650 = σ 1000 psi; departure of 7166 ft/s ≈ 0 (CHECK-VALUES §4)", () => {
    const r = bowersCrossplot({ velocityFtPerS: [7166], overburdenPsi: [5650], referencePressurePsi: [4650], a: 10.11, b: 0.777 });
    expect(r.points.effectiveStressPsi[0]).toBe(1000);
    expect(Math.abs(r.points.departureFromVirginFtPerS[0])).toBeLessThan(0.5);
  });
  it("equivalentDepthPorePressure: 12,000 − (8000 − 3720) = 7720 psi (CHECK-VALUES §5, own case)", () => {
    const r = equivalentDepthPorePressure({
      tvdFt: [0, 8000, 12000],
      overburdenPsi: [0, 8000, 12000],
      hydrostaticPsi: [0, 3720, 5580],
      observed: [200, 120, 120],
      trend: { kind: "function", valueAtTvdFt: (z) => 200 - 0.01 * z },
    });
    expect(r.ppPsi[2]).toBeCloseTo(7720, 6);
  });
  it("porePressureMisfitTable: 66 psi at 10,000 ft = 66/(10000·12/231) = 0.12705 ppg (legal gallon)", () => {
    const t = porePressureMisfitTable({ tvdFt: [10000], predictedPsi: [6300], observations: [{ index: 0, pressurePsi: 6234 }] });
    expect(t.rows[0].differencePpg).toBeCloseTo(0.12705, 8);
  });
  it("describePorePressureFlags and requireBowersParameters", () => {
    expect(describePorePressureFlags(2 | 64)).toEqual(["clipped at overburden (zero effective stress)", "unloading branch"]);
    expect(requireBowersParameters({ a: 10.11, b: 0.777 })).toBe(5000);
  });
});
