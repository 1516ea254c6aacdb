/**
 * Rolling (running) median of a log, NaN-aware.
 */
import { windowSampleCount, type SampleWindow } from "./sampleWindow.js";

/**
 * Centred rolling median of a log.
 *
 * out[i] = median of the finite values among x[i−h … i+h], h = (w−1)/2 (the window is cut
 * at the ends of the log). For an even number of finite values the median is the mean of
 * the two middle ones. NaN policy: a NaN sample stays NaN (gaps are never filled); NaN
 * neighbours are skipped. Running medians: Tukey 1977, *Exploratory Data Analysis*,
 * Addison-Wesley, ch. 7 (from memory).
 *
 * @param values log values, any unit, NaN = missing; typical DT or GR at 0.5 ft.
 * @param window {@link SampleWindow}; typical { samples: 5 } … { samples: 21 }.
 * @returns new Float64Array, same unit and length.
 * @throws ShalepointError E_RANGE from {@link windowSampleCount}.
 * @example smoothRollingMedian({ values: new Float64Array([1, 9, 2, 3, 4]), window: { samples: 3 } }) // [5, 2, 3, 3, 3.5]
 */
export function smoothRollingMedian(args: { values: ArrayLike<number>; window: SampleWindow }): Float64Array {
  const { values } = args;
  const w = windowSampleCount(args.window);
  const h = (w - 1) / 2;
  const n = values.length;
  const out = new Float64Array(n);
  const buf = new Float64Array(w);
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(values[i])) { out[i] = NaN; continue; }
    let m = 0;
    const lo = Math.max(0, i - h), hi = Math.min(n - 1, i + h);
    for (let j = lo; j <= hi; j++) {
      const v = values[j];
      if (Number.isNaN(v)) continue;
      // insertion into the sorted prefix buf[0..m)
      let k = m++;
      while (k > 0 && buf[k - 1] > v) { buf[k] = buf[k - 1]; k--; }
      buf[k] = v;
    }
    out[i] = m % 2 === 1 ? buf[(m - 1) >> 1] : 0.5 * (buf[m / 2 - 1] + buf[m / 2]);
  }
  return out;
}
