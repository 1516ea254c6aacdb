/**
 * Resampling of log curves from their own depth index (e.g. every 0.5 ft MD) onto a regular
 * TVD grid, by linear interpolation that never bridges a long gap.
 */
import { ShalepointError } from "../errors.js";

/** Curves on a regular TVD grid. */
export interface TvdResampled {
  /** Regular TVD grid, ft below rotary table: start, start + step, … ≤ stop. */
  tvdFt: Float64Array;
  /** Each input curve interpolated onto `tvdFt`; NaN inside gaps and outside its data. */
  curves: Record<string, Float64Array>;
}

/**
 * Resample curves to a regular TVD step by linear interpolation, NaN-aware.
 *
 * For a grid depth z, the value is interpolated linearly between the nearest valid (finite)
 * samples of that curve at or above z and at or below z, provided those two samples are at
 * most `maxGapFt` apart in TVD; otherwise the result is NaN — a gap stays a gap. A grid depth
 * that falls exactly on a valid sample takes that sample's value. Grid depths outside a
 * curve's first/last valid sample are NaN (no extrapolation). Samples whose TVD is NaN are
 * ignored. Linear interpolation: common practice, no source.
 *
 * The default grid runs over multiples of `stepFt` from the first to the last finite TVD.
 *
 * @param tvdFt TVD of each source sample, ft, strictly increasing over its finite entries
 *   (true for any hole with inclination < 90°); typical 0.5-ft MD sampling mapped to TVD.
 * @param curves curves aligned with `tvdFt`, any unit, NaN = missing.
 * @param stepFt grid step, ft, > 0; typical 0.5–10.
 * @param maxGapFt largest TVD distance between two valid samples that may be bridged, ft,
 *   ≥ 0; typical 2–5 × the source step (e.g. 2 ft for 0.5-ft data).
 * @param startFt, stopFt optional grid limits, ft (default: the TVD range rounded inward to
 *   multiples of stepFt).
 * @returns {@link TvdResampled}; new arrays.
 * @throws ShalepointError E_RANGE (bad step or gap limit), E_LENGTH (a curve's length differs
 *   from tvdFt), E_NOT_SORTED (finite TVDs not strictly increasing), E_TOO_FEW (no finite TVD).
 * @example
 * resampleToTvdStep({ tvdFt: new Float64Array([100, 101, 102]), curves: { GR: new Float64Array([50, NaN, 70]) },
 *   stepFt: 0.5, maxGapFt: 2 }).curves.GR // [50, 55, 60, 65, 70]
 */
export function resampleToTvdStep(args: {
  tvdFt: ArrayLike<number>;
  curves: Readonly<Record<string, ArrayLike<number>>>;
  stepFt: number;
  maxGapFt: number;
  startFt?: number;
  stopFt?: number;
}): TvdResampled {
  const { tvdFt, curves, stepFt, maxGapFt } = args;
  if (!(stepFt > 0 && Number.isFinite(stepFt))) {
    throw new ShalepointError("E_RANGE", "TVD step must be a positive number", {
      param: "stepFt", value: stepFt, unit: "ft", allowed: "> 0",
    });
  }
  if (!(maxGapFt >= 0)) {
    throw new ShalepointError("E_RANGE", "gap limit must be ≥ 0", {
      param: "maxGapFt", value: maxGapFt, unit: "ft", allowed: "≥ 0 (Infinity to bridge every gap)",
    });
  }
  // Finite TVD samples, checked for order.
  const src: number[] = [];
  let prev = -Infinity;
  for (let i = 0; i < tvdFt.length; i++) {
    const z = tvdFt[i];
    if (Number.isNaN(z)) continue;
    if (!(z > prev)) {
      throw new ShalepointError("E_NOT_SORTED", "TVD must strictly increase along the depth index", {
        param: "tvdFt", row: i, value: z, unit: "ft", allowed: `> ${prev}`,
        hint: "Resampling to TVD needs a hole that never reaches horizontal; resample the horizontal part in MD.",
      });
    }
    prev = z;
    src.push(i);
  }
  if (src.length === 0) {
    throw new ShalepointError("E_TOO_FEW", "no finite TVD to resample from", {
      param: "tvdFt", value: tvdFt.length, allowed: "at least 1 finite TVD",
    });
  }
  for (const [name, c] of Object.entries(curves)) {
    if (c.length !== tvdFt.length) {
      throw new ShalepointError("E_LENGTH", `curve ${name} and tvdFt must have the same length`, {
        param: `curves.${name}`, value: `${c.length} vs ${tvdFt.length}`,
      });
    }
  }
  const zFirst = tvdFt[src[0]];
  const zLast = tvdFt[src[src.length - 1]];
  const start = args.startFt ?? Math.ceil(zFirst / stepFt - 1e-9) * stepFt;
  const stop = args.stopFt ?? Math.floor(zLast / stepFt + 1e-9) * stepFt;
  const count = stop >= start ? Math.floor((stop - start) / stepFt + 1e-9) + 1 : 0;
  const grid = new Float64Array(count);
  for (let j = 0; j < count; j++) grid[j] = start + j * stepFt;

  const outCurves: Record<string, Float64Array> = {};
  for (const [name, c] of Object.entries(curves)) {
    const out = new Float64Array(count);
    // Sweep: `a` = last valid source position (in src) with tvd ≤ z; `b` = first valid ≥ z.
    let a = -1; // index into src of last valid sample at or above the grid depth
    let p = 0; // next src position to examine
    let bCache = -1; // first valid src position ≥ an earlier p (still first valid ≥ p if ≥ p)
    for (let j = 0; j < count; j++) {
      const z = grid[j];
      while (p < src.length && tvdFt[src[p]] <= z) {
        if (!Number.isNaN(c[src[p]])) a = p;
        p++;
      }
      if (a >= 0 && tvdFt[src[a]] === z) { out[j] = c[src[a]]; continue; }
      let b = bCache >= p ? bCache : p;
      while (b < src.length && Number.isNaN(c[src[b]])) b++;
      bCache = b;
      if (a < 0 || b >= src.length) { out[j] = NaN; continue; }
      const za = tvdFt[src[a]], zb = tvdFt[src[b]];
      if (zb - za > maxGapFt) { out[j] = NaN; continue; }
      const va = c[src[a]], vb = c[src[b]];
      out[j] = va + ((vb - va) * (z - za)) / (zb - za);
    }
    outCurves[name] = out;
  }
  return { tvdFt: grid, curves: outCurves };
}
