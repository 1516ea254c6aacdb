/**
 * Frictional-faulting stress bounds, stress polygon, Andersonian regimes and consistency
 * findings, checked against CHECK-VALUES §7 and §13.
 */
import { describe, expect, it } from "vitest";
import { frictionalStressRatio, frictionalStressBounds, stressPolygon } from "../../src/stress/frictionalStressBounds.js";
import { classifyStressRegime } from "../../src/stress/stressRegime.js";
import { stressConsistencyFindings } from "../../src/stress/stressConsistencyFindings.js";
import { mpaToPsi, psiToMpa } from "../../src/units/index.js";
import { codeOf } from "../helpers/shalepointErrors.js";

describe("frictionalStressRatio", () => {
  it("q(0.6) = 3.119, q(0.4) = 2.182, q(0.8) = 4.329, q(1.0) = 5.828 (CHECK-VALUES §7, published: Jaeger & Cook; Zoback 2007 ch. 4)", () => {
    expect(frictionalStressRatio(0.6)).toBeCloseTo(3.119, 3);
    expect(frictionalStressRatio(0.4)).toBeCloseTo(2.182, 3);
    expect(frictionalStressRatio(0.8)).toBeCloseTo(4.329, 3);
    expect(frictionalStressRatio(1.0)).toBeCloseTo(5.828, 3);
  });
  it("μ = 0 gives q = 1 (no differential stress); μ < 0 → E_RANGE", () => {
    expect(frictionalStressRatio(0)).toBe(1);
    expect(codeOf(() => frictionalStressRatio(-0.1))).toBe("E_RANGE");
  });
});

describe("stressPolygon", () => {
  it("Zhang 2019 inputs Sv 82.5, Pp 69.7 MPa, μ 0.6 → Shmin ≥ 73.80, SHmax ≤ 109.6 MPa (CHECK-VALUES §7, published)", () => {
    const p = stressPolygon({ svPsi: 82.5, ppPsi: 69.7 }); // MPa in, MPa out
    expect(p.shminLowerPsi).toBeCloseTo(73.80, 2);
    expect(p.shmaxUpperPsi).toBeCloseTo(109.6, 1);
  });
  it("outline vertices and regime triangles (own case from the polygon construction, Zoback 2007 ch. 4)", () => {
    const p = stressPolygon({ svPsi: 82.5, ppPsi: 69.7, frictionCoefficient: 0.6 });
    const L = p.shminLowerPsi;
    const U = p.shmaxUpperPsi;
    expect(p.outline).toEqual([
      { shminPsi: L, shmaxPsi: L }, { shminPsi: U, shmaxPsi: U },
      { shminPsi: 82.5, shmaxPsi: U }, { shminPsi: L, shmaxPsi: 82.5 },
    ]);
    // the strike-slip corner (L, Sv) lies on SHmax = Pp + q (Shmin − Pp)
    expect(69.7 + p.ratio * (L - 69.7)).toBeCloseTo(82.5, 10);
    // counter-clockwise: positive shoelace area
    let a = 0;
    for (let i = 0; i < 4; i++) {
      const u = p.outline[i];
      const v = p.outline[(i + 1) % 4];
      a += u.shminPsi * v.shmaxPsi - v.shminPsi * u.shmaxPsi;
    }
    expect(a).toBeGreaterThan(0);
    // the three triangles tile the outline
    const tri = (t: typeof p.normal) => Math.abs((t[1].shminPsi - t[0].shminPsi) * (t[2].shmaxPsi - t[0].shmaxPsi) - (t[2].shminPsi - t[0].shminPsi) * (t[1].shmaxPsi - t[0].shmaxPsi)) / 2;
    expect(tri(p.normal) + tri(p.strikeSlip) + tri(p.reverse)).toBeCloseTo(a / 2, 9);
  });
  it("Pp ≥ Sv → E_RANGE", () => {
    expect(codeOf(() => stressPolygon({ svPsi: 10, ppPsi: 10 }))).toBe("E_RANGE");
  });
});

