/**
 * Grouping of formation-pressure test points into pressure systems by robust
 * fluid-gradient lines; fluid identification, contacts and compartment matching.
 *
 * Pure: plain objects in and out.
 */
import { ShalepointError, type Warning } from "../errors.js";
import { identifyFluidFromGradient, type FluidGradientRanges, type GradientFluid } from "./identifyFluidFromGradient.js";

/**
 * Quality flag of a pressure test. Two vocabularies are accepted: `good` / `fair` / `poor`
 * (as in the project's pressure-test tables) and `good` / `suspect` / `bad`. `fair` ≡
 * `suspect`: used, and the line is flagged `suspect-points`. `poor` ≡ `bad`: never fitted,
 * rejected with a warning (a supercharged or lost-seal reading is not a formation pressure).
 */
export type PressureTestQuality = "good" | "fair" | "poor" | "suspect" | "bad";

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
  /** Name of the sand the test was taken in; tests sharing a name define a sand interval for contacts. */
  sand?: string;
}

/** A sand (permeable interval) in which a contact may lie, ft TVD. */
export interface SandInterval {
  topFt: number;
  baseFt: number;
  /** Sand name, when the interval came from the tests' `sand` names. */
  name?: string;
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
   * A point belongs to a line when within this many psi of it, > 0. Default 9 psi (own
   * choice: three standard deviations of a 3-psi scatter between repeat stabilised tests).
   * Near a contact, points within tolerance/(Δgradient) of it are ambiguous (≈ 25 ft for gas
   * over brine at 9 psi); the least-cost partition gives such a test to the leg it fits better.
   * Also the cost of a test left off every line and of each line (T², see below).
   */
  tolerancePsi?: number;
  /** Points a line needs, integer ≥ 2. Default 3 (a gas leg is often only 3–4 tests). */
  minPointsPerLine?: number;
  /**
   * Physical gradient range for any line, psi/ft. Default [0.02, 0.55] (common practice, no
   * source: light gas to heavy brine; a steeper "line" joins two pressure systems).
   */
  gradientRangePsiPerFt?: readonly [number, number];
  /** Logged depth range of the well, ft TVD; tests outside it are rejected with a warning. */
  wellTopFt?: number;
  wellBaseFt?: number;
  /**
   * Sands in which contacts may lie. Default: from the tests' `sand` names (see
   * {@link sandIntervalsFromTestNames}); without either, a contact needs both legs within
   * maxContactGapFt.
   */
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
  /** Sand intervals the contacts were looked for in (given, or from the tests' sand names). */
  sands: SandInterval[];
  /** Tolerance and gradient range used. */
  tolerancePsi: number;
  gradientRangePsiPerFt: [number, number];
  warnings: Warning[];
}

/**
 * Sand intervals from the `sand` names of formation-pressure tests.
 *
 * Each distinct name becomes one interval from its shallowest to its deepest test, widened
 * by half the test spacing on each side: top = z_min − s/2, base = z_max + s/2, with s the
 * median spacing between consecutive tests of that name (a single test: s = 0). Tests
 * without a name (or with a missing depth) are ignored. Own rule (common practice, no source:
 * a contact is only read inside the sand that holds both legs).
 *
 * @param tests pressure tests (tvdFt in ft TVD, e.g. 11,547 ft; `sand` names)
 * @returns intervals sorted by top, ft TVD, each with its name
 * @throws nothing
 * @example sandIntervalsFromTestNames([{ tvdFt: 11547, pressurePsi: 7494, sand: "Tarrant" },
 *   { tvdFt: 11587, pressurePsi: 7498, sand: "Tarrant" }, { tvdFt: 11607, pressurePsi: 7500, sand: "Tarrant" }])
 * // → [{ name: "Tarrant", topFt: 11532, baseFt: 11622 }] (spacings 40 and 20 ft, median 30)
 */
export function sandIntervalsFromTestNames(tests: readonly PressureTestPoint[]): SandInterval[] {
  const byName = new Map<string, number[]>();
  for (const t of tests) {
    if (t.sand === undefined || t.sand === "" || !Number.isFinite(t.tvdFt)) continue;
    const list = byName.get(t.sand) ?? [];
    list.push(t.tvdFt);
    byName.set(t.sand, list);
  }
  const out: SandInterval[] = [];
  for (const [name, zs] of byName) {
    zs.sort((u, v) => u - v);
    const gaps = zs.slice(1).map((z, k) => z - zs[k]).sort((u, v) => u - v);
    const m = gaps.length;
    const spacing = m === 0 ? 0 : m % 2 === 1 ? gaps[(m - 1) / 2] : 0.5 * (gaps[m / 2 - 1] + gaps[m / 2]);
    out.push({ name, topFt: zs[0] - spacing / 2, baseFt: zs[zs.length - 1] + spacing / 2 });
  }
  return out.sort((u, v) => u.topFt - v.topFt);
}

