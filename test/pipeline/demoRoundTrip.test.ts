/**
 * Round trip on the demo wells: predicted pore pressure in shale against the generator's
 * designed truth (own case: the generator forward-models the logs from that truth with the
 * published relations of Eaton 1975 and Bowers 1995; see demo-logs/README.md).
 *
 * Acceptance (issue): within 0.3 ppg EMW RMS where each method's assumptions hold — Eaton
 * and Bowers in the disequilibrium-compaction section; Bowers with unloading in Marten B-1's
 * unloading zone, where plain Eaton must be shown to under-predict.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { predictPorePressure, type PorePressurePrediction, type PorePressurePredictionOptions } from "../../src/pipeline/predictPorePressure.js";
import { psiPerFtToPpg } from "../../src/units/index.js";
import { demoPorePressureOptions, loadDemoWell, nearestIndex, type DemoWell } from "./demoWells.js";

/** Options an engineer would choose from the logs alone (no truth): normal trend fitted on the
 * shale from 600 ft below the mudline to 300 ft above the first sign of undercompaction. */
const demoOptions = (d: DemoWell, normalBaseTvdssFt: number, unloading?: { onsetTvdFt: number }): PorePressurePredictionOptions =>
  demoPorePressureOptions(d, normalBaseTvdssFt, unloading, "eatonSonic");

/** RMS and mean of (predicted − true) in ppg over shale truth rows of the given zones. */
function errorPpg(d: DemoWell, r: PorePressurePrediction, pp: Float64Array, zones: string[]): { rms: number; bias: number; n: number } {
  let s = 0;
  let s2 = 0;
  let n = 0;
  for (const t of d.truth) {
    if (t.lithology !== "shale" || !zones.includes(t.zone)) continue;
    const i = nearestIndex(r.tvdFt, t.tvdFt);
    if (!Number.isFinite(pp[i])) continue;
    const e = psiPerFtToPpg((pp[i] - t.ppPsi) / t.tvdFt);
    s += e;
    s2 += e * e;
    n++;
  }
  return { rms: Math.sqrt(s2 / n), bias: s / n, n };
}

describe("predictPorePressure on the demo wells (round trip against the designed truth)", () => {
  const wells: Record<string, { d: DemoWell; r: PorePressurePrediction }> = {};
  beforeAll(() => {
    for (const [slug, normalBaseTvdss, onset] of [
      ["quillon-a1", 8500, undefined],
      ["quillon-a2st", 8500, undefined],
      ["marten-b1", 7600, 12400],
    ] as const) {
      const d = loadDemoWell(slug);
      wells[slug] = { d, r: predictPorePressure(d.well, demoOptions(d, normalBaseTvdss, onset ? { onsetTvdFt: onset } : undefined)) };
    }
  });

  for (const slug of ["quillon-a1", "quillon-a2st", "marten-b1"]) {
    it(`${slug}: Eaton sonic and resistivity within 0.3 ppg RMS in the hydrostatic and undercompacted shale`, () => {
      const { d, r } = wells[slug];
      for (const m of [r.methods.eatonSonic!, r.methods.eatonResistivity!]) {
        const e = errorPpg(d, r, m.ppPsi, ["hydrostatic", "undercompacted"]);
        expect(e.n).toBeGreaterThan(300);
        expect(e.rms).toBeLessThan(0.3);
      }
    });
    it(`${slug}: Bowers (generator's A 10, B 0.75) within 0.3 ppg RMS in the undercompacted shale`, () => {
      const { d, r } = wells[slug];
      const e = errorPpg(d, r, r.methods.bowers!.ppPsi, ["undercompacted"]);
      expect(e.n).toBeGreaterThan(200);
      expect(e.rms).toBeLessThan(0.3);
    });
  }

  it("marten-b1: in the unloading zone Bowers with unloading is within 0.3 ppg RMS while Eaton under-predicts by more than 0.3 ppg", () => {
    const { d, r } = wells["marten-b1"];
    const bowers = errorPpg(d, r, r.methods.bowers!.ppPsi, ["unloading"]);
    const eaton = errorPpg(d, r, r.methods.eatonSonic!.ppPsi, ["unloading"]);
    expect(bowers.n).toBeGreaterThan(200);
    expect(bowers.rms).toBeLessThan(0.3);
    expect(eaton.bias).toBeLessThan(-0.3);
  });
});
