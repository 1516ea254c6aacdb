/**
 * Build-and-hold trajectory of the deviated demo well, in one vertical plane.
 *
 * With the azimuth constant and the inclination changing linearly with measured depth, the
 * build is a circular arc, so TVD has a closed form that equals the minimum-curvature
 * result between any two stations on the arc (Sawaryn & Thorogood 2005, *SPE Drilling &
 * Completion* 20(1), SPE-84246: minimum curvature assumes a circular arc between stations):
 *   build: ΔTVD = R·(sin I2 − sin I1), R = 1/(dI/dMD) (I in radians);
 *   hold:  ΔTVD = ΔMD·cos I;  horizontal displacement likewise with (cos I1 − cos I2) and sin I.
 */
import type { DemoTrajectory } from "./demoWellDesigns.js";

const RAD = Math.PI / 180;

/** Position on a build-and-hold path. */
export interface DemoPathPoint {
  mdFt: number;
  incDeg: number;
  aziDeg: number;
  /** TVD below the rotary table, ft. */
  tvdFt: number;
  /** Horizontal displacement from the slot, ft. */
  displacementFt: number;
}

/**
 * Position at a measured depth on a build-and-hold path (closed form of the circular arc).
 * @param t trajectory design
 * @param mdFt measured depth below the rotary table, ft (≥ 0)
 * @returns inclination, TVD and displacement at `mdFt`
 * @example demoPathAt({ kickoffMdFt: 5600, buildDegPer100Ft: 3, holdIncDeg: 45, azimuthDeg: 118, totalDepthMdFt: 17500, stationStepFt: 100 }, 7100).tvdFt // ≈ 6950.5
 */
export function demoPathAt(t: DemoTrajectory, mdFt: number): DemoPathPoint {
  const rate = (t.buildDegPer100Ft / 100) * RAD; // rad/ft
  const radiusFt = 1 / rate;
  const buildLenFt = (t.holdIncDeg * RAD) / rate;
  if (mdFt <= t.kickoffMdFt) {
    return { mdFt, incDeg: 0, aziDeg: t.azimuthDeg, tvdFt: mdFt, displacementFt: 0 };
  }
  const inBuild = Math.min(mdFt - t.kickoffMdFt, buildLenFt);
  const inc = rate * inBuild;
  let tvd = t.kickoffMdFt + radiusFt * Math.sin(inc);
  let disp = radiusFt * (1 - Math.cos(inc));
  const hold = mdFt - t.kickoffMdFt - inBuild;
  if (hold > 0) {
    tvd += hold * Math.cos(inc);
    disp += hold * Math.sin(inc);
  }
  return { mdFt, incDeg: inc / RAD, aziDeg: t.azimuthDeg, tvdFt: tvd, displacementFt: disp };
}

/**
 * Survey stations of the path: the tie-in at 0, every `stationStepFt` of MD, the kick-off,
 * the end of build and TD (each once, increasing).
 * @param t trajectory design
 * @returns stations with MD, inclination, azimuth (and TVD for checking)
 */
export function demoSurveyStations(t: DemoTrajectory): DemoPathPoint[] {
  const rateDegPerFt = t.buildDegPer100Ft / 100;
  const eob = t.kickoffMdFt + t.holdIncDeg / rateDegPerFt;
  const mds = new Set<number>([0, t.kickoffMdFt, eob, t.totalDepthMdFt]);
  for (let md = t.stationStepFt; md < t.totalDepthMdFt; md += t.stationStepFt) mds.add(md);
  return [...mds].sort((a, b) => a - b).map((md) => demoPathAt(t, md));
}