const MAX_TESTS = 400;

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

/** Least-squares line over zs[j..i] (sorted arrays), optionally leaving out index `skip`. */
function spanFit(zs: Float64Array, ps: Float64Array, j: number, i: number, skip: number): { g: number; a: number; rss: number; worst: number; worstAbs: number } {
  let n = 0;
  let mz = 0;
  let mp = 0;
  for (let k = j; k <= i; k++) {
    if (k === skip) continue;
    n++;
    mz += zs[k];
    mp += ps[k];
  }
  mz /= n;
  mp /= n;
  let szz = 0;
  let szp = 0;
  for (let k = j; k <= i; k++) {
    if (k === skip) continue;
    szz += (zs[k] - mz) ** 2;
    szp += (zs[k] - mz) * (ps[k] - mp);
  }
  const g = szz > 0 ? szp / szz : NaN;
  let rss = 0;
  let worst = -1;
  let worstAbs = -1;
  for (let k = j; k <= i; k++) {
    const r = Math.abs(ps[k] - mp - g * (zs[k] - mz));
    if (k !== skip) rss += r * r;
    if (r > worstAbs) {
      worstAbs = r;
      worst = k;
    }
  }
  return { g, a: mp - g * mz, rss, worst, worstAbs };
}

/**
 * Pressure-system grouping of formation-pressure tests by fluid-gradient lines.
 *
 * A pressure system is a contiguous depth range of tests in one well, so lines are runs of
 * depth-consecutive tests, and the grouping is an optimal partition of the depth-ordered
 * tests (dynamic programming over partitions of an interval: Jackson et al. 2005, IEEE Signal
 * Processing Letters 12(2):105–108, from memory):
 * 1. Points flagged `poor`/`bad`, missing, or outside [wellTopFt, wellBaseFt] are rejected
 *    and reported (each with a warning); `fair`/`suspect` points are used and flag their line.
 * 2. The usable tests, sorted by depth, are split into runs; each run is either one test
 *    left off every line (cost T², T = tolerancePsi) or a line of ≥ `minPointsPerLine`
 *    tests (cost Σ r² + T²) whose least-squares gradient lies in `gradientRangePsiPerFt`
 *    (default 0.02–0.55 psi/ft, common practice, no source) and whose every residual is
 *    ≤ T; a line may leave out one interior outlier (its worst point, cost T² more). The
 *    partition of least total cost wins — an MSAC-type score (each test costs min(r², T²);
 *    Torr & Zisserman 2000, Computer Vision and Image Understanding 78(1):138–156, eq. 7)
 *    plus T² per line, so a line must explain its tests well enough to pay for itself and
 *    a straight run is not split without cause. Far-apart collinear tests with other tests
 *    between them never form a line; a short gas leg over a water leg is its own line.
 * 3. Each line's fluid comes from its gradient (identifyFluidFromGradient, gradient ± 2 SE).
 * 4. Contacts: for a lighter line above a heavier one, the crossing depth
 *    z* = (a_heavy − a_light)/(g_light − g_heavy) must lie between the legs (± T expressed
 *    in depth) and inside one sand holding both legs' nearest points (sands given, or from
 *    the tests' `sand` names; without sands, the legs must be within maxContactGapFt).
 *    Lines joined by contacts share a system.
 * 5. Each line is matched to the compartment with the largest depth overlap.
 * Compartment concept: Bradley 1975, AAPG Bulletin 59(6):957–973 (from memory). Cost
 * O(k³) for k tests, so k ≤ 400.
 *
 * @param input see {@link FitPressureSystemsInput}
 * @returns lines (with fluid, flags, system and compartment), contacts, rejected points,
 *   the sands used, warnings
 * @throws ShalepointError E_RANGE for tolerance ≤ 0, minPointsPerLine < 2, a bad gradient
 *   range or more than 400 tests; E_TOO_SHORT when fewer usable tests than minPointsPerLine.
 * @example
 * // CHECK-VALUES §11 own case: 5000 psi at 9000 ft, 5093 psi at 9200 ft (and 9100 ft on the line)
 * // → one line, gradient 0.4650 psi/ft, water; a test at 9500 ft / 6000 psi fits no line.
 */
