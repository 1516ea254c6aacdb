/**
 * Partitioned-order quantiles: checked against a plain full sort with the type-7 rule of
 * Hyndman & Fan 1996 (The American Statistician 50(4):361–365, definition 7) and against
 * mathjs quantileSeq (an independent library using the same interpolation).
 */
import { describe, expect, it } from "vitest";
import { docExampleQuantiles, plainSortType7 } from "../helpers/plainSortType7.js";
import { createPartitionedOrderQuantiles, createXoshiro128Random } from "../../src/uncertainty/index.js";

describe("createPartitionedOrderQuantiles", () => {
  it("doc example [4, 1, 3, 2] → 1.3, 2.5, 3.7, as mathjs quantileSeq", () => {
    // Source: Hyndman & Fan 1996, def. 7 (published); own case 1.3, 2.5, 3.7; mathjs (library).
    const { out, valuesAfter, mathjs } = docExampleQuantiles(createPartitionedOrderQuantiles({ count: 4, probabilities: [0.1, 0.5, 0.9] }));
    out.forEach((v, k) => expect(v).toBeCloseTo(mathjs[k], 12));
    expect(out).toEqual([expect.closeTo(1.3, 12), expect.closeTo(2.5, 12), expect.closeTo(3.7, 12)]);
    expect(valuesAfter).toEqual([4, 1, 3, 2]); // values are not reordered
  });

  it("equals a plain sort, bit for bit, with many crossings, jumps over windows, reversals, ties and unrelated samples", () => {
    // Source: type-7 definition (published). Each sample mimics one depth of a Monte Carlo run
    // near normal pressure: realisations with their own slopes cross each other steadily
    // (hundreds of crossings per sample), a few jump far each sample, and every so often the
    // order reverses, becomes unrelated, or collapses into ties.
    const R = 1000;
    const P = [0.1, 0.5, 0.9];
    const rnd = createXoshiro128Random(23);
    const a = Float64Array.from({ length: R }, () => rnd.nextFloat());
    const s = Float64Array.from({ length: R }, () => rnd.nextFloat() - 0.5);
    const t = createPartitionedOrderQuantiles({ count: R, probabilities: P });
    const x = new Float64Array(R);
    const out = new Float64Array(P.length);
    let plainDepths = 0;
    for (let d = 0; d < 600; d++) {
      const kind = d % 97 === 13 ? "reverse" : d % 61 === 5 ? "unrelated" : d % 50 === 7 ? "ties" : d % 71 === 3 ? "equal" : "cross";
      for (let r = 0; r < R; r++) {
        if (kind === "reverse") x[r] = -(1000 + 30 * a[r]);
        else if (kind === "unrelated") x[r] = rnd.nextFloat();
        else if (kind === "ties") x[r] = Math.round(a[r] * 3);
        else if (kind === "equal") x[r] = 5;
        else x[r] = 1000 + d + a[r] + 0.2 * d * s[r] * 1e-2 + (rnd.nextFloat() < 0.01 ? 0.3 * (rnd.nextFloat() - 0.5) : 0);
      }
      if (kind === "cross") plainDepths++;
      const copy = Float64Array.from(x);
      t.quantiles(x, out, 0);
      P.forEach((p, k) => expect(out[k]).toBe(plainSortType7(copy, p)));
      expect(x).toEqual(copy);
    }
    // Crossing samples keep the partition (own count on this seeded case: the special
    // samples and the first need a whole sort, the crossing ones almost never).
    expect(plainDepths).toBeGreaterThan(500);
    expect(t.fullSorts()).toBeLessThan(80);
  });

  it("agrees with a plain sort for n = 1, 2, 10, 11, 59, 60, 200 and any probabilities, writing at the offset", () => {
    // Source: type-7 definition (published). Small n (overlapping windows) takes the carried
    // full order; n ≥ 60 with P10/P50/P90 takes the partition.
    const rnd = createXoshiro128Random(5);
    for (const n of [1, 2, 10, 11, 59, 60, 200]) {
      for (const P of [[0.1, 0.5, 0.9], [0, 1], [0.25, 0.75], [0.5]]) {
        const t = createPartitionedOrderQuantiles({ count: n, probabilities: P });
        const out = new Float64Array(P.length + 2).fill(-1);
        const base = Float64Array.from({ length: n }, () => rnd.nextFloat());
        for (let rep = 0; rep < 20; rep++) {
          const v = Float64Array.from(base, (b) => b + 0.05 * rep * rnd.nextFloat());
          t.quantiles(v, out, 2);
          expect(out[0]).toBe(-1);
          expect(out[1]).toBe(-1);
          P.forEach((p, k) => expect(out[2 + k]).toBe(plainSortType7(v, p)));
        }
      }
    }
  });

  it("rejects a bad count and probabilities that are not ascending in [0, 1]", () => {
    expect(() => createPartitionedOrderQuantiles({ count: 0, probabilities: [0.5] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => createPartitionedOrderQuantiles({ count: 10, probabilities: [0.9, 0.1] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => createPartitionedOrderQuantiles({ count: 10, probabilities: [10] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});
