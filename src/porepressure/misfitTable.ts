/**
 * Measured pore pressures and the misfit table used by every calibration.
 *
 * A measured point sits on the well's depth index (sample `index`): a formation-pressure
 * test in an adjacent sand, a kick EMW converted to pressure, or a connection-gas pick.
 * Differences are predicted − measured, in psi and as equivalent mud weight (ppg, through
 * units' pressureToEmwPpg with 12/231 psi/ft per ppg).
 *
 * Imports: ../errors.js and ../units/index.js.
 */
import { ShalepointError } from "../errors.js";
import { pressureToEmwPpg } from "../units/index.js";

/** One measured pore pressure on the well's depth index. */
export interface PressureObservation {
  /** Sample index in the well's depth index (integer, 0 ≤ index < length). */
  index: number;
  /** Measured pore pressure, psi (e.g. 6850). NaN marks a point to skip. */
  pressurePsi: number;
  /** Relative weight in the fit, > 0 (default 1; e.g. 0.3 for a connection-gas pick). */
  weight?: number;
  /** Free text: what the point is (e.g. "formation test", "kick", "connection gas"). */
  source?: string;
}

/** One row of the misfit table. */
export interface MisfitRow {
  index: number;
  /** TVD below RT, ft. */
  tvdFt: number;
  measuredPsi: number;
  predictedPsi: number;
  /** predicted − measured, psi. */
  differencePsi: number;
  measuredPpg: number;
  predictedPpg: number;
  /** predicted − measured, ppg EMW. */
  differencePpg: number;
  weight: number;
  source: string;
}

/** The misfit table and its summary. */
export interface MisfitTable {
  rows: MisfitRow[];
  /** Root-mean-square of differencePsi over rows with finite values (unweighted), psi. */
  rmsPsi: number;
  /** Root-mean-square of differencePpg over the same rows, ppg. */
  rmsPpg: number;
  /** Rows with a finite difference. */
  n: number;
  /** Rows skipped for a missing prediction or measurement. */
  nSkipped: number;
}

/**
 * Check measured points against a depth index of `length` samples.
 * @throws ShalepointError E_RANGE for a non-integer or out-of-range index or a weight ≤ 0
 */
export function requireObservations(observations: readonly PressureObservation[], length: number): void {
  observations.forEach((o, k) => {
    if (!(Number.isInteger(o.index) && o.index >= 0 && o.index < length)) {
      throw new ShalepointError("E_RANGE", "observation index must be a sample of the well", {
        param: `observations[${k}].index`,
        value: o.index,
        allowed: `integer in [0, ${length - 1}]`,
      });
    }
    if (o.weight !== undefined && !(Number.isFinite(o.weight) && o.weight > 0)) {
      throw new ShalepointError("E_RANGE", "observation weight must be > 0", {
        param: `observations[${k}].weight`,
        value: o.weight,
        allowed: "> 0",
      });
    }
  });
}

/**
 * Misfit table: measured versus predicted pore pressure at each measured point.
 *
 * difference = predicted − measured (psi), and in EMW: P/(D·12/231) (ppg).
 * RMS = sqrt(Σ d² / n) over rows with finite values (unweighted).
 *
 * @param input.tvdFt TVD below RT per sample, ft (> 0 at the points, for EMW)
 * @param input.predictedPsi predicted pore pressure per sample, psi
 * @param input.observations measured points ({@link PressureObservation})
 * @returns {@link MisfitTable}
 * @throws ShalepointError E_LENGTH on length mismatch; E_RANGE for a bad index or weight
 * @example
 * porePressureMisfitTable({ tvdFt: [10000], predictedPsi: [6300],
 *   observations: [{ index: 0, pressurePsi: 6234 }] }).rows[0].differencePpg // 0.12705 ppg (66 psi)
 */
export function porePressureMisfitTable(input: {
  tvdFt: ArrayLike<number>;
  predictedPsi: ArrayLike<number>;
  observations: readonly PressureObservation[];
}): MisfitTable {
  const { tvdFt, predictedPsi, observations } = input;
  if (tvdFt.length !== predictedPsi.length) {
    throw new ShalepointError("E_LENGTH", "tvdFt and predictedPsi must have the same length", {
      param: "tvdFt, predictedPsi",
      value: `${tvdFt.length} vs ${predictedPsi.length}`,
    });
  }
  requireObservations(observations, tvdFt.length);
  const rows: MisfitRow[] = [];
  let s2 = 0;
  let s2ppg = 0;
  let n = 0;
  for (const o of observations) {
    const z = tvdFt[o.index];
    const p = predictedPsi[o.index];
    const m = o.pressurePsi;
    const mPpg = pressureToEmwPpg(m, z);
    const pPpg = pressureToEmwPpg(p, z);
    const row: MisfitRow = {
      index: o.index,
      tvdFt: z,
      measuredPsi: m,
      predictedPsi: p,
      differencePsi: p - m,
      measuredPpg: mPpg,
      predictedPpg: pPpg,
      differencePpg: pPpg - mPpg,
      weight: o.weight ?? 1,
      source: o.source ?? "",
    };
    rows.push(row);
    if (Number.isFinite(row.differencePsi) && Number.isFinite(row.differencePpg)) {
      s2 += row.differencePsi ** 2;
      s2ppg += row.differencePpg ** 2;
      n++;
    }
  }
  return {
    rows,
    rmsPsi: n > 0 ? Math.sqrt(s2 / n) : NaN,
    rmsPpg: n > 0 ? Math.sqrt(s2ppg / n) : NaN,
    n,
    nSkipped: rows.length - n,
  };
}
