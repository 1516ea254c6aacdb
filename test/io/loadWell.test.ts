/**
 * lasToWell / readWellFromLas: unit conversion checked against mathjs units (independent
 * library), roles, datums from header items or options, MD → TVD sources. Fixtures are
 * invented (fictional Quillon Basin / Marten B-1).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { unit as mj } from "mathjs";
import { readLas } from "../../src/io/readLas.js";
import { lasToWell, readWellFromLas, CURVE_ROLE_MNEMONICS } from "../../src/io/loadWell.js";
import { ShalepointError } from "../../src/errors.js";
import type { LasFile } from "../../src/io/lasTypes.js";

const dir = new URL("../fixtures/las/", import.meta.url);
const fixture = (name: string): string => readFileSync(new URL(name, dir), "latin1");
const DATUMS = { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 };

/** Freeze the file and its header items (typed arrays cannot be frozen: the test compares a copy). */
function frozen(las: LasFile): LasFile {
  for (const part of [las.version, las.well, las.curves, las.parameters, las.data]) Object.freeze(part);
  las.curves.forEach((c) => Object.freeze(c));
  return Object.freeze(las);
}

function codeOf(f: () => unknown): { code: string; line?: number; message: string } {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(ShalepointError);
    const s = e as ShalepointError;
    return { code: s.code, line: s.details.line, message: s.message };
  }
  throw new Error("no error thrown");
}

