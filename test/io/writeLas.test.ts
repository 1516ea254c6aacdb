/**
 * writeLas: read → write → read exactness on every good fixture and on random data, the
 * LAS 2.0 wrapped-line limit of 80 characters (CWLS LAS 2.0, 1992 — published, CHECK-VALUES
 * §12), NaN written as NULL, and an independent read of the output by las-js 3.4.2.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { Las } from "las-js";
import { readLas, type ReadLasOptions } from "../../src/io/readLas.js";
import { formatFixedDecimals, writeLas } from "../../src/io/writeLas.js";
import type { LasFile } from "../../src/io/lasTypes.js";
import { ShalepointError } from "../../src/errors.js";

const dir = new URL("../fixtures/las/", import.meta.url);
const fixture = (name: string): string => readFileSync(new URL(name, dir), "latin1");

/** LasFile without the source line numbers (they differ between the original and the copy). */
function strip(las: LasFile): LasFile {
  const noLine = (items: LasFile["well"]) => items.map(({ mnemonic, unit, value, description }) => ({ mnemonic, unit, value, description }));
  return { ...las, version: noLine(las.version), well: noLine(las.well), curves: noLine(las.curves), parameters: noLine(las.parameters) };
}

function deepFreeze(las: LasFile): LasFile {
  for (const part of [las.version, las.well, las.curves, las.parameters]) {
    part.forEach((it) => Object.freeze(it));
    Object.freeze(part);
  }
  Object.freeze(las.data);
  return Object.freeze(las);
}

const GOOD: [string, ReadLasOptions["policy"]?][] = [
  ["basic.las"],
  ["crlf.las"],
  ["tabs-and-blank-lines.las"],
  ["null-9999.las"],
  ["wrapped.las"],
  ["negative-step.las"],
  ["irregular-step.las"],
  ["duplicate-mnemonic.las"],
  ["metric.las"],
  ["unknown-unit.las"],
];

