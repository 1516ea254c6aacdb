/**
 * Eaton's ratio method: pore pressure from the ratio of an observed shale log to its
 * normal compaction trend.
 *
 * Reference: Eaton, B.A., 1975, "The equation for geopressure prediction from well logs",
 * SPE-5544, Fall Meeting of the Society of Petroleum Engineers of AIME (meeting details from
 * memory). Written in gradients there: Pp/D = S/D − (S/D − Pn/D)·(ratio)^n. Multiplying by
 * D gives the stress form used here, Pp = Sv − (Sv − Ph)·ratio^n, which holds sample by
 * sample. Exponents 3.0 (sonic), 1.2 (resistivity, corrected d-exponent) as tabulated in
 * Lyons, W.C. (ed.), 2001, Standard Handbook of Petroleum & Natural Gas Engineering,
 * vol. 1, eq. 4-251.
 *
 * Imports: ../errors.js and the sibling porePressureFlags.ts.
 */
import { ShalepointError } from "../errors.js";
import {
  PP_FLAG_BELOW_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_OUTSIDE_CALIBRATION,
  checkLimitOptions,
  flagWarnings,
  requireLengths,
  type PorePressureLimitOptions,
  type PorePressureResult,
} from "./porePressureFlags.js";

/** Eaton (1975) exponent for sonic slowness, ratio Δtn/Δt. */
export const EATON_SONIC_EXPONENT = 3.0;
/** Eaton (1975) exponent for resistivity, ratio Ro/Rn. */
export const EATON_RESISTIVITY_EXPONENT = 1.2;
/** Eaton (1975) exponent for the corrected d-exponent, ratio dco/dcn. */
export const EATON_DEXPONENT_EXPONENT = 1.2;

/** Which log an Eaton ratio is built from. */
export type EatonLog = "sonic" | "resistivity" | "dexponent";

/** Inputs shared by the Eaton variants. */
export interface EatonStressInputs extends PorePressureLimitOptions {
  /** Vertical stress (overburden) per sample, psi; typical 0.9–1.05 psi/ft × depth. */
  overburdenPsi: ArrayLike<number>;
  /** Normal (hydrostatic) pore pressure per sample, psi; typical 0.44–0.465 psi/ft × depth. */
  hydrostaticPsi: ArrayLike<number>;
}

function requireExponent(exponent: number): void {
  if (!(Number.isFinite(exponent) && exponent > 0)) {
    throw new ShalepointError("E_RANGE", "Eaton exponent must be a finite number > 0", {
      param: "exponent",
      value: exponent,
      allowed: "> 0 (published 3.0 sonic, 1.2 resistivity and d-exponent)",
      hint: "Calibrate the exponent with calibrateEatonExponent or use the published default.",
    });
  }
}

/**
 * Eaton pore pressure from a ratio (generic form).
 *
 * Pp = Sv − (Sv − Ph) · ratio^n, sample by sample. ratio < 1 means undercompacted
 * (overpressured) shale; ratio = 1 gives Ph exactly; ratio → 0 gives Sv.
 *
 * Missing data: a NaN in any input, or ratio ≤ 0, gives NaN with PP_FLAG_MISSING_INPUT.
 * Pp > Sv (only possible when Sv < Ph in the inputs) is clipped to Sv and flagged; Pp < Ph
 * (ratio > 1) is flagged and kept unless `floorAtHydrostatic`.
 *
 * @param input.overburdenPsi Sv, psi (e.g. 10,000 at 10,000 ft)
 * @param input.hydrostaticPsi Ph, psi (e.g. 4650 at 10,000 ft)
 * @param input.ratio dimensionless ratio (> 0, typical 0.5–1.1): Δtn/Δt, Ro/Rn or dco/dcn
 * @param input.exponent Eaton exponent n (> 0; typical 3.0 sonic, 1.2 resistivity)
 * @returns ppPsi (psi), flags, warnings
 * @throws ShalepointError E_RANGE when exponent ≤ 0 or not finite; E_LENGTH on length mismatch
 * @example
 * eatonPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [10000 / 12000], exponent: 3 }).ppPsi[0]
 * // 6903.9 (0.6904 psi/ft at 10,000 ft)
 * @see Eaton 1975, SPE-5544, the Eaton equation (stress form); Lyons 2001, eq. 4-251
 */
