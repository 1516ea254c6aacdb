import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { mkdirSync, readFileSync, writeFileSync, existsSync, rmSync } from "node:fs";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { chromium, type Browser, type Page } from "playwright-core";
import { renderStudyReport } from "../../../src/present/report/renderStudyReport.js";
import { wellPressureFigure, strideSampleIndices } from "../../../src/present/report/reportFigures.js";
import { formatReportNumber, reportNumberCell, reportTextCell, rawNumberText } from "../../../src/present/report/formatReportNumber.js";
import { nearestDepthSampleIndex, countWarningsByCode } from "../../../src/present/report/reportSections.js";
import { plotlyBundleHtml } from "../../../src/present/notebookDisplay.js";
import { renderChartPng } from "../../../src/present/report/renderChartPng.js";
import type { StudyReportInput } from "../../../src/present/report/reportTypes.js";
import { buildDemoStudy, HOSTILE_WELL_NAME } from "./reportFixture.js";

const OUT_DIR = resolve("test-output");
const REPORT_PATH = resolve(OUT_DIR, "report.html");
const CHROMIUM_ARGS = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"];
/** psi/ft per ppg: 12/231 exactly (1 US gal = 231 in³, legal definition) — CHECK-VALUES §0, published. */
const PSI_PER_FT_PER_PPG = 12 / 231;

let study: StudyReportInput;
let html: string;
let browser: Browser;
let page: Page;
const outsideRequests: string[] = [];
const pageErrors: string[] = [];
let ppBefore: Float64Array;

beforeAll(async () => {
  study = buildDemoStudy();
  ppBefore = Float64Array.from(study.wells[0].prediction.ppPsi);
  Object.freeze(study);
  Object.freeze(study.wells);
  for (const w of study.wells) {
    Object.freeze(w);
    Object.freeze(w.tables);
    Object.freeze(w.well.header);
    for (const t of w.tables.pressureTests ?? []) Object.freeze(t);
    for (const s of w.stressWindow.casing?.sections ?? []) Object.freeze(s);
  }
  html = renderStudyReport(study);
  mkdirSync(OUT_DIR, { recursive: true });
  writeFileSync(REPORT_PATH, html, "utf8");
  browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: CHROMIUM_ARGS });
  page = await browser.newPage({ viewport: { width: 1280, height: 1000 } });
  const reportUrl = pathToFileURL(REPORT_PATH).href;
  await page.route("**/*", (route) => {
    const url = route.request().url();
    if (url !== reportUrl) {
      outsideRequests.push(url);
      return route.abort();
    }
    return route.continue();
  });
  page.on("pageerror", (e) => pageErrors.push(e.message));
  page.on("console", (m) => {
    if (m.type() === "error") pageErrors.push(m.text());
  });
  await page.goto(reportUrl, { waitUntil: "load" });
  await page.waitForSelector("#well-1-pressure-chart .main-svg", { timeout: 30_000 });
  await page.waitForSelector("#offset-chart .main-svg", { timeout: 30_000 });
}, 180_000);

afterAll(async () => {
  await browser?.close();
});

/** data-value of every cell with this data-key in a table, as numbers. */
async function columnValues(selector: string, key: string): Promise<number[]> {
  const raw = await page.locator(`${selector} td[data-key="${key}"]`).evaluateAll((cells) => cells.map((c) => c.getAttribute("data-value") ?? ""));
  return raw.map(Number);
}

/** data-value of the cells a selector finds, as numbers. */
async function columnValuesAt(selector: string): Promise<number[]> {
  return (await page.locator(selector).evaluateAll((cells) => cells.map((c) => c.getAttribute("data-value") ?? ""))).map(Number);
}

