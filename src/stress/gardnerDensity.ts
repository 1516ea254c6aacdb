/**
 * Bulk density from compressional velocity by the Gardner relation.
 *
 * Reference: Gardner, G.H.F., Gardner, L.W. & Gregory, A.R., 1974, "Formation velocity and
 * density — the diagnostic basics for stratigraphic traps", Geophysics 39(6):770–780,
 * doi:10.1190/1.1440465, the velocity–density relation ρ = 0.23·V^0.25 (ρ g/cc, V ft/s);
 * the metric form 0.31·V^0.25 (V m/s) is the same relation rounded (exact 0.23·0.3048^−0.25
 * = 0.3095).
 */

/** Gardner coefficient for V in ft/s and ρ in g/cc (Gardner et al. 1974). */
export const GARDNER_COEFFICIENT_FT_PER_S = 0.23;
/** Gardner exponent (Gardner et al. 1974). */
export const GARDNER_EXPONENT = 0.25;

/** Optional calibration of the Gardner relation (defaults are the published values). */
export interface GardnerCoefficients {
  /** Coefficient a in ρ = a·V^b with V in ft/s; range (0, 1); typical 0.23. */
  coefficient?: number;
  /** Exponent b; range (0, 1); typical 0.25. */
  exponent?: number;
}

/**
 * Gardner bulk density from velocity.
 *
 * Formula: ρ[g/cc] = a · V[ft/s]^b, a = 0.23, b = 0.25 unless given.
 * Missing data: NaN, non-finite or non-positive velocity gives NaN.
 *
 * @param velocityFtPerS compressional velocity, ft/s; range (0, 25,000]; typical 10,000
 * @param coefficient a, see {@link GardnerCoefficients}
 * @param exponent b, see {@link GardnerCoefficients}
 * @returns bulk density, g/cc
 * @example gardnerDensityGcc({ velocityFtPerS: 10000 }) // 2.3000 (0.23 · 10 = 2.300)
 * Reference: Gardner, Gardner & Gregory 1974, Geophysics 39(6):770–780,
 * doi:10.1190/1.1440465 (velocity–density relation).
 */
export function gardnerDensityGcc({
  velocityFtPerS,
  coefficient = GARDNER_COEFFICIENT_FT_PER_S,
  exponent = GARDNER_EXPONENT,
}: { velocityFtPerS: number } & GardnerCoefficients): number {
  return velocityFtPerS > 0 && Number.isFinite(velocityFtPerS) ? coefficient * velocityFtPerS ** exponent : NaN;
}

/**
 * Gardner bulk density from a sonic slowness curve (array form).
 *
 * Formula: V = 10⁶/Δt; ρ = a·V^b (Gardner et al. 1974). NaN slowness gives NaN, sample by
 * sample; the input is not modified.
 *
 * @param slownessUsPerFt compressional slowness, µs/ft; range [40, 240]; typical 100
 * @returns new Float64Array of bulk density, g/cc
 * @example gardnerDensityFromSlowness({ slownessUsPerFt: [100, NaN] }) // Float64Array [2.3, NaN]
 * Reference: Gardner, Gardner & Gregory 1974, Geophysics 39(6):770–780, doi:10.1190/1.1440465.
 */
export function gardnerDensityFromSlowness({
  slownessUsPerFt,
  coefficient = GARDNER_COEFFICIENT_FT_PER_S,
  exponent = GARDNER_EXPONENT,
}: { slownessUsPerFt: ArrayLike<number> } & GardnerCoefficients): Float64Array {
  const out = new Float64Array(slownessUsPerFt.length);
  for (let i = 0; i < out.length; i++) {
    const dt = slownessUsPerFt[i];
    out[i] = dt > 0 && Number.isFinite(dt) ? coefficient * (1e6 / dt) ** exponent : NaN;
  }
  return out;
}
