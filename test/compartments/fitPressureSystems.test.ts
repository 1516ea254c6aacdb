/**
 * identifyFluidFromGradient and fitPressureSystems. Sources: CHECK-VALUES §11 own case
 * (5000 psi at 9000 ft, 5093 psi at 9200 ft → 0.4650 psi/ft; a sand at 9500 ft reading
 * 6000 psi sits 767.5 psi off the line); fluid gradient ranges gas 0.05–0.15, oil
 * 0.30–0.38, water 0.433–0.47 psi/ft (CHECK-VALUES §11, common practice, no source);
 * psi/ft per g/cc 0.43353 (CHECK-VALUES §0, ρ·g). The gas-over-water set is an own case
 * designed here: contact at 10,150 ft, 5200 psi, gas 0.10 and brine 0.465 psi/ft.
 */
import { describe, expect, it } from "vitest";
import { fitPressureSystems, identifyFluidFromGradient, type PressureTestPoint } from "../../src/compartments/index.js";
import { ShalepointError } from "../../src/errors.js";

describe("identifyFluidFromGradient (common practice, no source)", () => {
  it("0.10 psi/ft → gas, density 0.10/0.43353 = 0.2307 g/cc (CHECK-VALUES §0)", () => {
    const r = identifyFluidFromGradient({ gradientPsiPerFt: 0.1 });
    expect(r.fluid).toBe("gas");
    expect(r.densityGcc).toBeCloseTo(0.2307, 4);
  });
  it("0.35 → oil; 0.465 → water (brine, CHECK-VALUES §0); 0.20 and 0.40 → undetermined", () => {
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.35 }).fluid).toBe("oil");
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.465 }).fluid).toBe("water");
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.2 }).fluid).toBe("undetermined");
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.4 }).candidates).toEqual([]);
  });
  it("range edges are inclusive: 0.433 is water, 0.4329 is not", () => {
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.433 }).fluid).toBe("water");
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.4329 }).fluid).toBe("undetermined");
  });
  it("a standard error widens the match to ±2 SE: 0.425 ± 0.010 reaches water", () => {
    expect(identifyFluidFromGradient({ gradientPsiPerFt: 0.425, standardErrorPsiPerFt: 0.005 }).fluid).toBe("water");
    const amb = identifyFluidFromGradient({ gradientPsiPerFt: 0.4, standardErrorPsiPerFt: 0.02 });
    expect(amb.candidates).toEqual(["oil", "water"]);
    expect(amb.fluid).toBe("undetermined");
  });
  it("bad input → E_RANGE", () => {
    expect(() => identifyFluidFromGradient({ gradientPsiPerFt: NaN })).toThrow(ShalepointError);
    expect(() => identifyFluidFromGradient({ gradientPsiPerFt: 0.4, standardErrorPsiPerFt: -1 })).toThrow(/standardErrorPsiPerFt/);
  });
});

describe("fitPressureSystems — CHECK-VALUES §11 own case", () => {
  const tests: readonly PressureTestPoint[] = Object.freeze([
    Object.freeze({ tvdFt: 9000, pressurePsi: 5000 }),
    Object.freeze({ tvdFt: 9100, pressurePsi: 5046.5 }),
    Object.freeze({ tvdFt: 9200, pressurePsi: 5093 }),
    Object.freeze({ tvdFt: 9500, pressurePsi: 6000 }),
  ]);
  const r = fitPressureSystems({ tests });
  it("one line of 0.4650 psi/ft through the first three tests, identified as water", () => {
    expect(r.lines).toHaveLength(1);
    expect(r.lines[0].gradientPsiPerFt).toBeCloseTo(0.465, 10);
    expect(r.lines[0].pointIndices).toEqual([0, 1, 2]);
    expect(r.lines[0].fluid).toBe("water");
  });
  it("the 9500 ft test fits no line and sits 767.5 psi off it", () => {
    expect(r.rejected).toHaveLength(1);
    expect(r.rejected[0].reason).toBe("fits-no-line");
    expect(r.rejected[0].nearestResidualPsi).toBeCloseTo(767.5, 8);
    expect(r.warnings.map((w) => w.code)).toContain("W_TEST_FITS_NO_LINE");
  });
});

/** Gas over water in one sand (10,000–10,300 ft), contact 10,150 ft at 5200 psi; a deeper water compartment. */
function gasWaterSet(): PressureTestPoint[] {
  const wiggle = [1.5, -1, 0.5, -1.5, 1];
  const pts: PressureTestPoint[] = [];
  [10010, 10040, 10070, 10100, 10130].forEach((z, k) => pts.push({ tvdFt: z, pressurePsi: 5200 + 0.1 * (z - 10150) + wiggle[k], label: `G${k}` }));
  [10170, 10200, 10230, 10260, 10290].forEach((z, k) => pts.push({ tvdFt: z, pressurePsi: 5200 + 0.465 * (z - 10150) - wiggle[k], label: `W${k}` }));
  // Deeper compartment: brine line 800 psi below the upper system's water line.
  [11500, 11600, 11700].forEach((z, k) => pts.push({ tvdFt: z, pressurePsi: 5200 + 0.465 * (z - 10150) - 800 + [1, -1, 0.5][k], label: `D${k}` }));
  pts.push({ tvdFt: 10220, pressurePsi: 4000, quality: "bad", label: "tight" });
  pts.push({ tvdFt: 10250, pressurePsi: 5245, quality: "suspect", label: "S" }); // on the water line: 5200 + 0.465·100 − 1.5
  pts.push({ tvdFt: 16000, pressurePsi: 9000, label: "beyondTD" });
  return pts;
}

