/**
 * Browser side of the trend-picking page (bundled into one IIFE by esbuild).
 *
 * Imports the core trend and Eaton modules directly, so every drag recomputes the trend and
 * the pore pressure in the page, with no round trip to the server. Draws plain SVG.
 * Text from the server or from errors is set with textContent only (never parsed as HTML).
 */
import { fitCompactionTrend } from "../../trend/fitCompactionTrend.js";
import { evaluateCompactionTrend } from "../../trend/evaluateCompactionTrend.js";
import type { BmlInterval, CompactionTrend, CompactionTrendKind, TrendFitMethod } from "../../trend/trendTypes.js";
import {
  handlesFromTrend,
  nearestPointIndex,
  numbersOrNaN,
  pickerPorePressure,
  trendFromHandles,
  trendLogOf,
  type PickerPorePressure,
  type PickerWellData,
  type TrendHandle,
} from "../pickerModel.js";

// Okabe–Ito colour-blind-safe palette (Okabe & Ito 2008), as in present/palette.ts.
const BLACK = "#000000";
const ORANGE = "#E69F00";
const SKY_BLUE = "#56B4E9";
const BLUISH_GREEN = "#009E73";
const BLUE = "#0072B2";
const VERMILLION = "#D55E00";
const REDDISH_PURPLE = "#CC79A7";
const SVG_NS = "http://www.w3.org/2000/svg";
const TOKEN_HEADER = "x-shalepoint-token";
const PSI_PER_FT_PER_PPG = 12 / 231;

interface PageState {
  data: PickerWellData;
  kind: CompactionTrendKind;
  trend: CompactionTrend;
  handles: [TrendHandle, TrendHandle];
  intervals: BmlInterval[];
  readoutIndex: number;
  pp: PickerPorePressure;
}

const token = new URLSearchParams(window.location.search).get("token") ?? "";
const $ = <T extends HTMLElement>(id: string): T => document.getElementById(id) as T;

function setStatus(text: string, bad = false): void {
  const el = $("status");
  el.textContent = text;
  el.className = bad ? "bad" : "";
}

function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

function svgEl(name: string, attrs: Record<string, string | number>, parent: Element): SVGElement {
  const el = document.createElementNS(SVG_NS, name);
  for (const [k, v] of Object.entries(attrs)) el.setAttribute(k, String(v));
  parent.appendChild(el);
  return el;
}

function svgText(text: string, attrs: Record<string, string | number>, parent: Element): void {
  const el = svgEl("text", { "font-size": 11, fill: BLACK, ...attrs }, parent);
  el.textContent = text;
}

// ---- geometry ------------------------------------------------------------------------------
const TOP = 34;
const BOTTOM = 700;
const LOG = { strip0: 40, strip1: 58, x0: 64, x1: 508 };
const PRESS = { x0: 50, x1: 408, emwMin: 8, emwMax: 20 };

function depthRange(data: PickerWellData): { min: number; max: number } {
  const z = data.points.tvdFt;
  const lo = Math.max(data.mudlineTvdFt, z[0] - 200);
  return { min: Math.floor(lo / 500) * 500, max: Math.ceil((z[z.length - 1] + 200) / 500) * 500 };
}
function yOf(state: PageState, tvdFt: number): number {
  const r = depthRange(state.data);
  return TOP + ((tvdFt - r.min) / (r.max - r.min)) * (BOTTOM - TOP);
}
function tvdOf(state: PageState, y: number): number {
  const r = depthRange(state.data);
  return r.min + ((y - TOP) / (BOTTOM - TOP)) * (r.max - r.min);
}
function valueRange(kind: CompactionTrendKind): { lo: number; hi: number; label: string } {
  return trendLogOf(kind) === "sonic" ? { lo: 40, hi: 250, label: "shale slowness, µs/ft (log scale)" } : { lo: 0.2, hi: 20, label: "shale deep resistivity, ohm·m (log scale)" };
}
function xOfValue(kind: CompactionTrendKind, v: number): number {
  const r = valueRange(kind);
  return LOG.x0 + ((Math.log10(v) - Math.log10(r.lo)) / (Math.log10(r.hi) - Math.log10(r.lo))) * (LOG.x1 - LOG.x0);
}
function valueOfX(kind: CompactionTrendKind, x: number): number {
  const r = valueRange(kind);
  return 10 ** (Math.log10(r.lo) + ((x - LOG.x0) / (LOG.x1 - LOG.x0)) * (Math.log10(r.hi) - Math.log10(r.lo)));
}
function xOfEmw(ppg: number): number {
  return PRESS.x0 + ((ppg - PRESS.emwMin) / (PRESS.emwMax - PRESS.emwMin)) * (PRESS.x1 - PRESS.x0);
}
function localPoint(svg: SVGSVGElement, ev: PointerEvent | MouseEvent): { x: number; y: number } {
  const r = svg.getBoundingClientRect();
  return { x: ev.clientX - r.left, y: ev.clientY - r.top };
}

