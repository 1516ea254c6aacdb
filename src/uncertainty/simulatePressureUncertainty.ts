/**
 * Monte Carlo uncertainty of pore pressure, fracture pressure and the mud-weight window
 * along a well, seeded and reproducible.
 *
 * Methods sampled (each keeps its published form; the Monte Carlo only varies inputs):
 * - Eaton, B.A., 1975, "The equation for geopressure prediction from well logs", SPE-5544
 *   (meeting details from memory): Pp = Sv − (Sv − Ph)·ratio^n, ratio = Δtn/Δt (sonic) or
 *   Ro/Rn (resistivity); exponents tabulated in Lyons (ed.) 2001, Standard Handbook of
 *   Petroleum & Natural Gas Engineering, vol. 1, eq. 4-251.
 * - Normal compaction trends linearised as in trend/fitCompactionTrend.ts: log10 Δt = a + bZ
 *   (Hottman & Johnson 1965, JPT 17(6):717–722, SPE-1110); ln R = a + bZ and
 *   ln(Δt − Δtm) = a + bZ (Zhang 2011, Earth-Science Reviews 108:50–63,
 *   doi:10.1016/j.earscirev.2011.06.001, forms from memory); (a, b) drawn jointly normal from
 *   the fit covariance; Δtm stays fixed, as in the fit.
 * - Bowers, G.L., 1995, SPE Drilling & Completion 10(2):89–95, SPE-27488 (equation numbers
 *   from memory): V = 10⁶/Δt; virgin σ = ((V − V0)/A)^(1/B) (eq. 1 inverted); unloading
 *   σ = σmax[((V − V0)/A)^(1/B)/σmax]^U, σmax = ((Vmax − V0)/A)^(1/B) (eqs. 2–3); Pp = Sv − σ.
 * - Eaton, B.A., 1969, JPT 21(10):1353–1360, SPE-2163: Shmin = ν/(1−ν)(Sv − Pp) + Pp.
 * - Frictional-faulting lower bound in a normal-faulting regime (Jaeger & Cook, Fundamentals
 *   of Rock Mechanics; Zoback 2007, Reservoir Geomechanics, Cambridge UP, ch. 4, eq. 4.45 from
 *   memory): Shmin = (Sv − Pp)/q + Pp, q = [√(μ² + 1) + μ]².
 * Both fracture forms are Shmin = Pp + k·max(Sv − Pp, 0) with k = ν/(1−ν) or 1/q(μ); the
 * fracture pressure here is that Shmin (no tensile strength, no hoop-stress term).
 *
 * Statistics: P10/P50/P90 are the 10th/50th/90th percentiles of the realisations, so P10 is
 * the LOW value and P90 the HIGH value (the usual convention of this trade), by the type-7
 * definition of Hyndman & Fan 1996 (The American Statistician 50(4):361–365): pore pressure
 * from a partition carried from the previous depth, with sorted windows around the three
 * ranks (createPartitionedOrderQuantiles in partitionedOrderQuantiles.ts), fracture pressure
 * from a permutation carried from the previous depth and re-sorted by insertion
 * (createCarriedOrderQuantiles in carriedOrderQuantiles.ts) — both exact, usually one pass
 * per depth.
 *
 * Loop order: all realisation parameters are drawn once (Float64Arrays of length R); then,
 * depth by depth, R pore pressures and R fracture pressures go into two scratch buffers
 * where the statistics are taken. Memory is O(R + depths); no R × depths matrix exists.
 * For log-linear trends ln(ratio) = a'_r + b'_r·Z − ln(obs) is linear in depth, so each
 * sample costs one exp (ratio^n = exp(n·ln ratio), by the table exponential of
 * tableExponential.ts); Bowers costs one exp per sample (ln(V − V0) once per depth). The
 * exponential-to-matrix sonic trend ln(Δtm + e^(a_r + b_r·Z)) is evaluated directly at the first depth of every block of 64
 * depth indices, with its degree-5 Taylor coefficients in Z, and the other depths of the
 * block use that polynomial (remainder < 6.5e-17 while |b_r|·|Z − Z₀| ≤ 6e-3, else the depth
 * becomes a new anchor), so a sample again costs one exp, with no log or division and no
 * drift; the result at a depth depends only on the inputs since its block of 64 began.
 *
 * Imports: ../errors.js, siblings of this folder, and the type-only trend shapes.
 */
import { ShalepointError, requireSameLength, type Warning } from "../errors.js";
import type { CompactionTrend } from "../trend/trendTypes.js";
import { checkParameterDistribution, drawParameterSamples, type ParameterDistribution } from "./drawParameterSamples.js";
import { drawCorrelatedPairs, type PairCovariance } from "./drawCorrelatedPairs.js";
import { createCarriedOrderQuantiles } from "./carriedOrderQuantiles.js";
import { createPartitionedOrderQuantiles } from "./partitionedOrderQuantiles.js";
import { expByTableInto } from "./tableExponential.js";
import { createXoshiro128Random, type UniformRandomSource } from "./xoshiro128Random.js";

/** Fewest realisations accepted. */
export const MIN_MONTE_CARLO_REALISATIONS = 10;
/** Most realisations accepted (memory and time guard). */
export const MAX_MONTE_CARLO_REALISATIONS = 10_000_000;

/** Pore-pressure method and its uncertain inputs. */
export type PorePressureUncertaintyMethod =
  | {
      kind: "eaton";
      /** Eaton exponent n (> 0), e.g. { kind: "normal", mean: 3, std: 0.3 } for sonic. */
      exponent: ParameterDistribution;
      /** Normal compaction trend (its kind fixes the log: sonic µs/ft or resistivity ohm.m). */
      trend: CompactionTrend;
      /**
       * Covariance of the linearised (intercept, slope) per trend segment, e.g.
       * fitCompactionTrend(...).diagnostics.covariance; null or absent = that segment fixed.
       */
      trendCovariance?: ReadonlyArray<PairCovariance | null>;
    }
  | {
      kind: "bowers";
      /** A, (ft/s)/psi^B, > 0; typical 10–20. */
      a: ParameterDistribution;
      /** B, in (0, 1]; typical 0.7–0.85. */
      b: ParameterDistribution;
      /** V0, ft/s, default 5000 (fixed). */
      v0FtPerS?: number;
      /** Unloading below onsetTvdFt where V < Vmax; U ≥ 1 (typical 3–8). */
      unloading?: { u: ParameterDistribution; onsetTvdFt: number; vmaxFtPerS: number };
    };

