/**
 * Depth-varying coefficient helpers and the @example values of the fracture files (own
 * cases: linear interpolation arithmetic; CHECK-VALUES §6 and §7 where named).
 */
import { describe, expect, it } from "vitest";
import { resolveDepthCoefficient, coefficientAtDepth, interpolateOnDepthIndex } from "../../src/stress/stressSeries.js";
import { calibrateFractureModel } from "../../src/stress/fractureCalibration.js";
import { frictionalStressBounds } from "../../src/stress/frictionalStressBounds.js";
import { ShalepointError } from "../../src/errors.js";

const code = (fn: () => unknown) => { try { fn(); } catch (e) { return (e as ShalepointError).code; } return undefined; };

describe("resolveDepthCoefficient", () => {
  it("doc example: table (0 ft 0.3, 4000 ft 0.5) at 1000 and 2000 ft → 0.35, 0.40 (own case)", () => {
    const r = resolveDepthCoefficient({ tvdFt: new Float64Array([1000, 2000]), coefficient: Object.freeze([{ depthFt: 0, value: 0.3 }, { depthFt: 4000, value: 0.5 }]), name: "nu" });
    expect(r[0]).toBeCloseTo(0.35, 14);
    expect(r[1]).toBeCloseTo(0.4, 14);
  });
  it("empty, unsorted or non-finite tables → E_TABLE; curve of wrong length → E_LENGTH", () => {
    expect(code(() => resolveDepthCoefficient({ tvdFt: [1], coefficient: [], name: "nu" }))).toBe("E_TABLE");
    expect(code(() => resolveDepthCoefficient({ tvdFt: [1], coefficient: [{ depthFt: 5, value: 0.3 }, { depthFt: 5, value: 0.4 }], name: "nu" }))).toBe("E_TABLE");
    expect(code(() => resolveDepthCoefficient({ tvdFt: [1], coefficient: [{ depthFt: NaN, value: 0.3 }], name: "nu" }))).toBe("E_TABLE");
    expect(code(() => resolveDepthCoefficient({ tvdFt: [1, 2], coefficient: new Float64Array(3), name: "nu" }))).toBe("E_LENGTH");
  });
  it("coefficientAtDepth and interpolateOnDepthIndex: linear inside, clamp or NaN outside", () => {
    expect(coefficientAtDepth({ tvdFt: [0], coefficient: 0.8, name: "ki", depthFt: 5449 })).toBe(0.8);
    expect(interpolateOnDepthIndex({ tvdFt: [0, 100], values: [0, 50], depthFt: 40, clampEnds: false })).toBe(20);
    expect(interpolateOnDepthIndex({ tvdFt: [0, 100], values: [0, 50], depthFt: 140, clampEnds: false })).toBeNaN();
    expect(interpolateOnDepthIndex({ tvdFt: [0, 100], values: [0, 50], depthFt: 140, clampEnds: true })).toBe(50);
  });
});

describe("doc examples", () => {
  it("calibrateFractureModel: one LOT at 0.6433 psi/ft on a 0.465 / 1.0 psi/ft well → ν 0.25 (CHECK-VALUES §6 own case inverted)", () => {
    const r = calibrateFractureModel({ tvdFt: [0, 10000], ppPsi: [0, 4650], svPsi: [0, 10000], tests: [{ tvdFt: 10000, pressurePsi: 6433.3, kind: "LOT" }], model: { model: "poissonRatio" } });
    expect(r.parameter).toBeCloseTo(0.25, 4);
  });
  it("frictionalStressBounds: 9843 ft, Pp 4351, Sv 10,008 psi → Shmin ≥ 6165 psi (CHECK-VALUES §7, 42.50 MPa own case)", () => {
    expect(frictionalStressBounds({ tvdFt: [9843], ppPsi: [4351], svPsi: [10008] }).normal.shminMinPsi[0]).toBeCloseTo(6164.6, 0);
  });
});
