/**
 * Test helper: load a demo well (LAS + survey for the deviated one) and its designed truth.
 * The truth files are read here, by tests only; prediction code never reads them.
 */
import { readFileSync, existsSync } from "node:fs";
import { join, resolve } from "node:path";
import { readWellFromLas } from "../../src/io/loadWell.js";
import { readDirectionalSurvey } from "../../src/io/tables.js";
import { surveyPathAtMd } from "../../src/well/surveyPathAtMd.js";
import type { Well } from "../../src/well/types.js";
import type { PorePressurePredictionOptions } from "../../src/pipeline/predictPorePressure.js";
import { mudlineTvdFt } from "../../src/well/depthReference.js";
import { depthBracketIndex } from "../../src/stress/stressSeries.js";

export const DEMO = resolve(__dirname, "..", "..", "demo-logs");

export interface DemoTruthRow {
  tvdFt: number;
  ppPsi: number;
  svPsi: number;
  shminPsi: number;
  lithology: string;
  zone: string;
}

export interface DemoWell {
  slug: string;
  well: Well;
  hydrostaticPsiPerFt: number;
  truth: DemoTruthRow[];
  truthJson: { boundariesTvdssFt: Record<string, number | null>; datums: { mudlineTvdFt: number; rtElevationFt: number } };
}

export function loadDemoWell(slug: string): DemoWell {
  const dir = join(DEMO, slug);
  const text = readFileSync(join(dir, `${slug}.las`), "utf8");
  const surveyFile = join(dir, "survey.csv");
  let tvd: { kind: "callback"; tvdFromMd: (md: Float64Array) => Float64Array } | undefined;
  if (existsSync(surveyFile)) {
    const survey = readDirectionalSurvey(readFileSync(surveyFile, "utf8"), { file: "survey.csv" }).records;
    tvd = { kind: "callback", tvdFromMd: (mdFt) => surveyPathAtMd({ survey, mdFt }).tvdFt };
  }
  const { well, las } = readWellFromLas(text, { file: `${slug}.las`, tvd });
  const hydg = las.parameters.find((p) => p.mnemonic === "HYDG");
  const hydrostaticPsiPerFt = hydg!.unit.toUpperCase() === "PSI/FT" ? Number(hydg!.value) : Number(hydg!.value) / 22.620590367;
  const lines = readFileSync(join(dir, "truth.csv"), "utf8").trim().split("\n");
  const head = lines[0].split(",");
  const col = (name: string): number => head.indexOf(name);
  const truth = lines.slice(1).map((l) => {
    const f = l.split(",");
    return {
      tvdFt: Number(f[col("tvd_ft")]),
      ppPsi: Number(f[col("pp_psi")]),
      svPsi: Number(f[col("sv_psi")]),
      shminPsi: Number(f[col("shmin_psi")]),
      lithology: f[col("lithology")],
      zone: f[col("zone")],
    };
  });
  const truthJson = JSON.parse(readFileSync(join(dir, "truth.json"), "utf8"));
  return { slug, well, hydrostaticPsiPerFt, truth, truthJson };
}

/** Index of the sample nearest to each truth row (same grid, so exact in practice). */
export function nearestIndex(tvdFt: Float64Array, depthFt: number): number {
  const lo = depthBracketIndex(tvdFt, depthFt);
  const hi = Math.min(lo + 1, tvdFt.length - 1);
  return Math.abs(tvdFt[lo] - depthFt) <= Math.abs(tvdFt[hi] - depthFt) ? lo : hi;
}

/**
 * Pore-pressure options an engineer would choose from the logs alone (no truth): normal
 * trend fitted on the shale from 600 ft below the mudline to a base picked above the first
 * sign of undercompaction (given in TVDSS), GR cutoff 85 API, Bowers A 10, B 0.75 with
 * unloading U 3.5 where asked. Shared by demoRoundTrip and demoCompartments, which differ
 * only in the primary method.
 */
export function demoPorePressureOptions(
  d: DemoWell,
  normalBaseTvdssFt: number,
  unloading: { onsetTvdFt: number } | undefined,
  primary: PorePressurePredictionOptions["primary"],
): PorePressurePredictionOptions {
  const mudline = mudlineTvdFt(d.well.datums);
  const base = normalBaseTvdssFt + d.well.datums.rtElevationFt - mudline;
  const intervals = [{ topBmlFt: 600, baseBmlFt: base }];
  return {
    hydrostaticGradientPsiPerFt: d.hydrostaticPsiPerFt,
    shale: { criterion: { kind: "grCutoff", cutoffApi: 85 } },
    sonicTrend: { use: "fit", kind: "sonicExponential", segments: [{ topBmlFt: 0, dtMatrixUsPerFt: 65, intervals }] },
    resistivityTrend: { use: "fit", kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, intervals }] },
    eatonSonic: {},
    eatonResistivity: {},
    equivalentDepth: true,
    bowers: { a: 10, b: 0.75, unloading: unloading ? { u: 3.5, onsetTvdFt: unloading.onsetTvdFt } : undefined },
    primary,
  };
}
