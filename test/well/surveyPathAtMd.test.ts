/**
 * MD → TVD along the minimum-curvature arc, and TVD → MD. Checks: CHECK-VALUES §10 own
 * cases, circle geometry of a planar build (own case), splitting a segment at an
 * interpolated point (the split survey must reproduce the original end station), identities.
 */
import { describe, expect, it } from "vitest";
import {
  mdAtTvdAlongSurvey,
  minimumCurvaturePositions,
  surveyPathAtMd,
  type SurveyStation,
} from "../../src/well/index.js";
import { ShalepointError } from "../../src/errors.js";

const DEG = Math.PI / 180;
const freezeSurvey = (s: SurveyStation[]): readonly SurveyStation[] => Object.freeze(s.map((x) => Object.freeze({ ...x })));

const buildHold = freezeSurvey([
  { mdFt: 1000, incDeg: 0, aziDeg: 0 },
  { mdFt: 1500, incDeg: 15, aziDeg: 45 },
  { mdFt: 2000, incDeg: 30, aziDeg: 45 },
  { mdFt: 3000, incDeg: 30, aziDeg: 45 },
]);

const turnBuild = freezeSurvey([
  { mdFt: 0, incDeg: 0, aziDeg: 0 },
  { mdFt: 3500, incDeg: 15, aziDeg: 20 },
  { mdFt: 3600, incDeg: 25, aziDeg: 45 },
  { mdFt: 4800, incDeg: 44, aziDeg: 80 },
]);

describe("surveyPathAtMd", () => {
  it("equals the station positions at station MDs", () => {
    const md = new Float64Array([1000, 1500, 2000, 3000]);
    const copy = md.slice();
    const path = surveyPathAtMd({ survey: buildHold, mdFt: md });
    const st = minimumCurvaturePositions(buildHold);
    for (let i = 0; i < 4; i++) {
      expect(path.tvdFt[i]).toBeCloseTo(st.tvdFt[i], 9);
      expect(path.northFt[i]).toBeCloseTo(st.northFt[i], 9);
      expect(path.incDeg[i]).toBeCloseTo(buildHold[i].incDeg, 9);
    }
    // Own case CHECK-VALUES §10: TVD 1494.31 / 1954.93 / 2820.96 ft at the stations.
    expect(Math.abs(path.tvdFt[1] - 1494.31)).toBeLessThan(6e-3);
    expect(Math.abs(path.tvdFt[3] - 2820.96)).toBeLessThan(6e-3);
    expect(md).toEqual(copy); // input not mutated
  });

  it("is vertical above the first vertical station and straight below the last station", () => {
    const path = surveyPathAtMd({ survey: buildHold, mdFt: new Float64Array([-10, 0, 640, 3000, 3400]) });
    // Identity: vertical hole above kickoff, TVD = MD (also above MD 0: the extension is vertical).
    expect(Array.from(path.tvdFt.subarray(0, 3))).toEqual([-10, 0, 640]);
    // Identity: constant inclination below the last station, ΔTVD = ΔMD cos I.
    expect(path.tvdFt[4] - path.tvdFt[3]).toBeCloseTo(400 * Math.cos(30 * DEG), 9);
    expect(path.northFt[4] - path.northFt[3]).toBeCloseTo(400 * Math.sin(30 * DEG) * Math.cos(45 * DEG), 9);
    expect(path.incDeg[4]).toBeCloseTo(30, 12);
    expect(path.aziDeg[4]).toBeCloseTo(45, 12);
  });

  it("lies on the circle of a planar build (not linear in TVD)", () => {
    // Planar build 0° → 30° over 1000–1600 ft, azimuth 0: centre at (north R, TVD 1000),
    // R = L/β (circle geometry, own case).
    const survey = freezeSurvey([{ mdFt: 1000, incDeg: 0, aziDeg: 0 }, { mdFt: 1600, incDeg: 30, aziDeg: 0 }]);
    const R = 600 / (30 * DEG);
    const mds = new Float64Array([1100, 1250, 1300, 1555]);
    const path = surveyPathAtMd({ survey, mdFt: mds });
    for (let i = 0; i < mds.length; i++) {
      const theta = (mds[i] - 1000) / R; // angle turned along the arc, rad
      expect(path.tvdFt[i]).toBeCloseTo(1000 + R * Math.sin(theta), 9);
      expect(path.northFt[i]).toBeCloseTo(R * (1 - Math.cos(theta)), 9);
      expect(path.incDeg[i]).toBeCloseTo(theta / DEG, 9);
    }
    // Linear interpolation in TVD would give 1000 + 0.5·(TVD end − 1000) at mid-arc;
    // the arc gives R sin(β/2) — different by ~0.4 ft here, so the test tells them apart.
    const mid = surveyPathAtMd({ survey, mdFt: new Float64Array([1300]) }).tvdFt[0];
    const linear = 1000 + 0.5 * (R * Math.sin(30 * DEG));
    expect(Math.abs(mid - linear)).toBeGreaterThan(0.3);
  });

  it("splitting a segment at an interpolated point reproduces the end station", () => {
    const at = new Float64Array([3550, 4123.4]);
    const path = surveyPathAtMd({ survey: turnBuild, mdFt: at });
    const end = minimumCurvaturePositions(turnBuild);
    for (let j = 0; j < at.length; j++) {
      const k = at[j] < 3600 ? 2 : 3; // station ending the segment that holds the point
      const split = [...turnBuild.slice(0, k), { mdFt: at[j], incDeg: path.incDeg[j], aziDeg: path.aziDeg[j] }, ...turnBuild.slice(k)];
      const p = minimumCurvaturePositions(split);
      // The interpolated point is the split survey's station k ...
      expect(p.tvdFt[k]).toBeCloseTo(path.tvdFt[j], 8);
      expect(p.northFt[k]).toBeCloseTo(path.northFt[j], 8);
      expect(p.eastFt[k]).toBeCloseTo(path.eastFt[j], 8);
      // ... and the arc continues to the same end station (same circle).
      expect(p.tvdFt[k + 1]).toBeCloseTo(end.tvdFt[k], 8);
      expect(p.northFt[k + 1]).toBeCloseTo(end.northFt[k], 8);
      expect(p.eastFt[k + 1]).toBeCloseTo(end.eastFt[k], 8);
    }
  });

  it("carries NaN MDs through and rejects unsorted MDs", () => {
    const path = surveyPathAtMd({ survey: buildHold, mdFt: new Float64Array([100, NaN, 200]) });
    expect(path.tvdFt[0]).toBe(100);
    expect(path.tvdFt[1]).toBeNaN();
    expect(path.incDeg[1]).toBeNaN();
    expect(path.tvdFt[2]).toBe(200);
    try {
      surveyPathAtMd({ survey: buildHold, mdFt: new Float64Array([100, 50]) });
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_NOT_SORTED");
      expect((e as ShalepointError).details.row).toBe(1);
    }
  });

  it("handles a segment between two identical directions (β = 0) without NaN", () => {
    const s = freezeSurvey([{ mdFt: 0, incDeg: 20, aziDeg: 10 }, { mdFt: 500, incDeg: 20, aziDeg: 10 }]);
    const path = surveyPathAtMd({ survey: s, mdFt: new Float64Array([250]) });
    // Identity: straight hole, ΔTVD = ΔMD cos I.
    expect(path.tvdFt[0]).toBeCloseTo(250 * Math.cos(20 * DEG), 12);
    expect(path.aziDeg[0]).toBeCloseTo(10, 12);
  });
});

