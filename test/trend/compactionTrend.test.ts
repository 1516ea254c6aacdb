/**
 * Normal compaction trends: models checked against CHECK-VALUES §2 (Zhang 2011 and
 * Hottman & Johnson 1965 forms, own cases); fits recover known parameters from seeded
 * synthetic shale points; Huber shrugs off 5 % gross outliers where least squares does not;
 * R² and standard errors match the simple linear regression closed forms.
 */
import { describe, expect, it } from "vitest";
import {
  sonicExponentialTrendUsPerFt,
  sonicLogLinearTrendUsPerFt,
  resistivityLogLinearTrendOhmM,
  fitCompactionTrend,
  fitCompactionTrendSegments,
  evaluateCompactionTrend,
  fitStraightLine,
  MIN_TREND_POINTS,
  type CompactionTrend,
} from "../../src/trend/index.js";
import { seededNormal } from "../helpers/seededRandom.js";

const ALL = Object.freeze([{ topBmlFt: 0, baseBmlFt: 20000 }]);

describe("sonicExponentialTrendUsPerFt", () => {
  it("Δtm 65, Δtml 200, c 3.0e-4, Z 5000 ft → 95.12 µs/ft (CHECK-VALUES §2, own case on Zhang 2011, form from memory)", () => {
    const params = Object.freeze({ dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 });
    // 4 significant figures; a 1 % change in c moves the value by 0.5 µs/ft
    expect(Math.abs(sonicExponentialTrendUsPerFt({ bmlFt: 5000, params }) - 95.12)).toBeLessThan(0.005);
    expect(sonicExponentialTrendUsPerFt({ bmlFt: 0, params })).toBe(200);
    expect(sonicExponentialTrendUsPerFt({ bmlFt: -10, params })).toBeNaN();
  });
});

describe("resistivityLogLinearTrendOhmM", () => {
  it("R0 0.8, b 1.0e-4, Z 10,000 ft → 2.175 ohm·m (CHECK-VALUES §2, own case on Zhang 2011)", () => {
    expect(Math.abs(resistivityLogLinearTrendOhmM({ bmlFt: 10000, params: { r0OhmM: 0.8, growthPerFt: 1e-4 } }) - 2.175)).toBeLessThan(5e-4);
  });
});

describe("sonicLogLinearTrendUsPerFt", () => {
  it("semilog line through 150 µs/ft at 2000 ft and 100 at 10,000 ft gives 122.5 at 6000 ft, the geometric mean (CHECK-VALUES §2, own case on Hottman & Johnson 1965)", () => {
    const s = Math.log10(100 / 150) / 8000;
    const params = { dtMudlineUsPerFt: 150 / 10 ** (s * 2000), log10SlopePerFt: s };
    expect(Math.abs(sonicLogLinearTrendUsPerFt({ bmlFt: 6000, params }) - 122.5)).toBeLessThan(0.05);
    expect(sonicLogLinearTrendUsPerFt({ bmlFt: 10000, params })).toBeCloseTo(100, 10);
  });
});

