/**
 * Shale flag and shale points on an invented Quillon A-1-style GR log (SCENARIO.md):
 * 0.5-ft samples from 8000 ft TVD, sand 40 API, shale 110 API. Expected beds, thicknesses and
 * medians are worked by hand from the layout below. Larionov 1969 (from memory) for Vsh.
 */
import { describe, expect, it } from "vitest";
import { pickShalePoints } from "../../src/logs/index.js";
import { ShalepointError } from "../../src/errors.js";

const N = 200;
const tvd = new Float64Array(N).map((_, i) => 8000 + 0.5 * i);
const gr = new Float64Array(N).fill(40);
for (let i = 20; i < 60; i++) gr[i] = 110; // 20-ft shale bed, 8010–8029.5 ft
for (let i = 70; i < 76; i++) gr[i] = 110; // 3-ft shale stringer
gr[100] = 150; // one-sample spike in sand
for (let i = 120; i < 200; i++) gr[i] = 110; // 40-ft shale, 8060–8099.5 ft
const dt = new Float64Array(N).map((_, i) => 100 + 0.1 * i);
dt[30] = NaN;

describe("pickShalePoints", () => {
  it("despikes, drops thin beds and gives one median point per bed", () => {
    const grCopy = gr.slice();
    const r = pickShalePoints({
      tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 },
      minBedThicknessFt: 5, curves: Object.freeze({ DT: dt }),
    });
    expect(Array.from(r.spikeIndex)).toEqual([100]);
    expect(r.isShale[100]).toBe(0);
    expect(r.isShale[72]).toBe(0); // 3 ft < 5 ft
    expect(r.isShale[20]).toBe(1);
    // Hand: bed 20..59 (40 samples) → middle sample 39; bed 120..199 (80) → 159.
    expect(Array.from(r.points.index)).toEqual([39, 159]);
    expect(Array.from(r.points.tvdFt)).toEqual([8019.5, 8079.5]);
    expect(Array.from(r.points.topTvdFt)).toEqual([8010, 8060]);
    expect(Array.from(r.points.baseTvdFt)).toEqual([8029.5, 8099.5]);
    expect(Array.from(r.points.sampleCount)).toEqual([40, 80]);
    expect(Array.from(r.points.grApi)).toEqual([110, 110]);
    // Hand: DT median of bed 1 skipping the NaN at 30: 39 values 102..105.9 → middle (i = 40) 104.0.
    expect(r.points.values.DT[0]).toBeCloseTo(104.0, 12);
    // Hand: bed 2, DT 112..119.9 over 80 samples → mean of the middle two (i = 159, 160) = 115.95.
    expect(r.points.values.DT[1]).toBeCloseTo(115.95, 12);
    expect(r.warnings).toEqual([]);
    expect(gr).toEqual(grCopy);
  });

  it("keeps the spike and the stringer when despiking is off and no thickness limit is set", () => {
    const r = pickShalePoints({ tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, despike: "off", decimation: { kind: "bedMedian" } });
    expect(r.isShale[100]).toBe(1);
    expect(Array.from(r.points.sampleCount)).toEqual([40, 6, 1, 80]);
  });

  it("drops a bed exactly at the limit only when the limit is 1% larger", () => {
    // Bed 20..59 is 40 samples × 0.5 ft = 20 ft between neighbour midpoints.
    const keep = pickShalePoints({ tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, minBedThicknessFt: 20 });
    const drop = pickShalePoints({ tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, minBedThicknessFt: 20.2 });
    expect(keep.isShale[40]).toBe(1);
    expect(drop.isShale[40]).toBe(0);
  });

  it("applies exclude and include masks (exclusion wins)", () => {
    const r = pickShalePoints({
      tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, minBedThicknessFt: 5,
      masks: [
        { topTvdFt: 8070, baseTvdFt: 8080, action: "exclude" },
        { topTvdFt: 8002, baseTvdFt: 8003, action: "include" },
        { topTvdFt: 8075, baseTvdFt: 8076, action: "include" },
      ],
    });
    // Include 8002–8003 → samples 4..6; exclude 8070–8080 → samples 140..160 (8075–8076 stays out).
    expect(Array.from(r.points.sampleCount)).toEqual([3, 40, 20, 39]);
    expect(r.isShale[150]).toBe(0);
    expect(r.isShale[5]).toBe(1);
  });

  it("decimates by TVD window", () => {
    const r = pickShalePoints({ tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, minBedThicknessFt: 5, decimation: { kind: "window", windowFt: 25 } });
    // Windows [8000, 8025): 20..49; [8025, 8050): 50..59; [8050, 8075): 120..149; [8075, 8100): 150..199.
    expect(Array.from(r.points.sampleCount)).toEqual([30, 10, 30, 50]);
    expect(Array.from(r.points.index)).toEqual([34, 54, 134, 174]);
  });

  it("uses a Vshale threshold: Larionov tertiary is stricter than linear at GR 90", () => {
    const g = new Float64Array([40, 90, 110]);
    const z = new Float64Array([9000, 9000.5, 9001]);
    const base = { tvdFt: z, grApi: g, despike: "off" as const, decimation: { kind: "none" as const } };
    const lin = pickShalePoints({ ...base, criterion: { kind: "vshale", grSandApi: 40, grShaleApi: 110, model: "linear", vshaleCutoff: 0.5 } });
    const ter = pickShalePoints({ ...base, criterion: { kind: "vshale", grSandApi: 40, grShaleApi: 110, model: "larionovTertiary", vshaleCutoff: 0.5 } });
    // Hand: IGR(90) = 50/70 = 0.714 → linear 0.714 ≥ 0.5; tertiary 0.083(2^2.643 − 1) = 0.435 < 0.5.
    expect(Array.from(lin.isShale)).toEqual([0, 1, 1]);
    expect(Array.from(ter.isShale)).toEqual([0, 0, 1]);
  });

  it("reproduces its doc-comment example", () => {
    const r = pickShalePoints({ tvdFt: new Float64Array([1000, 1001, 1002, 1003]), grApi: new Float64Array([40, 110, 115, 112]),
      criterion: { kind: "grCutoff", cutoffApi: 90 }, despike: "off" });
    expect(Array.from(r.points.index)).toEqual([2]); // bed of samples 1..3 → middle sample 2 (hand)
    expect(r.points.grApi[0]).toBe(112); // median of 110, 115, 112 (hand)
  });

  it("warns when nothing is shale and never calls NaN GR shale", () => {
    const r = pickShalePoints({ tvdFt: new Float64Array([1, 2]), grApi: new Float64Array([NaN, 20]), criterion: { kind: "grCutoff", cutoffApi: 90 } });
    expect(r.points.index.length).toBe(0);
    expect(r.warnings[0].code).toBe("W_NO_SHALE");
  });

  it("throws typed errors", () => {
    const code = (f: () => unknown): string => { try { f(); return "none"; } catch (e) { return (e as ShalepointError).code; } };
    expect(code(() => pickShalePoints({ tvdFt: new Float64Array([2, 1]), grApi: new Float64Array(2), criterion: { kind: "grCutoff", cutoffApi: 90 } }))).toBe("E_NOT_SORTED");
    expect(code(() => pickShalePoints({ tvdFt: tvd, grApi: gr, criterion: { kind: "grCutoff", cutoffApi: 90 }, masks: [{ topTvdFt: 2, baseTvdFt: 1, action: "exclude" }] }))).toBe("E_RANGE");
    expect(code(() => pickShalePoints({ tvdFt: tvd, grApi: new Float64Array(3), criterion: { kind: "grCutoff", cutoffApi: 90 } }))).toBe("E_LENGTH");
  });
});
