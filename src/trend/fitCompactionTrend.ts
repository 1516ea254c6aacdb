/**
 * Fit a normal compaction trend to shale points inside user-chosen depth intervals.
 *
 * Each model is fitted as a straight line in depth below the mudline Z after a transform
 * (so the fit is linear, by centred sums, see fitStraightLine.ts):
 * - sonicLogLinear (Hottman & Johnson 1965, JPT 17(6):717–722, SPE-1110):
 *   log10 Δt = log10 Δtml + s·Z;
 * - resistivityLogLinear (Zhang 2011, Earth-Science Reviews 108:50–63, eq. form from memory):
 *   ln R = ln R0 + b·Z;
 * - sonicExponential (Zhang 2011): the matrix slowness Δtm is FIXED by the user and
 *   ln(Δt − Δtm) = ln(Δtml − Δtm) − c·Z is fitted; points with Δt ≤ Δtm cannot be
 *   transformed and are excluded (counted in `nExcluded`). Fixing Δtm is the documented
 *   choice: Δtm is poorly determined by shallow data and is usually taken from the
 *   lithology (55–70 µs/ft for shale).
 * Methods: ordinary least squares, or Huber IRLS (k = 1.345, MAD scale; Huber 1964,
 * Annals of Mathematical Statistics 35(1):73–101) which shrugs off a few bad points.
 * R², residual spread and the covariance are those of the linearised fit; the standard
 * errors of the physical parameters follow by the delta method
 * (e.g. se(Δtml) = ln10·Δtml·se(a) for the log10 form).
 *
 * Files needed to copy this module into a script: trend/fitCompactionTrend.ts,
 * trend/fitStraightLine.ts, trend/fitStraightLineHuber.ts, trend/sonicExponentialTrend.ts,
 * trend/sonicLogLinearTrend.ts, trend/resistivityLogLinearTrend.ts, trend/trendTypes.ts,
 * errors.ts.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { fitStraightLine, type LineCovariance, type StraightLineFit } from "./fitStraightLine.js";
import { fitStraightLineHuber } from "./fitStraightLineHuber.js";
import { checkSonicExponentialParams } from "./sonicExponentialTrend.js";
import { checkSonicLogLinearParams } from "./sonicLogLinearTrend.js";
import { checkResistivityLogLinearParams } from "./resistivityLogLinearTrend.js";
import type {
  BmlInterval,
  CompactionTrend,
  CompactionTrendKind,
  TrendFitMethod,
  TrendParamsByKind,
  TrendSegment,
} from "./trendTypes.js";

/** Fewest shale points a trend fit accepts (two parameters plus one degree of freedom). */
export const MIN_TREND_POINTS = 3;

/** Inputs of {@link fitCompactionTrend}. */
export interface CompactionTrendFitInput<K extends CompactionTrendKind = CompactionTrendKind> {
  kind: K;
  /** Depth below mudline of each sample, ft (NaN = no depth). */
  bmlFt: ArrayLike<number>;
  /** Slowness (µs/ft) for sonic kinds, deep resistivity (ohm·m) for resistivity; NaN = missing. */
  values: ArrayLike<number>;
  /** 1 = shale point. Absent: every sample in the intervals is used. */
  shaleFlag?: Uint8Array;
  /** Depth intervals below the mudline to fit on (at least one). */
  intervals: readonly BmlInterval[];
  /** Default "leastSquares". */
  method?: TrendFitMethod;
  /** Matrix slowness Δtm, µs/ft, required for sonicExponential; typical 65. */
  dtMatrixUsPerFt?: number;
}

/** Fit diagnostics of one segment. */
export interface CompactionTrendDiagnostics<K extends CompactionTrendKind = CompactionTrendKind> {
  kind: K;
  method: TrendFitMethod;
  params: TrendParamsByKind[K];
  /** Linearised model the statistics refer to. */
  linearModel: string;
  /** Shale points used. */
  n: number;
  /** Samples in the intervals skipped for a missing (NaN or ≤ 0) value or depth. */
  nMissing: number;
  /** Samples in the intervals not flagged as shale. */
  nNotShale: number;
  /** sonicExponential only: points with Δt ≤ Δtm, which cannot be used. */
  nExcluded: number;
  /** Huber only: points given a weight below 1 (0 for least squares). */
  nDownweighted: number;
  rSquared: number;
  residualStd: number;
  /** Standard error of each physical parameter (0 for a fixed one), delta method. */
  paramStdErr: Record<string, number>;
  /** Covariance of the linearised intercept and slope. */
  covariance: LineCovariance;
  /** Depth span of the points used, ft below mudline. */
  depthRange: BmlInterval;
  warnings: Warning[];
}

