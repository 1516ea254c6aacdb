import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { existsSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { startTrendPicker, PICKER_MAX_BODY_BYTES, type TrendPickerHandle } from "../../src/picker/server.js";
import { parsePickerArgs, runPickerCommand } from "../../src/picker/runPickerCommand.js";
import { parseTrendFile, serializeTrendFile } from "../../src/io/trendFile.js";
import { SAFETY_CAUTION_TEXT } from "../../src/present/caution.js";
import type { PickerWellData } from "../../src/picker/pickerModel.js";
import { ShalepointError } from "../../src/errors.js";
import { copyDemoWell, rawRequest, removeDemoWellCopies } from "./pickerHttp.js";

// Trend through 150 µs/ft at 2000 ft and 100 µs/ft at 10,000 ft below mudline (CHECK-VALUES §2 own case).
const SLOPE = Math.log10(100 / 150) / 8000;
const GOOD_TREND_DOC = {
  format: "shalepoint-trend",
  version: 1,
  kind: "sonicLogLinear",
  segments: [{ topBmlFt: 0, params: { dtMudlineUsPerFt: 150 * 10 ** (-SLOPE * 2000), log10SlopePerFt: SLOPE }, fittedOn: null }],
};

let picker: TrendPickerHandle;
let wellDir: string;
let parent: string;
let json: Record<string, string>;

beforeAll(async () => {
  ({ wellDir, parent } = copyDemoWell("quillon-a1"));
  picker = await startTrendPicker({ wellDir, host: "127.0.0.1", port: 0, clientBundle: "/* test bundle */" });
  json = { "content-type": "application/json", origin: picker.origin };
});
afterAll(async () => {
  await picker?.close();
  removeDemoWellCopies();
});

const withToken = (path: string): string => `${path}${path.includes("?") ? "&" : "?"}token=${picker.token}`;
const wellFiles = (): string[] => readdirSync(wellDir).sort();

describe("startTrendPicker", () => {
  it("binds to 127.0.0.1 on a random port and gives a token URL", () => {
    expect(picker.origin).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(picker.url).toBe(`${picker.origin}/?token=${picker.token}`);
    expect(picker.token.length).toBeGreaterThanOrEqual(32); // 24 random bytes, base64url
    expect(picker.savePaths.sonic).toBe(join(picker.savePaths.sonic, "..", "quillon-a1.sonic-trend.json"));
  });

  it("refuses a missing or wrong token with 403 on every route", async () => {
    for (const path of ["/", "/data"]) {
      const none = await rawRequest(picker.origin, path);
      expect(none.status).toBe(403);
      expect(none.json().error?.code).toBe("E_PICKER_TOKEN");
    }
    const wrong = "x".repeat(picker.token.length);
    const r = await rawRequest(picker.origin, `/data?token=${wrong}`);
    expect(r.status).toBe(403);
    const save = await rawRequest(picker.origin, `/save?token=${wrong}`, { method: "POST", headers: json, body: JSON.stringify(GOOD_TREND_DOC) });
    expect(save.status).toBe(403);
    expect(existsSync(picker.savePaths.sonic)).toBe(false);
  });

  it("refuses other origins and other Host names with 403", async () => {
    const r = await rawRequest(picker.origin, withToken("/data"), { headers: { origin: "http://example.invalid" } });
    expect(r.status).toBe(403);
    expect(r.json().error?.code).toBe("E_PICKER_ORIGIN");
    const host = await rawRequest(picker.origin, withToken("/data"), { headers: { host: "attacker.invalid" } });
    expect(host.status).toBe(403);
    expect(host.json().error?.code).toBe("E_PICKER_HOST");
    const noOrigin = await rawRequest(picker.origin, withToken("/save"), {
      method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(GOOD_TREND_DOC),
    });
    expect(noOrigin.status).toBe(403);
  });

  it("serves one offline page with the caution, a strict CSP and the readout element", async () => {
    const r = await rawRequest(picker.origin, withToken("/"));
    expect(r.status).toBe(200);
    expect(r.text).toContain('id="pp-readout"');
    expect(r.text).toContain("/* test bundle */");
    expect(r.text).toContain("calibrate to measured data and review");
    expect(r.text).not.toMatch(/(src|href)=["']?https?:/i); // nothing loaded from outside (works offline)
    expect(String(r.headers["content-security-policy"])).toContain("default-src 'none'");
  });

  it("GET /data gives shale points with depth below mudline and hydrostatic from HYDG", async () => {
    const r = await rawRequest(picker.origin, withToken("/data"));
    expect(r.status).toBe(200);
    const data = JSON.parse(r.text) as PickerWellData;
    expect(data.wellName).toBe("Quillon A-1");
    expect(data.caution).toContain(SAFETY_CAUTION_TEXT);
    // Mudline = air gap 82 ft + water depth 4000 ft (demo-logs/README.md; depth definitions, no source needed)
    expect(data.mudlineTvdFt).toBe(4082);
    expect(data.points.tvdFt.length).toBeGreaterThan(100);
    for (let k = 0; k < data.points.tvdFt.length; k += 37) {
      expect(data.points.bmlFt[k]).toBeCloseTo(data.points.tvdFt[k] - 4082, 9);
      // Hydrostatic from sea level, P = 0.445 psi/ft × (TVD − 82 ft): HYDG of the file; Zoback 2007 ch. 1 (published)
      expect(data.points.phPsi[k]).toBeCloseTo(0.445 * (data.points.tvdFt[k] - 82), 6);
      // Sv = seawater column + sediment column (Zoback 2007 eq. 1.6, published; 0.43353 psi/ft per g/cc, CHECK-VALUES §0):
      // 1.03 g/cc over 4000 ft of water, then a mean sediment density between 1.5 and 2.7 g/cc (common practice, no source)
      const water = 0.43353 * 1.03 * 4000;
      const bml = data.points.bmlFt[k];
      expect(data.points.svPsi[k]).toBeGreaterThan(water + 0.43353 * 1.5 * bml);
      expect(data.points.svPsi[k]).toBeLessThan(water + 0.43353 * 2.7 * bml);
    }
    expect(data.trend.kind).toBe("sonicLogLinear");
    expect(data.saveFileNames.sonic).toBe("quillon-a1.sonic-trend.json");
  });

  it("POST /save writes the validated trend to the fixed file in the well folder only", async () => {
    const before = new Set(readdirSync(parent));
    const r = await rawRequest(picker.origin, withToken("/save"), { method: "POST", headers: json, body: JSON.stringify(GOOD_TREND_DOC) });
    expect(r.status).toBe(200);
    expect(r.json().file).toBe("quillon-a1.sonic-trend.json");
    const text = readFileSync(picker.savePaths.sonic, "utf8");
    const trend = parseTrendFile(text);
    expect(trend.segments[0].params).toEqual(GOOD_TREND_DOC.segments[0].params);
    expect(text).toContain("licensed practice govern");
    expect(wellFiles()).toEqual(["quillon-a1.las", "quillon-a1.sonic-trend.json"]); // no temp file left behind
    expect(new Set(readdirSync(parent))).toEqual(before);
  });

  it("a malformed trend gets 400 with the zod key path, and the saved file is not overwritten", async () => {
    const saved = readFileSync(picker.savePaths.sonic, "utf8");
    const bad = structuredClone(GOOD_TREND_DOC) as unknown as { segments: { params: Record<string, unknown> }[] };
    bad.segments[0].params.log10SlopePerFt = "steep";
    const r = await rawRequest(picker.origin, withToken("/save"), { method: "POST", headers: json, body: JSON.stringify(bad) });
    expect(r.status).toBe(400);
    expect(r.json().error?.code).toBe("E_TREND_FILE");
    expect(r.json().error?.message).toContain("segments[0].params.log10SlopePerFt");
    const notJson = await rawRequest(picker.origin, withToken("/save"), { method: "POST", headers: json, body: "{ not json" });
    expect(notJson.status).toBe(400);
    expect(notJson.json().error?.code).toBe("E_TREND_FILE_JSON");
    expect(readFileSync(picker.savePaths.sonic, "utf8")).toBe(saved);
    expect(wellFiles()).toEqual(["quillon-a1.las", "quillon-a1.sonic-trend.json"]);
  });

  it("refuses a request to save anywhere else, and nothing is written outside the well folder", async () => {
    const saved = readFileSync(picker.savePaths.sonic, "utf8");
    const before = readdirSync(parent).sort();
    const inBody = await rawRequest(picker.origin, withToken("/save"), {
      method: "POST", headers: json, body: JSON.stringify({ ...GOOD_TREND_DOC, path: "../escaped.json" }),
    });
    expect(inBody.status).toBe(400);
    expect(inBody.json().error?.code).toBe("E_PICKER_SAVE_PATH");
    expect(inBody.json().error?.message).toContain("save location is fixed");
    const inQuery = await rawRequest(picker.origin, withToken("/save?file=..%2Fescaped.json"), {
      method: "POST", headers: json, body: JSON.stringify(GOOD_TREND_DOC),
    });
    expect(inQuery.status).toBe(400);
    expect(inQuery.json().error?.code).toBe("E_PICKER_SAVE_PATH");
    const traversal = await rawRequest(picker.origin, withToken("/save/..%2F..%2Fescaped.json"), {
      method: "POST", headers: json, body: JSON.stringify(GOOD_TREND_DOC),
    });
    expect(traversal.status).toBe(404);
    expect(readdirSync(parent).sort()).toEqual(before);
    expect(readFileSync(picker.savePaths.sonic, "utf8")).toBe(saved);
  });

  it("refuses a body over the size limit with 413 and writes nothing", async () => {
    const saved = readFileSync(picker.savePaths.sonic, "utf8");
    const big = JSON.stringify({ ...GOOD_TREND_DOC, caution: "x".repeat(PICKER_MAX_BODY_BYTES + 10) });
    const r = await rawRequest(picker.origin, withToken("/save"), { method: "POST", headers: json, body: big });
    expect([413, -1]).toContain(r.status); // 413, or the connection closed by the server after refusing
    if (r.status === 413) expect(r.json().error?.code).toBe("E_PICKER_TOO_LARGE");
    expect(readFileSync(picker.savePaths.sonic, "utf8")).toBe(saved);
    const wrongType = await rawRequest(picker.origin, withToken("/save"), {
      method: "POST", headers: { origin: picker.origin, "content-type": "text/plain" }, body: JSON.stringify(GOOD_TREND_DOC),
    });
    expect(wrongType.status).toBe(415);
  });
});

describe("startTrendPicker on bad input", () => {
  const errorOf = async (f: () => Promise<unknown>): Promise<ShalepointError> => {
    try {
      await f();
    } catch (e) {
      if (e instanceof ShalepointError) return e;
      throw e;
    }
    throw new Error("expected a ShalepointError");
  };

  it("a malformed trend file is refused with its name and key path, and is left as it was", async () => {
    const { wellDir: dir } = copyDemoWell("quillon-a1");
    const trendPath = join(dir, "quillon-a1.sonic-trend.json");
    const badText = JSON.stringify({ ...GOOD_TREND_DOC, segments: [{ topBmlFt: 0, params: { dtMudlineUsPerFt: -5, log10SlopePerFt: 0 }, fittedOn: null }] });
    writeFileSync(trendPath, badText);
    const e = await errorOf(() => startTrendPicker({ wellDir: dir, clientBundle: "" }));
    expect(e.code).toBe("E_TREND_FILE");
    expect(e.message).toContain("quillon-a1.sonic-trend.json");
    expect(e.message).toContain("segments[0].params.dtMudlineUsPerFt");
    expect(readFileSync(trendPath, "utf8")).toBe(badText);
  });

  it("no shale points in the chosen interval gives a clear error naming how many were found", async () => {
    const { wellDir: dir } = copyDemoWell("quillon-a1");
    const e = await errorOf(() => startTrendPicker({ wellDir: dir, clientBundle: "", intervalsBmlFt: [{ topBmlFt: 3000.1, baseBmlFt: 3000.2 }] }));
    expect(e.code).toBe("E_TREND_TOO_FEW_POINTS");
    expect(e.message).toMatch(/needs at least 3 shale points, found [01]/);
    const none = await errorOf(() => startTrendPicker({ wellDir: dir, clientBundle: "", shaleGrCutoffApi: 500 }));
    expect(none.code).toBe("E_PICKER_NO_SHALE");
    expect(readdirSync(dir)).toEqual(["quillon-a1.las"]);
  });

  it("refuses a non-loopback host", async () => {
    const e = await errorOf(() => startTrendPicker({ wellDir: "unused", host: "0.0.0.0" }));
    expect(e.code).toBe("E_PICKER_HOST");
  });

  it("a saved trend file is what the page shows next time", async () => {
    const { wellDir: dir } = copyDemoWell("quillon-a1");
    const trend = parseTrendFile(JSON.stringify(GOOD_TREND_DOC));
    writeFileSync(join(dir, "quillon-a1.sonic-trend.json"), serializeTrendFile(trend));
    const p = await startTrendPicker({ wellDir: dir, clientBundle: "" });
    try {
      const data = JSON.parse((await rawRequest(p.origin, `/data?token=${p.token}`)).text) as PickerWellData;
      expect(data.trend).toEqual(trend);
      expect(data.trendSource).toBe("quillon-a1.sonic-trend.json");
    } finally {
      await p.close();
    }
  });
});

describe("runPickerCommand", () => {
  it("prints the URL with its token and the safety caution", async () => {
    const { wellDir: dir } = copyDemoWell("quillon-a1");
    const lines: string[] = [];
    const p = await runPickerCommand(["--well-dir", dir], { out: (l) => lines.push(l) });
    try {
      expect(lines.join("\n")).toContain(p.url);
      expect(p.url).toContain(`token=${p.token}`);
      expect(lines).toContain(SAFETY_CAUTION_TEXT);
    } finally {
      await p.close();
    }
  });

  it("parsePickerArgs refuses unknown options and a missing well", () => {
    expect(parsePickerArgs(["--las", "a.las", "--port", "0"])).toEqual({ lasPath: "a.las", port: 0 });
    expect(() => parsePickerArgs(["--output", "x"])).toThrow(/unknown option --output/);
    expect(() => parsePickerArgs([])).toThrow(/--well-dir/);
    expect(() => parsePickerArgs(["--port", "99999", "--las", "a.las"])).toThrow(/--port/);
  });
});
