import { requireRange } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";

/** Leak-off (or formation-integrity) test reduced to an equivalent mud weight. */
export interface LeakOffEmw {
  /** Downhole pressure at the shoe, psi = mud hydrostatic + surface pressure. */
  downholePressurePsi: number;
  /** Equivalent mud weight, psi/ft. */
  emwPsiPerFt: number;
  /** Equivalent mud weight, ppg (exact factor 12/231 psi/ft per ppg). */
  emwPpg: number;
}

/**
 * Leak-off test equivalent mud weight.
 *
 * EMW_LOT = MW + P_surface / (c · D_shoe), c = 12/231 psi/ft per ppg exactly (the field
 * rounding is 0.052; results differ by 0.1 %).
 * @param args.mudWeightPpg mud weight in the hole during the test, ppg, (0, 25), e.g. 10.0
 * @param args.surfacePressurePsi surface (leak-off) pressure, psi, ≥ 0, e.g. 1040
 * @param args.shoeTvdFt casing shoe true vertical depth, ft, > 0, e.g. 4000
 * @returns `{ downholePressurePsi, emwPsiPerFt, emwPpg }`
 * @throws ShalepointError E_RANGE for a non-positive depth, negative surface pressure or a
 *   mud weight outside (0, 25) ppg
 * @example leakOffEquivalentMudWeight({ mudWeightPpg: 10, surfacePressurePsi: 1040, shoeTvdFt: 4000 }).emwPpg // 15.005 (15.00 with 0.052)
 *
 * Reference: common practice, no source (leak-off EMW arithmetic of drilling handbooks).
 */
export function leakOffEquivalentMudWeight(args: {
  mudWeightPpg: number;
  surfacePressurePsi: number;
  shoeTvdFt: number;
}): LeakOffEmw {
  const { mudWeightPpg, surfacePressurePsi, shoeTvdFt } = args;
  requireRange(mudWeightPpg > 0 && mudWeightPpg < 25, "mudWeightPpg", mudWeightPpg, "(0, 25)", "ppg");
  requireRange(surfacePressurePsi >= 0, "surfacePressurePsi", surfacePressurePsi, ">= 0", "psi");
  requireRange(shoeTvdFt > 0, "shoeTvdFt", shoeTvdFt, "> 0", "ft");
  const emwPpg = mudWeightPpg + surfacePressurePsi / (PSI_PER_FT_PER_PPG * shoeTvdFt);
  const emwPsiPerFt = emwPpg * PSI_PER_FT_PER_PPG;
  return { downholePressurePsi: emwPsiPerFt * shoeTvdFt, emwPsiPerFt, emwPpg };
}

/**
 * Maximum allowable annular surface pressure from a leak-off EMW.
 *
 * MAASP = (EMW_LOT − MW) · c · D_shoe, c = 12/231 psi/ft per ppg.
 * @param args.leakOffEmwPpg leak-off EMW at the shoe, ppg, e.g. 15.0
 * @param args.mudWeightPpg current mud weight, ppg, e.g. 12.0
 * @param args.shoeTvdFt shoe TVD, ft, > 0, e.g. 4000
 * @returns pressure, psi (negative when the mud already exceeds the leak-off EMW)
 * @throws ShalepointError E_RANGE for a non-positive depth
 * @example maximumAllowableSurfacePressure({ leakOffEmwPpg: 15, mudWeightPpg: 12, shoeTvdFt: 4000 }) // 623.4 (624.0 with 0.052)
 *
 * Reference: common practice, no source.
 */
export function maximumAllowableSurfacePressure(args: {
  leakOffEmwPpg: number;
  mudWeightPpg: number;
  shoeTvdFt: number;
}): number {
  requireRange(args.shoeTvdFt > 0, "shoeTvdFt", args.shoeTvdFt, "> 0", "ft");
  return (args.leakOffEmwPpg - args.mudWeightPpg) * PSI_PER_FT_PER_PPG * args.shoeTvdFt;
}
