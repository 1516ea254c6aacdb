/**
 * Figures of the HTML prediction report: the pressure–depth chart of one well (EMW against
 * TVD) and the offset comparison of pore pressure against TVDSS across wells. Both are plain
 * FigureSpec data built on {@link pressureDepthFigure}; colours from the Okabe–Ito palette.
 */
import { PSI_PER_FT_PER_PPG } from "../../units/index.js";
import type { FigureSpec, TraceSpec } from "../figureSpec.js";
import { pressureDepthFigure, type PressureDepthSeries } from "../pressureDepthFigure.js";
import { depthAxisSpec } from "../depthAxisSpec.js";
import { escapePlotlyText } from "../escapeHtml.js";
import { OKABE_ITO, SERIES_COLOUR_ORDER } from "../palette.js";
import type { PrimaryPorePressureMethod } from "../../pipeline/predictPorePressure.js";
import type { WellReportInput } from "./reportTypes.js";

/** Display names of the pore-pressure methods (report wording). */
export const PORE_PRESSURE_METHOD_LABELS: Readonly<Record<PrimaryPorePressureMethod, string>> = {
  eatonSonic: "Eaton 1975, sonic",
  eatonResistivity: "Eaton 1975, resistivity",
  bowers: "Bowers 1995",
  equivalentDepth: "Equivalent depth (Foster & Whalen 1966)",
};

/** Most points kept per curve on a report chart (keeps the file small; every k-th sample). */
export const REPORT_MAX_CURVE_POINTS = 2500;

/** Okabe–Ito sky blue at 35 % opacity, the fill of the P10–P90 band. */
const BAND_FILL = "rgba(86,180,233,0.35)";

/**
 * Every k-th sample (k = ceil(n / maxPoints)), always keeping the last one, so a long log is
 * drawn with at most about `maxPoints` points. NaN samples are kept (they draw as gaps).
 *
 * @param n samples in the curve, ≥ 0
 * @param maxPoints most points wanted, ≥ 2, e.g. 2500
 * @returns sample indices, increasing
 * @example strideSampleIndices(10, 4) // [0, 3, 6, 9]
 */
export function strideSampleIndices(n: number, maxPoints: number): number[] {
  const k = Math.max(1, Math.ceil(n / Math.max(2, maxPoints)));
  const out: number[] = [];
  for (let i = 0; i < n; i += k) out.push(i);
  if (n > 0 && out[out.length - 1] !== n - 1) out.push(n - 1);
  return out;
}

function pick(values: ArrayLike<number>, idx: readonly number[]): Float64Array {
  const out = new Float64Array(idx.length);
  for (let j = 0; j < idx.length; j++) out[j] = values[idx[j]];
  return out;
}

/** Stair line through intervals (from, to, value) with a NaN break between intervals. */
function stairs(intervals: readonly { fromFt: number; toFt: number; value: number }[]): { tvdFt: number[]; values: number[] } {
  const tvdFt: number[] = [];
  const values: number[] = [];
  for (const s of intervals) {
    tvdFt.push(s.fromFt, s.toFt, s.toFt);
    values.push(s.value, s.value, NaN);
  }
  return { tvdFt, values };
}

/** Mud weight (psi/ft) in use at a depth, from the mud-weight table; NaN when none covers it. */
function mudWeightAt(input: WellReportInput, tvdFt: number): number {
  for (const m of input.tables.mudWeights ?? []) if (tvdFt >= m.tvdFromFt && tvdFt <= m.tvdToFt) return m.mudWeightPsiPerFt;
  return NaN;
}

/**
 * The pressure–depth chart of one well, in equivalent mud weight (ppg) against TVD below RT
 * (depth down): hydrostatic, overburden, pore pressure (primary method solid, the others
 * dotted), the P10–P90 pore-pressure band when a Monte Carlo result is given, fracture
 * pressure (Shmin), the mud weights used (stairs) and the selected section mud weights,
 * and points for pressure tests, leak-off / integrity tests, kicks, gas events (drawn at the
 * mud weight in use at their depth) and selected casing shoes.
 * EMW = P / (TVD · 12/231) (units/index.ts).
 *
 * @param input one well's report input
 * @param heightPx chart height, px (default 800)
 * @returns a FigureSpec for Plotly.newPlot
 * @throws ShalepointError from {@link pressureDepthFigure} (never for well-formed input)
 * @example wellPressureFigure(wellInput).layout.xaxis.title.text // "Equivalent mud weight (ppg)"
 */
