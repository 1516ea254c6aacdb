/**
 * Seeded pseudo-random numbers for the demo generator: mulberry32 for uniforms and the
 * Box–Muller transform for Gaussian deviates. Never uses Math.random, so the same seed
 * always gives the same sequence on every platform (integer arithmetic via Math.imul).
 */

/** A seeded random source. Each call advances the one internal state. */
export interface SeededRandom {
  /** Uniform deviate in [0, 1). */
  uniform(): number;
  /** Gaussian deviate with the given mean and standard deviation. */
  gaussian(mean: number, std: number): number;
  /** Integer uniformly in [lo, hi] (both inclusive). */
  integer(lo: number, hi: number): number;
}

/**
 * Seeded random source (mulberry32 uniforms, Box–Muller Gaussians).
 *
 * mulberry32: a 32-bit state advanced by the constant 0x6D2B79F5 and mixed by two
 * xor-shift-multiply rounds (public-domain generator usually credited to T. Ettinger, 2017 — from memory; not a
 * cryptographic generator). Box–Muller: Box, G. E. P. & Muller, M. E.
 * (1958), "A note on the generation of random normal deviates", *Annals of Mathematical
 * Statistics* 29(2):610–611, eq. (1): z = √(−2 ln u1)·cos(2π u2).
 *
 * @param seed any integer (taken modulo 2³²); typical 20261201
 * @returns a {@link SeededRandom}
 * @example createSeededRandom(1).uniform() // 0.6270739405881613 (same on every run)
 */
export function createSeededRandom(seed: number): SeededRandom {
  let state = seed >>> 0;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    uniform,
    gaussian(mean: number, std: number): number {
      // Box & Muller 1958, eq. (1); u1 kept away from 0 so the log is finite.
      const u1 = 1 - uniform();
      const u2 = uniform();
      return mean + std * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
    },
    integer(lo: number, hi: number): number {
      return lo + Math.floor(uniform() * (hi - lo + 1));
    },
  };
}
