/**
 * Type-7 quantiles of a sequence of related samples by carrying a partitioned order from one
 * sample to the next: only short sorted windows around the wanted ranks are kept in order,
 * the values between them are kept only on the right side of each window (exact).
 *
 * Definition (Hyndman, R.J. & Fan, Y., 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50(4):361–365, definition 7): for n sorted values
 * x(0) ≤ … ≤ x(n−1) and probability p, h = (n − 1)·p, j = ⌊h⌋,
 * Q(p) = x(j) + (h − j)·(x(j+1) − x(j)).
 *
 * Method (the partition step of Hoare, C.A.R., 1961, "Algorithm 65: FIND", Communications of
 * the ACM 4(7):321–322, carried over from sample to sample). A permutation of 0..n−1 is cut
 * into zones: gap 0, window 0, gap 1, window 1, …, gap m, where window q holds the positions
 * j_q − 8 … j_q + 9 (the ranks around j_q, clipped to 0..n−1) sorted by value, and every
 * value of a zone is ≤ every value of the next. For a new sample:
 * 1. each window is re-sorted by its new values (a few elements; straight insertion), giving
 *    its new value range [lo_q, hi_q];
 * 2. each gap element is checked against the open range (hi_(g−1), lo_g) of its gap;
 * 3. the few elements outside their range move to the zone whose range holds their new value
 *    (into a window: it is re-sorted), which keeps the partition;
 * 4. window q now starts at position b_q = the count of values in the zones before it; when
 *    b_q ≤ j_q and j_q + 1 lies inside the window, x(j_q) and x(j_q + 1) are read off the
 *    sorted window at positions j_q, j_q + 1; windows are then trimmed back to the 18 ranks.
 * When a window loses its ranks, or two windows' value ranges touch (ties), the whole
 * permutation is sorted (straight insertion from the carried order, or a fresh sort when
 * that would take over 16·n moves; Knuth 1998, TAOCP vol. 3, §5.2.1).
 * The reordering inside a gap, which is most of the reordering when many realisations cross
 * from one depth to the next, costs nothing; a sample costs one pass with two comparisons per
 * value plus the few moved values. The result is the exact type-7 value either way (the
 * carried state changes only the speed); tests compare it with a plain sort bit for bit.
 * Small samples (windows that would overlap, e.g. n < 60 for P10/P50/P90) use
 * createCarriedOrderQuantiles instead.
 *
 * Imports: siblings only (quantilesType7.ts for the request check, carriedOrderQuantiles.ts).
 */
import { checkQuantileRequest } from "./quantilesType7.js";
import { createCarriedOrderQuantiles } from "./carriedOrderQuantiles.js";

/** Quantile reader returned by {@link createPartitionedOrderQuantiles}. */
export interface PartitionedOrderQuantiles {
  /**
   * Write Q(p) for each probability to out[outOffset + q] for values[0..n−1] (Float64Array,
   * no NaN, not changed).
   */
  quantiles(values: Float64Array, out: Float64Array, outOffset: number): void;
  /** Number of samples that needed the whole permutation sorted (first sample included); for diagnostics. */
  fullSorts(): number;
}

/** Ranks kept on each side of the wanted rank(s) in a window. */
const WINDOW_HALF_RANKS = 8;

/**
 * Partitioned-order type-7 quantiles: exact P10/P50/P90 (or any ascending probabilities) of a
 * sequence of samples of the same size, usually one pass with two comparisons per value.
 *
 * Formula: Q(p) = x(j) + (h − j)(x(j+1) − x(j)), h = (n − 1)p, j = ⌊h⌋, with x(j), x(j+1)
 * read from a sorted window of ranks kept, with the zones around it, from the previous sample.
 * Missing data: none allowed in `values` (the caller skips samples with NaN).
 *
 * @param input.count sample size n, integer ≥ 1, e.g. 1000 realisations
 * @param input.probabilities ascending probabilities in [0, 1], e.g. [0.1, 0.5, 0.9]
 * @returns {@link PartitionedOrderQuantiles}; quantiles are in the unit of the values (e.g. psi)
 * @throws ShalepointError E_RANGE for a bad count or probabilities not ascending in [0, 1]
 * @example const t = createPartitionedOrderQuantiles({ count: 4, probabilities: [0.1, 0.5, 0.9] }); const o = new Float64Array(3);
 * t.quantiles(Float64Array.of(4, 1, 3, 2), o, 0) // o = [1.3, 2.5, 3.7]
 * @see Hyndman & Fan 1996, The American Statistician 50(4):361–365, definition 7; Hoare 1961, CACM 4(7):321–322
 */
