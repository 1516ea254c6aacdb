import { describe, expect, it } from "vitest";
import { interpolateShaleLine } from "../../src/logs/interpolateShaleLine.js";

describe("interpolateShaleLine", () => {
  it("joins points with straight lines in depth (doc example, worked by hand)", () => {
    const out = interpolateShaleLine({ pointTvdFt: [1000, 1100], pointValues: [120, 110], tvdFt: [1000, 1050, 1200] });
    expect(out[0]).toBe(120);
    expect(out[1]).toBe(115);
    expect(out[2]).toBeNaN();
  });
  it("skips NaN points, does not extrapolate, and leaves gaps wider than maxGapFt empty", () => {
    const out = interpolateShaleLine({
      pointTvdFt: Object.freeze([100, 200, 300, 2000]) as unknown as number[],
      pointValues: Object.freeze([10, NaN, 30, 40]) as unknown as number[],
      tvdFt: [50, 100, 150, 250, 300, 1000, 2000],
      maxGapFt: 500,
    });
    // 100 → 300 (200 ft gap, bridged): 150 → 15, 250 → 25; 300 → 2000 (1700 ft) not bridged
    expect(Array.from(out)).toEqual([NaN, 10, 15, 25, 30, NaN, 40]);
  });
  it("a single point fills only its own depth", () => {
    const out = interpolateShaleLine({ pointTvdFt: [100], pointValues: [5], tvdFt: [99, 100, 101] });
    expect(Array.from(out)).toEqual([NaN, 5, NaN]);
  });
  it("rejects unsorted points and a bad gap", () => {
    expect(() => interpolateShaleLine({ pointTvdFt: [200, 100], pointValues: [1, 2], tvdFt: [150] })).toThrow(
      expect.objectContaining({ code: "E_NOT_SORTED" }),
    );
    expect(() => interpolateShaleLine({ pointTvdFt: [1], pointValues: [1], tvdFt: [1], maxGapFt: 0 })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
  });
});
