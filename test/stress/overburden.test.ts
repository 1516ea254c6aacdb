/**
 * Overburden, near-mudline power law and Gardner: checked against CHECK-VALUES §1
 * (Zoback 2007 eq. 1.6; Traugott 1997 / Zhang 2019 eqs. 6.4–6.6; Gardner et al. 1974).
 * Expected values are the check figures or closed forms written out here, never the
 * code's own output. Unit factor used throughout: 0.43353 psi/ft per g/cc (ρ·g, exact).
 */
import { describe, expect, it } from "vitest";
import {
  integrateOverburden,
  OverburdenSource,
  gardnerDensityGcc,
  gardnerDensityFromSlowness,
  powerLawAverageDensityPpg,
  powerLawPointDensityPpg,
  powerLawOverburdenPsi,
} from "../../src/stress/index.js";
import { metresToFeet, psiToMpa, PPG_PER_GCC, ShalepointError } from "../../src/index.js";
import type { Datums } from "../../src/well/types.js";

const ONSHORE_AT_RT: Datums = Object.freeze({ rtElevationFt: 0, waterDepthFt: 0, groundLevelFt: 0, seawaterDensityGcc: 1.03 });

/** A regular grid from a to b (inclusive) with step h. */
function grid(a: number, b: number, h: number): number[] {
  const out: number[] = [];
  for (let k = 0; a + k * h <= b + 1e-9; k++) out.push(a + k * h);
  return out;
}

