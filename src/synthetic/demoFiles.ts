/**
 * Text of every demo file: LAS 2.0 logs (through io/writeLas), the CSV tables in the header
 * convention of io/tables.ts, and the truth (CSV + JSON). Pure string building; the caller
 * decides where to write (see main.ts). Deterministic: same seed → identical text.
 */
import { buildDemoDrillingData, DEMO_DRILLING_README } from "./demoDrillingData.js";
import { writeLas } from "../io/writeLas.js";
import type { LasFile, LasHeaderItem } from "../io/lasTypes.js";
import { KPA_PER_M_PER_PSI_PER_FT, PSI_PER_FT_PER_GCC, PSI_PER_FT_PER_PPG, psiToKpa } from "../units/index.js";
import { QUILLON_DEMO_WELLS, QUILLON_ROCK, type DemoRockParameters, type DemoWellDesign } from "./demoWellDesigns.js";
import { demoSurveyStations } from "./demoTrajectory.js";
import { generateDemoWellLogs, type DemoWellLogs } from "./syntheticLogs.js";
import { createSeededRandom, type SeededRandom } from "./seededRandom.js";
import type { DemoTruthPoint } from "./truthProfile.js";

/** One generated file: path relative to the demo-logs folder, and its text. */
export interface DemoFile {
  path: string;
  text: string;
}

/** Default seed of the committed demo files. */
export const DEMO_LOGS_SEED = 20261201;

/** The caution carried by every user-facing demo file. */
export const DEMO_SAFETY_CAUTION =
  "Invented demo data (fictional Quillon Basin). Any pore-pressure or fracture-gradient result is an estimate " +
  "for trained engineers; calibrate it to measured data and have it reviewed; local regulations and licensed practice govern.";

const NULL_VALUE = -999.25;
const M = 0.3048;

const fx = (x: number, d: number): string => {
  const s = x.toFixed(d);
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
};
const rnd = (x: number, d: number): number => {
  if (!Number.isFinite(x)) return NaN;
  const k = 10 ** d;
  const r = Math.round(x * k) / k;
  return r === 0 ? 0 : r;
};
const item = (mnemonic: string, unit: string, value: string, description: string): LasHeaderItem => ({ mnemonic, unit, value, description });
const emwPpg = (p: number, tvdFt: number): number => p / tvdFt / PSI_PER_FT_PER_PPG;

/** Build the LAS file of one well. */
function lasOf(logs: DemoWellLogs, seed: number): LasFile {
  const d = logs.design;
  const metric = d.fileUnits === "metric";
  const n = logs.index.length;
  const col = (src: Float64Array, f: (x: number) => number, dec: number): Float64Array => {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = rnd(f(src[i]), dec);
    return out;
  };
  const id = (x: number) => x;
  const data = [
    Float64Array.from(logs.index),
    col(logs.grApi, id, 2),
    metric ? col(logs.dtUsPerFt, (x) => x / M, 2) : col(logs.dtUsPerFt, id, 2),
    metric ? col(logs.rhobGcc, (x) => x * 1000, 1) : col(logs.rhobGcc, id, 4),
    col(logs.resOhmM, id, 4),
    metric ? col(logs.caliIn, (x) => x * 25.4, 1) : col(logs.caliIn, id, 3),
    metric ? col(logs.bitIn, (x) => x * 25.4, 2) : col(logs.bitIn, id, 3),
  ];
  const du = metric ? "M" : "F";
  const depthWord = d.trajectory ? "measured depth below rotary table" : "depth below rotary table (vertical well, MD = TVD)";
  const hydro = d.pressure.hydrostaticPsiPerFt;
  return {
    version: [item("VERS", "", "2.0", "CWLS log ASCII standard version 2.0"), item("WRAP", "", "NO", "one line per depth step")],
    well: [
      item("STRT", du, String(data[0][0]), "first index value"),
      item("STOP", du, String(data[0][n - 1]), "last index value"),
      item("STEP", du, metric ? "0.1524" : "0.5", "index step"),
      item("NULL", "", String(NULL_VALUE), "missing value"),
      item("COMP", "", "Quillon Basin demo partnership (fictional)", "company"),
      item("WELL", "", d.name, "well"),
      item("FLD", "", "Quillon Basin (fictional)", "field"),
      item("LOC", "", d.slug.startsWith("marten") ? "Block Q-12 (invented)" : "Block Q-7 (invented)", "location"),
      item("CTRY", "", "none - invented scenario", "country"),
      item("SRVC", "", "shalepoint synthetic generator", "service company"),
      item("DATE", "", "2026-12-01", "generation date (fixed for reproducibility)"),
      item("ERT", du, metric ? fx(d.airGapFt * M, 2) : fx(d.airGapFt, 1), "rotary table elevation above mean sea level (air gap)"),
      item("WDEP", du, metric ? fx(d.waterDepthFt * M, 2) : fx(d.waterDepthFt, 1), "water depth"),
      item("SWDEN", metric ? "K/M3" : "G/C3", metric ? fx(d.seawaterGcc * 1000, 1) : fx(d.seawaterGcc, 3), "seawater density"),
    ],
    curves: [
      item("DEPT", du, "", depthWord),
      item("GR", "GAPI", "", "gamma ray"),
      item("DT", metric ? "US/M" : "US/F", "", "compressional slowness"),
      item("RHOB", metric ? "K/M3" : "G/C3", "", "bulk density"),
      item("RDEP", "OHMM", "", "deep resistivity"),
      item("CALI", metric ? "MM" : "IN", "", "caliper"),
      item("BS", metric ? "MM" : "IN", "", "bit size"),
    ],
    parameters: [
      metric
        ? item("HYDG", "KPA/M", fx(hydro * KPA_PER_M_PER_PSI_PER_FT, 3), `hydrostatic (brine) pore-pressure gradient from sea level = ${fx(hydro, 3)} psi/ft`)
        : item("HYDG", "PSI/FT", fx(hydro, 3), "hydrostatic (brine) pore-pressure gradient from sea level"),
      item("SEED", "", String(seed), "generator seed"),
    ],
    other: [
      "Synthetic well logs forward-modelled from a designed truth; every value is invented.",
      DEMO_SAFETY_CAUTION,
    ].join("\n"),
    data,
    wrap: false,
    nullValue: NULL_VALUE,
  };
}

