/**
 * Write a study's outputs into its output folder, each file atomically (temporary file,
 * then rename): per well a result LAS 2.0 file and a CSV of every computed curve, a JSON
 * summary with provenance, the HTML report and a PNG of the main chart (when the report
 * module and headless Chromium are available). Nothing holds the wall-clock time, so two
 * runs on the same inputs write identical files.
 */
import { mkdirSync, renameSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { formatFixedDecimals, writeFixedDecimalsAscii, writeLas } from "../io/writeLas.js";
import type { LasFile, LasHeaderItem } from "../io/lasTypes.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { SAFETY_CAUTION_TEXT } from "../present/caution.js";
import { escapeHtml } from "../present/escapeHtml.js";
import type { StudyReportInput } from "../present/report/reportTypes.js";
import type { StudyResult, StudyWellResult } from "./runStudy.js";

/** One output column: LAS mnemonic, LAS unit, CSV header (`name_unit`), description and values. */
export interface StudyOutputCurve {
  mnemonic: string;
  lasUnit: string;
  csvHeader: string;
  description: string;
  values: ArrayLike<number>;
}

/** What {@link writeStudyOutputs} wrote (absolute paths) and what it skipped, with why. */
export interface StudyOutputFiles {
  outDir: string;
  wellFiles: { id: string; las: string; csv: string }[];
  summary: string;
  report?: string;
  chartPng?: string;
  skipped: { file: string; reason: string }[];
}

/** Options of {@link writeStudyOutputs}. */
export interface WriteStudyOutputsOptions {
  /** Write report.html (default: the config's output.report, else true). */
  report?: boolean;
  /** Write pressure-chart.png (default: the config's output.chartPng, else true). */
  chartPng?: boolean;
  /** ISO time put in the report's provenance; default none (byte-identical reruns). */
  generatedAt?: string;
}

/**
 * Write `text` to `path` atomically: write `path.tmp-<pid>`, then rename over `path`.
 * @param path destination file
 * @param data text or bytes
 * @returns nothing
 * @throws the file system's error (the temporary file is removed first)
 * @example writeFileAtomic("out/study-summary.json", "{}")
 */
export function writeFileAtomic(path: string, data: string | Uint8Array): void {
  const tmp = `${path}.tmp-${process.pid}`;
  try {
    writeFileSync(tmp, data);
    renameSync(tmp, path);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw e;
  }
}

/**
 * The curves written for one well, in oilfield units (ft, psi, psi/ft, ppg).
 * @param w one well's result
 * @returns the columns, index (MD) first
 * @example studyOutputCurves(result.wells[0])[0].mnemonic // "DEPT"
 */
export function studyOutputCurves(w: StudyWellResult): StudyOutputCurve[] {
  const p = w.prediction;
  const s = w.stressWindow;
  const n = p.tvdFt.length;
  const emw = (psi: ArrayLike<number>): Float64Array => {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = p.tvdFt[i] > 0 ? psi[i] / p.tvdFt[i] / PSI_PER_FT_PER_PPG : NaN;
    return out;
  };
  const toPpg = (g: ArrayLike<number>): Float64Array => {
    const out = new Float64Array(g.length);
    for (let i = 0; i < out.length; i++) out[i] = g[i] / PSI_PER_FT_PER_PPG;
    return out;
  };
  const c: StudyOutputCurve[] = [
    { mnemonic: "DEPT", lasUnit: "F", csvHeader: "md_ft", description: "measured depth below rotary table", values: w.well.mdFt },
    { mnemonic: "TVD", lasUnit: "F", csvHeader: "tvd_ft", description: "true vertical depth below rotary table", values: p.tvdFt },
    { mnemonic: "TVDSS", lasUnit: "F", csvHeader: "tvdss_ft", description: "true vertical depth below mean sea level", values: p.tvdssFt },
    { mnemonic: "SV", lasUnit: "PSI", csvHeader: "sv_psi", description: "overburden stress", values: p.overburden.svPsi },
    { mnemonic: "PH", lasUnit: "PSI", csvHeader: "ph_psi", description: "hydrostatic pore pressure", values: p.hydrostaticPsi },
    { mnemonic: "PP", lasUnit: "PSI", csvHeader: "pp_psi", description: `pore pressure (primary method ${p.primary})`, values: p.ppPsi },
    { mnemonic: "PP_EMW", lasUnit: "PPG", csvHeader: "pp_emw_ppg", description: "pore pressure as equivalent mud weight", values: emw(p.ppPsi) },
  ];
  const methodCurves: [keyof typeof p.methods, string, string][] = [
    ["eatonSonic", "PP_EATON_DT", "pore pressure Eaton 1975 sonic"],
    ["eatonResistivity", "PP_EATON_RES", "pore pressure Eaton 1975 resistivity"],
    ["bowers", "PP_BOWERS", "pore pressure Bowers 1995"],
    ["equivalentDepth", "PP_EQDEPTH", "pore pressure equivalent depth"],
  ];
  for (const [key, mnem, desc] of methodCurves) {
    const r = p.methods[key];
    if (r) c.push({ mnemonic: mnem, lasUnit: "PSI", csvHeader: `${mnem.toLowerCase()}_psi`, description: desc, values: r.ppPsi });
  }
  if (p.sonicTrend) c.push({ mnemonic: "DT_NCT", lasUnit: "US/F", csvHeader: "dt_nct_us_per_ft", description: "sonic normal compaction trend", values: p.sonicTrend.values });
  if (p.resistivityTrend) c.push({ mnemonic: "RES_NCT", lasUnit: "OHMM", csvHeader: "res_nct_ohm_m", description: "resistivity normal compaction trend", values: p.resistivityTrend.values });
  c.push(
    { mnemonic: "SHMIN", lasUnit: "PSI", csvHeader: "shmin_psi", description: "minimum horizontal stress (fracture pressure)", values: s.shminPsi },
    { mnemonic: "FG", lasUnit: "PPG", csvHeader: "fg_ppg", description: "fracture gradient as equivalent mud weight", values: toPpg(s.fractureGradientPsiPerFt) },
    { mnemonic: "MW_LOWER", lasUnit: "PPG", csvHeader: "mw_lower_ppg", description: "mud-weight window lower bound with trip margin", values: toPpg(s.window.lowerPsiPerFt) },
    { mnemonic: "MW_UPPER", lasUnit: "PPG", csvHeader: "mw_upper_ppg", description: "mud-weight window upper bound with kick margin", values: toPpg(s.window.upperPsiPerFt) },
  );
  const u = w.uncertainty;
  if (u) {
    c.push(
      { mnemonic: "PP_P10", lasUnit: "PSI", csvHeader: "pp_p10_psi", description: "pore pressure P10 (Monte Carlo)", values: u.ppP10Psi },
      { mnemonic: "PP_P50", lasUnit: "PSI", csvHeader: "pp_p50_psi", description: "pore pressure P50 (Monte Carlo)", values: u.ppP50Psi },
      { mnemonic: "PP_P90", lasUnit: "PSI", csvHeader: "pp_p90_psi", description: "pore pressure P90 (Monte Carlo)", values: u.ppP90Psi },
    );
  }
  return c;
}

function resultLas(w: StudyWellResult, result: StudyResult, curves: StudyOutputCurve[]): LasFile {
  const item = (mnemonic: string, unit: string, value: string, description: string): LasHeaderItem => ({ mnemonic, unit, value, description });
  const oneLine = (t: string): string => t.replace(/[\r\n:]+/g, " ").trim();
  return {
    version: [item("VERS", "", "2.0", "CWLS log ASCII standard version 2.0"), item("WRAP", "", "NO", "one line per depth step")],
    well: [
      item("NULL", "", "-999.25", "missing value"),
      item("WELL", "", oneLine(w.well.name), "well"),
      item("SRVC", "", "shalepoint " + result.provenance.version, "computed by"),
      item("ERT", "F", String(w.well.datums.rtElevationFt), "rotary table elevation above mean sea level"),
      item("WDEP", "F", String(w.well.datums.waterDepthFt), "water depth"),
    ],
    curves: curves.map((c) => item(c.mnemonic, c.lasUnit, "", c.description)),
    parameters: [
      item("HYDG", "PSI/FT", String(w.hydrostaticGradientPsiPerFt), "hydrostatic gradient used"),
      item("UNITSYS", "", "oilfield", "curves in ft psi psi/ft ppg whatever the input units"),
      item("CFGSHA", "", result.provenance.configSha256, "SHA-256 of the study file"),
    ],
    other: ["Computed pore pressure and stress estimates (shalepoint).", oneLine(SAFETY_CAUTION_TEXT)].join("\n"),
    data: curves.map((c) => finiteOrNaN(c.values)),
    wrap: false,
    nullValue: -999.25,
  };
}

/** A copy with ±Infinity turned into NaN (written as the LAS NULL value). */
function finiteOrNaN(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < out.length; i++) {
    const x = values[i];
    out[i] = x - x === 0 ? x : NaN; // finite ⇔ x − x is 0
  }
  return out;
}

