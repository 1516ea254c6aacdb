/**
 * The @example values written in the doc comments of src/trend and src/io/trendFile.ts,
 * checked so the documentation cannot drift. Values worked by hand from the formulas named
 * in each doc comment (CHECK-VALUES §2 own cases where they apply).
 */
import { describe, expect, it } from "vitest";
import {
  sonicExponentialTrendUsPerFt,
  sonicLogLinearTrendUsPerFt,
  resistivityLogLinearTrendOhmM,
  fitStraightLine,
  fitStraightLineHuber,
  fitCompactionTrend,
  evaluateCompactionTrend,
} from "../../src/trend/index.js";
import { parseTrendFile } from "../../src/io/trendFile.js";

describe("doc examples in src/trend", () => {
  it("model values: 95.12 µs/ft, 122.5 µs/ft (166·10^(−0.132)), 2.175 ohm·m (0.8·e)", () => {
    expect(sonicExponentialTrendUsPerFt({ bmlFt: 5000, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 } })).toBeCloseTo(95.12, 2);
    expect(sonicLogLinearTrendUsPerFt({ bmlFt: 6000, params: { dtMudlineUsPerFt: 166.0, log10SlopePerFt: -2.2e-5 } })).toBeCloseTo(122.5, 1);
    expect(resistivityLogLinearTrendOhmM({ bmlFt: 10000, params: { r0OhmM: 0.8, growthPerFt: 1e-4 } })).toBeCloseTo(2.175, 3);
    expect(evaluateCompactionTrend({ trend: { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }] }, bmlFt: [10000] })[0]).toBeCloseTo(2.175, 3);
  });
  it("fitStraightLine: (0,1),(1,3),(2,5),(3,7.5) → slope 2.15, intercept 0.9 (closed form: Sxy 10.75 / Sxx 5)", () => {
    const f = fitStraightLine({ x: [0, 1, 2, 3], y: [1, 3, 5, 7.5] });
    expect(f.slope).toBeCloseTo(2.15, 12);
    expect(f.intercept).toBeCloseTo(0.9, 12);
  });
  it("fitStraightLineHuber: y = x with one spike at x = 3 → slope 1, intercept 0", () => {
    const f = fitStraightLineHuber({ x: [0, 1, 2, 3, 4, 5], y: [0, 1, 2, 30, 4, 5] });
    expect(f.slope).toBeCloseTo(1, 6);
    expect(f.intercept).toBeCloseTo(0, 6);
  });
  it("fitCompactionTrend: three exact points of 0.8·e^(1e-4·Z) → r0 0.8, growth 1e-4, R² 1", () => {
    const f = fitCompactionTrend({
      kind: "resistivityLogLinear",
      bmlFt: [1000, 2000, 3000],
      values: [0.8 * Math.exp(0.1), 0.8 * Math.exp(0.2), 0.8 * Math.exp(0.3)],
      intervals: [{ topBmlFt: 0, baseBmlFt: 5000 }],
    });
    expect(f.params.r0OhmM).toBeCloseTo(0.8, 12);
    expect(f.params.growthPerFt).toBeCloseTo(1e-4, 15);
    expect(f.diagnostics.rSquared).toBeCloseTo(1, 12);
  });
  it("parseTrendFile: the example file reads back as written", () => {
    const t = parseTrendFile('{"format":"shalepoint-trend","version":1,"kind":"resistivityLogLinear","segments":[{"topBmlFt":0,"params":{"r0OhmM":0.8,"growthPerFt":1e-4},"fittedOn":null}]}');
    expect(t).toEqual({ kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 0.0001 }, fittedOn: null }] });
  });
});
