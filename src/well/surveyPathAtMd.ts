/**
 * Well path at arbitrary measured depths, interpolated along the minimum-curvature arcs
 * between survey stations (not linearly in TVD), and the inverse TVD → MD.
 */
import { ShalepointError } from "../errors.js";
import type { SurveyStation } from "./types.js";
import { doglegAngleRad, minimumCurvaturePositions, surveyTangent } from "./minimumCurvature.js";

const RAD = 180 / Math.PI;

/** sin(x)/x, exact to rounding for all x (series below 1e-4 where sin(x)/x cancels). */
function sinc(x: number): number {
  if (Math.abs(x) < 1e-4) return 1 - (x * x) / 6;
  return Math.sin(x) / x;
}

/** Nodes of the path (tie-in + stations) with their tangents and segment data. */
interface PathNodes {
  md: Float64Array; tvd: Float64Array; north: Float64Array; east: Float64Array;
  tn: Float64Array; te: Float64Array; td: Float64Array;
  /** Dogleg angle (rad) and sinc(β) of the segment from node k to node k+1. */
  beta: Float64Array; sincBeta: Float64Array;
}

function buildNodes(survey: readonly SurveyStation[]): PathNodes {
  const pos = minimumCurvaturePositions(survey);
  const off = pos.tieInAdded ? 1 : 0;
  const m = survey.length + off;
  const nodes: PathNodes = {
    md: new Float64Array(m), tvd: new Float64Array(m), north: new Float64Array(m), east: new Float64Array(m),
    tn: new Float64Array(m), te: new Float64Array(m), td: new Float64Array(m),
    beta: new Float64Array(m), sincBeta: new Float64Array(m),
  };
  if (off === 1) nodes.td[0] = 1; // vertical tie-in at MD 0, TVD 0, N 0, E 0
  for (let i = 0; i < survey.length; i++) {
    const k = i + off;
    const t = surveyTangent(survey[i].incDeg, survey[i].aziDeg);
    nodes.md[k] = pos.mdFt[i]; nodes.tvd[k] = pos.tvdFt[i];
    nodes.north[k] = pos.northFt[i]; nodes.east[k] = pos.eastFt[i];
    nodes.tn[k] = t.n; nodes.te[k] = t.e; nodes.td[k] = t.d;
  }
  for (let k = 0; k + 1 < m; k++) {
    const b = doglegAngleRad(
      { n: nodes.tn[k], e: nodes.te[k], d: nodes.td[k] },
      { n: nodes.tn[k + 1], e: nodes.te[k + 1], d: nodes.td[k + 1] },
    );
    nodes.beta[k] = b;
    nodes.sincBeta[k] = sinc(b);
  }
  return nodes;
}

/**
 * Arc weights of the two station tangents for the displacement from station k to the
 * point at fraction f of the arc: Δp = L·(c1·t1 + c2·t2), with
 *   c1 = (2−f)f/2 · sinc((2−f)β/2)·sinc(fβ/2)/sinc(β),  c2 = f²/2 · sinc²(fβ/2)/sinc(β),
 * the integral of t(φ) = [sin(β−φ) t1 + sin φ t2]/sin β written without 0/0 at β = 0.
 * At f = 1 both equal RF/2, the minimum-curvature segment formula.
 */
function arcWeights(f: number, beta: number, sincBeta: number): { c1: number; c2: number } {
  const s = sinc((f * beta) / 2);
  return {
    c1: (((2 - f) * f) / 2) * sinc(((2 - f) * beta) / 2) * s / sincBeta,
    c2: ((f * f) / 2) * s * s / sincBeta,
  };
}

/** TVD at fraction f of a segment's arc (see {@link arcWeights}). */
function tvdOnArc(f: number, beta: number, sincBeta: number, L: number, tvd1: number, z1: number, z2: number): number {
  const sh = sinc((f * beta) / 2);
  const c1 = (((2 - f) * f) / 2) * sinc(((2 - f) * beta) / 2) * sh / sincBeta;
  const c2 = ((f * f) / 2) * sh * sh / sincBeta;
  return tvd1 + L * (c1 * z1 + c2 * z2);
}

