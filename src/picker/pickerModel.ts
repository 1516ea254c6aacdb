/**
 * The trend-picking page's model: the data the server sends, and the pure computations the
 * page repeats on every drag (trend from two handles, Eaton pore pressure at shale points).
 *
 * Pure and DOM-free, so the browser bundle (client/main.ts) and the Node tests run the same
 * code: a test can recompute what the page shows with the same modules.
 *
 * Results are estimates for trained engineers: calibrate to measured data and review; local
 * regulations and licensed practice govern.
 */
import { ShalepointError } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { evaluateCompactionTrend } from "../trend/evaluateCompactionTrend.js";
import type { BmlInterval, CompactionTrend, CompactionTrendKind } from "../trend/trendTypes.js";
import { eatonResistivityPorePressure, eatonSonicPorePressure } from "../porepressure/eaton.js";

/** Shale points as sent to the page (JSON: a missing value is null, read back as NaN). */
export interface PickerShalePoints {
  /** TVD below rotary table of each point, ft, increasing. */
  tvdFt: number[];
  /** Depth below mudline of each point, ft. */
  bmlFt: number[];
  /** Median shale slowness at the point, µs/ft (NaN = missing). */
  dtUsPerFt: number[];
  /** Median shale deep resistivity at the point, ohm·m (NaN = missing). */
  resistivityOhmM: number[];
  /** Overburden at the point, psi. */
  svPsi: number[];
  /** Hydrostatic pore pressure at the point, psi. */
  phPsi: number[];
}

/** Everything the page needs about one well (GET /data). */
export interface PickerWellData {
  wellName: string;
  /** TVD of the mudline below the rotary table, ft (bml = TVD − this, for a vertical reference). */
  mudlineTvdFt: number;
  /** Brine gradient used for the hydrostatic pressure, psi/ft. */
  hydrostaticGradientPsiPerFt: number;
  points: PickerShalePoints;
  /** Coarse overburden and hydrostatic profiles for the pressure track. */
  profile: { tvdFt: number[]; svPsi: number[]; phPsi: number[] };
  /** Trend shown first (from a file or an initial fit). */
  trend: CompactionTrend;
  /** Where the first trend came from, in words (e.g. file name, or "initial fit"). */
  trendSource: string;
  /** Intervals (ft below mudline) selected at start. */
  intervals: BmlInterval[];
  /** Matrix slowness used for the exponential sonic trend, µs/ft. */
  dtMatrixUsPerFt: number;
  /** File names (in the well folder) that Save writes, by log. */
  saveFileNames: { sonic: string; resistivity: string };
  caution: string;
}

/** A draggable point on the trend line: depth below mudline (ft) and log value (µs/ft or ohm·m). */
export interface TrendHandle {
  bmlFt: number;
  value: number;
}

/** Which log a trend kind reads: sonic slowness or resistivity. */
export function trendLogOf(kind: CompactionTrendKind): "sonic" | "resistivity" {
  return kind === "resistivityLogLinear" ? "resistivity" : "sonic";
}

function badHandles(message: string, value: unknown): ShalepointError {
  return new ShalepointError("E_PICKER_HANDLES", message, {
    param: "handles",
    value,
    hint: "Move the handles so they sit at different depths on the compacting side of the points.",
  });
}

/**
 * Trend through two handles: the one-segment normal compaction trend of a chosen model that
 * passes exactly through both points.
 *
 * Formulas (solve the model for its two free parameters):
 * - sonicLogLinear (Hottman & Johnson 1965, JPT 17(6):717–722, SPE-1110, semilog trend):
 *   s = (log10 v2 − log10 v1)/(z2 − z1), Δtml = v1·10^(−s·z1);
 * - resistivityLogLinear, Rn = R0·e^(bZ) (Zhang 2011, Earth-Science Reviews 108:50–63,
 *   doi:10.1016/j.earscirev.2011.06.001, normal resistivity form; from memory):
 *   b = ln(v2/v1)/(z2 − z1), R0 = v1·e^(−b·z1);
 * - sonicExponential, Δtn = Δtm + (Δtml − Δtm)e^(−cZ) (Zhang 2011, same paper, from memory)
 *   with Δtm fixed: c = ln((v1 − Δtm)/(v2 − Δtm))/(z2 − z1), Δtml = Δtm + (v1 − Δtm)e^(c·z1).
 *
 * @param kind trend model
 * @param handles two handles, depth ft below mudline (≥ 0, typical 500–8000) and value
 *   (µs/ft, typical 80–200; or ohm·m, typical 0.5–3)
 * @param dtMatrixUsPerFt matrix slowness Δtm, µs/ft, for sonicExponential (typical 65)
 * @returns a one-segment trend (top 0 ft bml, fittedOn null: entered by hand)
 * @throws ShalepointError E_PICKER_HANDLES when the handles share a depth, a value is not
 *   positive, a sonicExponential handle is at or below Δtm, or the exponential trend would
 *   grow with depth (c < 0)
 * @example trendFromHandles({ kind: "sonicLogLinear", handles: [{ bmlFt: 2000, value: 150 }, { bmlFt: 10000, value: 100 }] })
 * // segments[0].params: dtMudlineUsPerFt 166.0, log10SlopePerFt −2.201e-5 (122.5 µs/ft at 6000 ft)
 */
