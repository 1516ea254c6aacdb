/**
 * Gamma-ray index and shale volume. Larionov 1969, "Borehole radiometry", Nedra, Moscow
 * (from memory): tertiary Vsh = 0.083(2^(3.7 IGR) − 1), older Vsh = 0.33(2^(2 IGR) − 1).
 * Values computed by hand at IGR 0, 0.5, 1.
 */
import { describe, expect, it } from "vitest";
import { gammaRayIndex, vshaleFromGammaRay, vshaleLarionovOlder, vshaleLarionovTertiary } from "../../src/logs/index.js";
import { ShalepointError } from "../../src/errors.js";

describe("vshaleLarionovTertiary", () => {
  it("matches hand values at IGR 0, 0.5, 1", () => {
    expect(vshaleLarionovTertiary(0)).toBe(0);
    // Hand: 2^1.85 = 3.60500, 0.083 × 2.60500 = 0.216215 (from memory formula, hand arithmetic).
    expect(vshaleLarionovTertiary(0.5)).toBeCloseTo(0.216215, 5);
    // Hand: 2^3.7 = 12.99604, 0.083 × 11.99604 = 0.995671.
    expect(vshaleLarionovTertiary(1)).toBeCloseTo(0.995671, 5);
  });
});

describe("vshaleLarionovOlder", () => {
  it("matches hand values at IGR 0, 0.5, 1", () => {
    expect(vshaleLarionovOlder(0)).toBe(0);
    expect(vshaleLarionovOlder(0.5)).toBeCloseTo(0.33, 12); // 0.33 × (2 − 1)
    expect(vshaleLarionovOlder(1)).toBeCloseTo(0.99, 12); // 0.33 × (4 − 1)
  });
});

describe("gammaRayIndex", () => {
  it("clips to [0, 1] and carries NaN", () => {
    const gr = new Float64Array([20, 30, 75, 120, 150, NaN]);
    const r = gammaRayIndex({ grApi: gr, grSandApi: 30, grShaleApi: 120 });
    expect(Array.from(r)).toEqual([0, 0, 0.5, 1, 1, NaN]);
  });
  it("rejects a shale line at or below the sand line", () => {
    expect(() => gammaRayIndex({ grApi: new Float64Array(1), grSandApi: 100, grShaleApi: 100 })).toThrowError(ShalepointError);
  });
});

describe("vshaleFromGammaRay", () => {
  it("applies each model to the gamma-ray index", () => {
    const gr = new Float64Array([30, 75, 120]);
    const lin = vshaleFromGammaRay({ grApi: gr, grSandApi: 30, grShaleApi: 120, model: "linear" });
    const ter = vshaleFromGammaRay({ grApi: gr, grSandApi: 30, grShaleApi: 120, model: "larionovTertiary" });
    const old = vshaleFromGammaRay({ grApi: gr, grSandApi: 30, grShaleApi: 120, model: "larionovOlder" });
    expect(Array.from(lin)).toEqual([0, 0.5, 1]);
    expect(ter[1]).toBeCloseTo(0.216215, 5);
    expect(old[2]).toBeCloseTo(0.99, 12);
    expect(Array.from(gr)).toEqual([30, 75, 120]);
  });
});
