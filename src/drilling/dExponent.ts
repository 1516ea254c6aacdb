/**
 * Drilling exponent and corrected drilling exponent from drilling data.
 *
 * d  = log10( R / (60·N) ) / log10( 12·W / (10⁶·D) )        Jorden & Shirley 1966, eq. 2
 * dc = d · (ρn / ρm)                                         Rehm & McClendon 1971
 *
 * with R rate of penetration (ft/h), N rotary speed (rpm), W weight on bit (lbf) and
 * D bit diameter (in) — the paper's own units, which are also shalepoint's internal units
 * for these quantities, so no conversion is needed at the top. ρn is the normal (hydrostatic)
 * pore-fluid gradient and ρm the mud weight (or ECD) in use; any one gradient unit serves,
 * since only their ratio enters (shalepoint passes psi/ft).
 *
 * References:
 * - Jorden, J.R. & Shirley, O.J., 1966, "Application of drilling performance data to
 *   overpressure detection", Journal of Petroleum Technology 18(11):1387–1394, SPE-1407.
 * - Rehm, B. & McClendon, R., 1971, "Measurement of formation pressure from drilling data",
 *   SPE-3601, SPE Annual Fall Meeting (from memory for the meeting details).
 */
import { ShalepointError } from "../errors.js";

/** Inputs of {@link dExponent}, one value per sample (arrays of equal length). */
export interface DExponentInput {
  /** Rate of penetration, ft/h (> 0; typical 10–200). */
  ropFtPerH: ArrayLike<number>;
  /** Rotary speed, rpm (> 0; typical 60–180). */
  rotaryRpm: ArrayLike<number>;
  /** Weight on bit, lbf (> 0; typical 10,000–50,000). */
  wobLbf: ArrayLike<number>;
  /** Bit diameter, in (> 0; typical 6–17.5). */
  bitIn: ArrayLike<number>;
}

/** Result of {@link dExponent}. */
export interface DExponentResult {
  /** Drilling exponent d (dimensionless), NaN where an input was missing or invalid. */
  d: Float64Array;
  /** Number of samples left NaN because an input was missing, non-positive, or the
   * logarithms' ratio is undefined (12W ≥ 10⁶D or R ≥ 60N). */
  nInvalid: number;
}

/**
 * Drilling exponent d of Jorden & Shirley (1966).
 *
 * d = log10(R/(60N)) / log10(12W/(10⁶D)). Both logarithms are negative in the valid range
 * (R < 60N and 12W < 10⁶D); a sample outside it, or with any NaN or non-positive input,
 * gives NaN and is counted in `nInvalid` (never an exception, since field data has gaps).
 *
 * @param input arrays of equal length (see {@link DExponentInput}); not mutated
 * @returns d per sample and the count of invalid samples
 * @throws ShalepointError E_LENGTH when the arrays differ in length
 * @example dExponent({ ropFtPerH: [30], rotaryRpm: [120], wobLbf: [35000], bitIn: [8.5] }).d[0] // ≈ 1.822
 * Reference: Jorden & Shirley 1966, JPT 18(11), eq. 2.
 */
export function dExponent(input: DExponentInput): DExponentResult {
  const n = input.ropFtPerH.length;
  for (const [name, arr] of Object.entries(input) as [string, ArrayLike<number>][]) {
    if (arr.length !== n) {
      throw new ShalepointError("E_LENGTH", "drilling-data arrays must have the same length", {
        param: name,
        value: `${arr.length} vs ${n}`,
        hint: "Put rate of penetration, rotary speed, weight on bit and bit size on one depth index.",
      });
    }
  }
  const d = new Float64Array(n);
  let nInvalid = 0;
  for (let i = 0; i < n; i++) {
    const R = input.ropFtPerH[i];
    const N = input.rotaryRpm[i];
    const W = input.wobLbf[i];
    const D = input.bitIn[i];
    const num = Math.log10(R / (60 * N));
    const den = Math.log10((12 * W) / (1e6 * D));
    const value = num / den;
    if (R > 0 && N > 0 && W > 0 && D > 0 && num < 0 && den < 0 && Number.isFinite(value)) {
      d[i] = value;
    } else {
      d[i] = NaN;
      nInvalid++;
    }
  }
  return { d, nInvalid };
}

/**
 * Corrected drilling exponent dc of Rehm & McClendon (1971): dc = d · ρn/ρm.
 *
 * @param d drilling exponent per sample (from {@link dExponent})
 * @param normalGradient normal pore-fluid gradient, psi/ft (typical 0.465), scalar or per sample
 * @param mudGradient mud weight or ECD in use as a gradient, psi/ft (typical 0.5–0.9), per sample
 * @returns dc per sample (NaN carried through; NaN where the mud gradient is not positive)
 * @throws ShalepointError E_LENGTH when arrays differ in length; E_RANGE for a non-positive scalar normal gradient
 * @example correctedDExponent([1.204], 0.46753, [0.62338])[0] // ≈ 0.9030 (9.0 and 12.0 ppg as psi/ft)
 * Reference: Rehm & McClendon 1971, SPE-3601.
 */
export function correctedDExponent(
  d: ArrayLike<number>,
  normalGradient: number | ArrayLike<number>,
  mudGradient: ArrayLike<number>,
): Float64Array {
  if (d.length !== mudGradient.length) {
    throw new ShalepointError("E_LENGTH", "d and mud gradient must have the same length", {
      param: "mudGradient",
      value: `${mudGradient.length} vs ${d.length}`,
    });
  }
  if (typeof normalGradient === "number") {
    if (!(normalGradient > 0)) {
      throw new ShalepointError("E_RANGE", "normal gradient must be positive", {
        param: "normalGradient",
        value: normalGradient,
        unit: "psi/ft",
        allowed: "> 0 (typical 0.44–0.465)",
      });
    }
  } else if (normalGradient.length !== d.length) {
    throw new ShalepointError("E_LENGTH", "d and normal gradient must have the same length", {
      param: "normalGradient",
      value: `${normalGradient.length} vs ${d.length}`,
    });
  }
  const out = new Float64Array(d.length);
  for (let i = 0; i < d.length; i++) {
    const rn = typeof normalGradient === "number" ? normalGradient : normalGradient[i];
    const rm = mudGradient[i];
    out[i] = rm > 0 ? (d[i] * rn) / rm : NaN;
  }
  return out;
}
