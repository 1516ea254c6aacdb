/**
 * The self-contained HTML prediction report: one file that opens offline (the plotly
 * bundle inlined once, no external request of any kind), prints cleanly, and shows for
 * every well the header, inputs and log quality, trends, the pressure–depth chart,
 * compartments, calibration, window and casing, and findings; at study level the offset
 * comparison and the provenance. The safety caution stands at the top and the bottom.
 */
import { escapeHtml } from "../escapeHtml.js";
import { SAFETY_CAUTION_TEXT } from "../caution.js";
import { figureHtml, plotlyBundleHtml } from "../notebookDisplay.js";
import { OKABE_ITO } from "../palette.js";
import { reportNumberCell, reportTextCell } from "./formatReportNumber.js";
import { offsetComparisonFigure, wellPressureFigure } from "./reportFigures.js";
import {
  reportCalibrationSection,
  reportCompartmentSection,
  reportInputsSection,
  reportFindingsSection,
  reportHeaderSection,
  reportTrendSection,
  reportWindowSection,
} from "./reportSections.js";
import type { RenderStudyReportOptions, StudyReportInput } from "./reportTypes.js";

/** The report's own stylesheet: screen and print (A4/Letter), Okabe–Ito accents. */
const REPORT_CSS = `
:root { --ink: ${OKABE_ITO.black}; --accent: ${OKABE_ITO.blue}; --warn: ${OKABE_ITO.vermillion}; }
* { box-sizing: border-box; }
body { font-family: "DejaVu Sans", Arial, Helvetica, sans-serif; color: var(--ink); background: #FFFFFF; margin: 0 auto; max-width: 1200px; padding: 16px 24px; font-size: 14px; line-height: 1.4; }
h1 { font-size: 24px; margin: 8px 0 4px; }
h2 { font-size: 20px; border-bottom: 3px solid var(--accent); padding-bottom: 4px; margin-top: 32px; }
h3 { font-size: 16px; margin: 20px 0 8px; color: var(--accent); }
.caution { border-left: 6px solid var(--warn); padding: 8px 12px; margin: 12px 0; background: #FFFFFF; }
.caution strong { color: var(--warn); }
.note { font-style: italic; margin: 6px 0; }
table { border-collapse: collapse; margin: 8px 0 16px; font-size: 12.5px; }
caption { text-align: left; font-weight: bold; padding: 4px 0; }
th, td { border: 1px solid #999999; padding: 3px 6px; vertical-align: top; }
th { background: #EEEEEE; text-align: left; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
nav ol { columns: 2; }
.shalepoint-figure { border: 1px solid #DDDDDD; margin: 8px 0; }
.meta { color: #444444; font-size: 12px; }
@media print {
  body { max-width: none; padding: 0; font-size: 11px; }
  nav, details > summary { display: none; }
  details { display: block; }
  section.well { break-before: page; }
  .block, table, .shalepoint-figure { break-inside: avoid; }
  h2, h3 { break-after: avoid; }
  a { color: inherit; text-decoration: none; }
}
@page { margin: 15mm; }
`;

/** Content-Security-Policy of the report: inline script and style only, nothing fetched. */
export const REPORT_CONTENT_SECURITY_POLICY = "default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:";

function cautionBlock(text: string, where: "top" | "bottom"): string {
  return `<div class="caution" role="note" id="caution-${where}"><strong>Caution.</strong> ${escapeHtml(text.replace(/^Caution:\s*/, ""))}</div>`;
}

/**
 * Render a study (one or more wells) as one self-contained HTML page.
 *
 * Every piece of text from files or results is HTML-escaped; data handed to scripts is
 * written with jsonForScript (no `</script>` break-out); numbers in tables are formatted by
 * one rule with the raw value in `data-value`. The page loads nothing from the network
 * (a Content-Security-Policy forbids it) and inlines the plotly bundle once.
 *
 * @param input the study: title, wells (prediction, stress window, tables, optional QC,
 *   uncertainty and compartments), provenance, optional findings and caution text
 * @param options optional plotly script and chart height, see {@link RenderStudyReportOptions}
 * @returns the HTML text (≈ 10 MB with the plotly bundle)
 * @throws ShalepointError E_MISSING_DEPENDENCY when the plotly bundle is not installed and no
 *   script is given; errors of the figure builders for malformed input
 * @example writeFileSync("report.html", renderStudyReport({ title: "Quillon A-1 study", wells: [a1], provenance }))
 */
