/**
 * HTML sections of the prediction report, one function per section. Every piece of text
 * that came from a file or a result goes through escapeHtml; every number through
 * reportNumberCell (formatted, with the raw value in `data-value`).
 */
import { PSI_PER_FT_PER_PPG } from "../../units/index.js";
import type { Warning } from "../../errors.js";
import { OVERBURDEN_SOURCE_NAMES } from "../../stress/overburden.js";
import { nearestDepthSampleIndex } from "../../stress/stressSeries.js";
import { porePressureMisfitTable, type MisfitRow, type PressureObservation } from "../../porepressure/misfitTable.js";
import type { PrimaryPorePressureMethod, TrendOutcome } from "../../pipeline/predictPorePressure.js";
import { escapeHtml } from "../escapeHtml.js";
import { reportNumberCell, reportTextCell, formatReportNumber } from "./formatReportNumber.js";
import { PORE_PRESSURE_METHOD_LABELS } from "./reportFigures.js";
import type { WellReportInput } from "./reportTypes.js";

/** Nearest depth sample index, defined once in stress/stressSeries.ts; re-exported here where the report API has always offered it. */
export { nearestDepthSampleIndex };

/** Misfit (ppg EMW) above which a measured point is flagged in the findings: 0.5 ppg (own choice, about twice the scatter of log-derived pore pressure). */
export const CALIBRATION_FLAG_PPG = 0.5;

/** One finding line of a well (window, stress, calibration), before rendering. */
export interface ReportFindingLine {
  group: "window" | "casing" | "stress" | "calibration" | "study";
  code: string;
  message: string;
  topFt: number;
  baseFt: number;
}

/** A table: header cells (escaped here) and rows of ready cell HTML. */
function table(cls: string, headers: readonly string[], rows: readonly string[][], caption?: string): string {
  const cap = caption === undefined ? "" : `<caption>${escapeHtml(caption)}</caption>`;
  const head = `<thead><tr>${headers.map((h) => `<th scope="col">${escapeHtml(h)}</th>`).join("")}</tr></thead>`;
  const body = `<tbody>${rows.map((r) => `<tr>${r.join("")}</tr>`).join("")}</tbody>`;
  return `<table class="${cls}">${cap}${head}${body}</table>`;
}

function section(id: string, title: string, inner: string): string {
  return `<section class="block" id="${escapeHtml(id)}"><h3>${escapeHtml(title)}</h3>${inner}</section>`;
}

function note(text: string): string {
  return `<p class="note">${escapeHtml(text)}</p>`;
}

/**
 * Report section: well identity, datums (air gap, water depth, mudline, seawater density),
 * depth range, the hydrostatic basis (psi/ft and ppg = psi/ft × 231/12) and the file's header facts.
 * @param input one well's report input
 * @param id element id of the section, e.g. `well-1-header`
 * @returns HTML of the section (all text escaped)
 * @example reportHeaderSection(a1, "well-1-header").startsWith('<section class="block" id="well-1-header">') // true
 */
export function reportHeaderSection(input: WellReportInput, id: string): string {
  const { well, prediction: p } = input;
  const n = p.tvdFt.length;
  const mudlineFt = well.datums.rtElevationFt + well.datums.waterDepthFt;
  const hydg = input.hydrostaticGradientPsiPerFt;
  const rows: string[][] = [
    [reportTextCell("Well"), reportTextCell(well.name), reportTextCell("")],
    [reportTextCell("Rotary table above sea level (air gap)"), reportNumberCell(well.datums.rtElevationFt, 1), reportTextCell("ft")],
    [reportTextCell("Water depth"), reportNumberCell(well.datums.waterDepthFt, 1), reportTextCell("ft")],
    [reportTextCell("Mudline, TVD below RT"), reportNumberCell(mudlineFt, 1), reportTextCell("ft")],
    [reportTextCell("Seawater density"), reportNumberCell(well.datums.seawaterDensityGcc, 3), reportTextCell("g/cc")],
    [reportTextCell("Top of data, TVD below RT"), reportNumberCell(n > 0 ? p.tvdFt[0] : NaN, 1), reportTextCell("ft")],
    [reportTextCell("Base of data, TVD below RT"), reportNumberCell(n > 0 ? p.tvdFt[n - 1] : NaN, 1), reportTextCell("ft")],
    [reportTextCell("Samples"), reportNumberCell(n, 0), reportTextCell("")],
  ];
  if (hydg !== undefined) {
    rows.push([reportTextCell("Hydrostatic basis: brine gradient from sea level"), reportNumberCell(hydg, 4), reportTextCell("psi/ft")]);
    rows.push([reportTextCell("Hydrostatic basis as EMW"), reportNumberCell(hydg / PSI_PER_FT_PER_PPG, 2), reportTextCell("ppg")]);
  }
  rows.push([reportTextCell("Pore pressure carried downstream"), reportTextCell(PORE_PRESSURE_METHOD_LABELS[p.primary]), reportTextCell("")]);
  const facts = Object.entries(well.header).map(([k, v]) => [reportTextCell(k), reportTextCell(v)]);
  return section(
    id,
    "Well, datums and hydrostatic basis",
    table("kv", ["Item", "Value", "Unit"], rows) +
      (facts.length > 0 ? table("kv facts", ["Item", "Value"], facts, `Header facts from the log file (${facts.length})`) : ""),
  );
}

