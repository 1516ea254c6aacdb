/**
 * Data for a Bowers velocity versus effective-stress crossplot: observed points from a
 * reference pressure, the virgin curve and (optionally) the unloading curve, sampled.
 *
 * Reference: Bowers, G.L., 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488 (from
 * memory): on this crossplot, normally compacted shale follows the virgin curve
 * V = V0 + A σ^B; unloaded shale plots above it at lower σ, on a flatter curve that leaves
 * the virgin curve at (σmax, Vmax).
 *
 * Imports: ../errors.js and the siblings bowersCurves.ts, porePressureFlags.ts.
 */
import { ShalepointError } from "../errors.js";
import {
  requireBowersParameters,
  unloadingVelocityRaw,
  virginStressRaw,
  virginVelocityRaw,
  type BowersParameters,
} from "./bowersCurves.js";
import { requireLengths } from "./porePressureFlags.js";

/** A sampled curve on the crossplot. */
export interface BowersCurveSamples {
  /** Effective stress, psi, increasing. */
  effectiveStressPsi: Float64Array;
  /** Velocity, ft/s. */
  velocityFtPerS: Float64Array;
}

/** Crossplot data set. */
export interface BowersCrossplotData {
  /** Observed points where velocity, Sv and the reference pressure are all present. */
  points: {
    /** Sample index in the well. */
    index: Int32Array;
    /** σ = Sv − Pref, psi. */
    effectiveStressPsi: Float64Array;
    /** Observed velocity, ft/s. */
    velocityFtPerS: Float64Array;
    /**
     * Observed minus virgin-curve velocity at the point's σ, ft/s. Near zero on the virgin
     * curve; clearly positive where σ comes from measured pressures in unloaded rock (the
     * velocity stayed high while σ fell), so the first such points show where unloading starts.
     */
    departureFromVirginFtPerS: Float64Array;
  };
  /** Samples skipped for a missing value or σ ≤ 0. */
  nSkipped: number;
  /** Virgin curve sampled from σ = 0 to the largest σ shown. */
  virginCurve: BowersCurveSamples;
  /** Unloading curve from σ = 0 to σmax; null without `unloading`. */
  unloadingCurve: BowersCurveSamples | null;
  /** σmax, psi (NaN without unloading). */
  sigmaMaxPsi: number;
  /** Vmax, ft/s (NaN without unloading). */
  vmaxFtPerS: number;
}

/**
 * Build the velocity–effective-stress crossplot data for Bowers' method.
 *
 * Points: σ = Sv − Pref at every sample where V, Sv, Pref are finite and σ > 0. Pref is a
 * reference pore pressure on the depth index: hydrostatic in the normally pressured section,
 * or measured pressures (NaN elsewhere). Curves: V = V0 + Aσ^B on `curveSamples` stresses
 * from 0 to 1.1 × max(largest point σ, σmax); unloading V = V0 + A[σmax(σ/σmax)^(1/U)]^B
 * from 0 to σmax.
 *
 * @param input.velocityFtPerS velocity per sample, ft/s (e.g. 6000–14,000)
 * @param input.overburdenPsi Sv per sample, psi
 * @param input.referencePressurePsi Pref per sample, psi (NaN where unknown)
 * @param input.a A (> 0); input.b B ((0, 1]); input.v0FtPerS V0 (default 5000 ft/s)
 * @param input.unloading optional { u ≥ 1, vmaxFtPerS > V0 } to draw the unloading curve
 * @param input.curveSamples number of samples per curve (≥ 2, default 101)
 * @returns {@link BowersCrossplotData}
 * @throws ShalepointError E_RANGE for bad parameters or curveSamples < 2; E_LENGTH on length mismatch
 * @example
 * bowersCrossplot({ velocityFtPerS: [7166], overburdenPsi: [5650], referencePressurePsi: [4650],
 *   a: 10.11, b: 0.777 }).points.effectiveStressPsi[0] // 1000 psi (departure ≈ 0 ft/s)
 * @see Bowers 1995, SPE-27488, velocity vs effective stress plot (from memory)
 */