/**
 * The CSV bytes: a header, then one row per sample, 4 decimals (the `toFixed(4)` text), empty
 * when not finite. Written straight into one growing byte buffer (every character is ASCII
 * except possibly in the header), so no string is made per value or per row.
 */
function resultCsv(curves: StudyOutputCurve[]): Uint8Array {
  const columns = curves.map((c) => c.values);
  const nCols = columns.length;
  const n = columns[0].length;
  const header = new TextEncoder().encode(curves.map((c) => c.csvHeader).join(",") + "\n");
  let buf = new Uint8Array(header.length + n * nCols * 11 + 64);
  buf.set(header);
  let at = header.length;
  const room = nCols * 40 + 8; // most a row can take before the next capacity check
  for (let i = 0; i < n; i++) {
    if (buf.length - at < room) {
      const bigger = new Uint8Array(buf.length * 2 + room);
      bigger.set(buf.subarray(0, at));
      buf = bigger;
    }
    for (let j = 0; j < nCols; j++) {
      if (j > 0) buf[at++] = 44; // ","
      const x = columns[j][i];
      if (!Number.isFinite(x)) continue;
      const fast = writeFixedDecimalsAscii(buf, at, x, 4);
      if (fast >= 0) {
        at = fast;
        continue;
      }
      const text = formatFixedDecimals(x, 4); // ≤ 1e21: plain digits, at most 27 characters
      for (let k = 0; k < text.length; k++) buf[at++] = text.charCodeAt(k);
    }
    buf[at++] = 10; // "\n"
  }
  return buf.subarray(0, at);
}

