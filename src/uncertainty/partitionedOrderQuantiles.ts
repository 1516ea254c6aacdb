/**
 * Type-7 quantiles of a sequence of related samples by carrying a partition from one sample
 * to the next: only short sorted windows around the wanted ranks are kept in order; every
 * other value only has to stay on the right side of the windows (exact).
 *
 * Definition (Hyndman, R.J. & Fan, Y., 1996, "Sample quantiles in statistical packages",
 * The American Statistician 50(4):361–365, definition 7): for n sorted values
 * x(0) ≤ … ≤ x(n−1) and probability p, h = (n − 1)·p, j = ⌊h⌋,
 * Q(p) = x(j) + (h − j)·(x(j+1) − x(j)).
 *
 * Method (the partition idea of Hoare, C.A.R., 1961, "Algorithm 65: FIND", Communications of
 * the ACM 4(7):321–322, carried over from sample to sample). Each index 0..n−1 belongs to a
 * zone: gap 0, window 0, gap 1, window 1, …, gap m. Window q holds the indices of the ranks
 * j_q − 8 … j_q + 9 (clipped to 0..n−1) as a list sorted by value; a gap only keeps a count.
 * For a new sample:
 * 1. each window list is re-sorted by its new values (a few elements; straight insertion),
 *    giving its value range [lo_q, hi_q];
 * 2. one pass over the indices in their own order checks each gap member against the open
 *    range (hi_(g−1), lo_g) of its gap (two comparisons; window members always pass);
 * 3. the few indices outside their range move to the zone whose range holds their new value
 *    (into a window: inserted in its sorted list), so every value of a zone is ≤ every value
 *    of the next;
 * 4. window q then starts at rank b_q = the number of values in the zones before it; when
 *    b_q ≤ j_q and j_q + 1 < b_q + (window length), x(j_q) and x(j_q + 1) are the window's
 *    entries j_q − b_q and j_q + 1 − b_q; windows are then trimmed back to their 18 ranks
 *    (the trimmed ends join the neighbouring gaps).
 * When a window loses its ranks, or two windows' value ranges touch (ties), every index is
 * sorted (straight insertion from the order of the last such sort, or a fresh sort when that
 * would take over 16·n moves; Knuth 1998, TAOCP vol. 3, §5.2.1) and the zones are cut again.
 * Reordering inside a gap, which is most of the reordering when many realisations cross from
 * one depth to the next, costs nothing. The result is the exact type-7 value either way (the
 * carried state changes only the speed); tests compare it with a plain sort bit for bit.
 * Small samples (windows that would overlap, e.g. n < 60 for P10/P50/P90) use
 * createCarriedOrderQuantiles instead.
 *
 * Imports: siblings only (quantilesType7.ts for the request check, carriedOrderQuantiles.ts).
 */
import { checkQuantileRequest } from "./quantilesType7.js";
import { createCarriedOrderQuantiles, insertionSortIndexRange } from "./carriedOrderQuantiles.js";

/** Quantile reader returned by {@link createPartitionedOrderQuantiles}. */
export interface PartitionedOrderQuantiles {
  /**
   * Write Q(p) for each probability to out[outOffset + q] for values[0..n−1] (Float64Array,
   * no NaN, not changed; infinities are allowed but slow the partition down).
   */
  quantiles(values: Float64Array, out: Float64Array, outOffset: number): void;
  /** Number of samples that needed every index sorted (first sample included); for diagnostics. */
  fullSorts(): number;
}

