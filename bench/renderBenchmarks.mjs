/** Render the benchmark results as BENCHMARKS.md (plain Markdown, no machine paths). */

const TARGETS = [
  { label: "LAS parse ≥ 100 MB/s (200,000 samples)", stage: "LAS parse (shalepoint readLas)", samples: 200000, check: (r) => r.mbPerS >= 100, show: (r) => `${r.mbPerS.toFixed(1)} MB/s` },
  {
    label: "LAS parse ≥ 3× the reference reader (200,000 samples)",
    stage: "LAS parse (shalepoint readLas)",
    samples: 200000,
    check: (r, all) => r.medianMs * 3 <= ref(all, 200000).medianMs,
    show: (r, all) => `${(ref(all, 200000).medianMs / r.medianMs).toFixed(1)}×`,
  },
  // Issue 3's pipeline is its one-call pore-pressure chain (predictPorePressure); the stress
  // window (issue 4) is timed in its own rows and in the pore pressure + stress window row.
  { label: "pore-pressure pipeline (predictPorePressure: despike, overburden, shale points, two fitted trends, Eaton ×2, Bowers, equivalent depth), 200,000 samples < 15 ms", stage: "pore-pressure pipeline (predictPorePressure)", samples: 200000, check: (r) => r.medianMs < 15 },
  {
    label: "pore-pressure pipeline at least 2× faster than a vectorised numpy script of the same stages (200,000 samples; the issue's aim)",
    stage: "pore-pressure pipeline (predictPorePressure)",
    samples: 200000,
    check: (r, all) => numpyRef(all, 200000) !== undefined && r.medianMs * 2 <= numpyRef(all, 200000).medianMs,
    show: (r, all) => (numpyRef(all, 200000) ? `${ms(r.medianMs)} ms vs numpy ${ms(numpyRef(all, 200000).medianMs)} ms (${(numpyRef(all, 200000).medianMs / r.medianMs).toFixed(2)}×)` : "numpy reference not run"),
  },
  { label: "Monte Carlo 1,000 × 40,000 (P10/P50/P90 of pore and fracture pressure) < 0.7 s median on this 2-core machine (both cores)", stage: "Monte Carlo 1,000 × 40,000, 2 threads (Eaton + Eaton 1969)", samples: 40000, check: (r) => r.medianMs < 700 },
  {
    // The issue states its 0.7 s beside "a vectorised numpy script needs about 1.3 s": at
    // least 1.3/0.7 = 1.86 times numpy's speed, measured here on the same draws.
    label: "Monte Carlo at least 1.86× faster than a vectorised numpy script of it (the issue's 0.7 s against its numpy 1.3 s), both cores",
    stage: "Monte Carlo 1,000 × 40,000, 2 threads (Eaton + Eaton 1969)",
    samples: 40000,
    check: (r, all) => numpyMc(all) !== undefined && r.medianMs * (1.3 / 0.7) <= numpyMc(all).medianMs,
    show: (r, all) => (numpyMc(all) ? `${ms(r.medianMs)} ms vs numpy ${ms(numpyMc(all).medianMs)} ms (${(numpyMc(all).medianMs / r.medianMs).toFixed(2)}×)` : "numpy reference not run"),
  },
  { label: "trend refit + pore-pressure recompute, 40,000 samples < 3 ms", stage: "trend refit + Eaton recompute", samples: 40000, check: (r) => r.medianMs < 3 },
  { label: "segmentation of a 200,000-sample profile < 200 ms", stage: "segmentation (segmentPressureProfile)", samples: 200000, check: (r) => r.medianMs < 200 },
];

function numpyRef(all, samples) {
  return all.find((r) => r.stage === "numpy reference: same pore-pressure stages" && r.samples === samples);
}
function numpyMc(all) {
  return all.find((r) => r.stage === "numpy reference: same Monte Carlo 1,000 × 40,000");
}
function ref(all, samples) {
  return all.find((r) => r.stage === "LAS parse (reference: las-js data())" && r.samples === samples);
}
const ms = (x) => (x >= 100 ? x.toFixed(0) : x >= 10 ? x.toFixed(1) : x.toFixed(2));