/** Fracture-pressure method and its uncertain input. */
export type FractureUncertaintyMethod =
  | { kind: "eaton1969"; /** ν in (0, 0.5), typical 0.25–0.47. */ poissonRatio: ParameterDistribution }
  | { kind: "frictionalNormal"; /** μ ≥ 0, typical 0.6. */ frictionCoefficient: ParameterDistribution };

/** Inputs of {@link simulatePressureUncertainty}. All arrays share one depth index. */
export interface PressureUncertaintyInput {
  /** TVD below rotary table, ft (e.g. 10,000). */
  tvdFt: ArrayLike<number>;
  /** Depth below mudline, ft (used by Eaton trends). */
  bmlFt: ArrayLike<number>;
  /** Overburden Sv, psi (best estimate). */
  overburdenPsi: ArrayLike<number>;
  /** Hydrostatic (normal) pore pressure Ph, psi. */
  hydrostaticPsi: ArrayLike<number>;
  /** Observed shale log: slowness µs/ft (sonic trends, Bowers) or resistivity ohm.m. NaN = missing. */
  observed: ArrayLike<number>;
  /**
   * Multiplier on Sv per realisation (bulk density uncertainty), > 0; default fixed 1.
   * E.g. { kind: "normal", mean: 1, std: 0.02 } for ±2 % (one sigma) overburden.
   */
  overburdenFactor?: ParameterDistribution;
  porePressure: PorePressureUncertaintyMethod;
  fracture: FractureUncertaintyMethod;
  /** Planned mud weight as a gradient, psi/ft (EMW), per depth; NaN = none there. */
  plannedMudWeightPsiPerFt?: ArrayLike<number>;
  /** Number of realisations R, integer in [10, 10⁷]; typical 1000. */
  realisations: number;
  /** Seed, non-negative integer; same seed and inputs give identical output. */
  seed: number;
}

/** One drawn input, for a report's parameter table. */
export interface DrawnParameter {
  /** e.g. `eatonExponent`, `trendIntercept[0]`, `poissonRatio`. */
  name: string;
  /** Unit of the values, e.g. `1`, `psi/ft`, `ln(ohm.m)`. */
  unit: string;
  /** One value per realisation (length R). */
  values: Float64Array;
}

/** Result of {@link simulatePressureUncertainty}; every array is aligned to the depth index. */
export interface PressureUncertaintyResult {
  realisations: number;
  seed: number;
  /** Pore pressure percentiles, psi (P10 = low, P90 = high). */
  ppP10Psi: Float64Array;
  ppP50Psi: Float64Array;
  ppP90Psi: Float64Array;
  /** Mean and standard deviation (divisor R − 1) of pore pressure, psi. */
  ppMeanPsi: Float64Array;
  ppStdPsi: Float64Array;
  /** Fracture pressure (Shmin) percentiles, psi (P10 = low, P90 = high). */
  fracP10Psi: Float64Array;
  fracP50Psi: Float64Array;
  fracP90Psi: Float64Array;
  /** Cautious window lower bound = pore pressure P90, psi. */
  windowLowerPsi: Float64Array;
  /** Cautious window upper bound = fracture pressure P10, psi. */
  windowUpperPsi: Float64Array;
  /** Fraction of realisations with planned mud pressure < Pp (underbalance); NaN without a mud weight. */
  probMudBelowPorePressure: Float64Array;
  /** Fraction of realisations with planned mud pressure > fracture pressure (losses); NaN without a mud weight. */
  probMudAboveFracture: Float64Array;
  /** Drawn inputs, in the order they were drawn. */
  draws: DrawnParameter[];
  /** W_MC_MISSING_DEPTHS (depths left NaN), W_MC_WINDOW_CLOSED (P90 Pp ≥ P10 fracture). */
  warnings: Warning[];
}

/** Draw one input and check every draw lies in its physical range. */
function drawChecked(
  random: UniformRandomSource,
  dist: ParameterDistribution,
  count: number,
  name: string,
  unit: string,
  lo: number,
  hi: number,
  loOpen: boolean,
  hiOpen: boolean,
): Float64Array {
  const allowed = `${loOpen ? "(" : "["}${lo}, ${hi}${hiOpen ? ")" : "]"}`;
  const inside = (x: number): boolean => (loOpen ? x > lo : x >= lo) && (hiOpen ? x < hi : x <= hi);
  const support = checkParameterDistribution(dist, name);
  // A bounded distribution must fit the physical range whatever the luck of the draw.
  if (Number.isFinite(support.min) && Number.isFinite(support.max) && !(inside(support.min) && inside(support.max))) {
    throw new ShalepointError("E_RANGE", `${name}: the distribution reaches outside the physical range`, {
      param: name, value: support, unit, allowed,
      hint: "Narrow the bounds of the distribution to the allowed range.",
    });
  }
  const values = drawParameterSamples({ distribution: dist, count, random, param: name });
  for (let r = 0; r < count; r++) {
    if (!inside(values[r])) {
      throw new ShalepointError("E_RANGE", `${name}: realisation ${r} drew a value outside the physical range`, {
        param: name, value: values[r], unit, allowed, row: r,
        hint: "Use a truncatedNormal (or uniform/triangular) distribution bounded inside the allowed range.",
      });
    }
  }
  return values;
}

function requireFiniteScalar(ok: boolean, param: string, value: unknown, allowed: string, unit?: string): void {
  if (!ok) throw new ShalepointError("E_RANGE", `${param} is out of range`, { param, value, allowed, unit });
}

