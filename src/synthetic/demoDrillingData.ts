/**
 * Demo drilling data for Quillon A-1 (invented), forward-modelled from the same designed
 * truth as its logs, so a d-exponent prediction can be checked against the truth.
 *
 * Recipe, per row (every 4th log sample, 2 ft, from 5,000 ft TVD to TD):
 * 1. corrected d-exponent from the truth: shale dc = dcn·(σ/σn)^(1/1.2), the Eaton (1975)
 *    d-exponent form inverted (σ = Sv − Pp, σn = Sv − Ph), with the normal trend
 *    dcn = 0.80·exp(6.0e-5·Zbml) (invented); sand dc = 0.75·dcn (sands drill faster);
 * 2. d = dc·ρm/ρn (Rehm & McClendon 1971 inverted) with ρm the mud weight of the well's own
 *    mud-weights.csv and ρn its brine gradient;
 * 3. drilling parameters: bit size from the hole section, rotary speed 110–150 rpm and weight
 *    on bit 18–40 klbf by section with Gaussian noise, then ROP = 60·N·(12W/(10⁶D))^d
 *    (Jorden & Shirley 1966 eq. 2 solved for R) with 12 % log-normal noise;
 * 4. ECD = mud weight + 0.25 ppg; background gas rising with the underbalance; connection gas
 *    where shale was drilled within 0.15 ppg of (or under) its pore pressure.
 * The seed is the demo seed XOR a constant of this file, so the other demo files are unchanged.
 *
 * Caution: demo data only; any result from it is an estimate for trained engineers, to be
 * calibrated to measured data and reviewed; local regulations and licensed practice govern.
 */
import { PSI_PER_FT_PER_PPG } from "../units/index.js";
import { readMudWeights } from "../io/tables.js";
import { createSeededRandom } from "./seededRandom.js";
import { generateDemoWellLogs } from "./syntheticLogs.js";
import { QUILLON_DEMO_WELLS, QUILLON_ROCK } from "./demoWellDesigns.js";
import type { DemoFile } from "./demoFiles.js";

/** Normal dc trend of the demo: dcn = DC0·exp(RATE·Zbml) (invented). */
export const DEMO_DC_TREND = { dcAtMudline: 0.8, ratePerFt: 6.0e-5 } as const;

/** First depth of the demo drilling data, ft TVD below RT. */
export const DEMO_DRILLING_TOP_TVD_FT = 5000;

function fx(x: number, digits: number): string {
  return Number.isFinite(x) ? x.toFixed(digits) : "";
}

/**
 * Build `quillon-a1/drilling-data.csv` from the well's truth and its mud-weights table.
 * @param seed demo seed (typical DEMO_LOGS_SEED)
 * @param mudWeightsCsv the well's generated mud-weights.csv text
 * @returns the file, path relative to the demo-logs folder
 * @example buildDemoDrillingData(20261201, mudText).path // "quillon-a1/drilling-data.csv"
 */
export function buildDemoDrillingData(seed: number, mudWeightsCsv: string): DemoFile {
  const design = QUILLON_DEMO_WELLS[0];
  const logs = generateDemoWellLogs(design, QUILLON_ROCK, seed);
  const rng = createSeededRandom((seed ^ 0x0d7e5a11) >>> 0);
  const mud = readMudWeights(mudWeightsCsv).records;
  const mwAt = (z: number): number => {
    for (const m of mud) if (z <= m.tvdToFt) return m.mudWeightPsiPerFt;
    return mud[mud.length - 1].mudWeightPsiPerFt;
  };
  const hydro = design.pressure.hydrostaticPsiPerFt;
  const mudlineTvdFt = design.airGapFt + design.waterDepthFt;
  const rows: string[] = [
    "tvd_ft,md_ft,rop_ft_per_h,rotary_speed_rpm,wob_klbf,bit_size_in,mud_weight_ppg,ecd_ppg,background_gas_units,connection_gas_units",
  ];
  const n = logs.tvdFt.length;
  let lastConnectionFt = -Infinity;
  for (let i = 0; i < n; i += 4) {
    const z = logs.tvdFt[i];
    if (z < DEMO_DRILLING_TOP_TVD_FT) continue;
    const t = logs.truth[i];
    const zBml = z - mudlineTvdFt;
    const dcn = DEMO_DC_TREND.dcAtMudline * Math.exp(DEMO_DC_TREND.ratePerFt * zBml);
    const shale = t.lithology === "shale";
    const dc = shale ? dcn * Math.pow(Math.max(t.sigmaPsi, 1) / t.sigmaNormalPsi, 1 / 1.2) : 0.75 * dcn;
    const mw = mwAt(z);
    const d = (dc * mw) / hydro;
    const bitIn = logs.bitIn[i];
    const rpm = Math.round((bitIn > 10 ? 120 : 140) + rng.gaussian(0, 4));
    const wobKlbf = Math.round(((bitIn > 14 ? 38 : bitIn > 10 ? 30 : 22) + rng.gaussian(0, 1.5)) * 10) / 10;
    const rop = 60 * rpm * Math.pow((12 * wobKlbf * 1000) / (1e6 * bitIn), d) * Math.exp(rng.gaussian(0, 0.12));
    const mwPpg = Math.round((mw / PSI_PER_FT_PER_PPG) * 100) / 100;
    const ppPpg = t.ppPsi / (z * PSI_PER_FT_PER_PPG);
    const under = ppPpg - mwPpg;
    const background = Math.max(1, 6 + rng.gaussian(0, 2) + Math.max(0, under + 0.8) * 20);
    let connection = "";
    if (shale && under > -0.15 && z - lastConnectionFt >= 90) {
      connection = fx(40 + 30 * rng.uniform() + Math.max(0, under + 0.15) * 120, 0);
      lastConnectionFt = z;
    }
    rows.push([fx(z, 1), fx(logs.mdFt[i], 1), fx(rop, 1), String(rpm), fx(wobKlbf, 1), fx(bitIn, 3), fx(mwPpg, 2), fx(mwPpg + 0.25, 2), fx(background, 0), connection].join(","));
  }
  return { path: `${design.slug}/drilling-data.csv`, text: rows.join("\n") + "\n" };
}

/** The paragraph the demo README gives the drilling data. */
export const DEMO_DRILLING_README = `
## Drilling data (Quillon A-1)
\`quillon-a1/drilling-data.csv\` — rate of penetration, rotary speed, weight on bit, bit size,
mud weight and ECD, background and connection gas every 2 ft from 5,000 ft TVD to TD, made
from the same truth (\`src/synthetic/demoDrillingData.ts\`): shale corrected d-exponent
dc = 0.80·exp(6.0e-5·Zbml)·(σ/σn)^(1/1.2) (Eaton's d-exponent form turned around), sand dc
0.75 × the trend; d = dc × mud weight / brine gradient (Rehm & McClendon); rotary speed
120/140 rpm ± 4, weight on bit 38/30/22 klbf ± 1.5 by hole size; ROP from Jorden & Shirley's
equation with 12 % log-normal noise; ECD = mud weight + 0.25 ppg; gas rises with the
underbalance. No gamma ray is in the file: pick shale from the LAS gamma ray (as from LWD).
`;