/**
 * Report section: input files and log quality — curve summary (nulls, range, gaps, spikes),
 * bad-hole count, shale points, and the overburden's density-source ranges.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section
 * @example reportInputsSection(a1, "well-1-inputs").includes("Overburden fill ranges") // true
 */
export function reportInputsSection(input: WellReportInput, id: string): string {
  const { prediction: p, well } = input;
  let html = "";
  const files = input.inputFiles ?? [];
  if (files.length > 0) html += table("files", ["Role", "File"], files.map((f) => [reportTextCell(f.role), reportTextCell(f.path)]), "Input files");
  const curveMeta = new Map(Object.entries(well.curves).map(([k, c]) => [k, c]));
  if (input.qc !== undefined) {
    html += table(
      "qc",
      ["Curve", "Mnemonic", "Description", "Samples", "Missing", "Missing %", "Min", "Max", "Mean", "First valid (ft)", "Last valid (ft)", "Longest gap (samples)", "Spikes"],
      input.qc.curves.map((c) => {
        const meta = curveMeta.get(c.name);
        return [
          reportTextCell(c.name),
          reportTextCell(meta?.mnemonic ?? ""),
          reportTextCell(meta?.description ?? ""),
          reportNumberCell(c.sampleCount, 0),
          reportNumberCell(c.nullCount, 0),
          reportNumberCell(100 * c.nullFraction, 1),
          reportNumberCell(c.min, 3),
          reportNumberCell(c.max, 3),
          reportNumberCell(c.mean, 3),
          reportNumberCell(c.firstValidDepthFt, 1),
          reportNumberCell(c.lastValidDepthFt, 1),
          reportNumberCell(c.longestGapSamples, 0),
          reportNumberCell(c.spikeCount, 0),
        ];
      }),
      "Curve summary (spikes: Hampel identifier, see logs/despikeLog)",
    );
  }
  let bad = 0;
  for (let i = 0; i < p.badHole.length; i++) bad += p.badHole[i];
  html += table(
    "kv",
    ["Check", "Value", "Unit"],
    [
      [reportTextCell("Bad-hole samples (caliper enlarged over bit size)"), reportNumberCell(bad, 0), reportTextCell("samples")],
      [reportTextCell("Bad-hole share of the log"), reportNumberCell(p.badHole.length > 0 ? (100 * bad) / p.badHole.length : NaN, 1), reportTextCell("%")],
      [reportTextCell("Shale points picked"), reportNumberCell(p.shale.points.tvdFt.length, 0), reportTextCell("points")],
    ],
  );
  html += table(
    "ranges",
    ["Density source for overburden", "From TVD (ft)", "To TVD (ft)", "Samples"],
    p.overburden.ranges.map((r) => [reportTextCell(r.source), reportNumberCell(r.fromTvdFt, 1), reportNumberCell(r.toTvdFt, 1), reportNumberCell(r.count, 0)]),
    "Overburden fill ranges (where the density log was replaced or extended)",
  );
  const known = new Set<string>(OVERBURDEN_SOURCE_NAMES);
  if (p.overburden.ranges.some((r) => !known.has(r.source))) html += note("Unknown density source names present.");
  return section(id, "Inputs and log quality", html);
}

