import { ShalepointError, type Warning, requireRange } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { interpolateOnDepthIndex, requireStressCurves } from "./stressSeries.js";

/**
 * Kinds of stress measurement: leak-off test, formation-integrity test (a lower bound: the
 * test stops before the rock leaks off), extended leak-off test closure, minifrac closure.
 */
export type StressTestKind = "LOT" | "FIT" | "XLOT" | "minifrac";

/** One measured stress test at a shoe or in open hole. */
export interface StressTestPoint {
  /** Test depth, ft TVD below RT. */
  tvdFt: number;
  /** Downhole test pressure, psi (LOT: leak-off; FIT: test pressure; XLOT/minifrac: closure). */
  pressurePsi: number;
  kind: StressTestKind;
  /** Free label, e.g. the casing it was run under. */
  label?: string;
}

/** Which parameter to fit. */
export type FractureCalibrationModel =
  | { model: "stressRatio" }
  | { model: "poissonRatio" }
  | { model: "tectonicRatio"; poissonRatio: number };

/** Flags a test can carry. */
export type StressTestFlag = "aboveOverburden" | "belowPorePressure" | "missingCurves" | "lowerBoundExceedsModel";

/** One test after calibration. */
export interface StressTestMisfit extends StressTestPoint {
  ppPsi: number;
  svPsi: number;
  /** Calibrated model pressure at the test depth, psi. */
  predictedPsi: number;
  /** measured − predicted, psi. */
  misfitPsi: number;
  /** measured − predicted as EMW, ppg (12/231 psi/ft per ppg). */
  misfitPpg: number;
  usedInFit: boolean;
  flags: StressTestFlag[];
}

/** Result of {@link calibrateFractureModel}. */
export interface FractureCalibration {
  model: FractureCalibrationModel["model"];
  /** The fitted parameter: K, ν or β according to the model. */
  parameter: number;
  /** Total effective-stress ratio K so that Shmin = Pp + K (Sv − Pp). */
  stressRatio: number;
  /** Number of tests used in the fit. */
  n: number;
  /** Root-mean-square misfit over the tests used, psi and ppg. */
  rmsMisfitPsi: number;
  rmsMisfitPpg: number;
  tests: StressTestMisfit[];
  warnings: Warning[];
}

/**
 * Calibrate a fracture model to leak-off, formation-integrity, extended leak-off and
 * minifrac tests.
 *
 * All three models are linear in one parameter times the effective overburden x = Sv − Pp:
 * - stressRatio: Shmin = Pp + K x (Hubbert & Willis 1957 form), fit K;
 * - poissonRatio: K = ν/(1−ν) (Eaton 1969), fit K then ν = K/(1+K);
 * - tectonicRatio: Shmin = Pp + (ν/(1−ν) + β) x (Daines 1982), ν given, fit β.
 * Least squares on pressure: K = Σ x y / Σ x², y = P_test − Pp (minus the Eaton term for β).
 *
 * LOT, XLOT and minifrac values are fitted. A FIT is a lower bound only (the test stopped
 * before leak-off), so it is not fitted; a FIT above the calibrated curve is flagged
 * `lowerBoundExceedsModel`. A test above overburden or below pore pressure is flagged,
 * warned about and left out of the fit. Pp and Sv at a test depth are interpolated linearly
 * on the depth index.
 *
 * @param args.tvdFt depth index, ft TVD below RT, increasing
 * @param args.ppPsi pore pressure, psi
 * @param args.svPsi overburden, psi
 * @param args.tests the tests (at least one fittable: LOT, XLOT or minifrac)
 * @param args.model which parameter to fit; for `tectonicRatio` give ν in (0, 0.5)
 * @returns parameter, misfit per test (psi and ppg), RMS misfit, flags and warnings
 * @throws ShalepointError E_DEPTH_OUTSIDE_WELL when a test lies outside the depth index;
 *   E_TOO_FEW when no fittable test remains; E_CALIBRATION_RANGE when a fitted ν leaves
 *   (0, 0.5) or K leaves [0, 1]; E_RANGE for ν outside (0, 0.5)
 * @example calibrateFractureModel({ tvdFt: [0, 10000], ppPsi: [0, 4650], svPsi: [0, 10000],
 *   tests: [{ tvdFt: 10000, pressurePsi: 6433.3, kind: "LOT" }], model: { model: "poissonRatio" } }).parameter // 0.25
 *
 * References: Hubbert & Willis 1957, Trans. AIME 210:153–168; Eaton 1969, JPT 21(10):
 * 1353–1360 (SPE-2163); Daines 1982, JPT 34(4):863–872 (from memory).
 */
