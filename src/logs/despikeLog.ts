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
  const buf = new Float64Array(w);
  const dev = new Float64Array(w);
  /** Insert v into the sorted prefix a[0..m) (insertion sort: fastest for short windows). */
  const insert = (a: Float64Array, m: number, v: number): void => {
    let k = m;
    while (k > 0 && a[k - 1] > v) { a[k] = a[k - 1]; k--; }
    a[k] = v;
  };
  const medianSorted = (a: Float64Array, m: number): number =>
    m % 2 === 1 ? a[(m - 1) >> 1] : 0.5 * (a[m / 2 - 1] + a[m / 2]);
  for (let i = 0; i < n; i++) {
    const x = values[i];
    out[i] = x;
    if (Number.isNaN(x)) continue;
    let m = 0;
    const lo = Math.max(0, i - h), hi = Math.min(n - 1, i + h);
    for (let j = lo; j <= hi; j++) {
      const v = values[j];
      if (!Number.isNaN(v)) insert(buf, m++, v);
    }
    const med = medianSorted(buf, m);
    for (let j = 0; j < m; j++) insert(dev, j, Math.abs(buf[j] - med));
    const mad = medianSorted(dev, m);
    const r = Math.abs(x - med);
    if (r > Math.max(k * MAD_TO_SIGMA * mad, minDev)) {
      isSpike[i] = 1;
      idx.push(i);
      out[i] = useNan ? NaN : med;
    }
  }
  return { values: out, isSpike, spikeIndex: Int32Array.from(idx), spikeCount: idx.length };
}
