/**
 * Vertical-well failure limits: Kirsch wall stresses, tensile breakdown (non-penetrating and
 * penetrating), breakout onset and width, and log-based UCS — against CHECK-VALUES §8 and
 * mathjs evaluations of the published correlations.
 */
import { describe, expect, it } from "vitest";
import { evaluate } from "mathjs";
import { kirschWallStress } from "../../src/stress/kirschWallStress.js";
import {
  breakdownPressureNonPenetrating,
  breakdownPressurePenetrating,
  poroelasticBreakdownCoefficient,
} from "../../src/stress/breakdownPressure.js";
import { breakoutMudPressure, breakoutWidth } from "../../src/stress/breakoutLimits.js";
import { ucsFromSlownessHorsrud2001, ucsFromSlownessLal1999 } from "../../src/stress/ucsCorrelations.js";
import { frictionalStressRatio } from "../../src/stress/frictionalStressBounds.js";
import { ShalepointError } from "../../src/errors.js";
import { codeOf } from "../helpers/shalepointErrors.js";

// CHECK-VALUES §8 own case: 7000 ft, Shmin 4300, SHmax 6300, Pp 3080 psi, UCS 3500, μi 0.6, T 800.
const CASE = Object.freeze({ shminPsi: 4300, shmaxPsi: 6300, ppPsi: 3080 });

describe("kirschWallStress", () => {
  it("uniaxial far field σ: hoop extremes 3σ at 90° and −σ at 0° (CHECK-VALUES §8, published Kirsch 1898)", () => {
    const r = kirschWallStress({ shmaxPsi: 1000, shminPsi: 0, ppPsi: 0, mudPressurePsi: 0, thetaDeg: Object.freeze([90, 0]) });
    expect(r.hoopEffectivePsi[0]).toBeCloseTo(3000, 9);
    expect(r.hoopEffectivePsi[1]).toBeCloseTo(-1000, 9);
  });
  it("own case at Pw = Pp: 8440 psi at 90°, 440 psi at 0° (CHECK-VALUES §8)", () => {
    const r = kirschWallStress({ ...CASE, mudPressurePsi: 3080, thetaDeg: [90, 0, 45] });
    expect(r.hoopEffectivePsi[0]).toBeCloseTo(8440, 9);
    expect(r.hoopEffectivePsi[1]).toBeCloseTo(440, 9);
    // at 45° the cos 2θ term vanishes: SHmax + Shmin − Pw − Pp
    expect(r.hoopEffectivePsi[2]).toBeCloseTo(6300 + 4300 - 6160, 9);
    expect(r.radialEffectivePsi[0]).toBe(0);
  });
  it("carries NaN; array lengths must agree", () => {
    expect(kirschWallStress({ ...CASE, mudPressurePsi: [NaN], thetaDeg: 0 }).hoopEffectivePsi[0]).toBeNaN();
    expect(codeOf(() => kirschWallStress({ ...CASE, mudPressurePsi: [1, 2], thetaDeg: [0, 1, 2] }))).toBe("E_LENGTH");
  });
});

describe("breakdown pressure", () => {
  it("non-penetrating: 3·4300 − 6300 − 3080 + 800 = 4320 psi (CHECK-VALUES §8, own case; Hubbert & Willis 1957)", () => {
    expect(breakdownPressureNonPenetrating({ ...CASE, tensileStrengthPsi: 800 })[0]).toBeCloseTo(4320, 9);
  });
  it("penetrating: η 0 → 3700 psi, η 0.5 → 3907 psi (CHECK-VALUES §8, own case; Haimson & Fairhurst 1967)", () => {
    expect(breakdownPressurePenetrating({ ...CASE, tensileStrengthPsi: 800, poroelasticCoefficient: 0 })[0]).toBeCloseTo(3700, 9);
    expect(breakdownPressurePenetrating({ ...CASE, tensileStrengthPsi: 800, poroelasticCoefficient: 0.5 })[0]).toBeCloseTo(3906.67, 2);
  });
  it("η = α(1 − 2ν)/(1 − ν): α 1, ν 0.25 → 2/3 (Haimson & Fairhurst 1967, from memory)", () => {
    expect(poroelasticBreakdownCoefficient({ biotCoefficient: 1, poissonRatio: 0.25 })).toBeCloseTo(2 / 3, 12);
    expect(codeOf(() => poroelasticBreakdownCoefficient({ biotCoefficient: 1, poissonRatio: 0.5 }))).toBe("E_RANGE");
  });
  it("the non-penetrating value is where the Kirsch hoop stress at 0° reaches −T (identity)", () => {
    const pb = breakdownPressureNonPenetrating({ ...CASE, tensileStrengthPsi: 800 })[0];
    expect(kirschWallStress({ ...CASE, mudPressurePsi: pb, thetaDeg: 0 }).hoopEffectivePsi[0]).toBeCloseTo(-800, 9);
  });
  it("negative tensile strength → E_RANGE; η outside [0, 1] → E_RANGE", () => {
    expect(codeOf(() => breakdownPressureNonPenetrating({ ...CASE, tensileStrengthPsi: -1 }))).toBe("E_RANGE");
    expect(codeOf(() => breakdownPressurePenetrating({ ...CASE, tensileStrengthPsi: 0, poroelasticCoefficient: 1.5 }))).toBe("E_RANGE");
  });
});

