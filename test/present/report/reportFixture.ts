/**
 * Builds a StudyReportInput from the real pipeline on two demo wells (Quillon A-1 and
 * Marten B-1, fictional Quillon Basin): files read with src/io, pore pressure and the stress
 * window predicted with the pipeline, QC summarised, a small Monte Carlo and a compartment
 * classification for A-1. Quillon A-1's name and one header value are replaced by hostile
 * text to check escaping.
 */
import { readFileSync } from "node:fs";
import { readWellFromLas } from "../../../src/io/loadWell.js";
import { readDrillingEvents, readFormationPressureTests, readFormationTops, readLeakOffTests, readMudWeights } from "../../../src/io/tables.js";
import { predictPorePressure, type PorePressurePredictionOptions } from "../../../src/pipeline/predictPorePressure.js";
import { predictStressWindow } from "../../../src/pipeline/predictStressWindow.js";
import { summarizeLogQc } from "../../../src/logs/summarizeLogQc.js";
import { simulatePressureUncertainty } from "../../../src/uncertainty/simulatePressureUncertainty.js";
import { classifyPressureCompartments } from "../../../src/compartments/classifyPressureCompartments.js";
import type { StudyReportInput, WellReportInput } from "../../../src/present/report/reportTypes.js";

/** A well name that would run a script if it were not escaped. */
export const HOSTILE_WELL_NAME = '<script>window.__hostileRan = 1</script>Quillon A-1 "<b>"';
/** A header value that would fetch an image and run a handler if it were not escaped. */
export const HOSTILE_HEADER_VALUE = '<img src="x" onerror="window.__hostileRan = 2">';

function demoPath(well: string, file: string): string {
  return new URL(`../../../demo-logs/${well}/${file}`, import.meta.url).pathname;
}

function wellInput(folder: string, options: {
  hydrostaticGradientPsiPerFt: number;
  trendIntervalBmlFt: [number, number];
  poissonRatio: number;
  firstShoeTvdFt: number;
  hostile?: boolean;
}): WellReportInput {
  const read = (f: string): string => readFileSync(demoPath(folder, f), "utf8");
  const loaded = readWellFromLas(read(`${folder}.las`), { file: `${folder}.las` });
  const well = options.hostile
    ? { ...loaded.well, name: HOSTILE_WELL_NAME, header: { ...loaded.well.header, COMP: HOSTILE_HEADER_VALUE } }
    : loaded.well;
  const tables = {
    pressureTests: readFormationPressureTests(read("pressure-tests.csv")).records,
    leakOffTests: readLeakOffTests(read("leakoff-tests.csv")).records,
    mudWeights: readMudWeights(read("mud-weights.csv")).records,
    events: readDrillingEvents(read("drilling-events.csv")).records,
    tops: readFormationTops(read("formation-tops.csv")).records,
  };
  const [top, base] = options.trendIntervalBmlFt;
  const ppOptions: PorePressurePredictionOptions = {
    hydrostaticGradientPsiPerFt: options.hydrostaticGradientPsiPerFt,
    shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
    sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals: [{ topBmlFt: top, baseBmlFt: base }] }] },
    resistivityTrend: { use: "fit", kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, intervals: [{ topBmlFt: top, baseBmlFt: base }] }] },
    eatonSonic: {},
    eatonResistivity: {},
    bowers: { a: 10, b: 0.75 },
    primary: "eatonSonic",
  };
  const prediction = predictPorePressure(well, ppOptions);
  const stressWindow = predictStressWindow(
    { tvdFt: prediction.tvdFt, ppPsi: prediction.ppPsi, svPsi: prediction.overburden.svPsi },
    {
      fracture: { method: "eaton1969", poissonRatio: options.poissonRatio },
      stressTests: tables.leakOffTests.map((t) => ({ tvdFt: t.shoeTvdFt, pressurePsi: t.emwPsiPerFt * t.shoeTvdFt, kind: t.testType, label: t.testType })),
      calibrateFracture: true,
      firstShoeTvdFt: options.firstShoeTvdFt,
    },
  );
  const qc = summarizeLogQc({ depthFt: well.tvdFt, curves: Object.fromEntries(Object.entries(well.curves).map(([k, c]) => [k, c.values])) });
  return {
    well,
    prediction,
    stressWindow,
    tables,
    qc,
    hydrostaticGradientPsiPerFt: options.hydrostaticGradientPsiPerFt,
    inputFiles: [
      { role: "logs (LAS 2.0)", path: `demo-logs/${folder}/${folder}.las` },
      { role: "pressure tests (CSV)", path: `demo-logs/${folder}/pressure-tests.csv` },
      { role: "leak-off tests (CSV)", path: `demo-logs/${folder}/leakoff-tests.csv` },
      { role: "mud weights (CSV)", path: `demo-logs/${folder}/mud-weights.csv` },
      { role: "drilling events (CSV)", path: `demo-logs/${folder}/drilling-events.csv` },
    ],
  };
}

/** The study of the tests: A-1 (hostile name, uncertainty, compartments) and B-1. */
export function buildDemoStudy(): StudyReportInput {
  // Hydrostatic gradients: each LAS file's HYDG item (demo-logs/README.md).
  const a1 = wellInput("quillon-a1", { hydrostaticGradientPsiPerFt: 0.445, trendIntervalBmlFt: [900, 4600], poissonRatio: 0.42, firstShoeTvdFt: 5400, hostile: true });
  const b1 = wellInput("marten-b1", { hydrostaticGradientPsiPerFt: 0.44, trendIntervalBmlFt: [1300, 5700], poissonRatio: 0.4, firstShoeTvdFt: 3800 });
  const p = a1.prediction;
  const trend = p.sonicTrend!;
  a1.uncertainty = simulatePressureUncertainty({
    tvdFt: p.tvdFt,
    bmlFt: p.bmlFt,
    overburdenPsi: p.overburden.svPsi,
    hydrostaticPsi: p.hydrostaticPsi,
    observed: p.shaleLine.dtUsPerFt!,
    porePressure: { kind: "eaton", exponent: { kind: "normal", mean: 3, std: 0.3 }, trend: trend.trend, trendCovariance: trend.diagnostics.map((d) => d.covariance) },
    fracture: { kind: "eaton1969", poissonRatio: { kind: "uniform", min: 0.4, max: 0.44 } },
    realisations: 100,
    seed: 7,
  });
  a1.compartments = {
    classification: classifyPressureCompartments({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, hydrostaticPsi: p.hydrostaticPsi, shaleFlag: p.shale.isShale, decimateEvery: 20 }),
  };
  return {
    title: "Quillon Basin demo study (fictional wells)",
    wells: [a1, b1],
    provenance: {
      version: "0.0.0-test",
      configSha256: "0".repeat(64),
      inputs: a1.inputFiles!.concat(b1.inputFiles!).map((f, k) => ({ path: f.path, sha256: k.toString(16).padStart(64, "a") })),
    },
  };
}
