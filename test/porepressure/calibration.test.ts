/**
 * Calibration checks. Synthetic measured pressures are made from the published model
 * equations (Eaton 1975, SPE-5544; Bowers 1995, SPE-27488, from memory) with the
 * CHECK-VALUES §3–§4 parameters (n 3.0; A 10.11, B 0.777, U 3.13), written out inline here,
 * then fitted back. Standard errors are checked against seeded Monte Carlo spread and the
 * textbook linearised formula SE = σ/√(ΣJ²); the crossplot line against mathjs (an
 * independent library) solving the normal equations; the misfit table against
 * CHECK-VALUES §0 (12.0 ppg at 10,000 ft = 6234 psi, 12/231 psi/ft per ppg).
 */
import { describe, expect, it } from "vitest";
import { inv, lusolve, multiply, transpose } from "mathjs";
import {
  calibrateBowers,
  calibrateEatonExponent,
  fitBowersCrossplot,
  porePressureMisfitTable,
  type PressureObservation,
} from "../../src/porepressure/index.js";
import { seededNormalClampedLog as seededNormal } from "../helpers/seededRandom.js";

// ---- a synthetic Quillon-style well (invented) -------------------------------------------
const tvdFt = Float64Array.from({ length: 101 }, (_, k) => 4000 + 100 * k); // 4000–14,000 ft
const sv = tvdFt.map((z) => 0.95 * z);
const ph = tvdFt.map((z) => 0.465 * z);

// Eaton truth: ratio 1 down to 8000 ft, falling to 0.6 at 14,000 ft; n = 3.0.
const N_TRUE = 3.0;
const ratio = tvdFt.map((z) => (z <= 8000 ? 1 : 1 - (0.4 * (z - 8000)) / 6000));
const eatonTruth = (i: number, n = N_TRUE): number => sv[i] - (sv[i] - ph[i]) * ratio[i] ** n;
const eatonIdx = Array.from({ length: 20 }, (_, k) => 42 + 3 * k); // 8200–13,900 ft

