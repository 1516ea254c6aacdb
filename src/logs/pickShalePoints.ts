/**
 * Shale flag and shale points: the samples (or bed/window representatives) on which normal
 * compaction trends and pore-pressure methods are read.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { despikeLog } from "./despikeLog.js";
import type { SampleWindow } from "./sampleWindow.js";
import { vshaleFromGammaRay, type VshaleModel } from "./vshaleFromGammaRay.js";
import { medianInPlace } from "../trend/medianInPlace.js";

/** How a sample is called shale. */
export type ShaleCriterion =
  /** Shale where GR ≥ cutoffApi. */
  | { kind: "grCutoff"; cutoffApi: number }
  /** Shale where Vsh(GR) ≥ vshaleCutoff (see {@link vshaleFromGammaRay}). */
  | { kind: "vshale"; grSandApi: number; grShaleApi: number; model: VshaleModel; vshaleCutoff: number };

/** How shale samples are thinned into points. */
export type ShaleDecimation =
  /** Every shale sample is a point. */
  | { kind: "none" }
  /** One point per shale bed (run of contiguous shale samples): its middle sample, medians of the bed. */
  | { kind: "bedMedian" }
  /** One point per TVD window [k·windowFt, (k+1)·windowFt): its middle shale sample, medians of the window. */
  | { kind: "window"; windowFt: number };

/** A TVD interval the user forces out of (exclude) or into (include) the shale set. */
export interface ShaleMask {
  /** Interval top and base, TVD ft below rotary table, top ≤ base; both ends inclusive. */
  topTvdFt: number;
  baseTvdFt: number;
  action: "exclude" | "include";
}

/** Shale points, one entry per point, all arrays the same length. */
export interface ShalePoints {
  /** Sample index of the point's representative sample in the input index. */
  index: Int32Array;
  /** TVD of the representative sample, ft. */
  tvdFt: Float64Array;
  /** TVD of the first and last shale sample the point stands for, ft. */
  topTvdFt: Float64Array;
  baseTvdFt: Float64Array;
  /** Number of shale samples the point stands for. */
  sampleCount: Int32Array;
  /** Median GR (despiked) over those samples, API. */
  grApi: Float64Array;
  /** Median (NaN-aware) of each extra curve over those samples, in the curve's unit. */
  values: Record<string, Float64Array>;
}

/** Result of {@link pickShalePoints}. */
export interface ShalePick {
  /** 1 where the sample is shale after all rules and masks, else 0. */
  isShale: Uint8Array;
  /** GR used for picking (despiked unless despiking was off), API. */
  grUsedApi: Float64Array;
  /** Indices of GR spikes removed before picking (empty when despiking was off). */
  spikeIndex: Int32Array;
  points: ShalePoints;
  warnings: Warning[];
}

function medianOf(values: ArrayLike<number>, members: Int32Array, from: number, to: number, scratch: Float64Array): number {
  let m = 0;
  for (let j = from; j < to; j++) { const v = values[members[j]]; if (v === v) scratch[m++] = v; }
  if (m === 0) return NaN;
  // Middle order statistic(s) by selection (trend/medianInPlace.ts) instead of a full sort:
  // the same values are picked, so the median is the same number.
  const med = medianInPlace(scratch.subarray(0, m));
  if (med === 0) {
    // A sort orders −0 before +0, selection treats them as equal: settle zeros by sorting.
    const sorted = scratch.subarray(0, m).sort();
    const k = (m - 1) >> 1;
    return m % 2 === 1 ? sorted[k] : 0.5 * (sorted[m / 2 - 1] + sorted[m / 2]);
  }
  return med;
}

