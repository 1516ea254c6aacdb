/**
 * One-call pore-pressure prediction for a well: QC → overburden → hydrostatic → shale
 * points → normal compaction trends → Eaton / Bowers / equivalent depth → calibration.
 *
 * Pure: a Well and a typed options object in, every intermediate curve out (so notebooks
 * and reports can show the evidence), plus all warnings. No I/O, no printing.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { ShalepointError, type Warning } from "../errors.js";
import type { Well } from "../well/types.js";
import { depthReferenceArrays } from "../well/depthReferenceArrays.js";
import { mudlineTvdFt } from "../well/depthReference.js";
import { despikeLog } from "../logs/despikeLog.js";
import { flagBadHole } from "../logs/flagBadHole.js";
import { pickShalePoints, type ShaleCriterion, type ShaleMask, type ShalePick } from "../logs/pickShalePoints.js";
import { interpolateShaleLine } from "../logs/interpolateShaleLine.js";
import { integrateOverburden, type NearMudlineFill, type OverburdenResult } from "../stress/overburden.js";
import { hydrostaticPressure } from "../stress/hydrostatic.js";
import type { CompactionTrend, CompactionTrendKind, TrendFitMethod } from "../trend/trendTypes.js";
import {
  fitCompactionTrendSegments,
  type CompactionTrendDiagnostics,
  type TrendSegmentRequest,
} from "../trend/fitCompactionTrend.js";
import { evaluateCompactionTrend } from "../trend/evaluateCompactionTrend.js";
import { eatonPorePressure, eatonRatio, EATON_RESISTIVITY_EXPONENT, EATON_SONIC_EXPONENT } from "../porepressure/eaton.js";
import { bowersPorePressure, type BowersPorePressureResult, type BowersUnloadingZone } from "../porepressure/bowersPorePressure.js";
import { equivalentDepthPorePressure, type EquivalentDepthResult } from "../porepressure/equivalentDepth.js";
import { velocityFromSlownessLog } from "../porepressure/velocityFromSlowness.js";
import type { PorePressureResult } from "../porepressure/porePressureFlags.js";
import type { PressureObservation } from "../porepressure/misfitTable.js";
import { calibrateEatonExponent, type EatonCalibration } from "../porepressure/calibrateEaton.js";
import { calibrateBowers, type BowersCalibration } from "../porepressure/calibrateBowers.js";

/** A normal compaction trend: given as data (e.g. loaded from a trend file) or fitted here. */
export type TrendChoice =
  | { use: "given"; trend: CompactionTrend }
  | {
      use: "fit";
      kind: CompactionTrendKind;
      /** Segments (shallow to deep) with the depth-below-mudline intervals to fit on. */
      segments: TrendSegmentRequest[];
      /** Default "huber" (robust to a few bad shale points). */
      method?: TrendFitMethod;
    };

/** The pore-pressure method whose result is carried downstream as "the" pore pressure. */
export type PrimaryPorePressureMethod = "eatonSonic" | "eatonResistivity" | "bowers" | "equivalentDepth";

/** Options of {@link predictPorePressure}. Defaults are published values or stated practice. */
export interface PorePressurePredictionOptions {
  /** Normal (hydrostatic) pore-fluid gradient, psi/ft, from sea level (typical 0.44–0.465). */
  hydrostaticGradientPsiPerFt: number;
  /** Shale picking. */
  shale: {
    criterion: ShaleCriterion;
    /** Thinnest shale bed kept, ft (default 10; common practice, no source). */
    minBedThicknessFt?: number;
    masks?: ShaleMask[];
    /** One shale point per this many ft of TVD (median of the shale samples in it); default 20. */
    pointSpacingFt?: number;
    /** Widest sand gap the shale line bridges, ft (default 1000). */
    maxGapFt?: number;
  };
  /** Despike DT, RHOB and resistivity (Hampel, 11 samples, 3 MAD) before use; default true. */
  despike?: boolean;
  /** Caliper enlargement over bit size that flags bad hole, in (default 1.0; common practice, no source). */
  badHoleEnlargementIn?: number;
  /** Gap fill from mudline to the top of density; default "powerLawAverage". */
  nearMudline?: NearMudlineFill;
  /** Sonic normal compaction trend (needed by Eaton sonic and equivalent depth). */
  sonicTrend?: TrendChoice;
  /** Resistivity normal compaction trend (needed by Eaton resistivity). */
  resistivityTrend?: TrendChoice;
  /** Eaton sonic; exponent default 3.0 (Eaton 1975). */
  eatonSonic?: { exponent?: number };
  /** Eaton resistivity; exponent default 1.2 (Eaton 1975). */
  eatonResistivity?: { exponent?: number };
  /** Bowers 1995 virgin curve (and unloading zone). */
  bowers?: { a: number; b: number; v0FtPerS?: number; unloading?: BowersUnloadingZone };
  /** Equivalent depth (Foster & Whalen 1966) on the sonic shale line. */
  equivalentDepth?: boolean;
  /** Method whose pore pressure is the result's `ppPsi`; default the first available of
   * bowers (when given), eatonSonic, eatonResistivity. */
  primary?: PrimaryPorePressureMethod;
  /** Measured pore pressures (sand tests, kicks) for calibration and the misfit tables. */
  calibration?: {
    observations: PressureObservation[];
    /** Refit the Eaton sonic / resistivity exponents; default false (report misfit only). */
    fitEatonExponents?: boolean;
    /** Refit Bowers A, B (and U when an unloading zone is given); default false. */
    fitBowers?: boolean;
  };
}

