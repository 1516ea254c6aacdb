import { requireRange } from "../errors.js";
import {
  type DepthVaryingCoefficient,
  type FractureEstimate,
  coefficientAtDepth,
  requireStressCurves,
  stressToGradient,
} from "./stressSeries.js";

/** Matthews–Kelly result: the fracture estimate plus the depth each Ki was read at. */
export interface MatthewsKellyEstimate extends FractureEstimate {
  /** Equivalent normally-pressured depth Di, ft, where Ki was read. */
  kiDepthFt: Float64Array;
  /** Matrix-stress coefficient Ki used at each sample. */
  ki: Float64Array;
}

/**
 * Matthews & Kelly (1967) fracture gradient with a matrix-stress coefficient.
 *
 * F = Ki σ/D + P/D with σ = S − P (vertical effective stress). Ki is read not at the
 * sample's depth but at Di, the depth where normally pressured rock carries the same σ:
 * Di = σ / (S/D − Pn/D), S/D the sample's overburden gradient, Pn/D the normal gradient.
 *
 * @param args.tvdFt depth index, ft TVD below RT (> 0), e.g. 11,000
 * @param args.ppPsi pore pressure, psi, e.g. 8085
 * @param args.svPsi overburden, psi, e.g. 11,000
 * @param args.normalGradientPsiPerFt normal (hydrostatic) pore gradient, psi/ft, (0.3, 0.6),
 *   typical 0.465
 * @param args.matrixStressCoefficient Ki (dimensionless, [0, 1], typical 0.4–0.95) as one
 *   number, a table of { depthFt, value } vs normally-pressured depth (linear, constant beyond
 *   the ends), or a curve on tvdFt interpolated at Di (constant beyond the ends)
 * @returns `{ shminPsi, gradientPsiPerFt, kiDepthFt, ki }`, NaN carried through
 * @throws ShalepointError E_RANGE for a normal gradient outside (0.3, 0.6) or a Ki outside [0, 1]
 * @example matthewsKellyFracture({ tvdFt: [11000], ppPsi: [8085], svPsi: [11000], normalGradientPsiPerFt: 0.465, matrixStressCoefficient: 0.8 })
 *   // kiDepthFt [5449], gradientPsiPerFt [0.9470]
 *
 * Reference: Matthews, W.R. and Kelly, J., 1967, "How to predict formation pressure and
 * fracture gradient", Oil & Gas Journal 65 (from memory; the Ki equation and the Ki-vs-depth
 * chart read at the equivalent normally pressured depth).
 */
export function matthewsKellyFracture(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  normalGradientPsiPerFt: number;
  matrixStressCoefficient: DepthVaryingCoefficient;
}): MatthewsKellyEstimate {
  const { tvdFt, ppPsi, svPsi, normalGradientPsiPerFt: pn, matrixStressCoefficient } = args;
  requireRange(pn > 0.3 && pn < 0.6, "normalGradientPsiPerFt", pn, "(0.3, 0.6)", "psi/ft");
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  const shminPsi = new Float64Array(n);
  const kiDepthFt = new Float64Array(n);
  const ki = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const d = tvdFt[i];
    const sigma = svPsi[i] - ppPsi[i];
    const sGrad = d > 0 ? svPsi[i] / d : NaN;
    const di = sGrad > pn ? sigma / (sGrad - pn) : NaN;
    kiDepthFt[i] = di;
    const k = coefficientAtDepth({ tvdFt, coefficient: matrixStressCoefficient, name: "matrixStressCoefficient", depthFt: di });
    if (Number.isFinite(k)) requireRange(k >= 0 && k <= 1, "matrixStressCoefficient", k, "[0, 1]");
    ki[i] = k;
    shminPsi[i] = k * sigma + ppPsi[i];
  }
  return { shminPsi, gradientPsiPerFt: stressToGradient(shminPsi, tvdFt), kiDepthFt, ki };
}
