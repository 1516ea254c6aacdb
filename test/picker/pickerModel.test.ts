import { describe, it, expect } from "vitest";
import { trendFromHandles, handlesFromTrend, pickerPorePressure, nearestPointIndex, type PickerShalePoints } from "../../src/picker/pickerModel.js";
import { evaluateCompactionTrend } from "../../src/trend/evaluateCompactionTrend.js";
import type { CompactionTrend } from "../../src/trend/trendTypes.js";
import { ShalepointError } from "../../src/errors.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("trendFromHandles", () => {
  it("sonicLogLinear through 150 µs/ft at 2000 ft and 100 µs/ft at 10,000 ft gives 122.5 µs/ft at 6000 ft", () => {
    const handles = Object.freeze([Object.freeze({ bmlFt: 2000, value: 150 }), Object.freeze({ bmlFt: 10000, value: 100 })]) as unknown as [
      { bmlFt: number; value: number },
      { bmlFt: number; value: number },
    ];
    const trend = trendFromHandles({ kind: "sonicLogLinear", handles });
    const v = evaluateCompactionTrend({ trend, bmlFt: [2000, 6000, 10000] });
    // CHECK-VALUES §2, Hottman & Johnson 1965 semilog trend, own case: 122.5 µs/ft (geometric mean),
    // given to 4 s.f., so allow half a unit of the 4th figure (0.05/122.5 = 4.1e-4)
    expect(rel(v[1], 122.5)).toBeLessThan(4.1e-4);
    expect(rel(v[1], (100 + 150) / 2)).toBeGreaterThan(1e-2); // not the arithmetic mean 125
    // the line passes exactly through both handles (definition of the two-point trend), to round-off
    expect(rel(v[0], 150)).toBeLessThan(1e-12);
    expect(rel(v[2], 100)).toBeLessThan(1e-12);
    expect(trend.segments[0].fittedOn).toBeNull();
  });

  it("resistivityLogLinear recovers R0 0.8 ohm·m and b 1e-4 /ft from handles on Rn = R0·e^(bZ)", () => {
    const given: CompactionTrend = { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }] };
    const handles = handlesFromTrend({ trend: given, topBmlFt: 0, baseBmlFt: 10000 });
    // CHECK-VALUES §2, Zhang 2011 resistivity trend, own case: R0 0.8, b 1e-4, Z 10,000 ft → 2.175 ohm·m (4 s.f.)
    expect(rel(handles[1].value, 2.175)).toBeLessThan(3e-4);
    const back = trendFromHandles({ kind: "resistivityLogLinear", handles });
    const p = back.segments[0].params as { r0OhmM: number; growthPerFt: number };
    // round trip through the model's own equation: exact to round-off
    expect(rel(p.r0OhmM, 0.8)).toBeLessThan(1e-12);
    expect(rel(p.growthPerFt, 1e-4)).toBeLessThan(1e-10);
  });

  it("sonicExponential with fixed Δtm recovers Δtml 200 µs/ft and c 3e-4 /ft; 95.12 µs/ft at 5000 ft", () => {
    const given: CompactionTrend = {
      kind: "sonicExponential",
      segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null }],
    };
    const handles = handlesFromTrend({ trend: given, topBmlFt: 1000, baseBmlFt: 5000 });
    // CHECK-VALUES §2, Zhang 2011 exponential sonic trend, own case: 95.12 µs/ft at Z 5000 ft
    expect(rel(handles[1].value, 95.12)).toBeLessThan(1e-4);
    const back = trendFromHandles({ kind: "sonicExponential", handles, dtMatrixUsPerFt: 65 });
    const p = back.segments[0].params as { dtMatrixUsPerFt: number; dtMudlineUsPerFt: number; decayPerFt: number };
    expect(p.dtMatrixUsPerFt).toBe(65);
    expect(rel(p.dtMudlineUsPerFt, 200)).toBeLessThan(1e-12);
    expect(rel(p.decayPerFt, 3e-4)).toBeLessThan(1e-10);
  });

  it("refuses handles at one depth, an exponential trend that grows with depth, and handles below Δtm", () => {
    const codeOf = (f: () => unknown): string | undefined => {
      try {
        f();
      } catch (e) {
        return e instanceof ShalepointError ? e.code : "other";
      }
      return undefined;
    };
    expect(codeOf(() => trendFromHandles({ kind: "sonicLogLinear", handles: [{ bmlFt: 3000, value: 140 }, { bmlFt: 3000, value: 120 }] }))).toBe("E_PICKER_HANDLES");
    expect(codeOf(() => trendFromHandles({ kind: "sonicExponential", dtMatrixUsPerFt: 65, handles: [{ bmlFt: 1000, value: 100 }, { bmlFt: 5000, value: 130 }] }))).toBe("E_PICKER_HANDLES");
    expect(codeOf(() => trendFromHandles({ kind: "sonicExponential", dtMatrixUsPerFt: 65, handles: [{ bmlFt: 1000, value: 150 }, { bmlFt: 5000, value: 60 }] }))).toBe("E_PICKER_HANDLES");
    expect(codeOf(() => trendFromHandles({ kind: "resistivityLogLinear", handles: [{ bmlFt: 1000, value: -1 }, { bmlFt: 5000, value: 1 }] }))).toBe("E_PICKER_HANDLES");
  });
});

