/**
 * Pore pressure from drilling data (corrected d-exponent and Eaton's dc form), in one call
 * and as a while-drilling update that appends new drilling-data rows.
 *
 * Chain: d (Jorden & Shirley 1966) → dc (Rehm & McClendon 1971) with the mud weight or ECD in
 * use → median-smoothed in shale → normal trend of ln(dc) on depth below mudline (fitted on
 * normally pressured intervals, or given = frozen) → Eaton 1975 dc form with exponent 1.2 by
 * default, optionally calibrated to measured pressures like the log methods.
 *
 * The update equals the full run bit for bit: d and dc are pointwise; the smoothing window
 * reaches ±halfWindowFt, so smoothed values are recomputed from the first old sample within
 * halfWindowFt of the new ones; the trend is refitted on all samples unless given, and when
 * its parameters change every sample's pore pressure is recomputed (pointwise, cheap).
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { ShalepointError, type Warning } from "../errors.js";
import type { Datums } from "../well/types.js";
import { depthReferenceArrays } from "../well/depthReferenceArrays.js";
import { dExponent, correctedDExponent } from "../drilling/dExponent.js";
import { smoothDcInShale } from "../drilling/smoothDcInShale.js";
import { fitDcNormalTrend, evaluateDcNormalTrend, type DcNormalTrend, type DcNormalTrendFit } from "../drilling/dcNormalTrend.js";
import { hydrostaticPressure } from "../stress/hydrostatic.js";
import { eatonPorePressure, eatonRatio, EATON_DEXPONENT_EXPONENT } from "../porepressure/eaton.js";
import { calibrateEatonExponent, type EatonCalibration } from "../porepressure/calibrateEaton.js";
import type { PressureObservation } from "../porepressure/misfitTable.js";
import { flagWarnings } from "../porepressure/porePressureFlags.js";

/** Drilling-data columns the chain reads (internal units; see readDrillingData). */
export interface DcDrillingColumns {
  tvdFt: ArrayLike<number>;
  ropFtPerH: ArrayLike<number>;
  rotaryRpm: ArrayLike<number>;
  wobLbf: ArrayLike<number>;
  bitIn: ArrayLike<number>;
  mudWeightPsiPerFt: ArrayLike<number>;
  ecdPsiPerFt?: ArrayLike<number>;
}

/** Options of {@link predictDcPorePressure}. */
export interface DcPorePressureOptions {
  datums: Datums;
  /** Normal pore-fluid gradient, psi/ft (typical 0.44–0.465): Ph and the dc correction. */
  hydrostaticGradientPsiPerFt: number;
  /** Correct d with the ECD where given (default false: the mud weight). */
  useEcd?: boolean;
  /** Half-width of the shale median window, ft (default 25). */
  smoothingHalfWindowFt?: number;
  /** The dc normal trend: fitted on normally pressured intervals, or given (frozen). */
  trend: { use: "fit"; intervals: { topBmlFt: number; baseBmlFt: number }[] } | { use: "given"; trend: DcNormalTrend };
  /** Eaton exponent (default 1.2, Eaton 1975). */
  exponent?: number;
  /** Measured pressures (index = drilling-data row) to fit the exponent to. */
  calibration?: { observations: PressureObservation[] };
}

/** Aligned per-sample inputs that are not in the drilling-data file. */
export interface DcSampleInputs {
  /** 1 = shale at the sample (e.g. from LWD gamma ray). */
  isShale: ArrayLike<number>;
  /** Overburden at each sample, psi (e.g. interpolated from a log-based prediction). */
  overburdenPsi: ArrayLike<number>;
}

/** Everything {@link predictDcPorePressure} computed, on the drilling-data index. */
export interface DcPorePressurePrediction {
  tvdFt: Float64Array;
  bmlFt: Float64Array;
  d: Float64Array;
  dc: Float64Array;
  dcSmoothed: Float64Array;
  trend: DcNormalTrend;
  trendFit?: DcNormalTrendFit;
  dcTrend: Float64Array;
  hydrostaticPsi: Float64Array;
  overburdenPsi: Float64Array;
  exponent: number;
  calibration?: EatonCalibration;
  ppPsi: Float64Array;
  flags: Uint8Array;
  warnings: Warning[];
}

