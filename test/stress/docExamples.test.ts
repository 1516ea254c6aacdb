/**
 * The @example values written in the doc comments of src/stress (overburden, hydrostatic,
 * Gardner, near-mudline power law), checked so the documentation cannot drift. Each value
 * was worked by hand from the published formula named in the doc comment.
 */
import { describe, expect, it } from "vitest";
import {
  gardnerDensityGcc,
  gardnerDensityFromSlowness,
  powerLawAverageDensityPpg,
  powerLawPointDensityPpg,
  powerLawOverburdenPsi,
  hydrostaticPressure,
  hydrostaticPressureFromBrineDensity,
  integrateOverburden,
} from "../../src/stress/index.js";

const DATUMS = Object.freeze({ rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 });

describe("doc examples in src/stress", () => {
  it("gardnerDensityGcc / gardnerDensityFromSlowness: 0.23·10,000^0.25 = 2.300 (Gardner et al. 1974)", () => {
    expect(gardnerDensityGcc({ velocityFtPerS: 10000 })).toBeCloseTo(2.3, 12);
    const a = gardnerDensityFromSlowness({ slownessUsPerFt: [100, NaN] });
    expect(a[0]).toBeCloseTo(2.3, 12);
    expect(a[1]).toBeNaN();
  });
  it("powerLaw*: ρa(3125) = 16.3 + 1 = 17.30, point density 16.3 + 1.6 = 17.90, Sv 7779 psi (Traugott 1997 from memory; Zhang 2019)", () => {
    expect(powerLawAverageDensityPpg(3125)).toBeCloseTo(17.3, 12);
    expect(powerLawPointDensityPpg(3125)).toBeCloseTo(17.9, 12);
    expect(Math.abs(powerLawOverburdenPsi({ bmlFt: 6920, waterDepthFt: 3000, seawaterPpg: 8.6 }) - 7779)).toBeLessThan(0.5);
  });
  it("hydrostaticPressure: [82, 10,082] ft at 0.465 psi/ft → [0, 4650] psi; 1.0 g/cc over 3280 ft → 3280 × 0.43353 = 1421.98 psi", () => {
    expect(Array.from(hydrostaticPressure({ tvdFt: [82, 10082], datums: DATUMS, gradientPsiPerFt: 0.465 }))).toEqual([0, 4650]);
    expect(hydrostaticPressureFromBrineDensity({ tvdFt: [3362], datums: DATUMS, brineDensityGcc: 1.0 })[0]).toBeCloseTo(1421.98, 1);
  });
  it("integrateOverburden: 1000 m seawater + 2000 m at 2.20 g/cc → 53.25 MPa = 7723 psi (CHECK-VALUES §1)", () => {
    const r = integrateOverburden({
      tvdFt: [0, 3280.84, 9842.52],
      datums: { rtElevationFt: 0, waterDepthFt: 3280.84, seawaterDensityGcc: 1.03 },
      densityGcc: [NaN, 2.2, 2.2],
    });
    expect(Math.abs(r.svPsi[2] - 7723)).toBeLessThan(0.5);
    expect(r.ranges.map((x) => x.source)).toEqual(["air", "densityLog"]);
  });
});
