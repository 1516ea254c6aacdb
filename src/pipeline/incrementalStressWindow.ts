/**
 * While-drilling update of the stress window: after {@link appendDepthSamples} (or any
 * change confined to the deeper part of the well), refresh minimum stress, fracture
 * gradient, stress bounds, wellbore limits and the mud-weight window from the first changed
 * sample, and the whole-well summaries (findings, casing points) over the whole well. The
 * result equals {@link predictStressWindow} on the whole arrays bit for bit (the same
 * arithmetic per sample; the test in test/pipeline/incrementalStressWindow.test.ts proves it
 * on a demo well).
 *
 * What restarts where:
 * - the fracture calibration to the stress tests is redone on the whole well (it reads the
 *   tests' depths only); when the chosen coefficient moved, or new options are given (a
 *   leak-off test just taken), every sample is recomputed;
 * - every per-sample curve ({@link stressWindowCurves}) from `fromIndex`;
 * - findings, window findings, casing points and the casing-plan check on the whole well
 *   (casing seats are chosen bottom-up, so the deepest sample can move every seat).
 * Per-sample coefficient curves (a Poisson's-ratio or UCS array) do not grow with the well
 * and are refused; give ν as a number or a depth table, and UCS through the slowness.
 *
 * The state's curves grow in place like those of the pore-pressure state (see
 * {@link GrowthRoom}): only the latest state can be refreshed.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have
 * them reviewed; local regulations and licensed practice govern.
 */
import { ShalepointError } from "../errors.js";
import type { MudWeightWindow } from "../window/mudWeightWindow.js";
import type { FrictionalStressBounds, RegimeStressRange } from "../stress/frictionalStressBounds.js";
import {
  assembleStressWindow,
  chooseFractureMethod,
  stressWindowCurves,
  stressWindowSummaries,
  type FractureMethodChoice,
  type StressInputs,
  type StressWindowCurves,
  type StressWindowOptions,
  type StressWindowPrediction,
} from "./predictStressWindow.js";
import { extendInRoom, supersededStateError, type GrowthRoom } from "./growthRoom.js";

/** The inputs of one refresh: the well's arrays so far (ft, psi, psi, µs/ft). */
export interface StressWindowDrillingInput extends StressInputs {
  /** Shale slowness for the UCS correlation (the shale line), µs/ft; used when options.wellbore is set. */
  dtUsPerFt?: ArrayLike<number>;
}

/** A while-drilling stress window: its options, the fracture method in use and the prediction. */
export interface StressWindowWhileDrillingState {
  /** As given (a `wellbore.dtUsPerFt` there is ignored: each input brings its own). */
  options: StressWindowOptions;
  /** The fracture method the curves were computed with (after calibration). */
  fracture: FractureMethodChoice;
  prediction: StressWindowPrediction;
  /** Storage with room to grow, shared with the states before and after this one. */
  room: GrowthRoom;
}

function unsupported(what: string): ShalepointError {
  return new ShalepointError("E_INCREMENTAL_UNSUPPORTED", `the while-drilling stress window does not support ${what}`, {
    param: what,
    hint: "Give Poisson's ratio as a number or a depth table and UCS through the shale slowness, or run predictStressWindow on the whole well.",
  });
}

function checkOptions(options: StressWindowOptions): void {
  const f = options.fracture;
  if ((f.method === "eaton1969" || f.method === "daines") && ArrayBuffer.isView(f.poissonRatio)) throw unsupported("fracture.poissonRatio as a per-sample curve");
  if (options.wellbore?.ucsPsi !== undefined) throw unsupported("wellbore.ucsPsi (a per-sample curve)");
}

/** The options with this input's slowness, for the samples from `from` on. */
function optionsFor(options: StressWindowOptions, input: StressWindowDrillingInput, from: number): StressWindowOptions {
  if (!options.wellbore) return options;
  const dt = input.dtUsPerFt;
  return { ...options, wellbore: { ...options.wellbore, dtUsPerFt: dt === undefined ? undefined : tailOf(dt, from) } };
}

function tailOf(a: ArrayLike<number>, from: number): ArrayLike<number> {
  if (from === 0) return a;
  return ArrayBuffer.isView(a) ? (a as Float64Array).subarray(from) : Array.prototype.slice.call(a, from);
}