/** A while-drilling dc prediction and the inputs so far. */
export interface DcWhileDrillingState {
  columns: { [K in keyof DcDrillingColumns]-?: Float64Array };
  samples: { isShale: Float64Array; overburdenPsi: Float64Array };
  options: DcPorePressureOptions;
  prediction: DcPorePressurePrediction;
  /** First row the last update recomputed (0 for a full run). */
  recomputedFromIndex: number;
}

function correctionGradient(cols: DcDrillingColumns, useEcd: boolean, from: number, n: number): Float64Array {
  const out = new Float64Array(n - from);
  for (let i = from; i < n; i++) {
    const ecd = useEcd && cols.ecdPsiPerFt ? cols.ecdPsiPerFt[i] : NaN;
    out[i - from] = Number.isFinite(ecd) ? ecd : cols.mudWeightPsiPerFt[i];
  }
  return out;
}

/**
 * Pore pressure from the corrected d-exponent for a drilled interval.
 *
 * Pp = Sv − (Sv − Ph)·(dco/dcn)^n (Eaton 1975, SPE-5544, d-exponent form; n = 1.2), dco the
 * smoothed shale dc, dcn the normal trend; d and dc from {@link dExponent} and
 * {@link correctedDExponent} (Jorden & Shirley 1966, JPT 18(11) eq. 2; Rehm & McClendon 1971,
 * SPE-3601).
 *
 * @param columns drilling data (see {@link DcDrillingColumns})
 * @param samples shale flag and overburden on the same rows (see {@link DcSampleInputs})
 * @param options see {@link DcPorePressureOptions}
 * @returns {@link DcPorePressurePrediction}
 * @throws ShalepointError E_LENGTH for misaligned inputs; E_TOO_FEW_POINTS when the trend
 *   intervals hold too few shale samples; every error of the stage modules
 * @example predictDcPorePressure(drilling, { isShale, overburdenPsi }, { datums, hydrostaticGradientPsiPerFt: 0.452,
 *   trend: { use: "fit", intervals: [{ topBmlFt: 1500, baseBmlFt: 4500 }] } }).ppPsi
 */
export function predictDcPorePressure(columns: DcDrillingColumns, samples: DcSampleInputs, options: DcPorePressureOptions): DcPorePressurePrediction {
  const n = columns.tvdFt.length;
  for (const [name, a] of Object.entries({ ...columns, ...samples })) {
    if (a !== undefined && a.length !== n) {
      throw new ShalepointError("E_LENGTH", `${name} must have one value per drilling-data row`, { param: name, value: `${a.length} vs ${n}` });
    }
  }
  const tvdFt = Float64Array.from(columns.tvdFt);
  const { bmlFt } = depthReferenceArrays({ tvdFt, datums: options.datums });
  const { d } = dExponent({ ropFtPerH: columns.ropFtPerH, rotaryRpm: columns.rotaryRpm, wobLbf: columns.wobLbf, bitIn: columns.bitIn });
  const dc = correctedDExponent(d, options.hydrostaticGradientPsiPerFt, correctionGradient(columns, options.useEcd ?? false, 0, n));
  const { dcSmoothed } = smoothDcInShale({ tvdFt, dc, isShale: samples.isShale, halfWindowFt: options.smoothingHalfWindowFt });
  const { trend, trendFit } = resolveDcTrend(options, bmlFt, dcSmoothed);
  const dcTrend = evaluateDcNormalTrend({ trend, bmlFt });
  const hydrostaticPsi = hydrostaticPressure({ tvdFt, datums: options.datums, gradientPsiPerFt: options.hydrostaticGradientPsiPerFt });
  const overburdenPsi = Float64Array.from(samples.overburdenPsi);
  const ratio = eatonRatio({ log: "dexponent", observed: dcSmoothed, trend: dcTrend });
  let exponent = options.exponent ?? EATON_DEXPONENT_EXPONENT;
  let calibration: EatonCalibration | undefined;
  if (options.calibration && options.calibration.observations.length > 0) {
    calibration = calibrateEatonExponent({ overburdenPsi, hydrostaticPsi, ratio, tvdFt, observations: options.calibration.observations });
    exponent = calibration.exponent;
  }
  const pp = eatonPorePressure({ overburdenPsi, hydrostaticPsi, tvdFt, ratio, exponent });
  return {
    tvdFt, bmlFt, d, dc, dcSmoothed, trend, trendFit, dcTrend, hydrostaticPsi, overburdenPsi, exponent, calibration,
    ppPsi: pp.ppPsi, flags: pp.flags, warnings: [...(calibration?.warnings ?? []), ...pp.warnings],
  };
}