/** Index of the sample nearest a TVDSS (first at or below it). */
function sampleAtTvdss(logs: DemoWellLogs, tvdss: number): number {
  const t = logs.truth;
  for (let i = 0; i < t.length; i++) if (t[i].tvdssFt >= tvdss) return i;
  return t.length - 1;
}

interface PressurePoint {
  tvdFt: number;
  pressurePsi: number;
  quality: "good" | "fair" | "poor";
  fluid: "water" | "gas";
  sand: string;
  comment: string;
}

function pressureTests(logs: DemoWellLogs, rng: SeededRandom, mwAt: (tvdFt: number) => number): PressurePoint[] {
  const d = logs.design;
  const topTvd = logs.tvdFt[0];
  const out: PressurePoint[] = [];
  for (const s of d.sands) {
    if (s.topTvdssFt + d.airGapFt < topTvd + 100) continue;
    const th = s.baseTvdssFt - s.topTvdssFt;
    const fr = s.gasWaterContactTvdssFt !== undefined ? [0.06, 0.2, 0.32, 0.44, 0.62, 0.78, 0.93] : th >= 90 ? [0.2, 0.5, 0.8] : [0.3, 0.7];
    for (const f of fr) {
      const tvdss = s.topTvdssFt + f * th;
      const i = sampleAtTvdss(logs, tvdss);
      const t = logs.truth[i];
      out.push({
        tvdFt: logs.tvdFt[i], pressurePsi: t.ppPsi + rng.gaussian(0, 3), quality: "good",
        fluid: t.fluid === "gas" ? "gas" : "water", sand: s.name, comment: "",
      });
    }
  }
  // Spoil a few: supercharged (low mobility), lost seal (reads the mud column), one fair.
  const pick = (): PressurePoint => out[rng.integer(0, out.length - 1)];
  for (let k = 0; k < 2; k++) {
    const p = pick();
    if (p.quality !== "good" || p.fluid === "gas") continue;
    p.pressurePsi += 80 + 170 * rng.uniform();
    p.quality = "poor";
    p.comment = "supercharged - low mobility; slow build-up";
  }
  const lost = pick();
  if (lost.quality === "good" && lost.fluid !== "gas") {
    lost.pressurePsi = mwAt(lost.tvdFt) * lost.tvdFt + rng.gaussian(0, 5);
    lost.quality = "poor";
    lost.comment = "lost seal - reading equals mud hydrostatic";
  }
  const fair = pick();
  if (fair.quality === "good") {
    fair.pressurePsi += rng.gaussian(0, 12);
    fair.quality = "fair";
    fair.comment = "build-up not fully stabilised";
  }
  return out;
}