/**
 * Pressure-system grouping of formation-pressure tests by fluid-gradient lines.
 *
 * A pressure system is a contiguous depth range of tests in one well, so lines are built from
 * depth-contiguous groups of tests:
 * 1. Points flagged `poor`/`bad`, missing, or outside [wellTopFt, wellBaseFt] are rejected
 *    and reported (each with a warning); `fair`/`suspect` points are used and flag their line.
 * 2. Line search, repeated while a line of ≥ `minPointsPerLine` points is found: every pair
 *    of free tests with a gradient inside `gradientRangePsiPerFt` (default 0.02–0.55 psi/ft,
 *    common practice, no source) defines a candidate; its group is the run of consecutive
 *    free tests by depth holding both, within `tolerancePsi` of the line, where a single
 *    outlier may be skipped (never two in a row, at most one per three inliers) and a test
 *    already on another line ends the run. The candidate with the most inliers wins (ties:
 *    smallest Σ r²); its inliers are refit by least squares and re-grouped until stable; if
 *    the inliers bend (a split into two lines of ≥ 3 points each passes an F test at 1 %,
 *    Bonferroni-corrected), only the larger straight part is kept. The winner's inliers and
 *    skipped outliers are taken. Far-apart collinear tests with other tests between them
 *    therefore never form a line.
 * 3. Junctions: where the deepest test of one line is followed by the shallowest test of
 *    another, each junction test moves to the line it fits better (if the donor keeps
 *    `minPointsPerLine` points), with refits, until nothing moves.
 * 4. Each line's fluid comes from its gradient (identifyFluidFromGradient, gradient ± 2 SE).
 * 5. Contacts: for a lighter line above a heavier one, the crossing depth
 *    z* = (a_heavy − a_light)/(g_light − g_heavy) must lie between the legs (± tolerance
 *    expressed in depth) and inside one sand holding both legs' nearest points (sands given,
 *    or from the tests' `sand` names; without sands, the legs must be within
 *    maxContactGapFt). Lines joined by contacts share a system.
 * 6. Each line is matched to the compartment with the largest depth overlap.
 * Compartment concept: Bradley 1975, AAPG Bulletin 59(6):957–973 (from memory). Cost
 * O(k³) per line for k tests, so k ≤ 400.
 *
 * @param input see {@link FitPressureSystemsInput}
 * @returns lines (with fluid, flags, system and compartment), contacts, rejected points,
 *   the sands used, warnings
 * @throws ShalepointError E_RANGE for tolerance ≤ 0, minPointsPerLine < 2, a bad gradient
 *   range or more than 400 tests; E_TOO_SHORT when fewer usable tests than minPointsPerLine.
 * @example
 * // CHECK-VALUES §11 own case: 5000 psi at 9000 ft, 5093 psi at 9200 ft (and 9100 ft on the line)
 * // → one line, gradient 0.4650 psi/ft, water; a test at 9500 ft / 6000 psi fits no line.
 */