export function trendFromHandles({
  kind,
  handles,
  dtMatrixUsPerFt,
}: {
  kind: CompactionTrendKind;
  handles: readonly [TrendHandle, TrendHandle];
  dtMatrixUsPerFt?: number;
}): CompactionTrend {
  const [h1, h2] = handles;
  const z1 = h1.bmlFt;
  const z2 = h2.bmlFt;
  const v1 = h1.value;
  const v2 = h2.value;
  if (!(Number.isFinite(z1) && Number.isFinite(z2) && Math.abs(z2 - z1) > 1e-6)) {
    throw badHandles("the two handles must sit at different finite depths", `${z1}, ${z2} ft below mudline`);
  }
  if (!(v1 > 0 && v2 > 0 && Number.isFinite(v1) && Number.isFinite(v2))) {
    throw badHandles("handle values must be finite and > 0", `${v1}, ${v2}`);
  }
  if (kind === "sonicLogLinear") {
    const s = (Math.log10(v2) - Math.log10(v1)) / (z2 - z1);
    return {
      kind,
      segments: [{ topBmlFt: 0, params: { dtMudlineUsPerFt: v1 * 10 ** (-s * z1), log10SlopePerFt: s }, fittedOn: null }],
    };
  }
  if (kind === "resistivityLogLinear") {
    const b = Math.log(v2 / v1) / (z2 - z1);
    return { kind, segments: [{ topBmlFt: 0, params: { r0OhmM: v1 * Math.exp(-b * z1), growthPerFt: b }, fittedOn: null }] };
  }
  if (kind === "sonicExponential") {
    const m = dtMatrixUsPerFt;
    if (!(m !== undefined && Number.isFinite(m) && m > 0)) {
      throw new ShalepointError("E_PICKER_HANDLES", "the exponential sonic trend needs a matrix slowness", {
        param: "dtMatrixUsPerFt", value: m, unit: "us/ft", allowed: "> 0 (typical 55–70 for shale)",
      });
    }
    if (!(v1 > m && v2 > m)) throw badHandles(`both handles must be slower than the matrix slowness ${m} us/ft`, `${v1}, ${v2} us/ft`);
    const c = Math.log((v1 - m) / (v2 - m)) / (z2 - z1);
    if (!(c >= 0)) throw badHandles("an exponential sonic trend must get faster (smaller slowness) with depth", `${v1} us/ft at ${z1} ft, ${v2} us/ft at ${z2} ft`);
    return {
      kind,
      segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: m, dtMudlineUsPerFt: m + (v1 - m) * Math.exp(c * z1), decayPerFt: c }, fittedOn: null }],
    };
  }
  throw new ShalepointError("E_PICKER_HANDLES", "unknown trend kind", { param: "kind", value: kind });
}

/**
 * Handles on a trend: the trend's value at two depths, where the page draws its drag handles.
 *
 * @param trend any trend (plain data)
 * @param topBmlFt upper handle depth, ft below mudline (typical 1000)
 * @param baseBmlFt lower handle depth, ft below mudline (typical 8000)
 * @returns two handles, in depth order as given
 * @throws ShalepointError from evaluateCompactionTrend (invalid trend)
 * @example handlesFromTrend({ trend: { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }] }, topBmlFt: 0, baseBmlFt: 10000 })
 * // [{ bmlFt: 0, value: 0.8 }, { bmlFt: 10000, value: 2.175 }]
 */
export function handlesFromTrend({
  trend,
  topBmlFt,
  baseBmlFt,
}: {
  trend: CompactionTrend;
  topBmlFt: number;
  baseBmlFt: number;
}): [TrendHandle, TrendHandle] {
  const v = evaluateCompactionTrend({ trend, bmlFt: [topBmlFt, baseBmlFt] });
  return [
    { bmlFt: topBmlFt, value: v[0] },
    { bmlFt: baseBmlFt, value: v[1] },
  ];
}