const round = (x: number, d = 4): number | null => (Number.isFinite(x) ? Math.round(x * 10 ** d) / 10 ** d : null);

/**
 * The JSON summary of a study: caution, findings, compartments, casing points, calibration
 * misfits and provenance (version, config hash, input hashes). Depths in ft TVD, pressures
 * in psi, mud weights in ppg.
 * @param result the study result
 * @returns a plain JSON-ready object
 * @example studySummary(result).provenance.configSha256 // 64 hex digits
 */
export function studySummary(result: StudyResult): Record<string, unknown> {
  return {
    format: "shalepoint-study-summary",
    formatVersion: 1,
    title: result.title,
    caution: SAFETY_CAUTION_TEXT,
    units: { depth: "ft TVD below rotary table", pressure: "psi", mudWeight: "ppg (12/231 psi/ft per ppg)" },
    provenance: result.provenance,
    criticalFindings: result.criticalFindings,
    findings: result.findings,
    wells: result.wells.map((w) => ({
      id: w.id,
      name: w.well.name,
      datums: w.well.datums,
      hydrostaticGradientPsiPerFt: w.hydrostaticGradientPsiPerFt,
      primaryMethod: w.prediction.primary,
      samples: w.prediction.tvdFt.length,
      topOfOverpressureTvdFt: round(w.compartments?.classification?.topOfOverpressureFt ?? NaN, 1),
      compartments: (w.compartments?.classification?.compartments ?? []).map((c) => ({
        id: c.compartmentId,
        topTvdFt: round(c.topFt, 1),
        baseTvdFt: round(c.baseFt, 1),
        meanExcessPsi: round(c.meanExcessPsi, 1),
        ppGradientPsiPerFt: round(c.ppGradientPsiPerFt, 4),
      })),
      intervals: (w.compartments?.classification?.intervals ?? []).map((iv) => ({
        label: iv.label,
        topTvdFt: round(iv.topFt, 1),
        baseTvdFt: round(iv.baseFt, 1),
        meanExcessPsi: round(iv.meanExcessPsi, 1),
      })),
      fluidGradients: (w.compartments?.pressureSystems?.lines ?? []).map((l) => ({
        fluid: l.fluid,
        gradientPsiPerFt: round(l.gradientPsiPerFt, 4),
        topTvdFt: round(l.topFt, 1),
        baseTvdFt: round(l.baseFt, 1),
        n: l.n,
      })),
      contacts: (w.compartments?.pressureSystems?.contacts ?? []).map((c) => ({ kind: c.kind, tvdFt: round(c.depthFt, 1), pressurePsi: round(c.pressurePsi, 1) })),
      casingShoesTvdFt: (w.stressWindow.casing?.shoeTvdFt ?? []).map((d) => round(d, 1)),
      fractureCalibration: w.stressWindow.fractureCalibration
        ? {
            model: w.stressWindow.fractureCalibration.model,
            parameter: round(w.stressWindow.fractureCalibration.parameter, 4),
            n: w.stressWindow.fractureCalibration.n,
            rmsMisfitPpg: round(w.stressWindow.fractureCalibration.rmsMisfitPpg, 3),
          }
        : null,
      porePressureMisfits: Object.fromEntries(
        Object.entries(w.misfits).map(([k, m]) => [k, { n: m.n, rmsPsi: round(m.rmsPsi, 1), rmsPpg: round(m.rmsPpg, 3) }]),
      ),
      uncertainty: w.uncertainty ? { realisations: w.uncertainty.realisations, seed: w.uncertainty.seed } : null,
      warnings: w.warnings.map((x) => ({ code: x.code, message: x.message })),
    })),
  };
}