export function bowersCrossplot(
  input: BowersParameters & {
    velocityFtPerS: ArrayLike<number>;
    overburdenPsi: ArrayLike<number>;
    referencePressurePsi: ArrayLike<number>;
    unloading?: { u: number; vmaxFtPerS: number };
    curveSamples?: number;
  },
): BowersCrossplotData {
  const { velocityFtPerS, overburdenPsi, referencePressurePsi, a, b, unloading } = input;
  const v0 = requireBowersParameters(input, unloading?.u);
  const n = velocityFtPerS.length;
  requireLengths(n, { velocityFtPerS, overburdenPsi, referencePressurePsi });
  const m = input.curveSamples ?? 101;
  if (!(Number.isInteger(m) && m >= 2)) {
    throw new ShalepointError("E_RANGE", "curveSamples must be an integer ≥ 2", { param: "curveSamples", value: m, allowed: "≥ 2" });
  }
  let sigmaMax = NaN;
  let vmax = NaN;
  if (unloading !== undefined) {
    vmax = unloading.vmaxFtPerS;
    if (!(Number.isFinite(vmax) && vmax > v0)) {
      throw new ShalepointError("E_RANGE", "Vmax must exceed V0", { param: "unloading.vmaxFtPerS", value: vmax, unit: "ft/s", allowed: `> ${v0}` });
    }
    sigmaMax = virginStressRaw(vmax, a, b, v0);
  }

  const idx: number[] = [];
  const sig: number[] = [];
  const vel: number[] = [];
  let skipped = 0;
  for (let i = 0; i < n; i++) {
    const v = velocityFtPerS[i];
    const s = overburdenPsi[i] - referencePressurePsi[i];
    if (!(Number.isFinite(v) && Number.isFinite(s) && s > 0)) {
      skipped++;
      continue;
    }
    idx.push(i);
    sig.push(s);
    vel.push(v);
  }
  const dep = new Float64Array(sig.length);
  let sMaxShown = 0;
  for (let k = 0; k < sig.length; k++) {
    dep[k] = vel[k] - virginVelocityRaw(sig[k], a, b, v0);
    if (sig[k] > sMaxShown) sMaxShown = sig[k];
  }
  if (Number.isFinite(sigmaMax) && sigmaMax > sMaxShown) sMaxShown = sigmaMax;
  if (sMaxShown === 0) sMaxShown = 1000; // nothing to show: a nominal 0–1100 psi axis
  const top = 1.1 * sMaxShown;

  const virgin: BowersCurveSamples = { effectiveStressPsi: new Float64Array(m), velocityFtPerS: new Float64Array(m) };
  for (let k = 0; k < m; k++) {
    const s = (top * k) / (m - 1);
    virgin.effectiveStressPsi[k] = s;
    virgin.velocityFtPerS[k] = virginVelocityRaw(s, a, b, v0);
  }
  let unload: BowersCurveSamples | null = null;
  if (unloading !== undefined) {
    unload = { effectiveStressPsi: new Float64Array(m), velocityFtPerS: new Float64Array(m) };
    for (let k = 0; k < m; k++) {
      const s = (sigmaMax * k) / (m - 1);
      unload.effectiveStressPsi[k] = s;
      unload.velocityFtPerS[k] = unloadingVelocityRaw(s, sigmaMax, a, b, unloading.u, v0);
    }
  }
  return {
    points: {
      index: Int32Array.from(idx),
      effectiveStressPsi: Float64Array.from(sig),
      velocityFtPerS: Float64Array.from(vel),
      departureFromVirginFtPerS: dep,
    },
    nSkipped: skipped,
    virginCurve: virgin,
    unloadingCurve: unload,
    sigmaMaxPsi: sigmaMax,
    vmaxFtPerS: vmax,
  };
}
