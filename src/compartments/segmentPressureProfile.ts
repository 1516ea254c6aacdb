/**
 * Segmentation of a pore-pressure profile into intervals of uniform pressure behaviour.
 *
 * Pure: typed arrays in, plain objects out.
 */
import { ShalepointError, requireSameLength, type Warning } from "../errors.js";
import { findChangePointsPelt, type ChangePointCost } from "./changePointsPelt.js";
import { medianInPlace } from "../trend/medianInPlace.js";

/** Grid size above which the automatic candidate step exceeds 1. */
const AUTO_GRID_POINTS = 2000;

/** Arguments of {@link segmentPressureProfile}. */
export interface SegmentPressureProfileInput {
  /** TVD below rotary table of each sample, ft, non-decreasing. Typical 0–25,000 ft. */
  tvdFt: ArrayLike<number>;
  /** Pore pressure on the same index, psi. NaN = missing (skipped). */
  ppPsi: ArrayLike<number>;
  /** Hydrostatic pressure on the same index, psi (e.g. 0.465 psi/ft × depth below sea level + water column). */
  hydrostaticPsi: ArrayLike<number>;
  /**
   * What is segmented. `"linear"` (default): excess pressure (pp − hydrostatic) as
   * piecewise-linear in depth, so a change of gradient starts a segment (ramps,
   * regressions). `"mean"`: excess pressure as piecewise-constant (steps between
   * compartments).
   */
  cost?: ChangePointCost;
  /** Penalty per change point, psi², > 0. Default: noise-based (see findChangePointsPelt). */
  penaltyPsi2?: number;
  /**
   * Minimum segment thickness, ft, > 0. Converted to samples with the median step of the
   * used samples (after decimation). Default 100 ft.
   */
  minThicknessFt?: number;
  /**
   * Optional selection of samples to segment (1 = use, 0 = skip), e.g. the shale flag when
   * pore pressure is only meaningful in shale. Skipped samples are counted, not dropped
   * silently.
   */
  useMask?: Uint8Array;
  /**
   * Keep every k-th used sample (integer ≥ 1, default 1). Decimation trades resolution
   * (boundary precision about k × step) for speed on very long profiles.
   */
  decimateEvery?: number;
  /**
   * Keep used samples at least this many ft of TVD apart (> 0; default: no depth
   * decimation): the first used sample, then the next one at or below the last kept depth
   * plus this spacing. Set it to the spacing of independent values when the profile is
   * interpolated between sparser points (e.g. pore pressure from a shale line joining
   * 20-ft shale points): the noise-based penalty and the segment costs then count
   * independent values, not interpolated ones. Applied after `decimateEvery`.
   */
  decimateSpacingFt?: number;
  /**
   * Spacing of admissible change positions, samples (see findChangePointsPelt). Default
   * `"auto"`: 1 (exact) up to 2000 used samples; above that, about nUsed/2000 (capped at
   * half the minimum segment) followed by refinement of each boundary to the sample.
   */
  candidateStep?: number | "auto";
}

/** One segment of the excess-pressure profile. */
export interface PressureProfileSegment {
  /** Index (input arrays) of the first and last used sample. */
  firstIndex: number;
  lastIndex: number;
  /** TVD of the first and last used sample, ft. */
  topFt: number;
  baseFt: number;
  /** Number of samples used in the fit. */
  nUsed: number;
  /** Mean excess pressure (pp − hydrostatic), psi. */
  meanExcessPsi: number;
  /** Least-squares slope of excess pressure with depth, psi/ft (0 for a ramp-free compartment). */
  excessGradientPsiPerFt: number;
  /** Least-squares slope of pore pressure with depth, psi/ft. */
  ppGradientPsiPerFt: number;
  /** Fitted excess pressure at top and base, psi. */
  excessTopPsi: number;
  excessBasePsi: number;
  /** RMS residual of the excess-pressure line, psi. */
  rmsResidualPsi: number;
}