/**
 * Pick shale samples and shale points from gamma ray.
 *
 * Steps, in order:
 * 1. Despike GR with {@link despikeLog} (Hampel identifier; skip with `despike: "off"`).
 * 2. Shale where GR ≥ cutoff, or where Vsh ≥ cutoff with Vsh from the gamma-ray index
 *    IGR = (GR − GRsand)/(GRshale − GRsand) and the linear or Larionov 1969 relations
 *    (Larionov 1969, *Borehole radiometry*, Nedra, Moscow — from memory). NaN GR or NaN TVD
 *    is never shale.
 * 3. Exclude masks clear samples.
 * 4. Beds thinner than `minBedThicknessFt` are dropped. A bed's thickness runs between the
 *    midpoints to its neighbouring samples (k samples at a regular step dz → k·dz).
 * 5. Include masks set samples to shale (except where an exclude mask also applies:
 *    exclusion wins), regardless of GR and bed thickness.
 * 6. Points by decimation (see {@link ShaleDecimation}); medians skip NaN.
 * Cutoffs and bed thickness are user choices: common practice, no source.
 *
 * @param tvdFt TVD below rotary table, ft, non-decreasing over finite values; NaN allowed.
 * @param grApi gamma ray, API, aligned with tvdFt; NaN = missing.
 * @param criterion {@link ShaleCriterion}; typical { kind: "grCutoff", cutoffApi: 90 } or a
 *   Vsh cutoff of 0.6–0.8.
 * @param minBedThicknessFt thinnest bed kept, ft, ≥ 0; default 0; typical 5–20.
 * @param despike settings for step 1, or "off"; default { window: { samples: 11 }, threshold: 3 }.
 * @param decimation {@link ShaleDecimation}; default { kind: "bedMedian" }.
 * @param masks {@link ShaleMask} list; default none.
 * @param curves extra curves aligned with tvdFt (e.g. DT, RES) whose medians the points carry.
 * @returns {@link ShalePick}; a W_NO_SHALE warning when no sample is shale.
 * @throws ShalepointError E_LENGTH (misaligned arrays), E_NOT_SORTED (TVD decreases),
 *   E_RANGE (bad cutoff, thickness, window or mask).
 * @example
 * pickShalePoints({ tvdFt: new Float64Array([1000, 1001, 1002, 1003]), grApi: new Float64Array([40, 110, 115, 112]),
 *   criterion: { kind: "grCutoff", cutoffApi: 90 }, despike: "off" }).points.index // [2]
 */
