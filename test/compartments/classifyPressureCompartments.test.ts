/**
 * segmentPressureProfile and classifyPressureCompartments on a designed synthetic profile
 * (own case): the truth below is chosen here, Gaussian noise of 30 psi is added from a
 * seeded generator, and the functions must recover the designed boundaries. The issue's
 * acceptance figure is ±150 ft; these tests hold ±50 ft, since with 30 psi noise on ramps of
 * 3–3.5 psi/ft a boundary is blurred by only ~10 ft.
 *
 * Designed truth (TVD, ft; excess pressure over a 0.465 psi/ft brine hydrostatic —
 * CHECK-VALUES §0, common practice, no source):
 *   5000–8000 hydrostatic; 8000–8600 ramp +3 psi/ft to 1800 psi across a 7980–8620 shale;
 *   8600–10400 compartment at 1800 psi; 10400–10800 regression −3.5 psi/ft to 400 psi across
 *   a 10380–10820 shale; 10800–12000 compartment at 400 psi; 12000–14000 ramp +0.3 psi/ft.
 */
import { describe, expect, it } from "vitest";
import { classifyPressureCompartments, compartmentIntervalStats, compartmentLineFit, segmentPressureProfile } from "../../src/compartments/index.js";
import { ShalepointError } from "../../src/errors.js";
import { seededUniform } from "../helpers/seededRandom.js";

const rng = seededUniform;

const HYDRO_PSI_PER_FT = 0.465;
function truthExcessPsi(z: number): number {
  if (z <= 8000) return 0;
  if (z <= 8600) return 3 * (z - 8000);
  if (z <= 10400) return 1800;
  if (z <= 10800) return 1800 - 3.5 * (z - 10400);
  if (z <= 12000) return 400;
  return 400 + 0.3 * (z - 12000);
}

function designedWell(seed = 42, noisePsi = 30) {
  const r = rng(seed);
  const n = (14000 - 5000) / 2 + 1;
  const tvdFt = new Float64Array(n);
  const ppPsi = new Float64Array(n);
  const hydrostaticPsi = new Float64Array(n);
  const shaleFlag = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const z = 5000 + 2 * i;
    tvdFt[i] = z;
    hydrostaticPsi[i] = HYDRO_PSI_PER_FT * z;
    const g = Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r());
    ppPsi[i] = hydrostaticPsi[i] + truthExcessPsi(z) + noisePsi * g;
    // Thin background beds: 40 ft sand, 60 ft shale; two thick seals.
    const background = z % 100 >= 40 ? 1 : 0;
    const seal = (z >= 7980 && z <= 8620) || (z >= 10380 && z <= 10820) ? 1 : 0;
    shaleFlag[i] = background | seal;
  }
  return { tvdFt, ppPsi, hydrostaticPsi, shaleFlag };
}

