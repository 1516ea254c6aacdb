import { requireRange } from "../errors.js";
import { requireStressCurves } from "./stressSeries.js";

/**
 * Frictional-faulting limit ratio q(μ) = [√(μ² + 1) + μ]².
 *
 * On an optimally oriented, cohesionless fault the effective principal stresses cannot
 * exceed (S1 − Pp)/(S3 − Pp) = q. μ = 0 gives q = 1 (no differential stress).
 * @param mu sliding friction coefficient, ≥ 0, typical 0.6 (Byerlee range 0.6–1.0)
 * @returns q, dimensionless (3.119 at μ = 0.6)
 * @throws ShalepointError E_RANGE when μ < 0 or not finite
 * @example frictionalStressRatio(0.6) // 3.1191
 *
 * Reference: Jaeger, J.C. and Cook, N.G.W., Fundamentals of Rock Mechanics (frictional
 * sliding limit); Zoback, M.D., 2007, Reservoir Geomechanics, Cambridge UP, ch. 4, eq. 4.45
 * (from memory for the equation number).
 */
export function frictionalStressRatio(mu: number): number {
  requireRange(Number.isFinite(mu) && mu >= 0, "frictionCoefficient", mu, ">= 0 (typical 0.6)");
  return (Math.sqrt(mu * mu + 1) + mu) ** 2;
}

/** Allowed ranges of the two horizontal stresses in one Andersonian regime, psi. */
export interface RegimeStressRange {
  shminMinPsi: Float64Array;
  shminMaxPsi: Float64Array;
  shmaxMinPsi: Float64Array;
  shmaxMaxPsi: Float64Array;
}

/** Frictional bounds at every depth, for each regime. */
export interface FrictionalStressBounds {
  /** q used. */
  ratio: number;
  /** Normal faulting: Sv ≥ SHmax ≥ Shmin ≥ Pp + (Sv − Pp)/q. */
  normal: RegimeStressRange;
  /** Strike-slip: SHmax ≥ Sv ≥ Shmin; SHmax ≤ Pp + q (Shmin − Pp). Ranges are the envelope. */
  strikeSlip: RegimeStressRange;
  /** Reverse: Pp + q (Sv − Pp) ≥ SHmax ≥ Shmin ≥ Sv. */
  reverse: RegimeStressRange;
}

/**
 * Frictional-faulting bounds on the horizontal stresses along a well.
 *
 * Normal: Shmin ≥ (Sv − Pp)/q + Pp, SHmax ∈ [Shmin, Sv]. Reverse: SHmax ≤ q (Sv − Pp) + Pp,
 * Shmin ∈ [Sv, SHmax]. Strike-slip: Shmin ∈ [(Sv − Pp)/q + Pp, Sv], SHmax ∈ [Sv, q(Shmin − Pp)
 * + Pp], whose envelope reaches q (Sv − Pp) + Pp when Shmin = Sv. Ranges here are the
 * envelopes per regime (the joint constraint is the polygon of {@link stressPolygon}).
 * Where Pp ≥ Sv every bound equals Sv (no admissible differential stress).
 *
 * @param args.tvdFt depth index, ft TVD (only its length is used)
 * @param args.ppPsi pore pressure, psi
 * @param args.svPsi overburden, psi
 * @param args.frictionCoefficient μ ≥ 0, default 0.6
 * @returns `{ ratio, normal, strikeSlip, reverse }` arrays in psi, NaN carried through
 * @throws ShalepointError E_RANGE for μ < 0; E_LENGTH on length mismatch
 * @example frictionalStressBounds({ tvdFt: [9843], ppPsi: [4351], svPsi: [10008] }).normal.shminMinPsi // [6165] (42.50 MPa)
 *
 * Reference: Zoback 2007, Reservoir Geomechanics, Cambridge UP, ch. 4 (frictional limits
 * and stress polygon, eq. 4.45, from memory); Anderson, E.M., 1951, The Dynamics of Faulting.
 */