function resolveDcTrend(options: DcPorePressureOptions, bmlFt: Float64Array, dcSmoothed: Float64Array): { trend: DcNormalTrend; trendFit?: DcNormalTrendFit } {
  if (options.trend.use === "given") return { trend: options.trend.trend };
  const trendFit = fitDcNormalTrend({ bmlFt, dc: dcSmoothed, intervals: options.trend.intervals });
  return { trend: trendFit.trend, trendFit };
}

/**
 * Start a while-drilling dc prediction (one full {@link predictDcPorePressure} run).
 * @param columns drilling data so far; @param samples shale flag and overburden on its rows
 * @param options see {@link DcPorePressureOptions}; calibration is not supported while drilling
 * @returns {@link DcWhileDrillingState}
 * @throws ShalepointError E_INCREMENTAL_UNSUPPORTED with calibration; errors of {@link predictDcPorePressure}
 * @example startDcWhileDrilling(drillingSoFar, { isShale, overburdenPsi }, options).prediction.ppPsi
 */
export function startDcWhileDrilling(columns: DcDrillingColumns, samples: DcSampleInputs, options: DcPorePressureOptions): DcWhileDrillingState {
  if (options.calibration) {
    throw new ShalepointError("E_INCREMENTAL_UNSUPPORTED", "exponent calibration is global: run predictDcPorePressure on the whole interval", { param: "calibration" });
  }
  const prediction = predictDcPorePressure(columns, samples, options);
  const n = columns.tvdFt.length;
  return {
    columns: {
      tvdFt: Float64Array.from(columns.tvdFt),
      ropFtPerH: Float64Array.from(columns.ropFtPerH),
      rotaryRpm: Float64Array.from(columns.rotaryRpm),
      wobLbf: Float64Array.from(columns.wobLbf),
      bitIn: Float64Array.from(columns.bitIn),
      mudWeightPsiPerFt: Float64Array.from(columns.mudWeightPsiPerFt),
      ecdPsiPerFt: columns.ecdPsiPerFt ? Float64Array.from(columns.ecdPsiPerFt) : new Float64Array(n).fill(NaN),
    },
    samples: { isShale: Float64Array.from(samples.isShale), overburdenPsi: Float64Array.from(samples.overburdenPsi) },
    options,
    prediction,
    recomputedFromIndex: 0,
  };
}

function cat(a: Float64Array, b: ArrayLike<number> | undefined, m: number): Float64Array {
  const out = new Float64Array(a.length + m);
  out.set(a);
  for (let i = 0; i < m; i++) out[a.length + i] = b === undefined ? NaN : b[i];
  return out;
}

function extend<T extends Float64Array | Uint8Array>(old: T, tail: T, from: number, n: number): T {
  const out = (old instanceof Uint8Array ? new Uint8Array(n) : new Float64Array(n)) as T;
  out.set(old.subarray(0, from));
  out.set(tail, from);
  return out;
}

/**
 * Append drilling-data rows (deeper than the last row) and refresh the dc pore pressure from
 * the first row the new data can change. Equals {@link predictDcPorePressure} on all rows bit
 * for bit; the input state is not changed.
 *
 * @param state from {@link startDcWhileDrilling} or a previous call
 * @param rows new drilling-data rows; @param samples their shale flag and overburden
 * @returns a new {@link DcWhileDrillingState}
 * @throws ShalepointError E_DEPTH_ORDER when a row is not below the last one; E_LENGTH when misaligned
 * @example appendDrillingRows(state, newRows, { isShale: [1], overburdenPsi: [9400] }).prediction.ppPsi
 */
