#!/usr/bin/env node
/**
 * shalepoint benchmark harness: times each stage on generated wells of 40,000 and 200,000
 * samples, compares the LAS reader with an independent npm LAS reader (las-js) on the same
 * text, measures peak memory of the 200,000-sample pipeline in a fresh process, and writes
 * BENCHMARKS.md (machine, load, median and spread, targets).
 *
 * Run after a build:   npm run -s build && node bench/run.mjs
 * Options: --quick (fewer runs, no file written unless --write), --write, --only=<substring>
 *
 * Timing (tinybench): warm-up runs (JIT), then at least `runs` timed runs and at least `minMs` of
 * wall time; median, interquartile range (p25–p75) and min are reported. Speed is measured
 * here only, never asserted in tests.
 */
import os from "node:os";
import fs from "node:fs";
import path from "node:path";
import v8 from "node:v8";
import { spawnSync } from "node:child_process";
import { fileURLToPath, pathToFileURL } from "node:url";
import { performance } from "node:perf_hooks";
import { generateBenchWell, BENCH_DATUMS } from "./generateBenchWell.mjs";
import { benchOptions, monteCarloInput, STRESS_OPTIONS, stressTests } from "./benchOptions.mjs";

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, "..");
const args = new Set(process.argv.slice(2).filter((a) => !a.startsWith("--only=")));
const only = (process.argv.find((a) => a.startsWith("--only=")) ?? "").slice(7);
const quick = args.has("--quick");
const write = args.has("--write") || !quick;

if (process.argv[2] === "--memory-probe") {
  await memoryProbe(process.argv[3], Number(process.argv[4]));
  process.exit(0);
}

const sp = await import(pathToFileURL(path.join(root, "dist/index.js")).href);
const { Las } = await import("las-js");
const { Bench } = await import("tinybench");

// ---------------------------------------------------------------------------------------
// harness
function quantile(sorted, p) {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  return sorted[lo] + (h - lo) * ((sorted[Math.min(lo + 1, sorted.length - 1)] ?? sorted[lo]) - sorted[lo]);
}
var sink = 0; // var: the memory probe runs before this line is reached
function consume(r) {
  // Touch the result cheaply: Object.keys on a typed array would build one string per element.
  if (ArrayBuffer.isView(r)) sink += r.byteLength;
  else if (r && typeof r === "object") sink += Object.keys(r).length;
}
/**
 * Time one stage with tinybench: `warmup` untimed calls, then at least `runs` timed calls
 * and at least `minMs` of timed work (capped at `maxMs`). Median, p25–p75 and min come from
 * the retained latency samples (tinybench reports p50/p75 but not p25).
 */
async function measure(fn, { warmup = 3, runs = 15, minMs = 300, maxMs = 20000, beforeEach } = {}) {
  if (quick) {
    warmup = Math.min(warmup, 1);
    runs = Math.min(runs, 5);
    minMs = 0;
  }
  const bench = new Bench({
    iterations: runs,
    time: minMs,
    warmup: warmup > 0,
    warmupIterations: warmup,
    warmupTime: 0,
    retainSamples: true,
    throws: true,
  });
  // beforeEach (untimed) prepares the input of one timed call.
  bench.add("stage", async () => consume(await fn()), beforeEach ? { beforeEach } : {});
  const started = performance.now();
  await bench.run();
  const task = bench.tasks[0];
  const latency = task.result?.latency;
  if (!latency || !latency.samples || latency.samples.length === 0) throw new Error(`no samples for a stage (${task.result?.state ?? "unknown state"})`);
  if (performance.now() - started > maxMs) console.warn(`  (a stage took ${(performance.now() - started).toFixed(0)} ms in all)`);
  const times = Array.from(latency.samples).sort((a, b) => a - b);
  return { medianMs: quantile(times, 0.5), p25Ms: quantile(times, 0.25), p75Ms: quantile(times, 0.75), minMs: times[0], runs: times.length, load1: os.loadavg()[0] };
}

