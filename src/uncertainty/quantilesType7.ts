/**
 * Sample quantiles by the "type 7" definition, found by selection (no full sort).
 *
 * Definition (Hyndman, R.J. & Fan, Y., 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50(4):361–365, definition 7 — the default of R and numpy):
 * for n sorted values x(0) ≤ … ≤ x(n−1) and probability p in [0, 1],
 *   h = (n − 1)·p, j = ⌊h⌋, Q(p) = x(j) + (h − j)·(x(j+1) − x(j)).
 *
 * Selection: Floyd, R.W. & Rivest, R.L., 1975, "Algorithm 489: The algorithm SELECT — for
 * finding the ith smallest of n elements", Communications of the ACM 18(3):173,
 * doi:10.1145/360680.360694. SELECT places x(j) at index j with nothing larger before it
 * and nothing smaller after it, in O(n) expected time; x(j+1) is then the minimum of the
 * part after j. For several ascending probabilities each selection works only on the part
 * right of the previous one. The result is exact (the same order statistics a sort gives).
 *
 * Imports: ../errors.js only.
 */
import { ShalepointError } from "../errors.js";

/** Floyd–Rivest SELECT on buf[left..right]: afterwards buf[k] is the k-th smallest there. */
function floydRivestSelect(buf: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    if (right - left > 600) {
      // Recurse on a sample to find pivots that bracket k tightly (Algorithm 489).
      const n = right - left + 1;
      const i = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (i - n / 2 < 0 ? -1 : 1);
      const newLeft = Math.max(left, Math.floor(k - (i * s) / n + sd));
      const newRight = Math.min(right, Math.floor(k + ((n - i) * s) / n + sd));
      floydRivestSelect(buf, k, newLeft, newRight);
    }
    const t = buf[k];
    let i = left;
    let j = right;
    let tmp = buf[left];
    buf[left] = buf[k];
    buf[k] = tmp;
    if (buf[right] > t) {
      tmp = buf[left];
      buf[left] = buf[right];
      buf[right] = tmp;
    }
    while (i < j) {
      tmp = buf[i];
      buf[i] = buf[j];
      buf[j] = tmp;
      i++;
      j--;
      while (buf[i] < t) i++;
      while (buf[j] > t) j--;
    }
    if (buf[left] === t) {
      tmp = buf[left];
      buf[left] = buf[j];
      buf[j] = tmp;
    } else {
      j++;
      tmp = buf[j];
      buf[j] = buf[right];
      buf[right] = tmp;
    }
    if (j <= k) left = j + 1;
    if (k <= j) right = j - 1;
  }
}

/**
 * Type-7 quantiles of buf[0..n−1], reordering buf in place (hot-loop form, no checks).
 *
 * Preconditions: no NaN in buf[0..n−1]; n ≥ 1; `probabilities` ascending, each in [0, 1].
 * Writes Q(probabilities[q]) to out[outOffset + q·outStride].
 *
 * @param buf scratch values (reordered), any unit
 * @param n number of values used from the start of buf
 * @param probabilities ascending probabilities, e.g. [0.1, 0.5, 0.9]
 * @param out destination array; outOffset, outStride place the results
 * @example const b = Float64Array.of(4, 1, 3, 2); const o = new Float64Array(1);
 * quantilesType7InPlace(b, 4, [0.5], o, 0, 1) // o = [2.5]
 * @see Hyndman & Fan 1996, The American Statistician 50(4):361–365, definition 7; Floyd & Rivest 1975, CACM 18(3):173
 */
export function quantilesType7InPlace(
  buf: Float64Array,
  n: number,
  probabilities: ArrayLike<number>,
  out: Float64Array,
  outOffset: number,
  outStride: number,
): void {
  let left = 0;
  let lastJ = -1;
  for (let q = 0; q < probabilities.length; q++) {
    const h = (n - 1) * probabilities[q];
    const j = Math.floor(h);
    const g = h - j;
    if (j !== lastJ) {
      floydRivestSelect(buf, j, left, n - 1);
      left = j + 1;
      lastJ = j;
    }
    let value = buf[j];
    if (g > 0 && j + 1 < n) {
      let next = buf[j + 1];
      for (let m = j + 2; m < n; m++) if (buf[m] < next) next = buf[m];
      value += g * (next - value);
    }
    out[outOffset + q * outStride] = value;
  }
}

