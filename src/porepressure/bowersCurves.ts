/**
 * Bowers' velocity–effective-stress relations: the virgin (loading) curve, the unloading
 * curve, and their inverses.
 *
 * Reference: Bowers, G.L., 1995, "Pore pressure estimation from velocity data: accounting
 * for overpressure mechanisms besides undercompaction", SPE Drilling & Completion 10(2):
 * 89–95, SPE-27488 (equation numbers and parameter ranges from memory): virgin curve
 * V = V0 + A·σ^B (eq. 1 in the paper's numbering as remembered), unloading curve
 * V = V0 + A[σmax(σ/σmax)^(1/U)]^B with σmax = ((Vmax − V0)/A)^(1/B) (eqs. 2–3).
 * Units as in the paper: V in ft/s, σ in psi, V0 = 5000 ft/s; A and B are calibration
 * constants (Gulf of Mexico calibrations quoted around A 10–20, B 0.7–0.85, U 3–8).
 * U = 1 makes the unloading curve identical to the virgin curve.
 *
 * Imports: ../errors.js only.
 */
import { ShalepointError } from "../errors.js";

/** Bowers (1995) default velocity at zero effective stress (mudline), ft/s. */
export const BOWERS_DEFAULT_V0_FT_PER_S = 5000;

/** Virgin-curve constants of Bowers (1995). */
export interface BowersParameters {
  /** A, (ft/s)/psi^B, > 0; typical 10–20. */
  a: number;
  /** B, dimensionless, in (0, 1]; typical 0.7–0.85. */
  b: number;
  /** V0, ft/s, > 0; default 5000. */
  v0FtPerS?: number;
}

function bad(param: string, value: number, allowed: string, unit?: string): never {
  throw new ShalepointError("E_RANGE", `Bowers ${param} is out of range`, {
    param,
    value,
    unit,
    allowed,
    hint: "Calibrate A, B (and U) with calibrateBowers or fitBowersCrossplot.",
  });
}

/**
 * Check Bowers parameters: A > 0, B in (0, 1], V0 > 0, and U ≥ 1 when given.
 * @returns V0 in ft/s (the default 5000 when not given)
 * @throws ShalepointError E_RANGE naming the parameter
 * @example requireBowersParameters({ a: 10.11, b: 0.777 }) // 5000
 */
export function requireBowersParameters(p: BowersParameters, u?: number): number {
  if (!(Number.isFinite(p.a) && p.a > 0)) bad("a", p.a, "> 0 (typical 10–20)");
  if (!(Number.isFinite(p.b) && p.b > 0 && p.b <= 1)) bad("b", p.b, "(0, 1] (typical 0.7–0.85)");
  const v0 = p.v0FtPerS ?? BOWERS_DEFAULT_V0_FT_PER_S;
  if (!(Number.isFinite(v0) && v0 > 0)) bad("v0FtPerS", v0, "> 0 (typical 5000)", "ft/s");
  if (u !== undefined && !(Number.isFinite(u) && u >= 1)) bad("u", u, "≥ 1 (typical 3–8; 1 = no unloading)");
  return v0;
}

// ---- raw scalar forms (no checks), shared by the array methods in this folder ----------

/** V = V0 + A σ^B; σ ≤ 0 → V0 at 0, NaN below. */
export function virginVelocityRaw(sigmaPsi: number, a: number, b: number, v0: number): number {
  return sigmaPsi >= 0 ? v0 + a * Math.pow(sigmaPsi, b) : NaN;
}
/**
 * σ = ((V − V0)/A)^(1/B); V < V0 → NaN. The power is taken as exp(ln(x)·(1/B)) (x ≥ 0),
 * several times faster than Math.pow per sample and equal to it within a few units in the
 * last place (relative ≲ (1 + |ln x|/B)·2.2e-16).
 */
export function virginStressRaw(vFtPerS: number, a: number, b: number, v0: number): number {
  return vFtPerS >= v0 ? Math.exp(Math.log((vFtPerS - v0) / a) * (1 / b)) : NaN;
}
/** V = V0 + A[σmax(σ/σmax)^(1/U)]^B. */
export function unloadingVelocityRaw(sigmaPsi: number, sigmaMaxPsi: number, a: number, b: number, u: number, v0: number): number {
  if (!(sigmaPsi >= 0)) return NaN;
  return v0 + a * Math.pow(sigmaMaxPsi * Math.pow(sigmaPsi / sigmaMaxPsi, 1 / u), b);
}
/** σ = σmax [((V − V0)/A)^(1/B) / σmax]^U; V < V0 → NaN. */
export function unloadingStressRaw(vFtPerS: number, sigmaMaxPsi: number, a: number, b: number, u: number, v0: number): number {
  if (!(vFtPerS >= v0)) return NaN;
  // Powers as exp(ln·exponent), as in virginStressRaw.
  return sigmaMaxPsi * Math.exp(Math.log(Math.exp(Math.log((vFtPerS - v0) / a) * (1 / b)) / sigmaMaxPsi) * u);
}

// ---- checked, documented scalar API -----------------------------------------------------

/**
 * Bowers virgin (loading) velocity from effective stress.
 *
 * V = V0 + A·σ^B.
 *
 * @param input.effectiveStressPsi vertical effective stress σ = Sv − Pp, psi (≥ 0; e.g. 3000)
 * @param input.a A (> 0, e.g. 10.11); input.b B ((0, 1], e.g. 0.777); input.v0FtPerS V0 (default 5000 ft/s)
 * @returns velocity, ft/s (NaN for σ < 0 or NaN)
 * @throws ShalepointError E_RANGE for A ≤ 0, B outside (0, 1], V0 ≤ 0
 * @example bowersVirginVelocity({ effectiveStressPsi: 3000, a: 10.11, b: 0.777 }) // 10087 ft/s
 * @see Bowers 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488, virgin curve (eq. 1, from memory)
 */
