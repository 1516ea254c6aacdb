/**
 * Parallel Monte Carlo: must equal the single-thread simulatePressureUncertainty bit for bit
 * (same draws, parts cut on 64-depth blocks, exact quantiles). The worker script is compiled
 * from src with esbuild into a temporary folder, as `npm run build` would place it in dist.
 */
import { afterAll, describe, expect, it } from "vitest";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { build } from "esbuild";
import { closeUncertaintyWorkers, simulatePressureUncertaintyParallel } from "../../src/uncertainty-node/index.js";
import { simulatePressureUncertainty, type PressureUncertaintyInput } from "../../src/uncertainty/index.js";

const here = path.dirname(fileURLToPath(import.meta.url));

async function workerUrl(): Promise<URL> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sp-mc-worker-"));
  const outfile = path.join(dir, "uncertaintyPartWorker.mjs");
  await build({
    entryPoints: [path.join(here, "../../src/uncertainty-node/uncertaintyPartWorker.ts")],
    bundle: true, platform: "node", format: "esm", outfile, logLevel: "silent",
  });
  return pathToFileURL(outfile);
}

/** Own case: a 10,000-depth Quillon-style well (0.5 ft steps, a few irregular steps and gaps). */
function wellInput(): PressureUncertaintyInput {
  const D = 10_000;
  const bml = new Float64Array(D);
  let z = 1000;
  for (let i = 0; i < D; i++) {
    bml[i] = z;
    z += i % 997 === 0 ? 0.75 : 0.5;
  }
  const tvd = bml.map((b) => b + 5082);
  const obs = bml.map((b, i) => (i % 1234 === 0 ? NaN : 65 + 135 * Math.exp(-3e-4 * b) * (1 + 0.25 * Math.max(0, Math.sin(i / 700)))));
  return Object.freeze({
    tvdFt: tvd, bmlFt: bml, overburdenPsi: tvd.map((t) => 0.95 * t), hydrostaticPsi: tvd.map((t) => 0.465 * t), observed: obs,
    plannedMudWeightPsiPerFt: tvd.map(() => 0.6),
    overburdenFactor: { kind: "normal", mean: 1, std: 0.02 },
    porePressure: {
      kind: "eaton", exponent: { kind: "normal", mean: 3, std: 0.3 },
      trend: { kind: "sonicExponential", segments: [
        { topBmlFt: 0, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 200, decayPerFt: 3e-4 }, fittedOn: null },
        { topBmlFt: 4000, params: { dtMatrixUsPerFt: 65, dtMudlineUsPerFt: 190, decayPerFt: 2.8e-4 }, fittedOn: null },
      ] },
      trendCovariance: [{ interceptVar: 4e-4, slopeVar: 4e-10, interceptSlopeCov: -2e-7 }, null],
    },
    fracture: { kind: "eaton1969", poissonRatio: { kind: "truncatedNormal", mean: 0.42, std: 0.03, min: 0.3, max: 0.49 } },
    realisations: 101, seed: 5,
  }) as PressureUncertaintyInput;
}

describe("simulatePressureUncertaintyParallel", () => {
  afterAll(() => closeUncertaintyWorkers());

  it("equals simulatePressureUncertainty bit for bit with 2 and 3 threads, and again on kept workers", async () => {
    // Own case (design property): same seed → same draws; parts start on 64-depth blocks.
    // The last call (2 threads again) runs on a worker kept from the earlier calls.
    const url = await workerUrl();
    const input = wellInput();
    const serial = simulatePressureUncertainty(input);
    for (const threads of [2, 3, 2]) {
      const parallel = await simulatePressureUncertaintyParallel(input, { threads, workerUrl: url });
      expect(parallel).toEqual(serial);
    }
    expect(serial.warnings.find((w) => w.code === "W_MC_MISSING_DEPTHS")?.count).toBe(9); // NaN at 0, 1234, …, 9872
  }, 60_000);

  it("short wells and threads = 1 run on the calling thread; bad input rejects with the core's code", async () => {
    const input = wellInput();
    const short = { ...input, tvdFt: input.tvdFt.slice(0, 500) } as PressureUncertaintyInput;
    await expect(simulatePressureUncertaintyParallel(short, { threads: 2 })).rejects.toMatchObject({ code: "E_LENGTH" });
    await expect(simulatePressureUncertaintyParallel(input, { threads: 0 })).rejects.toMatchObject({ code: "E_RANGE" });
    const url = await workerUrl();
    await expect(simulatePressureUncertaintyParallel({ ...input, realisations: 5 }, { threads: 2, workerUrl: url })).rejects.toMatchObject({ code: "E_MC_TOO_FEW_REALISATIONS" });
    const one = await simulatePressureUncertaintyParallel(input, { threads: 1 });
    expect(one.ppP50Psi).toEqual(simulatePressureUncertainty(input).ppP50Psi);
  }, 60_000);
});