interface MudInterval { fromTvdFt: number; toTvdFt: number; mwPsiPerFt: number }
interface EventRow { tvdFt: number; event: string; emwPsiPerFt?: number; gasUnits?: number; comment: string }

/**
 * Mud weights in 500-ft steps, set from the pore pressure already drilled (the highest EMW
 * of the previous 500 ft + 0.2 ppg, rounded up to 0.1 ppg), so the mud lags a rising
 * pressure: connection gas where shale is drilled underbalanced, and a kick in the designed
 * permeable bed, after which the mud is raised to the kick EMW + 0.5 ppg.
 */
function mudProgram(logs: DemoWellLogs, rng: SeededRandom): { intervals: MudInterval[]; events: EventRow[] } {
  const d = logs.design;
  const t = logs.truth;
  const n = t.length;
  const tvd = logs.tvdFt;
  const kickI = sampleAtTvdss(logs, d.kickTvdssFt);
  const ppEmw = (i: number) => emwPpg(t[i].ppPsi, tvd[i]);
  const intervals: MudInterval[] = [];
  const events: EventRow[] = [];
  const stepFt = 500;
  let from = 0;
  let prevFrom = 0;
  while (from < n - 1) {
    let to = from;
    while (to < n - 1 && tvd[to] - tvd[from] < stepFt) to++;
    let seen = ppEmw(from);
    for (let i = prevFrom; i < from; i++) seen = Math.max(seen, ppEmw(i));
    let mw = Math.max(8.6, Math.ceil((seen + 0.2) * 10 - 1e-9) / 10);
    let start = from;
    if (kickI > from && kickI <= to) {
      const kickEmw = ppEmw(kickI);
      mw = Math.min(mw, Math.floor((kickEmw - 0.1) * 10) / 10);
      intervals.push({ fromTvdFt: tvd[from], toTvdFt: tvd[kickI], mwPsiPerFt: mw * PSI_PER_FT_PER_PPG });
      events.push({ tvdFt: tvd[kickI], event: "kick", emwPsiPerFt: rnd(kickEmw + rng.gaussian(0, 0.05), 2) * PSI_PER_FT_PER_PPG, comment: "pit gain in sand; shut in; kill mud from shut-in drill-pipe pressure" });
      mw = Math.ceil((kickEmw + 0.5) * 10) / 10;
      start = kickI;
    }
    intervals.push({ fromTvdFt: tvd[start], toTvdFt: tvd[to], mwPsiPerFt: mw * PSI_PER_FT_PER_PPG });
    // Gas readings: background every interval, connection gas where shale was drilled underbalanced.
    let under = -Infinity;
    let underI = from;
    for (let i = start; i <= to; i++) {
      if (t[i].lithology === "shale" && ppEmw(i) - mw > under) { under = ppEmw(i) - mw; underI = i; }
    }
    const mid = Math.floor((from + to) / 2);
    events.push({ tvdFt: tvd[mid], event: "background_gas", gasUnits: rnd(Math.max(1, 8 + rng.gaussian(0, 3) + Math.max(0, 0.8 + under) * 15), 0), comment: "" });
    if (under > 0) {
      events.push({ tvdFt: tvd[underI], event: "connection_gas", gasUnits: rnd(60 + 40 * rng.uniform() + under * 150, 0), comment: "shale drilled underbalanced" });
    }
    prevFrom = from;
    from = to;
  }
  // A gas show in any gas sand.
  for (const s of d.sands) {
    if (s.gasWaterContactTvdssFt === undefined) continue;
    const i = sampleAtTvdss(logs, (s.topTvdssFt + s.gasWaterContactTvdssFt) / 2);
    events.push({ tvdFt: tvd[i], event: "background_gas", gasUnits: rnd(350 + 100 * rng.uniform(), 0), comment: `gas show in ${s.name}` });
  }
  events.sort((a, b) => a.tvdFt - b.tvdFt);
  return { intervals, events };
}

