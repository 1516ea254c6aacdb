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
