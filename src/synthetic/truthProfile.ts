/**
 * Forward model of the designed truth: pore pressure, overburden, effective stress and
 * minimum stress down a well, solved step by step from sea level.
 *
 * Overburden: Sv(z) = ρsw·g·zw + ∫ ρb g dz below the mudline (Zoback 2007, *Reservoir
 * Geomechanics*, Cambridge UP, eq. 1.6). Bulk density from porosity, ρb = φ ρfl + (1−φ) ρma,
 * and porosity from an Athy-style law written in effective stress, φ = φ0·exp(−σmax/σc)
 * (Athy 1930, *AAPG Bulletin* 14(1):1–24, with depth replaced by effective stress). Sv
 * depends on density and density on σ = Sv − Pp, so the column is integrated downward with a
 * predictor–corrector trapezoid step of 0.5 ft. Density follows σmax, the largest effective
 * stress the rock has carried, so it barely changes in an unloading zone.
 *
 * Minimum stress: Eaton 1969, *JPT* 21(10):1353–1360 (SPE-2163), eq. for fracture
 * gradient, written in stresses: Shmin = ν/(1−ν)·(Sv − Pp) + Pp.
 */
import { PSI_PER_FT_PER_GCC } from "../units/index.js";
import type { DemoRockParameters, DemoWellDesign } from "./demoWellDesigns.js";

/** Names of the pressure zones of the story. */
export type DemoZone =
  | "water"
  | "hydrostatic"
  | "undercompacted"
  | "upper-seal"
  | "compartment"
  | "lower-seal"
  | "regressed"
  | "unloading";

/** The truth at one depth. */
export interface DemoTruthPoint {
  tvdssFt: number;
  zone: DemoZone;
  lithology: "sand" | "shale" | "water";
  fluid: "brine" | "gas";
  /** Hydrostatic pressure, psi (brine gradient × TVDSS). */
  phPsi: number;
  ppPsi: number;
  svPsi: number;
  /** Effective vertical stress σ = Sv − Pp, psi. */
  sigmaPsi: number;
  /** Largest past effective stress, psi (= σ except in the unloading zone). */
  sigmaMaxPsi: number;
  /** Normal effective stress Sv − Ph, psi. */
  sigmaNormalPsi: number;
  shminPsi: number;
  porosity: number;
  densityGcc: number;
}

/** The integrated column: Sv on a TVDSS grid and the anchor values of each zone. */
export interface DemoTruthColumn {
  design: DemoWellDesign;
  rock: DemoRockParameters;
  mudlineTvdssFt: number;
  stepFt: number;
  /** Sv at mudline + i·stepFt, psi. */
  svPsi: Float64Array;
  anchors: DemoAnchors;
}

/** Values fixed where the integration first reaches each zone top. */
export interface DemoAnchors {
  sigmaTopOverpressurePsi: number;
  sigmaUpperSealTopPsi: number;
  ppCompartmentTopPsi: number;
  ppLowerSealTopPsi: number;
  sigmaMaxUnloadingPsi: number;
}

const G = PSI_PER_FT_PER_GCC;

function zoneAt(d: DemoWellDesign, z: number, mudline: number): DemoZone {
  const p = d.pressure;
  if (z < mudline) return "water";
  if (z < p.topOverpressureTvdssFt) return "hydrostatic";
  if (z < p.upperSeal.topTvdssFt) return "undercompacted";
  if (z < p.upperSeal.baseTvdssFt) return "upper-seal";
  if (z < p.lowerSeal.topTvdssFt) return "compartment";
  if (z < p.lowerSeal.baseTvdssFt) return "lower-seal";
  if (p.unloading === undefined || z < p.unloading.topTvdssFt) return "regressed";
  return "unloading";
}

/** Sand bed at a TVDSS, if any. */
function sandAt(d: DemoWellDesign, z: number) {
  for (const s of d.sands) if (z >= s.topTvdssFt && z < s.baseTvdssFt) return s;
  return undefined;
}