/** Leak-off / integrity tests at the casing shoes, from the truth Shmin (Eaton 1969) plus noise. */
function leakOffRows(logs: DemoWellLogs, rng: SeededRandom, mwAt: (tvdFt: number) => number) {
  const d = logs.design;
  const rows: { shoeTvdFt: number; mwPsiPerFt: number; surfacePsi: number; type: string; comment: string }[] = [];
  for (const s of d.sections) {
    if (s.shoeTest === undefined) continue;
    const i = sampleAtTvdss(logs, s.baseTvdssFt);
    const t = logs.truth[i];
    const shoe = logs.tvdFt[i];
    const mw = mwAt(shoe - 1);
    const downhole = s.shoeTest === "LOT" ? t.shminPsi + rng.gaussian(0, 40) : t.shminPsi - 250 - 100 * rng.uniform();
    rows.push({
      shoeTvdFt: shoe, mwPsiPerFt: mw, surfacePsi: downhole - mw * shoe, type: s.shoeTest,
      comment: s.shoeTest === "LOT" ? "leak-off seen" : "limit test; no leak-off",
    });
  }
  return rows;
}

function csv(header: string[], rows: string[][]): string {
  return [header.join(","), ...rows.map((r) => r.join(","))].join("\n") + "\n";
}

/**
 * All files of one demo well (LAS, tables, truth), deterministic for a seed.
 * @param design well design; @param rock rock parameters; @param seed PRNG seed (typical {@link DEMO_LOGS_SEED})
 * @returns files with paths relative to the demo-logs folder, e.g. `quillon-a1/quillon-a1.las`
 */
export function buildDemoWellFiles(design: DemoWellDesign, rock: DemoRockParameters, seed: number): DemoFile[] {
  const logs = generateDemoWellLogs(design, rock, seed);
  const rng = createSeededRandom((seed ^ 0x5bd1e995) >>> 0);
  const metric = design.fileUnits === "metric";
  const dir = design.slug;
  const files: DemoFile[] = [];
  const depthOut = (ft: number) => (metric ? fx(ft * M, 2) : fx(ft, 1));
  const pOut = (psi: number) => (metric ? fx(psiToKpa(psi), 0) : fx(psi, 1));
  const gOut = (g: number) => (metric ? fx(g / PSI_PER_FT_PER_GCC, 3) : fx(g / PSI_PER_FT_PER_PPG, 2));
  const du = metric ? "m" : "ft";
  const pu = metric ? "kpa" : "psi";
  const gu = metric ? "sg" : "ppg";

  files.push({ path: `${dir}/${dir}.las`, text: writeLas(lasOf(logs, seed)) });

  const mud = mudProgram(logs, rng);
  const mwAt = (tvdFt: number): number => {
    for (const m of mud.intervals) if (tvdFt <= m.toTvdFt) return m.mwPsiPerFt;
    return mud.intervals[mud.intervals.length - 1].mwPsiPerFt;
  };
  files.push({
    path: `${dir}/mud-weights.csv`,
    text: csv([`tvd_from_${du}`, `tvd_to_${du}`, `mud_weight_${gu}`], mud.intervals.map((m) => [depthOut(m.fromTvdFt), depthOut(m.toTvdFt), gOut(m.mwPsiPerFt)])),
  });
  files.push({
    path: `${dir}/drilling-events.csv`,
    text: csv([`tvd_${du}`, "event", `emw_${gu}`, "gas_units", "comment"], mud.events.map((e) => [
      depthOut(e.tvdFt), e.event, e.emwPsiPerFt === undefined ? "" : gOut(e.emwPsiPerFt), e.gasUnits === undefined ? "" : fx(e.gasUnits, 0), e.comment,
    ])),
  });
  const tests = pressureTests(logs, rng, mwAt);
  files.push({
    path: `${dir}/pressure-tests.csv`,
    text: csv([`tvd_${du}`, `pressure_${pu}`, "quality", "fluid", "sand", "comment"], tests.map((p) => [
      depthOut(p.tvdFt), pOut(p.pressurePsi), p.quality, p.fluid, p.sand, p.comment,
    ])),
  });
  const lots = leakOffRows(logs, rng, mwAt);
  files.push({
    path: `${dir}/leakoff-tests.csv`,
    text: csv([`shoe_tvd_${du}`, `mud_weight_${gu}`, `surface_pressure_${pu}`, "test_type", "comment"], lots.map((r) => [
      depthOut(r.shoeTvdFt), gOut(r.mwPsiPerFt), pOut(r.surfacePsi), r.type, r.comment,
    ])),
  });
  files.push({
    path: `${dir}/formation-tops.csv`,
    text: csv(["name", `tvd_${du}`], design.tops.map((t) => [t.name, depthOut(t.tvdssFt + design.airGapFt)])),
  });
  if (design.trajectory) {
    const st = demoSurveyStations(design.trajectory);
    files.push({
      path: `${dir}/survey.csv`,
      text: csv([`md_${du}`, "inc_deg", "azi_deg"], st.map((s) => [depthOut(s.mdFt), fx(s.incDeg, 2), fx(s.incDeg === 0 ? 0 : s.aziDeg, 2)])),
    });
  }
  files.push({ path: `${dir}/truth.csv`, text: truthCsv(logs) });
  files.push({ path: `${dir}/truth.json`, text: truthJson(logs, rock, seed) });
  return files;
}

