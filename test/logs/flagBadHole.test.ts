/**
 * Bad-hole flags (rules: common practice, no source): caliper − bit > limit, |DRHO| > limit.
 */
import { describe, expect, it } from "vitest";
import { flagBadHole } from "../../src/logs/index.js";
import { ShalepointError } from "../../src/errors.js";

describe("flagBadHole", () => {
  it("flags enlargement above the limit, not at it, and leaves NaN caliper unflagged", () => {
    const cal = new Float64Array([8.6, 9.5, 9.51, 12.3, NaN]);
    const copy = cal.slice();
    const r = flagBadHole({ caliperIn: cal, bitSizeIn: 8.5 });
    // Default 1.0 in: 9.5 − 8.5 = 1.0 is not above the limit; 9.51 is.
    expect(Array.from(r.isBadHole)).toEqual([0, 0, 1, 1, 0]);
    expect(r.count).toBe(2);
    expect(r.unknownCount).toBe(1);
    expect(cal).toEqual(copy);
  });

  it("follows a bit-size array across a casing point and uses the density correction", () => {
    const cal = new Float64Array([13.0, 13.0, 8.7, 8.7]);
    const bit = new Float64Array([12.25, 12.25, 8.5, 8.5]);
    const drho = new Float64Array([0.02, -0.16, 0.12, NaN]);
    const r = flagBadHole({ caliperIn: cal, bitSizeIn: bit, enlargementLimitIn: 0.5, densityCorrectionGcc: drho });
    expect(Array.from(r.byCaliper)).toEqual([1, 1, 0, 0]); // 0.75 in > 0.5 in
    expect(Array.from(r.byDensityCorrection)).toEqual([0, 1, 1, 0]); // |Δρ| > 0.10 g/cc
    expect(Array.from(r.isBadHole)).toEqual([1, 1, 1, 0]);
  });

  it("throws on misaligned arrays", () => {
    expect(() => flagBadHole({ caliperIn: new Float64Array(3), bitSizeIn: new Float64Array(2) })).toThrowError(ShalepointError);
  });
});
