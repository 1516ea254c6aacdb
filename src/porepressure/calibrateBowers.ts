/**
 * Calibration of Bowers' A, B (and U below an onset of unloading) to measured pore
 * pressures.
 *
 * Model: Bowers, G.L., 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488 (from memory
 * for equation numbers): Pp = Sv − σ(V), with σ from the virgin curve or, below the onset
 * of unloading where V < Vmax, from the unloading curve with σmax = ((Vmax − V0)/A)^(1/B).
 * Fit: weighted least squares in psi by Levenberg–Marquardt (Levenberg 1944, Q. Appl. Math.
 * 2(2):164–168; Marquardt 1963, J. SIAM 11(2):431–441); standard errors from the Jacobian.
 * Starting values, unless given, come from the log-log crossplot fit of the virgin points.
 *
 * Imports: ../errors.js and the siblings bowersCurves.ts, bowersPorePressure.ts,
 * fitBowersCrossplot.ts, leastSquares.ts, misfitTable.ts, porePressureFlags.ts.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { BOWERS_DEFAULT_V0_FT_PER_S, unloadingStressRaw, virginStressRaw } from "./bowersCurves.js";
import { bowersPorePressure, velocityAtDepth } from "./bowersPorePressure.js";
import { fitBowersCrossplot } from "./fitBowersCrossplot.js";
import { levenbergMarquardt } from "./leastSquares.js";
import { porePressureMisfitTable, requireObservations, type MisfitTable, type PressureObservation } from "./misfitTable.js";
import { requireLengths, type DepthRangeFt } from "./porePressureFlags.js";

/** Result of {@link calibrateBowers}. */
export interface BowersCalibration {
  a: number;
  b: number;
  /** U; NaN when no unloading zone was fitted. */
  u: number;
  v0FtPerS: number;
  aStandardError: number;
  bStandardError: number;
  /** NaN when no unloading zone was fitted. */
  uStandardError: number;
  /** σmax at the fitted A, B, psi (NaN without unloading). */
  sigmaMaxPsi: number;
  /** Vmax used, ft/s (NaN without unloading). */
  vmaxFtPerS: number;
  /** Points used; of which on the unloading branch. */
  n: number;
  nUnloading: number;
  nSkipped: number;
  /** Weighted residual standard deviation, psi: sqrt(Σw r²/(n − p)). */
  residualStdPsi: number;
  converged: boolean;
  iterations: number;
  misfit: MisfitTable;
  depthRangeFt: DepthRangeFt;
  warnings: Warning[];
}

/** Bounds used by the fit (projection): A in [1e-6, 1e6], B in [1e-3, 1], U in [1, 100]. */
const A_BOUNDS: [number, number] = [1e-6, 1e6];
const B_BOUNDS: [number, number] = [1e-3, 1];
const U_BOUNDS: [number, number] = [1, 100];

/**
 * Fit Bowers A, B — and U when an unloading zone is given — to measured pore pressures.
 *
 * Minimises Σ w_i [Sv_i − σ(V_i; A, B, U) − P_i]². Each point's branch follows
 * bowersPorePressure: unloading at or below `unloading.onsetTvdFt` where V < Vmax, virgin
 * elsewhere. Needs at least p + 1 usable points (p = 2, or 3 with unloading) and, with
 * unloading, at least one point on the unloading branch and two on the virgin branch.
 * A point with V < V0 is predicted at Sv.
 *
 * @param input.overburdenPsi, input.hydrostaticPsi Sv and Ph per sample, psi
 * @param input.velocityFtPerS velocity per sample, ft/s
 * @param input.tvdFt TVD below RT per sample, ft
 * @param input.observations measured points
 * @param input.v0FtPerS V0 (default 5000 ft/s), held fixed
 * @param input.unloading optional { onsetTvdFt, vmaxFtPerS?, initialU? (default 3) }
 * @param input.initial optional starting { a, b } (default: crossplot fit of the virgin points, else A 10, B 0.75)
 * @returns {@link BowersCalibration}
 * @throws ShalepointError E_TOO_FEW (too few points, or no unloading point); E_RANGE (bad
 *   index, weight, V0, Vmax or onset); E_LENGTH
 * @example
 * // points made with A 10.11, B 0.777 are fitted back to A 10.11, B 0.777
 * calibrateBowers({ overburdenPsi, hydrostaticPsi, velocityFtPerS, tvdFt, observations })
 * @see Bowers 1995, SPE-27488, eqs. 1–3 (from memory)
 */
