/**
 * Monte Carlo pore pressure / fracture pressure: checked against the published forms in
 * src/porepressure and src/stress (realisation by realisation), CHECK-VALUES.md §3, §6, §7,
 * and the exact lognormal moments for Eaton with a normal exponent.
 */
import { describe, expect, it } from "vitest";
import {
  simulatePressureUncertainty,
  simulatePressureUncertaintyPart,
  joinPressureUncertaintyParts,
  type PressureUncertaintyInput,
} from "../../src/uncertainty/index.js";
import { eatonPorePressure, eatonRatio, bowersPorePressure } from "../../src/porepressure/index.js";
import { evaluateCompactionTrend, type CompactionTrend } from "../../src/trend/index.js";
import { eaton1969Fracture, frictionalStressBounds } from "../../src/stress/index.js";

const PSI_PER_MPA = 1e6 / 6894.757293168361;

/** type-7 order statistic for R = 11 at p = 0.1, 0.5, 0.9: h = 1, 5, 9 exactly. */
function sortedAt(values: ArrayLike<number>, k: number): number {
  return Array.from(values).sort((a, b) => a - b)[k];
}

function freezeAll<T extends Record<string, unknown>>(o: T): T {
  for (const v of Object.values(o)) if (v !== null && typeof v === "object" && !ArrayBuffer.isView(v)) Object.freeze(v);
  return Object.freeze(o);
}

const resTrend: CompactionTrend = {
  kind: "resistivityLogLinear",
  segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }],
};

describe("simulatePressureUncertainty — fixed inputs reproduce CHECK-VALUES", () => {
  it("Eaton resistivity Ro/Rn = 0.6 → 0.7102 psi/ft; Eaton 1969 ν 0.25 over Ph → 0.6433 psi/ft", () => {
    // Rn(10,000 ft bml) = 0.8·e^1 = 2.175 ohm.m (CHECK-VALUES §2, own case); Ro = 0.6·Rn.
    const rn = 0.8 * Math.exp(1);
    const out = simulatePressureUncertainty({
      tvdFt: [10000, 10000], bmlFt: [10000, 10000], overburdenPsi: [10000, 10000], hydrostaticPsi: [4650, 4650],
      observed: [0.6 * rn, rn],
      porePressure: { kind: "eaton", exponent: { kind: "fixed", value: 1.2 }, trend: resTrend },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.25 } },
      realisations: 10, seed: 1,
    });
    // CHECK-VALUES §3 (own case): Ro/Rn 0.6, S/D 1, Pn 0.465 → 0.7102 psi/ft.
    expect(out.ppP50Psi[0] / 10000).toBeCloseTo(0.7102, 4);
    expect(out.ppP10Psi[0]).toBe(out.ppP90Psi[0]);
    expect(out.ppStdPsi[0]).toBeCloseTo(0, 6);
    // CHECK-VALUES §3 identity: ratio 1 → Pn exactly; §6 (own): ν 0.25, S/D 1, P/D 0.465 → 0.6433.
    expect(out.ppP50Psi[1]).toBeCloseTo(4650, 8);
    expect(out.fracP50Psi[1] / 10000).toBeCloseTo(0.6433, 4);
  });

  it("Eaton sonic with the exponential trend → 0.7335 psi/ft (CHECK-VALUES §3, own case)", () => {
    const out = simulatePressureUncertainty({
      tvdFt: [5000], bmlFt: [5000], overburdenPsi: [5000], hydrostaticPsi: [0.465 * 5000], observed: [120],
      porePressure: {
        kind: "eaton", exponent: { kind: "fixed", value: 3 },
        trend: { kind: "sonicExponential", segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null }] },
      },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.3 } },
      realisations: 10, seed: 1,
    });
    expect(out.ppP50Psi[0] / 5000).toBeCloseTo(0.7335, 4);
  });

  it("frictional lower bound: Sv 69, Pp 30 MPa, μ 0.6 → Shmin 42.50 MPa (CHECK-VALUES §7, own case)", () => {
    const sv = 69 * PSI_PER_MPA;
    const ph = 30 * PSI_PER_MPA;
    const out = simulatePressureUncertainty({
      tvdFt: [9843], bmlFt: [9843], overburdenPsi: [sv], hydrostaticPsi: [ph], observed: [resTrend.segments[0].params.r0OhmM * Math.exp(0.9843)],
      porePressure: { kind: "eaton", exponent: { kind: "fixed", value: 1.2 }, trend: resTrend },
      fracture: { kind: "frictionalNormal", frictionCoefficient: { kind: "fixed", value: 0.6 } },
      realisations: 10, seed: 3,
    });
    expect(out.ppP50Psi[0] / PSI_PER_MPA).toBeCloseTo(30, 6);
    expect(out.fracP50Psi[0] / PSI_PER_MPA).toBeCloseTo(42.5, 2);
  });
});

