/**
 * One-call pressure-compartment analysis of a predicted pore-pressure profile: segmentation
 * and labels (hydrostatic, ramp, compartment, regression), seals, and fluid-gradient lines
 * with contacts from formation-pressure tests.
 *
 * Pure: arrays and plain objects in, plain data out (for figures, reports and notebooks).
 * No I/O, no printing.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { ShalepointError, type Warning } from "../errors.js";
import {
  classifyPressureCompartments,
  type ClassifyPressureCompartmentsInput,
  type ClassifyPressureCompartmentsResult,
} from "../compartments/classifyPressureCompartments.js";
import {
  fitPressureSystems,
  type FitPressureSystemsInput,
  type FitPressureSystemsResult,
  type PressureTestPoint,
} from "../compartments/fitPressureSystems.js";

/** Shale-point spacing assumed when none is given, ft: the default of predictPorePressure's shale picking. */
export const DEFAULT_COMPARTMENT_SHALE_POINT_SPACING_FT = 20;

/** Arguments of {@link predictCompartments}. */
export interface PredictCompartmentsInput {
  /** TVD below rotary table, ft, non-decreasing (e.g. PorePressurePrediction.tvdFt). */
  tvdFt: ArrayLike<number>;
  /** Predicted pore pressure, psi, NaN = missing (e.g. PorePressurePrediction.ppPsi). */
  ppPsi: ArrayLike<number>;
  /** Hydrostatic pressure, psi, same index. */
  hydrostaticPsi: ArrayLike<number>;
  /** Shale flag (1 = shale), same index, used to find seals. */
  shaleFlag?: Uint8Array;
  /** Formation-pressure tests (sands) for fluid-gradient lines and contacts; TVD ft, psi. */
  pressureTests?: readonly PressureTestPoint[];
  /**
   * Spacing of the shale points the pore pressure was computed from, ft, > 0. Default 20 ft
   * (predictPorePressure's `shale.pointSpacingFt` default). The profile is segmented on one
   * sample per this spacing; see {@link predictCompartments}.
   */
  shalePointSpacingFt?: number;
  /** Settings passed on to classifyPressureCompartments (thresholds, cost, penalty, …). */
  classification?: Omit<ClassifyPressureCompartmentsInput, "tvdFt" | "ppPsi" | "hydrostaticPsi" | "shaleFlag">;
  /** Settings passed on to fitPressureSystems (tolerance, gradient range, sands, …). */
  pressureSystems?: Omit<FitPressureSystemsInput, "tests" | "compartments">;
}

/** Result of {@link predictCompartments}. */
export interface CompartmentPrediction {
  /** Labelled intervals, top of overpressure, compartments, regressions, seals. */
  classification: ClassifyPressureCompartmentsResult;
  /** Fluid-gradient lines, contacts and rejected tests; null without tests or when too few are usable (see warnings). */
  pressureSystems: FitPressureSystemsResult | null;
  /** Depth spacing the profile was segmented at, ft (null when decimation was set explicitly). */
  segmentSpacingFt: number | null;
  /** Warnings of both stages, plus this stage's own. */
  warnings: Warning[];
}

