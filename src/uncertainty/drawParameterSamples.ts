/**
 * Random draws of one uncertain input from a named distribution: fixed, normal, truncated
 * normal, uniform, triangular or lognormal.
 *
 * References:
 * - Normal deviates: Marsaglia, G. & Bray, T.A., 1964, "A convenient method for generating
 *   normal variables", SIAM Review 6(3):260–264 (the polar method: u, v uniform in (−1, 1),
 *   s = u² + v² < 1, z = u·√(−2 ln s / s) and v·√(−2 ln s / s)).
 * - Truncated normal: Robert, C.P., 1995, "Simulation of truncated normal variables",
 *   Statistics and Computing 5(2):121–125, doi:10.1007/BF00143942 — one-sided tail by an
 *   exponential proposal with rate λ* = (α + √(α² + 4))/2, accepted with
 *   exp(−(z − λ*)²/2) (his Proposition 2.3); narrow two-sided interval by a uniform
 *   proposal accepted with exp((m² − z²)/2), m the point of the interval nearest 0 (his
 *   section 2.2); otherwise plain rejection from the normal.
 * - Triangular: inverse of the piecewise-quadratic CDF (e.g. Evans, Hastings & Peacock,
 *   Statistical Distributions, 3rd ed., Wiley 2000, ch. 40).
 * - Lognormal: X = exp(ln(median) + σ_ln·Z).
 *
 * Imports: ../errors.js and the sibling xoshiro128Random.ts (type only).
 */
import { ShalepointError } from "../errors.js";
import type { UniformRandomSource } from "./xoshiro128Random.js";

/** An uncertain input's distribution. Units are those of the parameter it describes. */
export type ParameterDistribution =
  | { kind: "fixed"; value: number }
  | { kind: "normal"; mean: number; std: number }
  | { kind: "truncatedNormal"; mean: number; std: number; min: number; max: number }
  | { kind: "uniform"; min: number; max: number }
  | { kind: "triangular"; min: number; mode: number; max: number }
  | { kind: "lognormal"; median: number; logStd: number };

function badDistribution(param: string, message: string, value: unknown, allowed: string, hint?: string): never {
  throw new ShalepointError("E_RANGE", `${param}: ${message}`, { param, value, allowed, hint });
}

/**
 * Check a distribution's own parameters (not the physical range of the quantity).
 *
 * @param distribution the distribution
 * @param param name of the input, for the error (e.g. `poissonRatio`)
 * @returns the interval that contains every draw, `{ min, max }` (±Infinity when unbounded)
 * @throws ShalepointError E_RANGE for a negative or non-finite std, min ≥ max (except a
 *   truncated normal with std 0), a mode outside [min, max], a median ≤ 0, an unknown kind
 * @example checkParameterDistribution({ kind: "uniform", min: 0.3, max: 0.4 }, "poissonRatio") // { min: 0.3, max: 0.4 }
 */
