/**
 * Predicted pore pressure against the mud weight used while drilling, with low-margin runs
 * and the kicks and gas shows that line up with them.
 */
import { ShalepointError } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";

/** A kick or gas show while drilling (same meaning as the drilling-events table). */
export interface DrillingShow {
  tvdFt: number;
  event: "kick" | "connection_gas" | "trip_gas" | "background_gas";
  /** EMW that controlled a kick, psi/ft (kicks), when known. */
  emwPsiPerFt?: number;
  /** Gas reading, gas units (shows), when known. */
  gasUnits?: number;
}

/** A run of consecutive samples whose margin is below the threshold. */
export interface LowMarginRun {
  topTvdFt: number;
  baseTvdFt: number;
  /** Smallest margin in the run, ppg (negative = mud lighter than predicted pore pressure). */
  minMarginPpg: number;
  /** Depth of that smallest margin, ft. */
  minMarginTvdFt: number;
  sampleCount: number;
}

/** One show set against the prediction. */
export interface ShowComparison extends DrillingShow {
  /** Predicted pore pressure at the show (nearest sample), ppg EMW; NaN when none within tolerance. */
  predictedPpPpg: number;
  /** Mud weight in use there, ppg. */
  mudWeightPpg: number;
  /** Mud weight − predicted pore pressure, ppg. */
  marginPpg: number;
  /** True when a low-margin sample lies within ±toleranceFt of the show. */
  nearLowMargin: boolean;
  /** Kick EMW − predicted pore pressure, ppg (positive = prediction too low); NaN otherwise. */
  kickMinusPredictedPpg: number;
}

/** Result of {@link compareMudWeightToPorePressure}. */
export interface MudWeightMarginComparison {
  ppEmwPpg: Float64Array;
  mudWeightPpg: Float64Array;
  /** Mud weight − predicted pore pressure, ppg; NaN where either is missing. */
  marginPpg: Float64Array;
  /** 1 where the margin is below the threshold. */
  lowMargin: Uint8Array;
  runs: LowMarginRun[];
  shows: ShowComparison[];
  /** Kicks and connection/trip gas with no low-margin sample within tolerance: the prediction missed them. */
  missedShowCount: number;
}

/**
 * Compare predicted pore pressure with the mud weight used, sample by sample.
 *
 * margin [ppg] = MW [ppg] − Pp/(0.051948·TVD) [ppg]; a sample is flagged when margin <
 * threshold. Kicks and connection or trip gas are the field's evidence that the margin was
 * small or negative (a kick means the pore pressure exceeded the mud's bottom-hole pressure;
 * gas at connections means it came close when the pumps were off; common practice, no
 * source); each show is set against the prediction within ±toleranceFt. Background gas is
 * listed but never counted as missed.
 *
 * @param input.tvdFt TVD below RT, ft, non-decreasing (e.g. the drilling-data index)
 * @param input.ppPsi predicted pore pressure, psi (NaN = none)
 * @param input.mudWeightPsiPerFt mud weight (or ECD) in use per sample, psi/ft (typical 0.45–0.9)
 * @param input.minMarginPpg threshold, ppg (≥ 0 allowed negative for tests; typical 0.3–0.5)
 * @param input.shows kicks and gas shows (may be empty)
 * @param input.toleranceFt depth tolerance for matching shows, ft (default 50; ≥ 0)
 * @returns {@link MudWeightMarginComparison}
 * @throws ShalepointError E_LENGTH for misaligned arrays; E_RANGE for a non-finite threshold or negative tolerance
 * @example compareMudWeightToPorePressure({ tvdFt: [10000], ppPsi: [6234], mudWeightPsiPerFt: [12.2 * 12 / 231], minMarginPpg: 0.3, shows: [] }).marginPpg[0]
 * // 0.2 (12.2 ppg mud over a 12.0 ppg pore pressure) → lowMargin [1]
 */
export function compareMudWeightToPorePressure(input: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  mudWeightPsiPerFt: ArrayLike<number>;
  minMarginPpg: number;
  shows: readonly DrillingShow[];
  toleranceFt?: number;
}): MudWeightMarginComparison {
  const { tvdFt, ppPsi, mudWeightPsiPerFt, minMarginPpg, shows } = input;
  const tol = input.toleranceFt ?? 50;
  const n = tvdFt.length;
  if (ppPsi.length !== n || mudWeightPsiPerFt.length !== n) {
    throw new ShalepointError("E_LENGTH", "tvdFt, ppPsi and mudWeightPsiPerFt must have the same length", {
      param: "ppPsi",
      value: `${ppPsi.length}, ${mudWeightPsiPerFt.length} vs ${n}`,
    });
  }
  if (!Number.isFinite(minMarginPpg)) {
    throw new ShalepointError("E_RANGE", "minMarginPpg must be a finite number", { param: "minMarginPpg", value: minMarginPpg, unit: "ppg", allowed: "typical 0.3–0.5" });
  }
  if (!(tol >= 0)) throw new ShalepointError("E_RANGE", "toleranceFt must be ≥ 0", { param: "toleranceFt", value: tol, unit: "ft", allowed: "≥ 0" });
  const ppEmwPpg = new Float64Array(n);
  const mudWeightPpg = new Float64Array(n);
  const marginPpg = new Float64Array(n);
  const lowMargin = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const z = tvdFt[i];
    ppEmwPpg[i] = z > 0 ? ppPsi[i] / (z * PSI_PER_FT_PER_PPG) : NaN;
    mudWeightPpg[i] = mudWeightPsiPerFt[i] / PSI_PER_FT_PER_PPG;
    marginPpg[i] = mudWeightPpg[i] - ppEmwPpg[i];
    if (marginPpg[i] < minMarginPpg) lowMargin[i] = 1;
  }
  const runs: LowMarginRun[] = [];
  for (let i = 0; i < n; ) {
    if (!lowMargin[i]) {
      i++;
      continue;
    }
    let j = i;
    let k = i;
    while (j + 1 < n && lowMargin[j + 1]) {
      j++;
      if (marginPpg[j] < marginPpg[k]) k = j;
    }
    runs.push({ topTvdFt: tvdFt[i], baseTvdFt: tvdFt[j], minMarginPpg: marginPpg[k], minMarginTvdFt: tvdFt[k], sampleCount: j - i + 1 });
    i = j + 1;
  }
  let missedShowCount = 0;
  const out: ShowComparison[] = shows.map((s) => {
    let best = -1;
    let near = false;
    for (let i = 0; i < n; i++) {
      const d = Math.abs(tvdFt[i] - s.tvdFt);
      if (d > tol) continue;
      if (best < 0 || d < Math.abs(tvdFt[best] - s.tvdFt)) best = i;
      if (lowMargin[i]) near = true;
    }
    const predictedPpPpg = best >= 0 ? ppEmwPpg[best] : NaN;
    const mw = best >= 0 ? mudWeightPpg[best] : NaN;
    if (!near && s.event !== "background_gas") missedShowCount++;
    return {
      ...s,
      predictedPpPpg,
      mudWeightPpg: mw,
      marginPpg: mw - predictedPpPpg,
      nearLowMargin: near,
      kickMinusPredictedPpg: s.event === "kick" && s.emwPsiPerFt !== undefined ? s.emwPsiPerFt / PSI_PER_FT_PER_PPG - predictedPpPpg : NaN,
    };
  });
  return { ppEmwPpg, mudWeightPpg, marginPpg, lowMargin, runs, shows: out, missedShowCount };
}