function trendRows(label: string, t: TrendOutcome | undefined): string[][] {
  if (t === undefined) return [];
  if (t.diagnostics.length === 0) {
    return t.trend.segments.map((s, k) => [
      reportTextCell(label),
      reportNumberCell(k + 1, 0),
      reportTextCell(Object.entries(s.params).map(([n, v]) => `${n} = ${formatReportNumber(v as number, 6)}`).join("; ")),
      reportTextCell("given"),
      reportNumberCell(NaN, 0),
      reportNumberCell(NaN, 4),
      reportNumberCell(NaN, 5),
      reportTextCell(""),
      reportNumberCell(s.topBmlFt, 0),
      reportNumberCell(NaN, 0),
    ]);
  }
  return t.diagnostics.map((d, k) => [
    reportTextCell(label),
    reportNumberCell(k + 1, 0),
    reportTextCell(
      Object.entries(d.params)
        .map(([n, v]) => `${n} = ${(v as number).toPrecision(6)} ± ${(d.paramStdErr[n] ?? NaN).toPrecision(3)}`)
        .join("; "),
    ),
    reportTextCell(`${d.method}: ${d.linearModel}`),
    reportNumberCell(d.n, 0),
    reportNumberCell(d.rSquared, 4),
    reportNumberCell(d.residualStd, 5),
    reportTextCell(`${d.nDownweighted} down-weighted, ${d.nMissing} missing, ${d.nExcluded} excluded`),
    reportNumberCell(d.depthRange.topBmlFt, 0),
    reportNumberCell(d.depthRange.baseBmlFt, 0),
  ]);
}

/**
 * Report section: normal compaction trends with their fit diagnostics (parameters ± standard
 * error, n, R², residual standard deviation, depth range) and the Bowers parameters.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section
 * @example reportTrendSection(a1, "well-1-trends").includes("R²") // true
 */
export function reportTrendSection(input: WellReportInput, id: string): string {
  const p = input.prediction;
  const rows = [...trendRows("Sonic", p.sonicTrend), ...trendRows("Resistivity", p.resistivityTrend)];
  const html =
    rows.length > 0
      ? table(
          "trends",
          ["Trend", "Segment", "Parameters ± standard error", "Fit", "n", "R²", "Residual std (linearised)", "Points", "Top (ft BML)", "Base (ft BML)"],
          rows,
        )
      : note("No normal compaction trend was used (Bowers only).");
  const bw = p.methods.bowers;
  const extra = bw
    ? table("kv", ["Bowers 1995 parameter", "Value"], [
        [reportTextCell("A"), reportNumberCell(bw.a, 4)],
        [reportTextCell("B"), reportNumberCell(bw.b, 4)],
        [reportTextCell("U (1 = virgin curve only)"), reportNumberCell(bw.u, 3)],
      ])
    : "";
  return section(id, "Normal compaction trends", html + extra);
}

/**
 * Report section: pressure intervals, seals, fluid-gradient lines and contacts.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section, or "" when the input has no compartment analysis
 * @example reportCompartmentSection(b1WithoutCompartments, "well-2-compartments") // ""
 */
