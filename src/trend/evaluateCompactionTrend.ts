/**
 * Evaluate a piecewise normal compaction trend on a depth array.
 *
 * Segment k applies from its top down to the top of segment k+1; the first segment also
 * applies above its top, the last to any depth below. Models: Zhang 2011 (Earth-Science
 * Reviews 108:50–63) exponential-to-matrix sonic and log-linear resistivity; Hottman &
 * Johnson 1965 (JPT 17(6), SPE-1110) semilog sonic.
 */
import { ShalepointError } from "../errors.js";
import { checkSonicExponentialParams } from "./sonicExponentialTrend.js";
import { checkSonicLogLinearParams } from "./sonicLogLinearTrend.js";
import { checkResistivityLogLinearParams } from "./resistivityLogLinearTrend.js";
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
  const nSeg = segs.length;
  const n = bmlFt.length;
  const out = new Float64Array(n);
  // Per-segment constants hoisted out of the sample loop; each loop below is the formula of
  // sonicExponentialTrendUsPerFt / sonicLogLinearTrendUsPerFt / resistivityLogLinearTrendOhmM
  // with the same operations in the same order (same values bit for bit).
  const tops = new Float64Array(nSeg);
  const c0 = new Float64Array(nSeg);
  const c1 = new Float64Array(nSeg);
  const c2 = new Float64Array(nSeg);
  for (let k = 0; k < nSeg; k++) {
    tops[k] = segs[k].topBmlFt;
    if (trend.kind === "sonicExponential") {
      const q = trend.segments[k].params;
      c0[k] = q.dtMatrixUsPerFt;
      c1[k] = q.dtMudlineUsPerFt - q.dtMatrixUsPerFt;
      c2[k] = -q.decayPerFt;
    } else if (trend.kind === "sonicLogLinear") {
      const q = trend.segments[k].params;
      c0[k] = q.dtMudlineUsPerFt;
      c1[k] = q.log10SlopePerFt;
    } else {
      const q = trend.segments[k].params;
      c0[k] = q.r0OhmM;
      c1[k] = q.growthPerFt;
    }
  }
  const form = trend.kind === "sonicExponential" ? 0 : trend.kind === "sonicLogLinear" ? 1 : 2;
  if (form === 0) {
    // Exponential sonic trend (the usual one) in a loop of its own: no per-sample test of
    // the form; same operations, so same values.
    for (let i = 0; i < n; i++) {
      const z = bmlFt[i];
      if (!(z >= 0)) {
        out[i] = NaN;
        continue;
      }
      let k = 0;
      while (k + 1 < nSeg && z >= tops[k + 1]) k++;
      const v = c0[k] + c1[k] * Math.exp(c2[k] * z);
      if (!(Number.isFinite(v) && v > 0)) throwNonFinite(trend, k, z, v, i);
      out[i] = v;
    }
    return out;
  }
  for (let i = 0; i < n; i++) {
    const z = bmlFt[i];
    if (!(z >= 0)) {
      out[i] = NaN;
      continue;
    }
    let k = 0;
    while (k + 1 < nSeg && z >= tops[k + 1]) k++;
    const v = form === 1 ? c0[k] * 10 ** (c1[k] * z) : c0[k] * Math.exp(c1[k] * z);
    if (!(Number.isFinite(v) && v > 0)) throwNonFinite(trend, k, z, v, i);
    out[i] = v;
  }
  return out;
}

function throwNonFinite(trend: CompactionTrend, k: number, z: number, v: number, i: number): never {
  throw new ShalepointError("E_TREND_NONFINITE", `the trend is not finite and positive at ${z} ft below mudline`, {
    param: `segments[${k}].params`, value: v, row: i, unit: trend.kind === "resistivityLogLinear" ? "ohm.m" : "us/ft",
    hint: "Check the trend parameters (a slope too large overflows).",
  });
}
