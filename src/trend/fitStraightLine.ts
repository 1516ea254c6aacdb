/**
 * Weighted least-squares straight line y = a + b·x, by centred sums.
 *
 * Reference: the simple linear regression formulas (e.g. Draper & Smith, Applied
 * Regression Analysis, 3rd ed. 1998, ch. 1): with weights w, x̄ = Σwx/Σw, ȳ = Σwy/Σw,
 * Sxx = Σw(x−x̄)², Sxy = Σw(x−x̄)(y−ȳ), Syy = Σw(y−ȳ)²;
 * b = Sxy/Sxx, a = ȳ − b·x̄; SSE = Σw·r²; s² = SSE/(n−2); R² = 1 − SSE/Syy;
 * Var(b) = s²/Sxx, Var(a) = s²·(1/Σw + x̄²/Sxx), Cov(a, b) = −x̄·s²/Sxx.
 * Centred sums avoid the loss of digits of raw sums on offset data (depths of 10⁴ ft).
 */
import { ShalepointError } from "../errors.js";

/** Covariance of the intercept a and slope b. */
export interface LineCovariance {
  interceptVar: number;
  slopeVar: number;
  interceptSlopeCov: number;
}

/** Result of {@link fitStraightLine}. */
export interface StraightLineFit {
  intercept: number;
  slope: number;
  /** Number of points with a finite x, y and a positive weight. */
  n: number;
  /** 1 − SSE/Syy (weighted); NaN when all y are equal. */
  rSquared: number;
  /** s = √(SSE/(n−2)), in y units. */
  residualStd: number;
  interceptStdErr: number;
  slopeStdErr: number;
  covariance: LineCovariance;
}

/**
 * Fit a straight line by (weighted) least squares with centred sums.
 *
 * Formula: see the file header. Points with a NaN x or y, or a weight ≤ 0, are skipped.
 *
 * @param x abscissae (e.g. depth below mudline, ft)
 * @param y ordinates (e.g. log10 slowness)
 * @param weights optional weights ≥ 0 (default 1)
 * @returns intercept, slope, R², residual standard deviation, standard errors, covariance
 * @throws ShalepointError E_TREND_TOO_FEW_POINTS with fewer than 3 usable points;
 *   E_TREND_DEGENERATE when all x are equal
 * @example fitStraightLine({ x: [0, 1, 2, 3], y: [1, 3, 5, 7.5] }) // slope 2.15, intercept 0.9
 * Reference: Draper & Smith 1998, Applied Regression Analysis, ch. 1 (simple linear regression).
 */
export function fitStraightLine({
  x,
  y,
  weights,
}: {
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  weights?: ArrayLike<number>;
}): StraightLineFit {
  const len = Math.min(x.length, y.length);
  let sw = 0;
  let sx = 0;
  let sy = 0;
  let n = 0;
  for (let i = 0; i < len; i++) {
    const w = weights ? weights[i] : 1;
    if (!(w > 0) || !Number.isFinite(x[i]) || !Number.isFinite(y[i])) continue;
    sw += w;
    sx += w * x[i];
    sy += w * y[i];
    n++;
  }
  if (n < 3) {
    throw new ShalepointError("E_TREND_TOO_FEW_POINTS", `a straight-line fit needs at least 3 points, found ${n}`, {
      param: "x, y", value: n, allowed: ">= 3",
      hint: "Widen the depth intervals or relax the shale selection so more points qualify.",
    });
  }
  const xm = sx / sw;
  const ym = sy / sw;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < len; i++) {
    const w = weights ? weights[i] : 1;
    if (!(w > 0) || !Number.isFinite(x[i]) || !Number.isFinite(y[i])) continue;
    const dx = x[i] - xm;
    const dy = y[i] - ym;
    sxx += w * dx * dx;
    sxy += w * dx * dy;
    syy += w * dy * dy;
  }
  if (!(sxx > 0)) {
    throw new ShalepointError("E_TREND_DEGENERATE", "all points sit at the same depth; a slope cannot be fitted", {
      param: "x", value: xm, hint: "Pick intervals that span a range of depths.",
    });
  }
  const slope = sxy / sxx;
  const intercept = ym - slope * xm;
  let sse = 0;
  for (let i = 0; i < len; i++) {
    const w = weights ? weights[i] : 1;
    if (!(w > 0) || !Number.isFinite(x[i]) || !Number.isFinite(y[i])) continue;
    const r = y[i] - intercept - slope * x[i];
    sse += w * r * r;
  }
  const s2 = sse / (n - 2);
  const slopeVar = s2 / sxx;
  const interceptVar = s2 * (1 / sw + (xm * xm) / sxx);
  return {
    intercept,
    slope,
    n,
    rSquared: syy > 0 ? 1 - sse / syy : NaN,
    residualStd: Math.sqrt(s2),
    interceptStdErr: Math.sqrt(interceptVar),
    slopeStdErr: Math.sqrt(slopeVar),
    covariance: { interceptVar, slopeVar, interceptSlopeCov: (-xm * s2) / sxx },
  };
}
