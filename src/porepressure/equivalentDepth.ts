/**
 * Equivalent-depth method: equal shale log value means equal vertical effective stress.
 *
 * Reference: Foster, J.B. and Whalen, H.E., 1966, "Estimation of formation pressures from
 * electrical surveys — offshore Louisiana", Journal of Petroleum Technology 18(2):165–171
 * (citation from memory; the paper states the principle graphically rather than as a
 * numbered equation). In stresses: Pp(Z) = Sv(Z) − [Sv(Ze) − Ph(Ze)], where Ze is the
 * shallower depth at which the normal compaction trend equals the observed log value at Z.
 *
 * Imports: ../errors.js and the sibling porePressureFlags.ts.
 */
import { ShalepointError } from "../errors.js";
import {
  PP_FLAG_CLIPPED_AT_HYDROSTATIC,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_NO_EQUIVALENT_DEPTH,
  checkLimitOptions,
  finishPorePressure,
  requireLengths,
  type PorePressureResult,
} from "./porePressureFlags.js";

/**
 * A normal compaction trend as a function of TVD below RT (ft), or sampled on its own
 * increasing depth array (linear interpolation between samples, NaN outside them). Either
 * form must be strictly monotonic over the search interval (slowness falling with depth,
 * resistivity rising): only then is the equivalent depth unique.
 */
export type EquivalentDepthTrend =
  | { kind: "function"; valueAtTvdFt: (tvdFt: number) => number }
  | { kind: "sampled"; tvdFt: ArrayLike<number>; values: ArrayLike<number> };

/** Equivalent-depth pore pressure with the matched depth and the effective stress. */
export interface EquivalentDepthResult extends PorePressureResult {
  /** Ze, ft TVD below RT; NaN where none was found or input was missing. */
  equivalentDepthFt: Float64Array;
  /** σ = Sv(Ze) − Ph(Ze), psi; NaN where none. */
  effectiveStressPsi: Float64Array;
}

/** Index lo of the piece [x[lo], x[lo+1]] holding xq (binary search), or −1 outside [x0, xn-1]. */
function bracketIndex(x: ArrayLike<number>, xq: number): number {
  const n = x.length;
  if (!(n > 0 && xq >= x[0] && xq <= x[n - 1])) return -1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= xq) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Linear interpolation on the piece starting at lo (hi = lo + 1, or lo for one sample). */
function pieceValue(x: ArrayLike<number>, y: ArrayLike<number>, lo: number, xq: number): number {
  const hi = lo + 1 < x.length ? lo + 1 : lo;
  if (x[hi] === x[lo]) return y[lo];
  const t = (xq - x[lo]) / (x[hi] - x[lo]);
  if (t <= 0) return y[lo];
  if (t >= 1) return y[hi];
  return y[lo] + t * (y[hi] - y[lo]);
}

/** Linear interpolation in a non-decreasing abscissa; NaN outside [x0, xn-1]. */
/**
 * Same result as bracketIndex(x, xq), found by galloping from `hint` (a previous answer)
 * before bisecting: x is non-decreasing, so "x[k] ≤ xq" holds on a prefix and bracketIndex
 * returns the last k of that prefix, capped at n − 2 (n ≥ 2).
 */
function bracketIndexNear(x: ArrayLike<number>, xq: number, hint: number): number {
  const n = x.length;
  if (!(n > 0 && xq >= x[0] && xq <= x[n - 1])) return -1;
  if (n === 1) return 0;
  // Find lo ≤ n − 2 with x[lo] ≤ xq and hi = n − 1 or x[hi] > xq, then bisect as bracketIndex.
  let lo = hint > 0 && hint <= n - 2 ? hint : 0;
  let hi: number;
  let step = 1;
  if (x[lo] <= xq) {
    hi = lo + 1;
    while (hi < n - 1 && x[hi] <= xq) {
      lo = hi;
      step *= 2;
      hi = lo + step < n - 1 ? lo + step : n - 1;
    }
  } else {
    hi = lo;
    lo = lo - 1;
    while (lo > 0 && x[lo] > xq) {
      hi = lo;
      step *= 2;
      lo = hi - step > 0 ? hi - step : 0;
    }
  }
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= xq) lo = mid;
    else hi = mid;
  }
  return lo;
}

function interpolate(x: ArrayLike<number>, y: ArrayLike<number>, xq: number): number {
  const lo = bracketIndex(x, xq);
  return lo < 0 ? NaN : pieceValue(x, y, lo, xq);
}

function notMonotonic(what: string, value: unknown): never {
  throw new ShalepointError("E_NOT_MONOTONIC", `${what} must be strictly monotonic with depth`, {
    param: "trend",
    value,
    hint: "Equivalent depth needs a one-to-one trend (slowness falling or resistivity rising with depth).",
  });
}

