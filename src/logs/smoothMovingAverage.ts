/**
 * Centred moving average of a log, NaN-aware.
 */
import { windowSampleCount, type SampleWindow } from "./sampleWindow.js";

/**
 * Centred moving (boxcar) average of a log.
 *
 * out[i] = mean of the finite values among x[i−h … i+h], h = (w−1)/2 (the window is cut at
 * the ends). NaN policy: a NaN sample stays NaN (gaps are never filled); NaN neighbours are
 * skipped. Boxcar smoothing: common practice, no source.
 *
 * @param values log values, any unit, NaN = missing.
 * @param window {@link SampleWindow}; typical { lengthFt: 10, stepFt: 0.5 } (21 samples).
 * @returns new Float64Array, same unit and length.
 * @throws ShalepointError E_RANGE from {@link windowSampleCount}.
 * @example smoothMovingAverage({ values: new Float64Array([1, 2, NaN, 4, 8]), window: { samples: 3 } }) // [1.5, 1.5, NaN, 6, 6]
 */
export function smoothMovingAverage(args: { values: ArrayLike<number>; window: SampleWindow }): Float64Array {
  const { values } = args;
  const w = windowSampleCount(args.window);
  const h = (w - 1) / 2;
  const n = values.length;
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(values[i])) { out[i] = NaN; continue; }
    let s = 0, m = 0;
    const lo = Math.max(0, i - h), hi = Math.min(n - 1, i + h);
    for (let j = lo; j <= hi; j++) {
      const v = values[j];
      if (Number.isNaN(v)) continue;
      s += v; m++;
    }
    out[i] = s / m;
  }
  return out;
}
