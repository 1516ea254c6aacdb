/**
 * Resampling to a regular TVD step: linear interpolation (common practice, no source)
 * checked against hand-computed values; gaps longer than the limit stay gaps.
 */
import { describe, expect, it } from "vitest";
import { resampleToTvdStep } from "../../src/well/index.js";
import { ShalepointError } from "../../src/errors.js";

describe("resampleToTvdStep", () => {
  it("interpolates linearly across a short gap (hand-computed)", () => {
    const tvd = new Float64Array([100, 101, 102]);
    const gr = new Float64Array([50, NaN, 70]);
    const r = resampleToTvdStep({ tvdFt: tvd, curves: Object.freeze({ GR: gr }), stepFt: 0.5, maxGapFt: 2 });
    expect(Array.from(r.tvdFt)).toEqual([100, 100.5, 101, 101.5, 102]);
    expect(Array.from(r.curves.GR)).toEqual([50, 55, 60, 65, 70]);
    expect(Number.isNaN(gr[1])).toBe(true); // input untouched
  });

  it("keeps a gap longer than maxGapFt as NaN", () => {
    const tvd = new Float64Array([0, 1, 2, 3, 4, 5, 6]);
    const dt = new Float64Array([100, 101, NaN, NaN, NaN, 105, 106]);
    const r = resampleToTvdStep({ tvdFt: tvd, curves: { DT: dt }, stepFt: 1, maxGapFt: 3 });
    // Valid neighbours 1 ft and 5 ft are 4 ft apart > 3 ft: grid 2–4 stay NaN.
    expect(Array.from(r.curves.DT)).toEqual([100, 101, NaN, NaN, NaN, 105, 106]);
    const bridged = resampleToTvdStep({ tvdFt: tvd, curves: { DT: dt }, stepFt: 1, maxGapFt: 4 });
    expect(Array.from(bridged.curves.DT)).toEqual([100, 101, 102, 103, 104, 105, 106]);
  });

  it("aligns the grid to multiples of the step and never extrapolates", () => {
    const tvd = new Float64Array([99.7, 100.9, 102.3, NaN]);
    const v = new Float64Array([NaN, 2, 4.8, 9]);
    const r = resampleToTvdStep({ tvdFt: tvd, curves: { V: v }, stepFt: 1, maxGapFt: 5 });
    expect(Array.from(r.tvdFt)).toEqual([100, 101, 102]);
    // 100 lies above the first valid V sample (100.9): NaN. 101: 2 + 2.8·0.1/1.4 = 2.2. 102: 2 + 2.8·1.1/1.4 = 4.2.
    expect(r.curves.V[0]).toBeNaN();
    expect(r.curves.V[1]).toBeCloseTo(2.2, 12);
    expect(r.curves.V[2]).toBeCloseTo(4.2, 12);
  });

  it("throws typed errors for bad input", () => {
    const code = (f: () => unknown): string => { try { f(); return "none"; } catch (e) { return (e as ShalepointError).code; } };
    expect(code(() => resampleToTvdStep({ tvdFt: new Float64Array([1, 1]), curves: {}, stepFt: 1, maxGapFt: 1 }))).toBe("E_NOT_SORTED");
    expect(code(() => resampleToTvdStep({ tvdFt: new Float64Array([1, 2]), curves: {}, stepFt: 0, maxGapFt: 1 }))).toBe("E_RANGE");
    expect(code(() => resampleToTvdStep({ tvdFt: new Float64Array([1, 2]), curves: { A: new Float64Array(3) }, stepFt: 1, maxGapFt: 1 }))).toBe("E_LENGTH");
    expect(code(() => resampleToTvdStep({ tvdFt: new Float64Array([NaN]), curves: {}, stepFt: 1, maxGapFt: 1 }))).toBe("E_TOO_FEW");
  });
});
