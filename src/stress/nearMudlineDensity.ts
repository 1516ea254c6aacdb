/**
 * Near-mudline overburden from a power-law **average** sediment density (deepwater).
 *
 * Reference: Traugott, M., 1997, "Pore/fracture pressure determinations in deep water",
 * World Oil 218(8) (details from memory), reproduced in Zhang, J., 2019, Applied Petroleum
 * Geomechanics (Gulf Professional Publishing), eqs. 6.4–6.6:
 *   ρa[ppg] = 16.3 + (D_bml[ft] / 3125)^0.6
 *   Sv[psi] = (ρw[ppg]·Zw[ft] + ρa[ppg]·D_bml[ft]) / 19.25
 * ρa is the average density of the whole sediment column between the mudline and D_bml,
 * not the density at D_bml: Sv follows from ρa·D directly and ρa must never be integrated as
 * a point density. 1/19.25 = 12/231 psi/ft per ppg exactly.
 */
import { PSI_PER_FT_PER_PPG } from "../units/index.js";

/**
 * Average sediment density between the mudline and a depth (power-law form).
 *
 * Formula: ρa = 16.3 + (D/3125)^0.6 ppg (Traugott 1997; Zhang 2019 eq. 6.4–6.6).
 * Missing data: NaN or negative depth gives NaN.
 *
 * @param bmlFt depth below mudline, ft; range [0, 20,000]; typical 5000
 * @returns column-average density, ppg
 * @example powerLawAverageDensityPpg(3125) // 17.30
 * Reference: Traugott 1997, World Oil 218(8) (from memory); Zhang 2019, Applied Petroleum
 * Geomechanics, eqs. 6.4–6.6.
 */
export function powerLawAverageDensityPpg(bmlFt: number): number {
  return bmlFt >= 0 ? 16.3 + (bmlFt / 3125) ** 0.6 : NaN;
}

/**
 * Point (local) density implied by the power-law average density.
 *
 * Formula: the sediment stress is ρa(D)·D, so the point density is its derivative,
 * ρ(D) = d(ρa·D)/dD = 16.3 + 1.6·(D/3125)^0.6 ppg — larger than ρa below the mudline.
 * Used only to report the density implied by the fill; the stress itself comes from ρa·D.
 *
 * @param bmlFt depth below mudline, ft; range [0, 20,000]; typical 5000
 * @returns point density, ppg
 * @example powerLawPointDensityPpg(3125) // 17.90
 * Reference: derivative of Traugott 1997 / Zhang 2019 eqs. 6.4–6.6.
 */
export function powerLawPointDensityPpg(bmlFt: number): number {
  return bmlFt >= 0 ? 16.3 + 1.6 * (bmlFt / 3125) ** 0.6 : NaN;
}

/**
 * Overburden stress from the water column plus the power-law sediment column.
 *
 * Formula: Sv = (ρw·Zw + ρa(D)·D) / 19.25 psi, ρ in ppg, depths in ft.
 *
 * @param bmlFt depth below mudline, ft; range [0, 20,000]; typical 6920
 * @param waterDepthFt water depth, ft; range [0, 12,000]; typical 3000
 * @param seawaterPpg seawater density, ppg; range [8.3, 9.0]; typical 8.6
 * @returns overburden stress, psi (the air gap contributes nothing)
 * @throws nothing; NaN in gives NaN out
 * @example powerLawOverburdenPsi({ bmlFt: 6920, waterDepthFt: 3000, seawaterPpg: 8.6 }) // 7779
 * Reference: Traugott 1997, World Oil 218(8) (from memory); Zhang 2019, Applied Petroleum
 * Geomechanics, eqs. 6.4–6.6.
 */
export function powerLawOverburdenPsi({
  bmlFt,
  waterDepthFt,
  seawaterPpg,
}: {
  bmlFt: number;
  waterDepthFt: number;
  seawaterPpg: number;
}): number {
  return (seawaterPpg * waterDepthFt + powerLawAverageDensityPpg(bmlFt) * bmlFt) * PSI_PER_FT_PER_PPG;
}
