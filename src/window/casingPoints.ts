import { ShalepointError, requireRange, requireSameLength } from "../errors.js";
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { type WindowFinding } from "./windowFindings.js";

/** One open-hole section of a casing design. */
export interface CasingSection {
  /** Top of the section = shoe of the casing above it (0 / first depth for the top hole), ft TVD. */
  topTvdFt: number;
  /** Bottom of the section (the next shoe, or TD), ft TVD. */
  bottomTvdFt: number;
  /** Mud weight for the section, psi/ft and ppg (= the largest lower bound in the section). */
  mudWeightPsiPerFt: number;
  mudWeightPpg: number;
  /** Why the section's top is where it is: the upper-bound criterion that failed just above, or `top of well`. */
  topLimit: string;
  /** Depth whose upper bound could not hold the mud weight (NaN for the top hole), ft. */
  topLimitDepthFt: number;
}

/** Result of {@link selectCasingPoints}. */
export interface CasingDesign {
  /** Sections from the surface down. */
  sections: CasingSection[];
  /** Casing shoe depths from the surface down (the tops of every section but the first), ft TVD. */
  shoeTvdFt: number[];
  /** Samples where no mud weight fits (lower above upper), with depths. */
  findings: WindowFinding[];
}

/**
 * Casing points selected bottom-up from a mud-weight window.
 *
 * From the deepest sample with data, the section's mud weight starts at the lower bound
 * there; walking up, the mud weight rises to the largest lower bound met, and the walk stops
 * at the first depth whose upper bound (less the shoe safety margin) cannot hold it. The
 * casing shoe is set at the shallowest depth that held it, and the walk restarts from that
 * shoe with the shoe's own lower bound; the shallowest section reaches the top of the index.
 * Sections share their shoe sample; if the sample just above a shoe cannot hold the shoe's
 * own lower bound, the next section starts one sample above the shoe. A sample where no
 * mud weight fits (lower above upper, or a one-sample dead end) is reported as
 * `F_NO_MUD_WEIGHT` and left out of the sections; samples with NaN bounds do not constrain. The window should already include the trip and kick margins
 * ({@link mudWeightWindow}); `shoeSafetyMarginPpg` is an extra margin on the upper bound.
 *
 * @param args.tvdFt depth index, ft TVD, increasing
 * @param args.lowerPsiPerFt window lower bound, psi/ft
 * @param args.upperPsiPerFt window upper bound, psi/ft
 * @param args.upperCriterion optional label of the upper bound per sample (e.g. `fracture`)
 * @param args.shoeSafetyMarginPpg extra margin below the upper bound, ppg, [0, 3], default 0
 * @param args.firstIndex first sample to consider (default 0): the samples above it are
 *   ignored, as if the arrays started there (e.g. above the structural casing)
 * @returns sections top-down, shoe depths and findings (`F_NO_MUD_WEIGHT` ranges)
 * @throws ShalepointError E_RANGE for a margin outside [0, 3]; E_LENGTH on mismatch;
 *   E_TOO_FEW when no sample has both bounds
 * @example lower 9,9,9,10,11,12,13,14,15,16,17 and upper 11,12,13,14,15,15.5,16,16.5,17,17.5,18 ppg
 *   at 0, 1000, …, 10,000 ft → shoes [4000, 8000], mud weights 11, 15, 17 ppg
 *
 * Reference: common practice, no source (bottom-up casing seat selection of drilling
 * engineering texts).
 */
export function selectCasingPoints(args: {
  tvdFt: ArrayLike<number>;
  lowerPsiPerFt: ArrayLike<number>;
  upperPsiPerFt: ArrayLike<number>;
  upperCriterion?: readonly string[];
  shoeSafetyMarginPpg?: number;
  firstIndex?: number;
}): CasingDesign {
  const { tvdFt, lowerPsiPerFt: lower, upperPsiPerFt: upper, upperCriterion } = args;
  const marginPpg = args.shoeSafetyMarginPpg ?? 0;
  requireRange(marginPpg >= 0 && marginPpg <= 3, "shoeSafetyMarginPpg", marginPpg, "[0, 3]", "ppg");
  requireSameLength(tvdFt, lower, "tvdFt", "lowerPsiPerFt");
  requireSameLength(tvdFt, upper, "tvdFt", "upperPsiPerFt");
  const margin = marginPpg * PSI_PER_FT_PER_PPG;
  const tol = 1e-12; // absolute, psi/ft: equality within rounding counts as holding
  const has = (i: number): boolean => Number.isFinite(lower[i]) && Number.isFinite(upper[i]);
  const top = args.firstIndex ?? 0;
  if (!(Number.isInteger(top) && top >= 0)) {
    throw new ShalepointError("E_RANGE", "firstIndex must be a sample index ≥ 0", { param: "firstIndex", value: top, allowed: "integer ≥ 0" });
  }
  let b = tvdFt.length - 1;
  while (b >= top && !has(b)) b--;
  if (b < top) {
    throw new ShalepointError("E_TOO_FEW", "no sample has both window bounds", {
      param: "lowerPsiPerFt, upperPsiPerFt", allowed: "at least 1 sample with finite lower and upper bounds",
    });
  }
  let first = top;
  while (!has(first)) first++;

  const sectionsBottomUp: CasingSection[] = [];
  const noMw = new Set<number>();
  for (;;) {
    let mw = lower[b];
    if (upper[b] - margin < lower[b] - tol) noMw.add(b);
    let j = b - 1;
    let stopped = false;
    for (; j >= first; j--) {
      if (!has(j)) continue;
      const need = Math.max(mw, lower[j]);
      if (upper[j] - margin < need - tol) {
        stopped = true;
        break;
      }
      mw = need;
    }
    if (!stopped) {
      sectionsBottomUp.push(section(tvdFt[first], tvdFt[b], mw, "top of well", NaN));
      break;
    }
    let s = j + 1;
    while (!has(s)) s++;
    const crit = upperCriterion?.[j] ?? "upper bound";
    if (s < b) {
      sectionsBottomUp.push(section(tvdFt[s], tvdFt[b], mw, crit, tvdFt[j]));
      b = s;
    } else {
      // No progress: the sample above cannot hold this one's lower bound. Start the next
      // section one sample up (without emitting an empty section).
      noMw.add(b);
      b = j;
    }
  }
  const sections = sectionsBottomUp.reverse();
  const findings: WindowFinding[] = [...noMw].sort((x, y) => x - y).map((i) => ({
    code: "F_NO_MUD_WEIGHT",
    message: `no mud weight fits at ${tvdFt[i]} ft: lower bound ${(lower[i] / PSI_PER_FT_PER_PPG).toFixed(2)} ppg, upper ${((upper[i] - margin) / PSI_PER_FT_PER_PPG).toFixed(2)} ppg`,
    topFt: tvdFt[i], baseFt: tvdFt[i], count: 1,
  }));
  return { sections, shoeTvdFt: sections.slice(1).map((s) => s.topTvdFt), findings };
}

function section(top: number, bottom: number, mw: number, topLimit: string, topLimitDepthFt: number): CasingSection {
  return { topTvdFt: top, bottomTvdFt: bottom, mudWeightPsiPerFt: mw, mudWeightPpg: mw / PSI_PER_FT_PER_PPG, topLimit, topLimitDepthFt };
}
