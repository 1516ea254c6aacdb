/**
 * writeDemoLogs / buildDemoLogFiles: the committed demo-logs folder is exactly what the
 * generator writes for the default seed; a different seed changes the noise only.
 */
import { describe, expect, it } from "vitest";
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from "node:fs";
import { join } from "node:path";
import { tmpdir } from "node:os";
import { fileURLToPath } from "node:url";
import { writeDemoLogs } from "../../src/synthetic/writeDemoLogs.js";
import { buildDemoLogFiles, DEMO_LOGS_SEED } from "../../src/synthetic/demoFiles.js";
import { createSeededRandom } from "../../src/synthetic/seededRandom.js";
import { generateDemoWellLogs } from "../../src/synthetic/syntheticLogs.js";
import { QUILLON_DEMO_WELLS, QUILLON_ROCK } from "../../src/synthetic/demoWellDesigns.js";

const committed = fileURLToPath(new URL("../../demo-logs/", import.meta.url));

function listFiles(dir: string, prefix = ""): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir).sort()) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...listFiles(p, `${prefix}${name}/`));
    else out.push(prefix + name);
  }
  return out;
}

/** Files kept in demo-logs/ by hand, not by the generator: study configs and trend files. */
const HAND_WRITTEN = /(^|\/)[^/]*(study|trend)[^/]*\.json$/;

function generatedFiles(dir: string): string[] {
  return listFiles(dir).filter((f) => !HAND_WRITTEN.test(f));
}

describe("writeDemoLogs", () => {
  it("regenerates the committed demo-logs byte for byte (default seed)", () => {
    const dir = mkdtempSync(join(tmpdir(), "shalepoint-demo-"));
    try {
      const written = writeDemoLogs(dir, DEMO_LOGS_SEED);
      // Same set of files as committed (no stale or missing file).
      expect(listFiles(dir)).toEqual(generatedFiles(committed));
      expect(written.length).toBe(generatedFiles(committed).length);
      for (const rel of written) {
        const fresh = readFileSync(join(dir, rel));
        const kept = readFileSync(join(committed, rel));
        expect(fresh.equals(kept), rel).toBe(true);
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe("buildDemoLogFiles", () => {
  it("changes the noisy files but not the truth when the seed changes", () => {
    const a = new Map(buildDemoLogFiles(DEMO_LOGS_SEED).map((f) => [f.path, f.text]));
    const b = new Map(buildDemoLogFiles(DEMO_LOGS_SEED + 1).map((f) => [f.path, f.text]));
    for (const slug of ["quillon-a1", "quillon-a2st", "marten-b1"]) {
      expect(b.get(`${slug}/${slug}.las`)).not.toBe(a.get(`${slug}/${slug}.las`));
      expect(b.get(`${slug}/pressure-tests.csv`)).not.toBe(a.get(`${slug}/pressure-tests.csv`));
      // The designed truth does not depend on the seed.
      expect(b.get(`${slug}/truth.csv`)).toBe(a.get(`${slug}/truth.csv`));
    }
  });
});

describe("createSeededRandom", () => {
  it("repeats the same sequence for the same seed and differs for another", () => {
    const r1 = createSeededRandom(42);
    const r2 = createSeededRandom(42);
    const r3 = createSeededRandom(43);
    const s1 = Array.from({ length: 5 }, () => r1.uniform());
    expect(Array.from({ length: 5 }, () => r2.uniform())).toEqual(s1);
    expect(Array.from({ length: 5 }, () => r3.uniform())).not.toEqual(s1);
  });

  it("gaussian() has the moments of a normal deviate", () => {
    // Normal distribution (common practice, no source): mean 0, variance 1, P(|z| < 1.96) = 0.95.
    // With n = 200,000 the standard errors are 0.0022 (mean), 0.0032 (variance), 0.00049
    // (the 95 % share); bounds are 4 standard errors.
    const r = createSeededRandom(7);
    const n = 200_000;
    let s = 0, ss = 0, inside = 0;
    for (let i = 0; i < n; i++) {
      const z = r.gaussian(0, 1);
      s += z; ss += z * z;
      if (Math.abs(z) < 1.959964) inside++;
    }
    const mean = s / n;
    expect(Math.abs(mean)).toBeLessThan(0.009);
    expect(Math.abs(ss / n - mean * mean - 1)).toBeLessThan(0.013);
    expect(Math.abs(inside / n - 0.95)).toBeLessThan(0.002);
  });

  it("uniform() stays in [0, 1) with mean 1/2 and variance 1/12", () => {
    // Uniform distribution moments (common practice, no source); n = 100,000, 4 standard errors.
    const r = createSeededRandom(11);
    const n = 100_000;
    let s = 0, ss = 0, lo = 1, hi = 0;
    for (let i = 0; i < n; i++) {
      const u = r.uniform();
      s += u; ss += u * u; lo = Math.min(lo, u); hi = Math.max(hi, u);
    }
    expect(lo).toBeGreaterThanOrEqual(0);
    expect(hi).toBeLessThan(1);
    expect(Math.abs(s / n - 0.5)).toBeLessThan(0.0037);
    expect(Math.abs(ss / n - (s / n) ** 2 - 1 / 12)).toBeLessThan(0.0011);
  });
});

describe("generateDemoWellLogs", () => {
  it("adds DT noise of the stated 1.0 µs/ft away from spikes and gaps", () => {
    const logs = generateDemoWellLogs(QUILLON_DEMO_WELLS[0], QUILLON_ROCK, DEMO_LOGS_SEED);
    const inputCopy = JSON.stringify(QUILLON_DEMO_WELLS[0]);
    let s = 0, ss = 0, n = 0;
    for (let i = 0; i < logs.dtUsPerFt.length; i++) {
      const r = logs.dtUsPerFt[i] - logs.clean.dtUsPerFt[i];
      if (!Number.isFinite(r) || Math.abs(r) > 8) continue; // spikes are ≥ 20 µs/ft
      s += r; ss += r * r; n++;
    }
    const std = Math.sqrt(ss / n - (s / n) ** 2);
    // Sample std of ~20,000 Gaussian draws: standard error 0.5 %; allow 3 %.
    expect(Math.abs(std - 1.0)).toBeLessThan(0.03);
    expect(JSON.stringify(QUILLON_DEMO_WELLS[0])).toBe(inputCopy); // design not mutated
  });
});
