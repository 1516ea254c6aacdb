/**
 * Plain-data figure specifications in the JSON shape plotly.js accepts for
 * `Plotly.newPlot(div, data, layout, config)`. shalepoint never imports plotly at run time
 * (the bundle needs a browser); figure builders return these objects and the notebook or
 * report passes them to plotly in the page. Only the fields shalepoint uses are typed.
 *
 * Depth axes always increase downward (`autorange: "reversed"`), the convention of well
 * logs and pressure–depth plots.
 */

/** An axis title. */
export interface AxisTitleSpec {
  /** Title text including the unit, e.g. `"GR (API)"`. Already HTML-escaped. */
  text: string;
}

/** One x or y axis. */
export interface AxisSpec {
  title: AxisTitleSpec;
  /** Axis scale; resistivity uses `"log"`. */
  type?: "linear" | "log";
  /** `"reversed"` for depth axes (depth increases downward). */
  autorange?: boolean | "reversed";
  /** Fixed range in axis units (for `"log"` axes, in log10 units, as plotly expects). */
  range?: [number, number];
  /** Horizontal (x axes) or vertical (y axes) share of the plotting area, [0, 1]. */
  domain?: [number, number];
  /** Axis this one is drawn against, e.g. `"y"`. */
  anchor?: string;
  /** Axis whose range this one follows, e.g. `"y"` for shared depth. */
  matches?: string;
  side?: "top" | "bottom" | "left" | "right";
  showgrid?: boolean;
  zeroline?: boolean;
  showticklabels?: boolean;
  ticks?: "" | "inside" | "outside";
  /** d3-format string for tick labels, e.g. `",.0f"` for 12,000. */
  tickformat?: string;
}

/** A line or point series. */
export interface TraceSpec {
  type: "scatter";
  mode: "lines" | "markers" | "lines+markers";
  /** Series name shown in the legend. Already HTML-escaped. */
  name: string;
  /** x values; `null` marks a gap (missing sample). */
  x: (number | null)[];
  /** y values (depth); `null` marks a gap. */
  y: (number | null)[];
  /** x axis id, e.g. `"x2"`; default `"x"`. */
  xaxis?: string;
  /** y axis id; default `"y"`. */
  yaxis?: string;
  line?: { color: string; width?: number; dash?: "solid" | "dash" | "dot" | "dashdot" };
  marker?: { color: string; size?: number; symbol?: string };
  /** Keep false so a missing sample shows as a gap, not an invented straight line. */
  connectgaps?: boolean;
  showlegend?: boolean;
  hovertemplate?: string;
}

/** Figure layout. Axis keys follow plotly: `xaxis`, `xaxis2`, …, `yaxis`, `yaxis2`, … */
export interface LayoutSpec {
  title: { text: string; x?: number; xanchor?: "left" | "center" | "right"; y?: number; yanchor?: "top" | "middle" | "bottom" };
  height?: number;
  width?: number;
  showlegend?: boolean;
  legend?: { orientation?: "h" | "v"; x?: number; y?: number; xanchor?: string; yanchor?: string };
  margin?: { l?: number; r?: number; t?: number; b?: number };
  hovermode?: "closest" | "x" | "y" | "y unified" | false;
  plot_bgcolor?: string;
  paper_bgcolor?: string;
  font?: { family?: string; size?: number; color?: string };
  annotations?: {
    text: string;
    xref: "paper";
    yref: "paper";
    x: number;
    y: number;
    xanchor?: "left" | "center" | "right";
    yanchor?: "top" | "middle" | "bottom";
    showarrow: false;
    font?: { size?: number; color?: string };
  }[];
  [axis: `xaxis${string}`]: AxisSpec;
  [axis: `yaxis${string}`]: AxisSpec;
}

/** Options plotly reads when drawing. */
export interface PlotConfigSpec {
  responsive?: boolean;
  displaylogo?: boolean;
  scrollZoom?: boolean;
}

/** A whole figure: what `Plotly.newPlot` takes. */
export interface FigureSpec {
  data: TraceSpec[];
  layout: LayoutSpec;
  config: PlotConfigSpec;
}

/**
 * Copy numeric samples into a plain array for a figure, turning NaN and ±Infinity into
 * `null` (plotly draws a gap there; JSON cannot carry NaN). Optionally scales each value.
 *
 * @param values samples in any unit, e.g. a `Float64Array` log curve; NaN = missing
 * @param factor multiplier applied to each finite value (unit conversion), default 1
 * @returns a new array of numbers and `null`s, same length; input untouched
 * @example plotValues(new Float64Array([1, NaN, 3]), 2) // [2, null, 6]
 */
export function plotValues(values: ArrayLike<number>, factor = 1): (number | null)[] {
  const out = new Array<number | null>(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i] * factor;
    out[i] = Number.isFinite(v) ? v : null;
  }
  return out;
}
