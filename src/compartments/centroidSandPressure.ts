/**
 * Centroid effect: pressure in a dipping, connected sand against the surrounding shale.
 *
 * Pure; imports only `errors`.
 */
import { ShalepointError, type Warning } from "../errors.js";

/** Arguments of {@link centroidSandPressure}. */
export interface CentroidSandPressureInput {
  /** TVD of the structural crest (top of the sand), ft. Typical 9000 ft. */
  crestTvdFt: number;
  /** TVD of the deepest point of the sand (base of structure), ft, > crest. Typical 11,000 ft. */
  baseTvdFt: number;
  /**
   * TVD of the centroid, ft, within [crest, base]: the depth where sand and shale pressure
   * are equal. Default: midway between crest and base (a sand of uniform extent with depth);
   * pass a volume-weighted depth for a real structure.
   */
  centroidTvdFt?: number;
  /** Shale pore pressure at the centroid depth, psi. Typical 7000 psi at 10,000 ft. */
  shalePressureAtCentroidPsi: number;
  /** Gradient of the fluid in the sand, psi/ft, > 0. Typical brine 0.465. */
  sandFluidGradientPsiPerFt: number;
  /**
   * Gradient of shale pore pressure along the structure, psi/ft, > 0 (the slope dP/dz of
   * the shale pressure profile around the centroid). Typical 0.7–0.9 in overpressure.
   */
  shaleGradientPsiPerFt: number;
  /** Fracture (least-stress) pressure of the seal at the crest, psi; enables the crest margin. */
  fracturePressureAtCrestPsi?: number;
  /** Margin at the crest below which a finding is raised, psi, ≥ 0. Default 0 (margin closed). */
  minCrestMarginPsi?: number;
  /** Extra depths (ft) at which to report sand and shale pressure. */
  depthsFt?: ArrayLike<number>;
}

/** Result of {@link centroidSandPressure}. */
export interface CentroidSandPressureResult {
  centroidTvdFt: number;
  /** Sand pressure at crest and base, psi. */
  sandAtCrestPsi: number;
  sandAtBasePsi: number;
  /** Shale pressure at crest and base, psi. */
  shaleAtCrestPsi: number;
  shaleAtBasePsi: number;
  /** Sand − shale at crest (positive: sand overpressured relative to its seal) and base, psi. */
  crestExcessOverShalePsi: number;
  baseExcessOverShalePsi: number;
  /** Fracture pressure minus sand pressure at the crest, psi (NaN without a fracture pressure). */
  crestMarginPsi: number;
  /** The same as an EMW difference at the crest, psi/ft. */
  crestMarginPsiPerFt: number;
  /** Profiles at `depthsFt` (empty when none given). */
  profile: { tvdFt: Float64Array; sandPsi: Float64Array; shalePsi: Float64Array };
  /** Findings (e.g. crest margin closed), as warnings. */
  findings: Warning[];
}

/**
 * Centroid effect in a dipping sand.
 *
 * A connected permeable sand cannot follow the shale pressure profile: its pressure
 * follows its own fluid gradient and equals the shale pressure at one depth, the centroid
 * (Traugott 1997, "Pore/fracture pressure determinations in deep water", World Oil
 * 218(8), from memory; no equation number is quoted here):
 *   P_sand(z) = P_c + g_f (z − z_c);   P_shale(z) = P_c + g_sh (z − z_c).
 * At the crest the sand is above the shale pressure by (g_sh − g_f)(z_c − z_crest): the seal
 * at the crest sees the higher sand pressure, and the crest margin
 *   M = P_frac,crest − P_sand(z_crest)
 * closes first there. A finding is raised when M ≤ minCrestMarginPsi.
 *
 * @param input see {@link CentroidSandPressureInput}
 * @returns sand and shale pressure at crest and base, differences, crest margin, findings
 * @throws ShalepointError E_RANGE when depths are not finite, base ≤ crest, the centroid is
 *   outside [crest, base], a gradient ≤ 0 or a margin < 0.
 * @example
 * // CHECK-VALUES §11 own case
 * centroidSandPressure({ crestTvdFt: 9000, baseTvdFt: 11000, centroidTvdFt: 10000,
 *   shalePressureAtCentroidPsi: 7000, sandFluidGradientPsiPerFt: 0.465, shaleGradientPsiPerFt: 0.7 })
 * // → sandAtCrestPsi 6535, sandAtBasePsi 7465, shaleAtCrestPsi 6300, shaleAtBasePsi 7700
 */
