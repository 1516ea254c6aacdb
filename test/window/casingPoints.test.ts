/**
 * selectCasingPoints and checkCasingPlan on a small designed window whose answer is worked
 * by hand (bottom-up seat selection, common practice, no source).
 */
import { describe, expect, it } from "vitest";
import { selectCasingPoints } from "../../src/window/casingPoints.js";
import { checkCasingPlan } from "../../src/window/casingPlanCheck.js";
import { ShalepointError } from "../../src/errors.js";

const K = 12 / 231; // psi/ft per ppg (CHECK-VALUES §0)
const tvdFt = Object.freeze(Array.from({ length: 11 }, (_, i) => i * 1000));
const lowerPpg = [9, 9, 9, 10, 11, 12, 13, 14, 15, 16, 17];
const upperPpg = [11, 12, 13, 14, 15, 15.5, 16, 16.5, 17, 17.5, 18];
const lowerPsiPerFt = Object.freeze(lowerPpg.map((p) => p * K));
const upperPsiPerFt = Object.freeze(upperPpg.map((p) => p * K));
const upperCriterion = Object.freeze(tvdFt.map((d) => (d === 3000 ? "breakdown" : "fracture")));

describe("selectCasingPoints", () => {
  it("hand case: shoes at 4000 and 8000 ft; mud 11, 15, 17 ppg; limits at 3000 and 7000 ft", () => {
    // By hand: TD needs 17 ppg; 17.5 and 17 hold it at 9000 and 8000 ft, 16.5 at 7000 ft
    // does not → shoe 8000. From 8000 ft (15 ppg) up: 16.5…15 hold 15 down to 4000 ft,
    // 14 at 3000 ft does not → shoe 4000. From 4000 ft (11 ppg) up to 0 ft (upper 11) holds.
    const r = selectCasingPoints({ tvdFt, lowerPsiPerFt, upperPsiPerFt, upperCriterion });
    expect(r.shoeTvdFt).toEqual([4000, 8000]);
    expect(r.sections.map((s) => [s.topTvdFt, s.bottomTvdFt, +s.mudWeightPpg.toFixed(10), s.topLimit, s.topLimitDepthFt])).toEqual([
      [0, 4000, 11, "top of well", NaN],
      [4000, 8000, 15, "breakdown", 3000],
      [8000, 10000, 17, "fracture", 7000],
    ]);
    expect(r.findings).toEqual([]);
  });
  it("hand case with a 0.25 ppg shoe safety margin: shoes 1000, 4000, 7000, 9000 ft", () => {
    // By hand with upper − 0.25: 17 fails at 8000 (16.75) → shoe 9000; 16 fails at 6000
    // (15.75) → 7000; 14 fails at 3000 (13.75) → 4000; 11 fails at 0 (10.75) → 1000; 9 holds.
    const r = selectCasingPoints({ tvdFt, lowerPsiPerFt, upperPsiPerFt, shoeSafetyMarginPpg: 0.25 });
    expect(r.shoeTvdFt).toEqual([1000, 4000, 7000, 9000]);
    expect(r.sections.map((s) => +s.mudWeightPpg.toFixed(10))).toEqual([9, 11, 14, 16, 17]);
    expect(r.sections[1].topLimit).toBe("upper bound");
  });
  it("a sample with no workable mud weight is reported as a finding; NaN samples do not constrain", () => {
    const lo = [9, NaN, 10, 14].map((p) => p * K);
    const hi = [12, NaN, 13, 13.5].map((p) => p * K);
    const r = selectCasingPoints({ tvdFt: [0, 1000, 2000, 3000], lowerPsiPerFt: lo, upperPsiPerFt: hi });
    expect(r.findings.map((f) => [f.code, f.topFt])).toEqual([["F_NO_MUD_WEIGHT", 3000]]);
    expect(r.shoeTvdFt).toEqual([]);
    expect(r.sections[0].topTvdFt).toBe(0);
  });
  it("firstIndex ignores the samples above it, exactly as if the arrays started there (hand case from 2000 ft)", () => {
    const from = 2;
    const whole = selectCasingPoints({ tvdFt, lowerPsiPerFt, upperPsiPerFt, upperCriterion, firstIndex: from });
    const cut = selectCasingPoints({ tvdFt: tvdFt.slice(from), lowerPsiPerFt: lowerPsiPerFt.slice(from), upperPsiPerFt: upperPsiPerFt.slice(from), upperCriterion: upperCriterion.slice(from) });
    expect(whole).toEqual(cut);
    // By hand as above: the 4000 and 8000 ft shoes stand; the top section starts at 2000 ft.
    expect(whole.shoeTvdFt).toEqual([4000, 8000]);
    expect(whole.sections[0].topTvdFt).toBe(2000);
  });
  it("bad input: margin out of range, no data", () => {
    const code = (fn: () => unknown) => { try { fn(); } catch (e) { return (e as ShalepointError).code; } return undefined; };
    expect(code(() => selectCasingPoints({ tvdFt, lowerPsiPerFt, upperPsiPerFt, shoeSafetyMarginPpg: -1 }))).toBe("E_RANGE");
    expect(code(() => selectCasingPoints({ tvdFt: [1], lowerPsiPerFt: [NaN], upperPsiPerFt: [NaN] }))).toBe("E_TOO_FEW");
  });
});

