/**
 * readLas / safeReadLas against the Canadian Well Logging Society LAS 2.0 standard (1992;
 * rules as summarised in CHECK-VALUES §12 — published), the independent npm reader las-js
 * 3.4.2, and ECMAScript Number() (ECMA-262 StringToNumber — published standard) for the
 * number scanner. One fixture per file quirk, in test/fixtures/las/, named after the quirk.
 * Fixture data are invented (fictional Quillon Basin).
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { Las } from "las-js";
import { readLas, safeReadLas, LAS_POLICY_FLAGS, LAS_POLICY_STRICT, LAS_POLICY_LENIENT, type LasPolicyFlag } from "../../src/io/readLas.js";
import { ShalepointError } from "../../src/errors.js";

const dir = new URL("../fixtures/las/", import.meta.url);
const fixture = (name: string): string => readFileSync(new URL(name, dir), "latin1");

/** Run readLas and return the ShalepointError it throws. */
function errorOf(name: string, policy?: Partial<Record<LasPolicyFlag, boolean>>): ShalepointError {
  try {
    readLas(fixture(name), { file: name, policy });
  } catch (e) {
    expect(e).toBeInstanceOf(ShalepointError);
    return e as ShalepointError;
  }
  throw new Error(`${name} was read without error`);
}

const col = (las: ReturnType<typeof readLas>["las"], m: string): Float64Array => las.data[las.curves.findIndex((c) => c.mnemonic === m)];