/** A trend as used, with its values on the well's index and fit diagnostics (if fitted). */
export interface TrendOutcome {
  trend: CompactionTrend;
  /** Trend value at each sample (µs/ft or ohm·m). */
  values: Float64Array;
  /** One per segment when fitted here; empty for a given trend. */
  diagnostics: CompactionTrendDiagnostics[];
}

/** Everything {@link predictPorePressure} computed, aligned to the well's depth index. */
export interface PorePressurePrediction {
  tvdFt: Float64Array;
  tvdssFt: Float64Array;
  bmlFt: Float64Array;
  /** Cleaned curves used (despiked), NaN = missing. */
  curves: { grApi?: Float64Array; dtUsPerFt?: Float64Array; rhobGcc?: Float64Array; resOhmM?: Float64Array };
  /** 1 = bad hole (caliper enlarged); all zero when no caliper/bit size. */
  badHole: Uint8Array;
  overburden: OverburdenResult;
  hydrostaticPsi: Float64Array;
  shale: ShalePick;
  /** Shale lines: the log at shale points joined across sands (NaN where not bridged). */
  shaleLine: { dtUsPerFt?: Float64Array; resOhmM?: Float64Array };
  sonicTrend?: TrendOutcome;
  resistivityTrend?: TrendOutcome;
  methods: {
    eatonSonic?: PorePressureResult & { exponent: number };
    eatonResistivity?: PorePressureResult & { exponent: number };
    bowers?: BowersPorePressureResult & { a: number; b: number; u: number };
    equivalentDepth?: EquivalentDepthResult;
  };
  primary: PrimaryPorePressureMethod;
  /** Pore pressure of the primary method, psi. */
  ppPsi: Float64Array;
  calibration: {
    eatonSonic?: EatonCalibration;
    eatonResistivity?: EatonCalibration;
    bowers?: BowersCalibration;
  };
  warnings: Warning[];
}

function curveValues(well: Well, role: string): Float64Array | undefined {
  return well.curves[role]?.values;
}

function clean(values: Float64Array | undefined, despike: boolean): Float64Array | undefined {
  if (values === undefined) return undefined;
  return despike ? despikeLog({ values, window: { samples: 11 }, threshold: 3 }).values : Float64Array.from(values);
}

function resolveTrend(
  choice: TrendChoice,
  shale: ShalePick,
  pointValues: Float64Array,
  mudlineFt: number,
): { trend: CompactionTrend; diagnostics: CompactionTrendDiagnostics[] } {
  if (choice.use === "given") return { trend: choice.trend, diagnostics: [] };
  const pointBml = new Float64Array(shale.points.tvdFt.length);
  for (let k = 0; k < pointBml.length; k++) pointBml[k] = shale.points.tvdFt[k] - mudlineFt;
  return fitCompactionTrendSegments({
    kind: choice.kind,
    bmlFt: pointBml,
    values: pointValues,
    method: choice.method ?? "huber",
    segments: choice.segments,
  });
}

/**
 * Predict pore pressure along a well with every intermediate result.
 *
 * Steps: despike DT/RHOB/resistivity (Hampel); bad-hole flag from caliper vs bit size;
 * overburden from density with the near-mudline fill and Gardner patches over bad hole;
 * hydrostatic from sea level; shale points as medians of 20-ft windows; shale lines joining the points;
 * normal compaction trends (given or fitted on the points); Eaton (sonic, resistivity),
 * Bowers (with unloading) and equivalent depth as requested; optional calibration of the
 * Eaton exponents and Bowers A, B (U) to measured pressures, whose refitted parameters are
 * then used. Methods are those of the modules named in each step; see their references.
 *
 * @param well a Well in internal units (curves keyed by role: gammaRay, slowness, density,
 *   resistivity, caliper, bitSize)
 * @param options see {@link PorePressurePredictionOptions}
 * @returns {@link PorePressurePrediction}
 * @throws ShalepointError E_PIPELINE_MISSING_CURVE when a requested method lacks its curve or
 *   trend; E_PIPELINE_NO_METHOD when no method can run; every error of the stage modules
 * @example
 * predictPorePressure(well, { hydrostaticGradientPsiPerFt: 0.445, shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
 *   sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 1000, baseBmlFt: 4500 }] }] },
 *   eatonSonic: {} }).ppPsi
 */
