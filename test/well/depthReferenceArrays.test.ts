/**
 * TVDSS and depth below mudline for a whole index. Checks: CHECK-VALUES §1 own case
 * (air gap 80 ft, water 3000 ft, 10,000 ft RKB → 6920 ft below mudline) and the Quillon
 * datums of SCENARIO.md (air gap 82 ft).
 */
import { describe, expect, it } from "vitest";
import { depthReferenceArrays, type Datums } from "../../src/well/index.js";

describe("depthReferenceArrays", () => {
  it("gives TVDSS = TVD − air gap and BML = TVDSS − water depth offshore", () => {
    const datums: Datums = Object.freeze({ rtElevationFt: 80, waterDepthFt: 3000, seawaterDensityGcc: 1.03 });
    const tvd = new Float64Array([10000, 80, NaN]);
    const r = depthReferenceArrays({ tvdFt: tvd, datums });
    // Own case, CHECK-VALUES §1: D_bml 6920 ft.
    expect(r.bmlFt[0]).toBe(6920);
    expect(r.tvdssFt[0]).toBe(9920);
    expect(r.tvdssFt[1]).toBe(0); // sea level (identity)
    expect(r.bmlFt[2]).toBeNaN(); // NaN carries through
    expect(Array.from(tvd.subarray(0, 2))).toEqual([10000, 80]);
  });

  it("uses ground level onshore", () => {
    const datums: Datums = { rtElevationFt: 520, waterDepthFt: 0, groundLevelFt: 495, seawaterDensityGcc: 1.03 };
    const r = depthReferenceArrays({ tvdFt: new Float64Array([25, 1025]), datums });
    // Definition (well/types.ts): BML = TVD − (RT elevation − ground level) = TVD − 25.
    expect(Array.from(r.bmlFt)).toEqual([0, 1000]);
    expect(Array.from(r.tvdssFt)).toEqual([-495, 505]);
  });
});