export function checkParameterDistribution(distribution: ParameterDistribution, param: string): { min: number; max: number } {
  const d = distribution;
  const finite = (x: number): boolean => Number.isFinite(x);
  const needStd = (std: number): void => {
    if (!(finite(std) && std >= 0)) {
      badDistribution(`${param}.std`, "standard deviation must be finite and ≥ 0", std, ">= 0", "A spread cannot be negative; give 0 for a fixed value.");
    }
  };
  switch (d.kind) {
    case "fixed":
      if (!finite(d.value)) badDistribution(`${param}.value`, "value must be finite", d.value, "finite");
      return { min: d.value, max: d.value };
    case "normal":
      if (!finite(d.mean)) badDistribution(`${param}.mean`, "mean must be finite", d.mean, "finite");
      needStd(d.std);
      return d.std === 0 ? { min: d.mean, max: d.mean } : { min: -Infinity, max: Infinity };
    case "truncatedNormal":
      if (!finite(d.mean)) badDistribution(`${param}.mean`, "mean must be finite", d.mean, "finite");
      needStd(d.std);
      if (!(finite(d.min) && finite(d.max) && d.min < d.max)) {
        badDistribution(`${param}.min`, "truncation bounds must be finite with min < max", { min: d.min, max: d.max }, "min < max");
      }
      if (d.std === 0 && !(d.mean >= d.min && d.mean <= d.max)) {
        badDistribution(`${param}.mean`, "with std 0 the mean must lie inside [min, max]", d.mean, `[${d.min}, ${d.max}]`);
      }
      return { min: d.min, max: d.max };
    case "uniform":
      if (!(finite(d.min) && finite(d.max) && d.min < d.max)) {
        badDistribution(`${param}.min`, "bounds must be finite with min < max", { min: d.min, max: d.max }, "min < max");
      }
      return { min: d.min, max: d.max };
    case "triangular":
      if (!(finite(d.min) && finite(d.max) && d.min < d.max)) {
        badDistribution(`${param}.min`, "bounds must be finite with min < max", { min: d.min, max: d.max }, "min < max");
      }
      if (!(d.mode >= d.min && d.mode <= d.max)) badDistribution(`${param}.mode`, "mode must lie in [min, max]", d.mode, `[${d.min}, ${d.max}]`);
      return { min: d.min, max: d.max };
    case "lognormal":
      if (!(finite(d.median) && d.median > 0)) badDistribution(`${param}.median`, "median must be finite and > 0", d.median, "> 0");
      if (!(finite(d.logStd) && d.logStd >= 0)) {
        badDistribution(`${param}.logStd`, "standard deviation of ln must be finite and ≥ 0", d.logStd, ">= 0", "A spread cannot be negative.");
      }
      return d.logStd === 0 ? { min: d.median, max: d.median } : { min: 0, max: Infinity };
    default:
      return badDistribution(`${param}.kind`, "unknown distribution kind", (d as { kind: unknown }).kind,
        "fixed | normal | truncatedNormal | uniform | triangular | lognormal");
  }
}

/**
 * Standard normal deviates by the Marsaglia–Bray polar method, drawn in pairs.
 *
 * @param random uniform source (see createXoshiro128Random)
 * @param count number of deviates, ≥ 0
 * @returns new Float64Array of N(0, 1) deviates
 * @example drawStandardNormals(createXoshiro128Random(7), 4) // four N(0,1) deviates, same on every run
 * @see Marsaglia & Bray 1964, SIAM Review 6(3):260–264
 */