export function frictionalStressBounds(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  frictionCoefficient?: number;
}): FrictionalStressBounds {
  const { tvdFt, ppPsi, svPsi } = args;
  const q = frictionalStressRatio(args.frictionCoefficient ?? 0.6);
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  const mk = (): RegimeStressRange => ({
    shminMinPsi: new Float64Array(n),
    shminMaxPsi: new Float64Array(n),
    shmaxMinPsi: new Float64Array(n),
    shmaxMaxPsi: new Float64Array(n),
  });
  const normal = mk();
  const strikeSlip = mk();
  const reverse = mk();
  for (let i = 0; i < n; i++) {
    const sv = svPsi[i];
    const pp = ppPsi[i];
    const eff = Math.max(sv - pp, 0);
    const lo = pp + eff / q;
    const hi = pp + q * eff;
    const missing = Number.isNaN(sv) || Number.isNaN(pp);
    const lower = missing ? NaN : eff > 0 ? lo : sv;
    const upper = missing ? NaN : eff > 0 ? hi : sv;
    normal.shminMinPsi[i] = lower;
    const s = missing ? NaN : sv;
    normal.shminMaxPsi[i] = s;
    normal.shmaxMinPsi[i] = lower;
    normal.shmaxMaxPsi[i] = s;
    strikeSlip.shminMinPsi[i] = lower;
    strikeSlip.shminMaxPsi[i] = s;
    strikeSlip.shmaxMinPsi[i] = s;
    strikeSlip.shmaxMaxPsi[i] = upper;
    reverse.shminMinPsi[i] = s;
    reverse.shminMaxPsi[i] = upper;
    reverse.shmaxMinPsi[i] = s;
    reverse.shmaxMaxPsi[i] = upper;
  }
  return { ratio: q, normal, strikeSlip, reverse };
}

/** A vertex of the stress polygon, psi (or the caller's stress unit). */
export interface StressPolygonVertex {
  shminPsi: number;
  shmaxPsi: number;
}

/** The allowed (Shmin, SHmax) region at one depth, for a figure. */
export interface StressPolygon {
  ratio: number;
  /** Lowest admissible Shmin (normal-faulting limit). */
  shminLowerPsi: number;
  /** Highest admissible SHmax (reverse-faulting limit). */
  shmaxUpperPsi: number;
  /** Outline, counter-clockwise from (lower, lower); not repeated at the end. */
  outline: StressPolygonVertex[];
  /** Triangles of the three regimes (each 3 vertices). */
  normal: StressPolygonVertex[];
  strikeSlip: StressPolygonVertex[];
  reverse: StressPolygonVertex[];
}

/**
 * Stress polygon: the region of (Shmin, SHmax) allowed by frictional faulting at one depth.
 *
 * With L = Pp + (Sv − Pp)/q and U = Pp + q (Sv − Pp), the region above SHmax = Shmin is the
 * quadrilateral (L, L), (L, Sv), (Sv, U), (U, U); the strike-slip line SHmax = Pp + q (Shmin −
 * Pp) joins (L, Sv) to (Sv, U). Regime triangles: normal (L,L)(L,Sv)(Sv,Sv); strike-slip
 * (L,Sv)(Sv,U)(Sv,Sv); reverse (Sv,Sv)(Sv,U)(U,U).
 *
 * Works in any consistent stress unit (the names say psi; MPa in gives MPa out).
 * @param args.svPsi overburden, e.g. 82.5 (MPa) or 11,966 psi
 * @param args.ppPsi pore pressure, < Sv, e.g. 69.7 (MPa)
 * @param args.frictionCoefficient μ ≥ 0, default 0.6
 * @returns outline and regime triangles
 * @throws ShalepointError E_RANGE when Pp ≥ Sv, values are not finite, or μ < 0
 * @example stressPolygon({ svPsi: 82.5, ppPsi: 69.7 }) // shminLowerPsi 73.80, shmaxUpperPsi 109.6 (MPa in, MPa out)
 *
 * Reference: Zoback 2007, Reservoir Geomechanics, ch. 4 (stress polygon, from memory).
 */
export function stressPolygon(args: { svPsi: number; ppPsi: number; frictionCoefficient?: number }): StressPolygon {
  const { svPsi: sv, ppPsi: pp } = args;
  const q = frictionalStressRatio(args.frictionCoefficient ?? 0.6);
  requireRange(Number.isFinite(sv) && Number.isFinite(pp) && pp < sv, "ppPsi", pp, `finite and < svPsi (${sv})`, "psi");
  const L = pp + (sv - pp) / q;
  const U = pp + q * (sv - pp);
  const v = (shminPsi: number, shmaxPsi: number): StressPolygonVertex => ({ shminPsi, shmaxPsi });
  return {
    ratio: q,
    shminLowerPsi: L,
    shmaxUpperPsi: U,
    outline: [v(L, L), v(U, U), v(sv, U), v(L, sv)],
    normal: [v(L, L), v(sv, sv), v(L, sv)],
    strikeSlip: [v(L, sv), v(sv, sv), v(sv, U)],
    reverse: [v(sv, sv), v(U, U), v(sv, U)],
  };
}
