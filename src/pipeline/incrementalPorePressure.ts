/**
 * While-drilling update of a pore-pressure prediction: append new depth samples (a new LAS
 * chunk) and refresh every curve from the shallowest sample the new data can change,
 * without re-running the whole well or copying it (a state's arrays have room to grow and
 * an update writes into them: see {@link appendDepthSamples}). The result equals {@link predictPorePressure} on the
 * concatenated well bit for bit (the same arithmetic runs in the same order; the test in
 * test/pipeline/incrementalPorePressure.test.ts proves it on a demo well).
 *
 * Where each step restarts (h = 5, the half-width of the 11-sample despike window):
 * - despiked curves: from n_old − h (the windows that now see new samples);
 * - bad-hole flag, hydrostatic: pointwise, new samples only;
 * - overburden: from the start of the trailing run of filled (interpolated / extended)
 *   densities or n_old − h, whichever is shallower, continuing the compensated running sum
 *   kept in the state;
 * - shale flag and points: points in 20-ft windows that lie wholly above
 *   (depth of sample n_old − 1 − h) − minimum bed thickness − one step are kept; the rest are
 *   re-picked on a tail slice that starts far enough up for the despike window and the
 *   bed-thickness rule;
 * - shale lines: from the last kept point with a value;
 * - trends: refitted on all points unless given (frozen); when the fitted parameters are
 *   unchanged only new samples are evaluated, otherwise every sample;
 * - Eaton / Bowers: pointwise from the shallowest changed input (every sample when a trend
 *   moved); equivalent depth likewise (its search for Ze uses the whole trend, but above the
 *   restart Ze and its bracketing samples are the same as in the shorter well).
 * Calibration refits (fitEatonExponents, fitBowers) are global and are not supported here.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { ShalepointError, type Warning } from "../errors.js";
import type { Curve, Well } from "../well/types.js";
import { depthReferenceArrays } from "../well/depthReferenceArrays.js";
import { mudlineTvdFt } from "../well/depthReference.js";
import { despikeLog } from "../logs/despikeLog.js";
import { flagBadHole } from "../logs/flagBadHole.js";
import { pickShalePoints, type ShalePick, type ShalePoints } from "../logs/pickShalePoints.js";
import { interpolateShaleLine } from "../logs/interpolateShaleLine.js";
import { fillPendingDensity, OverburdenSource, OVERBURDEN_SOURCE_NAMES, type OverburdenResult, type OverburdenSourceRange } from "../stress/overburden.js";
import { gardnerDensityFromSlowness } from "../stress/gardnerDensity.js";
import { hydrostaticPressure } from "../stress/hydrostatic.js";
import { PSI_PER_FT_PER_GCC, PSI_PER_FT_PER_PPG } from "../units/index.js";
import { fitCompactionTrendSegments } from "../trend/fitCompactionTrend.js";
import { evaluateCompactionTrend } from "../trend/evaluateCompactionTrend.js";
import { eatonPorePressure, eatonRatio, EATON_RESISTIVITY_EXPONENT, EATON_SONIC_EXPONENT } from "../porepressure/eaton.js";
import { bowersPorePressure, velocityAtDepth } from "../porepressure/bowersPorePressure.js";
import { equivalentDepthPorePressure } from "../porepressure/equivalentDepth.js";
import { velocityFromSlownessLog } from "../porepressure/velocityFromSlowness.js";
import { flagWarnings, splicedFlagWarnings, type PorePressureResult } from "../porepressure/porePressureFlags.js";
import { extendInRoom as extend, supersededStateError, type GrowthRoom, type SampleArray } from "./growthRoom.js";
import {
  predictPorePressure,
  type PorePressurePrediction,
  type PorePressurePredictionOptions,
  type TrendChoice,
  type TrendOutcome,
} from "./predictPorePressure.js";

/** Half-width of the 11-sample despike window used by {@link predictPorePressure}. */
const DESPIKE_HALF = 5;

/** A while-drilling prediction: the well so far, its prediction and the running sums. */
export interface IncrementalPorePressureState {
  well: Well;
  options: PorePressurePredictionOptions;
  prediction: PorePressurePrediction;
  /** Compensated running sum of the overburden integral (sum and compensation), psi. */
  overburdenRun: { anchorIndex: number; sumPsi: Float64Array; compPsi: Float64Array };
  /**
   * First sample index the last update recomputed (0 for a fresh start): every curve of the
   * prediction is unchanged above it, so a later step (the stress window) may restart there.
   */
  recomputedFromIndex: number;
  /** Storage with room to grow, shared with the states before and after this one. */
  room: GrowthRoom;
}

/** New depth samples below the current end of the well, in internal units. */
export interface DepthSampleChunk {
  /** MD below RT, ft, increasing and deeper than the well's last sample. */
  mdFt: ArrayLike<number>;
  /** TVD below RT, ft, non-decreasing and at or below the well's last sample. */
  tvdFt: ArrayLike<number>;
  /** Values by curve role (the well's roles); a role missing here is appended as NaN. */
  curves: Readonly<Record<string, ArrayLike<number>>>;
}

function unsupported(what: string): ShalepointError {
  return new ShalepointError("E_INCREMENTAL_UNSUPPORTED", `the while-drilling update does not support ${what}`, {
    param: what,
    hint: "Run predictPorePressure on the whole well for calibration refits, or leave them out while drilling.",
  });
}

