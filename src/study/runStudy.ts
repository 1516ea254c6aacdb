/**
 * Run a study: load each well and its tables, predict pore pressure, stresses, window and
 * casing points, find compartments and pressure systems, optionally run the Monte Carlo
 * uncertainty, and collect findings and provenance. Writing the files is
 * {@link writeStudyOutputs}' job.
 */
import { resolve } from "node:path";
import type { Warning } from "../errors.js";
import { ShalepointError } from "../errors.js";
import type { SurveyStation, Well } from "../well/types.js";
import { mudlineTvdFt } from "../well/depthReference.js";
import { surveyPathAtMd } from "../well/surveyPathAtMd.js";
import { readWellFromLas } from "../io/loadWell.js";
import {
  readDirectionalSurvey,
  readDrillingEvents,
  readFormationPressureTests,
  readFormationTops,
  readLeakOffTests,
  readMudWeights,
} from "../io/tables.js";
import { parseTrendFile } from "../io/trendFile.js";
import { mpaToPsi, parseLasUnit, quantityOf, UNITS } from "../units/index.js";
import { summarizeLogQc } from "../logs/summarizeLogQc.js";
import {
  predictPorePressure,
  type PorePressurePrediction,
  type PorePressurePredictionOptions,
  type TrendChoice,
} from "../pipeline/predictPorePressure.js";
import { predictStressWindow, type FractureMethodChoice, type StressWindowOptions, type StressWindowPrediction } from "../pipeline/predictStressWindow.js";
import { ucsFromSlownessHorsrud2001, ucsFromSlownessLal1999 } from "../stress/ucsCorrelations.js";
import { nearestDepthSampleIndex } from "../stress/stressSeries.js";
import { compileCurveFormula } from "../formula/compileCurveFormula.js";
import type { PressureObservation, MisfitTable } from "../porepressure/misfitTable.js";
import { porePressureMisfitTable } from "../porepressure/misfitTable.js";
import type { StressTestPoint } from "../stress/fractureCalibration.js";
import type { PressureTestPoint } from "../compartments/fitPressureSystems.js";
import { predictCompartments } from "../pipeline/predictCompartments.js";
import { simulatePressureUncertainty, type PressureUncertaintyResult } from "../uncertainty/simulatePressureUncertainty.js";
import type { CompactionTrendKind } from "../trend/trendTypes.js";
import type { StudyFinding, StudyProvenance, WellReportInput } from "../present/report/reportTypes.js";
import { studyDepthFt, studyGradientPsiPerFt, studyPressurePsi, studyVelocityFtPerS, type StudyConfig, type StudyConfigFile } from "./config.js";
import { readInputText, type InputText } from "./readInputFile.js";
import { shalepointVersion } from "./packageVersion.js";

/** Finding codes that make a run "completed with critical findings" (CLI exit code 3). */
export const CRITICAL_FINDING_CODES: readonly string[] = ["F_WINDOW_INVERTS", "F_PP_AT_LEAST_STRESS"];

/** Progress of a study run, for a progress line. */
export interface StudyProgress {
  /** Well id, or `study` for study-level steps. */
  well: string;
  /** What is being done, e.g. `pore pressure`, `uncertainty`. */
  stage: string;
  /** Fraction of the whole study done, 0–1. */
  fraction: number;
}

/** Options of {@link runStudy}. */
export interface RunStudyOptions {
  /** Called before each stage of each well. */
  onProgress?: (p: StudyProgress) => void;
  /** Largest input file read, bytes (default 500 MB). */
  maxInputBytes?: number;
}

/** Result of one well in a study: the report's well input plus the study's own extras. */
export interface StudyWellResult extends WellReportInput {
  /** Well id from the config (used in file names). */
  id: string;
  /** Hydrostatic gradient used, psi/ft. */
  hydrostaticGradientPsiPerFt: number;
  /** Calibration points (pressure tests of the chosen qualities) on the depth index. */
  observations: PressureObservation[];
  /** Misfit of every method run against the calibration points. */
  misfits: Record<string, MisfitTable>;
  /** Warnings from reading and computing (data, never printed by the runner). */
  warnings: Warning[];
}

/** Everything a study produced (in memory). */
export interface StudyResult {
  title: string;
  wells: StudyWellResult[];
  findings: StudyFinding[];
  /** Findings whose code is in {@link CRITICAL_FINDING_CODES}. */
  criticalFindings: StudyFinding[];
  provenance: StudyProvenance;
  /** The config the study ran with. */
  config: StudyConfig;
}

