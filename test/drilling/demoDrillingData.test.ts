/**
 * Demo drilling data of Quillon A-1 (demo-logs/quillon-a1/drilling-data.csv) read, turned into
 * dc pore pressure and checked against the designed truth (tests only read the truth), and the
 * while-drilling row append checked against the full run on the same demo well.
 */
import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { readDrillingData } from "../../src/io/drillingData.js";
import { readMudWeights } from "../../src/io/tables.js";
import { predictPorePressure } from "../../src/pipeline/predictPorePressure.js";
import {
  predictDcPorePressure,
  startDcWhileDrilling,
  appendDrillingRows,
  type DcPorePressureOptions,
} from "../../src/pipeline/incrementalDrillingPorePressure.js";
import { DEMO, loadDemoWell, nearestIndex } from "../pipeline/demoWells.js";

const a1 = loadDemoWell("quillon-a1");
const { data } = readDrillingData(readFileSync(join(DEMO, "quillon-a1", "drilling-data.csv"), "utf8"), { file: "drilling-data.csv" });
const logs = predictPorePressure(a1.well, {
  hydrostaticGradientPsiPerFt: a1.hydrostaticPsiPerFt,
  shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
  sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: 900, baseBmlFt: 4300 }] }] },
  eatonSonic: {},
});
// Shale flag and overburden on the drilling rows, from the logs (drilling rows sit on the log grid).
const rowIndex = Array.from(data.tvdFt, (z) => nearestIndex(logs.tvdFt, z));
const isShale = Float64Array.from(rowIndex, (i) => logs.shale.isShale[i]);
const overburdenPsi = Float64Array.from(rowIndex, (i) => logs.overburden.svPsi[i]);
const options: DcPorePressureOptions = {
  datums: a1.well.datums,
  hydrostaticGradientPsiPerFt: a1.hydrostaticPsiPerFt,
  trend: { use: "fit", intervals: [{ topBmlFt: 1000, baseBmlFt: 4500 }] },
};
const full = predictDcPorePressure(data, { isShale, overburdenPsi }, options);
const PPG = 12 / 231;

describe("demo drilling data (Quillon A-1)", () => {
  it("rows are on the log grid and use the mud weights of mud-weights.csv", () => {
    expect(data.tvdFt.length).toBe(5001); // 5,000 to 15,000 ft TVD every 2 ft
    for (let k = 0; k < rowIndex.length; k += 250) expect(logs.tvdFt[rowIndex[k]]).toBe(data.tvdFt[k]);
    const mud = readMudWeights(readFileSync(join(DEMO, "quillon-a1", "mud-weights.csv"), "utf8")).records;
    const at = (z: number) => mud.find((m) => z <= m.tvdToFt)!.mudWeightPsiPerFt;
    for (let k = 0; k < data.tvdFt.length; k += 500) expect(data.mudWeightPsiPerFt[k] / PPG).toBeCloseTo(at(data.tvdFt[k]) / PPG, 2);
  });

  it("fits a dc normal trend near the one the generator used (0.80·e^(6.0e-5·Z), demoDrillingData.ts; own case)", () => {
    // ROP carries 12 % log-normal noise, averaged over ~1,700 fit rows: 1 % allowed at 4000 ft below mudline
    const z = 4000;
    const fitted = full.trend.dcAtMudline * Math.exp(full.trend.ratePerFt * z);
    expect(Math.abs(fitted / (0.8 * Math.exp(6.0e-5 * z)) - 1)).toBeLessThan(0.01);
  });

  it("recovers the truth in overpressured shale to 0.15 ppg RMS (own case; truth from demo-logs/quillon-a1/truth.csv)", () => {
    const truthAt = new Map(a1.truth.map((t) => [t.tvdFt, t]));
    let ss = 0;
    let k = 0;
    for (let r = 0; r < data.tvdFt.length; r++) {
      const t = truthAt.get(data.tvdFt[r]);
      if (!t || t.lithology !== "shale" || t.zone !== "undercompacted" || !Number.isFinite(full.ppPsi[r])) continue;
      const e = (full.ppPsi[r] - t.ppPsi) / (data.tvdFt[r] * PPG);
      ss += e * e;
      k++;
    }
    expect(k).toBeGreaterThan(50);
    // noise-free dc would give 0; 0.15 ppg leaves room for the ROP noise through the 50-ft median
    expect(Math.sqrt(ss / k)).toBeLessThan(0.15);
  });

  it("appending the rows in while-drilling chunks equals the full run bit for bit", () => {
    const n = data.tvdFt.length;
    const part = (a: number, b: number) => ({
      cols: {
        tvdFt: data.tvdFt.slice(a, b), ropFtPerH: data.ropFtPerH.slice(a, b), rotaryRpm: data.rotaryRpm.slice(a, b), wobLbf: data.wobLbf.slice(a, b),
        bitIn: data.bitIn.slice(a, b), mudWeightPsiPerFt: data.mudWeightPsiPerFt.slice(a, b), ecdPsiPerFt: data.ecdPsiPerFt.slice(a, b),
      },
      samples: { isShale: isShale.slice(a, b), overburdenPsi: overburdenPsi.slice(a, b) },
    });
    const first = part(0, 2500);
    let state = startDcWhileDrilling(first.cols, first.samples, options);
    for (const [a, b] of [[2500, 3000], [3000, 3001], [3001, n]]) {
      const p = part(a, b);
      state = appendDrillingRows(state, p.cols, p.samples);
    }
    const same = (x: ArrayLike<number>, y: ArrayLike<number>) => x.length === y.length && Array.from(x).every((v, i) => Object.is(v, y[i]));
    expect(same(state.prediction.ppPsi, full.ppPsi)).toBe(true);
    expect(same(state.prediction.dcSmoothed, full.dcSmoothed)).toBe(true);
    expect(same(state.prediction.dcTrend, full.dcTrend)).toBe(true);
  });
});
