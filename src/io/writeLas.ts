/**
 * LAS 2.0 writer (Canadian Well Logging Society, LAS Version 2.0, 1992; updates 2014, 2017).
 * Output reads back through {@link readLas} to the same {@link LasFile} (numbers are written
 * in shortest round-trip form unless a fixed precision is asked for).
 */
import { ShalepointError } from "../errors.js";
import type { LasFile, LasHeaderItem } from "./lasTypes.js";

/** Options of {@link writeLas}. */
export interface WriteLasOptions {
  /** Wrap records (index alone on a line, then values packed into lines ≤ 80 characters). Default: `las.wrap`. */
  wrap?: boolean;
  /**
   * Fixed number of decimals for ~A values (0–15). Default: shortest text that reads back to
   * the identical double (`String(x)`), which makes read → write → read exact.
   */
  precision?: number;
}

/** Longest line LAS 2.0 allows in wrapped data. */
const WRAP_WIDTH = 80;

/** 10^0 … 10^6, exact. */
const P10 = [1, 10, 100, 1000, 10000, 100000, 1000000];

/** "0000" … "9999" etc.: the zero-padded fractional digits for 1 to 6 decimals, built on first use. */
const FRACTION_DIGITS: (string[] | undefined)[] = [];

function fractionDigits(d: number): string[] {
  let t = FRACTION_DIGITS[d];
  if (t === undefined) {
    t = new Array<string>(P10[d]);
    for (let k = 0; k < P10[d]; k++) t[k] = String(k).padStart(d, "0");
    FRACTION_DIGITS[d] = t;
  }
  return t;
}

/**
 * Fixed-decimal text, byte for byte what `x.toFixed(decimals)` gives (ECMAScript
 * Number.prototype.toFixed: the integer n nearest to x·10^d, the larger on a tie, written with
 * the point moved d places; "-" for x < 0, so −0.00001 → "-0.0000" and −0 → "0.0000"), only
 * faster for the common case. Fast path for 1 ≤ d ≤ 4 and |x| < 10^6: y = |x|·10^d is then
 * below 10^10 < 2^34, so the one rounding of the product is at most 2^−20 ≈ 9.5e−7 away
 * from the exact |x|·10^d; when y's fraction is more than 1e−4 away from one half, Math.round(y) is
 * the same integer as the exact rounding. Everything else (ties, large numbers, NaN, ±∞,
 * other d) goes to `toFixed` itself.
 * @param x any number
 * @param decimals digits after the point, integer 0–100 (the fast path covers 1–4; typical 4)
 * @returns the same string as `x.toFixed(decimals)`
 * @throws RangeError as `toFixed` does for decimals outside 0–100
 * @example formatFixedDecimals(5432.123456, 4) // "5432.1235"
 * @example formatFixedDecimals(-0.00001, 4) // "-0.0000" (as toFixed)
 */
export function formatFixedDecimals(x: number, decimals: number): string {
  if (decimals >= 1 && decimals <= 4 && Number.isInteger(decimals)) {
    const neg = x < 0;
    const ax = neg ? -x : x;
    if (ax < 1e6) {
      const scale = P10[decimals];
      const y = ax * scale;
      const r = Math.round(y);
      const half = y - Math.floor(y) - 0.5;
      if (half > 1e-4 || half < -1e-4) {
        const frac = r % scale;
        const text = String((r - frac) / scale) + "." + fractionDigits(decimals)[frac];
        return neg ? "-" + text : text;
      }
    }
  }
  return x.toFixed(decimals);
}

/**
 * Fixed-decimal ASCII bytes: put the text of {@link formatFixedDecimals}(x, decimals) — the
 * same characters as `x.toFixed(decimals)` — into `buf` from index `at`, when x is on the
 * fast path (1 ≤ decimals ≤ 4, |x| < 10^6, not within 1e−4 of a rounding tie); otherwise
 * write nothing and return −1 so the caller can fall back to the string.
 * @param buf output bytes; needs at least 12 free bytes from `at`
 * @param at index of the first byte to write
 * @param x value (typical 5432.123456)
 * @param decimals digits after the point (typical 4)
 * @returns the index after the last byte written, or −1 when nothing was written
 * @throws nothing
 * @example writeFixedDecimalsAscii(new Uint8Array(16), 0, -2.5, 4) // 7 (bytes "-2.5000")
 */
