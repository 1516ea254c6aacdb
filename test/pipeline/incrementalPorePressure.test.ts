/**
 * appendDepthSamples must give exactly what predictPorePressure gives on the concatenated
 * well. The outside reference here is the project's full pipeline run on the same data
 * (own case: the demo well Quillon A-1); the tolerance is zero — every compared array must
 * match bit for bit, because the update runs the same arithmetic in the same order.
 */
import { describe, it, expect } from "vitest";
import { loadDemoWell } from "./demoWells.js";
import { wellHead } from "../helpers/wellHead.js";
import { predictPorePressure, type PorePressurePredictionOptions, type PorePressurePrediction } from "../../src/pipeline/predictPorePressure.js";
import { startWhileDrilling, appendDepthSamples, copyWhileDrillingState, type DepthSampleChunk } from "../../src/pipeline/incrementalPorePressure.js";
import type { Well } from "../../src/well/types.js";

const a1 = loadDemoWell("quillon-a1");
const mudline = a1.well.datums.rtElevationFt + a1.well.datums.waterDepthFt;

function optionsFor(): PorePressurePredictionOptions {
  const seg = [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 900, baseBmlFt: 4300 }] }];
  return {
    hydrostaticGradientPsiPerFt: a1.hydrostaticPsiPerFt,
    shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
    sonicTrend: { use: "fit", kind: "sonicExponential", segments: seg },
    resistivityTrend: { use: "fit", kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, intervals: [{ topBmlFt: 900, baseBmlFt: 4300 }] }] },
    eatonSonic: {},
    eatonResistivity: {},
    bowers: { a: 10, b: 0.75 },
    equivalentDepth: true,
    primary: "eatonSonic",
  };
}

function chunk(well: Well, from: number, to: number): DepthSampleChunk {
  // Frozen plain arrays: the update must not write into the caller's chunk.
  const curves: Record<string, readonly number[]> = {};
  for (const [k, c] of Object.entries(well.curves)) curves[k] = Object.freeze(Array.from(c.values.slice(from, to)));
  return Object.freeze({ mdFt: Object.freeze(Array.from(well.mdFt.slice(from, to))), tvdFt: Object.freeze(Array.from(well.tvdFt.slice(from, to))), curves: Object.freeze(curves) });
}

/** Index of the first element that differs (Object.is, so NaN equals NaN and −0 ≠ 0), or −1. */
function firstDiff(a: ArrayLike<number> | undefined, b: ArrayLike<number> | undefined): number {
  if (a === undefined || b === undefined) return a === b ? -1 : 0;
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return i;
  return -1;
}