export function eatonPorePressure(input: EatonStressInputs & { ratio: ArrayLike<number>; exponent: number }): PorePressureResult {
  const { overburdenPsi, hydrostaticPsi, ratio, exponent } = input;
  requireExponent(exponent);
  const n = ratio.length;
  requireLengths(n, { overburdenPsi, hydrostaticPsi, ratio });
  checkLimitOptions(n, input);
  const pp = new Float64Array(n);
  const flags = new Uint8Array(n);
  // r^n for r > 0: r·r·r for the published sonic n = 3, exp(n·ln r) otherwise. Both are
  // several times faster than Math.pow and agree with it to a few units in the last place
  // (relative ≲ (1 + n·|ln r|)·2.2e-16, i.e. below 1e-11 psi on Pp for r in (0.2, 5)).
  const cube = exponent === 3;
  // The limits of finishPorePressure (same tests, same order) are applied in the same pass.
  const floor = input.floorAtHydrostatic === true;
  const range = input.calibratedRangeTvdFt;
  const tvd = input.tvdFt;
  const checkRange = range !== undefined && tvd !== undefined;
  const topFt = range?.topFt ?? NaN;
  const baseFt = range?.baseFt ?? NaN;
  for (let i = 0; i < n; i++) {
    const sv = overburdenPsi[i];
    const ph = hydrostaticPsi[i];
    const r = ratio[i];
    if (!(Number.isFinite(sv) && Number.isFinite(ph) && Number.isFinite(r) && r > 0)) {
      pp[i] = NaN;
      flags[i] = PP_FLAG_MISSING_INPUT;
      continue;
    }
    const rn = cube ? r * r * r : Math.exp(exponent * Math.log(r));
    let p = sv - (sv - ph) * rn;
    if (Number.isNaN(p)) {
      // e.g. rn = ∞ with Sv = Ph: missing, as finishPorePressure flags a NaN raw value.
      pp[i] = NaN;
      flags[i] = PP_FLAG_MISSING_INPUT;
      continue;
    }
    let f = 0;
    if (p > sv) {
      p = sv;
      f = PP_FLAG_CLIPPED_AT_OVERBURDEN;
    }
    if (p < ph) {
      f |= PP_FLAG_BELOW_HYDROSTATIC;
      if (floor) {
        p = ph;
        f |= PP_FLAG_CLIPPED_AT_HYDROSTATIC;
      }
    }
    if (checkRange) {
      const z = tvd[i];
      if (!(z >= topFt && z <= baseFt)) f |= PP_FLAG_OUTSIDE_CALIBRATION;
    }
    flags[i] = f;
    pp[i] = p;
  }
  return { ppPsi: pp, flags, warnings: flagWarnings(flags, tvd, "Eaton") };
}

/**
 * Eaton ratio from an observed log and its normal trend, oriented so that ratio < 1 in
 * overpressured (undercompacted) shale.
 *
 * sonic: Δtn/Δt (trend over observed; slowness rises in overpressure);
 * resistivity: Ro/Rn (observed over trend); dexponent: dco/dcn (observed over trend).
 * NaN or non-positive values give NaN.
 *
 * @param input.log which log: "sonic" (µs/ft), "resistivity" (ohm.m) or "dexponent" (dimensionless)
 * @param input.observed observed shale values, in the log's unit (e.g. 120 µs/ft)
 * @param input.trend normal compaction trend on the same depth index, same unit (e.g. 100 µs/ft)
 * @returns new Float64Array of ratios (dimensionless)
 * @throws ShalepointError E_LENGTH on length mismatch
 * @example eatonRatio({ log: "sonic", observed: [120], trend: [100] }) // Float64Array [0.8333]
 * @see Eaton 1975, SPE-5544
 */
export function eatonRatio(input: { log: EatonLog; observed: ArrayLike<number>; trend: ArrayLike<number> }): Float64Array {
  const { log, observed, trend } = input;
  requireLengths(observed.length, { observed, trend });
  if (log !== "sonic" && log !== "resistivity" && log !== "dexponent") {
    throw new ShalepointError("E_RANGE", "log must be sonic, resistivity or dexponent", {
      param: "log",
      value: log,
      allowed: "sonic | resistivity | dexponent",
    });
  }
  const n = observed.length;
  const out = new Float64Array(n);
  // The log kind is tested once, not per sample.
  if (log === "sonic") {
    for (let i = 0; i < n; i++) {
      const o = observed[i];
      const t = trend[i];
      out[i] = o > 0 && t > 0 ? t / o : NaN;
    }
  } else {
    for (let i = 0; i < n; i++) {
      const o = observed[i];
      const t = trend[i];
      out[i] = o > 0 && t > 0 ? o / t : NaN;
    }
  }
  return out;
}

