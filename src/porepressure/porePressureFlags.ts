/**
 * Per-sample flags, result shape and limit handling shared by every pore-pressure method.
 *
 * Every method returns a {@link PorePressureResult}: the pore pressure (psi), one byte of
 * bit flags per sample, and warnings as data. Nothing is clipped or dropped silently: each
 * change to a computed value sets a flag and adds to a counted warning.
 *
 * Flag bits (combine with `|`, test with `&`):
 * | constant                          | bit | meaning |
 * | --------------------------------- | --- | ------- |
 * | PP_FLAG_MISSING_INPUT             | 1   | an input was NaN or outside its domain (e.g. slowness ≤ 0); ppPsi is NaN |
 * | PP_FLAG_CLIPPED_AT_OVERBURDEN     | 2   | the method gave Pp > Sv (negative effective stress); ppPsi set to Sv |
 * | PP_FLAG_BELOW_HYDROSTATIC         | 4   | the method gave Pp < hydrostatic; value kept unless floored |
 * | PP_FLAG_CLIPPED_AT_HYDROSTATIC    | 8   | ppPsi raised to hydrostatic (floor requested, or compacted side of the trend in equivalent depth) |
 * | PP_FLAG_NO_EQUIVALENT_DEPTH       | 16  | equivalent depth: no shallower depth on the trend matches the log; ppPsi is NaN |
 * | PP_FLAG_OUTSIDE_CALIBRATION       | 32  | depth outside the calibrated depth range given by the caller; value kept |
 * | PP_FLAG_UNLOADING_BRANCH          | 64  | Bowers: computed on the unloading branch (information, not a fault) |
 *
 * This file imports only ../errors.js.
 */
import { ShalepointError, type Warning } from "../errors.js";

/** Bit 1: an input was NaN or outside its domain; ppPsi is NaN. */
export const PP_FLAG_MISSING_INPUT = 1;
/** Bit 2: Pp came out above overburden (negative effective stress) and was set to Sv. */
export const PP_FLAG_CLIPPED_AT_OVERBURDEN = 2;
/** Bit 4: Pp came out below hydrostatic; kept unless `floorAtHydrostatic`. */
export const PP_FLAG_BELOW_HYDROSTATIC = 4;
/** Bit 8: Pp was raised to hydrostatic. */
export const PP_FLAG_CLIPPED_AT_HYDROSTATIC = 8;
/** Bit 16: equivalent depth found no matching shallower depth; ppPsi is NaN. */
export const PP_FLAG_NO_EQUIVALENT_DEPTH = 16;
/** Bit 32: sample depth outside the caller's calibrated depth range; value kept. */
export const PP_FLAG_OUTSIDE_CALIBRATION = 32;
/** Bit 64: Bowers sample computed on the unloading branch (information). */
export const PP_FLAG_UNLOADING_BRANCH = 64;

/** Stable warning code for each flag bit that signals a problem. */
export const PP_FLAG_WARNING_CODES: Readonly<Record<number, string>> = {
  [PP_FLAG_MISSING_INPUT]: "W_PP_MISSING_INPUT",
  [PP_FLAG_CLIPPED_AT_OVERBURDEN]: "W_PP_CLIPPED_AT_OVERBURDEN",
  [PP_FLAG_BELOW_HYDROSTATIC]: "W_PP_BELOW_HYDROSTATIC",
  [PP_FLAG_CLIPPED_AT_HYDROSTATIC]: "W_PP_CLIPPED_AT_HYDROSTATIC",
  [PP_FLAG_NO_EQUIVALENT_DEPTH]: "W_PP_NO_EQUIVALENT_DEPTH",
  [PP_FLAG_OUTSIDE_CALIBRATION]: "W_PP_OUTSIDE_CALIBRATION",
};