/** Pore pressure at the shale points, as the page shows it. */
export interface PickerPorePressure {
  /** Normal-trend value at each point (µs/ft or ohm·m). */
  trendValues: Float64Array;
  /** Eaton pore pressure at each point, psi (NaN where the log is missing). */
  ppPsi: Float64Array;
  /** Same as equivalent mud weight, ppg (Pp / (0.051948·TVD), exact 12/231 factor). */
  emwPpg: Float64Array;
}

/** JSON null → NaN. */
export function numbersOrNaN(values: readonly (number | null)[]): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < out.length; i++) {
    const v = values[i];
    out[i] = typeof v === "number" ? v : NaN;
  }
  return out;
}

/**
 * Eaton pore pressure at every shale point for a trend: the curve the page redraws on each drag.
 *
 * Formula (Eaton 1975, SPE-5544, stress form): Pp = Sv − (Sv − Ph)·(Δtn/Δt)^3.0 for sonic
 * trends, Pp = Sv − (Sv − Ph)·(R/Rn)^1.2 for resistivity, via porepressure/eaton.ts;
 * EMW = Pp/(0.051948·TVD) ppg (1 ppg = 12/231 psi/ft).
 *
 * @param points shale points with Sv and Ph (see {@link PickerShalePoints})
 * @param trend the current trend
 * @param exponent Eaton exponent (> 0); default 3.0 sonic, 1.2 resistivity
 * @returns {@link PickerPorePressure}
 * @throws ShalepointError from evaluateCompactionTrend and the Eaton functions
 * @example pickerPorePressure({ points: { tvdFt: [10000], bmlFt: [5000], dtUsPerFt: [120], resistivityOhmM: [NaN], svPsi: [10000], phPsi: [4650] },
 *   trend: { kind: "sonicExponential", segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null }] } }).ppPsi[0]
 * // 7335 psi (0.7335 psi/ft)
 */
export function pickerPorePressure({
  points,
  trend,
  exponent,
}: {
  points: PickerShalePoints;
  trend: CompactionTrend;
  exponent?: number;
}): PickerPorePressure {
  const bml = numbersOrNaN(points.bmlFt);
  const trendValues = evaluateCompactionTrend({ trend, bmlFt: bml });
  const overburdenPsi = numbersOrNaN(points.svPsi);
  const hydrostaticPsi = numbersOrNaN(points.phPsi);
  const result =
    trendLogOf(trend.kind) === "sonic"
      ? eatonSonicPorePressure({ overburdenPsi, hydrostaticPsi, dtUsPerFt: numbersOrNaN(points.dtUsPerFt), dtTrendUsPerFt: trendValues, exponent })
      : eatonResistivityPorePressure({
          overburdenPsi, hydrostaticPsi, resistivityOhmM: numbersOrNaN(points.resistivityOhmM), resistivityTrendOhmM: trendValues, exponent,
        });
  const tvd = numbersOrNaN(points.tvdFt);
  const emwPpg = new Float64Array(tvd.length);
  for (let i = 0; i < tvd.length; i++) emwPpg[i] = tvd[i] > 0 ? result.ppPsi[i] / (PSI_PER_FT_PER_PPG * tvd[i]) : NaN;
  return { trendValues, ppPsi: result.ppPsi, emwPpg };
}

/**
 * Index of the shale point nearest a depth, among points whose log value is present.
 *
 * @param tvdFt point depths, ft (TVD below RT)
 * @param values point log values (NaN = missing, skipped)
 * @param targetTvdFt the depth asked for, ft
 * @returns index, or −1 when no point has a value
 * @example nearestPointIndex({ tvdFt: [1000, 2000, 3000], values: [1, NaN, 1], targetTvdFt: 2100 }) // 2
 */
export function nearestPointIndex({
  tvdFt,
  values,
  targetTvdFt,
}: {
  tvdFt: ArrayLike<number | null>;
  values: ArrayLike<number | null>;
  targetTvdFt: number;
}): number {
  let best = -1;
  let bestDist = Infinity;
  for (let i = 0; i < tvdFt.length; i++) {
    const z = tvdFt[i];
    const v = values[i];
    if (typeof z !== "number" || typeof v !== "number" || !Number.isFinite(z) || !Number.isFinite(v)) continue;
    const d = Math.abs(z - targetTvdFt);
    if (d < bestDist) {
      bestDist = d;
      best = i;
    }
  }
  return best;
}
