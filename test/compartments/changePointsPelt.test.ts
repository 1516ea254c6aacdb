/**
 * findChangePointsPelt: checked against the published example set of CHECK-VALUES §11
 * (Killick, Fearnhead & Eckley 2012, JASA 107(500):1590–1598 — published), against a
 * brute-force search over every segmentation, and against optimal partitioning (the
 * unpruned O(n²) recursion of the same paper, eq. 2) written here independently, with
 * direct two-pass segment costs instead of prefix sums.
 */
import { describe, expect, it } from "vitest";
import { findChangePointsPelt, type ChangePointCost } from "../../src/compartments/index.js";
import { ShalepointError } from "../../src/errors.js";
import { seededUniform } from "../helpers/seededRandom.js";

const Y = Object.freeze([0.1, -0.2, 0.0, 0.3, -0.1, 5.2, 4.9, 5.1, 4.8, 5.0, 1.0, 1.2, 0.9, 1.1, 0.8]);

/** Seeded uniform generator (mulberry32, test/helpers/seededRandom.ts), so every random case is reproducible. */
const rng = seededUniform;
function gauss(r: () => number): number {
  return Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r());
}

/** Direct segment cost (two-pass), independent of the module's prefix sums. */
function directCost(y: ArrayLike<number>, x: ArrayLike<number>, a: number, b: number, cost: ChangePointCost): number {
  const m = b - a;
  let my = 0;
  let mx = 0;
  for (let i = a; i < b; i++) {
    my += y[i];
    mx += x[i];
  }
  my /= m;
  mx /= m;
  if (cost === "mean") {
    let s = 0;
    for (let i = a; i < b; i++) s += (y[i] - my) ** 2;
    return s;
  }
  let sxx = 0;
  let sxy = 0;
  for (let i = a; i < b; i++) {
    sxx += (x[i] - mx) ** 2;
    sxy += (x[i] - mx) * (y[i] - my);
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  let s = 0;
  for (let i = a; i < b; i++) s += (y[i] - my - slope * (x[i] - mx)) ** 2;
  return s;
}

/** Optimal partitioning (no pruning), Killick et al. 2012 eq. 2 recursion. */
function optimalPartitioning(y: ArrayLike<number>, beta: number, minSeg: number, cost: ChangePointCost): { cost: number; cps: number[] } {
  const n = y.length;
  const x = Array.from({ length: n }, (_, i) => i);
  const F = new Array<number>(n + 1).fill(Infinity);
  const last = new Array<number>(n + 1).fill(0);
  F[0] = -beta;
  for (let t = minSeg; t <= n; t++) {
    for (let tau = 0; tau <= t - minSeg; tau++) {
      if (tau !== 0 && tau < minSeg) continue;
      const v = F[tau] + directCost(y, x, tau, t, cost) + beta;
      if (v < F[t]) {
        F[t] = v;
        last[t] = tau;
      }
    }
  }
  const cps: number[] = [];
  for (let t = last[n]; t > 0; t = last[t]) cps.unshift(t);
  return { cost: F[n], cps };
}

/** Brute force over all 2^(n−1) sets of change positions. */
function bruteForce(y: ArrayLike<number>, beta: number): { cost: number; cps: number[] } {
  const n = y.length;
  const x = Array.from({ length: n }, (_, i) => i);
  let best = { cost: Infinity, cps: [] as number[] };
  for (let mask = 0; mask < 1 << (n - 1); mask++) {
    const cps: number[] = [];
    for (let k = 1; k < n; k++) if (mask & (1 << (k - 1))) cps.push(k);
    const bounds = [0, ...cps, n];
    let c = beta * cps.length;
    for (let s = 0; s + 1 < bounds.length; s++) c += directCost(y, x, bounds[s], bounds[s + 1], "mean");
    if (c < best.cost) best = { cost: c, cps };
  }
  return best;
}

describe("findChangePointsPelt — published example set (CHECK-VALUES §11, published)", () => {
  it("penalty 10 → changes after samples 5 and 10, cost 20.35", () => {
    const r = findChangePointsPelt({ values: Y, penalty: 10, minSegmentSamples: 1 });
    expect(r.changePointIndices).toEqual([5, 10]);
    // 4 significant figures as printed; the exact value is 20 + 0.148 + 0.1 + 0.1 = 20.348
    expect(r.totalCost).toBeCloseTo(20.348, 9);
  });
  it("penalty 2·ln 15 → same change points, cost 11.18", () => {
    const r = findChangePointsPelt({ values: Y, penalty: 2 * Math.log(15), minSegmentSamples: 1 });
    expect(r.changePointIndices).toEqual([5, 10]);
    expect(r.totalCost).toBeCloseTo(11.18, 2);
    expect(r.totalCost).toBeCloseTo(0.348 + 4 * Math.log(15), 9);
  });
  it("penalty 100 → no change, cost 69.95 (total sum of squares)", () => {
    const r = findChangePointsPelt({ values: Y, penalty: 100, minSegmentSamples: 1 });
    expect(r.changePointIndices).toEqual([]);
    expect(r.segments).toHaveLength(1);
    expect(r.totalCost).toBeCloseTo(69.95, 2);
  });
  it("agrees with a brute-force search over all 16,384 segmentations (exhaustive, own check)", () => {
    // Penalties with a unique optimum (at β = 0.05 two segmentations tie exactly in real arithmetic).
    for (const beta of [0.3, 1, 10, 2 * Math.log(15), 100]) {
      const bf = bruteForce(Y, beta);
      const r = findChangePointsPelt({ values: Y, penalty: beta, minSegmentSamples: 1 });
      expect(r.changePointIndices).toEqual(bf.cps);
      expect(r.totalCost).toBeCloseTo(bf.cost, 9);
    }
  });
  it("does not mutate its (frozen) input", () => {
    expect(() => findChangePointsPelt({ values: Y, penalty: 10 })).not.toThrow();
    expect(Y[5]).toBe(5.2);
  });
});

describe("findChangePointsPelt — agrees with optimal partitioning on seeded random series (exhaustive, own check)", () => {
  for (const cost of ["mean", "linear"] as const) {
    for (const minSeg of cost === "mean" ? [1, 2, 5] : [3, 6]) {
      it(`${cost} cost, minSegmentSamples ${minSeg}, 12 series of 60 samples`, () => {
        const r = rng(1000 + minSeg + (cost === "linear" ? 50 : 0));
        for (let rep = 0; rep < 12; rep++) {
          const y = new Float64Array(60);
          let level = 0;
          let slope = 0;
          for (let i = 0; i < 60; i++) {
            if (r() < 0.08) {
              level += 4 * gauss(r);
              slope = cost === "linear" ? 0.5 * gauss(r) : 0;
            }
            level += slope;
            y[i] = level + gauss(r);
          }
          const beta = [1, 3, 8][rep % 3];
          const op = optimalPartitioning(y, beta, minSeg, cost);
          const pelt = findChangePointsPelt({ values: y, penalty: beta, minSegmentSamples: minSeg, cost });
          // Same optimum; costs agree to rounding of the prefix sums (values ~10, n 60).
          expect(pelt.totalCost).toBeCloseTo(op.cost, 7);
          expect(pelt.changePointIndices).toEqual(op.cps);
          for (const s of pelt.segments) expect(s.nUsed).toBeGreaterThanOrEqual(minSeg);
        }
      });
    }
  }
});

describe("findChangePointsPelt — noise-based default penalty", () => {
  it("σ̂ = 1.4826·MAD(diff)/√2 (Hampel 1974 consistency constant, published) and β = 2σ̂²ln n", () => {
    // First differences ±1, median 0, MAD 1 → σ̂ = 1.4826/√2 = 1.048357 (own case).
    const y = Object.freeze([0, 1, 0, 1, 0, 1, 0]);
    const r = findChangePointsPelt({ values: y });
    expect(r.penaltySource).toBe("noise");
    expect(r.noiseSigma).toBeCloseTo(1.4826 / Math.SQRT2, 12);
    expect(r.penalty).toBeCloseTo(2 * (1.4826 ** 2 / 2) * Math.log(7), 12); // 4.27734
    expect(r.penalty).toBeCloseTo(4.27734, 4);
  });
  it("linear cost uses 3 parameters per change: β = 3σ̂²ln n", () => {
    const y = Object.freeze([0, 1, 0, 1, 0, 1, 0, 1, 0]);
    const r = findChangePointsPelt({ values: y, cost: "linear" });
    expect(r.penalty).toBeCloseTo(3 * (1.4826 ** 2 / 2) * Math.log(9), 12);
  });
  it("noise-free data → floored σ̂ and a W_NOISE_ZERO warning, never a zero penalty", () => {
    const r = findChangePointsPelt({ values: [1, 1, 1, 5, 5, 5] });
    expect(r.penalty).toBeGreaterThan(0);
    expect(r.warnings.map((w) => w.code)).toContain("W_NOISE_ZERO");
    expect(r.changePointIndices).toEqual([3]);
  });
});

describe("findChangePointsPelt — missing data and bad input", () => {
  it("skips NaN, reports the count, and keeps input indices", () => {
    const y = Float64Array.from([0, 0, NaN, 0, 10, 10, NaN, 10]);
    const copy = y.slice();
    const r = findChangePointsPelt({ values: y, penalty: 1, minSegmentSamples: 1 });
    expect(r.nSkipped).toBe(2);
    expect(r.nUsed).toBe(6);
    expect(r.changePointIndices).toEqual([4]);
    expect(r.segments[1].lastIndex).toBe(7);
    expect(r.warnings.map((w) => w.code)).toContain("W_SAMPLES_SKIPPED");
    expect(Array.from(y)).toEqual(Array.from(copy));
  });
  it("fewer usable samples than the minimum segment → E_TOO_SHORT", () => {
    expect(() => findChangePointsPelt({ values: [1, 2, NaN], minSegmentSamples: 3, penalty: 1 })).toThrow(ShalepointError);
    try {
      findChangePointsPelt({ values: [1, 2, NaN], minSegmentSamples: 3, penalty: 1 });
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_TOO_SHORT");
      expect((e as ShalepointError).details.value).toBe(2);
    }
  });
  it("penalty ≤ 0 → E_RANGE", () => {
    for (const p of [0, -1, NaN]) {
      try {
        findChangePointsPelt({ values: Y, penalty: p });
        expect.unreachable();
      } catch (e) {
        expect((e as ShalepointError).code).toBe("E_RANGE");
        expect((e as ShalepointError).details.param).toBe("penalty");
      }
    }
  });
  it("linear cost with minSegmentSamples < 3 → E_RANGE; decreasing positions → E_ORDER", () => {
    expect(() => findChangePointsPelt({ values: Y, cost: "linear", minSegmentSamples: 2, penalty: 1 })).toThrow(/minSegmentSamples/);
    try {
      findChangePointsPelt({ values: [1, 2, 3, 4], positions: [0, 2, 1, 3], cost: "linear", penalty: 1 });
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_ORDER");
    }
  });
});

