/**
 * Grouping of formation-pressure test points into pressure systems by robust
 * fluid-gradient lines; fluid identification, contacts and compartment matching.
 *
 * Pure: plain objects in and out.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { identifyFluidFromGradient, type FluidGradientRanges, type GradientFluid } from "./identifyFluidFromGradient.js";

/** Quality flag of a pressure test: `bad` points are excluded (and reported), `suspect` ones used and flagged. */
export type PressureTestQuality = "good" | "suspect" | "bad";

/** One formation-pressure test. */
export interface PressureTestPoint {
  /** TVD of the test, ft. */
  tvdFt: number;
  /** Stabilised formation pressure, psi. */
  pressurePsi: number;
  /** Quality flag; default `good`. */
  quality?: PressureTestQuality;
  /** Free label (e.g. test number), echoed in the output. */
  label?: string;
}

/** A sand (permeable interval) in which a contact may lie, ft TVD. */
export interface SandInterval {
  topFt: number;
  baseFt: number;
}

/** A log-derived compartment to match lines against, ft TVD. */
export interface CompartmentDepthRange {
  compartmentId: number;
  topFt: number;
  baseFt: number;
}

/** A fitted fluid-gradient line p = interceptPsi + gradientPsiPerFt · tvd. */
export interface FluidGradientLine {
  lineId: number;
  /** Indices into the input `tests` array. */
  pointIndices: number[];
  n: number;
  gradientPsiPerFt: number;
  /** Pressure extrapolated to TVD 0, psi (line intercept). */
  interceptPsi: number;
  /** Standard error of the gradient, psi/ft (NaN when n = 2). */
  gradientStdErrPsiPerFt: number;
  rmsResidualPsi: number;
  maxAbsResidualPsi: number;
  topFt: number;
  baseFt: number;
  fluid: GradientFluid;
  fluidEvidence: string;
  /** Quality flags: `two-points`, `short-span` (< 20 ft), `suspect-points`, `fluid-undetermined`, `no-compartment`. */
  flags: string[];
  /** Pressure system (lines joined by a contact share one). */
  systemId: number;
  /** Matched log-derived compartment (largest depth overlap), or null. */
  compartmentId: number | null;
}

/** A fluid contact where two lines cross. */
export interface FluidContact {
  depthFt: number;
  pressurePsi: number;
  upperLineId: number;
  lowerLineId: number;
  kind: string;
  /** The sand that holds it, when sands were given. */
  sand: SandInterval | null;
}

/** A test point not used in any line, with why. */
export interface PressureTestReject {
  index: number;
  tvdFt: number;
  pressurePsi: number;
  reason: "bad-quality" | "missing-value" | "outside-well" | "fits-no-line";
  /** For `fits-no-line`: residual to the nearest line at that depth, psi. */
  nearestResidualPsi?: number;
}

/** Arguments of {@link fitPressureSystems}. */
export interface FitPressureSystemsInput {
  tests: readonly PressureTestPoint[];
  /**
   * A point belongs to a line when within this many psi of it, > 0. Default 5 psi (own
   * choice: a few times the repeatability of a stabilised formation-pressure test). Near a
   * contact, points within tolerance/(Δgradient) of it are ambiguous (≈ 14 ft for gas over
   * brine at 5 psi).
   */
  tolerancePsi?: number;
  /** Points a line needs, integer ≥ 2. Default 3. */
  minPointsPerLine?: number;
  /** Plausible gradient range for any line, psi/ft. Default [0.02, 0.6]. */
  gradientRangePsiPerFt?: readonly [number, number];
  /** Logged depth range of the well, ft TVD; tests outside it are rejected with a warning. */
  wellTopFt?: number;
  wellBaseFt?: number;
  /** Sands in which contacts may lie. Without them, a contact needs both legs within maxContactGapFt. */
  sands?: readonly SandInterval[];
  /** Largest gap between two legs for a contact without sands, ft. Default 100 ft. */
  maxContactGapFt?: number;
  /** Log-derived compartments to match lines to. */
  compartments?: readonly CompartmentDepthRange[];
  /** Fluid gradient ranges (see identifyFluidFromGradient). */
  fluidRanges?: FluidGradientRanges;
}

