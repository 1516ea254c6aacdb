/**
 * The designed truth of the three Quillon Basin demo wells (fictional; see the scenario
 * notes in demo-logs/README.md). Every number here is invented for the demo. Depths of the
 * pressure story and beds are TVDSS, ft (below mean sea level, positive down).
 */

/** Rock and fluid parameters shared by the basin (one set, all wells). */
export interface DemoRockParameters {
  /** Shale compaction φ = φ0·exp(−σ/σc): φ0 (fraction), σc (psi), grain density (g/cc). */
  shale: { phi0: number; sigmaCPsi: number; grainGcc: number };
  /** Sand compaction, same law. */
  sand: { phi0: number; sigmaCPsi: number; grainGcc: number };
  /** Bowers 1995 shale velocity: V = v0 + a·σ^b (ft/s, psi); unloading parameter u. */
  bowers: { v0FtPerS: number; a: number; b: number; u: number };
  /** Sand velocity, same form with its own constants: V = v0 + a·σ^b (ft/s, psi). */
  sandVelocity: { v0FtPerS: number; a: number; b: number };
  /** Shale resistivity normal trend Rn = r0·exp(b·Zbml) and the Eaton 1975 exponent. */
  shaleResistivity: { r0OhmM: number; bPerFt: number; eatonExponent: number };
  /** Archie 1942 sand resistivity R = Rw/(φ^m·Sw^n). */
  archie: { rwOhmM: number; m: number; n: number };
  /** Gas: density (g/cc), water saturation in the gas leg, slowness multiplier. */
  gas: { densityGcc: number; waterSaturation: number; slownessFactor: number };
}

/** Basin-wide rock parameters (invented for the demo). */
export const QUILLON_ROCK: DemoRockParameters = {
  shale: { phi0: 0.47, sigmaCPsi: 3500, grainGcc: 2.7 },
  sand: { phi0: 0.38, sigmaCPsi: 5500, grainGcc: 2.65 },
  bowers: { v0FtPerS: 5000, a: 10, b: 0.75, u: 3.5 },
  sandVelocity: { v0FtPerS: 5200, a: 14, b: 0.72 },
  shaleResistivity: { r0OhmM: 0.65, bPerFt: 1.1e-4, eatonExponent: 1.2 },
  archie: { rwOhmM: 0.08, m: 2, n: 2 },
  gas: { densityGcc: 0.22, waterSaturation: 0.25, slownessFactor: 1.1 },
};

/** The pressure story of one well (TVDSS, ft; psi). */
export interface DemoPressureDesign {
  /** Brine (hydrostatic) gradient, psi/ft; Ph = gradient × TVDSS. */
  hydrostaticPsiPerFt: number;
  /** Top of overpressure, TVDSS ft (7,500–10,000). */
  topOverpressureTvdssFt: number;
  /** Growth of effective stress with depth in the undercompacted shale, psi/ft (near 0). */
  undercompactedSigmaRatePsiPerFt: number;
  /** Upper seal: effective stress ramps linearly to `baseSigmaPsi` at its base. */
  upperSeal: { topTvdssFt: number; baseTvdssFt: number; baseSigmaPsi: number };
  /** Lower seal: pressure ramps linearly down to hydrostatic + `regressedExcessPsi`. */
  lowerSeal: { topTvdssFt: number; baseTvdssFt: number };
  /** Overpressure left below the regression, psi (on the brine gradient). */
  regressedExcessPsi: number;
  /** Deep unloading: effective stress falls by `sigmaFallPsiPerFt` below the top. */
  unloading?: { topTvdssFt: number; sigmaFallPsiPerFt: number };
}

/** A sand bed (everything else is shale). */
export interface DemoSandBed {
  name: string;
  topTvdssFt: number;
  baseTvdssFt: number;
  /** Gas–water contact inside the bed, TVDSS ft, when the bed holds gas. */
  gasWaterContactTvdssFt?: number;
}

/** A named formation top (TVDSS ft). */
export interface DemoFormationTop {
  name: string;
  tvdssFt: number;
}

/** A casing shoe and the bit that drilled the hole section ending there. */
export interface DemoHoleSection {
  /** Bit size of the section, in. */
  bitIn: number;
  /** Section base (casing shoe or TD), TVDSS ft. */
  baseTvdssFt: number;
  /** Leak-off test kind below this shoe ("LOT", "FIT"), or none at TD. */
  shoeTest?: "LOT" | "FIT";
}

/** Simple build-and-hold trajectory in a vertical plane (constant azimuth). */
export interface DemoTrajectory {
  kickoffMdFt: number;
  buildDegPer100Ft: number;
  holdIncDeg: number;
  azimuthDeg: number;
  totalDepthMdFt: number;
  /** Survey station spacing, ft. */
  stationStepFt: number;
}

