/**
 * Hostile-input checks that cut across modules: text from files reaching HTML is escaped,
 * oversized or binary input files are refused before they are read.
 *
 * HTML escaping rule (common practice, no source beyond the HTML syntax itself): in text and
 * attribute values the five characters & < > " ' are the ones that can end an element,
 * attribute or entity; escaping them to entities keeps free text inert.
 */
import { describe, expect, it, afterAll } from "vitest";
import fc from "fast-check";
import { mkdtempSync, rmSync, truncateSync, writeFileSync, openSync, closeSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { escapeHtml } from "../../src/present/escapeHtml.js";
import { pickerPageHtml } from "../../src/picker/pageHtml.js";
import { readInputText } from "../../src/study/readInputFile.js";
import { ShalepointError } from "../../src/errors.js";

const unescape = (s: string): string =>
  s.replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&#39;/g, "'").replace(/&amp;/g, "&");

const hostileText = fc.oneof(
  fc.string({ maxLength: 60 }),
  fc.string({ unit: "binary", maxLength: 60 }),
  fc.constantFrom('</title><script>alert(1)</script>', '"><img src=x onerror=alert(1)>', "'; DROP", "&amp;&lt;", "<!--", "]]>", "Quillon A-1 <sidetrack>"),
);

describe("escapeHtml (property-based)", () => {
  it("escapeHtml leaves none of & < > \" ' unescaped and round-trips through entity decoding (common practice, no source)", () => {
    fc.assert(
      fc.property(hostileText, (s) => {
        const e = escapeHtml(s);
        expect(/[<>"']/.test(e)).toBe(false);
        expect(/&(?!(amp|lt|gt|quot|#39);)/.test(e)).toBe(false);
        expect(unescape(e)).toBe(s);
      }),
      { seed: 91, numRuns: 300 },
    );
  });

  it("pickerPageHtml shows a hostile well name only escaped: no extra element or script appears (common practice, no source)", () => {
    const plain = pickerPageHtml({ wellName: "Quillon A-1", caution: "c", bundle: "", nonce: "n0" });
    const count = (html: string, re: RegExp) => (html.match(re) ?? []).length;
    fc.assert(
      fc.property(hostileText, (name) => {
        const html = pickerPageHtml({ wellName: name, caution: "c", bundle: "", nonce: "n0" });
        expect(count(html, /<script/gi)).toBe(count(plain, /<script/gi));
        expect(count(html, /<[a-z!/]/gi)).toBe(count(plain, /<[a-z!/]/gi));
        expect(html).toContain(escapeHtml(name));
      }),
      { seed: 92, numRuns: 200 },
    );
  });
});

describe("readInputText (hostile files)", () => {
  const dir = mkdtempSync(join(tmpdir(), "shalepoint-hostile-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("readInputText refuses a 2 GB file from its size alone, before reading it (sparse file; own case)", () => {
    const path = join(dir, "huge.las");
    closeSync(openSync(path, "w"));
    truncateSync(path, 2 * 1024 ** 3); // sparse: no 2 GB is written to disk
    try {
      readInputText(path, { param: "wells[0].las" });
      throw new Error("a 2 GB file was accepted");
    } catch (e) {
      expect(e).toBeInstanceOf(ShalepointError);
      expect((e as ShalepointError).code).toBe("E_FILE_TOO_LARGE");
      expect((e as ShalepointError).details.value).toBe(2 * 1024 ** 3);
    }
  });

  it("readInputText refuses a binary file (NUL bytes in the first 64 KiB) with E_FILE_BINARY (own case)", () => {
    const path = join(dir, "binary.las");
    writeFileSync(path, Buffer.from([0x7e, 0x56, 0x00, 0x01, 0xff, 0x00, 0x41]));
    expect(() => readInputText(path)).toThrow(expect.objectContaining({ code: "E_FILE_BINARY" }));
  });

  it("readInputText reads a small text file and reports its size in bytes (own case)", () => {
    const path = join(dir, "small.csv");
    writeFileSync(path, "tvd_ft,pressure_psi\n9000,4100\n");
    const r = readInputText(path);
    expect(r.sizeBytes).toBe(30);
    expect(r.text.split("\n")[1]).toBe("9000,4100");
  });
});
