/**
 * Calibration of the Eaton exponent to measured pore pressures.
 *
 * Model: Eaton, B.A., 1975, SPE-5544 (from memory for the meeting details), stress form
 * Pp = Sv − (Sv − Ph)·ratio^n. Fit: weighted least squares in psi over the measured points,
 * minimised over n by golden-section search (Kiefer 1953, Proc. AMS 4(3):502–506);
 * standard error from the Jacobian ∂Pp/∂n = −(Sv − Ph)·ratio^n·ln(ratio).
 *
 * Imports: ../errors.js and the siblings eaton.ts, leastSquares.ts, misfitTable.ts,
 * porePressureFlags.ts.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { eatonPorePressure } from "./eaton.js";
import { goldenSectionMinimize } from "./leastSquares.js";
import { porePressureMisfitTable, requireObservations, type MisfitTable, type PressureObservation } from "./misfitTable.js";
import { requireLengths, type DepthRangeFt } from "./porePressureFlags.js";

/** Result of {@link calibrateEatonExponent}. */
export interface EatonCalibration {
  /** Fitted exponent n (dimensionless). */
  exponent: number;
  /** Standard error of n from the Jacobian (NaN with one point). */
  exponentStandardError: number;
  /** Points used (finite inputs and measurement). */
  n: number;
  /** Points skipped for a missing value. */
  nSkipped: number;
  /** Weighted residual standard deviation, psi: sqrt(Σw r² / (n − 1)). */
  residualStdPsi: number;
  /** Measured vs predicted at every point, with RMS (psi and ppg). */
  misfit: MisfitTable;
  /** Depth range of the points used, ft TVD: pass as calibratedRangeTvdFt. */
  depthRangeFt: DepthRangeFt;
  warnings: Warning[];
}

/**
 * Fit the Eaton exponent n to measured pore pressures.
 *
 * Minimises Σ w_i [Sv_i − (Sv_i − Ph_i)·r_i^n − P_i]² over n in [exponentMin, exponentMax]
 * by golden-section search (interval width 1e-10 of the bracket). The Eaton prediction is
 * unclipped inside the fit; the misfit table uses the clipped prediction.
 * SE(n) = sqrt(s² / Σ w_i J_i²), J_i = −(Sv_i − Ph_i) r_i^n ln r_i, s² = Σw r²/(m − 1).
 *
 * @param input.overburdenPsi, input.hydrostaticPsi Sv and Ph per sample, psi
 * @param input.ratio Eaton ratio per sample (see eatonRatio): Δtn/Δt for sonic, Ro/Rn for resistivity
 * @param input.tvdFt TVD below RT per sample, ft (for EMW and the depth range)
 * @param input.observations measured points (≥ 1 usable; 2 or more for a standard error)
 * @param input.exponentMin, input.exponentMax search bracket (default 0.1–6; published 3.0 sonic, 1.2 resistivity)
 * @returns {@link EatonCalibration}
 * @throws ShalepointError E_TOO_FEW with no usable point; E_RANGE for a bad bracket, index or weight; E_LENGTH
 * @example
 * // points made with n = 3 are fitted back to n = 3.000
 * calibrateEatonExponent({ overburdenPsi, hydrostaticPsi, ratio, tvdFt, observations }).exponent // 3.000
 * @see Eaton 1975, SPE-5544; Lyons 2001, Standard Handbook of Petroleum & Natural Gas Engineering, vol. 1, eq. 4-251
 */
export function calibrateEatonExponent(input: {
  overburdenPsi: ArrayLike<number>;
  hydrostaticPsi: ArrayLike<number>;
  ratio: ArrayLike<number>;
  tvdFt: ArrayLike<number>;
  observations: readonly PressureObservation[];
  exponentMin?: number;
  exponentMax?: number;
}): EatonCalibration {
  const { overburdenPsi, hydrostaticPsi, ratio, tvdFt, observations } = input;
  const len = tvdFt.length;
  requireLengths(len, { overburdenPsi, hydrostaticPsi, ratio, tvdFt });
  requireObservations(observations, len);
  const lo = input.exponentMin ?? 0.1;
  const hi = input.exponentMax ?? 6;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && lo > 0 && hi > lo)) {
    throw new ShalepointError("E_RANGE", "exponent bracket must satisfy 0 < exponentMin < exponentMax", {
      param: "exponentMin, exponentMax",
      value: `${lo}, ${hi}`,
      allowed: "0 < min < max",
    });
  }
  const sv: number[] = [];
  const dsp: number[] = []; // Sv − Ph
  const r: number[] = [];
  const pm: number[] = [];
  const w: number[] = [];
  const z: number[] = [];
  for (const o of observations) {
    const i = o.index;
    const ok =
      Number.isFinite(overburdenPsi[i]) && Number.isFinite(hydrostaticPsi[i]) && ratio[i] > 0 &&
      Number.isFinite(ratio[i]) && Number.isFinite(o.pressurePsi) && Number.isFinite(tvdFt[i]);
    if (!ok) continue;
    sv.push(overburdenPsi[i]);
    dsp.push(overburdenPsi[i] - hydrostaticPsi[i]);
    r.push(ratio[i]);
    pm.push(o.pressurePsi);
    w.push(o.weight ?? 1);
    z.push(tvdFt[i]);
  }
  const m = sv.length;
  if (m < 1) {
    throw new ShalepointError("E_TOO_FEW", "no usable measured point for the Eaton calibration", {
      param: "observations",
      value: observations.length,
      allowed: "≥ 1 point with finite Sv, Ph, ratio and pressure (≥ 2 for a standard error)",
    });
  }
  const sse = (nExp: number): number => {
    let s = 0;
    for (let k = 0; k < m; k++) {
      const d = sv[k] - dsp[k] * Math.pow(r[k], nExp) - pm[k];
      s += w[k] * d * d;
    }
    return s;
  };
  const best = goldenSectionMinimize(sse, lo, hi);
  const nFit = best.x;
  let jtj = 0;
  for (let k = 0; k < m; k++) {
    const j = -dsp[k] * Math.pow(r[k], nFit) * Math.log(r[k]);
    jtj += w[k] * j * j;
  }
  const s2 = m > 1 ? best.fx / (m - 1) : NaN;
  const se = m > 1 && jtj > 0 ? Math.sqrt(s2 / jtj) : NaN;

  const warnings: Warning[] = [];
  const span = hi - lo;
  if (nFit - lo < 1e-6 * span || hi - nFit < 1e-6 * span) {
    warnings.push({ code: "W_FIT_AT_BOUND", message: `Eaton exponent ended on its bound (${nFit.toPrecision(6)}); widen the bracket or check the points` });
  }
  if (m === 1) warnings.push({ code: "W_FIT_NO_STANDARD_ERROR", message: "one point: exponent fitted exactly, no standard error", count: 1 });
  if (jtj === 0) warnings.push({ code: "W_FIT_UNDETERMINED", message: "all usable points have ratio 1 or Sv = Ph: the exponent is not determined by the data" });

  const pred = eatonPorePressure({ overburdenPsi, hydrostaticPsi, ratio, exponent: nFit });
  const misfit = porePressureMisfitTable({ tvdFt, predictedPsi: pred.ppPsi, observations });
  return {
    exponent: nFit,
    exponentStandardError: se,
    n: m,
    nSkipped: observations.length - m,
    residualStdPsi: Math.sqrt(s2),
    misfit,
    depthRangeFt: { topFt: Math.min(...z), baseFt: Math.max(...z) },
    warnings,
  };
}