// ---- per-depth passes ---------------------------------------------------------------------
// Each pass is one short loop in a function of its own. The exponential is the table-driven
// one of tableExponential.ts: with the benchmark well's Eaton exponents (near −1) Math.exp took
// about twice as long per value, its reduction branch flipping from realisation to realisation.

/** Eaton exponent with a log-linear trend: x_r = n_r·(a_r + b_r·Z + c), signs folded in a, b, c. */
function exponentLogLinear(x: Float64Array, R: number, n: Float64Array, a: Float64Array, b: Float64Array, z: number, c: number): void {
  for (let r = 0; r < R; r++) x[r] = n[r] * (a[r] + b[r] * z + c);
}

/**
 * Depth indices per block (64) of the exponential-trend expansion: the trend is evaluated
 * exactly at the first depth of every block of this many indices (and again inside a block
 * after a segment change or once the expansion would reach too far), so the result at a depth
 * depends only on the inputs since its block began and any run split at a block boundary
 * gives the same bits.
 */
export const MONTE_CARLO_DEPTH_BLOCK = 64;
const TREND_ANCHOR_BLOCK = MONTE_CARLO_DEPTH_BLOCK;
/**
 * Largest |b|·|Z − Z_anchor| at which the degree-5 Taylor expansion of ln(Δtm + e^(a + bZ)) is
 * used: its remainder is below (|b|·|ΔZ|)⁶/720 ≤ 6.5e-17 (the sixth derivative is b⁶ times a
 * polynomial in w = E/(Δtm + E) bounded by 1 on [0, 1]), under a tenth of an ulp of ln Δt.
 */
const TAYLOR_REACH_MAX = 6e-3;

/**
 * Per-realisation Taylor coefficients of the exponential-to-matrix trend about the anchor
 * depth Z₀ of the current block: ln(Δtm + e^(a + bZ)) = Σ c_k·(Z − Z₀)^k, k = 0..5.
 */
interface ExponentialTrendState {
  c0: Float64Array;
  c1: Float64Array;
  c2: Float64Array;
  c3: Float64Array;
  c4: Float64Array;
  c5: Float64Array;
}

/**
 * Eaton exponent with the exponential-to-matrix sonic trend at an anchor depth (the first of
 * a 64-depth block, or after a segment change or a long reach):
 * x_r = n_r·(ln(Δtm + E) − ln Δt), E = e^(a_r + b_r·Z), with ln(Δtm + E) evaluated directly;
 * it also stores the Taylor coefficients about this depth used by the depths that follow
 * ({@link exponentFromExpansion}). With w = E/(Δtm + E) and v = w(1 − w), the derivatives of
 * ln(Δtm + e^(a + bZ)) are b·w, b²·v, b³·v(1 − 2w), b⁴·v(1 − 6w + 6w²),
 * b⁵·v(1 − 2w)(1 − 12w + 12w²) (from dw/dZ = b·v); c_k is the k-th derivative over k!.
 */
function exponentAtAnchor(
  x: Float64Array, R: number, n: Float64Array, a: Float64Array, b: Float64Array, dtMatrix: number,
  z: number, lnObs: number, st: ExponentialTrendState,
): void {
  const { c0, c1, c2, c3, c4, c5 } = st;
  for (let r = 0; r < R; r++) {
    const br = b[r];
    const er = Math.exp(a[r] + br * z);
    const l = Math.log(dtMatrix + er);
    const w = er / (dtMatrix + er);
    const v = w * (1 - w);
    const b2 = br * br;
    c0[r] = l;
    c1[r] = br * w;
    c2[r] = (b2 * v) / 2;
    c3[r] = (b2 * br * v * (1 - 2 * w)) / 6;
    c4[r] = (b2 * b2 * v * (1 - 6 * w + 6 * w * w)) / 24;
    c5[r] = (b2 * b2 * br * v * (1 - 2 * w) * (1 - 12 * w + 12 * w * w)) / 120;
    x[r] = n[r] * (l - lnObs);
  }
}

/**
 * Eaton exponent with the exponential-to-matrix trend after the anchor of its block, from the
 * degree-5 Taylor expansion about the anchor:
 * x_r = n_r·(c0 + t(c1 + t(c2 + t(c3 + t(c4 + t·c5)))) − ln Δt), t = Z − Z₀ (|b|·|t| ≤ 6e-3,
 * remainder < 6.5e-17), so no log and no division per sample, and no state carried from
 * depth to depth.
 */
function exponentFromExpansion(x: Float64Array, R: number, n: Float64Array, st: ExponentialTrendState, t: number, lnObs: number): void {
  const { c0, c1, c2, c3, c4, c5 } = st;
  for (let r = 0; r < R; r++) {
    const lnTrend = c0[r] + t * (c1[r] + t * (c2[r] + t * (c3[r] + t * (c4[r] + t * c5[r]))));
    x[r] = n[r] * (lnTrend - lnObs);
  }
}

/**
 * Bowers effective stress σ_r, psi, virgin or (u given) unloading branch; V ≤ V0 gives σ = 0
 * (Pp = Sv, as in bowersPorePressure).
 */
function bowersEffectiveStress(
  sigma: Float64Array, R: number, v: number, v0: number, lnA: Float64Array, invB: Float64Array,
  u: Float64Array | null, lnSigmaMax: Float64Array,
): void {
  if (!(v > v0)) {
    sigma.fill(0, 0, R);
    return;
  }
  const lnVV = Math.log(v - v0);
  if (u !== null) {
    for (let r = 0; r < R; r++) {
      const lnSigmaVirgin = (lnVV - lnA[r]) * invB[r];
      const lsm = lnSigmaMax[r];
      sigma[r] = Math.exp(lsm + u[r] * (lnSigmaVirgin - lsm));
    }
  } else {
    for (let r = 0; r < R; r++) sigma[r] = Math.exp((lnVV - lnA[r]) * invB[r]);
  }
}

