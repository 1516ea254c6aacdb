/**
 * Export the Monte Carlo benchmark case (bench/benchOptions.mjs monteCarloInput: 1,000
 * realisations on the generated 40,000-sample well) with shalepoint's drawn inputs and
 * results, as raw little-endian float64 files, for bench/numpyMonteCarloReference.py.
 *
 * Usage: node bench/exportMonteCarloCase.mjs <outDir> [samples]
 *   (run `npm run -s build` first: the results come from dist/index.js)
 *
 * Writes into outDir:
 * - per depth: tvd, bml (ft below mudline), sv, ph (psi), obs (shale-line slowness, µs/ft);
 * - per realisation, the draws in shalepoint's order: draw_<name>.f64 (names in meta.json);
 * - shalepoint's results: sp_<key>.f64 for the P10/P50/P90 of pore and fracture pressure
 *   and the pore-pressure mean and standard deviation;
 * - meta.json: samples, realisations, the trend segments (tops ft below mudline, matrix
 *   slowness µs/ft), the draw names and the file list.
 * Bench-only tooling: nothing in the tests or CI needs it. Invented data only (fictional
 * Quillon Basin).
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { writeRawFloat64 } from "./rawFloat64.mjs";
import { generateBenchWell } from "./generateBenchWell.mjs";
import { benchOptions, monteCarloInput } from "./benchOptions.mjs";

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, "..");

const outDir = process.argv[2];
const samples = Number(process.argv[3] ?? 40000);
if (!outDir || !(Number.isInteger(samples) && samples >= 1000)) {
  console.error("usage: node bench/exportMonteCarloCase.mjs <outDir> [samples ≥ 1000]");
  process.exit(2);
}
fs.mkdirSync(outDir, { recursive: true });

const writeF64 = (name, values) => writeRawFloat64(outDir, name, values);

const sp = await import(pathToFileURL(path.join(root, "dist/index.js")).href);
const { well } = generateBenchWell({ samples });
const base = sp.predictPorePressure(well, benchOptions());
const input = monteCarloInput(well, base);
const trend = input.porePressure.trend;
if (trend.kind !== "sonicExponential") throw new Error("the numpy reference covers the exponential sonic trend only");
const result = sp.simulatePressureUncertainty(input);

const files = {
  tvd: writeF64("tvd", input.tvdFt),
  bml: writeF64("bml", input.bmlFt),
  sv: writeF64("sv", input.overburdenPsi),
  ph: writeF64("ph", input.hydrostaticPsi),
  obs: writeF64("obs", input.observed),
};
const draws = result.draws.map((d) => ({ name: d.name, unit: d.unit, file: writeF64(`draw_${d.name.replace(/[^A-Za-z0-9]/g, "_")}`, d.values) }));
const results = {};
for (const key of ["ppP10Psi", "ppP50Psi", "ppP90Psi", "fracP10Psi", "fracP50Psi", "fracP90Psi", "ppMeanPsi", "ppStdPsi"]) {
  results[key] = writeF64(`sp_${key}`, result[key]);
}
const meta = {
  samples,
  realisations: input.realisations,
  seed: input.seed,
  trend: { kind: trend.kind, segments: trend.segments.map((s) => ({ topBmlFt: s.topBmlFt, dtMatrixUsPerFt: s.params.dtMatrixUsPerFt })) },
  draws,
  files,
  results,
};
fs.writeFileSync(path.join(outDir, "meta.json"), JSON.stringify(meta, null, 2) + "\n");
console.log(`wrote the Monte Carlo case (${samples} depths × ${input.realisations} realisations) to ${outDir}`);
