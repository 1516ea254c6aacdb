/**
 * Classification of a segmented pore-pressure profile: hydrostatic intervals, ramps,
 * compartments, regressions, the top of overpressure and the seals.
 *
 * Pure: typed arrays in, plain objects out.
 */
import { ShalepointError, requireSameLength, type Warning } from "../errors.js";
import type { ChangePointCost } from "./changePointsPelt.js";
import {
  compartmentIntervalStats,
  segmentPressureProfile,
  type PressureProfileSegment,
  type SegmentPressureProfileResult,
} from "./segmentPressureProfile.js";

/**
 * Label of an interval of the pressure profile.
 * - `hydrostatic`: excess pressure below the threshold at both ends.
 * - `ramp`: excess pressure rising with depth (transition, e.g. across a seal or in an
 *   undercompacted shale).
 * - `compartment`: excess pressure above the threshold and about constant with depth
 *   (fluid follows a water gradient at an elevated level).
 * - `regression`: excess pressure falling with depth (pressure drops back toward hydrostatic).
 * - `underpressured`: excess pressure below minus the threshold and about constant.
 */
export type PressureIntervalLabel = "hydrostatic" | "ramp" | "compartment" | "regression" | "underpressured";

/** A labelled interval with its statistics and the evidence for the label. */
export interface PressureInterval extends PressureProfileSegment {
  /** Position in the `intervals` list, top first. */
  id: number;
  label: PressureIntervalLabel;
  /** Change of fitted excess pressure from top to base, psi. */
  excessChangePsi: number;
  /** Thickness (base − top), ft. */
  thicknessFt: number;
  /** Plain-text reason for the label, with the numbers that decided it. */
  evidence: string;
}

/** A shale seal found at a compartment boundary. */
export interface PressureSeal {
  /** Top and base of the shale run, ft TVD, and its thickness, ft. */
  topFt: number;
  baseFt: number;
  thicknessFt: number;
  /** The compartment it bounds, and on which side. */
  compartmentId: number;
  side: "above" | "below";
  /** Excess pressure change across the boundary zone it sits in, psi (positive = pressure rises downward). */
  excessChangeAcrossPsi: number;
}

/** Statistics of one compartment interval. */
export interface CompartmentSummary {
  compartmentId: number;
  topFt: number;
  baseFt: number;
  thicknessFt: number;
  meanExcessPsi: number;
  /** Gradient of pore pressure inside the compartment, psi/ft. */
  ppGradientPsiPerFt: number;
  /** Gradient of excess pressure, psi/ft. */
  excessGradientPsiPerFt: number;
  /** Seals found above and below (null when none qualifies). */
  sealAbove: PressureSeal | null;
  sealBelow: PressureSeal | null;
}

/** A boundary between two adjacent intervals. */
export interface PressureBoundary {
  depthFt: number;
  upperLabel: PressureIntervalLabel;
  lowerLabel: PressureIntervalLabel;
  /** Fitted excess at top of lower interval minus fitted excess at base of upper, psi. */
  excessJumpPsi: number;
}

/** Arguments of {@link classifyPressureCompartments}. */
export interface ClassifyPressureCompartmentsInput {
  /** TVD, ft, non-decreasing. */
  tvdFt: ArrayLike<number>;
  /** Pore pressure, psi (NaN = missing). */
  ppPsi: ArrayLike<number>;
  /** Hydrostatic pressure, psi, same index. */
  hydrostaticPsi: ArrayLike<number>;
  /** Shale flag on the same index (1 = shale), used to find seals. Optional. */
  shaleFlag?: Uint8Array;
  /** Segmentation settings, passed to segmentPressureProfile. */
  cost?: ChangePointCost;
  penaltyPsi2?: number;
  minThicknessFt?: number;
  useMask?: Uint8Array;
  decimateEvery?: number;
  decimateSpacingFt?: number;
  /**
   * Excess pressure below which an interval is hydrostatic, psi, > 0. Default 100 psi
   * (common practice, no source: about the scatter of log-derived pore pressure).
   */
  hydrostaticExcessPsi?: number;
  /**
   * Slope of excess pressure below which an interval counts as flat, psi/ft, > 0.
   * Default 0.1 psi/ft (own choice). An interval is also flat when its excess changes by
   * less than `hydrostaticExcessPsi` from top to base.
   */
  flatGradientPsiPerFt?: number;
  /** Minimum thickness of a shale run to count as a seal, ft. Default 100 ft (own choice). */
  minSealThicknessFt?: number;
  /**
   * How far from a boundary a seal is looked for when no ramp or regression interval
   * marks the boundary zone, ft. Default 150 ft.
   */
  sealSearchFt?: number;
}