describe("calibrateEatonExponent", () => {
  it("recovers n = 3.0 from noiseless pressures (to 1e-7; golden-section bracket width 6e-10)", () => {
    const observations = Object.freeze(eatonIdx.map((i) => Object.freeze({ index: i, pressurePsi: eatonTruth(i) })));
    const fit = calibrateEatonExponent({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, tvdFt, observations });
    expect(fit.exponent).toBeCloseTo(N_TRUE, 7);
    expect(fit.n).toBe(20);
    expect(fit.nSkipped).toBe(0);
    expect(fit.misfit.rmsPsi).toBeLessThan(1e-4);
    expect(fit.depthRangeFt).toEqual({ topFt: 8200, baseFt: 13900 });
    expect(fit.warnings).toEqual([]);
  });

  it("from seeded noisy pressures (σ 60 psi): within 3 SE of 3.0, SE near σ/√ΣJ² and near the Monte Carlo spread", () => {
    const noiseSd = 60;
    // linearised SE at the truth: J_i = −(Sv − Ph) r^n ln r
    const sumJ2 = eatonIdx.reduce((s, i) => s + ((sv[i] - ph[i]) * ratio[i] ** N_TRUE * Math.log(ratio[i])) ** 2, 0);
    const seTheory = noiseSd / Math.sqrt(sumJ2);
    const rnd = seededNormal(20261201);
    const fits: number[] = [];
    let first: ReturnType<typeof calibrateEatonExponent> | undefined;
    for (let rep = 0; rep < 200; rep++) {
      const observations = eatonIdx.map((i) => ({ index: i, pressurePsi: eatonTruth(i) + noiseSd * rnd() }));
      const fit = calibrateEatonExponent({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, tvdFt, observations });
      fits.push(fit.exponent);
      first ??= fit;
    }
    expect(Math.abs(first!.exponent - N_TRUE)).toBeLessThan(3 * first!.exponentStandardError);
    // one replicate's SE from 20 points: s estimated with 19 dof (≈ 16 % spread) → allow ±45 %
    expect(first!.exponentStandardError / seTheory).toBeGreaterThan(0.55);
    expect(first!.exponentStandardError / seTheory).toBeLessThan(1.45);
    // 200 replicates: SD of the estimates within 15 % of the linearised SE (sampling error of an SD ≈ 5 %)
    const mean = fits.reduce((a, b) => a + b, 0) / fits.length;
    const sd = Math.sqrt(fits.reduce((a, b) => a + (b - mean) ** 2, 0) / (fits.length - 1));
    expect(sd / seTheory).toBeGreaterThan(0.85);
    expect(sd / seTheory).toBeLessThan(1.15);
    expect(Math.abs(mean - N_TRUE)).toBeLessThan(3 * sd / Math.sqrt(fits.length));
  });

  it("recovers the resistivity exponent 1.2 and skips NaN points, reporting how many", () => {
    const obs: PressureObservation[] = eatonIdx.map((i) => ({ index: i, pressurePsi: eatonTruth(i, 1.2) }));
    obs.push({ index: 60, pressurePsi: NaN });
    const fit = calibrateEatonExponent({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, tvdFt, observations: obs });
    expect(fit.exponent).toBeCloseTo(1.2, 7);
    expect(fit.n).toBe(20);
    expect(fit.nSkipped).toBe(1);
    expect(fit.misfit.nSkipped).toBe(1);
  });

  it("a tiny weight makes an outlier harmless", () => {
    const obs: PressureObservation[] = eatonIdx.map((i) => ({ index: i, pressurePsi: eatonTruth(i) }));
    obs.push({ index: 95, pressurePsi: eatonTruth(95) + 2000, weight: 1e-12, source: "connection gas" });
    const fit = calibrateEatonExponent({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, tvdFt, observations: obs });
    expect(fit.exponent).toBeCloseTo(N_TRUE, 4);
    expect(fit.misfit.rows[20].source).toBe("connection gas");
  });

  it("throws E_TOO_FEW without a usable point, E_RANGE for a bad index, weight or bracket; warns at a bound", () => {
    const base = { overburdenPsi: sv, hydrostaticPsi: ph, ratio, tvdFt };
    expect(() => calibrateEatonExponent({ ...base, observations: [{ index: 3, pressurePsi: NaN }] })).toThrow(
      expect.objectContaining({ code: "E_TOO_FEW" }),
    );
    expect(() => calibrateEatonExponent({ ...base, observations: [{ index: 101, pressurePsi: 5000 }] })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
    expect(() => calibrateEatonExponent({ ...base, observations: [{ index: 50, pressurePsi: 5000, weight: 0 }] })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
    expect(() => calibrateEatonExponent({ ...base, observations: [{ index: 50, pressurePsi: 5000 }], exponentMin: 2, exponentMax: 1 })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
    // pressures made with n = 5 fitted inside [0.5, 4] end on the upper bound, with a warning
    const obs = eatonIdx.map((i) => ({ index: i, pressurePsi: eatonTruth(i, 5) }));
    const fit = calibrateEatonExponent({ ...base, observations: obs, exponentMin: 0.5, exponentMax: 4 });
    expect(fit.exponent).toBe(4);
    expect(fit.warnings.map((w) => w.code)).toContain("W_FIT_AT_BOUND");
  });
});

// ---- Bowers truth: A 10.11, B 0.777 (CHECK-VALUES §4), unloading below 11,500 ft with U 3.13
const A_TRUE = 10.11;
const B_TRUE = 0.777;
const U_TRUE = 3.13;
const V0 = 5000;
const ONSET = 11500;
const sigmaTrue = tvdFt.map((z) => {
  const s8000 = 0.485 * 8000; // normal pressure above 8000 ft: σ = (0.95 − 0.465)z
  if (z <= 8000) return 0.485 * z;
  if (z <= ONSET) return s8000 + 0.15 * (z - 8000);
  return s8000 + 0.15 * (ONSET - 8000) - 0.5 * (z - ONSET);
});
const SIGMA_MAX_TRUE = 0.485 * 8000 + 0.15 * (ONSET - 8000);
// Bowers 1995: virgin V = V0 + Aσ^B; unloading V = V0 + A[σmax(σ/σmax)^(1/U)]^B
const velocity = tvdFt.map((z, i) =>
  z <= ONSET
    ? V0 + A_TRUE * sigmaTrue[i] ** B_TRUE
    : V0 + A_TRUE * (SIGMA_MAX_TRUE * (sigmaTrue[i] / SIGMA_MAX_TRUE) ** (1 / U_TRUE)) ** B_TRUE,
);
const ppTrue = tvdFt.map((_, i) => sv[i] - sigmaTrue[i]);
const allIdx = Array.from({ length: 26 }, (_, k) => 4 * k); // every 400 ft, 4000–14,000
const virginIdx = allIdx.filter((i) => tvdFt[i] <= ONSET);

describe("calibrateBowers", () => {
  it("recovers A 10.11, B 0.777 from noiseless virgin-branch pressures (relative 1e-6)", () => {
    const observations = Object.freeze(virginIdx.map((i) => ({ index: i, pressurePsi: ppTrue[i] })));
    const velCopy = Float64Array.from(velocity);
    const fit = calibrateBowers({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: velocity, tvdFt, observations });
    expect(Math.abs(fit.a / A_TRUE - 1)).toBeLessThan(1e-6);
    expect(Math.abs(fit.b / B_TRUE - 1)).toBeLessThan(1e-6);
    expect(Number.isNaN(fit.u)).toBe(true);
    expect(fit.converged).toBe(true);
    expect(fit.misfit.rmsPsi).toBeLessThan(1e-3);
    expect(velocity).toEqual(velCopy); // input untouched
  });

  it("recovers A, B and U 3.13 with an unloading zone below 11,500 ft (relative 1e-6)", () => {
    const observations = allIdx.map((i) => ({ index: i, pressurePsi: ppTrue[i] }));
    const fit = calibrateBowers({
      overburdenPsi: sv,
      hydrostaticPsi: ph,
      velocityFtPerS: velocity,
      tvdFt,
      observations,
      unloading: { onsetTvdFt: ONSET },
    });
    expect(fit.nUnloading).toBe(7); // 11,600, 12,000 … 14,000 ft: 7 points every 400 ft
    expect(Math.abs(fit.a / A_TRUE - 1)).toBeLessThan(1e-6);
    expect(Math.abs(fit.b / B_TRUE - 1)).toBeLessThan(1e-6);
    expect(Math.abs(fit.u / U_TRUE - 1)).toBeLessThan(1e-6);
    expect(Math.abs(fit.sigmaMaxPsi / SIGMA_MAX_TRUE - 1)).toBeLessThan(1e-6);
    expect(fit.misfit.rmsPsi).toBeLessThan(1e-2);
  });

  it("from seeded noisy pressures (σ 50 psi): A, B within 3 SE; SE of B near the Monte Carlo spread", () => {
    const noiseSd = 50;
    const rnd = seededNormal(7);
    const bs: number[] = [];
    const ses: number[] = [];
    let first: ReturnType<typeof calibrateBowers> | undefined;
    for (let rep = 0; rep < 60; rep++) {
      const observations = virginIdx.map((i) => ({ index: i, pressurePsi: ppTrue[i] + noiseSd * rnd() }));
      const fit = calibrateBowers({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: velocity, tvdFt, observations });
      bs.push(fit.b);
      ses.push(fit.bStandardError);
      first ??= fit;
    }
    expect(Math.abs(first!.a - A_TRUE)).toBeLessThan(3 * first!.aStandardError);
    expect(Math.abs(first!.b - B_TRUE)).toBeLessThan(3 * first!.bStandardError);
    expect(Math.abs(first!.residualStdPsi / noiseSd - 1)).toBeLessThan(0.45); // 18 dof
    const mean = bs.reduce((a, b) => a + b, 0) / bs.length;
    const sd = Math.sqrt(bs.reduce((a, b) => a + (b - mean) ** 2, 0) / (bs.length - 1));
    const meanSe = ses.reduce((a, b) => a + b, 0) / ses.length;
    // 60 replicates: sampling error of an SD ≈ 9 %; allow ±30 %
    expect(sd / meanSe).toBeGreaterThan(0.7);
    expect(sd / meanSe).toBeLessThan(1.3);
  });

  it("with noise and an unloading zone, U is within 3 SE of 3.13", () => {
    const rnd = seededNormal(11);
    const observations = allIdx.map((i) => ({ index: i, pressurePsi: ppTrue[i] + 30 * rnd() }));
    const fit = calibrateBowers({ overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: velocity, tvdFt, observations, unloading: { onsetTvdFt: ONSET } });
    expect(fit.uStandardError).toBeGreaterThan(0);
    expect(Math.abs(fit.u - U_TRUE)).toBeLessThan(3 * fit.uStandardError);
    expect(Math.abs(fit.a - A_TRUE)).toBeLessThan(3 * fit.aStandardError);
  });

  it("throws E_TOO_FEW for too few points or no unloading point, E_RANGE for V0 ≤ 0", () => {
    const base = { overburdenPsi: sv, hydrostaticPsi: ph, velocityFtPerS: velocity, tvdFt };
    const two = [40, 60].map((i) => ({ index: i, pressurePsi: ppTrue[i] }));
    expect(() => calibrateBowers({ ...base, observations: two })).toThrow(expect.objectContaining({ code: "E_TOO_FEW" }));
    const upper = virginIdx.map((i) => ({ index: i, pressurePsi: ppTrue[i] }));
    expect(() => calibrateBowers({ ...base, observations: upper, unloading: { onsetTvdFt: ONSET } })).toThrow(
      expect.objectContaining({ code: "E_TOO_FEW" }),
    );
    expect(() => calibrateBowers({ ...base, observations: upper, v0FtPerS: 0 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("fitBowersCrossplot", () => {
  it("fits the CHECK-VALUES §4 points (σ 1000/3000/5000 → 7166/10,087/12,566 ft/s) back to A 10.11, B 0.777", () => {
    const fit = fitBowersCrossplot({ velocityFtPerS: Object.freeze([7166, 10087, 12566]), effectiveStressPsi: Object.freeze([1000, 3000, 5000]) });
    // velocities rounded to ±0.5 ft/s: B within 0.001, A within 0.2 %; a 1 % change in A fails
    expect(Math.abs(fit.b - 0.777)).toBeLessThan(1e-3);
    expect(Math.abs(fit.a / 10.11 - 1)).toBeLessThan(2e-3);
    expect(fit.n).toBe(3);
  });

  it("agrees with mathjs normal equations (coefficients to 1e-9, SE(B) to 1e-9) on seeded noisy points", () => {
    const rnd = seededNormal(3);
    const s = Array.from({ length: 30 }, (_, k) => 800 + 150 * k);
    const v = s.map((x) => V0 + A_TRUE * x ** B_TRUE + 80 * rnd());
    v.push(NaN);
    s.push(2000);
    const fit = fitBowersCrossplot({ velocityFtPerS: v, effectiveStressPsi: s });
    expect(fit.nSkipped).toBe(1);
    const X = s.slice(0, 30).map((x) => [1, Math.log(x)]);
    const y = v.slice(0, 30).map((x) => [Math.log(x - V0)]);
    const Xt = transpose(X);
    const XtX = multiply(Xt, X) as number[][];
    const beta = (lusolve(XtX, multiply(Xt, y) as number[][]) as number[][]).map((r) => r[0]);
    expect(Math.abs(fit.b / beta[1] - 1)).toBeLessThan(1e-9);
    expect(Math.abs(fit.a / Math.exp(beta[0]) - 1)).toBeLessThan(1e-9);
    const res = y.map((r, k) => r[0] - beta[0] - beta[1] * X[k][1]);
    const s2 = res.reduce((a, b) => a + b * b, 0) / (30 - 2);
    const cov = inv(XtX) as number[][];
    expect(Math.abs(fit.bStandardError / Math.sqrt(s2 * cov[1][1]) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(fit.aStandardError / (fit.a * Math.sqrt(s2 * cov[0][0])) - 1)).toBeLessThan(1e-9);
  });

  it("needs 3 usable points (E_TOO_FEW) and warns when B falls outside (0, 1]", () => {
    expect(() => fitBowersCrossplot({ velocityFtPerS: [7000, 8000, 4000], effectiveStressPsi: [1000, 2000, 3000] })).toThrow(
      expect.objectContaining({ code: "E_TOO_FEW" }),
    );
    const fit = fitBowersCrossplot({ velocityFtPerS: [5100, 5400, 6600], effectiveStressPsi: [100, 200, 400] });
    expect(fit.warnings.map((w) => w.code)).toEqual(["W_BOWERS_B_OUT_OF_RANGE"]);
  });
});

describe("porePressureMisfitTable", () => {
  it("6234 psi at 10,000 ft is 12.00 ppg (CHECK-VALUES §0, own case); differences and RMS in psi and ppg", () => {
    const observations = Object.freeze([
      Object.freeze({ index: 0, pressurePsi: 6234, source: "formation test" }),
      Object.freeze({ index: 1, pressurePsi: 6300 }),
      Object.freeze({ index: 2, pressurePsi: 7000 }),
    ]);
    const t = porePressureMisfitTable({ tvdFt: [10000, 10000, 11000], predictedPsi: [6264, 6260, NaN], observations });
    // 12/231 psi/ft per ppg (legal gallon): a 1 % error in that factor moves 12.00 by 0.12 ppg
    expect(t.rows[0].measuredPpg).toBeCloseTo(12.0, 3);
    expect(t.rows[0].differencePsi).toBe(30);
    expect(t.rows[0].differencePpg).toBeCloseTo(30 / (10000 * 12 / 231), 12);
    expect(t.rows[1].differencePsi).toBe(-40);
    expect(t.rows[0].source).toBe("formation test");
    // RMS of 30 and −40 psi = √((900 + 1600)/2) = 35.355 psi (arithmetic)
    expect(t.rmsPsi).toBeCloseTo(35.35534, 5);
    expect(t.rmsPpg).toBeCloseTo(Math.sqrt(1250) / (10000 * 12 / 231), 12);
    expect(t.n).toBe(2);
    expect(t.nSkipped).toBe(1);
  });
});