const results = [];
function record(stage, samples, m, extra = {}) {
  const row = { stage, samples, ...m, ...extra };
  results.push(row);
  const mbps = extra.mbPerS ? `  ${extra.mbPerS.toFixed(1)} MB/s` : "";
  console.log(
    `${stage.padEnd(44)} ${String(samples).padStart(7)}  median ${fmt(m.medianMs)} ms  IQR ${fmt(m.p25Ms)}–${fmt(m.p75Ms)}  min ${fmt(m.minMs)}  n=${m.runs}  load ${m.load1.toFixed(2)}${mbps}`,
  );
}
function fmt(ms) {
  return ms >= 100 ? ms.toFixed(0) : ms >= 10 ? ms.toFixed(1) : ms.toFixed(2);
}
const want = (name) => only === "" || name.toLowerCase().includes(only.toLowerCase());

// ---------------------------------------------------------------------------------------
// stages
async function benchSize(n) {
  const g = generateBenchWell({ samples: n });
  const { well, survey } = g;
  const lasText = sp.writeLas(g.las);
  const mb = Buffer.byteLength(lasText) / 1e6;
  const options = benchOptions();

  if (want("las parse")) {
    const m = await measure(() => sp.readLas(lasText), { runs: 10 });
    record("LAS parse (shalepoint readLas)", n, m, { mbPerS: mb / (m.medianMs / 1000), fileMb: mb });
    const ref = await measure(async () => {
      const las = new Las(lasText, { loadFile: false });
      return { rows: (await las.data()).length };
    }, { runs: 5, warmup: 1, minMs: 0 });
    record("LAS parse (reference: las-js data())", n, ref, { mbPerS: mb / (ref.medianMs / 1000), fileMb: mb });
  }
  if (want("md→tvd")) {
    const mdFt = new Float64Array(n);
    for (let i = 0; i < n; i++) mdFt[i] = 5000 + (i * 13000) / (n - 1);
    record("MD→TVD (surveyPathAtMd, minimum curvature)", n, await measure(() => sp.surveyPathAtMd({ survey, mdFt })));
    const tvd = sp.surveyPathAtMd({ survey, mdFt }).tvdFt;
    record("TVD→MD (mdAtTvdAlongSurvey)", n, await measure(() => sp.mdAtTvdAlongSurvey({ survey, tvdFt: tvd })));
  }
  const rhob = well.curves.density.values;
  const dtRaw = well.curves.slowness.values;
  const tvdFt = well.tvdFt;
  const badHole = sp.flagBadHole({ caliperIn: well.curves.caliper.values, bitSizeIn: well.curves.bitSize.values }).isBadHole;
  if (want("floor") && n === 200000) {
    // The machine's floor for per-sample work, for reading the pipeline figures: one pass
    // over 200,000 samples that reads one array and writes another, with nothing, one
    // Math.exp or one Math.log per sample (into a reused array, so no allocation is timed).
    const src = Float64Array.from(dtRaw, (v) => (Number.isFinite(v) ? v : 100));
    const dst = new Float64Array(n);
    record("floor: copy loop (read + write)", n, await measure(() => { for (let i = 0; i < n; i++) dst[i] = src[i] * 0.5; return dst; }));
    record("floor: Math.exp per sample", n, await measure(() => { for (let i = 0; i < n; i++) dst[i] = Math.exp(-1e-2 * src[i]); return dst; }));
    record("floor: Math.log per sample", n, await measure(() => { for (let i = 0; i < n; i++) dst[i] = Math.log(src[i]); return dst; }));
    record("floor: new Float64Array filled", n, await measure(() => { const a = new Float64Array(n); for (let i = 0; i < n; i++) a[i] = src[i]; return a; }));
  }
  if (want("numpy")) {
    // The same pore-pressure stages written as a clean vectorised numpy script
    // (bench/numpyReference.py), on the same generated well, when this machine's python3 has
    // numpy and scipy (bench-only; tests and CI never need them). Its JSON line also reports
    // how closely its curves agree with shalepoint's.
    const probe = spawnSync("python3", ["-c", "import numpy, scipy"], { encoding: "utf8" });
    if (probe.status === 0) {
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), "shalepoint-numpy-"));
      try {
        const ex = spawnSync(process.execPath, [path.join(here, "exportBenchWell.mjs"), String(n), dir], { encoding: "utf8" });
        if (ex.status !== 0) throw new Error(`exportBenchWell failed: ${ex.stderr}`);
        const py = spawnSync("python3", [path.join(here, "numpyReference.py"), dir, "--runs", quick ? "5" : "15"], { encoding: "utf8", maxBuffer: 1 << 24 });
        if (py.status !== 0) throw new Error(`numpyReference.py failed: ${py.stderr}`);
        const j = JSON.parse(py.stdout.trim().split("\n").pop());
        const worst = Math.max(...["eatonSonicPp", "eatonResistivityPp", "bowersPp", "equivalentDepthPp"].map((k) => j.agreement?.[k]?.maxAbsDiff ?? NaN));
        record("numpy reference: same pore-pressure stages", n, { medianMs: j.medianMs, p25Ms: j.p25Ms, p75Ms: j.p75Ms, minMs: j.minMs, runs: j.runs, load1: os.loadavg()[0] }, { numpy: j.numpy, despikeMs: j.stagesMs?.despike, worstPpDiffPsi: worst });
      } finally {
        fs.rmSync(dir, { recursive: true, force: true });
      }
    } else {
      console.log("numpy reference: skipped (python3 with numpy and scipy not found)");
    }
  }
  if (want("despike")) {
    record("despike (Hampel, 11 samples)", n, await measure(() => sp.despikeLog({ values: dtRaw, window: { samples: 11 }, threshold: 3 })));
  }
  if (want("overburden")) {
    record("overburden (integrateOverburden)", n, await measure(() => sp.integrateOverburden({ tvdFt, datums: BENCH_DATUMS, densityGcc: rhob, slownessUsPerFt: dtRaw, badHoleFlag: badHole })));
  }
  const base = sp.predictPorePressure(well, options);
  const bmlFt = base.bmlFt;
  const stress = { tvdFt, overburdenPsi: base.overburden.svPsi, hydrostaticPsi: base.hydrostaticPsi };
  if (want("shale")) {
    record("shale points (pickShalePoints)", n, await measure(() =>
      sp.pickShalePoints({ tvdFt, grApi: well.curves.gammaRay.values, criterion: options.shale.criterion, minBedThicknessFt: 10, decimation: { kind: "window", windowFt: 20 }, curves: { dt: base.curves.dtUsPerFt, res: base.curves.resOhmM } })));
  }
  const pointBml = base.shale.points.tvdFt.map((t) => t - (BENCH_DATUMS.rtElevationFt + BENCH_DATUMS.waterDepthFt));
  const fitArgs = { kind: "sonicExponential", bmlFt: pointBml, values: base.shale.points.values.dt, method: "huber", segments: options.sonicTrend.segments };
  if (want("trend")) {
    record("trend fit (sonic exp., Huber, on shale points)", n, await measure(() => sp.fitCompactionTrendSegments(fitArgs)));
    record("trend evaluate (evaluateCompactionTrend)", n, await measure(() => sp.evaluateCompactionTrend({ trend: base.sonicTrend.trend, bmlFt })));
  }
  const observed = base.shaleLine.dtUsPerFt;
  if (want("eaton")) {
    record("Eaton sonic (ratio + pore pressure)", n, await measure(() => {
      const ratio = sp.eatonRatio({ log: "sonic", observed, trend: base.sonicTrend.values });
      return sp.eatonPorePressure({ ...stress, ratio, exponent: 3 });
    }));
  }
  if (want("bowers")) {
    const velocityFtPerS = sp.velocityFromSlownessLog(observed);
    record("Bowers (virgin + unloading)", n, await measure(() => sp.bowersPorePressure({ ...stress, velocityFtPerS, a: 10, b: 0.75, unloading: { onsetTvdFt: 13000, vmaxFtPerS: 11000, u: 3.5 } })));
  }
  if (want("equivalent")) {
    let first = 0;
    while (!(Number.isFinite(base.sonicTrend.values[first]) && bmlFt[first] > 0)) first++;
    record("equivalent depth (Foster & Whalen)", n, await measure(() => sp.equivalentDepthPorePressure({
      ...stress, observed, trend: { kind: "sampled", tvdFt: tvdFt.subarray(first), values: base.sonicTrend.values.subarray(first) }, searchTopTvdFt: tvdFt[first],
    })));
  }
  if (want("refit")) {
    // A user drags a trend handle: refit on the shale points, re-evaluate, recompute Eaton.
    record("trend refit + Eaton recompute", n, await measure(() => {
      const fit = sp.fitCompactionTrendSegments(fitArgs);
      const trend = sp.evaluateCompactionTrend({ trend: fit.trend, bmlFt });
      const ratio = sp.eatonRatio({ log: "sonic", observed, trend });
      return sp.eatonPorePressure({ ...stress, ratio, exponent: 3 });
    }));
  }
  if (want("pipeline")) {
    record("pore-pressure pipeline (predictPorePressure)", n, await measure(() => sp.predictPorePressure(well, options)));
    const pp = base.ppPsi;
    const win = { tvdFt, ppPsi: pp, svPsi: base.overburden.svPsi };
    const so = { ...STRESS_OPTIONS, stressTests: stressTests(), wellbore: { ...STRESS_OPTIONS.wellbore, dtUsPerFt: observed } };
    record("stress + window (predictStressWindow)", n, await measure(() => sp.predictStressWindow(win, so)));
    record("whole pipeline (pore pressure + stress window)", n, await measure(() => {
      const p = sp.predictPorePressure(well, options);
      return sp.predictStressWindow({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, svPsi: p.overburden.svPsi }, { ...so, wellbore: { ...so.wellbore, dtUsPerFt: p.shaleLine.dtUsPerFt } });
    }));
  }
  if (want("append") && n === 40000 && typeof sp.appendDepthSamples === "function") {
    // While drilling: a chain of updates, as a follow loop runs them; each call appends the
    // next 500 samples. The first calls warm the JIT up (untimed); the timed calls see wells
    // centred on 40,000 samples (30,000 to 50,000 in the full run), and the chain grows its
    // buffers on the way (those re-allocations are timed too). A state is extended in place,
    // so each call takes the state the previous call returned.
    const warmup = quick ? 2 : 20;
    const runs = quick ? 5 : 40;
    const chunks = warmup + runs;
    const n0 = n - 500 * (warmup + runs / 2);
    const big = generateBenchWell({ samples: n0 + 500 * chunks }).well;
    const cut = (a, from, to) => a.slice(from, to);
    const head = { ...big, mdFt: cut(big.mdFt, 0, n0), tvdFt: cut(big.tvdFt, 0, n0), curves: Object.fromEntries(Object.entries(big.curves).map(([k, c]) => [k, { ...c, values: cut(c.values, 0, n0) }])) };
    const chunkList = Array.from({ length: chunks }, (_, k) => {
      const a = n0 + 500 * k;
      return { mdFt: cut(big.mdFt, a, a + 500), tvdFt: cut(big.tvdFt, a, a + 500), curves: Object.fromEntries(Object.entries(big.curves).map(([r, c]) => [r, cut(c.values, a, a + 500)])) };
    });
    let state = sp.startWhileDrilling(head, options);
    let next = 0;
    record("append 500 samples + refresh (appendDepthSamples)", n, await measure(() => {
      if (next >= chunks) throw new Error("append benchmark ran out of chunks");
      state = sp.appendDepthSamples(state, chunkList[next++]);
      return state;
    }, { warmup, runs, minMs: 0 }));
    // All curves: the pore-pressure update, then the stress window (minimum stress with its
    // leak-off calibration, bounds, wellbore limits, mud-weight window, findings, casing
    // points) refreshed from the samples the update recomputed.
    const inputOf = (p) => ({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, svPsi: p.overburden.svPsi, dtUsPerFt: p.shaleLine.dtUsPerFt });
    let pp = sp.startWhileDrilling(head, options);
    let win = sp.startStressWindowWhileDrilling(inputOf(pp.prediction), { ...STRESS_OPTIONS, stressTests: stressTests().filter((t) => t.tvdFt < head.tvdFt[n0 - 1]) });
    next = 0;
    record("append 500 samples + refresh pore pressure and stress window", n, await measure(() => {
      if (next >= chunks) throw new Error("append benchmark ran out of chunks");
      pp = sp.appendDepthSamples(pp, chunkList[next++]);
      win = sp.refreshStressWindow(win, inputOf(pp.prediction), pp.recomputedFromIndex);
      return win;
    }, { warmup, runs, minMs: 0 }));
  }
  if (want("segment") && typeof sp.segmentPressureProfile === "function") {
    record("segmentation (segmentPressureProfile)", n, await measure(() => sp.segmentPressureProfile({ tvdFt, ppPsi: base.ppPsi, hydrostaticPsi: base.hydrostaticPsi }), { runs: 7, warmup: 1 }));
  }
  if (want("monte") && n === 40000 && typeof sp.simulatePressureUncertainty === "function") {
    const mcInputOf = () => monteCarloInput(well, base);
    const mc = () => sp.simulatePressureUncertainty(mcInputOf());
    record("Monte Carlo 1,000 × 40,000 (Eaton + Eaton 1969)", n, await measure(mc, { runs: 7, warmup: 2, minMs: 0 }));
    // Same input on both cores: depth parts in worker threads (src/uncertainty-node), equal
    // to the single-thread result bit for bit (tested).
    const mcNode = await import(pathToFileURL(path.join(root, "dist/uncertainty-node/index.js")).href);
    const mcInput = mcInputOf();
    record("Monte Carlo 1,000 × 40,000, 2 threads (Eaton + Eaton 1969)", n, await measure(() => mcNode.simulatePressureUncertaintyParallel(mcInput, { threads: 2 }), { runs: 7, warmup: 2, minMs: 0 }));
    await mcNode.closeUncertaintyWorkers();
    // The yardstick: the same Monte Carlo as a clean vectorised numpy script
    // (bench/numpyMonteCarloReference.py) on shalepoint's own draws, when python3 has numpy.
    const probe = spawnSync("python3", ["-c", "import numpy"], { encoding: "utf8" });
    if (probe.status === 0) {
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), "shalepoint-numpy-mc-"));
      try {
        const ex = spawnSync(process.execPath, [path.join(here, "exportMonteCarloCase.mjs"), dir, String(n)], { encoding: "utf8" });
        if (ex.status !== 0) throw new Error(`exportMonteCarloCase failed: ${ex.stderr}`);
        const py = spawnSync("python3", [path.join(here, "numpyMonteCarloReference.py"), dir, "--runs", quick ? "3" : "5"], { encoding: "utf8", maxBuffer: 1 << 24 });
        if (py.status !== 0) throw new Error(`numpyMonteCarloReference.py failed: ${py.stderr}`);
        const j = JSON.parse(py.stdout.trim().split("\n").pop());
        const worstRel = Math.max(...["ppP10Psi", "ppP50Psi", "ppP90Psi", "fracP10Psi", "fracP50Psi", "fracP90Psi"].map((k) => j.agreement?.[k]?.maxRelDiff ?? NaN));
        record("numpy reference: same Monte Carlo 1,000 × 40,000", n, { medianMs: j.medianMs, p25Ms: j.p25Ms, p75Ms: j.p75Ms, minMs: j.minMs, runs: j.runs, load1: os.loadavg()[0] }, { numpy: j.numpy, worstQuantileRelDiff: worstRel });
      } finally {
        fs.rmSync(dir, { recursive: true, force: true });
      }
    } else {
      console.log("numpy Monte Carlo reference: skipped (python3 with numpy not found)");
    }
  }
}