export function writeFixedDecimalsAscii(buf: Uint8Array, at: number, x: number, decimals: number): number {
  if (!(decimals >= 1 && decimals <= 4)) return -1;
  const neg = x < 0;
  const ax = neg ? -x : x;
  if (!(ax < 1e6)) return -1;
  const scale = P10[decimals];
  const y = ax * scale;
  const half = y - Math.floor(y) - 0.5;
  if (!(half > 1e-4 || half < -1e-4)) return -1;
  const r = Math.round(y); // < 10^10: exact integer arithmetic below
  const fracExact = r % scale;
  // both parts fit in 32-bit integers (whole ≤ 10^6, frac < 10^4)
  let whole = ((r - fracExact) / scale) | 0;
  let frac = fracExact | 0;
  if (neg) buf[at++] = 45; // "-"
  // integer part: digits counted first, then written from the right
  const digits = whole < 10 ? 1 : whole < 100 ? 2 : whole < 1000 ? 3 : whole < 10000 ? 4 : whole < 100000 ? 5 : whole < 1000000 ? 6 : 7;
  for (let k = at + digits - 1; k >= at; k--) {
    const q = (whole / 10) | 0;
    buf[k] = 48 + whole - q * 10;
    whole = q;
  }
  at += digits;
  buf[at++] = 46; // "."
  for (let k = at + decimals - 1; k >= at; k--) {
    const q = (frac / 10) | 0;
    buf[k] = 48 + frac - q * 10;
    frac = q;
  }
  return at + decimals;
}

/** Append ASCII text (numbers, the NULL value) to `buf` at `at`; returns the new end. */
function putAscii(buf: Uint8Array, at: number, text: string): number {
  for (let k = 0; k < text.length; k++) buf[at++] = text.charCodeAt(k);
  return at;
}

/**
 * Text that reads back to exactly `x`. Fast path for short decimals (at most 6 decimals and
 * |x·10^k| < 2^53): with y = x·10^k an integer and y / 10^k === x, the decimal text of y with
 * the point moved k places converts back to x (one correctly rounded division of exactly
 * representable doubles — the same fast path the reader uses). Otherwise `String(x)`.
 */
function formatNumber(x: number, precision: number | undefined): string {
  if (precision !== undefined) return formatFixedDecimals(x, precision);
  if (Object.is(x, -0)) return "-0";
  for (let k = 0; k <= 6; k++) {
    const y = x * P10[k];
    if (Number.isInteger(y) && Math.abs(y) < 9007199254740992) {
      if (y / P10[k] !== x) break;
      if (k === 0) return String(y);
      const neg = y < 0;
      let d = String(neg ? -y : y);
      // x·10^k can land on an integer one k late (51.2345·10^4 = 512344.99999999994), so
      // drop trailing zeros: "51.23450" and "51.2345" are the same decimal number.
      let kk = k;
      let end = d.length;
      while (kk > 0 && d.charCodeAt(end - 1) === 48) {
        end--;
        kk--;
      }
      d = d.slice(0, end);
      if (kk === 0) return (neg ? "-" : "") + d;
      if (d.length <= kk) d = "0".repeat(kk - d.length + 1) + d;
      return (neg ? "-" : "") + d.slice(0, d.length - kk) + "." + d.slice(d.length - kk);
    }
  }
  return String(x);
}

function checkItem(item: LasHeaderItem, section: string): void {
  const where = `${section} ${item.mnemonic}`;
  const bad = (param: string, value: string, allowed: string): never => {
    throw new ShalepointError("E_LAS_WRITE_HEADER", `cannot write ${where}: ${param} would not read back`, {
      param,
      value,
      allowed,
    });
  };
  if (item.mnemonic.trim().length === 0 || /[.\s]/.test(item.mnemonic.trim()) || item.mnemonic.trim() !== item.mnemonic) {
    bad("mnemonic", item.mnemonic, "non-empty, no dot, no blanks");
  }
  if (/\s/.test(item.unit)) bad("unit", item.unit, "no blanks");
  if (/[\r\n]/.test(item.value) || item.value.trim() !== item.value) bad("value", item.value, "one line, no leading/trailing blanks");
  if (/[:\r\n]/.test(item.description) || item.description.trim() !== item.description) {
    bad("description", item.description, "one line, no ':' and no leading/trailing blanks");
  }
}

function headerLines(items: LasHeaderItem[], section: string): string[] {
  const rows = items.map((it) => {
    checkItem(it, section);
    return { left: `${it.mnemonic}.${it.unit}`, value: it.value, description: it.description };
  });
  const wLeft = Math.max(0, ...rows.map((r) => r.left.length));
  const wValue = Math.max(0, ...rows.map((r) => r.value.length));
  return rows.map((r) => {
    const text = ` ${r.left.padEnd(wLeft)}  ${r.value.padStart(wValue)} : ${r.description}`;
    return text.replace(/\s+$/, "");
  });
}