describe("writeLas round trip", () => {
  for (const [name, policy] of GOOD) {
    it(`readLas(writeLas(readLas(${name}))) is the same LasFile`, () => {
      const first = deepFreeze(readLas(fixture(name), { policy }).las);
      const text = writeLas(first);
      const second = readLas(text).las;
      expect(strip(second)).toEqual(strip(first));
      // and the other layout gives the same data
      const other = readLas(writeLas(first, { wrap: !first.wrap })).las;
      expect(other.data).toEqual(first.data);
      expect(other.wrap).toBe(!first.wrap);
    });
  }

  it("writeLas(…, { wrap: true }) keeps every line ≤ 80 characters and puts the index alone first (LAS 2.0, published)", () => {
    const n = 3;
    const curves = [{ mnemonic: "DEPT", unit: "F", value: "", description: "depth" }];
    const data = [Float64Array.from([9000, 9000.5, 9001])];
    for (let j = 0; j < 30; j++) {
      curves.push({ mnemonic: `C${j}`, unit: "", value: "", description: `curve ${j}` });
      data.push(Float64Array.from({ length: n }, (_, i) => -1234.56789012345 * (i + 1) * (j + 1)));
    }
    const las: LasFile = { version: [], well: [], curves, parameters: [], other: "", data, wrap: true, nullValue: -999.25 };
    const text = writeLas(las);
    const aLines = text.split("~A\n")[1].trimEnd().split("\n");
    for (const l of text.split("\n")) expect(l.length).toBeLessThanOrEqual(80);
    expect(aLines[0]).toBe("9000");
    expect(readLas(text).las.data).toEqual(data);
  });

  it("writeLas writes NaN as the NULL value and adds STRT/STOP/STEP/NULL when missing", () => {
    const las: LasFile = {
      version: [],
      well: [{ mnemonic: "WELL", unit: "", value: "QUILLON A-1", description: "well name" }],
      curves: [
        { mnemonic: "DEPT", unit: "F", value: "", description: "depth" },
        { mnemonic: "GR", unit: "GAPI", value: "", description: "gamma ray" },
      ],
      parameters: [],
      other: "",
      data: [Float64Array.from([100, 100.1, 100.2]), Float64Array.from([50, NaN, 52])],
      wrap: false,
      nullValue: -9999,
    };
    const text = writeLas(las);
    expect(text).toMatch(/^\s*100\.1\s+-9999$/m);
    const back = readLas(text).las;
    expect(Array.from(back.data[1])).toEqual([50, NaN, 52]);
    const item = (m: string) => back.well.find((w) => w.mnemonic === m)?.value;
    expect(item("STRT")).toBe("100");
    expect(item("STOP")).toBe("100.2");
    // 100.1 − 100 = 0.09999999999999432 in binary; written as 0.1 (12 significant digits)
    expect(item("STEP")).toBe("0.1");
    expect(item("NULL")).toBe("-9999");
  });

  it("writeLas(…, { precision: 2 }) writes fixed decimals", () => {
    const { las } = readLas(fixture("basic.las"));
    const back = readLas(writeLas(las, { precision: 2 })).las;
    // RHOB 2.334 → "2.33"; 9000.5 → "9000.50"
    expect(back.data[3][1]).toBe(2.33);
    expect(back.data[0][1]).toBe(9000.5);
  });

  it("random data (finite doubles, NaN, -0) survives read → write → read bit for bit", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 6 }),
        fc.array(fc.double({ min: 0.001, max: 50, noNaN: true }), { minLength: 1, maxLength: 30 }),
        fc.array(fc.oneof(fc.double({ noDefaultInfinity: true }), fc.constant(-0)), { minLength: 180, maxLength: 180 }),
        fc.boolean(),
        (nCurves, steps, pool, wrap) => {
          const n = steps.length;
          const index = new Float64Array(n);
          for (let i = 1; i < n; i++) index[i] = index[i - 1] + steps[i];
          const curves = [{ mnemonic: "DEPT", unit: "M", value: "", description: "depth" }];
          const data = [index];
          for (let j = 0; j < nCurves; j++) {
            curves.push({ mnemonic: `X${j}`, unit: "", value: "", description: "" });
            data.push(Float64Array.from({ length: n }, (_, i) => {
              const v = pool[(i * 7 + j * 31) % pool.length];
              return v === -999.25 ? 0 : v;
            }));
          }
          const las: LasFile = { version: [], well: [], curves, parameters: [], other: "", data, wrap, nullValue: -999.25 };
          const back = readLas(writeLas(las), { policy: { allowStepMismatch: true } }).las;
          back.data.forEach((c, j) => c.forEach((v, i) => expect(Object.is(v, data[j][i])).toBe(true)));
        },
      ),
      { numRuns: 150, seed: 7 },
    );
  });

  it("short decimals are written as String(x) writes them (ECMA-262 Number::toString, published) and read back exactly", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: -1e9, max: 1e9 }), fc.integer({ min: 0, max: 6 })), { minLength: 1, maxLength: 50 }), (pairs) => {
        const xs = pairs.map(([i, k]) => i / 10 ** k).filter((x) => x !== -999.25 && !Object.is(x, -0));
        if (xs.length === 0) return;
        const las: LasFile = {
          version: [],
          well: [],
          curves: [
            { mnemonic: "DEPT", unit: "F", value: "", description: "" },
            { mnemonic: "X", unit: "", value: "", description: "" },
          ],
          parameters: [],
          other: "",
          data: [Float64Array.from(xs, (_, i) => i), Float64Array.from(xs)],
          wrap: false,
          nullValue: -999.25,
        };
        const text = writeLas(las);
        const tokens = text.split("~A\n")[1].trimEnd().split("\n").map((l) => l.trim().split(/\s+/)[1]);
        expect(tokens).toEqual(xs.map((x) => String(x)));
        expect(Array.from(readLas(text).las.data[1])).toEqual(xs);
      }),
      { numRuns: 200, seed: 11 },
    );
  });

  it("las-js 3.4.2 reads writeLas output to the same values", async () => {
    const { las } = readLas(fixture("null-9999.las"));
    const text = writeLas(las);
    const ref = new Las(text, { loadFile: false });
    expect(await ref.header()).toEqual(las.curves.map((c) => c.mnemonic));
    const rows = await ref.data();
    rows.forEach((row, i) => row.forEach((v, j) => (Number.isNaN(las.data[j][i]) ? expect(v).toBe(-9999) : expect(v).toBe(las.data[j][i]))));
  });
});

describe("writeLas errors", () => {
  const base = (): LasFile => readLas(fixture("irregular-step.las")).las;
  it("writeLas refuses a description with ':' (would not read back)", () => {
    const las = base();
    las.curves[1] = { ...las.curves[1], description: "gamma: ray" };
    expect(() => writeLas(las)).toThrow(ShalepointError);
    try {
      writeLas(las);
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_LAS_WRITE_HEADER");
    }
  });
  it("writeLas refuses ±Infinity and mismatched column lengths", () => {
    const las = base();
    const inf = { ...las, data: [las.data[0], Float64Array.from([1, Infinity, 3, 4])] };
    expect(() => writeLas(inf)).toThrow(/infinite/);
    const short = { ...las, data: [las.data[0], Float64Array.from([1, 2])] };
    expect(() => writeLas(short)).toThrow(/different length/);
  });
});

