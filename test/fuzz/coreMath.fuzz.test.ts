/**
 * Property-based tests of core math (fast-check, fixed seeds and run counts): physical
 * bounds hold or are flagged, monotonic where the physics is, inputs never change, and the
 * fast despike and equivalent-depth paths agree with plain re-statements of the published
 * rules written here from the equations (not from the code).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  eatonPorePressure,
  bowersPorePressure,
  equivalentDepthPorePressure,
  PP_FLAG_BELOW_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
} from "../../src/porepressure/index.js";
import { despikeLog, MAD_TO_SIGMA, pickShalePoints } from "../../src/logs/index.js";
import { integrateOverburden } from "../../src/stress/overburden.js";
import { mudWeightWindow } from "../../src/window/mudWeightWindow.js";

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const copy = (a: ArrayLike<number>) => Float64Array.from(a);

describe("eatonPorePressure (property-based)", () => {
  // Eaton 1975 (SPE-5544; meeting details from memory), in stresses:
  // Pp = Sv − (Sv − Ph)·ratio^n — CHECK-VALUES §3 (published form).
  const sample = fc.record({ depthFt: finite(1000, 25000), svGrad: finite(0.8, 1.1), phGrad: finite(0.433, 0.47), n: finite(0.5, 4) });

  it("eatonPorePressure never exceeds the overburden, and Pp below hydrostatic is always flagged (Eaton 1975 form; published)", () => {
    fc.assert(
      fc.property(sample, fc.array(finite(0, 5), { minLength: 1, maxLength: 30 }), (s, ratios) => {
        const m = ratios.length;
        const sv = new Float64Array(m).fill(s.svGrad * s.depthFt);
        const ph = new Float64Array(m).fill(s.phGrad * s.depthFt);
        const r = eatonPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, ratio: ratios, exponent: s.n });
        for (let i = 0; i < m; i++) {
          if (Number.isNaN(r.ppPsi[i])) {
            // A ratio of 0 has no Eaton value (0^n·(Sv − Ph) leaves Sv only as a limit): NaN, flagged.
            expect(ratios[i]).toBe(0);
            expect(r.flags[i] & PP_FLAG_MISSING_INPUT).toBe(PP_FLAG_MISSING_INPUT);
            continue;
          }
          expect(r.ppPsi[i]).toBeLessThanOrEqual(sv[i]);
          if (r.ppPsi[i] < ph[i]) expect(r.flags[i] & PP_FLAG_BELOW_HYDROSTATIC).toBe(PP_FLAG_BELOW_HYDROSTATIC);
          // ratio 1 → Ph exactly (identity in CHECK-VALUES §3; published form).
          if (ratios[i] === 1) expect(r.ppPsi[i]).toBeCloseTo(ph[i], 9);
        }
      }),
      { seed: 31, numRuns: 300 },
    );
  });

  it("eatonPorePressure falls as the ratio rises (Δtn/Δto or Ro/Rn larger = more compacted; Eaton 1975, published)", () => {
    fc.assert(
      fc.property(sample, finite(0.05, 3), finite(0.05, 3), (s, a, b) => {
        const lo = Math.min(a, b);
        const hi = Math.max(a, b);
        const r = eatonPorePressure({ overburdenPsi: [s.svGrad * s.depthFt, s.svGrad * s.depthFt], hydrostaticPsi: [s.phGrad * s.depthFt, s.phGrad * s.depthFt], ratio: [lo, hi], exponent: s.n });
        expect(r.ppPsi[0]).toBeGreaterThanOrEqual(r.ppPsi[1]);
      }),
      { seed: 32, numRuns: 300 },
    );
  });

  it("eatonPorePressure: NaN input gives NaN with the missing-input flag, and leaves frozen inputs unchanged", () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(finite(0.1, 2), fc.constant(NaN)), { minLength: 1, maxLength: 20 }), (ratios) => {
        const m = ratios.length;
        const sv = Object.freeze(Array.from({ length: m }, (_, i) => 9000 + i));
        const ph = Object.freeze(Array.from({ length: m }, (_, i) => 4450 + i));
        const ratio = Object.freeze([...ratios]);
        const r = eatonPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, exponent: 3 });
        for (let i = 0; i < m; i++) {
          if (Number.isNaN(ratios[i])) {
            expect(Number.isNaN(r.ppPsi[i])).toBe(true);
            expect(r.flags[i] & PP_FLAG_MISSING_INPUT).toBe(PP_FLAG_MISSING_INPUT);
          }
        }
      }),
      { seed: 33, numRuns: 200 },
    );
  });
});

describe("bowersPorePressure (property-based)", () => {
  // Bowers 1995 (SPE Drilling & Completion 10(2), SPE-27488; from memory): V = V0 + A·σ^B,
  // so σ rises and Pp = Sv − σ falls as velocity rises — CHECK-VALUES §4.
  it("bowersPorePressure falls as velocity rises, stays ≤ Sv, and flags V below V0 as clipped at Sv (Bowers 1995 virgin curve; from memory)", () => {
    fc.assert(
      fc.property(finite(4000, 16000), finite(4000, 16000), finite(8, 20), finite(0.6, 0.9), (v1, v2, a, b) => {
        const v = [Math.min(v1, v2), Math.max(v1, v2)];
        const r = bowersPorePressure({ overburdenPsi: [10000, 10000], hydrostaticPsi: [4650, 4650], velocityFtPerS: v, a, b });
        expect(r.ppPsi[0]).toBeGreaterThanOrEqual(r.ppPsi[1]);
        for (let i = 0; i < 2; i++) {
          expect(r.ppPsi[i]).toBeLessThanOrEqual(10000);
          // V < V0 = 5000 ft/s would need negative σ: the value is held at Sv and flagged.
          if (v[i] < 5000) expect(r.flags[i] & PP_FLAG_CLIPPED_AT_OVERBURDEN).toBe(PP_FLAG_CLIPPED_AT_OVERBURDEN);
        }
      }),
      { seed: 41, numRuns: 300 },
    );
  });
});

describe("equivalentDepthPorePressure (property-based)", () => {
  // Foster & Whalen 1966 (JPT 18(2); from memory): Pp(Z) = Sv(Z) − [Sv(Ze) − Ph(Ze)] with
  // trend(Ze) = observed(Z) — CHECK-VALUES §5. With a linear trend t(z) = t0 − g·z and linear
  // Sv, Ph the root is Ze = (t0 − x)/g exactly, so Pp is known in closed form (own case).
  it("equivalentDepthPorePressure on a sampled linear trend matches the closed-form Ze and Pp (Foster & Whalen 1966; own case)", () => {
    fc.assert(
      fc.property(finite(150, 220), finite(0.004, 0.012), finite(0.9, 1.05), finite(0.44, 0.465), fc.array(finite(0, 1), { minLength: 1, maxLength: 40 }), (t0, g, svG, phG, us) => {
        // Well index = trend grid, 1000–11,000 ft every 50 ft; Sv, Ph linear so their
        // interpolation at Ze is exact. Sample i is made to match at Ze = 1000 + u·(Z − 1000).
        const tvdFt = Float64Array.from({ length: 201 }, (_, i) => 1000 + i * 50);
        const trend = tvdFt.map((z) => t0 - g * z);
        const zeWanted = tvdFt.map((z, i) => 1000 + us[i % us.length] * (z - 1000));
        const observed = zeWanted.map((z) => t0 - g * z);
        const sv = tvdFt.map((d) => svG * d);
        const ph = tvdFt.map((d) => phG * d);
        const frozen = [copy(tvdFt), copy(sv), copy(ph), copy(observed), copy(trend)];
        const r = equivalentDepthPorePressure({ tvdFt, overburdenPsi: sv, hydrostaticPsi: ph, observed, trend: { kind: "sampled", tvdFt, values: trend }, searchTopTvdFt: 1000 });
        for (let i = 0; i < tvdFt.length; i++) {
          // Ze to 1e-6 ft; Pp = Sv(Z) − (Sv − Ph)(Ze) = svG·Z − (svG − phG)·Ze to 1e-5 psi.
          expect(r.equivalentDepthFt[i]).toBeCloseTo(zeWanted[i], 6);
          expect(r.ppPsi[i]).toBeCloseTo(svG * tvdFt[i] - (svG - phG) * zeWanted[i], 5);
        }
        expect([tvdFt, sv, ph, observed, trend]).toEqual(frozen);
      }),
      { seed: 51, numRuns: 200 },
    );
  });
});

/** Hampel identifier written directly from its definition (Hampel 1974, JASA 69(346); from memory). */
function hampelReference(x: ArrayLike<number>, w: number, k: number): { values: number[]; spikes: number[] } {
  const h = (w - 1) / 2;
  const values: number[] = [];
  const spikes: number[] = [];
  const median = (a: number[]): number => {
    const s = [...a].sort((p, q) => p - q);
    const m = s.length;
    return m % 2 === 1 ? s[(m - 1) / 2] : 0.5 * (s[m / 2 - 1] + s[m / 2]);
  };
  for (let i = 0; i < x.length; i++) {
    if (Number.isNaN(x[i])) {
      values.push(NaN);
      continue;
    }
    const win: number[] = [];
    for (let j = Math.max(0, i - h); j <= Math.min(x.length - 1, i + h); j++) if (!Number.isNaN(x[j])) win.push(x[j]);
    const med = median(win);
    const mad = median(win.map((v) => Math.abs(v - med)));
    if (Math.abs(x[i] - med) > k * MAD_TO_SIGMA * mad) {
      spikes.push(i);
      values.push(med);
    } else values.push(x[i]);
  }
  return { values, spikes };
}