describe("lasToWell", () => {
  it("lasToWell(metric.las): m, us/m, kg/m3 converted to ft, us/ft, g/cc as mathjs converts them", () => {
    const las = frozen(readLas(fixture("metric.las")).las);
    const before = las.data.map((a) => Float64Array.from(a));
    const { well, roles, warnings } = lasToWell(las);
    expect(warnings).toEqual([]);
    expect(roles).toEqual({ gammaRay: "GR", slowness: "DT", density: "RHOB", resistivity: "RDEP" });
    // mathjs units (independent library); relative 1e-12 = double rounding of one multiply
    const rel = (a: number, b: number) => Math.abs(a / b - 1);
    expect(rel(well.mdFt[0], mj(2000, "m").toNumber("ft"))).toBeLessThan(1e-12);
    expect(rel(well.curves.slowness.values[1], mj(400, "us/m").toNumber("us/ft"))).toBeLessThan(1e-12);
    expect(rel(well.curves.density.values[3], mj(2330, "kg/m^3").toNumber("g/cm^3"))).toBeLessThan(1e-12);
    expect(well.curves.slowness.values[2]).toBeNaN(); // NULL carried through as NaN
    expect(well.curves.slowness.unit).toBe("us/ft");
    expect(well.curves.density.unit).toBe("g/cc");
    expect(well.curves.gammaRay.values[0]).toBe(80.5);
    // datums from EKB.M 25, WDEP.M 700, SWDEN.K/M3 1030
    expect(rel(well.datums.rtElevationFt, mj(25, "m").toNumber("ft"))).toBeLessThan(1e-12);
    expect(rel(well.datums.waterDepthFt, mj(700, "m").toNumber("ft"))).toBeLessThan(1e-12);
    expect(well.datums.seawaterDensityGcc).toBeCloseTo(1.03, 12);
    expect(well.name).toBe("MARTEN B-1");
    expect(Array.from(well.tvdFt)).toEqual(Array.from(well.mdFt)); // vertical default
    las.data.forEach((a, j) => expect(a).toEqual(before[j])); // input untouched
  });

  it("lasToWell(basic.las): roles, SWDEN from ~P, header facts", () => {
    const { well, roles } = lasToWell(readLas(fixture("basic.las")).las);
    expect(roles).toEqual({ gammaRay: "GR", slowness: "DT", density: "RHOB", resistivity: "RDEP", caliper: "CALI" });
    expect(well.datums).toEqual({ rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 });
    expect(well.header.COMP).toBe("QUILLON EXPLORATION (FICTIONAL)");
    expect(well.header.BHT).toBe("180.0");
    expect(well.curves.caliper.values[3]).toBe(10.5);
  });

  it("lasToWell: options.datums win over header items", () => {
    const { well } = lasToWell(readLas(fixture("basic.las")).las, { datums: { waterDepthFt: 4500 } });
    expect(well.datums.waterDepthFt).toBe(4500);
    expect(well.datums.rtElevationFt).toBe(82);
  });

  it("lasToWell(negative-step.las) reverses to increasing MD with a warning", () => {
    const { well, warnings } = lasToWell(readLas(fixture("negative-step.las")).las, { datums: DATUMS });
    expect(well.mdFt[0]).toBe(1660);
    expect(well.mdFt[80]).toBe(1670);
    expect(warnings.map((w) => w.code)).toEqual(["W_WELL_INDEX_REVERSED"]);
    // GR in the file at 1670 (first row) is 60.0, at 1660 (row 81, i = 80, 80 % 7 = 3) is 63.0
    expect(well.curves.gammaRay.values[80]).toBe(60);
    expect(well.curves.gammaRay.values[0]).toBe(63);
  });

  it("lasToWell(unknown-unit.las) names the curve and its line; dropMnemonics leaves it out", () => {
    const las = readLas(fixture("unknown-unit.las")).las;
    const e = codeOf(() => lasToWell(las, { datums: DATUMS }));
    expect(e.code).toBe("E_LAS_UNKNOWN_UNIT");
    expect(e.line).toBe(16);
    expect(e.message).toContain("curve DT");
    expect(e.message).toContain("FURLONG/FORTNIGHT");
    const { well } = lasToWell(las, { datums: DATUMS, dropMnemonics: ["dt"] });
    expect(Object.keys(well.curves)).toEqual(["gammaRay"]);
  });

  it("lasToWell(duplicate-mnemonic.las): DT takes the slowness role, DT:2 kept by mnemonic, ambiguity warned", () => {
    const { well, warnings } = lasToWell(readLas(fixture("duplicate-mnemonic.las")).las, { datums: DATUMS });
    expect(Object.keys(well.curves).sort()).toEqual(["DT:2", "slowness"]);
    expect(well.curves.slowness.values[0]).toBe(120.5);
    expect(warnings.map((w) => w.code)).toEqual(["W_WELL_ROLE_AMBIGUOUS"]);
  });

  it("lasToWell: role overrides (null = none; wrong quantity is an error naming the curve)", () => {
    const las = readLas(fixture("basic.las")).las;
    const { well } = lasToWell(las, { roles: { resistivity: null } });
    expect(well.curves.resistivity).toBeUndefined();
    expect(well.curves.RDEP.values[0]).toBe(1.5);
    const e = codeOf(() => lasToWell(las, { roles: { density: "GR" } }));
    expect(e.code).toBe("E_WELL_ROLE_UNIT");
    expect(e.message).toContain("curve GR");
    expect(codeOf(() => lasToWell(las, { roles: { density: "ZZZ" } })).code).toBe("E_WELL_ROLE_MNEMONIC");
  });

  it("lasToWell: missing datums is an error that names the header mnemonics accepted", () => {
    const e = codeOf(() => lasToWell(readLas(fixture("null-9999.las")).las));
    expect(e.code).toBe("E_WELL_DATUM_MISSING");
    expect(e.message).toContain("EKB, EDF, ERT");
  });

  it("lasToWell: TVD from a callback — a 30° hold gives 86.60 ft TVD per 100 ft MD (CHECK-VALUES §10, own case)", () => {
    const las = readLas(fixture("irregular-step.las")).las; // MD 5000, 5001, 5004.5, 5007.5
    const kop = 4000;
    const { well } = lasToWell(las, {
      datums: DATUMS,
      tvd: { kind: "callback", tvdFromMd: (md) => md.map((d) => kop + (d - kop) * Math.cos(Math.PI / 6)) },
    });
    // 100 ft at 30° → ΔTVD 86.60 ft (CHECK-VALUES §10 own case, 4 significant figures)
    expect(((well.tvdFt[0] - kop) / (well.mdFt[0] - kop)) * 100).toBeCloseTo(86.60, 2);
    expect(well.tvdFt[3] - well.tvdFt[0]).toBeCloseTo(7.5 * 0.8660254, 6);
  });

  it("lasToWell: a TVD array is checked for length, order and TVD ≤ MD", () => {
    const las = readLas(fixture("irregular-step.las")).las;
    expect(codeOf(() => lasToWell(las, { datums: DATUMS, tvd: { kind: "array", tvdFt: [1, 2, 3] } })).code).toBe("E_WELL_TVD");
    expect(codeOf(() => lasToWell(las, { datums: DATUMS, tvd: { kind: "array", tvdFt: [5000, 5002, 5004, 5006] } })).code).toBe("E_WELL_TVD");
    const { well } = lasToWell(las, { datums: DATUMS, tvd: { kind: "array", tvdFt: [4990, 4991, 4994, 4996] } });
    expect(Array.from(well.tvdFt)).toEqual([4990, 4991, 4994, 4996]);
  });

  it("readWellFromLas reads and builds in one call", () => {
    const r = readWellFromLas(fixture("basic.las"), { file: "basic.las" });
    expect(r.well.name).toBe("QUILLON A-1");
    expect(r.las.curves.length).toBe(6);
  });

  it("CURVE_ROLE_MNEMONICS lists the mnemonics of the brief for each role", () => {
    expect(CURVE_ROLE_MNEMONICS.gammaRay).toEqual(expect.arrayContaining(["GR", "GRC", "SGR"]));
    expect(CURVE_ROLE_MNEMONICS.slowness).toEqual(expect.arrayContaining(["DT", "DTC", "DTCO", "AC"]));
    expect(CURVE_ROLE_MNEMONICS.density).toEqual(expect.arrayContaining(["RHOB", "RHOZ", "DEN"]));
    expect(CURVE_ROLE_MNEMONICS.resistivity).toEqual(expect.arrayContaining(["ILD", "RDEP", "RT", "RD", "LLD", "AT90", "RES_DEEP"]));
    expect(CURVE_ROLE_MNEMONICS.caliper).toEqual(expect.arrayContaining(["CALI", "CAL", "HCAL"]));
    expect(CURVE_ROLE_MNEMONICS.bitSize).toEqual(["BS", "BIT", "BITSIZE"]);
  });
});