/** The study-report input for the report renderer. */
export function studyReportInput(result: StudyResult, generatedAt?: string): StudyReportInput {
  return {
    title: result.title,
    wells: result.wells,
    provenance: generatedAt ? { ...result.provenance, generatedAt } : result.provenance,
    findings: result.findings,
  };
}

interface ReportModule {
  renderStudyReport?: (input: StudyReportInput) => string;
  renderChartPng?: (args: { figure: unknown; outPath: string; widthPx: number; heightPx: number }) => Promise<{ written: boolean; reason?: string }>;
  wellPressureFigure?: (input: StudyWellResult, heightPx?: number) => unknown;
}

/** Load the report helper's modules if present (they are optional at run time). */
async function loadReportModule(): Promise<ReportModule> {
  const found: ReportModule = {};
  for (const name of ["index", "renderStudyReport", "renderChartPng", "reportFigures"]) {
    try {
      const spec = `../present/report/${name}.js`;
      const mod = (await import(spec)) as ReportModule;
      found.renderStudyReport ??= mod.renderStudyReport;
      found.renderChartPng ??= mod.renderChartPng;
      found.wellPressureFigure ??= mod.wellPressureFigure;
    } catch {
      // module not there (yet): skip
    }
  }
  return found;
}

function fallbackReportHtml(result: StudyResult): string {
  const rows = result.findings.map((f) => `<tr><td>${escapeHtml(f.well ?? "")}</td><td>${escapeHtml(f.code)}</td><td>${escapeHtml(f.message)}</td></tr>`).join("");
  return [
    "<!doctype html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>",
    escapeHtml(result.title),
    "</title></head><body style=\"font-family:sans-serif\"><h1>",
    escapeHtml(result.title),
    "</h1><p><strong>",
    escapeHtml(SAFETY_CAUTION_TEXT),
    "</strong></p><p>The full report renderer was not available; results are in the LAS, CSV and JSON files beside this page.</p>",
    `<table><thead><tr><th>Well</th><th>Code</th><th>Finding</th></tr></thead><tbody>${rows}</tbody></table>`,
    "</body></html>\n",
  ].join("");
}

