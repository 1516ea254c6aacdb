/**
 * Log-track figure: the basic well-log display for QC, one track per curve side by side on
 * a shared depth axis that increases downward.
 */
import { ShalepointError } from "../errors.js";
import { METRES_PER_FOOT } from "../units/index.js";
import type { Well } from "../well/types.js";
import type { AxisSpec, FigureSpec, LayoutSpec, TraceSpec } from "./figureSpec.js";
import { plotValues } from "./figureSpec.js";
import { depthAxisSpec, type DepthReferenceLabel } from "./depthAxisSpec.js";
import { escapePlotlyText } from "./escapeHtml.js";
import {
  OKABE_ITO_BLACK,
  OKABE_ITO_BLUE,
  OKABE_ITO_BLUISH_GREEN,
  OKABE_ITO_ORANGE,
  OKABE_ITO_REDDISH_PURPLE,
  OKABE_ITO_VERMILLION,
} from "./palette.js";

/** Curves a log-track figure can show, internal units, aligned to the depth index; NaN = missing. */
export interface LogTrackCurves {
  /** Gamma ray, API (typical 20–150). */
  gammaRayApi?: ArrayLike<number>;
  /** Compressional slowness, µs/ft (typical 50–200). */
  slownessUsPerFt?: ArrayLike<number>;
  /** Deep resistivity, ohm·m (typical 0.2–20); drawn on a log axis. */
  resistivityOhmM?: ArrayLike<number>;
  /** Bulk density, g/cc (typical 1.9–2.7). */
  densityGcc?: ArrayLike<number>;
  /** Caliper, in (typical 8–17). */
  caliperIn?: ArrayLike<number>;
  /** Bit size, in; drawn dashed in the caliper track when given. */
  bitSizeIn?: ArrayLike<number>;
}

/** One track of the figure: what it shows and how. */
interface TrackPlan {
  title: string;
  type: "linear" | "log";
  lines: { name: string; values: ArrayLike<number>; colour: string; dash?: "dash" }[];
}

/**
 * Build a log-track figure: up to five tracks — GR; DT; deep resistivity (log axis); RHOB;
 * caliper with bit size — each with a titled, unit-labelled x axis on top, all sharing one
 * depth axis that increases downward. Tracks whose curve is absent are left out. Missing
 * samples (NaN) are drawn as gaps. Colours are Okabe–Ito (Okabe & Ito 2008).
 *
 * @param title figure title, e.g. the well name (free text; escaped here)
 * @param depthFt depth of each sample, ft, same length as every curve (MD or TVD, see `depthReference`)
 * @param depthReference what `depthFt` measures: `"MD"`, `"TVD"`, `"TVDSS"` or `"BML"`
 * @param depthUnit display unit of the depth axis, `"ft"` (default) or `"m"`
 * @param curves the curves to show (at least one)
 * @param heightPx figure height in pixels, default 800
 * @returns a plain-data figure spec for `Plotly.newPlot`
 * @throws ShalepointError `E_NO_CURVES` when no curve is given; `E_LENGTH_MISMATCH` when a
 *   curve's length differs from `depthFt`'s
 * @example
 * const fig = logTrackFigure({ title: "Quillon A-1", depthFt: [5000, 5001],
 *   depthReference: "MD", curves: { gammaRayApi: [80, 95] } });
 * fig.layout.yaxis.autorange // "reversed"; fig.layout.xaxis.title.text // "GR (API)"
 */