export function wellPressureFigure(input: WellReportInput, heightPx = 800): FigureSpec {
  const { prediction: p, stressWindow: sw, tables } = input;
  const idx = strideSampleIndices(p.tvdFt.length, REPORT_MAX_CURVE_POINTS);
  const z = pick(p.tvdFt, idx);
  const series: PressureDepthSeries[] = [];
  const line = (name: string, values: ArrayLike<number>, colour: string, dash: PressureDepthSeries["dash"] = "solid"): void => {
    series.push({ name, tvdFt: z, values: pick(values, idx), valueKind: "pressurePsi", colour, dash });
  };
  line("Hydrostatic", p.hydrostaticPsi, OKABE_ITO.skyBlue, "dash");
  line("Overburden (Sv)", p.overburden.svPsi, OKABE_ITO.black);
  line(`Pore pressure: ${PORE_PRESSURE_METHOD_LABELS[p.primary]}`, p.ppPsi, OKABE_ITO.vermillion);
  const others: string[] = [OKABE_ITO.reddishPurple, OKABE_ITO.orange, OKABE_ITO.bluishGreen];
  let o = 0;
  for (const key of Object.keys(PORE_PRESSURE_METHOD_LABELS) as PrimaryPorePressureMethod[]) {
    const m = p.methods[key];
    if (m === undefined || key === p.primary) continue;
    line(`Pore pressure: ${PORE_PRESSURE_METHOD_LABELS[key]}`, m.ppPsi, others[o++ % others.length], "dot");
  }
  line("Fracture pressure (Shmin)", sw.shminPsi, OKABE_ITO.blue);

  const mud = stairs((tables.mudWeights ?? []).map((m) => ({ fromFt: m.tvdFromFt, toFt: m.tvdToFt, value: m.mudWeightPsiPerFt })));
  if (mud.tvdFt.length > 0) series.push({ name: "Mud weight used", ...mud, valueKind: "gradientPsiPerFt", colour: OKABE_ITO.orange, dash: "solid" });
  if (sw.casing && sw.casing.sections.length > 0) {
    const sec = stairs(sw.casing.sections.map((s) => ({ fromFt: s.topTvdFt, toFt: s.bottomTvdFt, value: s.mudWeightPsiPerFt })));
    series.push({ name: "Section mud weight (selected)", ...sec, valueKind: "gradientPsiPerFt", colour: OKABE_ITO.bluishGreen, dash: "dashdot" });
    const shoes = sw.casing.shoeTvdFt;
    if (shoes.length > 0) {
      const shoeValues = shoes.map((d) => sw.casing!.sections.find((s) => s.bottomTvdFt === d)?.mudWeightPsiPerFt ?? NaN);
      series.push({ name: "Casing shoe (selected)", tvdFt: shoes, values: shoeValues, valueKind: "gradientPsiPerFt", style: "points", colour: OKABE_ITO.black, markerSymbol: "triangle-left" });
    }
  }
  const tests = tables.pressureTests ?? [];
  if (tests.length > 0) {
    series.push({ name: "Pressure tests", tvdFt: tests.map((t) => t.tvdFt), values: tests.map((t) => t.pressurePsi), valueKind: "pressurePsi", style: "points", colour: OKABE_ITO.bluishGreen, markerSymbol: "circle" });
  }
  const lots = tables.leakOffTests ?? [];
  if (lots.length > 0) {
    series.push({ name: "Leak-off / integrity tests", tvdFt: lots.map((t) => t.shoeTvdFt), values: lots.map((t) => t.emwPsiPerFt), valueKind: "gradientPsiPerFt", style: "points", colour: OKABE_ITO.blue, markerSymbol: "triangle-up" });
  }
  const events = tables.events ?? [];
  const kicks = events.filter((e) => e.event === "kick" && e.emwPsiPerFt !== undefined);
  if (kicks.length > 0) {
    series.push({ name: "Kicks (controlling EMW)", tvdFt: kicks.map((e) => e.tvdFt), values: kicks.map((e) => e.emwPsiPerFt ?? NaN), valueKind: "gradientPsiPerFt", style: "points", colour: OKABE_ITO.vermillion, markerSymbol: "x" });
  }
  const gas = events.filter((e) => e.event !== "kick");
  if (gas.length > 0) {
    series.push({ name: "Gas events (at mud weight in use)", tvdFt: gas.map((e) => e.tvdFt), values: gas.map((e) => e.emwPsiPerFt ?? mudWeightAt(input, e.tvdFt)), valueKind: "gradientPsiPerFt", style: "points", colour: OKABE_ITO.orange, markerSymbol: "diamond" });
  }

  const fig = pressureDepthFigure({ title: `${input.well.name}: pressure–depth profile`, xUnit: "ppg", series, heightPx });
  const u = input.uncertainty;
  if (u !== undefined && u.ppP10Psi.length === p.tvdFt.length) {
    const ppg = (v: ArrayLike<number>): (number | null)[] => {
      const out: (number | null)[] = [];
      for (const i of idx) {
        const x = p.tvdFt[i] > 0 ? v[i] / (p.tvdFt[i] * PSI_PER_FT_PER_PPG) : NaN;
        out.push(Number.isFinite(x) ? x : null);
      }
      return out;
    };
    const y = Array.from(z, (d) => (Number.isFinite(d) ? d : null));
    const low: TraceSpec = { type: "scatter", mode: "lines", name: "Pore pressure P10", x: ppg(u.ppP10Psi), y, line: { color: OKABE_ITO.skyBlue, width: 0.5 }, connectgaps: false, showlegend: false };
    const high = { type: "scatter" as const, mode: "lines" as const, name: `Pore pressure P10–P90 (${u.realisations} realisations)`, x: ppg(u.ppP90Psi), y, line: { color: OKABE_ITO.skyBlue, width: 0.5 }, connectgaps: false, fill: "tonextx", fillcolor: BAND_FILL };
    fig.data.unshift(low, high);
    // A filled trace makes plotly list the legend bottom-up; keep the series order.
    (fig.layout.legend as Record<string, unknown>).traceorder = "normal";
  }
  return fig;
}

