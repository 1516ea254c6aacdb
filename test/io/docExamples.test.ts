/**
 * The @example lines of the io doc comments, run as written. Expected values come from the
 * inputs themselves or from CHECK-VALUES §0 factors (12/231 psi/ft per ppg; 6.894757 kPa/psi,
 * NIST SP 811 App. B, from memory; 1 ft = 0.3048 m exactly).
 */
import { describe, expect, it } from "vitest";
import { readLas, safeReadLas } from "../../src/io/readLas.js";
import { lasToWell } from "../../src/io/loadWell.js";
import { parseCsv } from "../../src/io/csv.js";
import {
  readFormationPressureTests,
  readMudWeights,
  readDrillingEvents,
  readFormationTops,
  readDirectionalSurvey,
} from "../../src/io/tables.js";

describe("io doc examples", () => {
  it("readLas example: NULL becomes NaN", () => {
    const { las } = readLas("~V\nVERS. 2.0 :\nWRAP. NO :\n~W\nSTRT.F 100 :\nSTOP.F 101 :\nSTEP.F 1 :\nNULL. -999.25 :\n~C\nDEPT.F :\nGR.GAPI :\n~A\n100 50\n101 -999.25\n");
    expect(Array.from(las.data[1])).toEqual([50, NaN]);
  });
  it("safeReadLas example: empty text is E_LAS_EMPTY", () => {
    const r = safeReadLas("");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.code).toBe("E_LAS_EMPTY");
  });
  it("lasToWell example: 328.084 us/m at 1000 m → 100.0000 us/ft at 3280.84 ft (exact foot)", () => {
    const text =
      "~V\nVERS. 2.0 :\nWRAP. NO :\n~W\nSTRT.M 1000 :\nSTOP.M 1000 :\nSTEP.M 0 :\nNULL. -999.25 :\nEKB.M 25 :\nWDEP.M 1000 :\nSWDEN.G/CC 1.03 :\n~C\nDEPT.M :\nDT.US/M :\n~A\n1000 328.084\n";
    const { well } = lasToWell(readLas(text).las);
    expect(well.curves.slowness.values[0]).toBeCloseTo(100.0, 4); // 328.084 × 0.3048 = 99.9999999
    expect(well.mdFt[0]).toBeCloseTo(3280.84, 2); // 1000 / 0.3048
  });
  it("parseCsv example", () => {
    expect(parseCsv('a,b\n1,"x, y"\n').rows[0].fields).toEqual(["1", "x, y"]);
  });
  it("readFormationPressureTests example: 35.30 MPa ≈ 5119.8 psi", () => {
    expect(readFormationPressureTests("tvd_m,pressure_MPa,quality\n3000,35.30,good\n").records[0].pressurePsi).toBeCloseTo(35.3e3 / 6.894757, 1);
  });
  it("readMudWeights example: 10 ppg → 0.5195 psi/ft", () => {
    expect(readMudWeights("tvd_ft,mud_weight_ppg\n5000,10\n").records[0].mudWeightPsiPerFt).toBeCloseTo(120 / 231, 12);
  });
  it("readDrillingEvents example: 12.5 ppg → 0.6494 psi/ft", () => {
    expect(readDrillingEvents("tvd_ft,event,emw_ppg\n9000,kick,12.5\n").records[0].emwPsiPerFt).toBeCloseTo(150 / 231, 12);
  });
  it("readFormationTops example: 2500 m → 8202.1 ft", () => {
    expect(readFormationTops("name,tvd_m\nVeyra Shale,2500\n").records[0].tvdFt).toBeCloseTo(2500 / 0.3048, 9);
  });
  it("readDirectionalSurvey example", () => {
    expect(readDirectionalSurvey("md_ft,inc_deg,azi_deg\n0,0,0\n1000,5,45\n").records.length).toBe(2);
  });
});
