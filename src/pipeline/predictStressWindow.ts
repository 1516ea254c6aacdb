/**
 * One-call stress and mud-weight-window prediction from pore pressure and overburden:
 * minimum horizontal stress (fracture pressure) calibrated to leak-off tests, frictional
 * stress bounds and consistency findings, wellbore collapse and breakdown for a vertical
 * well, the mud-weight window and bottom-up casing points.
 *
 * Pure: arrays and a typed options object in, every intermediate curve out.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import type { Warning } from "../errors.js";
import { eaton1969Fracture } from "../stress/eaton1969Fracture.js";
import { hubbertWillisFractureBounds, effectiveStressRatioFracture } from "../stress/hubbertWillisFracture.js";
import { dainesFracture } from "../stress/dainesFracture.js";
import type { DepthVaryingCoefficient } from "../stress/stressSeries.js";
import { calibrateFractureModel, type FractureCalibration, type FractureCalibrationModel, type StressTestPoint } from "../stress/fractureCalibration.js";
import { frictionalStressBounds, type FrictionalStressBounds } from "../stress/frictionalStressBounds.js";
import { stressConsistencyFindings, type StressFinding } from "../stress/stressConsistencyFindings.js";
import { breakoutMudPressure } from "../stress/breakoutLimits.js";
import { breakdownPressureNonPenetrating } from "../stress/breakdownPressure.js";
import { ucsFromSlownessHorsrud2001 } from "../stress/ucsCorrelations.js";
import { mudWeightWindowCurves, mudWeightWindowFindings, type MudWeightWindow } from "../window/mudWeightWindow.js";
import { selectCasingPoints, type CasingDesign } from "../window/casingPoints.js";
import { checkCasingPlan, type PlannedHoleSection, type CasingPlanViolation } from "../window/casingPlanCheck.js";

/** How the minimum horizontal stress (the fracture-pressure curve) is estimated. */
export type FractureMethodChoice =
  | { method: "eaton1969"; poissonRatio: DepthVaryingCoefficient }
  | { method: "stressRatio"; stressRatio: number }
  | { method: "hubbertWillisMin" }
  | { method: "daines"; poissonRatio: DepthVaryingCoefficient; tectonicRatio: number };

/** Options of {@link predictStressWindow}. */
export interface StressWindowOptions {
  fracture: FractureMethodChoice;
  /**
   * Leak-off / integrity / closure tests. With `calibrateFracture`, the effective-stress
   * ratio (or ν, or β for Daines) is fitted to them and used; otherwise their misfit to the
   * chosen method is reported only.
   */
  stressTests?: StressTestPoint[];
  calibrateFracture?: boolean;
  /** Coefficient of sliding friction μ for the stress bounds (default 0.6; Byerlee 1978). */
  frictionCoefficient?: number;
  /**
   * Wellbore stability for a vertical well. SHmax is not measured in a planning study, so
   * it is assumed as Shmin + shmaxFraction·(Sv − Shmin): 0 = isotropic horizontal stress,
   * 1 = SHmax equal to Sv (the normal-faulting limit). Default 0: equal horizontal stresses,
   * the usual assumption for a relaxed passive-margin basin without breakout or image-log
   * data (common practice, no source).
   * UCS from Horsrud 2001 on shale slowness unless a UCS curve is given.
   */
  wellbore?: {
    shmaxFraction?: number;
    ucsPsi?: ArrayLike<number>;
    /** Shale slowness for the UCS correlation, µs/ft (use the shale line). */
    dtUsPerFt?: ArrayLike<number>;
    /** Internal friction coefficient μi (default 0.6). */
    internalFriction?: number;
    /** Tensile strength, psi (default 0: conservative; common practice, no source). */
    tensileStrengthPsi?: number;
  };
  /** Margins, ppg EMW (defaults 0.3 trip, 0.3 kick, 0.2 shoe safety; common practice, no source). */
  margins?: { tripPpg?: number; kickPpg?: number; shoeSafetyPpg?: number; minWindowPpg?: number };
  /**
   * Depth of the first (structural / conductor) casing shoe, ft TVD: casing points are
   * selected from the window below it. Default: the top of the data.
   */
  firstShoeTvdFt?: number;
  /** A user's casing plan to check against the window. */
  casingPlan?: PlannedHoleSection[];
}