export function reportCompartmentSection(input: WellReportInput, id: string): string {
  const c = input.compartments;
  if (c === undefined || (c.classification === undefined && c.pressureSystems === undefined)) return "";
  let html = "";
  if (c.classification !== undefined) {
    const k = c.classification;
    html += table(
      "intervals",
      ["Interval", "Label", "Top (ft)", "Base (ft)", "Thickness (ft)", "Mean excess (psi)", "Pp gradient (psi/ft)", "Evidence"],
      k.intervals.map((s) => [reportNumberCell(s.id, 0), reportTextCell(s.label), reportNumberCell(s.topFt, 1), reportNumberCell(s.baseFt, 1), reportNumberCell(s.thicknessFt, 1), reportNumberCell(s.meanExcessPsi, 0), reportNumberCell(s.ppGradientPsiPerFt, 4), reportTextCell(s.evidence)]),
      `Pressure intervals (top of overpressure: ${k.topOfOverpressureFt === null ? "none" : formatReportNumber(k.topOfOverpressureFt, 1) + " ft"})`,
    );
    if (k.seals.length > 0) {
      html += table(
        "seals",
        ["Compartment", "Side", "Seal top (ft)", "Seal base (ft)", "Thickness (ft)", "Excess change across (psi)"],
        k.seals.map((s) => [reportNumberCell(s.compartmentId, 0), reportTextCell(s.side), reportNumberCell(s.topFt, 1), reportNumberCell(s.baseFt, 1), reportNumberCell(s.thicknessFt, 1), reportNumberCell(s.excessChangeAcrossPsi, 0)]),
        "Seals",
      );
    }
  }
  if (c.pressureSystems !== undefined) {
    const s = c.pressureSystems;
    html += table(
      "systems",
      ["Line", "System", "Fluid", "n", "Gradient (psi/ft)", "Std error (psi/ft)", "Top (ft)", "Base (ft)", "RMS residual (psi)", "Flags"],
      s.lines.map((l) => [reportNumberCell(l.lineId, 0), reportNumberCell(l.systemId, 0), reportTextCell(l.fluid), reportNumberCell(l.n, 0), reportNumberCell(l.gradientPsiPerFt, 4), reportNumberCell(l.gradientStdErrPsiPerFt, 4), reportNumberCell(l.topFt, 1), reportNumberCell(l.baseFt, 1), reportNumberCell(l.rmsResidualPsi, 1), reportTextCell(l.flags.join(", "))]),
      "Fluid-gradient lines from pressure tests",
    );
    if (s.contacts.length > 0) {
      html += table("contacts", ["Contact", "Depth (ft)", "Pressure (psi)"], s.contacts.map((x) => [reportTextCell(x.kind), reportNumberCell(x.depthFt, 1), reportNumberCell(x.pressurePsi, 0)]), "Fluid contacts");
    }
  }
  return section(id, "Pressure compartments", html);
}

/** Measured points (pressure tests, kicks) on the well's index, with what they are. */
export interface ReportCalibrationPoint {
  observation: PressureObservation;
  quality: string;
  /** Depth as given in the file, ft TVD (the nearest sample is used for the prediction). */
  fileTvdFt: number;
}

/**
 * Measured pore pressures of a well as observations on its depth index: formation-pressure
 * tests (psi) and kicks (controlling EMW × TVD, common practice, no source); points outside
 * the index are counted and left out.
 * @param input one well's report input
 * @returns points (observation, quality, file depth) and the count outside the log
 * @example reportCalibrationPoints(a1).points.length // 35 pressure tests + 1 kick = 36
 */
export function reportCalibrationPoints(input: WellReportInput): { points: ReportCalibrationPoint[]; outside: number } {
  const z = input.prediction.tvdFt;
  const points: ReportCalibrationPoint[] = [];
  let outside = 0;
  for (const t of input.tables.pressureTests ?? []) {
    const index = nearestDepthSampleIndex(z, t.tvdFt);
    if (index < 0) { outside++; continue; }
    points.push({ observation: { index, pressurePsi: t.pressurePsi, source: `pressure test${t.sand ? `, ${t.sand}` : ""}` }, quality: t.quality, fileTvdFt: t.tvdFt });
  }
  for (const e of input.tables.events ?? []) {
    if (e.event !== "kick" || e.emwPsiPerFt === undefined) continue;
    const index = nearestDepthSampleIndex(z, e.tvdFt);
    if (index < 0) { outside++; continue; }
    points.push({ observation: { index, pressurePsi: e.emwPsiPerFt * e.tvdFt, source: "kick (controlling EMW)" }, quality: "kick", fileTvdFt: e.tvdFt });
  }
  return { points, outside };
}

/**
 * Misfit rows of the primary pore-pressure method at the calibration points
 * (porepressure/misfitTable: difference = predicted − measured, psi and ppg).
 * @param input one well's report input
 * @returns rows, the points they came from, and how many points lay outside the log
 * @example reportPrimaryMisfitRows(a1).rows[0].measuredPsi // 2374.7 (first A-1 pressure test)
 */
export function reportPrimaryMisfitRows(input: WellReportInput): { rows: MisfitRow[]; points: ReportCalibrationPoint[]; outside: number } {
  const { points, outside } = reportCalibrationPoints(input);
  if (points.length === 0) return { rows: [], points, outside };
  const t = porePressureMisfitTable({ tvdFt: input.prediction.tvdFt, predictedPsi: input.prediction.ppPsi, observations: points.map((p) => p.observation) });
  return { rows: t.rows, points, outside };
}

function rms(values: number[]): number {
  const f = values.filter(Number.isFinite);
  return f.length === 0 ? NaN : Math.sqrt(f.reduce((s, v) => s + v * v, 0) / f.length);
}

