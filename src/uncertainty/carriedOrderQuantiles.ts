/**
 * Type-7 quantiles of a sequence of related samples by carrying the sorted order from one
 * sample to the next (exact; no per-sample full sort in the usual case).
 *
 * Definition (Hyndman, R.J. & Fan, Y., 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50(4):361–365, definition 7): for n sorted values
 * x(0) ≤ … ≤ x(n−1) and probability p, h = (n − 1)·p, j = ⌊h⌋,
 * Q(p) = x(j) + (h − j)·(x(j+1) − x(j)).
 *
 * Sorting: straight insertion (Knuth, D.E., 1998, The Art of Computer Programming, vol. 3,
 * 2nd ed., §5.2.1, Algorithm S) applied to the permutation that sorted the previous sample.
 * Its cost is n − 1 comparisons plus one move per inversion, so a sample whose order barely
 * changed (a Monte Carlo realisation set one depth step further down) costs one pass. When
 * the moves pass a cap (16·n, about the work of a comparison sort of 1000 values) the
 * permutation is sorted afresh instead, so a sudden reorder
 * costs one O(n log n) sort, never O(n²). Either way the permutation ends sorted, and the
 * quantiles read straight off it are the exact type-7 values: the carried state changes only
 * the speed, never the result.
 *
 * Imports: ../errors.js only.
 */
import { checkQuantileRequest } from "./quantilesType7.js";

/** Quantile reader returned by {@link createCarriedOrderQuantiles}. */
export interface CarriedOrderQuantiles {
  /**
   * Write Q(p) for each probability to out[outOffset + q] for values[0..n−1] (Float64Array,
   * no NaN, not changed), and leave the sorting permutation in `order`.
   */
  quantiles(values: Float64Array, out: Float64Array, outOffset: number): void;
  /** Indices 0..n−1 ordered by the last sample's values (ascending); read only. */
  readonly order: Int32Array;
  /** Number of samples that needed a fresh sort (first sample included); for diagnostics. */
  fullSorts(): number;
}

/**
 * Carried-order type-7 quantiles: exact P10/P50/P90 (or any ascending probabilities) of a
 * sequence of samples of the same size, usually one insertion pass per sample.
 *
 * Formula: Q(p) = x(j) + (h − j)(x(j+1) − x(j)), h = (n − 1)p, j = ⌊h⌋, with x(·) read through
 * a permutation kept sorted by insertion from the previous sample's order.
 * Missing data: none allowed in `values` (the caller skips samples with NaN).
 *
 * @param input.count sample size n, integer ≥ 1, e.g. 1000 realisations
 * @param input.probabilities ascending probabilities in [0, 1], e.g. [0.1, 0.5, 0.9]
 * @returns {@link CarriedOrderQuantiles}; quantiles are in the unit of the values (e.g. psi)
 * @throws ShalepointError E_RANGE for a bad count or probabilities not ascending in [0, 1]
 * @example const t = createCarriedOrderQuantiles({ count: 4, probabilities: [0.1, 0.5, 0.9] }); const o = new Float64Array(3);
 * t.quantiles(Float64Array.of(4, 1, 3, 2), o, 0) // o = [1.3, 2.5, 3.7]
 * @see Hyndman & Fan 1996, The American Statistician 50(4):361–365, definition 7; Knuth 1998, TAOCP vol. 3 §5.2.1
 */
export function createCarriedOrderQuantiles(input: { count: number; probabilities: ArrayLike<number> }): CarriedOrderQuantiles {
  const { n, probs } = checkQuantileRequest(input);
  const m = probs.length;
  const jq = new Int32Array(m);
  const gq = new Float64Array(m);
  for (let q = 0; q < m; q++) {
    const h = (n - 1) * probs[q];
    jq[q] = Math.floor(h);
    gq[q] = h - jq[q];
  }
  const order = new Int32Array(n);
  for (let r = 0; r < n; r++) order[r] = r;
  const cap = 16 * n;
  let started = false;
  let nFull = 0;

  const quantiles = (x: Float64Array, out: Float64Array, off: number): void => {
    if (!started || !insertionSortIndexRange(order, x, 0, n, cap)) {
      order.sort((a, b) => x[a] - x[b]);
      started = true;
      nFull++;
    }
    for (let q = 0; q < m; q++) {
      const j = jq[q];
      let v = x[order[j]];
      const g = gq[q];
      if (g > 0 && j + 1 < n) v += g * (x[order[j + 1]] - v);
      out[off + q] = v;
    }
  };
  return { quantiles, order, fullSorts: () => nFull };
}

/**
 * Straight insertion of idx[from..to−1] by key[idx[·]], starting from the given order (Knuth
 * 1998, TAOCP vol. 3, §5.2.1): cheap when the order is nearly right, as it is from one depth
 * to the next. Gives up (returns false, idx still a permutation) once more than `cap` moves
 * were needed, so the caller can sort afresh instead.
 *
 * @param idx indices into key, reordered in place over [from, to)
 * @param key the values that order the indices (no NaN)
 * @param from first position, ≥ 0
 * @param to one past the last position, ≤ idx.length
 * @param cap most element moves allowed, ≥ 0
 * @returns true when idx[from..to−1] is sorted by key
 * @example const idx = Int32Array.of(0, 1, 2); insertionSortIndexRange(idx, Float64Array.of(3, 1, 2), 0, 3, 10); // true, idx [1, 2, 0]
 */
export function insertionSortIndexRange(idx: Int32Array, key: Float64Array, from: number, to: number, cap: number): boolean {
  if (to - from < 2) return true;
  let moves = 0;
  let prev = key[idx[from]];
  for (let k = from + 1; k < to; k++) {
    const id = idx[k];
    const v = key[id];
    if (v >= prev) {
      prev = v;
      continue;
    }
    // v belongs further left; the largest so far (prev) moves to position k and stays the max.
    let s = k - 1;
    do {
      idx[s + 1] = idx[s];
      s--;
    } while (s >= from && key[idx[s]] > v);
    idx[s + 1] = id;
    moves += k - 1 - s;
    if (moves > cap) return false;
  }
  return true;
}
