/**
 * Figure specs: log tracks and pressure–depth. Unit checks use CHECK-VALUES.md §0 (own cases
 * computed from exact unit definitions) and the international foot (1 ft = 0.3048 m exactly,
 * 1959 — published). Depth axes must increase downward (common practice, no source: the
 * well-log and pressure–depth plot convention).
 */
import { describe, expect, it } from "vitest";
import {
  logTrackFigure,
  logTrackFigureFromWell,
  pressureDepthFigure,
  depthAxisSpec,
  plotValues,
  type FigureSpec,
  type AxisSpec,
} from "../../src/present/index.js";
import { ShalepointError } from "../../src/errors.js";
import type { Well } from "../../src/well/types.js";

const axes = (fig: FigureSpec, prefix: "xaxis" | "yaxis"): AxisSpec[] =>
  Object.entries(fig.layout)
    .filter(([k]) => k === prefix || new RegExp(`^${prefix}\\d+$`).test(k))
    .map(([, v]) => v as AxisSpec);

const codeOf = (f: () => unknown): string | undefined => {
  try {
    f();
  } catch (e) {
    return e instanceof ShalepointError ? e.code : "not a ShalepointError";
  }
  return undefined;
};

// Invented Quillon A-1 samples (SCENARIO.md), frozen to prove no mutation.
const depthFt = Object.freeze([6000, 6000.5, 6001, 6001.5]);
const curves = Object.freeze({
  gammaRayApi: Object.freeze([85, 92, NaN, 110]),
  slownessUsPerFt: Object.freeze([128, 131, 133, 135]),
  resistivityOhmM: Object.freeze([1.1, 0.95, 0.9, 0.85]),
  densityGcc: Object.freeze([2.31, 2.29, NaN, 2.27]),
  caliperIn: Object.freeze([12.4, 12.6, 14.9, 12.3]),
  bitSizeIn: Object.freeze([12.25, 12.25, 12.25, 12.25]),
});

describe("logTrackFigure", () => {
  const fig = logTrackFigure({ title: "Quillon A-1", depthFt, depthReference: "MD", curves });

  it("has five titled, unit-labelled tracks with resistivity on a log axis", () => {
    const x = axes(fig, "xaxis");
    expect(x.map((a) => a.title.text)).toEqual(["GR (API)", "DT (µs/ft)", "Deep resistivity (ohm·m)", "RHOB (g/cc)", "Caliper (in)"]);
    expect(x.map((a) => a.type)).toEqual(["linear", "linear", "log", "linear", "linear"]);
    // tracks side by side without overlap, inside [0, 1]
    for (let i = 1; i < x.length; i++) expect(x[i].domain![0]).toBeGreaterThan(x[i - 1].domain![1]);
    expect(x[0].domain![0]).toBe(0);
    expect(x[x.length - 1].domain![1]).toBeLessThanOrEqual(1);
  });

  it("shares one depth axis, titled with reference and unit, increasing downward", () => {
    const y = axes(fig, "yaxis");
    expect(y).toHaveLength(1);
    expect(y[0].autorange).toBe("reversed");
    expect(y[0].title.text).toBe("Measured depth, MD (ft)");
    expect(new Set(fig.data.map((t) => t.yaxis))).toEqual(new Set(["y"]));
    expect(fig.data.map((t) => t.xaxis)).toEqual(["x", "x2", "x3", "x4", "x5", "x5"]);
  });

  it("draws missing samples as gaps and keeps the values", () => {
    expect(fig.data[0].x).toEqual([85, 92, null, 110]);
    expect(fig.data[0].y).toEqual([6000, 6000.5, 6001, 6001.5]);
    expect(fig.data.every((t) => t.connectgaps === false)).toBe(true);
    expect(fig.data[5]).toMatchObject({ name: "Bit size", line: { dash: "dash" } });
  });

  it("shows depth in metres on request", () => {
    const m = logTrackFigure({ title: "w", depthFt: [1000, 10000], depthReference: "TVD", depthUnit: "m", curves: { gammaRayApi: [1, 2] } });
    // 1 ft = 0.3048 m exactly (international foot, 1959 — published)
    expect(m.data[0].y[0]).toBeCloseTo(304.8, 12);
    expect(m.data[0].y[1]).toBeCloseTo(3048, 12);
    expect(m.layout.yaxis.title.text).toBe("True vertical depth below RT, TVD (m)");
  });

  it("leaves out absent tracks and escapes the title", () => {
    const f = logTrackFigure({ title: '<img src=x onerror="alert(1)">', depthFt, depthReference: "MD", curves: { resistivityOhmM: curves.resistivityOhmM } });
    expect(axes(f, "xaxis").map((a) => a.title.text)).toEqual(["Deep resistivity (ohm·m)"]);
    // Plotly decodes numeric references but shows &quot; literally, so quotes are &#34; here.
    expect(f.layout.title.text).toBe("&lt;img src=x onerror=&#34;alert(1)&#34;&gt;");
  });

  it("throws typed errors for no curves and for length mismatch", () => {
    expect(codeOf(() => logTrackFigure({ title: "w", depthFt, depthReference: "MD", curves: {} }))).toBe("E_NO_CURVES");
    expect(codeOf(() => logTrackFigure({ title: "w", depthFt, depthReference: "MD", curves: { densityGcc: [2.3] } }))).toBe("E_LENGTH_MISMATCH");
  });
});