/** Well path at the requested measured depths. All arrays align with the input MDs. */
export interface SurveyPathAtMd {
  /** TVD below rotary table, ft. */
  tvdFt: Float64Array;
  /** Northing, ft. */
  northFt: Float64Array;
  /** Easting, ft. */
  eastFt: Float64Array;
  /** Inclination of the path at each MD, deg. */
  incDeg: Float64Array;
  /** Azimuth of the path at each MD, deg in [0, 360) (0 where the hole is vertical). */
  aziDeg: Float64Array;
}

/**
 * Well path (TVD, north, east, inclination, azimuth) at any measured depths, on the
 * minimum-curvature arcs between survey stations.
 *
 * Within a segment of length L and dogleg β, the tangent at fraction f of the arc is
 * t(f) = [sin((1−f)β)·t1 + sin(fβ)·t2]/sin β (a straight line when β → 0), and the
 * position is its integral (Sawaryn & Thorogood 2005, *SPE Drilling & Completion* 20(1),
 * SPE-84246, interpolation along the arc; Taylor & Mason 1972, *SPE J.* 12(6) — from memory).
 * Above the top node (the implicit vertical tie-in at MD 0, or a first station at MD 0) the
 * path is extended vertically; below the last station, straight along its tangent.
 *
 * One pass over both sorted arrays: cost O(stations + samples).
 *
 * @param survey stations, as for {@link minimumCurvaturePositions}.
 * @param mdFt measured depths, ft, non-decreasing (NaN entries are allowed and give NaN);
 *   typical a log index of 10^4–10^5 samples every 0.5 ft.
 * @returns {@link SurveyPathAtMd}, ft and deg; NaN where MD is NaN.
 * @throws ShalepointError from {@link validateSurvey}; E_NOT_SORTED if the finite MDs decrease.
 * @example
 * surveyPathAtMd({ survey: [{ mdFt: 1000, incDeg: 0, aziDeg: 0 }, { mdFt: 1100, incDeg: 10, aziDeg: 90 }],
 *   mdFt: new Float64Array([500, 1100]) }).tvdFt // [500, 1099.49]
 */