/** Number of points at which a function trend is checked for monotonicity. */
const FUNCTION_TREND_CHECK_POINTS = 65;

/**
 * Equivalent-depth pore pressure (Foster & Whalen 1966).
 *
 * For each sample at depth Z with observed value x: find Ze in [searchTop, Z] with
 * trend(Ze) = x — for a sampled trend, by binary search for the bracketing pair of trend
 * samples and the exact root of the linear piece between them; for a function trend, by
 * bisection on the monotonic trend (relative depth tolerance 1e-12, at most 200 steps); then σ = Sv(Ze) − Ph(Ze) with Sv, Ph linearly interpolated in the well's
 * arrays, and Pp = Sv(Z) − σ.
 *
 * When no Ze exists:
 * - x at or beyond the trend at Z on the compacted side (faster or more resistive than
 *   normal): Ze = Z and Pp = Ph; flagged PP_FLAG_CLIPPED_AT_HYDROSTATIC when strictly beyond
 *   (the method cannot give underpressure).
 * - x less compacted than the trend at the search top (or the trend undefined at Z):
 *   Pp = NaN, flagged PP_FLAG_NO_EQUIVALENT_DEPTH.
 * NaN in Sv, Ph or x gives NaN with PP_FLAG_MISSING_INPUT.
 *
 * @param input.tvdFt TVD below RT per sample, ft, non-decreasing
 * @param input.overburdenPsi Sv per sample, psi
 * @param input.hydrostaticPsi Ph per sample, psi
 * @param input.observed shale log per sample in the trend's unit (e.g. slowness 110 µs/ft)
 * @param input.trend {@link EquivalentDepthTrend}
 * @param input.searchTopTvdFt shallowest depth Ze may take, ft (default: first sample with finite Sv and Ph)
 * @param input.floorAtHydrostatic, input.calibratedRangeTvdFt as for every method
 * @param input.fromIndex first sample to compute, 0 ≤ fromIndex ≤ n (default 0). The result
 *   then holds samples fromIndex…n−1 only (arrays of length n − fromIndex; warning indices
 *   count from fromIndex), each equal to the same sample of a run from 0: the whole arrays
 *   stay the search context for Ze, Sv(Ze) and Ph(Ze). For updates of a deepening well.
 * @returns ppPsi (psi), flags, warnings, equivalentDepthFt (ft), effectiveStressPsi (psi)
 * @throws ShalepointError E_LENGTH on length mismatch; E_NOT_SORTED when tvdFt decreases;
 *   E_NOT_MONOTONIC when the trend is not strictly monotonic; E_RANGE for a bad searchTopTvdFt
 * @example
 * // S/D 1.0 psi/ft, Ph/D 0.465 psi/ft; trend 200 − 0.01·z µs/ft; 120 µs/ft at 12,000 ft matches 8000 ft
 * equivalentDepthPorePressure({ tvdFt: [0, 8000, 12000], overburdenPsi: [0, 8000, 12000],
 *   hydrostaticPsi: [0, 3720, 5580], observed: [200, 120, 120],
 *   trend: { kind: "function", valueAtTvdFt: (z) => 200 - 0.01 * z } }).ppPsi[2] // 7720 psi
 * @see Foster & Whalen 1966, JPT 18(2):165–171 (from memory)
 */
