/**
 * refreshStressWindow must give exactly what predictStressWindow gives on the whole well.
 * The outside reference here is the project's full stress-window run on the same data (own
 * case: the demo well Quillon A-1 with its pore pressure updated while drilling); the
 * tolerance is zero — every curve must match bit for bit (Object.is) and every finding,
 * casing section and warning must be the same, because the refresh runs the same
 * arithmetic per sample and redoes the whole-well summaries.
 */
import { describe, it, expect } from "vitest";
import { loadDemoWell } from "./demoWells.js";
import { wellHead } from "../helpers/wellHead.js";
import { predictPorePressure, type PorePressurePredictionOptions } from "../../src/pipeline/predictPorePressure.js";
import { predictStressWindow, type StressWindowOptions } from "../../src/pipeline/predictStressWindow.js";
import { startWhileDrilling, appendDepthSamples, type DepthSampleChunk } from "../../src/pipeline/incrementalPorePressure.js";
import { startStressWindowWhileDrilling, refreshStressWindow, type StressWindowDrillingInput } from "../../src/pipeline/incrementalStressWindow.js";
import type { Well } from "../../src/well/types.js";
import type { PorePressurePrediction } from "../../src/pipeline/predictPorePressure.js";

const a1 = loadDemoWell("quillon-a1");
const mudline = a1.well.datums.rtElevationFt + a1.well.datums.waterDepthFt;

const ppOptions: PorePressurePredictionOptions = {
  hydrostaticGradientPsiPerFt: a1.hydrostaticPsiPerFt,
  shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
  sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 900, baseBmlFt: 4300 }] }] },
  eatonSonic: {},
  primary: "eatonSonic",
};

function chunk(well: Well, from: number, to: number): DepthSampleChunk {
  const curves: Record<string, Float64Array> = {};
  for (const [k, c] of Object.entries(well.curves)) curves[k] = c.values.slice(from, to);
  return { mdFt: well.mdFt.slice(from, to), tvdFt: well.tvdFt.slice(from, to), curves };
}

function inputOf(p: PorePressurePrediction): StressWindowDrillingInput {
  return { tvdFt: p.tvdFt, ppPsi: p.ppPsi, svPsi: p.overburden.svPsi, dtUsPerFt: p.shaleLine.dtUsPerFt };
}

/** Typed arrays as lists with NaN and −0 spelled out, so JSON comparison is bit-exact. */
function serial(x: unknown): string {
  return JSON.stringify(x, (_k, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array, (e) => (Object.is(e, -0) ? "-0" : Number.isNaN(e) ? "NaN" : e)) : v));
}

/**
 * Leak-off tests of the demo well (demo-logs/quillon-a1/leakoff-tests.csv: surface pressure
 * plus the mud column, 12/231 psi/ft per ppg): 8,382 ft, 8.70 ppg, 1,385.9 psi → 5,174 psi;
 * 11,282 ft, 10.50 ppg, 1,948.3 psi → 8,102 psi.
 */
const LOT_8382 = { tvdFt: 8382, pressurePsi: 5174, kind: "LOT" as const, label: "13-3/8 in shoe" };
const LOT_11282 = { tvdFt: 11282, pressurePsi: 8102, kind: "LOT" as const, label: "9-5/8 in shoe" };

/** Shoe depths and the leak-off test above the start of the invented well plan (fictional Quillon A-1). */
function windowOptions(calibrate: boolean): StressWindowOptions {
  return {
    fracture: { method: "eaton1969", poissonRatio: [{ depthFt: mudline, value: 0.38 }, { depthFt: 13000, value: 0.45 }] },
    stressTests: [LOT_8382],
    calibrateFracture: calibrate,
    wellbore: { shmaxFraction: 0.3 },
    margins: { tripPpg: 0.3, kickPpg: 0.3, minWindowPpg: 1.0 },
    firstShoeTvdFt: mudline + 1000,
    // The planned sections drilled so far (a plan must lie inside the well).
    casingPlan: [
      { topTvdFt: mudline + 1000, bottomTvdFt: 8382, mudWeightPpg: 9.0 },
      { topTvdFt: 8382, bottomTvdFt: 8900, mudWeightPpg: 10.5 },
    ],
  };
}

