import { ShalepointError, requireRange, requireSameLength } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import type { WindowFinding } from "./windowFindings.js";

/** What sets the lower bound at a sample. */
export type WindowLowerCriterion = "porePressure" | "collapse" | "missing";
/** What sets the upper bound at a sample. */
export type WindowUpperCriterion = "fracture" | "breakdown" | "missing";

/** The mud-weight window along a well. */
export interface MudWeightWindow {
  /** Lower bound, psi/ft EMW = max(Pp, collapse)/D + trip margin. */
  lowerPsiPerFt: Float64Array;
  /** Upper bound, psi/ft EMW = min(fracture, breakdown)/D − kick margin. */
  upperPsiPerFt: Float64Array;
  /** upper − lower, psi/ft (negative where the window inverts). */
  widthPsiPerFt: Float64Array;
  lowerCriterion: WindowLowerCriterion[];
  upperCriterion: WindowUpperCriterion[];
  /** Depth ranges where the window is narrower than `minWidthPpg` or inverted. */
  findings: WindowFinding[];
}

/**
 * Mud-weight window.
 *
 * lower = max(Pp, P_collapse)/D + trip margin; upper = min(Shmin or fracture pressure,
 * P_breakdown)/D − kick margin; all as EMW in psi/ft. Margins are given in ppg and converted
 * once at the top (× 12/231 psi/ft per ppg). An absent or NaN collapse/breakdown value does
 * not constrain; a NaN pore or fracture pressure makes the sample `missing` (NaN bounds).
 * Findings: `F_WINDOW_CLOSES` where 0 ≤ width < minWidthPpg, `F_WINDOW_INVERTS` where
 * width < 0, each with its depth range.
 *
 * @param args.tvdFt depth index, ft TVD below RT (> 0 for a bound; depth 0 gives NaN)
 * @param args.ppPsi pore pressure, psi
 * @param args.fracturePsi fracture pressure / Shmin, psi
 * @param args.collapsePsi optional breakout (collapse) mud pressure, psi
 * @param args.breakdownPsi optional tensile breakdown pressure, psi
 * @param args.tripMarginPpg swab/trip margin added to the lower bound, ppg, [0, 3], typical 0.3
 * @param args.kickMarginPpg kick margin taken off the upper bound, ppg, [0, 3], typical 0.5
 * @param args.minWidthPpg narrowest acceptable window, ppg, ≥ 0, default 0.5 (common
 *   practice, no source)
 * @returns bounds, width, criteria and findings
 * @throws ShalepointError E_RANGE for a margin outside [0, 3] ppg; E_LENGTH on mismatch;
 *   E_WINDOW_CLOSED_EVERYWHERE when the window is inverted at every sample with data
 *   (names the margins and the widest window before margins)
 * @example mudWeightWindow({ tvdFt: [10000], ppPsi: [5195], fracturePsi: [7792], tripMarginPpg: 0.3, kickMarginPpg: 0.5 })
 *   // lower ≈ 10.3 ppg, upper ≈ 14.5 ppg (as psi/ft: 0.5351, 0.7532)
 *
 * Reference: common practice, no source (window bounds and margins).
 */
export function mudWeightWindow(args: MudWeightWindowInput): MudWeightWindow {
  const curves = mudWeightWindowCurves(args);
  const findings = mudWeightWindowFindings({ ...args, curves });
  return { ...curves, findings };
}

/** Inputs of {@link mudWeightWindow} (see there for units and ranges). */
export interface MudWeightWindowInput {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  fracturePsi: ArrayLike<number>;
  collapsePsi?: ArrayLike<number>;
  breakdownPsi?: ArrayLike<number>;
  tripMarginPpg: number;
  kickMarginPpg: number;
  minWidthPpg?: number;
}