function checkOptions(options: PorePressurePredictionOptions): void {
  if (options.calibration?.fitEatonExponents) throw unsupported("calibration.fitEatonExponents");
  if (options.calibration?.fitBowers) throw unsupported("calibration.fitBowers");
  if (options.despike === false) return;
}

/** Replay the overburden's compensated running sum from its anchor (same arithmetic). */
function overburdenRunFrom(ob: OverburdenResult, tvdFt: Float64Array): IncrementalPorePressureState["overburdenRun"] {
  const n = tvdFt.length;
  let anchor = n;
  for (let i = 0; i < n; i++) {
    const s = ob.source[i];
    if (s !== OverburdenSource.air && s !== OverburdenSource.waterColumn && s !== OverburdenSource.nearMudlinePowerLaw) {
      anchor = i;
      break;
    }
  }
  const sumPsi = new Float64Array(n);
  const compPsi = new Float64Array(n);
  if (anchor < n) {
    let sum = ob.svPsi[anchor];
    let comp = 0;
    sumPsi[anchor] = sum;
    const rho = ob.densityUsedGcc;
    for (let i = anchor + 1; i < n; i++) {
      const term = 0.5 * (rho[i - 1] + rho[i]) * PSI_PER_FT_PER_GCC * (tvdFt[i] - tvdFt[i - 1]);
      const t = sum + term;
      comp += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
      sum = t;
      sumPsi[i] = sum;
      compPsi[i] = comp;
    }
  }
  return { anchorIndex: anchor, sumPsi, compPsi };
}

/**
 * Start a while-drilling prediction: run {@link predictPorePressure} once and keep what the
 * updates need, in buffers with room for the samples to come (the caller's well is copied,
 * never written).
 *
 * @param well the well drilled so far (internal units, curves keyed by role)
 * @param options as for {@link predictPorePressure}, without calibration refits
 * @returns {@link IncrementalPorePressureState}
 * @throws ShalepointError E_INCREMENTAL_UNSUPPORTED for calibration refits; every error of
 *   {@link predictPorePressure}
 * @example startWhileDrilling(wellToDate, options).prediction.ppPsi
 */
export function startWhileDrilling(well: Well, options: PorePressurePredictionOptions): IncrementalPorePressureState {
  checkOptions(options);
  return ownedState(well, options, predictPorePressure(well, options), 0);
}

/**
 * An independent copy of a while-drilling state: extend the copy and keep the original (for
 * a before/after comparison, or to try a chunk and go back). {@link appendDepthSamples}
 * extends a state's buffers in place, so without a copy only the latest state stays valid.
 *
 * @param state the latest state of a chain (from {@link startWhileDrilling} or
 *   {@link appendDepthSamples})
 * @returns a state with the same values in buffers of its own
 * @throws ShalepointError E_STATE_SUPERSEDED when `state` was already extended
 * @example const before = copyWhileDrillingState(state); state = appendDepthSamples(state, chunk);
 */
export function copyWhileDrillingState(state: IncrementalPorePressureState): IncrementalPorePressureState {
  if (state.room.latest !== state) throw supersededStateError();
  return ownedState(state.well, state.options, state.prediction, state.recomputedFromIndex, state.overburdenRun);
}

/** A state whose per-sample arrays are copies in the buffers of a new room. */
function ownedState(
  well: Well,
  options: PorePressurePredictionOptions,
  p: PorePressurePrediction,
  recomputedFromIndex: number,
  run = overburdenRunFrom(p.overburden, p.tvdFt),
): IncrementalPorePressureState {
  const room: GrowthRoom = { latest: null, buffers: new WeakSet() };
  const r = <T extends SampleArray>(a: T): T => extend(room, a, a.length);
  const ro = <T extends SampleArray>(a: T | undefined): T | undefined => (a === undefined ? undefined : r(a));
  const own = (a: ArrayLike<number>): Float64Array => r(a instanceof Float64Array ? a : Float64Array.from(a));
  const curves: Record<string, Curve> = {};
  for (const [role, c] of Object.entries(well.curves)) curves[role] = { ...c, values: own(c.values) };
  const tvdFt = own(well.tvdFt);
  const ownWell: Well = { ...well, mdFt: own(well.mdFt), tvdFt, curves };
  const m = p.methods;
  const methods: PorePressurePrediction["methods"] = {};
  if (m.eatonSonic) methods.eatonSonic = { ...m.eatonSonic, ppPsi: r(m.eatonSonic.ppPsi), flags: r(m.eatonSonic.flags) };
  if (m.eatonResistivity) methods.eatonResistivity = { ...m.eatonResistivity, ppPsi: r(m.eatonResistivity.ppPsi), flags: r(m.eatonResistivity.flags) };
  if (m.bowers) methods.bowers = { ...m.bowers, ppPsi: r(m.bowers.ppPsi), flags: r(m.bowers.flags), effectiveStressPsi: r(m.bowers.effectiveStressPsi) };
  if (m.equivalentDepth) {
    const e = m.equivalentDepth;
    methods.equivalentDepth = { ...e, ppPsi: r(e.ppPsi), flags: r(e.flags), equivalentDepthFt: r(e.equivalentDepthFt), effectiveStressPsi: r(e.effectiveStressPsi) };
  }
  const ob = p.overburden;
  const prediction: PorePressurePrediction = {
    ...p,
    tvdFt,
    tvdssFt: r(p.tvdssFt),
    bmlFt: r(p.bmlFt),
    // The prediction's GR is the well's (as predictPorePressure copies it).
    curves: { grApi: curves.gammaRay?.values, dtUsPerFt: ro(p.curves.dtUsPerFt), rhobGcc: ro(p.curves.rhobGcc), resOhmM: ro(p.curves.resOhmM) },
    badHole: r(p.badHole),
    overburden: { ...ob, svPsi: r(ob.svPsi), gradientPsiPerFt: r(ob.gradientPsiPerFt), emwPpg: r(ob.emwPpg), densityUsedGcc: r(ob.densityUsedGcc), source: r(ob.source) },
    hydrostaticPsi: r(p.hydrostaticPsi),
    shale: { ...p.shale, isShale: r(p.shale.isShale), grUsedApi: r(p.shale.grUsedApi) },
    shaleLine: { dtUsPerFt: ro(p.shaleLine.dtUsPerFt), resOhmM: ro(p.shaleLine.resOhmM) },
    sonicTrend: p.sonicTrend && { ...p.sonicTrend, values: r(p.sonicTrend.values) },
    resistivityTrend: p.resistivityTrend && { ...p.resistivityTrend, values: r(p.resistivityTrend.values) },
    methods,
    ppPsi: (methods[p.primary] as { ppPsi: Float64Array }).ppPsi,
  };
  const overburdenRun = { anchorIndex: run.anchorIndex, sumPsi: r(run.sumPsi), compPsi: r(run.compPsi) };
  const state: IncrementalPorePressureState = { well: ownWell, options, prediction, overburdenRun, recomputedFromIndex, room };
  room.latest = state;
  return state;
}