/** Put an item's value in place (or append it) without touching the caller's array. */
function withItem(items: LasHeaderItem[], mnemonic: string, make: () => LasHeaderItem, replace: boolean): LasHeaderItem[] {
  const i = items.findIndex((it) => it.mnemonic.toUpperCase() === mnemonic);
  if (i === -1) return [...items, make()];
  if (!replace) return items;
  const out = items.slice();
  out[i] = { ...items[i], value: make().value };
  return out;
}

/**
 * Write a {@link LasFile} as LAS 2.0 text.
 *
 * Sections in the standard's order `~V ~W ~C ~P ~O ~A`; `~P` and `~O` only when not empty.
 * `WRAP` in `~V` is set to match the layout written. If `~W` lacks STRT, STOP, STEP or NULL,
 * they are added from the data (STEP = the common index step, or 0 when irregular). NaN is
 * written as the NULL value. Wrapped layout: each record starts with the index alone on its
 * line, then the other values packed into lines of at most 80 characters.
 *
 * @param las the file to write (not modified)
 * @param options `wrap` (default `las.wrap`), `precision` (fixed decimals 0–15; default
 *   shortest round-trip text, which makes read → write → read exact)
 * @returns the LAS text, lines ending in `\n`
 * @throws ShalepointError `E_LAS_WRITE_SHAPE` when curves and data disagree in count or
 *   length; `E_LAS_WRITE_VALUE` for ±Infinity; `E_LAS_WRITE_HEADER` for a header item that
 *   would not read back (a dot or blank in a mnemonic, a blank in a unit, a ':' in a
 *   description); `E_RANGE` for a bad precision
 * @example
 * writeLas(readLas(text).las) // text that readLas turns back into the same LasFile
 * Reference: Canadian Well Logging Society (1992), LAS Version 2.0 — A Digital Standard for Logging Data.
 */
