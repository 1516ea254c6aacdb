/**
 * Forward model of the demo logs from the designed truth, with field-like imperfections.
 *
 * Shale sonic — Bowers 1995, "Pore pressure estimation from velocity data: accounting for
 * overpressure mechanisms besides undercompaction", *SPE Drilling & Completion* 10(2):89–95
 * (SPE-27488), virgin and unloading relations (forms and parameter ranges from memory):
 *   virgin     V = V0 + A·σ^B                                (V ft/s, σ psi, V0 5000 ft/s)
 *   unloading  V = V0 + A·[σmax·(σ/σmax)^(1/U)]^B
 * Shale resistivity — consistent with Eaton 1975, "The equation for geopressure prediction
 * from well logs", SPE Annual Fall Meeting, SPE-5544 (meeting details from memory), the
 * resistivity form Pp = Sv − (Sv − Ph)(R/Rn)^1.2, with exponent
 * 1.2, about the normal trend Rn = R0·exp(b·Zbml) (Zhang 2011, *Earth-Science Reviews*
 * 108:50–63, exponential resistivity trend): R = Rn·(σv/σn)^(1/1.2), where σn = Sv − Ph and
 * σv is the virgin-curve equivalent of the sonic's effective stress (so resistivity falls with
 * velocity in the unloading zone, as the scenario wants Eaton to under-predict there).
 * Sand resistivity — Archie 1942, *Trans. AIME* 146:54–62, eq. 1 with saturation:
 * R = Rw/(φ^m·Sw^n).
 */
import type { DemoWellDesign } from "./demoWellDesigns.js";
import { demoPathAt } from "./demoTrajectory.js";
import { demoTruthAt, integrateDemoTruth, type DemoTruthColumn, type DemoTruthPoint } from "./truthProfile.js";
import type { DemoRockParameters } from "./demoWellDesigns.js";
import { createSeededRandom } from "./seededRandom.js";

/** The logs of one demo well, on its file index, in internal units (NaN = null). */
export interface DemoWellLogs {
  design: DemoWellDesign;
  column: DemoTruthColumn;
  /** Index in the file's own unit (ft MD/TVD, or m for metric wells). */
  index: Float64Array;
  mdFt: Float64Array;
  tvdFt: Float64Array;
  truth: DemoTruthPoint[];
  grApi: Float64Array;
  dtUsPerFt: Float64Array;
  rhobGcc: Float64Array;
  resOhmM: Float64Array;
  caliIn: Float64Array;
  bitIn: Float64Array;
  /** The noise-free shale/sand response before imperfections (for checks). */
  clean: { dtUsPerFt: Float64Array; rhobGcc: Float64Array; resOhmM: Float64Array };
}

/**
 * Virgin-equivalent effective stress of Bowers' unloading branch: the σ that, put in the
 * virgin curve V = V0 + A·σ^B, gives the unloading velocity. σe = σmax·(σ/σmax)^(1/U) when
 * σ < σmax, else σ (Bowers 1995, SPE-27488, unloading relation; form from memory).
 * @param p truth point; only `sigmaPsi` and `sigmaMaxPsi` (psi) are read
 * @param u Bowers' unloading parameter U (≥ 1; typical 3–8; 1 = virgin curve)
 * @returns σe, psi
 * @example demoSonicStressPsi({ sigmaPsi: 2000, sigmaMaxPsi: 2947 } as DemoTruthPoint, 3.13) // ≈ 2603.7 (→ V 8645 ft/s with A 10, B 0.75)
 */
export function demoSonicStressPsi(p: DemoTruthPoint, u: number): number {
  if (p.sigmaMaxPsi > p.sigmaPsi && p.sigmaMaxPsi > 0) {
    return p.sigmaMaxPsi * Math.pow(Math.max(p.sigmaPsi, 0) / p.sigmaMaxPsi, 1 / u);
  }
  return Math.max(p.sigmaPsi, 0);
}

const round = (x: number, d: number): number => {
  if (!Number.isFinite(x)) return NaN;
  const k = 10 ** d;
  const r = Math.round(x * k) / k;
  return r === 0 ? 0 : r;
};