/** Truth at every 4th log sample (2 ft, or 0.6096 m), internal units for every well. */
function truthCsv(logs: DemoWellLogs): string {
  const rows: string[][] = [];
  for (let i = 0; i < logs.truth.length; i += 4) {
    const t: DemoTruthPoint = logs.truth[i];
    rows.push([
      fx(logs.mdFt[i], 3), fx(logs.tvdFt[i], 3), fx(t.tvdssFt, 3), fx(t.ppPsi, 2), fx(t.svPsi, 2), fx(t.shminPsi, 2),
      fx(t.sigmaPsi, 2), fx(t.sigmaMaxPsi, 2), fx(t.phPsi, 2), fx(t.densityGcc, 4), fx(t.porosity, 4), t.lithology, t.fluid, t.zone,
    ]);
  }
  return csv(["md_ft", "tvd_ft", "tvdss_ft", "pp_psi", "sv_psi", "shmin_psi", "sigma_psi", "sigma_max_psi", "ph_psi", "density_gcc", "porosity", "lithology", "fluid", "zone"], rows);
}

function truthJson(logs: DemoWellLogs, rock: DemoRockParameters, seed: number): string {
  const d = logs.design;
  const p = d.pressure;
  const a = logs.column.anchors;
  const gas = d.sands.find((s) => s.gasWaterContactTvdssFt !== undefined);
  const r2 = (x: number) => rnd(x, 2);
  const doc = {
    note: "Designed truth of an invented demo well, for tests only; prediction code never reads it. Depths ft, pressures psi, gradients psi/ft, density g/cc, whatever the units of the well's own files.",
    caution: DEMO_SAFETY_CAUTION,
    well: d.name,
    seed,
    fileUnits: d.fileUnits,
    datums: { rtElevationFt: r2(d.airGapFt), waterDepthFt: r2(d.waterDepthFt), seawaterDensityGcc: d.seawaterGcc, mudlineTvdFt: r2(d.airGapFt + d.waterDepthFt) },
    hydrostaticPsiPerFt: p.hydrostaticPsiPerFt,
    hydrostaticRule: "Ph = hydrostaticPsiPerFt x TVDSS (brine column from sea level)",
    poissonRatio: d.poissonRatio,
    minimumStressRule: "Shmin = nu/(1-nu) (Sv - Pp) + Pp (Eaton 1969)",
    boundariesTvdssFt: {
      topOverpressure: p.topOverpressureTvdssFt,
      upperSealTop: p.upperSeal.topTvdssFt,
      upperSealBase: p.upperSeal.baseTvdssFt,
      compartmentTop: p.upperSeal.baseTvdssFt,
      compartmentBase: p.lowerSeal.topTvdssFt,
      lowerSealTop: p.lowerSeal.topTvdssFt,
      lowerSealBase: p.lowerSeal.baseTvdssFt,
      regressionBase: p.lowerSeal.baseTvdssFt,
      unloadingTop: p.unloading?.topTvdssFt ?? null,
      gasWaterContact: gas?.gasWaterContactTvdssFt ?? null,
    },
    gasSand: gas ? { name: gas.name, topTvdssFt: gas.topTvdssFt, baseTvdssFt: gas.baseTvdssFt, gasGradientPsiPerFt: rnd(rock.gas.densityGcc * PSI_PER_FT_PER_GCC, 4) } : null,
    compartmentWaterLine: { ppAtTopPsi: r2(a.ppCompartmentTopPsi), topTvdssFt: p.upperSeal.baseTvdssFt, gradientPsiPerFt: p.hydrostaticPsiPerFt },
    undercompactedSigmaRatePsiPerFt: p.undercompactedSigmaRatePsiPerFt,
    upperSealBaseSigmaPsi: p.upperSeal.baseSigmaPsi,
    regressedExcessPsi: p.regressedExcessPsi,
    unloading: p.unloading ? { topTvdssFt: p.unloading.topTvdssFt, sigmaFallPsiPerFt: p.unloading.sigmaFallPsiPerFt, sigmaMaxPsi: r2(a.sigmaMaxUnloadingPsi) } : null,
    anchorsPsi: {
      sigmaAtTopOverpressure: r2(a.sigmaTopOverpressurePsi),
      sigmaAtUpperSealTop: r2(a.sigmaUpperSealTopPsi),
      ppAtCompartmentTop: r2(a.ppCompartmentTopPsi),
      ppAtLowerSealTop: r2(a.ppLowerSealTopPsi),
    },
    rock,
    trajectory: d.trajectory ?? null,
    sands: d.sands,
    holeSections: d.sections.map((s) => ({ ...s, baseTvdssFt: Number.isFinite(s.baseTvdssFt) ? s.baseTvdssFt : null })),
    kickTvdssFt: d.kickTvdssFt,
    logs: {
      firstIndex: d.logTopIndex, densityFirstIndex: d.densityTopIndex, indexUnit: d.fileUnits === "metric" ? "m" : "ft",
      noise: { grApi: 3, dtUsPerFt: 1.0, rhobGcc: 0.015, resistivityLogStd: 0.03, caliperIn: 0.05 },
    },
  };
  return JSON.stringify(doc, null, 2) + "\n";
}