function expectSame(inc: PorePressurePrediction, full: PorePressurePrediction): void {
  const pairs: [string, ArrayLike<number> | undefined, ArrayLike<number> | undefined][] = [
    ["dt", inc.curves.dtUsPerFt, full.curves.dtUsPerFt],
    ["rhob", inc.curves.rhobGcc, full.curves.rhobGcc],
    ["res", inc.curves.resOhmM, full.curves.resOhmM],
    ["badHole", inc.badHole, full.badHole],
    ["sv", inc.overburden.svPsi, full.overburden.svPsi],
    ["obSource", inc.overburden.source, full.overburden.source],
    ["rhoUsed", inc.overburden.densityUsedGcc, full.overburden.densityUsedGcc],
    ["ph", inc.hydrostaticPsi, full.hydrostaticPsi],
    ["isShale", inc.shale.isShale, full.shale.isShale],
    ["grUsed", inc.shale.grUsedApi, full.shale.grUsedApi],
    ["ptIndex", inc.shale.points.index, full.shale.points.index],
    ["ptDt", inc.shale.points.values.dt, full.shale.points.values.dt],
    ["ptRes", inc.shale.points.values.res, full.shale.points.values.res],
    ["lineDt", inc.shaleLine.dtUsPerFt, full.shaleLine.dtUsPerFt],
    ["lineRes", inc.shaleLine.resOhmM, full.shaleLine.resOhmM],
    ["sonicTrend", inc.sonicTrend?.values, full.sonicTrend?.values],
    ["resTrend", inc.resistivityTrend?.values, full.resistivityTrend?.values],
    ["eatonSonic", inc.methods.eatonSonic?.ppPsi, full.methods.eatonSonic?.ppPsi],
    ["eatonSonicFlags", inc.methods.eatonSonic?.flags, full.methods.eatonSonic?.flags],
    ["eatonRes", inc.methods.eatonResistivity?.ppPsi, full.methods.eatonResistivity?.ppPsi],
    ["bowers", inc.methods.bowers?.ppPsi, full.methods.bowers?.ppPsi],
    ["bowersSigma", inc.methods.bowers?.effectiveStressPsi, full.methods.bowers?.effectiveStressPsi],
    ["eqDepth", inc.methods.equivalentDepth?.ppPsi, full.methods.equivalentDepth?.ppPsi],
    ["eqDepthFlags", inc.methods.equivalentDepth?.flags, full.methods.equivalentDepth?.flags],
    ["eqDepthZe", inc.methods.equivalentDepth?.equivalentDepthFt, full.methods.equivalentDepth?.equivalentDepthFt],
    ["eqDepthSigma", inc.methods.equivalentDepth?.effectiveStressPsi, full.methods.equivalentDepth?.effectiveStressPsi],
    ["pp", inc.ppPsi, full.ppPsi],
  ];
  for (const [name, a, b] of pairs) expect({ name, firstDiff: firstDiff(a, b) }).toEqual({ name, firstDiff: -1 });
  expect(JSON.stringify(inc.sonicTrend?.trend)).toBe(JSON.stringify(full.sonicTrend?.trend));
  // Warnings too (equivalent depth above the restart is spliced from the old state).
  expect(JSON.stringify(inc.methods.equivalentDepth?.warnings)).toBe(JSON.stringify(full.methods.equivalentDepth?.warnings));
  expect(JSON.stringify(inc.warnings)).toBe(JSON.stringify(full.warnings));
  expect(JSON.stringify(inc.resistivityTrend?.trend)).toBe(JSON.stringify(full.resistivityTrend?.trend));
}

