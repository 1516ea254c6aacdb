/**
 * Seeded random numbers for tests, all drawn from the demo generator's source
 * (src/synthetic/seededRandom.ts: mulberry32 uniforms, Box–Muller Gaussians — Box & Muller
 * 1958, Annals of Mathematical Statistics 29(2):610–611, eq. 1), so every random case is
 * reproducible and the generator is written once. Test helper only.
 */
import { createSeededRandom } from "../../src/synthetic/seededRandom.js";

/**
 * Seeded uniform deviates in [0, 1) (mulberry32).
 * @param seed any integer (taken modulo 2³²), e.g. 7
 * @returns a function giving the next uniform deviate
 * @example seededUniform(1)() // 0.6270739405881613
 */
export function seededUniform(seed: number): () => number {
  return createSeededRandom(seed).uniform;
}

/**
 * Seeded standard normal deviates: z = √(−2 ln u1)·cos(2π u2) with u1 = 1 − u (the demo
 * generator's `gaussian(0, 1)`).
 * @param seed any integer, e.g. 42
 * @returns a function giving the next N(0, 1) deviate
 */
export function seededNormal(seed: number): () => number {
  const r = createSeededRandom(seed);
  return () => r.gaussian(0, 1);
}

/**
 * Seeded standard normal deviates with u1 = max(u, 1e−300) instead of 1 − u: the sequence
 * the pore-pressure calibration tests were designed on (same uniforms, a different draw than
 * {@link seededNormal}, so the two are kept apart).
 * @param seed any integer, e.g. 20261201
 * @returns a function giving the next N(0, 1) deviate
 */
export function seededNormalClampedLog(seed: number): () => number {
  const uniform = seededUniform(seed);
  return () => {
    const u1 = Math.max(uniform(), 1e-300);
    const u2 = uniform();
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
  };
}