export function calibrateBowers(input: {
  overburdenPsi: ArrayLike<number>;
  hydrostaticPsi: ArrayLike<number>;
  velocityFtPerS: ArrayLike<number>;
  tvdFt: ArrayLike<number>;
  observations: readonly PressureObservation[];
  v0FtPerS?: number;
  unloading?: { onsetTvdFt: number; vmaxFtPerS?: number; initialU?: number };
  initial?: { a: number; b: number };
}): BowersCalibration {
  const { overburdenPsi, hydrostaticPsi, velocityFtPerS, tvdFt, observations, unloading } = input;
  const len = tvdFt.length;
  requireLengths(len, { overburdenPsi, hydrostaticPsi, velocityFtPerS, tvdFt });
  requireObservations(observations, len);
  const v0 = input.v0FtPerS ?? BOWERS_DEFAULT_V0_FT_PER_S;
  if (!(Number.isFinite(v0) && v0 > 0)) {
    throw new ShalepointError("E_RANGE", "Bowers v0FtPerS is out of range", { param: "v0FtPerS", value: v0, unit: "ft/s", allowed: "> 0" });
  }
  let vmax = NaN;
  if (unloading !== undefined) {
    vmax = unloading.vmaxFtPerS ?? velocityAtDepth(tvdFt, velocityFtPerS, unloading.onsetTvdFt);
    if (!(Number.isFinite(vmax) && vmax > v0)) {
      throw new ShalepointError("E_RANGE", "Vmax must exceed V0", { param: "unloading.vmaxFtPerS", value: vmax, unit: "ft/s", allowed: `> ${v0}` });
    }
  }

  // Usable points and their branch.
  const sv: number[] = [];
  const vel: number[] = [];
  const pm: number[] = [];
  const sw: number[] = []; // √w
  const unl: boolean[] = [];
  const z: number[] = [];
  for (const o of observations) {
    const i = o.index;
    if (!(Number.isFinite(overburdenPsi[i]) && Number.isFinite(velocityFtPerS[i]) && Number.isFinite(o.pressurePsi) && Number.isFinite(tvdFt[i]))) continue;
    sv.push(overburdenPsi[i]);
    vel.push(velocityFtPerS[i]);
    pm.push(o.pressurePsi);
    sw.push(Math.sqrt(o.weight ?? 1));
    unl.push(unloading !== undefined && tvdFt[i] >= unloading.onsetTvdFt && velocityFtPerS[i] < vmax);
    z.push(tvdFt[i]);
  }
  const m = sv.length;
  const p = unloading === undefined ? 2 : 3;
  const nUnl = unl.filter(Boolean).length;
  if (m < p + 1) {
    throw new ShalepointError("E_TOO_FEW", `the Bowers calibration needs at least ${p + 1} usable points`, {
      param: "observations",
      value: m,
      allowed: `≥ ${p + 1} points with finite Sv, velocity and pressure`,
    });
  }
  if (unloading !== undefined && (nUnl < 1 || m - nUnl < 2)) {
    throw new ShalepointError("E_TOO_FEW", "fitting U needs ≥ 1 point on the unloading branch and ≥ 2 on the virgin branch", {
      param: "observations",
      value: `${nUnl} unloading, ${m - nUnl} virgin`,
      hint: "Add measured points below the onset of unloading, or fit A and B only.",
    });
  }

  // Starting values.
  let a0 = 10;
  let b0 = 0.75;
  if (input.initial !== undefined) {
    a0 = input.initial.a;
    b0 = input.initial.b;
  } else {
    const vv: number[] = [];
    const ss: number[] = [];
    for (let k = 0; k < m; k++) {
      if (!unl[k]) {
        vv.push(vel[k]);
        ss.push(sv[k] - pm[k]);
      }
    }
    try {
      const cp = fitBowersCrossplot({ velocityFtPerS: vv, effectiveStressPsi: ss, v0FtPerS: v0 });
      if (cp.b > 0 && cp.b <= 1 && Number.isFinite(cp.a)) {
        a0 = cp.a;
        b0 = cp.b;
      }
    } catch {
      // fewer than 3 usable virgin points: keep the nominal start
    }
  }
  const u0 = unloading?.initialU ?? 3;

  const residuals = (q: Float64Array): Float64Array => {
    const [a, b] = [q[0], q[1]];
    const u = p === 3 ? q[2] : 1;
    const sMax = p === 3 ? virginStressRaw(vmax, a, b, v0) : NaN;
    const r = new Float64Array(m);
    for (let k = 0; k < m; k++) {
      let s: number;
      if (vel[k] < v0) s = 0;
      else s = unl[k] ? unloadingStressRaw(vel[k], sMax, a, b, u, v0) : virginStressRaw(vel[k], a, b, v0);
      r[k] = sw[k] * (sv[k] - s - pm[k]);
    }
    return r;
  };
  const lower = Float64Array.from(p === 3 ? [A_BOUNDS[0], B_BOUNDS[0], U_BOUNDS[0]] : [A_BOUNDS[0], B_BOUNDS[0]]);
  const upper = Float64Array.from(p === 3 ? [A_BOUNDS[1], B_BOUNDS[1], U_BOUNDS[1]] : [A_BOUNDS[1], B_BOUNDS[1]]);
  const start = Float64Array.from(p === 3 ? [a0, b0, u0] : [a0, b0]);
  const sol = levenbergMarquardt({ residuals, initial: start, lower, upper });

  const a = sol.params[0];
  const b = sol.params[1];
  const u = p === 3 ? sol.params[2] : NaN;
  const warnings: Warning[] = [];
  const names = ["a", "b", "u"];
  sol.atBound.forEach((hit, j) => {
    if (hit) warnings.push({ code: "W_FIT_AT_BOUND", message: `Bowers ${names[j]} ended on its bound (${sol.params[j].toPrecision(6)})` });
  });
  if (!sol.converged) warnings.push({ code: "W_FIT_NOT_CONVERGED", message: `Bowers fit stopped after ${sol.iterations} iterations without converging` });

  const pred = bowersPorePressure({
    overburdenPsi,
    hydrostaticPsi,
    velocityFtPerS,
    tvdFt,
    a,
    b,
    v0FtPerS: v0,
    unloading: unloading === undefined ? undefined : { u, onsetTvdFt: unloading.onsetTvdFt, vmaxFtPerS: vmax },
  });
  const misfit = porePressureMisfitTable({ tvdFt, predictedPsi: pred.ppPsi, observations });
  return {
    a,
    b,
    u,
    v0FtPerS: v0,
    aStandardError: sol.standardErrors[0],
    bStandardError: sol.standardErrors[1],
    uStandardError: p === 3 ? sol.standardErrors[2] : NaN,
    sigmaMaxPsi: p === 3 ? virginStressRaw(vmax, a, b, v0) : NaN,
    vmaxFtPerS: vmax,
    n: m,
    nUnloading: nUnl,
    nSkipped: observations.length - m,
    residualStdPsi: Math.sqrt(sol.sse / (m - p)),
    converged: sol.converged,
    iterations: sol.iterations,
    misfit,
    depthRangeFt: { topFt: Math.min(...z), baseFt: Math.max(...z) },
    warnings,
  };
}
