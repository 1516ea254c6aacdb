import { describe, it, expect } from "vitest";
import {
  predictDcPorePressure,
  startDcWhileDrilling,
  appendDrillingRows,
  type DcDrillingColumns,
  type DcPorePressureOptions,
} from "../../src/pipeline/incrementalDrillingPorePressure.js";

/** ROP that gives drilling exponent d for N, W, D (Jorden & Shirley 1966 eq. 2 solved for R). */
function ropFor(d: number, rpm: number, wobLbf: number, bitIn: number): number {
  return 60 * rpm * Math.pow((12 * wobLbf) / (1e6 * bitIn), d);
}

const onshore = { rtElevationFt: 0, waterDepthFt: 0, seawaterDensityGcc: 1.03 };

describe("predictDcPorePressure", () => {
  it("Eaton dc form: S/D 1.04, Pn 0.452, dco 1.75, dcn 1.85 → 0.4899 psi/ft (CHECK-VALUES §3 own case; Eaton 1975 exponent 1.2)", () => {
    const n = 5;
    const tvdFt = [9980, 9990, 10000, 10010, 10020];
    // Mud weight equal to the normal gradient makes dc = d (Rehm & McClendon 1971), so d = 1.75.
    const cols: DcDrillingColumns = Object.freeze({
      tvdFt,
      ropFtPerH: tvdFt.map(() => ropFor(1.75, 120, 35000, 8.5)),
      rotaryRpm: tvdFt.map(() => 120),
      wobLbf: tvdFt.map(() => 35000),
      bitIn: tvdFt.map(() => 8.5),
      mudWeightPsiPerFt: tvdFt.map(() => 0.452),
    });
    const samples = Object.freeze({ isShale: new Array(n).fill(1), overburdenPsi: tvdFt.map((z) => 1.04 * z) });
    const r = predictDcPorePressure(cols, samples, {
      datums: onshore,
      hydrostaticGradientPsiPerFt: 0.452,
      trend: { use: "given", trend: { dcAtMudline: 1.85, ratePerFt: 0 } },
    });
    expect(r.dc[2]).toBeCloseTo(1.75, 12);
    expect(r.ppPsi[2] / 10000).toBeCloseTo(0.4899, 4); // 4 significant figures as printed
    // exponent moved by 1 % (1.212) shifts Pp/D by ~0.0004 psi/ft: the 4-figure check fails
    const moved = predictDcPorePressure(cols, samples, { datums: onshore, hydrostaticGradientPsiPerFt: 0.452, exponent: 1.212, trend: { use: "given", trend: { dcAtMudline: 1.85, ratePerFt: 0 } } });
    expect(moved.ppPsi[2] / 10000).not.toBeCloseTo(0.4899, 4);
  });

  it("the published d-exponent row (R 30, N 120, W 35,000, D 8.5 → d 1.822; CHECK-VALUES §9, Lapeyrouse) and dc 0.9030 for 9.0/12.0 ppg (own case)", () => {
    const PPG = 12 / 231;
    const r = predictDcPorePressure(
      { tvdFt: [5000, 5001, 5002], ropFtPerH: [30, 90, 90], rotaryRpm: [120, 110, 110], wobLbf: [35000, 20000, 20000], bitIn: [8.5, 8.5, 8.5], mudWeightPsiPerFt: [9 * PPG, 12 * PPG, 12 * PPG] },
      { isShale: [1, 1, 1], overburdenPsi: [5000, 5001, 5002] },
      { datums: onshore, hydrostaticGradientPsiPerFt: 9 * PPG, trend: { use: "given", trend: { dcAtMudline: 1, ratePerFt: 0 } } },
    );
    expect(r.d[0]).toBeCloseTo(1.822, 3);
    expect(r.dc[1]).toBeCloseTo(0.903, 3);
  });
});

/** Small deterministic generator (LCG, Numerical Recipes constants) for a noisy own case. */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

function synthetic(n: number) {
  const rnd = lcg(42);
  const tvdFt: number[] = [];
  const rop: number[] = [];
  const mw: number[] = [];
  const shale: number[] = [];
  const sv: number[] = [];
  for (let i = 0; i < n; i++) {
    const z = 3000 + 2 * i;
    tvdFt.push(z);
    const dTrue = 0.9 * Math.exp(5e-5 * (z - 2000)) * (z > 8000 ? 0.85 : 1) * (1 + 0.05 * (rnd() - 0.5));
    rop.push(i % 97 === 0 ? NaN : ropFor(dTrue, 120, 30000, 8.5));
    mw.push(z > 8000 ? 0.6 : 0.47);
    shale.push(rnd() < 0.7 ? 1 : 0);
    sv.push(0.95 * z);
  }
  const cols = { tvdFt, ropFtPerH: rop, rotaryRpm: tvdFt.map(() => 120), wobLbf: tvdFt.map(() => 30000), bitIn: tvdFt.map(() => 8.5), mudWeightPsiPerFt: mw };
  return { cols, samples: { isShale: shale, overburdenPsi: sv } };
}

function slice<T extends Record<string, number[]>>(o: T, a: number, b: number): T {
  const out = {} as Record<string, number[]>;
  for (const [k, v] of Object.entries(o)) out[k] = v.slice(a, b);
  return out as T;
}

function firstDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return i;
  return -1;
}

describe("appendDrillingRows", () => {
  const n = 3500;
  const { cols, samples } = synthetic(n);
  const options: DcPorePressureOptions = { datums: onshore, hydrostaticGradientPsiPerFt: 0.452, trend: { use: "fit", intervals: [{ topBmlFt: 3000, baseBmlFt: 7000 }] } };
  const full = predictDcPorePressure(cols, samples, options);

  it("equals predictDcPorePressure on all rows, bit for bit, when rows arrive in chunks (own case; reference = the full run)", () => {
    let state = startDcWhileDrilling(slice(cols, 0, 1000), slice(samples, 0, 1000), options);
    for (const [a, b] of [[1000, 1500], [1500, 1501], [1501, 2600], [2600, n]]) {
      state = appendDrillingRows(state, slice(cols, a, b), slice(samples, a, b));
    }
    const p = state.prediction;
    for (const [name, x, y] of [["d", p.d, full.d], ["dc", p.dc, full.dc], ["dcSmoothed", p.dcSmoothed, full.dcSmoothed], ["dcTrend", p.dcTrend, full.dcTrend], ["pp", p.ppPsi, full.ppPsi], ["flags", p.flags, full.flags]] as const) {
      expect({ name, at: firstDiff(x, y) }).toEqual({ name, at: -1 });
    }
    expect(p.trend).toEqual(full.trend);
    // below the fit interval the trend is fixed: the last update restarted near the old end
    expect(state.recomputedFromIndex).toBeGreaterThan(2600 - 30);
    // the overpressured interval (z > 8000 ft, dc 15 % under trend) reads above hydrostatic
    let sum = 0;
    let k = 0;
    for (let i = 0; i < n; i++) if (full.tvdFt[i] > 8500 && Number.isFinite(full.ppPsi[i])) { sum += full.ppPsi[i] / full.tvdFt[i]; k++; }
    expect(k).toBeGreaterThan(100);
    expect(sum / k).toBeGreaterThan(0.6); // well above the 0.452 psi/ft normal gradient
  });

  it("rejects rows that are not deeper than the last row", () => {
    const state = startDcWhileDrilling(slice(cols, 0, 1000), slice(samples, 0, 1000), options);
    expect(() => appendDrillingRows(state, slice(cols, 990, 1010), slice(samples, 990, 1010))).toThrow(expect.objectContaining({ code: "E_DEPTH_ORDER" }));
  });
});
