import { requireRange } from "../errors.js";
import { type StressSeries, commonSeriesLength, seriesValueAt } from "./stressSeries.js";

/** Andersonian faulting regime; `undetermined` where an input is missing. */
export type AndersonRegime = "normal" | "strikeSlip" | "reverse" | "undetermined";

/**
 * Andersonian stress regime from the three principal stresses.
 *
 * Normal: Sv ≥ SHmax ≥ Shmin; strike-slip: SHmax ≥ Sv ≥ Shmin; reverse: SHmax ≥ Shmin ≥ Sv.
 * Ties go to the first listed regime (Sv = SHmax is normal; Shmin = Sv is strike-slip).
 * @param args.svPsi overburden, psi (array or one number)
 * @param args.shminPsi minimum horizontal stress, psi
 * @param args.shmaxPsi maximum horizontal stress, psi, ≥ shminPsi
 * @returns regime per sample
 * @throws ShalepointError E_RANGE when SHmax < Shmin at a sample; E_LENGTH on mismatch
 * @example classifyStressRegime({ svPsi: 10000, shminPsi: 7000, shmaxPsi: 11000 }) // ["strikeSlip"]
 *
 * Reference: Anderson, E.M., 1951, The Dynamics of Faulting and Dyke Formation, 2nd ed.,
 * Oliver & Boyd (regime ordering; common practice, no equation number).
 */
export function classifyStressRegime(args: {
  svPsi: StressSeries;
  shminPsi: StressSeries;
  shmaxPsi: StressSeries;
}): AndersonRegime[] {
  const n = commonSeriesLength(args);
  const out: AndersonRegime[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const sv = seriesValueAt(args.svPsi, i);
    const h = seriesValueAt(args.shminPsi, i);
    const H = seriesValueAt(args.shmaxPsi, i);
    if (!(Number.isFinite(sv) && Number.isFinite(h) && Number.isFinite(H))) {
      out[i] = "undetermined";
      continue;
    }
    requireRange(H >= h, "shmaxPsi", H, `>= shminPsi (${h}) at sample ${i}`, "psi");
    out[i] = sv >= H ? "normal" : sv >= h ? "strikeSlip" : "reverse";
  }
  return out;
}
