/**
 * predictStressWindow on a small designed column (own case built from the published forms):
 * Eaton 1969 fracture pressure, its calibration to one leak-off test, the window margins and
 * the collapse limit, against values worked by hand from the same formulas.
 */
import { describe, expect, it } from "vitest";
import { predictStressWindow } from "../../src/pipeline/predictStressWindow.js";
import { PSI_PER_FT_PER_PPG } from "../../src/units/index.js";

const tvdFt = Float64Array.from({ length: 101 }, (_, i) => 5000 + 50 * i); // 5,000–10,000 ft
const svPsi = tvdFt.map((z) => 0.95 * z); // 0.95 psi/ft overburden
const ppPsi = tvdFt.map((z) => 0.465 * z); // hydrostatic brine column
const inputsBefore = [Float64Array.from(tvdFt), Float64Array.from(svPsi), Float64Array.from(ppPsi)];

describe("predictStressWindow", () => {
  it("Eaton 1969 with ν 0.4: Shmin = ν/(1−ν)(Sv − Pp) + Pp at every depth (Eaton 1969, JPT 21(10); own case)", () => {
    const r = predictStressWindow({ tvdFt, ppPsi, svPsi }, { fracture: { method: "eaton1969", poissonRatio: 0.4 } });
    const k = 0.4 / 0.6;
    for (const i of [0, 50, 100]) {
      expect(r.shminPsi[i]).toBeCloseTo(k * (svPsi[i] - ppPsi[i]) + ppPsi[i], 9);
      expect(r.fractureGradientPsiPerFt[i]).toBeCloseTo(k * (0.95 - 0.465) + 0.465, 12); // 0.7883 psi/ft
    }
    // Hubbert & Willis 1957 bounds reported beside it: K 1/3 and 1/2.
    expect(r.hubbertWillis.minPsi[100]).toBeCloseTo((svPsi[100] - ppPsi[100]) / 3 + ppPsi[100], 9);
  });

  it("calibrated to one leak-off test, the fitted ν reproduces the test pressure (least squares through one point)", () => {
    // LOT at 8,000 ft of 0.80 psi/ft: K = (0.80 − 0.465)/(0.95 − 0.465) = 0.6907, ν = K/(1+K) = 0.4086.
    const r = predictStressWindow(
      { tvdFt, ppPsi, svPsi },
      { fracture: { method: "eaton1969", poissonRatio: 0.4 }, stressTests: [{ tvdFt: 8000, pressurePsi: 0.8 * 8000, kind: "LOT" }], calibrateFracture: true },
    );
    const k = (0.8 - 0.465) / (0.95 - 0.465);
    expect(r.fractureCalibration!.parameter).toBeCloseTo(k / (1 + k), 9);
    const i = tvdFt.indexOf(8000);
    expect(r.shminPsi[i]).toBeCloseTo(6400, 6);
  });

  it("window: lower = Pp/D + trip, upper = Shmin/D − kick, in psi/ft with 12/231 psi/ft per ppg (CHECK-VALUES §0)", () => {
    const r = predictStressWindow({ tvdFt, ppPsi, svPsi }, { fracture: { method: "eaton1969", poissonRatio: 0.4 }, margins: { tripPpg: 0.3, kickPpg: 0.5 } });
    const i = 60;
    expect(r.window.lowerPsiPerFt[i]).toBeCloseTo(0.465 + 0.3 * PSI_PER_FT_PER_PPG, 12);
    expect(r.window.upperPsiPerFt[i]).toBeCloseTo(r.fractureGradientPsiPerFt[i] - 0.5 * PSI_PER_FT_PER_PPG, 12);
    expect(r.casing?.sections.length).toBeGreaterThan(0);
    // Inputs untouched (typed arrays cannot be frozen: compare with copies).
    expect([tvdFt, svPsi, ppPsi]).toEqual(inputsBefore);
  });

  it("collapse with equal horizontal stresses: Pw = Pp + (2σh − UCS)/(1 + q), q(0.6) = 3.119 (Mohr–Coulomb; CHECK-VALUES §7–8)", () => {
    const ucsPsi = new Float64Array(tvdFt.length).fill(1000);
    const r = predictStressWindow({ tvdFt, ppPsi, svPsi }, { fracture: { method: "eaton1969", poissonRatio: 0.4 }, wellbore: { ucsPsi, internalFriction: 0.6 } });
    const i = 100;
    const sh = r.shminPsi[i] - ppPsi[i];
    const q = (Math.sqrt(0.6 * 0.6 + 1) + 0.6) ** 2;
    expect(q).toBeCloseTo(3.119, 3);
    expect(r.wellbore!.shmaxPsi[i]).toBe(r.shminPsi[i]); // default SHmax fraction 0
    expect(r.wellbore!.collapsePsi[i]).toBeCloseTo(ppPsi[i] + (2 * sh - 1000) / (1 + q), 6);
  });
});
