import { type StressSeries, commonSeriesLength, seriesValueAt } from "./stressSeries.js";

/** Effective stresses at the wall of a vertical well, psi. */
export interface KirschWallStress {
  /** Effective hoop stress σθθ − Pp, psi (compression positive). */
  hoopEffectivePsi: Float64Array;
  /** Effective radial stress σrr − Pp = Pw − Pp, psi. */
  radialEffectivePsi: Float64Array;
}

/**
 * Kirsch wall stresses around a vertical well in an elastic, impermeable wall.
 *
 * σθθ − Pp = SHmax + Shmin − 2 (SHmax − Shmin) cos 2θ − Pw − Pp, σrr − Pp = Pw − Pp, with θ
 * measured from the SHmax azimuth (thermal and poroelastic terms omitted). The hoop stress
 * peaks at θ = 90° (3 SHmax − Shmin − Pw − Pp, where breakouts form) and is least at θ = 0°
 * (3 Shmin − SHmax − Pw − Pp, where tensile fractures open). For a uniaxial far field σ
 * (Shmin = Pp = Pw = 0) the extremes are 3σ and −σ.
 *
 * @param args.shmaxPsi maximum horizontal stress, psi, e.g. 6300
 * @param args.shminPsi minimum horizontal stress, psi, e.g. 4300
 * @param args.ppPsi pore pressure, psi, e.g. 3080
 * @param args.mudPressurePsi wellbore (mud) pressure, psi, e.g. 3640
 * @param args.thetaDeg angle from the SHmax azimuth, degrees
 * @returns `{ hoopEffectivePsi, radialEffectivePsi }`; arrays of the common input length
 *   (numbers broadcast), NaN carried through
 * @throws ShalepointError E_LENGTH when two array inputs differ in length
 * @example kirschWallStress({ shmaxPsi: 6300, shminPsi: 4300, ppPsi: 3080, mudPressurePsi: 3080, thetaDeg: 90 }).hoopEffectivePsi // [8440]
 *
 * Reference: Kirsch, E.G., 1898, "Die Theorie der Elastizität und die Bedürfnisse der
 * Festigkeitslehre", Zeitschrift des Vereines deutscher Ingenieure 42:797–807; wall form as
 * in Zoback 2007, Reservoir Geomechanics, ch. 6, eq. 6.1 (from memory).
 */
export function kirschWallStress(args: {
  shmaxPsi: StressSeries;
  shminPsi: StressSeries;
  ppPsi: StressSeries;
  mudPressurePsi: StressSeries;
  thetaDeg: StressSeries;
}): KirschWallStress {
  const n = commonSeriesLength(args);
  const hoopEffectivePsi = new Float64Array(n);
  const radialEffectivePsi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const H = seriesValueAt(args.shmaxPsi, i);
    const h = seriesValueAt(args.shminPsi, i);
    const pp = seriesValueAt(args.ppPsi, i);
    const pw = seriesValueAt(args.mudPressurePsi, i);
    const theta = (seriesValueAt(args.thetaDeg, i) * Math.PI) / 180;
    hoopEffectivePsi[i] = H + h - 2 * (H - h) * Math.cos(2 * theta) - pw - pp;
    radialEffectivePsi[i] = pw - pp;
  }
  return { hoopEffectivePsi, radialEffectivePsi };
}