describe("mdAtTvdAlongSurvey", () => {
  it("inverts surveyPathAtMd on a deviated well", () => {
    const md = new Float64Array(400);
    for (let i = 0; i < md.length; i++) md[i] = i * 15.3;
    const tvd = surveyPathAtMd({ survey: turnBuild, mdFt: md }).tvdFt;
    const back = mdAtTvdAlongSurvey({ survey: turnBuild, tvdFt: tvd });
    for (let i = 0; i < md.length; i++) expect(Math.abs(back.mdFt[i] - md[i])).toBeLessThan(1e-6);
    expect(back.maxTvdFt).toBe(Infinity);
  });

  it("own case: straight hole at 30° — MD = TVD / cos 30°", () => {
    const r = mdAtTvdAlongSurvey({ survey: [{ mdFt: 0, incDeg: 30, aziDeg: 45 }], tvdFt: new Float64Array([866.0254037844386]) });
    expect(r.mdFt[0]).toBeCloseTo(1000, 9);
  });

  it("stops where the hole reaches horizontal (quarter-circle build, circle geometry)", () => {
    const s = freezeSurvey([
      { mdFt: 1000, incDeg: 0, aziDeg: 0 },
      { mdFt: 1900, incDeg: 90, aziDeg: 0 },
      { mdFt: 2500, incDeg: 90, aziDeg: 0 },
    ]);
    const R = 900 / (Math.PI / 2);
    const r = mdAtTvdAlongSurvey({ survey: s, tvdFt: new Float64Array([500, 1000 + R * Math.sin(0.5), 1000 + R + 1, NaN]) });
    expect(r.mdFt[0]).toBe(500);
    expect(r.mdFt[1]).toBeCloseTo(1000 + 0.5 * R, 8); // arc angle 0.5 rad → arc length 0.5·R
    expect(r.mdFt[2]).toBeNaN();
    expect(r.mdFt[3]).toBeNaN();
    expect(r.maxTvdFt).toBeCloseTo(1000 + R, 8);
    expect(r.maxMdFt).toBeCloseTo(1900, 8);
  });

  it("finds the horizontal point inside a segment that goes past 90°", () => {
    // Planar build 60° → 120° over 600 ft: horizontal after 30° of a 60° arc, at MD 1300.
    const s = freezeSurvey([{ mdFt: 0, incDeg: 60, aziDeg: 0 }, { mdFt: 1000, incDeg: 60, aziDeg: 0 }, { mdFt: 1600, incDeg: 120, aziDeg: 0 }]);
    const r = mdAtTvdAlongSurvey({ survey: s, tvdFt: new Float64Array([0]) });
    expect(r.maxMdFt).toBeCloseTo(1300, 8);
    const R = 600 / (60 * DEG);
    // Circle geometry: dTVD = cos θ · R dθ, so the arc adds R (sin 90° − sin 60°).
    expect(r.maxTvdFt).toBeCloseTo(1000 * Math.cos(60 * DEG) + R * (1 - Math.sin(60 * DEG)), 8);
  });
});