/**
 * Start a while-drilling stress window: {@link predictStressWindow} on the well so far, kept
 * in buffers with room for the samples to come.
 *
 * @param input depth (ft), pore pressure and overburden (psi) and, for the wellbore limits,
 *   the shale slowness (µs/ft), e.g. from an {@link IncrementalPorePressureState}'s prediction
 * @param options as for {@link predictStressWindow}, without per-sample ν or UCS curves
 * @returns {@link StressWindowWhileDrillingState}
 * @throws ShalepointError E_INCREMENTAL_UNSUPPORTED for a per-sample ν or UCS curve; every
 *   error of {@link predictStressWindow}
 * @example startStressWindowWhileDrilling({ tvdFt, ppPsi, svPsi, dtUsPerFt }, { fracture: { method: "eaton1969", poissonRatio: 0.42 } }).prediction.window
 */
export function startStressWindowWhileDrilling(input: StressWindowDrillingInput, options: StressWindowOptions): StressWindowWhileDrillingState {
  checkOptions(options);
  const opts = optionsFor(options, input, 0);
  const chosen = chooseFractureMethod(input, opts);
  const curves = stressWindowCurves(input, chosen.fracture, opts);
  const summaries = stressWindowSummaries(input, curves, opts);
  const room: GrowthRoom = { latest: null, buffers: new WeakSet() };
  const owned = spliceCurves(room, undefined, curves, 0, input.tvdFt.length);
  const state: StressWindowWhileDrillingState = { options, fracture: chosen.fracture, prediction: assembleStressWindow(owned, chosen, summaries), room };
  room.latest = state;
  return state;
}

/**
 * Refresh a while-drilling stress window after the well's inputs changed from `fromIndex`
 * on (new samples below, and the samples the pore-pressure update recomputed). Equals
 * {@link predictStressWindow} on the whole input bit for bit.
 *
 * The update writes into the buffers of `state`: the returned state supersedes it (only the
 * latest state can be refreshed; E_STATE_SUPERSEDED otherwise).
 *
 * @param state the latest state, from {@link startStressWindowWhileDrilling} or a previous call
 * @param input the whole well so far (at least as long as before); above `fromIndex` it must
 *   equal the input of the previous call, as an {@link IncrementalPorePressureState} after
 *   {@link appendDepthSamples} guarantees above its `recomputedFromIndex`
 * @param fromIndex first sample whose inputs may differ, 0 ≤ fromIndex ≤ the previous length
 * @param newOptions options replacing the state's (e.g. with a leak-off test just taken);
 *   every sample is then recomputed. Default: the state's options.
 * @returns a new {@link StressWindowWhileDrillingState}
 * @throws ShalepointError E_RANGE for a bad fromIndex or a shorter input; E_STATE_SUPERSEDED
 *   when `state` was already refreshed (or a refresh failed part-way); every error of the
 *   stage modules (a per-sample error names its row counted from the restart sample)
 * @example
 * let pp = appendDepthSamples(ppState, chunk);
 * win = refreshStressWindow(win, { tvdFt: pp.prediction.tvdFt, ppPsi: pp.prediction.ppPsi, svPsi: pp.prediction.overburden.svPsi,
 *   dtUsPerFt: pp.prediction.shaleLine.dtUsPerFt }, pp.recomputedFromIndex);
 */