/**
 * Pore pressure, fracture pressure, shifted moment sums of Pp and exceedance counts of one
 * depth, in one pass. On entry pp holds a per-realisation factor e_r; on return the pore
 * pressure Pp_r = min(Sv_r − (load·Sv_r + offset)·e_r, Sv_r) (clipped at overburden, as
 * porepressure/ does):
 * - Eaton: e = ratio^n, load = 1, offset = −Ph, so Pp = Sv − (Sv − Ph)·ratio^n;
 * - Bowers: e = σ (psi), load = 0, offset = 1, so Pp = Sv − σ.
 * Fracture: fr_r = Pp_r + k_r·max(Sv_r − Pp_r, 0). mom gets [s1, s2, shift, nBelow, nAbove]:
 * sums of (Pp − shift) and its square about shift = Pp of the first realisation, and the
 * counts of Pp above and fracture pressure below the mud pressure (psi; NaN counts none).
 */
function pressureFractureMoments(
  pp: Float64Array, fr: Float64Array, R: number, f: Float64Array, k: Float64Array,
  sv: number, load: number, offset: number, mudPsi: number, mom: Float64Array,
): void {
  const sv0 = sv * f[0];
  const q0 = sv0 - (load * sv0 + offset) * pp[0];
  const shift = q0 > sv0 ? sv0 : q0;
  let s1 = 0;
  let s2 = 0;
  let nBelow = 0;
  let nAbove = 0;
  for (let r = 0; r < R; r++) {
    const svr = sv * f[r];
    const q = svr - (load * svr + offset) * pp[r];
    const p = q > svr ? svr : q;
    pp[r] = p;
    const eff = svr - p;
    const x = p + k[r] * (eff > 0 ? eff : 0);
    fr[r] = x;
    const d = p - shift;
    s1 += d;
    s2 += d * d;
    if (p > mudPsi) nBelow++;
    if (x < mudPsi) nAbove++;
  }
  mom[0] = s1;
  mom[1] = s2;
  mom[2] = shift;
  mom[3] = nBelow;
  mom[4] = nAbove;
}

/** Per-realisation Eaton trend data of one segment. */
interface TrendDraws {
  /** Natural-log intercept and slope, already multiplied by the ratio's sign (log-linear kinds). */
  a: Float64Array;
  b: Float64Array;
  /** Matrix slowness (sonicExponential only), µs/ft. */
  dtMatrix: number;
  /** Largest |b| over the realisations, 1/ft. */
  bAbsMax: number;
}

/**
 * Monte Carlo P10/P50/P90 of pore pressure and fracture pressure, the mud-weight window and
 * the chance that a planned mud weight is under pore pressure or over fracture pressure.
 *
 * Per realisation r and depth: Sv_r = f_r·Sv; Eaton: Pp = Sv_r − (Sv_r − Ph)·ratio_r^n_r with
 * the trend of realisation r; Bowers: Pp = Sv_r − σ_r(V); Pp is clipped at Sv_r (as in
 * porepressure/porePressureFlags.ts) and never floored at hydrostatic. Fracture:
 * Shmin = Pp + k_r·max(Sv_r − Pp, 0), k = ν/(1−ν) (Eaton 1969) or 1/q(μ) (frictional).
 * Probabilities: mud pressure = MW·TVD; P(MW < Pp) = #(Pp_r > mud)/R; P(MW > FG) = #(Shmin_r < mud)/R.
 * Draw order (fixed, for reproducibility): overburden factor, then Eaton exponent and each
 * segment's (intercept, slope), or Bowers A, B, U; then ν or μ.
 * Missing data: a NaN in TVD, Sv, Ph or the log (or a log ≤ 0; for Eaton a NaN or negative
 * depth below mudline) leaves every output NaN at that depth, counted in W_MC_MISSING_DEPTHS.
 *
 * @param input see {@link PressureUncertaintyInput}
 * @returns {@link PressureUncertaintyResult}: psi arrays, probabilities in [0, 1], draws
 * @throws ShalepointError E_MC_TOO_FEW_REALISATIONS (R < 10 or not an integer: with fewer
 *   than 10 realisations P10 and P90 lie on or next to the extreme draws and say nothing
 *   about the tails); E_RANGE (negative std, ν outside (0, 0.5), μ < 0, n ≤ 0, A ≤ 0,
 *   B outside (0, 1], U < 1, factor ≤ 0, bad seed, bad trend or covariance); E_LENGTH
 *   (arrays or trendCovariance of different lengths)
 * @example
 * simulatePressureUncertainty({ tvdFt: [10000], bmlFt: [10000], overburdenPsi: [10000], hydrostaticPsi: [4650],
 *   observed: [1.2], porePressure: { kind: "eaton", exponent: { kind: "fixed", value: 1.2 },
 *   trend: { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 2 * Math.exp(-1), growthPerFt: 1e-4 }, fittedOn: null }] } },
 *   fracture: { kind: "eaton1969", poissonRatio: { kind: "fixed", value: 0.25 } }, realisations: 100, seed: 1 }).ppP50Psi
 * // [7101.8] (Ro/Rn = 0.6, CHECK-VALUES §3: 0.7102 psi/ft)
 * @see Eaton 1975 SPE-5544; Bowers 1995 SPE-27488; Eaton 1969 SPE-2163; Hyndman & Fan 1996,
 *   The American Statistician 50(4):361–365
 */
export function simulatePressureUncertainty(input: PressureUncertaintyInput): PressureUncertaintyResult {
  return simulateDepthRange(input, 0, input.tvdFt.length);
}

