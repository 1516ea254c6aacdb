/**
 * Normal compaction trend of the corrected d-exponent: a straight line of ln(dc) on depth
 * below the mudline, fitted on normally pressured shale.
 *
 * Imports ../errors.js and ../trend/fitStraightLine.ts (the project's one least-squares line,
 * centred sums), so a copy of this file needs those two as well.
 */
import { ShalepointError } from "../errors.js";
import { fitStraightLine, type StraightLineFit } from "../trend/fitStraightLine.js";

/** A dc normal trend: dcn(Z) = dc0 · e^(b·Z), Z depth below mudline (ft). */
export interface DcNormalTrend {
  /** dc on the trend at the mudline (dimensionless, typical 0.5–1.2). */
  dcAtMudline: number;
  /** Growth rate b, 1/ft (typical 2e-5 to 1e-4). */
  ratePerFt: number;
}

/** Result of {@link fitDcNormalTrend}. */
export interface DcNormalTrendFit {
  trend: DcNormalTrend;
  /** Number of samples used (finite dc > 0 inside an interval). */
  n: number;
  /** Standard deviation of ln(dc) about the line (n − 2 degrees of freedom). */
  residualStdLn: number;
  /** Depth-below-mudline range of the samples used, ft. */
  bmlRangeFt: { topFt: number; baseFt: number };
}

/** Fewest samples a dc trend is fitted on (a line needs 2; 3 leave a residual). */
export const MIN_DC_TREND_SAMPLES = 3;

/**
 * Fit the normal trend of the corrected d-exponent: least squares of ln(dc) on depth below
 * mudline (centred sums, by fitStraightLine), over the given normally pressured intervals.
 *
 * ln(dcn) = ln(dc0) + b·Z. In normally pressured shale dc grows with depth as the shale
 * compacts; the trend is a straight line on semilog paper (Rehm & McClendon 1971, SPE-3601;
 * the same log-linear shape as the resistivity trend Rn = R0·e^(bZ) of Zhang 2011,
 * Earth-Science Reviews 108:50–63, from memory).
 *
 * @param input.bmlFt depth below mudline of each sample, ft
 * @param input.dc corrected d-exponent (smoothed shale values; NaN skipped), dimensionless
 * @param input.intervals depth-below-mudline intervals judged normally pressured, ft (top ≤ base)
 * @returns {@link DcNormalTrendFit}
 * @throws ShalepointError E_LENGTH (misaligned), E_RANGE (bad interval), E_TOO_FEW_POINTS
 *   (fewer than {@link MIN_DC_TREND_SAMPLES} usable samples)
 * @example fitDcNormalTrend({ bmlFt: [0, 1000, 2000], dc: [0.8, 0.8 * Math.exp(0.05), 0.8 * Math.exp(0.1)], intervals: [{ topBmlFt: 0, baseBmlFt: 2000 }] }).trend
 * // { dcAtMudline: 0.8, ratePerFt: 5e-5 }
 */
export function fitDcNormalTrend(input: {
  bmlFt: ArrayLike<number>;
  dc: ArrayLike<number>;
  intervals: readonly { topBmlFt: number; baseBmlFt: number }[];
}): DcNormalTrendFit {
  const { bmlFt, dc, intervals } = input;
  if (bmlFt.length !== dc.length) {
    throw new ShalepointError("E_LENGTH", "bmlFt and dc must have the same length", { param: "dc", value: `${dc.length} vs ${bmlFt.length}` });
  }
  intervals.forEach((iv, r) => {
    if (!(iv.topBmlFt <= iv.baseBmlFt)) {
      throw new ShalepointError("E_RANGE", "interval top must be at or above its base", { param: `intervals[${r}]`, value: `${iv.topBmlFt}–${iv.baseBmlFt}`, unit: "ft" });
    }
  });
  const inside = (z: number): boolean => intervals.some((iv) => z >= iv.topBmlFt && z <= iv.baseBmlFt);
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < dc.length; i++) {
    const z = bmlFt[i];
    const v = dc[i];
    if (Number.isFinite(z) && Number.isFinite(v) && v > 0 && inside(z)) {
      xs.push(z);
      ys.push(Math.log(v));
    }
  }
  const n = xs.length;
  if (n < MIN_DC_TREND_SAMPLES) {
    throw new ShalepointError("E_TOO_FEW_POINTS", `a dc trend needs at least ${MIN_DC_TREND_SAMPLES} samples in its intervals, got ${n}`, {
      param: "intervals",
      value: n,
      allowed: `≥ ${MIN_DC_TREND_SAMPLES}`,
      hint: "Widen the normally pressured intervals or add shale samples.",
    });
  }
  let line: StraightLineFit;
  try {
    line = fitStraightLine({ x: xs, y: ys });
  } catch (e) {
    if (e instanceof ShalepointError && e.code === "E_TREND_DEGENERATE") {
      throw new ShalepointError("E_TOO_FEW_POINTS", "a dc trend needs samples at two or more depths", { param: "intervals", value: n });
    }
    throw e;
  }
  return {
    trend: { dcAtMudline: Math.exp(line.intercept), ratePerFt: line.slope },
    n,
    residualStdLn: line.residualStd,
    bmlRangeFt: { topFt: Math.min(...xs), baseFt: Math.max(...xs) },
  };
}

/**
 * Evaluate a dc normal trend: dcn = dc0 · e^(b·Z); NaN above the mudline (Z < 0) or for NaN Z.
 *
 * @param input.trend {@link DcNormalTrend}
 * @param input.bmlFt depth below mudline, ft
 * @returns dcn per sample, dimensionless
 * @throws ShalepointError E_RANGE when dc0 ≤ 0 or a parameter is not finite
 * @example evaluateDcNormalTrend({ trend: { dcAtMudline: 0.8, ratePerFt: 1e-4 }, bmlFt: [10000] })[0] // 2.175
 */
export function evaluateDcNormalTrend(input: { trend: DcNormalTrend; bmlFt: ArrayLike<number> }): Float64Array {
  const { dcAtMudline, ratePerFt } = input.trend;
  if (!(dcAtMudline > 0 && Number.isFinite(dcAtMudline) && Number.isFinite(ratePerFt))) {
    throw new ShalepointError("E_RANGE", "dc trend needs dcAtMudline > 0 and a finite rate", { param: "trend", value: `${dcAtMudline}, ${ratePerFt}` });
  }
  const out = new Float64Array(input.bmlFt.length);
  for (let i = 0; i < out.length; i++) {
    const z = input.bmlFt[i];
    out[i] = z >= 0 ? dcAtMudline * Math.exp(ratePerFt * z) : NaN;
  }
  return out;
}