export function logTrackFigure({
  title,
  depthFt,
  depthReference,
  depthUnit = "ft",
  curves,
  heightPx = 800,
}: {
  title: string;
  depthFt: ArrayLike<number>;
  depthReference: DepthReferenceLabel;
  depthUnit?: "ft" | "m";
  curves: LogTrackCurves;
  heightPx?: number;
}): FigureSpec {
  const plans: TrackPlan[] = [];
  if (curves.gammaRayApi)
    plans.push({ title: "GR (API)", type: "linear", lines: [{ name: "GR", values: curves.gammaRayApi, colour: OKABE_ITO_BLUISH_GREEN }] });
  if (curves.slownessUsPerFt)
    plans.push({ title: "DT (µs/ft)", type: "linear", lines: [{ name: "DT", values: curves.slownessUsPerFt, colour: OKABE_ITO_BLUE }] });
  if (curves.resistivityOhmM)
    plans.push({ title: "Deep resistivity (ohm·m)", type: "log", lines: [{ name: "Resistivity", values: curves.resistivityOhmM, colour: OKABE_ITO_VERMILLION }] });
  if (curves.densityGcc)
    plans.push({ title: "RHOB (g/cc)", type: "linear", lines: [{ name: "RHOB", values: curves.densityGcc, colour: OKABE_ITO_REDDISH_PURPLE }] });
  if (curves.caliperIn || curves.bitSizeIn) {
    const lines: TrackPlan["lines"] = [];
    if (curves.caliperIn) lines.push({ name: "Caliper", values: curves.caliperIn, colour: OKABE_ITO_BLACK });
    if (curves.bitSizeIn) lines.push({ name: "Bit size", values: curves.bitSizeIn, colour: OKABE_ITO_ORANGE, dash: "dash" });
    plans.push({ title: "Caliper (in)", type: "linear", lines });
  }
  if (plans.length === 0) {
    throw new ShalepointError("E_NO_CURVES", "log-track figure needs at least one curve", {
      param: "curves",
      allowed: "one or more of gammaRayApi, slownessUsPerFt, resistivityOhmM, densityGcc, caliperIn, bitSizeIn",
    });
  }
  for (const plan of plans) {
    for (const line of plan.lines) {
      if (line.values.length !== depthFt.length) {
        throw new ShalepointError("E_LENGTH_MISMATCH", `curve ${line.name} and the depth index differ in length`, {
          param: `curves.${line.name}`,
          value: line.values.length,
          allowed: `${depthFt.length} samples (depthFt.length)`,
          hint: "Resample the curve onto the depth index first.",
        });
      }
    }
  }

  const depthFactor = depthUnit === "m" ? METRES_PER_FOOT : 1;
  const y = plotValues(depthFt, depthFactor);
  const gap = 0.02;
  const width = (1 - gap * (plans.length - 1)) / plans.length;
  const data: TraceSpec[] = [];
  const layout: LayoutSpec = {
    title: { text: escapePlotlyText(title), x: 0, xanchor: "left", y: 0.995, yanchor: "top" },
    height: heightPx,
    showlegend: true,
    legend: { orientation: "h", x: 0, y: -0.03, yanchor: "top" },
    margin: { l: 80, r: 20, t: 130, b: 60 },
    hovermode: "closest",
    plot_bgcolor: "#FFFFFF",
    paper_bgcolor: "#FFFFFF",
    yaxis: { ...depthAxisSpec({ reference: depthReference, unit: depthUnit }), anchor: "x" },
  };
  plans.forEach((plan, k) => {
    const id = k === 0 ? "x" : `x${k + 1}`;
    const start = k * (width + gap);
    const axis: AxisSpec = {
      title: { text: plan.title },
      type: plan.type,
      domain: [start, Math.min(1, start + width)],
      anchor: "y",
      side: "top",
      showgrid: true,
      zeroline: false,
      ticks: "outside",
    };
    const axisKey: `xaxis${string}` = k === 0 ? "xaxis" : `xaxis${k + 1}`;
    layout[axisKey] = axis;
    for (const line of plan.lines) {
      data.push({
        type: "scatter",
        mode: "lines",
        name: line.name,
        x: plotValues(line.values),
        y,
        xaxis: id,
        yaxis: "y",
        line: { color: line.colour, width: 1, ...(line.dash ? { dash: line.dash } : {}) },
        connectgaps: false,
      });
    }
  });
  return { data, layout, config: { responsive: true, displaylogo: false, scrollZoom: false } };
}

/**
 * {@link logTrackFigure} for a {@link Well}: takes the curves stored under the roles
 * `gammaRay`, `slowness`, `resistivity`, `density`, `caliper`, `bitSize` (internal units)
 * and plots them against MD or TVD below RT. The well name is escaped.
 *
 * @param well the well (its `curves` keyed by role)
 * @param depthReference `"MD"` (default) or `"TVD"`
 * @param depthUnit `"ft"` (default) or `"m"`
 * @param heightPx figure height in pixels, default 800
 * @returns a plain-data figure spec
 * @throws ShalepointError `E_NO_CURVES` when the well has none of those roles
 * @example logTrackFigureFromWell({ well, depthReference: "TVD" }).layout.yaxis.title.text
 * // "True vertical depth below RT, TVD (ft)"
 */
export function logTrackFigureFromWell({
  well,
  depthReference = "MD",
  depthUnit = "ft",
  heightPx = 800,
}: {
  well: Well;
  depthReference?: "MD" | "TVD";
  depthUnit?: "ft" | "m";
  heightPx?: number;
}): FigureSpec {
  const c = well.curves;
  return logTrackFigure({
    title: `${well.name}: log tracks`,
    depthFt: depthReference === "MD" ? well.mdFt : well.tvdFt,
    depthReference,
    depthUnit,
    heightPx,
    curves: {
      gammaRayApi: c.gammaRay?.values,
      slownessUsPerFt: c.slowness?.values,
      resistivityOhmM: c.resistivity?.values,
      densityGcc: c.density?.values,
      caliperIn: c.caliper?.values,
      bitSizeIn: c.bitSize?.values,
    },
  });
}