async function memoryProbe(mode, n) {
  // Only the pipeline module: the package barrel also loads the formula and I/O modules
  // (mathjs, zod), which a pipeline run does not use.
  const spm = await import(pathToFileURL(path.join(root, "dist/pipeline/index.js")).href);
  const g = generateBenchWell({ samples: n });
  const options = benchOptions();
  global.gc?.();
  const before = process.memoryUsage();
  let peakHeap = 0;
  if (mode === "pipeline") {
    for (let k = 0; k < 1; k++) {
      const p = spm.predictPorePressure(g.well, options);
      const w = spm.predictStressWindow({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, svPsi: p.overburden.svPsi }, { ...STRESS_OPTIONS, stressTests: stressTests(), wellbore: { ...STRESS_OPTIONS.wellbore, dtUsPerFt: p.shaleLine.dtUsPerFt } });
      peakHeap = Math.max(peakHeap, v8.getHeapStatistics().used_heap_size);
      sink += w.shminPsi.length;
    }
  }
  // Peak RSS of this process: VmHWM from /proc (reset at exec). getrusage's maxRSS is not
  // used on Linux because it keeps the high-water mark of the forking parent across exec.
  let peakKb = process.resourceUsage().maxRSS;
  try {
    const m = /VmHWM:\s+(\d+) kB/.exec(fs.readFileSync("/proc/self/status", "utf8"));
    if (m) peakKb = Number(m[1]);
  } catch {
    // not Linux: keep maxRSS
  }
  console.log(JSON.stringify({ maxRssMb: peakKb / 1024, rssBeforeMb: before.rss / 2 ** 20, heapBeforeMb: before.heapUsed / 2 ** 20, peakHeapMb: peakHeap / 2 ** 20 }));
}