describe("fitCompactionTrend", () => {
  it("recovers noiseless sonic exponential parameters with Δtm fixed (own case, Zhang 2011 form)", () => {
    const z = Object.freeze(Array.from({ length: 50 }, (_, i) => 500 + 150 * i));
    const dt = Object.freeze(z.map((Z) => 65 + 135 * Math.exp(-3e-4 * Z)));
    const f = fitCompactionTrend({ kind: "sonicExponential", bmlFt: z, values: dt, intervals: ALL, dtMatrixUsPerFt: 65 });
    expect(f.params.dtMudlineUsPerFt).toBeCloseTo(200, 9);
    expect(f.params.decayPerFt).toBeCloseTo(3e-4, 14);
    expect(f.diagnostics.rSquared).toBeCloseTo(1, 12);
    expect(f.diagnostics.n).toBe(50);
  });

  it("recovers noiseless log-linear sonic and resistivity parameters (own cases, CHECK-VALUES §2)", () => {
    const z = Array.from({ length: 40 }, (_, i) => 1000 + 200 * i);
    const s = Math.log10(100 / 150) / 8000;
    const dtMl = 150 / 10 ** (s * 2000);
    const fs = fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: z.map((Z) => dtMl * 10 ** (s * Z)), intervals: ALL });
    expect(Math.abs(fs.params.dtMudlineUsPerFt / dtMl - 1)).toBeLessThan(1e-12);
    expect(Math.abs(fs.params.log10SlopePerFt / s - 1)).toBeLessThan(1e-10);
    const fr = fitCompactionTrend({ kind: "resistivityLogLinear", bmlFt: z, values: z.map((Z) => 0.8 * Math.exp(1e-4 * Z)), intervals: ALL });
    expect(fr.params.r0OhmM).toBeCloseTo(0.8, 12);
    expect(fr.params.growthPerFt).toBeCloseTo(1e-4, 15);
  });

  it("recovers sonic exponential parameters from noisy points within 4 standard errors (seeded, own case)", () => {
    const rnd = seededNormal(42);
    const z: number[] = [];
    const dt: number[] = [];
    for (let i = 0; i < 300; i++) {
      const Z = 500 + 25 * i;
      z.push(Z);
      dt.push(65 + 135 * Math.exp(-3e-4 * Z) + 2 * rnd()); // σ 2 µs/ft
    }
    const f = fitCompactionTrend({ kind: "sonicExponential", bmlFt: z, values: dt, intervals: ALL, dtMatrixUsPerFt: 65 });
    const se = f.diagnostics.paramStdErr;
    expect(Math.abs(f.params.dtMudlineUsPerFt - 200)).toBeLessThan(4 * se.dtMudlineUsPerFt);
    expect(Math.abs(f.params.decayPerFt - 3e-4)).toBeLessThan(4 * se.decayPerFt);
    // and the standard errors are informative: under 2 % of the values
    expect(se.dtMudlineUsPerFt / 200).toBeLessThan(0.02);
    expect(se.decayPerFt / 3e-4).toBeLessThan(0.02);
    expect(se.dtMatrixUsPerFt).toBe(0); // fixed
  });

  it("Huber shrugs off 5 % gross outliers that bias least squares (seeded own case; Huber 1964)", () => {
    const rnd = seededNormal(20261201);
    const z: number[] = [];
    const dt: number[] = [];
    for (let i = 0; i < 200; i++) {
      const Z = 1000 + 40 * i;
      z.push(Z);
      dt.push(170 * 10 ** (-2.5e-5 * Z) + 1.5 * rnd());
    }
    const outliers: number[] = [];
    for (let i = 105; i < 200; i += 10) {
      dt[i] += 30; // 10 of 200 points: e.g. washed-out shale reading slow
      outliers.push(i);
    }
    const args = { kind: "sonicLogLinear" as const, bmlFt: Object.freeze(z), values: Object.freeze(dt), intervals: ALL };
    const ls = fitCompactionTrend({ ...args, method: "leastSquares" });
    const hub = fitCompactionTrend({ ...args, method: "huber" });
    const slopeErr = (p: { log10SlopePerFt: number }) => Math.abs(p.log10SlopePerFt / -2.5e-5 - 1);
    expect(slopeErr(ls.params)).toBeGreaterThan(0.05);
    expect(slopeErr(hub.params)).toBeLessThan(0.02);
    expect(Math.abs(hub.params.dtMudlineUsPerFt / 170 - 1)).toBeLessThan(0.005);
    expect(hub.diagnostics.nDownweighted).toBeGreaterThanOrEqual(outliers.length);
    expect(hub.diagnostics.method).toBe("huber");
  });

  it("R² and standard errors equal the closed forms on ln R (Anscombe 1973 set I as depth/ln R, own case)", () => {
    const x = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
    const y = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];
    const f = fitCompactionTrend({ kind: "resistivityLogLinear", bmlFt: x, values: y.map(Math.exp), intervals: ALL });
    // published (Anscombe 1973, from memory): R² 0.667, se(slope) 0.118, slope 0.500
    expect(f.diagnostics.rSquared).toBeCloseTo(0.667, 3);
    expect(f.diagnostics.paramStdErr.growthPerFt).toBeCloseTo(0.118, 3);
    expect(f.params.growthPerFt).toBeCloseTo(0.5, 3);
    // delta method: se(R0) = R0·se(a), se(a) from the closed form s·√(1/n + x̄²/Sxx) = 1.1247 (x̄ 9, Sxx 110)
    const line = fitStraightLine({ x, y });
    const seA = line.residualStd * Math.sqrt(1 / 11 + 81 / 110);
    expect(Math.abs(f.diagnostics.paramStdErr.r0OhmM / (f.params.r0OhmM * seA) - 1)).toBeLessThan(1e-10);
    expect(f.diagnostics.residualStd).toBeCloseTo(1.237, 3);
  });

  it("uses only flagged shale points inside the intervals, skipping NaN, and reports the counts", () => {
    const z = [100, 200, 300, 400, 500, 600, 700];
    const dt = [NaN, 180, 999, 170, 165, 160, 155];
    const flag = new Uint8Array([1, 1, 0, 1, 1, 1, 1]);
    const f = fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: dt, shaleFlag: flag, intervals: [{ topBmlFt: 50, baseBmlFt: 650 }] });
    expect(f.diagnostics).toMatchObject({ n: 4, nMissing: 1, nNotShale: 1, depthRange: { topBmlFt: 200, baseBmlFt: 600 } });
  });

  it("throws typed errors: too few points (says 3 are needed), all-NaN interval, interval outside the log, missing Δtm, top ≥ base", () => {
    const z = [1000, 2000, 3000, 4000];
    const dt = [150, 140, NaN, NaN];
    expect(MIN_TREND_POINTS).toBe(3);
    expect(() => fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: dt, intervals: [{ topBmlFt: 0, baseBmlFt: 2500 }] })).toThrow(
      /at least 3 shale points, found 2/,
    );
    expect(() => fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: dt, intervals: [{ topBmlFt: 2500, baseBmlFt: 4500 }] })).toThrow(
      expect.objectContaining({ code: "E_TREND_ALL_MISSING" }),
    );
    expect(() => fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: dt, intervals: [{ topBmlFt: 9000, baseBmlFt: 9500 }] })).toThrow(
      expect.objectContaining({ code: "E_TREND_DEPTH_RANGE", details: expect.objectContaining({ param: "intervals[0]" }) }),
    );
    expect(() => fitCompactionTrend({ kind: "sonicExponential", bmlFt: z, values: dt, intervals: ALL })).toThrow(
      expect.objectContaining({ code: "E_TREND_PARAMS", details: expect.objectContaining({ param: "dtMatrixUsPerFt" }) }),
    );
    expect(() => fitCompactionTrend({ kind: "sonicLogLinear", bmlFt: z, values: dt, intervals: [{ topBmlFt: 3000, baseBmlFt: 1000 }] })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
  });

  it("throws E_TREND_PARAMS when the fitted exponential decay is negative (slowness growing with depth)", () => {
    const z = [1000, 2000, 3000, 4000];
    const dt = [100, 110, 121, 133];
    expect(() => fitCompactionTrend({ kind: "sonicExponential", bmlFt: z, values: dt, intervals: ALL, dtMatrixUsPerFt: 60 })).toThrow(
      expect.objectContaining({ code: "E_TREND_PARAMS", details: expect.objectContaining({ param: "fitted.decayPerFt" }) }),
    );
  });
});