export function calibrateFractureModel(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  tests: readonly StressTestPoint[];
  model: FractureCalibrationModel;
}): FractureCalibration {
  const { tvdFt, ppPsi, svPsi, tests, model } = args;
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  let eatonK = 0;
  if (model.model === "tectonicRatio") {
    const nu = model.poissonRatio;
    requireRange(nu > 0 && nu < 0.5, "poissonRatio", nu, "(0, 0.5) exclusive");
    eatonK = nu / (1 - nu);
  }
  const top = n > 0 ? tvdFt[0] : NaN;
  const base = n > 0 ? tvdFt[n - 1] : NaN;
  const warnings: Warning[] = [];
  const rows: StressTestMisfit[] = tests.map((t, k) => {
    if (!(t.tvdFt >= top && t.tvdFt <= base)) {
      throw new ShalepointError("E_DEPTH_OUTSIDE_WELL", `test ${k} lies outside the well's depth index`, {
        param: `tests[${k}].tvdFt`,
        value: t.tvdFt,
        unit: "ft",
        allowed: `[${top}, ${base}]`,
        hint: "Check the test depth is TVD below the rotary table, or extend the curves.",
      });
    }
    const pp = interpolateOnDepthIndex({ tvdFt, values: ppPsi, depthFt: t.tvdFt, clampEnds: false });
    const sv = interpolateOnDepthIndex({ tvdFt, values: svPsi, depthFt: t.tvdFt, clampEnds: false });
    const flags: StressTestFlag[] = [];
    if (!Number.isFinite(pp) || !Number.isFinite(sv)) flags.push("missingCurves");
    else {
      if (t.pressurePsi > sv) {
        flags.push("aboveOverburden");
        warnings.push({ code: "W_TEST_ABOVE_OVERBURDEN", message: `${t.kind} at ${t.tvdFt} ft (${t.pressurePsi} psi) is above overburden (${sv.toFixed(0)} psi); left out of the fit`, depthFt: t.tvdFt, index: k });
      }
      if (t.pressurePsi < pp) {
        flags.push("belowPorePressure");
        warnings.push({ code: "W_TEST_BELOW_PORE_PRESSURE", message: `${t.kind} at ${t.tvdFt} ft (${t.pressurePsi} psi) is below pore pressure (${pp.toFixed(0)} psi); left out of the fit`, depthFt: t.tvdFt, index: k });
      }
    }
    const usedInFit = flags.length === 0 && t.kind !== "FIT" && sv - pp > 0;
    return { ...t, ppPsi: pp, svPsi: sv, predictedPsi: NaN, misfitPsi: NaN, misfitPpg: NaN, usedInFit, flags };
  });
  let sxy = 0;
  let sxx = 0;
  let used = 0;
  for (const r of rows) {
    if (!r.usedInFit) continue;
    const x = r.svPsi - r.ppPsi;
    const y = r.pressurePsi - r.ppPsi - eatonK * x;
    sxy += x * y;
    sxx += x * x;
    used++;
  }
  if (used === 0) {
    throw new ShalepointError("E_TOO_FEW", "no leak-off, XLOT or minifrac test is usable for calibration", {
      param: "tests",
      value: tests.length,
      allowed: "at least 1 LOT/XLOT/minifrac inside the well, between pore pressure and overburden",
      hint: "A FIT is a lower bound only and is not fitted.",
    });
  }
  const fitted = sxy / sxx;
  const stressRatio = eatonK + fitted;
  if (!(stressRatio >= 0 && stressRatio <= 1)) {
    throw new ShalepointError("E_CALIBRATION_RANGE", "calibrated effective-stress ratio is outside [0, 1]", {
      param: "stressRatio", value: stressRatio, allowed: "[0, 1]", hint: "Check the tests' depths, pressures and the pore-pressure curve.",
    });
  }
  let parameter = fitted;
  if (model.model === "poissonRatio") {
    parameter = fitted / (1 + fitted);
    if (!(parameter > 0 && parameter < 0.5)) {
      throw new ShalepointError("E_CALIBRATION_RANGE", "calibrated Poisson's ratio is outside (0, 0.5)", {
        param: "poissonRatio", value: parameter, allowed: "(0, 0.5) exclusive", hint: "Fit the stressRatio model instead, or review the tests.",
      });
    }
  }
  let ss = 0;
  let ssPpg = 0;
  for (const r of rows) {
    r.predictedPsi = r.ppPsi + stressRatio * (r.svPsi - r.ppPsi);
    r.misfitPsi = r.pressurePsi - r.predictedPsi;
    r.misfitPpg = r.tvdFt > 0 ? r.misfitPsi / (PSI_PER_FT_PER_PPG * r.tvdFt) : NaN;
    if (r.usedInFit) {
      ss += r.misfitPsi ** 2;
      ssPpg += r.misfitPpg ** 2;
    }
    if (r.kind === "FIT" && r.misfitPsi > 0) {
      r.flags.push("lowerBoundExceedsModel");
      warnings.push({ code: "W_FIT_ABOVE_MODEL", message: `FIT at ${r.tvdFt} ft held ${r.misfitPsi.toFixed(0)} psi above the calibrated fracture pressure: the model is too low there`, depthFt: r.tvdFt });
    }
  }
  return {
    model: model.model,
    parameter,
    stressRatio,
    n: used,
    rmsMisfitPsi: Math.sqrt(ss / used),
    rmsMisfitPpg: Math.sqrt(ssPpg / used),
    tests: rows,
    warnings,
  };
}