describe("renderStudyReport", () => {
  it("opens offline: no request leaves the file, no script error, plotly inlined once", () => {
    expect(outsideRequests).toEqual([]);
    expect(pageErrors).toEqual([]);
    // One inlined bundle: plotly's own banner comment appears once in the file.
    expect(html.split("plotly.js v").length - 1).toBe(1);
    expect(html).not.toMatch(/<script[^>]+src=/i);
    // Outside the inlined bundle (whose code mentions URLs it never fetches here), the report names no URL.
    expect(html.replace(plotlyBundleHtml(), "")).not.toMatch(/https?:|\/\/[a-z]/i);
  });

  it("draws the pressure–depth chart with every trace, titled, EMW axis, depth down", async () => {
    const fig = wellPressureFigure(study.wells[0], 800);
    const drawn = await page.evaluate(() => {
      const el = document.getElementById("well-1-pressure-chart") as unknown as { data: { name: string }[]; layout: { yaxis: { range: number[]; title: { text: string } }; xaxis: { title: { text: string } } } };
      return {
        names: el.data.map((d) => d.name),
        svgTraces: document.querySelectorAll("#well-1-pressure-chart .scatterlayer .trace").length,
        xTitle: el.layout.xaxis.title.text,
        yTitle: el.layout.yaxis.title.text,
        yRange: el.layout.yaxis.range,
        title: document.querySelector("#well-1-pressure-chart .gtitle")?.textContent ?? "",
      };
    });
    expect(drawn.names.length).toBe(fig.data.length);
    expect(drawn.svgTraces).toBe(fig.data.length);
    // Own case: the series the brief asks for are all on the chart.
    for (const part of ["Hydrostatic", "Overburden (Sv)", "Pore pressure: Eaton 1975, sonic", "Pore pressure: Bowers 1995", "Fracture pressure (Shmin)", "Mud weight used", "Pressure tests", "Leak-off / integrity tests", "Kicks (controlling EMW)", "Casing shoe (selected)"]) {
      expect(drawn.names).toContain(part);
    }
    expect(drawn.names.some((n) => n.startsWith("Pore pressure P10–P90 (100 realisations)"))).toBe(true);
    expect(drawn.xTitle).toBe("Equivalent mud weight (ppg)");
    expect(drawn.yTitle).toContain("(ft)");
    // Depth down: plotly resolves autorange "reversed" into a range from deep to shallow.
    expect(drawn.yRange[0]).toBeGreaterThan(drawn.yRange[1]);
    // The hostile name is shown as text in the chart title, too.
    expect(drawn.title).toContain("<script>");
  });

  it("pore-pressure trace of the chart equals the prediction in EMW (12/231 psi/ft per ppg)", async () => {
    const w = study.wells[0];
    const x = await page.evaluate(() => {
      const el = document.getElementById("well-1-pressure-chart") as unknown as { data: { name: string; x: (number | null)[]; y: (number | null)[] }[] };
      const t = el.data.find((d) => d.name === "Pore pressure: Eaton 1975, sonic")!;
      return { x: t.x, y: t.y };
    });
    const idx = strideSampleIndices(w.prediction.tvdFt.length, 2500);
    expect(x.x.length).toBe(idx.length);
    let checked = 0;
    idx.forEach((i, j) => {
      const z = w.prediction.tvdFt[i];
      expect(x.y[j]).toBe(z);
      const pp = w.prediction.ppPsi[i];
      if (!Number.isFinite(pp)) return expect(x.x[j]).toBeNull();
      // CHECK-VALUES §0 (published, legal gallon): EMW ppg = P / (D · 12/231); 1e-12 relative = double rounding.
      expect(x.x[j]!).toBeCloseTo(pp / (z * PSI_PER_FT_PER_PPG), 9);
      checked++;
    });
    expect(checked).toBeGreaterThan(1000);
  });

  it("calibration table carries the measured and predicted values exactly (data-value)", async () => {
    const w = study.wells[0];
    const sel = "#well-1-calibration table.calibration";
    const tvd = await columnValues(sel, "tvdFt");
    const measured = await columnValues(sel, "measuredPsi");
    const predicted = await columnValues(sel, "predictedPsi");
    const measuredPpg = await columnValues(sel, "measuredPpg");
    const diffPsi = await columnValues(sel, "differencePsi");
    // Rows: every pressure test inside the log, then every kick (own case: all A-1 tests lie inside 4900–15,000 ft).
    const tests = w.tables.pressureTests!;
    const kicks = w.tables.events!.filter((e) => e.event === "kick");
    expect(measured.length).toBe(tests.length + kicks.length);
    const z = w.prediction.tvdFt;
    tests.forEach((t, k) => {
      // Measured: the CSV value itself (demo-logs/quillon-a1/pressure-tests.csv), no rounding.
      expect(measured[k]).toBe(t.pressurePsi);
      // Nearest sample found here by a plain scan (0.5-ft index), independent of the report code.
      let best = 0;
      for (let i = 1; i < z.length; i++) if (Math.abs(z[i] - t.tvdFt) < Math.abs(z[best] - t.tvdFt)) best = i;
      expect(tvd[k]).toBe(z[best]);
      expect(predicted[k]).toBe(w.prediction.ppPsi[best]);
      expect(diffPsi[k]).toBe(w.prediction.ppPsi[best] - t.pressurePsi);
      // CHECK-VALUES §0 (published): EMW = P / (D × 12/231).
      expect(measuredPpg[k]).toBeCloseTo(t.pressurePsi / (z[best] * PSI_PER_FT_PER_PPG), 10);
    });
    kicks.forEach((e, j) => {
      // A kick's measured pressure is its controlling EMW × TVD (common practice, no source).
      expect(measured[tests.length + j]).toBeCloseTo(e.emwPsiPerFt! * e.tvdFt, 9);
    });
    // Shown text follows the one formatting rule (0 decimals for psi, thousands comma).
    const firstText = await page.locator(`${sel} td[data-key="measuredPsi"]`).first().textContent();
    expect(firstText).toBe(formatReportNumber(tests[0].pressurePsi, 0));
  });

  it("casing table equals the selected casing design; ppg = psi/ft × 231/12", async () => {
    const w = study.wells[0];
    const sections = w.stressWindow.casing!.sections;
    expect(sections.length).toBeGreaterThan(1);
    const sel = "#well-1-window table.casing";
    const top = await columnValues(sel, "topTvdFt");
    const bottom = await columnValues(sel, "bottomTvdFt");
    const mwPpg = await columnValues(sel, "mudWeightPpg");
    const mwGrad = await columnValues(sel, "mudWeightPsiPerFt");
    expect(top).toEqual(sections.map((s) => s.topTvdFt));
    expect(bottom).toEqual(sections.map((s) => s.bottomTvdFt));
    expect(mwPpg).toEqual(sections.map((s) => s.mudWeightPpg));
    // CHECK-VALUES §0 (published): 1 ppg = 12/231 psi/ft; relative 1e-12 (double rounding).
    mwGrad.forEach((g, k) => expect(mwPpg[k]).toBeCloseTo(g / PSI_PER_FT_PER_PPG, 9));
    // Shoe depths: first shoe at or below the requested first shoe (5400 ft, fixture option).
    expect(bottom[0]).toBeGreaterThanOrEqual(5400 - 0.5);
  });

  it("shows a hostile well name and header value as text; no script from them runs", async () => {
    const h2 = await page.locator("#well-1 > h2").textContent();
    expect(h2).toBe(HOSTILE_WELL_NAME);
    expect(await page.evaluate(() => (window as unknown as { __hostileRan?: number }).__hostileRan)).toBeUndefined();
    expect(await page.locator('img[src="x"]').count()).toBe(0);
    expect(await page.locator("#well-1-header").textContent()).toContain('<img src="x"');
    // Only the report's own scripts: the plotly bundle and one per figure (2 wells + offset).
    expect(await page.locator("script").count()).toBe(1 + 3);
    expect(html).not.toContain("<script>window.__hostileRan");
  });

  it("shows compartments only when given, one row per classified interval", async () => {
    const k = study.wells[0].compartments!.classification!;
    expect(await page.locator("#well-1-compartments table.intervals tbody tr").count()).toBe(k.intervals.length);
    const tops = await columnValuesAt("#well-1-compartments table.intervals tbody tr td:nth-child(3)");
    expect(tops).toEqual(k.intervals.map((x) => x.topFt));
    expect(await page.locator("#well-2-compartments").count()).toBe(0);
  });

  it("carries the safety caution at the top and the bottom", async () => {
    for (const id of ["#caution-top", "#caution-bottom"]) {
      const text = (await page.locator(id).textContent()) ?? "";
      expect(text).toContain("estimates for trained engineers");
      expect(text).toContain("measured data");
      expect(text).toContain("local regulations and licensed engineering practice govern");
    }
  });

  it("offset comparison puts each well's pore pressure against TVDSS", async () => {
    const drawn = await page.evaluate(() => {
      const el = document.getElementById("offset-chart") as unknown as { data: { name: string; y: (number | null)[] }[]; layout: { yaxis: { title: { text: string } } } };
      return { n: el.data.length, y0: el.data.map((d) => d.y[0]), title: el.layout.yaxis.title.text };
    });
    expect(drawn.n).toBe(2);
    expect(drawn.title).toContain("TVDSS");
    // TVDSS = TVD − RT elevation (well/types.ts definition); air gap 82 ft and 25 m (B-1), SCENARIO.md.
    study.wells.forEach((w, k) => expect(drawn.y0[k]).toBeCloseTo(w.prediction.tvdFt[0] - w.well.datums.rtElevationFt, 9));
    expect(study.wells[1].well.datums.rtElevationFt).toBeCloseTo(25 / 0.3048, 6);
  });

  it("lists provenance, findings counted by code, and does not mutate its input", async () => {
    expect(await page.locator("#provenance").textContent()).toContain("0".repeat(64));
    expect(await page.locator("#provenance table.inputs tbody tr").count()).toBe(10);
    const w = study.wells[0];
    const codes = new Set([...w.prediction.warnings, ...w.stressWindow.warnings, ...w.uncertainty!.warnings].map((x) => x.code));
    expect(await page.locator("#well-1-findings table.warnings tbody tr").count()).toBe(codes.size);
    for (const f of w.stressWindow.window.findings) expect(await page.locator("#well-1-findings").textContent()).toContain(f.code);
    expect(w.prediction.ppPsi).toEqual(ppBefore);
  });
});

