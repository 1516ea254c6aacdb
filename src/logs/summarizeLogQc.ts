/**
 * Log quality-control summary as plain data: nulls, ranges, gaps and spikes per curve.
 */
import { ShalepointError } from "../errors.js";
import { despikeLog } from "./despikeLog.js";
import type { SampleWindow } from "./sampleWindow.js";

/** QC figures of one curve. */
export interface CurveQcSummary {
  name: string;
  /** Samples in the curve. */
  sampleCount: number;
  /** NaN samples. */
  nullCount: number;
  /** nullCount / sampleCount (NaN for an empty curve). */
  nullFraction: number;
  /** Smallest and largest finite value, curve unit (NaN if none). */
  min: number;
  max: number;
  /** Mean of finite values, curve unit (NaN if none). */
  mean: number;
  /** Depth of the first and last finite value, ft (NaN if none). */
  firstValidDepthFt: number;
  lastValidDepthFt: number;
  /** Longest run of NaN between finite values (leading/trailing nulls excluded), samples. */
  longestGapSamples: number;
  /** Depths of the last finite sample above and first finite sample below that gap, ft. */
  longestGapFromFt: number;
  longestGapToFt: number;
  /** Spikes found by {@link despikeLog} with the summary's settings. */
  spikeCount: number;
}

/** Whole-log QC summary. */
export interface LogQcSummary {
  sampleCount: number;
  /** Depth range of the index, ft (first and last finite depth). */
  topDepthFt: number;
  baseDepthFt: number;
  curves: CurveQcSummary[];
}

/**
 * Summarise log quality: per curve null count and fraction, range, mean, first/last valid
 * depth, longest interior gap and number of spikes (Hampel identifier, {@link despikeLog}).
 * Summary statistics: common practice, no source. No value is changed.
 *
 * @param depthFt depth index, ft (MD or TVD; reported as given); typical 0.5-ft steps.
 * @param curves curves aligned with depthFt, any unit, NaN = missing.
 * @param spikeWindow window for spike counting; default { samples: 11 }.
 * @param spikeThreshold threshold k for spike counting; default 3.
 * @returns {@link LogQcSummary}.
 * @throws ShalepointError E_LENGTH when a curve's length differs from depthFt.
 * @example summarizeLogQc({ depthFt: new Float64Array([100, 100.5, 101]), curves: { GR: new Float64Array([60, NaN, 80]) } }).curves[0]
 * // { name: "GR", nullCount: 1, min: 60, max: 80, mean: 70, longestGapSamples: 1, … }
 */
export function summarizeLogQc(args: {
  depthFt: ArrayLike<number>;
  curves: Readonly<Record<string, ArrayLike<number>>>;
  spikeWindow?: SampleWindow;
  spikeThreshold?: number;
}): LogQcSummary {
  const { depthFt, curves } = args;
  const n = depthFt.length;
  let top = NaN, base = NaN;
  for (let i = 0; i < n; i++) if (!Number.isNaN(depthFt[i])) { if (Number.isNaN(top)) top = depthFt[i]; base = depthFt[i]; }
  const out: CurveQcSummary[] = [];
  for (const [name, c] of Object.entries(curves)) {
    if (c.length !== n) {
      throw new ShalepointError("E_LENGTH", `curve ${name} and depthFt must have the same length`, { param: `curves.${name}`, value: `${c.length} vs ${n}` });
    }
    let nulls = 0, min = Infinity, max = -Infinity, sum = 0, valid = 0;
    let first = -1, last = -1, bestGap = 0, bestFrom = -1, bestTo = -1;
    for (let i = 0; i < n; i++) {
      const v = c[i];
      if (Number.isNaN(v)) { nulls++; continue; }
      if (first < 0) first = i;
      else if (i - last - 1 > bestGap) { bestGap = i - last - 1; bestFrom = last; bestTo = i; }
      last = i;
      valid++; sum += v;
      if (v < min) min = v;
      if (v > max) max = v;
    }
    const spikes = despikeLog({ values: c, window: args.spikeWindow, threshold: args.spikeThreshold }).spikeCount;
    out.push({
      name,
      sampleCount: n,
      nullCount: nulls,
      nullFraction: n > 0 ? nulls / n : NaN,
      min: valid > 0 ? min : NaN,
      max: valid > 0 ? max : NaN,
      mean: valid > 0 ? sum / valid : NaN,
      firstValidDepthFt: first >= 0 ? depthFt[first] : NaN,
      lastValidDepthFt: last >= 0 ? depthFt[last] : NaN,
      longestGapSamples: bestGap,
      longestGapFromFt: bestFrom >= 0 ? depthFt[bestFrom] : NaN,
      longestGapToFt: bestTo >= 0 ? depthFt[bestTo] : NaN,
      spikeCount: spikes,
    });
  }
  return { sampleCount: n, topDepthFt: top, baseDepthFt: base, curves: out };
}
