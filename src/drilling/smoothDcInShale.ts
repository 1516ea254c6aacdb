/**
 * Corrected d-exponent smoothed over shale samples only.
 */
import { ShalepointError } from "../errors.js";

/** Result of {@link smoothDcInShale}. */
export interface SmoothedDc {
  /** Median of the shale dc values within ±halfWindowFt of each shale sample; NaN off shale. */
  dcSmoothed: Float64Array;
  /** Number of shale samples with a finite dc (the samples the smoothing used). */
  nUsed: number;
}

/**
 * Smooth the corrected d-exponent in shale intervals with a centred running median in depth.
 *
 * The d-exponent is read in shale only (Jorden & Shirley 1966, JPT 18(11):1387–1394: the
 * normal trend and the departure from it are defined for shale), and drilling data are
 * noisy sample to sample, so each shale sample takes the median of the finite dc of the
 * shale samples within ±halfWindowFt of it (sands never enter a shale value). Median, not
 * mean, so a single drilling-break spike does not move the curve (common practice, no source).
 *
 * @param input.tvdFt depth of each sample, ft, non-decreasing
 * @param input.dc corrected d-exponent per sample, dimensionless (typical 0.8–2.5), NaN = missing
 * @param input.isShale 1 = shale sample (e.g. from a gamma-ray cutoff or lithology log)
 * @param input.halfWindowFt half-width of the window, ft (> 0; default 25; typical 10–50)
 * @returns {@link SmoothedDc}; NaN where the sample is not shale or has no finite shale dc near it
 * @throws ShalepointError E_LENGTH for misaligned arrays, E_RANGE for halfWindowFt ≤ 0,
 *   E_NOT_SORTED when depth decreases
 * @example smoothDcInShale({ tvdFt: [0, 1, 2, 3], dc: [1.0, 5.0, 1.2, 1.1], isShale: [1, 1, 1, 1], halfWindowFt: 1 }).dcSmoothed
 * // [3.0, 1.2, 1.2, 1.15]
 */
export function smoothDcInShale(input: {
  tvdFt: ArrayLike<number>;
  dc: ArrayLike<number>;
  isShale: ArrayLike<number>;
  halfWindowFt?: number;
}): SmoothedDc {
  const { tvdFt, dc, isShale } = input;
  const h = input.halfWindowFt ?? 25;
  const n = tvdFt.length;
  if (dc.length !== n || isShale.length !== n) {
    throw new ShalepointError("E_LENGTH", "tvdFt, dc and isShale must have the same length", { param: "dc", value: `${dc.length}, ${isShale.length} vs ${n}` });
  }
  if (!(h > 0 && Number.isFinite(h))) {
    throw new ShalepointError("E_RANGE", "halfWindowFt must be > 0", { param: "halfWindowFt", value: h, unit: "ft", allowed: "> 0, typical 25" });
  }
  for (let i = 1; i < n; i++) {
    if (tvdFt[i] < tvdFt[i - 1]) throw new ShalepointError("E_NOT_SORTED", "depth must not decrease", { param: "tvdFt", row: i, value: tvdFt[i], unit: "ft" });
  }
  const out = new Float64Array(n).fill(NaN);
  let nUsed = 0;
  const usable = (j: number): boolean => isShale[j] === 1 && Number.isFinite(dc[j]);
  for (let j = 0; j < n; j++) if (usable(j)) nUsed++;
  const scratch: number[] = [];
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < n; i++) {
    if (isShale[i] !== 1) continue;
    const z = tvdFt[i];
    while (lo < n && tvdFt[lo] < z - h) lo++;
    if (hi < i) hi = i;
    while (hi + 1 < n && tvdFt[hi + 1] <= z + h) hi++;
    scratch.length = 0;
    for (let j = lo; j <= hi; j++) if (usable(j)) scratch.push(dc[j]);
    if (scratch.length === 0) continue;
    scratch.sort((a, b) => a - b);
    const m = scratch.length;
    out[i] = m % 2 === 1 ? scratch[(m - 1) >> 1] : 0.5 * (scratch[m / 2 - 1] + scratch[m / 2]);
  }
  return { dcSmoothed: out, nUsed };
}
