/**
 * Exact multiple change-point search by Pruned Exact Linear Time (PELT).
 *
 * Pure: typed arrays in, a plain result object out. No imports beyond `errors`.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { medianInPlace } from "../trend/medianInPlace.js";

/**
 * Segment cost used by {@link findChangePointsPelt}.
 * - `"mean"`: normal mean-change cost, the residual sum of squares about the segment mean,
 *   Σ (y − ȳ)² (Killick, Fearnhead & Eckley 2012, JASA, §2 — twice the negative normal
 *   log-likelihood with known variance, up to a constant).
 * - `"linear"`: piecewise-linear cost, the residual sum of squares of an ordinary
 *   least-squares line y = a + b·x fitted inside the segment (a change in gradient or in
 *   intercept starts a new segment).
 */
export type ChangePointCost = "mean" | "linear";

/** Arguments of {@link findChangePointsPelt}. */
export interface PeltChangePointsInput {
  /** Series to segment, any unit (e.g. excess pressure, psi). NaN = missing, skipped. */
  values: ArrayLike<number>;
  /**
   * Abscissa of each value (e.g. TVD, ft), used by the `"linear"` cost only; must be
   * non-decreasing over the used samples. Default: the sample index 0, 1, 2, …
   */
  positions?: ArrayLike<number>;
  /** Segment cost, default `"mean"`. */
  cost?: ChangePointCost;
  /**
   * Penalty per added change point, in (unit of values)², > 0. Default: from the data's
   * noise, β = k·σ̂²·ln n with σ̂ = 1.4826·MAD(first differences)/√2 and k the number of
   * parameters a change adds (2 for `"mean"`: location and level; 3 for `"linear"`:
   * location, intercept, slope). This is a BIC-type penalty (Schwarz 1978, Annals of
   * Statistics 6(2):461–464) with the noise variance estimated robustly.
   */
  penalty?: number;
  /**
   * Minimum number of used samples per segment, integer ≥ 1 (`"mean"`) or ≥ 3
   * (`"linear"`). Default 2 for `"mean"`, 3 for `"linear"`. Typical: a thickness in ft
   * divided by the sample step.
   */
  minSegmentSamples?: number;
  /**
   * Spacing of admissible change positions, in used samples, integer ≥ 1. Default 1: every
   * sample, and the result is the exact optimum. With k > 1 the search is exact over change
   * positions at every k-th sample (segment costs still use every sample), then each change
   * is refined to the single sample within ±(k − 1) samples: a speed-up for long profiles
   * with few changes (PELT's pruning does little inside long homogeneous stretches, where
   * its cost tends to O(n²)); the result is then no longer guaranteed optimal.
   */
  candidateStep?: number;
}

/** One segment found by {@link findChangePointsPelt}; indices refer to the input arrays. */
export interface PeltSegment {
  /** Index of the first used sample of the segment. */
  firstIndex: number;
  /** Index of the last used sample of the segment (inclusive). */
  lastIndex: number;
  /** Number of used (non-NaN) samples in the segment. */
  nUsed: number;
  /** Segment cost (residual sum of squares), (unit of values)². */
  cost: number;
}

/** Result of {@link findChangePointsPelt}. */
export interface PeltChangePointsResult {
  /** Segments, top to bottom, covering every used sample once. */
  segments: PeltSegment[];
  /** Input index of the first sample of each segment after the first (a change lies just before it). */
  changePointIndices: number[];
  /** Σ segment costs + penalty × number of change points: the minimised objective. */
  totalCost: number;
  /** Penalty used, (unit of values)². */
  penalty: number;
  /** Where the penalty came from. */
  penaltySource: "given" | "noise";
  /** Robust noise estimate σ̂ (unit of values); NaN when the penalty was given. */
  noiseSigma: number;
  /** Cost used. */
  cost: ChangePointCost;
  /** Minimum segment length used, samples. */
  minSegmentSamples: number;
  /** Spacing of admissible change positions used, samples (1 = exact). */
  candidateStep: number;
  /** Number of samples used (finite value and, for `"linear"`, finite position). */
  nUsed: number;
  /** Number of samples skipped as missing. */
  nSkipped: number;
  /**
   * Number of segment-cost evaluations performed: the run's cost. Without pruning this
   * would be about n²/2; PELT keeps it near c·n when changes keep arriving as n grows.
   */
  costEvaluations: number;
  /** Non-fatal conditions (e.g. noise estimate zero, skipped samples). */
  warnings: Warning[];
}