/** Result of {@link segmentPressureProfile}. */
export interface SegmentPressureProfileResult {
  segments: PressureProfileSegment[];
  /** Depths of boundaries, ft: midway between the last sample above and the first below. */
  boundariesFt: number[];
  /** Penalty used, psi², and whether it came from the data's noise. */
  penaltyPsi2: number;
  penaltySource: "given" | "noise";
  /** Noise estimate of excess pressure, psi (NaN when the penalty was given). */
  noiseSigmaPsi: number;
  /** Minimum segment length used, samples, and the step it was derived from, ft. */
  minSegmentSamples: number;
  stepFt: number;
  /** Spacing of admissible change positions used, samples (1 = exact optimum). */
  candidateStep: number;
  nUsed: number;
  nSkipped: number;
  warnings: Warning[];
}

/**
 * Least-squares line over selected samples (ordinary least squares in centred sums).
 *
 * slope = Σ(z − z̄)(v − v̄) / Σ(z − z̄)²; rms = √(Σ residual² / n). Used by the
 * classification to recompute merged intervals.
 * @param z abscissa, e.g. TVD ft
 * @param v ordinate, e.g. excess pressure psi
 * @param samples indices to use (non-empty, finite values)
 * @returns n, slope (v unit per z unit; 0 when all z are equal), means, rms residual
 * @throws nothing; an empty selection returns NaN means
 * @example compartmentLineFit([0, 1, 2], [1, 3, 5], [0, 1, 2]) // → slope 2, meanV 3, rms 0
 */
export function compartmentLineFit(
  z: ArrayLike<number>,
  v: ArrayLike<number>,
  samples: ArrayLike<number>,
): { n: number; slope: number; meanZ: number; meanV: number; rms: number } {
  const n = samples.length;
  let mz = 0;
  let mv = 0;
  for (let k = 0; k < n; k++) {
    mz += z[samples[k]];
    mv += v[samples[k]];
  }
  mz /= n;
  mv /= n;
  let szz = 0;
  let szv = 0;
  for (let k = 0; k < n; k++) {
    const dz = z[samples[k]] - mz;
    szz += dz * dz;
    szv += dz * (v[samples[k]] - mv);
  }
  const slope = szz > 0 ? szv / szz : 0;
  let ss = 0;
  for (let k = 0; k < n; k++) {
    const r = v[samples[k]] - mv - slope * (z[samples[k]] - mz);
    ss += r * r;
  }
  return { n, slope, meanZ: mz, meanV: mv, rms: Math.sqrt(ss / Math.max(n, 1)) };
}

/**
 * Statistics of one depth interval of the profile: mean excess pressure, least-squares
 * gradients of excess and pore pressure, fitted excess at top and base, rms residual.
 * @param tvdFt TVD, ft
 * @param excessPsi pore pressure minus hydrostatic, psi
 * @param ppPsi pore pressure, psi
 * @param samples indices of the interval's usable samples, in depth order (non-empty)
 * @returns a {@link PressureProfileSegment}
 * @example compartmentIntervalStats([9000, 9100], [1800, 1800], [5985, 6031.5], [0, 1])
 * // → meanExcessPsi 1800, excessGradientPsiPerFt 0, ppGradientPsiPerFt 0.465
 */
export function compartmentIntervalStats(
  tvdFt: ArrayLike<number>,
  excessPsi: ArrayLike<number>,
  ppPsi: ArrayLike<number>,
  samples: ArrayLike<number>,
): PressureProfileSegment {
  const e = compartmentLineFit(tvdFt, excessPsi, samples);
  const p = compartmentLineFit(tvdFt, ppPsi, samples);
  const first = samples[0];
  const lastI = samples[samples.length - 1];
  const topFt = tvdFt[first];
  const baseFt = tvdFt[lastI];
  return {
    firstIndex: first,
    lastIndex: lastI,
    topFt,
    baseFt,
    nUsed: e.n,
    meanExcessPsi: e.meanV,
    excessGradientPsiPerFt: e.slope,
    ppGradientPsiPerFt: p.slope,
    excessTopPsi: e.meanV + e.slope * (topFt - e.meanZ),
    excessBasePsi: e.meanV + e.slope * (baseFt - e.meanZ),
    rmsResidualPsi: e.rms,
  };
}