describe("appendDepthSamples", () => {
  const n = a1.well.tvdFt.length;
  const full = predictPorePressure(a1.well, optionsFor());

  it("equals predictPorePressure on the whole demo well after appending in uneven chunks (bit for bit)", () => {
    // Own case: start below the trend's fit interval, then add 500, 1, 37 and the rest.
    let start = 0;
    while (a1.well.tvdFt[start] < mudline + 4300 + 500) start++;
    let state = startWhileDrilling(wellHead(a1.well, start), optionsFor());
    const cuts = [start + 500, start + 501, start + 538, n];
    let from = start;
    for (const to of cuts) {
      const before = state.prediction.ppPsi;
      state = appendDepthSamples(state, chunk(a1.well, from, to));
      expect(state.prediction.ppPsi.length).toBe(to);
      // the update restarted close to the old end, not at the top of the well
      expect(state.recomputedFromIndex).toBeGreaterThan(from - 200);
      expect(before.length).toBe(from); // the old state was not changed
      from = to;
    }
    expectSame(state.prediction, full);
  });

  it("refits a trend whose fit interval the new samples reach, and still equals the full run", () => {
    let start = 0;
    while (a1.well.tvdFt[start] < mudline + 2500) start++;
    let state = startWhileDrilling(wellHead(a1.well, start), optionsFor());
    state = appendDepthSamples(state, chunk(a1.well, start, n));
    expect(state.recomputedFromIndex).toBe(0); // trend moved: every sample recomputed
    expectSame(state.prediction, full);
  });

  it("keeps a given (frozen) trend and equals the full run with that trend", () => {
    const opts = optionsFor();
    opts.sonicTrend = { use: "given", trend: full.sonicTrend!.trend };
    const fullFrozen = predictPorePressure(a1.well, opts);
    let start = 0;
    while (a1.well.tvdFt[start] < mudline + 3000) start++;
    let state = startWhileDrilling(wellHead(a1.well, start), opts);
    state = appendDepthSamples(state, chunk(a1.well, start, start + 800));
    state = appendDepthSamples(state, chunk(a1.well, start + 800, n));
    expectSame(state.prediction, fullFrozen);
  });

  it("Marten B-1 (metric files, Bowers with an unloading zone): appending below the onset equals the full run", () => {
    const b1 = loadDemoWell("marten-b1");
    const m = 1 / 0.3048; // ft per m (exact definition)
    const opts: PorePressurePredictionOptions = {
      hydrostaticGradientPsiPerFt: b1.hydrostaticPsiPerFt,
      shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
      sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 400 * m, baseBmlFt: 1650 * m }] }] },
      eatonSonic: {},
      bowers: { a: 10, b: 0.75, unloading: { onsetTvdFt: 3780 * m, u: 3.5 } },
      primary: "bowers",
    };
    const fullB1 = predictPorePressure(b1.well, opts);
    const nB = b1.well.tvdFt.length;
    let start = 0;
    while (b1.well.tvdFt[start] < 3780 * m + 300) start++;
    let state = startWhileDrilling(wellHead(b1.well, start), opts);
    state = appendDepthSamples(state, chunk(b1.well, start, start + 700));
    state = appendDepthSamples(state, chunk(b1.well, start + 700, nB));
    expect(state.prediction.methods.bowers!.vmaxFtPerS).toBe(fullB1.methods.bowers!.vmaxFtPerS);
    expectSame(state.prediction, fullB1);
  });

  it("extends a state's buffers in place: only the latest state may be extended; a copy stays as it was", () => {
    let start = 0;
    while (a1.well.tvdFt[start] < mudline + 4300 + 500) start++;
    const given = wellHead(a1.well, start);
    const givenTvd = Float64Array.from(given.tvdFt);
    const s0 = startWhileDrilling(given, optionsFor());
    const kept = copyWhileDrillingState(s0);
    const keptPp = Float64Array.from(kept.prediction.ppPsi);
    const s1 = appendDepthSamples(s0, chunk(a1.well, start, start + 400));
    // s0 was extended: appending to it again (a branch) is refused with a typed error
    expect(() => appendDepthSamples(s0, chunk(a1.well, start, start + 10))).toThrow(expect.objectContaining({ code: "E_STATE_SUPERSEDED" }));
    expect(() => copyWhileDrillingState(s0)).toThrow(expect.objectContaining({ code: "E_STATE_SUPERSEDED" }));
    // the copy is untouched and can take its own, different chunk
    expect(firstDiff(kept.prediction.ppPsi, keptPp)).toBe(-1);
    const k1 = appendDepthSamples(kept, chunk(a1.well, start, start + 37));
    expect(k1.prediction.ppPsi.length).toBe(start + 37);
    // both chains reach the same end and equal the full run
    const endA = appendDepthSamples(s1, chunk(a1.well, start + 400, n));
    const endB = appendDepthSamples(k1, chunk(a1.well, start + 37, n));
    expectSame(endA.prediction, full);
    expectSame(endB.prediction, full);
    // the caller's well was copied, never written
    expect(firstDiff(given.tvdFt, givenTvd)).toBe(-1);
    expect(given.tvdFt.length).toBe(start);
    // an empty chunk changes nothing and keeps the state extendable
    const same = appendDepthSamples(endA, chunk(a1.well, n, n));
    expect(same.prediction).toBe(endA.prediction);
    expect(appendDepthSamples(same, chunk(a1.well, n, n)).prediction.ppPsi.length).toBe(n);
  });

  it("rejects samples above the current end and calibration refits", () => {
    const state = startWhileDrilling(wellHead(a1.well, 20000), optionsFor());
    expect(() => appendDepthSamples(state, chunk(a1.well, 19990, 20010))).toThrow(/below the current end/);
    const opts = { ...optionsFor(), calibration: { observations: [], fitEatonExponents: true } };
    expect(() => startWhileDrilling(a1.well, opts)).toThrow(expect.objectContaining({ code: "E_INCREMENTAL_UNSUPPORTED" }));
  });
});
