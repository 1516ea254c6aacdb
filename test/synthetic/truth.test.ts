/**
 * integrateDemoTruth / demoTruthAt / demoSonicStressPsi / demoPathAt: the designed truth is
 * physically consistent and matches outside formulas and check values.
 */
import { describe, expect, it } from "vitest";
import { QUILLON_DEMO_WELLS, QUILLON_ROCK, type DemoRockParameters, type DemoWellDesign } from "../../src/synthetic/demoWellDesigns.js";
import { demoTruthAt, integrateDemoTruth } from "../../src/synthetic/truthProfile.js";
import { demoSonicStressPsi, generateDemoWellLogs } from "../../src/synthetic/syntheticLogs.js";
import { demoPathAt, demoSurveyStations } from "../../src/synthetic/demoTrajectory.js";
import { DEMO_LOGS_SEED } from "../../src/synthetic/demoFiles.js";

// CHECK-VALUES §0: psi/ft per g/cc = ρ·g = 0.43353 (g = 9.80665 m/s²), written out here
// independently of src/units: 1000 kg/m³ × 9.80665 × 0.3048 m / 6894.757 Pa.
const PSI_FT_PER_GCC = (1000 * 9.80665 * 0.3048) / 6894.757293168361;
const PA_PER_PSI = 6894.757293168361;

const [A1, A2ST, B1] = QUILLON_DEMO_WELLS;
const logsByWell = new Map(QUILLON_DEMO_WELLS.map((d) => [d.slug, generateDemoWellLogs(d, QUILLON_ROCK, DEMO_LOGS_SEED)]));

describe("integrateDemoTruth", () => {
  it("reproduces the CHECK-VALUES §1 seawater + constant-sediment overburden (53.25 MPa)", () => {
    // CHECK-VALUES §1 (own case on Zoback 2007 eq. 1.6): 1000 m seawater at 1.03 g/cc plus
    // 2000 m of sediment averaging 2.20 g/cc → 53.25 MPa. Zero porosity makes every
    // sediment's bulk density equal its grain density, 2.20 g/cc.
    const rock: DemoRockParameters = {
      ...QUILLON_ROCK,
      shale: { phi0: 0, sigmaCPsi: 2800, grainGcc: 2.2 },
      sand: { phi0: 0, sigmaCPsi: 5500, grainGcc: 2.2 },
    };
    const ft = (m: number) => m / 0.3048;
    const design: DemoWellDesign = {
      ...A1,
      waterDepthFt: ft(1000),
      sands: [],
      pressure: { ...A1.pressure, topOverpressureTvdssFt: 1e6, upperSeal: { topTvdssFt: 2e6, baseTvdssFt: 2e6 + 1, baseSigmaPsi: 1 }, lowerSeal: { topTvdssFt: 3e6, baseTvdssFt: 3e6 + 1 } },
    };
    const frozen = Object.freeze(JSON.parse(JSON.stringify(design)));
    const col = integrateDemoTruth(design, rock, ft(3000) + 10);
    const svMpa = (demoTruthAt(col, ft(3000)).svPsi * PA_PER_PSI) / 1e6;
    // 4 significant figures quoted → ±0.005 MPa.
    expect(Math.abs(svMpa - 53.25)).toBeLessThan(0.005);
    expect(JSON.parse(JSON.stringify(design))).toEqual(frozen);
  });

  it("gives hydrostatic pressure = ρ·g·TVDSS above the top of overpressure", () => {
    for (const d of QUILLON_DEMO_WELLS) {
      const col = integrateDemoTruth(d, QUILLON_ROCK, 15000);
      const rhoBrine = d.pressure.hydrostaticPsiPerFt / PSI_FT_PER_GCC; // g/cc
      for (const z of [d.waterDepthFt + 100, 6000, d.pressure.topOverpressureTvdssFt - 1]) {
        const p = demoTruthAt(col, z);
        expect(p.zone).toBe("hydrostatic");
        // CHECK-VALUES §0 (published constant): P = ρ g z; exact up to double rounding.
        expect(Math.abs(p.ppPsi / (rhoBrine * PSI_FT_PER_GCC * z) - 1)).toBeLessThan(1e-9);
      }
    }
  });

  it("starts Sv at the mudline with the seawater column (1.03 g/cc)", () => {
    for (const d of QUILLON_DEMO_WELLS) {
      const col = integrateDemoTruth(d, QUILLON_ROCK, 15000);
      // CHECK-VALUES §1: offshore Sv = ρw g zw + ∫ρ g dz (Zoback 2007 eq. 1.6, published).
      expect(Math.abs(col.svPsi[0] / (1.03 * PSI_FT_PER_GCC * d.waterDepthFt) - 1)).toBeLessThan(1e-9);
    }
  });
});