describe("integrateOverburden", () => {
  it("layered column 2.00/2.30/2.45 g/cc to 10,000 ft gives 10,166 psi, 1.017 psi/ft (CHECK-VALUES §1, own case; Zoback 2007 eq. 1.6, published)", () => {
    // Steps sampled twice at the same depth make the trapezoid rule exact.
    const tvdFt = Object.freeze([0, 1000, 1000, 5000, 5000, 10000]);
    const densityGcc = Object.freeze([2.0, 2.0, 2.3, 2.3, 2.45, 2.45]);
    const r = integrateOverburden({ tvdFt, datums: ONSHORE_AT_RT, densityGcc });
    // 10,166 psi to 4 significant figures: |error| < 0.5 psi; a 1 % change in ρg moves it by 102 psi.
    expect(Math.abs(r.svPsi[5] - 10166)).toBeLessThan(0.5);
    expect(Math.abs(r.gradientPsiPerFt[5] - 1.017)).toBeLessThan(5e-4);
    expect(r.ranges.map((x) => x.source)).toEqual(["densityLog"]);
  });

  it("layered column on a 1-ft grid stays within the trapezoid step error (own case, CHECK-VALUES §1)", () => {
    const tvdFt = grid(0, 10000, 1);
    const densityGcc = tvdFt.map((z) => (z < 1000 ? 2.0 : z < 5000 ? 2.3 : 2.45));
    const r = integrateOverburden({ tvdFt, datums: ONSHORE_AT_RT, densityGcc });
    // each density step is smeared over one 1-ft interval: error ≤ ½·Δρ·g·h ≈ 0.07 psi per step
    expect(Math.abs(r.svPsi[r.svPsi.length - 1] - 10166)).toBeLessThan(0.5);
  });

  it("trapezoid over z = 0…2000 m with ρ = 2.0…2.4 g/cc gives 43.15 MPa (CHECK-VALUES §1, own case)", () => {
    const tvdFt = Object.freeze([0, 500, 1000, 1500, 2000].map(metresToFeet));
    const densityGcc = Object.freeze([2.0, 2.1, 2.2, 2.3, 2.4]);
    const r = integrateOverburden({ tvdFt, datums: ONSHORE_AT_RT, densityGcc });
    // 4 significant figures: ±0.005 MPa
    expect(Math.abs(psiToMpa(r.svPsi[4]) - 43.15)).toBeLessThan(0.005);
  });

  it("1000 m of seawater (1.03) over 2000 m of 2.20 g/cc gives 53.25 MPa; the 25 m air gap adds nothing (CHECK-VALUES §1, own case)", () => {
    const air = metresToFeet(25);
    const wd = metresToFeet(1000);
    const datums: Datums = Object.freeze({ rtElevationFt: air, waterDepthFt: wd, seawaterDensityGcc: 1.03 });
    const tvdFt = Object.freeze([0, air, air + wd / 2, air + wd, air + wd + metresToFeet(2000)]);
    const densityGcc = Object.freeze([NaN, NaN, NaN, 2.2, 2.2]);
    const r = integrateOverburden({ tvdFt, datums, densityGcc });
    expect(r.svPsi[0]).toBe(0);
    expect(r.svPsi[1]).toBe(0);
    expect(Math.abs(psiToMpa(r.svPsi[3]) - 1.03 * 1000 * 9.80665e-3)).toBeLessThan(1e-9); // ρ g h in MPa, exact
    expect(Math.abs(psiToMpa(r.svPsi[4]) - 53.25)).toBeLessThan(0.005);
    expect(r.ranges.map((x) => x.source)).toEqual(["air", "waterColumn", "densityLog"]);
    expect(r.ranges[1]).toMatchObject({ fromIndex: 2, toIndex: 2, count: 1 });
  });

  it("no density log: the power-law average column gives 7779 psi / 14.97 ppg at 10,000 ft RKB (CHECK-VALUES §1, own case on Traugott 1997 from memory / Zhang 2019 eqs. 6.4–6.6)", () => {
    const datums: Datums = Object.freeze({ rtElevationFt: 80, waterDepthFt: 3000, seawaterDensityGcc: 8.6 / PPG_PER_GCC });
    const tvdFt = Object.freeze(grid(0, 10000, 10));
    const densityGcc = Object.freeze(tvdFt.map(() => NaN));
    const r = integrateOverburden({ tvdFt, datums, densityGcc });
    const last = tvdFt.length - 1;
    expect(Math.abs(r.svPsi[last] - 7779)).toBeLessThan(0.5);
    expect(Math.abs(r.emwPpg[last] - 14.97)).toBeLessThan(0.005);
    expect(r.ranges.map((x) => x.source)).toEqual(["air", "waterColumn", "nearMudlinePowerLaw"]);
    expect(r.ranges[2].fromTvdFt).toBe(3080);
  });

  it("the power-law ρa is used as a column average, not integrated as a point density (Zhang 2019 eqs. 6.4–6.6; CHECK-VALUES §1 warning)", () => {
    const datums: Datums = Object.freeze({ rtElevationFt: 80, waterDepthFt: 3000, seawaterDensityGcc: 8.6 / PPG_PER_GCC });
    const tvdFt = grid(0, 12000, 5);
    const topLog = 3080 + 4000; // density log starts 4000 ft below mudline
    const densityGcc = tvdFt.map((z) => (z >= topLog ? 2.2 : NaN));
    const r = integrateOverburden({ tvdFt, datums, densityGcc });
    const iTop = tvdFt.indexOf(topLog);
    // Closed form of eqs. 6.4–6.6 at D = 4000 ft: (8.6·3000 + ρa·4000)/19.25
    const rhoA = 16.3 + (4000 / 3125) ** 0.6;
    const expectedTop = (8.6 * 3000 + rhoA * 4000) / 19.25;
    expect(Math.abs(r.svPsi[iTop] - expectedTop)).toBeLessThan(1e-6);
    // integrating ρa(D) as a point density would give ∫ρa dD = 16.3 D + 3125·(D/3125)^1.6/1.6 — a known mistake
    const wrong = (8.6 * 3000 + 16.3 * 4000 + (3125 * (4000 / 3125) ** 1.6) / 1.6) / 19.25;
    expect(r.svPsi[iTop] - wrong).toBeGreaterThan(50);
    // below the top, constant 2.2 g/cc: Sv grows by 2.2 × 0.43353 psi/ft exactly
    const iEnd = tvdFt.length - 1;
    expect(Math.abs(r.svPsi[iEnd] - (expectedTop + 2.2 * 0.43353 * (12000 - topLog)))).toBeLessThan(0.05);
    // the implied point density reported for plots is d(ρa·D)/dD = 16.3 + 1.6 (D/3125)^0.6 ppg
    const iMid = tvdFt.indexOf(3080 + 3125);
    expect(r.densityUsedGcc[iMid] * PPG_PER_GCC).toBeCloseTo(17.9, 10);
  });

  it("gardnerFromSonic fills the near-mudline gap from sonic (Gardner et al. 1974, own case 100 µs/ft → 2.300 g/cc)", () => {
    const datums: Datums = Object.freeze({ rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 });
    const tvdFt = grid(3082, 6082, 1);
    const densityGcc = tvdFt.map((z) => (z >= 4082 ? 2.3 : NaN));
    const slownessUsPerFt = tvdFt.map(() => 100);
    const r = integrateOverburden({ tvdFt, datums, densityGcc, slownessUsPerFt, nearMudline: "gardnerFromSonic" });
    const expected = 1.03 * 0.43353 * 3000 + 2.3 * 0.43353 * 3000; // water + 3000 ft at 2.300
    expect(Math.abs(r.svPsi[r.svPsi.length - 1] - expected) / expected).toBeLessThan(2e-5); // 0.43353 is rounded to 5 digits
    expect(r.ranges.map((x) => x.source)).toEqual(["nearMudlineGardner", "densityLog"]);
    expect(r.ranges[0]).toMatchObject({ fromTvdFt: 3082, toTvdFt: 4081, count: 1000 });
  });

  it("patches caliper-flagged bad hole from Gardner on sonic and reports the range (own case, closed form)", () => {
    const datums: Datums = Object.freeze({ rtElevationFt: 0, waterDepthFt: 0, groundLevelFt: 0, seawaterDensityGcc: 1.03 });
    const tvdFt = Object.freeze(grid(0, 100, 1));
    const densityGcc = Object.freeze(tvdFt.map((_, i) => (i >= 10 && i <= 19 ? 1.5 : 2.4)));
    const slownessUsPerFt = Object.freeze(tvdFt.map(() => 100));
    const badHoleFlag = new Uint8Array(tvdFt.length);
    for (let i = 10; i <= 19; i++) badHoleFlag[i] = 1;
    const flagCopy = badHoleFlag.slice();
    const r = integrateOverburden({ tvdFt, datums, densityGcc, slownessUsPerFt, badHoleFlag });
    expect(badHoleFlag).toEqual(flagCopy); // not mutated
    // 10 samples at 2.300 instead of 2.4: the trapezoid deficit is 0.1 g/cc × 10 ft
    expect(Math.abs(r.svPsi[100] - (2.4 * 100 - 1.0) * 0.43353)).toBeLessThan(1e-3);
    expect(r.densityUsedGcc[15]).toBeCloseTo(2.3, 12);
    expect(r.ranges.find((x) => x.source === "badHoleGardner")).toMatchObject({ fromTvdFt: 10, toTvdFt: 19, count: 10 });
  });

  it("missing density without sonic is interpolated inside the log and held below it, and reported", () => {
    const tvdFt = grid(0, 100, 1);
    const densityGcc = tvdFt.map((z) => (z >= 40 && z < 50 ? NaN : z > 90 ? NaN : 2.0 + 0.002 * z));
    const r = integrateOverburden({ tvdFt, datums: ONSHORE_AT_RT, densityGcc });
    // density linear in depth everywhere it is interpolated: trapezoid is exact to z = 90
    const exact90 = (2.0 * 90 + 0.001 * 90 * 90) * 0.43353;
    expect(Math.abs(r.svPsi[90] - exact90)).toBeLessThan(1e-3);
    const held = (2.0 + 0.002 * 90) * 0.43353 * 10;
    expect(Math.abs(r.svPsi[100] - exact90 - held)).toBeLessThan(1e-3);
    expect(r.source[45]).toBe(OverburdenSource.interpolated);
    expect(r.ranges.map((x) => x.source)).toEqual(["densityLog", "interpolated", "densityLog", "extendedLastValue"]);
  });

  it("carries a warning when Gardner is asked for above the log but sonic is missing there", () => {
    const datums: Datums = { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 };
    const tvdFt = grid(3082, 5082, 10);
    const r = integrateOverburden({
      tvdFt,
      datums,
      densityGcc: tvdFt.map((z) => (z >= 4082 ? 2.2 : NaN)),
      slownessUsPerFt: tvdFt.map(() => NaN),
      nearMudline: "gardnerFromSonic",
    });
    expect(r.warnings.map((w) => w.code)).toContain("W_NO_SONIC_NEAR_MUDLINE");
    expect(r.ranges[0].source).toBe("nearMudlinePowerLaw");
  });

  it("throws typed errors for unsorted depth, length mismatch and seawater density in ppg", () => {
    const datums: Datums = { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 };
    expect(() => integrateOverburden({ tvdFt: [0, 10, 5], datums, densityGcc: [2, 2, 2] })).toThrow(
      expect.objectContaining({ code: "E_DEPTH_ORDER" }),
    );
    expect(() => integrateOverburden({ tvdFt: [0, 10], datums, densityGcc: [2] })).toThrow(ShalepointError);
    expect(() =>
      integrateOverburden({ tvdFt: [0, 10], datums: { ...datums, seawaterDensityGcc: 8.6 }, densityGcc: [2, 2] }),
    ).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});

describe("powerLawAverageDensityPpg", () => {
  it("ρa at 0/1000/3125/10,000 ft bml is 16.30/16.80/17.30/18.31 ppg (CHECK-VALUES §1, own case on Traugott 1997 from memory)", () => {
    const table: [number, number][] = [[0, 16.3], [1000, 16.8], [3125, 17.3], [10000, 18.31]];
    for (const [d, rho] of table) expect(Math.abs(powerLawAverageDensityPpg(d) - rho)).toBeLessThan(0.005);
    expect(powerLawAverageDensityPpg(-1)).toBeNaN();
  });
});

describe("powerLawOverburdenPsi", () => {
  it("ρw 8.6 ppg, Zw 3000 ft, D_bml 6920 ft → ρa 17.91 ppg, Sv 7779 psi (CHECK-VALUES §1, own case)", () => {
    expect(Math.abs(powerLawAverageDensityPpg(6920) - 17.91)).toBeLessThan(0.005);
    // a 1 % change in 3125 moves Sv by ≈ 3.5 psi, in 0.6 by ≈ 1.7 psi: the 0.5 psi band catches both
    expect(Math.abs(powerLawOverburdenPsi({ bmlFt: 6920, waterDepthFt: 3000, seawaterPpg: 8.6 }) - 7779)).toBeLessThan(0.5);
  });
});

describe("powerLawPointDensityPpg", () => {
  it("is the derivative of ρa·D (central difference, own case)", () => {
    const d = 5000;
    const h = 1e-3;
    const f = (x: number) => powerLawAverageDensityPpg(x) * x;
    expect(powerLawPointDensityPpg(d)).toBeCloseTo((f(d + h) - f(d - h)) / (2 * h), 6);
  });
});

describe("gardnerDensityGcc", () => {
  it("10,000 ft/s → 2.300 g/cc (CHECK-VALUES §1, own case on Gardner et al. 1974, published formula)", () => {
    // a 1 % change in 0.23 would give 2.323
    expect(Math.abs(gardnerDensityGcc({ velocityFtPerS: 10000 }) - 2.3)).toBeLessThan(1e-12);
  });
  it("3048 m/s agrees with the metric form 0.3095·V^0.25 = 2.300 and 0.31·V^0.25 = 2.303 within its rounding (CHECK-VALUES §1)", () => {
    const rho = gardnerDensityGcc({ velocityFtPerS: metresToFeet(3048) });
    expect(Math.abs(rho - 0.3095 * 3048 ** 0.25)).toBeLessThan(5e-4);
    expect(Math.abs(0.31 * 3048 ** 0.25 - 2.303)).toBeLessThan(5e-4);
    expect(Math.abs(rho - 2.3)).toBeLessThan(1e-9);
  });
  it("NaN and non-positive velocity give NaN", () => {
    expect(gardnerDensityGcc({ velocityFtPerS: NaN })).toBeNaN();
    expect(gardnerDensityGcc({ velocityFtPerS: 0 })).toBeNaN();
  });
});

describe("gardnerDensityFromSlowness", () => {
  it("100 µs/ft → 2.300 g/cc, NaN stays NaN, input untouched (own case, Gardner et al. 1974)", () => {
    const dt = Object.freeze([100, NaN, 50]);
    const rho = gardnerDensityFromSlowness({ slownessUsPerFt: dt });
    expect(rho[0]).toBeCloseTo(2.3, 12);
    expect(rho[1]).toBeNaN();
    expect(rho[2]).toBeCloseTo(0.23 * 20000 ** 0.25, 12);
  });
});