/** TVD below RT of an index value. */
function depthsOf(d: DemoWellDesign, idx: number): { mdFt: number; tvdFt: number } {
  const mdFt = d.fileUnits === "metric" ? idx / 0.3048 : idx;
  const tvdFt = d.trajectory ? demoPathAt(d.trajectory, mdFt).tvdFt : mdFt;
  return { mdFt, tvdFt };
}

/** Bit size (in) of the hole section at a TVDSS. */
function bitAt(d: DemoWellDesign, tvdss: number): number {
  for (const s of d.sections) if (tvdss <= s.baseTvdssFt) return s.bitIn;
  return d.sections[d.sections.length - 1].bitIn;
}

/**
 * Generate the logs of one demo well (deterministic for a seed).
 *
 * Clean response per sample from the truth (shale: Bowers sonic, Eaton-consistent
 * resistivity, compaction density; sand: its own velocity law, Archie resistivity; gas:
 * slowness × 1.10, gas in the pore fluid), then, from the seeded generator in a fixed order:
 * Gaussian noise (GR 3 API, DT 1.0 µs/ft, RHOB 0.015 g/cc, resistivity 3 % log-normal,
 * caliper 0.05 in), slow GR drift in shale, sonic spikes (cycle skips), washouts (caliper
 * enlarged 1.5–4 in over bit size, density reading low by 0.07 g/cc per inch of enlargement),
 * null gaps at casing points and in single curves, and no density above the density top.
 *
 * @param design well design; @param rock basin rock parameters; @param seed PRNG seed
 * @returns logs in internal units on the file's index, with the truth at each sample
 */
