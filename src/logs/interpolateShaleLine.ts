/**
 * Shale line: a log value at every depth, interpolated between shale points.
 *
 * Pore-pressure methods built on compaction (Eaton, Bowers, equivalent depth) are valid
 * in shale only. The usual practice (common practice, no source) is to read the log at
 * shale points and join them with straight lines in depth across the sands between them,
 * so that a pore-pressure curve exists at every depth and still comes from shale.
 */
import { ShalepointError } from "../errors.js";

/**
 * Interpolate values known at shale points onto a full depth index.
 *
 * For each target depth z: the nearest valid points above (z1, v1) and below (z2, v2)
 * give v = v1 + (v2 − v1)(z − z1)/(z2 − z1). A point value that is NaN is skipped. Depths
 * above the first or below the last valid point, or in a gap wider than `maxGapFt` between
 * two points, give NaN (no extrapolation, no bridging of long gaps).
 *
 * @param pointTvdFt depths of the shale points, ft, non-decreasing (e.g. ShalePoints.tvdFt)
 * @param pointValues log value at each point, in the log's unit (e.g. µs/ft); NaN skipped
 * @param tvdFt target depths, ft, non-decreasing (the well's index); NaN gives NaN
 * @param maxGapFt widest gap between two valid points that is bridged, ft (> 0; default 1000)
 * @returns new Float64Array aligned with `tvdFt`
 * @throws ShalepointError E_LENGTH (points misaligned), E_NOT_SORTED (point depths decrease),
 *   E_RANGE (maxGapFt ≤ 0)
 * @example interpolateShaleLine({ pointTvdFt: [1000, 1100], pointValues: [120, 110], tvdFt: [1000, 1050, 1200] })
 * // Float64Array [120, 115, NaN]
 */
export function interpolateShaleLine(args: {
  pointTvdFt: ArrayLike<number>;
  pointValues: ArrayLike<number>;
  tvdFt: ArrayLike<number>;
  maxGapFt?: number;
}): Float64Array {
  const { pointTvdFt, pointValues, tvdFt } = args;
  const maxGap = args.maxGapFt ?? 1000;
  if (pointTvdFt.length !== pointValues.length) {
    throw new ShalepointError("E_LENGTH", "point depths and values must have the same length", {
      param: "pointValues",
      value: `${pointValues.length} vs ${pointTvdFt.length}`,
    });
  }
  if (!(maxGap > 0)) {
    throw new ShalepointError("E_RANGE", "maxGapFt must be > 0", { param: "maxGapFt", value: maxGap, unit: "ft", allowed: "> 0" });
  }
  // Valid points, in order.
  const zs: number[] = [];
  const vs: number[] = [];
  for (let k = 0; k < pointTvdFt.length; k++) {
    const z = pointTvdFt[k];
    const v = pointValues[k];
    if (!Number.isFinite(z) || !Number.isFinite(v)) continue;
    if (zs.length > 0 && z < zs[zs.length - 1]) {
      throw new ShalepointError("E_NOT_SORTED", "shale point depths must not decrease", {
        param: "pointTvdFt",
        row: k,
        value: z,
        unit: "ft",
        hint: "Pass points in depth order, as pickShalePoints returns them.",
      });
    }
    zs.push(z);
    vs.push(v);
  }
  const out = new Float64Array(tvdFt.length).fill(NaN);
  const m = zs.length;
  if (m === 0) return out;
  let j = 0; // zs[j] ≤ z < zs[j+1] as z increases
  for (let i = 0; i < tvdFt.length; i++) {
    const z = tvdFt[i];
    if (!(z >= zs[0] && z <= zs[m - 1])) continue;
    while (j < m - 2 && zs[j + 1] <= z) j++;
    if (m === 1 || z === zs[j]) {
      out[i] = vs[j];
      continue;
    }
    const z1 = zs[j];
    const z2 = zs[j + 1];
    if (z === z2) {
      out[i] = vs[j + 1];
    } else if (z2 - z1 <= maxGap) {
      out[i] = vs[j] + ((vs[j + 1] - vs[j]) * (z - z1)) / (z2 - z1);
    }
  }
  return out;
}
