import { describe, it, expect, beforeAll, afterAll } from "vitest";
import { mkdtempSync, readFileSync, readdirSync, rmSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { createHash } from "node:crypto";
import { loadStudyConfig } from "../../src/study/config.js";
import { runStudy, type StudyResult } from "../../src/study/runStudy.js";
import { writeStudyOutputs } from "../../src/study/writeStudyOutputs.js";
import { readLas } from "../../src/io/readLas.js";

const DEMO = resolve("demo-logs/demo-study.json");
const sha = (p: string): string => createHash("sha256").update(readFileSync(p)).digest("hex");

function inputFiles(): string[] {
  const out: string[] = [DEMO];
  for (const d of ["quillon-a1", "quillon-a2st", "marten-b1"]) {
    for (const f of readdirSync(resolve("demo-logs", d))) out.push(resolve("demo-logs", d, f));
  }
  return out;
}

describe("runStudy + writeStudyOutputs on the demo study", () => {
  let dirA = "";
  let dirB = "";
  let result: StudyResult;
  const before = new Map<string, string>();

  beforeAll(async () => {
    for (const f of inputFiles()) before.set(f, sha(f));
    dirA = mkdtempSync(join(tmpdir(), "sp-study-a-"));
    dirB = mkdtempSync(join(tmpdir(), "sp-study-b-"));
    result = runStudy(loadStudyConfig(DEMO, { outDir: dirA }));
    await writeStudyOutputs(result, dirA, { chartPng: false });
    const second = runStudy(loadStudyConfig(DEMO, { outDir: dirB }));
    await writeStudyOutputs(second, dirB, { chartPng: false });
  }, 120_000);

  afterAll(() => {
    rmSync(dirA, { recursive: true, force: true });
    rmSync(dirB, { recursive: true, force: true });
  });

  it("writes every output file and no temporary file", () => {
    const names = readdirSync(dirA).sort();
    expect(names).toEqual(
      [
        "marten-b1.result.csv", "marten-b1.result.las", "quillon-a1.result.csv", "quillon-a1.result.las",
        "quillon-a2st.result.csv", "quillon-a2st.result.las", "report.html", "study-summary.json",
      ].sort(),
    );
    expect(names.some((n) => n.includes(".tmp-"))).toBe(false);
  });

  it("leaves every input byte-identical after two runs", () => {
    for (const [f, h] of before) expect(sha(f), f).toBe(h);
  });

  it("writes identical outputs on two runs", () => {
    for (const n of readdirSync(dirA)) expect(sha(join(dirB, n)), n).toBe(sha(join(dirA, n)));
  });

  it("result LAS reads back and its PP curve equals the in-memory pore pressure", () => {
    for (const w of result.wells) {
      const { las } = readLas(readFileSync(join(dirA, `${w.id}.result.las`), "utf8"));
      const j = las.curves.findIndex((c) => c.mnemonic === "PP");
      expect(las.curves[j].unit).toBe("PSI");
      const pp = las.data[j];
      expect(pp.length).toBe(w.prediction.ppPsi.length);
      let compared = 0;
      for (let i = 0; i < pp.length; i++) {
        const x = w.prediction.ppPsi[i];
        if (Number.isFinite(x)) {
          // Written with 4 decimals: the round-off is at most 5e-5 psi.
          expect(Math.abs(pp[i] - x)).toBeLessThanOrEqual(5.0001e-5);
          compared++;
        } else expect(Number.isNaN(pp[i])).toBe(true);
      }
      expect(compared).toBeGreaterThan(1000);
    }
  });

  it("PP_EMW in the result LAS is PP / TVD in ppg with 12/231 psi/ft per ppg", () => {
    const w = result.wells[0];
    const { las } = readLas(readFileSync(join(dirA, `${w.id}.result.las`), "utf8"));
    const col = (m: string): Float64Array => las.data[las.curves.findIndex((c) => c.mnemonic === m)];
    const pp = col("PP");
    const tvd = col("TVD");
    const emw = col("PP_EMW");
    // CHECK-VALUES §0 (published basis): 1 US gal = 231 in³ → 12/231 psi/ft per ppg;
    // own case there: 12.0 ppg at 10,000 ft → 6234 psi.
    expect((12.0 * 12) / 231 * 10000).toBeCloseTo(6233.77, 1);
    const i = Math.floor(pp.length * 0.7);
    expect(emw[i]).toBeCloseTo(pp[i] / tvd[i] / (12 / 231), 3);
  });

  it("summary provenance hashes match SHA-256 of the inputs (node:crypto)", () => {
    const summary = JSON.parse(readFileSync(join(dirA, "study-summary.json"), "utf8"));
    expect(summary.provenance.configSha256).toBe(sha(DEMO));
    expect(summary.provenance.version).toBe(JSON.parse(readFileSync("package.json", "utf8")).version);
    const inputs = summary.provenance.inputs as { path: string; sha256: string }[];
    expect(inputs.length).toBe(19);
    for (const { path, sha256 } of inputs) expect(sha256, path).toBe(sha(resolve("demo-logs", path)));
    expect(inputs.some((x) => x.path.includes("truth"))).toBe(false);
    expect(summary.caution).toMatch(/trained engineers/);
  });

  it("A-2ST is placed in TVD by its survey: TVD below MD past the kick-off", () => {
    const w = result.wells[1];
    const n = w.well.mdFt.length;
    // CHECK-VALUES §10 (minimum curvature, published method): a 45° hold shortens TVD.
    expect(w.well.tvdFt[n - 1]).toBeLessThan(w.well.mdFt[n - 1] - 1000);
  });

  it("the fracture model calibrated to the leak-off tests gives ν an engineer would accept", () => {
    // Soft-shale Poisson's ratio roughly 0.35–0.47 (common practice, no source).
    for (const w of result.wells) {
      const nu = w.stressWindow.fractureCalibration!.parameter;
      expect(nu).toBeGreaterThan(0.33);
      expect(nu).toBeLessThan(0.47);
    }
  });

  it("report.html is self-contained and carries the caution", () => {
    const html = readFileSync(join(dirA, "report.html"), "utf8");
    expect(html).toMatch(/trained engineers/);
    expect(html).not.toMatch(/<script[^>]+src=/i);
    expect(existsSync(join(dirA, "pressure-chart.png"))).toBe(false);
  });
});