/** Result of {@link fitCompactionTrend}. */
export interface CompactionTrendFit<K extends CompactionTrendKind = CompactionTrendKind> {
  params: TrendParamsByKind[K];
  diagnostics: CompactionTrendDiagnostics<K>;
}

const LINEAR_MODEL: Record<CompactionTrendKind, string> = {
  sonicExponential: "ln(dt - dtMatrix) = a + b*Z",
  sonicLogLinear: "log10(dt) = a + b*Z",
  resistivityLogLinear: "ln(R) = a + b*Z",
};

function checkIntervals(intervals: readonly BmlInterval[], bmlFt: ArrayLike<number>, pre: string): void {
  if (intervals.length === 0) {
    throw new ShalepointError("E_TREND_INTERVALS", "no depth interval given for the trend fit", {
      param: `${pre}intervals`, hint: "Give at least one { topBmlFt, baseBmlFt } interval of normally compacted shale.",
    });
  }
  let zMin = Infinity;
  let zMax = -Infinity;
  for (let i = 0; i < bmlFt.length; i++) {
    if (Number.isFinite(bmlFt[i])) {
      zMin = Math.min(zMin, bmlFt[i]);
      zMax = Math.max(zMax, bmlFt[i]);
    }
  }
  intervals.forEach((iv, k) => {
    if (!(Number.isFinite(iv.topBmlFt) && Number.isFinite(iv.baseBmlFt) && iv.topBmlFt < iv.baseBmlFt)) {
      throw new ShalepointError("E_RANGE", "interval top must be above (less than) its base", {
        param: `${pre}intervals[${k}]`, value: iv, unit: "ft below mudline", allowed: "topBmlFt < baseBmlFt, both finite",
      });
    }
    if (iv.baseBmlFt < zMin || iv.topBmlFt > zMax) {
      throw new ShalepointError("E_TREND_DEPTH_RANGE", "interval lies outside the depth range of the log", {
        param: `${pre}intervals[${k}]`, value: iv, unit: "ft below mudline",
        allowed: Number.isFinite(zMin) ? `overlapping [${zMin}, ${zMax}]` : "a log with depths",
        hint: "Depths are below the mudline (bmlFt), not TVD below the rotary table.",
      });
    }
  });
}

/**
 * Fit one normal compaction trend segment on shale points.
 *
 * Formula: see the file header (linearised least squares or Huber IRLS).
 * Missing data: samples with NaN depth or value (or value ≤ 0) are skipped and counted.
 *
 * @param input see {@link CompactionTrendFitInput}
 * @param paramPrefix prefix for parameter names in errors (e.g. `segments[1].`); default none
 * @returns fitted parameters and diagnostics { params, n, rSquared, residualStd, paramStdErr, covariance, depthRange }
 * @throws ShalepointError E_TREND_INTERVALS (no interval), E_RANGE (top ≥ base),
 *   E_TREND_DEPTH_RANGE (interval outside the log), E_TREND_ALL_MISSING (no finite value in
 *   the intervals), E_TREND_TOO_FEW_POINTS (fewer than 3 shale points), E_TREND_DEGENERATE
 *   (all points at one depth), E_TREND_PARAMS (fitted or given parameters invalid, e.g. Δtm missing)
 * @example
 * fitCompactionTrend({ kind: "resistivityLogLinear", bmlFt: [1000, 2000, 3000], values: [0.8 * Math.exp(0.1), 0.8 * Math.exp(0.2), 0.8 * Math.exp(0.3)], intervals: [{ topBmlFt: 0, baseBmlFt: 5000 }] })
 * // params { r0OhmM: 0.8, growthPerFt: 1e-4 }, rSquared 1
 * Reference: Hottman & Johnson 1965, JPT 17(6) (SPE-1110); Zhang 2011, Earth-Science Reviews
 * 108:50–63, doi:10.1016/j.earscirev.2011.06.001; Huber 1964, Ann. Math. Statist. 35(1).
 */
