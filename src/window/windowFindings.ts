/**
 * Findings type and run helper shared by the window files (imports nothing).
 */

/** One window finding over a depth range (one sample: topFt = baseFt). */
export interface WindowFinding {
  /** Stable code, e.g. `F_WINDOW_INVERTS`. */
  code: string;
  message: string;
  /** Shallowest and deepest depth of the range, ft TVD. */
  topFt: number;
  baseFt: number;
  /** Samples in the range. */
  count: number;
}

/** Index ranges [a, b] of consecutive true flags. */
export function windowFlagRuns(flags: ArrayLike<boolean | number>): Array<{ first: number; last: number }> {
  const runs: Array<{ first: number; last: number }> = [];
  let a = -1;
  for (let i = 0; i <= flags.length; i++) {
    const on = i < flags.length && !!flags[i];
    if (on && a < 0) a = i;
    if (!on && a >= 0) {
      runs.push({ first: a, last: i - 1 });
      a = -1;
    }
  }
  return runs;
}
