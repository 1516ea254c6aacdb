/**
 * Carried-order quantiles: checked against a plain full sort with the type-7 rule of
 * Hyndman & Fan 1996 (The American Statistician 50(4):361–365, definition 7) and against
 * mathjs quantileSeq (an independent library using the same interpolation).
 */
import { describe, expect, it } from "vitest";
import { docExampleQuantiles, plainSortType7 } from "../helpers/plainSortType7.js";
import { createCarriedOrderQuantiles, createXoshiro128Random, insertionSortIndexRange } from "../../src/uncertainty/index.js";

describe("createCarriedOrderQuantiles", () => {
  it("doc example [4, 1, 3, 2] → 1.3, 2.5, 3.7, as mathjs quantileSeq", () => {
    // Source: Hyndman & Fan 1996, def. 7 (published); own case 1.3, 2.5, 3.7; mathjs (library).
    const { out, valuesAfter, mathjs } = docExampleQuantiles(createCarriedOrderQuantiles({ count: 4, probabilities: [0.1, 0.5, 0.9] }));
    out.forEach((v, k) => expect(v).toBeCloseTo(mathjs[k], 12));
    expect(out).toEqual([expect.closeTo(1.3, 12), expect.closeTo(2.5, 12), expect.closeTo(3.7, 12)]);
    expect(valuesAfter).toEqual([4, 1, 3, 2]); // values are not reordered
  });

  it("equals a plain sort, bit for bit, over correlated samples with order jumps, reversals and ties", () => {
    // Source: type-7 definition (published). Each sample mimics one depth of a Monte Carlo run:
    // fixed per-realisation parameters, a smooth depth trend with crossing realisations, and
    // every so often a full reversal, a random shuffle or a block of ties (order jumps that
    // must fall back to a fresh sort).
    const R = 1000;
    const P = [0, 0.1, 0.25, 0.5, 0.9, 1];
    const rnd = createXoshiro128Random(11);
    const a = Float64Array.from({ length: R }, () => rnd.nextFloat());
    const b = Float64Array.from({ length: R }, () => rnd.nextFloat());
    const t = createCarriedOrderQuantiles({ count: R, probabilities: P });
    const x = new Float64Array(R);
    const out = new Float64Array(P.length);
    for (let d = 0; d < 400; d++) {
      for (let r = 0; r < R; r++) {
        if (d % 50 === 7) x[r] = Math.round(a[r] * 3); // ties
        else if (d % 97 === 13) x[r] = -(1000 + 30 * a[r]); // reversal of the usual order
        else if (d % 61 === 5) x[r] = rnd.nextFloat(); // unrelated order
        else x[r] = 1000 + d + 30 * a[r] * Math.sin(d / 40) + 5 * b[r];
      }
      const copy = Float64Array.from(x);
      const before = t.fullSorts();
      t.quantiles(x, out, 0);
      if (d % 97 === 13) expect(t.fullSorts()).toBe(before + 1); // a reversal needs a fresh sort
      P.forEach((p, k) => expect(out[k]).toBe(plainSortType7(copy, p)));
      expect(x).toEqual(copy);
      for (let k = 1; k < R; k++) expect(x[t.order[k]] >= x[t.order[k - 1]]).toBe(true);
    }
    // Most samples kept the carried order (own count on this seeded case: 60 of 400 sorted afresh).
    expect(t.fullSorts()).toBeLessThan(100);
  });

  it("agrees with a plain sort for n = 1, 2, 10, 11 and writes at the offset", () => {
    // Source: type-7 definition (published).
    const rnd = createXoshiro128Random(5);
    for (const n of [1, 2, 10, 11]) {
      const t = createCarriedOrderQuantiles({ count: n, probabilities: [0.1, 0.5, 0.9] });
      const out = new Float64Array(5).fill(-1);
      for (let rep = 0; rep < 3; rep++) {
        const v = Float64Array.from({ length: n }, () => rnd.nextFloat());
        t.quantiles(v, out, 2);
        expect(out[0]).toBe(-1);
        expect(out[1]).toBe(-1);
        [0.1, 0.5, 0.9].forEach((p, k) => expect(out[2 + k]).toBe(plainSortType7(v, p)));
      }
    }
  });

  it("rejects a bad count and probabilities that are not ascending in [0, 1]", () => {
    expect(() => createCarriedOrderQuantiles({ count: 0, probabilities: [0.5] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => createCarriedOrderQuantiles({ count: 10, probabilities: [0.9, 0.1] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => createCarriedOrderQuantiles({ count: 10, probabilities: [10] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("insertionSortIndexRange", () => {
  it("sorts only idx[from..to−1] by key, leaves the rest, and gives up past the move cap (own case, counted by hand)", () => {
    const key = Float64Array.of(5, 4, 3, 2, 1, 0);
    const idx = Int32Array.of(0, 1, 2, 3, 4, 5);
    // Positions 1..4 hold keys 4, 3, 2, 1: reversed, 6 moves by straight insertion.
    expect(insertionSortIndexRange(idx, key, 1, 5, 6)).toBe(true);
    expect(Array.from(idx)).toEqual([0, 4, 3, 2, 1, 5]);
    const again = Int32Array.of(0, 1, 2, 3, 4, 5);
    expect(insertionSortIndexRange(again, key, 1, 5, 5)).toBe(false);
    expect(Array.from(again).sort()).toEqual([0, 1, 2, 3, 4, 5]); // still a permutation
  });
});
