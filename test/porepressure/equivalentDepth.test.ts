/**
 * Equivalent depth (Foster & Whalen 1966, JPT 18(2):165–171, from memory) checked against
 * CHECK-VALUES §5 own cases, with the §2 exponential sonic trend (Zhang 2011, Earth-Sci.
 * Rev. 108:50–63, form from memory) evaluated inline, and the no-Ze flags.
 */
import { describe, expect, it } from "vitest";
import {
  PP_FLAG_CLIPPED_AT_HYDROSTATIC,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_NO_EQUIVALENT_DEPTH,
  equivalentDepthPorePressure,
} from "../../src/porepressure/index.js";

/** Depths 0, 500, …, 12,000 ft with S/D 1.0 and Ph/D 0.465 psi/ft (CHECK-VALUES §5 inputs). */
function linearWell(): { tvdFt: Float64Array; overburdenPsi: Float64Array; hydrostaticPsi: Float64Array } {
  const tvdFt = Float64Array.from({ length: 25 }, (_, k) => 500 * k);
  return { tvdFt, overburdenPsi: tvdFt.map((z) => 1.0 * z), hydrostaticPsi: tvdFt.map((z) => 0.465 * z) };
}
/** CHECK-VALUES §2 sonic trend: Δtm 65, Δtml 200 µs/ft, c 3.0e-4 /ft (Z below datum). */
const C_PER_FT = 3.0e-4;
const sonicTrend = (z: number): number => 65 + (200 - 65) * Math.exp(-C_PER_FT * z);

