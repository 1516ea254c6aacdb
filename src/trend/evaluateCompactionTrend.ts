/**
 * Evaluate a piecewise normal compaction trend on a depth array.
 *
 * Segment k applies from its top down to the top of segment k+1; the first segment also
 * applies above its top, the last to any depth below. Models: Zhang 2011 (Earth-Science
 * Reviews 108:50–63) exponential-to-matrix sonic and log-linear resistivity; Hottman &
 * Johnson 1965 (JPT 17(6), SPE-1110) semilog sonic.
 */
import { ShalepointError } from "../errors.js";
import { checkSonicExponentialParams, sonicExponentialTrendUsPerFt } from "./sonicExponentialTrend.js";
import { checkSonicLogLinearParams, sonicLogLinearTrendUsPerFt } from "./sonicLogLinearTrend.js";
import { checkResistivityLogLinearParams, resistivityLogLinearTrendOhmM } from "./resistivityLogLinearTrend.js";
import type { CompactionTrend, TrendParamsByKind } from "./trendTypes.js";

/**
 * Check a trend's structure and parameters.
 * @throws ShalepointError E_TREND_SEGMENTS (no segment, tops not increasing or not finite),
 *   E_TREND_PARAMS (a parameter that would make the trend negative or non-finite)
 */
export function checkCompactionTrend(trend: CompactionTrend): void {
  const segs = trend.segments;
  if (segs.length === 0) {
    throw new ShalepointError("E_TREND_SEGMENTS", "a trend needs at least one segment", { param: "segments" });
  }
  segs.forEach((seg, k) => {
    if (!Number.isFinite(seg.topBmlFt) || (k > 0 && !(seg.topBmlFt > segs[k - 1].topBmlFt))) {
      throw new ShalepointError("E_TREND_SEGMENTS", "segment tops must be finite and increase with depth", {
        param: `segments[${k}].topBmlFt`, value: seg.topBmlFt, unit: "ft below mudline",
      });
    }
    const where = `segments[${k}].params`;
    if (trend.kind === "sonicExponential") checkSonicExponentialParams(seg.params as TrendParamsByKind["sonicExponential"], where);
    else if (trend.kind === "sonicLogLinear") checkSonicLogLinearParams(seg.params as TrendParamsByKind["sonicLogLinear"], where);
    else if (trend.kind === "resistivityLogLinear") checkResistivityLogLinearParams(seg.params as TrendParamsByKind["resistivityLogLinear"], where);
    else {
      throw new ShalepointError("E_TREND_PARAMS", "unknown trend kind", {
        param: "kind", value: (trend as { kind: unknown }).kind, allowed: "sonicExponential, sonicLogLinear, resistivityLogLinear",
      });
    }
  });
}

/**
 * Normal-compaction trend values on a depth array (piecewise by segment).
 *
 * Formula: per segment, Δtn = Δtm + (Δtml − Δtm)e^(−cZ), Δtn = Δtml·10^(sZ) or Rn = R0·e^(bZ).
 * Missing data: NaN depth, or a depth above the mudline (Z < 0), gives NaN.
 *
 * @param trend the trend (plain data)
 * @param bmlFt depth below mudline of each sample, ft
 * @returns new Float64Array: slowness µs/ft (sonic kinds) or resistivity ohm·m
 * @throws ShalepointError as {@link checkCompactionTrend}; E_TREND_NONFINITE when a value
 *   comes out non-finite or ≤ 0 at a valid depth (e.g. an overflowing slope)
 * @example evaluateCompactionTrend({ trend: { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }] }, bmlFt: [10000] }) // [2.175]
 * Reference: Zhang 2011, doi:10.1016/j.earscirev.2011.06.001; Hottman & Johnson 1965, SPE-1110.
 */
export function evaluateCompactionTrend({ trend, bmlFt }: { trend: CompactionTrend; bmlFt: ArrayLike<number> }): Float64Array {
  checkCompactionTrend(trend);
  const segs = trend.segments;
  const out = new Float64Array(bmlFt.length);
  for (let i = 0; i < out.length; i++) {
    const z = bmlFt[i];
    if (!(z >= 0)) {
      out[i] = NaN;
      continue;
    }
    let k = 0;
    while (k + 1 < segs.length && z >= segs[k + 1].topBmlFt) k++;
    let v: number;
    if (trend.kind === "sonicExponential") v = sonicExponentialTrendUsPerFt({ bmlFt: z, params: trend.segments[k].params });
    else if (trend.kind === "sonicLogLinear") v = sonicLogLinearTrendUsPerFt({ bmlFt: z, params: trend.segments[k].params });
    else v = resistivityLogLinearTrendOhmM({ bmlFt: z, params: trend.segments[k].params });
    if (!(Number.isFinite(v) && v > 0)) {
      throw new ShalepointError("E_TREND_NONFINITE", `the trend is not finite and positive at ${z} ft below mudline`, {
        param: `segments[${k}].params`, value: v, row: i, unit: trend.kind === "resistivityLogLinear" ? "ohm.m" : "us/ft",
        hint: "Check the trend parameters (a slope too large overflows).",
      });
    }
    out[i] = v;
  }
  return out;
}
