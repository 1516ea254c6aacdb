import { requireRange } from "../errors.js";
import { type StressSeries, commonSeriesLength, seriesValueAt } from "./stressSeries.js";

function requireTensile(args: { tensileStrengthPsi: StressSeries }, n: number): void {
  for (let i = 0; i < n; i++) {
    const t = seriesValueAt(args.tensileStrengthPsi, i);
    if (!Number.isNaN(t)) requireRange(t >= 0, "tensileStrengthPsi", t, ">= 0", "psi");
  }
}

/**
 * Tensile breakdown pressure of a vertical well, non-penetrating fluid (Kirsch).
 *
 * The least hoop stress (θ = 0) reaches −T: Pb = 3 Shmin − SHmax − Pp + T.
 * @param args.shminPsi minimum horizontal stress, psi, e.g. 4300
 * @param args.shmaxPsi maximum horizontal stress, psi, e.g. 6300
 * @param args.ppPsi pore pressure, psi, e.g. 3080
 * @param args.tensileStrengthPsi tensile strength T, psi, ≥ 0, typical 0–1000 (0 for a
 *   pre-existing fracture)
 * @returns breakdown pressure, psi (array of the common input length), NaN carried through
 * @throws ShalepointError E_RANGE for T < 0; E_LENGTH on mismatch
 * @example breakdownPressureNonPenetrating({ shminPsi: 4300, shmaxPsi: 6300, ppPsi: 3080, tensileStrengthPsi: 800 }) // [4320]
 *
 * Reference: Hubbert & Willis 1957, Trans. AIME 210:153–168 (breakdown of an open hole,
 * Kirsch wall stress with tensile strength).
 */
export function breakdownPressureNonPenetrating(args: {
  shminPsi: StressSeries;
  shmaxPsi: StressSeries;
  ppPsi: StressSeries;
  tensileStrengthPsi: StressSeries;
}): Float64Array {
  const n = commonSeriesLength(args);
  requireTensile(args, n);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    out[i] = 3 * seriesValueAt(args.shminPsi, i) - seriesValueAt(args.shmaxPsi, i) - seriesValueAt(args.ppPsi, i) + seriesValueAt(args.tensileStrengthPsi, i);
  }
  return out;
}

/**
 * Poroelastic coefficient η = α (1 − 2ν)/(1 − ν) of the penetrating-fluid breakdown.
 * @param args.biotCoefficient α, [0, 1], typical 0.8–1
 * @param args.poissonRatio ν, (0, 0.5), typical 0.25
 * @returns η, dimensionless, in [0, 1)
 * @throws ShalepointError E_RANGE for α outside [0, 1] or ν outside (0, 0.5)
 * @example poroelasticBreakdownCoefficient({ biotCoefficient: 1, poissonRatio: 0.25 }) // 0.6667
 *
 * Reference: Haimson, B. and Fairhurst, C., 1967, "Initiation and extension of hydraulic
 * fractures in rocks", SPE Journal 7(3):310–318 (from memory).
 */
export function poroelasticBreakdownCoefficient(args: { biotCoefficient: number; poissonRatio: number }): number {
  const { biotCoefficient: a, poissonRatio: nu } = args;
  requireRange(a >= 0 && a <= 1, "biotCoefficient", a, "[0, 1]");
  requireRange(nu > 0 && nu < 0.5, "poissonRatio", nu, "(0, 0.5) exclusive");
  return (a * (1 - 2 * nu)) / (1 - nu);
}

/**
 * Tensile breakdown pressure of a vertical well, penetrating fluid (Haimson–Fairhurst).
 *
 * Pb = (3 Shmin − SHmax + T − η Pp)/(2 − η), η = α (1 − 2ν)/(1 − ν). η = 0 gives
 * (3 Shmin − SHmax + T)/2.
 * @param args.shminPsi, args.shmaxPsi, args.ppPsi stresses and pore pressure, psi
 * @param args.tensileStrengthPsi T ≥ 0, psi
 * @param args.poroelasticCoefficient η in [0, 1], typical 0.5–0.7
 * @returns breakdown pressure, psi, NaN carried through
 * @throws ShalepointError E_RANGE for T < 0 or η outside [0, 1]; E_LENGTH on mismatch
 * @example breakdownPressurePenetrating({ shminPsi: 4300, shmaxPsi: 6300, ppPsi: 3080, tensileStrengthPsi: 800, poroelasticCoefficient: 0.5 }) // [3906.7]
 *
 * Reference: Haimson & Fairhurst 1967, SPE Journal 7(3):310–318 (breakdown equation, from
 * memory).
 */
export function breakdownPressurePenetrating(args: {
  shminPsi: StressSeries;
  shmaxPsi: StressSeries;
  ppPsi: StressSeries;
  tensileStrengthPsi: StressSeries;
  poroelasticCoefficient: number;
}): Float64Array {
  const eta = args.poroelasticCoefficient;
  requireRange(eta >= 0 && eta <= 1, "poroelasticCoefficient", eta, "[0, 1]");
  const { poroelasticCoefficient: _eta, ...series } = args;
  const n = commonSeriesLength(series);
  requireTensile(args, n);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const h = seriesValueAt(args.shminPsi, i);
    const H = seriesValueAt(args.shmaxPsi, i);
    const pp = seriesValueAt(args.ppPsi, i);
    const t = seriesValueAt(args.tensileStrengthPsi, i);
    out[i] = (3 * h - H + t - eta * pp) / (2 - eta);
  }
  return out;
}