/** The whole Monte Carlo over depth indices [i0, i1): arrays of length i1 − i0, warnings with absolute indices. */
function simulateDepthRange(input: PressureUncertaintyInput, i0: number, i1: number): PressureUncertaintyResult {
  const { tvdFt, bmlFt, overburdenPsi, hydrostaticPsi, observed, realisations: R, seed } = input;
  const mw = input.plannedMudWeightPsiPerFt;

  if (!(Number.isInteger(R) && R >= MIN_MONTE_CARLO_REALISATIONS && R <= MAX_MONTE_CARLO_REALISATIONS)) {
    throw new ShalepointError("E_MC_TOO_FEW_REALISATIONS", "the number of realisations must be an integer of at least 10", {
      param: "realisations", value: R, allowed: `integer in [${MIN_MONTE_CARLO_REALISATIONS}, ${MAX_MONTE_CARLO_REALISATIONS}]`,
      hint: "With fewer than 10 realisations P10 and P90 sit on or next to the extreme draws; use 1000 or more for a report.",
    });
  }
  const nDepth = tvdFt.length;
  requireSameLength(tvdFt, bmlFt, "tvdFt", "bmlFt");
  requireSameLength(tvdFt, overburdenPsi, "tvdFt", "overburdenPsi");
  requireSameLength(tvdFt, hydrostaticPsi, "tvdFt", "hydrostaticPsi");
  requireSameLength(tvdFt, observed, "tvdFt", "observed");
  if (mw !== undefined) requireSameLength(tvdFt, mw, "tvdFt", "plannedMudWeightPsiPerFt");

  const random = createXoshiro128Random(seed);
  const draws: DrawnParameter[] = [];
  const factor = drawChecked(random, input.overburdenFactor ?? { kind: "fixed", value: 1 }, R, "overburdenFactor", "1", 0, Infinity, true, true);
  draws.push({ name: "overburdenFactor", unit: "1", values: factor });

  // ---- pore-pressure parameters --------------------------------------------------------
  const pm = input.porePressure;
  let exponent: Float64Array = new Float64Array(0);
  let trendKind: CompactionTrend["kind"] = "sonicLogLinear";
  const segTops: number[] = [];
  const segDraws: TrendDraws[] = [];
  let lnA: Float64Array = new Float64Array(0);
  let invB: Float64Array = new Float64Array(0);
  let uArr: Float64Array = new Float64Array(0);
  let lnSigmaMax: Float64Array = new Float64Array(0);
  let v0 = 5000;
  let unloadOnsetFt = Infinity;
  let vmax = NaN;
  if (pm.kind === "eaton") {
    exponent = drawChecked(random, pm.exponent, R, "eatonExponent", "1", 0, Infinity, true, true);
    draws.push({ name: "eatonExponent", unit: "1", values: exponent });
    const trend = pm.trend;
    trendKind = trend.kind;
    const segs = trend.segments as ReadonlyArray<{ topBmlFt: number; params: unknown }>;
    if (segs.length === 0) {
      throw new ShalepointError("E_TREND_SEGMENTS", "a trend needs at least one segment", { param: "porePressure.trend.segments" });
    }
    if (pm.trendCovariance !== undefined && pm.trendCovariance.length !== segs.length) {
      throw new ShalepointError("E_LENGTH", "trendCovariance needs one entry (or null) per trend segment", {
        param: "porePressure.trendCovariance", value: `${pm.trendCovariance.length} vs ${segs.length}`,
      });
    }
    // Ratio orientation (Eaton 1975): sonic Δtn/Δt → ln ratio = ln Δtn − ln Δt (sign +1);
    // resistivity Ro/Rn → ln ratio = ln Ro − ln Rn (sign −1 on the trend).
    const sign = trend.kind === "resistivityLogLinear" ? -1 : 1;
    segs.forEach((seg, k) => {
      const where = `porePressure.trend.segments[${k}]`;
      requireFiniteScalar(Number.isFinite(seg.topBmlFt) && (k === 0 || seg.topBmlFt > segs[k - 1].topBmlFt), `${where}.topBmlFt`, seg.topBmlFt, "finite, increasing with depth", "ft");
      // Linearised intercept a0 and slope b0, and the factor from that log base to ln.
      let a0: number;
      let b0: number;
      let toLn = 1;
      let dtMatrix = NaN;
      let unitA = "";
      if (trend.kind === "sonicLogLinear") {
        const p = trend.segments[k].params;
        requireFiniteScalar(p.dtMudlineUsPerFt > 0 && Number.isFinite(p.dtMudlineUsPerFt), `${where}.params.dtMudlineUsPerFt`, p.dtMudlineUsPerFt, "> 0", "us/ft");
        requireFiniteScalar(Number.isFinite(p.log10SlopePerFt), `${where}.params.log10SlopePerFt`, p.log10SlopePerFt, "finite", "1/ft");
        a0 = Math.log10(p.dtMudlineUsPerFt);
        b0 = p.log10SlopePerFt;
        toLn = Math.LN10;
        unitA = "log10(us/ft)";
      } else if (trend.kind === "resistivityLogLinear") {
        const p = trend.segments[k].params;
        requireFiniteScalar(p.r0OhmM > 0 && Number.isFinite(p.r0OhmM), `${where}.params.r0OhmM`, p.r0OhmM, "> 0", "ohm.m");
        requireFiniteScalar(Number.isFinite(p.growthPerFt), `${where}.params.growthPerFt`, p.growthPerFt, "finite", "1/ft");
        a0 = Math.log(p.r0OhmM);
        b0 = p.growthPerFt;
        unitA = "ln(ohm.m)";
      } else if (trend.kind === "sonicExponential") {
        const p = trend.segments[k].params;
        requireFiniteScalar(p.dtMatrixUsPerFt > 0 && Number.isFinite(p.dtMatrixUsPerFt), `${where}.params.dtMatrixUsPerFt`, p.dtMatrixUsPerFt, "> 0", "us/ft");
        requireFiniteScalar(p.dtMudlineUsPerFt > p.dtMatrixUsPerFt && Number.isFinite(p.dtMudlineUsPerFt), `${where}.params.dtMudlineUsPerFt`, p.dtMudlineUsPerFt, "> dtMatrixUsPerFt", "us/ft");
        requireFiniteScalar(p.decayPerFt >= 0 && Number.isFinite(p.decayPerFt), `${where}.params.decayPerFt`, p.decayPerFt, ">= 0", "1/ft");
        a0 = Math.log(p.dtMudlineUsPerFt - p.dtMatrixUsPerFt);
        b0 = -p.decayPerFt;
        dtMatrix = p.dtMatrixUsPerFt;
        unitA = "ln(us/ft)";
      } else {
        throw new ShalepointError("E_TREND_PARAMS", "unknown trend kind", {
          param: "porePressure.trend.kind", value: (trend as { kind: unknown }).kind,
          allowed: "sonicExponential, sonicLogLinear, resistivityLogLinear",
        });
      }
      const cov = pm.trendCovariance?.[k] ?? null;
      let aDraw: Float64Array;
      let bDraw: Float64Array;
      if (cov === null) {
        aDraw = new Float64Array(R).fill(a0);
        bDraw = new Float64Array(R).fill(b0);
      } else {
        const pair = drawCorrelatedPairs({ meanX: a0, meanY: b0, covariance: cov, count: R, random, param: `porePressure.trendCovariance[${k}]` });
        aDraw = pair.x;
        bDraw = pair.y;
      }
      draws.push({ name: `trendIntercept[${k}]`, unit: unitA, values: aDraw });
      draws.push({ name: `trendSlope[${k}]`, unit: `${unitA.split("(")[0]} per ft`, values: bDraw });
      const a = new Float64Array(R);
      const b = new Float64Array(R);
      const s = trend.kind === "sonicExponential" ? 1 : sign * toLn;
      for (let r = 0; r < R; r++) {
        a[r] = s * aDraw[r];
        b[r] = s * bDraw[r];
      }
      segTops.push(seg.topBmlFt);
      let bAbsMax = 0;
      for (let r = 0; r < R; r++) bAbsMax = Math.max(bAbsMax, Math.abs(b[r]));
      segDraws.push({ a, b, dtMatrix, bAbsMax });
    });
  } else if (pm.kind === "bowers") {
    v0 = pm.v0FtPerS ?? 5000;
    requireFiniteScalar(Number.isFinite(v0) && v0 > 0, "porePressure.v0FtPerS", v0, "> 0", "ft/s");
    const aArr = drawChecked(random, pm.a, R, "bowersA", "(ft/s)/psi^B", 0, Infinity, true, true);
    const bArr = drawChecked(random, pm.b, R, "bowersB", "1", 0, 1, true, false);
    draws.push({ name: "bowersA", unit: "(ft/s)/psi^B", values: aArr }, { name: "bowersB", unit: "1", values: bArr });
    lnA = new Float64Array(R);
    invB = new Float64Array(R);
    for (let r = 0; r < R; r++) {
      lnA[r] = Math.log(aArr[r]);
      invB[r] = 1 / bArr[r];
    }
    if (pm.unloading !== undefined) {
      const un = pm.unloading;
      requireFiniteScalar(Number.isFinite(un.onsetTvdFt), "porePressure.unloading.onsetTvdFt", un.onsetTvdFt, "finite", "ft");
      requireFiniteScalar(Number.isFinite(un.vmaxFtPerS) && un.vmaxFtPerS > v0, "porePressure.unloading.vmaxFtPerS", un.vmaxFtPerS, `> V0 (${v0})`, "ft/s");
      uArr = drawChecked(random, un.u, R, "bowersU", "1", 1, Infinity, false, true);
      draws.push({ name: "bowersU", unit: "1", values: uArr });
      unloadOnsetFt = un.onsetTvdFt;
      vmax = un.vmaxFtPerS;
      lnSigmaMax = new Float64Array(R);
      const lnVmax = Math.log(vmax - v0);
      for (let r = 0; r < R; r++) lnSigmaMax[r] = (lnVmax - lnA[r]) * invB[r];
    }
  } else {
    throw new ShalepointError("E_RANGE", "unknown pore-pressure method", {
      param: "porePressure.kind", value: (pm as { kind: unknown }).kind, allowed: "eaton | bowers",
    });
  }

  // ---- fracture parameter → k_r ----------------------------------------------------------
  const fm = input.fracture;
  const kFrac = new Float64Array(R);
  if (fm.kind === "eaton1969") {
    const nu = drawChecked(random, fm.poissonRatio, R, "poissonRatio", "1", 0, 0.5, true, true);
    draws.push({ name: "poissonRatio", unit: "1", values: nu });
    for (let r = 0; r < R; r++) kFrac[r] = nu[r] / (1 - nu[r]);
  } else if (fm.kind === "frictionalNormal") {
    const mu = drawChecked(random, fm.frictionCoefficient, R, "frictionCoefficient", "1", 0, Infinity, false, true);
    draws.push({ name: "frictionCoefficient", unit: "1", values: mu });
    for (let r = 0; r < R; r++) {
      const q = (Math.sqrt(mu[r] * mu[r] + 1) + mu[r]) ** 2;
      kFrac[r] = 1 / q;
    }
  } else {
    throw new ShalepointError("E_RANGE", "unknown fracture method", {
      param: "fracture.kind", value: (fm as { kind: unknown }).kind, allowed: "eaton1969 | frictionalNormal",
    });
  }

  // ---- depth loop ---------------------------------------------------------------------------
  const nOut = i1 - i0;
  const mk = (): Float64Array => new Float64Array(nOut);
  const ppQ = new Float64Array(3 * nOut); // interleaved P10, P50, P90 while looping
  const frQ = new Float64Array(3 * nOut);
  const ppMeanPsi = mk();
  const ppStdPsi = mk();
  const probMudBelowPorePressure = mk();
  const probMudAboveFracture = mk();
  const ppBuf = new Float64Array(R);
  const frBuf = new Float64Array(R);
  const mom = new Float64Array(5); // s1, s2, shift, nBelow, nAbove of the current depth
  const probs = [0.1, 0.5, 0.9];
  // Pore pressure: many realisations cross from one depth to the next where the pressure is
  // near normal (a partitioned order only pays for crossings near the wanted ranks); fracture
  // pressure keeps its order better, and the carried full order costs less there.
  const ppTracker = createPartitionedOrderQuantiles({ count: R, probabilities: probs });
  const frTracker = createCarriedOrderQuantiles({ count: R, probabilities: probs });
  let nMissing = 0;
  let firstMissing = -1;
  const isEaton = pm.kind === "eaton";
  const isResistivity = trendKind === "resistivityLogLinear";
  const isExpTrend = trendKind === "sonicExponential";
  const hasUnloading = uArr.length > 0;
  const coeff = (): Float64Array => new Float64Array(isExpTrend ? R : 0);
  const expState: ExponentialTrendState = { c0: coeff(), c1: coeff(), c2: coeff(), c3: coeff(), c4: coeff(), c5: coeff() };
  let anchorBlock = -1; // block (depth index / 64) of the expansion held in expState
  let anchorSeg = -1;
  let anchorZ = NaN;

  for (let i = i0; i < i1; i++) {
    const o = i - i0; // output position
    const sv = overburdenPsi[i];
    const ph = hydrostaticPsi[i];
    const obs = observed[i];
    const z = bmlFt[i];
    let ok = Number.isFinite(sv) && Number.isFinite(ph) && Number.isFinite(tvdFt[i]) && Number.isFinite(obs) && obs > 0;
    if (ok && isEaton) ok = z >= 0 && Number.isFinite(z);
    if (ok) {
      const mudPsi = mw === undefined ? NaN : mw[i] * tvdFt[i];
      if (isEaton) {
        let k = 0;
        while (k + 1 < segTops.length && z >= segTops[k + 1]) k++;
        const seg = segDraws[k];
        // frBuf holds the exponent n·ln(ratio) until pressureFractureMoments overwrites it.
        if (isExpTrend) {
          // Expand about the block's anchor depth; evaluate exactly at the first valid depth
          // of each block, after a segment change, or where the expansion would reach too far.
          // The decision depends only on the inputs since the block began.
          const block = Math.floor(i / TREND_ANCHOR_BLOCK);
          const t = z - anchorZ;
          if (anchorBlock !== block || anchorSeg !== k || !(Math.abs(t) * seg.bAbsMax <= TAYLOR_REACH_MAX)) {
            exponentAtAnchor(frBuf, R, exponent, seg.a, seg.b, seg.dtMatrix, z, Math.log(obs), expState);
            anchorBlock = block;
            anchorSeg = k;
            anchorZ = z;
          } else {
            exponentFromExpansion(frBuf, R, exponent, expState, t, Math.log(obs));
          }
        } else {
          exponentLogLinear(frBuf, R, exponent, seg.a, seg.b, z, isResistivity ? Math.log(obs) : -Math.log(obs));
        }
        expByTableInto({ x: frBuf, out: ppBuf, count: R }); // ratio^n = e^(n·ln ratio)
        pressureFractureMoments(ppBuf, frBuf, R, factor, kFrac, sv, 1, -ph, mudPsi, mom);
      } else {
        const v = 1e6 / obs; // Bowers works in velocity, ft/s (slowness µs/ft → 10⁶/Δt)
        const unload = hasUnloading && tvdFt[i] >= unloadOnsetFt && v < vmax;
        bowersEffectiveStress(ppBuf, R, v, v0, lnA, invB, unload ? uArr : null, lnSigmaMax);
        pressureFractureMoments(ppBuf, frBuf, R, factor, kFrac, sv, 0, 1, mudPsi, mom);
      }
      const s1 = mom[0];
      const s2 = mom[1];
      const shift = mom[2];
      const nBelow = mom[3];
      const nAbove = mom[4];
      if (Number.isFinite(s2)) {
        const mean = s1 / R;
        ppMeanPsi[o] = shift + mean;
        ppStdPsi[o] = Math.sqrt(Math.max(0, (s2 - R * mean * mean) / (R - 1)));
        probMudBelowPorePressure[o] = Number.isFinite(mudPsi) ? nBelow / R : NaN;
        probMudAboveFracture[o] = Number.isFinite(mudPsi) ? nAbove / R : NaN;
        ppTracker.quantiles(ppBuf, ppQ, 3 * o);
        frTracker.quantiles(frBuf, frQ, 3 * o);
        continue;
      }
    }
    // Missing input (or a non-finite realisation): NaN everywhere at this depth.
    nMissing++;
    if (firstMissing < 0) firstMissing = i;
    ppMeanPsi[o] = NaN;
    ppStdPsi[o] = NaN;
    probMudBelowPorePressure[o] = NaN;
    probMudAboveFracture[o] = NaN;
    ppQ[3 * o] = ppQ[3 * o + 1] = ppQ[3 * o + 2] = NaN;
    frQ[3 * o] = frQ[3 * o + 1] = frQ[3 * o + 2] = NaN;
  }

  const split = (q: Float64Array, m: number): Float64Array => {
    const out = mk();
    for (let o = 0; o < nOut; o++) out[o] = q[3 * o + m];
    return out;
  };
  const ppP10Psi = split(ppQ, 0);
  const ppP50Psi = split(ppQ, 1);
  const ppP90Psi = split(ppQ, 2);
  const fracP10Psi = split(frQ, 0);
  const fracP50Psi = split(frQ, 1);
  const fracP90Psi = split(frQ, 2);

  const warnings: Warning[] = [];
  if (nMissing > 0) {
    warnings.push({
      code: "W_MC_MISSING_DEPTHS", message: "depths with missing or invalid inputs were left NaN",
      count: nMissing, index: firstMissing, depthFt: tvdFt[firstMissing],
    });
  }
  let nClosed = 0;
  let firstClosed = -1;
  for (let o = 0; o < nOut; o++) {
    if (ppP90Psi[o] >= fracP10Psi[o]) {
      nClosed++;
      if (firstClosed < 0) firstClosed = o + i0;
    }
  }
  if (nClosed > 0) {
    warnings.push({
      code: "W_MC_WINDOW_CLOSED", message: "the high (P90) pore pressure reaches the low (P10) fracture pressure: no cautious window",
      count: nClosed, index: firstClosed, depthFt: tvdFt[firstClosed],
    });
  }

  return {
    realisations: R,
    seed,
    ppP10Psi,
    ppP50Psi,
    ppP90Psi,
    ppMeanPsi,
    ppStdPsi,
    fracP10Psi,
    fracP50Psi,
    fracP90Psi,
    windowLowerPsi: Float64Array.from(ppP90Psi),
    windowUpperPsi: Float64Array.from(fracP10Psi),
    probMudBelowPorePressure,
    probMudAboveFracture,
    draws,
    warnings,
  };
}