describe("fitCompactionTrendSegments", () => {
  it("fits two segments across an unconformity and evaluates each on its own side (own case)", () => {
    const z: number[] = [];
    const dt: number[] = [];
    for (let Z = 500; Z <= 9000; Z += 50) {
      z.push(Z);
      // above 5000 ft: 180·10^(−3e-5 Z); below: an older, faster section 140·10^(−2e-5 Z)
      dt.push(Z < 5000 ? 180 * 10 ** (-3e-5 * Z) : 140 * 10 ** (-2e-5 * Z));
    }
    const { trend, diagnostics } = fitCompactionTrendSegments({
      kind: "sonicLogLinear",
      bmlFt: z,
      values: dt,
      segments: [
        { topBmlFt: 0, intervals: [{ topBmlFt: 500, baseBmlFt: 4900 }] },
        { topBmlFt: 5000, intervals: [{ topBmlFt: 5000, baseBmlFt: 9000 }] },
      ],
    });
    expect(diagnostics).toHaveLength(2);
    expect(trend.segments[1].fittedOn?.n).toBe(81);
    const v = evaluateCompactionTrend({ trend, bmlFt: [100, 4999, 5000, 12000, -5, NaN] });
    expect(v[0]).toBeCloseTo(180 * 10 ** (-3e-5 * 100), 9);
    expect(v[1]).toBeCloseTo(180 * 10 ** (-3e-5 * 4999), 9);
    expect(v[2]).toBeCloseTo(140 * 10 ** (-2e-5 * 5000), 9);
    expect(v[3]).toBeCloseTo(140 * 10 ** (-2e-5 * 12000), 9);
    expect(v[4]).toBeNaN();
    expect(v[5]).toBeNaN();
  });

  it("names the failing segment in the error's param", () => {
    expect(() =>
      fitCompactionTrendSegments({
        kind: "resistivityLogLinear",
        bmlFt: [100, 200, 300, 400],
        values: [1, 1.1, 1.2, 1.3],
        segments: [
          { topBmlFt: 0, intervals: [{ topBmlFt: 0, baseBmlFt: 400 }] },
          { topBmlFt: 350, intervals: [{ topBmlFt: 350, baseBmlFt: 400 }] },
        ],
      }),
    ).toThrow(expect.objectContaining({ code: "E_TREND_TOO_FEW_POINTS", details: expect.objectContaining({ param: "segments[1].intervals" }) }));
  });
});

