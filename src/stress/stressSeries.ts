/**
 * Small shared helpers for the fracture-gradient, stress-bound and wellbore-limit files of
 * `stress/`: depth-varying coefficients (constant, table of depth/value pairs, or a curve on
 * the depth index), interpolation at an arbitrary depth, and input checks.
 *
 * Imports only ../errors.js, so a stress file plus this one can be copied into a script.
 */
import { ShalepointError, requireSameLength } from "../errors.js";

/** One row of a coefficient table: a value at a true vertical depth (ft below RT). */
export interface DepthValuePoint {
  /** True vertical depth below the rotary table, ft. */
  depthFt: number;
  /** Coefficient value at that depth (dimensionless unless stated by the caller). */
  value: number;
}

/**
 * A coefficient that may vary with depth: one number for the whole well; a table of
 * (depth, value) rows, interpolated linearly in depth and held constant beyond its first and
 * last rows; or a curve (Float64Array) aligned to the well's depth index, NaN = missing.
 */
export type DepthVaryingCoefficient = number | readonly DepthValuePoint[] | Float64Array;

/** A number for every sample, or one number for all samples. */
export type StressSeries = number | ArrayLike<number>;

/**
 * Resolve a depth-varying coefficient onto a depth index.
 *
 * Formula: table → linear interpolation between rows, constant beyond the ends; curve →
 * copied; number → repeated.
 * @param args.tvdFt depth index, ft TVD below RT, non-decreasing
 * @param args.coefficient the coefficient (see {@link DepthVaryingCoefficient})
 * @param args.name name used in error messages, e.g. `poissonRatio`
 * @returns a new Float64Array aligned to `tvdFt`
 * @throws ShalepointError E_TABLE when a table is empty, unsorted or has non-finite rows;
 *   E_LENGTH when a curve's length differs from `tvdFt`
 * @example resolveDepthCoefficient({ tvdFt: new Float64Array([1000, 2000]), coefficient: [{ depthFt: 0, value: 0.3 }, { depthFt: 4000, value: 0.5 }], name: "nu" }) // [0.35, 0.4]
 */
export function resolveDepthCoefficient(args: {
  tvdFt: ArrayLike<number>;
  coefficient: DepthVaryingCoefficient;
  name: string;
}): Float64Array {
  const { tvdFt, coefficient, name } = args;
  const n = tvdFt.length;
  const out = new Float64Array(n);
  if (typeof coefficient === "number") {
    out.fill(coefficient);
    return out;
  }
  if (coefficient instanceof Float64Array) {
    requireSameLength(coefficient, tvdFt, name, "tvdFt");
    out.set(coefficient);
    return out;
  }
  checkTable(coefficient, name);
  for (let i = 0; i < n; i++) out[i] = tableAt(coefficient, tvdFt[i]);
  return out;
}

/**
 * Value of a depth-varying coefficient at one depth (not necessarily on the index).
 * A curve is interpolated linearly on `tvdFt` and held constant beyond its ends.
 * @param args.depthFt depth to read, ft TVD
 * @returns the coefficient there (NaN when the depth is NaN or a curve neighbour is NaN)
 * @throws as {@link resolveDepthCoefficient}
 * @example coefficientAtDepth({ tvdFt: new Float64Array([0]), coefficient: 0.8, name: "ki", depthFt: 5449 }) // 0.8
 */
export function coefficientAtDepth(args: {
  tvdFt: ArrayLike<number>;
  coefficient: DepthVaryingCoefficient;
  name: string;
  depthFt: number;
}): number {
  const { tvdFt, coefficient, name, depthFt } = args;
  if (typeof coefficient === "number") return coefficient;
  if (Number.isNaN(depthFt)) return NaN;
  if (coefficient instanceof Float64Array) {
    requireSameLength(coefficient, tvdFt, name, "tvdFt");
    return interpolateOnDepthIndex({ tvdFt, values: coefficient, depthFt, clampEnds: true });
  }
  checkTable(coefficient, name);
  return tableAt(coefficient, depthFt);
}

