/**
 * Minimum-curvature survey computation: directional survey stations → well-path positions.
 *
 * Between two stations the hole is taken as a circular arc tangent to both station
 * directions (Taylor & Mason 1972, *SPE Journal* 12(6) — from memory; Sawaryn & Thorogood
 * 2005, *SPE Drilling & Completion* 20(1):71–76, SPE-84246, doi:10.2118/84246-PA).
 *
 * Directions are unit tangent vectors t = (sinI cosA, sinI sinA, cosI) in (north, east,
 * down). The dogleg angle β between t1 and t2 is taken as β = 2·atan2(|t2 − t1|, |t2 + t1|),
 * which equals acos[cos(I2−I1) − sinI1 sinI2 (1 − cos(A2−A1))] but keeps full precision for
 * small angles (the acos form loses half the digits near β = 0, as Sawaryn & Thorogood note).
 */
import { ShalepointError } from "../errors.js";
import type { SurveyStation } from "./types.js";

const DEG = Math.PI / 180;

/** Below this dogleg angle (rad) the ratio factor uses its Taylor series (see below). */
const SMALL_DOGLEG_RAD = 1e-3;

/**
 * Ratio factor of the minimum-curvature method.
 *
 * RF = (2/β)·tan(β/2) (Taylor & Mason 1972, *SPE J.* 12(6) — from memory; Sawaryn &
 * Thorogood 2005, *SPE Drilling & Completion* 20(1), SPE-84246, eq. 4). For β < 1e-3 rad
 * the series RF = 1 + β²/12 + β⁴/120 + 17β⁶/20160 is used (truncation error < 1e-25), so
 * two stations with the same direction give RF = 1 exactly and never divide by zero.
 *
 * @param doglegRad dogleg angle β between two station directions, rad, [0, π); typical 0–0.2.
 * @returns RF, dimensionless, ≥ 1.
 * @throws ShalepointError E_RANGE when β is not finite, negative, or ≥ π (a full reversal
 *   has no unique arc).
 * @example minimumCurvatureRatioFactor(12.9544 * Math.PI / 180) // ≈ 1.00428
 */
export function minimumCurvatureRatioFactor(doglegRad: number): number {
  if (!(doglegRad >= 0 && doglegRad < Math.PI)) {
    throw new ShalepointError("E_RANGE", "dogleg angle is out of range", {
      param: "doglegRad",
      value: doglegRad,
      unit: "rad",
      allowed: "[0, π)",
    });
  }
  if (doglegRad < SMALL_DOGLEG_RAD) {
    const b2 = doglegRad * doglegRad;
    return 1 + b2 / 12 + (b2 * b2) / 120 + (17 * b2 * b2 * b2) / 20160;
  }
  return (2 / doglegRad) * Math.tan(doglegRad / 2);
}

/** Unit tangent (north, east, down) of a station direction given in degrees. */
export function surveyTangent(incDeg: number, aziDeg: number): { n: number; e: number; d: number } {
  const i = incDeg * DEG;
  const a = aziDeg * DEG;
  const s = Math.sin(i);
  return { n: s * Math.cos(a), e: s * Math.sin(a), d: Math.cos(i) };
}

/**
 * Dogleg angle between two unit tangents, rad: β = 2·atan2(|t2 − t1|, |t2 + t1|).
 * Exact to rounding at every angle in [0, π].
 */
export function doglegAngleRad(
  t1: { n: number; e: number; d: number },
  t2: { n: number; e: number; d: number },
): number {
  const dn = t2.n - t1.n, de = t2.e - t1.e, dd = t2.d - t1.d;
  const sn = t2.n + t1.n, se = t2.e + t1.e, sd = t2.d + t1.d;
  return 2 * Math.atan2(Math.sqrt(dn * dn + de * de + dd * dd), Math.sqrt(sn * sn + se * se + sd * sd));
}

