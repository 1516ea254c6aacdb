import { describe, it, expect } from "vitest";
import { compareMudWeightToPorePressure, type DrillingShow } from "../../src/drilling/mudWeightMargin.js";

const PPG = 12 / 231; // psi/ft per ppg, exact (CHECK-VALUES §0: 1 US gal = 231 in³)

describe("compareMudWeightToPorePressure", () => {
  it("12.0 ppg pore pressure at 10,000 ft = 6234 psi (CHECK-VALUES §0 own case, exact factor) under 12.2 ppg mud → margin 0.2 ppg, flagged at 0.3", () => {
    const r = compareMudWeightToPorePressure({ tvdFt: [10000], ppPsi: [6234], mudWeightPsiPerFt: [12.2 * PPG], minMarginPpg: 0.3, shows: [] });
    // 6234 psi is 12.0 ppg to 4 significant figures: margin 0.2 ± 0.0005 ppg
    expect(r.ppEmwPpg[0]).toBeCloseTo(12.0, 3);
    expect(r.marginPpg[0]).toBeCloseTo(0.2, 3);
    expect(r.lowMargin[0]).toBe(1);
  });

  it("finds low-margin runs and sets kicks and gas shows against them (own case)", () => {
    const tvdFt = Object.freeze([9000, 9100, 9200, 9300, 9400, 9500]);
    const ppPpg = [10.0, 11.5, 11.9, 11.0, 10.5, 12.6];
    const ppPsi = Object.freeze(ppPpg.map((p, i) => p * PPG * tvdFt[i]));
    const mudWeightPsiPerFt = Object.freeze(tvdFt.map(() => 12.2 * PPG));
    const shows: DrillingShow[] = [
      { tvdFt: 9210, event: "connection_gas", gasUnits: 80 },
      { tvdFt: 9400, event: "kick", emwPsiPerFt: 12.4 * PPG }, // the prediction (10.5 ppg) missed this kick
      { tvdFt: 9500, event: "background_gas", gasUnits: 20 },
    ];
    const r = compareMudWeightToPorePressure({ tvdFt, ppPsi, mudWeightPsiPerFt, minMarginPpg: 0.5, shows, toleranceFt: 20 });
    expect(Array.from(r.lowMargin)).toEqual([0, 0, 1, 0, 0, 1]); // margins below 0.5 ppg only (next line)
    expect(Array.from(r.marginPpg).map((m) => Number(m.toFixed(6)))).toEqual([2.2, 0.7, 0.3, 1.2, 1.7, -0.4]);
    expect(r.runs.map((x) => [x.topTvdFt, x.baseTvdFt, Number(x.minMarginPpg.toFixed(6)), x.minMarginTvdFt])).toEqual([
      [9200, 9200, 0.3, 9200],
      [9500, 9500, -0.4, 9500],
    ]);
    expect(r.shows[0].nearLowMargin).toBe(true);
    expect(r.shows[1].nearLowMargin).toBe(false);
    expect(r.shows[1].kickMinusPredictedPpg).toBeCloseTo(1.9, 9); // 12.4 − 10.5
    expect(r.missedShowCount).toBe(1); // background gas is never counted as missed
  });
});