/** Everything that defines one demo well. */
export interface DemoWellDesign {
  slug: string;
  name: string;
  /** Unit system of the well's files. */
  fileUnits: "oilfield" | "metric";
  /** Air gap (rotary table above sea level), ft. */
  airGapFt: number;
  waterDepthFt: number;
  seawaterGcc: number;
  /** TD, ft TVD below rotary table (vertical wells); deviated wells use the trajectory. */
  totalDepthTvdFt: number;
  trajectory?: DemoTrajectory;
  /** First logged depth (GR, DT, resistivity) and first density sample, in the index unit of the file (ft MD/TVD or m). */
  logTopIndex: number;
  densityTopIndex: number;
  pressure: DemoPressureDesign;
  poissonRatio: number;
  sands: DemoSandBed[];
  tops: DemoFormationTop[];
  sections: DemoHoleSection[];
  /** Depth (TVDSS ft) of the kick taken while drilling. */
  kickTvdssFt: number;
}

const FT_PER_M = 1 / 0.3048;

/** Quillon A-1: vertical tutorial well, oilfield units, gas sand in the compartment. */
const QUILLON_A1: DemoWellDesign = {
  slug: "quillon-a1",
  name: "Quillon A-1",
  fileUnits: "oilfield",
  airGapFt: 82,
  waterDepthFt: 4000,
  seawaterGcc: 1.03,
  totalDepthTvdFt: 15000,
  logTopIndex: 4900,
  densityTopIndex: 5600,
  pressure: {
    hydrostaticPsiPerFt: 0.445,
    topOverpressureTvdssFt: 8800,
    undercompactedSigmaRatePsiPerFt: 0.06,
    upperSeal: { topTvdssFt: 11000, baseTvdssFt: 11350, baseSigmaPsi: 1300 },
    lowerSeal: { topTvdssFt: 12600, baseTvdssFt: 12900 },
    regressedExcessPsi: 900,
  },
  poissonRatio: 0.42,
  sands: [
    { name: "Fenwick Sand", topTvdssFt: 5300, baseTvdssFt: 5380 },
    { name: "Fenwick Sand lower", topTvdssFt: 5900, baseTvdssFt: 5950 },
    { name: "Orrin Sand", topTvdssFt: 6600, baseTvdssFt: 6720 },
    { name: "Orrin Sand lower", topTvdssFt: 7400, baseTvdssFt: 7460 },
    { name: "Pellow Sand", topTvdssFt: 8100, baseTvdssFt: 8190 },
    { name: "Brack Sand", topTvdssFt: 9500, baseTvdssFt: 9540 },
    { name: "Brack Sand lower", topTvdssFt: 10300, baseTvdssFt: 10345 },
    { name: "Tarrant Sand", topTvdssFt: 11450, baseTvdssFt: 11700, gasWaterContactTvdssFt: 11580 },
    { name: "Tarrant Sand lower", topTvdssFt: 11900, baseTvdssFt: 12020 },
    { name: "Tarrant Sand basal", topTvdssFt: 12300, baseTvdssFt: 12420 },
    { name: "Corrie Sand", topTvdssFt: 13200, baseTvdssFt: 13320 },
    { name: "Corrie Sand lower", topTvdssFt: 14000, baseTvdssFt: 14150 },
  ],
  tops: [
    { name: "Mudline", tvdssFt: 4000 },
    { name: "Fenwick Formation", tvdssFt: 5200 },
    { name: "Orrin Formation", tvdssFt: 6500 },
    { name: "Pellow Formation", tvdssFt: 8000 },
    { name: "Brack Shale", tvdssFt: 8800 },
    { name: "Hessle Shale (upper seal)", tvdssFt: 11000 },
    { name: "Tarrant Formation", tvdssFt: 11350 },
    { name: "Wyke Shale (lower seal)", tvdssFt: 12600 },
    { name: "Corrie Formation", tvdssFt: 12900 },
  ],
  sections: [
    { bitIn: 17.5, baseTvdssFt: 8300, shoeTest: "LOT" },
    { bitIn: 12.25, baseTvdssFt: 11200, shoeTest: "LOT" },
    { bitIn: 8.5, baseTvdssFt: 12750, shoeTest: "FIT" },
    { bitIn: 6.125, baseTvdssFt: 14918 },
  ],
  kickTvdssFt: 9515,
};

