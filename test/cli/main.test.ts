import { describe, it, expect, afterAll } from "vitest";
import { mkdtempSync, readFileSync, rmSync, writeFileSync, existsSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { main, CLI_EXIT } from "../../src/cli/main.js";
import { SAFETY_CAUTION_TEXT } from "../../src/present/caution.js";

function capture(): { io: { out: (l: string) => void; err: (l: string) => void; isTty: boolean }; out: string[]; err: string[] } {
  const out: string[] = [];
  const err: string[] = [];
  return { io: { out: (l) => out.push(l), err: (l) => err.push(l), isTty: false }, out, err };
}
const cautionCount = (lines: string[]): number => lines.filter((l) => l === SAFETY_CAUTION_TEXT).length;

/** The demo study with its well file paths made absolute, so it can live in a temp folder. */
function absolutePaths(d: any): any {
  for (const w of d.wells) {
    for (const k of ["las", "survey", "pressureTests", "leakOffTests", "mudWeights", "drillingEvents", "formationTops"]) {
      if (w[k]) w[k] = resolve("demo-logs", w[k]);
    }
  }
  return d;
}

const tmp = mkdtempSync(join(tmpdir(), "sp-cli-"));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

describe("main", () => {
  it("--version prints the package version and exits 0", async () => {
    const c = capture();
    expect(await main(["--version"], c.io)).toBe(CLI_EXIT.ok);
    expect(c.out).toEqual([JSON.parse(readFileSync("package.json", "utf8")).version]);
  });

  it("--help documents the exit codes and prints the caution once", async () => {
    const c = capture();
    expect(await main(["--help"], c.io)).toBe(0);
    const text = c.out.join("\n");
    expect(text).toContain("2  bad input");
    expect(text).toContain("3  the run completed");
    expect(cautionCount(c.out)).toBe(1);
    for (const cmd of ["run", "demo", "inspect", "pick"]) {
      const d = capture();
      expect(await main([cmd, "--help"], d.io)).toBe(0);
      expect(d.out[0]).toContain(`shalepoint ${cmd}`);
    }
  });

  it("an unknown command or option is bad input (exit 2)", async () => {
    const c = capture();
    expect(await main(["frobnicate"], c.io)).toBe(CLI_EXIT.badInput);
    expect(c.err[0]).toContain("E_USAGE");
    const d = capture();
    expect(await main(["run", "x.json", "--colour"], d.io)).toBe(2);
    expect(d.err[0]).toContain("--colour");
  });

  it("a study-file error names the key path (exit 2)", async () => {
    const d = JSON.parse(readFileSync("demo-logs/demo-study.json", "utf8"));
    d.wells[0].methods.eatonSonic.exponent = -3;
    const p = join(tmp, "bad-study.json");
    writeFileSync(p, JSON.stringify(absolutePaths(d)));
    try {
      const c = capture();
      expect(await main(["run", p, "--out", join(tmp, "bad")], c.io)).toBe(2);
      expect(c.err[0]).toContain("wells[0].methods.eatonSonic.exponent");
      expect(cautionCount([...c.out, ...c.err])).toBe(1);
      expect(existsSync(join(tmp, "bad"))).toBe(false);
    } finally {
      rmSync(p, { force: true });
    }
  });

  it("a missing study file is bad input (exit 2)", async () => {
    const c = capture();
    expect(await main(["run", join(tmp, "nope.json")], c.io)).toBe(2);
    expect(c.err[0]).toContain("E_CONFIG");
  });
});

describe("main inspect", () => {
  it("a good LAS file: curves with units and roles, exit 0", async () => {
    const c = capture();
    expect(await main(["inspect", "test/fixtures/las/metric.las"], c.io)).toBe(0);
    const text = c.out.join("\n");
    expect(text).toContain("Result: readable");
    expect(text).toMatch(/Curve roles: .*gammaRay/);
  });

  it("the demo A-1 LAS reports its datums in ft (air gap 82, water 4,000 per demo-logs/README.md)", async () => {
    const c = capture();
    expect(await main(["inspect", "demo-logs/quillon-a1/quillon-a1.las"], c.io)).toBe(0);
    expect(c.out.join("\n")).toContain("rotary table 82.0 ft above sea level, water depth 4000.0 ft");
  });

  it("a metric CSV table is recognised and converted (exit 0)", async () => {
    const c = capture();
    expect(await main(["inspect", "test/fixtures/csv/leak-off-tests-metric.csv"], c.io)).toBe(0);
    expect(c.out.join("\n")).toContain("Table kind: leak-off tests");
  });

  it("a binary file is refused before reading (exit 2)", async () => {
    const c = capture();
    expect(await main(["inspect", "test/fixtures/las/binary.las"], c.io)).toBe(2);
    expect(c.out.join("\n")).toContain("E_FILE_BINARY");
  });

  it("a file over the size limit is refused (exit 2)", async () => {
    const c = capture();
    expect(await main(["inspect", "demo-logs/quillon-a1/quillon-a1.las", "--max-size-mb", "0.5"], c.io)).toBe(2);
    expect(c.out.join("\n")).toContain("E_FILE_TOO_LARGE");
  });

  it("a LAS file with an unknown unit and a CSV with a bad unit are bad input (exit 2)", async () => {
    const c = capture();
    expect(await main(["inspect", "test/fixtures/las/unknown-unit.las"], c.io)).toBe(2);
    expect(c.out.join("\n")).toContain("E_LAS_UNKNOWN_UNIT");
    const d = capture();
    expect(await main(["inspect", "test/fixtures/csv/bad-unit.csv"], d.io)).toBe(2);
  });
});

describe("main run", () => {
  it("a run with an inverted window writes its outputs and exits 3", async () => {
    const d = JSON.parse(readFileSync("demo-logs/demo-study.json", "utf8"));
    d.wells = [d.wells[0]];
    delete d.uncertainty;
    // A deliberately weak fracture model (K = 0.25, Hubbert & Willis 1957 bounds are 1/3–1/2,
    // CHECK-VALUES §6) and 0.4 ppg margins: the window must invert where pore pressure is high.
    d.wells[0].fracture = { method: "stressRatio", stressRatio: 0.25, calibrateToLeakOffTests: false };
    d.margins = { tripPpg: 0.4, kickPpg: 0.4 };
    d.output.report = false;
    d.output.chartPng = false;
    const p = join(tmp, "critical-study.json");
    writeFileSync(p, JSON.stringify(absolutePaths(d)));
    try {
      const c = capture();
      const out = join(tmp, "crit");
      const code = await main(["run", p, "--out", out], c.io);
      expect(c.err.join("\n")).not.toContain("E_");
      expect(code).toBe(CLI_EXIT.criticalFindings);
      expect(c.err.join("\n")).toContain("F_WINDOW_INVERTS");
      expect(existsSync(join(out, "quillon-a1.result.las"))).toBe(true);
      expect(cautionCount([...c.out, ...c.err])).toBe(1);
    } finally {
      rmSync(p, { force: true });
    }
  }, 60_000);
});
