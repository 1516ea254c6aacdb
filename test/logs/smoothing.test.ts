/**
 * Rolling median and moving average: hand-computed values (definitions: running median,
 * Tukey 1977, from memory; boxcar mean, common practice, no source) and NaN policy.
 */
import { describe, expect, it } from "vitest";
import { smoothMovingAverage, smoothRollingMedian, windowSampleCount } from "../../src/logs/index.js";
import { ShalepointError } from "../../src/errors.js";

describe("windowSampleCount", () => {
  it("converts a length in ft to an odd sample count", () => {
    expect(windowSampleCount({ lengthFt: 5, stepFt: 0.5 })).toBe(11); // 10 → made odd
    expect(windowSampleCount({ lengthFt: 4.5, stepFt: 0.5 })).toBe(9);
    expect(windowSampleCount({ lengthFt: 0.1, stepFt: 0.5 })).toBe(1);
    expect(windowSampleCount({ samples: 7 })).toBe(7);
  });
  it("rejects even and non-positive windows with E_RANGE", () => {
    expect(() => windowSampleCount({ samples: 4 })).toThrowError(ShalepointError);
    expect(() => windowSampleCount({ lengthFt: 5, stepFt: 0 })).toThrowError(/step/);
  });
});

describe("smoothRollingMedian", () => {
  it("matches hand-computed medians, truncating the window at the ends", () => {
    const x = new Float64Array([1, 9, 2, 3, 4]);
    const copy = x.slice();
    // Hand: [median(1,9), median(1,9,2), median(9,2,3), median(2,3,4), median(3,4)]
    expect(Array.from(smoothRollingMedian({ values: x, window: { samples: 3 } }))).toEqual([5, 2, 3, 3, 3.5]);
    expect(x).toEqual(copy);
  });
  it("keeps NaN samples NaN and skips NaN neighbours", () => {
    const x = new Float64Array([10, NaN, 30, 20, NaN, NaN, 50]);
    // Hand: i0 median(10) = 10; i2 median(30,20) = 25; i3 median(30,20) = 25; i6 median(50) = 50.
    const r = smoothRollingMedian({ values: x, window: { samples: 3 } });
    expect(Array.from(r)).toEqual([10, NaN, 25, 25, NaN, NaN, 50]);
  });
  it("uses the ft window: 1.5 ft at 0.5-ft steps = 3 samples", () => {
    const x = new Float64Array([1, 9, 2, 3, 4]);
    expect(Array.from(smoothRollingMedian({ values: x, window: { lengthFt: 1.5, stepFt: 0.5 } }))).toEqual([5, 2, 3, 3, 3.5]);
  });
});

describe("smoothMovingAverage", () => {
  it("matches hand-computed means with NaN skipped and kept", () => {
    const x = new Float64Array([1, 2, NaN, 4, 8]);
    // Hand: (1+2)/2, (1+2)/2, NaN, (4+8)/2, (4+8)/2
    expect(Array.from(smoothMovingAverage({ values: x, window: { samples: 3 } }))).toEqual([1.5, 1.5, NaN, 6, 6]);
  });
  it("leaves a straight line unchanged away from the ends (identity)", () => {
    const x = new Float64Array(50).map((_, i) => 100 - 0.37 * i);
    const r = smoothMovingAverage({ values: x, window: { samples: 9 } });
    for (let i = 4; i < 46; i++) expect(r[i]).toBeCloseTo(x[i], 12);
  });
});