export function centroidSandPressure(input: CentroidSandPressureInput): CentroidSandPressureResult {
  const zt = input.crestTvdFt;
  const zb = input.baseTvdFt;
  if (!(Number.isFinite(zt) && Number.isFinite(zb) && zb > zt)) {
    throw new ShalepointError("E_RANGE", "baseTvdFt must be deeper than crestTvdFt", { param: "baseTvdFt", value: zb, unit: "ft", allowed: `> crestTvdFt (${zt})` });
  }
  const zc = input.centroidTvdFt ?? 0.5 * (zt + zb);
  if (!(Number.isFinite(zc) && zc >= zt && zc <= zb)) {
    throw new ShalepointError("E_RANGE", "centroidTvdFt must lie between crest and base", { param: "centroidTvdFt", value: zc, unit: "ft", allowed: `[${zt}, ${zb}]` });
  }
  const pc = input.shalePressureAtCentroidPsi;
  if (!Number.isFinite(pc)) throw new ShalepointError("E_RANGE", "shalePressureAtCentroidPsi must be finite", { param: "shalePressureAtCentroidPsi", value: pc, unit: "psi" });
  const gf = input.sandFluidGradientPsiPerFt;
  const gs = input.shaleGradientPsiPerFt;
  for (const [param, v] of [["sandFluidGradientPsiPerFt", gf], ["shaleGradientPsiPerFt", gs]] as const) {
    if (!(Number.isFinite(v) && v > 0)) throw new ShalepointError("E_RANGE", `${param} must be > 0`, { param, value: v, unit: "psi/ft", allowed: "> 0" });
  }
  const minMargin = input.minCrestMarginPsi ?? 0;
  if (!(Number.isFinite(minMargin) && minMargin >= 0)) {
    throw new ShalepointError("E_RANGE", "minCrestMarginPsi must be ≥ 0", { param: "minCrestMarginPsi", value: minMargin, unit: "psi", allowed: "≥ 0" });
  }
  const sand = (z: number): number => pc + gf * (z - zc);
  const shale = (z: number): number => pc + gs * (z - zc);
  const sandAtCrestPsi = sand(zt);
  const frac = input.fracturePressureAtCrestPsi;
  const crestMarginPsi = frac === undefined ? NaN : frac - sandAtCrestPsi;
  const findings: Warning[] = [];
  if (frac !== undefined && !(crestMarginPsi > minMargin)) {
    findings.push({
      code: "W_CENTROID_CREST_MARGIN_CLOSED",
      message: `crest sand pressure ${sandAtCrestPsi.toFixed(0)} psi leaves ${crestMarginPsi.toFixed(0)} psi to the fracture pressure ${frac.toFixed(0)} psi (limit ${minMargin} psi): the seal at the crest may leak or fracture`,
      depthFt: zt,
    });
  }
  const d = input.depthsFt ?? [];
  const tv = Float64Array.from(d);
  const sp = new Float64Array(tv.length);
  const sh = new Float64Array(tv.length);
  for (let i = 0; i < tv.length; i++) {
    sp[i] = sand(tv[i]);
    sh[i] = shale(tv[i]);
  }
  return {
    centroidTvdFt: zc,
    sandAtCrestPsi,
    sandAtBasePsi: sand(zb),
    shaleAtCrestPsi: shale(zt),
    shaleAtBasePsi: shale(zb),
    crestExcessOverShalePsi: sandAtCrestPsi - shale(zt),
    baseExcessOverShalePsi: sand(zb) - shale(zb),
    crestMarginPsi,
    crestMarginPsiPerFt: crestMarginPsi / zt,
    profile: { tvdFt: tv, sandPsi: sp, shalePsi: sh },
    findings,
  };
}
