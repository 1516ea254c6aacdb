/**
 * Hydrostatic (normal) pore pressure of a brine column.
 *
 * Offshore the brine column starts at mean sea level: P = G·TVDSS, zero above sea level
 * (in the air gap). Onshore (waterDepthFt = 0) it starts at ground level, taken as the
 * water table. G is a gradient in psi/ft; from a brine density, G = ρ·g
 * (0.43353 psi/ft per g/cc). Reference: hydrostatic pressure of a fluid column, e.g.
 * Zoback 2007, Reservoir Geomechanics (Cambridge UP), ch. 1 (P = ρ_w g z).
 */
import { PSI_PER_FT_PER_GCC } from "../units/index.js";
import { requireRange } from "../errors.js";
import type { Datums } from "../well/types.js";

/** TVD below the rotary table where the hydrostatic column starts, ft. */
function brineColumnTopTvdFt(datums: Datums): number {
  if (datums.waterDepthFt > 0) return datums.rtElevationFt;
  return datums.rtElevationFt - (datums.groundLevelFt ?? 0);
}

/**
 * Hydrostatic pore pressure for a chosen brine gradient (array form).
 *
 * Formula: P = G · max(0, TVD − TVD_top), TVD_top = rotary-table elevation offshore
 * (sea level) or RT − ground level onshore. NaN depth gives NaN.
 *
 * @param tvdFt TVD below the rotary table, ft; typical 0–25,000
 * @param datums well datums (rtElevationFt, waterDepthFt, groundLevelFt)
 * @param gradientPsiPerFt brine gradient, psi/ft; range [0.40, 0.55]; typical 0.465
 * @returns new Float64Array of pressure, psi
 * @throws ShalepointError E_RANGE when the gradient is outside [0.3, 0.6] psi/ft or not finite
 * @example hydrostaticPressure({ tvdFt: [82, 10082], datums: { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 }, gradientPsiPerFt: 0.465 }) // [0, 4650]
 * Reference: Zoback 2007, Reservoir Geomechanics, ch. 1 (hydrostatic column).
 */
export function hydrostaticPressure({
  tvdFt,
  datums,
  gradientPsiPerFt,
}: {
  tvdFt: ArrayLike<number>;
  datums: Datums;
  gradientPsiPerFt: number;
}): Float64Array {
  requireRange(
    Number.isFinite(gradientPsiPerFt) && gradientPsiPerFt >= 0.3 && gradientPsiPerFt <= 0.6,
    "gradientPsiPerFt",
    gradientPsiPerFt,
    "[0.3, 0.6]",
    "psi/ft",
    "A brine gradient is about 0.433 (fresh water) to 0.47 psi/ft; give psi/ft, not ppg.",
  );
  const top = brineColumnTopTvdFt(datums);
  const out = new Float64Array(tvdFt.length);
  for (let i = 0; i < out.length; i++) {
    const h = tvdFt[i] - top;
    out[i] = h > 0 ? gradientPsiPerFt * h : h <= 0 ? 0 : NaN;
  }
  return out;
}

/**
 * Hydrostatic pore pressure for a chosen brine density (array form).
 *
 * Formula: G = ρ · 0.43353 psi/ft per g/cc (ρ·g, g = 9.80665 m/s²), then as
 * {@link hydrostaticPressure}.
 *
 * @param tvdFt TVD below the rotary table, ft
 * @param datums well datums
 * @param brineDensityGcc brine density, g/cc; range [0.7, 1.38]; typical 1.07
 * @returns new Float64Array of pressure, psi
 * @throws ShalepointError E_RANGE when the density is outside [0.692, 1.384] g/cc
 * @example hydrostaticPressureFromBrineDensity({ tvdFt: [3362], datums: { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 }, brineDensityGcc: 1.0 }) // [1421.98] (3280 ft × 0.43353)
 * Reference: Zoback 2007, Reservoir Geomechanics, ch. 1 (P = ρ g z).
 */
export function hydrostaticPressureFromBrineDensity({
  tvdFt,
  datums,
  brineDensityGcc,
}: {
  tvdFt: ArrayLike<number>;
  datums: Datums;
  brineDensityGcc: number;
}): Float64Array {
  requireRange(
    Number.isFinite(brineDensityGcc) &&
      brineDensityGcc * PSI_PER_FT_PER_GCC >= 0.3 &&
      brineDensityGcc * PSI_PER_FT_PER_GCC <= 0.6,
    "brineDensityGcc",
    brineDensityGcc,
    "[0.692, 1.384] (a gradient of 0.3–0.6 psi/ft)",
    "g/cc",
    "Give the brine density in g/cc (typical 1.03–1.08).",
  );
  return hydrostaticPressure({ tvdFt, datums, gradientPsiPerFt: brineDensityGcc * PSI_PER_FT_PER_GCC });
}
