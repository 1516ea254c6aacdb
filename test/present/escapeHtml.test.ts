/**
 * escapeHtml and jsonForScript. Expected strings follow the character references of the
 * HTML Living Standard, §13.1.4 and §13.5 "Named character references" (&lt; &gt; &amp;
 * &quot;; &#39; is the decimal reference to U+0027) — label: published.
 */
import { describe, expect, it } from "vitest";
import { escapeHtml, escapePlotlyText, jsonForScript } from "../../src/present/index.js";

describe("escapeHtml", () => {
  it("neutralises a <script> element", () => {
    // HTML Living Standard, named character references (published)
    expect(escapeHtml('<script>alert("x")</script>')).toBe("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt;");
  });

  it("escapes double and single quotes for attribute values", () => {
    expect(escapeHtml(`Quillon "A-1" O'Neil`)).toBe("Quillon &quot;A-1&quot; O&#39;Neil");
  });

  it("escapes & first, so existing references are shown literally, not decoded", () => {
    expect(escapeHtml("&lt; & &amp;")).toBe("&amp;lt; &amp; &amp;amp;");
  });

  it("leaves other text untouched, including units and non-ASCII", () => {
    expect(escapeHtml("DT µs/ft, ohm·m, 10 000 ft")).toBe("DT µs/ft, ohm·m, 10 000 ft");
  });

  it("turns non-strings into text and null/undefined into the empty string", () => {
    expect(escapeHtml(12.5)).toBe("12.5");
    expect(escapeHtml(null)).toBe("");
    expect(escapeHtml(undefined)).toBe("");
  });
});

describe("jsonForScript", () => {
  it("cannot close a script element and parses back to the same value", () => {
    const value = { name: "</script><script>alert(1)</script>", note: "<!-- a & b -->", sep: "\u2028\u2029" };
    const json = jsonForScript(value);
    expect(json).not.toMatch(/[<>&\u2028\u2029]/);
    expect(JSON.parse(json)).toEqual(value); // ECMA-404: \uXXXX escapes are valid JSON (published)
  });

  it("is pure ASCII, so units survive a page without a declared character set", () => {
    const value = { unit: "DT (µs/ft)", r: "ohm·m", minus: "MD − TVD", emoji: "\u{1F600}" };
    const json = jsonForScript(value);
    expect(json).toMatch(/^[\x20-\x7e]*$/);
    expect(json).toContain("\\u00b5"); // µ MICRO SIGN is U+00B5 (Unicode Standard, published)
    expect(JSON.parse(json)).toEqual(value);
  });

  it("writes NaN and Infinity as null, like JSON.stringify", () => {
    expect(jsonForScript([1, NaN, Infinity])).toBe("[1,null,null]");
    expect(jsonForScript(undefined)).toBe("null");
  });
});

describe("escapePlotlyText", () => {
  it("escapes markup and writes quotes as numeric references (HTML Living Standard §13.1.4)", () => {
    expect(escapePlotlyText('A "B" <i>&\'')).toBe("A &#34;B&#34; &lt;i&gt;&amp;&#39;");
    expect(escapePlotlyText(undefined)).toBe("");
  });
});
