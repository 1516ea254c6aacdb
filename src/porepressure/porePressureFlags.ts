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

/** Warning-carrying flag bits, in the order the warnings are listed (FLAG_TEXT order). */
const WARNING_BITS: ReadonlyArray<{ bit: number; code: string; text: string }> = FLAG_TEXT.filter(
  ([bit]) => PP_FLAG_WARNING_CODES[bit] !== undefined,
).map(([bit, text]) => ({ bit, code: PP_FLAG_WARNING_CODES[bit], text }));

/**
 * Histogram of the flag bytes in flags[from, to): how many samples carry each byte value
 * and the first index of each value. One pass, one increment per flagged sample.
 */
function flagByteHistogram(flags: Uint8Array, from: number, to: number): { hist: Int32Array; first: Int32Array } {
  const hist = new Int32Array(256);
  const first = new Int32Array(256);
  for (let i = from; i < to; i++) {
    const f = flags[i];
    if (f === 0) continue;
    if (hist[f]++ === 0) first[f] = i;
  }
  return { hist, first };
}

/** Count and first index of the samples carrying `bit`, from a byte histogram. */
function bitTally(h: { hist: Int32Array; first: Int32Array }, bit: number): { count: number; first: number } {
  let count = 0;
  let first = -1;
  for (let v = bit; v < 256; v++) {
    if ((v & bit) === 0 || h.hist[v] === 0) continue;
    count += h.hist[v];
    if (first < 0 || h.first[v] < first) first = h.first[v];
  }
  return { count, first };
}

function flagWarning(code: string, text: string, count: number, first: number, tvdFt: ArrayLike<number> | undefined, methodName: string): Warning {
  const w: Warning = {
    code,
    message: `${methodName}: ${count} sample(s) ${text}; first at sample ${first}`,
    index: first,
    count,
  };
  if (tvdFt !== undefined && Number.isFinite(tvdFt[first])) w.depthFt = tvdFt[first];
  return w;
}

/** One counted warning per problem flag kind present in `flags`. */
export function flagWarnings(flags: Uint8Array, tvdFt: ArrayLike<number> | undefined, methodName: string): Warning[] {
  const out: Warning[] = [];
  // One pass over the flags into a histogram of flag bytes (most samples carry no flag);
  // each bit's count and first index then come from the at most 255 byte values.
  const h = flagByteHistogram(flags, 0, flags.length);
  for (const { bit, code, text } of WARNING_BITS) {
    const { count, first } = bitTally(h, bit);
    if (count === 0) continue;
    out.push(flagWarning(code, text, count, first, tvdFt, methodName));
  }
  return out;
}

/**
 * Flag warnings of a result whose flags were recomputed from sample `from` on, updated from
 * the previous result's warnings instead of recounting the whole well.
 *
 * Each count = old count − count in oldFlags[from, end) + count in flags[from, end); the
 * first index stays when it lies above `from`, otherwise it is the first in flags[from, end).
 * Same warnings, order, counts, indices and depths as `flagWarnings(flags, tvdFt, methodName)`
 * when flags[0, from) equals oldFlags[0, from) and `oldWarnings` is
 * `flagWarnings(oldFlags, ·, methodName)`; falls back to the full count when `oldWarnings`
 * holds a code that is not a flag warning.
 *
 * @param input.oldFlags the previous result's flags (one byte per old sample), or only those
 *   from `oldFlagsOffset` on (enough: only samples from `from` on are read)
 * @param input.oldFlagsOffset index in the old well of oldFlags[0] (default 0, at most `from`)
 * @param input.oldWarnings the previous result's flag warnings
 * @param input.flags the new flags (length ≥ from), equal to oldFlags above `from`
 * @param input.from first recomputed sample index, oldFlagsOffset ≤ from ≤ oldFlagsOffset + oldFlags.length
 * @param input.tvdFt TVD below RT of each new sample, ft (for the warnings' depths), or undefined
 * @param input.methodName method name that starts each message, e.g. "Eaton"
 * @returns one counted warning per problem flag kind present in `flags`
 * @example splicedFlagWarnings({ oldFlags: Uint8Array.of(4, 0), oldWarnings: flagWarnings(Uint8Array.of(4, 0), undefined, "Eaton"),
 *   flags: Uint8Array.of(4, 4, 4), from: 1, tvdFt: undefined, methodName: "Eaton" })[0].count // 3
 */
export function splicedFlagWarnings(input: {
  oldFlags: Uint8Array;
  oldFlagsOffset?: number;
  oldWarnings: readonly Warning[];
  flags: Uint8Array;
  from: number;
  tvdFt: ArrayLike<number> | undefined;
  methodName: string;
}): Warning[] {
  const { oldFlags, oldWarnings, flags, from, tvdFt, methodName } = input;
  const offset = input.oldFlagsOffset ?? 0;
  const oldLength = offset + oldFlags.length;
  const oldByCode = new Map<string, Warning>();
  for (const w of oldWarnings) oldByCode.set(w.code, w);
  if (
    !(from >= offset && from <= oldLength && from <= flags.length) ||
    oldWarnings.some((w) => !WARNING_BITS.some((b) => b.code === w.code))
  ) {
    // Without the old flags from `from` on, fall back to the full count.
    return flagWarnings(flags, tvdFt, methodName);
  }
  const gone = flagByteHistogram(oldFlags, from - offset, oldFlags.length);
  const added = flagByteHistogram(flags, from, flags.length);
  const out: Warning[] = [];
  for (const { bit, code, text } of WARNING_BITS) {
    const old = oldByCode.get(code);
    const oldCount = old?.count ?? 0;
    const oldFirst = old?.index ?? -1;
    const a = bitTally(added, bit);
    const count = oldCount - bitTally(gone, bit).count + a.count;
    if (count === 0) continue;
    const first = oldFirst >= 0 && oldFirst < from ? oldFirst : a.first;
    out.push(flagWarning(code, text, count, first, tvdFt, methodName));
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