/**
 * Pressure-profile segmentation by PELT on excess pressure.
 *
 * Excess pressure Δp(z) = pp(z) − ph(z) is split into segments by an exact change-point
 * search (PELT: Killick, Fearnhead & Eckley 2012, JASA 107(500):1590–1598,
 * doi:10.1080/01621459.2012.737745) with a piecewise-linear (default) or piecewise-constant
 * cost; each segment then gets its mean excess pressure and gradients. The penalty defaults
 * to a BIC-type 3·σ̂²·ln n (linear) or 2·σ̂²·ln n (mean) with σ̂ the robust noise of Δp; the
 * minimum thickness (default 100 ft) sets the minimum segment length.
 *
 * @param input see {@link SegmentPressureProfileInput}
 * @returns segments with depth ranges and statistics, boundaries, the penalty used
 * @throws ShalepointError E_LENGTH when arrays differ in length; E_RANGE for a penalty ≤ 0,
 *   a thickness ≤ 0, a bad decimation step or spacing; E_TOO_SHORT when fewer usable samples than
 *   the minimum segment; E_ORDER when depth decreases.
 * @example
 * // 0–4000 ft hydrostatic, then excess rising 1 psi/ft to 6000 ft, then flat at 2000 psi
 * // → segments ≈ [0, 4000], [4000, 6000], [6000, 8000] ft (see the tests)
 */
