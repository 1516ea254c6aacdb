/**
 * Property-based tests of the LAS 2.0 reader (fast-check, fixed seeds and run counts so CI
 * time is bounded). Files are built from random invented curves (Quillon Basin style), written
 * by writeLas, then mutated: truncation, CRLF, tabs, odd spacing, huge numbers, NaN strings,
 * non-ASCII header text, wrapped layout, wrong column counts.
 *
 * The properties: readLas either returns a LasFile or throws a ShalepointError — never any
 * other exception, never a hang; a valid file reads back to the values written (LAS 2.0,
 * Canadian Well Logging Society 1992: NULL marks a missing value; wrapped records start
 * with the index alone on a line — CHECK-VALUES §12, published).
 */
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readLas, safeReadLas } from "../../src/io/readLas.js";
import { writeLas } from "../../src/io/writeLas.js";
import type { LasFile, LasHeaderItem } from "../../src/io/lasTypes.js";
import { ShalepointError } from "../../src/errors.js";

const item = (mnemonic: string, unit: string, value: string, description: string): LasHeaderItem => ({ mnemonic, unit, value, description });

/** A small valid LAS file: depth index (regular or irregular) plus 1–4 curves with NULLs. */
const lasFileArb = fc
  .record({
    rows: fc.integer({ min: 1, max: 40 }),
    curves: fc.integer({ min: 1, max: 4 }),
    start: fc.integer({ min: 0, max: 20000 }),
    stepQuarterFt: fc.integer({ min: 1, max: 8 }),
    wrap: fc.boolean(),
    seedValues: fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), { minLength: 160, maxLength: 160 }),
    nullMask: fc.array(fc.boolean(), { minLength: 160, maxLength: 160 }),
    wellName: fc.string({ maxLength: 20 }).map((s) => s.replace(/[:\r\n]/g, " ")),
  })
  .map((r): LasFile => {
    const depth = Float64Array.from({ length: r.rows }, (_, i) => r.start + i * r.stepQuarterFt * 0.25);
    const data = [depth];
    const curves = [item("DEPT", "F", "", "DEPTH")];
    for (let c = 0; c < r.curves; c++) {
      curves.push(item(`C${c}`, "US/F", "", `CURVE ${c}`));
      data.push(Float64Array.from({ length: r.rows }, (_, i) => (r.nullMask[(c * 40 + i) % 160] && i % 3 === 1 ? NaN : r.seedValues[(c * 40 + i) % 160])));
    }
    return {
      version: [item("VERS", "", "2.0", "CWLS LAS 2.0"), item("WRAP", "", r.wrap ? "YES" : "NO", "WRAP MODE")],
      well: [item("NULL", "", "-999.25", "NULL VALUE"), item("WELL", "", r.wellName.trim() === "" ? "Quillon A-1" : r.wellName.trim(), "WELL NAME")],
      curves,
      parameters: [],
      other: "",
      data,
      wrap: r.wrap,
      nullValue: -999.25,
    };
  });

/** Call readLas; fail the property on anything but success or a ShalepointError. */
function readsOrTypedError(text: string): "ok" | "error" {
  try {
    readLas(text, { policy: { allowStepMismatch: true } });
    return "ok";
  } catch (e) {
    if (!(e instanceof ShalepointError)) throw new Error(`untyped failure: ${(e as Error)?.stack ?? String(e)}`);
    expect(e.code).toMatch(/^E_[A-Z0-9_]+$/);
    return "error";
  }
}

