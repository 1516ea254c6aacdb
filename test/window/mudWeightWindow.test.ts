/**
 * mudWeightWindow: EMW bounds with margins (common practice, no source) on small designed
 * wells whose answers are worked by hand with the exact 12/231 psi/ft per ppg factor
 * (CHECK-VALUES §0).
 */
import { describe, expect, it } from "vitest";
import { mudWeightWindow, mudWeightWindowCurves } from "../../src/window/mudWeightWindow.js";
import { errorOf as errOf } from "../helpers/shalepointErrors.js";

const K = 12 / 231; // psi/ft per ppg, exact (CHECK-VALUES §0)

describe("mudWeightWindow", () => {
  it("10.0 ppg pore pressure, 15.0 ppg fracture, trip 0.3 / kick 0.5 ppg → 10.3 to 14.5 ppg (own case)", () => {
    const d = 10000;
    const r = mudWeightWindow({
      tvdFt: Object.freeze([d]), ppPsi: Object.freeze([10 * K * d]), fracturePsi: Object.freeze([15 * K * d]),
      tripMarginPpg: 0.3, kickMarginPpg: 0.5,
    });
    expect(r.lowerPsiPerFt[0] / K).toBeCloseTo(10.3, 12);
    expect(r.upperPsiPerFt[0] / K).toBeCloseTo(14.5, 12);
    expect(r.widthPsiPerFt[0] / K).toBeCloseTo(4.2, 12);
    expect(r.lowerCriterion).toEqual(["porePressure"]);
    expect(r.upperCriterion).toEqual(["fracture"]);
    expect(r.findings).toEqual([]);
  });
  it("mudWeightWindowCurves is per sample: the deeper part alone gives the whole well's values there (bit for bit)", () => {
    const tvdFt = [1000, 2000, 3000, 4000, 5000];
    const args = {
      tvdFt, ppPsi: [9, 9.5, 12, NaN, 13].map((p, i) => p * K * tvdFt[i]), fracturePsi: [14, 14, 12.8, 12.4, 12.5].map((p, i) => p * K * tvdFt[i]),
      collapsePsi: [NaN, 10 * K * 2000, NaN, NaN, 14 * K * 5000], tripMarginPpg: 0.3, kickMarginPpg: 0.3,
    };
    const whole = mudWeightWindow(args);
    const tail = mudWeightWindowCurves({ ...args, tvdFt: tvdFt.slice(2), ppPsi: args.ppPsi.slice(2), fracturePsi: args.fracturePsi.slice(2), collapsePsi: args.collapsePsi.slice(2) });
    expect(Array.from(tail.widthPsiPerFt)).toEqual(Array.from(whole.widthPsiPerFt.subarray(2)));
    expect(Array.from(tail.lowerPsiPerFt)).toEqual(Array.from(whole.lowerPsiPerFt.subarray(2)));
    expect(tail.lowerCriterion).toEqual(whole.lowerCriterion.slice(2));
    expect(tail.upperCriterion).toEqual(["fracture", "missing", "fracture"]);
    // 12 ppg pore, 12.8 ppg fracture at 3000 ft with 0.3 + 0.3 ppg margins: 0.2 ppg wide (own case)
    expect(tail.widthPsiPerFt[0] / K).toBeCloseTo(0.2, 10);
  });
  it("collapse raises the lower bound and breakdown lowers the upper bound where they bind", () => {
    const tvdFt = [1000, 2000, 3000];
    const r = mudWeightWindow({
      tvdFt, ppPsi: tvdFt.map((d) => 9 * K * d), fracturePsi: tvdFt.map((d) => 16 * K * d),
      collapsePsi: [NaN, 10 * K * 2000, 8 * K * 3000], breakdownPsi: [14 * K * 1000, NaN, 17 * K * 3000],
      tripMarginPpg: 0, kickMarginPpg: 0,
    });
    expect(r.lowerCriterion).toEqual(["porePressure", "collapse", "porePressure"]);
    expect(r.upperCriterion).toEqual(["breakdown", "fracture", "fracture"]);
    expect(Array.from(r.lowerPsiPerFt, (g) => g / K).map((x) => +x.toFixed(10))).toEqual([9, 10, 9]);
    expect(Array.from(r.upperPsiPerFt, (g) => g / K).map((x) => +x.toFixed(10))).toEqual([14, 16, 16]);
  });
  it("reports where the window closes (< min width) and where it inverts, with depth ranges", () => {
    // ppg at 1000…6000 ft: pore 9, 9, 12, 12.6, 13, 10; fracture 14, 14, 12.8, 12.4, 12.5, 14
    const tvdFt = [1000, 2000, 3000, 4000, 5000, 6000];
    const pp = [9, 9, 12, 12.6, 13, 10];
    const fg = [14, 14, 12.8, 12.4, 12.5, 14];
    const r = mudWeightWindow({
      tvdFt, ppPsi: tvdFt.map((d, i) => pp[i] * K * d), fracturePsi: tvdFt.map((d, i) => fg[i] * K * d),
      tripMarginPpg: 0, kickMarginPpg: 0, minWidthPpg: 1,
    });
    expect(r.findings.map((f) => [f.code, f.topFt, f.baseFt, f.count])).toEqual([
      ["F_WINDOW_CLOSES", 3000, 3000, 1],
      ["F_WINDOW_INVERTS", 4000, 5000, 2],
    ]);
    expect(r.findings[1].message).toContain("-0.50 ppg");
  });
  it("NaN pore or fracture pressure → missing sample; depth 0 → missing", () => {
    const r = mudWeightWindow({ tvdFt: [0, 1000, 2000], ppPsi: [0, NaN, 930], fracturePsi: [0, 700, 1400], tripMarginPpg: 0, kickMarginPpg: 0 });
    expect(r.lowerCriterion).toEqual(["missing", "missing", "porePressure"]);
    expect(r.lowerPsiPerFt[1]).toBeNaN();
  });
  it("margins that close every window → E_WINDOW_CLOSED_EVERYWHERE naming the margins and the widest window", () => {
    const tvdFt = [1000, 2000];
    const e = errOf(() => mudWeightWindow({
      tvdFt, ppPsi: tvdFt.map((d) => 10 * K * d), fracturePsi: tvdFt.map((d) => 11 * K * d),
      tripMarginPpg: 0.6, kickMarginPpg: 0.5,
    }));
    expect(e.code).toBe("E_WINDOW_CLOSED_EVERYWHERE");
    expect(e.details.value).toBeCloseTo(1.1, 12);
    expect(e.details.allowed).toContain("< 1.00 ppg");
  });
  it("margins outside [0, 3] ppg → E_RANGE", () => {
    expect(errOf(() => mudWeightWindow({ tvdFt: [1], ppPsi: [0.5], fracturePsi: [0.8], tripMarginPpg: -0.1, kickMarginPpg: 0 })).code).toBe("E_RANGE");
    expect(errOf(() => mudWeightWindow({ tvdFt: [1], ppPsi: [0.5], fracturePsi: [0.8], tripMarginPpg: 0, kickMarginPpg: 4 })).code).toBe("E_RANGE");
  });
});