describe("readLas on good fixtures", () => {
  it("readLas(basic.las): header items split at first dot / first space / last colon (LAS 2.0, published)", () => {
    const { las, warnings } = readLas(Object.freeze(fixture("basic.las")) as string, { file: "basic.las" });
    expect(warnings).toEqual([]);
    expect(las.wrap).toBe(false);
    expect(las.nullValue).toBe(-999.25);
    expect(las.curves.map((c) => c.mnemonic)).toEqual(["DEPT", "GR", "DT", "RHOB", "RDEP", "CALI"]);
    expect(las.curves.map((c) => c.unit)).toEqual(["F", "GAPI", "US/F", "G/C3", "OHMM", "IN"]);
    const item = (m: string) => las.well.find((w) => w.mnemonic === m)!;
    // TIME value holds a colon: description is after the LAST colon (LAS 2.0, published)
    expect(item("TIME")).toMatchObject({ unit: "", value: "14:30", description: "log time", line: 17 });
    expect(item("DATE").value).toBe("13/05/2026");
    // "FLD ." — mnemonic trimmed, empty unit (LAS 2.0, published)
    expect(item("FLD")).toMatchObject({ unit: "", value: "QUILLON BASIN", description: "field" });
    expect(item("EKB")).toMatchObject({ unit: "F", value: "82.0" });
    expect(las.parameters.map((p) => p.mnemonic)).toEqual(["SWDEN", "BHT"]);
    expect(las.other).toBe(" Invented demonstration data for the fictional Quillon Basin.\n Not a real well.");
    // values as printed in the fixture; NULL (-999.25 and -999.2500, compared numerically) → NaN
    expect(Array.from(las.data[0])).toEqual([9000, 9000.5, 9001, 9001.5, 9002, 9002.5]);
    expect(Array.from(col(las, "GR"))).toEqual([75, 87.88, 94.71, 92.26, NaN, 67.98]);
    expect(Array.from(col(las, "RHOB"))).toEqual([2.31, 2.334, NaN, 2.36, 2.355, 2.34]);
    expect(col(las, "CALI")[3]).toBe(10.5);
  });

  it("readLas(crlf.las) gives the same file as basic.las (CRLF tolerated)", () => {
    const a = readLas(fixture("basic.las")).las;
    const b = readLas(fixture("crlf.las")).las;
    expect(b).toEqual(a);
  });

  it("readLas(tabs-and-blank-lines.las): tabs, trailing spaces and blank lines change nothing", () => {
    const a = readLas(fixture("basic.las")).las;
    const b = readLas(fixture("tabs-and-blank-lines.las")).las;
    expect(b.data).toEqual(a.data);
    expect(b.curves.map(({ mnemonic, unit, value, description }) => ({ mnemonic, unit, value, description }))).toEqual(
      a.curves.map(({ mnemonic, unit, value, description }) => ({ mnemonic, unit, value, description })),
    );
  });

  it("readLas(null-9999.las): NULL -9999 matches -9999 and -9999.0 numerically", () => {
    const { las } = readLas(fixture("null-9999.las"));
    expect(las.nullValue).toBe(-9999);
    expect(col(las, "DT")[1]).toBeNaN();
    expect(col(las, "CALI")[3]).toBeNaN();
    expect(col(las, "DT")[0]).toBe(124);
  });

  it("readLas(wrapped.las): WRAP YES, index alone then values over two lines (LAS 2.0, published)", () => {
    const { las } = readLas(fixture("wrapped.las"));
    expect(las.wrap).toBe(true);
    expect(Array.from(las.data[0])).toEqual([9100, 9100.5, 9101]);
    expect(Array.from(col(las, "RDEP"))).toEqual([1.5, NaN, 1.132]);
    expect(Array.from(col(las, "CALI"))).toEqual([8.6, 8.6, 8.6]);
  });

  it("readLas(negative-step.las): STRT 1670, STOP 1660, STEP -0.125 → 81 rows (CHECK-VALUES §12, own case)", () => {
    const { las, warnings } = readLas(fixture("negative-step.las"));
    expect(warnings).toEqual([]);
    expect(las.data[0].length).toBe(81);
    expect(las.data[0][0]).toBe(1670);
    expect(las.data[0][80]).toBe(1660);
    expect(las.data[0][1]).toBe(1669.875);
  });

  it("readLas(irregular-step.las): STEP 0 means irregular sampling, only monotonicity checked (LAS 2.0, published)", () => {
    const { las } = readLas(fixture("irregular-step.las"));
    expect(Array.from(las.data[0])).toEqual([5000, 5001, 5004.5, 5007.5]);
  });

  it("readLas(duplicate-mnemonic.las): second DT kept as DT:2 with a warning naming line 16", () => {
    const { las, warnings } = readLas(fixture("duplicate-mnemonic.las"));
    expect(las.curves.map((c) => c.mnemonic)).toEqual(["DEPT", "DT", "DT:2"]);
    expect(Array.from(las.data[2])).toEqual([121.0, 120.2, 119.7]);
    expect(warnings).toHaveLength(1);
    expect(warnings[0].code).toBe("W_LAS_DUPLICATE_MNEMONIC");
    expect(warnings[0].message).toContain("line 16");
  });
});