describe("segmentPressureProfile — designed profile (own case)", () => {
  it("finds the five designed boundaries: four sharp ones within ±50 ft, the gentle kink within ±150 ft", () => {
    const w = designedWell();
    const r = segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi });
    const truth = [8000, 8600, 10400, 10800, 12000];
    // At 12,000 ft the excess gradient changes by only 0.3 psi/ft: the profile needs 100 ft
    // to depart from the upper line by one noise σ (30 psi), so only the issue's ±150 ft holds.
    const tol = [50, 50, 50, 50, 150];
    expect(r.boundariesFt).toHaveLength(truth.length);
    r.boundariesFt.forEach((b, k) => expect(Math.abs(b - truth[k])).toBeLessThan(tol[k]));
    expect(r.penaltySource).toBe("noise");
    // σ̂ from MAD of differences should recover the 30 psi noise within 10 % (n ≈ 4500).
    expect(Math.abs(r.noiseSigmaPsi / 30 - 1)).toBeLessThan(0.1);
    // 4501 samples > 2000 → automatic candidate grid every ceil(4501/2000) = 3 samples; on
    // this profile the refined result equals the exact search (candidateStep 1).
    expect(r.candidateStep).toBe(3);
    const exact = segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi, candidateStep: 1 });
    expect(r.boundariesFt).toEqual(exact.boundariesFt);
  });
  it("recovers the compartment level (1800 psi) and the brine gradient inside it", () => {
    const w = designedWell();
    const r = segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi });
    const comp = r.segments[2];
    // mean of ~900 samples with σ 30 psi: standard error 1 psi; allow 10 psi for edge samples.
    expect(Math.abs(comp.meanExcessPsi - 1800)).toBeLessThan(10);
    // brine 0.465 psi/ft (CHECK-VALUES §0, common practice, no source); slope s.e. ≈ 0.002 psi/ft.
    expect(Math.abs(comp.ppGradientPsiPerFt - 0.465)).toBeLessThan(0.01);
    const ramp = r.segments[1];
    expect(Math.abs(ramp.excessGradientPsiPerFt - 3)).toBeLessThan(0.1); // designed 3 psi/ft
  });
  it("mean cost: steps between flat compartments (own case: 0 → 1500 psi at 9000 ft, → 600 psi at 10,000 ft) within ±10 ft", () => {
    // Sharp steps of 900–1500 psi against 30 psi noise: a step is located to a sample or two.
    const r = rng(7);
    const n = 2001;
    const tvdFt = Float64Array.from({ length: n }, (_, i) => 8000 + 2 * i);
    const hydrostaticPsi = tvdFt.map((z) => 0.465 * z);
    const ppPsi = tvdFt.map((z, i) => {
      const g = Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r());
      return hydrostaticPsi[i] + (z < 9000 ? 0 : z < 10000 ? 1500 : 600) + 30 * g;
    });
    const s = segmentPressureProfile({ tvdFt, ppPsi, hydrostaticPsi, cost: "mean" });
    expect(s.boundariesFt).toHaveLength(2);
    expect(Math.abs(s.boundariesFt[0] - 9000)).toBeLessThan(10);
    expect(Math.abs(s.boundariesFt[1] - 10000)).toBeLessThan(10);
    const c = classifyPressureCompartments({ tvdFt, ppPsi, hydrostaticPsi, cost: "mean" });
    expect(c.intervals.map((iv) => iv.label)).toEqual(["hydrostatic", "compartment", "compartment"]);
    // The 900 psi drop between the two compartments shows as a negative boundary jump.
    expect(Math.abs(c.boundaries[1].excessJumpPsi + 900)).toBeLessThan(30);
  });
  it("decimateSpacingFt 20: one sample per 20 ft (451 of 4501), boundaries still within ±50 ft (sharp) / ±150 ft (gentle kink)", () => {
    const w = designedWell();
    const r = segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi, decimateSpacingFt: 20 });
    // 5000–14,000 ft at 2 ft, kept every 20 ft: 9000/20 + 1 = 451 samples, 4050 counted as skipped.
    expect(r.nUsed).toBe(451);
    expect(r.nSkipped).toBe(4050);
    expect(r.stepFt).toBe(20);
    const truth = [8000, 8600, 10400, 10800, 12000];
    const tol = [50, 50, 50, 50, 150];
    expect(r.boundariesFt).toHaveLength(truth.length);
    r.boundariesFt.forEach((b, k) => expect(Math.abs(b - truth[k])).toBeLessThan(tol[k]));
    for (const bad of [0, -1, NaN]) expect(() => segmentPressureProfile({ ...w, decimateSpacingFt: bad })).toThrow(/decimateSpacingFt/);
  });
  it("missing pressure samples are skipped and counted, with a warning", () => {
    const w = designedWell();
    const pp = w.ppPsi.slice();
    for (let i = 100; i < 150; i++) pp[i] = NaN;
    const r = segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: pp, hydrostaticPsi: w.hydrostaticPsi });
    expect(r.nSkipped).toBe(50);
    expect(r.nUsed).toBe(w.tvdFt.length - 50);
    expect(r.warnings.find((x) => x.code === "W_SAMPLES_SKIPPED")?.count).toBe(50);
  });
  it("does not mutate its inputs", () => {
    const w = designedWell();
    const copy = w.ppPsi.slice();
    segmentPressureProfile({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi });
    expect(Array.from(w.ppPsi)).toEqual(Array.from(copy));
  });
  it("bad input: too few samples → E_TOO_SHORT; penalty ≤ 0 → E_RANGE; lengths differ → E_LENGTH", () => {
    const z = Float64Array.from({ length: 10 }, (_, i) => 9000 + 2 * i);
    const h = z.map((v) => 0.465 * v);
    const codeOf = (f: () => unknown): string => {
      try {
        f();
      } catch (e) {
        return (e as ShalepointError).code;
      }
      return "none";
    };
    expect(codeOf(() => segmentPressureProfile({ tvdFt: z, ppPsi: h, hydrostaticPsi: h, minThicknessFt: 100 }))).toBe("E_TOO_SHORT");
    const w = designedWell();
    expect(codeOf(() => segmentPressureProfile({ ...w, penaltyPsi2: 0 }))).toBe("E_RANGE");
    expect(codeOf(() => segmentPressureProfile({ ...w, penaltyPsi2: -5 }))).toBe("E_RANGE");
    expect(codeOf(() => segmentPressureProfile({ tvdFt: z, ppPsi: h.slice(1), hydrostaticPsi: h }))).toBe("E_LENGTH");
  });
});