/** Result of {@link classifyPressureCompartments}. */
export interface ClassifyPressureCompartmentsResult {
  /** Labelled intervals, top first (adjacent segments of one kind merged). */
  intervals: PressureInterval[];
  boundaries: PressureBoundary[];
  /** Top of the first overpressured interval (ramp or compartment), ft; null when none. */
  topOfOverpressureFt: number | null;
  compartments: CompartmentSummary[];
  seals: PressureSeal[];
  /** Intervals labelled `regression`. */
  regressions: PressureInterval[];
  /** The segmentation the labels were built on. */
  segmentation: SegmentPressureProfileResult;
  /** Thresholds used. */
  hydrostaticExcessPsi: number;
  flatGradientPsiPerFt: number;
  warnings: Warning[];
}

/** Adjacent ramp (or regression) pieces whose excess gradients differ by less than this factor are joined. */
const RAMP_MERGE_RATIO = 2;

function labelOf(s: PressureProfileSegment, thr: number, flat: number): { label: PressureIntervalLabel; evidence: string } {
  const change = s.excessBasePsi - s.excessTopPsi;
  const g = s.excessGradientPsiPerFt;
  const nums = `mean excess ${s.meanExcessPsi.toFixed(0)} psi, excess ${s.excessTopPsi.toFixed(0)}→${s.excessBasePsi.toFixed(0)} psi, excess gradient ${g.toFixed(3)} psi/ft over ${(s.baseFt - s.topFt).toFixed(0)} ft`;
  if (Math.abs(s.excessTopPsi) < thr && Math.abs(s.excessBasePsi) < thr) {
    return { label: "hydrostatic", evidence: `|excess| < ${thr} psi at top and base (${nums})` };
  }
  // A sloping interval is a ramp (or regression) by its gradient: a long transition is
  // often cut into short pieces whose own excess change is below T. The small floor on the
  // change (T/10) keeps a short, noisy tilt flat.
  if (change >= 0.1 * thr && g > flat) return { label: "ramp", evidence: `excess rises ${change.toFixed(0)} psi downward (${nums})` };
  if (change <= -0.1 * thr && g < -flat) return { label: "regression", evidence: `excess falls ${(-change).toFixed(0)} psi downward (${nums})` };
  if (s.meanExcessPsi <= -thr) return { label: "underpressured", evidence: `flat and below hydrostatic (${nums})` };
  return { label: "compartment", evidence: `flat excess above ${thr} psi (${nums})` };
}

interface ShaleRun {
  topFt: number;
  baseFt: number;
}

function shaleRuns(tvdFt: ArrayLike<number>, flag: Uint8Array): ShaleRun[] {
  const runs: ShaleRun[] = [];
  let start = -1;
  let lastShale = -1;
  for (let i = 0; i <= flag.length; i++) {
    const isShale = i < flag.length && flag[i] === 1 && Number.isFinite(tvdFt[i]);
    if (isShale) {
      if (start < 0) start = i;
      lastShale = i;
    } else if (start >= 0) {
      runs.push({ topFt: tvdFt[start], baseFt: tvdFt[lastShale] });
      start = -1;
    }
  }
  return runs;
}

/**
 * Pressure-compartment classification of a pore-pressure profile.
 *
 * Segments excess pressure Δp = pp − ph by PELT (see segmentPressureProfile), labels each
 * segment from its fitted excess at top and base and its excess gradient g (thresholds
 * T = hydrostaticExcessPsi, G = flatGradientPsiPerFt):
 *   hydrostatic if |Δp_top| < T and |Δp_base| < T;
 *   ramp if Δp_base − Δp_top ≥ T and g > G; regression if Δp_base − Δp_top ≤ −T and g < −G;
 *   otherwise compartment (or underpressured when mean Δp ≤ −T).
 * Adjacent segments with one label are merged (compartments only when their mean excess
 * differs by less than T). The top of overpressure is the top of the first ramp or
 * compartment. Seals are the thickest shale run (shale flag = 1, at least
 * minSealThicknessFt thick) overlapping the zone above and below each compartment: the
 * neighbouring ramp or regression interval, or the boundary ± sealSearchFt.
 * The compartment concept follows Bradley 1975, AAPG Bulletin 59(6):957–973 and Hunt
 * 1990, AAPG Bulletin 74(1):1–12 (from memory); the thresholds are choices of this module.
 *
 * @param input see {@link ClassifyPressureCompartmentsInput}
 * @returns labelled intervals, boundaries, top of overpressure, compartments and seals
 * @throws ShalepointError as segmentPressureProfile, plus E_RANGE for thresholds ≤ 0
 * @example
 * // hydrostatic to 8000 ft, ramp to 8500 ft (+1500 psi), compartment to 10,000 ft, regression
 * // → topOfOverpressureFt ≈ 8000, one compartment ≈ 8500–10,000 ft (see the tests)
 */