export function fitCompactionTrend<K extends CompactionTrendKind>(
  input: CompactionTrendFitInput<K>,
  paramPrefix = "",
): CompactionTrendFit<K> {
  const { kind, bmlFt, values, shaleFlag, intervals } = input;
  const method: TrendFitMethod = input.method ?? "leastSquares";
  if (bmlFt.length !== values.length || (shaleFlag && shaleFlag.length !== values.length)) {
    throw new ShalepointError("E_LENGTH", "bmlFt, values and shaleFlag must have the same length", {
      param: "bmlFt, values, shaleFlag",
      value: `${bmlFt.length}, ${values.length}${shaleFlag ? ", " + shaleFlag.length : ""}`,
    });
  }
  const dtm = input.dtMatrixUsPerFt;
  if (kind === "sonicExponential" && !(dtm !== undefined && Number.isFinite(dtm) && dtm > 0)) {
    throw new ShalepointError("E_TREND_PARAMS", "the exponential sonic trend needs a fixed matrix slowness", {
      param: `${paramPrefix}dtMatrixUsPerFt`, value: dtm, unit: "us/ft", allowed: "> 0 (typical 55–70 for shale)",
      hint: "Give dtMatrixUsPerFt, or fit the sonicLogLinear kind instead.",
    });
  }
  checkIntervals(intervals, bmlFt, paramPrefix);

  const xs: number[] = [];
  const ys: number[] = [];
  let nInside = 0;
  let nMissing = 0;
  let nNotShale = 0;
  let nExcluded = 0;
  for (let i = 0; i < values.length; i++) {
    const z = bmlFt[i];
    if (!Number.isFinite(z)) continue;
    let inside = false;
    for (const iv of intervals) if (z >= iv.topBmlFt && z <= iv.baseBmlFt) inside = true;
    if (!inside) continue;
    nInside++;
    const v = values[i];
    if (!(Number.isFinite(v) && v > 0)) {
      nMissing++;
      continue;
    }
    if (shaleFlag && shaleFlag[i] !== 1) {
      nNotShale++;
      continue;
    }
    let y: number;
    if (kind === "sonicLogLinear") y = Math.log10(v);
    else if (kind === "resistivityLogLinear") y = Math.log(v);
    else {
      if (v <= dtm!) {
        nExcluded++;
        continue;
      }
      y = Math.log(v - dtm!);
    }
    xs.push(z);
    ys.push(y);
  }
  if (nInside > 0 && nMissing === nInside) {
    throw new ShalepointError("E_TREND_ALL_MISSING", "every sample in the chosen intervals is missing (NaN)", {
      param: `${paramPrefix}values`, value: nInside, hint: "Pick intervals where the log has data.",
    });
  }
  if (xs.length < MIN_TREND_POINTS) {
    throw new ShalepointError(
      "E_TREND_TOO_FEW_POINTS",
      `a trend fit needs at least ${MIN_TREND_POINTS} shale points, found ${xs.length}` +
        ` (${nInside} samples in the intervals: ${nMissing} missing, ${nNotShale} not shale, ${nExcluded} at or below the matrix slowness)`,
      { param: `${paramPrefix}intervals`, value: xs.length, allowed: `>= ${MIN_TREND_POINTS}`, hint: "Widen the intervals, add intervals or relax the shale selection." },
    );
  }

  const line: StraightLineFit & { nDownweighted?: number } =
    method === "huber" ? fitStraightLineHuber({ x: xs, y: ys }) : fitStraightLine({ x: xs, y: ys });
  const a = line.intercept;
  const b = line.slope;
  const seA = line.interceptStdErr;
  const seB = line.slopeStdErr;
  let params: TrendParamsByKind[CompactionTrendKind];
  let paramStdErr: Record<string, number>;
  const warnings: Warning[] = [];
  if (kind === "sonicLogLinear") {
    const p = { dtMudlineUsPerFt: 10 ** a, log10SlopePerFt: b };
    checkSonicLogLinearParams(p, `${paramPrefix}fitted`);
    params = p;
    paramStdErr = { dtMudlineUsPerFt: Math.LN10 * p.dtMudlineUsPerFt * seA, log10SlopePerFt: seB };
    if (b > 0) warnings.push({ code: "W_TREND_NOT_COMPACTING", message: "fitted slowness increases with depth; check the intervals are normally compacted shale" });
  } else if (kind === "resistivityLogLinear") {
    const p = { r0OhmM: Math.exp(a), growthPerFt: b };
    checkResistivityLogLinearParams(p, `${paramPrefix}fitted`);
    params = p;
    paramStdErr = { r0OhmM: p.r0OhmM * seA, growthPerFt: seB };
    if (b < 0) warnings.push({ code: "W_TREND_NOT_COMPACTING", message: "fitted resistivity decreases with depth; check the intervals are normally compacted shale" });
  } else {
    const p = { dtMatrixUsPerFt: dtm!, dtMudlineUsPerFt: dtm! + Math.exp(a), decayPerFt: -b };
    checkSonicExponentialParams(p, `${paramPrefix}fitted`);
    params = p;
    paramStdErr = { dtMatrixUsPerFt: 0, dtMudlineUsPerFt: Math.exp(a) * seA, decayPerFt: seB };
  }
  if (nExcluded > 0) {
    warnings.push({ code: "W_TREND_POINTS_BELOW_MATRIX", message: "points at or below the matrix slowness were left out of the fit", count: nExcluded });
  }
  let zTop = Infinity;
  let zBase = -Infinity;
  for (const z of xs) {
    zTop = Math.min(zTop, z);
    zBase = Math.max(zBase, z);
  }
  return {
    params: params as TrendParamsByKind[K],
    diagnostics: {
      kind,
      method,
      params: params as TrendParamsByKind[K],
      linearModel: LINEAR_MODEL[kind],
      n: xs.length,
      nMissing,
      nNotShale,
      nExcluded,
      nDownweighted: line.nDownweighted ?? 0,
      rSquared: line.rSquared,
      residualStd: line.residualStd,
      paramStdErr,
      covariance: line.covariance,
      depthRange: { topBmlFt: zTop, baseBmlFt: zBase },
      warnings,
    },
  };
}