function trendChoice(
  t: NonNullable<StudyConfigFile["wells"][number]["methods"]["sonicTrend"]>,
  kind: CompactionTrendKind,
  cfg: StudyConfig,
  param: string,
  inputs: InputText[],
): TrendChoice {
  if ("file" in t) {
    const path = resolve(cfg.baseDir, t.file);
    const input = readInputText(path, { param: `${param}.file` });
    inputs.push(input);
    const trend = parseTrendFile(input.text, t.file);
    const isResistivity = (k: CompactionTrendKind): boolean => k === "resistivityLogLinear";
    if (isResistivity(trend.kind) !== isResistivity(kind)) {
      throw new ShalepointError("E_CONFIG", `${param}.file holds a ${trend.kind} trend`, { param: `${param}.file`, value: trend.kind, allowed: kind });
    }
    return { use: "given", trend };
  }
  const intervals = t.fitIntervals.map((iv) => {
    const f = UNITS[iv.unit].factor;
    return { topBmlFt: iv.top * f, baseBmlFt: iv.base * f };
  });
  return {
    use: "fit",
    kind,
    method: t.method ?? "huber",
    segments: [{ topBmlFt: 0, intervals, dtMatrixUsPerFt: kind === "sonicExponential" ? (t.dtMatrixUsPerFt ?? 65) : undefined }],
  };
}

/**
 * Run a depth-wise computation on every k-th sample (k from a depth step) and interpolate
 * each per-depth result array linearly back onto the full index (TVD). Keeps the Monte
 * Carlo affordable on 0.5 ft logs; the spread varies over hundreds of feet, not samples.
 */
function onFullIndex(
  tvdFt: Float64Array,
  stepFt: number,
  run: (pick: (a: ArrayLike<number>) => Float64Array) => PressureUncertaintyResult,
): PressureUncertaintyResult {
  const n = tvdFt.length;
  const span = n > 1 ? (tvdFt[n - 1] - tvdFt[0]) / (n - 1) : 1;
  const k = Math.max(1, Math.round(stepFt / Math.max(span, 1e-9)));
  const idx: number[] = [];
  for (let i = 0; i < n; i += k) idx.push(i);
  if (idx[idx.length - 1] !== n - 1) idx.push(n - 1);
  const pick = (a: ArrayLike<number>): Float64Array => Float64Array.from(idx, (i) => a[i]);
  const r = run(pick);
  const subTvd = pick(tvdFt);
  const spread = (a: Float64Array): Float64Array => {
    const out = new Float64Array(n);
    let j = 0;
    for (let i = 0; i < n; i++) {
      while (j < subTvd.length - 2 && subTvd[j + 1] < tvdFt[i]) j++;
      const z0 = subTvd[j];
      const z1 = subTvd[Math.min(j + 1, subTvd.length - 1)];
      const t = z1 > z0 ? Math.min(1, Math.max(0, (tvdFt[i] - z0) / (z1 - z0))) : 0;
      const a0 = a[j];
      const a1 = a[Math.min(j + 1, a.length - 1)];
      out[i] = t === 0 ? a0 : t === 1 ? a1 : a0 + t * (a1 - a0);
    }
    return out;
  };
  const out = { ...r } as unknown as Record<string, unknown>;
  for (const [key, v] of Object.entries(r)) {
    if (v instanceof Float64Array && v.length === idx.length) out[key] = spread(v);
  }
  return out as unknown as PressureUncertaintyResult;
}

/** Nearest sample, -1 outside [first, last] sample (stricter than nearestDepthSampleIndex's half-step margin). */
function nearestIndex(tvdFt: Float64Array, depthFt: number): number {
  const n = tvdFt.length;
  if (n === 0 || !(depthFt >= tvdFt[0] && depthFt <= tvdFt[n - 1])) return -1;
  return nearestDepthSampleIndex(tvdFt, depthFt);
}

function hydrostaticFromLas(las: { parameters: { mnemonic: string; unit: string; value: string; line?: number }[] }, file: string): number | undefined {
  const item = las.parameters.find((p) => p.mnemonic.toUpperCase() === "HYDG");
  if (!item) return undefined;
  const id = parseLasUnit(item.unit);
  const v = Number(item.value);
  if (id === undefined || UNITS[id].quantity !== "gradient" || !Number.isFinite(v)) {
    throw new ShalepointError("E_CONFIG", "~P HYDG needs a gradient unit and a number", { file, line: item.line, param: "HYDG", value: `${item.value} ${item.unit}`, allowed: "PSI/FT, KPA/M, PPG, SG" });
  }
  return v * UNITS[id].factor;
}

