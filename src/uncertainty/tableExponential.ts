/**
 * Table-driven exponential e^x in plain TypeScript, for the Monte Carlo hot loops (one
 * exponential per realisation and depth).
 *
 * Method: Tang, P.T.P., 1989, "Table-driven implementation of the exponential function in
 * IEEE floating-point arithmetic", ACM Transactions on Mathematical Software 15(2):144–157,
 * doi:10.1145/63522.214389 (details from memory). Range reduction
 *   x = (128·k + j)·ln2/128 + r,   m = 128·k + j = round(x·128/ln2), j in 0..127, |r| ≤ ln2/256,
 * with ln2/128 split into a short head (m·head exact for |m| < 2^21) and a tail
 * (Cody & Waite 1980, Software Manual for the Elementary Functions, Prentice-Hall), then
 *   e^x = 2^k · 2^(j/128) · e^r,   e^r − 1 ≈ r + r²/2 + r³/6 + r⁴/24 + r⁵/120,
 * with 2^(j/128) held as a head + tail pair (double-double, built at load from 2^(1/128))
 * so the table adds no rounding of its own. The result is formed as
 *   2^k · (T_hi + (T_lo + T_hi·q)),  q = e^r − 1.
 *
 * Error bound (relative, for |x| < 700, no subnormal results): the final addition rounds
 * once (≤ 2^−53 ≈ 1.11e−16); the polynomial truncation is ≤ |r|⁶/720 ≤ 5.4e−19; the
 * rounding of q, T_hi·q and T_lo + T_hi·q is ≤ 3·2^−53·|q| ≤ 9e−19; the reduction tail and
 * the table pair are below 1e−25. Total ≤ 1.13e−16 (about half an ulp). Against Math.exp
 * (fdlibm, < 1 ulp) the difference is therefore below 1.5 ulp ≈ 3.4e−16, which the tests
 * check (max relative difference < 4e−16 on 10^6 seeded points in [−20, 20]).
 * Outside (−700, 700), and for NaN, the call falls back to Math.exp (same value).
 *
 * Pure: the tables are constants built once at load (about 2,200 numbers); no state.
 * Imports: none.
 */

/** Table size N: 2^(j/N) for j = 0..N − 1. */
const TABLE_SIZE = 128;
/** N/ln 2. */
const INV_STEP = TABLE_SIZE / Math.LN2;
/**
 * ln 2 = LN2_HEAD + LN2_TAIL (fdlibm's split: the head has 32 significant bits, so m·head/128
 * is exact for |m| < 2^21).
 */
const LN2_HEAD = 6.93147180369123816490e-1;
const LN2_TAIL = 1.90821492927058770002e-10;
const STEP_HEAD = LN2_HEAD / TABLE_SIZE;
const STEP_TAIL = LN2_TAIL / TABLE_SIZE;
/** 2^(1/128) as a double-double: head (nearest double) and tail (the rest). */
const ROOT_HEAD = 1.0054299011128027;
const ROOT_TAIL = 9.499186535455032e-17;
/** 1.5·2^52: adding and subtracting it rounds a double of magnitude < 2^51 to an integer (ties to even). */
const ROUND_SHIFT = 6755399441055744;
/** Exponent offset of the power-of-two table (2^k at index k + 1023). */
const POW2_OFFSET = 1023;

/** Veltkamp split constant 2^27 + 1 (Dekker 1971, Numerische Mathematik 18:224–242). */
const SPLITTER = 134217729;

/** Build 2^(j/128) as head/tail pairs by double-double products with 2^(1/128). */
function buildFractionTable(): { head: Float64Array; tail: Float64Array } {
  const head = new Float64Array(TABLE_SIZE);
  const tail = new Float64Array(TABLE_SIZE);
  let h = 1;
  let t = 0;
  for (let j = 0; j < TABLE_SIZE; j++) {
    head[j] = h;
    tail[j] = t;
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
  return { head, tail };
}

const FRACTION = buildFractionTable();
const FRACTION_HEAD = FRACTION.head;
const FRACTION_TAIL = FRACTION.tail;
/** 2^k for k in [−1022, 1023] (exact). */
const POW2 = (() => {
  const t = new Float64Array(2 * POW2_OFFSET);
  for (let k = -1022; k <= 1023; k++) t[k + POW2_OFFSET] = 2 ** k;
  return t;
})();

/**
 * Exponential by table (Tang 1989): e^x to within half an ulp plus 2e−18 (relative).
 *
 * Formula: e^x = 2^k · 2^(j/128) · e^r with m = round(128x/ln2) = 128k + j, r = x − m·ln2/128,
 * e^r − 1 by its Taylor polynomial to r⁵ (|r| ≤ 2.71e−3). See the file comment for the
 * error bound (≤ 1.13e−16 relative; < 4e−16 from Math.exp, tested).
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
  const j = m & (TABLE_SIZE - 1);
  const q = r * (1 + r * (0.5 + r * (1 / 6 + r * (1 / 24 + r * (1 / 120)))));
  const s = FRACTION_HEAD[j];
  return (s + (FRACTION_TAIL[j] + s * q)) * POW2[(m >> 7) + POW2_OFFSET];
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
  const head = FRACTION_HEAD;
  const tail = FRACTION_TAIL;
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
    const j = m & (TABLE_SIZE - 1);
    const q = r * (1 + r * (0.5 + r * (1 / 6 + r * (1 / 24 + r * (1 / 120)))));
    const s = head[j];
    out[i] = (s + (tail[j] + s * q)) * pow2[(m >> 7) + POW2_OFFSET];
  }
  if (outside) {
    for (let i = 0; i < count; i++) {
      const xi = x[i];
      if (!(xi > -700 && xi < 700)) out[i] = Math.exp(xi);
    }
  }
}
