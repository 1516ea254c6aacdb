/**
 * Random sources and samplers: moments against the distributions' textbook formulas
 * (published: uniform mean 1/2, variance 1/12; triangular mean (a+b+c)/3; truncated-normal
 * support; lognormal median), and the Cholesky pair against its target covariance.
 * Tolerances: 5 Monte Carlo standard errors for N = 40,000 draws.
 */
import { describe, expect, it } from "vitest";
import { createXoshiro128Random, drawParameterSamples, drawCorrelatedPairs, drawStandardNormals, choleskyOfPairCovariance } from "../../src/uncertainty/index.js";

const N = 40000;
const mean = (x: Float64Array): number => x.reduce((s, v) => s + v, 0) / x.length;
const variance = (x: Float64Array): number => { const m = mean(x); return x.reduce((s, v) => s + (v - m) ** 2, 0) / (x.length - 1); };

describe("createXoshiro128Random", () => {
  it("uniforms have mean 1/2 and variance 1/12 (published moments of U(0,1)); same seed same stream", () => {
    const r = createXoshiro128Random(123);
    const u = Float64Array.from({ length: N }, () => r.nextFloat());
    expect(Math.abs(mean(u) - 0.5)).toBeLessThan(5 * Math.sqrt(1 / 12 / N));
    expect(Math.abs(variance(u) - 1 / 12)).toBeLessThan(5 * Math.sqrt(1 / 180 / N)); // Var(s²) ≈ (μ4 − σ⁴)/N, μ4 = 1/80
    const a = createXoshiro128Random(9), b = createXoshiro128Random(9);
    for (let i = 0; i < 100; i++) expect(a.nextUint32()).toBe(b.nextUint32());
    expect(() => createXoshiro128Random(1.5)).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("drawParameterSamples", () => {
  it("normal, triangular, truncated normal and lognormal draws have their textbook moments", () => {
    const rnd = createXoshiro128Random(7);
    const z = drawStandardNormals(rnd, N);
    expect(Math.abs(mean(z))).toBeLessThan(5 / Math.sqrt(N));
    expect(Math.abs(variance(z) - 1)).toBeLessThan(5 * Math.sqrt(2 / N));
    const t = drawParameterSamples({ distribution: { kind: "triangular", min: 2, mode: 3, max: 4.5 }, count: N, random: rnd });
    const tv = (4 + 9 + 20.25 - 6 - 9 - 13.5) / 18; // (a²+b²+c²−ab−ac−bc)/18
    expect(Math.abs(mean(t) - 9.5 / 3)).toBeLessThan(5 * Math.sqrt(tv / N));
    const tn = drawParameterSamples({ distribution: { kind: "truncatedNormal", mean: 0.42, std: 0.05, min: 0.3, max: 0.49 }, count: N, random: rnd });
    expect(Math.min(...tn)).toBeGreaterThanOrEqual(0.3);
    expect(Math.max(...tn)).toBeLessThanOrEqual(0.49);
    // Upper-tail truncation at mean + 2σ, one-sided: E = μ + σφ(α)/(1−Φ(α)); α = 2 → μ + 2.3732σ (published Mills ratio, φ(2)/(1−Φ(2)) = 0.05399/0.02275).
    const tail = drawParameterSamples({ distribution: { kind: "truncatedNormal", mean: 0, std: 1, min: 2, max: 50 }, count: N, random: rnd });
    expect(Math.abs(mean(tail) - 2.3732)).toBeLessThan(0.01);
    const ln = drawParameterSamples({ distribution: { kind: "lognormal", median: 0.6, logStd: 0.2 }, count: N, random: rnd });
    const sorted = Array.from(ln).sort((a, b) => a - b);
    expect(Math.abs(sorted[N / 2] / 0.6 - 1)).toBeLessThan(0.01);
    expect(() => drawParameterSamples({ distribution: { kind: "normal", mean: 1, std: -1 }, count: 3, random: rnd })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("drawCorrelatedPairs", () => {
  it("reproduces the target covariance (Cholesky, Golub & Van Loan Alg. 4.2.1)", () => {
    const cov = { interceptVar: 4e-4, slopeVar: 1e-12, interceptSlopeCov: -1.6e-8 }; // correlation −0.8
    const { x, y } = drawCorrelatedPairs({ meanX: 0.2, meanY: 1e-4, covariance: cov, count: N, random: createXoshiro128Random(3) });
    const mx = mean(x), my = mean(y);
    let c = 0;
    for (let i = 0; i < N; i++) c += (x[i] - mx) * (y[i] - my);
    const rho = c / (N - 1) / Math.sqrt(variance(x) * variance(y));
    expect(Math.abs(rho + 0.8)).toBeLessThan(5 * (1 - 0.64) / Math.sqrt(N)); // SE(r) ≈ (1−ρ²)/√N
    expect(Math.abs(variance(x) / 4e-4 - 1)).toBeLessThan(5 * Math.sqrt(2 / N));
    expect(choleskyOfPairCovariance({ interceptVar: 4, slopeVar: 2, interceptSlopeCov: 2 }, "c")).toEqual({ l11: 2, l21: 1, l22: 1 });
  });
});