describe("equivalentDepthPorePressure", () => {
  it("match at Ze 8000 ft for Z 12,000 ft → σ 4280, Pp 7720 psi (CHECK-VALUES §5, own case)", () => {
    const w = linearWell();
    // a linear trend 200 − 0.01 z µs/ft equals 120 µs/ft at 8000 ft
    const observed = w.tvdFt.map((z) => (z === 12000 ? 120 : 200 - 0.01 * z));
    const r = equivalentDepthPorePressure({ ...w, observed, trend: { kind: "function", valueAtTvdFt: (z) => 200 - 0.01 * z } });
    const i = 24;
    expect(r.equivalentDepthFt[i]).toBeCloseTo(8000, 6);
    expect(r.effectiveStressPsi[i]).toBeCloseTo(4280, 4);
    expect(r.ppPsi[i]).toBeCloseTo(7720, 4);
    expect(r.ppPsi[i] / 12000).toBeCloseTo(0.6433, 4);
    // on the trend elsewhere: Ze = Z and Pp = Ph (normal pressure), no flag
    expect(r.ppPsi[10]).toBeCloseTo(0.465 * 5000, 9);
    expect(r.flags[10]).toBe(0);
  });

  it("with the §2 sonic trend, Δt 110 at 9000 ft → Ze 3662 ft, σ 1959, Pp 7041 psi (CHECK-VALUES §5, own case)", () => {
    const w = linearWell();
    const observed = w.tvdFt.map((z) => (z === 9000 ? 110 : sonicTrend(z)));
    const r = equivalentDepthPorePressure({ ...w, observed, trend: { kind: "function", valueAtTvdFt: sonicTrend } });
    const i = 18;
    // 4 s.f. in the source: ±0.5 ft / psi. A 1 % change in c moves Ze by ≈ 36 ft and fails.
    expect(Math.abs(r.equivalentDepthFt[i] - 3662)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.effectiveStressPsi[i] - 1959)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.ppPsi[i] - 7041)).toBeLessThanOrEqual(0.5);
  });

  it("fromIndex computes only the deeper samples, each equal to the whole run's (bit for bit), with the whole well as context", () => {
    const w = linearWell();
    // Own case: observed values below the trend from 6000 ft on (overpressure), so Ze lies
    // far above the first computed sample and the search must see the shallow samples.
    const observed = w.tvdFt.map((z) => (z >= 6000 ? sonicTrend(z) + 0.002 * (z - 5500) : sonicTrend(z)));
    const tz = Float64Array.from({ length: 1201 }, (_, k) => 10 * k);
    const input = { ...w, observed, trend: { kind: "sampled" as const, tvdFt: tz, values: tz.map(sonicTrend) } };
    const whole = equivalentDepthPorePressure(input);
    const from = 16; // 8000 ft
    const part = equivalentDepthPorePressure({ ...input, fromIndex: from });
    expect(part.ppPsi.length).toBe(25 - from);
    expect(Array.from(part.ppPsi)).toEqual(Array.from(whole.ppPsi.subarray(from)));
    expect(Array.from(part.equivalentDepthFt)).toEqual(Array.from(whole.equivalentDepthFt.subarray(from)));
    expect(Array.from(part.effectiveStressPsi)).toEqual(Array.from(whole.effectiveStressPsi.subarray(from)));
    expect(Array.from(part.flags)).toEqual(Array.from(whole.flags.subarray(from)));
    // the matched depths lie above fromIndex's depth: the context was used
    expect(part.equivalentDepthFt[0]).toBeLessThan(w.tvdFt[from] - 1000);
    expect(equivalentDepthPorePressure({ ...input, fromIndex: 25 }).ppPsi.length).toBe(0);
    expect(() => equivalentDepthPorePressure({ ...input, fromIndex: 26 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => equivalentDepthPorePressure({ ...input, fromIndex: 1.5 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });

  it("a sampled trend (10 ft steps) gives the same Ze within 0.5 ft (linear interpolation error ≈ h²c/8 ≈ 0.004 ft)", () => {
    const w = linearWell();
    const observed = w.tvdFt.map((z) => (z === 9000 ? 110 : sonicTrend(z)));
    const tz = Float64Array.from({ length: 1201 }, (_, k) => 10 * k);
    const r = equivalentDepthPorePressure({ ...w, observed, trend: { kind: "sampled", tvdFt: tz, values: tz.map(sonicTrend) } });
    expect(Math.abs(r.equivalentDepthFt[18] - 3662)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(r.ppPsi[18] - 7041)).toBeLessThanOrEqual(0.5);
  });

  it("flags what has no equivalent depth: compacted side → Ph (flag 8), slower than the trend at the top → NaN (flag 16), NaN → flag 1", () => {
    const w = linearWell();
    const observed = w.tvdFt.map((z) => sonicTrend(z));
    observed[12] = 70; // faster than the trend at 6000 ft (≈ 87.3): more compacted than normal
    observed[20] = 250; // slower than the trend even at the top (200): no Ze
    observed[22] = NaN;
    const r = equivalentDepthPorePressure({ ...w, observed, trend: { kind: "function", valueAtTvdFt: sonicTrend } });
    expect(r.ppPsi[12]).toBeCloseTo(0.465 * 6000, 9);
    expect(r.flags[12]).toBe(PP_FLAG_CLIPPED_AT_HYDROSTATIC);
    expect(Number.isNaN(r.ppPsi[20])).toBe(true);
    expect(r.flags[20]).toBe(PP_FLAG_NO_EQUIVALENT_DEPTH);
    expect(Number.isNaN(r.equivalentDepthFt[20])).toBe(true);
    expect(r.flags[22]).toBe(PP_FLAG_MISSING_INPUT);
    expect(r.warnings.map((x) => [x.code, x.count, x.depthFt])).toEqual([
      ["W_PP_MISSING_INPUT", 1, 11000],
      ["W_PP_CLIPPED_AT_HYDROSTATIC", 1, 6000],
      ["W_PP_NO_EQUIVALENT_DEPTH", 1, 10000],
    ]);
  });

  it("works for a resistivity trend that rises with depth (CHECK-VALUES §2 Rn = 0.8 e^(1e-4 Z))", () => {
    const w = linearWell();
    const rn = (z: number): number => 0.8 * Math.exp(1.0e-4 * z);
    // observed at 12,000 ft equals the trend at 8000 ft → own case of §5: Pp 7720 psi
    const observed = w.tvdFt.map((z) => (z === 12000 ? rn(8000) : rn(z)));
    const r = equivalentDepthPorePressure({ ...w, observed, trend: { kind: "function", valueAtTvdFt: rn } });
    expect(r.ppPsi[24]).toBeCloseTo(7720, 4);
  });

  it("throws E_NOT_MONOTONIC for a trend that turns, E_NOT_SORTED for decreasing depths, E_LENGTH for mismatches", () => {
    const w = linearWell();
    const observed = w.tvdFt.map(sonicTrend);
    expect(() =>
      equivalentDepthPorePressure({ ...w, observed, trend: { kind: "function", valueAtTvdFt: (z) => (z - 6000) ** 2 } }),
    ).toThrow(expect.objectContaining({ code: "E_NOT_MONOTONIC" }));
    expect(() =>
      equivalentDepthPorePressure({ ...w, observed, trend: { kind: "sampled", tvdFt: [0, 1000, 2000], values: [150, 120, 130] } }),
    ).toThrow(expect.objectContaining({ code: "E_NOT_MONOTONIC" }));
    expect(() =>
      equivalentDepthPorePressure({ tvdFt: [0, 2, 1], overburdenPsi: [0, 2, 1], hydrostaticPsi: [0, 1, 0.5], observed: [1, 1, 1], trend: { kind: "function", valueAtTvdFt: sonicTrend } }),
    ).toThrow(expect.objectContaining({ code: "E_NOT_SORTED" }));
    expect(() => equivalentDepthPorePressure({ ...w, observed: [1], trend: { kind: "function", valueAtTvdFt: sonicTrend } })).toThrow(
      expect.objectContaining({ code: "E_LENGTH" }),
    );
  });

  it("does not mutate its inputs", () => {
    const w = linearWell();
    const observed = w.tvdFt.map((z) => (z === 9000 ? 110 : sonicTrend(z)));
    const copies = [Float64Array.from(w.tvdFt), Float64Array.from(w.overburdenPsi), Float64Array.from(observed)];
    const trend = Object.freeze({ kind: "function" as const, valueAtTvdFt: sonicTrend });
    equivalentDepthPorePressure({ ...w, observed, trend });
    expect([w.tvdFt, w.overburdenPsi, observed]).toEqual(copies);
  });
});