/**
 * Linear interpolation of a curve on a non-decreasing depth index at one depth.
 * @param args.clampEnds true: hold the end values beyond the index; false: NaN outside
 * @returns interpolated value; NaN if a bracketing sample is NaN
 * @example interpolateOnDepthIndex({ tvdFt: [0, 100], values: [0, 50], depthFt: 40, clampEnds: false }) // 20
 */
export function interpolateOnDepthIndex(args: {
  tvdFt: ArrayLike<number>;
  values: ArrayLike<number>;
  depthFt: number;
  clampEnds: boolean;
}): number {
  const { tvdFt, values, depthFt, clampEnds } = args;
  const n = tvdFt.length;
  if (n === 0 || Number.isNaN(depthFt)) return NaN;
  if (depthFt <= tvdFt[0]) return depthFt === tvdFt[0] || clampEnds ? values[0] : NaN;
  if (depthFt >= tvdFt[n - 1]) return depthFt === tvdFt[n - 1] || clampEnds ? values[n - 1] : NaN;
  const lo = depthBracketIndex(tvdFt, depthFt);
  const hi = Math.min(lo + 1, n - 1);
  const d0 = tvdFt[lo];
  const d1 = tvdFt[hi];
  if (d1 === d0) return values[lo];
  const t = (depthFt - d0) / (d1 - d0);
  return values[lo] + t * (values[hi] - values[lo]);
}

/**
 * Depth bracket: the index lo of the pair of neighbouring samples that holds a depth on an
 * increasing depth index, found by binary search (tvdFt[lo] ≤ depthFt < tvdFt[lo + 1] inside
 * the index; 0 above the first sample, n − 2 at or below the last).
 *
 * Formula: bisection of [0, n − 1] keeping tvdFt[lo] ≤ depthFt (common practice, no source).
 *
 * @param tvdFt depth index, ft, increasing (e.g. 0.5 ft steps from 5,000 to 15,000 ft)
 * @param depthFt the depth, ft (e.g. 11,547)
 * @returns lo, an index in [0, max(0, n − 2)]; 0 for an empty or one-sample index
 * @throws nothing
 * @example depthBracketIndex([100, 100.5, 101], 100.7) // 1
 */
