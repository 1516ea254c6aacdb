/**
 * Minimum curvature: checked against the published worked example and the own cases of
 * CHECK-VALUES §10 (formulas: Taylor & Mason 1972, SPE J. 12(6), from memory; Sawaryn &
 * Thorogood 2005, SPE Drilling & Completion 20(1), SPE-84246), and straight-hole and
 * circular-arc geometry identities.
 */
import { describe, expect, it } from "vitest";
import {
  minimumCurvaturePositions,
  minimumCurvatureRatioFactor,
  validateSurvey,
  type SurveyStation,
} from "../../src/well/index.js";
import { ShalepointError } from "../../src/errors.js";

const freezeSurvey = (s: SurveyStation[]): readonly SurveyStation[] => Object.freeze(s.map((x) => Object.freeze({ ...x })));
const DEG = Math.PI / 180;

describe("minimumCurvaturePositions", () => {
  it("reproduces the Lapeyrouse worked example 3500 ft (15°, 20°) → 3600 ft (25°, 45°)", () => {
    const survey = freezeSurvey([
      { mdFt: 3500, incDeg: 15, aziDeg: 20 },
      { mdFt: 3600, incDeg: 25, aziDeg: 45 },
    ]);
    const p = minimumCurvaturePositions(survey);
    // Published (Lapeyrouse, "Formulas and Calculations for Drilling, Production and
    // Workover"; CHECK-VALUES §10): ΔN 27.22, ΔE 19.45, ΔTVD 94.01 ft printed to 0.01 ft,
    // so ±0.006 ft (half the last digit plus rounding of the printed RF).
    expect(p.northFt[1] - p.northFt[0]).toBeCloseTo(27.22, 2);
    expect(Math.abs(p.northFt[1] - p.northFt[0] - 27.22)).toBeLessThan(0.006);
    expect(Math.abs(p.eastFt[1] - p.eastFt[0] - 19.45)).toBeLessThan(0.006);
    expect(Math.abs(p.tvdFt[1] - p.tvdFt[0] - 94.01)).toBeLessThan(0.006);
    // Published: RF 1.00428 (5 decimals) and β 12.95° (2 decimals) → dogleg 12.95°/100 ft.
    expect(Math.abs(p.ratioFactor[1] - 1.00428)).toBeLessThan(6e-6);
    expect(Math.abs(p.doglegDegPer100Ft[1] - 12.95)).toBeLessThan(0.006);
    expect(p.tieInAdded).toBe(true);
  });

  it("own case 1000 ft (0°, 0°) → 1100 ft (10°, 90°): ΔN 0, ΔE 8.705, ΔTVD 99.49", () => {
    const p = minimumCurvaturePositions(freezeSurvey([
      { mdFt: 1000, incDeg: 0, aziDeg: 0 },
      { mdFt: 1100, incDeg: 10, aziDeg: 90 },
    ]));
    // Own case, CHECK-VALUES §10 (4 significant figures → ±0.0006 / ±0.006 ft).
    expect(Math.abs(p.northFt[1])).toBeLessThan(1e-12);
    expect(Math.abs(p.eastFt[1] - 8.705)).toBeLessThan(6e-4);
    expect(Math.abs(p.tvdFt[1] - 1000 - 99.49)).toBeLessThan(6e-3);
    // Vertical from the implicit tie-in: TVD = MD at the first station (identity).
    expect(p.tvdFt[0]).toBe(1000);
  });

  it("own case: hold 100 ft at 30°/45° gives ΔN = ΔE = 35.36, ΔTVD 86.60 (ΔTVD = ΔMD cos I)", () => {
    const p = minimumCurvaturePositions(freezeSurvey([
      { mdFt: 2000, incDeg: 30, aziDeg: 45 },
      { mdFt: 2100, incDeg: 30, aziDeg: 45 },
    ]));
    // Own case CHECK-VALUES §10; straight-line identity ΔN = ΔMD sinI cosA exactly.
    expect(p.northFt[1] - p.northFt[0]).toBeCloseTo(100 * Math.sin(30 * DEG) * Math.cos(45 * DEG), 10);
    expect(p.eastFt[1] - p.eastFt[0]).toBeCloseTo(35.36, 2);
    expect(p.tvdFt[1] - p.tvdFt[0]).toBeCloseTo(100 * Math.cos(30 * DEG), 10);
    expect(Math.abs(p.tvdFt[1] - p.tvdFt[0] - 86.60)).toBeLessThan(6e-3);
    // Identical directions: RF = 1 exactly, dogleg 0, no division by zero.
    expect(p.ratioFactor[1]).toBe(1);
    expect(p.doglegDegPer100Ft[1]).toBe(0);
  });

  it("own case: build-and-hold survey from a vertical tie-in at MD 0", () => {
    const p = minimumCurvaturePositions(freezeSurvey([
      { mdFt: 1000, incDeg: 0, aziDeg: 0 },
      { mdFt: 1500, incDeg: 15, aziDeg: 45 },
      { mdFt: 2000, incDeg: 30, aziDeg: 45 },
      { mdFt: 3000, incDeg: 30, aziDeg: 45 },
    ]));
    // Own case CHECK-VALUES §10: N = E = 46.02 / 180.9 / 534.5 ft; TVD 1494.31 / 1954.93 / 2820.96 ft.
    const nExp = [0, 46.02, 180.9, 534.5];
    const tol = [1e-9, 6e-3, 0.06, 0.06];
    const tvdExp = [1000, 1494.31, 1954.93, 2820.96];
    for (let i = 0; i < 4; i++) {
      expect(Math.abs(p.northFt[i] - nExp[i])).toBeLessThan(tol[i]);
      expect(Math.abs(p.eastFt[i] - nExp[i])).toBeLessThan(tol[i]);
      expect(Math.abs(p.tvdFt[i] - tvdExp[i])).toBeLessThan(6e-3);
    }
  });

  it("vertical hole: TVD = MD, no displacement (identity)", () => {
    const p = minimumCurvaturePositions(freezeSurvey([
      { mdFt: 0, incDeg: 0, aziDeg: 0 },
      { mdFt: 5000, incDeg: 0, aziDeg: 123 },
      { mdFt: 9000, incDeg: 0, aziDeg: 0 },
    ]));
    expect(Array.from(p.tvdFt)).toEqual([0, 5000, 9000]);
    expect(Array.from(p.northFt)).toEqual([0, 0, 0]);
    expect(p.tieInAdded).toBe(false);
  });

  it("a quarter-circle build reaches TVD = kickoff + R, R = L/(π/2) (circle geometry, own case)", () => {
    const p = minimumCurvaturePositions(freezeSurvey([
      { mdFt: 1000, incDeg: 0, aziDeg: 0 },
      { mdFt: 1900, incDeg: 90, aziDeg: 0 },
    ]));
    const R = 900 / (Math.PI / 2);
    expect(p.tvdFt[1]).toBeCloseTo(1000 + R, 9);
    expect(p.northFt[1]).toBeCloseTo(R, 9);
    expect(p.doglegDegPer100Ft[1]).toBeCloseTo(10, 12);
  });
});