/**
 * Robust noise standard deviation from first differences:
 * σ̂ = 1.4826 · median(|d − median(d)|) / √2, d_i = y_{i+1} − y_i.
 * The 1.4826 factor makes the MAD consistent for a normal distribution (Hampel 1974,
 * JASA 69(346):383–393); dividing by √2 undoes the doubling of variance by differencing.
 * Level shifts and a smooth trend barely move the median of differences, so σ̂ reflects
 * the noise, not the signal.
 */
function differenceNoiseSigma(y: Float64Array): number {
  const n = y.length;
  if (n < 3) return 0;
  const d = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) d[i] = y[i + 1] - y[i];
  const med = medianInPlace(d.slice());
  for (let i = 0; i < d.length; i++) d[i] = Math.abs(d[i] - med);
  return (1.4826 * medianInPlace(d)) / Math.SQRT2;
}


/**
 * Pruned Exact Linear Time change-point search (PELT).
 *
 * Finds the segmentation 0 = τ0 < τ1 < … < τm < τm+1 = n of the used samples that
 * minimises Σ_{i=0..m} C(y[τi .. τi+1)) + β·m exactly (optimal partitioning,
 * F(t) = min_τ [F(τ) + C(y[τ..t)) + β], F(0) = −β), with every segment at least
 * `minSegmentSamples` long. A candidate τ is dropped for good once
 * F(τ) + C(y[τ..s)) > F(s) for an admissible s (Killick, Fearnhead & Eckley 2012, JASA
 * 107(500):1590–1598, Theorem 3.1 with K = 0, valid for residual-sum-of-squares costs;
 * doi:10.1080/01621459.2012.737745). With a minimum segment length the test uses
 * s = t − minSegmentSamples, so the pruning never removes a candidate a later optimum needs.
 *
 * Segment costs come from prefix sums (of y, y² and, for the linear cost, x, x², xy) over
 * centred data, so each cost is O(1) and nothing is allocated per candidate. Cost: O(n)
 * memory; time O(n) in the favourable case of the paper (changes spread through the series)
 * and O(n²) at worst; `costEvaluations` reports the work done. Precision: costs are
 * differences of prefix sums, accurate to about 1e-16 × (Σ y² over the series); costs
 * below that are clamped at zero.
 *
 * Missing data: samples with NaN value (or NaN position for `"linear"`) are skipped and
 * counted in `nSkipped`; segments are reported in input indices.
 *
 * @param input see {@link PeltChangePointsInput}
 * @returns segments, change-point indices, the minimised cost and the penalty used
 * @throws ShalepointError E_TOO_SHORT when fewer used samples than `minSegmentSamples`;
 *   E_RANGE when the penalty is ≤ 0 or not finite, or `minSegmentSamples` is not an
 *   integer ≥ 1 (≥ 3 for `"linear"`); E_LENGTH when positions and values differ in length;
 *   E_ORDER when positions decrease.
 * @example
 * // CHECK-VALUES §11 (published example set): penalty 10
 * findChangePointsPelt({ values: [0.1,-0.2,0,0.3,-0.1,5.2,4.9,5.1,4.8,5,1,1.2,0.9,1.1,0.8], penalty: 10 })
 * // → changePointIndices [5, 10], totalCost 20.348
 */