/** Brine pore pressure of the zone (no gas), given Sv at that depth. */
function brinePressure(d: DemoWellDesign, zone: DemoZone, z: number, sv: number, a: DemoAnchors): number {
  const p = d.pressure;
  const gh = p.hydrostaticPsiPerFt;
  switch (zone) {
    case "water":
      return d.seawaterGcc * G * z;
    case "hydrostatic":
      return gh * z;
    case "undercompacted":
      return sv - (a.sigmaTopOverpressurePsi + p.undercompactedSigmaRatePsiPerFt * (z - p.topOverpressureTvdssFt));
    case "upper-seal": {
      const f = (z - p.upperSeal.topTvdssFt) / (p.upperSeal.baseTvdssFt - p.upperSeal.topTvdssFt);
      return sv - (a.sigmaUpperSealTopPsi + f * (p.upperSeal.baseSigmaPsi - a.sigmaUpperSealTopPsi));
    }
    case "compartment":
      return a.ppCompartmentTopPsi + gh * (z - p.upperSeal.baseTvdssFt);
    case "lower-seal": {
      const f = (z - p.lowerSeal.topTvdssFt) / (p.lowerSeal.baseTvdssFt - p.lowerSeal.topTvdssFt);
      const target = gh * p.lowerSeal.baseTvdssFt + p.regressedExcessPsi;
      return a.ppLowerSealTopPsi + f * (target - a.ppLowerSealTopPsi);
    }
    case "regressed":
      return gh * z + p.regressedExcessPsi;
    case "unloading": {
      const u = p.unloading!;
      return sv - (a.sigmaMaxUnloadingPsi - u.sigmaFallPsiPerFt * (z - u.topTvdssFt));
    }
  }
}

/** The full truth state at one TVDSS given Sv there. */
function stateAt(col: Omit<DemoTruthColumn, "svPsi">, z: number, sv: number): DemoTruthPoint {
  const { design: d, rock, anchors: a } = col;
  const zone = zoneAt(d, z, col.mudlineTvdssFt);
  const gh = d.pressure.hydrostaticPsiPerFt;
  const ph = gh * z;
  if (zone === "water") {
    const pw = d.seawaterGcc * G * z;
    return {
      tvdssFt: z, zone, lithology: "water", fluid: "brine", phPsi: ph, ppPsi: pw, svPsi: pw,
      sigmaPsi: 0, sigmaMaxPsi: 0, sigmaNormalPsi: 0, shminPsi: pw, porosity: 1, densityGcc: d.seawaterGcc,
    };
  }
  const sand = sandAt(d, z);
  let pp = brinePressure(d, zone, z, sv, a);
  let fluid: "brine" | "gas" = "brine";
  if (sand?.gasWaterContactTvdssFt !== undefined && z < sand.gasWaterContactTvdssFt) {
    // Gas leg: the gas column hangs from the water pressure at the contact.
    const zc = sand.gasWaterContactTvdssFt;
    const pc = brinePressure(d, zone, zc, sv, a); // compartment: independent of sv
    pp = pc - rock.gas.densityGcc * G * (zc - z);
    fluid = "gas";
  }
  const sigma = sv - pp;
  const sigmaMax = zone === "unloading" ? a.sigmaMaxUnloadingPsi : sigma;
  const rhoBrine = gh / G;
  const law = sand ? rock.sand : rock.shale;
  const porosity = law.phi0 * Math.exp(-Math.max(sigmaMax, 0) / law.sigmaCPsi);
  const sw = fluid === "gas" ? rock.gas.waterSaturation : 1;
  const rhoFluid = sw * rhoBrine + (1 - sw) * rock.gas.densityGcc;
  const density = porosity * rhoFluid + (1 - porosity) * law.grainGcc;
  const nu = d.poissonRatio;
  return {
    tvdssFt: z, zone, lithology: sand ? "sand" : "shale", fluid, phPsi: ph, ppPsi: pp, svPsi: sv,
    sigmaPsi: sigma, sigmaMaxPsi: sigmaMax, sigmaNormalPsi: sv - ph,
    shminPsi: (nu / (1 - nu)) * sigma + pp, porosity, densityGcc: density,
  };
}

/** Zone tops in order, with the anchor each one fixes from the state just above it. */
function anchorAt(col: Omit<DemoTruthColumn, "svPsi">, name: keyof DemoAnchors, zTop: number, sv: number): void {
  const above = stateAt(col, zTop - 1e-9, sv);
  switch (name) {
    case "sigmaTopOverpressurePsi":
    case "sigmaUpperSealTopPsi":
    case "sigmaMaxUnloadingPsi":
      col.anchors[name] = sv - brinePressure(col.design, above.zone, zTop, sv, col.anchors);
      break;
    default:
      col.anchors[name] = brinePressure(col.design, above.zone, zTop, sv, col.anchors);
  }
}