/** Result of {@link quantilesType7}. */
export interface SampleQuantiles {
  /** Q(p) for each requested probability, in the order given; NaN when no finite value. */
  quantiles: Float64Array;
  /** Number of values used (NaN values are skipped). */
  n: number;
}

/**
 * Type-7 sample quantiles of an array (checked, copying form).
 *
 * Formula: h = (n − 1)p, j = ⌊h⌋, Q = x(j) + (h − j)(x(j+1) − x(j)), by selection.
 * Missing data: NaN values are skipped and `n` says how many were used; with none left every
 * quantile is NaN. The input is not changed.
 *
 * @param input.values the sample (any unit; NaN = missing), e.g. 1000 pore pressures in psi
 * @param input.probabilities probabilities in [0, 1], any order, e.g. [0.1, 0.5, 0.9]
 * @returns { quantiles, n } — quantiles in the unit of the values
 * @throws ShalepointError E_RANGE when a probability is outside [0, 1] or not finite
 * @example quantilesType7({ values: [1, 2, 3, 4], probabilities: [0.1, 0.5, 0.9] }).quantiles // [1.3, 2.5, 3.7]
 * @see Hyndman & Fan 1996, The American Statistician 50(4):361–365, definition 7; Floyd & Rivest 1975, CACM 18(3):173
 */
export function quantilesType7(input: { values: ArrayLike<number>; probabilities: ArrayLike<number> }): SampleQuantiles {
  const { values, probabilities } = input;
  const m = probabilities.length;
  for (let q = 0; q < m; q++) {
    const p = probabilities[q];
    if (!(p >= 0 && p <= 1)) {
      throw new ShalepointError("E_RANGE", "a quantile probability must lie in [0, 1]", {
        param: `probabilities[${q}]`, value: p, allowed: "[0, 1]", hint: "P10 is probability 0.1, not 10.",
      });
    }
  }
  const buf = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isNaN(v)) buf[n++] = v;
  }
  const quantiles = new Float64Array(m);
  if (n === 0) {
    quantiles.fill(NaN);
    return { quantiles, n };
  }
  // Select in ascending order of probability, then put the answers back in the caller's order.
  const order = Array.from({ length: m }, (_, q) => q).sort((a, b) => probabilities[a] - probabilities[b]);
  const sortedP = order.map((q) => probabilities[q]);
  const tmp = new Float64Array(m);
  quantilesType7InPlace(buf, n, sortedP, tmp, 0, 1);
  order.forEach((q, k) => {
    quantiles[q] = tmp[k];
  });
  return { quantiles, n };
}

/** Floyd–Rivest SELECT on an index array, ordering idx[left..right] by key[idx[·]]. */
function floydRivestSelectIndex(idx: Int32Array, key: Float64Array, k: number, left: number, right: number): void {
  while (right > left) {
    if (right - left > 600) {
      const n = right - left + 1;
      const i = k - left + 1;
      const z = Math.log(n);
      const s = 0.5 * Math.exp((2 * z) / 3);
      const sd = 0.5 * Math.sqrt((z * s * (n - s)) / n) * (i - n / 2 < 0 ? -1 : 1);
      floydRivestSelectIndex(idx, key, k, Math.max(left, Math.floor(k - (i * s) / n + sd)), Math.min(right, Math.floor(k + ((n - i) * s) / n + sd)));
    }
    const t = key[idx[k]];
    let i = left;
    let j = right;
    let tmp = idx[left];
    idx[left] = idx[k];
    idx[k] = tmp;
    if (key[idx[right]] > t) {
      tmp = idx[left];
      idx[left] = idx[right];
      idx[right] = tmp;
    }
    while (i < j) {
      tmp = idx[i];
      idx[i] = idx[j];
      idx[j] = tmp;
      i++;
      j--;
      while (key[idx[i]] < t) i++;
      while (key[idx[j]] > t) j--;
    }
    if (key[idx[left]] === t) {
      tmp = idx[left];
      idx[left] = idx[j];
      idx[j] = tmp;
    } else {
      j++;
      tmp = idx[j];
      idx[j] = idx[right];
      idx[right] = tmp;
    }
    if (j <= k) left = j + 1;
    if (k <= j) right = j - 1;
  }
}

