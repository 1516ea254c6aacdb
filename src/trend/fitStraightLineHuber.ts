/**
 * Robust straight line y = a + b·x by Huber M-estimation (iteratively reweighted least
 * squares).
 *
 * Reference: Huber, P.J., 1964, "Robust estimation of a location parameter", Annals of
 * Mathematical Statistics 35(1):73–101 (the ρ function quadratic inside ±k, linear
 * outside). Weights w = min(1, k·s/|r|) with k = 1.345 (about 95 % efficiency for normal
 * errors) and the scale s from the median absolute deviation of the residuals,
 * s = MAD/0.6744897502 (0.6744897502 = Φ⁻¹(0.75), normal consistency).
 *
 * Algorithm: start from ordinary least squares; repeat {residuals → s → weights → weighted
 * least squares} until the fitted line moves by less than 1e-12 (relative to the spread
 * of y) at both ends of the x range, or 100 iterations. Standard errors are the weighted
 * least-squares ones at the final weights (an approximation; no sandwich correction).
 */
import { fitStraightLine, type StraightLineFit } from "./fitStraightLine.js";
import { medianInPlace } from "./medianInPlace.js";

/** Huber tuning constant giving ≈ 95 % efficiency under normal errors. */
export const HUBER_TUNING_CONSTANT = 1.345;
const NORMAL_MAD_FACTOR = 0.6744897501960817;

/** Result of {@link fitStraightLineHuber}. */
export interface HuberLineFit extends StraightLineFit {
  /** Final weight of each input point (0 for skipped points), in input order. */
  weights: Float64Array;
  /** Robust residual scale s (y units). */
  scale: number;
  /** Points with weight < 1 at the end. */
  nDownweighted: number;
  iterations: number;
  converged: boolean;
}

/** Median of finite values, found by selection in `scratch` (overwritten; same length). */
function median(values: Float64Array, scratch: Float64Array): number {
  scratch.set(values);
  return medianInPlace(scratch);
}

/**
 * Fit a straight line that shrugs off a few gross outliers (Huber IRLS).
 *
 * Formula: minimise Σ ρ_k(r_i/s), ρ_k(u) = u²/2 for |u| ≤ k, k|u| − k²/2 otherwise.
 * Points with NaN x or y are skipped.
 *
 * @param x abscissae (e.g. depth below mudline, ft)
 * @param y ordinates
 * @param tuningConstant k; range [1, 3]; typical 1.345
 * @returns the line with its final weights, scale and iteration count
 * @throws ShalepointError E_TREND_TOO_FEW_POINTS (< 3 points), E_TREND_DEGENERATE (all x equal)
 * @example fitStraightLineHuber({ x: [0, 1, 2, 3, 4, 5], y: [0, 1, 2, 30, 4, 5] }) // slope ≈ 1, intercept ≈ 0
 * Reference: Huber 1964, Annals of Mathematical Statistics 35(1):73–101.
 */
export function fitStraightLineHuber({
  x,
  y,
  tuningConstant = HUBER_TUNING_CONSTANT,
}: {
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  tuningConstant?: number;
}): HuberLineFit {
  const len = Math.min(x.length, y.length);
  const w = new Float64Array(len);
  let xMin = Infinity;
  let xMax = -Infinity;
  let yMin = Infinity;
  let yMax = -Infinity;
  const usable: number[] = [];
  for (let i = 0; i < len; i++) {
    if (Number.isFinite(x[i]) && Number.isFinite(y[i])) {
      w[i] = 1;
      usable.push(i);
      xMin = Math.min(xMin, x[i]);
      xMax = Math.max(xMax, x[i]);
      yMin = Math.min(yMin, y[i]);
      yMax = Math.max(yMax, y[i]);
    }
  }
  let fit = fitStraightLine({ x, y, weights: w });
  const tol = 1e-12 * Math.max(yMax - yMin, Number.MIN_VALUE);
  const r = new Float64Array(usable.length);
  const dev = new Float64Array(usable.length);
  const scratch = new Float64Array(usable.length);
  let scale = NaN;
  let iterations = 0;
  let converged = false;
  for (; iterations < 100; ) {
    for (let j = 0; j < usable.length; j++) {
      const i = usable[j];
      r[j] = y[i] - fit.intercept - fit.slope * x[i];
    }
    const med = median(r, scratch);
    for (let j = 0; j < r.length; j++) dev[j] = Math.abs(r[j] - med);
    scale = median(dev, scratch) / NORMAL_MAD_FACTOR;
    // a perfect fit of most points: keep a tiny floor so outliers get a weight near zero
    const s = Math.max(scale, tol);
    for (let j = 0; j < usable.length; j++) {
      const a = Math.abs(r[j]);
      w[usable[j]] = a <= tuningConstant * s ? 1 : (tuningConstant * s) / a;
    }
    const next = fitStraightLine({ x, y, weights: w });
    iterations++;
    const moveTop = Math.abs(next.intercept + next.slope * xMin - (fit.intercept + fit.slope * xMin));
    const moveBase = Math.abs(next.intercept + next.slope * xMax - (fit.intercept + fit.slope * xMax));
    fit = next;
    if (moveTop <= tol && moveBase <= tol) {
      converged = true;
      break;
    }
  }
  let nDownweighted = 0;
  for (const i of usable) if (w[i] < 1) nDownweighted++;
  return { ...fit, weights: w, scale, nDownweighted, iterations, converged };
}
