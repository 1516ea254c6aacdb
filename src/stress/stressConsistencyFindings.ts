import { ShalepointError } from "../errors.js";
import { frictionalStressRatio } from "./frictionalStressBounds.js";
import { interpolateOnDepthIndex, requireStressCurves } from "./stressSeries.js";

/** A measured minimum horizontal stress (XLOT / minifrac closure), for checking. */
export interface MeasuredShmin {
  tvdFt: number;
  shminPsi: number;
  label?: string;
}

/** Kinds of inconsistency found. */
export type StressFindingCode =
  | "F_PP_AT_LEAST_STRESS"
  | "F_SHMIN_BELOW_FRICTIONAL_LIMIT"
  | "F_SHMIN_ABOVE_FRICTIONAL_LIMIT"
  | "F_STRESSES_CONVERGE_ON_PP";

/** One finding over a depth range (one sample: topFt = baseFt). */
export interface StressFinding {
  code: StressFindingCode;
  message: string;
  /** Shallowest and deepest depth of the range, ft TVD. */
  topFt: number;
  baseFt: number;
  /** Samples in the range (1 for a point check). */
  count: number;
}

/**
 * Consistency checks on pore pressure and stresses along a well, returned as findings with
 * depths (never thrown, never printed).
 *
 * 1. Pp at or above the least principal stress (min of Sv and the Shmin curve when given):
 *    the rock would fracture, so the inputs cannot all be right.
 * 2. A measured Shmin outside the frictional envelope: below Pp + (Sv − Pp)/q (normal-faulting
 *    limit) or above Pp + q (Sv − Pp) (reverse-faulting limit).
 * 3. Stresses converging on pore pressure: runs of at least `minRunSamples` where the least
 *    principal stress minus Pp decreases with depth (the mud-weight window narrows).
 *
 * @param args.tvdFt depth index, ft TVD, increasing
 * @param args.ppPsi pore pressure, psi
 * @param args.svPsi overburden, psi
 * @param args.shminPsi optional Shmin curve, psi (e.g. a calibrated fracture model)
 * @param args.measuredShmin optional measured Shmin points inside the well
 * @param args.frictionCoefficient μ ≥ 0, default 0.6
 * @param args.minRunSamples shortest convergence run reported, ≥ 2, default 5
 * @returns findings in check order (1, 2, 3), each by depth (measured points in input order)
 * @throws ShalepointError E_RANGE for μ < 0; E_DEPTH_OUTSIDE_WELL for a measured point
 *   outside the depth index; E_LENGTH on mismatch
 * @example stressConsistencyFindings({ tvdFt: [1000], ppPsi: [1100], svPsi: [1000] })
 *   // [{ code: "F_PP_AT_LEAST_STRESS", topFt: 1000, baseFt: 1000, count: 1, … }]
 *
 * Reference: Zoback 2007, Reservoir Geomechanics, ch. 4 (frictional limits; converging
 * stresses with overpressure) — from memory; CHECK-VALUES §13 (common practice, no source).
 */