export function pickShalePoints(args: {
  tvdFt: ArrayLike<number>;
  grApi: ArrayLike<number>;
  criterion: ShaleCriterion;
  minBedThicknessFt?: number;
  despike?: { window?: SampleWindow; threshold?: number } | "off";
  decimation?: ShaleDecimation;
  masks?: readonly ShaleMask[];
  curves?: Readonly<Record<string, ArrayLike<number>>>;
}): ShalePick {
  const { tvdFt, grApi, criterion } = args;
  const n = tvdFt.length;
  const minBed = args.minBedThicknessFt ?? 0;
  const decimation = args.decimation ?? { kind: "bedMedian" };
  const masks = args.masks ?? [];
  const curves = args.curves ?? {};
  if (grApi.length !== n) {
    throw new ShalepointError("E_LENGTH", "grApi and tvdFt must have the same length", { param: "grApi", value: `${grApi.length} vs ${n}` });
  }
  for (const [name, c] of Object.entries(curves)) {
    if (c.length !== n) throw new ShalepointError("E_LENGTH", `curve ${name} and tvdFt must have the same length`, { param: `curves.${name}`, value: `${c.length} vs ${n}` });
  }
  if (!(minBed >= 0)) {
    throw new ShalepointError("E_RANGE", "minimum bed thickness must be ≥ 0", { param: "minBedThicknessFt", value: minBed, unit: "ft", allowed: "≥ 0" });
  }
  if (decimation.kind === "window" && !(decimation.windowFt > 0 && Number.isFinite(decimation.windowFt))) {
    throw new ShalepointError("E_RANGE", "decimation window must be > 0", { param: "decimation.windowFt", value: decimation.windowFt, unit: "ft", allowed: "> 0" });
  }
  masks.forEach((m, r) => {
    if (!(m.topTvdFt <= m.baseTvdFt)) {
      throw new ShalepointError("E_RANGE", "mask top must be at or above its base", { param: `masks[${r}]`, row: r, value: `${m.topTvdFt}–${m.baseTvdFt}`, unit: "ft", allowed: "topTvdFt ≤ baseTvdFt" });
    }
  });
  let prev = -Infinity;
  for (let i = 0; i < n; i++) {
    const z = tvdFt[i];
    if (Number.isNaN(z)) continue;
    if (z < prev) throw new ShalepointError("E_NOT_SORTED", "TVD must not decrease along the index", { param: "tvdFt", row: i, value: z, unit: "ft", allowed: `≥ ${prev}` });
    prev = z;
  }

  // 1. despike
  let gr: Float64Array;
  let spikeIndex: Int32Array;
  if (args.despike === "off") {
    gr = Float64Array.from(grApi);
    spikeIndex = new Int32Array(0);
  } else {
    const d = despikeLog({ values: grApi, window: args.despike?.window, threshold: args.despike?.threshold });
    gr = d.values;
    spikeIndex = d.spikeIndex;
  }

  // 2. criterion
  const isShale = new Uint8Array(n);
  if (criterion.kind === "grCutoff") {
    if (!Number.isFinite(criterion.cutoffApi)) {
      throw new ShalepointError("E_RANGE", "GR cutoff must be a finite number", { param: "criterion.cutoffApi", value: criterion.cutoffApi, unit: "API" });
    }
    for (let i = 0; i < n; i++) if (gr[i] >= criterion.cutoffApi && !Number.isNaN(tvdFt[i])) isShale[i] = 1;
  } else {
    if (!(criterion.vshaleCutoff >= 0 && criterion.vshaleCutoff <= 1)) {
      throw new ShalepointError("E_RANGE", "Vshale cutoff must be in [0, 1]", { param: "criterion.vshaleCutoff", value: criterion.vshaleCutoff, allowed: "[0, 1], typical 0.7" });
    }
    const vsh = vshaleFromGammaRay({ grApi: gr, grSandApi: criterion.grSandApi, grShaleApi: criterion.grShaleApi, model: criterion.model });
    for (let i = 0; i < n; i++) if (vsh[i] >= criterion.vshaleCutoff && !Number.isNaN(tvdFt[i])) isShale[i] = 1;
  }

  // 3. exclude masks
  const inMask = (z: number, action: "exclude" | "include"): boolean => {
    for (const m of masks) if (m.action === action && z >= m.topTvdFt && z <= m.baseTvdFt) return true;
    return false;
  };
  const excluded = new Uint8Array(n);
  if (masks.length > 0) {
    for (let i = 0; i < n; i++) if (inMask(tvdFt[i], "exclude")) { excluded[i] = 1; isShale[i] = 0; }
  }

  // 4. minimum bed thickness
  if (minBed > 0) {
    let i = 0;
    while (i < n) {
      if (!isShale[i]) { i++; continue; }
      let e = i;
      while (e + 1 < n && isShale[e + 1]) e++;
      const top = i > 0 && !Number.isNaN(tvdFt[i - 1]) ? 0.5 * (tvdFt[i - 1] + tvdFt[i]) : tvdFt[i];
      const base = e < n - 1 && !Number.isNaN(tvdFt[e + 1]) ? 0.5 * (tvdFt[e] + tvdFt[e + 1]) : tvdFt[e];
      if (base - top < minBed) for (let j = i; j <= e; j++) isShale[j] = 0;
      i = e + 1;
    }
  }

  // 5. include masks
  if (masks.length > 0) {
    for (let i = 0; i < n; i++) if (!excluded[i] && !Number.isNaN(tvdFt[i]) && inMask(tvdFt[i], "include")) isShale[i] = 1;
  }

  // 6. points: group members as one flat index list with start offsets (no per-sample arrays).
  const members = new Int32Array(n);
  const starts: number[] = [];
  let count = 0;
  if (decimation.kind === "none") {
    for (let i = 0; i < n; i++) if (isShale[i]) { starts.push(count); members[count++] = i; }
  } else if (decimation.kind === "bedMedian") {
    let open = false;
    for (let i = 0; i < n; i++) {
      if (isShale[i]) { if (!open) { starts.push(count); open = true; } members[count++] = i; } else open = false;
    }
  } else {
    let key = NaN;
    let open = false;
    const wFt = decimation.windowFt;
    for (let i = 0; i < n; i++) {
      if (!isShale[i]) continue;
      const k = Math.floor(tvdFt[i] / wFt);
      if (!(open && k === key)) { starts.push(count); open = true; key = k; }
      members[count++] = i;
    }
  }
  starts.push(count);
  const m = starts.length - 1;
  const points: ShalePoints = {
    index: new Int32Array(m), tvdFt: new Float64Array(m), topTvdFt: new Float64Array(m), baseTvdFt: new Float64Array(m),
    sampleCount: new Int32Array(m), grApi: new Float64Array(m), values: {},
  };
  const curveEntries = Object.entries(curves);
  const curveOut = curveEntries.map(([name]) => (points.values[name] = new Float64Array(m)));
  let widest = 0;
  for (let p = 0; p < m; p++) widest = Math.max(widest, starts[p + 1] - starts[p]);
  const scratch = new Float64Array(widest);
  for (let p = 0; p < m; p++) {
    const from = starts[p];
    const to = starts[p + 1];
    const rep = members[from + ((to - from - 1) >> 1)];
    points.index[p] = rep;
    points.tvdFt[p] = tvdFt[rep];
    points.topTvdFt[p] = tvdFt[members[from]];
    points.baseTvdFt[p] = tvdFt[members[to - 1]];
    points.sampleCount[p] = to - from;
    points.grApi[p] = medianOf(gr, members, from, to, scratch);
    for (let c = 0; c < curveEntries.length; c++) curveOut[c][p] = medianOf(curveEntries[c][1], members, from, to, scratch);
  }
  const warnings: Warning[] = [];
  if (m === 0) warnings.push({ code: "W_NO_SHALE", message: "no sample met the shale criterion; check the cutoff, masks and bed thickness", count: 0 });
  return { isShale, grUsedApi: gr, spikeIndex, points, warnings };
}
