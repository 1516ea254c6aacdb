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
