/**
 * Flag-warning bookkeeping: counts and first indices checked against flag arrays counted
 * by hand (own case), and the spliced update checked against the same hand counts.
 */
import { describe, expect, it } from "vitest";
import {
  PP_FLAG_BELOW_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_UNLOADING_BRANCH,
  flagWarnings,
  splicedFlagWarnings,
} from "../../src/porepressure/porePressureFlags.js";

const M = PP_FLAG_MISSING_INPUT; // 1
const O = PP_FLAG_CLIPPED_AT_OVERBURDEN; // 2
const B = PP_FLAG_BELOW_HYDROSTATIC; // 4
const U = PP_FLAG_UNLOADING_BRANCH; // 64, information only: no warning

describe("flagWarnings", () => {
  it("counts each warning bit once per sample, in flag-bit order (own case, counted by hand)", () => {
    // index:              0  1      2  3      4  5
    const flags = Uint8Array.of(0, B | U, M, B | O, 0, B);
    const tvdFt = Object.freeze([1000, 1010, 1020, 1030, 1040, 1050]);
    const w = flagWarnings(flags, tvdFt, "Eaton");
    expect(Array.from(flags)).toEqual([0, B | U, M, B | O, 0, B]); // typed arrays cannot be frozen: unchanged instead
    // By hand: missing at 2 (1 sample); overburden clip at 3 (1); below hydrostatic at 1, 3, 5 (3).
    expect(w.map((x) => [x.code, x.count, x.index, x.depthFt])).toEqual([
      ["W_PP_MISSING_INPUT", 1, 2, 1020],
      ["W_PP_CLIPPED_AT_OVERBURDEN", 1, 3, 1030],
      ["W_PP_BELOW_HYDROSTATIC", 3, 1, 1010],
    ]);
    expect(w[2].message).toBe("Eaton: 3 sample(s) below hydrostatic; first at sample 1");
  });
});

describe("splicedFlagWarnings", () => {
  it("updates the old counts over the recomputed part only (own case, counted by hand)", () => {
    const oldFlags = Uint8Array.of(0, B, 0, B, M);
    const oldWarnings = Object.freeze(flagWarnings(oldFlags, undefined, "Eaton"));
    // Samples 3 on recomputed and 2 appended: old 3 (B) and 4 (M) are replaced by 0, O, B, B.
    const flags = Uint8Array.of(0, B, 0, 0, O, B, B);
    const w = splicedFlagWarnings({ oldFlags, oldWarnings, flags, from: 3, tvdFt: undefined, methodName: "Eaton" });
    expect([Array.from(oldFlags), Array.from(flags)]).toEqual([[0, B, 0, B, M], [0, B, 0, 0, O, B, B]]); // inputs unchanged
    // By hand on the new flags: overburden clip at 4 (1); below hydrostatic at 1, 5, 6 (3); no missing.
    expect(w.map((x) => [x.code, x.count, x.index])).toEqual([
      ["W_PP_CLIPPED_AT_OVERBURDEN", 1, 4],
      ["W_PP_BELOW_HYDROSTATIC", 3, 1],
    ]);
    expect(w).toEqual(flagWarnings(flags, undefined, "Eaton"));
  });

  it("takes the first index from the recomputed part when the old first lay there (own case)", () => {
    const oldFlags = Uint8Array.of(0, 0, B, B);
    const flags = Uint8Array.of(0, 0, 0, B, B, B);
    const w = splicedFlagWarnings({ oldFlags, oldWarnings: flagWarnings(oldFlags, undefined, "Bowers"), flags, from: 2, tvdFt: undefined, methodName: "Bowers" });
    // By hand: below hydrostatic at 3, 4, 5.
    expect(w).toEqual([{ code: "W_PP_BELOW_HYDROSTATIC", message: "Bowers: 3 sample(s) below hydrostatic; first at sample 3", index: 3, count: 3 }]);
  });

  it("needs only the old flags from `from` on (oldFlagsOffset): same warnings as with the whole old array (own case)", () => {
    const oldFlags = Uint8Array.of(0, B, 0, B, M);
    const oldWarnings = flagWarnings(oldFlags, undefined, "Eaton");
    const flags = Uint8Array.of(0, B, 0, 0, O, B, B);
    const whole = splicedFlagWarnings({ oldFlags, oldWarnings, flags, from: 3, tvdFt: undefined, methodName: "Eaton" });
    const tail = splicedFlagWarnings({ oldFlags: oldFlags.slice(3), oldFlagsOffset: 3, oldWarnings, flags, from: 3, tvdFt: undefined, methodName: "Eaton" });
    expect(tail).toEqual(whole);
    // Counted by hand as above: overburden clip at 4 (1), below hydrostatic at 1, 5, 6 (3).
    expect(tail.map((x) => [x.count, x.index])).toEqual([[1, 4], [3, 1]]);
    // An offset past `from` cannot be updated: the full count is returned (still right).
    expect(splicedFlagWarnings({ oldFlags: oldFlags.slice(4), oldFlagsOffset: 4, oldWarnings, flags, from: 3, tvdFt: undefined, methodName: "Eaton" })).toEqual(whole);
  });
});
