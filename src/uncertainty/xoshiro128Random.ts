/**
 * Seeded uniform random numbers for Monte Carlo runs: the xoshiro128** generator, seeded
 * through SplitMix64.
 *
 * References:
 * - Blackman, D. & Vigna, S., 2021, "Scrambled linear pseudorandom number generators",
 *   ACM Transactions on Mathematical Software 47(4), article 36, doi:10.1145/3460772
 *   (xoshiro128**: 128-bit state, scrambler rotl(s1·5, 7)·9, state update with shift 9
 *   and rotation 11).
 * - Steele, G.L., Lea, D. & Flood, C.H., 2014, "Fast splittable pseudorandom number
 *   generators", OOPSLA 2014, ACM SIGPLAN Notices 49(10):453–472, doi:10.1145/2714064.2660195
 *   (SplitMix64 mixing, used here only to spread the seed over the 128-bit state, as the
 *   xoshiro authors recommend).
 * - Matsumoto, M. & Nishimura, T., 1998, "Mersenne twister", ACM TOMS 8(1):3–30
 *   (53-bit doubles from two 32-bit outputs, as in their genrand_res53).
 *
 * Integer arithmetic uses Math.imul and unsigned shifts, so a seed gives the same sequence
 * on every platform. Not a cryptographic generator. This file has no imports but errors.
 */
import { ShalepointError } from "../errors.js";

/** A seeded uniform random source; each call advances its one internal state. */
export interface UniformRandomSource {
  /** Next 32-bit unsigned integer, in [0, 2³²). */
  nextUint32(): number;
  /** Next double uniformly in [0, 1), 53 random bits. */
  nextFloat(): number;
}

const MASK64 = (1n << 64n) - 1n;

/** SplitMix64 step: returns [next state, output] as 64-bit BigInts. */
function splitMix64(state: bigint): { state: bigint; out: bigint } {
  const s = (state + 0x9e3779b97f4a7c15n) & MASK64;
  let z = s;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return { state: s, out: z ^ (z >> 31n) };
}

/**
 * xoshiro128** uniform random source from an integer seed.
 *
 * State: four 32-bit words from two SplitMix64 outputs of the seed (low word first).
 * Step: result = rotl(s1·5, 7)·9; t = s1 << 9; s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3;
 * s2 ^= t; s3 = rotl(s3, 11). Doubles: (a >>> 5)·2²⁶ + (b >>> 6), divided by 2⁵³.
 *
 * @param seed non-negative safe integer (0 ≤ seed ≤ 2⁵³ − 1); typical 20261201
 * @returns a {@link UniformRandomSource}
 * @throws ShalepointError E_RANGE when the seed is not a non-negative safe integer
 * @example createXoshiro128Random(1).nextFloat() // a double in [0, 1), identical on every run
 * @see Blackman & Vigna 2021, ACM TOMS 47(4):36, doi:10.1145/3460772
 */
export function createXoshiro128Random(seed: number): UniformRandomSource {
  if (!(Number.isSafeInteger(seed) && seed >= 0)) {
    throw new ShalepointError("E_RANGE", "the random seed must be a non-negative integer", {
      param: "seed",
      value: seed,
      allowed: "integer in [0, 2^53 − 1]",
      hint: "Give a whole number such as 20261201; the same seed reproduces the same run.",
    });
  }
  let st = BigInt(seed);
  const r1 = splitMix64(st);
  st = r1.state;
  const r2 = splitMix64(st);
  let s0 = Number(r1.out & 0xffffffffn) >>> 0;
  let s1 = Number(r1.out >> 32n) >>> 0;
  let s2 = Number(r2.out & 0xffffffffn) >>> 0;
  let s3 = Number(r2.out >> 32n) >>> 0;
  if ((s0 | s1 | s2 | s3) === 0) s0 = 1; // the all-zero state is a fixed point (never reached from SplitMix64 in practice)

  const nextUint32 = (): number => {
    const m = Math.imul(s1, 5);
    const rot = (m << 7) | (m >>> 25);
    const result = Math.imul(rot, 9) >>> 0;
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= t;
    s3 = (s3 << 11) | (s3 >>> 21);
    return result;
  };
  const nextFloat = (): number => {
    const a = nextUint32() >>> 5;
    const b = nextUint32() >>> 6;
    return (a * 67108864 + b) / 9007199254740992;
  };
  return { nextUint32, nextFloat };
}
