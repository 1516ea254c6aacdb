/**
 * calibrateFractureModel: least-squares fit of the effective-stress ratio (Hubbert & Willis
 * 1957 form), Poisson's ratio (Eaton 1969) or Daines' (1982) β to leak-off tests. Expected
 * values are own cases solved by hand from the normal equation K = Σxy/Σx².
 */
import { describe, expect, it } from "vitest";
import { calibrateFractureModel, type StressTestPoint } from "../../src/stress/fractureCalibration.js";
import { ShalepointError } from "../../src/errors.js";
import { codeOf } from "../helpers/shalepointErrors.js";

// Normally pressured well: Pp 0.465 psi/ft, Sv 1.0 psi/ft, 0–10,000 ft.
const tvdFt = Object.freeze(Array.from({ length: 11 }, (_, i) => i * 1000));
const ppPsi = Object.freeze(tvdFt.map((d) => 0.465 * d));
const svPsi = Object.freeze(tvdFt.map((d) => d));
const at = (d: number, k: number): number => 0.465 * d + k * 0.535 * d;

describe("calibrateFractureModel", () => {
  // x = Sv − Pp: 2140 psi at 4000 ft, 4280 psi at 8000 ft. Residuals +100 and −50 psi
  // satisfy Σ x·r = 2140·100 − 4280·50 = 0, so K stays exactly 0.6.
  const tests: readonly StressTestPoint[] = Object.freeze([
    { tvdFt: 4000, pressurePsi: at(4000, 0.6) + 100, kind: "LOT" },
    { tvdFt: 8000, pressurePsi: at(8000, 0.6) - 50, kind: "XLOT" },
  ]);

  it("stressRatio: K 0.6; misfit +100/−50 psi, +0.4813/−0.1203 ppg; RMS 79.06 psi (own case)", () => {
    const r = calibrateFractureModel({ tvdFt, ppPsi, svPsi, tests, model: { model: "stressRatio" } });
    expect(r.parameter).toBeCloseTo(0.6, 12);
    expect(r.n).toBe(2);
    expect(r.tests[0].misfitPsi).toBeCloseTo(100, 8);
    expect(r.tests[1].misfitPsi).toBeCloseTo(-50, 8);
    // ppg with 12/231: 100 / (0.051948·4000) = 0.48125; −50 / (0.051948·8000) = −0.12031
    expect(r.tests[0].misfitPpg).toBeCloseTo(0.48125, 5);
    expect(r.tests[1].misfitPpg).toBeCloseTo(-0.12031, 5);
    expect(r.rmsMisfitPsi).toBeCloseTo(Math.sqrt((100 ** 2 + 50 ** 2) / 2), 8); // 79.06
    expect(r.warnings).toEqual([]);
  });

  it("poissonRatio: K 0.6 ⇒ ν = 0.6/1.6 = 0.375 (Eaton 1969: K = ν/(1−ν))", () => {
    const r = calibrateFractureModel({ tvdFt, ppPsi, svPsi, tests, model: { model: "poissonRatio" } });
    expect(r.parameter).toBeCloseTo(0.375, 12);
    expect(r.stressRatio).toBeCloseTo(0.6, 12);
  });

  it("tectonicRatio with ν 0.25: β = 0.6 − 1/3 = 0.26667 (Daines 1982 form)", () => {
    const r = calibrateFractureModel({ tvdFt, ppPsi, svPsi, tests, model: { model: "tectonicRatio", poissonRatio: 0.25 } });
    expect(r.parameter).toBeCloseTo(0.6 - 1 / 3, 12);
  });

  it("interpolates Pp and Sv between samples (test at 4500 ft, own case)", () => {
    const r = calibrateFractureModel({
      tvdFt, ppPsi, svPsi, model: { model: "stressRatio" },
      tests: [{ tvdFt: 4500, pressurePsi: at(4500, 0.7), kind: "minifrac" }],
    });
    expect(r.tests[0].ppPsi).toBeCloseTo(2092.5, 9);
    expect(r.parameter).toBeCloseTo(0.7, 12);
  });

  it("flags a LOT above overburden or below pore pressure and leaves it out of the fit", () => {
    const r = calibrateFractureModel({
      tvdFt, ppPsi, svPsi, model: { model: "stressRatio" },
      tests: [
        ...tests,
        { tvdFt: 6000, pressurePsi: 6100, kind: "LOT", label: "above Sv" },
        { tvdFt: 6000, pressurePsi: 2700, kind: "LOT", label: "below Pp" },
      ],
    });
    expect(r.parameter).toBeCloseTo(0.6, 12);
    expect(r.n).toBe(2);
    expect(r.tests[2].flags).toEqual(["aboveOverburden"]);
    expect(r.tests[3].flags).toEqual(["belowPorePressure"]);
    expect(r.warnings.map((w) => [w.code, w.depthFt])).toEqual([
      ["W_TEST_ABOVE_OVERBURDEN", 6000],
      ["W_TEST_BELOW_PORE_PRESSURE", 6000],
    ]);
  });

  it("treats a FIT as a lower bound: not fitted, flagged only when above the calibrated curve", () => {
    const r = calibrateFractureModel({
      tvdFt, ppPsi, svPsi, model: { model: "stressRatio" },
      tests: [
        ...tests,
        { tvdFt: 2000, pressurePsi: at(2000, 0.8), kind: "FIT" },
        { tvdFt: 3000, pressurePsi: at(3000, 0.4), kind: "FIT" },
      ],
    });
    expect(r.parameter).toBeCloseTo(0.6, 12);
    expect(r.tests[2].usedInFit).toBe(false);
    expect(r.tests[2].flags).toEqual(["lowerBoundExceedsModel"]);
    expect(r.tests[2].misfitPsi).toBeCloseTo(0.2 * 0.535 * 2000, 8); // 214 psi above the model
    expect(r.tests[3].flags).toEqual([]);
    expect(r.warnings.map((w) => w.code)).toEqual(["W_FIT_ABOVE_MODEL"]);
  });

  it("a test depth outside the well → E_DEPTH_OUTSIDE_WELL naming value and range", () => {
    try {
      calibrateFractureModel({ tvdFt, ppPsi, svPsi, model: { model: "stressRatio" }, tests: [{ tvdFt: 12000, pressurePsi: 9000, kind: "LOT" }] });
      expect.unreachable();
    } catch (e) {
      const err = e as ShalepointError;
      expect(err.code).toBe("E_DEPTH_OUTSIDE_WELL");
      expect(err.details.value).toBe(12000);
      expect(err.details.allowed).toBe("[0, 10000]");
    }
  });

  it("only FITs → E_TOO_FEW; fitted ν outside (0, 0.5) → E_CALIBRATION_RANGE", () => {
    expect(codeOf(() => calibrateFractureModel({ tvdFt, ppPsi, svPsi, model: { model: "stressRatio" }, tests: [{ tvdFt: 2000, pressurePsi: 1500, kind: "FIT" }] }))).toBe("E_TOO_FEW");
    // K 0.9 ⇒ ν 0.474 is fine; K 1.0 ⇒ ν 0.5 is not
    expect(codeOf(() => calibrateFractureModel({ tvdFt, ppPsi, svPsi, model: { model: "poissonRatio" }, tests: [{ tvdFt: 5000, pressurePsi: 5000, kind: "LOT" }] }))).toBe("E_CALIBRATION_RANGE");
    expect(codeOf(() => calibrateFractureModel({ tvdFt, ppPsi, svPsi, model: { model: "tectonicRatio", poissonRatio: 0.5 }, tests }))).toBe("E_RANGE");
  });
});