describe("readLas (property-based)", () => {
  it("readLas(writeLas(f)) returns the values written, NaN where NULL (LAS 2.0 NULL rule; published, CWLS 1992)", () => {
    fc.assert(
      fc.property(lasFileArb, (las) => {
        const back = readLas(writeLas(las)).las;
        expect(back.data.length).toBe(las.data.length);
        for (let c = 0; c < las.data.length; c++) {
          // writeLas writes the shortest round-trip text, so values come back exactly.
          expect(Array.from(back.data[c])).toEqual(Array.from(las.data[c]));
        }
        expect(back.wrap).toBe(las.wrap);
      }),
      { seed: 20261201, numRuns: 100 },
    );
  });

  it("readLas on a truncated file: parses or throws ShalepointError, never another error (own case)", () => {
    fc.assert(
      fc.property(lasFileArb, fc.double({ min: 0, max: 1, noNaN: true }), (las, cut) => {
        const text = writeLas(las);
        readsOrTypedError(text.slice(0, Math.floor(text.length * cut)));
      }),
      { seed: 11, numRuns: 200 },
    );
  });

  it("readLas with CRLF line ends and tab or multi-space separators reads the same values (own case: LAS 2.0 allows any blank separation)", () => {
    fc.assert(
      fc.property(lasFileArb, fc.constantFrom("\t", "   ", " \t "), (las, sep) => {
        const text = writeLas(las);
        const plain = readLas(text).las;
        const mangled = text
          .split("\n")
          .map((line) => (/^[\s\d.+-]/.test(line) && !line.startsWith("~") ? line.trim().split(/ +/).join(sep) : line))
          .join("\r\n");
        const back = readLas(mangled).las;
        for (let c = 0; c < plain.data.length; c++) expect(Array.from(back.data[c])).toEqual(Array.from(plain.data[c]));
      }),
      { seed: 12, numRuns: 100 },
    );
  });

  it("readLas with a data token replaced by a hostile string: parses or throws ShalepointError (own case)", () => {
    const hostile = ["NaN", "nan", "Infinity", "-Infinity", "1e400", "-1e400", "1e-400", "0x1F", "1,5", "--3", "", "∞", "１２", "1e", ".", "+", "9".repeat(400)];
    fc.assert(
      fc.property(lasFileArb, fc.nat(), fc.constantFrom(...hostile), (las, at, token) => {
        const text = writeLas(las);
        const start = text.indexOf("~A");
        const tokens = [...text.slice(start).matchAll(/-?\d[\d.eE+-]*/g)];
        if (tokens.length === 0) return;
        const t = tokens[at % tokens.length];
        const pos = start + (t.index ?? 0);
        const mutated = text.slice(0, pos) + token + text.slice(pos + t[0].length);
        const outcome = readsOrTypedError(mutated);
        if (outcome === "ok") {
          // Whatever was accepted is a finite number or NaN, never ±Infinity.
          const r = readLas(mutated, { policy: { allowStepMismatch: true } }).las;
          for (const col of r.data) for (const v of col) expect(Number.isNaN(v) || Number.isFinite(v)).toBe(true);
        }
      }),
      { seed: 13, numRuns: 200 },
    );
  });

  it("readLas with non-ASCII and control text in header descriptions and well name: parses or throws ShalepointError (own case)", () => {
    fc.assert(
      fc.property(lasFileArb, fc.string({ unit: "binary", maxLength: 30 }), (las, junk) => {
        const text = writeLas(las).replace("WELL NAME", junk).replace("CURVE 0", junk);
        readsOrTypedError(text);
      }),
      { seed: 14, numRuns: 200 },
    );
  });

  it("readLas with a row missing or gaining a value: throws ShalepointError naming a line (own case)", () => {
    fc.assert(
      fc.property(lasFileArb.filter((f) => !f.wrap && f.data[0].length >= 2), fc.boolean(), fc.nat(), (las, drop, at) => {
        const lines = writeLas(las).split("\n");
        const first = lines.findIndex((l) => l.startsWith("~A")) + 1;
        const rowLines = lines.length - 1 - first;
        const k = first + (at % rowLines);
        lines[k] = drop ? lines[k].trim().split(/\s+/).slice(0, -1).join(" ") : `${lines[k]} 1.0`;
        try {
          readLas(lines.join("\n"));
          throw new Error("accepted a row of the wrong length");
        } catch (e) {
          expect(e).toBeInstanceOf(ShalepointError);
          expect((e as ShalepointError).details.line).toBeGreaterThan(0);
        }
      }),
      { seed: 15, numRuns: 100 },
    );
  });

  it("safeReadLas never throws on arbitrary text and reports a stable error code (own case)", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 300 }), fc.string({ unit: "binary", maxLength: 300 }), lasFileArb.map((f) => writeLas(f).replace(/\n/g, "\r"))), (text) => {
        const r = safeReadLas(text);
        if (!r.ok) {
          expect(r.error).toBeInstanceOf(ShalepointError);
          expect(r.error.code).not.toBe("E_LAS_INTERNAL");
        }
      }),
      { seed: 16, numRuns: 300 },
    );
  });

  it("readLas refuses a text over maxSizeBytes before parsing it (own case)", () => {
    const text = writeLas(fc.sample(lasFileArb, { seed: 17, numRuns: 1 })[0]);
    expect(() => readLas(text, { maxSizeBytes: text.length - 1 })).toThrow(ShalepointError);
    expect(readLas(text, { maxSizeBytes: text.length }).las.curves.length).toBeGreaterThan(1);
  });

  it("readLas does not modify its options object (frozen input)", () => {
    const options = Object.freeze({ file: "quillon-a1.las", policy: Object.freeze({ allowStepMismatch: true }) });
    const text = writeLas(fc.sample(lasFileArb, { seed: 18, numRuns: 1 })[0]);
    expect(() => readLas(text, options)).not.toThrow();
  });
});
