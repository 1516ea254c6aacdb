/**
 * Reservoir fluid from a measured pressure gradient.
 *
 * Pure; imports only `errors` and `units`.
 */
import { ShalepointError } from "../errors.js";
import { PSI_PER_FT_PER_GCC } from "../units/index.js";

/** Fluid a pressure gradient points to. */
export type GradientFluid = "gas" | "oil" | "water" | "undetermined";

/** Gradient ranges, psi/ft (inclusive). */
export interface FluidGradientRanges {
  gas: readonly [number, number];
  oil: readonly [number, number];
  water: readonly [number, number];
}

/**
 * Default gradient ranges, psi/ft (common practice, no source): gas 0.05–0.15,
 * oil 0.30–0.38, water (fresh to saline brine) 0.433–0.47.
 */
export const DEFAULT_FLUID_GRADIENT_RANGES: FluidGradientRanges = Object.freeze({
  gas: Object.freeze([0.05, 0.15] as const),
  oil: Object.freeze([0.3, 0.38] as const),
  water: Object.freeze([0.433, 0.47] as const),
});

/** Arguments of {@link identifyFluidFromGradient}. */
export interface IdentifyFluidFromGradientInput {
  /** Fitted pressure gradient, psi/ft. Typical 0.1 (gas) to 0.465 (brine). */
  gradientPsiPerFt: number;
  /**
   * Standard error of the gradient, psi/ft, ≥ 0 (default 0). A range matches when it
   * overlaps gradient ± 2 × standard error (about 95 % for a normal error).
   */
  standardErrorPsiPerFt?: number;
  /** Ranges to use; default {@link DEFAULT_FLUID_GRADIENT_RANGES}. */
  ranges?: FluidGradientRanges;
}

/** Result of {@link identifyFluidFromGradient}. */
export interface IdentifyFluidFromGradientResult {
  fluid: GradientFluid;
  /** All fluids whose range overlaps gradient ± 2·SE (more than one = ambiguous). */
  candidates: GradientFluid[];
  /** Equivalent fluid density, g/cc (gradient / 0.43353). */
  densityGcc: number;
  evidence: string;
}

/**
 * Fluid identification from pressure gradient.
 *
 * Hydrostatic gradient of a fluid column is ρ·g, so gradient ranges separate gas, oil and
 * water (common practice, no source): fluid = the range that overlaps
 * [g − 2·SE, g + 2·SE]; none or several → `undetermined` (the candidates are listed).
 * Density ρ = g / 0.43353 (psi/ft per g/cc, g = 9.80665 m/s²).
 *
 * @param input see {@link IdentifyFluidFromGradientInput}
 * @returns the fluid, candidate fluids, equivalent density and evidence text
 * @throws ShalepointError E_RANGE when the gradient is not finite or the error is negative
 * @example identifyFluidFromGradient({ gradientPsiPerFt: 0.1 }) // → fluid "gas", densityGcc 0.2307
 */
export function identifyFluidFromGradient(input: IdentifyFluidFromGradientInput): IdentifyFluidFromGradientResult {
  const g = input.gradientPsiPerFt;
  const se = input.standardErrorPsiPerFt ?? 0;
  const ranges = input.ranges ?? DEFAULT_FLUID_GRADIENT_RANGES;
  if (!Number.isFinite(g)) {
    throw new ShalepointError("E_RANGE", "gradientPsiPerFt must be finite", { param: "gradientPsiPerFt", value: g, unit: "psi/ft" });
  }
  if (!(Number.isFinite(se) && se >= 0)) {
    throw new ShalepointError("E_RANGE", "standardErrorPsiPerFt must be ≥ 0", { param: "standardErrorPsiPerFt", value: se, unit: "psi/ft", allowed: "≥ 0" });
  }
  const lo = g - 2 * se;
  const hi = g + 2 * se;
  const candidates: GradientFluid[] = [];
  for (const f of ["gas", "oil", "water"] as const) {
    const [a, b] = ranges[f];
    if (hi >= a && lo <= b) candidates.push(f);
  }
  const fluid: GradientFluid = candidates.length === 1 ? candidates[0] : "undetermined";
  const band = se > 0 ? `${g.toFixed(3)} ± ${(2 * se).toFixed(3)} psi/ft` : `${g.toFixed(3)} psi/ft`;
  const evidence =
    candidates.length === 1
      ? `gradient ${band} within the ${fluid} range ${ranges[fluid as "gas"][0]}–${ranges[fluid as "gas"][1]} psi/ft`
      : candidates.length === 0
        ? `gradient ${band} outside every fluid range`
        : `gradient ${band} overlaps ${candidates.join(" and ")} ranges`;
  return { fluid, candidates, densityGcc: g / PSI_PER_FT_PER_GCC, evidence };
}