/**
 * Every demo file of the three Quillon Basin wells plus the folder README.
 * @param seed PRNG seed (default {@link DEMO_LOGS_SEED}); a different seed changes only the noise
 * @returns files with paths relative to the demo-logs folder
 * @example buildDemoLogFiles().map((f) => f.path)[0] // "README.md"
 */
export function buildDemoLogFiles(seed: number = DEMO_LOGS_SEED): DemoFile[] {
  const files: DemoFile[] = [{ path: "README.md", text: DEMO_README + DEMO_DRILLING_README }];
  for (const d of QUILLON_DEMO_WELLS) files.push(...buildDemoWellFiles(d, QUILLON_ROCK, seed));
  files.push(buildDemoDrillingData(seed, files.find((f) => f.path === "quillon-a1/mud-weights.csv")!.text));
  return files;
}

const DEMO_README = `# Demo logs — Quillon Basin (fictional)

> **Caution.** ${DEMO_SAFETY_CAUTION}

Everything here is invented and generated by \`src/synthetic\` (\`npm run demo-logs\`), which
forward-models three wells from a designed truth with a seeded generator; running it again
rewrites these files byte for byte. A test checks that.

## Wells
| folder | well | files in | notes |
| --- | --- | --- | --- |
| quillon-a1 | Quillon A-1, vertical, water 4,000 ft, TD 15,000 ft TVD | ft, us/ft, g/cc, ohm.m, API, in; psi, ppg | tutorial well; gas sand (Tarrant Sand) with a gas–water contact at 11,580 ft TVDSS |
| quillon-a2st | Quillon A-2ST, build 3°/100 ft from 5,600 ft MD to 45°, TD 17,500 ft MD | as A-1; LAS indexed in MD; survey.csv | same story as A-1, 80 ft deeper |
| marten-b1 | Marten B-1, vertical, water 610 m, TD 4,300 m TVD | m, us/m, kg/m3, ohm.m, API, mm; kPa, sg | deep unloading zone below 12,300 ft TVDSS |

All wells: air gap 82 ft (25 m for Marten B-1), seawater 1.03 g/cc. The brine (hydrostatic)
gradient is in each LAS file's ~P section (\`HYDG\`): 0.445 psi/ft for the Quillon wells,
0.440 psi/ft (9.953 kPa/m) for Marten B-1 — both just under the seawater gradient (0.4465
psi/ft), so the effective stress at the mudline is not negative.

## Files per well
- \`<well>.las\` — LAS 2.0: GR, DT (compressional slowness), RHOB, RDEP (deep resistivity),
  CALI, BS; header items ERT (air gap), WDEP (water depth), SWDEN (seawater density).
- \`pressure-tests.csv\` — formation-pressure test points in sands with quality flags
  (a few are supercharged or lost seal: flagged \`poor\`).
- \`leakoff-tests.csv\` — leak-off (LOT) and limit (FIT) tests at casing shoes.
- \`mud-weights.csv\`, \`drilling-events.csv\` — mud weights used and gas/kick events.
- \`formation-tops.csv\`, and \`survey.csv\` for Quillon A-2ST (MD, inclination, azimuth).
- \`truth.csv\`, \`truth.json\` — the designed truth (ft, psi, g/cc for every well, every 4th
  log sample). **For tests only**: prediction code never reads them.

Table columns follow the header convention of \`src/io/tables.ts\` (\`<name>_<unit>\`); depths
are TVD below the rotary table except the survey (MD).

## How the truth is designed
1. **Hydrostatic** from the mudline to the top of overpressure (A-1 8,800, A-2ST 8,880,
   B-1 7,900 ft TVDSS): Pp = gradient × TVDSS.
2. **Disequilibrium compaction** below it: effective stress nearly frozen (it grows only
   0.05–0.06 psi/ft), Pp = Sv − σ.
3. **Upper seal** (300–350 ft of shale): effective stress ramps down, pressure ramps up.
4. **Compartment**: sands and shales on one brine-gradient line at elevated pressure.
5. **Lower seal**: pressure ramps down to hydrostatic + 700–900 psi (the regression).
6. **Marten B-1 unloading** (below 12,300 ft TVDSS): Pp rises faster than Sv, σ falls by
   1 psi/ft while σmax stays at its value at the top of the zone; density follows σmax (so it
   barely changes) and velocity follows Bowers' unloading branch (so it falls).
7. **Gas** (A-1 Tarrant Sand): gas gradient ≈ 0.095 psi/ft (0.22 g/cc) above the contact.

Overburden: seawater column at 1.03 g/cc, then bulk density integrated downward step by step
(0.5 ft, trapezoid with a predictor–corrector). Porosity φ = φ0·exp(−σmax/σc) (Athy's law
written in effective stress; shale φ0 0.47, σc 3,500 psi, grain 2.70 g/cc; sand φ0 0.38,
σc 5,500 psi, grain 2.65 g/cc); bulk density = φ·ρfluid + (1 − φ)·ρgrain. The shallow shale
parameters are chosen so that the column-average density below the mudline stays within
about 0.05 g/cc of the published near-mudline power law (Traugott 1997), as a calibrated
basin would. Minimum stress:
Eaton (1969), Shmin = ν/(1−ν)(Sv − Pp) + Pp, ν 0.42 (Quillon) and 0.40 (Marten).

## Design target for the pore-pressure engine
Parameters were chosen so that, in the shale of the disequilibrium-compaction section, a
prediction recovers the truth to 0.3 ppg RMS or better with Eaton sonic (exponent 3, about
an exponential normal trend fitted in the hydrostatic shale), Eaton resistivity (exponent
1.2) and Bowers (A 10, B 0.75). In Marten B-1's unloading zone plain Eaton (and Bowers'
virgin curve) under-predicts by about 0.9 ppg and Bowers' unloading branch recovers the
truth. The truth files let tests measure exactly that.

## How the logs are made
- Shale sonic: Bowers (1995), V = 5000 + 10·σ^0.75 (ft/s, psi); unloading branch with U = 3.5.
- Shale resistivity: Rn = 0.65·exp(1.1e-4·Zbml) ohm.m, R = Rn·(σv/σn)^(1/1.2) (Eaton 1975
  form, exponent 1.2), σn = Sv − Ph, σv the sonic's virgin-equivalent effective stress.
- Sand: V = 5200 + 14·σ^0.72, Archie resistivity with Rw 0.08 ohm.m, m = n = 2; gas slowness
  × 1.10, gas saturation 0.75.
- Imperfections: Gaussian noise (GR 3 API, DT 1 µs/ft, RHOB 0.015 g/cc, resistivity 3 %),
  cycle-skip spikes in DT, GR spikes, washouts (caliper 1.5–4 in over bit, density low by
  0.07 g/cc per inch), null gaps at casing points and in single curves, and a density log that
  starts well below the mudline (A-1 about 1,500 ft, A-2ST about 2,000 ft, B-1 515 m below it).
`;