/** Quillon A-2ST: deviated sidetrack from the A-1 slot, the same story shifted 80 ft deeper. */
const SHIFT_FT = 80;
const QUILLON_A2ST: DemoWellDesign = {
  ...QUILLON_A1,
  slug: "quillon-a2st",
  name: "Quillon A-2ST",
  totalDepthTvdFt: NaN,
  trajectory: {
    kickoffMdFt: 5600,
    buildDegPer100Ft: 3,
    holdIncDeg: 45,
    azimuthDeg: 118,
    totalDepthMdFt: 17500,
    stationStepFt: 100,
  },
  logTopIndex: 5700,
  densityTopIndex: 6100,
  pressure: {
    ...QUILLON_A1.pressure,
    topOverpressureTvdssFt: 8800 + SHIFT_FT,
    upperSeal: { topTvdssFt: 11000 + SHIFT_FT, baseTvdssFt: 11350 + SHIFT_FT, baseSigmaPsi: 1350 },
    lowerSeal: { topTvdssFt: 12600 + SHIFT_FT, baseTvdssFt: 12900 + SHIFT_FT },
    regressedExcessPsi: 850,
  },
  sands: QUILLON_A1.sands.map((s) => {
    const { gasWaterContactTvdssFt: _gwc, ...water } = s; // the gas is local to A-1's crest
    return { ...water, topTvdssFt: s.topTvdssFt + SHIFT_FT, baseTvdssFt: s.baseTvdssFt + SHIFT_FT };
  }),
  tops: QUILLON_A1.tops.map((t) => (t.name === "Mudline" ? t : { ...t, tvdssFt: t.tvdssFt + SHIFT_FT })),
  sections: [
    { bitIn: 17.5, baseTvdssFt: 8380, shoeTest: "LOT" },
    { bitIn: 12.25, baseTvdssFt: 11280, shoeTest: "LOT" },
    { bitIn: 8.5, baseTvdssFt: 12830, shoeTest: "FIT" },
    { bitIn: 6.125, baseTvdssFt: Infinity },
  ],
  kickTvdssFt: 9595,
};

/** Marten B-1: vertical, shallower water, metric files, deep unloading zone. */
const MARTEN_B1: DemoWellDesign = {
  slug: "marten-b1",
  name: "Marten B-1",
  fileUnits: "metric",
  airGapFt: 25 * FT_PER_M,
  waterDepthFt: 610 * FT_PER_M,
  seawaterGcc: 1.03,
  totalDepthTvdFt: 4300 * FT_PER_M,
  logTopIndex: 1000, // m
  densityTopIndex: 1150, // m
  pressure: {
    hydrostaticPsiPerFt: 0.44,
    topOverpressureTvdssFt: 7900,
    undercompactedSigmaRatePsiPerFt: 0.05,
    upperSeal: { topTvdssFt: 9700, baseTvdssFt: 10000, baseSigmaPsi: 1400 },
    lowerSeal: { topTvdssFt: 10900, baseTvdssFt: 11200 },
    regressedExcessPsi: 700,
    unloading: { topTvdssFt: 12300, sigmaFallPsiPerFt: 1.0 },
  },
  poissonRatio: 0.4,
  sands: [
    { name: "Sorrel Sand", topTvdssFt: 3700, baseTvdssFt: 3790 },
    { name: "Sorrel Sand lower", topTvdssFt: 4600, baseTvdssFt: 4660 },
    { name: "Lathe Sand", topTvdssFt: 5600, baseTvdssFt: 5720 },
    { name: "Lathe Sand lower", topTvdssFt: 6700, baseTvdssFt: 6770 },
    { name: "Dunmore Sand", topTvdssFt: 8600, baseTvdssFt: 8650 },
    { name: "Kestle Sand", topTvdssFt: 10100, baseTvdssFt: 10260 },
    { name: "Kestle Sand lower", topTvdssFt: 10550, baseTvdssFt: 10680 },
    { name: "Garth Sand", topTvdssFt: 11500, baseTvdssFt: 11600 },
    { name: "Garth Sand lower", topTvdssFt: 12000, baseTvdssFt: 12080 },
    { name: "Rill Sand", topTvdssFt: 13000, baseTvdssFt: 13060 },
  ],
  tops: [
    { name: "Mudline", tvdssFt: 610 * FT_PER_M },
    { name: "Sorrel Formation", tvdssFt: 3600 },
    { name: "Lathe Formation", tvdssFt: 5500 },
    { name: "Dunmore Shale", tvdssFt: 7900 },
    { name: "Ashby Shale (upper seal)", tvdssFt: 9700 },
    { name: "Kestle Formation", tvdssFt: 10000 },
    { name: "Marl Shale (lower seal)", tvdssFt: 10900 },
    { name: "Garth Formation", tvdssFt: 11200 },
    { name: "Rill Shale", tvdssFt: 12300 },
  ],
  sections: [
    { bitIn: 17.5, baseTvdssFt: 7400, shoeTest: "LOT" },
    { bitIn: 12.25, baseTvdssFt: 9900, shoeTest: "LOT" },
    { bitIn: 8.5, baseTvdssFt: 11000, shoeTest: "LOT" },
    { bitIn: 6.125, baseTvdssFt: Infinity },
  ],
  kickTvdssFt: 13020,
};

/** The three demo wells, in the order they are written. */
export const QUILLON_DEMO_WELLS: readonly DemoWellDesign[] = [QUILLON_A1, QUILLON_A2ST, MARTEN_B1];
