/**
 * Sonic normal compaction trend, exponential decay to a matrix slowness.
 *
 * Reference: Zhang, J., 2011, "Pore pressure prediction from well logs: methods,
 * modifications, and new approaches", Earth-Science Reviews 108:50–63,
 * doi:10.1016/j.earscirev.2011.06.001 (equation form from memory):
 *   Δtn(Z) = Δtm + (Δtml − Δtm)·e^(−c·Z), Z below the mudline.
 */
import { ShalepointError } from "../errors.js";
import type { SonicExponentialParams } from "./trendTypes.js";

/**
 * Throw unless the parameters give a finite, positive, compacting trend.
 * @throws ShalepointError E_TREND_PARAMS naming the parameter
 */
export function checkSonicExponentialParams(params: SonicExponentialParams, where = "params"): void {
  const { dtMatrixUsPerFt, dtMudlineUsPerFt, decayPerFt } = params;
  const bad = (param: string, value: number, allowed: string, hint: string): never => {
    throw new ShalepointError("E_TREND_PARAMS", "sonic exponential trend parameter out of range", {
      param: `${where}.${param}`, value, allowed, hint,
    });
  };
  if (!(Number.isFinite(dtMatrixUsPerFt) && dtMatrixUsPerFt > 0)) bad("dtMatrixUsPerFt", dtMatrixUsPerFt, "> 0 µs/ft (typical 55–70)", "Give the matrix slowness in µs/ft.");
  if (!(Number.isFinite(dtMudlineUsPerFt) && dtMudlineUsPerFt > dtMatrixUsPerFt)) bad("dtMudlineUsPerFt", dtMudlineUsPerFt, `> dtMatrixUsPerFt (${dtMatrixUsPerFt})`, "Mudline slowness must exceed the matrix slowness.");
  if (!(Number.isFinite(decayPerFt) && decayPerFt >= 0)) bad("decayPerFt", decayPerFt, ">= 0 per ft (typical 1e-4 to 5e-4)", "A negative decay makes slowness grow without bound with depth.");
}

/**
 * Normal-compaction slowness at a depth below the mudline (exponential to matrix).
 *
 * Formula: Δtn = Δtm + (Δtml − Δtm)·e^(−c·Z).
 * Missing data: NaN depth or depth above the mudline (Z < 0) gives NaN.
 *
 * @param bmlFt depth below mudline Z, ft; range [0, 25,000]; typical 5000
 * @param params see {@link SonicExponentialParams} (not checked here; see checkSonicExponentialParams)
 * @returns normal-trend slowness, µs/ft
 * @example sonicExponentialTrendUsPerFt({ bmlFt: 5000, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 } }) // 95.12
 * Reference: Zhang 2011, Earth-Science Reviews 108:50–63, doi:10.1016/j.earscirev.2011.06.001.
 */
export function sonicExponentialTrendUsPerFt({ bmlFt, params }: { bmlFt: number; params: SonicExponentialParams }): number {
  if (!(bmlFt >= 0)) return NaN;
  return params.dtMatrixUsPerFt + (params.dtMudlineUsPerFt - params.dtMatrixUsPerFt) * Math.exp(-params.decayPerFt * bmlFt);
}