/**
 * Check a directional survey and throw a typed error naming the first bad station.
 *
 * Rules: at least one station; every value finite; MD ≥ 0 and strictly increasing;
 * inclination in [0, 180] deg; azimuth in [0, 360] deg; no 180° reversal between two
 * stations. `row` in the error is the 0-based index into the array.
 *
 * @param survey stations (mdFt, incDeg, aziDeg), ft and degrees.
 * @throws ShalepointError E_SURVEY_EMPTY (no stations), E_SURVEY_RANGE (non-finite or out
 *   of range value), E_SURVEY_ORDER (MD not strictly increasing), E_SURVEY_REVERSAL
 *   (dogleg of 180° between consecutive stations).
 * @example validateSurvey([{ mdFt: 0, incDeg: 0, aziDeg: 0 }, { mdFt: 100, incDeg: 5, aziDeg: 90 }]) // no throw
 */
export function validateSurvey(survey: readonly SurveyStation[]): void {
  if (survey.length === 0) {
    throw new ShalepointError("E_SURVEY_EMPTY", "the directional survey has no stations", {
      param: "survey",
      hint: "Give at least one station (MD, inclination, azimuth), or treat the well as vertical.",
    });
  }
  for (let r = 0; r < survey.length; r++) {
    const s = survey[r];
    const where = `survey station ${r + 1}`;
    if (!Number.isFinite(s.mdFt) || s.mdFt < 0) {
      throw new ShalepointError("E_SURVEY_RANGE", `${where}: measured depth must be a finite number ≥ 0`, {
        param: `survey[${r}].mdFt`, row: r, value: s.mdFt, unit: "ft", allowed: "≥ 0",
      });
    }
    if (!Number.isFinite(s.incDeg) || s.incDeg < 0 || s.incDeg > 180) {
      throw new ShalepointError("E_SURVEY_RANGE", `${where}: inclination is out of range`, {
        param: `survey[${r}].incDeg`, row: r, value: s.incDeg, unit: "deg", allowed: "[0, 180]",
      });
    }
    if (!Number.isFinite(s.aziDeg) || s.aziDeg < 0 || s.aziDeg > 360) {
      throw new ShalepointError("E_SURVEY_RANGE", `${where}: azimuth is out of range`, {
        param: `survey[${r}].aziDeg`, row: r, value: s.aziDeg, unit: "deg", allowed: "[0, 360]",
        hint: "Azimuths are degrees clockwise from north; add 360 to negative values.",
      });
    }
    if (r > 0) {
      const p = survey[r - 1];
      if (!(s.mdFt > p.mdFt)) {
        throw new ShalepointError("E_SURVEY_ORDER", `${where}: measured depth must increase from the station above`, {
          param: `survey[${r}].mdFt`, row: r, value: s.mdFt, unit: "ft", allowed: `> ${p.mdFt}`,
          hint: "Sort the survey by MD and remove repeated rows.",
        });
      }
      const beta = doglegAngleRad(surveyTangent(p.incDeg, p.aziDeg), surveyTangent(s.incDeg, s.aziDeg));
      if (beta > Math.PI - 1e-9) {
        throw new ShalepointError("E_SURVEY_REVERSAL", `${where}: direction reverses by 180° from the station above`, {
          param: `survey[${r}]`, row: r, value: `${s.incDeg}/${s.aziDeg}`, unit: "deg",
          hint: "A full reversal has no unique minimum-curvature arc; check the inclination and azimuth.",
        });
      }
    }
  }
}

/** Positions along the survey, one entry per input station. */
export interface SurveyPositions {
  /** Measured depth of each station, ft (copy of the input). */
  mdFt: Float64Array;
  /** TVD below rotary table, ft. */
  tvdFt: Float64Array;
  /** Northing from the rotary table, ft (negative = south). */
  northFt: Float64Array;
  /** Easting from the rotary table, ft (negative = west). */
  eastFt: Float64Array;
  /** Inclination of each station, deg (copy of the input). */
  incDeg: Float64Array;
  /** Azimuth of each station, deg (copy of the input). */
  aziDeg: Float64Array;
  /**
   * Dogleg severity of the segment ending at each station, deg/100 ft. Entry 0 is the
   * segment from the implicit tie-in (0 when the first station is at MD 0).
   */
  doglegDegPer100Ft: Float64Array;
  /** Ratio factor of the segment ending at each station (entry 0 as above). */
  ratioFactor: Float64Array;
  /** True when an implicit vertical tie-in at MD 0 was put above the first station. */
  tieInAdded: boolean;
}