/**
 * Offset comparison: primary pore pressure of each well in EMW (ppg, over TVD below RT)
 * against TVDSS (ft), so wells with different air gaps line up by depth below sea level.
 *
 * @param wells report inputs of two or more wells (one also works)
 * @param heightPx chart height, px (default 700)
 * @returns a FigureSpec
 * @example offsetComparisonFigure([a1, a2]).data.length // 2
 */
export function offsetComparisonFigure(wells: readonly WellReportInput[], heightPx = 700): FigureSpec {
  const fig = pressureDepthFigure({
    title: "Offset wells: pore pressure against depth below sea level",
    xUnit: "ppg",
    heightPx,
    series: wells.map((w, k) => {
      const idx = strideSampleIndices(w.prediction.tvdFt.length, REPORT_MAX_CURVE_POINTS);
      return {
        name: `${w.well.name} (${PORE_PRESSURE_METHOD_LABELS[w.prediction.primary]})`,
        tvdFt: pick(w.prediction.tvdFt, idx),
        values: pick(w.prediction.ppPsi, idx),
        valueKind: "pressurePsi" as const,
        colour: SERIES_COLOUR_ORDER[k % SERIES_COLOUR_ORDER.length],
      };
    }),
  });
  // Same x (EMW over TVD below RT); the y axis moves to TVDSS.
  fig.data.forEach((trace, k) => {
    const idx = strideSampleIndices(wells[k].prediction.tvdFt.length, REPORT_MAX_CURVE_POINTS);
    trace.y = idx.map((i) => {
      const d = wells[k].prediction.tvdssFt[i];
      return Number.isFinite(d) ? d : null;
    });
  });
  fig.layout.yaxis = { ...depthAxisSpec({ reference: "TVDSS", unit: "ft" }), anchor: "x" };
  fig.layout.title = { ...fig.layout.title, text: escapePlotlyText("Offset wells: pore pressure against depth below sea level") };
  return fig;
}