/**
 * Report section: measured against predicted pore pressure (every method's RMS), refitted
 * parameters, and leak-off / integrity tests against the fracture-pressure model.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section (numbers with raw `data-value`, named by `data-key`)
 * @example reportCalibrationSection(a1, "well-1-calibration").includes('data-key="predictedPsi"') // true
 */
export function reportCalibrationSection(input: WellReportInput, id: string): string {
  const p = input.prediction;
  const { rows, points, outside } = reportPrimaryMisfitRows(input);
  let html = "";
  if (rows.length > 0) {
    html += table(
      "calibration",
      ["TVD (ft)", "What", "Quality", "Measured (psi)", "Predicted (psi)", "Predicted − measured (psi)", "Measured (ppg)", "Predicted (ppg)", "Predicted − measured (ppg)"],
      rows.map((r, k) => [
        reportNumberCell(r.tvdFt, 1, "tvdFt"),
        reportTextCell(r.source),
        reportTextCell(points[k].quality),
        reportNumberCell(r.measuredPsi, 0, "measuredPsi"),
        reportNumberCell(r.predictedPsi, 0, "predictedPsi"),
        reportNumberCell(r.differencePsi, 0, "differencePsi"),
        reportNumberCell(r.measuredPpg, 2, "measuredPpg"),
        reportNumberCell(r.predictedPpg, 2, "predictedPpg"),
        reportNumberCell(r.differencePpg, 2, "differencePpg"),
      ]),
      `Pore pressure, ${PORE_PRESSURE_METHOD_LABELS[p.primary]}: measured points against the prediction at the nearest sample (EMW = P / (TVD × 12/231))`,
    );
    const used = points.map((pt, k) => ({ pt, k })).filter(({ pt }) => pt.quality !== "poor");
    const methodRows: string[][] = [];
    for (const key of Object.keys(PORE_PRESSURE_METHOD_LABELS) as PrimaryPorePressureMethod[]) {
      const m = p.methods[key];
      if (m === undefined) continue;
      const t = porePressureMisfitTable({ tvdFt: p.tvdFt, predictedPsi: m.ppPsi, observations: used.map(({ pt }) => pt.observation) });
      methodRows.push([reportTextCell(PORE_PRESSURE_METHOD_LABELS[key]), reportNumberCell(t.n, 0), reportNumberCell(t.rmsPsi, 0, "rmsPsi"), reportNumberCell(t.rmsPpg, 3, "rmsPpg")]);
    }
    html += table("methods", ["Method", "Points", "RMS misfit (psi)", "RMS misfit (ppg)"], methodRows, "Every method against the measured points (poor-quality tests left out)");
  } else {
    html += note("No measured pore pressure (pressure test or kick) inside the logged interval: the prediction is not calibrated.");
  }
  if (outside > 0) html += note(`${outside} measured point(s) lie outside the logged interval and are not compared.`);
  const fitted: string[][] = [];
  const c = p.calibration;
  if (c.eatonSonic) fitted.push([reportTextCell("Eaton sonic exponent"), reportNumberCell(c.eatonSonic.exponent, 3), reportNumberCell(c.eatonSonic.exponentStandardError, 3), reportNumberCell(c.eatonSonic.n, 0)]);
  if (c.eatonResistivity) fitted.push([reportTextCell("Eaton resistivity exponent"), reportNumberCell(c.eatonResistivity.exponent, 3), reportNumberCell(c.eatonResistivity.exponentStandardError, 3), reportNumberCell(c.eatonResistivity.n, 0)]);
  if (c.bowers) {
    fitted.push([reportTextCell("Bowers A"), reportNumberCell(c.bowers.a, 4), reportNumberCell(c.bowers.aStandardError, 4), reportNumberCell(c.bowers.n, 0)]);
    fitted.push([reportTextCell("Bowers B"), reportNumberCell(c.bowers.b, 4), reportNumberCell(c.bowers.bStandardError, 4), reportNumberCell(c.bowers.n, 0)]);
  }
  if (fitted.length > 0) html += table("fitted", ["Refitted parameter", "Value", "Std error", "Points"], fitted, "Parameters refitted to the measured points");
  const fc = input.stressWindow.fractureCalibration;
  if (fc !== undefined && fc.tests.length > 0) {
    html += table(
      "stresstests",
      ["TVD (ft)", "Test", "Measured (psi)", "Model (psi)", "Measured − model (psi)", "Measured − model (ppg)", "Used in fit", "Flags"],
      fc.tests.map((t) => [
        reportNumberCell(t.tvdFt, 1, "tvdFt"),
        reportTextCell(t.kind),
        reportNumberCell(t.pressurePsi, 0, "pressurePsi"),
        reportNumberCell(t.predictedPsi, 0, "predictedPsi"),
        reportNumberCell(t.misfitPsi, 0, "misfitPsi"),
        reportNumberCell(t.misfitPpg, 2, "misfitPpg"),
        reportTextCell(t.usedInFit ? "yes" : "no"),
        reportTextCell(t.flags.join(", ")),
      ]),
      `Leak-off and integrity tests against the fracture-pressure model (${fc.model}, parameter ${formatReportNumber(fc.parameter, 4)}, RMS ${formatReportNumber(fc.rmsMisfitPpg, 2)} ppg)`,
    );
  }
  return section(id, "Calibration against measurements", html);
}

