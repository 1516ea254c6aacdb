/**
 * Despiking (Hampel identifier: Hampel 1974, JASA 69(346), from memory). Checks: the MAD
 * consistency constant against the published normal quantile, an injected spike on a
 * compaction-trend log, a smooth log left unchanged, NaN policy.
 */
import { describe, expect, it } from "vitest";
import { MAD_TO_SIGMA, despikeLog } from "../../src/logs/index.js";

/** Exponential sonic compaction trend, form of Zhang 2011 (CHECK-VALUES §2): Δt = 65 + 135 e^(−3e-4 z). */
function trendLog(n: number): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = 65 + 135 * Math.exp(-3e-4 * (2000 + 0.5 * i));
  return x;
}

describe("MAD_TO_SIGMA", () => {
  it("is 1/Φ⁻¹(0.75)", () => {
    // Published: standard normal upper quartile 0.6744897501960817 (any normal table; value to 16 digits).
    expect(MAD_TO_SIGMA * 0.6744897501960817).toBeCloseTo(1, 12);
  });
});

describe("despikeLog", () => {
  it("removes an injected spike and nothing else", () => {
    const truth = trendLog(400);
    const x = truth.slice();
    x[200] += 60; // 60 us/ft spike
    x[321] -= 25; // negative spike
    const input = x.slice();
    const r = despikeLog({ values: x, window: { samples: 11 }, threshold: 3 });
    expect(Array.from(r.spikeIndex)).toEqual([200, 321]);
    expect(r.spikeCount).toBe(2);
    expect(r.isSpike[200]).toBe(1);
    expect(r.isSpike[199]).toBe(0);
    // Replaced by the window median, one sample step from the truth on a monotonic log
    // (trend slope ≤ 0.02 us/ft per sample here).
    expect(Math.abs(r.values[200] - truth[200])).toBeLessThan(0.02);
    expect(Math.abs(r.values[321] - truth[321])).toBeLessThan(0.02);
    for (let i = 0; i < 400; i++) if (i !== 200 && i !== 321) expect(r.values[i]).toBe(x[i]);
    expect(x).toEqual(input); // input not mutated
  });

  it("leaves a smooth log unchanged (monotonic trend and a sinusoid)", () => {
    const t = trendLog(300);
    const r1 = despikeLog({ values: t });
    expect(r1.spikeCount).toBe(0);
    expect(r1.values).toEqual(t);
    const s = new Float64Array(300).map((_, i) => 80 + 20 * Math.sin((2 * Math.PI * i) / 100));
    const r2 = despikeLog({ values: s, window: { samples: 7 } });
    expect(r2.spikeCount).toBe(0);
    expect(r2.values).toEqual(s);
  });

  it("reproduces its doc-comment example (hand: window median 104, MAD 2 → 76 > 8.9)", () => {
    const r = despikeLog({ values: new Float64Array([100, 101, 102, 180, 104, 105, 106]), window: { samples: 5 } });
    expect(Array.from(r.values)).toEqual([100, 101, 102, 104, 104, 105, 106]);
    expect(Array.from(r.spikeIndex)).toEqual([3]);
  });

  it("keeps NaN as NaN, ignores NaN neighbours and can replace spikes by NaN", () => {
    const x = new Float64Array([100, 101, NaN, 102, 180, 104, 105, NaN, 106]);
    const r = despikeLog({ values: x, window: { samples: 5 }, replaceWith: "nan" });
    expect(Array.from(r.spikeIndex)).toEqual([4]);
    expect(r.values[4]).toBeNaN();
    expect(r.values[2]).toBeNaN();
    expect(r.isSpike[2]).toBe(0);
    expect(r.values[3]).toBe(102);
  });

  it("a threshold 1% away changes the decision at the boundary", () => {
    // Window (0, 0, 10, 0, 0): median 0, MAD 0, so only minDeviation decides (hand).
    const x = new Float64Array([0, 0, 10, 0, 0]);
    expect(despikeLog({ values: x, window: { samples: 5 }, minDeviation: 9.9 }).spikeCount).toBe(1);
    expect(despikeLog({ values: x, window: { samples: 5 }, minDeviation: 10.1 }).spikeCount).toBe(0);
    // Hampel rule by hand: window (1, 2, y, 4, 5) with y > 6: median 4, deviations
    // (3, 2, y−4, 0, 1) → MAD 2, so spike iff y − 4 > 3·1.4826·2 = 8.896.
    const limit = 3 * MAD_TO_SIGMA * 2;
    const a = despikeLog({ values: new Float64Array([1, 2, 4 + limit * 1.01, 4, 5]), window: { samples: 5 } });
    const b = despikeLog({ values: new Float64Array([1, 2, 4 + limit * 0.99, 4, 5]), window: { samples: 5 } });
    expect(a.isSpike[2]).toBe(1);
    expect(b.isSpike[2]).toBe(0);
  });
});
