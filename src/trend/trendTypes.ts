/**
 * Shared shapes of normal compaction trends (NCT). A trend is plain data, so it
 * serialises to JSON as is (see io/trendFile.ts): `{ kind, segments }`, each segment
 * `{ topBmlFt, params, fittedOn }`. All depths are below the mudline (`bmlFt`, ft).
 */

/** Trend models: see sonicExponentialTrend.ts, sonicLogLinearTrend.ts, resistivityLogLinearTrend.ts. */
export type CompactionTrendKind = "sonicExponential" | "sonicLogLinear" | "resistivityLogLinear";

/** Δtn(Z) = Δtm + (Δtml − Δtm)·e^(−cZ) (Zhang 2011). */
export interface SonicExponentialParams {
  /** Matrix (zero-porosity) slowness Δtm, µs/ft; range (40, 90); typical 65. */
  dtMatrixUsPerFt: number;
  /** Slowness at the mudline Δtml, µs/ft; range (Δtm, 250); typical 200. */
  dtMudlineUsPerFt: number;
  /** Decay constant c, 1/ft; range [0, 2e-3]; typical 3e-4. */
  decayPerFt: number;
}

/** log10 Δtn(Z) = log10 Δtml + s·Z (Hottman & Johnson 1965). */
export interface SonicLogLinearParams {
  /** Slowness at the mudline, µs/ft; typical 160. */
  dtMudlineUsPerFt: number;
  /** Slope s of log10(Δt) per ft (negative when compacting); typical −2.2e-5. */
  log10SlopePerFt: number;
}

/** Rn(Z) = R0·e^(bZ) (Zhang 2011). */
export interface ResistivityLogLinearParams {
  /** Resistivity at the mudline R0, ohm·m; typical 0.8. */
  r0OhmM: number;
  /** Growth constant b, 1/ft (positive when compacting); typical 1e-4. */
  growthPerFt: number;
}

/** Parameters by trend kind. */
export interface TrendParamsByKind {
  sonicExponential: SonicExponentialParams;
  sonicLogLinear: SonicLogLinearParams;
  resistivityLogLinear: ResistivityLogLinearParams;
}

/** A depth interval below the mudline, ft, top < base. */
export interface BmlInterval {
  topBmlFt: number;
  baseBmlFt: number;
}

/** Fit method. */
export type TrendFitMethod = "leastSquares" | "huber";

/** What a segment was fitted on (JSON-safe: null where a number is undefined). */
export interface TrendFitRecord {
  method: TrendFitMethod;
  /** Depth intervals the user picked. */
  intervals: BmlInterval[];
  /** Number of shale points used. */
  n: number;
  /** Coefficient of determination in the linearised space, or null. */
  rSquared: number | null;
  /** Residual standard deviation in the linearised space, or null. */
  residualStd: number | null;
  /** Depth span of the points used. */
  depthRange: BmlInterval;
}

/** One trend segment: applies from `topBmlFt` down to the next segment's top. */
export interface TrendSegment<K extends CompactionTrendKind = CompactionTrendKind> {
  /** Top of the segment, ft below mudline. The first segment also applies above its top. */
  topBmlFt: number;
  params: TrendParamsByKind[K];
  /** How it was fitted; null for a trend entered by hand. */
  fittedOn: TrendFitRecord | null;
}

/** A piecewise normal compaction trend of one kind, segments ordered by depth. */
export type CompactionTrend = {
  [K in CompactionTrendKind]: { kind: K; segments: TrendSegment<K>[] };
}[CompactionTrendKind];
