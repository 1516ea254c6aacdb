import {
  type DepthVaryingCoefficient,
  type FractureEstimate,
  requireOpenInterval,
  requireStressCurves,
  resolveDepthCoefficient,
  stressToGradient,
} from "./stressSeries.js";

/**
 * Eaton (1969) fracture gradient from Poisson's ratio.
 *
 * Uniaxial-strain (no lateral strain) horizontal stress:
 * F = ν/(1−ν) (S/D − P/D) + P/D; in stresses Shmin = ν/(1−ν)(Sv − Pp) + Pp.
 * For 0 < ν < 0.5 the result lies strictly between pore pressure and overburden.
 *
 * @param args.tvdFt depth index, ft TVD below RT, e.g. 12,000
 * @param args.ppPsi pore pressure, psi, e.g. 7488
 * @param args.svPsi overburden, psi, e.g. 11,520
 * @param args.poissonRatio ν, dimensionless, open interval (0, 0.5), typical 0.25–0.47 in
 *   Gulf-Coast-type shales: one number, a table of { depthFt, value } rows (linear in depth,
 *   constant beyond the ends) or a curve aligned to tvdFt (NaN = missing → NaN result)
 * @returns `{ shminPsi, gradientPsiPerFt }`
 * @throws ShalepointError E_RANGE when a finite ν is outside (0, 0.5), naming the depth;
 *   E_LENGTH / E_TABLE for malformed inputs
 * @example eaton1969Fracture({ tvdFt: [12000], ppPsi: [7488], svPsi: [11520], poissonRatio: 0.47 }).gradientPsiPerFt // [0.9220]
 *
 * Reference: Eaton, B.A., 1969, "Fracture gradient prediction and its application in
 * oilfield operations", J. Petroleum Technology 21(10):1353–1360, SPE-2163 (the fracture
 * gradient equation; Poisson's-ratio-vs-depth chart).
 */
export function eaton1969Fracture(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  poissonRatio: DepthVaryingCoefficient;
}): FractureEstimate {
  const { tvdFt, ppPsi, svPsi } = args;
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  const nu = resolveDepthCoefficient({ tvdFt, coefficient: args.poissonRatio, name: "poissonRatio" });
  requireOpenInterval({ values: nu, tvdFt, name: "poissonRatio", lo: 0, hi: 0.5, hint: "Poisson's ratio of rock lies between 0 and 0.5." });
  const shminPsi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const k = nu[i] / (1 - nu[i]);
    shminPsi[i] = k * (svPsi[i] - ppPsi[i]) + ppPsi[i];
  }
  return { shminPsi, gradientPsiPerFt: stressToGradient(shminPsi, tvdFt) };
}