describe("simulatePressureUncertainty — realisations agree with the published forms in src/", () => {
  it("Eaton log-linear sonic with trend covariance, exponent, overburden and ν: R = 11 order statistics", () => {
    // Own case; reference values from eatonRatio + eatonPorePressure (Eaton 1975) and
    // eaton1969Fracture (Eaton 1969) per realisation. For R = 11, type-7 P10/P50/P90 are the
    // 2nd, 6th and 10th smallest values exactly.
    const trend: CompactionTrend = { kind: "sonicLogLinear", segments: [
      { topBmlFt: 0, params: { dtMudlineUsPerFt: 166, log10SlopePerFt: -2.2e-5 }, fittedOn: null },
      { topBmlFt: 6000, params: { dtMudlineUsPerFt: 160, log10SlopePerFt: -2.0e-5 }, fittedOn: null },
    ] };
    const input: PressureUncertaintyInput = freezeAll({
      tvdFt: Object.freeze([6000, 9000, 12000]) as number[], bmlFt: Object.freeze([3500, 6500, 9500]) as number[],
      overburdenPsi: Object.freeze([5600, 8600, 11700]) as number[], hydrostaticPsi: Object.freeze([2700, 4050, 5400]) as number[],
      observed: Object.freeze([140, 130, 125]) as number[],
      overburdenFactor: Object.freeze({ kind: "normal", mean: 1, std: 0.02 }) as never,
      porePressure: {
        kind: "eaton", exponent: { kind: "triangular", min: 2.5, mode: 3, max: 3.6 }, trend,
        trendCovariance: [{ interceptVar: 4e-5, slopeVar: 1e-14, interceptSlopeCov: -1.5e-10 }, null],
      },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "truncatedNormal", mean: 0.42, std: 0.03, min: 0.3, max: 0.49 } },
      plannedMudWeightPsiPerFt: Object.freeze([0.5, 0.6, 0.8]) as number[],
      realisations: 11, seed: 2024,
    });
    const out = simulatePressureUncertainty(input);
    const get = (name: string): Float64Array => out.draws.find((d) => d.name === name)!.values;
    const f = get("overburdenFactor"), n = get("eatonExponent"), a0 = get("trendIntercept[0]"), b0 = get("trendSlope[0]"), nu = get("poissonRatio");
    expect(Array.from(get("trendIntercept[1]")).every((v) => v === Math.log10(160))).toBe(true);
    for (let i = 0; i < 3; i++) {
      const pp: number[] = [];
      const fr: number[] = [];
      for (let r = 0; r < 11; r++) {
        const tr: CompactionTrend = { kind: "sonicLogLinear", segments: [
          { topBmlFt: 0, params: { dtMudlineUsPerFt: 10 ** a0[r], log10SlopePerFt: b0[r] }, fittedOn: null },
          trend.segments[1] as never,
        ] };
        const dtn = evaluateCompactionTrend({ trend: tr, bmlFt: [input.bmlFt[i]] });
        const ratio = eatonRatio({ log: "sonic", observed: [input.observed[i]], trend: dtn });
        const sv = input.overburdenPsi[i] * f[r];
        const p = eatonPorePressure({ overburdenPsi: [sv], hydrostaticPsi: [input.hydrostaticPsi[i]], ratio, exponent: n[r] }).ppPsi[0];
        pp.push(p);
        fr.push(eaton1969Fracture({ tvdFt: [input.tvdFt[i]], ppPsi: [p], svPsi: [sv], poissonRatio: nu[r] }).shminPsi[0]);
      }
      const tol = (x: number): number => 1e-9 * Math.abs(x);
      expect(Math.abs(out.ppP10Psi[i] - sortedAt(pp, 1))).toBeLessThan(tol(pp[0]));
      expect(Math.abs(out.ppP50Psi[i] - sortedAt(pp, 5))).toBeLessThan(tol(pp[0]));
      expect(Math.abs(out.ppP90Psi[i] - sortedAt(pp, 9))).toBeLessThan(tol(pp[0]));
      expect(Math.abs(out.fracP10Psi[i] - sortedAt(fr, 1))).toBeLessThan(tol(fr[0]));
      expect(Math.abs(out.fracP90Psi[i] - sortedAt(fr, 9))).toBeLessThan(tol(fr[0]));
      const mean = pp.reduce((s, v) => s + v, 0) / 11;
      expect(out.ppMeanPsi[i]).toBeCloseTo(mean, 6);
      const sd = Math.sqrt(pp.reduce((s, v) => s + (v - mean) ** 2, 0) / 10);
      expect(out.ppStdPsi[i]).toBeCloseTo(sd, 6);
      // Probabilities: own hand count over the 11 reference realisations.
      const mud = input.plannedMudWeightPsiPerFt![i] * input.tvdFt[i];
      expect(out.probMudBelowPorePressure[i]).toBe(pp.filter((p) => p > mud).length / 11);
      expect(out.probMudAboveFracture[i]).toBe(fr.filter((x) => x < mud).length / 11);
    }
    expect(out.windowLowerPsi).toEqual(out.ppP90Psi);
    expect(out.windowUpperPsi).toEqual(out.fracP10Psi);
  });

  it("Bowers with unloading and the frictional bound: R = 11 order statistics vs bowersPorePressure and frictionalStressBounds", () => {
    // Own case; Bowers 1995 (SPE-27488) via src/porepressure, Zoback 2007 ch. 4 via src/stress.
    const tvd = [9000, 11000, 12000, 12500];
    const dt = [110, 100, 120, 95];
    const sv = [8600, 10600, 11600, 12100];
    const ph = [4050, 4950, 5400, 5625];
    const out = simulatePressureUncertainty({
      tvdFt: tvd, bmlFt: tvd, overburdenPsi: sv, hydrostaticPsi: ph, observed: dt,
      porePressure: {
        kind: "bowers", a: { kind: "uniform", min: 9, max: 12 }, b: { kind: "truncatedNormal", mean: 0.77, std: 0.03, min: 0.7, max: 0.85 },
        unloading: { u: { kind: "triangular", min: 2.5, mode: 3.13, max: 5 }, onsetTvdFt: 11500, vmaxFtPerS: 9500 },
      },
      fracture: { kind: "frictionalNormal", frictionCoefficient: { kind: "lognormal", median: 0.6, logStd: 0.15 } },
      realisations: 11, seed: 77,
    });
    const get = (name: string): Float64Array => out.draws.find((d) => d.name === name)!.values;
    const A = get("bowersA"), B = get("bowersB"), U = get("bowersU"), MU = get("frictionCoefficient");
    for (let i = 0; i < tvd.length; i++) {
      const pp: number[] = [];
      const fr: number[] = [];
      for (let r = 0; r < 11; r++) {
        const p = bowersPorePressure({
          overburdenPsi: [sv[i]], hydrostaticPsi: [ph[i]], velocityFtPerS: [1e6 / dt[i]], a: A[r], b: B[r], tvdFt: [tvd[i]],
          unloading: { u: U[r], onsetTvdFt: 11500, vmaxFtPerS: 9500 },
        }).ppPsi[0];
        pp.push(p);
        fr.push(frictionalStressBounds({ tvdFt: [tvd[i]], ppPsi: [p], svPsi: [sv[i]], frictionCoefficient: MU[r] }).normal.shminMinPsi[0]);
      }
      for (const [k, m] of [[1, 0], [5, 1], [9, 2]] as const) {
        const got = [out.ppP10Psi, out.ppP50Psi, out.ppP90Psi][m][i];
        expect(Math.abs(got - sortedAt(pp, k))).toBeLessThan(1e-9 * sv[i]);
        const gotF = [out.fracP10Psi, out.fracP50Psi, out.fracP90Psi][m][i];
        expect(Math.abs(gotF - sortedAt(fr, k))).toBeLessThan(1e-9 * sv[i]);
      }
    }
  });
});

