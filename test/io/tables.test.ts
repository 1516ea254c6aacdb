/**
 * parseCsv (IETF RFC 4180, 2005 — published: quoting, doubled quotes, CRLF) and the typed
 * table readers: unit conversion checked against mathjs units (independent library) and
 * CHECK-VALUES §0/§6; errors carry file, row, column and line. Fixtures are invented
 * (fictional Quillon Basin).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { unit as mj } from "mathjs";
import { parseCsv } from "../../src/io/csv.js";
import {
  readFormationPressureTests,
  readLeakOffTests,
  readMudWeights,
  readDrillingEvents,
  readFormationTops,
  readDirectionalSurvey,
} from "../../src/io/tables.js";
import { errorOf } from "../helpers/shalepointErrors.js";

const dir = new URL("../fixtures/csv/", import.meta.url);
const fixture = (name: string): string => readFileSync(new URL(name, dir), "utf8");
const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe("parseCsv (RFC 4180)", () => {
  it("parseCsv: quoted commas, doubled quotes, a line break inside quotes, CRLF, # comments", () => {
    const text = 'name,note\r\n# comment\r\n"Corvel Sand, upper","said ""tight"""\r\n\r\nA,"two\nlines"\r\nB, plain \r\n';
    const t = parseCsv(text);
    expect(t.header).toEqual(["name", "note"]);
    expect(t.rows.map((r) => r.fields)).toEqual([
      ["Corvel Sand, upper", 'said "tight"'],
      ["A", "two\nlines"],
      ["B", "plain"],
    ]);
    expect(t.rows.map((r) => [r.row, r.line])).toEqual([[1, 3], [2, 5], [3, 7]]);
  });
  it("parseCsv(unclosed-quote.csv) throws E_CSV_QUOTE at line 3", () => {
    const e = errorOf(() => parseCsv(fixture("unclosed-quote.csv"), { file: "unclosed-quote.csv" }));
    expect(e.code).toBe("E_CSV_QUOTE");
    expect(e.details.line).toBe(3);
    expect(e.details.rawLine).toBe('"Veyra Shale,8900');
  });
  it("parseCsv(field-count-mismatch.csv) throws E_CSV_FIELD_COUNT at row 2, line 3", () => {
    const e = errorOf(() => parseCsv(fixture("field-count-mismatch.csv")));
    expect(e.code).toBe("E_CSV_FIELD_COUNT");
    expect([e.details.row, e.details.line]).toEqual([2, 3]);
  });
  it("parseCsv of blank text throws E_CSV_EMPTY", () => {
    expect(errorOf(() => parseCsv("# only a comment\n\n")).code).toBe("E_CSV_EMPTY");
  });
});

describe("readFormationPressureTests", () => {
  it("readFormationPressureTests(formation-pressure-tests.csv): ft and psi kept, quoted sand names, optional fluid", () => {
    const { records, columns } = readFormationPressureTests(fixture("formation-pressure-tests.csv"));
    expect(columns).toMatchObject({ tvdFt: "tvd_ft", pressurePsi: "pressure_psi" });
    expect(records.map((r) => [r.tvdFt, r.pressurePsi, r.quality])).toEqual([
      [8200, 3812.5, "good"],
      [9000, 5000, "good"],
      [9200, 5093, "fair"],
      [9500, 6000, "poor"],
    ]);
    expect(records[1].sand).toBe("Corvel Sand, upper");
    expect(records[3].fluid).toBeUndefined();
    expect([records[0].row, records[0].line]).toEqual([1, 4]);
    // CHECK-VALUES §11 own case: 5000 psi at 9000 ft and 5093 psi at 9200 ft → 0.4650 psi/ft
    expect((records[2].pressurePsi - records[1].pressurePsi) / (records[2].tvdFt - records[1].tvdFt)).toBeCloseTo(0.465, 4);
  });
  it("readFormationPressureTests(…metric.csv): m and MPa converted as mathjs does; 1.20 sg over 3000 m → 35.30 MPa (CHECK-VALUES §0, own case)", () => {
    const { records } = readFormationPressureTests(fixture("formation-pressure-tests-metric.csv"));
    expect(rel(records[0].tvdFt, mj(3000, "m").toNumber("ft"))).toBeLessThan(1e-12);
    // mathjs psi is given to 9 significant digits, hence 1e-9
    expect(rel(records[0].pressurePsi, mj(35.3, "MPa").toNumber("psi"))).toBeLessThan(1e-9);
    // 3048 m = 10,000 ft exactly; 20.684 MPa ≈ 3000 psi (6.894757 kPa/psi, CHECK-VALUES §0, from memory)
    expect(records[1].tvdFt).toBeCloseTo(10000, 9);
    expect(records[1].pressurePsi).toBeCloseTo(3000, 0);
    // gradient 1.20 sg → 35.30 MPa at 3000 m: pressure/depth in sg units
    expect(records[0].pressurePsi / records[0].tvdFt / 0.43353).toBeCloseTo(1.2, 3);
  });
  it("readFormationPressureTests(bad-unit.csv): E_CSV_UNKNOWN_COLUMN names the column and the accepted units", () => {
    const e = errorOf(() => readFormationPressureTests(fixture("bad-unit.csv"), { file: "bad-unit.csv" }));
    expect(e.code).toBe("E_CSV_UNKNOWN_COLUMN");
    expect(e.details.column).toBe("pressure_atm");
    expect(e.details.allowed).toBe("pressure_psi, pressure_kpa, pressure_mpa, pressure_bar");
    expect(e.details.line).toBe(1);
  });
  it("readFormationPressureTests(non-numeric-cell.csv): E_CSV_VALUE at row 2, column pressure_psi, line 4", () => {
    const e = errorOf(() => readFormationPressureTests(fixture("non-numeric-cell.csv"), { file: "non-numeric-cell.csv" }));
    expect(e.code).toBe("E_CSV_VALUE");
    expect([e.details.row, e.details.column, e.details.line, e.details.value]).toEqual([2, "pressure_psi", 4, "5O93"]);
    expect(e.message).toContain("non-numeric-cell.csv, line 4, row 2, column pressure_psi");
  });
  it("readFormationPressureTests(bad-quality.csv): zod enum error mapped to row 2, column quality", () => {
    const e = errorOf(() => readFormationPressureTests(fixture("bad-quality.csv")));
    expect(e.code).toBe("E_CSV_VALUE");
    expect([e.details.row, e.details.column, e.details.line, e.details.value]).toEqual([2, "quality", 3, "excellent"]);
  });
  it("readFormationPressureTests: a missing required column lists the accepted spellings", () => {
    const e = errorOf(() => readFormationPressureTests("tvd_ft,quality\n9000,good\n"));
    expect(e.code).toBe("E_CSV_MISSING_COLUMN");
    expect(e.details.allowed).toBe("pressure_psi, pressure_kpa, pressure_mpa, pressure_bar");
  });
  it("readFormationPressureTests: the same quantity in two units is refused", () => {
    expect(errorOf(() => readFormationPressureTests("tvd_ft,tvd_m,pressure_psi,quality\n1,1,1,good\n")).code).toBe("E_CSV_DUPLICATE_COLUMN");
  });
});

describe("readLeakOffTests", () => {
  it("readLeakOffTests: shoe 4000 ft, 10.0 ppg, 1040 psi → EMW 15.00 ppg (CHECK-VALUES §6, common practice, no source; 0.052 factor there, 12/231 here: allow 0.2 %)", () => {
    const { records } = readLeakOffTests(fixture("leak-off-tests.csv"));
    const r = records[0];
    expect(r.testType).toBe("LOT");
    const emwPpg = r.emwPsiPerFt / (12 / 231);
    expect(Math.abs(emwPpg / 15.0 - 1)).toBeLessThan(0.002);
    expect(records[2].closurePressurePsi).toBe(760);
    expect(records[1].closurePressurePsi).toBeUndefined();
  });
  it("readLeakOffTests(…metric.csv): m, sg, kPa give the same test as the oilfield row (mathjs factors)", () => {
    const { records } = readLeakOffTests(fixture("leak-off-tests-metric.csv"));
    const r = records[0];
    expect(rel(r.shoeTvdFt, 4000)).toBeLessThan(1e-12); // 1219.2 m = 4000 ft exactly
    expect(rel(r.surfacePressurePsi, mj(7170.5, "kPa").toNumber("psi"))).toBeLessThan(1e-9);
    // 1.20 sg as a gradient: 1.2 × ρw g = 1.2 × 0.43353 psi/ft (CHECK-VALUES §0)
    expect(r.mudWeightPsiPerFt).toBeCloseTo(1.2 * 0.43353, 5);
  });
  it("readLeakOffTests(field-count-mismatch.csv) reports row 2, line 3", () => {
    const e = errorOf(() => readLeakOffTests(fixture("field-count-mismatch.csv")));
    expect([e.code, e.details.row, e.details.line]).toEqual(["E_CSV_FIELD_COUNT", 2, 3]);
  });
});

describe("readMudWeights", () => {
  it("readMudWeights(mud-weights-intervals.csv): ppg → psi/ft with 12/231 (CHECK-VALUES §0, 1 US gal = 231 in³)", () => {
    const { records } = readMudWeights(fixture("mud-weights-intervals.csv"));
    expect(records.map((r) => [r.tvdFromFt, r.tvdToFt])).toEqual([[3082, 6000], [6000, 9500], [9500, 11800]]);
    // CHECK-VALUES §0: 0.051948 quoted to 5 significant figures → 1e-5 relative
    expect(rel(records[0].mudWeightPsiPerFt, 9.2 * 0.051948)).toBeLessThan(1e-5);
    // 12.0 ppg at 10,000 ft → 6234 psi (CHECK-VALUES §0 own case, exact factor)
    expect((12 / 10.5) * records[1].mudWeightPsiPerFt * 10000).toBeCloseTo(6234, 0);
    expect(records[2].ecdPsiPerFt).toBeUndefined();
  });
  it("readMudWeights(mud-weights-points.csv): one depth gives from = to; sg converted", () => {
    const { records } = readMudWeights(fixture("mud-weights-points.csv"));
    expect(records[0].tvdFromFt).toBe(records[0].tvdToFt);
    expect(rel(records[1].tvdFromFt, mj(3000, "m").toNumber("ft"))).toBeLessThan(1e-12);
    // 1.45 sg in ppg = 1.45 × 8.345404 (CHECK-VALUES §0)
    expect(records[1].mudWeightPsiPerFt / (12 / 231)).toBeCloseTo(1.45 * 8.345404, 5);
  });
  it("readMudWeights: tvd_to shallower than tvd_from is an error at its row and column", () => {
    const e = errorOf(() => readMudWeights("tvd_from_ft,tvd_to_ft,mud_weight_ppg\n5000,4000,10\n"));
    expect([e.code, e.details.row, e.details.column, e.details.line]).toEqual(["E_CSV_VALUE", 1, "tvd_to_ft", 2]);
  });
});

describe("readDrillingEvents, readFormationTops, readDirectionalSurvey", () => {
  it("readDrillingEvents(drilling-events.csv): kick with EMW, gas shows with units", () => {
    const { records } = readDrillingEvents(fixture("drilling-events.csv"));
    expect(records.map((r) => r.event)).toEqual(["connection_gas", "kick", "trip_gas"]);
    expect(records[0].gasUnits).toBe(120);
    // CHECK-VALUES §0: 0.051948 psi/ft per ppg is quoted to 5 significant figures → 1e-5 relative
    expect(rel(records[1].emwPsiPerFt!, 13.9 * 0.051948)).toBeLessThan(1e-5);
  });
  it("readDrillingEvents(event-without-reading.csv): row 2 needs EMW or gas units", () => {
    const e = errorOf(() => readDrillingEvents(fixture("event-without-reading.csv")));
    expect([e.code, e.details.row, e.details.column, e.details.line]).toEqual(["E_CSV_VALUE", 2, "emw_ppg", 3]);
  });
  it("readFormationTops(formation-tops.csv)", () => {
    const { records } = readFormationTops(fixture("formation-tops.csv"));
    expect(records.map((r) => [r.name, r.tvdFt])).toEqual([
      ["Ashmere Sand", 8150],
      ["Veyra Shale", 8900],
      ["Corvel Sand", 8990],
      ["Dunlin Sand", 9480],
    ]);
  });
  it("readDirectionalSurvey(directional-survey.csv): MD, inclination, azimuth", () => {
    const { records } = readDirectionalSurvey(fixture("directional-survey.csv"));
    expect(records.map((r) => [r.mdFt, r.incDeg, r.aziDeg])).toEqual([
      [0, 0, 0],
      [1000, 0, 0],
      [1500, 15, 45],
      [2000, 30, 45],
      [3000, 30, 45],
    ]);
    expect(records[0].line).toBe(3);
  });
  it("readDirectionalSurvey(survey-md-not-increasing.csv): E_CSV_ORDER at row 3, line 4", () => {
    const e = errorOf(() => readDirectionalSurvey(fixture("survey-md-not-increasing.csv")));
    expect([e.code, e.details.row, e.details.column, e.details.line]).toEqual(["E_CSV_ORDER", 3, "md_ft", 4]);
  });
  it("readDirectionalSurvey: inclination above 180° is refused at its cell", () => {
    const e = errorOf(() => readDirectionalSurvey("md_ft,inc_deg,azi_deg\n0,0,0\n100,181,0\n"));
    expect([e.code, e.details.row, e.details.column]).toEqual(["E_CSV_VALUE", 2, "inc_deg"]);
  });
});