export function equivalentDepthPorePressure(input: {
  tvdFt: ArrayLike<number>;
  overburdenPsi: ArrayLike<number>;
  hydrostaticPsi: ArrayLike<number>;
  observed: ArrayLike<number>;
  trend: EquivalentDepthTrend;
  searchTopTvdFt?: number;
  floorAtHydrostatic?: boolean;
  calibratedRangeTvdFt?: { topFt: number; baseFt: number };
  fromIndex?: number;
}): EquivalentDepthResult {
  const { tvdFt, overburdenPsi, hydrostaticPsi, observed, trend } = input;
  const n = tvdFt.length;
  requireLengths(n, { tvdFt, overburdenPsi, hydrostaticPsi, observed });
  checkLimitOptions(n, input);
  const from = input.fromIndex ?? 0;
  if (!(Number.isInteger(from) && from >= 0 && from <= n)) {
    throw new ShalepointError("E_RANGE", "fromIndex must be a sample index from 0 to the sample count", {
      param: "fromIndex",
      value: from,
      allowed: `integer 0–${n}`,
      hint: "Pass the first sample that needs computing, or leave fromIndex out for the whole well.",
    });
  }
  const m = n - from;
  // The limits are applied to the computed samples only.
  const limits = {
    floorAtHydrostatic: input.floorAtHydrostatic,
    calibratedRangeTvdFt: input.calibratedRangeTvdFt,
    tvdFt: from === 0 ? input.tvdFt : tailOf(tvdFt, from),
  };
  for (let i = 1; i < n; i++) {
    if (tvdFt[i] < tvdFt[i - 1]) {
      throw new ShalepointError("E_NOT_SORTED", "tvdFt must be non-decreasing", { param: "tvdFt", value: tvdFt[i], unit: "ft", row: i });
    }
  }

  // The trend as a function of depth.
  let trendAt: (z: number) => number;
  let sampledZ: ArrayLike<number> | undefined;
  let sampledV: ArrayLike<number> | undefined;
  if (trend.kind === "sampled") {
    const tz = trend.tvdFt;
    const tv = trend.values;
    requireLengths(tz.length, { "trend.tvdFt": tz, "trend.values": tv });
    if (tz.length < 2) {
      throw new ShalepointError("E_TOO_FEW", "a sampled trend needs at least 2 samples", { param: "trend.tvdFt", value: tz.length, allowed: "≥ 2" });
    }
    const dir = Math.sign(tv[1] - tv[0]);
    if (!(dir !== 0)) notMonotonic("trend.values", tv[1]);
    // One comparison pair per sample (this check runs on every call, also while drilling).
    for (let k = 1; k < tz.length; k++) {
      const up = tv[k] > tv[k - 1];
      if (!(tz[k] > tz[k - 1] && (dir > 0 ? up : tv[k] < tv[k - 1]))) {
        if (!(tz[k] > tz[k - 1])) notMonotonic("trend.tvdFt", tz[k]);
        notMonotonic("trend.values", tv[k]);
      }
    }
    trendAt = (z) => interpolate(tz, tv, z);
    sampledZ = tz;
    sampledV = tv;
  } else {
    trendAt = trend.valueAtTvdFt;
  }

  // Search top: first sample with finite Sv and Ph unless given.
  let top = input.searchTopTvdFt ?? NaN;
  if (input.searchTopTvdFt === undefined) {
    for (let i = 0; i < n; i++) {
      if (Number.isFinite(overburdenPsi[i]) && Number.isFinite(hydrostaticPsi[i]) && Number.isFinite(tvdFt[i])) {
        top = tvdFt[i];
        break;
      }
    }
  } else if (!Number.isFinite(top)) {
    throw new ShalepointError("E_RANGE", "searchTopTvdFt must be finite", { param: "searchTopTvdFt", value: top, unit: "ft" });
  }

  // Output k holds sample from + k.
  const raw = new Float64Array(m).fill(NaN);
  const ze = new Float64Array(m).fill(NaN);
  const sig = new Float64Array(m).fill(NaN);
  const flags = new Uint8Array(m);
  const svOut = from === 0 ? overburdenPsi : tailOf(overburdenPsi, from);
  const phOut = from === 0 ? hydrostaticPsi : tailOf(hydrostaticPsi, from);
  if (!Number.isFinite(top) || n === 0) {
    flags.fill(PP_FLAG_MISSING_INPUT);
    const done = finishPorePressure(raw, svOut, phOut, flags, limits, "Equivalent depth", true);
    return { ...done, equivalentDepthFt: ze, effectiveStressPsi: sig };
  }

  // Direction of compaction over the well (sign of trend change with depth), and a
  // monotonicity check of a function trend on a grid.
  const bottom = tvdFt[n - 1];
  const tTop = trendAt(top);
  const tBottom = trendAt(bottom);
  const s = Math.sign(tBottom - tTop);
  if (!(s !== 0 && Number.isFinite(s))) notMonotonic("trend", { top: tTop, bottom: tBottom });
  if (trend.kind === "function" && bottom > top) {
    let prev = tTop;
    for (let k = 1; k < FUNCTION_TREND_CHECK_POINTS; k++) {
      const cur = trendAt(top + ((bottom - top) * k) / (FUNCTION_TREND_CHECK_POINTS - 1));
      if (!(Math.sign(cur - prev) === s)) notMonotonic("trend", cur);
      prev = cur;
    }
  }

  // Search hints only speed the searches up (each finds the same index from any start).
  let cursor = 0;
  if (from > 0 && sampledZ !== undefined && sampledZ.length >= 2) cursor = Math.max(0, bracketIndexNear(sampledZ, tvdFt[from], 0));
  let hintA = 0;
  let hintLo = 0;
  for (let i = from; i < n; i++) {
    const k = i - from;
    const z = tvdFt[i];
    const x = observed[i];
    const sv = overburdenPsi[i];
    const ph = hydrostaticPsi[i];
    if (!(Number.isFinite(z) && Number.isFinite(x) && Number.isFinite(sv) && Number.isFinite(ph))) {
      flags[k] = PP_FLAG_MISSING_INPUT;
      continue;
    }
    let tz: number;
    if (sampledZ !== undefined && sampledV !== undefined) {
      // Depths are non-decreasing, so the trend piece at z is found by a forward cursor
      // (same piece and formula as interpolate()).
      const nT = sampledZ.length;
      if (!(z >= sampledZ[0] && z <= sampledZ[nT - 1])) tz = NaN;
      else {
        while (cursor + 2 < nT && sampledZ[cursor + 1] <= z) cursor++;
        tz = pieceValue(sampledZ, sampledV, cursor, z);
      }
    } else tz = trendAt(z);
    if (!Number.isFinite(tz) || z < top) {
      flags[k] = PP_FLAG_NO_EQUIVALENT_DEPTH;
      continue;
    }
    const d = (x - tz) * s;
    if (d >= 0) {
      // Normal or more compacted than the trend at Z: Ze = Z, Pp = Ph.
      ze[k] = z;
      sig[k] = sv - ph;
      raw[k] = ph;
      if (d > 0) flags[k] = PP_FLAG_CLIPPED_AT_HYDROSTATIC;
      continue;
    }
    if ((x - tTop) * s < 0) {
      flags[k] = PP_FLAG_NO_EQUIVALENT_DEPTH;
      continue;
    }
    // g(ze) = (trend(ze) − x)·s is ≤ 0 at top and > 0 at z.
    let zE: number;
    if (sampledZ !== undefined && sampledV !== undefined) {
      // Sampled trend: binary search for the last trend sample with g ≤ 0, then the root of
      // the linear piece after it (exact for the piecewise-linear trend), kept in [top, z].
      // g(k) = (trend[k] − x)·s never decreases with k (strictly monotone trend), so the
      // last k with g ≤ 0 is unique: it is bracketed by galloping from the previous
      // sample's answer (the shale line varies slowly with depth), then bisected. Same
      // index as a bisection over the whole trend.
      const last = sampledZ.length - 1;
      let a = 0;
      let b = last;
      if ((sampledV[a] - x) * s > 0) b = a;
      else if ((sampledV[b] - x) * s <= 0) a = b;
      else {
        // Here g(0) ≤ 0 < g(last).
        const h = hintA < last ? hintA : last - 1;
        let step = 1;
        if ((sampledV[h] - x) * s <= 0) {
          a = h;
          b = h + 1;
          while (b < last && (sampledV[b] - x) * s <= 0) {
            a = b;
            step *= 2;
            b = a + step < last ? a + step : last;
          }
        } else {
          b = h;
          a = h > 0 ? h - 1 : 0;
          while (a > 0 && (sampledV[a] - x) * s > 0) {
            b = a;
            step *= 2;
            a = b - step > 0 ? b - step : 0;
          }
        }
      }
      while (b - a > 1) {
        const mid = (a + b) >> 1;
        if ((sampledV[mid] - x) * s <= 0) a = mid;
        else b = mid;
      }
      hintA = a;
      const dv = sampledV[b] - sampledV[a];
      zE = a === b || dv === 0 ? sampledZ[a] : sampledZ[a] + ((x - sampledV[a]) / dv) * (sampledZ[b] - sampledZ[a]);
      if (!(zE >= top)) zE = top;
      if (!(zE <= z)) zE = z;
    } else {
      // Function trend: bisection.
      let lo = top;
      let hi = z;
      const tol = 1e-12 * Math.max(1, Math.abs(z));
      for (let k = 0; k < 200 && hi - lo > tol; k++) {
        const mid = 0.5 * (lo + hi);
        if ((trendAt(mid) - x) * s <= 0) lo = mid;
        else hi = mid;
      }
      zE = 0.5 * (lo + hi);
    }
    // Sv and Ph at Ze share one search of the depth index.
    const lo = bracketIndexNear(tvdFt, zE, hintLo);
    if (lo >= 0) hintLo = lo;
    const svE = lo < 0 ? NaN : pieceValue(tvdFt, overburdenPsi, lo, zE);
    const phE = lo < 0 ? NaN : pieceValue(tvdFt, hydrostaticPsi, lo, zE);
    if (!(Number.isFinite(svE) && Number.isFinite(phE))) {
      flags[k] = PP_FLAG_MISSING_INPUT;
      continue;
    }
    ze[k] = zE;
    sig[k] = svE - phE;
    raw[k] = sv - (svE - phE);
  }
  const done = finishPorePressure(raw, svOut, phOut, flags, limits, "Equivalent depth", true);
  return { ...done, equivalentDepthFt: ze, effectiveStressPsi: sig };
}

/** Samples from `from` on, without copying a typed array. */
function tailOf(a: ArrayLike<number>, from: number): ArrayLike<number> {
  return ArrayBuffer.isView(a) ? (a as Float64Array).subarray(from) : Array.prototype.slice.call(a, from);
}