/**
 * Velocity at the onset of unloading, as {@link velocityAtDepth} gives it on the whole
 * velocity log, but converting only the two samples that bracket the depth (the same two
 * samples and formula, so the same value); outside the index it defers to the full call so
 * the error is the same.
 */
function velocityAtOnset(tvdFt: Float64Array, dtUsPerFt: Float64Array, depthFt: number): number {
  const n = tvdFt.length;
  if (!(n > 1 && depthFt >= tvdFt[0] && depthFt <= tvdFt[n - 1])) {
    return velocityAtDepth(tvdFt, velocityFromSlownessLog(dtUsPerFt), depthFt);
  }
  let j = 0;
  while (j < n - 1 && tvdFt[j] < depthFt) j++;
  const a = Math.max(0, j - 1);
  return velocityAtDepth(tvdFt.subarray(a, j + 1), velocityFromSlownessLog(dtUsPerFt.subarray(a, j + 1)), depthFt);
}

function spliceDespiked(room: GrowthRoom, oldClean: Float64Array | undefined, raw: Float64Array | undefined, from: number, despike: boolean): Float64Array | undefined {
  if (raw === undefined || oldClean === undefined) return undefined;
  const n = raw.length;
  const out = extend(room, oldClean, n);
  if (!despike) {
    out.set(raw.subarray(from), from);
    return out;
  }
  const s = Math.max(0, from - DESPIKE_HALF);
  const tail = despikeLog({ values: raw.subarray(s), window: { samples: 11 }, threshold: 3 }).values;
  out.set(tail.subarray(from - s), from);
  return out;
}

/** Check a chunk against the well's end (before anything is written). */
function checkChunk(well: Well, chunk: DepthSampleChunk): void {
  const m = chunk.tvdFt.length;
  const n0 = well.tvdFt.length;
  if (chunk.mdFt.length !== m) {
    throw new ShalepointError("E_LENGTH", "chunk mdFt and tvdFt must have the same length", { param: "chunk.mdFt", value: `${chunk.mdFt.length} vs ${m}` });
  }
  const lastTvd = n0 > 0 ? well.tvdFt[n0 - 1] : -Infinity;
  const lastMd = n0 > 0 ? well.mdFt[n0 - 1] : -Infinity;
  for (let i = 0; i < m; i++) {
    const prevTvd = i === 0 ? lastTvd : chunk.tvdFt[i - 1];
    const prevMd = i === 0 ? lastMd : chunk.mdFt[i - 1];
    if (!(Number.isFinite(chunk.tvdFt[i]) && chunk.tvdFt[i] >= prevTvd && chunk.mdFt[i] > prevMd)) {
      throw new ShalepointError("E_DEPTH_ORDER", "appended samples must lie below the current end of the well, in depth order", {
        param: "chunk.tvdFt",
        row: i,
        value: chunk.tvdFt[i],
        unit: "ft",
        allowed: `TVD ≥ ${prevTvd} and MD > ${prevMd}`,
        hint: "Append only samples drilled since the last update; re-run the whole well to revise older depths.",
      });
    }
  }
  for (const role of Object.keys(well.curves)) {
    const add = chunk.curves[role];
    if (add !== undefined && add.length !== m) {
      throw new ShalepointError("E_LENGTH", `chunk curve ${role} must have one value per sample`, { param: `chunk.curves.${role}`, value: `${add.length} vs ${m}` });
    }
  }
}