export function surveyPathAtMd(args: { survey: readonly SurveyStation[]; mdFt: ArrayLike<number> }): SurveyPathAtMd {
  const { survey, mdFt } = args;
  const p = buildNodes(survey);
  const m = p.md.length;
  const n = mdFt.length;
  const out: SurveyPathAtMd = {
    tvdFt: new Float64Array(n), northFt: new Float64Array(n), eastFt: new Float64Array(n),
    incDeg: new Float64Array(n), aziDeg: new Float64Array(n),
  };
  let k = 0; // segment index: node k .. k+1
  let prev = -Infinity;
  for (let j = 0; j < n; j++) {
    const md = mdFt[j];
    if (Number.isNaN(md)) {
      out.tvdFt[j] = out.northFt[j] = out.eastFt[j] = out.incDeg[j] = out.aziDeg[j] = NaN;
      continue;
    }
    if (md < prev) {
      throw new ShalepointError("E_NOT_SORTED", "measured depths must be non-decreasing", {
        param: "mdFt", row: j, value: md, unit: "ft", allowed: `≥ ${prev}`,
        hint: "Sort the depth index first (NaN entries are skipped).",
      });
    }
    prev = md;
    let tn: number, te: number, td: number;
    if (md <= p.md[0]) {
      // Above the top node: vertical extension.
      out.tvdFt[j] = p.tvd[0] + (md - p.md[0]);
      out.northFt[j] = p.north[0];
      out.eastFt[j] = p.east[0];
      tn = 0; te = 0; td = 1;
      if (md === p.md[0]) { tn = p.tn[0]; te = p.te[0]; td = p.td[0]; }
    } else if (md >= p.md[m - 1]) {
      // Below the last station: straight along its tangent.
      const s = md - p.md[m - 1];
      tn = p.tn[m - 1]; te = p.te[m - 1]; td = p.td[m - 1];
      out.tvdFt[j] = p.tvd[m - 1] + s * td;
      out.northFt[j] = p.north[m - 1] + s * tn;
      out.eastFt[j] = p.east[m - 1] + s * te;
    } else {
      while (md > p.md[k + 1]) k++;
      const L = p.md[k + 1] - p.md[k];
      const f = (md - p.md[k]) / L;
      const beta = p.beta[k], sb = p.sincBeta[k];
      // arcWeights inlined (hot loop)
      const sh = sinc((f * beta) / 2);
      const c1 = (((2 - f) * f) / 2) * sinc(((2 - f) * beta) / 2) * sh / sb;
      const c2 = ((f * f) / 2) * sh * sh / sb;
      out.tvdFt[j] = p.tvd[k] + L * (c1 * p.td[k] + c2 * p.td[k + 1]);
      out.northFt[j] = p.north[k] + L * (c1 * p.tn[k] + c2 * p.tn[k + 1]);
      out.eastFt[j] = p.east[k] + L * (c1 * p.te[k] + c2 * p.te[k + 1]);
      // t(f) = [(1−f) sinc((1−f)β) t1 + f sinc(fβ) t2] / sinc(β)
      const w1 = ((1 - f) * sinc((1 - f) * beta)) / sb;
      const w2 = (f * sinc(f * beta)) / sb;
      tn = w1 * p.tn[k] + w2 * p.tn[k + 1];
      te = w1 * p.te[k] + w2 * p.te[k + 1];
      td = w1 * p.td[k] + w2 * p.td[k + 1];
    }
    const h = Math.hypot(tn, te);
    out.incDeg[j] = Math.atan2(h, td) * RAD;
    const a = h < 1e-12 ? 0 : Math.atan2(te, tn) * RAD;
    out.aziDeg[j] = a < 0 ? a + 360 : a;
  }
  return out;
}

/** Result of the TVD → MD inverse. */
export interface MdAtTvd {
  /** Measured depth of each requested TVD, ft; NaN beyond the monotonic part or for NaN input. */
  mdFt: Float64Array;
  /**
   * Deepest TVD the inverse covers, ft: TVD where the hole first reaches horizontal
   * (inclination 90°), or +Infinity if it never does (the last tangent points down).
   */
  maxTvdFt: number;
  /** MD at {@link MdAtTvd.maxTvdFt}, ft (+Infinity if never horizontal). */
  maxMdFt: number;
}

/**
 * Measured depth at given TVDs (inverse of {@link surveyPathAtMd}) on the monotonic part of
 * the well: from the top down to the first point where the path reaches horizontal. On that
 * part TVD strictly increases with MD, so the inverse is unique; TVDs beyond it give NaN.
 * Each MD is found by safeguarded Newton iteration on the arc (dTVD/dMD = cos I), converged
 * to 1e-9 ft.
 *
 * @param survey stations, as for {@link minimumCurvaturePositions}.
 * @param tvdFt TVD below rotary table, ft, non-decreasing (NaN allowed → NaN).
 * @returns {@link MdAtTvd}.
 * @throws ShalepointError from {@link validateSurvey}; E_NOT_SORTED if the finite TVDs decrease.
 * @example
 * mdAtTvdAlongSurvey({ survey: [{ mdFt: 0, incDeg: 30, aziDeg: 45 }], tvdFt: new Float64Array([866.0254]) }).mdFt // [1000]
 */