/**
 * Integrate the designed truth column of one demo well from the mudline to `bottomTvdssFt`.
 *
 * Overburden by the trapezoid rule, Sv(z+h) = Sv(z) + g·h·(ρ(z) + ρ(z+h))/2, with ρ(z+h)
 * from a predicted Sv (predictor–corrector); g = 0.43353 psi/ft per g/cc. Zone anchors
 * (σ at the top of overpressure, pressure at the compartment top…) are fixed where the
 * integration reaches each zone top, from the zone above, so pressure is continuous.
 *
 * @param design the well design (see demoWellDesigns.ts)
 * @param rock basin rock parameters
 * @param bottomTvdssFt deepest TVDSS needed, ft (typical 15,000)
 * @returns the integrated column; evaluate it with {@link demoTruthAt}
 * @example integrateDemoTruth(QUILLON_DEMO_WELLS[0], QUILLON_ROCK, 15000).anchors.sigmaTopOverpressurePsi // ≈ 1896 psi
 */
export function integrateDemoTruth(design: DemoWellDesign, rock: DemoRockParameters, bottomTvdssFt: number): DemoTruthColumn {
  const stepFt = 0.5;
  const mudline = design.waterDepthFt;
  const n = Math.ceil((bottomTvdssFt - mudline) / stepFt) + 2;
  const svPsi = new Float64Array(n);
  const col: DemoTruthColumn = {
    design, rock, mudlineTvdssFt: mudline, stepFt, svPsi,
    anchors: {
      sigmaTopOverpressurePsi: NaN, sigmaUpperSealTopPsi: NaN, ppCompartmentTopPsi: NaN,
      ppLowerSealTopPsi: NaN, sigmaMaxUnloadingPsi: NaN,
    },
  };
  const p = design.pressure;
  const tops: [keyof DemoAnchors, number][] = [
    ["sigmaTopOverpressurePsi", p.topOverpressureTvdssFt],
    ["sigmaUpperSealTopPsi", p.upperSeal.topTvdssFt],
    ["ppCompartmentTopPsi", p.upperSeal.baseTvdssFt],
    ["ppLowerSealTopPsi", p.lowerSeal.topTvdssFt],
  ];
  if (p.unloading) tops.push(["sigmaMaxUnloadingPsi", p.unloading.topTvdssFt]);
  let next = 0;
  svPsi[0] = design.seawaterGcc * G * mudline;
  let rhoPrev = stateAt(col, mudline, svPsi[0]).densityGcc;
  for (let i = 1; i < n; i++) {
    const z0 = mudline + (i - 1) * stepFt;
    const z1 = z0 + stepFt;
    while (next < tops.length && tops[next][1] <= z1) {
      const [name, zTop] = tops[next];
      anchorAt(col, name, zTop, svPsi[i - 1] + G * rhoPrev * (zTop - z0));
      next++;
    }
    const svPred = svPsi[i - 1] + G * rhoPrev * stepFt;
    const rhoPred = stateAt(col, z1, svPred).densityGcc;
    const svCorr = svPsi[i - 1] + (G * stepFt * (rhoPrev + rhoPred)) / 2;
    const rho1 = stateAt(col, z1, svCorr).densityGcc;
    svPsi[i] = svPsi[i - 1] + (G * stepFt * (rhoPrev + rho1)) / 2;
    rhoPrev = rho1;
  }
  return col;
}

/**
 * The truth at one TVDSS: Sv interpolated linearly on the integration grid, everything
 * else from the zone rules at that exact depth.
 * @param col column from {@link integrateDemoTruth}
 * @param tvdssFt depth below sea level, ft (≥ 0)
 * @returns the truth point (psi, g/cc, fraction); above the mudline, the seawater column
 * @example demoTruthAt(integrateDemoTruth(QUILLON_DEMO_WELLS[0], QUILLON_ROCK, 15000), 6000).ppPsi // 2670 (0.445 × 6000)
 */
export function demoTruthAt(col: DemoTruthColumn, tvdssFt: number): DemoTruthPoint {
  if (tvdssFt < col.mudlineTvdssFt) return stateAt(col, tvdssFt, NaN);
  const x = (tvdssFt - col.mudlineTvdssFt) / col.stepFt;
  const i = Math.min(Math.floor(x), col.svPsi.length - 2);
  const f = x - i;
  const sv = col.svPsi[i] * (1 - f) + col.svPsi[i + 1] * f;
  return stateAt(col, tvdssFt, sv);
}
