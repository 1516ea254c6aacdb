import { quantileSeq } from "mathjs";

/**
 * Test reference for type-7 sample quantiles, written from the definition (Hyndman, R.J. &
 * Fan, Y., 1996, The American Statistician 50(4):361–365, definition 7): sort a copy, then
 * h = (n − 1)·p, j = ⌊h⌋, Q = x(j) + (h − j)·(x(j+1) − x(j)).
 */
export function plainSortType7(values: ArrayLike<number>, p: number): number {
  const x = Array.from(values).sort((a, b) => a - b);
  const h = (x.length - 1) * p;
  const j = Math.floor(h);
  return j + 1 < x.length ? x[j] + (h - j) * (x[j + 1] - x[j]) : x[j];
}

/**
 * The trackers' doc example: P10/P50/P90 of [4, 1, 3, 2] are 1.3, 2.5, 3.7 (own case from
 * definition 7), equal to mathjs quantileSeq (an independent library, same interpolation),
 * and the values are not reordered. Returns what the tracker wrote, the input after the call
 * and mathjs's values, for the caller's assertions.
 */
export function docExampleQuantiles(tracker: { quantiles(values: Float64Array, out: Float64Array, outOffset: number): void }): {
  out: number[];
  valuesAfter: number[];
  mathjs: number[];
} {
  const o = new Float64Array(3);
  const x = Float64Array.of(4, 1, 3, 2);
  tracker.quantiles(x, o, 0);
  return { out: Array.from(o), valuesAfter: Array.from(x), mathjs: quantileSeq([4, 1, 3, 2], [0.1, 0.5, 0.9]) as number[] };
}