// ---- state changes ---------------------------------------------------------------------------
function pointValues(state: PageState): number[] {
  return trendLogOf(state.kind) === "sonic" ? state.data.points.dtUsPerFt : state.data.points.resistivityOhmM;
}
function handleDepths(state: PageState): [number, number] {
  const b = numbersOrNaN(state.data.points.bmlFt).filter(Number.isFinite);
  const lo = Math.max(0, b[0]);
  const hi = b[b.length - 1];
  return [Math.round(lo + 0.15 * (hi - lo)), Math.round(lo + 0.85 * (hi - lo))];
}
function dtMatrix(): number {
  return Number(($("dt-matrix") as HTMLInputElement).value);
}

function recompute(state: PageState): void {
  state.pp = pickerPorePressure({ points: state.data.points, trend: state.trend });
}

function setTrend(state: PageState, trend: CompactionTrend, moveHandles: boolean): void {
  state.trend = trend;
  state.kind = trend.kind;
  if (moveHandles) {
    const [a, b] = handleDepths(state);
    state.handles = handlesFromTrend({ trend, topBmlFt: a, baseBmlFt: b });
  }
  recompute(state);
}

function fitNow(state: PageState, kind: CompactionTrendKind): void {
  const method = ($("fit-method") as HTMLSelectElement).value as TrendFitMethod;
  const fit = fitCompactionTrend({
    kind,
    bmlFt: numbersOrNaN(state.data.points.bmlFt),
    values: numbersOrNaN(trendLogOf(kind) === "sonic" ? state.data.points.dtUsPerFt : state.data.points.resistivityOhmM),
    intervals: state.intervals,
    method,
    dtMatrixUsPerFt: kind === "sonicExponential" ? dtMatrix() : undefined,
  });
  const d = fit.diagnostics;
  const trend = {
    kind,
    segments: [{
      topBmlFt: 0,
      params: fit.params,
      fittedOn: {
        method,
        intervals: state.intervals.map((iv) => ({ topBmlFt: iv.topBmlFt, baseBmlFt: iv.baseBmlFt })),
        n: d.n,
        rSquared: Number.isFinite(d.rSquared) ? d.rSquared : null,
        residualStd: Number.isFinite(d.residualStd) ? d.residualStd : null,
        depthRange: d.depthRange,
      },
    }],
  } as CompactionTrend;
  setTrend(state, trend, true);
  const warn = d.warnings.map((w) => w.message).join("; ");
  setStatus(`Fitted ${kind} on ${d.n} shale points (R² ${d.rSquared.toFixed(3)}).${warn ? " " + warn : ""}`, false);
}

function moveHandle(state: PageState, which: 0 | 1, bmlFt: number, value: number): void {
  const next: [TrendHandle, TrendHandle] = [{ ...state.handles[0] }, { ...state.handles[1] }];
  next[which] = { bmlFt: Math.max(0, bmlFt), value };
  try {
    const trend = trendFromHandles({ kind: state.kind, handles: next, dtMatrixUsPerFt: state.kind === "sonicExponential" ? dtMatrix() : undefined });
    evaluateCompactionTrend({ trend, bmlFt: [0, 40000] }); // refuses overflowing trends before they are shown
    state.handles = next;
    setTrend(state, trend, false);
    setStatus("Trend moved by hand (not fitted).");
  } catch (e) {
    setStatus(errorText(e), true);
  }
}

function paramsText(trend: CompactionTrend): string {
  const p = trend.segments[0].params as unknown as Record<string, number>;
  return Object.entries(p).map(([k, v]) => `${k} ${Math.abs(v) < 0.01 ? v.toExponential(3) : v.toPrecision(5)}`).join(", ");
}

