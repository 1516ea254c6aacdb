/**
 * Sonic normal compaction trend, straight line on semilog axes.
 *
 * Reference: Hottman, C.E. & Johnson, R.K., 1965, "Estimation of formation pressures from
 * log-derived shale properties", Journal of Petroleum Technology 17(6):717–722 (SPE-1110):
 * the normal shale slowness plots as a straight line of log Δt against depth:
 *   log10 Δtn(Z) = log10 Δtml + s·Z, i.e. Δtn = Δtml·10^(s·Z), Z below the mudline.
 */
import { ShalepointError } from "../errors.js";
import type { SonicLogLinearParams } from "./trendTypes.js";

/**
 * Throw unless the parameters are finite with a positive mudline slowness.
 * @throws ShalepointError E_TREND_PARAMS naming the parameter
 */
export function checkSonicLogLinearParams(params: SonicLogLinearParams, where = "params"): void {
  if (!(Number.isFinite(params.dtMudlineUsPerFt) && params.dtMudlineUsPerFt > 0)) {
    throw new ShalepointError("E_TREND_PARAMS", "sonic log-linear trend parameter out of range", {
      param: `${where}.dtMudlineUsPerFt`, value: params.dtMudlineUsPerFt, allowed: "> 0 µs/ft (typical 140–220)",
      hint: "A negative or zero slowness has no meaning; give µs/ft.",
    });
  }
  if (!Number.isFinite(params.log10SlopePerFt)) {
    throw new ShalepointError("E_TREND_PARAMS", "sonic log-linear trend parameter out of range", {
      param: `${where}.log10SlopePerFt`, value: params.log10SlopePerFt, allowed: "finite (typical −5e-5 to −1e-5 per ft)",
    });
  }
}

/**
 * Normal-compaction slowness at a depth below the mudline (semilog straight line).
 *
 * Formula: Δtn = Δtml·10^(s·Z).
 * Missing data: NaN depth or Z < 0 gives NaN.
 *
 * @param bmlFt depth below mudline Z, ft; range [0, 25,000]; typical 6000
 * @param params see {@link SonicLogLinearParams}
 * @returns normal-trend slowness, µs/ft
 * @example sonicLogLinearTrendUsPerFt({ bmlFt: 6000, params: { dtMudlineUsPerFt: 166.0, log10SlopePerFt: -2.2e-5 } }) // 122.5
 * Reference: Hottman & Johnson 1965, JPT 17(6):717–722 (SPE-1110), semilog shale trend.
 */
export function sonicLogLinearTrendUsPerFt({ bmlFt, params }: { bmlFt: number; params: SonicLogLinearParams }): number {
  if (!(bmlFt >= 0)) return NaN;
  return params.dtMudlineUsPerFt * 10 ** (params.log10SlopePerFt * bmlFt);
}
