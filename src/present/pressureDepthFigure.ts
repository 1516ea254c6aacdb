/**
 * Pressure–depth figure: the plot every pore-pressure study ends in — pore pressure,
 * overburden, fracture gradient, mud weights and measured points against depth, with the
 * x axis in pressure or in equivalent mud weight (EMW) and depth increasing downward.
 */
import { ShalepointError } from "../errors.js";
import { METRES_PER_FOOT, UNITS, convert } from "../units/index.js";
import type { FigureSpec, LayoutSpec, TraceSpec } from "./figureSpec.js";
import { depthAxisSpec } from "./depthAxisSpec.js";
import { escapePlotlyText } from "./escapeHtml.js";
import { seriesColour } from "./palette.js";

/** Units the x axis can show: pressure (psi, MPa) or equivalent mud weight (ppg, sg). */
export type PressureAxisUnit = "psi" | "MPa" | "ppg" | "sg";

/** One series on a pressure–depth figure, internal units. */
export interface PressureDepthSeries {
  /** Legend name (free text; escaped by the builder). */
  name: string;
  /** TVD below rotary table of each value, ft (> 0 for EMW). */
  tvdFt: ArrayLike<number>;
  /** The values, same length as `tvdFt`; NaN = missing (drawn as a gap). */
  values: ArrayLike<number>;
  /** What `values` hold: pressure in psi, or a gradient / EMW in psi/ft. */
  valueKind: "pressurePsi" | "gradientPsiPerFt";
  /** `"line"` (default) for profiles, `"points"` for measurements (pressure tests, LOTs). */
  style?: "line" | "points";
  /** `#RRGGBB` colour; default: the next Okabe–Ito colour in series order. */
  colour?: string;
  /** Line dash for `"line"` series. */
  dash?: "solid" | "dash" | "dot" | "dashdot";
  /** Marker symbol for `"points"` series, e.g. `"circle"`, `"triangle-up"`. */
  markerSymbol?: string;
}

const AXIS_WORDS: Readonly<Record<PressureAxisUnit, string>> = {
  psi: "Pressure",
  MPa: "Pressure",
  ppg: "Equivalent mud weight",
  sg: "Equivalent mud weight",
};

/**
 * Convert one series to the x-axis unit.
 * Pressure → EMW: EMW = P / D (psi/ft), then psi/ft → ppg by 231/12 or → sg by 1/0.43353
 * (units/index.ts); gradient → pressure: P = G · D. D is TVD below RT.
 */
function seriesX(s: PressureDepthSeries, unit: PressureAxisUnit): (number | null)[] {
  const toEmw = unit === "ppg" || unit === "sg";
  const out = new Array<number | null>(s.values.length);
  for (let i = 0; i < s.values.length; i++) {
    const v = s.values[i];
    const d = s.tvdFt[i];
    let x: number;
    if (toEmw) {
      const gradient = s.valueKind === "gradientPsiPerFt" ? v : d > 0 ? v / d : NaN;
      x = convert(gradient, "psi/ft", unit);
    } else {
      const pressure = s.valueKind === "pressurePsi" ? v : v * d;
      x = convert(pressure, "psi", unit);
    }
    out[i] = Number.isFinite(x) ? x : null;
  }
  return out;
}

/**
 * Build a pressure–depth figure from line and point series. Each series is converted to the
 * chosen x unit: pressures (psi, MPa) or equivalent mud weight (ppg, sg, with
 * EMW = P / TVD below RT). The depth axis is TVD below RT, increasing downward, in ft or m.
 * Non-finite results (NaN input, EMW at depth ≤ 0) are drawn as gaps.
 *
 * @param title figure title (free text; escaped here)
 * @param xUnit x-axis unit: `"psi"`, `"MPa"`, `"ppg"` or `"sg"`
 * @param series the series to draw, at least one
 * @param depthUnit depth display unit, `"ft"` (default) or `"m"`
 * @param heightPx figure height in pixels, default 700
 * @returns a plain-data figure spec for `Plotly.newPlot`
 * @throws ShalepointError `E_NO_SERIES` for an empty list; `E_LENGTH_MISMATCH` when a
 *   series' `values` and `tvdFt` differ in length; `E_UNIT` for an unknown `xUnit`
 * @example
 * const fig = pressureDepthFigure({ title: "Quillon A-1", xUnit: "ppg", series: [
 *   { name: "Hydrostatic", tvdFt: [5000, 10000], values: [0.465, 0.465], valueKind: "gradientPsiPerFt" }] });
 * fig.data[0].x // [8.951…, 8.951…] (0.465 psi/ft × 231/12)
 */
export function pressureDepthFigure({
  title,
  xUnit,
  series,
  depthUnit = "ft",
  heightPx = 700,
}: {
  title: string;
  xUnit: PressureAxisUnit;
  series: readonly PressureDepthSeries[];
  depthUnit?: "ft" | "m";
  heightPx?: number;
}): FigureSpec {
  if (!Object.prototype.hasOwnProperty.call(AXIS_WORDS, xUnit)) {
    throw new ShalepointError("E_UNIT", "unknown x-axis unit for a pressure–depth figure", {
      param: "xUnit",
      value: xUnit,
      allowed: "psi, MPa, ppg, sg",
    });
  }
  if (series.length === 0) {
    throw new ShalepointError("E_NO_SERIES", "pressure–depth figure needs at least one series", {
      param: "series",
      value: 0,
      allowed: "≥ 1 series",
    });
  }
  const depthFactor = depthUnit === "m" ? METRES_PER_FOOT : 1;
  const data: TraceSpec[] = series.map((s, i) => {
    if (s.values.length !== s.tvdFt.length) {
      throw new ShalepointError("E_LENGTH_MISMATCH", `series "${s.name}": values and tvdFt differ in length`, {
        param: `series[${i}].values`,
        value: s.values.length,
        allowed: `${s.tvdFt.length} (tvdFt.length)`,
      });
    }
    const colour = s.colour ?? seriesColour(i);
    const y = new Array<number | null>(s.tvdFt.length);
    for (let k = 0; k < y.length; k++) {
      const d = s.tvdFt[k] * depthFactor;
      y[k] = Number.isFinite(d) ? d : null;
    }
    const base = { type: "scatter" as const, name: escapePlotlyText(s.name), x: seriesX(s, xUnit), y, connectgaps: false };
    return (s.style ?? "line") === "points"
      ? { ...base, mode: "markers" as const, marker: { color: colour, size: 8, symbol: s.markerSymbol ?? "circle" } }
      : { ...base, mode: "lines" as const, line: { color: colour, width: 2, dash: s.dash ?? "solid" } };
  });
  const layout: LayoutSpec = {
    title: { text: escapePlotlyText(title), x: 0, xanchor: "left", y: 0.995, yanchor: "top" },
    height: heightPx,
    showlegend: true,
    legend: { orientation: "v", x: 1.02, y: 1, xanchor: "left", yanchor: "top" },
    margin: { l: 80, r: 20, t: 110, b: 60 },
    hovermode: "closest",
    plot_bgcolor: "#FFFFFF",
    paper_bgcolor: "#FFFFFF",
    xaxis: {
      title: { text: `${AXIS_WORDS[xUnit]} (${UNITS[xUnit].label})` },
      type: "linear",
      side: "top",
      anchor: "y",
      showgrid: true,
      zeroline: false,
      ticks: "outside",
    },
    yaxis: { ...depthAxisSpec({ reference: "TVD", unit: depthUnit }), anchor: "x" },
  };
  return { data, layout, config: { responsive: true, displaylogo: false, scrollZoom: false } };
}
