/**
 * Table records, HTML tables, notebook display HTML and the safety caution.
 * Summary statistics are checked on small invented Quillon samples against hand
 * arithmetic (own case); HTML escaping against the HTML Living Standard's character
 * references (published).
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import {
  wellHeaderRecords,
  curveSummaryRecords,
  lasSectionRecords,
  recordsToHtmlTable,
  formatTableNumber,
  figureHtml,
  plotlyBundleHtml,
  plotlyBundlePath,
  logTrackFigure,
  SAFETY_CAUTION_TEXT,
  safetyCautionHtml,
} from "../../src/present/index.js";
import { ShalepointError } from "../../src/errors.js";
import type { Well } from "../../src/well/types.js";
import type { LasFile } from "../../src/io/lasTypes.js";

const well: Well = Object.freeze({
  name: 'Quillon A-1 <"demo">',
  datums: Object.freeze({ rtElevationFt: 82, waterDepthFt: 3950, seawaterDensityGcc: 1.03 }),
  mdFt: new Float64Array([4100, 4100.5, 4101, 4101.5, 4102]),
  tvdFt: new Float64Array([4100, 4100.5, 4101, 4101.5, 4102]),
  curves: Object.freeze({
    gammaRay: { mnemonic: "GR", unit: "API" as const, description: "Gamma ray", values: new Float64Array([NaN, 80, 100, 90, NaN]) },
    density: { mnemonic: "RHOB", unit: "g/cc" as const, description: "Bulk density", values: new Float64Array([NaN, NaN, NaN, NaN, NaN]) },
  }),
  header: Object.freeze({ FLD: "Quillon Basin", "Hydrostatic gradient": "0.452 psi/ft" }),
}) as Well;

describe("curveSummaryRecords", () => {
  it("counts missing samples and summarises the present ones", () => {
    const [gr, rhob] = curveSummaryRecords(well);
    // own case, hand arithmetic: present 80, 100, 90 → mean 90, min 80, max 100
    expect(gr).toEqual({
      curve: "gammaRay", mnemonic: "GR", unit: "API", description: "Gamma ray",
      samples: 3, missing: 2, minimum: 80, maximum: 100, mean: 90, topMdFt: 4100.5, baseMdFt: 4101.5,
    });
    expect(rhob.samples).toBe(0);
    expect(rhob.missing).toBe(5);
    expect(Number.isNaN(rhob.mean) && Number.isNaN(rhob.topMdFt)).toBe(true);
    expect(Number.isNaN(well.curves.gammaRay.values[0])).toBe(true); // input untouched
  });

  it("throws E_LENGTH_MISMATCH for a curve off the depth index", () => {
    const bad = { ...well, curves: { gr: { mnemonic: "GR", unit: "API" as const, description: "", values: new Float64Array(2) } } };
    expect(() => curveSummaryRecords(bad)).toThrow(ShalepointError);
  });
});

describe("wellHeaderRecords", () => {
  it("lists name, datums, depth range, counts, then the file's header facts", () => {
    const rows = wellHeaderRecords(well);
    expect(rows[0]).toEqual({ item: "Well", value: 'Quillon A-1 <"demo">', unit: "" });
    expect(rows.find((r) => r.item === "Water depth")).toEqual({ item: "Water depth", value: 3950, unit: "ft" });
    expect(rows.find((r) => r.item === "Base of log, MD")?.value).toBe(4102);
    expect(rows.find((r) => r.item === "Samples")?.value).toBe(5);
    expect(rows.slice(-2)).toEqual([
      { item: "FLD", value: "Quillon Basin", unit: "" },
      { item: "Hydrostatic gradient", value: "0.452 psi/ft", unit: "" },
    ]);
  });
});

describe("lasSectionRecords", () => {
  it("returns a header section's items as rows, in file order", () => {
    const las: LasFile = {
      version: [{ mnemonic: "VERS", unit: "", value: "2.0", description: "CWLS LOG ASCII STANDARD - VERSION 2.0" }],
      well: [
        { mnemonic: "STRT", unit: "F", value: "4100.0", description: "START DEPTH", line: 5 },
        { mnemonic: "WELL", unit: "", value: "QUILLON A-1", description: "WELL", line: 9 },
      ],
      curves: [], parameters: [], other: "", data: [], wrap: false, nullValue: -999.25,
    };
    expect(lasSectionRecords({ las, section: "well" })).toEqual([
      { mnemonic: "STRT", unit: "F", value: "4100.0", description: "START DEPTH" },
      { mnemonic: "WELL", unit: "", value: "QUILLON A-1", description: "WELL" },
    ]);
  });
});

describe("formatTableNumber", () => {
  it("keeps integers, rounds others to significant digits, dashes missing values", () => {
    expect(formatTableNumber(4102)).toBe("4102");
    expect(formatTableNumber(2.34567)).toBe("2.346");
    expect(formatTableNumber(0.4652, 3)).toBe("0.465");
    expect(formatTableNumber(NaN)).toBe("—");
    expect(formatTableNumber(1.5e-7)).toBe("1.500e-7");
  });
});

describe("recordsToHtmlTable", () => {
  it("escapes headers and cells and right-aligns numbers", () => {
    const html = recordsToHtmlTable({ records: [{ a: 1, "<b>": "<x>" }, { a: NaN, c: "O'K" }], caption: "A&B" });
    expect(html).toBe(
      '<table class="shalepoint-table"><caption>A&amp;B</caption>' +
        "<thead><tr><th>a</th><th>&lt;b&gt;</th><th>c</th></tr></thead><tbody>" +
        '<tr><td style="text-align:right">1</td><td>&lt;x&gt;</td><td></td></tr>' +
        '<tr><td style="text-align:right">—</td><td></td><td>O&#39;K</td></tr></tbody></table>',
    );
  });

  it("shows a hostile well name as text", () => {
    const html = recordsToHtmlTable({ records: wellHeaderRecords({ ...well, name: "</td><script>alert(1)</script>" }) });
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;/td&gt;&lt;script&gt;alert(1)&lt;/script&gt;");
  });
});

describe("figureHtml", () => {
  const fig = logTrackFigure({
    title: "</script><script>alert(1)</script>",
    depthFt: [100, 200],
    depthReference: "MD",
    curves: { gammaRayApi: [50, 60] },
  });

  it("writes one div and one newPlot call whose JSON round-trips the spec", () => {
    const html = figureHtml(fig, { divId: "fig-a1" });
    expect(html.startsWith('<div id="fig-a1" class="shalepoint-figure" style="width:100%;height:800px"></div><script')).toBe(true);
    expect(html.match(/<\/script/g)).toHaveLength(1);
    expect(html.endsWith("</script>")).toBe(true);
    // Run the script against a stub page and capture what plotly would receive.
    const script = /<script type="text\/javascript">([\s\S]*)<\/script>$/.exec(html)![1];
    const calls: unknown[][] = [];
    const el = { id: "fig-a1", textContent: "" };
    const document = { getElementById: (id: string) => (id === "fig-a1" ? el : null) };
    const window = { Plotly: { newPlot: (...args: unknown[]) => calls.push(args) } };
    new Function("window", "document", script)(window, document);
    expect(calls).toHaveLength(1);
    expect(calls[0][0]).toBe(el);
    expect(calls[0].slice(1)).toEqual([fig.data, fig.layout, fig.config]);
    // without plotly loaded, the div says so instead of failing silently
    new Function("window", "document", script)({}, document);
    expect(el.textContent).toMatch(/plotly\.js is not loaded/);
  });

  it("gives distinct ids by default and rejects unsafe ids", () => {
    const a = /id="([^"]+)"/.exec(figureHtml(fig))![1];
    const b = /id="([^"]+)"/.exec(figureHtml(fig))![1];
    expect(a).toMatch(/^sp-fig-/);
    expect(a).not.toBe(b);
    expect(() => figureHtml(fig, { divId: 'x" onload="alert(1)' })).toThrow(ShalepointError);
  });
});

describe("plotlyBundleHtml", () => {
  it("inlines the installed plotly.js-dist bundle in one script element", () => {
    const html = plotlyBundleHtml();
    const req = createRequire(import.meta.url);
    const version = JSON.parse(readFileSync(req.resolve("plotly.js-dist/package.json"), "utf8")).version as string;
    expect(plotlyBundlePath()).toBe(req.resolve("plotly.js-dist"));
    expect(html.startsWith('<script type="text/javascript">')).toBe(true);
    expect(html.match(/<\/script/gi)).toHaveLength(1);
    expect(html).toContain(`plotly.js v${version}`);
    expect(html).toContain("window.Plotly = Plotly");
  });
});

describe("SAFETY_CAUTION_TEXT / safetyCautionHtml", () => {
  it("says estimate, calibrate, review and who governs", () => {
    // Project rule (common practice, no source): every user-facing output carries this caution.
    for (const phrase of ["estimates for trained engineers", "Calibrate", "measured data", "reviewed", "local regulations", "licensed engineering practice govern"]) {
      expect(SAFETY_CAUTION_TEXT).toContain(phrase);
    }
    expect(safetyCautionHtml()).toContain("shalepoint&#39;s results are estimates");
  });
});