const FLAG_TEXT: ReadonlyArray<[number, string]> = [
  [PP_FLAG_MISSING_INPUT, "missing or invalid input"],
  [PP_FLAG_CLIPPED_AT_OVERBURDEN, "clipped at overburden (zero effective stress)"],
  [PP_FLAG_BELOW_HYDROSTATIC, "below hydrostatic"],
  [PP_FLAG_CLIPPED_AT_HYDROSTATIC, "raised to hydrostatic"],
  [PP_FLAG_NO_EQUIVALENT_DEPTH, "no equivalent depth on the trend"],
  [PP_FLAG_OUTSIDE_CALIBRATION, "outside the calibrated depth range"],
  [PP_FLAG_UNLOADING_BRANCH, "unloading branch"],
];

/** Pore pressure with per-sample flags and returned warnings. */
export interface PorePressureResult {
  /** Pore pressure, psi, aligned to the input depth index; NaN where it cannot be computed. */
  ppPsi: Float64Array;
  /** Bit flags per sample (PP_FLAG_* constants). */
  flags: Uint8Array;
  /** One counted warning per flag kind that occurred, with the first sample index (and depth). */
  warnings: Warning[];
}

/** Depth interval, ft TVD below RT, top ≤ base. */
export interface DepthRangeFt {
  topFt: number;
  baseFt: number;
}

/** Options every pore-pressure method accepts for limits and flagging. */
export interface PorePressureLimitOptions {
  /**
   * TVD below RT of each sample, ft. Optional for the pointwise methods: when given,
   * warnings carry the depth and `calibratedRangeTvdFt` can be checked.
   */
  tvdFt?: ArrayLike<number>;
  /** Raise any Pp below hydrostatic to hydrostatic (flagged). Default false: keep and flag. */
  floorAtHydrostatic?: boolean;
  /** Depth range the method's parameters were calibrated over; samples outside are flagged. */
  calibratedRangeTvdFt?: DepthRangeFt;
}

/**
 * Words for the bits set in one flag byte, for tables and reports.
 * @param flag one element of a result's `flags`
 * @returns the meaning of each set bit, in bit order
 * @example describePorePressureFlags(2 | 64) // ["clipped at overburden (zero effective stress)", "unloading branch"]
 */
export function describePorePressureFlags(flag: number): string[] {
  const out: string[] = [];
  for (const [bit, text] of FLAG_TEXT) if ((flag & bit) !== 0) out.push(text);
  return out;
}

/** Check the optional limit inputs against the sample count (used by every method). */
export function checkLimitOptions(n: number, opts: PorePressureLimitOptions): void {
  if (opts.tvdFt !== undefined && opts.tvdFt.length !== n) {
    throw new ShalepointError("E_LENGTH", "tvdFt must have one depth per sample", {
      param: "tvdFt",
      value: `${opts.tvdFt.length} vs ${n}`,
      hint: "Pass the well's TVD array on the same depth index as the curves.",
    });
  }
  const r = opts.calibratedRangeTvdFt;
  if (r !== undefined) {
    if (opts.tvdFt === undefined) {
      throw new ShalepointError("E_MISSING", "calibratedRangeTvdFt needs tvdFt", {
        param: "tvdFt",
        hint: "Pass tvdFt so each sample's depth can be compared with the calibrated range.",
      });
    }
    if (!(Number.isFinite(r.topFt) && Number.isFinite(r.baseFt) && r.topFt <= r.baseFt)) {
      throw new ShalepointError("E_RANGE", "calibratedRangeTvdFt must have finite topFt ≤ baseFt", {
        param: "calibratedRangeTvdFt",
        value: r,
        unit: "ft",
        allowed: "topFt ≤ baseFt, both finite",
      });
    }
  }
}

/**
 * Apply the limits to raw per-sample pore pressures and build the result.
 *
 * Order per sample: a sample already flagged missing stays NaN; Pp > Sv → Sv (flag 2);
 * Pp < Ph → flag 4 and, with `floorAtHydrostatic`, Ph (flag 8); outside the calibrated
 * range → flag 32. Warnings are counted per flag kind.
 *
 * @param rawPsi raw pore pressure, psi (consumed: the returned `ppPsi` is a new array,
 *   or `rawPsi` itself with `inPlace`)
 * @param flags flags already set by the method (copied, or updated in place with `inPlace`)
 * @param inPlace default false; true when the caller owns `rawPsi` (a Float64Array) and
 *   `flags` and does not use them afterwards: the limits are then applied in those arrays
 *   (same values, two fewer allocations of the well's length)
 */