export function segmentPressureProfile(input: SegmentPressureProfileInput): SegmentPressureProfileResult {
  const { tvdFt, ppPsi, hydrostaticPsi } = input;
  requireSameLength(tvdFt, ppPsi, "tvdFt", "ppPsi");
  requireSameLength(tvdFt, hydrostaticPsi, "tvdFt", "hydrostaticPsi");
  if (input.useMask !== undefined) requireSameLength(tvdFt, input.useMask, "tvdFt", "useMask");
  const minThicknessFt = input.minThicknessFt ?? 100;
  if (!(Number.isFinite(minThicknessFt) && minThicknessFt > 0)) {
    throw new ShalepointError("E_RANGE", "minThicknessFt must be > 0", { param: "minThicknessFt", value: minThicknessFt, unit: "ft", allowed: "> 0" });
  }
  const every = input.decimateEvery ?? 1;
  if (!Number.isInteger(every) || every < 1) {
    throw new ShalepointError("E_RANGE", "decimateEvery must be an integer ≥ 1", { param: "decimateEvery", value: every, allowed: "integer ≥ 1" });
  }
  const spacingFt = input.decimateSpacingFt;
  if (spacingFt !== undefined && !(Number.isFinite(spacingFt) && spacingFt > 0)) {
    throw new ShalepointError("E_RANGE", "decimateSpacingFt must be a finite number > 0", { param: "decimateSpacingFt", value: spacingFt, unit: "ft", allowed: "> 0" });
  }
  if (input.penaltyPsi2 !== undefined && !(Number.isFinite(input.penaltyPsi2) && input.penaltyPsi2 > 0)) {
    throw new ShalepointError("E_RANGE", "penaltyPsi2 must be a finite number > 0", { param: "penaltyPsi2", value: input.penaltyPsi2, unit: "psi²", allowed: "> 0" });
  }
  const cost = input.cost ?? "linear";
  const n0 = tvdFt.length;
  const excess = new Float64Array(n0);
  const used: number[] = [];
  let nMissing = 0;
  let nMasked = 0;
  let nDecimated = 0;
  let seen = 0;
  let nextKeepFt = -Infinity;
  let lastFt = -Infinity;
  for (let i = 0; i < n0; i++) {
    excess[i] = ppPsi[i] - hydrostaticPsi[i];
    if (!(Number.isFinite(excess[i]) && Number.isFinite(tvdFt[i]))) {
      nMissing++;
      continue;
    }
    if (input.useMask !== undefined && input.useMask[i] !== 1) {
      nMasked++;
      continue;
    }
    if (spacingFt !== undefined && tvdFt[i] < lastFt) {
      throw new ShalepointError("E_ORDER", "tvdFt must be non-decreasing", { param: "tvdFt", value: tvdFt[i], unit: "ft", row: i });
    }
    lastFt = tvdFt[i];
    if (seen++ % every !== 0 || (spacingFt !== undefined && tvdFt[i] < nextKeepFt)) {
      nDecimated++;
      continue;
    }
    if (spacingFt !== undefined) nextKeepFt = tvdFt[i] + spacingFt;
    used.push(i);
  }
  const warnings: Warning[] = [];
  if (nMissing > 0) warnings.push({ code: "W_SAMPLES_SKIPPED", message: `${nMissing} sample(s) with missing depth or pressure skipped`, count: nMissing });
  if (nMasked > 0) warnings.push({ code: "W_SAMPLES_MASKED", message: `${nMasked} sample(s) outside useMask not segmented`, count: nMasked });
  // Median step of the used samples.
  const steps = new Float64Array(Math.max(used.length - 1, 0));
  for (let k = 1; k < used.length; k++) steps[k - 1] = tvdFt[used[k]] - tvdFt[used[k - 1]];
  const stepFt = medianInPlace(steps);
  const minLen = cost === "linear" ? 3 : 1;
  const minSeg = stepFt > 0 ? Math.max(minLen, Math.round(minThicknessFt / stepFt) + 1) : minLen;
  if (used.length < minSeg) {
    throw new ShalepointError("E_TOO_SHORT", "too few usable samples for one segment of the minimum thickness", {
      param: "ppPsi",
      value: used.length,
      allowed: `≥ ${minSeg} usable samples (minThicknessFt ${minThicknessFt} ft at step ${stepFt} ft)`,
      hint: "Use a thinner minimum segment or a longer profile.",
    });
  }
  const zs = new Float64Array(used.length);
  const es = new Float64Array(used.length);
  for (let k = 0; k < used.length; k++) {
    zs[k] = tvdFt[used[k]];
    es[k] = excess[used[k]];
  }
  const stepOpt = input.candidateStep ?? "auto";
  const candidateStep =
    stepOpt === "auto" ? Math.max(1, Math.min(Math.ceil(used.length / AUTO_GRID_POINTS), Math.floor(minSeg / 2))) : stepOpt;
  const pelt = findChangePointsPelt({ values: es, positions: zs, cost, penalty: input.penaltyPsi2, minSegmentSamples: minSeg, candidateStep });
  for (const w of pelt.warnings) if (w.code !== "W_SAMPLES_SKIPPED") warnings.push(w);
  const segments: PressureProfileSegment[] = [];
  for (const s of pelt.segments) {
    const samples = used.slice(s.firstIndex, s.lastIndex + 1);
    segments.push(compartmentIntervalStats(tvdFt, excess, ppPsi, samples));
  }
  const boundariesFt: number[] = [];
  for (let k = 1; k < segments.length; k++) boundariesFt.push(0.5 * (segments[k - 1].baseFt + segments[k].topFt));
  return {
    segments,
    boundariesFt,
    penaltyPsi2: pelt.penalty,
    penaltySource: pelt.penaltySource,
    noiseSigmaPsi: pelt.noiseSigma,
    minSegmentSamples: minSeg,
    stepFt,
    candidateStep: pelt.candidateStep,
    nUsed: used.length,
    nSkipped: nMissing + nMasked + nDecimated,
    warnings,
  };
}