/** Result of {@link fitPressureSystems}. */
export interface FitPressureSystemsResult {
  lines: FluidGradientLine[];
  contacts: FluidContact[];
  /** Points not used, with reasons (bad quality, missing, outside well, fits no line). */
  rejected: PressureTestReject[];
  warnings: Warning[];
}

const MAX_TESTS = 400;

/**
 * Bend test: does splitting the points (sorted by depth) into an upper and a lower line
 * (each ≥ 3 points) fit significantly better than one line? F = ((RSS₁ − RSS₂)/2) /
 * (RSS₂/(n − 4)) against the upper α quantile of F(2, n − 4), which for 2 numerator degrees
 * of freedom has the closed form (ν/2)(α^(−2/ν) − 1); α = 0.01 divided by the number of
 * split positions tried (Bonferroni). Returns the larger part's indices, or null if straight.
 */
function straightPart(idx: number[], Z: (i: number) => number, P: (i: number) => number): number[] | null {
  const n = idx.length;
  if (n < 6) return null;
  const sorted = idx.slice().sort((u, v) => Z(u) - Z(v));
  const rss = (a: number[]): number => {
    const f = lsq(a.map(Z), a.map(P));
    return f.rms * f.rms * a.length;
  };
  const rss1 = rss(sorted);
  let best = Infinity;
  let bestK = -1;
  for (let k = 3; k <= n - 3; k++) {
    const r = rss(sorted.slice(0, k)) + rss(sorted.slice(k));
    if (r < best) {
      best = r;
      bestK = k;
    }
  }
  const nu = n - 4;
  const alpha = 0.01 / (n - 5);
  const fCrit = (nu / 2) * (Math.pow(alpha, -2 / nu) - 1);
  const F = best > 0 ? ((rss1 - best) / 2) / (best / nu) : rss1 > 0 ? Infinity : 0;
  if (!(F > fCrit)) return null;
  const upper = sorted.slice(0, bestK);
  const lower = sorted.slice(bestK);
  return lower.length >= upper.length ? lower : upper;
}

function lsq(z: number[], p: number[]): { g: number; a: number; se: number; rms: number; maxAbs: number } {
  const n = z.length;
  let mz = 0;
  let mp = 0;
  for (let i = 0; i < n; i++) {
    mz += z[i];
    mp += p[i];
  }
  mz /= n;
  mp /= n;
  let szz = 0;
  let szp = 0;
  for (let i = 0; i < n; i++) {
    szz += (z[i] - mz) ** 2;
    szp += (z[i] - mz) * (p[i] - mp);
  }
  const g = szp / szz;
  let ss = 0;
  let maxAbs = 0;
  for (let i = 0; i < n; i++) {
    const r = p[i] - mp - g * (z[i] - mz);
    ss += r * r;
    maxAbs = Math.max(maxAbs, Math.abs(r));
  }
  const se = n > 2 ? Math.sqrt(ss / (n - 2) / szz) : NaN;
  return { g, a: mp - g * mz, se, rms: Math.sqrt(ss / n), maxAbs };
}

