import { requireRange } from "../errors.js";
import {
  type DepthVaryingCoefficient,
  type FractureEstimate,
  requireOpenInterval,
  requireStressCurves,
  resolveDepthCoefficient,
  stressToGradient,
} from "./stressSeries.js";

/**
 * Daines (1982) fracture pressure: Eaton's uniaxial-strain stress plus a tectonic term.
 *
 * Shmin = ν/(1−ν)(Sv − Pp) + β (Sv − Pp) + Pp, where β·(Sv − Pp) is the superposed
 * tectonic stress, β calibrated at the first leak-off test (see `calibrateFractureModel`).
 * β = 0 returns Eaton 1969.
 *
 * @param args.tvdFt depth index, ft TVD below RT
 * @param args.ppPsi pore pressure, psi
 * @param args.svPsi overburden, psi
 * @param args.poissonRatio ν in (0, 0.5), typical 0.25 (number, table or curve)
 * @param args.tectonicRatio β, dimensionless, [−1, 1], typical 0–0.2
 * @returns `{ shminPsi, gradientPsiPerFt }`, NaN carried through
 * @throws ShalepointError E_RANGE for ν outside (0, 0.5) or β outside [−1, 1]
 * @example dainesFracture({ tvdFt: [1000], ppPsi: [465], svPsi: [1000], poissonRatio: 0.25, tectonicRatio: 0.1 }).gradientPsiPerFt // [0.6968]
 *
 * Reference: Daines, S.R., 1982, "Prediction of fracture pressures for wildcat wells",
 * J. Petroleum Technology 34(4):863–872 (from memory; the superposed tectonic stress
 * equation).
 */
export function dainesFracture(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  poissonRatio: DepthVaryingCoefficient;
  tectonicRatio: number;
}): FractureEstimate {
  const { tvdFt, ppPsi, svPsi, tectonicRatio } = args;
  requireRange(tectonicRatio >= -1 && tectonicRatio <= 1, "tectonicRatio", tectonicRatio, "[-1, 1]");
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  const nu = resolveDepthCoefficient({ tvdFt, coefficient: args.poissonRatio, name: "poissonRatio" });
  requireOpenInterval({ values: nu, tvdFt, name: "poissonRatio", lo: 0, hi: 0.5 });
  const shminPsi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const eff = svPsi[i] - ppPsi[i];
    shminPsi[i] = (nu[i] / (1 - nu[i])) * eff + tectonicRatio * eff + ppPsi[i];
  }
  return { shminPsi, gradientPsiPerFt: stressToGradient(shminPsi, tvdFt) };
}