describe("checkCasingPlan", () => {
  it("accepts the selected design and lists violations of a user plan with depths (hand case)", () => {
    const ok = selectCasingPoints({ tvdFt, lowerPsiPerFt, upperPsiPerFt });
    const plan = ok.sections.map((s) => ({ topTvdFt: s.topTvdFt, bottomTvdFt: s.bottomTvdFt, mudWeightPpg: s.mudWeightPpg }));
    expect(checkCasingPlan({ tvdFt, lowerPsiPerFt, upperPsiPerFt, sections: plan })).toEqual([]);

    // User plan, by hand: 0–5000 ft at 10.5 ppg is below the lower bound 11 at 4000 ft and
    // 12 at 5000 ft (worst 1.5 ppg); 5000–10,000 ft at 16.6 ppg is above the upper bound
    // 15.5, 16, 16.5 at 5000–7000 ft (worst 1.1 ppg) and below the lower 17 at 10,000 ft.
    const v = checkCasingPlan({
      tvdFt, lowerPsiPerFt, upperPsiPerFt,
      sections: [{ topTvdFt: 0, bottomTvdFt: 5000, mudWeightPpg: 10.5 }, { topTvdFt: 5000, bottomTvdFt: 10000, mudWeightPpg: 16.6 }],
    });
    expect(v.map((x) => [x.sectionIndex, x.code, x.topFt, x.baseFt, x.worstDepthFt, +x.worstExceedancePpg.toFixed(6)])).toEqual([
      [0, "V_BELOW_LOWER", 4000, 5000, 5000, 1.5],
      [1, "V_BELOW_LOWER", 10000, 10000, 10000, 0.4],
      [1, "V_ABOVE_UPPER", 5000, 7000, 5000, 1.1],
    ]);
  });
  it("a section outside the well → E_DEPTH_OUTSIDE_WELL; top below bottom → E_RANGE", () => {
    const code = (fn: () => unknown) => { try { fn(); } catch (e) { return (e as ShalepointError).code; } return undefined; };
    expect(code(() => checkCasingPlan({ tvdFt, lowerPsiPerFt, upperPsiPerFt, sections: [{ topTvdFt: 0, bottomTvdFt: 12000, mudWeightPpg: 10 }] }))).toBe("E_DEPTH_OUTSIDE_WELL");
    expect(code(() => checkCasingPlan({ tvdFt, lowerPsiPerFt, upperPsiPerFt, sections: [{ topTvdFt: 5000, bottomTvdFt: 4000, mudWeightPpg: 10 }] }))).toBe("E_RANGE");
  });
  it("doc example: 10 ppg in a section whose lower bound reaches 0.6 psi/ft (11.55 ppg) → 1.55 ppg short at 2000 ft", () => {
    const v = checkCasingPlan({ tvdFt: [1000, 2000], lowerPsiPerFt: [0.5, 0.6], upperPsiPerFt: [0.8, 0.8], sections: [{ topTvdFt: 1000, bottomTvdFt: 2000, mudWeightPpg: 10 }] });
    expect(v).toHaveLength(1);
    expect([v[0].code, v[0].topFt, v[0].baseFt]).toEqual(["V_BELOW_LOWER", 2000, 2000]);
    expect(v[0].worstExceedancePpg).toBeCloseTo(0.6 / K - 10, 12); // 11.55 − 10
    expect(v[0].worstExceedancePpg).toBeCloseTo(1.55, 2);
  });
});