export function drawStandardNormals(random: UniformRandomSource, count: number): Float64Array {
  const out = new Float64Array(count);
  let i = 0;
  while (i < count) {
    let u: number;
    let v: number;
    let s: number;
    do {
      u = 2 * random.nextFloat() - 1;
      v = 2 * random.nextFloat() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const m = Math.sqrt((-2 * Math.log(s)) / s);
    out[i++] = u * m;
    if (i < count) out[i++] = v * m;
  }
  return out;
}

/** One standard normal deviate (polar method, second of the pair discarded). */
function oneStandardNormal(random: UniformRandomSource): number {
  for (;;) {
    const u = 2 * random.nextFloat() - 1;
    const v = 2 * random.nextFloat() - 1;
    const s = u * u + v * v;
    if (s < 1 && s > 0) return u * Math.sqrt((-2 * Math.log(s)) / s);
  }
}

/** Standard normal truncated to [alpha, beta] (Robert 1995). */
function truncatedStandardNormal(random: UniformRandomSource, alpha: number, beta: number): number {
  const MAX_TRIES = 1_000_000;
  if (alpha > 0 && beta - alpha > 2.5) {
    // One-sided right tail, exponential proposal (Robert 1995, Prop. 2.3); reject beyond beta.
    const lam = (alpha + Math.sqrt(alpha * alpha + 4)) / 2;
    for (let k = 0; k < MAX_TRIES; k++) {
      const z = alpha - Math.log(1 - random.nextFloat()) / lam;
      const accept = random.nextFloat() <= Math.exp(-((z - lam) ** 2) / 2);
      if (accept && z <= beta) return z;
    }
  } else if (beta < 0 && beta - alpha > 2.5) {
    return -truncatedStandardNormal(random, -beta, -alpha);
  } else if (beta - alpha <= 2.5) {
    // Narrow interval: uniform proposal (Robert 1995, section 2.2).
    const m = alpha > 0 ? alpha : beta < 0 ? beta : 0;
    for (let k = 0; k < MAX_TRIES; k++) {
      const z = alpha + (beta - alpha) * random.nextFloat();
      if (random.nextFloat() <= Math.exp((m * m - z * z) / 2)) return z;
    }
  } else {
    // Wide interval containing 0: at least half the normal mass lies inside, plain rejection.
    for (let k = 0; k < MAX_TRIES; k++) {
      const z = oneStandardNormal(random);
      if (z >= alpha && z <= beta) return z;
    }
  }
  throw new ShalepointError("E_MC_SAMPLER", "truncated normal sampler did not converge", {
    param: "truncatedNormal", value: { alpha, beta },
    hint: "The truncation interval holds almost no probability; widen it or use a uniform distribution.",
  });
}

/**
 * Draw `count` values of one uncertain input.
 *
 * fixed: the value; normal: mean + std·Z; truncatedNormal: normal conditioned on [min, max]
 * (Robert 1995); uniform: min + (max − min)·U; triangular: inverse CDF
 * (U < Fc: min + √(U(max − min)(mode − min)), else max − √((1 − U)(max − min)(max − mode)),
 * Fc = (mode − min)/(max − min)); lognormal: median·exp(logStd·Z).
 * The sequence depends only on the source's state, so a seeded source reproduces it.
 *
 * @param input.distribution see {@link ParameterDistribution}
 * @param input.count number of draws (≥ 0, integer), e.g. 1000
 * @param input.random a seeded source (createXoshiro128Random)
 * @param input.param name of the input for errors, e.g. `eatonExponent` (default `value`)
 * @returns new Float64Array of draws, in the parameter's own unit
 * @throws ShalepointError as {@link checkParameterDistribution}; E_RANGE for a bad count
 * @example drawParameterSamples({ distribution: { kind: "uniform", min: 0.3, max: 0.4 }, count: 3, random: createXoshiro128Random(1) })
 * // three values in [0.3, 0.4), identical for seed 1 on every run
 * @see Marsaglia & Bray 1964, SIAM Review 6(3); Robert 1995, Statistics and Computing 5(2):121–125
 */
export function drawParameterSamples(input: {
  distribution: ParameterDistribution;
  count: number;
  random: UniformRandomSource;
  param?: string;
}): Float64Array {
  const { distribution: d, count, random } = input;
  const param = input.param ?? "value";
  if (!(Number.isSafeInteger(count) && count >= 0)) {
    badDistribution("count", "count must be a non-negative integer", count, ">= 0");
  }
  checkParameterDistribution(d, param);
  const out = new Float64Array(count);
  switch (d.kind) {
    case "fixed":
      out.fill(d.value);
      break;
    case "normal": {
      const z = drawStandardNormals(random, count);
      for (let i = 0; i < count; i++) out[i] = d.mean + d.std * z[i];
      break;
    }
    case "truncatedNormal": {
      if (d.std === 0) {
        out.fill(d.mean);
        break;
      }
      const alpha = (d.min - d.mean) / d.std;
      const beta = (d.max - d.mean) / d.std;
      for (let i = 0; i < count; i++) {
        const x = d.mean + d.std * truncatedStandardNormal(random, alpha, beta);
        out[i] = Math.min(d.max, Math.max(d.min, x)); // guard the last rounding bit
      }
      break;
    }
    case "uniform":
      for (let i = 0; i < count; i++) out[i] = d.min + (d.max - d.min) * random.nextFloat();
      break;
    case "triangular": {
      const w = d.max - d.min;
      const fc = (d.mode - d.min) / w;
      for (let i = 0; i < count; i++) {
        const u = random.nextFloat();
        out[i] = u < fc ? d.min + Math.sqrt(u * w * (d.mode - d.min)) : d.max - Math.sqrt((1 - u) * w * (d.max - d.mode));
      }
      break;
    }
    case "lognormal": {
      const z = drawStandardNormals(random, count);
      for (let i = 0; i < count; i++) out[i] = d.median * Math.exp(d.logStd * z[i]);
      break;
    }
  }
  return out;
}
