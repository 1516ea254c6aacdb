/**
 * The picking page's HTML: controls, two SVG tracks (filled by the browser bundle), a status
 * line and the safety caution. Everything inline; the page loads nothing from outside.
 */
import { escapeHtml } from "../present/escapeHtml.js";
import {
  OKABE_ITO_BLACK,
  OKABE_ITO_BLUE,
  OKABE_ITO_VERMILLION,
} from "../present/palette.js";

/**
 * Build the page.
 * @param wellName well name (free text from the file; escaped here)
 * @param caution caution text (escaped here)
 * @param bundle browser script (inlined; `</script` sequences are neutralised)
 * @param nonce CSP nonce for the inline script
 * @returns HTML text
 * @example pickerPageHtml({ wellName: "Quillon A-1", caution: "…", bundle: "", nonce: "abc" }).includes('id="pp-readout"') // true
 */
export function pickerPageHtml({ wellName, caution, bundle, nonce }: { wellName: string; caution: string; bundle: string; nonce: string }): string {
  const safeBundle = bundle.replace(/<\/script/gi, "<\\/script").replace(/<!--/g, "<\\!--");
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Trend picking — ${escapeHtml(wellName)}</title>
<style>
  body { font-family: sans-serif; margin: 12px; color: ${OKABE_ITO_BLACK}; background: #FFFFFF; }
  h1 { font-size: 18px; margin: 0 0 8px 0; }
  .bar { display: flex; flex-wrap: wrap; gap: 12px; align-items: center; margin-bottom: 8px; font-size: 13px; }
  .bar label { display: flex; gap: 4px; align-items: center; }
  .tracks { display: flex; gap: 16px; }
  svg { border: 1px solid #999; background: #FFFFFF; user-select: none; touch-action: none; }
  #status { min-height: 1.4em; font-size: 13px; margin: 6px 0; white-space: pre-wrap; }
  #status.bad { color: ${OKABE_ITO_VERMILLION}; font-weight: bold; }
  #pp-readout { font-size: 15px; font-weight: bold; color: ${OKABE_ITO_BLUE}; }
  .caution { border-left: 6px solid ${OKABE_ITO_VERMILLION}; padding: 6px 10px; margin: 8px 0; font-size: 12px; max-width: 980px; }
  .hint { font-size: 12px; color: #444; max-width: 980px; }
  button { font-size: 13px; }
</style>
</head>
<body>
<h1>Normal compaction trend — ${escapeHtml(wellName)}</h1>
<div class="caution" role="note">${escapeHtml(caution)}</div>
<div class="bar">
  <label>Trend model
    <select id="trend-kind">
      <option value="sonicLogLinear">sonic, semilog (Hottman &amp; Johnson 1965)</option>
      <option value="sonicExponential">sonic, exponential to matrix (Zhang 2011)</option>
      <option value="resistivityLogLinear">resistivity, exponential (Zhang 2011)</option>
    </select>
  </label>
  <label>Δtm, µs/ft <input id="dt-matrix" type="number" step="1" min="30" max="120" style="width:5em"></label>
  <label>Fit <select id="fit-method"><option value="leastSquares">least squares</option><option value="huber">Huber (robust)</option></select></label>
  <button id="fit-button" type="button">Fit on selected intervals</button>
  <button id="clear-intervals" type="button">Clear intervals</button>
  <button id="save-button" type="button">Save trend</button>
</div>
<div class="bar">
  <label>Read pore pressure at TVD, ft <input id="readout-depth" type="number" step="10" style="width:7em"></label>
  <span id="pp-readout" data-pp-psi="" data-tvd-ft="" data-point-index="">—</span>
  <span id="trend-params"></span>
</div>
<div id="status" role="status" aria-live="polite"></div>
<div class="tracks">
  <svg id="log-track" width="520" height="720" aria-label="shale points and trend against depth"></svg>
  <svg id="pressure-track" width="420" height="720" aria-label="pore pressure against depth"></svg>
</div>
<p class="hint">Drag the two round handles to move the trend. Drag down the shaded strip at the left edge of the log track
to select a depth interval; click a selected interval to remove it. "Fit" refits the trend on the shale points in the
selected intervals. Pore pressure (Eaton 1975: exponent 3.0 for sonic, 1.2 for resistivity) is recomputed in the page on
every change. Click a depth on either track to read the pore pressure at the nearest shale point.</p>
<script nonce="${escapeHtml(nonce)}">${safeBundle}</script>
</body>
</html>
`;
}
