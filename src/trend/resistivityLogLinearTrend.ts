/**
 * Resistivity normal compaction trend, exponential growth with depth.
 *
 * Reference: Zhang, J., 2011, Earth-Science Reviews 108:50–63,
 * doi:10.1016/j.earscirev.2011.06.001 (equation form from memory):
 *   Rn(Z) = R0·e^(b·Z), Z below the mudline (a straight line of ln R against depth).
 */
import { ShalepointError } from "../errors.js";
import type { ResistivityLogLinearParams } from "./trendTypes.js";

/**
 * Throw unless the parameters are finite with a positive mudline resistivity.
 * @throws ShalepointError E_TREND_PARAMS naming the parameter
 */
export function checkResistivityLogLinearParams(params: ResistivityLogLinearParams, where = "params"): void {
  if (!(Number.isFinite(params.r0OhmM) && params.r0OhmM > 0)) {
    throw new ShalepointError("E_TREND_PARAMS", "resistivity trend parameter out of range", {
      param: `${where}.r0OhmM`, value: params.r0OhmM, allowed: "> 0 ohm·m (typical 0.5–1.5)",
    });
  }
  if (!Number.isFinite(params.growthPerFt)) {
    throw new ShalepointError("E_TREND_PARAMS", "resistivity trend parameter out of range", {
      param: `${where}.growthPerFt`, value: params.growthPerFt, allowed: "finite (typical 5e-5 to 2e-4 per ft)",
    });
  }
}

/**
 * Normal-compaction resistivity at a depth below the mudline.
 *
 * Formula: Rn = R0·e^(b·Z).
 * Missing data: NaN depth or Z < 0 gives NaN.
 *
 * @param bmlFt depth below mudline Z, ft; range [0, 25,000]; typical 10,000
 * @param params see {@link ResistivityLogLinearParams}
 * @returns normal-trend resistivity, ohm·m
 * @example resistivityLogLinearTrendOhmM({ bmlFt: 10000, params: { r0OhmM: 0.8, growthPerFt: 1e-4 } }) // 2.175
 * Reference: Zhang 2011, Earth-Science Reviews 108:50–63, doi:10.1016/j.earscirev.2011.06.001.
 */
export function resistivityLogLinearTrendOhmM({ bmlFt, params }: { bmlFt: number; params: ResistivityLogLinearParams }): number {
  if (!(bmlFt >= 0)) return NaN;
  return params.r0OhmM * Math.exp(params.growthPerFt * bmlFt);
}
