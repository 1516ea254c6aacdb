/**
 * Export the generated benchmark well (and shalepoint's own pipeline results on it) as raw
 * little-endian float64 files, for the numpy reference script (bench/numpyReference.py).
 *
 * Usage: node bench/exportBenchWell.mjs <samples> <outDir>
 *   (run `npm run -s build` first: the results come from dist/index.js)
 *
 * Writes into outDir:
 * - input curves, one file each, NaN for nulls: tvd, gr, dt, rhob, res, cali, bs (.f64);
 * - meta.json: sample count, datums, the bench options (bench/benchOptions.mjs), file list,
 *   and the fitted trend parameters and shale-point count of shalepoint's run;
 * - shalepoint's results, prefixed "sp_": despiked gr/dt/rhob/res, sv, hydrostatic, shale-line
 *   dt and res, sonic and resistivity trends, and the pore pressure of Eaton sonic, Eaton
 *   resistivity, Bowers and equivalent depth (.f64) with their per-sample flag bits (.u8).
 * Bench-only tooling: nothing in the tests or CI needs it. Invented data only (fictional
 * Quillon Basin).
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { writeRawFloat64 } from "./rawFloat64.mjs";
import { generateBenchWell, BENCH_DATUMS } from "./generateBenchWell.mjs";
import { benchOptions } from "./benchOptions.mjs";

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, "..");

const samples = Number(process.argv[2]);
const outDir = process.argv[3];
if (!(Number.isInteger(samples) && samples >= 1000) || !outDir) {
  console.error("usage: node bench/exportBenchWell.mjs <samples ≥ 1000> <outDir>");
  process.exit(2);
}
fs.mkdirSync(outDir, { recursive: true });

const writeF64 = (name, values) => writeRawFloat64(outDir, name, values);

const { well } = generateBenchWell({ samples });
const c = well.curves;
const files = {
  tvd: writeF64("tvd", well.tvdFt),
  gr: writeF64("gr", c.gammaRay.values),
  dt: writeF64("dt", c.slowness.values),
  rhob: writeF64("rhob", c.density.values),
  res: writeF64("res", c.resistivity.values),
  cali: writeF64("cali", c.caliper.values),
  bs: writeF64("bs", c.bitSize.values),
};

const sp = await import(pathToFileURL(path.join(root, "dist/index.js")).href);
const options = benchOptions();
const p = sp.predictPorePressure(well, options);
const results = {
  grClean: writeF64("sp_grClean", p.shale.grUsedApi),
  dtClean: writeF64("sp_dtClean", p.curves.dtUsPerFt),
  rhobClean: writeF64("sp_rhobClean", p.curves.rhobGcc),
  resClean: writeF64("sp_resClean", p.curves.resOhmM),
  sv: writeF64("sp_sv", p.overburden.svPsi),
  hydrostatic: writeF64("sp_hydrostatic", p.hydrostaticPsi),
  shaleLineDt: writeF64("sp_shaleLineDt", p.shaleLine.dtUsPerFt),
  shaleLineRes: writeF64("sp_shaleLineRes", p.shaleLine.resOhmM),
  sonicTrend: writeF64("sp_sonicTrend", p.sonicTrend.values),
  resistivityTrend: writeF64("sp_resistivityTrend", p.resistivityTrend.values),
  eatonSonicPp: writeF64("sp_eatonSonicPp", p.methods.eatonSonic.ppPsi),
  eatonResistivityPp: writeF64("sp_eatonResistivityPp", p.methods.eatonResistivity.ppPsi),
  bowersPp: writeF64("sp_bowersPp", p.methods.bowers.ppPsi),
  equivalentDepthPp: writeF64("sp_equivalentDepthPp", p.methods.equivalentDepth.ppPsi),
};

function writeU8(name, values) {
  fs.writeFileSync(path.join(outDir, `${name}.u8`), Uint8Array.from(values));
  return `${name}.u8`;
}
const flags = {
  eatonSonic: writeU8("sp_eatonSonicFlags", p.methods.eatonSonic.flags),
  eatonResistivity: writeU8("sp_eatonResistivityFlags", p.methods.eatonResistivity.flags),
  bowers: writeU8("sp_bowersFlags", p.methods.bowers.flags),
  equivalentDepth: writeU8("sp_equivalentDepthFlags", p.methods.equivalentDepth.flags),
};

const meta = {
  samples,
  well: well.name,
  datums: { ...BENCH_DATUMS },
  options,
  files,
  shalepoint: {
    results,
    flags,
    shalePointCount: p.shale.points.tvdFt.length,
    shaleSampleCount: p.shale.isShale.reduce((s, v) => s + v, 0),
    badHoleCount: p.badHole.reduce((s, v) => s + v, 0),
    sonicTrendParams: p.sonicTrend.trend.segments[0].params,
    resistivityTrendParams: p.resistivityTrend.trend.segments[0].params,
    sonicFitPoints: p.sonicTrend.diagnostics[0].n,
    resistivityFitPoints: p.resistivityTrend.diagnostics[0].n,
  },
};
fs.writeFileSync(path.join(outDir, "meta.json"), JSON.stringify(meta, null, 2) + "\n");
console.log(`wrote ${Object.keys(files).length + Object.keys(results).length} curves of ${samples} samples and meta.json to ${outDir}`);