export function refreshStressWindow(
  state: StressWindowWhileDrillingState,
  input: StressWindowDrillingInput,
  fromIndex: number,
  newOptions?: StressWindowOptions,
): StressWindowWhileDrillingState {
  const old = state.prediction;
  const nOld = old.shminPsi.length;
  const n = input.tvdFt.length;
  const room = state.room;
  if (room.latest !== state) throw supersededStateError();
  if (!(n >= nOld && Number.isInteger(fromIndex) && fromIndex >= 0 && fromIndex <= nOld)) {
    throw new ShalepointError("E_RANGE", "the refreshed well must be at least as long as before and fromIndex within the old well", {
      param: "fromIndex",
      value: `${fromIndex} (samples ${nOld} → ${n})`,
      allowed: `integer 0–${nOld}, and at least ${nOld} samples`,
      hint: "Pass the well so far and the pore-pressure state's recomputedFromIndex.",
    });
  }
  const options = newOptions ?? state.options;
  if (newOptions) checkOptions(newOptions);
  const whole = optionsFor(options, input, 0);
  const chosen = chooseFractureMethod(input, whole);
  // New options, or a recalibrated coefficient, move every sample's curves.
  const from = !newOptions && JSON.stringify(chosen.fracture) === JSON.stringify(state.fracture) ? fromIndex : 0;
  const tailInput: StressInputs = { tvdFt: tailOf(input.tvdFt, from), ppPsi: tailOf(input.ppPsi, from), svPsi: tailOf(input.svPsi, from) };
  const tail = stressWindowCurves(tailInput, chosen.fracture, optionsFor(options, input, from));
  // From here on the shared buffers are written: a failure part-way leaves the chain unusable.
  room.latest = null;
  const curves = spliceCurves(room, old, tail, from, n);
  const summaries = stressWindowSummaries(input, curves, whole);
  const next: StressWindowWhileDrillingState = { options, fracture: chosen.fracture, prediction: assembleStressWindow(curves, chosen, summaries), room };
  room.latest = next;
  return next;
}

/**
 * The old curves above `from` and the tail's from there on, in room buffers (`old`
 * undefined: the tail is the whole well, copied into the room).
 */
function spliceCurves(room: GrowthRoom, old: StressWindowPrediction | undefined, tail: StressWindowCurves, from: number, n: number): StressWindowCurves {
  const put = (o: Float64Array | undefined, t: Float64Array): Float64Array => {
    const out = extendInRoom(room, o ?? t.subarray(0, 0), n);
    out.set(t, from);
    return out;
  };
  const regime = (o: RegimeStressRange | undefined, t: RegimeStressRange): RegimeStressRange => ({
    shminMinPsi: put(o?.shminMinPsi, t.shminMinPsi),
    shminMaxPsi: put(o?.shminMaxPsi, t.shminMaxPsi),
    shmaxMinPsi: put(o?.shmaxMinPsi, t.shmaxMinPsi),
    shmaxMaxPsi: put(o?.shmaxMaxPsi, t.shmaxMaxPsi),
  });
  const bounds: FrictionalStressBounds = {
    ratio: tail.bounds.ratio,
    normal: regime(old?.bounds.normal, tail.bounds.normal),
    strikeSlip: regime(old?.bounds.strikeSlip, tail.bounds.strikeSlip),
    reverse: regime(old?.bounds.reverse, tail.bounds.reverse),
  };
  const tw = tail.wellbore;
  const ow = old?.wellbore;
  const wellbore = tw && {
    shmaxPsi: put(ow?.shmaxPsi, tw.shmaxPsi),
    ucsPsi: put(ow?.ucsPsi, tw.ucsPsi),
    collapsePsi: put(ow?.collapsePsi, tw.collapsePsi),
    breakdownPsi: put(ow?.breakdownPsi, tw.breakdownPsi),
  };
  // The criteria are plain arrays: cut at `from` and continued (in place: they belong to the chain).
  const criteria = <T>(o: T[] | undefined, t: T[]): T[] => {
    const out = o ?? [];
    out.length = from;
    for (let k = 0; k < t.length; k++) out.push(t[k]);
    return out;
  };
  const ow2: MudWeightWindow | undefined = old?.window;
  const window: StressWindowCurves["window"] = {
    lowerPsiPerFt: put(ow2?.lowerPsiPerFt, tail.window.lowerPsiPerFt),
    upperPsiPerFt: put(ow2?.upperPsiPerFt, tail.window.upperPsiPerFt),
    widthPsiPerFt: put(ow2?.widthPsiPerFt, tail.window.widthPsiPerFt),
    lowerCriterion: criteria(ow2?.lowerCriterion, tail.window.lowerCriterion),
    upperCriterion: criteria(ow2?.upperCriterion, tail.window.upperCriterion),
  };
  return {
    shminPsi: put(old?.shminPsi, tail.shminPsi),
    fractureGradientPsiPerFt: put(old?.fractureGradientPsiPerFt, tail.fractureGradientPsiPerFt),
    hubbertWillis: { minPsi: put(old?.hubbertWillis.minPsi, tail.hubbertWillis.minPsi), maxPsi: put(old?.hubbertWillis.maxPsi, tail.hubbertWillis.maxPsi) },
    bounds,
    wellbore,
    window,
  };
}