export function findChangePointsPelt(input: PeltChangePointsInput): PeltChangePointsResult {
  const cost: ChangePointCost = input.cost ?? "mean";
  if (cost !== "mean" && cost !== "linear") {
    throw new ShalepointError("E_RANGE", "unknown change-point cost", { param: "cost", value: cost, allowed: "mean, linear" });
  }
  const linear = cost === "linear";
  const values = input.values;
  const n0 = values.length;
  if (input.positions !== undefined && input.positions.length !== n0) {
    throw new ShalepointError("E_LENGTH", "positions and values must have the same length", {
      param: "positions, values",
      value: `${input.positions.length} vs ${n0}`,
      hint: "Put both on the same depth index first.",
    });
  }
  const minSeg = input.minSegmentSamples ?? (linear ? 3 : 2);
  const minAllowed = linear ? 3 : 1;
  if (!Number.isInteger(minSeg) || minSeg < minAllowed) {
    throw new ShalepointError("E_RANGE", "minSegmentSamples is out of range", {
      param: "minSegmentSamples",
      value: minSeg,
      allowed: `integer ≥ ${minAllowed}`,
      hint: linear ? "A line needs at least 3 samples to have a residual." : undefined,
    });
  }
  const step = input.candidateStep ?? 1;
  if (!Number.isInteger(step) || step < 1) {
    throw new ShalepointError("E_RANGE", "candidateStep must be an integer ≥ 1", { param: "candidateStep", value: step, allowed: "integer ≥ 1" });
  }
  if (input.penalty !== undefined && !(Number.isFinite(input.penalty) && input.penalty > 0)) {
    throw new ShalepointError("E_RANGE", "penalty must be a finite number > 0", {
      param: "penalty",
      value: input.penalty,
      allowed: "> 0",
      hint: "Leave it out to use the noise-based default, or pass e.g. 2·σ²·ln(n).",
    });
  }

  // Compact the used samples.
  const idx = new Int32Array(n0);
  let n = 0;
  for (let i = 0; i < n0; i++) {
    const v = values[i];
    const x = input.positions === undefined ? i : input.positions[i];
    if (Number.isFinite(v) && (!linear || Number.isFinite(x))) idx[n++] = i;
  }
  const warnings: Warning[] = [];
  const nSkipped = n0 - n;
  if (nSkipped > 0) {
    warnings.push({ code: "W_SAMPLES_SKIPPED", message: `${nSkipped} missing sample(s) skipped`, count: nSkipped });
  }
  if (n < minSeg) {
    throw new ShalepointError("E_TOO_SHORT", "too few usable samples for one segment", {
      param: "values",
      value: n,
      allowed: `≥ ${minSeg} usable samples (minSegmentSamples)`,
      hint: "Supply a longer profile or a smaller minimum segment thickness.",
    });
  }
  const y = new Float64Array(n);
  const x = new Float64Array(n);
  let meanY = 0;
  let meanX = 0;
  for (let k = 0; k < n; k++) {
    const i = idx[k];
    y[k] = values[i];
    x[k] = input.positions === undefined ? i : input.positions[i];
    meanY += y[k];
    meanX += x[k];
    if (k > 0 && x[k] < x[k - 1]) {
      throw new ShalepointError("E_ORDER", "positions must be non-decreasing", {
        param: "positions",
        value: x[k],
        row: i,
        hint: "Sort the profile by depth first.",
      });
    }
  }
  meanY /= n;
  meanX /= n;

  // Penalty.
  let penalty: number;
  let noiseSigma = NaN;
  let penaltySource: "given" | "noise";
  if (input.penalty !== undefined) {
    penalty = input.penalty;
    penaltySource = "given";
  } else {
    noiseSigma = differenceNoiseSigma(y);
    penaltySource = "noise";
    if (!(noiseSigma > 0)) {
      let lo = Infinity;
      let hi = -Infinity;
      for (let k = 0; k < n; k++) {
        if (y[k] < lo) lo = y[k];
        if (y[k] > hi) hi = y[k];
      }
      noiseSigma = 1e-6 * Math.max(hi - lo, 1e-12);
      warnings.push({
        code: "W_NOISE_ZERO",
        message: "noise estimate is zero (noise-free data?); σ̂ floored at 1e-6 × data range — pass a penalty to control the result",
      });
    }
    penalty = (linear ? 3 : 2) * noiseSigma * noiseSigma * Math.log(Math.max(n, 2));
  }

  // Prefix sums over centred data (x also scaled to unit spread for conditioning).
  let spreadX = 0;
  for (let k = 0; k < n; k++) spreadX = Math.max(spreadX, Math.abs(x[k] - meanX));
  const scaleX = spreadX > 0 ? 1 / spreadX : 1;
  const S1 = new Float64Array(n + 1);
  const S2 = new Float64Array(n + 1);
  const SX = linear ? new Float64Array(n + 1) : S1;
  const SXX = linear ? new Float64Array(n + 1) : S1;
  const SXY = linear ? new Float64Array(n + 1) : S1;
  for (let k = 0; k < n; k++) {
    const yc = y[k] - meanY;
    S1[k + 1] = S1[k] + yc;
    S2[k + 1] = S2[k] + yc * yc;
    if (linear) {
      const xc = (x[k] - meanX) * scaleX;
      SX[k + 1] = SX[k] + xc;
      SXX[k + 1] = SXX[k] + xc * xc;
      SXY[k + 1] = SXY[k] + xc * yc;
    }
  }
  const segCost = (a: number, b: number): number => {
    const m = b - a;
    const sy = S1[b] - S1[a];
    const syy = S2[b] - S2[a] - (sy * sy) / m;
    if (!linear) return syy > 0 ? syy : 0;
    if (m <= 2) return 0;
    const sx = SX[b] - SX[a];
    const sxx = SXX[b] - SXX[a] - (sx * sx) / m;
    const sxy = SXY[b] - SXY[a] - (sx * sy) / m;
    const rss = sxx > 1e-300 ? syy - (sxy * sxy) / sxx : syy;
    return rss > 0 ? rss : 0;
  };

  // PELT recursion over the grid of admissible change positions g_j = j·step (step = 1:
  // every sample, exact). The last grid point is n itself.
  const b = step;
  const J = Math.ceil(n / b);
  const gpos = (j: number): number => (j >= J ? n : j * b);
  const mJ = Math.ceil(minSeg / b);
  const F = new Float64Array(J + 1).fill(Infinity);
  const last = new Int32Array(J + 1);
  F[0] = -penalty;
  const cand = new Int32Array(J + 1);
  let nCand = 0;
  let evals = 0;
  let nextToAdd = 0; // grid index of the next candidate to enter the set
  for (let j = Math.min(mJ, J); j <= J; j++) {
    const t = gpos(j);
    // Admit every grid candidate i whose segment (g_i, t] is long enough.
    while (nextToAdd < j && t - gpos(nextToAdd) >= minSeg) {
      if (Number.isFinite(F[nextToAdd])) cand[nCand++] = nextToAdd;
      nextToAdd++;
    }
    let best = Infinity;
    let arg = 0;
    for (let c = 0; c < nCand; c++) {
      const i = cand[c];
      const v = F[i] + segCost(gpos(i), t) + penalty;
      if (v < best) {
        best = v;
        arg = i;
      }
    }
    evals += nCand;
    F[j] = best;
    last[j] = arg;
    // Prune against s = j − mJ, admissible for every later end point (including n).
    const sIdx = j - mJ;
    if (j < J && sIdx >= 1 && Number.isFinite(F[sIdx])) {
      const Fs = F[sIdx];
      const sPos = gpos(sIdx);
      let kept = 0;
      for (let c = 0; c < nCand; c++) {
        const i = cand[c];
        if (i < sIdx && F[i] + segCost(gpos(i), sPos) > Fs) continue;
        cand[kept++] = i;
      }
      evals += nCand;
      nCand = kept;
    }
  }
  if (!Number.isFinite(F[J])) {
    // Only possible when n < minSeg, rejected above; kept as a guard.
    throw new ShalepointError("E_TOO_SHORT", "no admissible segmentation", { param: "values", value: n });
  }

  // Back-track.
  const cps: number[] = [];
  for (let j = last[J]; j > 0; j = last[j]) cps.unshift(gpos(j));
  // Local refinement to the sample when the grid is coarser than the samples: each change
  // moves within ±(step − 1) samples to minimise the cost of its two segments, others fixed.
  if (b > 1) {
    for (let pass = 0; pass < 2; pass++) {
      for (let k = 0; k < cps.length; k++) {
        const lo = k === 0 ? 0 : cps[k - 1];
        const hi = k === cps.length - 1 ? n : cps[k + 1];
        let bestC = cps[k];
        let bestV = segCost(lo, bestC) + segCost(bestC, hi);
        const from = Math.max(lo + minSeg, cps[k] - b + 1);
        const to = Math.min(hi - minSeg, cps[k] + b - 1);
        for (let c = from; c <= to; c++) {
          const v = segCost(lo, c) + segCost(c, hi);
          if (v < bestV) {
            bestV = v;
            bestC = c;
          }
        }
        evals += Math.max(0, to - from + 1);
        cps[k] = bestC;
      }
    }
  }
  const ends = [...cps, n];
  const segments: PeltSegment[] = [];
  let start = 0;
  let total = 0;
  for (const e of ends) {
    const c = segCost(start, e);
    total += c;
    segments.push({ firstIndex: idx[start], lastIndex: idx[e - 1], nUsed: e - start, cost: c });
    start = e;
  }
  total += penalty * (segments.length - 1);
  return {
    segments,
    changePointIndices: segments.slice(1).map((s) => s.firstIndex),
    totalCost: total,
    penalty,
    penaltySource,
    noiseSigma,
    cost,
    minSegmentSamples: minSeg,
    candidateStep: step,
    nUsed: n,
    nSkipped,
    costEvaluations: evals,
    warnings,
  };
}