describe("simulatePressureUncertainty — statistics", () => {
  it("mean and std of Pp match the exact lognormal moments when only a normal Eaton exponent varies", () => {
    // Published identity (lognormal moments): with n ~ N(μ, σ²) and L = ln r,
    // E[r^n] = exp(μL + σ²L²/2), E[r^{2n}] = exp(2μL + 2σ²L²); Pp = Sv − (Sv − Ph)r^n.
    // Tolerance: 4 Monte Carlo standard errors — SE(mean) = sd/√R and, for the std,
    // SE(s) ≈ √((m4 − sd⁴)/R)/(2 sd) with m4 the exact 4th central moment of r^n.
    const R = 20000;
    const mu = 3, sigma = 0.3;
    const sv = 10000, ph = 4650;
    const ratios = [0.7, 0.85, 1.1];
    const rn = 0.8 * Math.exp(1); // trend at 10,000 ft bml
    const out = simulatePressureUncertainty({
      tvdFt: [10000, 10000, 10000], bmlFt: [10000, 10000, 10000], overburdenPsi: [sv, sv, sv], hydrostaticPsi: [ph, ph, ph],
      observed: ratios.map((q) => q * rn),
      porePressure: { kind: "eaton", exponent: { kind: "normal", mean: mu, std: sigma }, trend: resTrend },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.4 } },
      realisations: R, seed: 99,
    });
    ratios.forEach((q, i) => {
      const L = Math.log(q);
      const raw = (k: number): number => Math.exp(k * mu * L + (k * k * sigma * sigma * L * L) / 2); // E[(r^n)^k]
      const m1 = raw(1);
      const v = raw(2) - m1 * m1;
      const m4 = raw(4) - 4 * raw(3) * m1 + 6 * raw(2) * m1 * m1 - 3 * m1 ** 4;
      const meanPp = sv - (sv - ph) * m1;
      const sdPp = (sv - ph) * Math.sqrt(v);
      const sdOfSd = ((sv - ph) * Math.sqrt((m4 - v * v) / R)) / (2 * Math.sqrt(v)); // delta method on s = √s²
      expect(Math.abs(out.ppMeanPsi[i] - meanPp)).toBeLessThan((4 * sdPp) / Math.sqrt(R));
      expect(Math.abs(out.ppStdPsi[i] - sdPp)).toBeLessThan(4 * sdOfSd);
    });
  });

  it("P50 equals deterministic Eaton at the sample median exponent (median of a monotone function), R odd", () => {
    // Own case: Pp is monotone in n, so the middle order statistic of Pp is Pp(middle n) exactly;
    // reference Pp from eatonPorePressure (Eaton 1975) at that n.
    const out = simulatePressureUncertainty({
      tvdFt: [10000], bmlFt: [10000], overburdenPsi: [10000], hydrostaticPsi: [4650], observed: [0.7 * 0.8 * Math.exp(1)],
      porePressure: { kind: "eaton", exponent: { kind: "normal", mean: 1.2, std: 0.15 }, trend: resTrend },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.4 } },
      realisations: 1001, seed: 5,
    });
    const n = out.draws.find((d) => d.name === "eatonExponent")!.values;
    const nMed = sortedAt(n, 500);
    const det = eatonPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [0.7], exponent: nMed }).ppPsi[0];
    expect(Math.abs(out.ppP50Psi[0] - det)).toBeLessThan(1e-9 * det);
    // And near the population value Pp(μ = 1.2) = 0.6802 psi/ft (own case, CHECK-VALUES §3 form), within sampling error.
    const pop = eatonPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [0.7], exponent: 1.2 }).ppPsi[0];
    expect(Math.abs(out.ppP50Psi[0] - pop)).toBeLessThan(15);
  });

  it("same seed gives identical output; another seed gives different draws", () => {
    const base: PressureUncertaintyInput = {
      tvdFt: [8000, 9000], bmlFt: [5000, 6000], overburdenPsi: [7600, 8600], hydrostaticPsi: [3600, 4050], observed: [1.1, 1.0],
      overburdenFactor: { kind: "normal", mean: 1, std: 0.02 },
      porePressure: { kind: "eaton", exponent: { kind: "normal", mean: 1.2, std: 0.1 }, trend: resTrend },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "uniform", min: 0.35, max: 0.45 } },
      plannedMudWeightPsiPerFt: [0.5, 0.55], realisations: 500, seed: 31,
    };
    const a = simulatePressureUncertainty(base);
    const b = simulatePressureUncertainty(base);
    const c = simulatePressureUncertainty({ ...base, seed: 32 });
    expect(b).toEqual(a);
    expect(c.ppP50Psi[0]).not.toBe(a.ppP50Psi[0]);
    expect(c.draws[0].values[0]).not.toBe(a.draws[0].values[0]);
    expect(a.realisations).toBe(500);
    expect(a.seed).toBe(31);
  });

  it("probabilities on a hand case: fixed Pp between two mud weights gives 1 and 0", () => {
    // Own case: Eaton ratio 1 → Pp = Ph = 4650 psi; ν 0.25 → Shmin 6433 psi at 10,000 ft.
    const out = simulatePressureUncertainty({
      tvdFt: [10000, 10000, 10000], bmlFt: [10000, 10000, 10000], overburdenPsi: [10000, 10000, 10000], hydrostaticPsi: [4650, 4650, 4650],
      observed: [0.8 * Math.exp(1), 0.8 * Math.exp(1), 0.8 * Math.exp(1)],
      porePressure: { kind: "eaton", exponent: { kind: "fixed", value: 1.2 }, trend: resTrend },
      fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.25 } },
      plannedMudWeightPsiPerFt: [0.40, 0.55, 0.70], realisations: 10, seed: 1,
    });
    expect(Array.from(out.probMudBelowPorePressure)).toEqual([1, 0, 0]);
    expect(Array.from(out.probMudAboveFracture)).toEqual([0, 0, 1]);
  });
});