/**
 * Check a request for quantiles of a fixed sample size (shared by the quantile trackers).
 * @returns the sample size and the probabilities as an array
 * @throws ShalepointError E_RANGE for a count that is not an integer ≥ 1, or probabilities
 *   not ascending in [0, 1]
 */
export function checkQuantileRequest(input: { count: number; probabilities: ArrayLike<number> }): { n: number; probs: number[] } {
  const n = input.count;
  const probs = Array.from(input.probabilities);
  if (!(Number.isSafeInteger(n) && n >= 1)) {
    throw new ShalepointError("E_RANGE", "sample size must be an integer ≥ 1", { param: "count", value: n, allowed: ">= 1" });
  }
  probs.forEach((p, q) => {
    if (!(p >= 0 && p <= 1) || (q > 0 && p < probs[q - 1])) {
      throw new ShalepointError("E_RANGE", "probabilities must lie in [0, 1] in ascending order", {
        param: `probabilities[${q}]`, value: p, allowed: "[0, 1], ascending",
      });
    }
  });
  return { n, probs };
}

/**
 * Type-7 quantiles of a sequence of related samples (one per depth), exact, usually in one
 * pass per sample.
 *
 * Monte Carlo realisations keep nearly the same rank order from one depth to the next, so
 * the realisation that gave order statistic x(j) at the previous depth predicts it here.
 * For each probability a bracket [c − w, c + w] is centred on that realisation's new value
 * (w a fraction of the current P10–P90 spread, adapted as it goes); one pass counts the
 * values below each bracket and gathers the indices inside it. When the bracket provably
 * holds ranks j and j+1 (count below ≤ j and j+1 < count below + count inside), x(j) and
 * x(j+1) are selected among the few bracketed values (Floyd–Rivest); otherwise the whole
 * sample is selected. Either way the answer is the exact type-7 quantile: the state only
 * changes the speed, never the result.
 *
 * @param input.count sample size n (≥ 1), e.g. 1000 realisations
 * @param input.probabilities ascending probabilities in [0, 1], e.g. [0.1, 0.5, 0.9]
 * @returns an object whose `quantiles(values, out, outOffset)` writes Q(p) for each
 *   probability to out[outOffset + q] (values: Float64Array of length ≥ n, no NaN, not changed)
 * @throws ShalepointError E_RANGE for a bad count or probabilities not ascending in [0, 1]
 * @example const t = createQuantileTracker({ count: 4, probabilities: [0.5] }); const o = new Float64Array(1);
 * t.quantiles(Float64Array.of(4, 1, 3, 2), o, 0) // o = [2.5]
 * @see Hyndman & Fan 1996, The American Statistician 50(4):361–365, definition 7; Floyd & Rivest 1975, CACM 18(3):173
 */