describe("despikeLog (property-based)", () => {
  it("despikeLog equals the Hampel rule computed from its definition, with NaN gaps and ties (Hampel 1974; from memory)", () => {
    const log = fc.array(fc.oneof(finite(40, 200), fc.constant(NaN), fc.integer({ min: 60, max: 63 }).map(Number), finite(-1e4, 1e4)), { minLength: 1, maxLength: 80 });
    fc.assert(
      fc.property(log, fc.integer({ min: 0, max: 8 }), finite(0.5, 5), (xs, hw, k) => {
        const w = 2 * hw + 1;
        const input = Float64Array.from(xs);
        const before = copy(input);
        const r = despikeLog({ values: input, window: { samples: w }, threshold: k });
        const ref = hampelReference(xs, w, k);
        expect(Array.from(r.values)).toEqual(ref.values);
        expect(Array.from(r.spikeIndex)).toEqual(ref.spikes);
        expect(input).toEqual(before);
      }),
      { seed: 61, numRuns: 300 },
    );
  });

  it("pickShalePoints point values are medians of their 20-ft windows, computed here from the definition (common practice, no source)", () => {
    fc.assert(
      fc.property(fc.array(fc.record({ gr: finite(20, 150), dt: fc.oneof(finite(60, 180), fc.constant(NaN)) }), { minLength: 5, maxLength: 120 }), (rows) => {
        const tvdFt = Float64Array.from(rows, (_, i) => 9000 + i * 2.5);
        const grApi = Float64Array.from(rows, (r) => r.gr);
        const dt = Float64Array.from(rows, (r) => r.dt);
        const pick = pickShalePoints({ tvdFt, grApi, criterion: { kind: "grCutoff", cutoffApi: 85 }, despike: "off", decimation: { kind: "window", windowFt: 20 }, curves: { dt } });
        for (let p = 0; p < pick.points.index.length; p++) {
          const key = Math.floor(pick.points.tvdFt[p] / 20);
          const members = rows.map((_, i) => i).filter((i) => pick.isShale[i] === 1 && Math.floor(tvdFt[i] / 20) === key);
          const vals = members.map((i) => dt[i]).filter((v) => !Number.isNaN(v)).sort((a, b) => a - b);
          const m = vals.length;
          const want = m === 0 ? NaN : m % 2 ? vals[(m - 1) / 2] : 0.5 * (vals[m / 2 - 1] + vals[m / 2]);
          expect(pick.points.values.dt[p]).toBe(want);
          expect(pick.points.sampleCount[p]).toBe(members.length);
        }
      }),
      { seed: 62, numRuns: 200 },
    );
  });
});