/**
 * Pressure-system grouping of formation-pressure tests by fluid-gradient lines.
 *
 * 1. Points flagged `bad`, missing, or outside [wellTopFt, wellBaseFt] are rejected and
 *    reported (each with a warning).
 * 2. Exact small-set consensus search: every pair of remaining points defines a candidate
 *    line with a gradient inside `gradientRangePsiPerFt`; the one with the lowest MSAC
 *    score Σ min(r², tolerance²) (Torr & Zisserman 2000, CVIU 78(1):138–156) and at least
 *    `minPointsPerLine` points within `tolerancePsi` wins; its inliers are refit by
 *    least squares and re-selected until stable; if the inliers bend (a split into two lines
 *    of ≥ 3 points each passes an F test at 1 %, Bonferroni-corrected), only the larger
 *    straight part is kept and re-grown; the line is kept if it has at least
 *    `minPointsPerLine` points, its points are removed, and the search repeats. This is
 *    exhaustive over pairs (O(k³) per line for k points, so k ≤ 400), and robust to
 *    outliers in the sense of a maximum-consensus fit.
 * 3. Each line's fluid comes from its gradient (identifyFluidFromGradient, gradient ± 2 SE).
 * 4. Contacts: for a lighter line above a heavier one, the crossing depth
 *    z* = (a_heavy − a_light)/(g_light − g_heavy) must lie between the legs (±tolerance
 *    expressed in depth) and inside one sand holding both legs' nearest points (or, without
 *    sands, the legs must be within maxContactGapFt). Lines joined by contacts share a system.
 * 5. Each line is matched to the compartment with the largest depth overlap.
 * Fluid-gradient ranges: common practice, no source. Compartment concept: Bradley 1975,
 * AAPG Bulletin 59(6):957–973 (from memory).
 *
 * @param input see {@link FitPressureSystemsInput}
 * @returns lines (with fluid, flags, system and compartment), contacts, rejected points, warnings
 * @throws ShalepointError E_RANGE for tolerance ≤ 0, minPointsPerLine < 2, a bad gradient
 *   range or more than 400 tests; E_TOO_SHORT when fewer usable tests than minPointsPerLine.
 * @example
 * // CHECK-VALUES §11 own case: 5000 psi at 9000 ft, 5093 psi at 9200 ft (and 9100 ft on the line)
 * // → one line, gradient 0.4650 psi/ft, water; a test at 9500 ft / 6000 psi fits no line.
 */
