/**
 * Input types of the self-contained HTML prediction report ({@link renderStudyReport}).
 *
 * A report is built from results the pipeline already computed: the well, its pore-pressure
 * prediction, its stress/window prediction, the measured tables read from CSV, and
 * optionally the log QC summary, the Monte Carlo uncertainty and the compartment analysis.
 * Nothing is recomputed here except simple unit conversions for display.
 */
import type { Well } from "../../well/types.js";
import type { PorePressurePrediction } from "../../pipeline/predictPorePressure.js";
import type { StressWindowPrediction } from "../../pipeline/predictStressWindow.js";
import type { DrillingEvent, FormationPressureTest, FormationTop, LeakOffTest, MudWeightInterval } from "../../io/tables.js";
import type { LogQcSummary } from "../../logs/summarizeLogQc.js";
import type { PressureUncertaintyResult } from "../../uncertainty/simulatePressureUncertainty.js";
import type { ClassifyPressureCompartmentsResult } from "../../compartments/classifyPressureCompartments.js";
import type { FitPressureSystemsResult } from "../../compartments/fitPressureSystems.js";

/** The measured tables of one well (records as read by src/io/tables.ts), all optional. */
export interface WellReportTables {
  /** Formation-pressure tests (sand points). */
  pressureTests?: readonly FormationPressureTest[];
  /** Leak-off / formation-integrity tests at casing shoes. */
  leakOffTests?: readonly LeakOffTest[];
  /** Mud weights used while drilling. */
  mudWeights?: readonly MudWeightInterval[];
  /** Kicks and gas events. */
  events?: readonly DrillingEvent[];
  /** Formation tops. */
  tops?: readonly FormationTop[];
}

/** One input file of a well, listed with its role (hashes go in the study provenance). */
export interface WellReportInputFile {
  /** What the file holds, e.g. `logs (LAS 2.0)`, `pressure tests (CSV)`. */
  role: string;
  /** Path as given by the user (shown escaped; never opened by the report). */
  path: string;
}

/** Compartment analysis of one well (both parts optional). */
export interface WellReportCompartments {
  /** Log-derived intervals, compartments, seals and regressions. */
  classification?: ClassifyPressureCompartmentsResult;
  /** Fluid-gradient lines and contacts from the pressure tests. */
  pressureSystems?: FitPressureSystemsResult;
}

/** Everything the report shows for one well. */
export interface WellReportInput {
  /** The well (name, datums, header: free text, escaped by the renderer). */
  well: Well;
  /** Pore-pressure prediction on the well's depth index. */
  prediction: PorePressurePrediction;
  /** Stress, window and casing prediction on the same index. */
  stressWindow: StressWindowPrediction;
  /** Measured tables. */
  tables: WellReportTables;
  /** Input files of this well (role and path). */
  inputFiles?: readonly WellReportInputFile[];
  /** Log QC summary (curve nulls, gaps, spikes). */
  qc?: LogQcSummary;
  /** Monte Carlo result on the same depth index (adds the P10–P90 band). */
  uncertainty?: PressureUncertaintyResult;
  /** Compartments and pressure systems. */
  compartments?: WellReportCompartments;
  /** Hydrostatic (normal pore-fluid) gradient used, psi/ft, for the header (e.g. 0.445). */
  hydrostaticGradientPsiPerFt?: number;
}

/** A study-level finding (free text from the study runner; escaped by the renderer). */
export interface StudyFinding {
  /** Stable code, e.g. `F_WINDOW_INVERTS`. */
  code: string;
  message: string;
  /** Well it concerns, if one. */
  well?: string;
  topFt?: number;
  baseFt?: number;
}

/** Where the results came from: tool version, configuration and input file hashes. */
export interface StudyProvenance {
  /** shalepoint version, e.g. `0.1.0`. */
  version: string;
  /** SHA-256 of the study configuration file, hex. */
  configSha256: string;
  /** Every input file with its SHA-256, hex. */
  inputs: readonly { path: string; sha256: string }[];
  /** ISO 8601 time the study ran; omitted for byte-identical reports. */
  generatedAt?: string;
}

/** Everything {@link renderStudyReport} needs. */
export interface StudyReportInput {
  /** Report title (free text; escaped). */
  title: string;
  /** One or more wells. */
  wells: readonly WellReportInput[];
  provenance: StudyProvenance;
  /** Extra study-level findings (each well's own findings are collected by the renderer). */
  findings?: readonly StudyFinding[];
  /** Replacement caution text; default SAFETY_CAUTION_TEXT. Shown at the top and bottom. */
  caution?: string;
}

/** Options of {@link renderStudyReport}. */
export interface RenderStudyReportOptions {
  /**
   * The `<script>` element that loads plotly (default: plotlyBundleHtml(), the whole bundle
   * inlined). Must load plotly without any network request.
   */
  plotlyScriptHtml?: string;
  /** Height of the main pressure–depth chart, px (default 800). */
  chartHeightPx?: number;
}