describe("evaluateCompactionTrend", () => {
  it("returns the CHECK-VALUES §2 exponential case on an array (own case) and leaves the trend untouched", () => {
    const trend: CompactionTrend = Object.freeze({
      kind: "sonicExponential" as const,
      segments: Object.freeze([Object.freeze({ topBmlFt: 0, params: Object.freeze({ dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }), fittedOn: null })]) as never,
    });
    const out = evaluateCompactionTrend({ trend, bmlFt: Object.freeze([5000, 0]) });
    expect(out).toBeInstanceOf(Float64Array);
    expect(Math.abs(out[0] - 95.12)).toBeLessThan(0.005);
    expect(out[1]).toBe(200);
  });

  it("rejects parameters that make the trend negative or non-finite", () => {
    const neg: CompactionTrend = { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: -0.8, growthPerFt: 1e-4 }, fittedOn: null }] };
    expect(() => evaluateCompactionTrend({ trend: neg, bmlFt: [1000] })).toThrow(
      expect.objectContaining({ code: "E_TREND_PARAMS", details: expect.objectContaining({ param: "segments[0].params.r0OhmM" }) }),
    );
    const overflow: CompactionTrend = { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 1, growthPerFt: 1 }, fittedOn: null }] };
    expect(() => evaluateCompactionTrend({ trend: overflow, bmlFt: [1000] })).toThrow(expect.objectContaining({ code: "E_TREND_NONFINITE" }));
    const unordered: CompactionTrend = {
      kind: "sonicLogLinear",
      segments: [
        { topBmlFt: 3000, params: { dtMudlineUsPerFt: 150, log10SlopePerFt: -2e-5 }, fittedOn: null },
        { topBmlFt: 1000, params: { dtMudlineUsPerFt: 150, log10SlopePerFt: -2e-5 }, fittedOn: null },
      ],
    };
    expect(() => evaluateCompactionTrend({ trend: unordered, bmlFt: [1000] })).toThrow(expect.objectContaining({ code: "E_TREND_SEGMENTS" }));
  });
});