/**
 * Report section: narrowest window, and the casing sections (shoe depths, mud weight in ppg
 * and psi/ft, what limits each section's top), plus planned-casing violations.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section
 * @example reportWindowSection(a1, "well-1-window").includes("Casing points") // true
 */
export function reportWindowSection(input: WellReportInput, id: string): string {
  const sw = input.stressWindow;
  let html = "";
  const w = sw.window;
  let narrowPpg = Infinity;
  let narrowAt = NaN;
  for (let i = 0; i < w.widthPsiPerFt.length; i++) {
    const v = w.widthPsiPerFt[i] / PSI_PER_FT_PER_PPG;
    if (Number.isFinite(v) && v < narrowPpg) { narrowPpg = v; narrowAt = input.prediction.tvdFt[i]; }
  }
  html += table("kv", ["Window", "Value", "Unit"], [
    [reportTextCell("Narrowest window (after margins)"), reportNumberCell(Number.isFinite(narrowPpg) ? narrowPpg : NaN, 2, "narrowestPpg"), reportTextCell("ppg")],
    [reportTextCell("at TVD"), reportNumberCell(narrowAt, 1, "narrowestTvdFt"), reportTextCell("ft")],
  ]);
  if (sw.casing !== undefined && sw.casing.sections.length > 0) {
    html += table(
      "casing",
      ["Section", "Top / shoe above (ft TVD)", "Shoe / bottom (ft TVD)", "Length (ft)", "Mud weight (ppg)", "Mud weight (psi/ft)", "What limits the top", "Limit depth (ft)"],
      sw.casing.sections.map((s, k) => [
        reportNumberCell(k + 1, 0),
        reportNumberCell(s.topTvdFt, 1, "topTvdFt"),
        reportNumberCell(s.bottomTvdFt, 1, "bottomTvdFt"),
        reportNumberCell(s.bottomTvdFt - s.topTvdFt, 1),
        reportNumberCell(s.mudWeightPpg, 2, "mudWeightPpg"),
        reportNumberCell(s.mudWeightPsiPerFt, 4, "mudWeightPsiPerFt"),
        reportTextCell(s.topLimit),
        reportNumberCell(s.topLimitDepthFt, 1),
      ]),
      "Casing points selected bottom-up from the window (margins included)",
    );
  } else {
    html += note("No casing design was computed.");
  }
  const v = sw.casingPlanViolations ?? [];
  if (v.length > 0) {
    html += table(
      "violations",
      ["Planned section", "Problem", "Top (ft)", "Base (ft)", "Worst depth (ft)", "Worst exceedance (ppg)"],
      v.map((x) => [reportNumberCell(x.sectionIndex + 1, 0), reportTextCell(x.code === "V_BELOW_LOWER" ? "mud below the lower bound" : "mud above the upper bound"), reportNumberCell(x.topFt, 1), reportNumberCell(x.baseFt, 1), reportNumberCell(x.worstDepthFt, 1), reportNumberCell(x.worstExceedancePpg, 2)]),
      "Planned casing against the window",
    );
  }
  return section(id, "Mud-weight window and casing", html);
}

/**
 * Findings of one well: window closes/inverts, casing (no mud weight, plan violations),
 * stress consistency, leak-off test flags, and measured points whose misfit exceeds
 * {@link CALIBRATION_FLAG_PPG}.
 * @param input one well's report input
 * @returns finding lines in that order
 * @example reportWellFindingLines(a1)[0].code // e.g. "F_WINDOW_CLOSES"
 */
