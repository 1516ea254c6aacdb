/**
 * Eaton (1975, SPE-5544) checks against outside values: CHECK-VALUES §3
 * own cases (computed there from the published equation), the published exponents
 * (Lyons 2001, eq. 4-251), and the identities ratio 1 → Ph, ratio → 0 → Sv.
 */
import { describe, expect, it } from "vitest";
import {
  EATON_DEXPONENT_EXPONENT,
  EATON_RESISTIVITY_EXPONENT,
  EATON_SONIC_EXPONENT,
  PP_FLAG_BELOW_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_HYDROSTATIC,
  PP_FLAG_CLIPPED_AT_OVERBURDEN,
  PP_FLAG_MISSING_INPUT,
  PP_FLAG_OUTSIDE_CALIBRATION,
  describePorePressureFlags,
  eatonDexponentPorePressure,
  eatonPorePressure,
  eatonRatio,
  eatonResistivityPorePressure,
  eatonSonicPorePressure,
} from "../../src/porepressure/index.js";
import { mpaToPsi, psiToMpa } from "../../src/units/index.js";
import { ShalepointError } from "../../src/errors.js";

// Gradients in psi/ft at D = 10,000 ft: stresses are gradient × D, results divided back.
const D = 10000;

describe("Eaton exponents", () => {
  it("EATON_*_EXPONENT are 3.0 / 1.2 / 1.2 (published: Eaton 1975; Lyons 2001 eq. 4-251)", () => {
    expect(EATON_SONIC_EXPONENT).toBe(3.0);
    expect(EATON_RESISTIVITY_EXPONENT).toBe(1.2);
    expect(EATON_DEXPONENT_EXPONENT).toBe(1.2);
  });
});

describe("eatonSonicPorePressure", () => {
  it("S/D 1.0, Pn 0.465, V 10,000 vs Vn 12,000 ft/s → 0.6904 psi/ft (CHECK-VALUES §3, own case)", () => {
    // slowness = 1e6/V: 100 µs/ft observed, 83.333 µs/ft trend
    const r = eatonSonicPorePressure({
      overburdenPsi: [1.0 * D],
      hydrostaticPsi: [0.465 * D],
      dtUsPerFt: [1e6 / 10000],
      dtTrendUsPerFt: [1e6 / 12000],
    });
    // 4 significant figures in the source: ±0.5 in the last digit. A 1 % change of the
    // exponent (3.00 → 3.03) moves the result by 0.0017 psi/ft and fails this check.
    expect(r.ppPsi[0] / D).toBeCloseTo(0.6904, 4);
    expect(r.flags[0]).toBe(0);
    expect(r.warnings).toEqual([]);
  });

  it("Sv 66, Ph 30 MPa, Δtn 100, Δt 120 µs/ft → 45.17 MPa (CHECK-VALUES §3, own case)", () => {
    const r = eatonSonicPorePressure({
      overburdenPsi: [mpaToPsi(66)],
      hydrostaticPsi: [mpaToPsi(30)],
      dtUsPerFt: [120],
      dtTrendUsPerFt: [100],
    });
    expect(psiToMpa(r.ppPsi[0])).toBeCloseTo(45.17, 2); // 4 s.f. in the source
  });

  it("with the exponential trend of CHECK-VALUES §2 at Z 5000 ft, Δt 120 → 0.7335 psi/ft (CHECK-VALUES §3, own case)", () => {
    // Zhang 2011 (Earth-Sci. Rev. 108:50–63, form from memory): Δtn = Δtm + (Δtml − Δtm)e^(−cZ),
    // Δtm 65, Δtml 200 µs/ft, c 3.0e-4 /ft — evaluated here, not taken from src/trend.
    const z = 5000;
    const dtn = 65 + (200 - 65) * Math.exp(-3.0e-4 * z);
    const r = eatonSonicPorePressure({ overburdenPsi: [z], hydrostaticPsi: [0.465 * z], dtUsPerFt: [120], dtTrendUsPerFt: [dtn] });
    expect(r.ppPsi[0] / z).toBeCloseTo(0.7335, 4);
  });
});