export function finishPorePressure(
  rawPsi: ArrayLike<number>,
  overburdenPsi: ArrayLike<number>,
  hydrostaticPsi: ArrayLike<number>,
  flags: Uint8Array,
  opts: PorePressureLimitOptions,
  methodName: string,
  inPlace = false,
): PorePressureResult {
  const n = rawPsi.length;
  // In place, pp[i] is written after rawPsi[i] is read, at the same index only.
  const pp = inPlace && rawPsi instanceof Float64Array ? rawPsi : new Float64Array(n);
  const fl = pp === rawPsi ? flags : new Uint8Array(flags);
  const range = opts.calibratedRangeTvdFt;
  const tvd = opts.tvdFt;
  for (let i = 0; i < n; i++) {
    let p = rawPsi[i];
    if ((fl[i] & (PP_FLAG_MISSING_INPUT | PP_FLAG_NO_EQUIVALENT_DEPTH)) !== 0 || Number.isNaN(p)) {
      if (Number.isNaN(p) && (fl[i] & PP_FLAG_NO_EQUIVALENT_DEPTH) === 0) fl[i] |= PP_FLAG_MISSING_INPUT;
      pp[i] = NaN;
      continue;
    }
    const sv = overburdenPsi[i];
    const ph = hydrostaticPsi[i];
    if (p > sv) {
      p = sv;
      fl[i] |= PP_FLAG_CLIPPED_AT_OVERBURDEN;
    }
    if (p < ph) {
      fl[i] |= PP_FLAG_BELOW_HYDROSTATIC;
      if (opts.floorAtHydrostatic === true) {
        p = ph;
        fl[i] |= PP_FLAG_CLIPPED_AT_HYDROSTATIC;
      }
    }
    if (range !== undefined && tvd !== undefined) {
      const z = tvd[i];
      if (!(z >= range.topFt && z <= range.baseFt)) fl[i] |= PP_FLAG_OUTSIDE_CALIBRATION;
    }
    pp[i] = p;
  }
  return { ppPsi: pp, flags: fl, warnings: flagWarnings(fl, tvd, methodName) };
}

/** One counted warning per problem flag kind present in `flags`. */
export function flagWarnings(flags: Uint8Array, tvdFt: ArrayLike<number> | undefined, methodName: string): Warning[] {
  const out: Warning[] = [];
  // One pass over the flags: count and first index per bit (most samples carry no flag).
  const counts = new Int32Array(8);
  const firsts = new Int32Array(8).fill(-1);
  for (let i = 0; i < flags.length; i++) {
    const f = flags[i];
    if (f === 0) continue;
    for (let b = 0; b < 8; b++) {
      if ((f & (1 << b)) !== 0) {
        if (firsts[b] < 0) firsts[b] = i;
        counts[b]++;
      }
    }
  }
  for (const [bit, text] of FLAG_TEXT) {
    const code = PP_FLAG_WARNING_CODES[bit];
    if (code === undefined) continue;
    const b = 31 - Math.clz32(bit);
    const count = counts[b];
    const first = firsts[b];
    if (count === 0) continue;
    const w: Warning = {
      code,
      message: `${methodName}: ${count} sample(s) ${text}; first at sample ${first}`,
      index: first,
      count,
    };
    if (tvdFt !== undefined && Number.isFinite(tvdFt[first])) w.depthFt = tvdFt[first];
    out.push(w);
  }
  return out;
}

/** Throw E_LENGTH unless every named array has length `n`. */
export function requireLengths(n: number, arrays: Record<string, ArrayLike<number>>): void {
  for (const [name, a] of Object.entries(arrays)) {
    if (a.length !== n) {
      throw new ShalepointError("E_LENGTH", `${name} must have the same length as the other curves`, {
        param: name,
        value: `${a.length} vs ${n}`,
        hint: "Put every curve on the same depth index first.",
      });
    }
  }
}
