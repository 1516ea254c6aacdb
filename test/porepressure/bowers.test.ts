/**
 * Bowers (1995, SPE Drilling & Completion 10(2):89–95, SPE-27488; equations from memory)
 * checked against CHECK-VALUES §4 own cases for both parameter sets, σmax, the unloading
 * values, forward-then-inverse identities, and the branch choice of bowersPorePressure.
 */
import { describe, expect, it } from "vitest";
import {
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_UNLOADING_BRANCH,
  bowersCrossplot,
  bowersPorePressure,
  bowersSigmaMax,
  bowersUnloadingEffectiveStress,
  bowersUnloadingVelocity,
  bowersVirginEffectiveStress,
  bowersVirginVelocity,
  velocityFromSlownessLog,
} from "../../src/porepressure/index.js";
import { ShalepointError } from "../../src/errors.js";

const GOM1 = { a: 10.11, b: 0.777 }; // CHECK-VALUES §4 parameter set 1, V0 5000 ft/s
const GOM2 = { a: 10, b: 0.75 }; // CHECK-VALUES §4 parameter set 2

// CHECK-VALUES §4 gives velocities to the nearest ft/s and stresses to the nearest psi:
// tolerance half a unit. A 1 % change in A moves V(3000 psi) by ≈ 51 ft/s and fails.
const HALF = 0.5;

describe("bowersVirginVelocity", () => {
  it("A 10.11, B 0.777: σ 1000/3000/5000 psi → 7166/10,087/12,566 ft/s (CHECK-VALUES §4, own case)", () => {
    const v = [1000, 3000, 5000].map((s) => bowersVirginVelocity({ effectiveStressPsi: s, ...GOM1 }));
    [7166, 10087, 12566].forEach((want, k) => expect(Math.abs(v[k] - want)).toBeLessThanOrEqual(HALF));
  });
  it("A 10, B 0.75: σ 1000/3000/5000 psi → 6778/9054/10,946 ft/s (CHECK-VALUES §4, own case)", () => {
    const v = [1000, 3000, 5000].map((s) => bowersVirginVelocity({ effectiveStressPsi: s, ...GOM2 }));
    [6778, 9054, 10946].forEach((want, k) => expect(Math.abs(v[k] - want)).toBeLessThanOrEqual(HALF));
  });
  it("σ 0 gives V0 and a negative σ gives NaN (definition of the curve)", () => {
    expect(bowersVirginVelocity({ effectiveStressPsi: 0, ...GOM1 })).toBe(5000);
    expect(bowersVirginVelocity({ effectiveStressPsi: 0, ...GOM1, v0FtPerS: 4900 })).toBe(4900);
    expect(Number.isNaN(bowersVirginVelocity({ effectiveStressPsi: -1, ...GOM1 }))).toBe(true);
  });
  it("rejects A ≤ 0, B outside (0, 1], V0 ≤ 0 with E_RANGE naming the parameter", () => {
    const cases: Array<[Record<string, number>, string]> = [
      [{ a: 0, b: 0.7 }, "a"],
      [{ a: -3, b: 0.7 }, "a"],
      [{ a: 10, b: 0 }, "b"],
      [{ a: 10, b: 1.01 }, "b"],
      [{ a: 10, b: 0.7, v0FtPerS: 0 }, "v0FtPerS"],
    ];
    for (const [p, param] of cases) {
      try {
        bowersVirginVelocity({ effectiveStressPsi: 1000, ...(p as { a: number; b: number }) });
        expect.unreachable();
      } catch (e) {
        expect((e as ShalepointError).code).toBe("E_RANGE");
        expect((e as ShalepointError).details.param).toBe(param);
      }
    }
    // B = 1 is allowed (the upper end of the range)
    expect(bowersVirginVelocity({ effectiveStressPsi: 1000, a: 1, b: 1 })).toBe(6000);
  });
});

describe("bowersVirginEffectiveStress", () => {
  it("V 8000 ft/s → σ 1520 psi; Sv 10,000 → Pp 8480 psi (CHECK-VALUES §4, own case)", () => {
    const s = bowersVirginEffectiveStress({ velocityFtPerS: 8000, ...GOM1 });
    expect(Math.abs(s - 1520)).toBeLessThanOrEqual(HALF);
    expect(Math.abs(10000 - s - 8480)).toBeLessThanOrEqual(HALF);
  });
  it("forward then inverse returns the input to 1e-12 (CHECK-VALUES §4 identity)", () => {
    for (const p of [GOM1, GOM2]) {
      for (const s of [1, 250, 1000, 2202.5, 5000, 12000]) {
        const v = bowersVirginVelocity({ effectiveStressPsi: s, ...p });
        expect(Math.abs(bowersVirginEffectiveStress({ velocityFtPerS: v, ...p }) / s - 1)).toBeLessThan(1e-12);
      }
    }
  });
  it("V below V0 has no effective stress on the curve: NaN", () => {
    expect(Number.isNaN(bowersVirginEffectiveStress({ velocityFtPerS: 4999, ...GOM1 }))).toBe(true);
  });
});

