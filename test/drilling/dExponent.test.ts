import { describe, expect, it } from "vitest";
import { dExponent, correctedDExponent } from "../../src/drilling/dExponent.js";
import { ppgToPsiPerFt } from "../../src/units/index.js";

describe("dExponent", () => {
  it("published worked example: R 30 ft/h, N 120 rpm, W 35,000 lb, D 8.5 in → d 1.82 (Lapeyrouse, Formulas and Calculations for Drilling, Production and Workover; CHECK-VALUES §9)", () => {
    const { d, nInvalid } = dExponent({ ropFtPerH: [30], rotaryRpm: [120], wobLbf: [35000], bitIn: [8.5] });
    expect(d[0]).toBeCloseTo(1.82, 2); // book rounds to 2 decimals
    expect(d[0]).toBeCloseTo(1.8223, 4); // own case: unrounded, same formula (Jorden & Shirley 1966 eq. 2)
    expect(nInvalid).toBe(0);
  });

  it("own case: R 90, N 110, W 20,000 lb, D 8.5 in → d 1.204 (CHECK-VALUES §9)", () => {
    const { d } = dExponent({ ropFtPerH: [90], rotaryRpm: [110], wobLbf: [20000], bitIn: [8.5] });
    expect(d[0]).toBeCloseTo(1.204, 3);
  });

  it("moves when a coefficient moves by 1 % (60 → 60.6 in the denominator of R)", () => {
    const base = dExponent({ ropFtPerH: [30], rotaryRpm: [120], wobLbf: [35000], bitIn: [8.5] }).d[0];
    // 1 % more rotary speed is the same as 60 → 60.6: d changes by log10(1.01)/1.306 ≈ 0.0033
    const shifted = dExponent({ ropFtPerH: [30], rotaryRpm: [121.2], wobLbf: [35000], bitIn: [8.5] }).d[0];
    expect(shifted - base).toBeCloseTo(Math.log10(1.01) / -Math.log10((12 * 35000) / (1e6 * 8.5)), 10);
  });

  it("NaN, non-positive and out-of-range samples give NaN and are counted", () => {
    const input = {
      ropFtPerH: Object.freeze([30, NaN, 0, 30, 30]),
      rotaryRpm: Object.freeze([120, 120, 120, 120, 120]),
      wobLbf: Object.freeze([35000, 35000, 35000, 1e9, 35000]),
      bitIn: Object.freeze([8.5, 8.5, 8.5, 8.5, -1]),
    };
    const { d, nInvalid } = dExponent(input);
    expect(d[0]).toBeCloseTo(1.8223, 4);
    expect(Array.from(d.slice(1)).every(Number.isNaN)).toBe(true);
    expect(nInvalid).toBe(4);
  });

  it("refuses arrays of different lengths", () => {
    expect(() => dExponent({ ropFtPerH: [1, 2], rotaryRpm: [1], wobLbf: [1], bitIn: [1] })).toThrow(
      expect.objectContaining({ code: "E_LENGTH" }),
    );
  });
});

describe("correctedDExponent", () => {
  it("own case: d 1.204, ρn 9.0 ppg, ρm 12.0 ppg → dc 0.9030 (Rehm & McClendon 1971; CHECK-VALUES §9)", () => {
    const dc = correctedDExponent([1.204], ppgToPsiPerFt(9), [ppgToPsiPerFt(12)]);
    expect(dc[0]).toBeCloseTo(0.903, 4);
  });
  it("per-sample normal gradient, NaN carried, zero mud gives NaN", () => {
    const dc = correctedDExponent([1.5, NaN, 1.5], [0.465, 0.465, 0.465], [0.62, 0.62, 0]);
    expect(dc[0]).toBeCloseTo((1.5 * 0.465) / 0.62, 12);
    expect(dc[1]).toBeNaN();
    expect(dc[2]).toBeNaN();
  });
  it("rejects a non-positive normal gradient", () => {
    expect(() => correctedDExponent([1], 0, [0.6])).toThrow(expect.objectContaining({ code: "E_RANGE" }));
  });
});