/**
 * Wellbore-stability inputs of one well from its study settings: UCS from a published
 * correlation on the shale-line slowness (Horsrud 2001 by default, or Lal 1999), from a
 * UCS curve in the LAS file, or from the user's own formula over LAS mnemonics (compiled
 * once by src/formula, evaluated over the curves in internal units; non-finite results are
 * set to NaN and counted in a warning).
 */
function wellboreOptions(
  wb: NonNullable<StudyConfigFile["wells"][number]["wellbore"]>,
  well: Well,
  prediction: PorePressurePrediction,
  warnings: Warning[],
): NonNullable<StressWindowOptions["wellbore"]> {
  const dt = prediction.shaleLine.dtUsPerFt ?? new Float64Array(prediction.tvdFt.length).fill(NaN);
  const ucs = wb.ucs ?? { source: "horsrud2001" as const };
  let ucsPsi: Float64Array;
  if (ucs.source === "horsrud2001") {
    ucsPsi = ucsFromSlownessHorsrud2001(dt);
  } else if (ucs.source === "lal1999") {
    ucsPsi = ucsFromSlownessLal1999(dt);
  } else {
    const byMnemonic: Record<string, Float64Array> = {};
    for (const c of Object.values(well.curves)) byMnemonic[c.mnemonic] = c.values;
    if (ucs.source === "curve") {
      const c = Object.values(well.curves).find((x) => x.mnemonic === ucs.mnemonic);
      if (c === undefined || quantityOf(c.unit) !== "pressure") {
        throw new ShalepointError("E_CONFIG", `wellbore.ucs.mnemonic: no pressure-unit curve '${ucs.mnemonic}' in the well`, {
          param: "wellbore.ucs.mnemonic",
          value: ucs.mnemonic,
          allowed: Object.values(well.curves).filter((x) => quantityOf(x.unit) === "pressure").map((x) => x.mnemonic).join(", ") || "none in this file",
        });
      }
      ucsPsi = Float64Array.from(c.values);
    } else {
      const formula = compileCurveFormula({ expression: ucs.expression, availableNames: Object.keys(byMnemonic) });
      const r = formula.evaluate({ curves: byMnemonic, nonFinite: "flag" });
      const k = ucs.unit === "MPa" ? mpaToPsi(1) : 1;
      ucsPsi = r.values.map((v) => v * k);
      if (r.nonFiniteIndices.length > 0) {
        warnings.push({ code: "W_UCS_FORMULA_NON_FINITE", message: `UCS formula gave a non-finite value at ${r.nonFiniteIndices.length} samples (set to NaN)`, count: r.nonFiniteIndices.length, index: r.nonFiniteIndices[0] });
      }
    }
  }
  return {
    shmaxFraction: wb.shmaxFraction,
    ucsPsi,
    internalFriction: wb.internalFriction,
    tensileStrengthPsi: wb.tensileStrength ? studyPressurePsi(wb.tensileStrength) : undefined,
  };
}

/**
 * Run a study from a loaded configuration (see {@link loadStudyConfig}).
 *
 * Per well: read the LAS file (MD→TVD by minimum curvature when a survey is given) and the
 * CSV tables; predict pore pressure ({@link predictPorePressure}) with the configured trends,
 * methods and calibration points; predict Shmin, fracture gradient, window and casing points
 * ({@link predictStressWindow}) with the fracture model calibrated to the leak-off tests;
 * segment and classify the primary pore pressure into compartments; fit fluid-gradient lines
 * to the pressure tests; run the Monte Carlo when configured. Inputs are only read.
 *
 * @param config loaded study
 * @param options progress callback and input size limit
 * @returns the {@link StudyResult}
 * @throws ShalepointError from reading (E_FILE_*, E_LAS_*, E_CSV_*, E_CONFIG) and from the
 *   pipeline (e.g. E_PIPELINE_MISSING_CURVE)
 * @example const r = runStudy(loadStudyConfig("demo-logs/demo-study.json")); r.wells.length // 3
 */