describe("formatFixedDecimals", () => {
  // Outside reference: ECMAScript Number.prototype.toFixed (ECMA-262, §21.1.3.3 — published
  // standard, as implemented by the running engine): the text must be identical, byte for byte.
  it("formatFixedDecimals(x, d) gives exactly x.toFixed(d) on random, tie and edge values", () => {
    let seed = 20261201; // deterministic LCG (Numerical Recipes constants), not Math.random
    const rnd = (): number => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 4294967296);
    const values: number[] = [0, -0, NaN, Infinity, -Infinity, 5e-324, -1e-7, 1e21, 999999.99995, -999999.99995, 1e6, 0.00005, 1.00005, 2.5, -2.5];
    for (let i = 0; i < 20000; i++) values.push((rnd() - 0.5) * 10 ** (rnd() * 12 - 5));
    // decimal ties k/2·10^-d and values a hair either side of them
    for (let k = -3000; k <= 3000; k++) for (const d of [1, 2, 3, 4]) values.push((k + 0.5) / 10 ** d, (k + 0.5) / 10 ** d + 1e-12, (k + 0.5) / 10 ** d - 1e-12, 5432 + (k + 0.5) / 10 ** d);
    let mismatches = 0;
    for (const d of [0, 1, 2, 3, 4, 6]) for (const x of values) if (formatFixedDecimals(x, d) !== x.toFixed(d)) mismatches++;
    expect(mismatches).toBe(0);
  });

  it("formatFixedDecimals keeps toFixed's sign and tie rules (ECMA-262 §21.1.3.3, published)", () => {
    // x < 0 prints "-" even when every digit is zero; −0 is not < 0
    expect(formatFixedDecimals(-0.00001, 4)).toBe("-0.0000");
    expect(formatFixedDecimals(-0, 4)).toBe("0.0000");
    // exact tie: the larger n (0.25 and 0.125 are exact binary fractions)
    expect(formatFixedDecimals(0.25, 1)).toBe("0.3");
    expect(formatFixedDecimals(0.125, 2)).toBe("0.13");
    // 1.005 is stored as 1.00499999999999989… so it rounds down (from memory, a well-known case)
    expect(formatFixedDecimals(1.005, 2)).toBe("1.00");
    // ordinary value; own case checked by hand: 5432.123456 → 5432.1235
    expect(formatFixedDecimals(5432.123456, 4)).toBe("5432.1235");
    expect(formatFixedDecimals(-12.00004, 4)).toBe("-12.0000");
  });
});

describe("writeLas data layout with fixed decimals", () => {
  it("writeLas(…, { precision: 4 }) writes each row as the toFixed(4) texts right-aligned to the column width, one blank apart", () => {
    // Outside references: ECMA-262 Number.prototype.toFixed (published) for the digits and the
    // LAS 2.0 ~A layout (CWLS 1992, published: one line per depth when WRAP = NO, NULL for
    // missing); the expected table is built here independently, value by value.
    let seed = 7;
    const rnd = (): number => ((seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 4294967296);
    const n = 3000;
    const md = Float64Array.from({ length: n }, (_, i) => 4000 + 0.5 * i);
    const pp = Float64Array.from({ length: n }, (_, i) => (i % 97 === 0 ? NaN : 1500 + 9000 * rnd()));
    const small = Float64Array.from({ length: n }, (_, i) => (i % 5 === 0 ? -0.00001 : (rnd() - 0.5) * 1e-3));
    const big = Float64Array.from({ length: n }, () => (rnd() - 0.5) * 1e8); // beyond the fast path
    const data = [md, pp, small, big];
    const las: LasFile = {
      version: [],
      well: [{ mnemonic: "NULL", unit: "", value: "-999.25", description: "missing value" }],
      curves: ["DEPT", "PP", "SMALL", "BIG"].map((mnemonic) => ({ mnemonic, unit: "", value: "", description: mnemonic.toLowerCase() })),
      parameters: [],
      other: "",
      data,
      wrap: false,
      nullValue: -999.25,
    };
    const texts = data.map((col) => Array.from(col, (x) => (Number.isNaN(x) ? "-999.25" : x.toFixed(4))));
    const widths = texts.map((t) => Math.max(...t.map((s) => s.length)));
    const rows = Array.from({ length: n }, (_, i) => texts.map((t, j) => t[i].padStart(widths[j])).join(" "));
    const text = writeLas(las, { precision: 4 });
    expect(text.slice(text.indexOf("~A\n") + 3)).toBe(rows.join("\n") + "\n");
    // wrapped: the index alone on its line, then the other values (each at most 80 wide)
    const wrapped = writeLas(las, { precision: 4, wrap: true }).split("\n");
    const a = wrapped.indexOf("~A");
    expect(wrapped[a + 1]).toBe(texts[0][0]);
    expect(wrapped[a + 2]).toBe([1, 2, 3].map((j) => texts[j][0].padStart(widths[j])).join(" "));
  });
});