export function fitPressureSystems(input: FitPressureSystemsInput): FitPressureSystemsResult {
  const tol = input.tolerancePsi ?? 5;
  const minPts = input.minPointsPerLine ?? 3;
  const [gMin, gMax] = input.gradientRangePsiPerFt ?? [0.02, 0.6];
  const maxGap = input.maxContactGapFt ?? 100;
  if (!(Number.isFinite(tol) && tol > 0)) throw new ShalepointError("E_RANGE", "tolerancePsi must be > 0", { param: "tolerancePsi", value: tol, unit: "psi", allowed: "> 0" });
  if (!Number.isInteger(minPts) || minPts < 2) throw new ShalepointError("E_RANGE", "minPointsPerLine must be an integer ≥ 2", { param: "minPointsPerLine", value: minPts, allowed: "integer ≥ 2" });
  if (!(gMin < gMax)) throw new ShalepointError("E_RANGE", "gradientRangePsiPerFt must be [low, high] with low < high", { param: "gradientRangePsiPerFt", value: [gMin, gMax], unit: "psi/ft" });
  if (!(Number.isFinite(maxGap) && maxGap >= 0)) throw new ShalepointError("E_RANGE", "maxContactGapFt must be ≥ 0", { param: "maxContactGapFt", value: maxGap, unit: "ft", allowed: "≥ 0" });
  if (input.tests.length > MAX_TESTS) {
    throw new ShalepointError("E_RANGE", "too many pressure tests for the exhaustive line search", { param: "tests", value: input.tests.length, allowed: `≤ ${MAX_TESTS}`, hint: "Split the tests by interval first." });
  }
  const warnings: Warning[] = [];
  const rejected: PressureTestReject[] = [];
  const usable: number[] = [];
  input.tests.forEach((t, i) => {
    const q = t.quality ?? "good";
    const base = { index: i, tvdFt: t.tvdFt, pressurePsi: t.pressurePsi };
    if (!(Number.isFinite(t.tvdFt) && Number.isFinite(t.pressurePsi))) {
      rejected.push({ ...base, reason: "missing-value" });
      warnings.push({ code: "W_TEST_MISSING_VALUE", message: `test ${t.label ?? i} has a missing depth or pressure: not used`, index: i });
    } else if (q === "bad") {
      rejected.push({ ...base, reason: "bad-quality" });
      warnings.push({ code: "W_TEST_BAD_QUALITY", message: `test ${t.label ?? i} at ${t.tvdFt} ft is flagged bad: not used`, index: i, depthFt: t.tvdFt });
    } else if ((input.wellTopFt !== undefined && t.tvdFt < input.wellTopFt) || (input.wellBaseFt !== undefined && t.tvdFt > input.wellBaseFt)) {
      rejected.push({ ...base, reason: "outside-well" });
      warnings.push({ code: "W_TEST_OUTSIDE_WELL", message: `test ${t.label ?? i} at ${t.tvdFt} ft lies outside the well's logged range: not used`, index: i, depthFt: t.tvdFt });
    } else {
      usable.push(i);
    }
  });
  if (usable.length < minPts) {
    throw new ShalepointError("E_TOO_SHORT", "too few usable pressure tests to fit a gradient line", {
      param: "tests",
      value: usable.length,
      allowed: `≥ ${minPts} usable tests (minPointsPerLine)`,
      hint: rejected.length > 0 ? `${rejected.length} test(s) were rejected; see their quality flags and depths.` : undefined,
    });
  }
  const tol2 = tol * tol;
  const Z = (i: number): number => input.tests[i].tvdFt;
  const P = (i: number): number => input.tests[i].pressurePsi;

  type Found = { idx: number[]; fit: ReturnType<typeof lsq> };
  const found: Found[] = [];
  let remaining = usable.slice();
  for (;;) {
    if (remaining.length < minPts) break;
    let bestIdx: number[] = [];
    let bestScore = Infinity;
    for (let a = 0; a < remaining.length; a++) {
      for (let b = a + 1; b < remaining.length; b++) {
        const ia = remaining[a];
        const ib = remaining[b];
        const dz = Z(ib) - Z(ia);
        if (Math.abs(dz) < 1e-6) continue;
        const g = (P(ib) - P(ia)) / dz;
        if (g < gMin || g > gMax) continue;
        // MSAC score: Σ min(r², tol²) over all remaining points (Torr & Zisserman 2000,
        // Computer Vision and Image Understanding 78(1):138–156, eq. 7): fewer, tighter
        // points beat more, looser ones.
        const inl: number[] = [];
        let score = 0;
        for (const k of remaining) {
          const r = P(k) - P(ia) - g * (Z(k) - Z(ia));
          if (Math.abs(r) <= tol) {
            inl.push(k);
            score += r * r;
          } else {
            score += tol2;
          }
        }
        if (inl.length >= minPts && score < bestScore) {
          bestIdx = inl;
          bestScore = score;
        }
      }
    }
    if (bestIdx.length < minPts) break;
    // Refit and re-select until stable; when the inliers bend (two fluids, or two systems
    // caught by one band), keep the larger straight part (at most 10 rounds).
    let idx = bestIdx;
    let fit = lsq(idx.map(Z), idx.map(P));
    for (let round = 0; round < 10; round++) {
      const part = straightPart(idx, Z, P);
      if (part !== null) {
        idx = part;
        fit = lsq(idx.map(Z), idx.map(P));
      }
      const next = remaining.filter((k) => Math.abs(P(k) - fit.a - fit.g * Z(k)) <= tol);
      if (next.length < minPts) break;
      const same = next.length === idx.length && next.every((v, j) => v === idx[j]);
      if (same && part === null) break;
      idx = next;
      fit = lsq(idx.map(Z), idx.map(P));
      if (same) break;
    }
    if (idx.length < minPts) break;
    if (fit.g < gMin || fit.g > gMax) break;
    found.push({ idx: idx.slice().sort((u, v) => Z(u) - Z(v)), fit });
    const taken = new Set(idx);
    remaining = remaining.filter((k) => !taken.has(k));
  }

  // Lines.
  const lines: FluidGradientLine[] = found.map((f, lineId) => {
    const zs = f.idx.map(Z);
    const topFt = Math.min(...zs);
    const baseFt = Math.max(...zs);
    const fl = identifyFluidFromGradient({ gradientPsiPerFt: f.fit.g, standardErrorPsiPerFt: Number.isFinite(f.fit.se) ? f.fit.se : 0, ranges: input.fluidRanges });
    const flags: string[] = [];
    if (f.idx.length === 2) flags.push("two-points");
    if (baseFt - topFt < 20) flags.push("short-span");
    if (f.idx.some((k) => input.tests[k].quality === "suspect")) flags.push("suspect-points");
    if (fl.fluid === "undetermined") flags.push("fluid-undetermined");
    return {
      lineId,
      pointIndices: f.idx,
      n: f.idx.length,
      gradientPsiPerFt: f.fit.g,
      interceptPsi: f.fit.a,
      gradientStdErrPsiPerFt: f.fit.se,
      rmsResidualPsi: f.fit.rms,
      maxAbsResidualPsi: f.fit.maxAbs,
      topFt,
      baseFt,
      fluid: fl.fluid,
      fluidEvidence: fl.evidence,
      flags,
      systemId: lineId,
      compartmentId: null,
    };
  });

  // Contacts.
  const contacts: FluidContact[] = [];
  const parent = lines.map((_, i) => i);
  const root = (i: number): number => (parent[i] === i ? i : (parent[i] = root(parent[i])));
  const byTop = lines.slice().sort((u, v) => u.topFt - v.topFt);
  for (let i = 0; i < byTop.length; i++) {
    for (let j = i + 1; j < byTop.length; j++) {
      const up = byTop[i];
      const lo = byTop[j];
      if (!(up.gradientPsiPerFt < lo.gradientPsiPerFt) || up.baseFt > lo.topFt) continue;
      const zc = (lo.interceptPsi - up.interceptPsi) / (up.gradientPsiPerFt - lo.gradientPsiPerFt);
      // Depth tolerance equivalent to the pressure tolerance at the crossing angle.
      const dzTol = tol / (lo.gradientPsiPerFt - up.gradientPsiPerFt);
      if (zc < up.baseFt - dzTol || zc > lo.topFt + dzTol) continue;
      let sand: SandInterval | null = null;
      if (input.sands !== undefined) {
        const s = input.sands.find((sd) => sd.topFt <= up.baseFt && sd.baseFt >= lo.topFt && zc >= sd.topFt - dzTol && zc <= sd.baseFt + dzTol);
        if (s === undefined) continue;
        sand = { topFt: s.topFt, baseFt: s.baseFt };
      } else if (lo.topFt - up.baseFt > maxGap) {
        continue;
      }
      contacts.push({
        depthFt: zc,
        pressurePsi: up.interceptPsi + up.gradientPsiPerFt * zc,
        upperLineId: up.lineId,
        lowerLineId: lo.lineId,
        kind: `${up.fluid}-${lo.fluid}`,
        sand,
      });
      parent[root(lo.lineId)] = root(up.lineId);
    }
  }
  for (const l of lines) l.systemId = root(l.lineId);
  // Renumber systems 0, 1, … by first appearance.
  const sysMap = new Map<number, number>();
  for (const l of lines) {
    if (!sysMap.has(l.systemId)) sysMap.set(l.systemId, sysMap.size);
    l.systemId = sysMap.get(l.systemId)!;
  }

  // Compartments.
  if (input.compartments !== undefined) {
    for (const l of lines) {
      let best: number | null = null;
      let bestOverlap = -Infinity;
      for (const c of input.compartments) {
        const overlap = Math.min(l.baseFt, c.baseFt) - Math.max(l.topFt, c.topFt);
        if (overlap >= 0 && overlap > bestOverlap) {
          bestOverlap = overlap;
          best = c.compartmentId;
        }
      }
      l.compartmentId = best;
      if (best === null) l.flags.push("no-compartment");
    }
  }

  // Points that fit no line.
  for (const k of remaining) {
    let nearest = Infinity;
    for (const l of lines) {
      const r = input.tests[k].pressurePsi - l.interceptPsi - l.gradientPsiPerFt * input.tests[k].tvdFt;
      if (Math.abs(r) < Math.abs(nearest)) nearest = r;
    }
    rejected.push({ index: k, tvdFt: Z(k), pressurePsi: P(k), reason: "fits-no-line", nearestResidualPsi: Number.isFinite(nearest) ? nearest : undefined });
    warnings.push({ code: "W_TEST_FITS_NO_LINE", message: `test ${input.tests[k].label ?? k} at ${Z(k)} ft fits no fluid-gradient line`, index: k, depthFt: Z(k) });
  }
  rejected.sort((u, v) => u.index - v.index);
  return { lines, contacts, rejected, warnings };
}
