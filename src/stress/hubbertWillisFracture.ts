import { requireRange } from "../errors.js";
import { type FractureEstimate, requireStressCurves, stressToGradient } from "./stressSeries.js";

/** Hubbert & Willis (1957) lower effective-stress ratio, k = 1/3. */
export const HUBBERT_WILLIS_MIN_RATIO = 1 / 3;
/** Hubbert & Willis (1957) upper effective-stress ratio, k = 1/2. */
export const HUBBERT_WILLIS_MAX_RATIO = 1 / 2;

/** Both Hubbert–Willis bounds on a depth index. */
export interface HubbertWillisBounds {
  /** Lower bound (k = 1/3). */
  min: FractureEstimate;
  /** Upper bound (k = 1/2). */
  max: FractureEstimate;
}

/**
 * Hubbert–Willis fracture gradient bounds.
 *
 * The minimum principal stress in a relaxed (normal-faulting) basin lies between one third
 * and one half of the effective overburden above pore pressure:
 * F = P/D + k (S/D − P/D), k = 1/3 (min) and 1/2 (max); in stresses Shmin = Pp + k (Sv − Pp).
 *
 * @param args.tvdFt depth index, ft TVD below RT (> 0 for a gradient), e.g. 10,000
 * @param args.ppPsi pore pressure, psi, e.g. 4650
 * @param args.svPsi overburden (vertical stress), psi, e.g. 10,000
 * @returns `{ min, max }`, each `{ shminPsi, gradientPsiPerFt }`; NaN carried through
 * @throws ShalepointError E_LENGTH when the arrays differ in length
 * @example hubbertWillisFractureBounds({ tvdFt: [10000], ppPsi: [7350], svPsi: [10000] })
 *   // min.gradientPsiPerFt [0.8233], max.gradientPsiPerFt [0.8675]
 *
 * Reference: Hubbert, M.K. and Willis, D.G., 1957, "Mechanics of hydraulic fracturing",
 * Trans. AIME 210:153–168 (the bound equation, in the gradient form above).
 */
export function hubbertWillisFractureBounds(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
}): HubbertWillisBounds {
  return {
    min: effectiveStressRatioFracture({ ...args, stressRatio: HUBBERT_WILLIS_MIN_RATIO }),
    max: effectiveStressRatioFracture({ ...args, stressRatio: HUBBERT_WILLIS_MAX_RATIO }),
  };
}

/**
 * Fracture pressure from an effective-stress ratio (the Hubbert–Willis form with any k).
 *
 * Shmin = Pp + K (Sv − Pp). K = 1/3…1/2 reproduces Hubbert & Willis; K = ν/(1−ν) is
 * Eaton 1969; a K fitted to leak-off tests is the calibrated form.
 * @param args.stressRatio K, dimensionless, [0, 1], typical 0.3–0.9
 * @returns `{ shminPsi, gradientPsiPerFt }`, NaN carried through
 * @throws ShalepointError E_RANGE when K is outside [0, 1]; E_LENGTH on length mismatch
 * @example effectiveStressRatioFracture({ tvdFt: [1000], ppPsi: [465], svPsi: [1000], stressRatio: 1 / 3 }).shminPsi // [643.33]
 *
 * Reference: Hubbert & Willis 1957, Trans. AIME 210:153–168 (bound equation with general k).
 */
export function effectiveStressRatioFracture(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  stressRatio: number;
}): FractureEstimate {
  const { tvdFt, ppPsi, svPsi, stressRatio } = args;
  requireRange(stressRatio >= 0 && stressRatio <= 1, "stressRatio", stressRatio, "[0, 1]");
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  const shminPsi = new Float64Array(n);
  for (let i = 0; i < n; i++) shminPsi[i] = ppPsi[i] + stressRatio * (svPsi[i] - ppPsi[i]);
  return { shminPsi, gradientPsiPerFt: stressToGradient(shminPsi, tvdFt) };
}
