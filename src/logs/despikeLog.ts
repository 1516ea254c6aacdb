/**
 * Spike removal for well logs with a rolling-median / MAD rule (Hampel identifier).
 */
import { ShalepointError } from "../errors.js";
import { windowSampleCount, type SampleWindow } from "./sampleWindow.js";

/** Consistency constant: 1.4826·MAD estimates σ for normally distributed noise (1/Φ⁻¹(3/4)). */
export const MAD_TO_SIGMA = 1.482602218505602;

/** Result of {@link despikeLog}. */
export interface DespikeResult {
  /** Cleaned log (new array): spikes replaced, everything else unchanged. */
  values: Float64Array;
  /** 1 where a spike was found, else 0; aligned with the input. */
  isSpike: Uint8Array;
  /** Sample indices of the spikes, increasing. */
  spikeIndex: Int32Array;
  /** Number of spikes found (= spikeIndex.length). */
  spikeCount: number;
}

/**
 * Despike a log with the Hampel identifier: rolling median and median absolute deviation.
 *
 * For each sample i, over the centred window of w samples (finite values only):
 *   m_i = median(x), MAD_i = median(|x − m_i|), spike if |x_i − m_i| > max(k·1.4826·MAD_i, minDeviation).
 * A spike is replaced by m_i (or by NaN). Hampel 1974, *Journal of the American Statistical
 * Association* 69(346):383–393, doi:10.1080/01621459.1974.10482962 (the identifier is the
 * outlier rule built on the median and MAD; from memory); the 1.4826 factor makes MAD a
 * consistent estimate of σ for Gaussian noise (Rousseeuw & Croux 1993, *JASA* 88(424):1273,
 * from memory).
 *
 * NaN policy: NaN samples stay NaN and are never spikes; NaN neighbours are skipped. A smooth
 * monotonic log is never changed (its window median is the centre sample). Where MAD is 0
 * (flat log) any departure larger than `minDeviation` counts as a spike.
 *
 * @param values log values, any unit, NaN = missing; typical GR (API) or DT (us/ft).
 * @param window {@link SampleWindow}; default { samples: 11 }; typical 7–21 samples.
 * @param threshold k in MAD-σ units, > 0; default 3 (a common choice, no source); typical 2.5–5.
 * @param minDeviation smallest departure from the median that can be a spike, same unit as
 *   values, ≥ 0; default 0; e.g. 5 us/ft for DT.
 * @param replaceWith "median" (default) or "nan".
 * @returns {@link DespikeResult}.
 * @throws ShalepointError E_RANGE for a bad window, threshold or minDeviation.
 * @example despikeLog({ values: new Float64Array([100, 101, 102, 180, 104, 105, 106]), window: { samples: 5 } })
 * // values [100, 101, 102, 104, 104, 105, 106], spikeIndex [3]
 */
export function despikeLog(args: {
  values: ArrayLike<number>;
  window?: SampleWindow;
  threshold?: number;
  minDeviation?: number;
  replaceWith?: "median" | "nan";
}): DespikeResult {
  const { values } = args;
  const w = windowSampleCount(args.window ?? { samples: 11 });
  const k = args.threshold ?? 3;
  const minDev = args.minDeviation ?? 0;
  if (!(k > 0 && Number.isFinite(k))) {
    throw new ShalepointError("E_RANGE", "despike threshold must be > 0", { param: "threshold", value: k, allowed: "> 0, typical 3" });
  }
  if (!(minDev >= 0)) {
    throw new ShalepointError("E_RANGE", "minDeviation must be ≥ 0", { param: "minDeviation", value: minDev, allowed: "≥ 0" });
  }
  const useNan = args.replaceWith === "nan";
  const h = (w - 1) / 2;
  const n = values.length;
  const out = new Float64Array(n);
  const isSpike = new Uint8Array(n);
  const idx: number[] = [];
  // Sorted finite values of the current window, kept up to date as the window slides
  // (one removal and one insertion per sample instead of re-sorting the whole window).
  const win = new Float64Array(w);
  const dev = new Float64Array(w);
  const c = k * MAD_TO_SIGMA;
  let m = 0;
  let winLo = 0;
  let winHi = -1;
  for (let i = 0; i < n; i++) {
    const x = values[i];
    out[i] = x;
    const lo = i - h > 0 ? i - h : 0;
    const hi = i + h < n - 1 ? i + h : n - 1;
    if (winLo + 1 === lo && winHi + 1 === hi) {
      // Steady slide by one sample: when the leaving and the entering values are both
      // finite, replace one with the other in a single pass over the sorted window (only
      // the values between the two positions move; the window holds the same values as
      // after a removal and an insertion).
      const vOut = values[winLo];
      const vIn = values[hi];
      if (vOut === vOut && vIn === vIn) {
        let q = 0;
        while (win[q] !== vOut) q++;
        if (vIn >= vOut) {
          // `<=`: like the insertion below, the entering value goes after equal values.
          while (q + 1 < m && win[q + 1] <= vIn) { win[q] = win[q + 1]; q++; }
        } else {
          while (q > 0 && win[q - 1] > vIn) { win[q] = win[q - 1]; q--; }
        }
        win[q] = vIn;
        winLo = lo;
        winHi = hi;
      }
    }
    while (winLo < lo) {
      const v = values[winLo++];
      if (v === v) {
        let q = 0;
        while (win[q] !== v) q++;
        m--;
        for (; q < m; q++) win[q] = win[q + 1];
      }
    }
    while (winHi < hi) {
      const v = values[++winHi];
      if (v === v) {
        let q = m++;
        while (q > 0 && win[q - 1] > v) { win[q] = win[q - 1]; q--; }
        win[q] = v;
      }
    }
    if (x !== x) continue;
    const half = m >> 1;
    let spike: boolean;
    if ((m & 1) === 1) {
      // Odd count: MAD is the middle deviation, so r > c·MAD exactly when at least
      // half + 1 of the deviations d satisfy c·d < r (c·d is non-decreasing in d).
      const med = win[half];
      const r = Math.abs(x - med);
      spike = false;
      if (r > minDev) {
        // win is sorted, so c·|win[j] − med| never decreases going outward from the middle:
        // the deviations with c·d < r form one contiguous run around `half`. Count it from
        // the middle outward and stop as soon as it exceeds half (same test, fewer steps).
        let below = 0;
        for (let j = half; j >= 0 && c * Math.abs(win[j] - med) < r; j--) below++;
        for (let j = half + 1; j < m && below <= half && c * Math.abs(win[j] - med) < r; j++) below++;
        spike = below > half;
      }
      if (spike) {
        isSpike[i] = 1;
        idx.push(i);
        out[i] = useNan ? NaN : med;
      }
    } else {
      const med = 0.5 * (win[half - 1] + win[half]);
      for (let j = 0; j < m; j++) {
        const d = Math.abs(win[j] - med);
        let q = j;
        while (q > 0 && dev[q - 1] > d) { dev[q] = dev[q - 1]; q--; }
        dev[q] = d;
      }
      const mad = 0.5 * (dev[half - 1] + dev[half]);
      const r = Math.abs(x - med);
      if (r > Math.max(k * MAD_TO_SIGMA * mad, minDev)) {
        isSpike[i] = 1;
        idx.push(i);
        out[i] = useNan ? NaN : med;
      }
    }
  }
  return { values: out, isSpike, spikeIndex: Int32Array.from(idx), spikeCount: idx.length };
}