describe("readLas errors: code and 1-based line per fixture", () => {
  const cases: [string, string, number][] = [
    // [fixture, code, line] — lines counted in the fixture files by hand
    ["empty.las", "E_LAS_EMPTY", 1],
    ["binary.las", "E_LAS_BINARY", 3],
    ["missing-a-section.las", "E_LAS_MISSING_DATA", 15],
    ["missing-c-section.las", "E_LAS_MISSING_CURVES", 13],
    ["column-count-mismatch.las", "E_LAS_COLUMN_COUNT", 19],
    ["non-numeric-data.las", "E_LAS_NON_NUMERIC", 18],
    ["non-monotonic-depth.las", "E_LAS_NON_MONOTONIC", 19],
    ["step-mismatch.las", "E_LAS_STEP_MISMATCH", 19],
    ["version-3.las", "E_LAS_VERSION", 2],
    ["version-1-2.las", "E_LAS_VERSION", 2],
    ["a-not-last.las", "E_LAS_A_NOT_LAST", 19],
    ["section-before-v.las", "E_LAS_V_NOT_FIRST", 1],
    ["wrapped-short-record.las", "E_LAS_COLUMN_COUNT", 22],
    ["missing-colon.las", "E_LAS_HEADER_SYNTAX", 10],
    ["unknown-section.las", "E_LAS_UNKNOWN_SECTION", 16],
    ["missing-null-item.las", "E_LAS_MISSING_ITEM", 4], // reported at the ~W line
    ["bad-wrap-value.las", "E_LAS_WRAP", 3],
  ];
  for (const [name, code, line] of cases) {
    it(`readLas(${name}) throws ${code} at line ${line}`, () => {
      const e = errorOf(name);
      expect(e.code).toBe(code);
      expect(e.details.line).toBe(line);
      expect(e.details.file).toBe(name);
      expect(e.message).toContain(`${name}, line ${line}`);
      if (code !== "E_LAS_EMPTY" && code !== "E_LAS_BINARY") {
        const raw = fixture(name).split("\n")[line - 1];
        expect(e.details.rawLine).toBe(raw);
      }
    });
  }

  it("readLas(non-numeric-data.las) names the bad token", () => {
    expect(errorOf("non-numeric-data.las").details.value).toBe("5O.1");
  });

  it("readLas refuses a text over maxSizeBytes before parsing", () => {
    const text = fixture("basic.las");
    try {
      readLas(text, { maxSizeBytes: 100 });
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_LAS_TOO_LARGE");
      expect((e as ShalepointError).message).toContain("limit of 100 bytes");
    }
  });

  it("readLas flags a NULL index at its line", () => {
    const text = fixture("irregular-step.las").replace("5001.0 81.2", "-999.25 81.2");
    try {
      readLas(text);
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_LAS_NULL_INDEX");
      expect((e as ShalepointError).details.line).toBe(18);
    }
  });

  it("readLas flags STRT disagreeing with the first index", () => {
    const text = fixture("negative-step.las").replace("STRT.F         1670.0", "STRT.F         1671.0");
    try {
      readLas(text);
      expect.unreachable();
    } catch (e) {
      expect((e as ShalepointError).code).toBe("E_LAS_STRT_STOP_MISMATCH");
      expect((e as ShalepointError).details.line).toBe(17); // the first data row (~A is line 16)
    }
  });
});

describe("lenient policies (LAS_POLICY_FLAGS)", () => {
  const relaxes: Record<LasPolicyFlag, [string, string]> = {
    allowStepMismatch: ["step-mismatch.las", "W_LAS_STEP_MISMATCH"],
    allowVersion1_2: ["version-1-2.las", "W_LAS_VERSION_1_2"],
    allowNonMonotonicDepth: ["non-monotonic-depth.las", "W_LAS_NON_MONOTONIC"],
    allowMissingColon: ["missing-colon.las", "W_LAS_MISSING_COLON"],
    allowUnknownSections: ["unknown-section.las", "W_LAS_UNKNOWN_SECTION"],
  };
  it("every flag in the table has a fixture and is off in LAS_POLICY_STRICT, on in LAS_POLICY_LENIENT", () => {
    expect(Object.keys(relaxes).sort()).toEqual(Object.keys(LAS_POLICY_FLAGS).sort());
    expect(Object.keys(LAS_POLICY_STRICT).sort()).toEqual(Object.keys(LAS_POLICY_FLAGS).sort());
    for (const f of Object.keys(LAS_POLICY_FLAGS) as LasPolicyFlag[]) {
      expect(LAS_POLICY_STRICT[f]).toBe(false);
      expect(LAS_POLICY_LENIENT[f]).toBe(true);
    }
  });
  for (const [flag, [name, warning]] of Object.entries(relaxes) as [LasPolicyFlag, [string, string]][]) {
    it(`readLas(${name}, { ${flag} }) reads and warns ${warning}`, () => {
      const { las, warnings } = readLas(fixture(name), { policy: { [flag]: true } });
      expect(warnings.map((w) => w.code)).toContain(warning);
      expect(las.data[0].length).toBeGreaterThan(1);
    });
  }
  it("allowNonMonotonicDepth keeps the rows in file order", () => {
    const { las } = readLas(fixture("non-monotonic-depth.las"), { policy: { allowNonMonotonicDepth: true } });
    expect(Array.from(las.data[0])).toEqual([1000, 1001, 1000.5, 1003]);
  });
  it("no policy relaxes version 3.0", () => {
    expect(errorOf("version-3.las", LAS_POLICY_LENIENT).code).toBe("E_LAS_VERSION");
  });
});