function checkWindowInput(args: MudWeightWindowInput): void {
  const { tvdFt, ppPsi, fracturePsi, collapsePsi, breakdownPsi, tripMarginPpg, kickMarginPpg } = args;
  requireRange(tripMarginPpg >= 0 && tripMarginPpg <= 3, "tripMarginPpg", tripMarginPpg, "[0, 3]", "ppg");
  requireRange(kickMarginPpg >= 0 && kickMarginPpg <= 3, "kickMarginPpg", kickMarginPpg, "[0, 3]", "ppg");
  requireRange((args.minWidthPpg ?? 0.5) >= 0, "minWidthPpg", args.minWidthPpg ?? 0.5, ">= 0", "ppg");
  requireSameLength(tvdFt, ppPsi, "tvdFt", "ppPsi");
  requireSameLength(tvdFt, fracturePsi, "tvdFt", "fracturePsi");
  if (collapsePsi) requireSameLength(tvdFt, collapsePsi, "tvdFt", "collapsePsi");
  if (breakdownPsi) requireSameLength(tvdFt, breakdownPsi, "tvdFt", "breakdownPsi");
}

/**
 * The window's per-sample part: bounds, width and criteria, each sample on its own (so a
 * run on the deeper part of a well gives the same values there as a run on the whole well).
 * Same formulas and checks as {@link mudWeightWindow}, without the findings.
 *
 * @param args as {@link mudWeightWindow}
 * @returns bounds (psi/ft EMW), width (psi/ft) and criteria per sample
 * @throws ShalepointError E_RANGE for a margin outside [0, 3] ppg; E_LENGTH on mismatch
 * @example mudWeightWindowCurves({ tvdFt: [10000], ppPsi: [5195], fracturePsi: [7792], tripMarginPpg: 0.3, kickMarginPpg: 0.5 }).widthPsiPerFt[0] // ≈ 0.2181
 */
export function mudWeightWindowCurves(args: MudWeightWindowInput): Omit<MudWeightWindow, "findings"> {
  checkWindowInput(args);
  const { tvdFt, ppPsi, fracturePsi, collapsePsi, breakdownPsi, tripMarginPpg, kickMarginPpg } = args;
  // ppg → psi/ft once, here.
  const trip = tripMarginPpg * PSI_PER_FT_PER_PPG;
  const kick = kickMarginPpg * PSI_PER_FT_PER_PPG;
  const n = tvdFt.length;
  const lowerPsiPerFt = new Float64Array(n);
  const upperPsiPerFt = new Float64Array(n);
  const widthPsiPerFt = new Float64Array(n);
  const lowerCriterion: WindowLowerCriterion[] = new Array(n);
  const upperCriterion: WindowUpperCriterion[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const d = tvdFt[i];
    let lo = ppPsi[i];
    let loC: WindowLowerCriterion = "porePressure";
    const c = collapsePsi ? collapsePsi[i] : NaN;
    if (c > lo) {
      lo = c;
      loC = "collapse";
    }
    let hi = fracturePsi[i];
    let hiC: WindowUpperCriterion = "fracture";
    const b = breakdownPsi ? breakdownPsi[i] : NaN;
    if (b < hi) {
      hi = b;
      hiC = "breakdown";
    }
    if (!(d > 0) || Number.isNaN(ppPsi[i]) || Number.isNaN(fracturePsi[i])) {
      lowerPsiPerFt[i] = upperPsiPerFt[i] = widthPsiPerFt[i] = NaN;
      lowerCriterion[i] = "missing";
      upperCriterion[i] = "missing";
      continue;
    }
    lowerPsiPerFt[i] = lo / d + trip;
    upperPsiPerFt[i] = hi / d - kick;
    widthPsiPerFt[i] = upperPsiPerFt[i] - lowerPsiPerFt[i];
    lowerCriterion[i] = loC;
    upperCriterion[i] = hiC;
  }
  return { lowerPsiPerFt, upperPsiPerFt, widthPsiPerFt, lowerCriterion, upperCriterion };
}

/**
 * The window's whole-well part: the depth ranges where it closes or inverts, and the check
 * that it is not inverted everywhere. One pass over the width, no per-sample arrays.
 *
 * @param args as {@link mudWeightWindow}, plus `curves` from {@link mudWeightWindowCurves}
 *   on the same (whole) arrays
 * @returns findings sorted by top depth
 * @throws ShalepointError E_WINDOW_CLOSED_EVERYWHERE when the window is inverted at every
 *   sample with data (names the margins and the widest window before margins)
 * @example mudWeightWindowFindings({ tvdFt: [10000], ppPsi: [5195], fracturePsi: [7792], tripMarginPpg: 0.3, kickMarginPpg: 0.5,
 *   curves: mudWeightWindowCurves({ tvdFt: [10000], ppPsi: [5195], fracturePsi: [7792], tripMarginPpg: 0.3, kickMarginPpg: 0.5 }) }) // []
 */
