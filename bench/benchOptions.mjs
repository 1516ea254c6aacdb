/** Pipeline options used by the benchmark (the generated Quillon BENCH-1 well). */
export function benchOptions() {
  return {
    hydrostaticGradientPsiPerFt: 0.445,
    shale: { criterion: { kind: "grCutoff", cutoffApi: 80 } },
    sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 1000, baseBmlFt: 4500 }] }] },
    resistivityTrend: { use: "fit", kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, intervals: [{ topBmlFt: 1000, baseBmlFt: 4500 }] }] },
    eatonSonic: {},
    eatonResistivity: {},
    bowers: { a: 10, b: 0.75 },
    equivalentDepth: true,
    primary: "eatonSonic",
  };
}

/** Stress-window options: Eaton 1969 with ν 0.42, calibrated to the leak-off tests below. */
export const STRESS_OPTIONS = Object.freeze({
  fracture: { method: "eaton1969", poissonRatio: 0.42 },
  calibrateFracture: true,
  wellbore: { shmaxFraction: 0.5 },
  firstShoeTvdFt: 5500,
});

/** Invented leak-off tests at three casing shoes of the benchmark well. */
export function stressTests() {
  return [
    { tvdFt: 6000, pressurePsi: 3200, kind: "LOT", label: "13-3/8 in shoe" },
    { tvdFt: 9000, pressurePsi: 5600, kind: "LOT", label: "9-5/8 in shoe" },
    { tvdFt: 12000, pressurePsi: 8600, kind: "LOT", label: "7 in shoe" },
  ];
}

/**
 * Monte Carlo input of the benchmark (issue: 1,000 realisations on the 40,000-sample well):
 * Eaton sonic with the fitted exponential trend and its covariance, exponent N(3, 0.3),
 * overburden factor N(1, 0.02), Eaton 1969 fracture pressure with ν truncated N(0.42, 0.03)
 * on [0.3, 0.49], seed 7. `base` is predictPorePressure's result on `well`.
 */
export function monteCarloInput(well, base) {
  return {
    tvdFt: well.tvdFt, bmlFt: base.bmlFt, overburdenPsi: base.overburden.svPsi, hydrostaticPsi: base.hydrostaticPsi,
    observed: base.shaleLine.dtUsPerFt,
    porePressure: { kind: "eaton", exponent: { kind: "normal", mean: 3, std: 0.3 }, trend: base.sonicTrend.trend, trendCovariance: base.sonicTrend.diagnostics.map((d) => d.covariance ?? null) },
    fracture: { kind: "eaton1969", poissonRatio: { kind: "truncatedNormal", mean: 0.42, std: 0.03, min: 0.3, max: 0.49 } },
    overburdenFactor: { kind: "normal", mean: 1, std: 0.02 },
    realisations: 1000, seed: 7,
  };
}
