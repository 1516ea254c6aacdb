/**
 * Trend files: round trip, and malformed files rejected with the key path named
 * (behaviour pinned here; the format is shalepoint's own, see src/io/trendFile.ts).
 */
import { describe, expect, it } from "vitest";
import { parseTrendFile, safeParseTrendFile, serializeTrendFile, TREND_FILE_FORMAT } from "../../src/io/trendFile.js";
import { evaluateCompactionTrend, fitCompactionTrendSegments, type CompactionTrend } from "../../src/trend/index.js";

const HAND: CompactionTrend = Object.freeze({
  kind: "sonicExponential",
  segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null }],
}) as CompactionTrend;

describe("serializeTrendFile / parseTrendFile", () => {
  it("round-trips a hand-entered trend and it still gives 95.12 µs/ft at 5000 ft (CHECK-VALUES §2, own case)", () => {
    const text = serializeTrendFile(HAND);
    const back = parseTrendFile(text, "a1-sonic.trend.json");
    expect(back).toEqual(HAND);
    expect(JSON.parse(text)).toMatchObject({ format: TREND_FILE_FORMAT, version: 1 });
    expect(JSON.parse(text).caution).toMatch(/calibrate to measured data/);
    expect(Math.abs(evaluateCompactionTrend({ trend: back, bmlFt: [5000] })[0] - 95.12)).toBeLessThan(0.005);
  });

  it("round-trips a fitted two-segment trend with its fit record, bit for bit", () => {
    const z: number[] = [];
    const r: number[] = [];
    for (let Z = 200; Z <= 8000; Z += 100) {
      z.push(Z);
      r.push(Z < 4000 ? 0.8 * Math.exp(1e-4 * Z) * (1 + 0.01 * Math.sin(Z)) : 1.1 * Math.exp(0.8e-4 * Z) * (1 + 0.01 * Math.cos(Z)));
    }
    const { trend } = fitCompactionTrendSegments({
      kind: "resistivityLogLinear",
      bmlFt: z,
      values: r,
      method: "huber",
      segments: [
        { topBmlFt: 0, intervals: [{ topBmlFt: 200, baseBmlFt: 3900 }] },
        { topBmlFt: 4000, intervals: [{ topBmlFt: 4000, baseBmlFt: 8000 }] },
      ],
    });
    const back = parseTrendFile(serializeTrendFile(trend));
    expect(back).toEqual(trend);
    expect(back.segments[1].fittedOn?.method).toBe("huber");
  });

  it("names the key path of a bad parameter", () => {
    const bad = JSON.parse(serializeTrendFile(HAND));
    bad.segments[0].params.decayPerFt = -1e-4;
    expect(() => parseTrendFile(JSON.stringify(bad), "bad.json")).toThrow(
      expect.objectContaining({ code: "E_TREND_FILE", details: expect.objectContaining({ param: "segments[0].params.decayPerFt", file: "bad.json", value: -1e-4 }) }),
    );
    expect(() => parseTrendFile(JSON.stringify(bad), "bad.json")).toThrow(/bad\.json: invalid trend file: segments\[0\]\.params\.decayPerFt/);
  });

  it("refuses a misspelt parameter, a missing one, an unknown kind, a newer version and unordered segments", () => {
    const good = JSON.parse(serializeTrendFile(HAND));
    const typo = structuredClone(good);
    typo.segments[0].params.decay = 3e-4;
    delete typo.segments[0].params.decayPerFt;
    const r1 = safeParseTrendFile(JSON.stringify(typo));
    expect(r1.ok).toBe(false);
    if (!r1.ok) expect(r1.error.message).toMatch(/segments\[0\]\.params/);

    const kind = { ...good, kind: "sonicLinear" };
    expect(() => parseTrendFile(JSON.stringify(kind))).toThrow(expect.objectContaining({ details: expect.objectContaining({ param: "kind" }) }));

    const newer = { ...good, version: 2 };
    expect(() => parseTrendFile(JSON.stringify(newer))).toThrow(expect.objectContaining({ details: expect.objectContaining({ param: "version" }) }));

    const twoSegs = structuredClone(good);
    twoSegs.segments.push({ ...twoSegs.segments[0], topBmlFt: 0 });
    expect(() => parseTrendFile(JSON.stringify(twoSegs))).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ param: "segments[1].topBmlFt" }) }),
    );

    const below = structuredClone(good);
    below.segments[0].params.dtMudlineUsPerFt = 60;
    expect(() => parseTrendFile(JSON.stringify(below))).toThrow(
      expect.objectContaining({ details: expect.objectContaining({ param: "segments[0].params.dtMudlineUsPerFt" }) }),
    );
  });

  it("reports broken JSON with the line", () => {
    const text = '{\n  "format": "shalepoint-trend",\n  "version": 1,,\n}';
    expect(() => parseTrendFile(text, "broken.json")).toThrow(expect.objectContaining({ code: "E_TREND_FILE_JSON", details: expect.objectContaining({ line: 3 }) }));
  });

  it("will not write a trend holding NaN", () => {
    const nan = { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: NaN, growthPerFt: 1e-4 }, fittedOn: null }] } as CompactionTrend;
    expect(() => serializeTrendFile(nan)).toThrow(expect.objectContaining({ details: expect.objectContaining({ param: "segments[0].params.r0OhmM" }) }));
  });
});
