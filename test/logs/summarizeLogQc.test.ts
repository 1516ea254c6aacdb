/**
 * Log QC summary: counts, ranges and gaps checked by hand on a small log.
 */
import { describe, expect, it } from "vitest";
import { summarizeLogQc } from "../../src/logs/index.js";

describe("summarizeLogQc", () => {
  it("counts nulls, ranges, the longest interior gap and spikes", () => {
    const depth = new Float64Array(20).map((_, i) => 5000 + 0.5 * i);
    const gr = new Float64Array(20).map((_, i) => 60 + i); // smooth ramp 60..79
    gr[0] = NaN; // leading null: not a gap
    gr[5] = NaN; gr[6] = NaN; gr[7] = NaN; // interior gap of 3 samples
    gr[12] = NaN; // gap of 1
    gr[15] = 200; // spike
    const r = summarizeLogQc({ depthFt: depth, curves: Object.freeze({ GR: gr }) });
    const c = r.curves[0];
    // Hand: 5 nulls of 20; finite values 61..79 minus the gaps, with 200 at i = 15.
    expect(c.nullCount).toBe(5);
    expect(c.nullFraction).toBe(0.25);
    expect(c.min).toBe(61);
    expect(c.max).toBe(200);
    const finite = [61, 62, 63, 64, 68, 69, 70, 71, 73, 74, 200, 76, 77, 78, 79];
    expect(c.mean).toBeCloseTo(finite.reduce((a, b) => a + b) / finite.length, 12);
    expect(c.firstValidDepthFt).toBe(5000.5);
    expect(c.lastValidDepthFt).toBe(5009.5);
    expect(c.longestGapSamples).toBe(3);
    expect(c.longestGapFromFt).toBe(5002);
    expect(c.longestGapToFt).toBe(5004);
    expect(c.spikeCount).toBe(1);
    expect(r.topDepthFt).toBe(5000);
    expect(r.baseDepthFt).toBe(5009.5);
  });

  it("reports NaN statistics for an all-null curve", () => {
    const r = summarizeLogQc({ depthFt: new Float64Array([1, 2]), curves: { RHOB: new Float64Array([NaN, NaN]) } });
    expect(r.curves[0].nullCount).toBe(2);
    expect(r.curves[0].min).toBeNaN();
    expect(r.curves[0].longestGapSamples).toBe(0);
    expect(r.curves[0].spikeCount).toBe(0);
  });
});