export function bowersVirginVelocity(input: BowersParameters & { effectiveStressPsi: number }): number {
  const v0 = requireBowersParameters(input);
  return virginVelocityRaw(input.effectiveStressPsi, input.a, input.b, v0);
}

/**
 * Bowers virgin-curve effective stress from velocity (inverse of the virgin curve).
 *
 * σ = ((V − V0)/A)^(1/B).
 *
 * @param input.velocityFtPerS interval velocity, ft/s (≥ V0; e.g. 8000)
 * @param input.a A; input.b B; input.v0FtPerS V0 (default 5000)
 * @returns effective stress, psi (NaN when V < V0 or NaN)
 * @throws ShalepointError E_RANGE for bad A, B, V0
 * @example bowersVirginEffectiveStress({ velocityFtPerS: 8000, a: 10.11, b: 0.777 }) // 1520 psi
 * @see Bowers 1995, SPE-27488, virgin curve inverted (from memory)
 */
export function bowersVirginEffectiveStress(input: BowersParameters & { velocityFtPerS: number }): number {
  const v0 = requireBowersParameters(input);
  return virginStressRaw(input.velocityFtPerS, input.a, input.b, v0);
}

/**
 * Bowers maximum past effective stress from the velocity where unloading began.
 *
 * σmax = ((Vmax − V0)/A)^(1/B).
 *
 * @param input.vmaxFtPerS velocity at the onset of unloading, ft/s (> V0; e.g. 9000)
 * @param input.a A; input.b B; input.v0FtPerS V0 (default 5000)
 * @returns σmax, psi
 * @throws ShalepointError E_RANGE for bad A, B, V0 or Vmax ≤ V0
 * @example bowersSigmaMax({ vmaxFtPerS: 9000, a: 10.11, b: 0.777 }) // 2202 psi
 * @see Bowers 1995, SPE-27488, σmax relation (eq. 3, from memory)
 */
export function bowersSigmaMax(input: BowersParameters & { vmaxFtPerS: number }): number {
  const v0 = requireBowersParameters(input);
  if (!(Number.isFinite(input.vmaxFtPerS) && input.vmaxFtPerS > v0)) {
    bad("vmaxFtPerS", input.vmaxFtPerS, `> V0 (${v0} ft/s)`, "ft/s");
  }
  return virginStressRaw(input.vmaxFtPerS, input.a, input.b, v0);
}

function requireSigmaMax(sigmaMaxPsi: number): void {
  if (!(Number.isFinite(sigmaMaxPsi) && sigmaMaxPsi > 0)) bad("sigmaMaxPsi", sigmaMaxPsi, "> 0", "psi");
}

/**
 * Bowers unloading velocity from effective stress.
 *
 * V = V0 + A[σmax(σ/σmax)^(1/U)]^B (valid for σ ≤ σmax; U = 1 returns the virgin curve).
 *
 * @param input.effectiveStressPsi σ, psi (0 ≤ σ ≤ σmax; e.g. 2000)
 * @param input.sigmaMaxPsi σmax, psi (> 0; e.g. 2202, see bowersSigmaMax)
 * @param input.u unloading exponent U (≥ 1; typical 3–8)
 * @param input.a A; input.b B; input.v0FtPerS V0 (default 5000)
 * @returns velocity, ft/s
 * @throws ShalepointError E_RANGE for bad A, B, V0, U < 1 or σmax ≤ 0
 * @example bowersUnloadingVelocity({ effectiveStressPsi: 2000, sigmaMaxPsi: 2202.4, u: 3.13, a: 10.11, b: 0.777 }) // 8906 ft/s
 * @see Bowers 1995, SPE-27488, unloading curve (eq. 2, from memory)
 */
export function bowersUnloadingVelocity(
  input: BowersParameters & { effectiveStressPsi: number; sigmaMaxPsi: number; u: number },
): number {
  const v0 = requireBowersParameters(input, input.u);
  requireSigmaMax(input.sigmaMaxPsi);
  return unloadingVelocityRaw(input.effectiveStressPsi, input.sigmaMaxPsi, input.a, input.b, input.u, v0);
}

/**
 * Bowers unloading-curve effective stress from velocity (inverse of the unloading curve).
 *
 * σ = σmax·[((V − V0)/A)^(1/B) / σmax]^U.
 *
 * @param input.velocityFtPerS velocity, ft/s (V0 ≤ V ≤ Vmax; e.g. 8906)
 * @param input.sigmaMaxPsi σmax, psi (> 0); input.u U (≥ 1)
 * @param input.a A; input.b B; input.v0FtPerS V0 (default 5000)
 * @returns effective stress, psi (NaN when V < V0)
 * @throws ShalepointError E_RANGE for bad parameters
 * @example bowersUnloadingEffectiveStress({ velocityFtPerS: 8906, sigmaMaxPsi: 2202.4, u: 3.13, a: 10.11, b: 0.777 }) // ≈ 2000 psi
 * @see Bowers 1995, SPE-27488, unloading curve inverted (from memory)
 */
export function bowersUnloadingEffectiveStress(
  input: BowersParameters & { velocityFtPerS: number; sigmaMaxPsi: number; u: number },
): number {
  const v0 = requireBowersParameters(input, input.u);
  requireSigmaMax(input.sigmaMaxPsi);
  return unloadingStressRaw(input.velocityFtPerS, input.sigmaMaxPsi, input.a, input.b, input.u, v0);
}