/**
 * One depth range of {@link simulatePressureUncertainty}: the same draws (same input, same
 * seed), evaluated only at depth indices [startIndex, endIndex), so a long well can be shared
 * between threads and put back together with {@link joinPressureUncertaintyParts}.
 *
 * Formula: as {@link simulatePressureUncertainty}. The range must start on a multiple of
 * {@link MONTE_CARLO_DEPTH_BLOCK} (64): the trend expansion restarts there, so the part
 * repeats the whole-well values at its depths bit for bit.
 *
 * @param input.input the whole-well input, unchanged (all arrays full length)
 * @param input.startIndex first depth index, a multiple of 64 in [0, depths], e.g. 20,032
 * @param input.endIndex depth index after the last, in [startIndex, depths], e.g. 40,000
 * @returns a {@link PressureUncertaintyResult} whose arrays have endIndex − startIndex values;
 *   warning indices are whole-well indices
 * @throws ShalepointError E_RANGE (range not inside the well or start not a multiple of 64),
 *   and everything {@link simulatePressureUncertainty} throws
 * @example simulatePressureUncertaintyPart({ input, startIndex: 64, endIndex: 128 }).ppP50Psi
 * // equals simulatePressureUncertainty(input).ppP50Psi.subarray(64, 128), bit for bit
 * @see simulatePressureUncertainty
 */
