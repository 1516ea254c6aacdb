import { describe, it, expect } from "vitest";
import { fitDcNormalTrend, evaluateDcNormalTrend } from "../../src/drilling/dcNormalTrend.js";

describe("evaluateDcNormalTrend", () => {
  it("log-linear trend 0.8·e^(1e-4·Z) at Z 10,000 ft → 2.175 (CHECK-VALUES §2, Zhang 2011 Rn = R0·e^(bZ) shape, own case)", () => {
    const v = evaluateDcNormalTrend({ trend: Object.freeze({ dcAtMudline: 0.8, ratePerFt: 1e-4 }), bmlFt: [10000, -5] });
    expect(v[0]).toBeCloseTo(2.175, 3);
    expect(Number.isNaN(v[1])).toBe(true); // above the mudline
    // a 1 % larger rate moves the value by e^(0.01) − 1 ≈ 1 %: fails if the coefficient moves
    expect(evaluateDcNormalTrend({ trend: { dcAtMudline: 0.8, ratePerFt: 1.01e-4 }, bmlFt: [10000] })[0]).not.toBeCloseTo(2.175, 2);
  });
});

describe("fitDcNormalTrend", () => {
  it("fits ln(dc) on depth exactly for points on a line, and skips NaN and samples outside the intervals (own case)", () => {
    const z = [1000, 2000, 3000, 4000, 5000, 9000];
    const dc = z.map((x) => 0.7 * Math.exp(6e-5 * x));
    dc[2] = NaN;
    dc[5] = 5; // overpressured: outside the interval
    const fit = fitDcNormalTrend({ bmlFt: z, dc, intervals: [{ topBmlFt: 0, baseBmlFt: 6000 }] });
    expect(fit.n).toBe(4);
    expect(fit.trend.dcAtMudline).toBeCloseTo(0.7, 12);
    expect(fit.trend.ratePerFt).toBeCloseTo(6e-5, 15);
    expect(fit.residualStdLn).toBeLessThan(1e-12);
    expect(fit.bmlRangeFt).toEqual({ topFt: 1000, baseFt: 5000 });
    // geometric mean (CHECK-VALUES §2 own case): a log-linear trend through 150 @ 2000 and 100 @ 10,000 gives 122.5 @ 6000
    // (dc scaled by 1/100; the third point, at 14,000 ft, lies on the same line: 1.0·(1/1.5)^0.5)
    const g = fitDcNormalTrend({ bmlFt: [2000, 10000, 14000], dc: [1.5, 1.0, Math.sqrt(1 / 1.5)], intervals: [{ topBmlFt: 0, baseBmlFt: 15000 }] });
    expect(evaluateDcNormalTrend({ trend: g.trend, bmlFt: [6000] })[0] * 100).toBeCloseTo(122.5, 1);
  });

  it("doc example: three points on 0.8·e^(5e-5·Z) give dcAtMudline 0.8 and rate 5e-5 (own case)", () => {
    const fit = fitDcNormalTrend({ bmlFt: [0, 1000, 2000], dc: [0.8, 0.8 * Math.exp(0.05), 0.8 * Math.exp(0.1)], intervals: [{ topBmlFt: 0, baseBmlFt: 2000 }] });
    expect(fit.trend.dcAtMudline).toBeCloseTo(0.8, 12);
    expect(fit.trend.ratePerFt).toBeCloseTo(5e-5, 15);
  });

  it("throws E_TOO_FEW_POINTS with fewer than 3 samples or one depth", () => {
    expect(() => fitDcNormalTrend({ bmlFt: [1, 2], dc: [1, 1], intervals: [{ topBmlFt: 0, baseBmlFt: 5 }] })).toThrow(expect.objectContaining({ code: "E_TOO_FEW_POINTS" }));
    expect(() => fitDcNormalTrend({ bmlFt: [1, 1, 1], dc: [1, 2, 3], intervals: [{ topBmlFt: 0, baseBmlFt: 5 }] })).toThrow(expect.objectContaining({ code: "E_TOO_FEW_POINTS" }));
  });
});