export function renderStudyReport(input: StudyReportInput, options: RenderStudyReportOptions = {}): string {
  const caution = input.caution ?? SAFETY_CAUTION_TEXT;
  const chartHeight = options.chartHeightPx ?? 800;
  const wells = input.wells;
  const nav: string[] = [];
  const parts: string[] = [];

  wells.forEach((w, k) => {
    const base = `well-${k + 1}`;
    nav.push(`<li><a href="#${base}">${escapeHtml(w.well.name)}</a></li>`);
    const fig = wellPressureFigure(w, chartHeight);
    parts.push(
      `<section class="well" id="${base}" data-well-index="${k}">` +
        `<h2>${escapeHtml(w.well.name)}</h2>` +
        reportHeaderSection(w, `${base}-header`) +
        reportInputsSection(w, `${base}-inputs`) +
        reportTrendSection(w, `${base}-trends`) +
        `<section class="block" id="${base}-chart"><h3>Pressure–depth profile</h3>` +
        figureHtml(fig, { divId: `${base}-pressure-chart` }) +
        `<p class="note">EMW = pressure / (TVD below RT × 12/231 psi/ft per ppg). Depth increases downward.</p></section>` +
        reportCompartmentSection(w, `${base}-compartments`) +
        reportCalibrationSection(w, `${base}-calibration`) +
        reportWindowSection(w, `${base}-window`) +
        reportFindingsSection(w, `${base}-findings`) +
        `</section>`,
    );
  });

  let study = "";
  if (wells.length > 1) {
    study += `<section class="block" id="offset-wells"><h2>Offset wells</h2>${figureHtml(offsetComparisonFigure(wells), { divId: "offset-chart" })}</section>`;
    nav.push(`<li><a href="#offset-wells">Offset wells</a></li>`);
  }
  const sf = input.findings ?? [];
  if (sf.length > 0) {
    study +=
      `<section class="block" id="study-findings"><h2>Study findings</h2><table class="findings"><thead><tr><th>Well</th><th>Code</th><th>Top (ft)</th><th>Base (ft)</th><th>Finding</th></tr></thead><tbody>` +
      sf.map((f) => `<tr>${reportTextCell(f.well ?? "")}${reportTextCell(f.code)}${reportNumberCell(f.topFt ?? NaN, 1)}${reportNumberCell(f.baseFt ?? NaN, 1)}${reportTextCell(f.message)}</tr>`).join("") +
      `</tbody></table></section>`;
    nav.push(`<li><a href="#study-findings">Study findings</a></li>`);
  }
  const pv = input.provenance;
  study +=
    `<section class="block" id="provenance"><h2>Provenance</h2><table class="provenance"><tbody>` +
    `<tr><th scope="row">shalepoint version</th>${reportTextCell(pv.version)}</tr>` +
    `<tr><th scope="row">Configuration SHA-256</th><td><code>${escapeHtml(pv.configSha256)}</code></td></tr>` +
    (pv.generatedAt !== undefined ? `<tr><th scope="row">Generated</th>${reportTextCell(pv.generatedAt)}</tr>` : "") +
    `</tbody></table><table class="inputs"><thead><tr><th>Input file</th><th>SHA-256</th></tr></thead><tbody>` +
    pv.inputs.map((f) => `<tr>${reportTextCell(f.path)}<td><code>${escapeHtml(f.sha256)}</code></td></tr>`).join("") +
    `</tbody></table></section>`;
  nav.push(`<li><a href="#provenance">Provenance</a></li>`);

  const plotly = options.plotlyScriptHtml ?? plotlyBundleHtml();
  return (
    `<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="${REPORT_CONTENT_SECURITY_POLICY}">` +
    `<meta name="viewport" content="width=device-width, initial-scale=1">` +
    `<title>${escapeHtml(input.title)}</title><style>${REPORT_CSS}</style>${plotly}</head><body>` +
    `<header><h1>${escapeHtml(input.title)}</h1>` +
    `<p class="meta">Pore pressure and fracture gradient prediction report · ${wells.length} well${wells.length === 1 ? "" : "s"} · shalepoint ${escapeHtml(pv.version)}</p>` +
    cautionBlock(caution, "top") +
    `</header><nav><h2>Contents</h2><ol>${nav.join("")}</ol></nav><main>` +
    parts.join("") +
    study +
    `</main><footer>${cautionBlock(caution, "bottom")}</footer></body></html>\n`
  );
}