describe("simulatePressureUncertainty — missing data and errors", () => {
  const ok: PressureUncertaintyInput = {
    tvdFt: [8000, 9000], bmlFt: [5000, 6000], overburdenPsi: [7600, 8600], hydrostaticPsi: [3600, 4050], observed: [1.1, NaN],
    porePressure: { kind: "eaton", exponent: { kind: "fixed", value: 1.2 }, trend: resTrend },
    fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.4 } }, realisations: 10, seed: 1,
  };
  it("NaN input at a depth gives NaN outputs there and a counted warning", () => {
    const out = simulatePressureUncertainty(ok);
    expect(out.ppP50Psi[0]).toBeGreaterThan(0);
    for (const k of ["ppP10Psi", "ppP50Psi", "ppP90Psi", "ppMeanPsi", "ppStdPsi", "fracP10Psi", "fracP50Psi", "fracP90Psi"] as const) {
      expect(out[k][1]).toBeNaN();
    }
    expect(out.warnings.find((w) => w.code === "W_MC_MISSING_DEPTHS")?.count).toBe(1);
  });
  it("throws typed errors", () => {
    const code = (c: string) => expect.objectContaining({ code: c });
    expect(() => simulatePressureUncertainty({ ...ok, realisations: 9 })).toThrow(code("E_MC_TOO_FEW_REALISATIONS"));
    expect(() => simulatePressureUncertainty({ ...ok, overburdenFactor: { kind: "normal", mean: 1, std: -0.1 } })).toThrow(code("E_RANGE"));
    expect(() => simulatePressureUncertainty({ ...ok, fracture: { kind: "eaton1969", poissonRatio: { kind: "uniform", min: 0.3, max: 0.55 } } })).toThrow(code("E_RANGE"));
    expect(() => simulatePressureUncertainty({ ...ok, fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0 } } })).toThrow(code("E_RANGE"));
    expect(() => simulatePressureUncertainty({ ...ok, fracture: { kind: "frictionalNormal", frictionCoefficient: { kind: "fixed", value: -0.1 } } })).toThrow(code("E_RANGE"));
    expect(() => simulatePressureUncertainty({ ...ok, observed: [1.1] })).toThrow(code("E_LENGTH"));
    expect(() => simulatePressureUncertainty({ ...ok, seed: -1 })).toThrow(code("E_RANGE"));
    expect(() => simulatePressureUncertainty({ ...ok, porePressure: { ...ok.porePressure, trendCovariance: [{ interceptVar: 1, slopeVar: 1, interceptSlopeCov: 2 }] } as never })).toThrow(code("E_RANGE"));
  });
});