/**
 * Write every output of a study into `outDir` (created if missing), each atomically.
 *
 * Files: `<well-id>.result.las` and `<well-id>.result.csv` (oilfield units: ft, psi, ppg; 4 decimals;
 * see {@link studyOutputCurves}), `study-summary.json` ({@link studySummary}), `report.html`
 * and `pressure-chart.png` (first well's pressure chart, headless Chromium). Chromium is
 * started first and runs while the other files are written; its file is renamed into place
 * after them.
 *
 * @param result study result from runStudy
 * @param outDir output folder (absolute or relative to the working directory)
 * @param options report / PNG switches and an optional generation time for the report
 * @returns the paths written and the files skipped with the reason
 * @throws the file system's errors; ShalepointError E_LAS_WRITE_* for an unwritable curve
 * @example await writeStudyOutputs(runStudy(cfg), "demo-output") // { summary: ".../study-summary.json", … }
 */
export async function writeStudyOutputs(result: StudyResult, outDir: string, options: WriteStudyOutputsOptions = {}): Promise<StudyOutputFiles> {
  mkdirSync(outDir, { recursive: true });
  const files: StudyOutputFiles = { outDir, wellFiles: [], summary: join(outDir, "study-summary.json"), skipped: [] };
  const wantReport = options.report ?? result.config.file.output.report ?? true;
  const wantPng = options.chartPng ?? result.config.file.output.chartPng ?? true;
  const mod: ReportModule = wantReport || wantPng ? await loadReportModule() : {};

  // The PNG comes from a Chromium child process: start it first and write the other files
  // while it runs (none of them depends on it; each file is written exactly as before).
  const pngPath = join(outDir, "pressure-chart.png");
  const pngTmp = `${pngPath}.tmp-${process.pid}.png`;
  let png: Promise<{ written: boolean; reason?: string; error?: unknown }> | undefined;
  const { renderChartPng, wellPressureFigure } = mod;
  if (wantPng && renderChartPng && wellPressureFigure && result.wells.length > 0) {
    // An error (figure or renderer) is held and thrown after the other files, as before.
    png = (async () => renderChartPng({ figure: wellPressureFigure(result.wells[0], 900), outPath: pngTmp, widthPx: 900, heightPx: 900 }))().then(
      (r) => ({ written: r.written, reason: r.reason }),
      (error: unknown) => ({ written: false, error }),
    );
  }
  try {
    for (const w of result.wells) {
      const las = join(outDir, `${w.id}.result.las`);
      const csv = join(outDir, `${w.id}.result.csv`);
      const curves = studyOutputCurves(w);
      writeFileAtomic(las, writeLas(resultLas(w, result, curves), { precision: 4 }));
      writeFileAtomic(csv, resultCsv(curves));
      files.wellFiles.push({ id: w.id, las, csv });
    }
    writeFileAtomic(files.summary, JSON.stringify(studySummary(result), null, 2) + "\n");
    if (wantReport) {
      const path = join(outDir, "report.html");
      if (mod.renderStudyReport) writeFileAtomic(path, mod.renderStudyReport(studyReportInput(result, options.generatedAt)));
      else {
        writeFileAtomic(path, fallbackReportHtml(result));
        files.skipped.push({ file: "report.html (full)", reason: "report renderer not available; wrote a short findings page instead" });
      }
      files.report = path;
    }
  } catch (e) {
    // Let Chromium finish (it writes into this folder) and remove its file before failing.
    if (png) await png;
    rmSync(pngTmp, { force: true });
    throw e;
  }
  if (wantPng) {
    if (png) {
      const r = await png;
      if (r.error !== undefined) {
        rmSync(pngTmp, { force: true });
        throw r.error;
      }
      if (r.written) {
        renameSync(pngTmp, pngPath);
        files.chartPng = pngPath;
      } else {
        rmSync(pngTmp, { force: true });
        files.skipped.push({ file: "pressure-chart.png", reason: r.reason ?? "chart renderer declined" });
      }
    } else files.skipped.push({ file: "pressure-chart.png", reason: "chart PNG renderer not available" });
  }
  return files;
}