export function simulatePressureUncertaintyPart(args: { input: PressureUncertaintyInput; startIndex: number; endIndex: number }): PressureUncertaintyResult {
  const { input, startIndex, endIndex } = args;
  const n = input.tvdFt.length;
  if (!(Number.isInteger(startIndex) && startIndex >= 0 && startIndex % MONTE_CARLO_DEPTH_BLOCK === 0 && startIndex <= n)) {
    throw new ShalepointError("E_RANGE", "a depth range must start on a multiple of 64 inside the well", {
      param: "startIndex", value: startIndex, allowed: `multiple of ${MONTE_CARLO_DEPTH_BLOCK} in [0, ${n}]`,
    });
  }
  if (!(Number.isInteger(endIndex) && endIndex >= startIndex && endIndex <= n)) {
    throw new ShalepointError("E_RANGE", "a depth range must end inside the well, after its start", {
      param: "endIndex", value: endIndex, allowed: `integer in [${startIndex}, ${n}]`,
    });
  }
  return simulateDepthRange(input, startIndex, endIndex);
}

/**
 * Join consecutive depth parts of one Monte Carlo run (from {@link simulatePressureUncertaintyPart},
 * in depth order, covering the well) into the whole-well result.
 *
 * Arrays are concatenated; draws come from the first part (every part draws the same);
 * warnings of one code are merged: counts added, the first part's index and depth kept.
 *
 * @param args.parts the parts in depth order, e.g. two halves of a 40,000-depth run
 * @returns {@link PressureUncertaintyResult} equal to the single-call result
 * @throws ShalepointError E_RANGE when there are no parts or they differ in realisations or seed
 * @example joinPressureUncertaintyParts({ parts: [partA, partB] }).ppP50Psi.length // 40000
 * @see simulatePressureUncertaintyPart
 */