describe("renderStudyReport, one well", () => {
  it("has no offset section, keeps both cautions, and uses a given caution text escaped", () => {
    const one = renderStudyReport(
      { title: "B-1 only <i>", wells: [study.wells[1]], provenance: study.provenance, caution: "Estimates only <u>review</u>." },
      { plotlyScriptHtml: "<script>/* plotly stub */</script>" },
    );
    expect(one).not.toContain('id="offset-wells"');
    expect(one).toContain("<title>B-1 only &lt;i&gt;</title>");
    expect(one.split("Estimates only &lt;u&gt;review&lt;/u&gt;.").length - 1).toBe(2);
    expect(one).toContain('id="caution-top"');
    expect(one).toContain('id="caution-bottom"');
  });
});

describe("formatReportNumber and reportNumberCell", () => {
  it("formats with fixed decimals and thousands commas; keeps the raw value", () => {
    // CHECK-VALUES §0 own case: 12.0 ppg at 10,000 ft → 6234 psi (exact factor 12/231).
    const psi = 12.0 * PSI_PER_FT_PER_PPG * 10000;
    expect(formatReportNumber(psi, 0)).toBe("6,234");
    expect(formatReportNumber(psi, 2)).toBe("6,233.77");
    expect(formatReportNumber(12345.678, 1)).toBe("12,345.7");
    expect(formatReportNumber(-1234567.891, 2)).toBe("-1,234,567.89");
    expect(formatReportNumber(-0.004, 2)).toBe("0.00");
    expect(formatReportNumber(NaN, 2)).toBe("–");
    expect(formatReportNumber(Infinity, 2)).toBe("–");
    expect(Number(rawNumberText(psi))).toBe(psi);
    // Doc examples (own cases).
    expect(reportNumberCell(6234.2857, 0)).toBe('<td class="num" data-value="6234.2857">6,234</td>');
    expect(reportTextCell("<b>")).toBe("<td>&lt;b&gt;</td>");
    expect(strideSampleIndices(10, 4)).toEqual([0, 3, 6, 9]);
    expect(nearestDepthSampleIndex([100, 100.5, 101], 100.7)).toBe(1);
    expect(nearestDepthSampleIndex([100, 100.5, 101], 101.3)).toBe(-1);
    expect(countWarningsByCode([{ code: "W_A", message: "", count: 5 }, { code: "W_A", message: "" }])).toEqual([{ code: "W_A", warnings: 2, samples: 6 }]);
    expect(strideSampleIndices(9, 4)).toEqual([0, 3, 6, 8]);
    expect(reportNumberCell(0.1 + 0.2, 2, 'a"b')).toBe('<td class="num" data-key="a&quot;b" data-value="0.30000000000000004">0.30</td>');
  });
});

