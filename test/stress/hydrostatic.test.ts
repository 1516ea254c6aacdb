/**
 * Hydrostatic pressure: checked against CHECK-VALUES §0 (own cases on ρ g h with
 * g = 9.80665 m/s²) and common practice (0.465 psi/ft brine, no source).
 */
import { describe, expect, it } from "vitest";
import { hydrostaticPressure, hydrostaticPressureFromBrineDensity } from "../../src/stress/index.js";
import { metresToFeet, psiToMpa, pressureToEmwPpg } from "../../src/index.js";
import type { Datums } from "../../src/well/types.js";

const OFFSHORE: Datums = Object.freeze({ rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 });

describe("hydrostaticPressure", () => {
  it("starts at sea level offshore: zero in the air gap, 0.465 psi/ft × TVDSS below (own case)", () => {
    const tvdFt = Object.freeze([0, 82, 1082, 10082, NaN]);
    const p = hydrostaticPressure({ tvdFt, datums: OFFSHORE, gradientPsiPerFt: 0.465 });
    expect(Array.from(p.slice(0, 4))).toEqual([0, 0, 465, 4650]);
    expect(p[4]).toBeNaN();
  });
  it("0.465 psi/ft reads 8.951 ppg EMW below TVDSS (CHECK-VALUES §0, own case); EMW vs RT depth is lower by the air gap", () => {
    const p = hydrostaticPressure({ tvdFt: [10082], datums: { ...OFFSHORE, rtElevationFt: 0 }, gradientPsiPerFt: 0.465 });
    expect(Math.abs(pressureToEmwPpg(p[0], 10082) - 8.951)).toBeLessThan(5e-4);
  });
  it("onshore starts at ground level", () => {
    const datums: Datums = { rtElevationFt: 30, waterDepthFt: 0, groundLevelFt: 0, seawaterDensityGcc: 1.03 };
    const p = hydrostaticPressure({ tvdFt: [10, 1030], datums, gradientPsiPerFt: 0.44 });
    expect(p[0]).toBe(0);
    expect(p[1]).toBeCloseTo(440, 10);
  });
  it("rejects a gradient given in ppg by mistake with E_RANGE", () => {
    expect(() => hydrostaticPressure({ tvdFt: [1000], datums: OFFSHORE, gradientPsiPerFt: 8.95 })).toThrow(
      expect.objectContaining({ code: "E_RANGE" }),
    );
  });
});

describe("hydrostaticPressureFromBrineDensity", () => {
  it("1.20 sg over 3000 m → 35.30 MPa (CHECK-VALUES §0, own case)", () => {
    const datums: Datums = { rtElevationFt: 0, waterDepthFt: 100, seawaterDensityGcc: 1.03 };
    const p = hydrostaticPressureFromBrineDensity({ tvdFt: [metresToFeet(3000)], datums, brineDensityGcc: 1.2 });
    // 1.2 × 9.80665 × 3000 / 1000 = 35.304 MPa; a 1 % density change moves it 0.35 MPa
    expect(Math.abs(psiToMpa(p[0]) - 35.30394)).toBeLessThan(1e-4);
  });
  it("rejects a density in kg/m3 with E_RANGE", () => {
    expect(() => hydrostaticPressureFromBrineDensity({ tvdFt: [1], datums: OFFSHORE, brineDensityGcc: 1030 })).toThrow(
      expect.objectContaining({ code: "E_RANGE", details: expect.objectContaining({ param: "brineDensityGcc" }) }),
    );
  });
});