export function fitPressureSystems(input: FitPressureSystemsInput): FitPressureSystemsResult {
  const tol = input.tolerancePsi ?? 9;
  const minPts = input.minPointsPerLine ?? 3;
  const [gMin, gMax] = input.gradientRangePsiPerFt ?? [0.02, 0.55];
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
    const q: string = t.quality ?? "good";
    const base = { index: i, tvdFt: t.tvdFt, pressurePsi: t.pressurePsi };
    if (!(Number.isFinite(t.tvdFt) && Number.isFinite(t.pressurePsi))) {
      rejected.push({ ...base, reason: "missing-value" });
      warnings.push({ code: "W_TEST_MISSING_VALUE", message: `test ${t.label ?? i} has a missing depth or pressure: not used`, index: i });
    } else if (q !== "good" && q !== "fair" && q !== "suspect") {
      // poor, bad, or an unknown flag: never fitted.
      rejected.push({ ...base, reason: "bad-quality" });
      warnings.push({ code: "W_TEST_BAD_QUALITY", message: `test ${t.label ?? i} at ${t.tvdFt} ft is flagged ${q}: not used`, index: i, depthFt: t.tvdFt });
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
  const Z = (i: number): number => input.tests[i].tvdFt;
  const P = (i: number): number => input.tests[i].pressurePsi;
  const order = usable.slice().sort((u, v) => Z(u) - Z(v) || u - v);
  const isSuspect = (k: number): boolean => input.tests[k].quality === "fair" || input.tests[k].quality === "suspect";
  const m = order.length;
  const zs = Float64Array.from(order, Z);
  const ps = Float64Array.from(order, P);
  const T2 = tol * tol;

  // Optimal partition: best[i] = least cost of the first i tests (by depth).
  const best = new Float64Array(m + 1).fill(Infinity);
  const from = new Int32Array(m + 1).fill(-1); // start of the last run
  const skipAt = new Int32Array(m + 1).fill(-1); // skipped test of the last run, −1 none
  best[0] = 0;
  for (let i = 1; i <= m; i++) {
    // Test i − 1 left off every line.
    best[i] = best[i - 1] + T2;
    from[i] = i - 1;
    skipAt[i] = -2; // marks "no line"
    for (let j = i - minPts; j >= 0; j--) {
      if (!Number.isFinite(best[j])) continue;
      const last = i - 1;
      let fit = spanFit(zs, ps, j, last, -1);
      let skip = -1;
      if (!(fit.worstAbs <= tol) && last - j + 1 > minPts && fit.worst > j && fit.worst < last) {
        skip = fit.worst;
        fit = spanFit(zs, ps, j, last, skip);
        if (!(fit.worstAbs <= tol) && fit.worst !== skip) continue;
        // worstAbs may be the skipped point itself: check the others.
        let ok = true;
        for (let k = j; k <= last && ok; k++) if (k !== skip && Math.abs(ps[k] - fit.a - fit.g * zs[k]) > tol) ok = false;
        if (!ok) continue;
      } else if (!(fit.worstAbs <= tol)) {
        continue;
      }
      if (!(fit.g >= gMin && fit.g <= gMax)) continue;
      const cost = best[j] + fit.rss + T2 + (skip >= 0 ? T2 : 0);
      if (cost < best[i]) {
        best[i] = cost;
        from[i] = j;
        skipAt[i] = skip;
      }
    }
  }
  type Found = { idx: number[]; skipped: number[]; fit: ReturnType<typeof lsq> };
  const found: Found[] = [];
  for (let i = m; i > 0; i = from[i]) {
    if (skipAt[i] === -2) continue;
    const idx: number[] = [];
    const skipped: number[] = [];
    for (let k = from[i]; k < i; k++) (k === skipAt[i] ? skipped : idx).push(order[k]);
    found.push({ idx, skipped, fit: lsq(idx.map(Z), idx.map(P)) });
  }
  found.sort((u, v) => Z(u.idx[0]) - Z(v.idx[0]));
  const inLine = new Set<number>();
  for (const f of found) for (const k of f.idx) inLine.add(k);
  const remaining = order.filter((k) => !inLine.has(k)).sort((u, v) => u - v);
  const sands: SandInterval[] = input.sands !== undefined ? input.sands.map((sd) => ({ ...sd })) : sandIntervalsFromTestNames(input.tests.filter((_, i) => usable.includes(i)));

  // Lines.
  const lines: FluidGradientLine[] = found.map((f, lineId) => {
    const zs = f.idx.map(Z);
    const topFt = Math.min(...zs);
    const baseFt = Math.max(...zs);
    const fl = identifyFluidFromGradient({ gradientPsiPerFt: f.fit.g, standardErrorPsiPerFt: Number.isFinite(f.fit.se) ? f.fit.se : 0, ranges: input.fluidRanges });
    const flags: string[] = [];
    if (f.idx.length === 2) flags.push("two-points");
    if (baseFt - topFt < 20) flags.push("short-span");
    if (f.idx.some(isSuspect)) flags.push("suspect-points");
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
      if (sands.length > 0) {
        const s = sands.find((sd) => sd.topFt <= up.baseFt && sd.baseFt >= lo.topFt && zc >= sd.topFt - dzTol && zc <= sd.baseFt + dzTol);
        if (s === undefined) continue;
        sand = { ...s };
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
  return { lines, contacts, rejected, sands, tolerancePsi: tol, gradientRangePsiPerFt: [gMin, gMax], warnings };
}