describe("renderChartPng", () => {
  it("writes a PNG of the requested size (PNG signature and IHDR width/height)", async () => {
    const outPath = resolve(OUT_DIR, "report-chart.png");
    rmSync(outPath, { force: true });
    const fig = wellPressureFigure(study.wells[0], 900);
    const r = await renderChartPng({ figure: fig, outPath, widthPx: 900, heightPx: 1100 });
    expect(r).toEqual({ written: true });
    const png = readFileSync(outPath);
    expect(png.length).toBeGreaterThan(10_000);
    // PNG signature and IHDR layout: W3C PNG Specification (2nd ed., 2003) §5.2 and §11.2.2 (published).
    expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
    expect(png.subarray(12, 16).toString("ascii")).toBe("IHDR");
    expect(png.readUInt32BE(16)).toBe(900);
    expect(png.readUInt32BE(20)).toBe(1100);
  }, 120_000);

  it("returns written: false with a reason when Chromium is absent, and rejects a bad size", async () => {
    const outPath = resolve(OUT_DIR, "never-written.png");
    const r = await renderChartPng({ figure: wellPressureFigure(study.wells[1]), outPath, widthPx: 400, heightPx: 400, chromiumPath: resolve(OUT_DIR, "no-such-chromium") });
    expect(r.written).toBe(false);
    expect(r.reason).toContain("Chromium not found");
    expect(existsSync(outPath)).toBe(false);
    await expect(renderChartPng({ figure: wellPressureFigure(study.wells[1]), outPath, widthPx: 50, heightPx: 400 })).rejects.toMatchObject({ code: "E_RANGE" });
  });
});
