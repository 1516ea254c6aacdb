/**
 * Correlated pairs from a bivariate normal distribution, through the Cholesky factor of the
 * 2×2 covariance — used for the linearised intercept and slope of a fitted compaction trend.
 *
 * Reference: the Cholesky factorisation Σ = L·Lᵀ (e.g. Golub, G.H. & Van Loan, C.F.,
 * Matrix Computations, 4th ed., Johns Hopkins UP 2013, Algorithm 4.2.1): for
 * Σ = [[Vx, C], [C, Vy]], L11 = √Vx, L21 = C/L11, L22 = √(Vy − L21²); then
 * x = μx + L11·z1, y = μy + L21·z1 + L22·z2 with z1, z2 independent N(0, 1) gives
 * Cov(x, y) = Σ exactly. Normal deviates by the polar method (Marsaglia & Bray 1964,
 * SIAM Review 6(3):260–264).
 *
 * Imports: ../errors.js and the siblings drawParameterSamples.ts, xoshiro128Random.ts (type).
 */
import { ShalepointError } from "../errors.js";
import { drawStandardNormals } from "./drawParameterSamples.js";
import type { UniformRandomSource } from "./xoshiro128Random.js";

/** A 2×2 covariance: variances of x and y and their covariance (same shape as a line fit's). */
export interface PairCovariance {
  /** Var(x), in x units squared, ≥ 0. */
  interceptVar: number;
  /** Var(y), in y units squared, ≥ 0. */
  slopeVar: number;
  /** Cov(x, y), with |Cov| ≤ √(Var x · Var y). */
  interceptSlopeCov: number;
}

/** Draws of a correlated pair. */
export interface CorrelatedPairs {
  /** First member (e.g. trend intercept), length count. */
  x: Float64Array;
  /** Second member (e.g. trend slope), length count. */
  y: Float64Array;
}

/**
 * Cholesky factor of a 2×2 covariance, checked to be positive semi-definite.
 *
 * A relative excess of |C| over √(Vx·Vy) up to 1e-12 (rounding in the fit) is accepted and
 * treated as perfect correlation.
 *
 * @param covariance see {@link PairCovariance}
 * @param param name for errors (e.g. `trendCovariance[0]`)
 * @returns { l11, l21, l22 }
 * @throws ShalepointError E_RANGE for a negative or non-finite variance, or |C| > √(Vx·Vy)
 * @example choleskyOfPairCovariance({ interceptVar: 4, slopeVar: 2, interceptSlopeCov: 2 }, "c") // { l11: 2, l21: 1, l22: 1 }
 * @see Golub & Van Loan 2013, Matrix Computations, Algorithm 4.2.1
 */
export function choleskyOfPairCovariance(covariance: PairCovariance, param: string): { l11: number; l21: number; l22: number } {
  const { interceptVar: vx, slopeVar: vy, interceptSlopeCov: c } = covariance;
  for (const [name, v] of [["interceptVar", vx], ["slopeVar", vy]] as const) {
    if (!(Number.isFinite(v) && v >= 0)) {
      throw new ShalepointError("E_RANGE", `${param}.${name}: a variance must be finite and ≥ 0`, {
        param: `${param}.${name}`, value: v, allowed: ">= 0",
        hint: "Variances are squared standard errors; a negative one means a corrupted fit record.",
      });
    }
  }
  const limit = Math.sqrt(vx * vy);
  if (!(Number.isFinite(c) && Math.abs(c) <= limit * (1 + 1e-12))) {
    throw new ShalepointError("E_RANGE", `${param}.interceptSlopeCov: covariance exceeds √(Var·Var), not positive semi-definite`, {
      param: `${param}.interceptSlopeCov`, value: c, allowed: `|cov| <= ${limit}`,
    });
  }
  const l11 = Math.sqrt(vx);
  const l21 = l11 > 0 ? c / l11 : 0;
  const l22 = Math.sqrt(Math.max(0, vy - l21 * l21));
  return { l11, l21, l22 };
}

/**
 * Draw correlated (x, y) pairs from a bivariate normal distribution.
 *
 * Formula: x = μx + L11·z1, y = μy + L21·z1 + L22·z2 (Cholesky, see file header).
 *
 * @param input.meanX mean of x (e.g. a trend intercept, ln ohm·m), input.meanY mean of y (e.g. slope, 1/ft)
 * @param input.covariance 2×2 covariance (e.g. `diagnostics.covariance` of fitCompactionTrend)
 * @param input.count number of pairs (integer ≥ 0), e.g. 1000
 * @param input.random a seeded source (createXoshiro128Random)
 * @param input.param name for errors (default `covariance`)
 * @returns { x, y } new Float64Arrays
 * @throws ShalepointError E_RANGE as {@link choleskyOfPairCovariance}, or a bad count
 * @example drawCorrelatedPairs({ meanX: 0, meanY: 1e-4, covariance: { interceptVar: 1e-4, slopeVar: 1e-12, interceptSlopeCov: -5e-9 }, count: 2, random: createXoshiro128Random(3) })
 * // { x: Float64Array(2), y: Float64Array(2) }, identical for seed 3 on every run
 * @see Golub & Van Loan 2013, Algorithm 4.2.1; Marsaglia & Bray 1964, SIAM Review 6(3)
 */
export function drawCorrelatedPairs(input: {
  meanX: number;
  meanY: number;
  covariance: PairCovariance;
  count: number;
  random: UniformRandomSource;
  param?: string;
}): CorrelatedPairs {
  const { meanX, meanY, count, random } = input;
  const param = input.param ?? "covariance";
  if (!(Number.isSafeInteger(count) && count >= 0)) {
    throw new ShalepointError("E_RANGE", "count must be a non-negative integer", { param: "count", value: count, allowed: ">= 0" });
  }
  if (!(Number.isFinite(meanX) && Number.isFinite(meanY))) {
    throw new ShalepointError("E_RANGE", `${param}: means must be finite`, { param, value: { meanX, meanY }, allowed: "finite" });
  }
  const { l11, l21, l22 } = choleskyOfPairCovariance(input.covariance, param);
  const z = drawStandardNormals(random, 2 * count);
  const x = new Float64Array(count);
  const y = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const z1 = z[2 * i];
    const z2 = z[2 * i + 1];
    x[i] = meanX + l11 * z1;
    y[i] = meanY + l21 * z1 + l22 * z2;
  }
  return { x, y };
}