/** The well with the chunk's samples written after its end (a role missing in the chunk: NaN). */
function appendWell(room: GrowthRoom, well: Well, chunk: DepthSampleChunk): Well {
  const n0 = well.tvdFt.length;
  const m = chunk.tvdFt.length;
  const put = (a: ArrayLike<number>, add: ArrayLike<number> | undefined): Float64Array => {
    const out = extend(room, a as Float64Array, n0 + m);
    for (let i = 0; i < m; i++) out[n0 + i] = add === undefined ? NaN : add[i];
    return out;
  };
  const curves: Record<string, Curve> = {};
  for (const [role, curve] of Object.entries(well.curves)) curves[role] = { ...curve, values: put(curve.values, chunk.curves[role]) };
  return { ...well, mdFt: put(well.mdFt, chunk.mdFt), tvdFt: put(well.tvdFt, chunk.tvdFt), curves };
}

function windowKey(z: number, wFt: number): number {
  return Math.floor(z / wFt);
}

/** Shale pick on the new well: keep old points wholly above the safe depth, re-pick the rest. */
function updateShalePick(
  room: GrowthRoom,
  old: ShalePick,
  tvdFt: Float64Array,
  grRaw: Float64Array,
  pointCurves: Record<string, Float64Array>,
  options: PorePressurePredictionOptions,
  nOld: number,
): { pick: ShalePick; cutKeyDepthFt: number } {
  const n = tvdFt.length;
  const wFt = options.shale.pointSpacingFt ?? 20;
  const minBed = options.shale.minBedThicknessFt ?? 10;
  let maxStep = 0;
  for (let i = Math.max(1, nOld - 4 * DESPIKE_HALF); i < n; i++) maxStep = Math.max(maxStep, tvdFt[i] - tvdFt[i - 1]);
  // Old samples at or above this depth keep their shale flag (despike window and bed rule unchanged).
  const lastSure = Math.max(0, nOld - 1 - DESPIKE_HALF);
  const safeFt = tvdFt[lastSure] - minBed - maxStep;
  const cutKey = Math.floor(safeFt / wFt);
  const cutFt = cutKey * wFt;
  // Tail slice start: the bed rule needs beds reaching the cut to be seen over minBed + a step,
  // and the GR despike needs DESPIKE_HALF samples of lead.
  const t = countWhile(n, (i) => tvdFt[i] < cutFt - minBed - 2 * maxStep);
  const s = Math.max(0, t - DESPIKE_HALF - 1);
  const sliceCurves: Record<string, Float64Array> = {};
  for (const [k, v] of Object.entries(pointCurves)) sliceCurves[k] = v.subarray(s);
  const tail = pickShalePoints({
    tvdFt: tvdFt.subarray(s),
    grApi: grRaw.subarray(s),
    criterion: options.shale.criterion,
    minBedThicknessFt: minBed,
    masks: options.shale.masks,
    decimation: { kind: "window", windowFt: wFt },
    curves: sliceCurves,
  });
  const keepOld = countWhile(old.points.tvdFt.length, (p) => windowKey(old.points.tvdFt[p], wFt) < cutKey);
  const tp = tail.points;
  let firstNew = 0;
  while (firstNew < tp.tvdFt.length && windowKey(tp.tvdFt[firstNew], wFt) < cutKey) firstNew++;
  const nNew = tp.tvdFt.length - firstNew;
  const m = keepOld + nNew;
  const op = old.points;
  const points: ShalePoints = {
    index: new Int32Array(m),
    tvdFt: new Float64Array(m),
    topTvdFt: new Float64Array(m),
    baseTvdFt: new Float64Array(m),
    sampleCount: new Int32Array(m),
    grApi: new Float64Array(m),
    values: {},
  };
  const take = <T extends Int32Array | Float64Array>(dst: T, a: T, b: T, offset = 0): void => {
    dst.set(a.subarray(0, keepOld));
    for (let p = 0; p < nNew; p++) dst[keepOld + p] = b[firstNew + p] + offset;
  };
  take(points.index, op.index, tp.index, s);
  take(points.tvdFt, op.tvdFt, tp.tvdFt);
  take(points.topTvdFt, op.topTvdFt, tp.topTvdFt);
  take(points.baseTvdFt, op.baseTvdFt, tp.baseTvdFt);
  take(points.sampleCount, op.sampleCount, tp.sampleCount);
  take(points.grApi, op.grApi, tp.grApi);
  for (const k of Object.keys(pointCurves)) {
    points.values[k] = new Float64Array(m);
    take(points.values[k], op.values[k], tp.values[k]);
  }
  // Per-sample arrays: sample i ≥ t (slice index ≥ t − s) is exact in the tail pick.
  const isShale = extend(room, old.isShale, n);
  isShale.set(tail.isShale.subarray(t - s), t);
  const grUsedApi = extend(room, old.grUsedApi, n);
  grUsedApi.set(tail.grUsedApi.subarray(t - s), t);
  const spikes: number[] = [];
  for (const i of old.spikeIndex) if (i < t) spikes.push(i);
  for (const i of tail.spikeIndex) if (i + s >= t) spikes.push(i + s);
  const warnings: Warning[] = [];
  if (m === 0) warnings.push({ code: "W_NO_SHALE", message: "no sample met the shale criterion; check the cutoff, masks and bed thickness", count: 0 });
  return { pick: { isShale, grUsedApi, spikeIndex: Int32Array.from(spikes), points, warnings }, cutKeyDepthFt: cutFt };
}

