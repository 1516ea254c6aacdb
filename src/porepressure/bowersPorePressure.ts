/**
 * Bowers' method: pore pressure from velocity through the effective-stress curves, with the
 * unloading branch below a user-given onset of unloading.
 *
 * Reference: Bowers, G.L., 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488 (from
 * memory for equation numbers): σ from the virgin curve (eq. 1 inverted) or the unloading
 * curve (eq. 2 inverted) with σmax from eq. 3; then Terzaghi's effective stress
 * Pp = Sv − σ.
 *
 * Imports: ../errors.js and the siblings bowersCurves.ts and porePressureFlags.ts.
 */
import { ShalepointError } from "../errors.js";
import {
  requireBowersParameters,
  unloadingStressRaw,
  virginStressRaw,
  type BowersParameters,
} from "./bowersCurves.js";
import {
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_UNLOADING_BRANCH,
  checkLimitOptions,
  finishPorePressure,
  requireLengths,
  type PorePressureLimitOptions,
  type PorePressureResult,
} from "./porePressureFlags.js";

/** Where and how unloading applies. */
export interface BowersUnloadingZone {
  /** Unloading exponent U, ≥ 1 (typical 3–8; 1 = no unloading). */
  u: number;
  /** TVD below RT where unloading begins, ft (e.g. 11,500). Samples at or below it may unload. */
  onsetTvdFt: number;
  /**
   * Velocity at the onset of unloading, ft/s (> V0). Default: the velocity log linearly
   * interpolated at `onsetTvdFt` (smooth the log first: one noisy sample sets σmax).
   */
  vmaxFtPerS?: number;
}

/** Bowers pore pressure, with the effective stress and unloading state used. */
export interface BowersPorePressureResult extends PorePressureResult {
  /** Effective stress from the velocity, psi, before any clipping; NaN where missing. */
  effectiveStressPsi: Float64Array;
  /** σmax, psi; NaN when no unloading zone was given. */
  sigmaMaxPsi: number;
  /** Vmax used, ft/s; NaN when no unloading zone was given. */
  vmaxFtPerS: number;
}

/**
 * Velocity at a depth by linear interpolation in a non-decreasing depth index.
 * @throws ShalepointError E_RANGE when the depth is outside the index, E_MISSING when the
 *   bracketing velocities are NaN
 */
export function velocityAtDepth(tvdFt: ArrayLike<number>, velocityFtPerS: ArrayLike<number>, depthFt: number): number {
  const n = tvdFt.length;
  if (!(n > 0 && depthFt >= tvdFt[0] && depthFt <= tvdFt[n - 1])) {
    throw new ShalepointError("E_RANGE", "onset depth lies outside the well's depth index", {
      param: "unloading.onsetTvdFt",
      value: depthFt,
      unit: "ft",
      allowed: n > 0 ? `[${tvdFt[0]}, ${tvdFt[n - 1]}]` : "a non-empty depth index",
    });
  }
  let j = 0;
  while (j < n - 1 && tvdFt[j] < depthFt) j++;
  let v: number;
  if (tvdFt[j] === depthFt || j === 0) v = velocityFtPerS[j];
  else {
    const z0 = tvdFt[j - 1];
    const z1 = tvdFt[j];
    const t = (depthFt - z0) / (z1 - z0);
    v = velocityFtPerS[j - 1] + t * (velocityFtPerS[j] - velocityFtPerS[j - 1]);
  }
  if (!Number.isFinite(v)) {
    throw new ShalepointError("E_MISSING", "velocity is missing at the onset of unloading", {
      param: "unloading.onsetTvdFt",
      value: depthFt,
      unit: "ft",
      hint: "Give unloading.vmaxFtPerS, or choose an onset depth where the velocity log has data.",
    });
  }
  return v;
}

