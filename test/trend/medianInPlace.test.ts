/**
 * medianInPlace: the textbook median (middle value, or the mean of the two middle values for
 * an even count) of a sorted copy, written independently of the selection code.
 */
import { describe, expect, it } from "vitest";
import { medianInPlace } from "../../src/trend/medianInPlace.js";
import { seededUniform as rng } from "../helpers/seededRandom.js";

describe("medianInPlace", () => {
  it("doc example: [3, 1, 2, 10] → 2.5 (definition of the median, common practice, no source)", () => {
    expect(medianInPlace(Float64Array.from([3, 1, 2, 10]))).toBe(2.5);
  });
  it("equals the sorted-array median on seeded random arrays with ties, odd and even lengths", () => {
    const r = rng(99);
    for (let rep = 0; rep < 50; rep++) {
      const n = 1 + Math.floor(r() * 40);
      const a = Float64Array.from({ length: n }, () => Math.round(r() * 10));
      const s = Array.from(a).sort((u, v) => u - v);
      const expected = n % 2 ? s[(n - 1) / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
      expect(medianInPlace(a.slice())).toBe(expected);
    }
    expect(Number.isNaN(medianInPlace(new Float64Array(0)))).toBe(true);
  });
});