describe("bowersSigmaMax", () => {
  it("Vmax 9000 → σmax 2202 psi (A 10.11, B 0.777) and 2947 psi (A 10, B 0.75) (CHECK-VALUES §4, own case)", () => {
    expect(Math.abs(bowersSigmaMax({ vmaxFtPerS: 9000, ...GOM1 }) - 2202)).toBeLessThanOrEqual(HALF);
    expect(Math.abs(bowersSigmaMax({ vmaxFtPerS: 9000, ...GOM2 }) - 2947)).toBeLessThanOrEqual(HALF);
  });
  it("rejects Vmax ≤ V0", () => {
    expect(() => bowersSigmaMax({ vmaxFtPerS: 5000, ...GOM1 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("bowersUnloadingVelocity", () => {
  const sm1 = bowersSigmaMax({ vmaxFtPerS: 9000, ...GOM1 });
  const sm2 = bowersSigmaMax({ vmaxFtPerS: 9000, ...GOM2 });
  it("U 3.13, σ 2000 → 8906 ft/s, virgin 8712; inverting 8906 on the virgin curve → 2135 psi (CHECK-VALUES §4, own case)", () => {
    const vu = bowersUnloadingVelocity({ effectiveStressPsi: 2000, sigmaMaxPsi: sm1, u: 3.13, ...GOM1 });
    expect(Math.abs(vu - 8906)).toBeLessThanOrEqual(HALF);
    expect(Math.abs(bowersVirginVelocity({ effectiveStressPsi: 2000, ...GOM1 }) - 8712)).toBeLessThanOrEqual(HALF);
    expect(Math.abs(bowersVirginEffectiveStress({ velocityFtPerS: 8906, ...GOM1 }) - 2135)).toBeLessThanOrEqual(HALF);
  });
  it("A 10, B 0.75, U 3.13, σ 2000 → 8645 ft/s (CHECK-VALUES §4, own case)", () => {
    const vu = bowersUnloadingVelocity({ effectiveStressPsi: 2000, sigmaMaxPsi: sm2, u: 3.13, ...GOM2 });
    expect(Math.abs(vu - 8645)).toBeLessThanOrEqual(HALF);
  });
  it("U = 1 gives the virgin curve; at σ = σmax both curves meet at Vmax (CHECK-VALUES §4 identity)", () => {
    for (const s of [100, 1000, 2000]) {
      const vu = bowersUnloadingVelocity({ effectiveStressPsi: s, sigmaMaxPsi: sm1, u: 1, ...GOM1 });
      expect(Math.abs(vu / bowersVirginVelocity({ effectiveStressPsi: s, ...GOM1 }) - 1)).toBeLessThan(1e-14);
    }
    expect(bowersUnloadingVelocity({ effectiveStressPsi: sm1, sigmaMaxPsi: sm1, u: 5, ...GOM1 })).toBeCloseTo(9000, 9);
  });
  it("rejects U < 1 and σmax ≤ 0", () => {
    expect(() => bowersUnloadingVelocity({ effectiveStressPsi: 1, sigmaMaxPsi: sm1, u: 0.99, ...GOM1 })).toThrow(
      expect.objectContaining({ code: "E_RANGE", details: expect.objectContaining({ param: "u" }) }),
    );
    expect(() => bowersUnloadingVelocity({ effectiveStressPsi: 1, sigmaMaxPsi: 0, u: 3, ...GOM1 })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
  });
});

describe("bowersUnloadingEffectiveStress", () => {
  it("forward then inverse returns the input to 1e-12 for both parameter sets (CHECK-VALUES §4 identity)", () => {
    for (const p of [GOM1, GOM2]) {
      const sm = bowersSigmaMax({ vmaxFtPerS: 9000, ...p });
      for (const u of [1, 3.13, 8]) {
        for (const s of [10, 500, 2000, sm]) {
          const v = bowersUnloadingVelocity({ effectiveStressPsi: s, sigmaMaxPsi: sm, u, ...p });
          const back = bowersUnloadingEffectiveStress({ velocityFtPerS: v, sigmaMaxPsi: sm, u, ...p });
          expect(Math.abs(back / s - 1)).toBeLessThan(1e-12);
        }
      }
    }
  });
});

describe("bowersPorePressure", () => {
  const tvdFt = Float64Array.from([10000, 11000, 12000, 12500]);
  const sv = Float64Array.from([10000, 11000, 12000, 12500]);
  const ph = Float64Array.from([4650, 5115, 5580, 5812.5]);

  it("virgin branch: Sv 10,000, V 8000 → Pp 8480 psi (CHECK-VALUES §4, own case)", () => {
    const r = bowersPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], velocityFtPerS: [8000], ...GOM1 });
    expect(Math.abs(r.ppPsi[0] - 8480)).toBeLessThanOrEqual(HALF);
    expect(r.flags[0]).toBe(0);
    expect(Number.isNaN(r.sigmaMaxPsi)).toBe(true);
  });

  it("chooses the virgin branch above the onset and the unloading branch below it (8906 ft/s → 2135 vs 2000 psi)", () => {
    // CHECK-VALUES §4: 8906 ft/s is σ 2000 psi on the U 3.13 unloading curve (Vmax 9000) but
    // 2135 psi on the virgin curve. Below the onset, V 9100 ≥ Vmax is loading again (virgin).
    const v = Float64Array.from([8906, 9000, 8906, 9100]);
    const r = bowersPorePressure({
      overburdenPsi: sv,
      hydrostaticPsi: ph,
      velocityFtPerS: v,
      tvdFt,
      ...GOM1,
      unloading: { u: 3.13, onsetTvdFt: 11000 },
    });
    expect(r.vmaxFtPerS).toBe(9000); // velocity at the onset sample
    expect(Math.abs(r.sigmaMaxPsi - 2202)).toBeLessThanOrEqual(HALF);
    expect(Math.abs(r.effectiveStressPsi[0] - 2135)).toBeLessThanOrEqual(HALF);
    // unloading: σ within ±1.1 psi of 2000 because 8906 is rounded to ±0.5 ft/s and
    // dσ/dV ≈ 2.1 psi per ft/s on this branch
    expect(Math.abs(r.effectiveStressPsi[2] - 2000)).toBeLessThanOrEqual(1.1);
    expect(r.ppPsi[2]).toBeCloseTo(12000 - r.effectiveStressPsi[2], 9);
    expect(Array.from(r.flags)).toEqual([0, 0, PP_FLAG_UNLOADING_BRANCH, 0]);
    // V 9100 on the virgin branch: ((9100 − 5000)/10.11)^(1/0.777)
    expect(r.effectiveStressPsi[3]).toBeCloseTo(Math.pow(4100 / 10.11, 1 / 0.777), 9);
    expect(r.warnings).toEqual([]);
  });

  it("takes Vmax by linear interpolation at an onset between samples, or as given", () => {
    const v = Float64Array.from([8800, 9200, 8906, 8906]);
    const r = bowersPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: v, tvdFt, ...GOM1, unloading: { u: 3.13, onsetTvdFt: 10500 } });
    expect(r.vmaxFtPerS).toBeCloseTo(9000, 9);
    const given = bowersPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: v, tvdFt, ...GOM1, unloading: { u: 3.13, onsetTvdFt: 10500, vmaxFtPerS: 9000 } });
    expect(given.ppPsi[3]).toBeCloseTo(r.ppPsi[3], 9);
  });

  it("V below V0 gives Sv, flagged clipped at overburden; NaN carried through as missing", () => {
    const r = bowersPorePressure({ overburdenPsi: [10000, 10000, NaN], hydrostaticPsi: [4650, 4650, 4650], velocityFtPerS: [4800, NaN, 8000], ...GOM1 });
    expect(r.ppPsi[0]).toBe(10000);
    expect(r.flags[0]).toBe(PP_FLAG_CLIPPED_AT_OVERBURDEN);
    expect(Number.isNaN(r.ppPsi[1]) && Number.isNaN(r.ppPsi[2])).toBe(true);
    expect(r.flags[1]).toBe(PP_FLAG_MISSING_INPUT);
    expect(r.warnings.map((w) => [w.code, w.count])).toEqual([
      ["W_PP_MISSING_INPUT", 2],
      ["W_PP_CLIPPED_AT_OVERBURDEN", 1],
    ]);
  });

  it("throws typed errors: unloading without tvdFt, onset outside the well, U < 1, mismatched lengths", () => {
    const base = { overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: Float64Array.from([8906, 9000, 8906, 9100]), ...GOM1 };
    expect(() => bowersPorePressure({ ...base, unloading: { u: 3, onsetTvdFt: 11000 } })).toThrow(expect.objectContaining({ code: "E_MISSING" }));
    expect(() => bowersPorePressure({ ...base, tvdFt, unloading: { u: 3, onsetTvdFt: 20000 } })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => bowersPorePressure({ ...base, tvdFt, unloading: { u: 0.5, onsetTvdFt: 11000 } })).toThrow(
      expect.objectContaining({ code: "E_RANGE", details: expect.objectContaining({ param: "u" }) }),
    );
    expect(() => bowersPorePressure({ ...base, hydrostaticPsi: [1] })).toThrow(expect.objectContaining({ code: "E_LENGTH" }));
  });

  it("does not mutate its inputs", () => {
    const v = Float64Array.from([8906, 9000, 8906, 9100]);
    const copies = [Float64Array.from(v), Float64Array.from(sv), Float64Array.from(tvdFt)];
    const unloading = Object.freeze({ u: 3.13, onsetTvdFt: 11000 });
    bowersPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: v, tvdFt, ...GOM1, unloading });
    expect([v, sv, tvdFt]).toEqual(copies);
  });
});

