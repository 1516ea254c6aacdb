/**
 * Bad-hole flag: where the borehole is enlarged (caliper well above bit size) or the density
 * tool's correction is large, density and often sonic readings are unreliable.
 */
import { ShalepointError } from "../errors.js";

/** Result of {@link flagBadHole}; all flags aligned with the input. */
export interface BadHoleFlags {
  /** 1 where either rule fires, else 0. */
  isBadHole: Uint8Array;
  /** 1 where caliper − bit size > enlargementLimitIn. */
  byCaliper: Uint8Array;
  /** 1 where |density correction| > densityCorrectionLimitGcc (all 0 without that curve). */
  byDensityCorrection: Uint8Array;
  /** Number of samples flagged by either rule. */
  count: number;
  /** Samples where neither rule could be evaluated (caliper and correction both NaN/absent). */
  unknownCount: number;
}

/**
 * Flag bad hole from caliper versus bit size and, if given, from the density-correction curve.
 *
 * Rules (common practice, no source): bad hole where caliper − bit size > enlargementLimitIn
 * (default 1.0 in; values from 0.5 to 2 in are in use), or where |Δρ| > densityCorrectionLimitGcc
 * (default 0.10 g/cc; 0.05–0.15 in use). NaN policy: a NaN caliper (or correction) never
 * raises its flag; samples where nothing could be tested are counted in `unknownCount`.
 *
 * @param caliperIn caliper, in; typical 8.5–17.5.
 * @param bitSizeIn bit size, in: one number for the whole log or an array aligned with the
 *   caliper (changes at casing points); typical 8.5, 12.25.
 * @param enlargementLimitIn allowed enlargement, in, ≥ 0; default 1.0.
 * @param densityCorrectionGcc optional density correction curve (DRHO), g/cc.
 * @param densityCorrectionLimitGcc allowed |correction|, g/cc, > 0; default 0.10.
 * @returns {@link BadHoleFlags}.
 * @throws ShalepointError E_LENGTH for misaligned arrays, E_RANGE for negative limits.
 * @example flagBadHole({ caliperIn: new Float64Array([8.6, 10.1, NaN]), bitSizeIn: 8.5 }).isBadHole // [0, 1, 0]
 */
export function flagBadHole(args: {
  caliperIn: ArrayLike<number>;
  bitSizeIn: number | ArrayLike<number>;
  enlargementLimitIn?: number;
  densityCorrectionGcc?: ArrayLike<number>;
  densityCorrectionLimitGcc?: number;
}): BadHoleFlags {
  const { caliperIn, bitSizeIn, densityCorrectionGcc } = args;
  const lim = args.enlargementLimitIn ?? 1.0;
  const rhoLim = args.densityCorrectionLimitGcc ?? 0.1;
  if (!(lim >= 0)) {
    throw new ShalepointError("E_RANGE", "enlargement limit must be ≥ 0", { param: "enlargementLimitIn", value: lim, unit: "in", allowed: "≥ 0, typical 1.0" });
  }
  if (!(rhoLim > 0)) {
    throw new ShalepointError("E_RANGE", "density-correction limit must be > 0", { param: "densityCorrectionLimitGcc", value: rhoLim, unit: "g/cc", allowed: "> 0, typical 0.10" });
  }
  const n = caliperIn.length;
  const bitArray = typeof bitSizeIn === "number" ? undefined : bitSizeIn;
  if (bitArray && bitArray.length !== n) {
    throw new ShalepointError("E_LENGTH", "bitSizeIn and caliperIn must have the same length", { param: "bitSizeIn", value: `${bitArray.length} vs ${n}` });
  }
  if (densityCorrectionGcc && densityCorrectionGcc.length !== n) {
    throw new ShalepointError("E_LENGTH", "densityCorrectionGcc and caliperIn must have the same length", { param: "densityCorrectionGcc", value: `${densityCorrectionGcc.length} vs ${n}` });
  }
  const isBadHole = new Uint8Array(n);
  const byCaliper = new Uint8Array(n);
  const byDensityCorrection = new Uint8Array(n);
  let count = 0, unknownCount = 0;
  for (let i = 0; i < n; i++) {
    const bit = bitArray ? bitArray[i] : (bitSizeIn as number);
    const enl = caliperIn[i] - bit;
    const drho = densityCorrectionGcc ? densityCorrectionGcc[i] : NaN;
    if (enl > lim) byCaliper[i] = 1;
    if (Math.abs(drho) > rhoLim) byDensityCorrection[i] = 1;
    if (byCaliper[i] || byDensityCorrection[i]) { isBadHole[i] = 1; count++; }
    else if (Number.isNaN(enl) && Number.isNaN(drho)) unknownCount++;
  }
  return { isBadHole, byCaliper, byDensityCorrection, count, unknownCount };
}