/** Everything {@link predictStressWindow} computed. */
export interface StressWindowPrediction {
  /** Minimum horizontal stress = fracture pressure used, psi. */
  shminPsi: Float64Array;
  /** Fracture gradient, psi/ft. */
  fractureGradientPsiPerFt: Float64Array;
  /** Hubbert & Willis (1957) bounds for reference, psi. */
  hubbertWillis: { minPsi: Float64Array; maxPsi: Float64Array };
  fractureCalibration?: FractureCalibration;
  bounds: FrictionalStressBounds;
  findings: StressFinding[];
  /** Assumed SHmax, UCS, collapse and breakdown pressures, psi (absent without `wellbore`). */
  wellbore?: { shmaxPsi: Float64Array; ucsPsi: Float64Array; collapsePsi: Float64Array; breakdownPsi: Float64Array };
  window: MudWeightWindow;
  casing?: CasingDesign;
  casingPlanViolations?: CasingPlanViolation[];
  warnings: Warning[];
}

/** Shortest run of converging stresses reported, ft (common practice, no source). */
const CONVERGENCE_MIN_RUN_FT = 200;

function medianStepFt(tvdFt: ArrayLike<number>): number {
  const steps: number[] = [];
  const stride = Math.max(1, Math.floor(tvdFt.length / 101));
  for (let i = stride; i < tvdFt.length; i += stride) {
    const d = (tvdFt[i] - tvdFt[i - stride]) / stride;
    if (d > 0) steps.push(d);
  }
  steps.sort((a, b) => a - b);
  return steps.length > 0 ? steps[steps.length >> 1] : 1;
}

function fractureFrom(
  choice: FractureMethodChoice,
  stress: { tvdFt: ArrayLike<number>; ppPsi: ArrayLike<number>; svPsi: ArrayLike<number> },
): Float64Array {
  switch (choice.method) {
    case "eaton1969":
      return eaton1969Fracture({ ...stress, poissonRatio: choice.poissonRatio }).shminPsi;
    case "stressRatio":
      return effectiveStressRatioFracture({ ...stress, stressRatio: choice.stressRatio }).shminPsi;
    case "hubbertWillisMin":
      return hubbertWillisFractureBounds(stress).min.shminPsi;
    case "daines":
      return dainesFracture({ ...stress, poissonRatio: choice.poissonRatio, tectonicRatio: choice.tectonicRatio }).shminPsi;
  }
}

/**
 * Predict minimum stress, stress bounds, wellbore limits, the mud-weight window and casing
 * points from pore pressure and overburden.
 *
 * Three steps, each reusable by the while-drilling update: {@link chooseFractureMethod}
 * (calibration to the stress tests), {@link stressWindowCurves} (every per-sample curve)
 * and {@link stressWindowSummaries} (findings and casing points over the whole well).
 *
 * @param input.tvdFt TVD below RT, ft, non-decreasing
 * @param input.ppPsi pore pressure, psi (e.g. PorePressurePrediction.ppPsi)
 * @param input.svPsi overburden, psi
 * @param options see {@link StressWindowOptions}
 * @returns {@link StressWindowPrediction}
 * @throws every error of the stage modules (typed ShalepointError)
 * @example predictStressWindow({ tvdFt, ppPsi, svPsi }, { fracture: { method: "eaton1969", poissonRatio: 0.42 } }).window
 */
export function predictStressWindow(input: StressInputs, options: StressWindowOptions): StressWindowPrediction {
  const chosen = chooseFractureMethod(input, options);
  const curves = stressWindowCurves(input, chosen.fracture, options);
  const summaries = stressWindowSummaries(input, curves, options);
  return assembleStressWindow(curves, chosen, summaries);
}

/** Depth, pore pressure and overburden on one index (ft, psi, psi). */
export interface StressInputs {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
}

/** The fracture method to use after calibration, with the calibration and its warnings. */
export interface ChosenFractureMethod {
  fracture: FractureMethodChoice;
  fractureCalibration?: FractureCalibration;
  warnings: Warning[];
}

/**
 * Step 1 of {@link predictStressWindow}: calibrate the fracture model to the stress tests
 * (when there are tests) and, with `calibrateFracture`, replace the given coefficient by the
 * fitted one. Reads the well only at the tests' depths.
 *
 * @param stress depth (ft), pore pressure and overburden (psi) on one index
 * @param options the stress-window options (fracture, stressTests, calibrateFracture)
 * @returns {@link ChosenFractureMethod}
 * @throws every error of calibrateFractureModel
 * @example chooseFractureMethod({ tvdFt, ppPsi, svPsi }, { fracture: { method: "eaton1969", poissonRatio: 0.42 } }).fracture
 */