export function appendDrillingRows(state: DcWhileDrillingState, rows: DcDrillingColumns, samples: DcSampleInputs): DcWhileDrillingState {
  const m = rows.tvdFt.length;
  const nOld = state.columns.tvdFt.length;
  for (const [name, a] of Object.entries({ ...rows, ...samples })) {
    if (a !== undefined && a.length !== m) throw new ShalepointError("E_LENGTH", `${name} must have one value per new row`, { param: name, value: `${a.length} vs ${m}` });
  }
  for (let i = 0; i < m; i++) {
    const prev = i === 0 ? (nOld > 0 ? state.columns.tvdFt[nOld - 1] : -Infinity) : rows.tvdFt[i - 1];
    if (!(rows.tvdFt[i] > prev)) {
      throw new ShalepointError("E_DEPTH_ORDER", "new drilling-data rows must be deeper than the last row", { param: "rows.tvdFt", row: i, value: rows.tvdFt[i], unit: "ft", allowed: `> ${prev}` });
    }
  }
  const c = state.columns;
  const columns: DcWhileDrillingState["columns"] = {
    tvdFt: cat(c.tvdFt, rows.tvdFt, m),
    ropFtPerH: cat(c.ropFtPerH, rows.ropFtPerH, m),
    rotaryRpm: cat(c.rotaryRpm, rows.rotaryRpm, m),
    wobLbf: cat(c.wobLbf, rows.wobLbf, m),
    bitIn: cat(c.bitIn, rows.bitIn, m),
    mudWeightPsiPerFt: cat(c.mudWeightPsiPerFt, rows.mudWeightPsiPerFt, m),
    ecdPsiPerFt: cat(c.ecdPsiPerFt, rows.ecdPsiPerFt, m),
  };
  const s = { isShale: cat(state.samples.isShale, samples.isShale, m), overburdenPsi: cat(state.samples.overburdenPsi, samples.overburdenPsi, m) };
  const { options } = state;
  const old = state.prediction;
  const n = nOld + m;
  const tvdFt = columns.tvdFt;
  const { bmlFt } = depthReferenceArrays({ tvdFt, datums: options.datums });
  const newD = dExponent({
    ropFtPerH: columns.ropFtPerH.subarray(nOld), rotaryRpm: columns.rotaryRpm.subarray(nOld), wobLbf: columns.wobLbf.subarray(nOld), bitIn: columns.bitIn.subarray(nOld),
  }).d;
  const d = extend(old.d, newD, nOld, n);
  const dc = extend(old.dc, correctedDExponent(newD, options.hydrostaticGradientPsiPerFt, correctionGradient(columns, options.useEcd ?? false, nOld, n)), nOld, n);
  // Smoothing: rows within halfWindowFt of a new row see new samples; start the slice one
  // more half-window up so their windows are complete.
  const h = options.smoothingHalfWindowFt ?? 25;
  let from = nOld;
  while (from > 0 && tvdFt[from - 1] >= tvdFt[nOld] - h) from--;
  let lo = from;
  while (lo > 0 && tvdFt[lo - 1] >= tvdFt[from] - h) lo--;
  const tailSmooth = smoothDcInShale({ tvdFt: tvdFt.subarray(lo), dc: dc.subarray(lo), isShale: s.isShale.subarray(lo), halfWindowFt: h }).dcSmoothed;
  const dcSmoothed = extend(old.dcSmoothed, tailSmooth.subarray(from - lo), from, n);
  const { trend, trendFit } = resolveDcTrend(options, bmlFt, dcSmoothed);
  const moved = JSON.stringify(trend) !== JSON.stringify(old.trend);
  const dcTrend = moved ? evaluateDcNormalTrend({ trend, bmlFt }) : extend(old.dcTrend, evaluateDcNormalTrend({ trend, bmlFt: bmlFt.subarray(nOld) }), nOld, n);
  const hydrostaticPsi = extend(old.hydrostaticPsi, hydrostaticPressure({ tvdFt: tvdFt.subarray(nOld), datums: options.datums, gradientPsiPerFt: options.hydrostaticGradientPsiPerFt }), nOld, n);
  const f = moved ? 0 : from;
  const exponent = old.exponent;
  const ratio = eatonRatio({ log: "dexponent", observed: dcSmoothed.subarray(f), trend: dcTrend.subarray(f) });
  const tail = eatonPorePressure({ overburdenPsi: s.overburdenPsi.subarray(f), hydrostaticPsi: hydrostaticPsi.subarray(f), tvdFt: tvdFt.subarray(f), ratio, exponent });
  const ppPsi = extend(old.ppPsi, tail.ppPsi, f, n);
  const flags = extend(old.flags, tail.flags, f, n);
  const prediction: DcPorePressurePrediction = {
    tvdFt, bmlFt, d, dc, dcSmoothed, trend, trendFit, dcTrend, hydrostaticPsi, overburdenPsi: s.overburdenPsi, exponent,
    ppPsi, flags, warnings: flagWarnings(flags, tvdFt, "Eaton"),
  };
  return { columns, samples: s, options, prediction, recomputedFromIndex: f };
}