describe("logTrackFigureFromWell", () => {
  const well: Well = {
    name: "Quillon A-2ST",
    datums: { rtElevationFt: 82, waterDepthFt: 3400, seawaterDensityGcc: 1.03 },
    mdFt: new Float64Array([8000, 8100]),
    tvdFt: new Float64Array([7400, 7480]),
    curves: {
      gammaRay: { mnemonic: "GR", unit: "API", description: "gamma ray", values: new Float64Array([70, 90]) },
      slowness: { mnemonic: "DT", unit: "us/ft", description: "sonic", values: new Float64Array([120, 125]) },
    },
    header: {},
  };
  it("plots the role curves against TVD or MD", () => {
    const tvd = logTrackFigureFromWell({ well, depthReference: "TVD" });
    expect(tvd.data[0].y).toEqual([7400, 7480]);
    expect(tvd.layout.yaxis.title.text).toBe("True vertical depth below RT, TVD (ft)");
    expect(axes(tvd, "xaxis").map((a) => a.title.text)).toEqual(["GR (API)", "DT (µs/ft)"]);
    expect(tvd.layout.title.text).toBe("Quillon A-2ST: log tracks");
    expect(logTrackFigureFromWell({ well }).data[1].y).toEqual([8000, 8100]);
  });
});

describe("pressureDepthFigure", () => {
  const tvdFt = Object.freeze([10000]);

  it("converts a 0.465 psi/ft gradient to 8.951 ppg EMW", () => {
    const f = pressureDepthFigure({
      title: "Quillon A-1",
      xUnit: "ppg",
      series: [{ name: "Hydrostatic", tvdFt, values: Object.freeze([0.465]), valueKind: "gradientPsiPerFt" }],
    });
    // CHECK-VALUES §0: 0.465 psi/ft = 8.951 ppg (exact factor 12/231; own case, 4 s.f.)
    expect(Math.abs(f.data[0].x[0]! - 8.951)).toBeLessThan(0.0005);
    expect(f.layout.xaxis.title.text).toBe("Equivalent mud weight (ppg)");
  });

  it("converts 6234 psi at 10,000 ft to 12.00 ppg EMW", () => {
    const f = pressureDepthFigure({ title: "t", xUnit: "ppg", series: [{ name: "Pp", tvdFt, values: [6234], valueKind: "pressurePsi" }] });
    // CHECK-VALUES §0: 12.0 ppg at 10,000 ft → 6234 psi (exact factor; own case, 4 s.f. → ±0.001 ppg)
    expect(Math.abs(f.data[0].x[0]! - 12.0)).toBeLessThan(0.001);
  });

  it("converts 1.20 sg over 3000 m to 35.30 MPa and shows depth in metres", () => {
    const d = 3000 / 0.3048; // 3000 m in ft (exact foot)
    const f = pressureDepthFigure({
      title: "t",
      xUnit: "MPa",
      depthUnit: "m",
      series: [{ name: "Mud", tvdFt: [d], values: [1.2 * 0.43353], valueKind: "gradientPsiPerFt" }],
    });
    // CHECK-VALUES §0: 1.20 sg over 3000 m → 35.30 MPa (own case); 0.43353 psi/ft per g/cc is
    // itself rounded to 5 s.f., so allow 0.01 MPa.
    expect(Math.abs(f.data[0].x[0]! - 35.3)).toBeLessThan(0.01);
    expect(f.data[0].y[0]).toBeCloseTo(3000, 9);
    expect(f.layout.xaxis.title.text).toBe("Pressure (MPa)");
    expect(f.layout.yaxis.title.text).toBe("True vertical depth below RT, TVD (m)");
  });

  it("converts 23 MPa/km to 1.017 psi/ft shown as psi at 10,000 ft", () => {
    const g = 1.017; // CHECK-VALUES §0: 23 MPa/km = 1.017 psi/ft (own case)
    const f = pressureDepthFigure({ title: "t", xUnit: "psi", series: [{ name: "Sv", tvdFt, values: [g], valueKind: "gradientPsiPerFt" }] });
    expect(f.data[0].x[0]).toBeCloseTo(10170, 9);
    expect(f.layout.xaxis.title.text).toBe("Pressure (psi)");
  });

  it("draws depth downward, points as markers, default Okabe–Ito colours in order", () => {
    const f = pressureDepthFigure({
      title: "t",
      xUnit: "sg",
      series: [
        { name: "Pore pressure", tvdFt: [5000, 9000], values: [2300, 5000], valueKind: "pressurePsi" },
        { name: "Pressure tests", tvdFt: [9000], values: [5010], valueKind: "pressurePsi", style: "points" },
      ],
    });
    expect(f.layout.yaxis.autorange).toBe("reversed");
    expect(f.data[0]).toMatchObject({ mode: "lines", line: { color: "#0072B2" } });
    expect(f.data[1]).toMatchObject({ mode: "markers", marker: { color: "#D55E00", symbol: "circle" } });
    expect(f.layout.xaxis.title.text).toBe("Equivalent mud weight (sg)");
  });

  it("gives gaps for NaN and for EMW at or above the rotary table", () => {
    const f = pressureDepthFigure({ title: "t", xUnit: "ppg", series: [{ name: "Pp", tvdFt: [0, 1000, 2000], values: [0, NaN, 900], valueKind: "pressurePsi" }] });
    expect(f.data[0].x[0]).toBeNull();
    expect(f.data[0].x[1]).toBeNull();
    expect(f.data[0].x[2]).not.toBeNull();
  });

  it("escapes series names and throws typed errors for bad input", () => {
    const f = pressureDepthFigure({ title: "a&b", xUnit: "psi", series: [{ name: "<b>x</b>", tvdFt: [1], values: [1], valueKind: "pressurePsi" }] });
    expect(f.data[0].name).toBe("&lt;b&gt;x&lt;/b&gt;");
    expect(f.layout.title.text).toBe("a&amp;b");
    expect(codeOf(() => pressureDepthFigure({ title: "t", xUnit: "psi", series: [] }))).toBe("E_NO_SERIES");
    expect(codeOf(() => pressureDepthFigure({ title: "t", xUnit: "psi", series: [{ name: "x", tvdFt: [1, 2], values: [1], valueKind: "pressurePsi" }] }))).toBe("E_LENGTH_MISMATCH");
    expect(codeOf(() => pressureDepthFigure({ title: "t", xUnit: "bar" as never, series: [{ name: "x", tvdFt: [1], values: [1], valueKind: "pressurePsi" }] }))).toBe("E_UNIT");
  });
});

describe("depthAxisSpec", () => {
  it("titles with the reference and unit and reverses the axis", () => {
    expect(depthAxisSpec({ reference: "TVDSS", unit: "m" })).toMatchObject({ title: { text: "True vertical depth below sea level, TVDSS (m)" }, autorange: "reversed" });
    expect(depthAxisSpec({ reference: "BML", unit: "ft", title: "Depth <below> mudline" }).title.text).toBe("Depth &lt;below&gt; mudline (ft)");
  });
});

describe("plotValues", () => {
  it("copies, scales and maps non-finite values to null without touching the input", () => {
    const input = new Float64Array([1, NaN, -Infinity, 2.5]);
    expect(plotValues(input, 0.3048)).toEqual([0.3048, null, null, 0.762]);
    expect(Array.from(input.slice(0, 1))).toEqual([1]);
    expect(Number.isNaN(input[1])).toBe(true);
  });
});