describe("minimumCurvatureRatioFactor", () => {
  it("is 1 at β = 0 and matches (2/β)tan(β/2) on both sides of the series switch", () => {
    expect(minimumCurvatureRatioFactor(0)).toBe(1);
    // Series RF = 1 + β²/12 + … vs the closed form, which is accurate to ~1e-13 at 9.99e-4.
    const b = 9.99e-4;
    expect(Math.abs(minimumCurvatureRatioFactor(b) - (2 / b) * Math.tan(b / 2))).toBeLessThan(1e-13);
    // Published value, Lapeyrouse example (CHECK-VALUES §10): β 12.95° → RF 1.00428.
    expect(Math.abs(minimumCurvatureRatioFactor(12.9544 * DEG) - 1.00428)).toBeLessThan(6e-6);
    // Quarter circle: RF(π/2) = (4/π)·tan(π/4) = 4/π (identity).
    expect(minimumCurvatureRatioFactor(Math.PI / 2)).toBeCloseTo(4 / Math.PI, 14);
  });

  it("throws E_RANGE at β = π and for negative β", () => {
    expect(() => minimumCurvatureRatioFactor(Math.PI)).toThrowError(/out of range/);
    expect(() => minimumCurvatureRatioFactor(-0.1)).toThrowError(ShalepointError);
  });
});

describe("validateSurvey", () => {
  const code = (f: () => void): { code: string; row?: number } => {
    try {
      f();
    } catch (e) {
      const err = e as ShalepointError;
      return { code: err.code, row: err.details.row };
    }
    return { code: "none" };
  };
  it("names the row of the first bad station", () => {
    expect(code(() => validateSurvey([]))).toEqual({ code: "E_SURVEY_EMPTY", row: undefined });
    expect(code(() => validateSurvey([
      { mdFt: 0, incDeg: 0, aziDeg: 0 }, { mdFt: 100, incDeg: 2, aziDeg: 0 }, { mdFt: 100, incDeg: 3, aziDeg: 0 },
    ]))).toEqual({ code: "E_SURVEY_ORDER", row: 2 });
    expect(code(() => validateSurvey([{ mdFt: 0, incDeg: 181, aziDeg: 0 }]))).toEqual({ code: "E_SURVEY_RANGE", row: 0 });
    expect(code(() => validateSurvey([{ mdFt: 0, incDeg: 0, aziDeg: 0 }, { mdFt: 10, incDeg: 5, aziDeg: -1 }])))
      .toEqual({ code: "E_SURVEY_RANGE", row: 1 });
    expect(code(() => validateSurvey([{ mdFt: 0, incDeg: NaN, aziDeg: 0 }]))).toEqual({ code: "E_SURVEY_RANGE", row: 0 });
    expect(code(() => validateSurvey([{ mdFt: 0, incDeg: 0, aziDeg: 0 }, { mdFt: 10, incDeg: 180, aziDeg: 0 }])))
      .toEqual({ code: "E_SURVEY_REVERSAL", row: 1 });
    expect(code(() => validateSurvey([{ mdFt: 0, incDeg: 180, aziDeg: 360 }]))).toEqual({ code: "none" });
  });
  it("puts the station number in the message", () => {
    expect(() => validateSurvey([{ mdFt: 0, incDeg: 0, aziDeg: 0 }, { mdFt: 100, incDeg: 200, aziDeg: 0 }]))
      .toThrowError(/survey station 2: inclination/);
  });
});