/** One segment to fit: where it starts and which intervals it is fitted on. */
export interface TrendSegmentRequest {
  /** Top of the segment, ft below mudline; segments must be given shallow to deep. */
  topBmlFt: number;
  intervals: BmlInterval[];
  /** sonicExponential only: matrix slowness for this segment, µs/ft. */
  dtMatrixUsPerFt?: number;
}

/**
 * Fit a piecewise normal compaction trend (e.g. above and below an unconformity).
 *
 * Each segment is fitted independently by {@link fitCompactionTrend} on its own intervals;
 * segment k applies from its top down to the top of segment k+1 (the first also above its
 * top, the last to any depth).
 *
 * @param kind trend model, one for all segments
 * @param segments segment tops (strictly increasing) with their fit intervals
 * @returns the trend (plain data, ready for serializeTrendFile) and one diagnostics per segment
 * @throws ShalepointError E_TREND_SEGMENTS when no segment is given or tops are not increasing;
 *   any error of {@link fitCompactionTrend}, with `segments[k].` in front of `param`
 * @example
 * fitCompactionTrendSegments({ kind: "sonicLogLinear", bmlFt, values: dt, shaleFlag, segments: [{ topBmlFt: 0, intervals: [{ topBmlFt: 500, baseBmlFt: 4000 }] }, { topBmlFt: 4500, intervals: [{ topBmlFt: 4600, baseBmlFt: 7000 }] }] })
 * Reference: see {@link fitCompactionTrend}.
 */
export function fitCompactionTrendSegments({
  kind,
  bmlFt,
  values,
  shaleFlag,
  method,
  segments,
}: {
  kind: CompactionTrendKind;
  bmlFt: ArrayLike<number>;
  values: ArrayLike<number>;
  shaleFlag?: Uint8Array;
  method?: TrendFitMethod;
  segments: readonly TrendSegmentRequest[];
}): { trend: CompactionTrend; diagnostics: CompactionTrendDiagnostics[] } {
  if (segments.length === 0) {
    throw new ShalepointError("E_TREND_SEGMENTS", "no trend segment requested", { param: "segments", hint: "Give at least one segment." });
  }
  for (let k = 1; k < segments.length; k++) {
    if (!(segments[k].topBmlFt > segments[k - 1].topBmlFt)) {
      throw new ShalepointError("E_TREND_SEGMENTS", "segment tops must increase with depth", {
        param: `segments[${k}].topBmlFt`, value: segments[k].topBmlFt, unit: "ft below mudline",
        allowed: `> ${segments[k - 1].topBmlFt}`,
      });
    }
  }
  const out: TrendSegment[] = [];
  const diagnostics: CompactionTrendDiagnostics[] = [];
  segments.forEach((seg, k) => {
    const fit = fitCompactionTrend(
      { kind, bmlFt, values, shaleFlag, intervals: seg.intervals, method, dtMatrixUsPerFt: seg.dtMatrixUsPerFt },
      `segments[${k}].`,
    );
    const d = fit.diagnostics;
    out.push({
      topBmlFt: seg.topBmlFt,
      params: fit.params,
      fittedOn: {
        method: d.method,
        intervals: seg.intervals.map((iv) => ({ topBmlFt: iv.topBmlFt, baseBmlFt: iv.baseBmlFt })),
        n: d.n,
        rSquared: Number.isFinite(d.rSquared) ? d.rSquared : null,
        residualStd: Number.isFinite(d.residualStd) ? d.residualStd : null,
        depthRange: d.depthRange,
      },
    });
    diagnostics.push(d);
  });
  return { trend: { kind, segments: out } as CompactionTrend, diagnostics };
}