describe("demoTruthAt (truth invariants on every log sample)", () => {
  for (const d of QUILLON_DEMO_WELLS) {
    const logs = logsByWell.get(d.slug)!;
    it(`${d.name}: Pp stays below Sv (≥ 1,000 psi where overpressured) and below Shmin; Sv increases`, () => {
      let prevSv = -Infinity;
      for (let i = 0; i < logs.truth.length; i++) {
        const t = logs.truth[i];
        // Common practice, no source (CHECK-VALUES §13): pore pressure cannot reach the
        // least principal stress. Design margins: σ > 0 from the mudline down, σ ≥ 1,000 psi
        // wherever the rock is overpressured.
        expect(t.svPsi - t.ppPsi).toBeGreaterThan(0);
        if (t.zone !== "hydrostatic") expect(t.svPsi - t.ppPsi).toBeGreaterThan(1000);
        expect(t.shminPsi).toBeGreaterThan(t.ppPsi);
        expect(t.shminPsi).toBeLessThan(t.svPsi);
        expect(t.svPsi).toBeGreaterThanOrEqual(prevSv);
        prevSv = t.svPsi;
      }
    });

    it(`${d.name}: Shmin follows Eaton 1969 with the stated Poisson's ratio`, () => {
      // Eaton 1969 (CHECK-VALUES §6, published form): Shmin = ν/(1−ν)(Sv − Pp) + Pp.
      const k = d.poissonRatio / (1 - d.poissonRatio);
      for (let i = 0; i < logs.truth.length; i += 997) {
        const t = logs.truth[i];
        expect(Math.abs(t.shminPsi - (k * (t.svPsi - t.ppPsi) + t.ppPsi))).toBeLessThan(1e-8);
      }
    });

    it(`${d.name}: overburden gradient is plausible at TD`, () => {
      const t = logs.truth[logs.truth.length - 1];
      const mud = d.seawaterGcc * PSI_FT_PER_GCC * d.waterDepthFt;
      const sedimentGradient = (t.svPsi - mud) / (t.tvdssFt - d.waterDepthFt);
      // Common practice, no source: overburden ≈ 1 psi/ft (Zoback 2007 ~23 MPa/km = 1.017
      // psi/ft); a young deepwater sand–shale column sits a little below: 0.85–1.0 psi/ft.
      expect(sedimentGradient).toBeGreaterThan(0.85);
      expect(sedimentGradient).toBeLessThan(1.0);
      // Total gradient from the rotary table, with thousands of ft of water, 0.75–0.95.
      const tvd = t.tvdssFt + d.airGapFt;
      expect(t.svPsi / tvd).toBeGreaterThan(0.75);
      expect(t.svPsi / tvd).toBeLessThan(0.95);
    });

    it(`${d.name}: Sv equals the first sample's Sv plus the integral of the truth density`, () => {
      // Zoback 2007 eq. 1.6 (published): integrate the sample densities independently
      // (trapezoid over the samples' TVDSS, which is irregular in the deviated well).
      let sv = logs.truth[0].svPsi;
      for (let i = 1; i < logs.truth.length; i++) {
        const a = logs.truth[i - 1], b = logs.truth[i];
        sv += (PSI_FT_PER_GCC * (a.densityGcc + b.densityGcc) * (b.tvdssFt - a.tvdssFt)) / 2;
      }
      const last = logs.truth[logs.truth.length - 1].svPsi;
      // Different grids (0.5 ft from the mudline vs the file index) and bed edges: ≤ 0.05 %.
      expect(Math.abs(sv / last - 1)).toBeLessThan(5e-4);
    });
  }

  it("puts the compartment sands of Quillon A-1 on one brine-gradient line", () => {
    const logs = logsByWell.get("quillon-a1")!;
    const pts = logs.truth.filter((t) => t.zone === "compartment" && t.lithology === "sand" && t.fluid === "brine");
    expect(pts.length).toBeGreaterThan(100);
    const first = pts[0];
    for (const t of pts) {
      // CHECK-VALUES §11 (Bradley 1975; Hunt 1990, from memory): one compartment → one
      // fluid-gradient line, here the brine gradient 0.445 psi/ft.
      const line = first.ppPsi + 0.445 * (t.tvdssFt - first.tvdssFt);
      expect(Math.abs(t.ppPsi - line)).toBeLessThan(1e-6);
    }
    // The regressed sands below sit far off that line (another compartment).
    const below = logs.truth.find((t) => t.zone === "regressed" && t.lithology === "sand")!;
    expect(first.ppPsi + 0.445 * (below.tvdssFt - first.tvdssFt) - below.ppPsi).toBeGreaterThan(500);
  });

  it("hangs a gas column of about 0.1 psi/ft from the water line at the contact (A-1)", () => {
    const logs = logsByWell.get("quillon-a1")!;
    const gas = logs.truth.filter((t) => t.fluid === "gas");
    const g = (gas[gas.length - 1].ppPsi - gas[0].ppPsi) / (gas[gas.length - 1].tvdssFt - gas[0].tvdssFt);
    // Common practice, no source (CHECK-VALUES §11): gas 0.05–0.15 psi/ft; designed 0.22 g/cc.
    expect(Math.abs(g - 0.22 * PSI_FT_PER_GCC)).toBeLessThan(1e-9);
    expect(g).toBeGreaterThan(0.05);
    expect(g).toBeLessThan(0.15);
  });

  it("makes Marten B-1's unloading zone: Pp rises faster than Sv, density flat, sonic slower", () => {
    const logs = logsByWell.get("marten-b1")!;
    const idx = logs.truth.map((t, i) => (t.zone === "unloading" && t.lithology === "shale" ? i : -1)).filter((i) => i >= 0);
    const a = idx[0], b = idx[idx.length - 1];
    const ta = logs.truth[a], tb = logs.truth[b];
    expect((tb.ppPsi - ta.ppPsi) / (tb.tvdssFt - ta.tvdssFt)).toBeGreaterThan((tb.svPsi - ta.svPsi) / (tb.tvdssFt - ta.tvdssFt));
    expect(Math.abs(tb.densityGcc - ta.densityGcc)).toBeLessThan(0.005);
    expect(logs.clean.dtUsPerFt[b] - logs.clean.dtUsPerFt[a]).toBeGreaterThan(3);
    expect(tb.sigmaPsi).toBeLessThan(tb.sigmaMaxPsi);
  });
});

