/**
 * Bowers virgin-curve constants A and B from a velocity versus effective-stress crossplot
 * of normally pressured shale (or of measured points), by a straight-line fit in log space.
 *
 * Reference: Bowers, G.L., 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488 (from
 * memory): V = V0 + A σ^B, so ln(V − V0) = ln A + B ln σ is a straight line. Ordinary least
 * squares with centred sums (slope = Sxy/Sxx), standard errors from the usual regression
 * formulas; SE(A) by the delta method, A·SE(ln A).
 *
 * The line itself is fitted by ../trend/fitStraightLine.ts (the project's one least-squares
 * line); SSE is summed from the residuals there, so R² and the standard errors can differ from
 * the Syy − b·Sxy form in the last digits only.
 *
 * Imports: ../errors.js, ../trend/fitStraightLine.ts and the siblings bowersCurves.ts,
 * porePressureFlags.ts.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { BOWERS_DEFAULT_V0_FT_PER_S } from "./bowersCurves.js";
import { requireLengths } from "./porePressureFlags.js";
import { fitStraightLine, type StraightLineFit } from "../trend/fitStraightLine.js";

/** Result of {@link fitBowersCrossplot}. */
export interface BowersCrossplotFit {
  /** A, (ft/s)/psi^B. */
  a: number;
  /** B, dimensionless. */
  b: number;
  /** V0 used, ft/s. */
  v0FtPerS: number;
  /** Standard error of A (delta method from ln A). */
  aStandardError: number;
  /** Standard error of B. */
  bStandardError: number;
  /** Coefficient of determination of the log-log line. */
  rSquared: number;
  /** Points used. */
  n: number;
  /** Points skipped (missing value, V ≤ V0 or σ ≤ 0). */
  nSkipped: number;
  warnings: Warning[];
}

/**
 * Fit Bowers A and B on the velocity–effective-stress crossplot.
 *
 * ln(V − V0) = ln A + B·ln σ, least squares with centred sums; skips NaN, V ≤ V0, σ ≤ 0.
 *
 * @param input.velocityFtPerS velocity of each point, ft/s (e.g. 7000–11,000)
 * @param input.effectiveStressPsi σ = Sv − Pp of each point, psi (e.g. 1000–5000), from
 *   hydrostatic in the normal section or from measured pressures (see bowersCrossplot)
 * @param input.v0FtPerS V0, ft/s (> 0, default 5000)
 * @returns {@link BowersCrossplotFit}
 * @throws ShalepointError E_TOO_FEW with fewer than 3 usable points; E_RANGE for V0 ≤ 0 or
 *   all σ equal; E_LENGTH on length mismatch
 * @example
 * fitBowersCrossplot({ velocityFtPerS: [7166.4, 10087, 12566], effectiveStressPsi: [1000, 3000, 5000] })
 * // { a ≈ 10.11, b ≈ 0.777, ... }
 * @see Bowers 1995, SPE-27488, virgin curve (from memory)
 */
export function fitBowersCrossplot(input: {
  velocityFtPerS: ArrayLike<number>;
  effectiveStressPsi: ArrayLike<number>;
  v0FtPerS?: number;
}): BowersCrossplotFit {
  const { velocityFtPerS, effectiveStressPsi } = input;
  requireLengths(velocityFtPerS.length, { velocityFtPerS, effectiveStressPsi });
  const v0 = input.v0FtPerS ?? BOWERS_DEFAULT_V0_FT_PER_S;
  if (!(Number.isFinite(v0) && v0 > 0)) {
    throw new ShalepointError("E_RANGE", "Bowers v0FtPerS is out of range", { param: "v0FtPerS", value: v0, unit: "ft/s", allowed: "> 0" });
  }
  const xs: number[] = [];
  const ys: number[] = [];
  for (let i = 0; i < velocityFtPerS.length; i++) {
    const v = velocityFtPerS[i];
    const s = effectiveStressPsi[i];
    if (v > v0 && s > 0 && Number.isFinite(v) && Number.isFinite(s)) {
      xs.push(Math.log(s));
      ys.push(Math.log(v - v0));
    }
  }
  const n = xs.length;
  if (n < 3) {
    throw new ShalepointError("E_TOO_FEW", "the crossplot fit needs at least 3 usable points", {
      param: "velocityFtPerS",
      value: n,
      allowed: "≥ 3 points with V > V0 and σ > 0",
    });
  }
  let line: StraightLineFit;
  try {
    line = fitStraightLine({ x: xs, y: ys });
  } catch (e) {
    if (e instanceof ShalepointError && e.code === "E_TREND_DEGENERATE") {
      throw new ShalepointError("E_RANGE", "all points have the same effective stress: B is not determined", {
        param: "effectiveStressPsi",
        value: Math.exp(xs.reduce((u, v) => u + v, 0) / n),
        unit: "psi",
        hint: "Use points over a range of depths.",
      });
    }
    throw e;
  }
  const b = line.slope;
  const lnA = line.intercept;
  const a = Math.exp(lnA);
  const warnings: Warning[] = [];
  if (!(b > 0 && b <= 1)) {
    warnings.push({ code: "W_BOWERS_B_OUT_OF_RANGE", message: `fitted B = ${b.toPrecision(4)} lies outside (0, 1]; the points do not follow a virgin curve` });
  }
  return {
    a,
    b,
    v0FtPerS: v0,
    aStandardError: a * line.interceptStdErr,
    bStandardError: line.slopeStdErr,
    // fitStraightLine gives NaN when all ln(V − V0) are equal (Syy = 0); a flat line fits them exactly.
    rSquared: Number.isNaN(line.rSquared) ? 1 : line.rSquared,
    n,
    nSkipped: velocityFtPerS.length - n,
    warnings,
  };
}
