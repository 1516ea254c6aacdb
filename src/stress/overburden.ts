/**
 * Overburden (vertical stress) by integrating bulk density from the rotary table down.
 *
 * Reference: Zoback, M.D., 2007, Reservoir Geomechanics (Cambridge UP), ch. 1, eq. 1.6:
 *   Sv(z) = ∫₀ᶻ ρ(z) g dz; offshore Sv = ρw g zw + ∫ ρ g dz below the mudline.
 *
 * Column, top to bottom:
 * - air gap (rotary table to sea level, or to ground level onshore): contributes nothing;
 * - water column at the seawater density (datums.seawaterDensityGcc);
 * - sediments: the density log; where it has not started yet (mudline to the top of the
 *   log), the power-law average density of Traugott 1997 (see nearMudlineDensity.ts) or,
 *   as an option, Gardner density from sonic (see gardnerDensity.ts); inside the log,
 *   bad-hole samples (caliper flag) and missing samples are patched from Gardner on sonic,
 *   else interpolated linearly in depth; below the last density value, Gardner on sonic or
 *   the last value held.
 *
 * Numerical rule and precision: the trapezoid rule on the sample grid, summed cumulatively
 * with Neumaier compensation. It is exact when density is linear between samples (and at
 * steps, when the step is sampled twice at the same depth); otherwise the truncation error
 * over a depth L is at most L·h²·max|ρ''|·g/12 for sample spacing h — for a 0.5 ft log with
 * ρ'' ≤ 1e-3 g/cc/ft², below 1e-4 psi over 20,000 ft. Rounding stays near 1e-15 relative.
 *
 * Files needed to copy this module into a script: stress/overburden.ts,
 * stress/gardnerDensity.ts, stress/nearMudlineDensity.ts, units/index.ts, errors.ts,
 * well/types.ts (types only).
 */
import { PSI_PER_FT_PER_GCC, PSI_PER_FT_PER_PPG, PPG_PER_GCC } from "../units/index.js";
import { ShalepointError, requireRange, requireSameLength, type Warning } from "../errors.js";
import type { Datums } from "../well/types.js";
import { GARDNER_COEFFICIENT_FT_PER_S, GARDNER_EXPONENT, type GardnerCoefficients } from "./gardnerDensity.js";
import { powerLawAverageDensityPpg, powerLawPointDensityPpg } from "./nearMudlineDensity.js";

/** Where the density at each sample came from (index into {@link OVERBURDEN_SOURCE_NAMES}). */
export const OverburdenSource = {
  air: 0,
  waterColumn: 1,
  densityLog: 2,
  nearMudlinePowerLaw: 3,
  nearMudlineGardner: 4,
  badHoleGardner: 5,
  missingGardner: 6,
  interpolated: 7,
  extendedLastValue: 8,
} as const;

/** Name of a density source. */
export type OverburdenSourceName = keyof typeof OverburdenSource;

/** Source names in code order: `OVERBURDEN_SOURCE_NAMES[code]`. */
export const OVERBURDEN_SOURCE_NAMES: readonly OverburdenSourceName[] = [
  "air",
  "waterColumn",
  "densityLog",
  "nearMudlinePowerLaw",
  "nearMudlineGardner",
  "badHoleGardner",
  "missingGardner",
  "interpolated",
  "extendedLastValue",
];

/** One run of consecutive samples whose density came from the same source. */
export interface OverburdenSourceRange {
  source: OverburdenSourceName;
  /** First and last sample index of the run (inclusive). */
  fromIndex: number;
  toIndex: number;
  /** TVD below RT of the first and last sample, ft. */
  fromTvdFt: number;
  toTvdFt: number;
  count: number;
}

/** How to fill the gap between the mudline and the top of the density log. */
export type NearMudlineFill = "powerLawAverage" | "gardnerFromSonic";

/** Inputs of {@link integrateOverburden}. */
export interface OverburdenInput {
  /** TVD below the rotary table of each sample, ft, finite and non-decreasing. */
  tvdFt: ArrayLike<number>;
  /** Rotary-table elevation, water depth, seawater density (g/cc, typical 1.03). */
  datums: Datums;
  /** Bulk density log, g/cc (NaN = missing); typical 1.8–2.6. */
  densityGcc: ArrayLike<number>;
  /** Compressional slowness, µs/ft (NaN = missing); needed for Gardner patches. */
  slownessUsPerFt?: ArrayLike<number>;
  /** Bad-hole flag per sample (1 = density unreliable, e.g. washout from caliper). */
  badHoleFlag?: Uint8Array;
  /** Gap fill between mudline and top of density; default "powerLawAverage". */
  nearMudline?: NearMudlineFill;
  /** Gardner calibration for all Gardner patches (defaults 0.23, 0.25). */
  gardner?: GardnerCoefficients;
}

