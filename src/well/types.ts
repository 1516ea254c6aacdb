/**
 * The well model shared by every stage: datums, a depth index and curves on it.
 *
 * Depth references (all in ft, internal units, positive downward):
 * - **MD**: measured depth along hole from the rotary table (RT).
 * - **TVD**: true vertical depth below the rotary table. The core's working depth.
 * - **TVDSS**: TVD below mean sea level = TVD − rtElevationFt.
 * - **BML**: depth below mudline (offshore) or below ground level (onshore)
 *   = TVDSS − waterDepthFt offshore; TVD − (rtElevationFt − groundLevelFt) onshore.
 *
 * A curve is a `Float64Array` aligned to the well's depth index; a missing value is NaN.
 */
import type { UnitId } from "../units/index.js";

/** Elevations and water depth that tie depths to sea level and the mudline. */
export interface Datums {
  /**
   * Rotary-table elevation above mean sea level, ft. Offshore this is the air gap
   * (Quillon wells: 82 ft); onshore, the kelly-bushing elevation. Typical 20–120 ft.
   */
  rtElevationFt: number;
  /** Water depth (sea level to mudline), ft; 0 onshore. Typical 0–10,000 ft. */
  waterDepthFt: number;
  /** Ground-level elevation above sea level, ft, onshore only (waterDepthFt = 0). */
  groundLevelFt?: number;
  /** Seawater density, g/cc (typical 1.03). Used for the water column in overburden. */
  seawaterDensityGcc: number;
}

/** One log curve, in internal units. */
export interface Curve {
  /** Mnemonic as in the file, e.g. `DT`, `RHOB`, `RES_DEEP`. */
  mnemonic: string;
  /** Internal unit of the values (see units/index.ts). */
  unit: UnitId;
  /** Free text from the file's curve description. */
  description: string;
  /** Values aligned to the well's depth index; NaN = missing. */
  values: Float64Array;
}

/** One directional survey station. */
export interface SurveyStation {
  /** Measured depth, ft. */
  mdFt: number;
  /** Inclination from vertical, degrees, [0, 180]. */
  incDeg: number;
  /** Azimuth from north, degrees, [0, 360). */
  aziDeg: number;
}

/** A well: datums, depth index and curves. */
export interface Well {
  /** Well name, from the file (free text: escape before showing in HTML). */
  name: string;
  datums: Datums;
  /** Measured depth of each sample, ft, increasing. */
  mdFt: Float64Array;
  /** True vertical depth below RT of each sample, ft, non-decreasing. */
  tvdFt: Float64Array;
  /** Curves keyed by the role shalepoint uses (see {@link CurveRole}) or by mnemonic. */
  curves: Record<string, Curve>;
  /** Directional survey if the well is deviated; absent for a vertical well. */
  survey?: SurveyStation[];
  /** Free-form header facts from the file (company, field, location, hydrostatic basis…). */
  header: Record<string, string>;
}

/**
 * Roles the pore-pressure stages look curves up by. A loader maps file mnemonics to
 * roles (e.g. `DT`, `DTC`, `AC` → `slowness`).
 */
export type CurveRole = "gammaRay" | "slowness" | "density" | "resistivity" | "caliper" | "bitSize";