describe("integrateOverburden (property-based)", () => {
  // Sv(z) = ρw·g·Zw + ∫ρ g dz (Zoback 2007 eq. 1.6; published): with positive densities Sv
  // never decreases with depth, and the gradient lies between the lightest and heaviest
  // material's (0.43353 psi/ft per g/cc, CHECK-VALUES §0).
  it("integrateOverburden never decreases with depth for positive densities (Zoback 2007 eq. 1.6; published)", () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(finite(1.6, 2.8), fc.constant(NaN)), { minLength: 2, maxLength: 60 }), finite(0, 6000), (rho, water) => {
        const datums = { rtElevationFt: 82, waterDepthFt: water, seawaterDensityGcc: 1.03 };
        const top = 82 + water + 500;
        const tvdFt = Float64Array.from(rho, (_, i) => top + i * 10);
        const densityGcc = Float64Array.from(rho);
        const before = copy(densityGcc);
        const r = integrateOverburden({ tvdFt, datums, densityGcc });
        for (let i = 1; i < rho.length; i++) if (Number.isFinite(r.svPsi[i]) && Number.isFinite(r.svPsi[i - 1])) expect(r.svPsi[i]).toBeGreaterThanOrEqual(r.svPsi[i - 1]);
        for (let i = 0; i < rho.length; i++) if (Number.isFinite(r.svPsi[i])) expect(r.svPsi[i] / (tvdFt[i] - 82)).toBeLessThanOrEqual(2.8 * 0.43353 + 1e-9);
        expect(densityGcc).toEqual(before);
      }),
      { seed: 71, numRuns: 200 },
    );
  });
});

