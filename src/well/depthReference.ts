/**
 * Depth references: TVD below rotary table ↔ TVDSS ↔ depth below mudline.
 * All depths in ft, positive downward. See well/types.ts for the definitions.
 */
import type { Datums } from "./types.js";

/**
 * TVD below rotary table → TVD below mean sea level.
 * @param tvdFt TVD below RT, ft
 * @returns TVDSS, ft (negative above sea level)
 * @example tvdToTvdss(10082, { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 }) // 10000
 */
export function tvdToTvdss(tvdFt: number, datums: Datums): number {
  return tvdFt - datums.rtElevationFt;
}

/** TVDSS → TVD below RT, ft. */
export function tvdssToTvd(tvdssFt: number, datums: Datums): number {
  return tvdssFt + datums.rtElevationFt;
}

/** TVD below RT of the mudline (offshore) or ground level (onshore), ft. */
export function mudlineTvdFt(datums: Datums): number {
  if (datums.waterDepthFt > 0) return datums.rtElevationFt + datums.waterDepthFt;
  return datums.rtElevationFt - (datums.groundLevelFt ?? 0);
}

/**
 * TVD below RT → depth below mudline (offshore) or ground level (onshore), ft.
 * Negative above the mudline.
 * @example tvdToBml(10000, { rtElevationFt: 80, waterDepthFt: 3000, seawaterDensityGcc: 1.03 }) // 6920
 */
export function tvdToBml(tvdFt: number, datums: Datums): number {
  return tvdFt - mudlineTvdFt(datums);
}

/** Array form of {@link tvdToBml}; returns a new array. */
export function tvdArrayToBml(tvdFt: ArrayLike<number>, datums: Datums): Float64Array {
  const z0 = mudlineTvdFt(datums);
  const out = new Float64Array(tvdFt.length);
  for (let i = 0; i < out.length; i++) out[i] = tvdFt[i] - z0;
  return out;
}