describe("pickerPorePressure", () => {
  const points: PickerShalePoints = Object.freeze({
    tvdFt: Object.freeze([10000, 10000]) as number[],
    bmlFt: Object.freeze([5000, 5000]) as number[],
    dtUsPerFt: Object.freeze([120, NaN]) as number[],
    resistivityOhmM: Object.freeze([NaN, NaN]) as number[],
    svPsi: Object.freeze([10000, 10000]) as number[],
    phPsi: Object.freeze([4650, 4650]) as number[],
  });
  const trend: CompactionTrend = {
    kind: "sonicExponential",
    segments: [{ topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null }],
  };

  it("Eaton sonic on the exponential trend gives 0.7335 psi/ft at Z 5000 ft, Δt 120, OBG 1.0, Png 0.465", () => {
    const r = pickerPorePressure({ points, trend });
    // CHECK-VALUES §3, Eaton 1975 with the §2 sonic trend, own case: 0.7335 psi/ft × 10,000 ft (4 s.f.);
    // a 1 % change in the exponent 3.0 moves the result by ~0.2 %, well outside 1e-4
    expect(rel(r.ppPsi[0], 7335)).toBeLessThan(1e-4);
    expect(Number.isNaN(r.ppPsi[1])).toBe(true); // missing log carries through as NaN
    // EMW in ppg with the exact 12/231 psi/ft per ppg (CHECK-VALUES §0, legal gallon definition)
    expect(rel(r.emwPpg[0], 7335 / (10000 * 12 / 231))).toBeLessThan(1e-4);
  });

  it("a point on the trend gives hydrostatic exactly, 12.0 ppg EMW at 10,000 ft for 6234 psi", () => {
    const onTrend: PickerShalePoints = { ...points, dtUsPerFt: [95.1188, NaN], phPsi: [6233.766, 6233.766] };
    const exact = evaluateCompactionTrend({ trend, bmlFt: [5000] })[0];
    onTrend.dtUsPerFt = [exact, NaN];
    const r = pickerPorePressure({ points: onTrend, trend });
    // CHECK-VALUES §3 identity: ratio 1 → Pn exactly; §0 own case: 12.0 ppg at 10,000 ft → 6234 psi (exact factor)
    expect(rel(r.ppPsi[0], 6233.766)).toBeLessThan(1e-12);
    expect(rel(r.emwPpg[0], 12.0)).toBeLessThan(1e-6);
  });

  it("resistivity trend uses Eaton exponent 1.2: Ro/Rn 0.6 at S/D 1.0, Pn 0.465 → 0.7102 psi/ft", () => {
    const rtrend: CompactionTrend = { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 2.0, growthPerFt: 0 }, fittedOn: null }] };
    const r = pickerPorePressure({ points: { ...points, resistivityOhmM: [1.2, 1.2] }, trend: rtrend });
    // CHECK-VALUES §3, Eaton 1975 resistivity form, own case: 0.7102 psi/ft (4 s.f.)
    expect(rel(r.ppPsi[0], 7102)).toBeLessThan(1e-4);
  });
});

describe("nearestPointIndex", () => {
  it("skips points without a value and returns −1 when none has one", () => {
    expect(nearestPointIndex({ tvdFt: [1000, 2000, 3000], values: [1, NaN, 1], targetTvdFt: 2100 })).toBe(2);
    expect(nearestPointIndex({ tvdFt: [1000, 2000], values: [null, NaN], targetTvdFt: 1500 })).toBe(-1);
  });
});