describe("classifyPressureCompartments — designed profile (own case)", () => {
  const w = designedWell();
  const r = classifyPressureCompartments({ ...w });

  it("labels the intervals hydrostatic, ramp, compartment, regression, compartment, ramp", () => {
    expect(r.intervals.map((iv) => iv.label)).toEqual(["hydrostatic", "ramp", "compartment", "regression", "compartment", "ramp"]);
  });
  it("top of overpressure at 8000 ft ± 50 ft", () => {
    expect(r.topOfOverpressureFt).not.toBeNull();
    expect(Math.abs(r.topOfOverpressureFt! - 8000)).toBeLessThan(50);
  });
  it("two compartments with the designed ranges and levels", () => {
    expect(r.compartments).toHaveLength(2);
    const [a, b] = r.compartments;
    expect(Math.abs(a.topFt - 8600)).toBeLessThan(50);
    expect(Math.abs(a.baseFt - 10400)).toBeLessThan(50);
    expect(Math.abs(b.topFt - 10800)).toBeLessThan(50);
    expect(Math.abs(b.baseFt - 12000)).toBeLessThan(150); // gentle 0.3 psi/ft kink, see above
    expect(Math.abs(a.meanExcessPsi - 1800)).toBeLessThan(10);
    expect(Math.abs(b.meanExcessPsi - 400)).toBeLessThan(10);
  });
  it("one regression between 10,400 and 10,800 ft (±50 ft), dropping about 1400 psi", () => {
    expect(r.regressions).toHaveLength(1);
    expect(Math.abs(r.regressions[0].topFt - 10400)).toBeLessThan(50);
    expect(Math.abs(r.regressions[0].baseFt - 10800)).toBeLessThan(50);
    expect(Math.abs(r.regressions[0].excessChangePsi + 1400)).toBeLessThan(60);
  });
  it("seals: the two designed thick shales with their exact extent", () => {
    // The designed seals 7980–8620 and 10380–10820 ft join the background shale bed just
    // above them (z mod 100 ≥ 40), so the shale runs are 7940–8620 (680 ft) and
    // 10340–10820 ft (480 ft).
    const a = r.compartments[0];
    expect(a.sealAbove).not.toBeNull();
    expect(a.sealAbove!.topFt).toBe(7940);
    expect(a.sealAbove!.baseFt).toBe(8620);
    expect(a.sealAbove!.thicknessFt).toBe(680);
    expect(a.sealBelow!.topFt).toBe(10340);
    expect(a.sealBelow!.thicknessFt).toBe(480);
    expect(r.compartments[1].sealAbove!.topFt).toBe(10340);
    // No shale ≥ 100 ft below the second compartment: reported, not silently skipped.
    expect(r.compartments[1].sealBelow).toBeNull();
    expect(r.warnings.some((x) => x.code === "W_NO_SEAL_FOUND")).toBe(true);
  });
  it("each interval carries evidence text with its numbers", () => {
    expect(r.intervals[2].evidence).toMatch(/flat excess above 100 psi/);
    expect(r.intervals[3].evidence).toMatch(/excess falls/);
  });
  it("segmenting shale samples only (useMask) still finds the top of overpressure within ±50 ft", () => {
    const m = classifyPressureCompartments({ ...w, useMask: w.shaleFlag });
    expect(Math.abs(m.topOfOverpressureFt! - 8000)).toBeLessThan(50);
    expect(m.warnings.some((x) => x.code === "W_SAMPLES_MASKED")).toBe(true);
  });
  it("the hydrostatic threshold moves the label: 500 psi makes the 400 psi compartment hydrostatic-level flat", () => {
    // 400 psi < 500 psi threshold at top and base → hydrostatic (threshold rule, own choice).
    const t = classifyPressureCompartments({ ...w, hydrostaticExcessPsi: 500 });
    expect(t.compartments).toHaveLength(1);
  });
  it("without a shale flag: warning W_NO_SHALE_FLAG and no seals", () => {
    const t = classifyPressureCompartments({ tvdFt: w.tvdFt, ppPsi: w.ppPsi, hydrostaticPsi: w.hydrostaticPsi });
    expect(t.seals).toHaveLength(0);
    expect(t.warnings.map((x) => x.code)).toContain("W_NO_SHALE_FLAG");
  });
});

describe("compartmentLineFit / compartmentIntervalStats — doc examples (own cases, exact arithmetic)", () => {
  it("line through (0,1), (1,3), (2,5): slope 2, mean 3, rms 0", () => {
    const f = compartmentLineFit([0, 1, 2], [1, 3, 5], [0, 1, 2]);
    expect(f.slope).toBeCloseTo(2, 12);
    expect(f.meanV).toBeCloseTo(3, 12);
    expect(f.rms).toBeCloseTo(0, 12);
  });
  it("flat 1800 psi excess on a 0.465 psi/ft brine line (CHECK-VALUES §0 common practice) → pp gradient 0.465", () => {
    const s = compartmentIntervalStats([9000, 9100], [1800, 1800], [5985, 6031.5], [0, 1]);
    expect(s.meanExcessPsi).toBe(1800);
    expect(s.excessGradientPsiPerFt).toBe(0);
    expect(s.ppGradientPsiPerFt).toBeCloseTo(0.465, 12);
  });
});