/**
 * Minimum-curvature positions of directional survey stations.
 *
 * For each segment (station 1 → 2, ΔMD):
 *   ΔN   = ΔMD/2 · (sinI1 cosA1 + sinI2 cosA2) · RF
 *   ΔE   = ΔMD/2 · (sinI1 sinA1 + sinI2 sinA2) · RF
 *   ΔTVD = ΔMD/2 · (cosI1 + cosI2) · RF,   RF = (2/β) tan(β/2)
 * (Taylor & Mason 1972, *SPE J.* 12(6) — from memory; Sawaryn & Thorogood 2005, *SPE
 * Drilling & Completion* 20(1), SPE-84246, eqs. 1–4). Dogleg severity = β·100/ΔMD, deg/100 ft.
 *
 * Tie-in: positions start at the rotary table (MD 0, TVD 0, N 0, E 0). When the first
 * station is below MD 0, an implicit tie-in station (MD 0, inclination 0, azimuth 0) is put
 * above it, so the hole is vertical from surface whenever the first station is vertical
 * (the usual case) and otherwise follows the minimum-curvature arc from vertical.
 *
 * @param survey stations, MD ft strictly increasing, inclination 0–180 deg, azimuth 0–360
 *   deg; typical: 50–300 stations every 90–100 ft.
 * @returns {@link SurveyPositions}: arrays aligned with the input stations, ft and deg/100 ft.
 * @throws ShalepointError from {@link validateSurvey}.
 * @example
 * minimumCurvaturePositions([{ mdFt: 3500, incDeg: 15, aziDeg: 20 }, { mdFt: 3600, incDeg: 25, aziDeg: 45 }])
 * // segment 2 − 1: ΔN 27.22, ΔE 19.45, ΔTVD 94.01 ft, RF 1.00428, dogleg 12.95 deg/100 ft
 */
export function minimumCurvaturePositions(survey: readonly SurveyStation[]): SurveyPositions {
  validateSurvey(survey);
  const n = survey.length;
  const out: SurveyPositions = {
    mdFt: new Float64Array(n),
    tvdFt: new Float64Array(n),
    northFt: new Float64Array(n),
    eastFt: new Float64Array(n),
    incDeg: new Float64Array(n),
    aziDeg: new Float64Array(n),
    doglegDegPer100Ft: new Float64Array(n),
    ratioFactor: new Float64Array(n),
    tieInAdded: survey[0].mdFt > 0,
  };
  let md = 0, tvd = 0, north = 0, east = 0;
  let t1 = surveyTangent(0, 0);
  for (let i = 0; i < n; i++) {
    const s = survey[i];
    const t2 = surveyTangent(s.incDeg, s.aziDeg);
    const dmd = s.mdFt - md;
    if (dmd > 0) {
      const beta = doglegAngleRad(t1, t2);
      const rf = minimumCurvatureRatioFactor(beta);
      const h = (dmd / 2) * rf;
      north += h * (t1.n + t2.n);
      east += h * (t1.e + t2.e);
      tvd += h * (t1.d + t2.d);
      out.doglegDegPer100Ft[i] = (beta / DEG) * (100 / dmd);
      out.ratioFactor[i] = rf;
    } else {
      out.ratioFactor[i] = 1;
    }
    out.mdFt[i] = s.mdFt;
    out.tvdFt[i] = tvd;
    out.northFt[i] = north;
    out.eastFt[i] = east;
    out.incDeg[i] = s.incDeg;
    out.aziDeg[i] = s.aziDeg;
    md = s.mdFt;
    t1 = t2;
  }
  return out;
}
