import { describe, it, expect } from "vitest";
import { readDrillingData } from "../../src/io/drillingData.js";
import { errorOf } from "../helpers/shalepointErrors.js";

const OILFIELD = Object.freeze(
  [
    "tvd_ft,md_ft,rop_ft_per_h,rotary_speed_rpm,wob_klbf,bit_size_in,mud_weight_ppg,ecd_ppg,background_gas_units,connection_gas_units,comment",
    "9000,9000,30,120,35,8.5,12.0,12.3,15,,published d-exponent row",
    "9010,9010,,120,35,8.5,12.0,,16,40,missing ROP",
  ].join("\n"),
);

describe("readDrillingData", () => {
  it("reads oilfield columns into internal units (ppg → psi/ft with 12/231, CHECK-VALUES §0)", () => {
    const { data, columns, lines } = readDrillingData(OILFIELD, { file: "drilling-data.csv" });
    expect(Array.from(data.tvdFt)).toEqual([9000, 9010]);
    expect(data.wobLbf[0]).toBe(35000); // klbf × 1000, definition
    expect(data.ropFtPerH[0]).toBe(30);
    expect(Number.isNaN(data.ropFtPerH[1])).toBe(true); // empty cell → NaN
    // CHECK-VALUES §0 (published unit definition): 12.0 ppg × 0.051948 = 0.62338 psi/ft; 5 significant figures → 1e-5 relative
    expect(data.mudWeightPsiPerFt[0]).toBeCloseTo(0.62338, 5);
    expect(data.ecdPsiPerFt[0]).toBeCloseTo(12.3 * 0.051948, 5);
    expect(Number.isNaN(data.ecdPsiPerFt[1])).toBe(true);
    expect(Number.isNaN(data.connectionGasUnits[0])).toBe(true);
    expect(data.connectionGasUnits[1]).toBe(40);
    expect(columns.wobLbf).toBe("wob_klbf");
    expect(Array.from(lines)).toEqual([2, 3]);
  });

  it("reads metric columns: m → ft (0.3048 exact), m/h → ft/h, kN → lbf (4.4482216152605 N), mm → in, sg → psi/ft", () => {
    const { data } = readDrillingData(
      "TVD_m,ROP_m_per_h,Rotary_Speed_rpm,WOB_kN,Bit_Size_mm,Mud_Weight_sg\n3000,9.144,120,155.6878,215.9,1.44\n",
    );
    // own case: 3000 m = 9842.52 ft; 9.144 m/h = 30 ft/h; 215.9 mm = 8.5 in (exact definitions)
    expect(data.tvdFt[0]).toBeCloseTo(9842.5197, 3);
    expect(data.ropFtPerH[0]).toBeCloseTo(30, 9);
    expect(data.bitIn[0]).toBeCloseTo(8.5, 9);
    // own case: 155.6878 kN / 4.4482216152605 N per lbf = 35,000.0 lbf (to 1e-4 relative from the rounded input)
    expect(data.wobLbf[0] / 35000).toBeCloseTo(1, 4);
    // CHECK-VALUES §0: 0.43353 psi/ft per g/cc (5 significant figures)
    expect(data.mudWeightPsiPerFt[0]).toBeCloseTo(1.44 * 0.43353, 4);
  });

  it("rejects a missing required column, naming the accepted headers", () => {
    const e = errorOf(() => readDrillingData("tvd_ft,rop_ft_per_h,rotary_speed_rpm,bit_size_in,mud_weight_ppg\n9000,30,120,8.5,10\n"));
    expect([e.code, e.details.column, e.details.allowed]).toEqual(["E_CSV_MISSING_COLUMN", "wob", "wob_lbf, wob_klbf, wob_kn, wob_tonne"]);
  });

  it("rejects an unknown unit suffix and a bit size given in mm under an in header", () => {
    const e = errorOf(() => readDrillingData("tvd_ft,rop_ft_per_min,rotary_speed_rpm,wob_lbf,bit_size_in,mud_weight_ppg\n9000,1,120,1,8.5,10\n"));
    expect([e.code, e.details.column]).toEqual(["E_CSV_UNKNOWN_COLUMN", "rop_ft_per_min"]);
    const f = errorOf(() => readDrillingData("tvd_ft,rop_ft_per_h,rotary_speed_rpm,wob_lbf,bit_size_in,mud_weight_ppg\n9000,30,120,35000,215.9,10\n", { file: "d.csv" }));
    expect([f.code, f.details.column, f.details.line, f.details.row, f.details.file]).toEqual(["E_CSV_VALUE", "bit_size_in", 2, 1, "d.csv"]);
  });

  it("rejects depths that do not increase, text in a number column and a negative ROP", () => {
    const head = "tvd_ft,rop_ft_per_h,rotary_speed_rpm,wob_lbf,bit_size_in,mud_weight_ppg\n";
    const e = errorOf(() => readDrillingData(head + "9000,30,120,35000,8.5,10\n9000,30,120,35000,8.5,10\n"));
    expect([e.code, e.details.line, e.details.column]).toEqual(["E_CSV_VALUE", 3, "tvd_ft"]);
    const f = errorOf(() => readDrillingData(head + "9000,fast,120,35000,8.5,10\n"));
    expect([f.code, f.details.value]).toEqual(["E_CSV_VALUE", "fast"]);
    const g = errorOf(() => readDrillingData(head + "9000,-3,120,35000,8.5,10\n"));
    expect([g.code, g.details.column]).toEqual(["E_CSV_VALUE", "rop_ft_per_h"]);
  });
});
