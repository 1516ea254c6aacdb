/**
 * Okabe–Ito palette: every constant against the published values of Okabe, M. & Ito, K.
 * (2008), "Color Universal Design (CUD): How to make figures and presentations that are
 * friendly to colorblind people", J*FLY web publication, Fig. 16 — hex codes and RGB
 * triples (label: published).
 */
import { describe, expect, it } from "vitest";
import {
  OKABE_ITO,
  OKABE_ITO_BLACK,
  OKABE_ITO_ORANGE,
  OKABE_ITO_SKY_BLUE,
  OKABE_ITO_BLUISH_GREEN,
  OKABE_ITO_YELLOW,
  OKABE_ITO_BLUE,
  OKABE_ITO_VERMILLION,
  OKABE_ITO_REDDISH_PURPLE,
  SERIES_COLOUR_ORDER,
  seriesColour,
} from "../../src/present/index.js";

// Okabe & Ito 2008, Fig. 16 (published): name, hex, RGB.
const PUBLISHED: [string, string, [number, number, number]][] = [
  ["black", "#000000", [0, 0, 0]],
  ["orange", "#E69F00", [230, 159, 0]],
  ["skyBlue", "#56B4E9", [86, 180, 233]],
  ["bluishGreen", "#009E73", [0, 158, 115]],
  ["yellow", "#F0E442", [240, 228, 66]],
  ["blue", "#0072B2", [0, 114, 178]],
  ["vermillion", "#D55E00", [213, 94, 0]],
  ["reddishPurple", "#CC79A7", [204, 121, 167]],
];

const rgb = (hex: string): number[] => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

describe("OKABE_ITO", () => {
  it("holds exactly the eight published colours by name", () => {
    expect(Object.keys(OKABE_ITO).sort()).toEqual(PUBLISHED.map((p) => p[0]).sort());
    for (const [name, hex] of PUBLISHED) {
      expect(OKABE_ITO[name as keyof typeof OKABE_ITO]).toBe(hex); // Okabe & Ito 2008, Fig. 16 (published)
    }
  });

  it("hex codes decode to the published RGB triples", () => {
    for (const [name, , triple] of PUBLISHED) {
      expect(rgb(OKABE_ITO[name as keyof typeof OKABE_ITO])).toEqual(triple); // Okabe & Ito 2008, Fig. 16 (published)
    }
  });

  it("named constants equal the published hex codes", () => {
    // Okabe & Ito 2008, Fig. 16 (published)
    expect(OKABE_ITO_BLACK).toBe("#000000");
    expect(OKABE_ITO_ORANGE).toBe("#E69F00");
    expect(OKABE_ITO_SKY_BLUE).toBe("#56B4E9");
    expect(OKABE_ITO_BLUISH_GREEN).toBe("#009E73");
    expect(OKABE_ITO_YELLOW).toBe("#F0E442");
    expect(OKABE_ITO_BLUE).toBe("#0072B2");
    expect(OKABE_ITO_VERMILLION).toBe("#D55E00");
    expect(OKABE_ITO_REDDISH_PURPLE).toBe("#CC79A7");
  });
});

describe("seriesColour", () => {
  it("uses each palette colour once per cycle, yellow last, and wraps", () => {
    const cycle = Array.from({ length: 8 }, (_, i) => seriesColour(i));
    expect(new Set(cycle)).toEqual(new Set(PUBLISHED.map((p) => p[1])));
    expect(cycle[7]).toBe("#F0E442"); // faint on white as a thin line (common practice, no source)
    expect(seriesColour(8)).toBe(cycle[0]);
    expect(seriesColour(-1)).toBe(cycle[7]);
    expect(seriesColour(1)).toBe("#D55E00");
    expect(Object.isFrozen(SERIES_COLOUR_ORDER)).toBe(true);
  });
});