export function createPartitionedOrderQuantiles(input: { count: number; probabilities: ArrayLike<number> }): PartitionedOrderQuantiles {
  const { n, probs } = checkQuantileRequest(input);
  const m = probs.length;
  const jq = new Int32Array(m);
  const gq = new Float64Array(m);
  const wantLo = new Int32Array(m);
  const wantHi = new Int32Array(m); // exclusive
  let overlap = m === 0;
  for (let q = 0; q < m; q++) {
    const h = (n - 1) * probs[q];
    jq[q] = Math.floor(h);
    gq[q] = h - jq[q];
    const need = gq[q] > 0 && jq[q] + 1 < n ? jq[q] + 1 : jq[q];
    wantLo[q] = Math.max(0, jq[q] - WINDOW_HALF_RANKS);
    wantHi[q] = Math.min(n, need + WINDOW_HALF_RANKS + 1);
    if (q > 0 && wantLo[q] < wantHi[q - 1]) overlap = true;
  }
  if (overlap) {
    const carried = createCarriedOrderQuantiles(input);
    return { quantiles: carried.quantiles, fullSorts: carried.fullSorts };
  }

  const zones = 2 * m + 1; // gap 0, window 0, gap 1, …, window m−1, gap m
  // Zone z covers permutation positions [bound[z], bound[z + 1]).
  const bound = new Int32Array(zones + 1);
  let perm = new Int32Array(n);
  let spare = new Int32Array(n);
  for (let r = 0; r < n; r++) perm[r] = r;
  const lo = new Float64Array(m);
  const hi = new Float64Array(m);
  const moved = new Uint8Array(n); // by position: 1 = leaves its zone this sample
  const excPos = new Int32Array(n);
  const excZone = new Int32Array(n);
  const cap = 16 * n;
  let built = false;
  let nFull = 0;

  /** Sort the whole permutation by x and cut the zones at the wanted ranks. */
  const rebuild = (x: Float64Array): void => {
    if (!insertionSortPermutation(perm, x, 0, n, cap)) perm.sort((a, b) => x[a] - x[b]);
    bound[0] = 0;
    for (let q = 0; q < m; q++) {
      bound[2 * q + 1] = wantLo[q];
      bound[2 * q + 2] = wantHi[q];
    }
    bound[zones] = n;
    built = true;
    nFull++;
  };

  /** Move the nExc flagged elements to the zones whose value ranges hold them. */
  const repartition = (x: Float64Array, nExc: number): void => {
    for (let e = 0; e < nExc; e++) {
      const k = excPos[e];
      const v = x[perm[k]];
      let t = zones - 1;
      for (let q = 0; q < m; q++) {
        if (v < lo[q]) {
          t = 2 * q;
          break;
        }
        if (v <= hi[q]) {
          t = 2 * q + 1;
          break;
        }
      }
      excZone[e] = t;
      moved[k] = 1;
    }
    let at = 0;
    let start = 0;
    for (let z = 0; z < zones; z++) {
      const end = bound[z + 1]; // old end of zone z (bound[z] already holds its new start)
      const newStart = at;
      for (let k = start; k < end; k++) if (moved[k] === 0) spare[at++] = perm[k];
      const kept = at;
      for (let e = 0; e < nExc; e++) if (excZone[e] === z) spare[at++] = perm[excPos[e]];
      // A window that took new members is re-sorted (the old members are already in order).
      if ((z & 1) === 1 && at > kept) insertionSortPermutation(spare, x, newStart, at, Infinity);
      start = end;
      bound[z + 1] = at;
    }
    for (let e = 0; e < nExc; e++) moved[excPos[e]] = 0;
    const swap = perm;
    perm = spare;
    spare = swap;
  };

  const quantiles = (x: Float64Array, out: Float64Array, off: number): void => {
    let ok = built;
    if (ok) {
      // 1. Re-sort the windows and take their value ranges.
      for (let q = 0; q < m; q++) {
        const s = bound[2 * q + 1];
        const e = bound[2 * q + 2];
        insertionSortPermutation(perm, x, s, e, Infinity);
        lo[q] = x[perm[s]];
        hi[q] = x[perm[e - 1]];
        if (q > 0 && !(hi[q - 1] < lo[q])) ok = false;
      }
    }
    if (ok) {
      // 2. Check every gap element against its gap's open value range.
      let nExc = 0;
      for (let g = 0; g <= m; g++) {
        const lower = g === 0 ? -Infinity : hi[g - 1];
        const upper = g === m ? Infinity : lo[g];
        const end = bound[2 * g + 1];
        for (let k = bound[2 * g]; k < end; k++) {
          const v = x[perm[k]];
          if (v > lower && v < upper) continue;
          excPos[nExc++] = k;
        }
      }
      // 3. Move the elements that left their zone.
      if (nExc > 0) repartition(x, nExc);
      // 4. Each window must still hold its ranks.
      for (let q = 0; q < m && ok; q++) {
        const need = gq[q] > 0 && jq[q] + 1 < n ? jq[q] + 1 : jq[q];
        ok = bound[2 * q + 1] <= jq[q] && need < bound[2 * q + 2];
      }
    }
    if (!ok) rebuild(x);
    for (let q = 0; q < m; q++) {
      const j = jq[q];
      let v = x[perm[j]];
      const g = gq[q];
      if (g > 0 && j + 1 < n) v += g * (x[perm[j + 1]] - v);
      out[off + q] = v;
      // Trim the window back to its ranks; the trimmed ends join the neighbouring gaps.
      if (bound[2 * q + 1] < wantLo[q]) bound[2 * q + 1] = wantLo[q];
      if (bound[2 * q + 2] > wantHi[q]) bound[2 * q + 2] = wantHi[q];
    }
  };
  return { quantiles, fullSorts: () => nFull };
}

/**
 * Straight insertion of idx[from..to−1] by key[idx[·]], starting from the given order; gives
 * up (returns false, idx still a permutation) once more than `cap` moves were needed.
 */
function insertionSortPermutation(idx: Int32Array, key: Float64Array, from: number, to: number, cap: number): boolean {
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
