/**
 * Seeded generator of benchmark wells (fictional Quillon Basin, invented data only).
 *
 * A vertical offshore well (air gap 82 ft, water 4000 ft, seawater 1.03 g/cc, brine
 * 0.445 psi/ft) logged from 5000 to 15,000 ft TVD with any number of samples, so the same
 * geology can be sampled at 40,000 or 200,000 points. The forward model is deliberately
 * simple (it exists to give the stages realistic work, not to test them):
 * - sediment density ρ(z) = 2.55 − 0.65·exp(−z_bml/4500) g/cc; Sv integrated from it;
 * - pore pressure hydrostatic to 8800 ft TVDSS, then the effective stress grows only
 *   0.05 psi/ft (disequilibrium compaction);
 * - shale velocity from Bowers (1995, SPE Drilling & Completion 10(2), virgin curve
 *   V = 5000 + A·σ^B with A 10, B 0.75), sand 12 % faster; density from Gardner et al.
 *   (1974, Geophysics 39(6), ρ = 0.23·V^0.25); resistivity Eaton-consistent (exponent 1.2)
 *   about an exponential normal trend 0.8·exp(1e-4·z_bml) ohm·m;
 * - GR beds 5–60 ft thick (shale ≈ 105 API, sand ≈ 45 API), Gaussian noise, 0.1 % spikes,
 *   washouts (caliper + 2 in, density low) and a few null gaps.
 * Mulberry32 PRNG with a fixed seed: every run sees the same well.
 */

const RT_FT = 82;
const WATER_FT = 4000;
const SEAWATER_GCC = 1.03;
const HYDRO_PSI_PER_FT = 0.445;
const PSI_PER_FT_PER_GCC = 0.43353;
const TOP_LOG_FT = 5000;
const BASE_LOG_FT = 15000;

/** Mulberry32: small seeded uniform generator on [0, 1). */
export function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function gaussian(rand) {
  let u = 0;
  while (u === 0) u = rand();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
}

export const BENCH_DATUMS = Object.freeze({ rtElevationFt: RT_FT, waterDepthFt: WATER_FT, seawaterDensityGcc: SEAWATER_GCC });

/**
 * Build one benchmark well in memory.
 * @param {{ samples: number, seed?: number }} args
 * @returns {{ well: object, truth: { ppPsi: Float64Array, svPsi: Float64Array, hydrostaticPsi: Float64Array }, las: object, survey: object[] }}
 */