describe("simulatePressureUncertainty — exponential-to-matrix trend stepped in depth", () => {
  // 300 depths cross four anchor blocks of 64; the step is 0.5 ft with a few irregular steps
  // (0.5000001, 0.7, 30 ft) and a missing sample, so every path of the depth stepping runs.
  const D = 300;
  const bml: number[] = [];
  let zRun = 4000;
  for (let i = 0; i < D; i++) {
    bml.push(zRun);
    zRun += i === 40 ? 0.5000001 : i === 100 ? 0.7 : i === 200 ? 30 : 0.5;
  }
  const tvd = bml.map((z) => z + 5082);
  const obs = bml.map((z, i) => (i === 150 ? NaN : 65 + 135 * Math.exp(-3e-4 * z) * (1 + 0.2 * Math.sin(i / 30))));
  const trend: CompactionTrend = { kind: "sonicExponential", segments: [
    { topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null },
  ] };
  const input: PressureUncertaintyInput = freezeAll({
    tvdFt: Object.freeze(tvd) as number[], bmlFt: Object.freeze(bml) as number[],
    overburdenPsi: Object.freeze(tvd.map((t) => 0.95 * t)) as number[], hydrostaticPsi: Object.freeze(tvd.map((t) => 0.465 * t)) as number[],
    observed: Object.freeze(obs) as number[],
    overburdenFactor: Object.freeze({ kind: "normal", mean: 1, std: 0.02 }) as never,
    porePressure: {
      kind: "eaton", exponent: { kind: "normal", mean: 3, std: 0.3 }, trend,
      trendCovariance: [{ interceptVar: 4e-4, slopeVar: 4e-10, interceptSlopeCov: -2e-7 }],
    },
    fracture: { kind: "eaton1969", poissonRatio: { kind: "truncatedNormal", mean: 0.42, std: 0.03, min: 0.3, max: 0.49 } },
    realisations: 11, seed: 99,
  });

  it("every depth matches Eaton 1975 with the realisation's own trend (evaluateCompactionTrend) to 1e-12", () => {
    // Own case; reference per realisation from evaluateCompactionTrend (Zhang 2011 form),
    // eatonRatio + eatonPorePressure (Eaton 1975) and eaton1969Fracture (Eaton 1969). The
    // depth stepping of the trend must not drift: 1e-12 relative is ~5000 ulp, far below any
    // physical meaning and far above double rounding of the direct evaluation.
    const out = simulatePressureUncertainty(input);
    const get = (name: string): Float64Array => out.draws.find((d) => d.name === name)!.values;
    const f = get("overburdenFactor"), n = get("eatonExponent"), a0 = get("trendIntercept[0]"), b0 = get("trendSlope[0]"), nu = get("poissonRatio");
    for (let i = 0; i < D; i++) {
      if (i === 150) {
        expect(out.ppP50Psi[i]).toBeNaN();
        continue;
      }
      const pp: number[] = [];
      const fr: number[] = [];
      for (let r = 0; r < 11; r++) {
        // Linearised form: ln(Δtml − Δtm) = a, −c = b (drawn); back to the trend parameters.
        const tr: CompactionTrend = { kind: "sonicExponential", segments: [
          { topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 65 + Math.exp(a0[r]), decayPerFt: -b0[r] }, fittedOn: null },
        ] };
        const dtn = evaluateCompactionTrend({ trend: tr, bmlFt: [bml[i]] });
        const ratio = eatonRatio({ log: "sonic", observed: [obs[i]], trend: dtn });
        const sv = input.overburdenPsi[i] * f[r];
        const p = eatonPorePressure({ overburdenPsi: [sv], hydrostaticPsi: [input.hydrostaticPsi[i]], ratio, exponent: n[r] }).ppPsi[0];
        pp.push(p);
        fr.push(eaton1969Fracture({ tvdFt: [tvd[i]], ppPsi: [p], svPsi: [sv], poissonRatio: nu[r] }).shminPsi[0]);
      }
      for (const [k, q] of [[1, out.ppP10Psi], [5, out.ppP50Psi], [9, out.ppP90Psi]] as const) {
        expect(Math.abs(q[i] - sortedAt(pp, k))).toBeLessThan(1e-12 * sortedAt(pp, k));
      }
      for (const [k, q] of [[1, out.fracP10Psi], [5, out.fracP50Psi], [9, out.fracP90Psi]] as const) {
        expect(Math.abs(q[i] - sortedAt(fr, k))).toBeLessThan(1e-12 * sortedAt(fr, k));
      }
    }
  });

  it("a run starting on an anchor block boundary (index 64, 128) repeats the full run bit for bit", () => {
    // Own case (design property): the trend state is re-evaluated at every multiple of 64, so
    // the result at a depth depends only on the inputs since its block began — the property a
    // run split across threads at block boundaries relies on.
    const full = simulatePressureUncertainty(input);
    for (const start of [64, 128]) {
      const cut = <T,>(a: ArrayLike<T>): T[] => Array.from(a).slice(start);
      const part = simulatePressureUncertainty({
        ...input, tvdFt: cut(input.tvdFt), bmlFt: cut(input.bmlFt), overburdenPsi: cut(input.overburdenPsi),
        hydrostaticPsi: cut(input.hydrostaticPsi), observed: cut(input.observed),
      });
      for (const key of ["ppP10Psi", "ppP50Psi", "ppP90Psi", "fracP10Psi", "fracP50Psi", "fracP90Psi", "ppMeanPsi", "ppStdPsi"] as const) {
        expect(part[key]).toEqual(full[key].slice(start));
      }
    }
  });

  it("simulatePressureUncertaintyPart + joinPressureUncertaintyParts repeat the whole run bit for bit", () => {
    // Own case (design property): parts starting on multiples of 64, joined in depth order,
    // equal the single call — arrays, draws and the merged missing-depth warning (depth 150).
    const full = simulatePressureUncertainty(input);
    for (const cuts of [[0, 128, D], [0, 64, 256, D], [0, D]]) {
      const parts = cuts.slice(1).map((end, k) => simulatePressureUncertaintyPart({ input, startIndex: cuts[k], endIndex: end }));
      const joined = joinPressureUncertaintyParts({ parts });
      expect(joined).toEqual(full);
    }
    expect(full.warnings.find((w) => w.code === "W_MC_MISSING_DEPTHS")).toMatchObject({ count: 1, index: 150 });
    expect(() => simulatePressureUncertaintyPart({ input, startIndex: 100, endIndex: D })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => simulatePressureUncertaintyPart({ input, startIndex: 64, endIndex: D + 1 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => joinPressureUncertaintyParts({ parts: [] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});