export function joinPressureUncertaintyParts(args: { parts: ReadonlyArray<PressureUncertaintyResult> }): PressureUncertaintyResult {
  const { parts } = args;
  if (parts.length === 0 || parts.some((p) => p.realisations !== parts[0].realisations || p.seed !== parts[0].seed)) {
    throw new ShalepointError("E_RANGE", "parts must be one or more pieces of the same run (same realisations and seed)", {
      param: "parts", value: parts.length, allowed: "≥ 1 parts of one run",
    });
  }
  const cat = (key: keyof PressureUncertaintyResult): Float64Array => {
    const out = new Float64Array(parts.reduce((s, p) => s + (p[key] as Float64Array).length, 0));
    let at = 0;
    for (const p of parts) {
      out.set(p[key] as Float64Array, at);
      at += (p[key] as Float64Array).length;
    }
    return out;
  };
  const warnings: Warning[] = [];
  for (const code of ["W_MC_MISSING_DEPTHS", "W_MC_WINDOW_CLOSED"]) {
    const hits = parts.flatMap((p) => p.warnings.filter((w) => w.code === code));
    if (hits.length > 0) warnings.push({ ...hits[0], count: hits.reduce((s, w) => s + (w.count ?? 0), 0) });
  }
  return {
    realisations: parts[0].realisations,
    seed: parts[0].seed,
    ppP10Psi: cat("ppP10Psi"),
    ppP50Psi: cat("ppP50Psi"),
    ppP90Psi: cat("ppP90Psi"),
    ppMeanPsi: cat("ppMeanPsi"),
    ppStdPsi: cat("ppStdPsi"),
    fracP10Psi: cat("fracP10Psi"),
    fracP50Psi: cat("fracP50Psi"),
    fracP90Psi: cat("fracP90Psi"),
    windowLowerPsi: cat("windowLowerPsi"),
    windowUpperPsi: cat("windowUpperPsi"),
    probMudBelowPorePressure: cat("probMudBelowPorePressure"),
    probMudAboveFracture: cat("probMudAboveFracture"),
    draws: parts[0].draws,
    warnings,
  };
}