describe("breakoutMudPressure", () => {
  it("own case → 4279 psi = 11.76 ppg with 0.052 at 7000 ft (CHECK-VALUES §8, own case)", () => {
    const pw = breakoutMudPressure({ ...CASE, ucsPsi: 3500, internalFriction: 0.6 })[0];
    expect(pw).toBeCloseTo(4279, 0); // 4 s.f. as listed; a 1 % change in UCS moves Pw by 8.5 psi
    expect(pw / (0.052 * 7000)).toBeCloseTo(11.76, 2);
  });
  it("at the onset pressure the wall at 90° meets Mohr–Coulomb exactly: σθθ = UCS + q·ΔP (identity)", () => {
    const pw = breakoutMudPressure({ ...CASE, ucsPsi: 3500, internalFriction: 0.6 })[0];
    const hoop = kirschWallStress({ ...CASE, mudPressurePsi: pw, thetaDeg: 90 }).hoopEffectivePsi[0];
    expect(hoop).toBeCloseTo(3500 + frictionalStressRatio(0.6) * (pw - 3080), 8);
  });
  it("negative UCS and μi < 0 → E_RANGE naming the value", () => {
    try {
      breakoutMudPressure({ ...CASE, ucsPsi: [3500, -10], internalFriction: 0.6 });
      expect.unreachable();
    } catch (e) {
      const err = e as ShalepointError;
      expect(err.code).toBe("E_RANGE");
      expect(err.details.param).toBe("ucsPsi");
      expect(err.details.value).toBe(-10);
    }
    expect(codeOf(() => breakoutMudPressure({ ...CASE, ucsPsi: 3500, internalFriction: -0.1 }))).toBe("E_RANGE");
  });
});

describe("breakoutWidth", () => {
  it("Pw = Pp: cos 2θb = 940/4000 → width 103.6° (own case from Zoback 2007 ch. 6, from memory)", () => {
    const w = breakoutWidth({ ...CASE, mudPressurePsi: 3080, ucsPsi: 3500, internalFriction: 0.6 })[0];
    expect(w).toBeCloseTo(180 - (Math.acos(940 / 4000) * 180) / Math.PI, 9);
    expect(w).toBeCloseTo(103.6, 1);
  });
  it("the hoop stress at the breakout edge equals the strength (consistency with Kirsch)", () => {
    const pw = 3600;
    const w = breakoutWidth({ ...CASE, mudPressurePsi: pw, ucsPsi: 3500, internalFriction: 0.6 })[0];
    const thetaB = 90 - w / 2;
    const hoop = kirschWallStress({ ...CASE, mudPressurePsi: pw, thetaDeg: thetaB }).hoopEffectivePsi[0];
    expect(hoop).toBeCloseTo(3500 + frictionalStressRatio(0.6) * (pw - 3080), 6);
  });
  it("zero at and above the onset pressure; 180° when the wall fails all round", () => {
    const onset = breakoutMudPressure({ ...CASE, ucsPsi: 3500, internalFriction: 0.6 })[0];
    const w = breakoutWidth({ ...CASE, mudPressurePsi: [onset + 1e-6, onset + 500], ucsPsi: 3500, internalFriction: 0.6 });
    expect(Array.from(w)).toEqual([0, 0]);
    // UCS 0 at Pw = Pp: hoop − strength ≥ 440 psi all round (the 0° hoop stress) → 180°
    expect(breakoutWidth({ ...CASE, mudPressurePsi: 3080, ucsPsi: 0, internalFriction: 0.6 })[0]).toBe(180);
    expect(breakoutWidth({ shmaxPsi: 5000, shminPsi: 5000, ppPsi: 3000, mudPressurePsi: 3000, ucsPsi: 1000, internalFriction: 0.6 })[0]).toBe(180);
  });
  it("NaN carried; negative UCS → E_RANGE", () => {
    expect(breakoutWidth({ ...CASE, mudPressurePsi: NaN, ucsPsi: 3500, internalFriction: 0.6 })[0]).toBeNaN();
    expect(codeOf(() => breakoutWidth({ ...CASE, mudPressurePsi: 3080, ucsPsi: -1, internalFriction: 0.6 }))).toBe("E_RANGE");
  });
});

describe("UCS correlations", () => {
  it("ucsFromSlownessHorsrud2001: Δt 100, 150 µs/ft vs mathjs evaluation of 0.77 (304.8/Δt)^2.93 MPa (Horsrud 2001, from memory)", () => {
    const dt = new Float64Array([100, 150, NaN, 0]);
    const r = ucsFromSlownessHorsrud2001(dt);
    for (const [i, d] of [[0, 100], [1, 150]] as const) {
      const mj = evaluate(`0.77 * (304.8 / ${d}) ^ 2.93 MPa`).toNumber("psi");
      expect(Math.abs(r[i] / mj - 1)).toBeLessThan(1e-8); // mathjs psi has 9 digits
    }
    expect(r[0]).toBeCloseTo(2925, 0); // 20.17 MPa
    expect(r[2]).toBeNaN();
    expect(r[3]).toBeNaN();
    expect(Array.from(dt.slice(0, 2))).toEqual([100, 150]);
  });
  it("ucsFromSlownessLal1999: Δt 100 µs/ft → 20.48 MPa via mathjs (Lal 1999, from memory)", () => {
    const r = ucsFromSlownessLal1999(Object.freeze([100, 400]));
    expect(Math.abs(r[0] / evaluate("10 * (304.8 / 100 - 1) MPa").toNumber("psi") - 1)).toBeLessThan(1e-8);
    expect(r[1]).toBeNaN(); // slower than 304.8 µs/ft: negative, returned as missing
  });
});
