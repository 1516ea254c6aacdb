import { describe, it, expect } from "vitest";
import { smoothDcInShale } from "../../src/drilling/smoothDcInShale.js";

describe("smoothDcInShale", () => {
  it("doc example: ±1 ft running median over shale samples (own case, medians by hand)", () => {
    const input = Object.freeze({ tvdFt: Object.freeze([0, 1, 2, 3]), dc: Object.freeze([1.0, 5.0, 1.2, 1.1]), isShale: Object.freeze([1, 1, 1, 1]), halfWindowFt: 1 });
    const r = smoothDcInShale(input);
    expect(Array.from(r.dcSmoothed)).toEqual([3.0, 1.2, 1.2, 1.15]); // medians {1,5}, {1,5,1.2}, {5,1.2,1.1}, {1.2,1.1}
    expect(r.nUsed).toBe(4);
  });

  it("sand samples are neither smoothed nor used; NaN dc is skipped (own case)", () => {
    const r = smoothDcInShale({ tvdFt: [0, 1, 2, 3, 4], dc: [1.0, 9.0, NaN, 1.4, 1.2], isShale: [1, 0, 1, 1, 1], halfWindowFt: 2 });
    expect(Number.isNaN(r.dcSmoothed[1])).toBe(true); // sand → NaN
    expect(r.dcSmoothed[0]).toBe(1.0); // window 0–2 ft: shale finite {1.0}
    expect(r.dcSmoothed[2]).toBeCloseTo(1.2, 15); // window 0–4: {1.0, 1.4, 1.2} → 1.2 (the sand 9.0 is left out)
    expect(r.dcSmoothed[4]).toBeCloseTo(1.3, 15); // window 2–4: {1.4, 1.2} → 1.3
    expect(r.nUsed).toBe(3);
  });

  it("rejects misaligned arrays, a non-positive window and decreasing depth", () => {
    expect(() => smoothDcInShale({ tvdFt: [0, 1], dc: [1], isShale: [1, 1] })).toThrow(expect.objectContaining({ code: "E_LENGTH" }));
    expect(() => smoothDcInShale({ tvdFt: [0], dc: [1], isShale: [1], halfWindowFt: 0 })).toThrow(expect.objectContaining({ code: "E_RANGE" }));
    expect(() => smoothDcInShale({ tvdFt: [1, 0], dc: [1, 1], isShale: [1, 1] })).toThrow(expect.objectContaining({ code: "E_NOT_SORTED" }));
  });
});