/**
 * Bowers pore pressure from velocity, virgin branch above the onset of unloading and
 * unloading branch below it.
 *
 * Per sample: σ = ((V − V0)/A)^(1/B) on the virgin branch; below `unloading.onsetTvdFt`
 * and where V < Vmax, σ = σmax[((V − V0)/A)^(1/B)/σmax]^U with σmax = ((Vmax − V0)/A)^(1/B)
 * (flag 64). Where V ≥ Vmax below the onset the rock is loading again: virgin branch.
 * Pp = Sv − σ. V < V0 (no effective stress on the curve) gives Pp = Sv, flagged clipped at
 * overburden. NaN in Sv, Ph or V gives NaN (flag 1).
 *
 * @param input.overburdenPsi Sv per sample, psi (e.g. 10,000 at 10,000 ft)
 * @param input.hydrostaticPsi Ph per sample, psi (for the below-hydrostatic flag)
 * @param input.velocityFtPerS interval velocity per sample, ft/s (e.g. 8000); see velocityFromSlownessLog
 * @param input.a A (> 0, e.g. 10.11); input.b B ((0, 1], e.g. 0.777); input.v0FtPerS V0 (default 5000)
 * @param input.unloading optional {@link BowersUnloadingZone}; needs `tvdFt`
 * @returns ppPsi (psi), flags, warnings, effectiveStressPsi (psi), sigmaMaxPsi, vmaxFtPerS
 * @throws ShalepointError E_RANGE for A ≤ 0, B ∉ (0, 1], V0 ≤ 0, U < 1, Vmax ≤ V0, onset outside
 *   the well; E_LENGTH on length mismatch; E_MISSING when unloading is given without tvdFt
 * @example
 * bowersPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], velocityFtPerS: [8000],
 *   a: 10.11, b: 0.777 }).ppPsi[0] // 8480 psi (σ 1520 psi)
 * @see Bowers 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488, eqs. 1–3 (from memory)
 */
export function bowersPorePressure(
  input: BowersParameters &
    PorePressureLimitOptions & {
      overburdenPsi: ArrayLike<number>;
      hydrostaticPsi: ArrayLike<number>;
      velocityFtPerS: ArrayLike<number>;
      unloading?: BowersUnloadingZone;
    },
): BowersPorePressureResult {
  const { overburdenPsi, hydrostaticPsi, velocityFtPerS, a, b, unloading, tvdFt } = input;
  const v0 = requireBowersParameters(input, unloading?.u);
  const n = velocityFtPerS.length;
  requireLengths(n, { overburdenPsi, hydrostaticPsi, velocityFtPerS });
  checkLimitOptions(n, input);

  let sigmaMax = NaN;
  let vmax = NaN;
  if (unloading !== undefined) {
    if (tvdFt === undefined) {
      throw new ShalepointError("E_MISSING", "an unloading zone needs tvdFt", {
        param: "tvdFt",
        hint: "Pass the well's TVD array so samples below unloading.onsetTvdFt can be found.",
      });
    }
    if (!Number.isFinite(unloading.onsetTvdFt)) {
      throw new ShalepointError("E_RANGE", "unloading.onsetTvdFt must be finite", {
        param: "unloading.onsetTvdFt",
        value: unloading.onsetTvdFt,
        unit: "ft",
      });
    }
    vmax = unloading.vmaxFtPerS ?? velocityAtDepth(tvdFt, velocityFtPerS, unloading.onsetTvdFt);
    if (!(Number.isFinite(vmax) && vmax > v0)) {
      throw new ShalepointError("E_RANGE", "Vmax must exceed V0", {
        param: "unloading.vmaxFtPerS",
        value: vmax,
        unit: "ft/s",
        allowed: `> ${v0}`,
        hint: "The onset of unloading must sit where the velocity exceeds V0.",
      });
    }
    sigmaMax = virginStressRaw(vmax, a, b, v0);
  }

  const raw = new Float64Array(n);
  const sigma = new Float64Array(n);
  const flags = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const sv = overburdenPsi[i];
    const v = velocityFtPerS[i];
    if (!(Number.isFinite(sv) && Number.isFinite(v) && Number.isFinite(hydrostaticPsi[i]))) {
      raw[i] = NaN;
      sigma[i] = NaN;
      flags[i] = PP_FLAG_MISSING_INPUT;
      continue;
    }
    if (v < v0) {
      // Below V0 the curve has no effective stress: σ taken as 0, Pp = Sv, flagged.
      sigma[i] = 0;
      raw[i] = sv;
      flags[i] = PP_FLAG_CLIPPED_AT_OVERBURDEN;
      continue;
    }
    let s: number;
    if (unloading !== undefined && tvdFt !== undefined && tvdFt[i] >= unloading.onsetTvdFt && v < vmax) {
      s = unloadingStressRaw(v, sigmaMax, a, b, unloading.u, v0);
      flags[i] = PP_FLAG_UNLOADING_BRANCH;
    } else {
      s = virginStressRaw(v, a, b, v0);
    }
    sigma[i] = s;
    raw[i] = sv - s;
  }
  const done = finishPorePressure(raw, overburdenPsi, hydrostaticPsi, flags, input, "Bowers", true);
  return { ...done, effectiveStressPsi: sigma, sigmaMaxPsi: sigmaMax, vmaxFtPerS: vmax };
}
