/**
 * Units: every factor checked against mathjs units (an independent general-purpose
 * library) and against the constants in NIST SP 811 (2008), App. B (from memory) and the
 * exact legal definitions (1 ft = 0.3048 m; 1 US gal = 231 in³; 1 lb = 0.45359237 kg).
 */
import { describe, expect, it } from "vitest";
import { unit as mjUnit, createUnit } from "mathjs";
import {
  UNITS,
  INTERNAL_UNIT,
  PSI_PER_FT_PER_PPG,
  PSI_PER_FT_PER_GCC,
  PPG_PER_GCC,
  KPA_PER_M_PER_PSI_PER_FT,
  PASCALS_PER_PSI,
  convert,
  convertArray,
  conversionFactor,
  parseLasUnit,
  LAS_UNIT_OUT,
  feetToMetres,
  metresToFeet,
  psiToMpa,
  mpaToPsi,
  psiPerFtToPpg,
  ppgToPsiPerFt,
  gccToPpg,
  slownessToVelocity,
  pressureToEmwPpg,
  emwPpgToPressure,
  type UnitId,
} from "../../src/units/index.js";

// mathjs has no "ppg" as a pressure gradient; define the pieces we need once.
createUnit("usft", { definition: "1e-6 s/ft" }, { override: true });

/** mathjs expression for each of our unit ids (gradient units as pressure per length). */
const MATHJS: Partial<Record<UnitId, string>> = {
  ft: "ft", m: "m",
  psi: "psi", kPa: "kPa", MPa: "MPa", bar: "bar",
  "psi/ft": "psi/ft", "kPa/m": "kPa/m", "MPa/km": "MPa/km",
  "g/cc": "g/cm^3", "kg/m3": "kg/m^3", "lbm/gal": "lbm/gal",
  "us/ft": "us/ft", "us/m": "us/m",
  "ft/s": "ft/s", "m/s": "m/s",
  in: "inch", mm: "mm", deg: "deg",
  "ft/h": "ft/hour", "m/h": "m/hour",
  lbf: "lbf", kN: "kN",
};

describe("UNITS factors agree with mathjs", () => {
  for (const [id, expr] of Object.entries(MATHJS) as [UnitId, string][]) {
    it(`${id} → ${INTERNAL_UNIT[UNITS[id].quantity]}`, () => {
      const internal = INTERNAL_UNIT[UNITS[id].quantity];
      const expected = mjUnit(1, expr).toNumber(MATHJS[internal]!);
      // mathjs defines psi as 6894.75729 Pa (9 significant digits); all else is exact,
      // so the two agree to 1e-9 relative.
      expect(Math.abs(UNITS[id].factor / expected - 1)).toBeLessThan(1e-9);
    });
  }
});

describe("constants", () => {
  it("PASCALS_PER_PSI matches NIST SP 811 App. B 6.894757 kPa (from memory) to 7 digits", () => {
    expect(PASCALS_PER_PSI).toBeCloseTo(6894.757, 3);
  });
  it("PSI_PER_FT_PER_PPG = 12/231 (1 US gal = 231 in³, legal definition)", () => {
    expect(PSI_PER_FT_PER_PPG).toBeCloseTo(0.051948, 6);
    // mathjs: 1 lbm/gal × g over 1 ft, in psi
    const mj = mjUnit(1, "lbm/gal").multiply(mjUnit(9.80665, "m/s^2")).multiply(mjUnit(1, "ft")).toNumber("psi");
    expect(Math.abs(PSI_PER_FT_PER_PPG / mj - 1)).toBeLessThan(1e-9); // mathjs psi to 9 digits
  });
  it("PSI_PER_FT_PER_GCC = ρ g = 0.43353 (CHECK-VALUES §0, g = 9.80665)", () => {
    expect(PSI_PER_FT_PER_GCC).toBeCloseTo(0.43353, 5);
  });
  it("PPG_PER_GCC = 8.345404 (CHECK-VALUES §0)", () => {
    expect(PPG_PER_GCC).toBeCloseTo(8.345404, 6);
    expect(mjUnit(1, "g/cm^3").toNumber("lbm/gal")).toBeCloseTo(PPG_PER_GCC, 9);
  });
  it("KPA_PER_M_PER_PSI_PER_FT = 22.6206 (CHECK-VALUES §0)", () => {
    expect(KPA_PER_M_PER_PSI_PER_FT).toBeCloseTo(22.6206, 4);
  });
});