describe("mudWeightWindow (property-based)", () => {
  // Window = [Pp/D + trip margin, Shmin/D − kick margin] in psi/ft, margins converted at
  // 12/231 psi/ft per ppg (CHECK-VALUES §0; published, legal gallon).
  it("mudWeightWindow width is upper − lower and margins move the bounds by margin × 0.051948 psi/ft (CHECK-VALUES §0; published)", () => {
    fc.assert(
      fc.property(fc.array(fc.record({ pp: finite(0.44, 0.9), frac: finite(0.6, 1.0) }), { minLength: 1, maxLength: 30 }), finite(0, 1), finite(0, 1), (rows, trip, kick) => {
        const tvdFt = Float64Array.from(rows, (_, i) => 5000 + 100 * i);
        const ppPsi = Float64Array.from(rows, (r, i) => r.pp * tvdFt[i]);
        const fracturePsi = Float64Array.from(rows, (r, i) => Math.max(r.frac, r.pp + 0.2) * tvdFt[i]);
        const w = mudWeightWindow({ tvdFt, ppPsi, fracturePsi, tripMarginPpg: trip, kickMarginPpg: kick });
        for (let i = 0; i < rows.length; i++) {
          expect(w.lowerPsiPerFt[i]).toBeCloseTo(ppPsi[i] / tvdFt[i] + trip * (12 / 231), 12);
          expect(w.upperPsiPerFt[i]).toBeCloseTo(fracturePsi[i] / tvdFt[i] - kick * (12 / 231), 12);
          expect(w.widthPsiPerFt[i]).toBeCloseTo(w.upperPsiPerFt[i] - w.lowerPsiPerFt[i], 12);
        }
      }),
      { seed: 81, numRuns: 200 },
    );
  });
});
