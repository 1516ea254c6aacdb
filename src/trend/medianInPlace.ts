/**
 * Median by selection, the shared numerical helper of the robust fits (Huber scale in
 * fitStraightLineHuber.ts, the noise scale and depth step of the change-point segmentation)
 * and of the shale-point medians (logs/pickShalePoints.ts).
 *
 * Imports: nothing.
 */

/**
 * Median of a NaN-free array by iterative selection (Hoare's FIND, Communications of the
 * ACM 4(7):321–322, 1961), O(n) on average. Reorders `a` (pass a copy to keep the input).
 * @param a values, any unit; must not contain NaN
 * @returns the median (mean of the two middle values for an even count); NaN when empty
 * @example medianInPlace(Float64Array.from([3, 1, 2, 10])) // → 2.5
 */
export function medianInPlace(a: Float64Array): number {
  if (a.length === 0) return NaN;
  const n = a.length;
  const select = (k: number): number => {
    let lo = 0;
    let hi = n - 1;
    while (lo < hi) {
      const pivot = a[(lo + hi) >> 1];
      let i = lo;
      let j = hi;
      while (i <= j) {
        while (a[i] < pivot) i++;
        while (a[j] > pivot) j--;
        if (i <= j) {
          const tmp = a[i];
          a[i] = a[j];
          a[j] = tmp;
          i++;
          j--;
        }
      }
      if (k <= j) hi = j;
      else if (k >= i) lo = i;
      else return a[k];
    }
    return a[k];
  };
  const m = n >> 1;
  if (n % 2 === 1) return select(m);
  const upper = select(m);
  // After selecting m, every element left of m is ≤ a[m]: the lower middle is their maximum.
  let lower = -Infinity;
  for (let i = 0; i < m; i++) if (a[i] > lower) lower = a[i];
  return 0.5 * (lower + upper);
}