describe("bowersCrossplot", () => {
  it("puts points at σ = Sv − Pref, with near-zero departure on the virgin curve and +194 ft/s for unloaded rock", () => {
    // Point 0: σ 1000 psi, V 7166 (virgin, CHECK-VALUES §4). Point 1: σ 2000 psi, V 8906
    // (unloaded): the virgin curve gives 8712 there (CHECK-VALUES §4), so departure ≈ 194 ft/s.
    const r = bowersCrossplot({
      velocityFtPerS: [7166, 8906, NaN],
      overburdenPsi: [5650, 12000, 13000],
      referencePressurePsi: [4650, 10000, 7000],
      ...GOM1,
      unloading: { u: 3.13, vmaxFtPerS: 9000 },
      curveSamples: 11,
    });
    expect(Array.from(r.points.index)).toEqual([0, 1]);
    expect(Array.from(r.points.effectiveStressPsi)).toEqual([1000, 2000]);
    expect(Math.abs(r.points.departureFromVirginFtPerS[0])).toBeLessThanOrEqual(HALF);
    expect(Math.abs(r.points.departureFromVirginFtPerS[1] - (8906 - 8712))).toBeLessThanOrEqual(2 * HALF);
    expect(r.nSkipped).toBe(1);
    // curves: virgin from 0 to 1.1 × max(2000, σmax 2202) in 11 samples
    expect(r.virginCurve.effectiveStressPsi[0]).toBe(0);
    expect(r.virginCurve.velocityFtPerS[0]).toBe(5000);
    expect(r.virginCurve.effectiveStressPsi[10]).toBeCloseTo(1.1 * r.sigmaMaxPsi, 9);
    // the unloading curve leaves the virgin curve at (σmax, Vmax) and starts at V0
    const u = r.unloadingCurve!;
    expect(u.effectiveStressPsi[10]).toBeCloseTo(r.sigmaMaxPsi, 9);
    expect(u.velocityFtPerS[10]).toBeCloseTo(9000, 9);
    expect(u.velocityFtPerS[0]).toBe(5000);
  });
  it("returns no unloading curve without an unloading zone and rejects curveSamples < 2", () => {
    const r = bowersCrossplot({ velocityFtPerS: [7166], overburdenPsi: [5650], referencePressurePsi: [4650], ...GOM2 });
    expect(r.unloadingCurve).toBeNull();
    expect(r.virginCurve.effectiveStressPsi.length).toBe(101);
    expect(() => bowersCrossplot({ velocityFtPerS: [1], overburdenPsi: [1], referencePressurePsi: [1], ...GOM2, curveSamples: 1 })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
  });
});

describe("velocityFromSlownessLog", () => {
  it("V = 10⁶/Δt: 100 → 10,000 and 125 → 8000 ft/s (unit identity); 0, negative, NaN → NaN", () => {
    const dt = Object.freeze([100, 125, 0, -5, NaN]);
    const v = velocityFromSlownessLog(dt);
    expect(Array.from(v.slice(0, 2))).toEqual([10000, 8000]);
    expect(Array.from(v.slice(2)).every(Number.isNaN)).toBe(true);
  });
});
