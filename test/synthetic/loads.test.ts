/**
 * The committed demo files load through the project's readers (src/io) and convert to the
 * values the generator meant, in each well's own units.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { readLas } from "../../src/io/readLas.js";
import { lasToWell } from "../../src/io/loadWell.js";
import {
  readDirectionalSurvey,
  readDrillingEvents,
  readFormationPressureTests,
  readFormationTops,
  readLeakOffTests,
  readMudWeights,
} from "../../src/io/tables.js";
import { surveyPathAtMd } from "../../src/well/surveyPathAtMd.js";
import { QUILLON_DEMO_WELLS, QUILLON_ROCK } from "../../src/synthetic/demoWellDesigns.js";
import { generateDemoWellLogs } from "../../src/synthetic/syntheticLogs.js";
import { DEMO_LOGS_SEED } from "../../src/synthetic/demoFiles.js";

const dir = fileURLToPath(new URL("../../demo-logs/", import.meta.url));
const text = (rel: string) => readFileSync(dir + rel, "utf8");

// Exact legal factors (CHECK-VALUES §0): 1 ft = 0.3048 m; 1 psi = 6.894757 kPa.
const FT_PER_M = 1 / 0.3048;
const PSI_PER_KPA = 1 / 6.894757293168361;

describe("readLas + lasToWell on the demo LAS files", () => {
  for (const d of QUILLON_DEMO_WELLS) {
    it(`${d.name}: loads strictly, with datums from the header and every role filled`, () => {
      const file = `${d.slug}/${d.slug}.las`;
      const { las, warnings } = readLas(text(file), { file });
      expect(warnings).toEqual([]);
      const { well, roles } = lasToWell(las, { file });
      expect(Object.keys(roles).sort()).toEqual(["bitSize", "caliper", "density", "gammaRay", "resistivity", "slowness"]);
      // Datums: air gap 82 ft (25 m), water depth as designed, seawater 1.03 g/cc.
      expect(Math.abs(well.datums.rtElevationFt - d.airGapFt)).toBeLessThan(0.02);
      expect(Math.abs(well.datums.waterDepthFt - d.waterDepthFt)).toBeLessThan(0.02);
      expect(Math.abs(well.datums.seawaterDensityGcc - 1.03)).toBeLessThan(1e-12);

      // Values convert back to the generator's internal values within the written rounding.
      const logs = generateDemoWellLogs(d, QUILLON_ROCK, DEMO_LOGS_SEED);
      expect(well.mdFt.length).toBe(logs.mdFt.length);
      const metric = d.fileUnits === "metric";
      const tolDt = metric ? 0.005 * 0.3048 + 1e-9 : 0.005 + 1e-9; // 2 decimals in us/m or us/ft
      const tolRhob = metric ? 0.05 / 1000 + 1e-9 : 0.00005 + 1e-9; // 0.1 kg/m3 or 1e-4 g/cc
      let checked = 0;
      for (let i = 0; i < logs.mdFt.length; i += 251) {
        expect(Math.abs(well.mdFt[i] - logs.mdFt[i])).toBeLessThan(metric ? 0.00005 * FT_PER_M + 1e-9 : 1e-9);
        const dt = well.curves.slowness.values[i];
        if (Number.isFinite(logs.dtUsPerFt[i])) {
          expect(Math.abs(dt - logs.dtUsPerFt[i])).toBeLessThan(tolDt);
          checked++;
        } else expect(Number.isNaN(dt)).toBe(true);
        const rho = well.curves.density.values[i];
        if (Number.isFinite(logs.rhobGcc[i])) expect(Math.abs(rho - logs.rhobGcc[i])).toBeLessThan(tolRhob);
        else expect(Number.isNaN(rho)).toBe(true);
      }
      expect(checked).toBeGreaterThan(50);
    });

    it(`${d.name}: density starts over 1,000 ft below the mudline; washouts read low`, () => {
      const file = `${d.slug}/${d.slug}.las`;
      const { well } = lasToWell(readLas(text(file)).las, { file });
      const rho = well.curves.density.values;
      const first = rho.findIndex((x) => Number.isFinite(x));
      const logs = generateDemoWellLogs(d, QUILLON_ROCK, DEMO_LOGS_SEED);
      expect(logs.tvdFt[first] - (d.airGapFt + d.waterDepthFt)).toBeGreaterThan(1000);
      // Where the caliper is over 1 in larger than the bit, density is lower than the truth.
      const cal = well.curves.caliper.values, bs = well.curves.bitSize.values;
      let s = 0, n = 0;
      for (let i = 0; i < rho.length; i++) {
        if (cal[i] - bs[i] > 1 && Number.isFinite(rho[i])) { s += rho[i] - logs.clean.rhobGcc[i]; n++; }
      }
      expect(n).toBeGreaterThan(20);
      expect(s / n).toBeLessThan(-0.07);
      // Null gaps exist in every curve.
      for (const role of ["gammaRay", "slowness", "resistivity"] as const) {
        expect(well.curves[role].values.some((x) => Number.isNaN(x))).toBe(true);
      }
    });
  }
});

describe("table readers on the demo CSV files", () => {
  for (const d of QUILLON_DEMO_WELLS) {
    it(`${d.name}: every table reads, with a kick and sand-only pressure tests`, () => {
      const f = (n: string) => ({ t: text(`${d.slug}/${n}`), file: n });
      const tests = readFormationPressureTests(f("pressure-tests.csv").t, { file: "pressure-tests.csv" }).records;
      const lots = readLeakOffTests(f("leakoff-tests.csv").t).records;
      const mud = readMudWeights(f("mud-weights.csv").t).records;
      const events = readDrillingEvents(f("drilling-events.csv").t).records;
      const tops = readFormationTops(f("formation-tops.csv").t).records;
      expect(tests.length).toBeGreaterThan(15);
      expect(tests.some((p) => p.quality === "poor")).toBe(true);
      expect(lots.length).toBe(3);
      expect(mud.length).toBeGreaterThan(10);
      expect(events.filter((e) => e.event === "kick").length).toBe(1);
      expect(tops.length).toBe(d.tops.length);
      // Every test point lies in a designed sand bed.
      for (const p of tests) {
        const tvdss = p.tvdFt - d.airGapFt;
        expect(d.sands.some((s) => tvdss >= s.topTvdssFt - 0.5 && tvdss < s.baseTvdssFt + 0.5)).toBe(true);
      }
      // The kick's EMW exceeds the mud weight in use just above it (it was underbalanced).
      const kick = events.find((e) => e.event === "kick")!;
      const mwAbove = mud.find((m) => m.tvdToFt === kick.tvdFt)!;
      expect(kick.emwPsiPerFt!).toBeGreaterThan(mwAbove.mudWeightPsiPerFt);
      // Leak-off EMW sits above the mud weight and below the overburden gradient (~1 psi/ft).
      for (const l of lots) {
        expect(l.emwPsiPerFt).toBeGreaterThan(l.mudWeightPsiPerFt);
        expect(l.emwPsiPerFt).toBeLessThan(1.0);
      }
    });
  }

  it("Marten B-1 tables are metric and convert (kPa → psi, m → ft)", () => {
    const raw = text("marten-b1/pressure-tests.csv").split("\n")[1].split(",");
    const rec = readFormationPressureTests(text("marten-b1/pressure-tests.csv")).records[0];
    expect(Math.abs(rec.tvdFt - Number(raw[0]) * FT_PER_M)).toBeLessThan(1e-9);
    expect(Math.abs(rec.pressurePsi - Number(raw[1]) * PSI_PER_KPA)).toBeLessThan(1e-9);
  });

  it("Quillon A-1 gas and water test points cross at the designed contact", () => {
    const tests = readFormationPressureTests(text("quillon-a1/pressure-tests.csv")).records.filter(
      (p) => p.sand === "Tarrant Sand" && p.quality === "good",
    );
    const fit = (pts: typeof tests) => {
      const n = pts.length;
      const mx = pts.reduce((a, p) => a + p.tvdFt, 0) / n;
      const my = pts.reduce((a, p) => a + p.pressurePsi, 0) / n;
      let sxy = 0, sxx = 0;
      for (const p of pts) { sxy += (p.tvdFt - mx) * (p.pressurePsi - my); sxx += (p.tvdFt - mx) ** 2; }
      const slope = sxy / sxx;
      return { slope, at: (z: number) => my + slope * (z - mx) };
    };
    const gas = fit(tests.filter((p) => p.fluid === "gas"));
    const water = fit(tests.filter((p) => p.fluid === "water"));
    // Common practice, no source (CHECK-VALUES §11): gas ~0.05–0.15, water 0.433–0.47 psi/ft;
    // the contact is where the two fitted lines cross. 3-psi gauge noise over ~50 ft spans
    // → slopes within ±0.1 psi/ft, contact within ±25 ft of the designed 11,580 ft TVDSS.
    expect(gas.slope).toBeGreaterThan(0.0);
    expect(gas.slope).toBeLessThan(0.2);
    expect(water.slope).toBeGreaterThan(0.35);
    expect(water.slope).toBeLessThan(0.55);
    const zc = (water.at(0) - gas.at(0)) / (gas.slope - water.slope);
    const truth = JSON.parse(text("quillon-a1/truth.json"));
    expect(Math.abs(zc - 82 - truth.boundariesTvdssFt.gasWaterContact)).toBeLessThan(25);
  });

  it("Quillon A-2ST survey gives, by minimum curvature, the TVD of the truth file", () => {
    const survey = readDirectionalSurvey(text("quillon-a2st/survey.csv")).records;
    const rows = text("quillon-a2st/truth.csv").trim().split("\n").slice(1).map((l) => l.split(","));
    const pick = rows.filter((_, i) => i % 500 === 0);
    const md = Float64Array.from(pick.map((r) => Number(r[0])));
    // Sawaryn & Thorogood 2005 (published method, implemented in src/well): arcs between
    // stations; the generator's closed-form arc must agree to the truth file's 0.001 ft.
    const path = surveyPathAtMd({ survey: survey.map((s) => ({ mdFt: s.mdFt, incDeg: s.incDeg, aziDeg: s.aziDeg })), mdFt: md });
    pick.forEach((r, i) => expect(Math.abs(path.tvdFt[i] - Number(r[1]))).toBeLessThan(0.002));
    expect(Number(pick[pick.length - 1][0]) - Number(pick[pick.length - 1][1])).toBeGreaterThan(2000); // MD ≠ TVD
  });
});