export function stressConsistencyFindings(args: {
  tvdFt: ArrayLike<number>;
  ppPsi: ArrayLike<number>;
  svPsi: ArrayLike<number>;
  shminPsi?: ArrayLike<number>;
  measuredShmin?: readonly MeasuredShmin[];
  frictionCoefficient?: number;
  minRunSamples?: number;
}): StressFinding[] {
  const { tvdFt, ppPsi, svPsi, shminPsi } = args;
  const q = frictionalStressRatio(args.frictionCoefficient ?? 0.6);
  const n = requireStressCurves(tvdFt, ppPsi, svPsi);
  if (shminPsi !== undefined) requireStressCurves(tvdFt, ppPsi, shminPsi);
  const minRun = Math.max(2, Math.floor(args.minRunSamples ?? 5));
  const findings: StressFinding[] = [];
  // The least principal stress at a sample: min(Sv, Shmin) (Sv without Shmin).
  const least = (i: number): number => (shminPsi === undefined ? svPsi[i] : Math.min(svPsi[i], shminPsi[i]));

  // One pass for checks 1 and 3 (they run on every while-drilling update, over the whole
  // well): runs of Pp ≥ least stress, and runs of least stress − Pp falling with depth (the
  // margin wiggles sample to sample, so most of those runs are short and dropped at once).
  const atLeastRuns: number[] = []; // [first, last] pairs
  const convergingRuns: number[] = []; // [sample above the first member, last] pairs
  // min(Sv, Sv) = Sv, so Sv stands in for a missing Shmin.
  const sh = shminPsi ?? svPsi;
  let badStart = -1;
  let fallStart = -1;
  let dPrev = NaN;
  for (let i = 0; i < n; i++) {
    const l = Math.min(svPsi[i], sh[i]);
    const p = ppPsi[i];
    if (p >= l) {
      if (badStart < 0) badStart = i;
    } else if (badStart >= 0) {
      atLeastRuns.push(badStart, i - 1);
      badStart = -1;
    }
    const d = l - p;
    if (i > 0) {
      if (d < dPrev) {
        if (fallStart < 0) fallStart = i;
      } else if (fallStart >= 0) {
        // the run compares with the sample above its first member
        if (i - fallStart + 1 >= minRun) convergingRuns.push(fallStart - 1, i - 1);
        fallStart = -1;
      }
    }
    dPrev = d;
  }
  if (badStart >= 0) atLeastRuns.push(badStart, n - 1);
  if (fallStart >= 0 && n - fallStart + 1 >= minRun) convergingRuns.push(fallStart - 1, n - 1);

  // 1. Pp at or above the least principal stress: contiguous runs.
  for (let r = 0; r < atLeastRuns.length; r += 2) {
    const a = atLeastRuns[r];
    const b = atLeastRuns[r + 1];
    findings.push({
      code: "F_PP_AT_LEAST_STRESS",
      message: `pore pressure at or above the least principal stress from ${tvdFt[a]} to ${tvdFt[b]} ft: the rock would fracture; review pore pressure, overburden and Shmin`,
      topFt: tvdFt[a],
      baseFt: tvdFt[b],
      count: b - a + 1,
    });
  }

  // 2. Measured Shmin against the frictional envelope.
  const top = n > 0 ? tvdFt[0] : NaN;
  const base = n > 0 ? tvdFt[n - 1] : NaN;
  (args.measuredShmin ?? []).forEach((m, k) => {
    if (!(m.tvdFt >= top && m.tvdFt <= base)) {
      throw new ShalepointError("E_DEPTH_OUTSIDE_WELL", `measured Shmin ${k} lies outside the well's depth index`, {
        param: `measuredShmin[${k}].tvdFt`, value: m.tvdFt, unit: "ft", allowed: `[${top}, ${base}]`,
      });
    }
    const pp = interpolateOnDepthIndex({ tvdFt, values: ppPsi, depthFt: m.tvdFt, clampEnds: false });
    const sv = interpolateOnDepthIndex({ tvdFt, values: svPsi, depthFt: m.tvdFt, clampEnds: false });
    if (!(Number.isFinite(pp) && Number.isFinite(sv))) return;
    const lo = pp + (sv - pp) / q;
    const hi = pp + q * (sv - pp);
    const name = m.label ? ` (${m.label})` : "";
    if (m.shminPsi < lo) {
      findings.push({
        code: "F_SHMIN_BELOW_FRICTIONAL_LIMIT",
        message: `measured Shmin${name} ${m.shminPsi} psi at ${m.tvdFt} ft is below the normal-faulting limit ${lo.toFixed(0)} psi (μ ${args.frictionCoefficient ?? 0.6})`,
        topFt: m.tvdFt, baseFt: m.tvdFt, count: 1,
      });
    } else if (m.shminPsi > hi) {
      findings.push({
        code: "F_SHMIN_ABOVE_FRICTIONAL_LIMIT",
        message: `measured Shmin${name} ${m.shminPsi} psi at ${m.tvdFt} ft is above the reverse-faulting limit ${hi.toFixed(0)} psi`,
        topFt: m.tvdFt, baseFt: m.tvdFt, count: 1,
      });
    }
  });

  // 3. Convergence: least stress − Pp falling with depth over at least minRun samples.
  for (let r = 0; r < convergingRuns.length; r += 2) {
    const start = convergingRuns[r];
    const b = convergingRuns[r + 1];
    const m0 = least(start) - ppPsi[start];
    const m1 = least(b) - ppPsi[b];
    findings.push({
      code: "F_STRESSES_CONVERGE_ON_PP",
      message: `least stress minus pore pressure falls from ${m0.toFixed(0)} to ${m1.toFixed(0)} psi between ${tvdFt[start]} and ${tvdFt[b]} ft: the window narrows with depth`,
      topFt: tvdFt[start],
      baseFt: tvdFt[b],
      count: b - start + 1,
    });
  }
  return findings;
}
