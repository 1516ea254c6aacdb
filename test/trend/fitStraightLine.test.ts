/**
 * Straight-line fits: least squares checked against the simple linear regression closed
 * forms and the published Anscombe (1973) data set I; Huber IRLS checked on a set with one
 * gross outlier.
 */
import { describe, expect, it } from "vitest";
import { fitStraightLine, fitStraightLineHuber, HUBER_TUNING_CONSTANT } from "../../src/trend/index.js";

// Anscombe, F.J., 1973, "Graphs in statistical analysis", The American Statistician 27(1):17–21, set I.
const AX = Object.freeze([10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5]);
const AY = Object.freeze([8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68]);

/** Textbook closed forms with plain (uncentred) sums, written independently of the code. */
function closedForm(x: readonly number[], y: readonly number[]) {
  const n = x.length;
  const sx = x.reduce((s, v) => s + v, 0);
  const sy = y.reduce((s, v) => s + v, 0);
  const sxx = x.reduce((s, v) => s + v * v, 0) - (sx * sx) / n;
  const syy = y.reduce((s, v) => s + v * v, 0) - (sy * sy) / n;
  const sxy = x.reduce((s, v, i) => s + v * y[i], 0) - (sx * sy) / n;
  const b = sxy / sxx;
  const a = sy / n - (b * sx) / n;
  const sse = syy - b * sxy;
  const s2 = sse / (n - 2);
  return { a, b, r2: (sxy * sxy) / (sxx * syy), s: Math.sqrt(s2), seB: Math.sqrt(s2 / sxx), seA: Math.sqrt(s2 * (1 / n + (sx / n) ** 2 / sxx)) };
}

describe("fitStraightLine", () => {
  it("Anscombe set I: y = 3.00 + 0.500x, R² 0.667, se(b) 0.118 (published, Anscombe 1973, 3 digits, from memory)", () => {
    const f = fitStraightLine({ x: AX, y: AY });
    expect(f.intercept).toBeCloseTo(3.0, 2);
    expect(f.slope).toBeCloseTo(0.5, 3);
    expect(f.rSquared).toBeCloseTo(0.667, 3);
    expect(f.slopeStdErr).toBeCloseTo(0.118, 3);
    expect(f.n).toBe(11);
  });
  it("matches the simple-linear-regression closed forms to 1e-12 (own case, Draper & Smith 1998 ch. 1 formulas)", () => {
    const c = closedForm(AX, AY);
    const f = fitStraightLine({ x: AX, y: AY });
    const rel = (u: number, v: number) => Math.abs(u / v - 1);
    expect(rel(f.slope, c.b)).toBeLessThan(1e-12);
    expect(rel(f.intercept, c.a)).toBeLessThan(1e-12);
    expect(rel(f.rSquared, c.r2)).toBeLessThan(1e-12);
    expect(rel(f.residualStd, c.s)).toBeLessThan(1e-12);
    expect(rel(f.slopeStdErr, c.seB)).toBeLessThan(1e-12);
    expect(rel(f.interceptStdErr, c.seA)).toBeLessThan(1e-12);
    // Cov(a, b) = −x̄·s²/Sxx (x̄ = 9, Sxx = 110 for set I)
    expect(rel(f.covariance.interceptSlopeCov, (-9 * c.s * c.s) / 110)).toBeLessThan(1e-12);
  });
  it("keeps its digits on depths offset by 10⁴ ft (centred sums; shift invariance of the slope, own case)", () => {
    const x = AX.map((v) => v + 12000);
    const f = fitStraightLine({ x, y: AY });
    const g = fitStraightLine({ x: AX, y: AY });
    expect(Math.abs(f.slope / g.slope - 1)).toBeLessThan(1e-10);
    expect(Math.abs(f.rSquared / g.rSquared - 1)).toBeLessThan(1e-10);
  });
  it("skips NaN and counts only the points it used", () => {
    const f = fitStraightLine({ x: [...AX, NaN, 3], y: [...AY, 1, NaN] });
    expect(f.n).toBe(11);
    expect(f.slope).toBeCloseTo(closedForm(AX, AY).b, 12);
  });
  it("throws E_TREND_TOO_FEW_POINTS below 3 points and E_TREND_DEGENERATE at one depth", () => {
    expect(() => fitStraightLine({ x: [1, 2], y: [1, 2] })).toThrow(expect.objectContaining({ code: "E_TREND_TOO_FEW_POINTS" }));
    expect(() => fitStraightLine({ x: [5, 5, 5], y: [1, 2, 3] })).toThrow(expect.objectContaining({ code: "E_TREND_DEGENERATE" }));
  });
});

describe("fitStraightLineHuber", () => {
  it("ignores one gross outlier that drags least squares (own case, Huber 1964 weights, k = 1.345)", () => {
    expect(HUBER_TUNING_CONSTANT).toBe(1.345);
    const x = Object.freeze([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    const y = Object.freeze([0.05, 1.98, 4.03, 5.97, 8.02, 50, 12.01, 13.96, 16.04, 17.98]); // ≈ 2x, one spike
    const ls = fitStraightLine({ x, y });
    const hub = fitStraightLineHuber({ x, y });
    expect(Math.abs(ls.slope - 2)).toBeGreaterThan(0.1);
    expect(Math.abs(hub.slope - 2)).toBeLessThan(0.02);
    expect(hub.converged).toBe(true);
    expect(hub.weights[5]).toBeLessThan(0.05);
    expect(hub.nDownweighted).toBeGreaterThanOrEqual(1);
  });
  it("scale is the normalised MAD of the final residuals: median |r − median r| / 0.6745 (Hampel 1974, JASA 69:383–393; sorted by hand here)", () => {
    // Even and odd point counts, with tied residuals: the median must be the textbook one.
    for (const y of [
      [0.05, 1.98, 4.03, 5.97, 8.02, 50, 12.01, 13.96, 16.04, 17.98],
      [0.05, 1.98, 4.03, 5.97, 8.02, 50, 12.01, 13.96, 16.04],
      [0, 2, 4, 6, 8, 10, 12, 14.5, 16, 18, -3],
    ]) {
      const x = y.map((_, i) => i);
      const hub = fitStraightLineHuber({ x, y });
      // The scale is computed from the residuals of the fit before the last weight update,
      // which equals the final fit at convergence (to the 1e-12 stopping tolerance).
      const r = y.map((v, i) => v - hub.intercept - hub.slope * x[i]);
      const med = (v: number[]): number => {
        const s = [...v].sort((a, b) => a - b);
        const m = s.length >> 1;
        return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
      };
      const m = med(r);
      const mad = med(r.map((v) => Math.abs(v - m)));
      expect(hub.converged).toBe(true);
      expect(hub.scale).toBeCloseTo(mad / 0.6744897501960817, 9);
    }
  });
  it("equals least squares on data with no residual beyond k·s (weights all 1)", () => {
    const x = [0, 1, 2, 3, 4];
    const y = [0, 1, 2, 3, 4.000001];
    const hub = fitStraightLineHuber({ x, y, tuningConstant: 1e6 });
    const ls = fitStraightLine({ x, y });
    expect(hub.slope).toBeCloseTo(ls.slope, 12);
  });
});
