/**
 * HTML for showing figures in a notebook (tslab `display.html(...)`) or a standalone page.
 *
 * A plotly MIME-type output is lost when a notebook is exported to HTML, so figures go out
 * as plain HTML: once per notebook the plotly bundle inlined in a `<script>`
 * ({@link plotlyBundleHtml}), then per figure a `<div>` and a `Plotly.newPlot` call
 * ({@link figureHtml}). The page then works offline.
 *
 * This is an edge module: it reads the bundle from node_modules at call time.
 */
import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import { randomUUID } from "node:crypto";
import { ShalepointError } from "../errors.js";
import type { FigureSpec } from "./figureSpec.js";
import { jsonForScript } from "./escapeHtml.js";

/**
 * File path of the plotly.js browser bundle (package `plotly.js-dist`), resolved from this
 * module so it works from any working directory.
 * @returns absolute path of `plotly.js`
 * @throws ShalepointError `E_MISSING_DEPENDENCY` when plotly.js-dist is not installed
 */
export function plotlyBundlePath(): string {
  try {
    return createRequire(import.meta.url).resolve("plotly.js-dist");
  } catch (cause) {
    throw new ShalepointError("E_MISSING_DEPENDENCY", "the plotly.js-dist package was not found", {
      param: "plotly.js-dist",
      hint: "Run `npm ci` in the shalepoint folder; figures need the plotly browser bundle.",
      value: String(cause).slice(0, 120),
    });
  }
}

/**
 * HTML that loads plotly.js into the page: the whole bundle (≈ 10 MB) inlined in one
 * `<script>`. Show it once per notebook (or page), before the first figure. Any `</script`
 * inside the bundle text is written `<\/script` (same JavaScript) so it cannot end the
 * element early.
 *
 * @returns `<script>…plotly.js…</script>`
 * @throws ShalepointError `E_MISSING_DEPENDENCY` when the bundle is not installed
 * @example display.html(plotlyBundleHtml()) // once, at the top of a notebook
 */
export function plotlyBundleHtml(): string {
  const source = readFileSync(plotlyBundlePath(), "utf8").replace(/<\/script/gi, "<\\/script");
  return `<script type="text/javascript">${source}</script>`;
}

const DIV_ID = /^[A-Za-z][A-Za-z0-9_-]{0,63}$/;

/**
 * HTML for one figure: a `<div>` and a script calling `Plotly.newPlot` with the spec.
 * The spec is embedded as script-safe JSON (no raw `<`, so text from files cannot close the
 * script). If plotly has not been loaded, the div says so instead of failing silently.
 *
 * @param figure a figure spec (e.g. from logTrackFigure or pressureDepthFigure)
 * @param divId element id, letters/digits/`-`/`_`, starting with a letter; default a random
 *   `sp-fig-…` id (unique, so several notebooks can share one page)
 * @returns `<div id="…" …></div><script>…Plotly.newPlot(…)…</script>`
 * @throws ShalepointError `E_VALUE` for an invalid `divId`
 * @example display.html(figureHtml(logTrackFigureFromWell({ well })))
 */
export function figureHtml(figure: FigureSpec, { divId }: { divId?: string } = {}): string {
  const id = divId ?? `sp-fig-${randomUUID()}`;
  if (!DIV_ID.test(id)) {
    throw new ShalepointError("E_VALUE", "invalid figure element id", {
      param: "divId",
      value: id,
      allowed: "a letter, then up to 63 letters, digits, - or _",
    });
  }
  const height = typeof figure.layout.height === "number" && figure.layout.height > 0 ? figure.layout.height : 600;
  const missing = "Figure not drawn: plotly.js is not loaded in this page (show plotlyBundleHtml() first).";
  return (
    `<div id="${id}" class="shalepoint-figure" style="width:100%;height:${height}px"></div>` +
    `<script type="text/javascript">(function () {` +
    `var el = document.getElementById(${jsonForScript(id)});` +
    `if (!el) return;` +
    `if (typeof window.Plotly === "undefined") { el.textContent = ${jsonForScript(missing)}; return; }` +
    `window.Plotly.newPlot(el, ${jsonForScript(figure.data)}, ${jsonForScript(figure.layout)}, ${jsonForScript(figure.config)});` +
    `})();</script>`
  );
}