/**
 * Eaton pore pressure from sonic slowness.
 *
 * Pp = Sv − (Sv − Ph)·(Δtn/Δt)^n, default n = 3.0.
 *
 * @param input.dtUsPerFt observed shale slowness, µs/ft (typical 60–200, e.g. 120)
 * @param input.dtTrendUsPerFt normal-compaction-trend slowness, µs/ft (e.g. 100)
 * @param input.exponent n (> 0), default {@link EATON_SONIC_EXPONENT} = 3.0
 * @returns ppPsi (psi), flags, warnings
 * @throws ShalepointError E_RANGE (exponent ≤ 0), E_LENGTH (length mismatch)
 * @example
 * eatonSonicPorePressure({ overburdenPsi: [66e6 / 6894.757], hydrostaticPsi: [30e6 / 6894.757],
 *   dtUsPerFt: [120], dtTrendUsPerFt: [100] }).ppPsi[0] // 6550.8 psi = 45.17 MPa
 * @see Eaton 1975, SPE-5544 (sonic form, exponent 3.0); Lyons 2001, eq. 4-251
 */
export function eatonSonicPorePressure(
  input: EatonStressInputs & { dtUsPerFt: ArrayLike<number>; dtTrendUsPerFt: ArrayLike<number>; exponent?: number },
): PorePressureResult {
  const ratio = eatonRatio({ log: "sonic", observed: input.dtUsPerFt, trend: input.dtTrendUsPerFt });
  return eatonPorePressure({ ...input, ratio, exponent: input.exponent ?? EATON_SONIC_EXPONENT });
}

/**
 * Eaton pore pressure from shale resistivity.
 *
 * Pp = Sv − (Sv − Ph)·(Ro/Rn)^n, default n = 1.2.
 *
 * @param input.resistivityOhmM observed shale resistivity, ohm.m (typical 0.3–5, e.g. 1.2)
 * @param input.resistivityTrendOhmM normal-trend resistivity, ohm.m (e.g. 2.0)
 * @param input.exponent n (> 0), default {@link EATON_RESISTIVITY_EXPONENT} = 1.2
 * @returns ppPsi (psi), flags, warnings
 * @throws ShalepointError E_RANGE (exponent ≤ 0), E_LENGTH (length mismatch)
 * @example
 * eatonResistivityPorePressure({ overburdenPsi: [10000], hydrostaticPsi: [4650],
 *   resistivityOhmM: [1.2], resistivityTrendOhmM: [2.0] }).ppPsi[0] // 7101.8 (0.7102 psi/ft)
 * @see Eaton 1975, SPE-5544 (resistivity form, exponent 1.2); Lyons 2001, eq. 4-251
 */
export function eatonResistivityPorePressure(
  input: EatonStressInputs & { resistivityOhmM: ArrayLike<number>; resistivityTrendOhmM: ArrayLike<number>; exponent?: number },
): PorePressureResult {
  const ratio = eatonRatio({ log: "resistivity", observed: input.resistivityOhmM, trend: input.resistivityTrendOhmM });
  return eatonPorePressure({ ...input, ratio, exponent: input.exponent ?? EATON_RESISTIVITY_EXPONENT });
}

/**
 * Eaton pore pressure from the corrected d-exponent.
 *
 * Pp = Sv − (Sv − Ph)·(dco/dcn)^n, default n = 1.2.
 *
 * @param input.dcObserved observed corrected d-exponent, dimensionless (typical 0.8–2.5, e.g. 1.75)
 * @param input.dcTrend normal-trend corrected d-exponent, dimensionless (e.g. 1.85)
 * @param input.exponent n (> 0), default {@link EATON_DEXPONENT_EXPONENT} = 1.2
 * @returns ppPsi (psi), flags, warnings
 * @throws ShalepointError E_RANGE (exponent ≤ 0), E_LENGTH (length mismatch)
 * @example
 * eatonDexponentPorePressure({ overburdenPsi: [10400], hydrostaticPsi: [4520],
 *   dcObserved: [1.75], dcTrend: [1.85] }).ppPsi[0] // 4899.3 (0.4899 psi/ft at 10,000 ft)
 * @see Eaton 1975, SPE-5544 (d-exponent form, exponent 1.2); Lyons 2001, eq. 4-251
 */
export function eatonDexponentPorePressure(
  input: EatonStressInputs & { dcObserved: ArrayLike<number>; dcTrend: ArrayLike<number>; exponent?: number },
): PorePressureResult {
  const ratio = eatonRatio({ log: "dexponent", observed: input.dcObserved, trend: input.dcTrend });
  return eatonPorePressure({ ...input, ratio, exponent: input.exponent ?? EATON_DEXPONENT_EXPONENT });
}