export function mudWeightWindowFindings(args: MudWeightWindowInput & { curves: Pick<MudWeightWindow, "widthPsiPerFt" | "lowerCriterion"> }): WindowFinding[] {
  const { tvdFt, tripMarginPpg, kickMarginPpg } = args;
  const minWidthPpg = args.minWidthPpg ?? 0.5;
  const minWidth = minWidthPpg * PSI_PER_FT_PER_PPG;
  const width = args.curves.widthPsiPerFt;
  const criterion = args.curves.lowerCriterion;
  const n = width.length;
  const narrowRuns: Array<{ first: number; last: number; extreme: number }> = [];
  const invertedRuns: Array<{ first: number; last: number; extreme: number }> = [];
  let withData = 0;
  let inverted = 0;
  // Runs of narrow (0 ≤ w < minWidth) and of inverted (w < 0) samples, with the least
  // width in each run; a missing sample (NaN) ends a run.
  let kind = 0; // 0 none, 1 narrow, 2 inverted
  let first = 0;
  let extreme = Infinity;
  const close = (last: number): void => {
    (kind === 1 ? narrowRuns : invertedRuns).push({ first, last, extreme });
  };
  for (let i = 0; i < n; i++) {
    const w = width[i];
    if (criterion[i] !== "missing") {
      withData++;
      if (w < 0) inverted++;
    }
    const k = w >= 0 && w < minWidth ? 1 : w < 0 ? 2 : 0;
    if (k !== kind) {
      if (kind !== 0) close(i - 1);
      kind = k;
      first = i;
      extreme = Infinity;
    }
    if (k !== 0 && w < extreme) extreme = w;
  }
  if (kind !== 0) close(n - 1);
  if (withData > 0 && inverted === withData) {
    // The widest window before margins, for the message (a rare path: one more pass).
    const { ppPsi, fracturePsi, collapsePsi, breakdownPsi } = args;
    let widestRaw = -Infinity;
    for (let i = 0; i < n; i++) {
      const d = tvdFt[i];
      if (!(d > 0) || Number.isNaN(ppPsi[i]) || Number.isNaN(fracturePsi[i])) continue;
      const c = collapsePsi ? collapsePsi[i] : NaN;
      const b = breakdownPsi ? breakdownPsi[i] : NaN;
      const lo = c > ppPsi[i] ? c : ppPsi[i];
      const hi = b < fracturePsi[i] ? b : fracturePsi[i];
      widestRaw = Math.max(widestRaw, (hi - lo) / d);
    }
    throw new ShalepointError("E_WINDOW_CLOSED_EVERYWHERE", "the mud-weight window is inverted at every depth", {
      param: "tripMarginPpg + kickMarginPpg",
      value: tripMarginPpg + kickMarginPpg,
      unit: "ppg",
      allowed: `< ${(widestRaw / PSI_PER_FT_PER_PPG).toFixed(2)} ppg (the widest window before margins)`,
      hint: widestRaw > 0 ? "Reduce the margins." : "The bounds cross even without margins: review pore pressure and fracture inputs.",
    });
  }
  const findings: WindowFinding[] = [];
  const toPpg = (g: number): string => (g / PSI_PER_FT_PER_PPG).toFixed(2);
  for (const { first: a, last: b, extreme: least } of narrowRuns) {
    findings.push({
      code: "F_WINDOW_CLOSES",
      message: `window narrower than ${minWidthPpg} ppg from ${tvdFt[a]} to ${tvdFt[b]} ft (narrowest ${toPpg(least)} ppg)`,
      topFt: tvdFt[a], baseFt: tvdFt[b], count: b - a + 1,
    });
  }
  for (const { first: a, last: b, extreme: worst } of invertedRuns) {
    findings.push({
      code: "F_WINDOW_INVERTS",
      message: `window inverted (lower above upper) from ${tvdFt[a]} to ${tvdFt[b]} ft (worst ${toPpg(worst)} ppg)`,
      topFt: tvdFt[a], baseFt: tvdFt[b], count: b - a + 1,
    });
  }
  findings.sort((a, b) => a.topFt - b.topFt);
  return findings;
}