function updateReadout(state: PageState): void {
  const el = $("pp-readout");
  const i = state.readoutIndex;
  const z = state.data.points.tvdFt[i];
  const pp = i >= 0 ? state.pp.ppPsi[i] : NaN;
  el.dataset.ppPsi = Number.isFinite(pp) ? String(pp) : "";
  el.dataset.tvdFt = i >= 0 ? String(z) : "";
  el.dataset.pointIndex = String(i);
  el.textContent = Number.isFinite(pp)
    ? `Pore pressure ${pp.toFixed(0)} psi = ${(pp / (PSI_PER_FT_PER_PPG * z)).toFixed(2)} ppg EMW at ${z.toFixed(0)} ft TVD (shale point ${i})`
    : "no pore pressure at that depth (no shale point with a log value)";
  const paramsEl = $("trend-params");
  paramsEl.dataset.trend = JSON.stringify(state.trend);
  paramsEl.textContent = `${state.kind}: ${paramsText(state.trend)}${state.trend.segments[0].fittedOn ? " (fitted)" : " (by hand)"}`;
}

function chooseReadout(state: PageState, tvdFt: number): void {
  state.readoutIndex = nearestPointIndex({ tvdFt: state.data.points.tvdFt, values: pointValues(state), targetTvdFt: tvdFt });
  ($("readout-depth") as HTMLInputElement).value = String(Math.round(tvdFt));
  updateReadout(state);
  draw(state);
}

// ---- drawing -------------------------------------------------------------------------------
function drawDepthAxis(state: PageState, svg: Element, x: number): void {
  const r = depthRange(state.data);
  const step = r.max - r.min > 8000 ? 1000 : 500;
  for (let z = r.min; z <= r.max; z += step) {
    const y = yOf(state, z);
    svgEl("line", { x1: x, x2: x + 4, y1: y, y2: y, stroke: BLACK }, svg);
    svgText(String(z), { x: x - 2, y: y + 4, "text-anchor": "end", "font-size": 10 }, svg);
  }
  svgText("TVD, ft", { x: 4, y: 16 }, svg);
}

function drawLogTrack(state: PageState): void {
  const svg = $("log-track") as unknown as SVGSVGElement;
  svg.replaceChildren();
  const kind = state.kind;
  const vr = valueRange(kind);
  svgEl("rect", { x: LOG.x0, y: TOP, width: LOG.x1 - LOG.x0, height: BOTTOM - TOP, fill: "none", stroke: BLACK, class: "plot-area" }, svg);
  svgEl("rect", { x: LOG.strip0, y: TOP, width: LOG.strip1 - LOG.strip0, height: BOTTOM - TOP, fill: "#EEEEEE", stroke: BLACK, id: "interval-strip", style: "cursor:ns-resize" }, svg);
  drawDepthAxis(state, svg, LOG.strip0 - 6);
  svgText(vr.label, { x: (LOG.x0 + LOG.x1) / 2, y: 14, "text-anchor": "middle" }, svg);
  for (let d = 1; d <= 1000; d *= 10) {
    for (const m of [1, 2, 5]) {
      const v = (m * d) / (trendLogOf(kind) === "sonic" ? 1 : 10);
      if (v < vr.lo || v > vr.hi) continue;
      const x = xOfValue(kind, v);
      svgEl("line", { x1: x, x2: x, y1: TOP, y2: BOTTOM, stroke: "#DDDDDD" }, svg);
      svgText(String(v), { x, y: TOP - 4, "text-anchor": "middle", "font-size": 10 }, svg);
    }
  }
  const mud = state.data.mudlineTvdFt;
  state.intervals.forEach((iv, k) => {
    const y0 = yOf(state, iv.topBmlFt + mud);
    const y1 = yOf(state, iv.baseBmlFt + mud);
    svgEl("rect", { x: LOG.x0, y: y0, width: LOG.x1 - LOG.x0, height: Math.max(1, y1 - y0), fill: BLUISH_GREEN, "fill-opacity": 0.12 }, svg);
    svgEl("rect", {
      x: LOG.strip0, y: y0, width: LOG.strip1 - LOG.strip0, height: Math.max(2, y1 - y0), fill: BLUISH_GREEN,
      class: "interval", "data-index": k, style: "cursor:pointer",
    }, svg);
  });
  const pts = state.data.points;
  const values = pointValues(state);
  for (let i = 0; i < pts.tvdFt.length; i++) {
    const v = values[i];
    if (typeof v !== "number" || !(v > 0)) continue;
    const b = pts.bmlFt[i];
    const inside = state.intervals.some((iv) => b >= iv.topBmlFt && b <= iv.baseBmlFt);
    svgEl("circle", { cx: xOfValue(kind, v), cy: yOf(state, pts.tvdFt[i]), r: 2.2, fill: inside ? BLUE : SKY_BLUE }, svg);
  }
  // Trend line.
  const r = depthRange(state.data);
  const zs: number[] = [];
  for (let k = 0; k <= 120; k++) zs.push(Math.max(0, r.min - mud + ((r.max - r.min) * k) / 120));
  const tv = evaluateCompactionTrend({ trend: state.trend, bmlFt: zs });
  const path = zs
    .map((z, k) => `${k === 0 ? "M" : "L"}${Math.min(Math.max(xOfValue(kind, tv[k]), LOG.x0 - 2), LOG.x1 + 2).toFixed(1)},${yOf(state, z + mud).toFixed(1)}`)
    .join(" ");
  svgEl("path", { d: path, fill: "none", stroke: VERMILLION, "stroke-width": 2, id: "trend-line" }, svg);
  state.handles.forEach((h, k) => {
    svgEl("circle", {
      cx: xOfValue(kind, h.value), cy: yOf(state, h.bmlFt + mud), r: 7, fill: ORANGE, stroke: BLACK, "stroke-width": 1.5,
      id: `trend-handle-${k}`, class: "handle", "data-handle": k, style: "cursor:move",
    }, svg);
  });
  if (state.readoutIndex >= 0) {
    const y = yOf(state, pts.tvdFt[state.readoutIndex]);
    svgEl("line", { x1: LOG.x0, x2: LOG.x1, y1: y, y2: y, stroke: REDDISH_PURPLE, "stroke-dasharray": "4 3" }, svg);
  }
}

