import { describe, it, expect } from "vitest";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { createHash } from "node:crypto";
import { loadStudyConfig, parseStudyConfig, studyConfigFromText, studyDepthFt, studyGradientPsiPerFt, formatKeyPath } from "../../src/study/config.js";
import { errorOf } from "../helpers/shalepointErrors.js";

const DEMO = resolve("demo-logs/demo-study.json");
const demo = (): Record<string, any> => JSON.parse(readFileSync(DEMO, "utf8"));

describe("loadStudyConfig", () => {
  it("loads the demo study and resolves paths against the study file's folder", () => {
    const cfg = loadStudyConfig(DEMO);
    expect(cfg.file.wells.map((w) => w.id)).toEqual(["quillon-a1", "quillon-a2st", "marten-b1"]);
    expect(cfg.wellPaths[1].survey).toBe(resolve("demo-logs/quillon-a2st/survey.csv"));
    expect(cfg.outDir).toBe(resolve("demo-output"));
    // Outside reference: node:crypto SHA-256 of the file bytes (own case).
    expect(cfg.configSha256).toBe(createHash("sha256").update(readFileSync(DEMO)).digest("hex"));
  });

  it("names a missing input file by its key path", () => {
    const d = demo();
    d.wells[1].leakOffTests = "quillon-a2st/no-such-file.csv";
    const e = errorOf(() => studyConfigFromText(JSON.stringify(d), DEMO));
    expect(e.code).toBe("E_CONFIG");
    expect(e.details.param).toBe("wells[1].leakOffTests");
    expect(e.message).toContain("file not found");
    expect(e.message).toContain("no-such-file.csv");
  });

  it("refuses an output folder that holds input files", () => {
    const e = errorOf(() => studyConfigFromText(readFileSync(DEMO, "utf8"), DEMO, { outDir: resolve("demo-logs/quillon-a1") }));
    expect(e.code).toBe("E_CONFIG");
    expect(e.details.param).toBe("--out");
  });

  it("reports a file that is not JSON", () => {
    const dir = mkdtempSync(join(tmpdir(), "sp-cfg-"));
    try {
      const e = errorOf(() => studyConfigFromText("{ title: ", join(dir, "s.json")));
      expect(e.code).toBe("E_CONFIG");
      expect(e.message).toContain("not valid JSON");
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe("parseStudyConfig", () => {
  it("names an unknown key with its path and lists the allowed keys", () => {
    const d = demo();
    d.wells[1].methods.eatonSonc = { exponent: 3 };
    const e = errorOf(() => parseStudyConfig(d, "study.json"));
    expect(e.code).toBe("E_CONFIG");
    expect(e.details.param).toBe("wells[1].methods.eatonSonc");
    expect(e.details.allowed).toContain("eatonSonic");
    expect(e.details.allowed).toContain("bowers");
  });

  it("names a wrong type with its path", () => {
    const d = demo();
    d.wells[1].methods.eatonSonic.exponent = "three";
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("wells[1].methods.eatonSonic.exponent");
    expect(e.message).toContain("must be a number");
    // The published default travels in the hint (Eaton 1975 sonic exponent 3.0; CHECK-VALUES §3, published).
    expect(e.message).toContain("default 3.0");
  });

  it("names an unknown unit and lists the allowed units", () => {
    const d = demo();
    d.wells[2].methods.bowers.unloading.onsetTvd.unit = "furlong";
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("wells[2].methods.bowers.unloading.onsetTvd.unit");
    expect(e.details.allowed).toBe('"ft", "m"');
  });

  it("refuses a negative margin with the bound", () => {
    const d = demo();
    d.margins.kickPpg = -0.2;
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("margins.kickPpg");
    expect(e.details.allowed).toBe("≥ 0");
    expect(e.details.value).toBe(-0.2);
  });

  it("names a missing required key", () => {
    const d = demo();
    delete d.wells[0].fracture;
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("wells[0].fracture");
    expect(e.message).toContain("required");
  });

  it("checks the chosen fracture method's own keys", () => {
    const d = demo();
    d.wells[0].fracture = { method: "eaton1969", poissonRatio: 0.42, stressRatio: 0.6 };
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("wells[0].fracture.stressRatio");
    expect(e.details.allowed).toContain("poissonRatio");
  });

  it("refuses a Poisson's ratio outside (0, 0.5)", () => {
    const d = demo();
    d.wells[0].fracture.poissonRatio = 0.5;
    const e = errorOf(() => parseStudyConfig(d));
    expect(e.details.param).toBe("wells[0].fracture.poissonRatio");
    expect(e.details.allowed).toBe("< 0.5");
  });

  it("does not modify the object it validates", () => {
    const d = demo();
    const before = JSON.stringify(d);
    Object.freeze(d);
    parseStudyConfig(d);
    expect(JSON.stringify(d)).toBe(before);
  });
});

describe("study unit conversions", () => {
  it("studyDepthFt converts metres with the exact foot (0.3048 m)", () => {
    // International yard and pound agreement 1959: 1 ft = 0.3048 m exactly (published).
    expect(studyDepthFt({ value: 3780, unit: "m" })).toBeCloseTo(3780 / 0.3048, 9);
    expect(studyDepthFt({ value: 1500, unit: "ft" })).toBe(1500);
  });

  it("studyGradientPsiPerFt matches CHECK-VALUES §0", () => {
    // CHECK-VALUES §0 (own case): 0.465 psi/ft = 10.52 kPa/m = 8.951 ppg (exact factor 12/231).
    expect(studyGradientPsiPerFt({ value: 8.951, unit: "ppg" })).toBeCloseTo(0.465, 4);
    expect(studyGradientPsiPerFt({ value: 10.52, unit: "kPa/m" })).toBeCloseTo(0.465, 3);
    // CHECK-VALUES §0: psi/ft per g/cc 0.43353 (ρ·g, g = 9.80665 m/s²), 5 significant figures.
    expect(studyGradientPsiPerFt({ value: 1, unit: "sg" })).toBeCloseTo(0.43353, 5);
  });

  it("formatKeyPath writes array indices in brackets", () => {
    expect(formatKeyPath(["wells", 1, "methods", "eatonSonic", "exponent"])).toBe("wells[1].methods.eatonSonic.exponent");
  });
});

describe("study wellbore settings", () => {
  it("accepts the UCS sources and refuses an unknown one with its key path", async () => {
    const { parseStudyConfig } = await import("../../src/study/config.js");
    const base = JSON.parse(readFileSync(new URL("../../demo-logs/demo-study.json", import.meta.url), "utf8"));
    base.wells[0].wellbore = { ucs: { source: "formula", expression: "0.77 * (304.8 / DT) ^ 2.93", unit: "MPa" }, shmaxFraction: 0.2 };
    expect(parseStudyConfig(base).wells[0].wellbore?.ucs?.source).toBe("formula");
    base.wells[0].wellbore = { ucs: { source: "guess" } };
    expect(() => parseStudyConfig(base)).toThrow(/wells\[0\]\.wellbore\.ucs/);
    base.wells[0].wellbore = { shmaxFraction: 1.5 };
    expect(() => parseStudyConfig(base)).toThrow(/wells\[0\]\.wellbore\.shmaxFraction/);
  });
});
