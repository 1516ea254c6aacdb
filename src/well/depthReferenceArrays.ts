/**
 * Depth-reference arrays for a whole depth index: TVD below rotary table → TVDSS and depth
 * below mudline (or below ground level onshore). Definitions in well/types.ts.
 */
import type { Datums } from "./types.js";
import { mudlineTvdFt, tvdToTvdss } from "./depthReference.js";

/** TVDSS and below-mudline depths aligned with the input TVDs. */
export interface DepthReferenceArrays {
  /** TVD below mean sea level, ft (negative above sea level). */
  tvdssFt: Float64Array;
  /** Depth below mudline (offshore) or ground level (onshore), ft (negative above it). */
  bmlFt: Float64Array;
}

/**
 * TVDSS and depth-below-mudline arrays for a TVD index.
 *
 * TVDSS = TVD − rtElevationFt; BML = TVD − TVD(mudline), with TVD(mudline) =
 * rtElevationFt + waterDepthFt offshore, rtElevationFt − groundLevelFt onshore
 * (definitions, no published source needed). NaN carries through.
 *
 * @param tvdFt TVD below rotary table, ft; typical 0–25,000.
 * @param datums rotary-table elevation (Quillon wells: 82 ft air gap), water depth, …
 * @returns {@link DepthReferenceArrays}, ft; new arrays.
 * @example depthReferenceArrays({ tvdFt: new Float64Array([10082]), datums: { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 } })
 * // { tvdssFt: [10000], bmlFt: [7000] }
 */
export function depthReferenceArrays(args: { tvdFt: ArrayLike<number>; datums: Datums }): DepthReferenceArrays {
  const { tvdFt, datums } = args;
  const n = tvdFt.length;
  const z0 = mudlineTvdFt(datums);
  const tvdssFt = new Float64Array(n);
  const bmlFt = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    tvdssFt[i] = tvdToTvdss(tvdFt[i], datums);
    bmlFt[i] = tvdFt[i] - z0;
  }
  return { tvdssFt, bmlFt };
}
