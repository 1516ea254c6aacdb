/**
 * Quantiles: checked against a plain full sort with the type-7 rule of Hyndman & Fan 1996
 * (The American Statistician 50(4):361–365, definition 7) and against mathjs quantileSeq
 * (an independent library using the same interpolation).
 */
import { describe, expect, it } from "vitest";
import { plainSortType7 } from "../helpers/plainSortType7.js";
import { quantileSeq } from "mathjs";
import { quantilesType7, quantilesType7InPlace, createQuantileTracker, createXoshiro128Random } from "../../src/uncertainty/index.js";

const P = [0, 0.1, 0.25, 0.5, 0.9, 1];

describe("quantilesType7", () => {
  it("matches mathjs on [1, 2, 3, 4] (own case: 1.3, 2.5, 3.7 by definition 7)", () => {
    // Source: Hyndman & Fan 1996, def. 7 (published); mathjs quantileSeq (library).
    const q = quantilesType7({ values: Object.freeze([1, 2, 3, 4]) as number[], probabilities: [0.1, 0.5, 0.9] }).quantiles;
    const ref = quantileSeq([1, 2, 3, 4], [0.1, 0.5, 0.9]) as number[];
    q.forEach((v, k) => expect(v).toBeCloseTo(ref[k], 12));
    expect(Array.from(q)).toEqual([expect.closeTo(1.3, 12), expect.closeTo(2.5, 12), expect.closeTo(3.7, 12)]);
  });

  it("equals a plain sort on seeded random arrays, with ties, n = 10, 11, 37, 700, 1500", () => {
    // Source: type-7 definition, Hyndman & Fan 1996 (published); selection must give the same order statistics.
    const rnd = createXoshiro128Random(42);
    for (const n of [1, 2, 10, 11, 37, 700, 1500]) {
      for (const ties of [false, true]) {
        const v = Array.from({ length: n }, () => (ties ? Math.floor(rnd.nextFloat() * 5) : rnd.nextFloat() * 1000 - 300));
        const q = quantilesType7({ values: v, probabilities: P }).quantiles;
        P.forEach((p, k) => expect(q[k]).toBe(plainSortType7(v, p)));
        const mj = quantileSeq(v, P) as number[];
        P.forEach((_, k) => expect(Math.abs(q[k] - mj[k])).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(mj[k]))));
      }
    }
  });

  it("skips NaN, keeps the caller's order of probabilities, leaves the input unchanged", () => {
    const v = Object.freeze([5, NaN, 1, 4, 2, 3]) as number[];
    const r = quantilesType7({ values: v, probabilities: [0.9, 0.1] });
    expect(r.n).toBe(5);
    expect(r.quantiles[0]).toBe(plainSortType7([5, 1, 4, 2, 3], 0.9)); // own case: 4.6
    expect(r.quantiles[1]).toBe(plainSortType7([5, 1, 4, 2, 3], 0.1)); // own case: 1.4
    expect(quantilesType7({ values: [NaN], probabilities: [0.5] }).quantiles[0]).toBeNaN();
  });

  it("rejects a probability outside [0, 1]", () => {
    expect(() => quantilesType7({ values: [1, 2], probabilities: [10] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("quantilesType7InPlace", () => {
  it("agrees with a plain sort (n = 10 and 11)", () => {
    const rnd = createXoshiro128Random(5);
    for (const n of [10, 11]) {
      const v = Array.from({ length: n }, () => rnd.nextFloat());
      const out = new Float64Array(3);
      quantilesType7InPlace(Float64Array.from(v), n, [0.1, 0.5, 0.9], out, 0, 1);
      [0.1, 0.5, 0.9].forEach((p, k) => expect(out[k]).toBe(plainSortType7(v, p)));
    }
  });
});

describe("createQuantileTracker", () => {
  it("is exact on a sequence of correlated samples, including jumps that defeat its bracket", () => {
    // Source: type-7 definition (published). Each sample mimics one depth of a Monte Carlo
    // run: fixed per-realisation parameters, a depth trend, occasional jumps and tie blocks.
    const R = 1000;
    const rnd = createXoshiro128Random(11);
    const a = Float64Array.from({ length: R }, () => rnd.nextFloat());
    const b = Float64Array.from({ length: R }, () => rnd.nextFloat());
    const tracker = createQuantileTracker({ count: R, probabilities: [0.1, 0.5, 0.9] });
    const x = new Float64Array(R);
    const out = new Float64Array(3);
    for (let d = 0; d < 400; d++) {
      const jump = d % 97 === 0 ? 50 * rnd.nextFloat() : 0;
      for (let r = 0; r < R; r++) {
        x[r] = d % 50 === 7 ? Math.round(a[r] * 3) : 1000 + d + jump + 30 * a[r] * Math.sin(d / 40) + 5 * b[r];
      }
      const copy = Array.from(x);
      tracker.quantiles(x, out, 0);
      [0.1, 0.5, 0.9].forEach((p, k) => expect(out[k]).toBe(plainSortType7(copy, p)));
      expect(Array.from(x)).toEqual(copy); // values are not reordered
    }
  });
});
