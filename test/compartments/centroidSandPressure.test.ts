/**
 * centroidSandPressure: CHECK-VALUES §11 own case (Traugott 1997, World Oil 218(8), from
 * memory): centroid 10,000 ft, shale 0.70 psi/ft, brine 0.465 psi/ft, crest 9000 / base
 * 11,000 ft → sand 6535 / 7465 psi vs shale 6300 / 7700 psi (+235 / −235 psi).
 */
import { describe, expect, it } from "vitest";
import { centroidSandPressure } from "../../src/compartments/index.js";
import { ShalepointError } from "../../src/errors.js";

const CASE = Object.freeze({
  crestTvdFt: 9000,
  baseTvdFt: 11000,
  centroidTvdFt: 10000,
  shalePressureAtCentroidPsi: 7000, // 0.70 psi/ft × 10,000 ft
  sandFluidGradientPsiPerFt: 0.465,
  shaleGradientPsiPerFt: 0.7,
});

describe("centroidSandPressure (CHECK-VALUES §11, own case)", () => {
  it("sand 6535 / 7465 psi and shale 6300 / 7700 psi at crest / base", () => {
    const r = centroidSandPressure(CASE);
    // Exact arithmetic of the own case; a 1 % change of either gradient moves these by ≥ 4.65 psi.
    expect(r.sandAtCrestPsi).toBeCloseTo(6535, 9);
    expect(r.sandAtBasePsi).toBeCloseTo(7465, 9);
    expect(r.shaleAtCrestPsi).toBeCloseTo(6300, 9);
    expect(r.shaleAtBasePsi).toBeCloseTo(7700, 9);
    expect(r.crestExcessOverShalePsi).toBeCloseTo(235, 9);
    expect(r.baseExcessOverShalePsi).toBeCloseTo(-235, 9);
  });
  it("the centroid defaults to mid-structure (10,000 ft here)", () => {
    const { centroidTvdFt: _drop, ...rest } = CASE;
    expect(centroidSandPressure(rest).centroidTvdFt).toBe(10000);
    expect(centroidSandPressure(rest).sandAtCrestPsi).toBeCloseTo(6535, 9);
  });
  it("crest margin to fracture: 6600 psi leaves 65 psi, no finding; 6500 psi closes it (−35 psi) with a finding", () => {
    const open = centroidSandPressure({ ...CASE, fracturePressureAtCrestPsi: 6600 });
    expect(open.crestMarginPsi).toBeCloseTo(65, 9);
    expect(open.crestMarginPsiPerFt).toBeCloseTo(65 / 9000, 12);
    expect(open.findings).toHaveLength(0);
    const closed = centroidSandPressure({ ...CASE, fracturePressureAtCrestPsi: 6500 });
    expect(closed.crestMarginPsi).toBeCloseTo(-35, 9);
    expect(closed.findings.map((f) => f.code)).toEqual(["W_CENTROID_CREST_MARGIN_CLOSED"]);
    expect(closed.findings[0].depthFt).toBe(9000);
    // A required margin of 100 psi raises the finding even while 65 psi remain.
    expect(centroidSandPressure({ ...CASE, fracturePressureAtCrestPsi: 6600, minCrestMarginPsi: 100 }).findings).toHaveLength(1);
  });
  it("profile at given depths: sand equals shale at the centroid", () => {
    const r = centroidSandPressure({ ...CASE, depthsFt: [9500, 10000, 10500] });
    expect(Array.from(r.profile.sandPsi)).toEqual([6767.5, 7000, 7232.5]);
    expect(Array.from(r.profile.shalePsi)).toEqual([6650, 7000, 7350]);
  });
  it("bad geometry or gradients → E_RANGE", () => {
    const codeOf = (f: () => unknown): string => {
      try {
        f();
      } catch (e) {
        return (e as ShalepointError).code + ":" + (e as ShalepointError).details.param;
      }
      return "none";
    };
    expect(codeOf(() => centroidSandPressure({ ...CASE, baseTvdFt: 9000 }))).toBe("E_RANGE:baseTvdFt");
    expect(codeOf(() => centroidSandPressure({ ...CASE, centroidTvdFt: 12000 }))).toBe("E_RANGE:centroidTvdFt");
    expect(codeOf(() => centroidSandPressure({ ...CASE, sandFluidGradientPsiPerFt: 0 }))).toBe("E_RANGE:sandFluidGradientPsiPerFt");
  });
});