export function predictPorePressure(well: Well, options: PorePressurePredictionOptions): PorePressurePrediction {
  const warnings: Warning[] = [];
  const despike = options.despike ?? true;
  const tvdFt = Float64Array.from(well.tvdFt);
  const { tvdssFt, bmlFt } = depthReferenceArrays({ tvdFt, datums: well.datums });
  const mudline = mudlineTvdFt(well.datums);

  const grApi = curveValues(well, "gammaRay");
  if (grApi === undefined) {
    throw new ShalepointError("E_PIPELINE_MISSING_CURVE", "a gamma-ray curve is needed to pick shale", {
      param: "well.curves.gammaRay",
      hint: "Map the GR curve with the loader's roles option.",
    });
  }
  const dtUsPerFt = clean(curveValues(well, "slowness"), despike);
  const rhobGcc = clean(curveValues(well, "density"), despike);
  const resOhmM = clean(curveValues(well, "resistivity"), despike);
  const caliper = curveValues(well, "caliper");
  const bitSize = curveValues(well, "bitSize");

  const n = tvdFt.length;
  let badHole: Uint8Array = new Uint8Array(n);
  if (caliper !== undefined && bitSize !== undefined) {
    badHole = flagBadHole({ caliperIn: caliper, bitSizeIn: bitSize, enlargementLimitIn: options.badHoleEnlargementIn }).isBadHole;
  }
  if (rhobGcc === undefined) {
    throw new ShalepointError("E_PIPELINE_MISSING_CURVE", "a bulk-density curve is needed for the overburden", {
      param: "well.curves.density",
      hint: "Map the RHOB curve with the loader's roles option.",
    });
  }
  const overburden = integrateOverburden({
    tvdFt,
    datums: well.datums,
    densityGcc: rhobGcc,
    slownessUsPerFt: dtUsPerFt,
    badHoleFlag: badHole,
    nearMudline: options.nearMudline,
  });
  warnings.push(...overburden.warnings);
  const hydrostaticPsi = hydrostaticPressure({ tvdFt, datums: well.datums, gradientPsiPerFt: options.hydrostaticGradientPsiPerFt });

  const pointCurves: Record<string, Float64Array> = {};
  if (dtUsPerFt) pointCurves.dt = dtUsPerFt;
  if (resOhmM) pointCurves.res = resOhmM;
  const shale = pickShalePoints({
    tvdFt,
    grApi,
    criterion: options.shale.criterion,
    minBedThicknessFt: options.shale.minBedThicknessFt ?? 10,
    masks: options.shale.masks,
    decimation: { kind: "window", windowFt: options.shale.pointSpacingFt ?? 20 },
    curves: pointCurves,
  });
  warnings.push(...shale.warnings);
  const maxGapFt = options.shale.maxGapFt ?? 1000;
  const shaleLine: PorePressurePrediction["shaleLine"] = {};
  if (dtUsPerFt) {
    shaleLine.dtUsPerFt = interpolateShaleLine({ pointTvdFt: shale.points.tvdFt, pointValues: shale.points.values.dt, tvdFt, maxGapFt });
  }
  if (resOhmM) {
    shaleLine.resOhmM = interpolateShaleLine({ pointTvdFt: shale.points.tvdFt, pointValues: shale.points.values.res, tvdFt, maxGapFt });
  }

  let sonicTrend: TrendOutcome | undefined;
  if (options.sonicTrend) {
    if (!dtUsPerFt) throw missingCurve("sonicTrend", "slowness");
    const r = resolveTrend(options.sonicTrend, shale, shale.points.values.dt, mudline);
    sonicTrend = { ...r, values: evaluateCompactionTrend({ trend: r.trend, bmlFt }) };
  }
  let resistivityTrend: TrendOutcome | undefined;
  if (options.resistivityTrend) {
    if (!resOhmM) throw missingCurve("resistivityTrend", "resistivity");
    const r = resolveTrend(options.resistivityTrend, shale, shale.points.values.res, mudline);
    resistivityTrend = { ...r, values: evaluateCompactionTrend({ trend: r.trend, bmlFt }) };
  }

  const stress = { overburdenPsi: overburden.svPsi, hydrostaticPsi, tvdFt };
  const methods: PorePressurePrediction["methods"] = {};
  const calibration: PorePressurePrediction["calibration"] = {};
  const observations = options.calibration?.observations ?? [];

  // Eaton on one log: the ratio of shale line to trend, the exponent given or fitted to the
  // calibration pressures, then the pore pressure.
  const eaton = (log: "sonic" | "resistivity", observed: Float64Array, trend: Float64Array, givenExponent: number) => {
    const ratio = eatonRatio({ log, observed, trend });
    let exponent = givenExponent;
    let fitted: EatonCalibration | undefined;
    if (options.calibration?.fitEatonExponents && observations.length > 0) {
      fitted = calibrateEatonExponent({ ...stress, ratio, observations });
      exponent = fitted.exponent;
    }
    return { result: { ...eatonPorePressure({ ...stress, ratio, exponent }), exponent }, fitted };
  };
  if (options.eatonSonic) {
    if (!sonicTrend || !shaleLine.dtUsPerFt) throw missingCurve("eatonSonic", "slowness and a sonic trend");
    const r = eaton("sonic", shaleLine.dtUsPerFt, sonicTrend.values, options.eatonSonic.exponent ?? EATON_SONIC_EXPONENT);
    methods.eatonSonic = r.result;
    if (r.fitted) calibration.eatonSonic = r.fitted;
  }
  if (options.eatonResistivity) {
    if (!resistivityTrend || !shaleLine.resOhmM) throw missingCurve("eatonResistivity", "resistivity and a resistivity trend");
    const r = eaton("resistivity", shaleLine.resOhmM, resistivityTrend.values, options.eatonResistivity.exponent ?? EATON_RESISTIVITY_EXPONENT);
    methods.eatonResistivity = r.result;
    if (r.fitted) calibration.eatonResistivity = r.fitted;
  }
  if (options.bowers) {
    if (!shaleLine.dtUsPerFt) throw missingCurve("bowers", "slowness");
    const velocityFtPerS = velocityFromSlownessLog(shaleLine.dtUsPerFt);
    let { a, b } = options.bowers;
    let unloading = options.bowers.unloading;
    if (options.calibration?.fitBowers && observations.length > 0) {
      calibration.bowers = calibrateBowers({
        ...stress,
        velocityFtPerS,
        observations,
        v0FtPerS: options.bowers.v0FtPerS,
        unloading: unloading ? { onsetTvdFt: unloading.onsetTvdFt, vmaxFtPerS: unloading.vmaxFtPerS, initialU: unloading.u } : undefined,
        initial: { a, b },
      });
      a = calibration.bowers.a;
      b = calibration.bowers.b;
      if (unloading) unloading = { ...unloading, u: calibration.bowers.u };
    }
    const r = bowersPorePressure({ ...stress, velocityFtPerS, a, b, v0FtPerS: options.bowers.v0FtPerS, unloading });
    methods.bowers = { ...r, a, b, u: unloading?.u ?? 1 };
  }
  if (options.equivalentDepth) {
    if (!sonicTrend || !shaleLine.dtUsPerFt) throw missingCurve("equivalentDepth", "slowness and a sonic trend");
    // The trend is defined below the mudline only: hand over that part of it.
    let first = 0;
    while (first < n && !(Number.isFinite(sonicTrend.values[first]) && bmlFt[first] > 0)) first++;
    methods.equivalentDepth = equivalentDepthPorePressure({
      ...stress,
      observed: shaleLine.dtUsPerFt,
      trend: { kind: "sampled", tvdFt: tvdFt.subarray(first), values: sonicTrend.values.subarray(first) },
      searchTopTvdFt: Math.max(mudline, tvdFt[Math.min(first, n - 1)]),
    });
  }
  for (const m of Object.values(methods)) if (m) warnings.push(...m.warnings);

  const primary =
    options.primary ?? (methods.bowers ? "bowers" : methods.eatonSonic ? "eatonSonic" : methods.eatonResistivity ? "eatonResistivity" : "equivalentDepth");
  const chosen = methods[primary];
  if (!chosen) {
    throw new ShalepointError("E_PIPELINE_NO_METHOD", `the primary method '${primary}' was not run`, {
      param: "primary",
      value: primary,
      allowed: Object.keys(methods).join(", ") || "none was requested",
      hint: "Request at least one of eatonSonic, eatonResistivity, bowers, equivalentDepth, and name it as primary.",
    });
  }

  return {
    tvdFt,
    tvdssFt,
    bmlFt,
    curves: { grApi: Float64Array.from(grApi), dtUsPerFt, rhobGcc, resOhmM },
    badHole,
    overburden,
    hydrostaticPsi,
    shale,
    shaleLine,
    sonicTrend,
    resistivityTrend,
    methods,
    primary,
    ppPsi: chosen.ppPsi,
    calibration,
    warnings,
  };
}

function missingCurve(option: string, what: string): ShalepointError {
  return new ShalepointError("E_PIPELINE_MISSING_CURVE", `${option} needs ${what}`, {
    param: option,
    hint: `Load a well with ${what}, or leave ${option} out of the options.`,
  });
}