describe("eatonResistivityPorePressure", () => {
  it("Ro/Rn 0.6, S/D 1.0, Pn 0.465 → 0.7102 psi/ft (CHECK-VALUES §3, own case)", () => {
    const r = eatonResistivityPorePressure({
      overburdenPsi: [D],
      hydrostaticPsi: [0.465 * D],
      resistivityOhmM: [0.6],
      resistivityTrendOhmM: [1.0],
    });
    // A 1 % change of the exponent (1.2 → 1.212) moves the result by 0.0018 psi/ft.
    expect(r.ppPsi[0] / D).toBeCloseTo(0.7102, 4);
  });
});

describe("eatonDexponentPorePressure", () => {
  it("S/D 1.04, Pn 0.452, dco 1.75, dcn 1.85 → 0.4899 psi/ft (CHECK-VALUES §3, own case)", () => {
    const r = eatonDexponentPorePressure({ overburdenPsi: [1.04 * D], hydrostaticPsi: [0.452 * D], dcObserved: [1.75], dcTrend: [1.85] });
    expect(r.ppPsi[0] / D).toBeCloseTo(0.4899, 4);
  });
});

describe("eatonPorePressure", () => {
  it("ratio 1 gives Ph exactly; ratio → 0 gives Sv (CHECK-VALUES §3 identities)", () => {
    const r = eatonPorePressure({ overburdenPsi: [9870, 9870], hydrostaticPsi: [4589.55, 4589.55], ratio: [1, 1e-12], exponent: 3 });
    expect(r.ppPsi[0]).toBe(4589.55);
    expect(r.ppPsi[1]).toBe(9870);
  });

  it("carries NaN and non-positive ratios through as missing (flag 1), sample by sample", () => {
    const r = eatonPorePressure({
      overburdenPsi: [10000, NaN, 10000, 10000],
      hydrostaticPsi: [4650, 4650, 4650, 4650],
      ratio: [0.8, 0.8, 0, NaN],
      exponent: 3,
    });
    // own case: 10000 − 5350·0.8³ = 7260.8 psi
    expect(r.ppPsi[0]).toBeCloseTo(7260.8, 9);
    expect(Array.from(r.ppPsi.slice(1)).every(Number.isNaN)).toBe(true);
    expect(Array.from(r.flags)).toEqual([0, PP_FLAG_MISSING_INPUT, PP_FLAG_MISSING_INPUT, PP_FLAG_MISSING_INPUT]);
    expect(r.warnings).toEqual([
      { code: "W_PP_MISSING_INPUT", message: "Eaton: 3 sample(s) missing or invalid input; first at sample 1", index: 1, count: 3 },
    ]);
  });

  it("flags below hydrostatic (kept) and, with floorAtHydrostatic, raises to Ph (flags 4|8)", () => {
    const base = { overburdenPsi: [10000], hydrostaticPsi: [4650], ratio: [1.1], exponent: 3 };
    const kept = eatonPorePressure(base);
    // own case: 10000 − 5350·1.331 = 2879.15 psi, below Ph
    expect(kept.ppPsi[0]).toBeCloseTo(2879.15, 9);
    expect(kept.flags[0]).toBe(PP_FLAG_BELOW_HYDROSTATIC);
    const floored = eatonPorePressure({ ...base, floorAtHydrostatic: true });
    expect(floored.ppPsi[0]).toBe(4650);
    expect(floored.flags[0]).toBe(PP_FLAG_BELOW_HYDROSTATIC | PP_FLAG_CLIPPED_AT_HYDROSTATIC);
    expect(floored.warnings.map((w) => w.code)).toEqual(["W_PP_BELOW_HYDROSTATIC", "W_PP_CLIPPED_AT_HYDROSTATIC"]);
  });

  it("clips at overburden and says so (flag 2, warning with depth)", () => {
    // Sv below Ph (inconsistent inputs) makes Pp > Sv: 4000 − (4000 − 4650)·0.5³ = 4081.25
    const r = eatonPorePressure({ overburdenPsi: [4000], hydrostaticPsi: [4650], ratio: [0.5], exponent: 3, tvdFt: [10000] });
    expect(r.ppPsi[0]).toBe(4000);
    expect(r.flags[0] & PP_FLAG_CLIPPED_AT_OVERBURDEN).toBe(PP_FLAG_CLIPPED_AT_OVERBURDEN);
    expect(r.warnings[0]).toMatchObject({ code: "W_PP_CLIPPED_AT_OVERBURDEN", count: 1, index: 0, depthFt: 10000 });
    expect(describePorePressureFlags(r.flags[0])).toContain("clipped at overburden (zero effective stress)");
  });

  it("flags samples outside the calibrated depth range (flag 32), values kept", () => {
    const r = eatonPorePressure({
      overburdenPsi: [9000, 10000, 11000],
      hydrostaticPsi: [4185, 4650, 5115],
      ratio: [1, 1, 1],
      exponent: 3,
      tvdFt: [9000, 10000, 11000],
      calibratedRangeTvdFt: { topFt: 9500, baseFt: 10500 },
    });
    expect(Array.from(r.flags)).toEqual([PP_FLAG_OUTSIDE_CALIBRATION, 0, PP_FLAG_OUTSIDE_CALIBRATION]);
    expect(Array.from(r.ppPsi)).toEqual([4185, 4650, 5115]);
  });

  it("throws E_RANGE for an exponent ≤ 0 or not finite, E_LENGTH for mismatched arrays", () => {
    for (const exponent of [0, -1, NaN, Infinity]) {
      try {
        eatonPorePressure({ overburdenPsi: [1], hydrostaticPsi: [1], ratio: [1], exponent });
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(ShalepointError);
        expect((e as ShalepointError).code).toBe("E_RANGE");
        expect((e as ShalepointError).details.param).toBe("exponent");
      }
    }
    expect(() => eatonPorePressure({ overburdenPsi: [1, 2], hydrostaticPsi: [1], ratio: [1, 1], exponent: 3 })).toThrow(/same length/);
    expect(() => eatonPorePressure({ overburdenPsi: [1], hydrostaticPsi: [1], ratio: [1], exponent: 3, tvdFt: [1, 2] })).toThrow(
      expect.objectContaining({ code: "E_LENGTH" }),
    );
  });

  it("does not mutate its inputs (frozen arrays, typed arrays compared with copies)", () => {
    const sv = Object.freeze([10000, 11000]);
    const ph = Object.freeze([4650, 5115]);
    const ratio = new Float64Array([0.8, 0.9]);
    const copy = Float64Array.from(ratio);
    const r = eatonPorePressure({ overburdenPsi: sv, hydrostaticPsi: ph, ratio, exponent: 3 });
    expect(ratio).toEqual(copy);
    expect(r.ppPsi).not.toBe(ratio);
  });
});

describe("eatonRatio", () => {
  it("sonic is trend/observed, resistivity and d-exponent observed/trend; bad values → NaN", () => {
    expect(eatonRatio({ log: "sonic", observed: [120], trend: [100] })[0]).toBeCloseTo(100 / 120, 15);
    expect(eatonRatio({ log: "resistivity", observed: [0.6], trend: [1.2] })[0]).toBeCloseTo(0.5, 15);
    expect(eatonRatio({ log: "dexponent", observed: [1.75], trend: [1.85] })[0]).toBeCloseTo(1.75 / 1.85, 15);
    expect(Number.isNaN(eatonRatio({ log: "sonic", observed: [0], trend: [100] })[0])).toBe(true);
    expect(() => eatonRatio({ log: "density" as never, observed: [1], trend: [1] })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});