/**
 * Length of the leading run of indices for which `ok` holds, for a predicate that holds on a
 * prefix and then never again (a condition on a non-decreasing depth array): a binary search,
 * the same count as stepping from 0.
 */
function countWhile(n: number, ok: (p: number) => boolean): number {
  let lo = 0; // ok holds below lo
  let hi = n; // ok fails at hi (or hi = n)
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (ok(mid)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Shale line refreshed from the last kept point with a value: returns the line and its restart index. */
function updateShaleLine(
  room: GrowthRoom,
  oldLine: Float64Array,
  points: ShalePoints,
  values: Float64Array,
  keptBelowFt: number,
  tvdFt: Float64Array,
  maxGapFt: number,
): { line: Float64Array; from: number } {
  let zKeep = -Infinity;
  for (let p = 0; p < points.tvdFt.length && points.tvdFt[p] < keptBelowFt; p++) if (Number.isFinite(values[p])) zKeep = points.tvdFt[p];
  const from = countWhile(tvdFt.length, (i) => !(tvdFt[i] > zKeep));
  const line = extend(room, oldLine, tvdFt.length);
  const tail = interpolateShaleLine({ pointTvdFt: points.tvdFt, pointValues: values, tvdFt: tvdFt.subarray(from), maxGapFt });
  line.set(tail, from);
  return { line, from };
}

function sameTrend(a: TrendOutcome | undefined, b: { trend: unknown }): boolean {
  return a !== undefined && JSON.stringify(a.trend) === JSON.stringify(b.trend);
}

function updateTrend(
  room: GrowthRoom,
  old: TrendOutcome | undefined,
  choice: TrendChoice | undefined,
  pick: ShalePick,
  pointValues: Float64Array | undefined,
  mudlineFt: number,
  bmlFt: Float64Array,
  nOld: number,
  keptAboveBmlFt: number,
): { outcome?: TrendOutcome; from: number } {
  if (choice === undefined || old === undefined || pointValues === undefined) return { outcome: undefined, from: bmlFt.length };
  let fitted: { trend: TrendOutcome["trend"]; diagnostics: TrendOutcome["diagnostics"] };
  // Points shallower than the cut are the old ones: when every fit interval ends above the
  // cut, the fit sees the same points as before and its result cannot change.
  const deepestBaseBmlFt = choice.use === "fit" ? Math.max(...choice.segments.flatMap((sg) => sg.intervals.map((iv) => iv.baseBmlFt))) : Infinity;
  if (choice.use === "given") {
    fitted = { trend: choice.trend, diagnostics: [] };
  } else if (deepestBaseBmlFt < keptAboveBmlFt) {
    fitted = { trend: old.trend, diagnostics: old.diagnostics };
  } else {
    const pointBml = new Float64Array(pick.points.tvdFt.length);
    for (let k = 0; k < pointBml.length; k++) pointBml[k] = pick.points.tvdFt[k] - mudlineFt;
    fitted = fitCompactionTrendSegments({ kind: choice.kind, bmlFt: pointBml, values: pointValues, method: choice.method ?? "huber", segments: choice.segments });
  }
  if (sameTrend(old, fitted)) {
    const values = extend(room, old.values, bmlFt.length);
    values.set(evaluateCompactionTrend({ trend: fitted.trend, bmlFt: bmlFt.subarray(nOld) }), nOld);
    return { outcome: { ...fitted, values }, from: nOld };
  }
  const values = extend(room, old.values, bmlFt.length);
  values.set(evaluateCompactionTrend({ trend: fitted.trend, bmlFt }));
  return { outcome: { ...fitted, values }, from: 0 };
}

/**
 * The old result above `from` and the recomputed tail below, with the flag warnings of the
 * whole well: counted again only over the recomputed part, from the old counts (same
 * warnings as flagWarnings on the spliced flags).
 */
function spliceResult(room: GrowthRoom, old: PorePressureResult | undefined, tail: PorePressureResult, from: number, n: number, tvdFt: Float64Array, methodName: string): PorePressureResult {
  if (!old) {
    const ppPsi = new Float64Array(n);
    const flags = new Uint8Array(n);
    ppPsi.set(tail.ppPsi, from);
    flags.set(tail.flags, from);
    return { ppPsi, flags, warnings: flagWarnings(flags, tvdFt, methodName) };
  }
  const nOld = old.flags.length;
  // The old flags that the tail replaces, read before the shared buffer is written.
  const oldTailFlags = from <= nOld ? old.flags.slice(from) : undefined;
  const ppPsi = extend(room, old.ppPsi, n);
  const flags = extend(room, old.flags, n);
  ppPsi.set(tail.ppPsi, from);
  flags.set(tail.flags, from);
  const warnings = oldTailFlags
    ? splicedFlagWarnings({ oldFlags: oldTailFlags, oldFlagsOffset: from, oldWarnings: old.warnings, flags, from, tvdFt, methodName })
    : flagWarnings(flags, tvdFt, methodName);
  return { ppPsi, flags, warnings };
}

/**
 * Append new depth samples to a while-drilling prediction and refresh every curve from the
 * shallowest sample the new data can change (see the file header for each step's restart
 * point). The returned prediction equals {@link predictPorePressure} on the concatenated
 * well bit for bit.
 *
 * The update writes into the buffers of `state` (which hold room for new samples) instead
 * of copying the whole well: the cost grows with the chunk and the restart distance, not
 * with the well's length. The returned state supersedes `state`: its arrays keep their
 * length, but samples from `recomputedFromIndex` on may now hold the refreshed values, and
 * it cannot be extended again (E_STATE_SUPERSEDED). Keep a snapshot with
 * {@link copyWhileDrillingState} before the call when you need the old values. The chunk
 * and the well given to {@link startWhileDrilling} are never written.
 *
 * @param state the latest state, from {@link startWhileDrilling} or a previous call
 * @param chunk new samples below the current end (see {@link DepthSampleChunk})
 * @returns a new {@link IncrementalPorePressureState}; `recomputedFromIndex` says where the
 *   pointwise pore-pressure methods restarted
 * @throws ShalepointError E_DEPTH_ORDER when the chunk is not below the well's end;
 *   E_LENGTH for misaligned chunk curves (both before anything is written);
 *   E_STATE_SUPERSEDED when `state` was already extended, or an earlier update of this
 *   chain failed part-way (start again with startWhileDrilling); every error of the stage
 *   modules (after which the chain cannot be extended)
 * @example appendDepthSamples(state, { mdFt: [9000.5], tvdFt: [9000.5], curves: { gammaRay: [95], slowness: [120] } }).prediction.ppPsi
 */
export function appendDepthSamples(state: IncrementalPorePressureState, chunk: DepthSampleChunk): IncrementalPorePressureState {
  const { options } = state;
  const old = state.prediction;
  const nOld = old.tvdFt.length;
  const room = state.room;
  if (room.latest !== state) throw supersededStateError();
  checkChunk(state.well, chunk);
  if (chunk.tvdFt.length === 0) {
    const same = { ...state, recomputedFromIndex: nOld };
    room.latest = same;
    return same;
  }
  // From here on the shared buffers are written: a failure part-way leaves the chain unusable.
  room.latest = null;
  const well = appendWell(room, state.well, chunk);
  const n = well.tvdFt.length;
  const despike = options.despike ?? true;
  // The prediction shares the well's depth array.
  const tvdFt = well.tvdFt as Float64Array;
  // pointwise: only the new samples
  const tail = depthReferenceArrays({ tvdFt: tvdFt.subarray(nOld), datums: well.datums });
  const tvdssFt = extend(room, old.tvdssFt, n);
  tvdssFt.set(tail.tvdssFt, nOld);
  const bmlFt = extend(room, old.bmlFt, n);
  bmlFt.set(tail.bmlFt, nOld);
  const mudline = mudlineTvdFt(well.datums);
  const raw = (role: string): Float64Array | undefined => well.curves[role]?.values;
  const cleanFrom = Math.max(0, nOld - DESPIKE_HALF);
  const dtUsPerFt = spliceDespiked(room, old.curves.dtUsPerFt, raw("slowness"), cleanFrom, despike);
  const rhobGcc = spliceDespiked(room, old.curves.rhobGcc, raw("density"), cleanFrom, despike) as Float64Array;
  const resOhmM = spliceDespiked(room, old.curves.resOhmM, raw("resistivity"), cleanFrom, despike);
  const grApi = raw("gammaRay") as Float64Array;

  // bad hole: pointwise on the new samples
  const badHole = extend(room, old.badHole, n);
  badHole.fill(0, nOld);
  const caliper = raw("caliper");
  const bitSize = raw("bitSize");
  if (caliper !== undefined && bitSize !== undefined) {
    badHole.set(flagBadHole({ caliperIn: caliper.subarray(nOld), bitSizeIn: bitSize.subarray(nOld), enlargementLimitIn: options.badHoleEnlargementIn }).isBadHole, nOld);
  }

  // overburden
  const ob = updateOverburden(state, tvdFt, rhobGcc, dtUsPerFt, badHole, cleanFrom);
  const hydrostaticPsi = extend(room, old.hydrostaticPsi, n);
  hydrostaticPsi.set(hydrostaticPressure({ tvdFt: tvdFt.subarray(nOld), datums: well.datums, gradientPsiPerFt: options.hydrostaticGradientPsiPerFt }), nOld);

  // shale points and lines
  const pointCurves: Record<string, Float64Array> = {};
  if (dtUsPerFt) pointCurves.dt = dtUsPerFt;
  if (resOhmM) pointCurves.res = resOhmM;
  const { pick: shale, cutKeyDepthFt } = updateShalePick(room, old.shale, tvdFt, grApi, pointCurves, options, nOld);
  const maxGapFt = options.shale.maxGapFt ?? 1000;
  const shaleLine: PorePressurePrediction["shaleLine"] = {};
  let from = Math.min(ob.from, cleanFrom, nOld);
  if (dtUsPerFt && old.shaleLine.dtUsPerFt) {
    const r = updateShaleLine(room, old.shaleLine.dtUsPerFt, shale.points, shale.points.values.dt, cutKeyDepthFt, tvdFt, maxGapFt);
    shaleLine.dtUsPerFt = r.line;
    from = Math.min(from, r.from);
  }
  if (resOhmM && old.shaleLine.resOhmM) {
    const r = updateShaleLine(room, old.shaleLine.resOhmM, shale.points, shale.points.values.res, cutKeyDepthFt, tvdFt, maxGapFt);
    shaleLine.resOhmM = r.line;
    from = Math.min(from, r.from);
  }

  const sonic = updateTrend(room, old.sonicTrend, options.sonicTrend, shale, shale.points.values.dt, mudline, bmlFt, nOld, cutKeyDepthFt - mudline);
  const resistivity = updateTrend(room, old.resistivityTrend, options.resistivityTrend, shale, shale.points.values.res, mudline, bmlFt, nOld, cutKeyDepthFt - mudline);

  const methods: PorePressurePrediction["methods"] = {};
  // The shallowest sample any curve was recomputed from (reported as recomputedFromIndex).
  let lowest = Math.min(from, sonic.from, resistivity.from);
  const sub = (a: Float64Array, f: number): Float64Array => a.subarray(f);
  // Eaton from the first sample its shale line or trend changed, spliced after the old result.
  const eatonFrom = (log: "sonic" | "resistivity", line: Float64Array, trend: Float64Array, f: number, oldResult: PorePressureResult | undefined, exponent: number) => {
    const ratio = eatonRatio({ log, observed: sub(line, f), trend: sub(trend, f) });
    const tail = eatonPorePressure({ overburdenPsi: sub(ob.result.svPsi, f), hydrostaticPsi: sub(hydrostaticPsi, f), tvdFt: sub(tvdFt, f), ratio, exponent });
    return { ...spliceResult(room, oldResult, tail, f, n, tvdFt, "Eaton"), exponent };
  };
  if (options.eatonSonic && sonic.outcome && shaleLine.dtUsPerFt) {
    const exponent = options.eatonSonic.exponent ?? EATON_SONIC_EXPONENT;
    methods.eatonSonic = eatonFrom("sonic", shaleLine.dtUsPerFt, sonic.outcome.values, Math.min(from, sonic.from), old.methods.eatonSonic, exponent);
  }
  if (options.eatonResistivity && resistivity.outcome && shaleLine.resOhmM) {
    const exponent = options.eatonResistivity.exponent ?? EATON_RESISTIVITY_EXPONENT;
    methods.eatonResistivity = eatonFrom("resistivity", shaleLine.resOhmM, resistivity.outcome.values, Math.min(from, resistivity.from), old.methods.eatonResistivity, exponent);
  }
  if (options.bowers && shaleLine.dtUsPerFt) {
    const { a, b, v0FtPerS } = options.bowers;
    let unloading = options.bowers.unloading;
    // Vmax is read once on the whole velocity log (as the full run does), then passed explicitly.
    if (unloading && unloading.vmaxFtPerS === undefined) {
      unloading = { ...unloading, vmaxFtPerS: velocityAtOnset(tvdFt, shaleLine.dtUsPerFt, unloading.onsetTvdFt) };
    }
    const f = old.methods.bowers && unloading?.vmaxFtPerS === old.methods.bowers.vmaxFtPerS ? from : old.methods.bowers && !unloading ? from : 0;
    lowest = Math.min(lowest, f);
    const velocity = velocityFromSlownessLog(sub(shaleLine.dtUsPerFt, f));
    const tail = bowersPorePressure({ overburdenPsi: sub(ob.result.svPsi, f), hydrostaticPsi: sub(hydrostaticPsi, f), velocityFtPerS: velocity, tvdFt: sub(tvdFt, f), a, b, v0FtPerS, unloading });
    const r = spliceResult(room, old.methods.bowers, tail, f, n, tvdFt, "Bowers");
    const es = f > 0 && old.methods.bowers ? extend(room, old.methods.bowers.effectiveStressPsi, n) : new Float64Array(n);
    es.set(tail.effectiveStressPsi, f);
    methods.bowers = { ...r, effectiveStressPsi: es, sigmaMaxPsi: tail.sigmaMaxPsi, vmaxFtPerS: tail.vmaxFtPerS, a, b, u: unloading?.u ?? 1 };
  }
  if (options.equivalentDepth && sonic.outcome && shaleLine.dtUsPerFt) {
    let first = 0;
    while (first < n && !(Number.isFinite(sonic.outcome.values[first]) && bmlFt[first] > 0)) first++;
    const f = Math.min(from, sonic.from);
    const oldEd = old.methods.equivalentDepth;
    // Samples above f keep their result when Sv, Ph, the shale line and the trend are
    // unchanged there and their Ze (≤ Z ≤ the depth at f − 1) is bracketed by the same pair
    // of old samples in the longer depth array: true when that depth lies strictly above
    // the old well's last depth (the bracket search returns the last sample at or above Ze).
    const reuse = oldEd !== undefined && f > 0 && f < nOld && tvdFt[f - 1] < tvdFt[nOld - 1];
    const start = reuse ? f : 0;
    lowest = Math.min(lowest, start);
    // Samples from `start` on, computed with the whole well as the search context.
    const ed = equivalentDepthPorePressure({
      overburdenPsi: ob.result.svPsi,
      hydrostaticPsi,
      tvdFt,
      observed: shaleLine.dtUsPerFt,
      trend: { kind: "sampled", tvdFt: tvdFt.subarray(first), values: sonic.outcome.values.subarray(first) },
      searchTopTvdFt: Math.max(mudline, tvdFt[Math.min(first, n - 1)]),
      fromIndex: start,
    });
    if (reuse && oldEd) {
      const r = spliceResult(room, oldEd, ed, start, n, tvdFt, "Equivalent depth");
      const zeFt = extend(room, oldEd.equivalentDepthFt, n);
      zeFt.set(ed.equivalentDepthFt, start);
      const es = extend(room, oldEd.effectiveStressPsi, n);
      es.set(ed.effectiveStressPsi, start);
      methods.equivalentDepth = { ...r, equivalentDepthFt: zeFt, effectiveStressPsi: es };
    } else methods.equivalentDepth = ed;
  }
  const warnings: Warning[] = [...ob.result.warnings, ...shale.warnings];
  for (const m of Object.values(methods)) if (m) warnings.push(...m.warnings);
  const chosen = methods[old.primary];
  if (!chosen) throw unsupported(`primary method '${old.primary}' without its inputs`);
  const prediction: PorePressurePrediction = {
    tvdFt,
    tvdssFt,
    bmlFt,
    curves: { grApi, dtUsPerFt, rhobGcc, resOhmM },
    badHole,
    overburden: ob.result,
    hydrostaticPsi,
    shale,
    shaleLine,
    sonicTrend: sonic.outcome,
    resistivityTrend: resistivity.outcome,
    methods,
    primary: old.primary,
    ppPsi: chosen.ppPsi,
    calibration: {},
    warnings,
  };
  const next: IncrementalPorePressureState = { well, options, prediction, overburdenRun: ob.run, recomputedFromIndex: lowest, room };
  room.latest = next;
  return next;
}

function updateOverburden(
  state: IncrementalPorePressureState,
  tvdFt: Float64Array,
  rhobGcc: Float64Array,
  dtUsPerFt: Float64Array | undefined,
  badHole: Uint8Array,
  cleanFrom: number,
): { result: OverburdenResult; run: IncrementalPorePressureState["overburdenRun"]; from: number } {
  const old = state.prediction.overburden;
  const n = tvdFt.length;
  const anchor = state.overburdenRun.anchorIndex;
  if (anchor >= cleanFrom - 1) throw unsupported("a well whose density log starts within the last samples (run predictPorePressure on the whole well first)");
  const filled = (s: number): boolean => s === OverburdenSource.interpolated || s === OverburdenSource.extendedLastValue;
  let from = cleanFrom;
  while (from - 1 > anchor && filled(old.source[from - 1])) from--;
  const room = state.room;
  const source = extend(room, old.source, n);
  const rho = extend(room, old.densityUsedGcc, n);
  const gardner = dtUsPerFt ? gardnerDensityFromSlowness({ slownessUsPerFt: dtUsPerFt.subarray(from) }) : undefined;
  const PENDING = 255;
  for (let i = from; i < n; i++) {
    const g = gardner ? gardner[i - from] : NaN;
    const d = rhobGcc[i];
    const bad = badHole[i] !== 0;
    if (Number.isFinite(d) && d > 0 && !bad) {
      source[i] = OverburdenSource.densityLog;
      rho[i] = d;
    } else if (Number.isFinite(g)) {
      source[i] = bad ? OverburdenSource.badHoleGardner : OverburdenSource.missingGardner;
      rho[i] = g;
    } else {
      source[i] = PENDING;
    }
  }
  fillPendingDensity({ tvdFt, rhoGcc: rho, source, lastKnownIndex: from - 1, pending: PENDING });
  const sumPsi = extend(room, state.overburdenRun.sumPsi, n);
  const compPsi = extend(room, state.overburdenRun.compPsi, n);
  const svPsi = extend(room, old.svPsi, n);
  let sum = sumPsi[from - 1];
  let comp = compPsi[from - 1];
  for (let i = from; i < n; i++) {
    const term = 0.5 * (rho[i - 1] + rho[i]) * PSI_PER_FT_PER_GCC * (tvdFt[i] - tvdFt[i - 1]);
    const t = sum + term;
    comp += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
    sum = t;
    sumPsi[i] = sum;
    compPsi[i] = comp;
    svPsi[i] = sum + comp;
  }
  const gradientPsiPerFt = extend(room, old.gradientPsiPerFt, n);
  const emwPpg = extend(room, old.emwPpg, n);
  for (let i = from; i < n; i++) {
    gradientPsiPerFt[i] = tvdFt[i] > 0 ? svPsi[i] / tvdFt[i] : NaN;
    emwPpg[i] = gradientPsiPerFt[i] / PSI_PER_FT_PER_PPG;
  }
  // Runs that end, with the sample after them, above `from` are unchanged: copied, and the
  // scan restarts at the first run that reaches `from` − 1 (same runs as a scan from 0).
  const ranges: OverburdenSourceRange[] = [];
  let restart = 0;
  for (const rg of old.ranges) {
    if (!(rg.toIndex + 1 < from && rg.fromIndex === restart)) break;
    ranges.push({ ...rg });
    restart = rg.toIndex + 1;
  }
  for (let i = restart; i < n; ) {
    let j = i;
    while (j + 1 < n && source[j + 1] === source[i]) j++;
    ranges.push({ source: OVERBURDEN_SOURCE_NAMES[source[i]], fromIndex: i, toIndex: j, fromTvdFt: tvdFt[i], toTvdFt: tvdFt[j], count: j - i + 1 });
    i = j + 1;
  }
  return {
    result: { svPsi, gradientPsiPerFt, emwPpg, densityUsedGcc: rho, source, ranges, warnings: old.warnings },
    run: { anchorIndex: anchor, sumPsi, compPsi },
    from,
  };
}
