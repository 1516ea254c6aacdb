/**
 * predictCompartments on the demo wells against the generator's designed truth (own case:
 * the generator forward-models the logs and the formation-pressure tests from that truth;
 * see demo-logs/README.md; truth files are read by this test only).
 *
 * Acceptance (issue): top of overpressure within ±150 ft; each sealed compartment's top and
 * base and the regression within ±150 ft; the Quillon A-1 gas–water contact within ±30 ft.
 * Pore pressure: Bowers 1995 primary (the generator's A 10, B 0.75; unloading U 3.5 in
 * Marten B-1) with the normal-trend options of demoRoundTrip.test.ts. Depths compared in
 * TVDSS = TVD − air gap (the truth's reference).
 */
import { beforeAll, describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { predictPorePressure, type PorePressurePrediction, type PorePressurePredictionOptions } from "../../src/pipeline/predictPorePressure.js";
import { predictCompartments, type CompartmentPrediction } from "../../src/pipeline/predictCompartments.js";
import { readFormationPressureTests } from "../../src/io/tables.js";
import type { PressureTestPoint } from "../../src/compartments/fitPressureSystems.js";
import { ShalepointError } from "../../src/errors.js";
import { DEMO, demoPorePressureOptions, loadDemoWell, type DemoWell } from "./demoWells.js";

/** The options of demoRoundTrip.test.ts (normal trend fitted from 600 ft below the mudline to a
 * depth picked from the logs alone), with Bowers as the primary method. */
const demoOptions = (d: DemoWell, normalBaseTvdssFt: number, unloading?: { onsetTvdFt: number }): PorePressurePredictionOptions =>
  demoPorePressureOptions(d, normalBaseTvdssFt, unloading, "bowers");

function demoTests(slug: string): PressureTestPoint[] {
  const text = readFileSync(join(DEMO, slug, "pressure-tests.csv"), "utf8");
  return readFormationPressureTests(text, { file: "pressure-tests.csv" }).records.map((t) => ({
    tvdFt: t.tvdFt,
    pressurePsi: t.pressurePsi,
    quality: t.quality,
    sand: t.sand,
  }));
}

const ACCEPT_FT = 150; // issue acceptance for boundaries
const CONTACT_ACCEPT_FT = 30; // issue acceptance for the gas–water contact

describe("predictCompartments on the demo wells (designed truth)", () => {
  const runs: Record<string, { d: DemoWell; p: PorePressurePrediction; c: CompartmentPrediction; rt: number }> = {};
  beforeAll(() => {
    for (const [slug, normalBaseTvdss, onset] of [
      ["quillon-a1", 8500, undefined],
      ["quillon-a2st", 8500, undefined],
      ["marten-b1", 7600, 12400],
    ] as const) {
      const d = loadDemoWell(slug);
      const p = predictPorePressure(d.well, demoOptions(d, normalBaseTvdss, onset ? { onsetTvdFt: onset } : undefined));
      const c = predictCompartments({
        tvdFt: p.tvdFt,
        ppPsi: p.ppPsi,
        hydrostaticPsi: p.hydrostaticPsi,
        shaleFlag: p.shale.isShale,
        pressureTests: demoTests(slug),
      });
      runs[slug] = { d, p, c, rt: d.well.datums.rtElevationFt };
    }
  });

  for (const slug of ["quillon-a1", "quillon-a2st", "marten-b1"]) {
    it(`${slug}: top of overpressure within ±150 ft of the truth`, () => {
      const { d, c, rt } = runs[slug];
      const truth = d.truthJson.boundariesTvdssFt.topOverpressure!;
      expect(c.classification.topOfOverpressureFt).not.toBeNull();
      expect(Math.abs(c.classification.topOfOverpressureFt! - rt - truth)).toBeLessThan(ACCEPT_FT);
    });
    it(`${slug}: the sealed compartment (top and base) and the regression below it within ±150 ft`, () => {
      const { d, c, rt } = runs[slug];
      const b = d.truthJson.boundariesTvdssFt;
      const comp = c.classification.compartments.find((x) => Math.abs(x.topFt - rt - b.compartmentTop!) < ACCEPT_FT);
      expect(comp).toBeDefined();
      expect(Math.abs(comp!.baseFt - rt - b.compartmentBase!)).toBeLessThan(ACCEPT_FT);
      // The compartment's sands and shales follow the brine line: pore-pressure gradient
      // near the well's hydrostatic gradient (0.445 / 0.440 psi/ft, common practice, no source:
      // 0.433–0.47 for brine), excess well above the 100-psi hydrostatic threshold.
      expect(comp!.meanExcessPsi).toBeGreaterThan(1000);
      const reg = c.classification.regressions.find((x) => Math.abs(x.topFt - rt - b.lowerSealTop!) < ACCEPT_FT);
      expect(reg).toBeDefined();
      expect(Math.abs(reg!.baseFt - rt - b.regressionBase!)).toBeLessThan(ACCEPT_FT);
      // Regression: pressure falls back toward hydrostatic across the lower seal.
      expect(reg!.excessChangePsi).toBeLessThan(-500);
    });
  }

  it("marten-b1: a ramp starts within ±150 ft of the top of the unloading zone (12,300 ft TVDSS)", () => {
    const { d, c, rt } = runs["marten-b1"];
    const top = d.truthJson.boundariesTvdssFt.unloadingTop!;
    expect(c.classification.intervals.some((iv) => iv.label === "ramp" && Math.abs(iv.topFt - rt - top) < ACCEPT_FT)).toBe(true);
  });

  it("quillon-a1: gas line of the 4 Tarrant Sand gas tests, gas–water contact within ±30 ft of 11,580 ft TVDSS", () => {
    const { d, c, rt } = runs["quillon-a1"];
    const s = c.pressureSystems!;
    const gas = s.lines.filter((l) => l.fluid === "gas");
    expect(gas).toHaveLength(1);
    expect(gas[0].n).toBe(4);
    // Designed gas gradient 0.0954 psi/ft (truth.json); with ±3 psi test noise over 95 ft the
    // fitted gradient's standard error is ~0.03 psi/ft: it must stay in the gas range
    // 0.05–0.15 psi/ft (CHECK-VALUES §11, common practice, no source).
    expect(gas[0].gradientPsiPerFt).toBeGreaterThan(0.05);
    expect(gas[0].gradientPsiPerFt).toBeLessThan(0.15);
    const contact = s.contacts.find((x) => x.kind === "gas-water");
    expect(contact).toBeDefined();
    expect(Math.abs(contact!.depthFt - rt - d.truthJson.boundariesTvdssFt.gasWaterContact!)).toBeLessThan(CONTACT_ACCEPT_FT);
    expect(contact!.sand?.name).toBe("Tarrant Sand");
  });

  it("every well: water lines lie on brine gradients, no line is steeper than 0.55 psi/ft, poor tests are rejected with warnings", () => {
    for (const slug of ["quillon-a1", "quillon-a2st", "marten-b1"]) {
      const { c } = runs[slug];
      const s = c.pressureSystems!;
      expect(s.lines.length).toBeGreaterThanOrEqual(3); // hydrostatic, compartment, regressed systems
      for (const l of s.lines) {
        expect(l.gradientPsiPerFt).toBeLessThanOrEqual(0.55); // common practice, no source
        if (l.fluid === "water") expect(Math.abs(l.gradientPsiPerFt - 0.445)).toBeLessThan(0.02); // designed 0.445/0.440 ± noise
      }
      const poor = demoTests(slug).map((t, i) => ({ t, i })).filter((x) => x.t.quality === "poor");
      expect(poor.length).toBeGreaterThan(0);
      for (const { i } of poor) {
        expect(s.rejected.find((r) => r.index === i)?.reason).toBe("bad-quality");
        expect(s.lines.every((l) => !l.pointIndices.includes(i))).toBe(true);
        expect(s.warnings.some((w) => w.code === "W_TEST_BAD_QUALITY" && w.index === i)).toBe(true);
      }
    }
  });

  it("segments one sample per shale-point spacing (20 ft) and reports it", () => {
    const { c } = runs["quillon-a1"];
    expect(c.segmentSpacingFt).toBe(20);
    // A 0.5-ft profile decimated to ≥ 20 ft: used samples ≈ logged span / 20 ft.
    expect(c.classification.segmentation.stepFt).toBeGreaterThanOrEqual(20);
    expect(c.classification.segmentation.stepFt).toBeLessThan(21);
  });

  it("bad input: spacing ≤ 0 → E_RANGE; tests outside the well or all poor → warnings, never a silent drop", () => {
    const { p } = runs["quillon-a1"];
    const base = { tvdFt: p.tvdFt, ppPsi: p.ppPsi, hydrostaticPsi: p.hydrostaticPsi };
    for (const bad of [0, -20, NaN]) {
      try {
        predictCompartments({ ...base, shalePointSpacingFt: bad });
        expect.unreachable();
      } catch (e) {
        expect((e as ShalepointError).code).toBe("E_RANGE");
      }
    }
    const tests: PressureTestPoint[] = [
      { tvdFt: 9000, pressurePsi: 4000, quality: "poor" },
      { tvdFt: 9100, pressurePsi: 4045, quality: "poor" },
      { tvdFt: 40000, pressurePsi: 18000 },
    ];
    const r = predictCompartments({ ...base, pressureTests: tests });
    expect(r.pressureSystems).toBeNull();
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toContain("W_PRESSURE_SYSTEMS_NOT_FITTED");
  });

  it("does not mutate its inputs (frozen tests, copied arrays unchanged)", () => {
    const { p } = runs["quillon-a1"];
    const pp = p.ppPsi.slice();
    const tests = Object.freeze(demoTests("quillon-a1").map((t) => Object.freeze(t)));
    predictCompartments({ tvdFt: p.tvdFt, ppPsi: p.ppPsi, hydrostaticPsi: p.hydrostaticPsi, pressureTests: tests });
    expect(Array.from(p.ppPsi)).toEqual(Array.from(pp));
  });
});
