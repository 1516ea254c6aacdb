import { requireRange } from "../errors.js";
import { type StressSeries, commonSeriesLength, seriesValueAt } from "./stressSeries.js";

function checkStrength(args: { ucsPsi: StressSeries; internalFriction: number }, n: number): number {
  const mu = args.internalFriction;
  requireRange(Number.isFinite(mu) && mu >= 0, "internalFriction", mu, ">= 0 (typical 0.6)");
  for (let i = 0; i < n; i++) {
    const c = seriesValueAt(args.ucsPsi, i);
    if (!Number.isNaN(c)) requireRange(c >= 0, "ucsPsi", c, ">= 0", "psi", `negative UCS at sample ${i}`);
  }
  return (Math.sqrt(mu * mu + 1) + mu) ** 2;
}

/**
 * Breakout (collapse) mud pressure of a vertical well: the least mud pressure at which the
 * wall at θ = 90° from SHmax does not fail in shear (Mohr–Coulomb, Kirsch wall stresses).
 *
 * σ1 = 3σH − σh − ΔP (hoop), σ3 = ΔP (radial), ΔP = Pw − Pp, σH = SHmax − Pp, σh = Shmin − Pp.
 * Mohr–Coulomb σ1 = UCS + q σ3, q = [√(μi² + 1) + μi]², gives
 * Pw = Pp + (3σH − σh − UCS)/(1 + q). A value below Pp means the wall holds with any
 * balanced mud (the window's lower bound is then pore pressure).
 *
 * @param args.shmaxPsi, args.shminPsi, args.ppPsi stresses and pore pressure, psi
 * @param args.ucsPsi unconfined compressive strength, psi, ≥ 0, typical 1000–15,000
 * @param args.internalFriction μi ≥ 0 (tan of the friction angle), typical 0.6
 * @returns mud pressure at breakout onset, psi, NaN carried through
 * @throws ShalepointError E_RANGE for negative UCS or μi < 0; E_LENGTH on mismatch
 * @example breakoutMudPressure({ shmaxPsi: 6300, shminPsi: 4300, ppPsi: 3080, ucsPsi: 3500, internalFriction: 0.6 }) // [4279.2]
 *
 * Reference: Kirsch 1898, Z. VDI 42:797–807 (wall stresses); Mohr–Coulomb criterion in
 * principal stresses as in Jaeger, Cook & Zimmerman 2007, Fundamentals of Rock Mechanics,
 * 4th ed., eq. 4.4 (from memory); breakout onset derivation as in Zoback 2007, Reservoir
 * Geomechanics, ch. 6 (from memory).
 */
export function breakoutMudPressure(args: {
  shmaxPsi: StressSeries;
  shminPsi: StressSeries;
  ppPsi: StressSeries;
  ucsPsi: StressSeries;
  internalFriction: number;
}): Float64Array {
  const { internalFriction: _mu, ...series } = args;
  const n = commonSeriesLength(series);
  const q = checkStrength(args, n);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const pp = seriesValueAt(args.ppPsi, i);
    const sH = seriesValueAt(args.shmaxPsi, i) - pp;
    const sh = seriesValueAt(args.shminPsi, i) - pp;
    out[i] = pp + (3 * sH - sh - seriesValueAt(args.ucsPsi, i)) / (1 + q);
  }
  return out;
}

/**
 * Breakout width at a given mud pressure, vertical well.
 *
 * The wall fails where the Kirsch hoop stress exceeds the Mohr–Coulomb strength at the
 * radial stress ΔP = Pw − Pp:
 * SHmax + Shmin − 2 (SHmax − Shmin) cos 2θ − Pw − Pp ≥ UCS + q ΔP.
 * The failure begins at θb from SHmax with cos 2θb = (SHmax + Shmin − Pw − Pp − UCS − qΔP) /
 * (2 (SHmax − Shmin)); the breakout, centred on Shmin's azimuth, spans wbo = π − 2θb.
 * Returned in degrees: 0 when the wall holds, 180 when it fails all round (or when
 * SHmax = Shmin and the isotropic wall fails).
 *
 * @param args.shmaxPsi, args.shminPsi, args.ppPsi stresses and pore pressure, psi
 * @param args.mudPressurePsi mud pressure Pw, psi
 * @param args.ucsPsi UCS ≥ 0, psi
 * @param args.internalFriction μi ≥ 0, typical 0.6
 * @returns breakout width, degrees, [0, 180], NaN carried through
 * @throws ShalepointError E_RANGE for negative UCS or μi < 0, or SHmax < Shmin
 * @example breakoutWidth({ shmaxPsi: 6300, shminPsi: 4300, ppPsi: 3080, mudPressurePsi: 3080, ucsPsi: 3500, internalFriction: 0.6 }) // [103.6]
 *
 * Reference: Barton, C.A., Zoback, M.D. and Burns, K.L., 1988, "In-situ stress orientation
 * and magnitude at the Fenton geothermal site, New Mexico, determined from wellbore
 * breakouts", Geophysical Research Letters 15(5):467–470 (from memory); Zoback 2007,
 * Reservoir Geomechanics, ch. 6 (wbo = π − 2θb, from memory).
 */
export function breakoutWidth(args: {
  shmaxPsi: StressSeries;
  shminPsi: StressSeries;
  ppPsi: StressSeries;
  mudPressurePsi: StressSeries;
  ucsPsi: StressSeries;
  internalFriction: number;
}): Float64Array {
  const { internalFriction: _mu, ...series } = args;
  const n = commonSeriesLength(series);
  const q = checkStrength(args, n);
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const H = seriesValueAt(args.shmaxPsi, i);
    const h = seriesValueAt(args.shminPsi, i);
    const pp = seriesValueAt(args.ppPsi, i);
    const pw = seriesValueAt(args.mudPressurePsi, i);
    const c = seriesValueAt(args.ucsPsi, i);
    if (![H, h, pp, pw, c].every(Number.isFinite)) {
      out[i] = NaN;
      continue;
    }
    requireRange(H >= h, "shmaxPsi", H, `>= shminPsi (${h}) at sample ${i}`, "psi");
    const excess = H + h - pw - pp - c - q * (pw - pp); // hoop − strength at cos 2θ = 0
    const amp = 2 * (H - h);
    if (amp === 0) {
      out[i] = excess > 0 ? 180 : 0;
      continue;
    }
    const cos2 = excess / amp;
    if (cos2 <= -1) out[i] = 0;
    else if (cos2 >= 1) out[i] = 180;
    else out[i] = 180 - (Math.acos(cos2) * 180) / Math.PI;
  }
  return out;
}