describe("gradient and EMW units (CHECK-VALUES §0, own cases)", () => {
  it("ppg and sg as gradients", () => {
    expect(convert(1, "ppg", "psi/ft")).toBeCloseTo(12 / 231, 12);
    expect(convert(1, "sg", "psi/ft")).toBeCloseTo(PSI_PER_FT_PER_GCC, 12);
  });
  it("12.0 ppg at 10,000 ft → 6234 psi (exact factor)", () => {
    expect(emwPpgToPressure(12, 10000)).toBeCloseTo(6233.77, 1);
    expect(pressureToEmwPpg(6233.766, 10000)).toBeCloseTo(12, 4);
  });
  it("1.20 sg over 3000 m → 35.30 MPa", () => {
    const psi = 1.2 * PSI_PER_FT_PER_GCC * metresToFeet(3000);
    expect(psiToMpa(psi)).toBeCloseTo(35.30, 2);
  });
  it("23 MPa/km = 1.017 psi/ft", () => {
    expect(convert(23, "MPa/km", "psi/ft")).toBeCloseTo(1.0168, 4);
  });
  it("0.465 psi/ft = 10.52 kPa/m = 8.951 ppg", () => {
    expect(convert(0.465, "psi/ft", "kPa/m")).toBeCloseTo(10.5186, 4);
    expect(psiPerFtToPpg(0.465)).toBeCloseTo(8.951, 3);
    expect(ppgToPsiPerFt(8.951)).toBeCloseTo(0.465, 4);
  });
});

describe("named conversions", () => {
  it("feet ↔ metres exact", () => {
    expect(feetToMetres(10000)).toBe(3048);
    expect(metresToFeet(3048)).toBeCloseTo(10000, 10);
  });
  it("psi ↔ MPa round trip", () => {
    expect(mpaToPsi(psiToMpa(1234.5))).toBeCloseTo(1234.5, 10);
    expect(mpaToPsi(1)).toBeCloseTo(145.0377, 4);
  });
  it("g/cc → ppg", () => {
    expect(gccToPpg(1.03)).toBeCloseTo(8.596, 3);
  });
  it("slowness ↔ velocity", () => {
    expect(slownessToVelocity(100)).toBe(10000);
    expect(slownessToVelocity(0)).toBeNaN();
    expect(slownessToVelocity(NaN)).toBeNaN();
  });
  it("us/m → us/ft: 328.084 us/m = 100 us/ft", () => {
    expect(convert(328.084, "us/m", "us/ft")).toBeCloseTo(100, 3);
  });
});

describe("convertArray", () => {
  it("returns a new array, carries NaN, does not mutate", () => {
    const input = Object.freeze([1000, NaN, 2000]) as unknown as number[];
    const out = convertArray(input, "m", "ft");
    expect(out[0]).toBeCloseTo(3280.84, 2);
    expect(out[1]).toBeNaN();
    expect(input[0]).toBe(1000);
  });
  it("refuses to convert across quantities", () => {
    expect(() => conversionFactor("ft", "psi")).toThrow(/cannot convert/);
  });
});

describe("LAS unit strings", () => {
  const cases: [string, UnitId][] = [
    ["F", "ft"], ["FT", "ft"], ["M", "m"], ["US/F", "us/ft"], ["us/ft", "us/ft"], ["US/M", "us/m"],
    ["G/C3", "g/cc"], ["g/cm3", "g/cc"], ["K/M3", "kg/m3"], ["kg/m3", "kg/m3"], ["OHMM", "ohm.m"],
    ["ohm.m", "ohm.m"], ["GAPI", "API"], ["API", "API"], ["IN", "in"],
  ];
  for (const [raw, id] of cases) {
    it(`${JSON.stringify(raw)} → ${id}`, () => expect(parseLasUnit(raw)).toBe(id));
  }
  it("unknown unit is not guessed", () => {
    expect(parseLasUnit("FURLONG")).toBeUndefined();
    expect(parseLasUnit("G/C4")).toBeUndefined();
  });
  it("every unit written reads back as itself or an equal unit", () => {
    for (const id of Object.keys(LAS_UNIT_OUT) as UnitId[]) {
      const back = parseLasUnit(LAS_UNIT_OUT[id]);
      expect(back, id).toBeDefined();
      expect(UNITS[back!].factor).toBeCloseTo(UNITS[id].factor, 12);
    }
  });
});