describe("fitPressureSystems — gas over water (own case)", () => {
  const tests = gasWaterSet();
  const r = fitPressureSystems({
    tests,
    wellTopFt: 5000,
    wellBaseFt: 12500,
    sands: [{ topFt: 10000, baseFt: 10300 }, { topFt: 11450, baseFt: 11750 }],
    compartments: [
      { compartmentId: 0, topFt: 9000, baseFt: 10400 },
      { compartmentId: 1, topFt: 10800, baseFt: 12000 },
    ],
  });
  const gas = r.lines.find((l) => l.fluid === "gas")!;
  const waters = r.lines.filter((l) => l.fluid === "water").sort((a, b) => a.topFt - b.topFt);

  it("three lines: gas 0.10 and two water 0.465 psi/ft, each within 0.01 psi/ft", () => {
    expect(r.lines).toHaveLength(3);
    // The designed scatter (≤ 1.5 psi) tilts the least-squares gradients by 0.005, 0.0023 and
    // 0.0025 psi/ft (gas, upper water, deeper water; by hand from the wiggles): < 0.01 holds.
    expect(Math.abs(gas.gradientPsiPerFt - 0.1)).toBeLessThan(0.01);
    expect(waters).toHaveLength(2);
    for (const w of waters) expect(Math.abs(w.gradientPsiPerFt - 0.465)).toBeLessThan(0.01);
  });
  it("gas–water contact at 10,150 ft within ±30 ft (issue acceptance) and ±10 ft (1.5 psi / 0.365 psi/ft ≈ 4 ft)", () => {
    expect(r.contacts).toHaveLength(1);
    const c = r.contacts[0];
    expect(c.kind).toBe("gas-water");
    expect(Math.abs(c.depthFt - 10150)).toBeLessThan(10);
    expect(Math.abs(c.pressurePsi - 5200)).toBeLessThan(3);
    expect(c.sand).toEqual({ topFt: 10000, baseFt: 10300 });
  });
  it("gas and upper water share a system; the deeper water is another system", () => {
    expect(gas.systemId).toBe(waters[0].systemId);
    expect(waters[1].systemId).not.toBe(gas.systemId);
  });
  it("lines match the log-derived compartments by depth overlap", () => {
    expect(gas.compartmentId).toBe(0);
    expect(waters[0].compartmentId).toBe(0);
    expect(waters[1].compartmentId).toBe(1);
  });
  it("bad-quality and out-of-well tests are rejected and reported, never dropped silently; suspect ones used and flagged", () => {
    const byReason = Object.fromEntries(r.rejected.map((x) => [tests[x.index].label, x.reason]));
    expect(byReason).toEqual({ tight: "bad-quality", beyondTD: "outside-well" });
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toContain("W_TEST_BAD_QUALITY");
    expect(codes).toContain("W_TEST_OUTSIDE_WELL");
    expect(waters[0].flags).toContain("suspect-points");
    expect(waters[0].n).toBe(6);
  });
  it("without sands, a contact needs the legs within maxContactGapFt", () => {
    const g = fitPressureSystems({ tests, maxContactGapFt: 20 });
    expect(g.contacts).toHaveLength(0); // legs 40 ft apart (10,130 → 10,170)
    const ok = fitPressureSystems({ tests, maxContactGapFt: 100 });
    expect(ok.contacts).toHaveLength(1);
  });
  it("does not mutate its inputs", () => {
    const frozen = Object.freeze(gasWaterSet().map((p) => Object.freeze(p)));
    expect(() => fitPressureSystems({ tests: frozen })).not.toThrow();
  });
});

describe("fitPressureSystems — bad input", () => {
  it("all tests flagged bad → E_TOO_SHORT naming how many are needed", () => {
    const tests = [9000, 9100, 9200].map((z) => ({ tvdFt: z, pressurePsi: 0.465 * z, quality: "bad" as const }));
    try {
      fitPressureSystems({ tests });
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_TOO_SHORT");
      expect((e as ShalepointError).details.allowed).toMatch(/≥ 3/);
    }
  });
  it("tolerance ≤ 0 or minPointsPerLine < 2 → E_RANGE", () => {
    const tests = [9000, 9100, 9200].map((z) => ({ tvdFt: z, pressurePsi: 0.465 * z }));
    expect(() => fitPressureSystems({ tests, tolerancePsi: 0 })).toThrow(/tolerancePsi/);
    expect(() => fitPressureSystems({ tests, minPointsPerLine: 1 })).toThrow(/minPointsPerLine/);
  });
});