export function generateBenchWell({ samples, seed = 20261201 }) {
  const n = samples;
  const rand = mulberry32(seed);
  const stepFt = (BASE_LOG_FT - TOP_LOG_FT) / (n - 1);
  const tvdFt = new Float64Array(n);
  const svPsi = new Float64Array(n);
  const ppPsi = new Float64Array(n);
  const hydrostaticPsi = new Float64Array(n);
  const gr = new Float64Array(n);
  const dt = new Float64Array(n);
  const rhob = new Float64Array(n);
  const res = new Float64Array(n);
  const cali = new Float64Array(n);
  const bit = new Float64Array(n);

  const mudlineTvd = RT_FT + WATER_FT;
  const densityAt = (bml) => 2.55 - 0.65 * Math.exp(-bml / 4500);
  // Sv at the top of the log: water, then ∫ρ g dz from the mudline in 1-ft steps.
  let sv = SEAWATER_GCC * PSI_PER_FT_PER_GCC * WATER_FT;
  for (let z = 0; z < TOP_LOG_FT - mudlineTvd; z += 1) sv += PSI_PER_FT_PER_GCC * 0.5 * (densityAt(z) + densityAt(z + 1));
  const topOpTvdss = 8800;
  let sigmaAtTop = NaN;

  let bedLeft = 0;
  let isSand = false;
  let washLeft = 0;
  let gapLeft = 0;
  for (let i = 0; i < n; i++) {
    const z = TOP_LOG_FT + i * stepFt;
    tvdFt[i] = Math.round(z * 1e4) / 1e4;
    if (i > 0) {
      const b0 = tvdFt[i - 1] - mudlineTvd;
      const b1 = tvdFt[i] - mudlineTvd;
      sv += PSI_PER_FT_PER_GCC * 0.5 * (densityAt(b0) + densityAt(b1)) * (b1 - b0);
    }
    svPsi[i] = sv;
    const tvdss = tvdFt[i] - RT_FT;
    const bml = tvdFt[i] - mudlineTvd;
    hydrostaticPsi[i] = HYDRO_PSI_PER_FT * tvdss;
    let sigma;
    if (tvdss <= topOpTvdss) {
      ppPsi[i] = hydrostaticPsi[i];
      sigma = sv - ppPsi[i];
      sigmaAtTop = sigma;
    } else {
      sigma = sigmaAtTop + 0.05 * (tvdss - topOpTvdss);
      ppPsi[i] = sv - sigma;
    }
    if (bedLeft <= 0) {
      isSand = !isSand && rand() < 0.45;
      bedLeft = 5 + rand() * 55;
    }
    bedLeft -= stepFt;
    const vShale = 5000 + 10 * Math.pow(Math.max(sigma, 1), 0.75);
    const v = isSand ? vShale * 1.12 : vShale;
    dt[i] = 1e6 / v + gaussian(rand) * 1.5;
    rhob[i] = 0.23 * Math.pow(v, 0.25) + gaussian(rand) * 0.02;
    const sigmaNormal = sv - hydrostaticPsi[i];
    const rn = 0.8 * Math.exp(1e-4 * bml);
    const rShale = rn * Math.pow(Math.max(sigma, 1) / Math.max(sigmaNormal, 1), 1 / 1.2);
    res[i] = (isSand ? rShale * 0.6 : rShale) * Math.exp(gaussian(rand) * 0.05);
    gr[i] = (isSand ? 45 : 105) + gaussian(rand) * 8;
    bit[i] = tvdFt[i] < 9000 ? 12.25 : 8.5;
    cali[i] = bit[i] + 0.1 + Math.abs(gaussian(rand)) * 0.1;
    if (washLeft <= 0 && rand() < 2e-4 * stepFt * 4) washLeft = 10 + rand() * 30;
    if (washLeft > 0) {
      washLeft -= stepFt;
      cali[i] += 2;
      rhob[i] -= 0.25;
    }
    if (rand() < 1e-3) dt[i] += (rand() < 0.5 ? -1 : 1) * 40;
    if (rand() < 1e-3) rhob[i] += (rand() < 0.5 ? -1 : 1) * 0.4;
    if (gapLeft <= 0 && rand() < 5e-5 * stepFt * 4) gapLeft = 5 + rand() * 20;
    if (gapLeft > 0) {
      gapLeft -= stepFt;
      dt[i] = NaN;
      res[i] = NaN;
    }
  }
  for (const a of [dt, rhob, res, gr, cali]) for (let i = 0; i < n; i++) if (Number.isFinite(a[i])) a[i] = Math.round(a[i] * 1e4) / 1e4;

  const curve = (mnemonic, unit, description, values) => ({ mnemonic, unit, description, values });
  const well = {
    name: "Quillon BENCH-1 (generated)",
    datums: { ...BENCH_DATUMS },
    mdFt: Float64Array.from(tvdFt),
    tvdFt,
    curves: {
      gammaRay: curve("GR", "api", "gamma ray", gr),
      slowness: curve("DT", "usPerFt", "compressional slowness", dt),
      density: curve("RHOB", "gcc", "bulk density", rhob),
      resistivity: curve("RDEEP", "ohmM", "deep resistivity", res),
      caliper: curve("CALI", "in", "caliper", cali),
      bitSize: curve("BS", "in", "bit size", bit),
    },
    header: { HYDG: String(HYDRO_PSI_PER_FT) },
  };
  const item = (mnemonic, unit, value, description) => ({ mnemonic, unit, value, description });
  const las = {
    version: [item("VERS", "", "2.0", "CWLS LOG ASCII STANDARD - VERSION 2.0"), item("WRAP", "", "NO", "ONE LINE PER DEPTH STEP")],
    well: [
      item("STRT", "F", String(tvdFt[0]), "START DEPTH"),
      item("STOP", "F", String(tvdFt[n - 1]), "STOP DEPTH"),
      item("STEP", "F", "0", "STEP"),
      item("NULL", "", "-999.25", "NULL VALUE"),
      item("COMP", "", "Quillon Benchmark Co (fictional)", "COMPANY"),
      item("WELL", "", "Quillon BENCH-1", "WELL"),
      item("FLD", "", "Quillon Basin", "FIELD"),
      item("EKB", "F", String(RT_FT), "RT ELEVATION"),
      item("WDEP", "F", String(WATER_FT), "WATER DEPTH"),
      item("SWDEN", "G/CC", String(SEAWATER_GCC), "SEAWATER DENSITY"),
    ],
    curves: [
      item("DEPT", "F", "", "MEASURED DEPTH"),
      item("GR", "GAPI", "", "GAMMA RAY"),
      item("DT", "US/F", "", "COMPRESSIONAL SLOWNESS"),
      item("RHOB", "G/C3", "", "BULK DENSITY"),
      item("RDEEP", "OHMM", "", "DEEP RESISTIVITY"),
      item("CALI", "IN", "", "CALIPER"),
      item("BS", "IN", "", "BIT SIZE"),
    ],
    parameters: [item("HYDG", "PSI/F", String(HYDRO_PSI_PER_FT), "HYDROSTATIC GRADIENT USED")],
    other: "",
    data: [Float64Array.from(tvdFt), gr, dt, rhob, res, cali, bit],
    wrap: false,
    nullValue: -999.25,
  };
  // A build-and-hold survey (kickoff 2000 ft, 2°/100 ft to 40°) for the MD→TVD stage.
  const survey = [];
  for (let md = 0; md <= 20000; md += 100) {
    const inc = md <= 2000 ? 0 : Math.min(40, ((md - 2000) / 100) * 2);
    survey.push({ mdFt: md, incDeg: inc, aziDeg: 135 });
  }
  return { well, truth: { ppPsi, svPsi, hydrostaticPsi }, las, survey };
}