export function writeLas(las: LasFile, options: WriteLasOptions = {}): string {
  const wrap = options.wrap ?? las.wrap;
  const precision = options.precision;
  if (precision !== undefined && !(Number.isInteger(precision) && precision >= 0 && precision <= 15)) {
    throw new ShalepointError("E_RANGE", "precision must be an integer from 0 to 15", { param: "precision", value: precision, allowed: "0…15" });
  }
  const nCurves = las.curves.length;
  if (nCurves === 0 || las.data.length !== nCurves) {
    throw new ShalepointError("E_LAS_WRITE_SHAPE", "curves and data columns differ in number", {
      param: "data",
      value: `${nCurves} curves, ${las.data.length} columns`,
      hint: "LasFile.data needs one array per ~C curve, index first.",
    });
  }
  const nRows = las.data[0].length;
  for (let j = 1; j < nCurves; j++) {
    if (las.data[j].length !== nRows) {
      throw new ShalepointError("E_LAS_WRITE_SHAPE", `curve ${las.curves[j].mnemonic} has a different length from the index`, {
        param: `data[${j}]`,
        value: `${las.data[j].length} vs ${nRows}`,
      });
    }
  }
  const nullText = formatNumber(las.nullValue, undefined);
  const index = las.data[0];
  const indexUnit = las.curves[0].unit;

  // ---- header sections ----------------------------------------------------------------------
  let version = withItem(las.version, "VERS", () => ({ mnemonic: "VERS", unit: "", value: "2.0", description: "LAS format version 2.0" }), false);
  version = withItem(version, "WRAP", () => ({ mnemonic: "WRAP", unit: "", value: wrap ? "YES" : "NO", description: wrap ? "records span lines" : "one line per index step" }), true);

  let well = las.well;
  if (nRows > 0) {
    well = withItem(well, "STRT", () => ({ mnemonic: "STRT", unit: indexUnit, value: formatNumber(index[0], undefined), description: "first index value" }), false);
    well = withItem(well, "STOP", () => ({ mnemonic: "STOP", unit: indexUnit, value: formatNumber(index[nRows - 1], undefined), description: "last index value" }), false);
    well = withItem(well, "STEP", () => ({ mnemonic: "STEP", unit: indexUnit, value: formatNumber(commonStep(index), undefined), description: "index step (0 = irregular)" }), false);
  }
  well = withItem(well, "NULL", () => ({ mnemonic: "NULL", unit: "", value: nullText, description: "missing value" }), false);

  const out: string[] = [];
  out.push("~Version");
  out.push(...headerLines(version, "~V"));
  out.push("~Well");
  out.push(...headerLines(well, "~W"));
  out.push("~Curves");
  out.push(...headerLines(las.curves, "~C"));
  if (las.parameters.length > 0) {
    out.push("~Parameters");
    out.push(...headerLines(las.parameters, "~P"));
  }
  if (las.other.length > 0) {
    out.push("~Other");
    for (const line of las.other.split("\n")) {
      const t = line.trim();
      if (t.length === 0 || t.startsWith("#") || t.startsWith("~")) {
        throw new ShalepointError("E_LAS_WRITE_HEADER", "~O line would not read back (blank, '#' or '~' first)", { param: "other", value: line });
      }
      out.push(line);
    }
  }
  out.push("~A");

  // ---- data: format every value into one byte column per curve (no per-value strings), then
  // pad each column to its widest text. Every character is ASCII, so bytes = characters.
  const cols: { bytes: Uint8Array; end: Int32Array }[] = [];
  const widths: number[] = [];
  for (let j = 0; j < nCurves; j++) {
    const col = las.data[j];
    let bytes = new Uint8Array(Math.max(64, nRows * 12));
    const end = new Int32Array(nRows);
    let at = 0;
    let w = 0;
    for (let i = 0; i < nRows; i++) {
      if (bytes.length - at < 64) {
        const bigger = new Uint8Array(bytes.length * 2);
        bigger.set(bytes.subarray(0, at));
        bytes = bigger;
      }
      const start = at;
      const x = col[i];
      if (Number.isNaN(x)) at = putAscii(bytes, at, nullText);
      else if (!Number.isFinite(x)) {
        throw new ShalepointError("E_LAS_WRITE_VALUE", `curve ${las.curves[j].mnemonic} holds an infinite value`, {
          param: las.curves[j].mnemonic,
          row: i + 1,
          value: String(x),
          hint: "Replace ±Infinity by NaN (written as NULL) before writing.",
        });
      } else {
        const fast = precision === undefined ? -1 : writeFixedDecimalsAscii(bytes, at, x, precision);
        if (fast >= 0) at = fast;
        else {
          const text = formatNumber(x, precision);
          if (bytes.length - at < text.length) {
            const bigger = new Uint8Array((bytes.length + text.length) * 2);
            bigger.set(bytes.subarray(0, at));
            bytes = bigger;
          }
          at = putAscii(bytes, at, text);
        }
      }
      end[i] = at;
      if (at - start > w) w = at - start;
    }
    cols.push({ bytes, end });
    widths.push(w);
  }
  const lines: string[] = [];
  if (!wrap) {
    // One buffer for the whole table: each row is every column right-aligned, one blank apart.
    let rowWidth = nCurves; // blanks and the newline
    for (const w of widths) rowWidth += w;
    const table = new Uint8Array(nRows * rowWidth).fill(32);
    for (let j = 0, offset = 0; j < nCurves; j++) {
      const { bytes, end } = cols[j];
      const w = widths[j];
      let start = 0;
      for (let i = 0; i < nRows; i++) {
        const len = end[i] - start;
        table.set(bytes.subarray(start, end[i]), i * rowWidth + offset + w - len);
        start = end[i];
      }
      offset += w + 1;
    }
    for (let i = 1; i <= nRows; i++) table[i * rowWidth - 1] = 10; // "\n"
    return out.join("\n") + "\n" + asciiText(table);
  }
  const text = (j: number, i: number): string => String.fromCharCode(...cols[j].bytes.subarray(i === 0 ? 0 : cols[j].end[i - 1], cols[j].end[i]));
  for (let i = 0; i < nRows; i++) {
    lines.push(text(0, i));
    let s = "";
    for (let j = 1; j < nCurves; j++) {
      const v = text(j, i).padStart(Math.min(widths[j], WRAP_WIDTH - 1));
      if (s.length > 0 && s.length + 1 + v.length > WRAP_WIDTH) {
        lines.push(s);
        s = "";
      }
      s = s.length === 0 ? v : s + " " + v;
    }
    if (s.length > 0) lines.push(s);
  }
  return out.join("\n") + "\n" + (lines.length > 0 ? lines.join("\n") + "\n" : "");
}

const ASCII_DECODER = new TextDecoder();

/** ASCII bytes as a string (UTF-8 decoding is the identity on ASCII). */
function asciiText(bytes: Uint8Array): string {
  return ASCII_DECODER.decode(bytes);
}

/** The step shared by all consecutive index values, or 0 when sampling is irregular. */
function commonStep(index: ArrayLike<number>): number {
  if (index.length < 2) return 0;
  const step = index[1] - index[0];
  const tol = 1e-6 * Math.abs(step);
  for (let i = 2; i < index.length; i++) {
    if (Math.abs(index[i] - index[i - 1] - step) > tol) return 0;
  }
  return Number(step.toPrecision(12)); // drop binary noise such as 0.09999999999999432
}