export function generateDemoWellLogs(design: DemoWellDesign, rock: DemoRockParameters, seed: number): DemoWellLogs {
  const metric = design.fileUnits === "metric";
  const step = metric ? 0.1524 : 0.5;
  const decimals = metric ? 4 : 1;
  const stopIndex = design.trajectory ? design.trajectory.totalDepthMdFt : metric ? design.totalDepthTvdFt * 0.3048 : design.totalDepthTvdFt;
  const n = Math.floor((stopIndex - design.logTopIndex) / step + 1e-6) + 1;
  const index = new Float64Array(n);
  const mdFt = new Float64Array(n);
  const tvdFt = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    index[i] = round(design.logTopIndex + i * step, decimals);
    const dd = depthsOf(design, index[i]);
    mdFt[i] = dd.mdFt;
    tvdFt[i] = dd.tvdFt;
  }
  const column = integrateDemoTruth(design, rock, tvdFt[n - 1] - design.airGapFt + 10);
  const truth: DemoTruthPoint[] = new Array(n);
  for (let i = 0; i < n; i++) truth[i] = demoTruthAt(column, tvdFt[i] - design.airGapFt);

  const rng = createSeededRandom(seed);
  const grApi = new Float64Array(n);
  const dt = new Float64Array(n);
  const rhob = new Float64Array(n);
  const res = new Float64Array(n);
  const cali = new Float64Array(n);
  const bit = new Float64Array(n);
  const cleanDt = new Float64Array(n);
  const cleanRhob = new Float64Array(n);
  const cleanRes = new Float64Array(n);
  const b = rock.bowers;
  const rr = rock.shaleResistivity;
  let drift = 0;
  for (let i = 0; i < n; i++) {
    const p = truth[i];
    const zbml = p.tvdssFt - design.waterDepthFt;
    const seal = p.zone === "upper-seal" || p.zone === "lower-seal";
    drift = 0.995 * drift + rng.gaussian(0, 0.6);
    let dtClean: number;
    let resClean: number;
    let grClean: number;
    if (p.lithology === "sand") {
      const sv = rock.sandVelocity;
      dtClean = 1e6 / (sv.v0FtPerS + sv.a * Math.pow(Math.max(p.sigmaMaxPsi, 0), sv.b));
      const sw = p.fluid === "gas" ? rock.gas.waterSaturation : 1;
      if (p.fluid === "gas") dtClean *= rock.gas.slownessFactor;
      const ar = rock.archie;
      resClean = ar.rwOhmM / (Math.pow(p.porosity, ar.m) * Math.pow(sw, ar.n));
      grClean = 40 + 0.3 * drift;
    } else {
      const sVirgin = demoSonicStressPsi(p, b.u);
      dtClean = 1e6 / (b.v0FtPerS + b.a * Math.pow(sVirgin, b.b));
      const rn = rr.r0OhmM * Math.exp(rr.bPerFt * zbml);
      resClean = rn * Math.pow(sVirgin / p.sigmaNormalPsi, 1 / rr.eatonExponent);
      grClean = (seal ? 122 : 108) + drift;
    }
    cleanDt[i] = dtClean;
    cleanRhob[i] = p.densityGcc;
    cleanRes[i] = resClean;
    grApi[i] = Math.max(5, grClean + rng.gaussian(0, 3));
    dt[i] = dtClean + rng.gaussian(0, 1.0);
    rhob[i] = p.densityGcc + rng.gaussian(0, 0.015);
    res[i] = resClean * Math.exp(rng.gaussian(0, 0.03));
    bit[i] = bitAt(design, p.tvdssFt);
    cali[i] = bit[i] + 0.1 + rng.gaussian(0, 0.05);
  }
  // Washouts in shale: a few intervals, caliper enlarged, density reads low.
  const nWash = 6;
  for (let k = 0; k < nWash; k++) {
    const at = rng.integer(Math.floor(n * 0.05), n - 400);
    const len = rng.integer(40, 160);
    const peakIn = 1.5 + 2.5 * rng.uniform();
    for (let j = 0; j < len && at + j < n; j++) {
      const i = at + j;
      if (truth[i].lithology !== "shale") continue;
      const shape = Math.sin((Math.PI * (j + 0.5)) / len);
      const enlarge = peakIn * shape;
      cali[i] += enlarge;
      rhob[i] -= 0.07 * enlarge;
    }
  }
  // Cycle-skip spikes in the sonic and a few GR spikes.
  for (let k = 0; k < 10; k++) {
    const i = rng.integer(0, n - 3);
    const w = rng.integer(1, 3);
    const amp = 20 + 25 * rng.uniform();
    for (let j = 0; j < w; j++) dt[i + j] += amp;
  }
  for (let k = 0; k < 4; k++) grApi[rng.integer(0, n - 1)] += 150 + 50 * rng.uniform();
  // Null gaps: every curve across each casing point (a new logging run), then one gap per curve.
  const gapAll: [number, number][] = [];
  for (const s of design.sections) {
    if (!Number.isFinite(s.baseTvdssFt)) continue;
    const i0 = firstIndexBelowTvdss(truth, s.baseTvdssFt);
    if (i0 < 0) continue;
    gapAll.push([i0 - 20, i0 + 60 + rng.integer(0, 40)]);
  }
  for (const [a, z] of gapAll) for (let i = Math.max(0, a); i < Math.min(n, z); i++) {
    grApi[i] = dt[i] = rhob[i] = res[i] = cali[i] = NaN;
  }
  for (const curve of [dt, res, grApi]) {
    const at = rng.integer(Math.floor(n * 0.1), n - 200);
    const len = rng.integer(30, 120);
    for (let i = at; i < Math.min(n, at + len); i++) curve[i] = NaN;
  }
  // Density only from the density top down.
  for (let i = 0; i < n && index[i] < design.densityTopIndex; i++) rhob[i] = NaN;
  return {
    design, column, index, mdFt, tvdFt, truth,
    grApi, dtUsPerFt: dt, rhobGcc: rhob, resOhmM: res, caliIn: cali, bitIn: bit,
    clean: { dtUsPerFt: cleanDt, rhobGcc: cleanRhob, resOhmM: cleanRes },
  };
}

function firstIndexBelowTvdss(truth: DemoTruthPoint[], tvdss: number): number {
  for (let i = 0; i < truth.length; i++) if (truth[i].tvdssFt >= tvdss) return i;
  return -1;
}