function probe(mode, n) {
  const r = spawnSync(process.execPath, ["--expose-gc", fileURLToPath(import.meta.url), "--memory-probe", mode, String(n)], { encoding: "utf8" });
  if (r.status !== 0) throw new Error(`memory probe failed: ${r.stderr}`);
  return JSON.parse(r.stdout.trim().split("\n").pop());
}

// ---------------------------------------------------------------------------------------
const machine = {
  cpu: os.cpus()[0]?.model ?? "unknown",
  cores: os.cpus().length,
  memoryGb: os.totalmem() / 2 ** 30,
  node: process.version,
  v8: process.versions.v8,
  platform: `${os.type()} ${os.release()} ${os.arch()}`,
  date: new Date().toISOString(),
};
console.log(`machine: ${machine.cpu}, ${machine.cores} cores, ${machine.memoryGb.toFixed(1)} GB, Node ${machine.node}`);
const loadStart = os.loadavg();
for (const n of [40000, 200000]) await benchSize(n);
// Demo study end to end: the CLI in a fresh process (three demo wells, outputs and report
// written to a temporary folder outside the repository), timed from spawn to exit.
if (want("demo") && fs.existsSync(path.join(root, "dist/cli/main.js")) && fs.existsSync(path.join(root, "demo-logs/demo-study.json"))) {
  for (const variant of [{ name: "demo study end to end (CLI demo, report + PNG chart)", extra: [] }, { name: "demo study end to end (CLI demo, report, no PNG)", extra: ["--no-png"] }]) {
    const m = await measure(() => {
      const out = fs.mkdtempSync(path.join(os.tmpdir(), "shalepoint-bench-demo-"));
      try {
        const r = spawnSync(process.execPath, [path.join(root, "dist/cli/main.js"), "demo", "--out", path.join(out, "o"), "--quiet", ...variant.extra], { encoding: "utf8" });
        if (r.status !== 0) throw new Error(`demo failed (${r.status}): ${r.stderr}`);
        if (!fs.existsSync(path.join(out, "o", "report.html"))) throw new Error("demo wrote no report.html");
        return { ok: 1 };
      } finally {
        fs.rmSync(out, { recursive: true, force: true });
      }
    }, { warmup: 0, runs: 3, minMs: 0 });
    record(variant.name, 3, m);
  }
}
let memory = null;
if (want("memory")) {
  memory = { idle: probe("idle", 200000), pipeline: probe("pipeline", 200000) };
  console.log(`memory: 200,000-sample pipeline peak RSS ${memory.pipeline.maxRssMb.toFixed(0)} MB (process with the generated well only: ${memory.idle.maxRssMb.toFixed(0)} MB); peak V8 heap ${memory.pipeline.peakHeapMb.toFixed(0)} MB`);
}
const loadEnd = os.loadavg();

if (write) {
  const { renderBenchmarks } = await import("./renderBenchmarks.mjs");
  const text = renderBenchmarks({ machine, results, memory, loadStart, loadEnd, quick });
  fs.writeFileSync(path.join(root, "BENCHMARKS.md.tmp"), text);
  fs.renameSync(path.join(root, "BENCHMARKS.md.tmp"), path.join(root, "BENCHMARKS.md"));
  console.log("wrote BENCHMARKS.md");
}
if (sink === -1) console.log(sink);