export function depthBracketIndex(tvdFt: ArrayLike<number>, depthFt: number): number {
  let lo = 0;
  let hi = tvdFt.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (tvdFt[mid] <= depthFt) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Nearest depth sample: the index of the sample nearest a depth on an increasing depth index
 * (binary search; a depth half-way between two samples takes the shallower one).
 *
 * Formula: lo = depthBracketIndex(tvdFt, depthFt); the nearer of lo and lo + 1
 * (common practice, no source).
 *
 * @param tvdFt depth index, ft, increasing (e.g. 0.5 ft steps)
 * @param depthFt the depth, ft (e.g. 11,547)
 * @returns the index, or -1 outside [first − step/2, last + step/2] (step = mean spacing)
 *   or for NaN
 * @throws nothing
 * @example nearestDepthSampleIndex([100, 100.5, 101], 100.7) // 1
 */
export function nearestDepthSampleIndex(tvdFt: ArrayLike<number>, depthFt: number): number {
  const n = tvdFt.length;
  if (n === 0 || !Number.isFinite(depthFt)) return -1;
  const step = n > 1 ? (tvdFt[n - 1] - tvdFt[0]) / (n - 1) : 0;
  if (depthFt < tvdFt[0] - step / 2 || depthFt > tvdFt[n - 1] + step / 2) return -1;
  const lo = depthBracketIndex(tvdFt, depthFt);
  const hi = Math.min(lo + 1, n - 1);
  return Math.abs(tvdFt[hi] - depthFt) < Math.abs(depthFt - tvdFt[lo]) ? hi : lo;
}

/** Read element `i` of a series (a number stands for every sample). */
export function seriesValueAt(s: StressSeries, i: number): number {
  return typeof s === "number" ? s : s[i];
}

/**
 * Common length of several series: the length shared by every array among them (1 when all
 * are numbers).
 * @throws ShalepointError E_LENGTH when two arrays differ in length
 */
export function commonSeriesLength(series: Record<string, StressSeries>): number {
  let n = -1;
  let first = "";
  for (const [name, s] of Object.entries(series)) {
    if (typeof s === "number") continue;
    if (n < 0) {
      n = s.length;
      first = name;
    } else if (s.length !== n) {
      throw new ShalepointError("E_LENGTH", `${first} and ${name} must have the same length`, {
        param: `${first}, ${name}`,
        value: `${n} vs ${s.length}`,
        hint: "Put every curve on the same depth index first.",
      });
    }
  }
  return n < 0 ? 1 : n;
}

function checkTable(table: readonly DepthValuePoint[], name: string): void {
  if (table.length === 0) {
    throw new ShalepointError("E_TABLE", `${name} table has no rows`, {
      param: name,
      allowed: "at least 1 row of { depthFt, value }",
    });
  }
  for (let k = 0; k < table.length; k++) {
    const r = table[k];
    if (!Number.isFinite(r.depthFt) || !Number.isFinite(r.value)) {
      throw new ShalepointError("E_TABLE", `${name} table row ${k} is not finite`, {
        param: `${name}[${k}]`,
        value: r,
        allowed: "finite depthFt and value",
      });
    }
    if (k > 0 && r.depthFt <= table[k - 1].depthFt) {
      throw new ShalepointError("E_TABLE", `${name} table depths must increase`, {
        param: `${name}[${k}].depthFt`,
        value: r.depthFt,
        unit: "ft",
        allowed: `> ${table[k - 1].depthFt}`,
      });
    }
  }
}

function tableAt(table: readonly DepthValuePoint[], depthFt: number): number {
  if (Number.isNaN(depthFt)) return NaN;
  const last = table.length - 1;
  if (depthFt <= table[0].depthFt) return table[0].value;
  if (depthFt >= table[last].depthFt) return table[last].value;
  let k = 1;
  while (table[k].depthFt < depthFt) k++;
  const a = table[k - 1];
  const b = table[k];
  return a.value + ((depthFt - a.depthFt) / (b.depthFt - a.depthFt)) * (b.value - a.value);
}

/** Minimum horizontal stress (fracture closure) estimate on a depth index. */
export interface FractureEstimate {
  /** Minimum horizontal stress / fracture pressure, psi; NaN where an input is missing. */
  shminPsi: Float64Array;
  /** The same as a gradient (EMW), psi/ft = shminPsi / tvdFt; NaN at depth ≤ 0. */
  gradientPsiPerFt: Float64Array;
}

/** Check the three core curves share one length; return it. */
export function requireStressCurves(tvdFt: ArrayLike<number>, ppPsi: ArrayLike<number>, svPsi: ArrayLike<number>): number {
  requireSameLength(tvdFt, ppPsi, "tvdFt", "ppPsi");
  requireSameLength(tvdFt, svPsi, "tvdFt", "svPsi");
  return tvdFt.length;
}

/** Throw E_RANGE naming the first finite value outside (lo, hi) (open) in a coefficient array. */
export function requireOpenInterval(args: {
  values: ArrayLike<number>;
  tvdFt: ArrayLike<number>;
  name: string;
  lo: number;
  hi: number;
  hint?: string;
}): void {
  const { values, tvdFt, name, lo, hi, hint } = args;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isNaN(v)) continue;
    if (!(v > lo && v < hi)) {
      throw new ShalepointError("E_RANGE", `${name} is out of range at ${tvdFt[i]} ft`, {
        param: name,
        value: v,
        row: i,
        allowed: `(${lo}, ${hi}) exclusive`,
        hint,
      });
    }
  }
}

/** Gradient of a stress curve: psi / ft, NaN at depth ≤ 0. */
export function stressToGradient(stressPsi: ArrayLike<number>, tvdFt: ArrayLike<number>): Float64Array {
  const out = new Float64Array(stressPsi.length);
  for (let i = 0; i < out.length; i++) out[i] = tvdFt[i] > 0 ? stressPsi[i] / tvdFt[i] : NaN;
  return out;
}