describe("safeReadLas", () => {
  it("safeReadLas returns ok:false with the error instead of throwing", () => {
    const r = safeReadLas(fixture("column-count-mismatch.las"), { file: "x.las" });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.code).toBe("E_LAS_COLUMN_COUNT");
      expect(r.error.details.line).toBe(19);
    }
  });
  it("safeReadLas returns ok:true with las and warnings", () => {
    const r = safeReadLas(fixture("duplicate-mnemonic.las"));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.warnings[0].code).toBe("W_LAS_DUPLICATE_MNEMONIC");
  });
});

describe("readLas number scanner equals Number() on the same tokens (ECMA-262 StringToNumber, published)", () => {
  const head = "~V\nVERS. 2.0 :\nWRAP. NO :\n~W\nSTRT.F 0 :\nSTOP.F 0 :\nSTEP.F 0 :\nNULL. -999.25 :\n~C\nDEPT.F :\nX. :\n~A\n";
  const build = (tokens: string[]): string => {
    // index column 0,1,2,… so STRT/STOP checks pass with STOP patched in
    const rows = tokens.map((t, i) => `${i} ${t}`).join("\n");
    return head.replace("STOP.F 0", `STOP.F ${tokens.length - 1}`) + rows + "\n";
  };
  it("hand-picked tokens: signs, exponents, leading zeros, 17 digits, subnormal, huge", () => {
    const tokens = ["0", "-0", "+1.5", ".5", "5.", "0.000125", "1e-7", "-2.5E+03", "123456789012345678", "0.30000000000000004",
      "4.9e-324", "1.7976931348623157e308", "00012.500", "1E22", "1e23", "9007199254740993", "-999.250000001"];
    const { las } = readLas(build(tokens));
    tokens.forEach((t, i) => expect(Object.is(las.data[1][i], Number(t))).toBe(true));
  });
  it("random doubles written by String, toFixed, toExponential, toPrecision read back as Number() does", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 }), { minLength: 1, maxLength: 40 }),
        fc.integer({ min: 0, max: 3 }),
        fc.integer({ min: 1, max: 17 }),
        (xs, style, digits) => {
          const tokens = xs.map((x) =>
            style === 0 ? String(x) : style === 1 ? x.toFixed(Math.min(digits, 12)) : style === 2 ? x.toExponential(digits - 1) : x.toPrecision(digits),
          );
          const { las } = readLas(build(tokens));
          tokens.forEach((t, i) => {
            const want = Number(t) === -999.25 ? NaN : Number(t);
            expect(Object.is(las.data[1][i], want)).toBe(true);
          });
        },
      ),
      { numRuns: 200, seed: 20260513 },
    );
  });
  it("rejects hex, Infinity and NaN tokens that Number() would accept", () => {
    for (const t of ["0x10", "Infinity", "NaN", "1e400"]) {
      const r = safeReadLas(build(["1", t]));
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.code).toBe("E_LAS_NON_NUMERIC");
    }
  });
});

describe("readLas agrees with the independent reader las-js 3.4.2", () => {
  for (const name of ["null-9999.las", "wrapped.las"]) {
    it(`readLas(${name}) matches las-js header(), wrap() and data() (NULL ↔ NaN)`, async () => {
      const text = fixture(name);
      const { las } = readLas(text);
      const ref = new Las(text, { loadFile: false });
      expect(las.curves.map((c) => c.mnemonic)).toEqual(await ref.header());
      expect(las.wrap).toBe(await ref.wrap());
      const nullText = (await ref.wellParams()).NULL.value;
      expect(las.nullValue).toBe(Number(nullText));
      const rows = await ref.data();
      expect(rows.length).toBe(las.data[0].length);
      rows.forEach((row, i) =>
        row.forEach((v, j) => {
          const mine = las.data[j][i];
          if (Number(v) === Number(nullText)) expect(mine).toBeNaN();
          else expect(mine).toBe(Number(v));
        }),
      );
    });
  }
});