describe("demoSonicStressPsi", () => {
  const v = (sigmaPsi: number, sigmaMaxPsi: number, u: number) =>
    5000 + 10 * Math.pow(demoSonicStressPsi({ sigmaPsi, sigmaMaxPsi } as never, u), 0.75);
  it("gives Bowers' virgin velocities (A 10, B 0.75)", () => {
    // CHECK-VALUES §4, Bowers 1995 (own case, from memory form): σ 1000/3000/5000 → 6778/9054/10,946 ft/s.
    expect(Math.abs(v(1000, 1000, 3.13) - 6778)).toBeLessThan(0.5);
    expect(Math.abs(v(3000, 3000, 3.13) - 9054)).toBeLessThan(0.5);
    expect(Math.abs(v(5000, 5000, 3.13) - 10946)).toBeLessThan(0.5);
  });
  it("gives Bowers' unloading velocity (σmax 2947 psi, U 3.13, σ 2000 → 8645 ft/s)", () => {
    // CHECK-VALUES §4 (own case): Vmax 9000 → σmax 2947 psi; U 3.13, σ 2000 → 8645 ft/s.
    // A 1 % change in U moves V by ~3 ft/s, beyond the ±1 ft/s allowed for σmax rounding.
    expect(Math.abs(v(2000, 2947, 3.13) - 8645)).toBeLessThan(1);
  });
});