/**
 * Pressure compartments of a predicted pore-pressure profile, with the pressure systems of
 * the formation-pressure tests matched to them.
 *
 * Segmentation spacing: a log-derived pore pressure is computed on a shale line that joins
 * shale points (medians of 20-ft windows by default) by interpolation, so neighbouring
 * samples of a 0.5-ft profile are not independent: their first differences are tiny, the
 * noise-based penalty of the change-point search (k·σ̂²·ln n, Killick et al. 2012, JASA
 * 107(500):1590–1598, with a BIC-type k per Schwarz 1978) becomes far too small, and the
 * residual sums count each independent value ~40 times, so the profile over-segments.
 * Segmenting one sample per shale-point spacing (decimateSpacingFt = shalePointSpacingFt)
 * restores independent values; estimating the noise about a smoothed profile instead would
 * fix σ̂ but not the repeated counting, so it was not chosen. Boundary precision is then
 * about one spacing (20 ft), well inside the ±150 ft the classification aims at.
 *
 * Pressure tests: fitted by fitPressureSystems (depth-contiguous lines, poor tests
 * rejected, contacts inside sands from the tests' `sand` names) within the profile's depth
 * range, with lines matched to the compartments found.
 *
 * @param input see {@link PredictCompartmentsInput}
 * @returns {@link CompartmentPrediction}
 * @throws ShalepointError E_RANGE for shalePointSpacingFt ≤ 0; every error of
 *   classifyPressureCompartments (E_TOO_SHORT for fewer usable samples than one minimum
 *   segment, E_RANGE for a penalty ≤ 0, E_LENGTH, E_ORDER) and the E_RANGE errors of
 *   fitPressureSystems. Too few usable tests is a warning (W_PRESSURE_SYSTEMS_NOT_FITTED).
 * @example
 * const p = predictPorePressure(well, options);
 * predictCompartments({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, hydrostaticPsi: p.hydrostaticPsi,
 *   shaleFlag: p.shale.isShale, pressureTests: tests }).classification.topOfOverpressureFt
 * // → ≈ 8,950 ft TVD on the Quillon A-1 demo well (truth 8,882 ft TVD = 8,800 ft TVDSS)
 */
export function predictCompartments(input: PredictCompartmentsInput): CompartmentPrediction {
  const spacing = input.shalePointSpacingFt ?? DEFAULT_COMPARTMENT_SHALE_POINT_SPACING_FT;
  if (!(Number.isFinite(spacing) && spacing > 0)) {
    throw new ShalepointError("E_RANGE", "shalePointSpacingFt must be a finite number > 0", {
      param: "shalePointSpacingFt",
      value: spacing,
      unit: "ft",
      allowed: "> 0",
      hint: "Pass the shale point spacing used for the pore-pressure prediction (default 20 ft).",
    });
  }
  const settings = input.classification ?? {};
  const explicit = settings.decimateSpacingFt !== undefined || settings.decimateEvery !== undefined;
  const classification = classifyPressureCompartments({
    ...settings,
    tvdFt: input.tvdFt,
    ppPsi: input.ppPsi,
    hydrostaticPsi: input.hydrostaticPsi,
    shaleFlag: input.shaleFlag,
    decimateSpacingFt: explicit ? settings.decimateSpacingFt : spacing,
  });
  const warnings: Warning[] = [...classification.warnings];

  let pressureSystems: FitPressureSystemsResult | null = null;
  if (input.pressureTests !== undefined && input.pressureTests.length > 0) {
    let top = Infinity;
    let base = -Infinity;
    for (let i = 0; i < input.tvdFt.length; i++) {
      const z = input.tvdFt[i];
      if (Number.isFinite(z)) {
        if (z < top) top = z;
        if (z > base) base = z;
      }
    }
    try {
      pressureSystems = fitPressureSystems({
        wellTopFt: Number.isFinite(top) ? top : undefined,
        wellBaseFt: Number.isFinite(base) ? base : undefined,
        ...input.pressureSystems,
        tests: input.pressureTests,
        compartments: classification.compartments.map((c) => ({ compartmentId: c.compartmentId, topFt: c.topFt, baseFt: c.baseFt })),
      });
      warnings.push(...pressureSystems.warnings);
    } catch (e) {
      if (!(e instanceof ShalepointError) || e.code !== "E_TOO_SHORT") throw e;
      warnings.push({ code: "W_PRESSURE_SYSTEMS_NOT_FITTED", message: `fluid-gradient lines not fitted: ${e.message}`, count: Number(e.details.value) });
    }
  }
  return { classification, pressureSystems, segmentSpacingFt: explicit ? null : spacing, warnings };
}