export function renderBenchmarks({ machine, results, memory, loadStart, loadEnd, quick }) {
  const L = [];
  L.push("# Benchmarks");
  L.push("");
  L.push("Written by `node bench/run.mjs` (after `npm run -s build`). Generated wells only: the");
  L.push("fictional Quillon BENCH-1 of `bench/generateBenchWell.mjs` (invented data, seeded), at");
  L.push("40,000 and 200,000 samples between 5,000 and 15,000 ft TVD. Speed is measured here and never");
  L.push("asserted in tests.");
  L.push("");
  L.push("Caution: shalepoint's results are estimates for trained engineers; calibrate them to measured");
  L.push("data and have them reviewed; local regulations and licensed practice govern.");
  L.push("");
  L.push("## Machine");
  L.push("");
  L.push(`- CPU: ${machine.cpu}, ${machine.cores} cores; memory ${machine.memoryGb.toFixed(1)} GB`);
  L.push(`- Node ${machine.node} (V8 ${machine.v8}); ${machine.platform}`);
  L.push(`- Run: ${machine.date}${quick ? " (quick mode: fewer runs)" : ""}`);
  L.push(`- Load average (1/5/15 min) at start ${loadStart.map((x) => x.toFixed(2)).join(" / ")}, at end ${loadEnd.map((x) => x.toFixed(2)).join(" / ")}.`);
  L.push("  The machine is shared: a 1-minute load above the core count means other processes took");
  L.push("  CPU during the run and the medians are pessimistic; the `load` column is the 1-minute");
  L.push("  load when each stage finished.");
  L.push("");
  L.push("## Targets");
  L.push("");
  L.push("| target | measured (median) | met |");
  L.push("| --- | --- | --- |");
  for (const t of TARGETS) {
    const r = results.find((x) => x.stage === t.stage && x.samples === t.samples);
    if (!r) {
      L.push(`| ${t.label} | not measured | — |`);
      continue;
    }
    const shown = t.show ? t.show(r, results) : `${ms(r.medianMs)} ms`;
    L.push(`| ${t.label} | ${shown} | ${t.check(r, results) ? "yes" : "no"} |`);
  }
  if (memory) {
    const ok = memory.pipeline.maxRssMb < 200;
    L.push(`| peak memory of the 200,000-sample pipeline < 200 MB | ${memory.pipeline.maxRssMb.toFixed(0)} MB peak RSS of the whole process | ${ok ? "yes" : "no"} |`);
  }
  const demo = results.find((x) => x.stage === "demo study end to end (CLI demo, report + PNG chart)");
  if (demo) L.push(`| demo study end to end (3 wells, report written) < 10 s | ${(demo.medianMs / 1000).toFixed(2)} s (with the PNG chart; ${(results.find((x) => x.stage.includes("no PNG"))?.medianMs / 1000).toFixed(2)} s without) | ${demo.medianMs < 10000 ? "yes" : "no"} |`);
  else L.push("| demo study end to end (3 wells, report written) < 10 s | not measured (build the CLI first) | — |");
  const app = results.find((x) => x.stage === "append 500 samples + refresh pore pressure and stress window");
  const appPp = results.find((x) => x.stage === "append 500 samples + refresh (appendDepthSamples)");
  if (app) L.push(`| append 500 samples to a 40,000-sample well and refresh all curves (pore pressure, stress window) < 5 ms | ${ms(app.medianMs)} ms (pore-pressure curves alone ${appPp ? ms(appPp.medianMs) : "—"} ms) | ${app.medianMs < 5 ? "yes" : "no"} |`);
  else L.push("| append 500 samples to a 40,000-sample well and refresh all curves < 5 ms | slot: incremental update not built | — |");
  L.push("");
  if (memory) {
    L.push("Memory: peak resident set of a fresh Node process that generates the 200,000-sample well and");
    L.push(`runs the whole pipeline once (only the pipeline module loaded): ${memory.pipeline.maxRssMb.toFixed(0)} MB (the same process with the generated`);
    L.push(`well only: ${memory.idle.maxRssMb.toFixed(0)} MB); peak V8 heap in use after a pipeline run ${memory.pipeline.peakHeapMb.toFixed(0)} MB.`);
    L.push("");
  }
  L.push("## All stages");
  L.push("");
  L.push("Median, interquartile range (p25–p75) and fastest run, in ms, after warm-up runs (timed with tinybench).");
  L.push("");
  L.push("Samples: the demo-study rows count wells, not samples.");
  L.push("");
  L.push("| stage | samples | median | p25–p75 | min | runs | MB/s | load |");
  L.push("| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |");
  for (const r of results) {
    L.push(`| ${r.stage} | ${r.samples.toLocaleString("en-US")} | ${ms(r.medianMs)} | ${ms(r.p25Ms)}–${ms(r.p75Ms)} | ${ms(r.minMs)} | ${r.runs} | ${r.mbPerS ? r.mbPerS.toFixed(1) : ""} | ${r.load1.toFixed(2)} |`);
  }
  L.push("");
  const np = results.filter((r) => r.stage === "numpy reference: same pore-pressure stages");
  if (np.length > 0) {
    L.push("The numpy reference is `bench/numpyReference.py` (numpy " + np[0].numpy + " and scipy, run by the harness when");
    L.push("python3 has them): the stages of `predictPorePressure` with the bench options, vectorised");
    L.push("(despike by `scipy.ndimage.median_filter` plus an exact MAD count), on the same well exported by");
    L.push("`bench/exportBenchWell.mjs`. Its despike of four logs takes " + np.map((r) => `${ms(r.despikeMs)} ms at ${r.samples.toLocaleString("en-US")}`).join(" and ") + " samples;");
    L.push("its pore pressures differ from shalepoint's by at most " + np.map((r) => r.worstPpDiffPsi.toExponential(1)).join(" and ") + " psi (rounding).");
    L.push("");
  }
  const npMc = results.find((r) => r.stage === "numpy reference: same Monte Carlo 1,000 × 40,000");
  if (npMc) {
    L.push("The numpy Monte Carlo reference is `bench/numpyMonteCarloReference.py` (numpy " + npMc.numpy + "): the same");
    L.push("Eaton / Eaton 1969 Monte Carlo on shalepoint's own draws (exported by `bench/exportMonteCarloCase.mjs`),");
    L.push("vectorised over blocks of 1,000 depths × 1,000 realisations, type-7 quantiles from `np.sort` (faster");
    L.push("here than `np.percentile`). Its P10/P50/P90 differ from shalepoint's by at most " + npMc.worstQuantileRelDiff.toExponential(1) + " (relative).");
    L.push("");
  }
  L.push("The reference LAS reader is `las-js` (npm), called as `new Las(text, { loadFile: false }).data()`");
  L.push("on the same text in the same run. It returns a row array; shalepoint's reader returns typed");
  L.push("columns, header items and warnings and checks the file against LAS 2.0.");
  L.push("");
  L.push("## What was changed, and what limits the missed targets");
  L.push("");
  L.push("Profiled with `node --cpu-prof` on the 200,000-sample pipeline. Changed (output identical,");
  L.push("checked against the previous code on random inputs and by the test suites):");
  L.push("");
  L.push("- `despikeLog` (Hampel identifier): the window is kept sorted as it slides (one removal, one");
  L.push("  insertion per sample) and the MAD test r > k·1.4826·MAD is decided by counting deviations");
  L.push("  below r/(k·1.4826) instead of sorting them (odd windows; even windows keep the full rule).");
  L.push("  About 4× faster; it runs on four curves per pipeline call (GR, DT, RHOB, resistivity).");
  L.push("- `equivalentDepthPorePressure`: for a sampled trend, Ze comes from a binary search for the");
  L.push("  bracketing trend samples and the exact root of that linear piece (it was a 40-step");
  L.push("  bisection with a binary-search interpolation at each step); the trend at Z is read with a");
  L.push("  forward cursor; Sv and Ph at Ze share one search. Results agree with the bisection to");
  L.push("  3e-9 psi on the benchmark well (the bisection's own tolerance is 1e-12 relative in depth).");
  L.push("- `pickShalePoints`: one flat index list with offsets instead of an array per point, medians");
  L.push("  with a typed scratch buffer.");
  L.push("- `flagWarnings` counts all flag bits in one pass; `mudWeightWindow` builds its run flags in");
  L.push("  typed arrays.");
  L.push("- While drilling: a state's per-sample arrays are views on buffers with room to grow");
  L.push("  (`GrowthRoom`), so an append writes the samples it recomputes instead of copying about 40");
  L.push("  well-length arrays (only the latest state of a chain can be extended; `copyWhileDrillingState`");
  L.push("  keeps a snapshot); equivalent depth computes from the restart sample only (`fromIndex`, the");
  L.push("  whole well still the search context). The stress window follows with `refreshStressWindow`:");
  L.push("  per-sample curves from the restart, findings and casing seats over the whole well in single");
  L.push("  passes. Both equal the full runs bit for bit (tests).");
  L.push("- Huber trend fits take their medians by selection (same order statistics as a sort).");
  L.push("- Monte Carlo: quantiles by a partitioned order around the three ranks (exact); a Taylor-stepped");
  L.push("  trend; a branch-free table-driven exponential within 5e-16 of `Math.exp` (the engine's `Math.exp`");
  L.push("  took about twice as long on the Eaton exponents, whose size flips its reduction branch); each");
  L.push("  per-depth pass a short function of its own (the same loops inside one function ran about half");
  L.push("  as fast).");
  L.push("");
  L.push("Limits:");
  L.push("");
  const pipe = results.find((r) => r.stage === "pore-pressure pipeline (predictPorePressure)" && r.samples === 200000);
  const np2 = results.find((r) => r.stage === "numpy reference: same pore-pressure stages" && r.samples === 200000);
  const floorExp = results.find((r) => r.stage === "floor: Math.exp per sample");
  const floorLog = results.find((r) => r.stage === "floor: Math.log per sample");
  const despike2 = results.find((r) => r.stage === "despike (Hampel, 11 samples)" && r.samples === 200000);
  if (pipe) {
    L.push(`- Pore-pressure pipeline at 200,000 samples: ${ms(pipe.medianMs)} ms against the 15 ms target.` + (np2 ? ` The vectorised numpy` : ""));
    if (np2) {
      L.push(`  script of the same stages takes ${ms(np2.medianMs)} ms on this machine (the issue expected about 38 ms \"on this`);
      L.push(`  kind of machine\"), ${ms(np2.despikeMs)} ms of it in the four Hampel despikes alone, so 15 ms is out of reach here for`);
      L.push(`  these stages in either language; shalepoint runs at ${(np2.medianMs / pipe.medianMs).toFixed(2)}× numpy's speed (the issue's aim: 2×).`);
    }
    if (floorExp && floorLog && despike2) {
      L.push(`  The floor on this machine: one \`Math.exp\` per sample costs ${ms(floorExp.medianMs)} ms and one \`Math.log\` ${ms(floorLog.medianMs)} ms`);
      L.push("  over 200,000 samples; the pipeline needs about six transcendental calls per sample (two trend");
      L.push(`  exponentials, the resistivity Eaton power, the Bowers power) and four despikes (${ms(despike2.medianMs)} ms each here),`);
      L.push("  before any shale picking, equivalent-depth search or the ~85 result arrays it returns.");
    }
    const pipe40 = results.find((r) => r.stage === "pore-pressure pipeline (predictPorePressure)" && r.samples === 40000);
    const np40 = results.find((r) => r.stage === "numpy reference: same pore-pressure stages" && r.samples === 40000);
    L.push("  Closing the gap needs fewer result arrays (caller-owned buffers), fused passes and a cheaper");
    L.push("  despike" + (pipe40 && np40 ? `; at 40,000 samples shalepoint takes ${ms(pipe40.medianMs)} ms and the numpy script ${ms(np40.medianMs)} ms.` : "."));
  }
  const mc1 = results.find((r) => r.stage === "Monte Carlo 1,000 × 40,000 (Eaton + Eaton 1969)");
  const mc2 = results.find((r) => r.stage === "Monte Carlo 1,000 × 40,000, 2 threads (Eaton + Eaton 1969)");
  if (mc1 && mc2) {
    const npMc2 = results.find((r) => r.stage === "numpy reference: same Monte Carlo 1,000 × 40,000");
    L.push(`- Monte Carlo: ${ms(mc2.medianMs)} ms on two threads (fastest run ${ms(mc2.minMs)} ms), ${ms(mc1.medianMs)} ms on one (fastest ${ms(mc1.minMs)} ms)` + (npMc2 ? `; the numpy script ${ms(npMc2.medianMs)} ms.` : "."));
    L.push("  Each depth makes four passes over the 1,000 realisations (trend polynomial, exponential,");
    L.push("  pressure with fracture pressure, moments and exceedance counts) and two exact quantile");
    L.push("  trackers, at about 2.5–8 ns per value each on this machine. The spread between the fastest");
    L.push("  and the median run shows how much the shared machine's CPU varies (the same run took 1.0 to");
    L.push("  2.2 s on one thread within an hour).");
  }
  L.push("- LAS parse figures depend strongly on machine load (84–120 MB/s across runs here): the");
  L.push("  reader is a single pass over the characters with no per-token strings.");
  L.push("");
  return L.join("\n");
}