export function createQuantileTracker(input: { count: number; probabilities: ArrayLike<number> }): {
  quantiles(values: Float64Array, out: Float64Array, outOffset: number): void;
} {
  const { n, probs } = checkQuantileRequest(input);
  const m = probs.length;
  const jq = probs.map((p) => Math.floor((n - 1) * p));
  const gq = probs.map((p, q) => (n - 1) * p - jq[q]);
  const all = new Int32Array(n);
  const windows = probs.map(() => new Int32Array(n));
  const tracked = new Int32Array(m).fill(-1);
  const halfWidthFrac = new Float64Array(m).fill(0.02);
  const lo = new Float64Array(m);
  const hi = new Float64Array(m);
  const below = new Int32Array(m);
  const inside = new Int32Array(m);
  const target = 24 + (n >> 6); // bracket size aimed at (≈ 39 for 1000 realisations)

  const fullSelect = (x: Float64Array, out: Float64Array, off: number): void => {
    for (let r = 0; r < n; r++) all[r] = r;
    let left = 0;
    for (let q = 0; q < m; q++) {
      const j = jq[q];
      if (j >= left) floydRivestSelectIndex(all, x, j, left, n - 1);
      left = Math.max(left, j + 1);
      tracked[q] = all[j];
      let v = x[all[j]];
      if (gq[q] > 0 && j + 1 < n) {
        let next = Infinity;
        for (let t = j + 1; t < n; t++) if (x[all[t]] < next) next = x[all[t]];
        v += gq[q] * (next - v);
      }
      out[off + q] = v;
    }
  };

  const quantiles = (x: Float64Array, out: Float64Array, off: number): void => {
    if (m === 0) return;
    if (tracked[0] < 0 || n < 64) {
      fullSelect(x, out, off);
      return;
    }
    const spread = Math.abs(x[tracked[m - 1]] - x[tracked[0]]) + 1e-12 * Math.abs(x[tracked[0]]);
    for (let q = 0; q < m; q++) {
      const c = x[tracked[q]];
      const w = halfWidthFrac[q] * spread;
      lo[q] = c - w;
      hi[q] = c + w;
      below[q] = 0;
      inside[q] = 0;
    }
    if (m === 3) {
      // The usual P10/P50/P90 case, unrolled.
      const lo0 = lo[0], hi0 = hi[0], lo1 = lo[1], hi1 = hi[1], lo2 = lo[2], hi2 = hi[2];
      const w0 = windows[0], w1 = windows[1], w2 = windows[2];
      let b0 = 0, b1 = 0, b2 = 0, c0 = 0, c1 = 0, c2 = 0;
      for (let r = 0; r < n; r++) {
        const v = x[r];
        if (v < lo0) b0++;
        else if (v <= hi0) w0[c0++] = r;
        if (v < lo1) b1++;
        else if (v <= hi1) w1[c1++] = r;
        if (v < lo2) b2++;
        else if (v <= hi2) w2[c2++] = r;
      }
      below[0] = b0; below[1] = b1; below[2] = b2;
      inside[0] = c0; inside[1] = c1; inside[2] = c2;
    } else {
      for (let r = 0; r < n; r++) {
        const v = x[r];
        for (let q = 0; q < m; q++) {
          if (v < lo[q]) below[q]++;
          else if (v <= hi[q]) windows[q][inside[q]++] = r;
        }
      }
    }
    for (let q = 0; q < m; q++) {
      const j = jq[q];
      const need = gq[q] > 0 && j + 1 < n ? j + 1 : j;
      if (!(below[q] <= j && need < below[q] + inside[q])) {
        halfWidthFrac[q] = Math.min(halfWidthFrac[q] * 4, 1e6);
        fullSelect(x, out, off);
        return;
      }
    }
    for (let q = 0; q < m; q++) {
      const win = windows[q];
      const cnt = inside[q];
      const k = jq[q] - below[q];
      floydRivestSelectIndex(win, x, k, 0, cnt - 1);
      tracked[q] = win[k];
      let v = x[win[k]];
      if (gq[q] > 0 && jq[q] + 1 < n) {
        let next = Infinity;
        for (let t = k + 1; t < cnt; t++) if (x[win[t]] < next) next = x[win[t]];
        v += gq[q] * (next - v);
      }
      out[off + q] = v;
      if (cnt > 2 * target) halfWidthFrac[q] *= 0.7;
      else if (cnt < target / 2) halfWidthFrac[q] *= 1.25;
    }
  };
  return { quantiles };
}