export function runStudy(config: StudyConfig, options: RunStudyOptions = {}): StudyResult {
  const progress = options.onProgress ?? (() => undefined);
  const f = config.file;
  const inputs: InputText[] = [];
  const wells: StudyWellResult[] = [];
  const findings: StudyFinding[] = [];
  const stages = 5;
  const total = f.wells.length * stages;
  let step = 0;
  const tick = (well: string, stage: string): void => progress({ well, stage, fraction: step++ / total });

  f.wells.forEach((w, wi) => {
    const paths = config.wellPaths[wi];
    const key = `wells[${wi}]`;
    const read = (p: string | undefined, param: string): InputText | undefined => {
      if (p === undefined) return undefined;
      const t = readInputText(p, { param: `${key}.${param}`, maxBytes: options.maxInputBytes });
      inputs.push(t);
      return t;
    };
    tick(w.id, "reading files");
    const lasText = read(paths.las, "las")!;
    const surveyText = read(paths.survey, "survey");
    let survey: SurveyStation[] | undefined;
    if (surveyText) {
      survey = readDirectionalSurvey(surveyText.text, { file: w.survey }).records.map((s) => ({ mdFt: s.mdFt, incDeg: s.incDeg, aziDeg: s.aziDeg }));
    }
    const datums: Partial<Well["datums"]> = {};
    if (w.datums?.airGap) datums.rtElevationFt = studyDepthFt(w.datums.airGap);
    if (w.datums?.waterDepth) datums.waterDepthFt = studyDepthFt(w.datums.waterDepth);
    if (w.datums?.seawaterDensityGcc !== undefined) datums.seawaterDensityGcc = w.datums.seawaterDensityGcc;
    const loaded = readWellFromLas(lasText.text, {
      file: w.las,
      name: w.name,
      datums,
      survey,
      tvd: survey ? { kind: "callback", tvdFromMd: (mdFt) => surveyPathAtMd({ survey: survey!, mdFt }).tvdFt } : { kind: "vertical" },
      maxSizeBytes: options.maxInputBytes,
    });
    const well = loaded.well;
    const warnings: Warning[] = [...loaded.warnings];
    const tables: StudyWellResult["tables"] = {};
    const pt = read(paths.pressureTests, "pressureTests");
    if (pt) tables.pressureTests = readFormationPressureTests(pt.text, { file: w.pressureTests }).records;
    const lot = read(paths.leakOffTests, "leakOffTests");
    if (lot) tables.leakOffTests = readLeakOffTests(lot.text, { file: w.leakOffTests }).records;
    const mw = read(paths.mudWeights, "mudWeights");
    if (mw) tables.mudWeights = readMudWeights(mw.text, { file: w.mudWeights }).records;
    const ev = read(paths.drillingEvents, "drillingEvents");
    if (ev) tables.events = readDrillingEvents(ev.text, { file: w.drillingEvents }).records;
    const tops = read(paths.formationTops, "formationTops");
    if (tops) tables.tops = readFormationTops(tops.text, { file: w.formationTops }).records;

    const hydG = w.hydrostaticGradient ? studyGradientPsiPerFt(w.hydrostaticGradient) : hydrostaticFromLas(loaded.las, w.las);
    if (hydG === undefined) {
      throw new ShalepointError("E_CONFIG", `${key}.hydrostaticGradient is required (the LAS file has no ~P HYDG)`, {
        param: `${key}.hydrostaticGradient`,
        hint: "Add e.g. { \"value\": 0.445, \"unit\": \"psi/ft\" }.",
      });
    }

    // Calibration points: pressure tests of the chosen qualities, on the nearest sample.
    const qualities = new Set(w.calibration?.useQualities ?? ["good"]);
    const observations: PressureObservation[] = [];
    for (const t of tables.pressureTests ?? []) {
      if (!qualities.has(t.quality)) continue;
      const index = nearestIndex(well.tvdFt, t.tvdFt);
      if (index >= 0) observations.push({ index, pressurePsi: t.pressurePsi, source: `pressure test ${t.sand ?? ""} row ${t.row}`.trim() });
    }

    tick(w.id, "pore pressure");
    const m = w.methods;
    const ppOptions: PorePressurePredictionOptions = {
      hydrostaticGradientPsiPerFt: hydG,
      shale: {
        criterion: { kind: "grCutoff", cutoffApi: m.shale.grCutoffApi },
        minBedThicknessFt: m.shale.minBedThicknessFt,
        pointSpacingFt: m.shale.pointSpacingFt,
        maxGapFt: m.shale.maxGapFt,
        masks: m.shale.exclude?.map((x) => ({ topTvdFt: x.top * UNITS[x.unit].factor, baseTvdFt: x.base * UNITS[x.unit].factor, action: "exclude" as const })),
      },
      sonicTrend: m.sonicTrend ? trendChoice(m.sonicTrend, "sonicExponential", config, `${key}.methods.sonicTrend`, inputs) : undefined,
      resistivityTrend: m.resistivityTrend
        ? trendChoice(m.resistivityTrend, "resistivityLogLinear", config, `${key}.methods.resistivityTrend`, inputs)
        : undefined,
      eatonSonic: m.eatonSonic ? { exponent: m.eatonSonic.exponent } : undefined,
      eatonResistivity: m.eatonResistivity ? { exponent: m.eatonResistivity.exponent } : undefined,
      bowers: m.bowers
        ? {
            a: m.bowers.a,
            b: m.bowers.b,
            v0FtPerS: m.bowers.v0 ? studyVelocityFtPerS(m.bowers.v0) : undefined,
            unloading: m.bowers.unloading ? { u: m.bowers.unloading.u, onsetTvdFt: studyDepthFt(m.bowers.unloading.onsetTvd) } : undefined,
          }
        : undefined,
      equivalentDepth: m.equivalentDepth ?? false,
      primary: m.primary,
      calibration:
        observations.length > 0
          ? { observations, fitEatonExponents: w.calibration?.fitEatonExponents ?? false, fitBowers: w.calibration?.fitBowers ?? false }
          : undefined,
    };
    const prediction: PorePressurePrediction = predictPorePressure(well, ppOptions);
    warnings.push(...prediction.warnings);
    const misfits: Record<string, MisfitTable> = {};
    if (observations.length > 0) {
      for (const [name, r] of Object.entries(prediction.methods)) {
        if (r) misfits[name] = porePressureMisfitTable({ tvdFt: prediction.tvdFt, predictedPsi: r.ppPsi, observations });
      }
    }

    tick(w.id, "stresses and window");
    const stressTests: StressTestPoint[] = (tables.leakOffTests ?? []).map((t) => ({
      tvdFt: t.shoeTvdFt,
      pressurePsi: t.emwPsiPerFt * t.shoeTvdFt,
      kind: t.testType,
      label: `${t.testType} at ${t.shoeTvdFt.toFixed(0)} ft (row ${t.row})`,
    }));
    const fr = w.fracture;
    const fracture: FractureMethodChoice =
      fr.method === "eaton1969"
        ? { method: "eaton1969", poissonRatio: fr.poissonRatio }
        : fr.method === "stressRatio"
          ? { method: "stressRatio", stressRatio: fr.stressRatio }
          : { method: "hubbertWillisMin" };
    const mudline = mudlineTvdFt(well.datums);
    const stressWindow: StressWindowPrediction = predictStressWindow(
      { tvdFt: prediction.tvdFt, ppPsi: prediction.ppPsi, svPsi: prediction.overburden.svPsi },
      {
        fracture,
        stressTests,
        calibrateFracture: fr.method === "hubbertWillisMin" ? false : (fr.calibrateToLeakOffTests ?? true),
        frictionCoefficient: f.frictionCoefficient,
        margins: f.margins,
        firstShoeTvdFt: mudline + (w.firstShoeBelowMudline ? studyDepthFt(w.firstShoeBelowMudline) : 1500),
        wellbore: w.wellbore ? wellboreOptions(w.wellbore, well, prediction, warnings) : undefined,
      },
    );
    warnings.push(...stressWindow.warnings);

    tick(w.id, "compartments");
    const compartments: StudyWellResult["compartments"] = {};
    try {
      // One pressure-system test per row; poor tests are passed on and rejected (with a
      // warning) by the fit, never silently dropped.
      const tests: PressureTestPoint[] = (tables.pressureTests ?? []).map((t) => ({
        tvdFt: t.tvdFt,
        pressurePsi: t.pressurePsi,
        quality: t.quality,
        sand: t.sand,
        label: t.sand ?? `row ${t.row}`,
      }));
      const found = predictCompartments({
        tvdFt: prediction.tvdFt,
        ppPsi: prediction.ppPsi,
        hydrostaticPsi: prediction.hydrostaticPsi,
        shaleFlag: prediction.shale.isShale,
        pressureTests: tests,
        shalePointSpacingFt: m.shale.pointSpacingFt,
      });
      compartments.classification = found.classification;
      if (found.pressureSystems !== null) compartments.pressureSystems = found.pressureSystems;
      warnings.push(...found.warnings);
    } catch (e) {
      if (!(e instanceof ShalepointError)) throw e;
      warnings.push({ code: "W_STUDY_NO_COMPARTMENTS", message: `compartments not found: ${e.message}` });
    }

    tick(w.id, "uncertainty");
    let uncertainty: PressureUncertaintyResult | undefined;
    const u = f.uncertainty;
    const eatonSonic = prediction.methods.eatonSonic;
    const sonicTrend = prediction.sonicTrend;
    if (u && eatonSonic && sonicTrend && prediction.shaleLine.dtUsPerFt && fr.method === "eaton1969") {
      const nu = stressWindow.fractureCalibration && (fr.calibrateToLeakOffTests ?? true) && stressWindow.fractureCalibration.n > 0
        ? stressWindow.fractureCalibration.parameter
        : fr.poissonRatio;
      uncertainty = onFullIndex(prediction.tvdFt, u.depthStepFt ?? 10, (pick) => simulatePressureUncertainty({
        tvdFt: pick(prediction.tvdFt),
        bmlFt: pick(prediction.bmlFt),
        overburdenPsi: pick(prediction.overburden.svPsi),
        hydrostaticPsi: pick(prediction.hydrostaticPsi),
        observed: pick(prediction.shaleLine.dtUsPerFt!),
        overburdenFactor: { kind: "normal", mean: 1, std: u.spreads?.overburdenFactor?.std ?? 0.02 },
        porePressure: {
          kind: "eaton",
          exponent: { kind: "normal", mean: eatonSonic.exponent, std: u.spreads?.eatonExponent?.std ?? 0.3 },
          trend: sonicTrend.trend,
        },
        fracture: {
          kind: "eaton1969",
          poissonRatio: { kind: "truncatedNormal", mean: nu, std: u.spreads?.poissonRatio?.std ?? 0.02, min: 0.01, max: 0.49 },
        },
        realisations: u.realisations,
        seed: u.seed + wi,
      }));
      warnings.push(...uncertainty.warnings);
    }

    const qcCurves: Record<string, Float64Array> = {};
    for (const [role, c] of Object.entries(well.curves)) qcCurves[role] = c.values;
    const qc = summarizeLogQc({ depthFt: well.mdFt, curves: qcCurves });

    for (const fd of [...stressWindow.findings, ...stressWindow.window.findings, ...(stressWindow.casing?.findings ?? [])]) {
      findings.push({ code: fd.code, message: fd.message, well: well.name, topFt: fd.topFt, baseFt: fd.baseFt });
    }
    const inputFiles = [
      { role: "logs (LAS 2.0)", path: w.las },
      ...(w.survey ? [{ role: "directional survey (CSV)", path: w.survey }] : []),
      ...(w.pressureTests ? [{ role: "pressure tests (CSV)", path: w.pressureTests }] : []),
      ...(w.leakOffTests ? [{ role: "leak-off tests (CSV)", path: w.leakOffTests }] : []),
      ...(w.mudWeights ? [{ role: "mud weights (CSV)", path: w.mudWeights }] : []),
      ...(w.drillingEvents ? [{ role: "drilling events (CSV)", path: w.drillingEvents }] : []),
      ...(w.formationTops ? [{ role: "formation tops (CSV)", path: w.formationTops }] : []),
    ];
    wells.push({
      id: w.id,
      well,
      prediction,
      stressWindow,
      tables,
      inputFiles,
      qc,
      uncertainty,
      compartments,
      hydrostaticGradientPsiPerFt: hydG,
      observations,
      misfits,
      warnings,
    });
  });
  progress({ well: "study", stage: "done", fraction: 1 });

  const rel = (p: string): string => {
    const base = config.baseDir.endsWith("/") ? config.baseDir : config.baseDir + "/";
    return p.startsWith(base) ? p.slice(base.length) : p;
  };
  const seen = new Set<string>();
  const provenanceInputs: { path: string; sha256: string }[] = [];
  for (const t of inputs) {
    if (seen.has(t.path)) continue;
    seen.add(t.path);
    provenanceInputs.push({ path: rel(t.path), sha256: t.sha256 });
  }
  const provenance: StudyProvenance = { version: shalepointVersion(), configSha256: config.configSha256, inputs: provenanceInputs };
  const criticalFindings = findings.filter((x) => CRITICAL_FINDING_CODES.includes(x.code));
  return { title: f.title, wells, findings, criticalFindings, provenance, config };
}