function drawPressureTrack(state: PageState): void {
  const svg = $("pressure-track") as unknown as SVGSVGElement;
  svg.replaceChildren();
  svgEl("rect", { x: PRESS.x0, y: TOP, width: PRESS.x1 - PRESS.x0, height: BOTTOM - TOP, fill: "none", stroke: BLACK, class: "plot-area" }, svg);
  drawDepthAxis(state, svg, PRESS.x0 - 6);
  svgText("equivalent mud weight, ppg", { x: (PRESS.x0 + PRESS.x1) / 2, y: 14, "text-anchor": "middle" }, svg);
  for (let e = PRESS.emwMin; e <= PRESS.emwMax; e += 2) {
    const x = xOfEmw(e);
    svgEl("line", { x1: x, x2: x, y1: TOP, y2: BOTTOM, stroke: "#DDDDDD" }, svg);
    svgText(String(e), { x, y: TOP - 4, "text-anchor": "middle", "font-size": 10 }, svg);
  }
  const prof = state.data.profile;
  const line = (vals: number[], colour: string, id: string): void => {
    const d: string[] = [];
    for (let i = 0; i < prof.tvdFt.length; i++) {
      const z = prof.tvdFt[i];
      const e = vals[i] / (PSI_PER_FT_PER_PPG * z);
      if (!Number.isFinite(e) || z <= state.data.mudlineTvdFt) continue;
      d.push(`${d.length === 0 ? "M" : "L"}${xOfEmw(Math.min(Math.max(e, PRESS.emwMin - 0.5), PRESS.emwMax + 0.5)).toFixed(1)},${yOf(state, z).toFixed(1)}`);
    }
    svgEl("path", { d: d.join(" "), fill: "none", stroke: colour, "stroke-width": 1.5, id }, svg);
  };
  line(prof.phPsi, BLUE, "hydrostatic-line");
  line(prof.svPsi, BLACK, "overburden-line");
  const pts = state.data.points;
  for (let i = 0; i < pts.tvdFt.length; i++) {
    const e = state.pp.emwPpg[i];
    if (!Number.isFinite(e)) continue;
    svgEl("circle", { cx: xOfEmw(Math.min(Math.max(e, PRESS.emwMin), PRESS.emwMax)), cy: yOf(state, pts.tvdFt[i]), r: 2, fill: VERMILLION }, svg);
  }
  if (state.readoutIndex >= 0) {
    const y = yOf(state, pts.tvdFt[state.readoutIndex]);
    svgEl("line", { x1: PRESS.x0, x2: PRESS.x1, y1: y, y2: y, stroke: REDDISH_PURPLE, "stroke-dasharray": "4 3" }, svg);
  }
  const legend: [string, string][] = [["pore pressure (Eaton)", VERMILLION], ["hydrostatic", BLUE], ["overburden", BLACK]];
  legend.forEach(([label, colour], k) => {
    svgEl("rect", { x: PRESS.x0 + 8, y: BOTTOM - 52 + k * 15, width: 10, height: 10, fill: colour }, svg);
    svgText(label, { x: PRESS.x0 + 22, y: BOTTOM - 43 + k * 15 }, svg);
  });
}