export function classifyPressureCompartments(input: ClassifyPressureCompartmentsInput): ClassifyPressureCompartmentsResult {
  const thr = input.hydrostaticExcessPsi ?? 100;
  const flat = input.flatGradientPsiPerFt ?? 0.1;
  const minSeal = input.minSealThicknessFt ?? 100;
  const searchFt = input.sealSearchFt ?? 150;
  for (const [param, value, unit] of [
    ["hydrostaticExcessPsi", thr, "psi"],
    ["flatGradientPsiPerFt", flat, "psi/ft"],
    ["minSealThicknessFt", minSeal, "ft"],
    ["sealSearchFt", searchFt, "ft"],
  ] as const) {
    if (!(Number.isFinite(value) && value > 0)) {
      throw new ShalepointError("E_RANGE", `${param} must be > 0`, { param, value, unit, allowed: "> 0" });
    }
  }
  if (input.shaleFlag !== undefined) requireSameLength(input.tvdFt, input.shaleFlag, "tvdFt", "shaleFlag");
  const seg = segmentPressureProfile(input);
  const { tvdFt, ppPsi, hydrostaticPsi } = input;
  const warnings: Warning[] = [...seg.warnings];

  // Samples eligible for interval statistics (finite and inside the mask).
  const n0 = tvdFt.length;
  const excess = new Float64Array(n0);
  const ok = new Uint8Array(n0);
  for (let i = 0; i < n0; i++) {
    excess[i] = ppPsi[i] - hydrostaticPsi[i];
    ok[i] = Number.isFinite(excess[i]) && Number.isFinite(tvdFt[i]) && (input.useMask === undefined || input.useMask[i] === 1) ? 1 : 0;
  }
  const statsOver = (first: number, last: number): PressureProfileSegment => {
    const s: number[] = [];
    for (let i = first; i <= last; i++) if (ok[i] === 1) s.push(i);
    return compartmentIntervalStats(tvdFt, excess, ppPsi, s);
  };

  // Label and merge.
  type Raw = { first: number; last: number; label: PressureIntervalLabel };
  const merged: Raw[] = [];
  for (const s of seg.segments) {
    const { label } = labelOf(s, thr, flat);
    const prev = merged[merged.length - 1];
    if (prev !== undefined && prev.label === label) {
      const ps = statsOver(prev.first, prev.last);
      let join: boolean;
      if (label === "ramp" || label === "regression") {
        // Join pieces of one transition, but keep a steeper ramp (e.g. across a seal)
        // apart from a gentler one (disequilibrium compaction): gradients within 2×.
        const g1 = Math.abs(ps.excessGradientPsiPerFt);
        const g2 = Math.abs(s.excessGradientPsiPerFt);
        join = Math.max(g1, g2) < RAMP_MERGE_RATIO * Math.min(g1, g2);
      } else if (label === "hydrostatic") {
        join = true;
      } else {
        join = Math.abs(ps.meanExcessPsi - s.meanExcessPsi) < thr;
      }
      if (join) {
        prev.last = s.lastIndex;
        continue;
      }
    }
    merged.push({ first: s.firstIndex, last: s.lastIndex, label });
  }
  const intervals: PressureInterval[] = merged.map((m, id) => {
    const st = statsOver(m.first, m.last);
    const { label, evidence } = labelOf(st, thr, flat);
    // Merged statistics normally keep the label; if not, keep the segment-level label and say so.
    const ev = label === m.label ? evidence : `${evidence}; segment-level label ${m.label} kept`;
    return { ...st, id, label: m.label, excessChangePsi: st.excessBasePsi - st.excessTopPsi, thicknessFt: st.baseFt - st.topFt, evidence: ev };
  });
  const boundaries: PressureBoundary[] = [];
  for (let k = 1; k < intervals.length; k++) {
    const a = intervals[k - 1];
    const b = intervals[k];
    boundaries.push({ depthFt: 0.5 * (a.baseFt + b.topFt), upperLabel: a.label, lowerLabel: b.label, excessJumpPsi: b.excessTopPsi - a.excessBasePsi });
  }
  const firstOp = intervals.find((iv) => iv.label === "ramp" || iv.label === "compartment");
  const topOfOverpressureFt = firstOp === undefined ? null : firstOp.topFt;
  if (firstOp !== undefined && firstOp.id === 0) {
    warnings.push({ code: "W_OVERPRESSURE_AT_TOP_OF_DATA", message: "profile is overpressured from its first sample: the true top of overpressure may be shallower", depthFt: firstOp.topFt });
  }

  // Seals.
  const runs = input.shaleFlag === undefined ? [] : shaleRuns(tvdFt, input.shaleFlag);
  if (input.shaleFlag === undefined) {
    warnings.push({ code: "W_NO_SHALE_FLAG", message: "no shale flag given: seals not identified" });
  }
  const seals: PressureSeal[] = [];
  const compartments: CompartmentSummary[] = [];
  const findSeal = (zoneTop: number, zoneBase: number, compartmentId: number, side: "above" | "below", change: number): PressureSeal | null => {
    let best: ShaleRun | null = null;
    for (const r of runs) {
      if (r.baseFt < zoneTop || r.topFt > zoneBase) continue;
      if (best === null || r.baseFt - r.topFt > best.baseFt - best.topFt) best = r;
    }
    if (best === null || best.baseFt - best.topFt < minSeal) {
      if (input.shaleFlag !== undefined) {
        warnings.push({
          code: "W_NO_SEAL_FOUND",
          message: `no shale ≥ ${minSeal} ft found ${side} compartment ${compartmentId} between ${zoneTop.toFixed(0)} and ${zoneBase.toFixed(0)} ft`,
          depthFt: side === "above" ? zoneBase : zoneTop,
        });
      }
      return null;
    }
    // Two compartments can share one seal: list it once (as the first compartment found it).
    const known = seals.find((x) => x.topFt === best!.topFt && x.baseFt === best!.baseFt);
    if (known !== undefined) return known;
    const seal: PressureSeal = { topFt: best.topFt, baseFt: best.baseFt, thicknessFt: best.baseFt - best.topFt, compartmentId, side, excessChangeAcrossPsi: change };
    seals.push(seal);
    return seal;
  };
  for (const iv of intervals) {
    if (iv.label !== "compartment") continue;
    const cid = compartments.length;
    const above = intervals[iv.id - 1];
    const below = intervals[iv.id + 1];
    let sealAbove: PressureSeal | null = null;
    let sealBelow: PressureSeal | null = null;
    if (above !== undefined) {
      const zone = above.label === "ramp" || above.label === "regression" ? [above.topFt, above.baseFt] : [iv.topFt - searchFt, iv.topFt + searchFt];
      sealAbove = findSeal(zone[0], zone[1], cid, "above", iv.excessTopPsi - (above.label === "compartment" ? above.excessBasePsi : above.excessTopPsi));
    }
    if (below !== undefined) {
      const zone = below.label === "ramp" || below.label === "regression" ? [below.topFt, below.baseFt] : [iv.baseFt - searchFt, iv.baseFt + searchFt];
      sealBelow = findSeal(zone[0], zone[1], cid, "below", (below.label === "compartment" ? below.excessTopPsi : below.excessBasePsi) - iv.excessBasePsi);
    }
    compartments.push({
      compartmentId: cid,
      topFt: iv.topFt,
      baseFt: iv.baseFt,
      thicknessFt: iv.thicknessFt,
      meanExcessPsi: iv.meanExcessPsi,
      ppGradientPsiPerFt: iv.ppGradientPsiPerFt,
      excessGradientPsiPerFt: iv.excessGradientPsiPerFt,
      sealAbove,
      sealBelow,
    });
  }
  return {
    intervals,
    boundaries,
    topOfOverpressureFt,
    compartments,
    seals,
    regressions: intervals.filter((iv) => iv.label === "regression"),
    segmentation: seg,
    hydrostaticExcessPsi: thr,
    flatGradientPsiPerFt: flat,
    warnings,
  };
}