export function chooseFractureMethod(stress: StressInputs, options: StressWindowOptions): ChosenFractureMethod {
  let fracture = options.fracture;
  let fractureCalibration: FractureCalibration | undefined;
  const warnings: Warning[] = [];
  const tests = options.stressTests ?? [];
  if (tests.length > 0) {
    const given = fracture;
    const model: FractureCalibrationModel =
      given.method === "daines" && typeof given.poissonRatio === "number"
        ? { model: "tectonicRatio", poissonRatio: given.poissonRatio }
        : given.method === "eaton1969"
          ? { model: "poissonRatio" }
          : { model: "stressRatio" };
    fractureCalibration = calibrateFractureModel({ ...stress, tests, model });
    warnings.push(...fractureCalibration.warnings);
    if (options.calibrateFracture && fractureCalibration.n > 0) {
      if (model.model === "tectonicRatio" && fracture.method === "daines") {
        fracture = { ...fracture, tectonicRatio: fractureCalibration.parameter };
      } else if (model.model === "poissonRatio") {
        fracture = { method: "eaton1969", poissonRatio: fractureCalibration.parameter };
      } else {
        fracture = { method: "stressRatio", stressRatio: fractureCalibration.stressRatio };
      }
    }
  }
  return { fracture, fractureCalibration, warnings };
}

/** Every per-sample curve of the stress window (see {@link StressWindowPrediction}). */
export interface StressWindowCurves {
  shminPsi: Float64Array;
  fractureGradientPsiPerFt: Float64Array;
  hubbertWillis: { minPsi: Float64Array; maxPsi: Float64Array };
  bounds: FrictionalStressBounds;
  wellbore?: { shmaxPsi: Float64Array; ucsPsi: Float64Array; collapsePsi: Float64Array; breakdownPsi: Float64Array };
  window: Omit<MudWeightWindow, "findings">;
}

/**
 * Step 2 of {@link predictStressWindow}: minimum stress, fracture gradient, Hubbert &
 * Willis bounds, frictional bounds, wellbore limits and the window's bounds. Each sample is
 * computed from its own inputs only, so the curves of the deeper part of a well are the same
 * whether computed alone or with the whole well.
 *
 * @param stress depth (ft), pore pressure and overburden (psi) on one index
 * @param fracture the method chosen by {@link chooseFractureMethod}
 * @param options the stress-window options (frictionCoefficient, wellbore, margins)
 * @returns {@link StressWindowCurves}
 * @throws every error of the stage modules (a ν or UCS curve must have one value per sample)
 * @example stressWindowCurves({ tvdFt, ppPsi, svPsi }, { method: "eaton1969", poissonRatio: 0.42 }, options).shminPsi
 */
export function stressWindowCurves(stress: StressInputs, fracture: FractureMethodChoice, options: StressWindowOptions): StressWindowCurves {
  const { tvdFt, ppPsi, svPsi } = stress;
  const n = tvdFt.length;
  const shminPsi = fractureFrom(fracture, stress);
  const fractureGradientPsiPerFt = new Float64Array(n);
  for (let i = 0; i < n; i++) fractureGradientPsiPerFt[i] = tvdFt[i] > 0 ? shminPsi[i] / tvdFt[i] : NaN;
  const hw = hubbertWillisFractureBounds(stress);
  const bounds = frictionalStressBounds({ ...stress, frictionCoefficient: options.frictionCoefficient ?? 0.6 });

  let wellbore: StressWindowCurves["wellbore"];
  if (options.wellbore) {
    const wb = options.wellbore;
    const f = wb.shmaxFraction ?? 0;
    const shmaxPsi = new Float64Array(n);
    for (let i = 0; i < n; i++) shmaxPsi[i] = shminPsi[i] + f * Math.max(0, svPsi[i] - shminPsi[i]);
    const ucsPsi = wb.ucsPsi ? Float64Array.from(wb.ucsPsi) : ucsFromSlownessHorsrud2001(wb.dtUsPerFt ?? new Float64Array(n).fill(NaN));
    const collapsePsi = breakoutMudPressure({ shmaxPsi, shminPsi, ppPsi, ucsPsi, internalFriction: wb.internalFriction ?? 0.6 });
    const breakdownPsi = breakdownPressureNonPenetrating({ shminPsi, shmaxPsi, ppPsi, tensileStrengthPsi: wb.tensileStrengthPsi ?? 0 });
    wellbore = { shmaxPsi, ucsPsi, collapsePsi, breakdownPsi };
  }
  const window = mudWeightWindowCurves({ ...windowMargins(options), tvdFt, ppPsi, fracturePsi: shminPsi, collapsePsi: wellbore?.collapsePsi, breakdownPsi: wellbore?.breakdownPsi });
  return { shminPsi, fractureGradientPsiPerFt, hubbertWillis: { minPsi: hw.min.shminPsi, maxPsi: hw.max.shminPsi }, bounds, wellbore, window };
}

function windowMargins(options: StressWindowOptions): { tripMarginPpg: number; kickMarginPpg: number; minWidthPpg?: number } {
  const m = options.margins ?? {};
  return { tripMarginPpg: m.tripPpg ?? 0.3, kickMarginPpg: m.kickPpg ?? 0.3, minWidthPpg: m.minWindowPpg };
}