describe("refreshStressWindow", () => {
  const n = a1.well.tvdFt.length;
  let start = 0;
  while (a1.well.tvdFt[start] < 9000) start++;

  for (const calibrate of [false, true]) {
    it(`equals predictStressWindow on the whole demo well after pore-pressure appends (bit for bit; calibrateFracture ${calibrate})`, () => {
      const options = windowOptions(calibrate);
      let pp = startWhileDrilling(wellHead(a1.well, start), ppOptions);
      let win = startStressWindowWhileDrilling(inputOf(pp.prediction), options);
      // the start equals the full run on the well so far
      expect(serial(win.prediction)).toBe(serial(predictStressWindow(inputOf(pp.prediction), { ...options, wellbore: { ...options.wellbore, dtUsPerFt: pp.prediction.shaleLine.dtUsPerFt } })));
      const cuts = [start + 500, start + 501, start + 1700, n];
      let from = start;
      let restarts = 0;
      for (const to of cuts) {
        pp = appendDepthSamples(pp, chunk(a1.well, from, to));
        win = refreshStressWindow(win, inputOf(pp.prediction), pp.recomputedFromIndex);
        if (pp.recomputedFromIndex > from - 1000) restarts++;
        from = to;
      }
      // the updates restarted near the old end (no trend or calibration moved everything)
      expect(restarts).toBe(cuts.length);
      const full = predictPorePressure(a1.well, ppOptions);
      const expected = predictStressWindow(inputOf(full), { ...options, wellbore: { ...options.wellbore, dtUsPerFt: full.shaleLine.dtUsPerFt } });
      expect(win.prediction.shminPsi.length).toBe(n);
      expect(serial(win.prediction)).toBe(serial(expected));
      // the comparison has substance: findings and at least two casing shoes were produced
      expect(expected.casing?.shoeTvdFt.length).toBeGreaterThanOrEqual(2);
      expect(expected.findings.length + expected.window.findings.length).toBeGreaterThan(0);
    });
  }

  it("takes a leak-off test added once drilled (new options: every sample recomputed, ν recalibrated) and still equals the full run", () => {
    const options = windowOptions(true);
    let pp = startWhileDrilling(wellHead(a1.well, start), ppOptions);
    let win = startStressWindowWhileDrilling(inputOf(pp.prediction), options);
    pp = appendDepthSamples(pp, chunk(a1.well, start, n));
    win = refreshStressWindow(win, inputOf(pp.prediction), pp.recomputedFromIndex);
    const nuBefore = JSON.stringify(win.fracture);
    // The 9-5/8 in shoe is drilled out and tested: the test joins the options.
    const withSecond = { ...options, stressTests: [LOT_8382, LOT_11282] };
    win = refreshStressWindow(win, inputOf(pp.prediction), n, withSecond);
    expect(JSON.stringify(win.fracture)).not.toBe(nuBefore);
    const full = predictPorePressure(a1.well, ppOptions);
    const expected = predictStressWindow(inputOf(full), { ...withSecond, wellbore: { ...options.wellbore, dtUsPerFt: full.shaleLine.dtUsPerFt } });
    expect(expected.fractureCalibration?.n).toBe(2);
    expect(serial(win.prediction)).toBe(serial(expected));
  });

  it("refuses a superseded state, a shorter well and per-sample coefficient curves", () => {
    const p0 = predictPorePressure(wellHead(a1.well, start), ppOptions);
    const win0 = startStressWindowWhileDrilling(inputOf(p0), windowOptions(false));
    const win1 = refreshStressWindow(win0, inputOf(p0), start);
    expect(() => refreshStressWindow(win0, inputOf(p0), start)).toThrow(expect.objectContaining({ code: "E_STATE_SUPERSEDED" }));
    const shorter = predictPorePressure(wellHead(a1.well, start - 10), ppOptions);
    expect(() => refreshStressWindow(win1, inputOf(shorter), 0)).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    const nuCurve = { ...windowOptions(false), fracture: { method: "eaton1969" as const, poissonRatio: new Float64Array(start).fill(0.4) } };
    expect(() => startStressWindowWhileDrilling(inputOf(p0), nuCurve)).toThrow(expect.objectContaining({ code: "E_INCREMENTAL_UNSUPPORTED" }));
  });
});