export function reportWellFindingLines(input: WellReportInput): ReportFindingLine[] {
  const sw = input.stressWindow;
  const out: ReportFindingLine[] = [];
  for (const f of sw.window.findings) out.push({ group: "window", code: f.code, message: f.message, topFt: f.topFt, baseFt: f.baseFt });
  for (const f of sw.casing?.findings ?? []) out.push({ group: "casing", code: f.code, message: f.message, topFt: f.topFt, baseFt: f.baseFt });
  for (const v of sw.casingPlanViolations ?? []) {
    out.push({ group: "casing", code: v.code, message: `planned section ${v.sectionIndex + 1}: worst ${formatReportNumber(v.worstExceedancePpg, 2)} ppg at ${formatReportNumber(v.worstDepthFt, 1)} ft`, topFt: v.topFt, baseFt: v.baseFt });
  }
  for (const f of sw.findings) out.push({ group: "stress", code: f.code, message: f.message, topFt: f.topFt, baseFt: f.baseFt });
  for (const t of sw.fractureCalibration?.tests ?? []) {
    for (const flag of t.flags) out.push({ group: "calibration", code: `C_TEST_${flag}`, message: `${t.kind} at ${formatReportNumber(t.tvdFt, 1)} ft: ${flag}`, topFt: t.tvdFt, baseFt: t.tvdFt });
  }
  const { rows, points } = reportPrimaryMisfitRows(input);
  rows.forEach((r, k) => {
    if (Math.abs(r.differencePpg) > CALIBRATION_FLAG_PPG) {
      out.push({
        group: "calibration",
        code: "C_MISFIT_OVER_LIMIT",
        message: `${r.source} (${points[k].quality}) at ${formatReportNumber(r.tvdFt, 1)} ft: predicted − measured ${formatReportNumber(r.differencePpg, 2)} ppg (limit ±${CALIBRATION_FLAG_PPG} ppg)`,
        topFt: r.tvdFt,
        baseFt: r.tvdFt,
      });
    }
  });
  return out;
}

/**
 * Warnings counted by code: number of warnings and samples affected (a warning's `count`,
 * else 1), sorted by code.
 * @param warnings warnings of any stages
 * @returns one row per code
 * @example countWarningsByCode([{ code: "W_A", message: "", count: 5 }, { code: "W_A", message: "" }]) // [{ code: "W_A", warnings: 2, samples: 6 }]
 */
export function countWarningsByCode(warnings: readonly Warning[]): { code: string; warnings: number; samples: number }[] {
  const m = new Map<string, { warnings: number; samples: number }>();
  for (const w of warnings) {
    const e = m.get(w.code) ?? { warnings: 0, samples: 0 };
    e.warnings += 1;
    e.samples += w.count ?? 1;
    m.set(w.code, e);
  }
  return [...m.entries()].sort((a, b) => (a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : 0)).map(([code, e]) => ({ code, ...e }));
}

/**
 * Report section: the well's findings ({@link reportWellFindingLines}) and the warnings of
 * every stage counted by code.
 * @param input one well's report input
 * @param id element id of the section
 * @returns HTML of the section
 * @example reportFindingsSection(a1, "well-1-findings").includes("counted by code") // true
 */
export function reportFindingsSection(input: WellReportInput, id: string): string {
  const lines = reportWellFindingLines(input);
  let html =
    lines.length > 0
      ? table("findings", ["Kind", "Code", "Top (ft)", "Base (ft)", "Finding"], lines.map((f) => [reportTextCell(f.group), reportTextCell(f.code), reportNumberCell(f.topFt, 1), reportNumberCell(f.baseFt, 1), reportTextCell(f.message)]))
      : note("No window, casing, stress or calibration finding.");
  const all = [...input.prediction.warnings, ...input.stressWindow.warnings, ...(input.uncertainty?.warnings ?? [])];
  const counted = countWarningsByCode(all);
  html +=
    counted.length > 0
      ? table("warnings", ["Warning code", "Warnings", "Samples affected"], counted.map((c) => [reportTextCell(c.code), reportNumberCell(c.warnings, 0, "warnings"), reportNumberCell(c.samples, 0, "samples")]), "Warnings of every stage, counted by code")
      : note("No warnings from the computing stages.");
  return section(id, "Findings", html);
}