/** The whole-well results of {@link stressWindowSummaries}. */
export interface StressWindowSummaries {
  findings: StressFinding[];
  windowFindings: MudWeightWindow["findings"];
  casing?: CasingDesign;
  casingPlanViolations?: CasingPlanViolation[];
  warnings: Warning[];
}

/**
 * Step 3 of {@link predictStressWindow}: what needs the whole well — stress consistency
 * findings, window findings, bottom-up casing points and the casing-plan check.
 *
 * @param stress depth (ft), pore pressure and overburden (psi) of the whole well
 * @param curves {@link stressWindowCurves} of the whole well
 * @param options the stress-window options (stressTests, frictionCoefficient, margins, firstShoeTvdFt, casingPlan)
 * @returns {@link StressWindowSummaries}
 * @throws every error of the stage modules (e.g. E_WINDOW_CLOSED_EVERYWHERE)
 * @example stressWindowSummaries(stress, stressWindowCurves(stress, options.fracture, options), options).casing
 */
export function stressWindowSummaries(stress: StressInputs, curves: StressWindowCurves, options: StressWindowOptions): StressWindowSummaries {
  const { tvdFt, ppPsi, svPsi } = stress;
  const n = tvdFt.length;
  const warnings: Warning[] = [];
  const tests = options.stressTests ?? [];
  const { shminPsi, window, wellbore } = curves;
  const mu = options.frictionCoefficient ?? 0.6;
  const findings = stressConsistencyFindings({
    tvdFt,
    ppPsi,
    svPsi,
    shminPsi,
    measuredShmin: tests.filter((t) => t.kind === "XLOT" || t.kind === "minifrac").map((t) => ({ tvdFt: t.tvdFt, shminPsi: t.pressurePsi, label: t.label })),
    frictionCoefficient: mu,
    // Convergence is a trend over hundreds of feet, not a sample-to-sample wiggle.
    minRunSamples: Math.max(5, Math.round(CONVERGENCE_MIN_RUN_FT / medianStepFt(tvdFt))),
  });
  const windowFindings = mudWeightWindowFindings({
    ...windowMargins(options),
    tvdFt,
    ppPsi,
    fracturePsi: shminPsi,
    collapsePsi: wellbore?.collapsePsi,
    breakdownPsi: wellbore?.breakdownPsi,
    curves: window,
  });

  let casing: CasingDesign | undefined;
  try {
    // Casing seats are chosen below the first (structural) shoe: above it the hole is
    // drilled riserless or jetted and the window does not govern.
    let first = 0;
    const firstShoe = options.firstShoeTvdFt ?? -Infinity;
    while (first < n && tvdFt[first] < firstShoe) first++;
    casing = selectCasingPoints({
      tvdFt,
      lowerPsiPerFt: window.lowerPsiPerFt,
      upperPsiPerFt: window.upperPsiPerFt,
      upperCriterion: window.upperCriterion,
      shoeSafetyMarginPpg: options.margins?.shoeSafetyPpg ?? 0.2,
      firstIndex: first,
    });
  } catch (e) {
    warnings.push({ code: "W_NO_CASING_DESIGN", message: `casing points not selected: ${(e as Error).message}` });
  }
  const casingPlanViolations = options.casingPlan
    ? checkCasingPlan({ tvdFt, lowerPsiPerFt: window.lowerPsiPerFt, upperPsiPerFt: window.upperPsiPerFt, sections: options.casingPlan })
    : undefined;
  return { findings, windowFindings, casing, casingPlanViolations, warnings };
}

/**
 * The prediction from the three steps' results (warnings: calibration, then summaries).
 * @param curves step 2
 * @param chosen step 1
 * @param summaries step 3
 * @returns {@link StressWindowPrediction}
 * @example assembleStressWindow(curves, chosen, summaries).window.findings
 */
export function assembleStressWindow(curves: StressWindowCurves, chosen: ChosenFractureMethod, summaries: StressWindowSummaries): StressWindowPrediction {
  return {
    shminPsi: curves.shminPsi,
    fractureGradientPsiPerFt: curves.fractureGradientPsiPerFt,
    hubbertWillis: curves.hubbertWillis,
    fractureCalibration: chosen.fractureCalibration,
    bounds: curves.bounds,
    findings: summaries.findings,
    wellbore: curves.wellbore,
    window: { ...curves.window, findings: summaries.windowFindings },
    casing: summaries.casing,
    casingPlanViolations: summaries.casingPlanViolations,
    warnings: [...chosen.warnings, ...summaries.warnings],
  };
}