describe("demoPathAt", () => {
  it("matches the CHECK-VALUES §10 build-and-hold stations", () => {
    // CHECK-VALUES §10 (own case, minimum curvature): (1000,0,0), (1500,15,45), (2000,30,45),
    // (3000,30,45) → TVD 1494.31 / 1954.93 / 2820.96 ft; N = E = 46.02 / 180.9 / 534.5 ft.
    const t = { kickoffMdFt: 1000, buildDegPer100Ft: 3, holdIncDeg: 30, azimuthDeg: 45, totalDepthMdFt: 3000, stationStepFt: 100 };
    const expected = [[1500, 1494.31, 46.02], [2000, 1954.93, 180.9], [3000, 2820.96, 534.5]];
    for (const [md, tvd, ne] of expected) {
      const p = demoPathAt(t, md);
      expect(Math.abs(p.tvdFt - tvd)).toBeLessThan(0.006);
      const north = p.displacementFt * Math.cos((45 * Math.PI) / 180);
      expect(Math.abs(north - ne)).toBeLessThan(ne < 100 ? 0.006 : 0.06);
    }
  });
  it("lists survey stations that include the kick-off, end of build and TD", () => {
    const st = demoSurveyStations(A2ST.trajectory!);
    const mds = st.map((s) => s.mdFt);
    expect(mds).toContain(5600);
    expect(mds).toContain(7100);
    expect(mds[mds.length - 1]).toBe(17500);
    expect(st[st.length - 1].incDeg).toBeCloseTo(45, 12);
  });
});

describe("QUILLON_DEMO_WELLS", () => {
  it("keeps the scenario's stated ranges", () => {
    for (const d of QUILLON_DEMO_WELLS) {
      // SCENARIO: air gap 82 ft (25 m), seawater 1.03 g/cc, brine 0.44–0.465 psi/ft, top of
      // overpressure 7,500–10,000 ft TVDSS, water 2,000–5,500 ft.
      expect(Math.abs(d.airGapFt - 82)).toBeLessThan(0.05);
      expect(d.seawaterGcc).toBe(1.03);
      expect(d.pressure.hydrostaticPsiPerFt).toBeGreaterThanOrEqual(0.44);
      expect(d.pressure.hydrostaticPsiPerFt).toBeLessThanOrEqual(0.465);
      expect(d.pressure.topOverpressureTvdssFt).toBeGreaterThanOrEqual(7500);
      expect(d.pressure.topOverpressureTvdssFt).toBeLessThanOrEqual(10000);
      expect(d.waterDepthFt).toBeGreaterThanOrEqual(2000);
    }
    expect(B1.pressure.unloading).toBeDefined();
  });
});

describe("doc examples", () => {
  it("demoPathAt: end of build at 7,100 ft MD is 5,600 + R·sin 45° TVD", () => {
    // Circular arc (Sawaryn & Thorogood 2005, published): R = 100/(3·π/180) ft = 1909.86 ft.
    const r = 100 / ((3 * Math.PI) / 180);
    expect(Math.abs(demoPathAt(A2ST.trajectory!, 7100).tvdFt - (5600 + r * Math.SQRT1_2))).toBeLessThan(1e-9);
    expect(Math.abs(demoPathAt(A2ST.trajectory!, 7100).tvdFt - 6950.5)).toBeLessThan(0.05);
  });
  it("demoTruthAt: hydrostatic 0.445 psi/ft × 6,000 ft = 2,670 psi in Quillon A-1", () => {
    const col = integrateDemoTruth(A1, QUILLON_ROCK, 15000);
    expect(Math.abs(demoTruthAt(col, 6000).ppPsi - 2670)).toBeLessThan(1e-9);
  });
});