function draw(state: PageState): void {
  drawLogTrack(state);
  drawPressureTrack(state);
}

// ---- interaction -----------------------------------------------------------------------------
function wire(state: PageState): void {
  const logSvg = $("log-track") as unknown as SVGSVGElement;
  const pressSvg = $("pressure-track") as unknown as SVGSVGElement;
  let drag: { kind: "handle"; which: 0 | 1 } | { kind: "interval"; y0: number; ghost: SVGElement } | null = null;

  logSvg.addEventListener("pointerdown", (ev) => {
    const target = ev.target as Element;
    const p = localPoint(logSvg, ev);
    if (target.classList.contains("handle")) {
      drag = { kind: "handle", which: Number(target.getAttribute("data-handle")) === 1 ? 1 : 0 };
      ev.preventDefault();
    } else if (target.classList.contains("interval")) {
      const k = Number(target.getAttribute("data-index"));
      state.intervals = state.intervals.filter((_, j) => j !== k);
      setStatus("Interval removed. Press Fit to refit on the remaining intervals.");
      draw(state);
      ev.preventDefault();
    } else if (p.x >= LOG.strip0 && p.x <= LOG.strip1) {
      const ghost = svgEl("rect", { x: LOG.strip0, y: p.y, width: LOG.strip1 - LOG.strip0, height: 1, fill: BLUISH_GREEN, "fill-opacity": 0.5 }, logSvg);
      drag = { kind: "interval", y0: p.y, ghost };
      ev.preventDefault();
    } else if (p.x >= LOG.x0 && p.x <= LOG.x1 && p.y >= TOP && p.y <= BOTTOM) {
      chooseReadout(state, tvdOf(state, p.y));
    }
  });
  window.addEventListener("pointermove", (ev) => {
    if (drag === null) return;
    const p = localPoint(logSvg, ev);
    if (drag.kind === "handle") {
      const y = Math.min(Math.max(p.y, TOP), BOTTOM);
      const x = Math.min(Math.max(p.x, LOG.x0), LOG.x1);
      moveHandle(state, drag.which, tvdOf(state, y) - state.data.mudlineTvdFt, valueOfX(state.kind, x));
      updateReadout(state);
      draw(state);
    } else {
      const y0 = Math.min(drag.y0, p.y);
      drag.ghost.setAttribute("y", String(y0));
      drag.ghost.setAttribute("height", String(Math.abs(p.y - drag.y0)));
    }
  });
  window.addEventListener("pointerup", (ev) => {
    if (drag === null) return;
    const d = drag;
    drag = null;
    if (d.kind === "interval") {
      const p = localPoint(logSvg, ev);
      const mud = state.data.mudlineTvdFt;
      const a = Math.min(Math.max(Math.min(d.y0, p.y), TOP), BOTTOM);
      const b = Math.min(Math.max(Math.max(d.y0, p.y), TOP), BOTTOM);
      if (b - a >= 4) {
        const top = Math.max(0, Math.round(tvdOf(state, a) - mud));
        const base = Math.round(tvdOf(state, b) - mud);
        if (base > top) {
          state.intervals = [...state.intervals, { topBmlFt: top, baseBmlFt: base }].sort((x, y) => x.topBmlFt - y.topBmlFt);
          setStatus(`Interval ${top}–${base} ft below mudline added. Press Fit to refit.`);
        }
      }
      draw(state);
    }
  });
  pressSvg.addEventListener("pointerdown", (ev) => {
    const p = localPoint(pressSvg, ev);
    if (p.y >= TOP && p.y <= BOTTOM) chooseReadout(state, tvdOf(state, p.y));
  });
  $("readout-depth").addEventListener("change", (ev) => {
    const z = Number((ev.target as HTMLInputElement).value);
    if (Number.isFinite(z)) chooseReadout(state, z);
  });
  $("fit-button").addEventListener("click", () => {
    try {
      fitNow(state, state.kind);
    } catch (e) {
      setStatus(errorText(e), true);
    }
    updateReadout(state);
    draw(state);
  });
  $("clear-intervals").addEventListener("click", () => {
    state.intervals = [];
    setStatus("Intervals cleared. Drag down the strip at the left to select new ones.");
    draw(state);
  });
  $("trend-kind").addEventListener("change", (ev) => {
    const kind = (ev.target as HTMLSelectElement).value as CompactionTrendKind;
    try {
      fitNow(state, kind);
    } catch (e) {
      // No fit possible (e.g. no shale points in the intervals): show the model at default handles.
      const [a, b] = handleDepths(state);
      const defaults: [number, number] = trendLogOf(kind) === "sonic" ? [160, 95] : [0.7, 1.8];
      try {
        state.kind = kind;
        state.handles = [{ bmlFt: a, value: defaults[0] }, { bmlFt: b, value: defaults[1] }];
        setTrend(state, trendFromHandles({ kind, handles: state.handles, dtMatrixUsPerFt: dtMatrix() }), false);
        setStatus(`Could not fit ${kind}: ${errorText(e)} Showing a default trend; drag its handles.`, true);
      } catch (e2) {
        setStatus(errorText(e2), true);
      }
    }
    state.readoutIndex = nearestPointIndex({ tvdFt: state.data.points.tvdFt, values: pointValues(state), targetTvdFt: Number(($("readout-depth") as HTMLInputElement).value) });
    updateReadout(state);
    draw(state);
  });
  $("dt-matrix").addEventListener("change", () => {
    if (state.kind !== "sonicExponential") return;
    try {
      const trend = trendFromHandles({ kind: state.kind, handles: state.handles, dtMatrixUsPerFt: dtMatrix() });
      setTrend(state, trend, false);
      setStatus("Matrix slowness changed; trend redrawn through the handles.");
    } catch (e) {
      setStatus(errorText(e), true);
    }
    updateReadout(state);
    draw(state);
  });
  $("save-button").addEventListener("click", () => {
    void save(state);
  });
}

