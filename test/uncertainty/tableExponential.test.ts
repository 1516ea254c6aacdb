/**
 * Table-driven exponential (Tang 1989, ACM TOMS 15(2):144–157): checked against Math.exp
 * (the engine's fdlibm exponential, < 1 ulp) on a million seeded points, and against
 * published values of e, 1/e and e^10.
 */
import { describe, expect, it } from "vitest";
import { createXoshiro128Random, expByTable, expByTableInto } from "../../src/uncertainty/index.js";

/** Relative difference |a − b| / |b|. */
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("expByTable", () => {
  it("stays within 5e-16 (relative) of Math.exp on 10^6 seeded points in [−20, 20]", () => {
    // Source: Math.exp (library, fdlibm: error < 1 ulp). Bound: ours ≤ 2.6e-16 (file comment)
    // plus Math.exp's < 1 ulp (≤ 2.22e-16) = 4.8e-16 < 5e-16; a 1 % change in any polynomial
    // coefficient moves results near |r| = 1.35e-3 by ≥ 1.4e-15 and fails here.
    const rnd = createXoshiro128Random(2024);
    let worst = 0;
    let worstNarrow = 0;
    for (let i = 0; i < 1_000_000; i++) {
      const x = -20 + 40 * rnd.nextFloat();
      worst = Math.max(worst, rel(expByTable(x), Math.exp(x)));
      // The Monte Carlo range: n·ln(Δtn/Δt) mostly within ±3.
      const y = -3 + 6 * rnd.nextFloat();
      worstNarrow = Math.max(worstNarrow, rel(expByTable(y), Math.exp(y)));
    }
    expect(worst).toBeLessThan(5e-16);
    expect(worstNarrow).toBeLessThan(5e-16);
  });

  it("gives e, 1/e and e^10 to the nearest double or next to it", () => {
    // Source: published values (common practice, no source): e = 2.718281828459045235…,
    // 1/e = 0.367879441171442321…, e^10 = 22026.465794806716516…; tolerance 2^-52 relative.
    expect(rel(expByTable(1), 2.718281828459045235)).toBeLessThanOrEqual(2 ** -52);
    expect(rel(expByTable(-1), 0.367879441171442321)).toBeLessThanOrEqual(2 ** -52);
    expect(rel(expByTable(10), 22026.465794806716516)).toBeLessThanOrEqual(2 ** -52);
    expect(expByTable(0)).toBe(1);
  });

  it("falls back to Math.exp outside (−700, 700) and for NaN and infinities", () => {
    // Source: Math.exp (library) — the same value is returned there.
    for (const x of [700, -700, 709.7, -745, 800, -800, Infinity, -Infinity]) expect(expByTable(x)).toBe(Math.exp(x));
    expect(expByTable(NaN)).toBeNaN();
    // Just inside the table range the result is still within the bound.
    expect(rel(expByTable(699.9), Math.exp(699.9))).toBeLessThan(5e-16);
    expect(rel(expByTable(-699.9), Math.exp(-699.9))).toBeLessThan(5e-16);
  });
});

describe("expByTableInto", () => {
  it("equals expByTable value for value, out-of-range and NaN included, and leaves x unchanged", () => {
    // Source: expByTable (same method, checked above against Math.exp).
    const rnd = createXoshiro128Random(9);
    const x = Float64Array.from({ length: 5000 }, () => -30 + 60 * rnd.nextFloat());
    x[17] = 900;
    x[18] = -900;
    x[19] = NaN;
    x[20] = Infinity;
    const copy = Float64Array.from(x);
    const out = new Float64Array(5001).fill(-1);
    expByTableInto({ x, out, count: 5000 });
    for (let i = 0; i < 5000; i++) expect(Object.is(out[i], expByTable(x[i]))).toBe(true);
    expect(out[5000]).toBe(-1); // nothing past count
    expect(x).toEqual(copy);
  });

  it("matches the doc example: e^0 = 1, e^1 = e", () => {
    // Source: published value of e (common practice, no source).
    const out = new Float64Array(2);
    expByTableInto({ x: Float64Array.of(0, 1), out, count: 2 });
    expect(out[0]).toBe(1);
    expect(rel(out[1], 2.718281828459045235)).toBeLessThanOrEqual(2 ** -52);
  });
});