/** Result of {@link integrateOverburden}. All arrays align with `tvdFt`. */
export interface OverburdenResult {
  /** Vertical stress, psi. */
  svPsi: Float64Array;
  /** Overburden gradient Sv/TVD, psi/ft (NaN at TVD ≤ 0). */
  gradientPsiPerFt: Float64Array;
  /** Overburden gradient as equivalent mud weight, ppg. */
  emwPpg: Float64Array;
  /**
   * Point density used at each sample, g/cc (NaN in the air). For power-law samples this is
   * the implied point density d(ρa·D)/dD, shown for plots only; Sv uses ρa·D itself.
   */
  densityUsedGcc: Float64Array;
  /** Source code per sample, see {@link OverburdenSource}. */
  source: Uint8Array;
  /** Runs of samples by source, top to bottom: which depth ranges were filled and how. */
  ranges: OverburdenSourceRange[];
  warnings: Warning[];
}

/**
 * Overburden stress from density, with a near-mudline fill and bad-hole patches.
 *
 * Formula (Zoback 2007, eq. 1.6): Sv(z) = ρw·g·Zw + ∫ ρ·g dz, with g·ρ = 0.43353 psi/ft per
 * g/cc; near-mudline gap Sv = (ρw·Zw + ρa·D)/19.25 with ρa = 16.3 + (D/3125)^0.6 ppg
 * (Traugott 1997; Zhang 2019 eqs. 6.4–6.6); Gardner ρ = 0.23·V^0.25 (Gardner et al. 1974).
 * Integration: trapezoid on the sample grid, cumulative (see the file header for precision).
 *
 * @param input see {@link OverburdenInput}
 * @returns Sv (psi), gradient (psi/ft), EMW (ppg), density used, sources and ranges
 * @throws ShalepointError E_LENGTH when curves differ in length from tvdFt;
 *   E_DEPTH_ORDER when tvdFt is not finite and non-decreasing; E_RANGE for datums out of range
 * @example
 * // seawater 1.03 g/cc over 3280.84 ft (1000 m), then 2.20 g/cc for 6561.68 ft (2000 m):
 * integrateOverburden({ tvdFt: [0, 3280.84, 9842.52], datums: { rtElevationFt: 0, waterDepthFt: 3280.84, seawaterDensityGcc: 1.03 }, densityGcc: [NaN, 2.2, 2.2] })
 * // svPsi[2] ≈ 7723 psi (53.25 MPa); ranges: air at 0 ft, densityLog 3280.84–9842.52 ft
 * Reference: Zoback 2007, Reservoir Geomechanics, ch. 1, eq. 1.6.
 */