/** Ranks kept on each side of the wanted rank(s) in a window. */
const WINDOW_HALF_RANKS = 8;
/** Most zones (2m + 1) a Uint16Array zone index can name. */
const MAX_ZONES = 65535;

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
  const needq = new Int32Array(m);
  const wantLo = new Int32Array(m);
  const wantHi = new Int32Array(m); // exclusive
  let overlap = m === 0 || 2 * m + 1 > MAX_ZONES;
  for (let q = 0; q < m && !overlap; q++) {
    const h = (n - 1) * probs[q];
    jq[q] = Math.floor(h);
    gq[q] = h - jq[q];
    needq[q] = gq[q] > 0 && jq[q] + 1 < n ? jq[q] + 1 : jq[q];
    wantLo[q] = Math.max(0, jq[q] - WINDOW_HALF_RANKS);
    wantHi[q] = Math.min(n, needq[q] + WINDOW_HALF_RANKS + 1);
    if (q > 0 && wantLo[q] < wantHi[q - 1]) overlap = true;
  }
  if (overlap) {
    const carried = createCarriedOrderQuantiles(input);
    return { quantiles: carried.quantiles, fullSorts: carried.fullSorts };
  }

  const zones = 2 * m + 1; // gap 0, window 0, gap 1, …, window m−1, gap m
  const zoneOf = new Uint16Array(n);
  // Open value range (zoneLo, zoneHi) each zone's members must keep; ±∞ for windows.
  const zoneLo = new Float64Array(zones);
  const zoneHi = new Float64Array(zones);
  const gapCount = new Int32Array(m + 1);
  // Window lists start with room for their ranks plus intruders and grow when needed (a
  // window can take up to n entries before a rebuild), so a huge n costs no 3·n scratch.
  const win = Array.from({ length: m }, (_, q) => new Int32Array(Math.min(n, 4 * (wantHi[q] - wantLo[q]))));
  const winLen = new Int32Array(m);
  const winStart = new Int32Array(m); // rank of each window's first entry
  const lo = new Float64Array(m);
  const hi = new Float64Array(m);
  const exc = new Int32Array(n);
  const order = new Int32Array(n); // order of the last whole sort
  for (let r = 0; r < n; r++) order[r] = r;
  const cap = 16 * n;
  let built = false;
  let nFull = 0;

  /** Sort every index by x and cut the zones at the wanted ranks. */
  const rebuild = (x: Float64Array): void => {
    if (!built || !insertionSortIndexRange(order, x, 0, n, cap)) order.sort((a, b) => x[a] - x[b]);
    let k = 0;
    for (let q = 0; q < m; q++) {
      gapCount[q] = wantLo[q] - k;
      for (; k < wantLo[q]; k++) zoneOf[order[k]] = 2 * q;
      const w = win[q];
      let len = 0;
      for (; k < wantHi[q]; k++) {
        zoneOf[order[k]] = 2 * q + 1;
        w[len++] = order[k];
      }
      winLen[q] = len;
      winStart[q] = wantLo[q];
    }
    gapCount[m] = n - k;
    for (; k < n; k++) zoneOf[order[k]] = 2 * m;
    built = true;
    nFull++;
  };

  /** Steps 1–4 of the file comment; false when the partition cannot be kept (rebuild). */
  const update = (x: Float64Array): boolean => {
    // 1. Re-sort the windows and take their value ranges.
    for (let q = 0; q < m; q++) {
      const w = win[q];
      insertionSortIndexRange(w, x, 0, winLen[q], Infinity);
      lo[q] = x[w[0]];
      hi[q] = x[w[winLen[q] - 1]];
      if (q > 0 && !(hi[q - 1] < lo[q])) return false;
    }
    for (let g = 0; g <= m; g++) {
      zoneLo[2 * g] = g === 0 ? -Infinity : hi[g - 1];
      zoneHi[2 * g] = g === m ? Infinity : lo[g];
      if (g < m) {
        zoneLo[2 * g + 1] = -Infinity;
        zoneHi[2 * g + 1] = Infinity;
      }
    }
    // 2. One pass in index order: each gap member against its gap's open range.
    const zo = zoneOf;
    const zl = zoneLo;
    const zh = zoneHi;
    let nExc = 0;
    for (let r = 0; r < n; r++) {
      const z = zo[r];
      const v = x[r];
      if (v > zl[z] && v < zh[z]) continue;
      exc[nExc++] = r;
    }
    // 3. Move the indices that left their gap.
    for (let e = 0; e < nExc; e++) {
      const r = exc[e];
      if ((zo[r] & 1) === 1) continue; // a window member (an infinite value) stays where it is
      const v = x[r];
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
      gapCount[zo[r] >> 1]--;
      zo[r] = t;
      if ((t & 1) === 0) gapCount[t >> 1]++;
      else {
        const q = t >> 1;
        if (winLen[q] === win[q].length) {
          const grown = new Int32Array(Math.min(n, 2 * win[q].length));
          grown.set(win[q]);
          win[q] = grown;
        }
        const w = win[q];
        // Insert in the sorted window (ties go after equal values).
        let s = winLen[q] - 1;
        while (s >= 0 && x[w[s]] > v) {
          w[s + 1] = w[s];
          s--;
        }
        w[s + 1] = r;
        winLen[q]++;
      }
    }
    // 4. Window ranks must still hold j_q and j_q + 1.
    let b = 0;
    for (let q = 0; q < m; q++) {
      b += gapCount[q];
      winStart[q] = b;
      if (!(b <= jq[q] && needq[q] < b + winLen[q])) return false;
      b += winLen[q];
    }
    return true;
  };

  const quantiles = (x: Float64Array, out: Float64Array, off: number): void => {
    if (!built || !update(x)) rebuild(x);
    for (let q = 0; q < m; q++) {
      const w = win[q];
      const start = winStart[q];
      const j = jq[q];
      let v = x[w[j - start]];
      const g = gq[q];
      if (g > 0 && j + 1 < n) v += g * (x[w[j + 1 - start]] - v);
      out[off + q] = v;
      // Trim the window back to its ranks; the trimmed ends join the neighbouring gaps.
      const drop = wantLo[q] - start;
      if (drop > 0) {
        for (let i = 0; i < drop; i++) zoneOf[w[i]] = 2 * q;
        w.copyWithin(0, drop, winLen[q]);
        winLen[q] -= drop;
        winStart[q] = wantLo[q];
        gapCount[q] += drop;
      }
      const extra = winStart[q] + winLen[q] - wantHi[q];
      if (extra > 0) {
        for (let i = winLen[q] - extra; i < winLen[q]; i++) zoneOf[w[i]] = 2 * q + 2;
        winLen[q] -= extra;
        gapCount[q + 1] += extra;
      }
    }
  };
  return { quantiles, fullSorts: () => nFull };
}
