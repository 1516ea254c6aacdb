/**
 * Write one figure as a PNG with headless Chromium (for the CLI and for reports that need
 * an image). Chromium is an optional system program: when it is absent the function says so
 * in its result instead of throwing.
 */
import { execFile } from "node:child_process";
import { copyFileSync, existsSync, mkdtempSync, renameSync, rmSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { pathToFileURL } from "node:url";
import { ShalepointError } from "../../errors.js";
import type { FigureSpec } from "../figureSpec.js";
import { jsonForScript } from "../escapeHtml.js";
import { plotlyBundleHtml } from "../notebookDisplay.js";

/** Where Chromium is looked for when no path is given (Debian's package). */
export const DEFAULT_CHROMIUM_PATH = "/usr/bin/chromium";

/** Chromium switches for a one-shot offline screenshot (no sandbox for containers; no network services). */
export const CHART_PNG_CHROMIUM_FLAGS: readonly string[] = Object.freeze([
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--hide-scrollbars",
  "--virtual-time-budget=5000",
]);

/** Result of {@link renderChartPng}. */
export interface ChartPngResult {
  written: boolean;
  /** Why nothing was written (Chromium missing, Chromium failed, empty output). */
  reason?: string;
}

/** The minimal page: plotly, one full-window figure, static (no mode bar). */
function chartPageHtml(figure: FigureSpec, widthPx: number, heightPx: number, plotlyScriptHtml: string): string {
  const layout = { ...figure.layout, width: widthPx, height: heightPx };
  const config = { ...figure.config, responsive: false, staticPlot: true, displayModeBar: false };
  return (
    `<!DOCTYPE html><html><head><meta charset="utf-8">` +
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:">` +
    `<style>html,body{margin:0;padding:0;background:#FFFFFF;overflow:hidden}</style>${plotlyScriptHtml}</head>` +
    `<body><div id="chart" style="width:${widthPx}px;height:${heightPx}px"></div><script>` +
    `window.Plotly.newPlot(document.getElementById("chart"), ${jsonForScript(figure.data)}, ${jsonForScript(layout)}, ${jsonForScript(config)});` +
    `</script></body></html>`
  );
}

function runChromium(path: string, args: string[], timeoutMs: number): Promise<{ ok: boolean; message: string }> {
  return new Promise((done) => {
    execFile(path, args, { timeout: timeoutMs, maxBuffer: 4 * 1024 * 1024 }, (error, _stdout, stderr) => {
      done(error ? { ok: false, message: `${error.message} ${String(stderr).slice(-400)}`.trim() } : { ok: true, message: "" });
    });
  });
}

/**
 * Render a figure to a PNG file with headless Chromium: writes a minimal page (plotly bundle
 * and the figure, sized widthPx × heightPx) into a fresh temporary folder, has Chromium take
 * a screenshot of it with a fresh profile, and moves the image into place atomically (written
 * under a temporary name next to `outPath`, then renamed). No network request is made; the
 * temporary folder is removed afterwards.
 *
 * @param figure the figure (e.g. from wellPressureFigure or pressureDepthFigure)
 * @param outPath PNG file to write (folder must exist)
 * @param widthPx, heightPx image size in CSS pixels, integers 100–8000 (typical 1000 × 1200)
 * @param chromiumPath Chromium executable (default /usr/bin/chromium)
 * @param timeoutMs how long Chromium may take, ms (default 60,000)
 * @param plotlyScriptHtml script element loading plotly (default the inlined bundle)
 * @returns `{ written: true }`, or `{ written: false, reason }` when Chromium is missing or fails
 * @throws ShalepointError E_RANGE for a size outside 100–8000 px; E_FILE when the output folder
 *   does not exist
 * @example await renderChartPng({ figure, outPath: "a1-pressure.png", widthPx: 1000, heightPx: 1200 })
 *   // { written: true } (or { written: false, reason: "Chromium not found at /usr/bin/chromium …" })
 */
export async function renderChartPng({
  figure,
  outPath,
  widthPx,
  heightPx,
  chromiumPath = DEFAULT_CHROMIUM_PATH,
  timeoutMs = 60_000,
  plotlyScriptHtml,
}: {
  figure: FigureSpec;
  outPath: string;
  widthPx: number;
  heightPx: number;
  chromiumPath?: string;
  timeoutMs?: number;
  plotlyScriptHtml?: string;
}): Promise<ChartPngResult> {
  for (const [param, v] of [["widthPx", widthPx], ["heightPx", heightPx]] as const) {
    if (!Number.isInteger(v) || v < 100 || v > 8000) {
      throw new ShalepointError("E_RANGE", `${param} must be an integer number of pixels in [100, 8000]`, { param, value: v, unit: "px", allowed: "[100, 8000]" });
    }
  }
  const target = resolve(outPath);
  if (!existsSync(dirname(target))) {
    throw new ShalepointError("E_FILE", "the folder of the PNG file does not exist", { param: "outPath", value: outPath, hint: "Create the output folder first." });
  }
  if (!existsSync(chromiumPath)) {
    return { written: false, reason: `Chromium not found at ${chromiumPath}: no PNG written (install the chromium package or pass chromiumPath).` };
  }
  const work = mkdtempSync(join(tmpdir(), "shalepoint-png-"));
  const tempOut = `${target}.${process.pid}.${Date.now()}.tmp.png`;
  try {
    const page = join(work, "chart.html");
    writeFileSync(page, chartPageHtml(figure, widthPx, heightPx, plotlyScriptHtml ?? plotlyBundleHtml()), "utf8");
    const shot = join(work, "shot.png");
    const run = await runChromium(
      chromiumPath,
      [...CHART_PNG_CHROMIUM_FLAGS, `--user-data-dir=${join(work, "profile")}`, `--screenshot=${shot}`, `--window-size=${widthPx},${heightPx}`, pathToFileURL(page).href],
      timeoutMs,
    );
    if (!existsSync(shot) || statSync(shot).size === 0) {
      return { written: false, reason: `Chromium did not write a screenshot${run.ok ? "" : `: ${run.message}`}` };
    }
    // Copy (the temp folder may be on another file system), then rename in the target folder.
    copyFileSync(shot, tempOut);
    renameSync(tempOut, target);
    return { written: true };
  } catch (cause) {
    return { written: false, reason: `PNG not written: ${String(cause).slice(0, 300)}` };
  } finally {
    rmSync(work, { recursive: true, force: true });
    rmSync(tempOut, { force: true });
  }
}