export function integrateOverburden(input: OverburdenInput): OverburdenResult {
  const { tvdFt, datums, densityGcc, slownessUsPerFt, badHoleFlag } = input;
  const nearMudline: NearMudlineFill = input.nearMudline ?? "powerLawAverage";
  const n = tvdFt.length;
  requireSameLength(tvdFt, densityGcc, "tvdFt", "densityGcc");
  if (slownessUsPerFt) requireSameLength(tvdFt, slownessUsPerFt, "tvdFt", "slownessUsPerFt");
  if (badHoleFlag) requireSameLength(tvdFt, badHoleFlag, "tvdFt", "badHoleFlag");
  requireRange(datums.rtElevationFt >= 0 && Number.isFinite(datums.rtElevationFt), "datums.rtElevationFt", datums.rtElevationFt, "[0, 500]", "ft");
  requireRange(datums.waterDepthFt >= 0 && Number.isFinite(datums.waterDepthFt), "datums.waterDepthFt", datums.waterDepthFt, "[0, 15000]", "ft");
  requireRange(
    datums.seawaterDensityGcc >= 0.95 && datums.seawaterDensityGcc <= 1.1,
    "datums.seawaterDensityGcc",
    datums.seawaterDensityGcc,
    "[0.95, 1.1]",
    "g/cc",
    "Seawater is about 1.03 g/cc (8.6 ppg); give g/cc.",
  );
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(tvdFt[i]) || (i > 0 && tvdFt[i] < tvdFt[i - 1])) {
      throw new ShalepointError("E_DEPTH_ORDER", "tvdFt must be finite and non-decreasing", {
        param: "tvdFt",
        value: tvdFt[i],
        row: i,
        unit: "ft",
        hint: "Sort the samples by depth and drop samples without a depth before integrating.",
      });
    }
  }

  const offshore = datums.waterDepthFt > 0;
  const seaTvdFt = offshore ? datums.rtElevationFt : datums.rtElevationFt - (datums.groundLevelFt ?? 0);
  const mudlineTvdFt = offshore ? datums.rtElevationFt + datums.waterDepthFt : seaTvdFt;
  const waterGrad = datums.seawaterDensityGcc * PSI_PER_FT_PER_GCC;
  const svMudlinePsi = offshore ? waterGrad * datums.waterDepthFt : 0;

  const source = new Uint8Array(n);
  const rho = new Float64Array(n).fill(NaN);
  const svPsi = new Float64Array(n);
  const warnings: Warning[] = [];
  // Gardner density is needed only where the density log is not used (above its top, bad
  // hole, missing): evaluated there alone, with the formula of gardnerDensityFromSlowness
  // (same operations, same values), instead of at every sample.
  const gCoef = input.gardner?.coefficient;
  const gExp = input.gardner?.exponent;
  const gardnerCoefficient = gCoef === undefined ? GARDNER_COEFFICIENT_FT_PER_S : gCoef;
  const gardnerExponent = gExp === undefined ? GARDNER_EXPONENT : gExp;
  const gardnerAt = (i: number): number => {
    if (!slownessUsPerFt) return NaN;
    const dt = slownessUsPerFt[i];
    return dt > 0 && Number.isFinite(dt) ? gardnerCoefficient * (1e6 / dt) ** gardnerExponent : NaN;
  };

  // 1. air and water; first sediment sample
  let iSed = n;
  for (let i = 0; i < n; i++) {
    const z = tvdFt[i];
    if (z < mudlineTvdFt) {
      if (z <= seaTvdFt) {
        source[i] = OverburdenSource.air;
        svPsi[i] = 0;
      } else {
        source[i] = OverburdenSource.waterColumn;
        rho[i] = datums.seawaterDensityGcc;
        svPsi[i] = waterGrad * (z - seaTvdFt);
      }
    } else {
      iSed = i;
      break;
    }
  }

  // 2. top of the density log (first finite value, flagged or not)
  let iTop = n;
  for (let i = iSed; i < n; i++) {
    if (Number.isFinite(densityGcc[i]) && densityGcc[i] > 0) {
      iTop = i;
      break;
    }
  }

  // 3. point densities
  const PENDING = 255;
  for (let i = iSed; i < n; i++) {
    if (i < iTop) {
      const g = nearMudline === "gardnerFromSonic" ? gardnerAt(i) : NaN;
      if (nearMudline === "gardnerFromSonic" && Number.isFinite(g)) {
        source[i] = OverburdenSource.nearMudlineGardner;
        rho[i] = g;
      } else {
        source[i] = PENDING; // power law above the anchor, interpolated below it
      }
      continue;
    }
    const d = densityGcc[i];
    const bad = badHoleFlag !== undefined && badHoleFlag[i] !== 0;
    if (Number.isFinite(d) && d > 0 && !bad) {
      source[i] = OverburdenSource.densityLog;
      rho[i] = d;
      continue;
    }
    const g = gardnerAt(i);
    if (Number.isFinite(g)) {
      source[i] = bad ? OverburdenSource.badHoleGardner : OverburdenSource.missingGardner;
      rho[i] = g;
    } else {
      source[i] = PENDING;
    }
  }
  if (nearMudline === "gardnerFromSonic" && iTop > iSed) {
    let any = false;
    for (let i = iSed; i < iTop; i++) if (source[i] === OverburdenSource.nearMudlineGardner) any = true;
    if (!any) {
      warnings.push({
        code: "W_NO_SONIC_NEAR_MUDLINE",
        message: "Gardner fill was asked for above the density log but sonic is missing there; the power-law average density was used instead.",
        count: iTop - iSed,
      });
    }
  }

  // anchor: first sediment sample with a point density
  let iAnchor = n;
  for (let i = iSed; i < n; i++) {
    if (source[i] !== PENDING) {
      iAnchor = i;
      break;
    }
  }
  // power law from the mudline down to the anchor (exclusive)
  for (let i = iSed; i < iAnchor; i++) {
    const dBml = tvdFt[i] - mudlineTvdFt;
    source[i] = OverburdenSource.nearMudlinePowerLaw;
    rho[i] = powerLawPointDensityPpg(dBml) / PPG_PER_GCC;
    svPsi[i] = svMudlinePsi + powerLawAverageDensityPpg(dBml) * dBml * PSI_PER_FT_PER_PPG;
  }
  // interpolate / extend the pending samples below the anchor
  fillPendingDensity({ tvdFt, rhoGcc: rho, source, lastKnownIndex: iAnchor, pending: PENDING });

  // 4. trapezoid integration from the anchor, Neumaier-compensated running sum
  if (iAnchor < n) {
    const d0 = tvdFt[iAnchor] - mudlineTvdFt;
    let sum = svMudlinePsi + (d0 > 0 ? powerLawAverageDensityPpg(d0) * d0 * PSI_PER_FT_PER_PPG : 0);
    let comp = 0;
    svPsi[iAnchor] = sum;
    for (let i = iAnchor + 1; i < n; i++) {
      const term = 0.5 * (rho[i - 1] + rho[i]) * PSI_PER_FT_PER_GCC * (tvdFt[i] - tvdFt[i - 1]);
      const t = sum + term;
      comp += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
      sum = t;
      svPsi[i] = sum + comp;
    }
  }

  let implausible = 0;
  for (let i = iSed; i < n; i++) if (rho[i] < 1.0 || rho[i] > 3.2) implausible++;
  if (implausible > 0) {
    warnings.push({
      code: "W_DENSITY_IMPLAUSIBLE",
      message: "Density outside 1.0–3.2 g/cc was integrated; check units (g/cc) and log quality.",
      count: implausible,
    });
  }

  const gradientPsiPerFt = new Float64Array(n);
  const emwPpg = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    gradientPsiPerFt[i] = tvdFt[i] > 0 ? svPsi[i] / tvdFt[i] : NaN;
    emwPpg[i] = gradientPsiPerFt[i] / PSI_PER_FT_PER_PPG;
  }

  const ranges: OverburdenSourceRange[] = [];
  for (let i = 0; i < n; ) {
    let j = i;
    while (j + 1 < n && source[j + 1] === source[i]) j++;
    ranges.push({
      source: OVERBURDEN_SOURCE_NAMES[source[i]],
      fromIndex: i,
      toIndex: j,
      fromTvdFt: tvdFt[i],
      toTvdFt: tvdFt[j],
      count: j - i + 1,
    });
    i = j + 1;
  }

  return { svPsi, gradientPsiPerFt, emwPpg, densityUsedGcc: rho, source, ranges, warnings };
}