async function save(state: PageState): Promise<void> {
  const doc = { format: "shalepoint-trend", version: 1, kind: state.trend.kind, segments: state.trend.segments };
  setStatus("Saving…");
  try {
    const res = await fetch("/save", {
      method: "POST",
      headers: { "content-type": "application/json", [TOKEN_HEADER]: token },
      body: JSON.stringify(doc),
    });
    const body = (await res.json()) as { ok?: boolean; file?: string; error?: { code: string; message: string } };
    if (res.ok && body.ok) {
      setStatus(`Saved ${body.file ?? ""} in the well folder.`);
      document.body.dataset.saved = body.file ?? "";
    } else {
      setStatus(`Not saved: ${body.error?.message ?? res.statusText}`, true);
    }
  } catch (e) {
    setStatus(`Not saved: ${errorText(e)}`, true);
  }
}

async function main(): Promise<void> {
  const res = await fetch("/data", { headers: { [TOKEN_HEADER]: token } });
  if (!res.ok) {
    const body = (await res.json().catch(() => ({}))) as { error?: { message: string } };
    setStatus(`Cannot load the well: ${body.error?.message ?? res.statusText}`, true);
    return;
  }
  const data = (await res.json()) as PickerWellData;
  ($("dt-matrix") as HTMLInputElement).value = String(data.dtMatrixUsPerFt);
  ($("trend-kind") as HTMLSelectElement).value = data.trend.kind;
  const state = { data, kind: data.trend.kind, trend: data.trend, intervals: data.intervals.map((iv) => ({ ...iv })), readoutIndex: -1 } as PageState;
  setTrend(state, data.trend, true);
  const b = numbersOrNaN(data.points.tvdFt);
  const target = b[0] + 0.75 * (b[b.length - 1] - b[0]);
  wire(state);
  chooseReadout(state, Math.round(target));
  setStatus(`Loaded ${data.points.tvdFt.length} shale points; first trend: ${data.trendSource}.`);
  document.body.dataset.ready = "1";
}

main().catch((e) => setStatus(`Page error: ${errorText(e)}`, true));