describe("frictionalStressBounds", () => {
  it("3 km, Sv 69 MPa: Pp 30 → Shmin ≥ 42.50 MPa; Pp 55.2 → 59.62 MPa (CHECK-VALUES §7, own case)", () => {
    const sv = mpaToPsi(69);
    const r = frictionalStressBounds({
      tvdFt: Object.freeze([9842.5, 9842.5]),
      ppPsi: Object.freeze([mpaToPsi(30), mpaToPsi(55.2)]),
      svPsi: Object.freeze([sv, sv]),
    });
    expect(psiToMpa(r.normal.shminMinPsi[0])).toBeCloseTo(42.50, 2);
    expect(psiToMpa(r.normal.shminMinPsi[1])).toBeCloseTo(59.62, 2);
    // stresses converge on Pp: Shmin − Pp shrinks from 12.50 to 4.424 MPa
    expect(psiToMpa(r.normal.shminMinPsi[0]) - 30).toBeCloseTo(12.50, 2);
    expect(psiToMpa(r.normal.shminMinPsi[1]) - 55.2).toBeCloseTo(4.424, 3);
  });
  it("reverse SHmax ≤ q(Sv − Pp) + Pp matches the polygon's 109.6 MPa (CHECK-VALUES §7, published)", () => {
    const r = frictionalStressBounds({ tvdFt: [1], ppPsi: [mpaToPsi(69.7)], svPsi: [mpaToPsi(82.5)], frictionCoefficient: 0.6 });
    expect(psiToMpa(r.reverse.shmaxMaxPsi[0])).toBeCloseTo(109.6, 1);
    expect(psiToMpa(r.strikeSlip.shmaxMaxPsi[0])).toBeCloseTo(109.6, 1);
    expect(psiToMpa(r.reverse.shminMinPsi[0])).toBeCloseTo(82.5, 9);
  });
  it("μ = 0: every bound equals Sv — no differential stress (CHECK-VALUES identity)", () => {
    const r = frictionalStressBounds({ tvdFt: [10000], ppPsi: [4650], svPsi: [10000], frictionCoefficient: 0 });
    for (const reg of [r.normal, r.strikeSlip, r.reverse]) {
      for (const a of [reg.shminMinPsi, reg.shminMaxPsi, reg.shmaxMinPsi, reg.shmaxMaxPsi]) expect(a[0]).toBeCloseTo(10000, 9);
    }
  });
  it("carries NaN; rejects μ < 0", () => {
    const r = frictionalStressBounds({ tvdFt: [1], ppPsi: [NaN], svPsi: [1] });
    expect(r.normal.shminMinPsi[0]).toBeNaN();
    expect(r.reverse.shminMinPsi[0]).toBeNaN();
    expect(codeOf(() => frictionalStressBounds({ tvdFt: [1], ppPsi: [0], svPsi: [1], frictionCoefficient: -0.2 }))).toBe("E_RANGE");
  });
});

describe("classifyStressRegime", () => {
  it("Andersonian ordering (CHECK-VALUES §13, common practice, no source)", () => {
    expect(classifyStressRegime({ svPsi: [10000, 10000, 10000, NaN], shminPsi: [7000, 7000, 10500, 1], shmaxPsi: [9000, 11000, 12000, 2] }))
      .toEqual(["normal", "strikeSlip", "reverse", "undetermined"]);
  });
  it("SHmax < Shmin → E_RANGE", () => {
    expect(codeOf(() => classifyStressRegime({ svPsi: 1, shminPsi: 2, shmaxPsi: 1 }))).toBe("E_RANGE");
  });
});

describe("stressConsistencyFindings", () => {
  // 5 samples, 1000 ft apart; overpressure from 3000 ft; Pp reaches Sv at 5000 ft.
  const tvdFt = Object.freeze([1000, 2000, 3000, 4000, 5000]);
  const svPsi = Object.freeze([1000, 2000, 3000, 4000, 5000]);
  const ppPsi = Object.freeze([465, 930, 2000, 3500, 5000]);

  it("reports Pp at the least stress and convergence with depth ranges (CHECK-VALUES §13, common practice)", () => {
    const f = stressConsistencyFindings({ tvdFt, ppPsi, svPsi, minRunSamples: 3 });
    const pp = f.find((x) => x.code === "F_PP_AT_LEAST_STRESS")!;
    expect([pp.topFt, pp.baseFt, pp.count]).toEqual([5000, 5000, 1]);
    // Sv − Pp: 535, 1070, 1000, 500, 0 → falls from 2000 ft to 5000 ft
    const cv = f.find((x) => x.code === "F_STRESSES_CONVERGE_ON_PP")!;
    expect([cv.topFt, cv.baseFt, cv.count]).toEqual([2000, 5000, 4]);
  });
  it("uses the Shmin curve as least stress when given", () => {
    const f = stressConsistencyFindings({ tvdFt, ppPsi, svPsi, shminPsi: [700, 1400, 2100, 3400, 5100], minRunSamples: 10 });
    const pp = f.filter((x) => x.code === "F_PP_AT_LEAST_STRESS");
    expect(pp.map((x) => [x.topFt, x.baseFt])).toEqual([[4000, 5000]]);
  });
  it("flags a measured Shmin outside the frictional envelope (CHECK-VALUES §7 limits, own case)", () => {
    // at 2000 ft: Pp 930, Sv 2000 → normal limit 930 + 1070/3.119 = 1273 psi; reverse 4268 psi
    const f = stressConsistencyFindings({
      tvdFt, ppPsi, svPsi, minRunSamples: 10,
      measuredShmin: [
        { tvdFt: 2000, shminPsi: 1200, label: "XLOT 1" },
        { tvdFt: 2000, shminPsi: 1300 },
        { tvdFt: 2000, shminPsi: 4300 },
      ],
    });
    expect(f.filter((x) => x.code.startsWith("F_SHMIN")).map((x) => x.code)).toEqual([
      "F_SHMIN_BELOW_FRICTIONAL_LIMIT",
      "F_SHMIN_ABOVE_FRICTIONAL_LIMIT",
    ]);
    expect(codeOf(() => stressConsistencyFindings({ tvdFt, ppPsi, svPsi, measuredShmin: [{ tvdFt: 9000, shminPsi: 1 }] }))).toBe("E_DEPTH_OUTSIDE_WELL");
  });
  it("a hydrostatic well yields no findings (stresses diverge from Pp)", () => {
    expect(stressConsistencyFindings({ tvdFt, ppPsi: tvdFt.map((d) => 0.465 * d), svPsi })).toEqual([]);
  });
});