/**
 * Fill density samples still marked `pending` below a known sample: linear interpolation in
 * depth between the known samples on either side (source `interpolated`), or the last known
 * value held below the last one (source `extendedLastValue`). Works in place on `rhoGcc`
 * and `source`, from `lastKnownIndex + 1` to the end. Shared by {@link integrateOverburden}
 * and the while-drilling update, which continues the same fill from its restart sample.
 *
 * @param args.tvdFt TVD below RT, ft, non-decreasing
 * @param args.rhoGcc density per sample, g/cc (written where pending)
 * @param args.source source code per sample (written where pending)
 * @param args.lastKnownIndex index of a sample with a known density; filling starts below it
 * @param args.pending the source code that marks a pending sample
 */
export function fillPendingDensity(args: {
  tvdFt: ArrayLike<number>;
  rhoGcc: Float64Array;
  source: Uint8Array;
  lastKnownIndex: number;
  pending: number;
}): void {
  const { tvdFt, rhoGcc: rho, source, pending } = args;
  const n = rho.length;
  let prev = args.lastKnownIndex;
  for (let i = prev + 1; i < n; i++) {
    if (source[i] !== pending) {
      prev = i;
      continue;
    }
    let next = i + 1;
    while (next < n && source[next] === pending) next++;
    for (let k = i; k < next; k++) {
      if (next < n && tvdFt[next] > tvdFt[prev]) {
        const t = (tvdFt[k] - tvdFt[prev]) / (tvdFt[next] - tvdFt[prev]);
        rho[k] = rho[prev] + t * (rho[next] - rho[prev]);
        source[k] = OverburdenSource.interpolated;
      } else if (next < n) {
        rho[k] = rho[prev];
        source[k] = OverburdenSource.interpolated;
      } else {
        rho[k] = rho[prev];
        source[k] = OverburdenSource.extendedLastValue;
      }
    }
    i = next - 1;
  }
}
