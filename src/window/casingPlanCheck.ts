import { ShalepointError, requireSameLength } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { windowFlagRuns } from "./windowFindings.js";

/** One hole section of a user's casing plan. */
export interface PlannedHoleSection {
  /** Top of open hole (the shoe above), ft TVD. */
  topTvdFt: number;
  /** Bottom of the section (this casing's shoe or TD), ft TVD. */
  bottomTvdFt: number;
  /** Planned mud weight, ppg. */
  mudWeightPpg: number;
}

/** A depth range where a planned mud weight leaves the window. */
export interface CasingPlanViolation {
  sectionIndex: number;
  /** `V_BELOW_LOWER`: mud below the lower bound (kick / collapse risk); `V_ABOVE_UPPER`: mud above the upper bound (losses / fracture risk). */
  code: "V_BELOW_LOWER" | "V_ABOVE_UPPER";
  topFt: number;
  baseFt: number;
  count: number;
  /** Depth of the largest exceedance and its size, ppg (positive). */
  worstDepthFt: number;
  worstExceedancePpg: number;
}

/**
 * Check a user's casing plan against a mud-weight window.
 *
 * For each section, every sample with topTvdFt ≤ D ≤ bottomTvdFt must satisfy
 * lower(D) ≤ MW ≤ upper(D) (EMW, psi/ft; the plan's ppg converted with 12/231). Violating
 * depth runs are listed with the worst exceedance. Samples with NaN bounds are not checked.
 *
 * @param args.tvdFt depth index, ft TVD, increasing
 * @param args.lowerPsiPerFt window lower bound, psi/ft
 * @param args.upperPsiPerFt window upper bound, psi/ft
 * @param args.sections planned hole sections, top-down
 * @returns violations in section order, then depth
 * @throws ShalepointError E_DEPTH_OUTSIDE_WELL when a section lies outside the depth index;
 *   E_RANGE when a section's top is not above its bottom or its mud weight is outside (0, 25) ppg
 * @example checkCasingPlan({ tvdFt: [1000, 2000], lowerPsiPerFt: [0.5, 0.6], upperPsiPerFt: [0.8, 0.8],
 *   sections: [{ topTvdFt: 1000, bottomTvdFt: 2000, mudWeightPpg: 10 }] })
 *   // [{ code: "V_BELOW_LOWER", topFt: 2000, baseFt: 2000, worstExceedancePpg: 1.55, … }]
 *
 * Reference: common practice, no source.
 */
export function checkCasingPlan(args: {
  tvdFt: ArrayLike<number>;
  lowerPsiPerFt: ArrayLike<number>;
  upperPsiPerFt: ArrayLike<number>;
  sections: readonly PlannedHoleSection[];
}): CasingPlanViolation[] {
  const { tvdFt, lowerPsiPerFt: lower, upperPsiPerFt: upper, sections } = args;
  requireSameLength(tvdFt, lower, "tvdFt", "lowerPsiPerFt");
  requireSameLength(tvdFt, upper, "tvdFt", "upperPsiPerFt");
  const n = tvdFt.length;
  const top = n > 0 ? tvdFt[0] : NaN;
  const base = n > 0 ? tvdFt[n - 1] : NaN;
  const out: CasingPlanViolation[] = [];
  sections.forEach((s, k) => {
    for (const [name, d] of [["topTvdFt", s.topTvdFt], ["bottomTvdFt", s.bottomTvdFt]] as const) {
      if (!(d >= top && d <= base)) {
        throw new ShalepointError("E_DEPTH_OUTSIDE_WELL", `section ${k} ${name} lies outside the well's depth index`, {
          param: `sections[${k}].${name}`, value: d, unit: "ft", allowed: `[${top}, ${base}]`,
        });
      }
    }
    if (!(s.topTvdFt < s.bottomTvdFt)) {
      throw new ShalepointError("E_RANGE", `section ${k} top must be above its bottom`, {
        param: `sections[${k}].topTvdFt`, value: s.topTvdFt, unit: "ft", allowed: `< ${s.bottomTvdFt}`,
      });
    }
    if (!(s.mudWeightPpg > 0 && s.mudWeightPpg < 25)) {
      throw new ShalepointError("E_RANGE", `section ${k} mud weight is out of range`, {
        param: `sections[${k}].mudWeightPpg`, value: s.mudWeightPpg, unit: "ppg", allowed: "(0, 25)",
      });
    }
    const mw = s.mudWeightPpg * PSI_PER_FT_PER_PPG;
    const inSec = (i: number): boolean => tvdFt[i] >= s.topTvdFt && tvdFt[i] <= s.bottomTvdFt;
    const checks = [
      { code: "V_BELOW_LOWER" as const, excess: (i: number) => lower[i] - mw },
      { code: "V_ABOVE_UPPER" as const, excess: (i: number) => mw - upper[i] },
    ];
    for (const { code, excess } of checks) {
      const flags = Array.from({ length: n }, (_, i) => inSec(i) && excess(i) > 0);
      for (const { first, last } of windowFlagRuns(flags)) {
        let worst = first;
        for (let i = first; i <= last; i++) if (excess(i) > excess(worst)) worst = i;
        out.push({
          sectionIndex: k, code, topFt: tvdFt[first], baseFt: tvdFt[last], count: last - first + 1,
          worstDepthFt: tvdFt[worst], worstExceedancePpg: excess(worst) / PSI_PER_FT_PER_PPG,
        });
      }
    }
  });
  return out;
}