export function mdAtTvdAlongSurvey(args: { survey: readonly SurveyStation[]; tvdFt: ArrayLike<number> }): MdAtTvd {
  const { survey, tvdFt } = args;
  const p = buildNodes(survey);
  const m = p.md.length;

  // Locate the end of the monotonic part: first node with td ≤ 0, the horizontal point
  // lies in the segment before it where t(φ)·down = 0, φ = atan2(z1 sinβ, z1 cosβ − z2).
  let lastSeg = m - 1; // segments 0..lastSeg-1 fully usable, plus the tail if lastSeg = m-1
  let maxMd = Infinity, maxTvd = Infinity;
  let endFraction = 1;
  for (let k = 0; k < m; k++) {
    if (p.td[k] <= 1e-12) { // cos 90° rounds to 6e-17: treat |cos I| < 1e-12 as horizontal
      if (k === 0) {
        maxMd = p.md[0]; maxTvd = p.tvd[0]; lastSeg = -1;
      } else {
        const z1 = p.td[k - 1], z2 = p.td[k], b = p.beta[k - 1];
        const phi = Math.atan2(z1 * Math.sin(b), z1 * Math.cos(b) - z2);
        endFraction = b > 0 ? Math.min(1, phi / b) : 1;
        lastSeg = k - 1;
        const L = p.md[k] - p.md[k - 1];
        const { c1, c2 } = arcWeights(endFraction, b, p.sincBeta[k - 1]);
        maxMd = p.md[k - 1] + endFraction * L;
        maxTvd = p.tvd[k - 1] + L * (c1 * z1 + c2 * z2);
      }
      break;
    }
  }

  const n = tvdFt.length;
  const out = new Float64Array(n);
  let k = 0;
  let prev = -Infinity;
  for (let j = 0; j < n; j++) {
    const z = tvdFt[j];
    if (Number.isNaN(z)) { out[j] = NaN; continue; }
    if (z < prev) {
      throw new ShalepointError("E_NOT_SORTED", "TVDs must be non-decreasing", {
        param: "tvdFt", row: j, value: z, unit: "ft", allowed: `≥ ${prev}`,
      });
    }
    prev = z;
    if (z > maxTvd) { out[j] = NaN; continue; }
    if (z <= p.tvd[0]) { out[j] = p.md[0] + (z - p.tvd[0]); continue; }
    const tailStart = lastSeg === m - 1 ? m - 1 : -1;
    if (tailStart >= 0 && z >= p.tvd[m - 1]) {
      out[j] = p.md[m - 1] + (z - p.tvd[m - 1]) / p.td[m - 1];
      continue;
    }
    const kEnd = lastSeg === m - 1 ? m - 2 : lastSeg;
    while (k < kEnd && z > p.tvd[k + 1]) k++;
    const L = p.md[k + 1] - p.md[k];
    const fMax = k === lastSeg ? endFraction : 1;
    const z1 = p.td[k], z2 = p.td[k + 1], b = p.beta[k], sb = p.sincBeta[k];
    const tvdK = p.tvd[k];
    // Safeguarded Newton on g(f) = tvd(f) − z over [0, fMax].
    let lo = 0, hi = fMax;
    let f = (z - tvdK) / Math.max(tvdOnArc(fMax, b, sb, L, tvdK, z1, z2) - tvdK, 1e-300) * fMax;
    if (!(f > lo && f < hi)) f = 0.5 * (lo + hi);
    for (let it = 0; it < 60; it++) {
      const g = tvdOnArc(f, b, sb, L, tvdK, z1, z2) - z;
      if (Math.abs(g) < 1e-9) break;
      if (g > 0) hi = f; else lo = f;
      const dz = L * (((1 - f) * sinc((1 - f) * b) * z1 + f * sinc(f * b) * z2) / sb);
      let next = dz > 0 ? f - g / dz : NaN;
      if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
      if (hi - lo < 1e-15) break;
      f = next;
    }
    out[j] = p.md[k] + f * L;
  }
  return { mdFt: out, maxTvdFt: maxTvd, maxMdFt: maxMd };
}
