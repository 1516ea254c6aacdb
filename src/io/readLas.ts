/**
 * LAS 2.0 reader (Canadian Well Logging Society, "LAS Version 2.0: A Digital Standard for
 * Logging Data", 1992; updates 2014 and 2017).
 *
 * Strict by default: anything the standard does not allow raises a {@link ShalepointError}
 * with a stable code, the file name, the 1-based line number and the raw line. Real files
 * that break a rule can be read through named lenient flags ({@link LAS_POLICY_FLAGS});
 * every relaxation is reported back as a returned {@link Warning}, never printed.
 *
 * The `~A` block is parsed by a hand-written number scanner over the string (no split per
 * line) that fills one Float64Array per curve. Decimal tokens of at most 15 significant
 * digits and a power-of-ten scale within ±22 are converted exactly (one correctly rounded
 * multiplication or division of two exactly representable doubles — Clinger 1990,
 * "How to read floating point numbers accurately", PLDI '90, the "fast path"), so the result
 * is bit-identical to `Number(token)`; every other token falls back to `Number()`.
 */
import { ShalepointError, type ErrorDetails, type Warning } from "../errors.js";
import type { LasFile, LasHeaderItem } from "./lasTypes.js";

// ---- policy table --------------------------------------------------------------------------

/**
 * Named lenient policy flags, each with what it relaxes. All are off in the strict default.
 * The type {@link LasPolicy} is built from this table, so a flag name cannot drift from its
 * documentation.
 */
export const LAS_POLICY_FLAGS = {
  allowStepMismatch:
    "STEP, STRT or STOP in ~W disagree with the index column: read the data as it is and warn (W_LAS_STEP_MISMATCH).",
  allowVersion1_2: "VERS 1.2 is read as if it were 2.0, with a warning (W_LAS_VERSION_1_2).",
  allowNonMonotonicDepth:
    "Index not strictly increasing or decreasing: keep the rows in file order and warn (W_LAS_NON_MONOTONIC).",
  allowMissingColon:
    "A ~V/~W/~C/~P line without the ':' before its description: the value runs to the end of the line; warn (W_LAS_MISSING_COLON).",
  allowUnknownSections:
    "Sections other than ~V ~W ~C ~P ~O ~A (e.g. from later LAS versions) are skipped with a warning (W_LAS_UNKNOWN_SECTION).",
} as const;

/** One lenient flag name. */
export type LasPolicyFlag = keyof typeof LAS_POLICY_FLAGS;

/** A reading policy: which rules are relaxed. */
export type LasPolicy = Readonly<Record<LasPolicyFlag, boolean>>;

/** The default: every rule enforced. */
export const LAS_POLICY_STRICT: LasPolicy = Object.freeze({
  allowStepMismatch: false,
  allowVersion1_2: false,
  allowNonMonotonicDepth: false,
  allowMissingColon: false,
  allowUnknownSections: false,
});

/** Everything a field file commonly gets wrong, relaxed (each relaxation still warns). */
export const LAS_POLICY_LENIENT: LasPolicy = Object.freeze({
  allowStepMismatch: true,
  allowVersion1_2: true,
  allowNonMonotonicDepth: true,
  allowMissingColon: true,
  allowUnknownSections: true,
});

/** Default size limit of a LAS text: 500 MB (counted in UTF-16 code units ≈ bytes for ASCII). */
export const LAS_DEFAULT_MAX_SIZE_BYTES = 500_000_000;

/** Options of {@link readLas}. */
export interface ReadLasOptions {
  /** File name used in error messages and warnings. */
  file?: string;
  /** Rules to relax (missing flags stay strict). */
  policy?: Partial<LasPolicy>;
  /** Refuse texts longer than this many characters; default {@link LAS_DEFAULT_MAX_SIZE_BYTES}. */
  maxSizeBytes?: number;
}

/** Result of {@link readLas}. */
export interface ReadLasResult {
  las: LasFile;
  warnings: Warning[];
}

/** Result of {@link safeReadLas}. */
export type SafeReadLasResult =
  | { ok: true; las: LasFile; warnings: Warning[] }
  | { ok: false; error: ShalepointError };

// ---- helpers -------------------------------------------------------------------------------

const SECTION_NAMES: Record<string, string> = {
  V: "~V (version)",
  W: "~W (well)",
  C: "~C (curves)",
  P: "~P (parameters)",
  O: "~O (other)",
  A: "~A (data)",
};

/** Powers of ten exactly representable as doubles (10^0 … 10^22). */
const POW10: number[] = [];
for (let i = 0, p = 1; i <= 22; i++, p *= 10) POW10.push(p);

/** Strict decimal syntax accepted by the fallback path (no hex, no Infinity, no NaN). */
const DECIMAL_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function isSpace(c: number): boolean {
  return c === 32 || c === 9 || c === 13 || c === 12 || c === 11;
}

/** Position of a problem in the text, computed only when an error is raised. */
function lineAt(text: string, offset: number): { line: number; rawLine: string } {
  let line = 1;
  for (let i = text.indexOf("\n"); i !== -1 && i < offset; i = text.indexOf("\n", i + 1)) line++;
  const start = text.lastIndexOf("\n", offset - 1) + 1;
  let end = text.indexOf("\n", offset);
  if (end === -1) end = text.length;
  return { line, rawLine: text.slice(start, end).replace(/\r$/, "") };
}

function findItem(items: LasHeaderItem[], mnemonic: string): LasHeaderItem | undefined {
  const key = mnemonic.toUpperCase();
  return items.find((it) => it.mnemonic.toUpperCase() === key);
}

interface HeaderCtx {
  file?: string;
  /** Raw text of header lines by 1-based line number. */
  raw: Map<number, string>;
  /** Line of each section's `~` line, by section letter. */
  sectionLine: Map<string, number>;
  policy: LasPolicy;
  warnings: Warning[];
}

/**
 * Split one header line `MNEM.UNIT  VALUE : DESCRIPTION`: mnemonic up to the first dot, unit
 * right after the dot up to the first space, description after the last colon, value between.
 */
function parseHeaderLine(raw: string, lineNo: number, ctx: HeaderCtx): LasHeaderItem {
  const s = raw.replace(/\t/g, " ").trim();
  const dot = s.indexOf(".");
  let colon = s.lastIndexOf(":");
  if (dot <= 0 || (colon !== -1 && colon < dot)) {
    throw new ShalepointError("E_LAS_HEADER_SYNTAX", "header line has no 'MNEMONIC.' before its value", {
      file: ctx.file,
      line: lineNo,
      rawLine: raw,
      allowed: "MNEM.UNIT  VALUE : DESCRIPTION",
      hint: "Every ~V/~W/~C/~P line needs a mnemonic followed by a dot.",
    });
  }
  if (colon === -1) {
    if (!ctx.policy.allowMissingColon) {
      throw new ShalepointError("E_LAS_HEADER_SYNTAX", "header line has no ':' before its description", {
        file: ctx.file,
        line: lineNo,
        rawLine: raw,
        allowed: "MNEM.UNIT  VALUE : DESCRIPTION",
        hint: "Add ' :' after the value, or read with policy { allowMissingColon: true }.",
      });
    }
    ctx.warnings.push({ code: "W_LAS_MISSING_COLON", message: `line ${lineNo}: no ':' in header line; value taken to end of line` });
    colon = s.length;
  }
  const mnemonic = s.slice(0, dot).trim();
  let unitEnd = dot + 1;
  while (unitEnd < colon && s.charCodeAt(unitEnd) !== 32) unitEnd++;
  const unit = s.slice(dot + 1, unitEnd);
  const value = s.slice(unitEnd, colon).trim();
  const description = colon < s.length ? s.slice(colon + 1).trim() : "";
  return { mnemonic, unit, value, description, line: lineNo };
}

function headerNumber(item: LasHeaderItem | undefined, name: string, ctx: HeaderCtx): number {
  if (item === undefined) {
    const ln = ctx.sectionLine.get("W");
    throw new ShalepointError("E_LAS_MISSING_ITEM", `~W has no ${name} item`, {
      file: ctx.file,
      line: ln,
      rawLine: ln === undefined ? undefined : ctx.raw.get(ln),
      param: name,
      hint: `LAS 2.0 requires STRT, STOP, STEP and NULL in ~W; add '${name}.<unit>  <value> : <description>'.`,
    });
  }
  const v = DECIMAL_RE.test(item.value) ? Number(item.value) : NaN;
  if (!Number.isFinite(v)) {
    throw new ShalepointError("E_LAS_HEADER_VALUE", `${name} must be a number`, {
      file: ctx.file,
      line: item.line,
      rawLine: ctx.raw.get(item.line!),
      param: name,
      value: item.value,
    });
  }
  return v;
}

// ---- reader --------------------------------------------------------------------------------

/**
 * Read a LAS 2.0 text into a {@link LasFile}.
 *
 * Rules enforced (strict default), with their error codes:
 * - text empty → `E_LAS_EMPTY`; contains NUL bytes or > 10 % control characters in its first
 *   64 KiB → `E_LAS_BINARY`; longer than `maxSizeBytes` → `E_LAS_TOO_LARGE`;
 * - content or a section before `~V` → `E_LAS_V_NOT_FIRST`; `~A` not last → `E_LAS_A_NOT_LAST`;
 *   a section twice → `E_LAS_DUPLICATE_SECTION`; unknown section → `E_LAS_UNKNOWN_SECTION`;
 * - `VERS` not 2.0 → `E_LAS_VERSION`; `WRAP` not YES/NO → `E_LAS_WRAP`; VERS, WRAP, STRT,
 *   STOP, STEP or NULL missing → `E_LAS_MISSING_ITEM`; non-numeric STRT/STOP/STEP/NULL →
 *   `E_LAS_HEADER_VALUE`; malformed header line → `E_LAS_HEADER_SYNTAX`;
 * - no `~C` → `E_LAS_MISSING_CURVES`; no `~A` → `E_LAS_MISSING_DATA`; no rows →
 *   `E_LAS_NO_ROWS`;
 * - a row (or wrapped record) with a number of values ≠ curve count → `E_LAS_COLUMN_COUNT`;
 *   wrapped record not starting with the index alone → `E_LAS_WRAP_LAYOUT`;
 * - non-numeric value → `E_LAS_NON_NUMERIC`; NULL index → `E_LAS_NULL_INDEX`;
 * - index not strictly monotonic → `E_LAS_NON_MONOTONIC`; index steps ≠ STEP (when STEP ≠ 0)
 *   → `E_LAS_STEP_MISMATCH`; first/last index ≠ STRT/STOP → `E_LAS_STRT_STOP_MISMATCH`.
 * Duplicate curve mnemonics are kept and renamed `DT:2`, `DT:3`… with a `W_LAS_DUPLICATE_MNEMONIC`
 * warning. Values equal (numerically) to NULL become NaN. `#` lines are comments anywhere.
 * STEP/STRT/STOP tolerance: |Δ − STEP| ≤ 1e-3·|STEP| (a 0.1 % slack for rounded printouts);
 * with STEP = 0 (irregular) only monotonicity is checked.
 *
 * @param text whole file content (CRLF, tabs, trailing spaces and blank lines tolerated)
 * @param options `file` (for messages), `policy` (lenient flags, see {@link LAS_POLICY_FLAGS}),
 *   `maxSizeBytes` (default 500 MB)
 * @returns `{ las, warnings }`; `las.data[j]` holds curve j, NULL → NaN
 * @throws ShalepointError with one of the codes above, `file`, `line` (1-based), `rawLine`
 * @example
 * const { las } = readLas("~V\nVERS. 2.0 :\nWRAP. NO :\n~W\nSTRT.F 100 :\nSTOP.F 101 :\nSTEP.F 1 :\nNULL. -999.25 :\n~C\nDEPT.F :\nGR.GAPI :\n~A\n100 50\n101 -999.25\n");
 * // las.data[1] → Float64Array [50, NaN]
 * Reference: Canadian Well Logging Society (1992), LAS Version 2.0 — A Digital Standard for
 * Logging Data; number conversion after Clinger (1990), PLDI '90, pp. 92–101, doi:10.1145/93542.93557.
 */
export function readLas(text: string, options: ReadLasOptions = {}): ReadLasResult {
  const file = options.file;
  const policy: LasPolicy = { ...LAS_POLICY_STRICT, ...(options.policy ?? {}) };
  const warnings: Warning[] = [];
  const ctx: HeaderCtx = { file, policy, warnings, raw: new Map(), sectionLine: new Map() };
  const maxSize = options.maxSizeBytes ?? LAS_DEFAULT_MAX_SIZE_BYTES;

  if (typeof text !== "string") {
    throw new ShalepointError("E_LAS_EMPTY", "LAS input is not text", { file, value: typeof text });
  }
  if (text.length > maxSize) {
    throw new ShalepointError("E_LAS_TOO_LARGE", `LAS text is larger than the limit of ${maxSize} bytes`, {
      file,
      value: text.length,
      unit: "bytes",
      allowed: `≤ ${maxSize}`,
      hint: "Split the file by depth interval, or raise the limit with { maxSizeBytes } if the machine has the memory.",
    });
  }
  if (text.trim().length === 0) {
    throw new ShalepointError("E_LAS_EMPTY", "LAS file is empty", { file, line: 1, hint: "Check that the right file was given." });
  }
  const nul = text.indexOf("\u0000");
  if (nul !== -1) {
    const at = lineAt(text, nul);
    throw new ShalepointError("E_LAS_BINARY", "file contains NUL bytes: this is not a LAS text file", {
      file,
      line: at.line,
      hint: "LAS 2.0 is plain ASCII; export the log as LAS 2.0 text.",
    });
  }
  {
    const n = Math.min(text.length, 65536);
    let ctrl = 0;
    for (let i = 0; i < n; i++) {
      const c = text.charCodeAt(i);
      if ((c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) || c === 127 || c === 0xfffd) ctrl++;
    }
    if (ctrl > 0.1 * n) {
      throw new ShalepointError("E_LAS_BINARY", "file is mostly control characters: this is not a LAS text file", {
        file,
        line: 1,
        value: `${ctrl} of ${n} characters`,
        hint: "LAS 2.0 is plain ASCII; export the log as LAS 2.0 text.",
      });
    }
  }

  const sections: Record<string, LasHeaderItem[]> = { V: [], W: [], C: [], P: [] };
  const otherLines: string[] = [];
  const seen = new Set<string>();
  let current = ""; // "" before the first section; "X" for a skipped unknown section
  let pos = 0;
  let lineNo = 0;
  let dataStart = -1;
  let dataLine = 0;
  let aLineNo = 0;
  let lastRaw = "";

  while (pos < text.length) {
    let end = text.indexOf("\n", pos);
    if (end === -1) end = text.length;
    lineNo++;
    const raw = text.slice(pos, end).replace(/\r$/, "");
    const next = end + 1;
    lastRaw = raw;
    ctx.raw.set(lineNo, raw);
    const t = raw.trim();
    pos = next;
    if (t.length === 0 || t.charCodeAt(0) === 35 /* # */) continue;
    if (t.charCodeAt(0) === 126 /* ~ */) {
      const letter = t.charAt(1).toUpperCase();
      if (seen.size === 0 && letter !== "V") {
        throw new ShalepointError("E_LAS_V_NOT_FIRST", `section ${t.slice(0, 2)} comes before ~V`, {
          file,
          line: lineNo,
          rawLine: raw,
          hint: "LAS 2.0 files start with the ~V (version) section.",
        });
      }
      if (!(letter in SECTION_NAMES)) {
        if (!policy.allowUnknownSections) {
          throw new ShalepointError("E_LAS_UNKNOWN_SECTION", `unknown section ${t.slice(0, 2)}`, {
            file,
            line: lineNo,
            rawLine: raw,
            allowed: "~V ~W ~C ~P ~O ~A",
            hint: "Remove it, or read with policy { allowUnknownSections: true }.",
          });
        }
        warnings.push({ code: "W_LAS_UNKNOWN_SECTION", message: `line ${lineNo}: section ${t.slice(0, 2)} skipped` });
        current = "X";
        continue;
      }
      if (seen.has(letter)) {
        throw new ShalepointError("E_LAS_DUPLICATE_SECTION", `section ${SECTION_NAMES[letter]} appears twice`, {
          file,
          line: lineNo,
          rawLine: raw,
        });
      }
      seen.add(letter);
      ctx.sectionLine.set(letter, lineNo);
      current = letter;
      if (letter === "A") {
        dataStart = next;
        dataLine = lineNo + 1;
        aLineNo = lineNo;
        break;
      }
      continue;
    }
    if (current === "") {
      throw new ShalepointError("E_LAS_V_NOT_FIRST", "text before the ~V section", {
        file,
        line: lineNo,
        rawLine: raw,
        hint: "LAS 2.0 files start with the ~V (version) section; only '#' comments may come before it.",
      });
    }
    if (current === "X") continue;
    if (current === "O") {
      otherLines.push(raw.replace(/\s+$/, ""));
      continue;
    }
    sections[current].push(parseHeaderLine(raw, lineNo, ctx));
  }

  // ---- ~V -------------------------------------------------------------------------------
  const vers = findItem(sections.V, "VERS");
  if (vers === undefined) {
    const ln = ctx.sectionLine.get("V");
    throw new ShalepointError("E_LAS_MISSING_ITEM", "~V has no VERS item", {
      file,
      line: ln,
      rawLine: ln === undefined ? undefined : ctx.raw.get(ln),
      param: "VERS",
      hint: "Add 'VERS.  2.0 : LAS version'.",
    });
  }
  const versNum = DECIMAL_RE.test(vers.value) ? Number(vers.value) : NaN;
  if (versNum !== 2) {
    if (versNum === 1.2 && policy.allowVersion1_2) {
      warnings.push({ code: "W_LAS_VERSION_1_2", message: `line ${vers.line}: VERS 1.2 read as LAS 2.0` });
    } else {
      throw new ShalepointError("E_LAS_VERSION", `unsupported LAS version ${vers.value}`, {
        file,
        line: vers.line,
        rawLine: lineAt(text, offsetOfLine(text, vers.line!)).rawLine,
        value: vers.value,
        allowed: "2.0 (1.2 with policy { allowVersion1_2: true })",
        hint: versNum >= 3 ? "LAS 3.0 is a different format; export the log as LAS 2.0." : undefined,
      });
    }
  }
  const wrapItem = findItem(sections.V, "WRAP");
  if (wrapItem === undefined) {
    const ln = ctx.sectionLine.get("V");
    throw new ShalepointError("E_LAS_MISSING_ITEM", "~V has no WRAP item", {
      file,
      line: ln,
      rawLine: ln === undefined ? undefined : ctx.raw.get(ln),
      param: "WRAP",
      hint: "Add 'WRAP.  NO : one line per depth step'.",
    });
  }
  const wrapText = wrapItem.value.toUpperCase();
  if (wrapText !== "YES" && wrapText !== "NO") {
    throw new ShalepointError("E_LAS_WRAP", "WRAP must be YES or NO", {
      file,
      line: wrapItem.line,
      rawLine: ctx.raw.get(wrapItem.line!),
      value: wrapItem.value,
      allowed: "YES, NO",
    });
  }
  const wrap = wrapText === "YES";

  // ---- ~C / ~A presence ---------------------------------------------------------------------
  if (dataStart === -1) {
    throw new ShalepointError("E_LAS_MISSING_DATA", "file has no ~A (data) section", {
      file,
      line: lineNo,
      rawLine: lastRaw,
      hint: "The file may be truncated; LAS 2.0 ends with the ~A section.",
    });
  }
  if (!seen.has("C") || sections.C.length === 0) {
    throw new ShalepointError("E_LAS_MISSING_CURVES", "no ~C (curve) section before ~A", {
      file,
      line: aLineNo,
      rawLine: lineAt(text, offsetOfLine(text, aLineNo)).rawLine,
      hint: "~C lists one line per data column, the index (depth) first.",
    });
  }
  if (!seen.has("W")) {
    throw new ShalepointError("E_LAS_MISSING_ITEM", "file has no ~W (well) section", {
      file,
      line: aLineNo,
      rawLine: ctx.raw.get(aLineNo),
      param: "~W",
      hint: "LAS 2.0 needs ~W with STRT, STOP, STEP and NULL.",
    });
  }

  // ---- ~W numbers ---------------------------------------------------------------------------
  const strt = headerNumber(findItem(sections.W, "STRT"), "STRT", ctx);
  const stop = headerNumber(findItem(sections.W, "STOP"), "STOP", ctx);
  const step = headerNumber(findItem(sections.W, "STEP"), "STEP", ctx);
  const nullValue = headerNumber(findItem(sections.W, "NULL"), "NULL", ctx);

  // ---- duplicate curve mnemonics ------------------------------------------------------------
  const curves = sections.C.map((c) => ({ ...c }));
  const counts = new Map<string, number>();
  for (const c of curves) {
    const key = c.mnemonic.toUpperCase();
    const n = (counts.get(key) ?? 0) + 1;
    counts.set(key, n);
    if (n > 1) {
      const renamed = `${c.mnemonic}:${n}`;
      warnings.push({
        code: "W_LAS_DUPLICATE_MNEMONIC",
        message: `line ${c.line}: curve mnemonic ${c.mnemonic} repeated; kept as ${renamed}`,
      });
      c.mnemonic = renamed;
    }
  }

  // ---- ~A ---------------------------------------------------------------------------------
  const data = scanData(text, dataStart, dataLine, curves.length, wrap, nullValue, file);
  const nRows = data.rows;
  if (nRows === 0) {
    throw new ShalepointError("E_LAS_NO_ROWS", "~A section has no data rows", {
      file,
      line: aLineNo,
      rawLine: lineAt(text, offsetOfLine(text, aLineNo)).rawLine,
    });
  }
  const index = data.columns[0];

  // index checks: NULL, monotonic, STEP, STRT/STOP
  for (let i = 0; i < nRows; i++) {
    if (Number.isNaN(index[i])) {
      const ln = data.rowLine[i];
      throw new ShalepointError("E_LAS_NULL_INDEX", "index (first curve) is NULL", {
        file,
        line: ln,
        rawLine: lineAt(text, offsetOfLine(text, ln)).rawLine,
        row: i + 1,
      });
    }
  }
  const direction = step !== 0 ? Math.sign(step) : nRows > 1 ? Math.sign(index[1] - index[0]) : 1;
  const tol = step !== 0 ? 1e-3 * Math.abs(step) : 0;
  let monotonicWarned = false;
  let stepWarned = false;
  for (let i = 1; i < nRows; i++) {
    const d = index[i] - index[i - 1];
    if (!(d * direction > 0)) {
      if (!policy.allowNonMonotonicDepth) {
        const ln = data.rowLine[i];
        throw new ShalepointError("E_LAS_NON_MONOTONIC", `index is not strictly ${direction > 0 ? "increasing" : "decreasing"}`, {
          file,
          line: ln,
          rawLine: lineAt(text, offsetOfLine(text, ln)).rawLine,
          row: i + 1,
          value: `${index[i - 1]} then ${index[i]}`,
          hint: "Sort or de-duplicate the rows, or read with policy { allowNonMonotonicDepth: true }.",
        });
      }
      if (!monotonicWarned) {
        warnings.push({ code: "W_LAS_NON_MONOTONIC", message: `line ${data.rowLine[i]}: index not monotonic (first at row ${i + 1})`, index: i });
        monotonicWarned = true;
      }
      continue;
    }
    if (step !== 0 && Math.abs(d - step) > tol) {
      if (!policy.allowStepMismatch) {
        const ln = data.rowLine[i];
        throw new ShalepointError("E_LAS_STEP_MISMATCH", "index step disagrees with STEP in ~W", {
          file,
          line: ln,
          rawLine: lineAt(text, offsetOfLine(text, ln)).rawLine,
          row: i + 1,
          value: d,
          allowed: `STEP = ${step} (±0.1 %), or STEP 0 for irregular sampling`,
          hint: "Fix STEP (0 = irregular), or read with policy { allowStepMismatch: true }.",
        });
      }
      if (!stepWarned) {
        warnings.push({ code: "W_LAS_STEP_MISMATCH", message: `line ${data.rowLine[i]}: index step ${d} ≠ STEP ${step}`, index: i });
        stepWarned = true;
      }
    }
  }
  const endTol = step !== 0 ? tol : 1e-9 * Math.max(1, Math.abs(strt), Math.abs(stop));
  const first = index[0];
  const last = index[nRows - 1];
  if (Math.abs(first - strt) > endTol || Math.abs(last - stop) > endTol) {
    const bad = Math.abs(first - strt) > endTol ? 0 : nRows - 1;
    if (!policy.allowStepMismatch) {
      const ln = data.rowLine[bad];
      throw new ShalepointError("E_LAS_STRT_STOP_MISMATCH", `${bad === 0 ? "first" : "last"} index disagrees with ${bad === 0 ? "STRT" : "STOP"} in ~W`, {
        file,
        line: ln,
        rawLine: lineAt(text, offsetOfLine(text, ln)).rawLine,
        row: bad + 1,
        value: index[bad],
        allowed: `${bad === 0 ? "STRT" : "STOP"} = ${bad === 0 ? strt : stop}`,
        hint: "Fix STRT/STOP, or read with policy { allowStepMismatch: true }.",
      });
    }
    warnings.push({ code: "W_LAS_STEP_MISMATCH", message: `index runs ${first}…${last} but ~W says STRT ${strt}, STOP ${stop}` });
  }

  const las: LasFile = {
    version: sections.V,
    well: sections.W,
    curves,
    parameters: sections.P,
    other: otherLines.join("\n"),
    data: data.columns.map((c) => c.slice(0, nRows)),
    wrap,
    nullValue,
  };
  return { las, warnings };
}

/** Character offset of the start of 1-based line `line`. */
function offsetOfLine(text: string, line: number): number {
  let off = 0;
  for (let l = 1; l < line; l++) {
    const nl = text.indexOf("\n", off);
    if (nl === -1) return text.length;
    off = nl + 1;
  }
  return off;
}

interface ScanResult {
  columns: Float64Array[];
  rowLine: Int32Array;
  rows: number;
}

/** Throw a data-section error at `line` (the raw line is looked up only now). */
function failAt(
  text: string,
  file: string | undefined,
  line: number,
  row: number | undefined,
  code: string,
  message: string,
  at: number,
  extra: ErrorDetails = {},
): never {
  const { rawLine } = lineAt(text, at);
  throw new ShalepointError(code, message, { file, line, rawLine, row, ...extra });
}

/** Parse the ~A block starting at `start` (first line number `firstLine`). */
function scanData(
  text: string,
  start: number,
  firstLine: number,
  nCurves: number,
  wrap: boolean,
  nullValue: number,
  file: string | undefined,
): ScanResult {
  // capacity: at most one row per line
  let lines = 1;
  for (let i = text.indexOf("\n", start); i !== -1; i = text.indexOf("\n", i + 1)) lines++;
  const cap = lines;
  const columns: Float64Array[] = [];
  for (let j = 0; j < nCurves; j++) columns.push(new Float64Array(cap));
  const rowLine = new Int32Array(cap);

  const n = text.length;
  let p = start;
  let line = firstLine;
  let row = 0;
  let col = 0; // values filled in the current row/record
  let recordLine = firstLine;

  while (p < n) {
    const lineStart = p;
    // skip leading blanks
    let c = text.charCodeAt(p);
    while (p < n && isSpace(c)) c = text.charCodeAt(++p);
    if (p >= n) break;
    if (c === 10) {
      p++;
      line++;
      continue;
    }
    if (c === 35 /* # */) {
      const nl = text.indexOf("\n", p);
      p = nl === -1 ? n : nl + 1;
      line++;
      continue;
    }
    if (c === 126 /* ~ */) {
      failAt(text, file, line, undefined, "E_LAS_A_NOT_LAST", "a section follows ~A; ~A must be the last section", lineStart, {
        hint: "Move the ~A section to the end of the file.",
      });
    }
    // tokens on this line
    let tokens = 0;
    const startCol = col;
    if (col === 0) recordLine = line;
    while (p < n) {
      c = text.charCodeAt(p);
      while (p < n && isSpace(c)) c = text.charCodeAt(++p);
      if (p >= n || c === 10) break;
      // ---- number scanner --------------------------------------------------------------
      const tokStart = p;
      let neg = false;
      if (c === 45 || c === 43) {
        neg = c === 45;
        c = text.charCodeAt(++p);
      }
      let m = 0;
      let sig = 0;
      let digits = 0;
      let frac = 0;
      while (c >= 48 && c <= 57) {
        if (m !== 0 || c !== 48) {
          m = m * 10 + (c - 48);
          sig++;
        }
        digits++;
        c = text.charCodeAt(++p);
      }
      if (c === 46 /* . */) {
        c = text.charCodeAt(++p);
        while (c >= 48 && c <= 57) {
          if (m !== 0 || c !== 48) {
            m = m * 10 + (c - 48);
            sig++;
          }
          digits++;
          frac++;
          c = text.charCodeAt(++p);
        }
      }
      let exp = 0;
      let ok = digits > 0;
      if (ok && (c === 101 || c === 69) /* e E */) {
        c = text.charCodeAt(++p);
        let eneg = false;
        if (c === 45 || c === 43) {
          eneg = c === 45;
          c = text.charCodeAt(++p);
        }
        let ed = 0;
        while (c >= 48 && c <= 57) {
          if (exp < 100000) exp = exp * 10 + (c - 48);
          ed++;
          c = text.charCodeAt(++p);
        }
        if (ed === 0) ok = false;
        if (eneg) exp = -exp;
      }
      // the token must end at a blank or the end of the line
      if (!(p >= n || c === 10 || isSpace(c))) ok = false;
      let v: number;
      if (ok && sig <= 15 && exp - frac >= -22 && exp - frac <= 22) {
        const e10 = exp - frac;
        v = e10 < 0 ? m / POW10[-e10] : m * POW10[e10];
        if (neg) v = -v;
      } else {
        // odd token: take it to the next blank and let Number() decide (strict decimal syntax)
        while (p < n) {
          c = text.charCodeAt(p);
          if (c === 10 || isSpace(c)) break;
          p++;
        }
        const tok = text.slice(tokStart, p);
        v = DECIMAL_RE.test(tok) ? Number(tok) : NaN;
        if (!Number.isFinite(v)) {
          failAt(text, file, line, row + 1, "E_LAS_NON_NUMERIC", `non-numeric value in ~A`, tokStart, {
            value: tok,
            hint: "Every ~A value must be a decimal number; use the NULL value for missing samples.",
          });
        }
      }
      if (v === nullValue) v = NaN;
      // ---- place the value ---------------------------------------------------------------
      if (col >= nCurves) {
        failAt(text, file, line, row + 1, "E_LAS_COLUMN_COUNT", `more values than the ${nCurves} curves in ~C`, tokStart, {
          value: wrap ? "record overflows" : `${startCol + tokens + 1}+ values`,
          allowed: `${nCurves} values per ${wrap ? "record" : "line"}`,
        });
      }
      columns[col][row] = v;
      col++;
      tokens++;
    }
    // end of line
    if (wrap) {
      if (startCol === 0 && tokens !== 1) {
        failAt(text, file, line, row + 1, "E_LAS_WRAP_LAYOUT", "a wrapped record must start with the index alone on its line", lineStart, {
          value: `${tokens} values`,
          hint: "With WRAP YES each depth step starts with a line holding only the index value.",
        });
      }
      if (col === nCurves) {
        rowLine[row] = recordLine;
        row++;
        col = 0;
      }
    } else {
      if (tokens !== nCurves) {
        failAt(text, file, line, row + 1, "E_LAS_COLUMN_COUNT", `line has ${tokens} values but ~C defines ${nCurves} curves`, lineStart, {
          value: tokens,
          allowed: `${nCurves}`,
          hint: "Check the ~C section against the data columns, or WRAP if records span lines.",
        });
      }
      rowLine[row] = line;
      row++;
      col = 0;
    }
    if (p < n) {
      p++; // past the newline
      line++;
    }
  }
  if (col !== 0) {
    throw new ShalepointError("E_LAS_COLUMN_COUNT", `wrapped record has ${col} values but ~C defines ${nCurves} curves`, {
      file,
      line: recordLine,
      rawLine: lineAt(text, offsetOfLine(text, recordLine)).rawLine,
      row: row + 1,
      value: col,
      allowed: `${nCurves}`,
    });
  }
  return { columns, rowLine, rows: row };
}

/**
 * Non-throwing form of {@link readLas}.
 * @returns `{ ok: true, las, warnings }`, or `{ ok: false, error }` with the ShalepointError
 *   (any unexpected failure is wrapped as `E_LAS_INTERNAL`)
 * @example safeReadLas("").ok // false (error.code "E_LAS_EMPTY")
 */
export function safeReadLas(text: string, options: ReadLasOptions = {}): SafeReadLasResult {
  try {
    const { las, warnings } = readLas(text, options);
    return { ok: true, las, warnings };
  } catch (e) {
    if (e instanceof ShalepointError) return { ok: false, error: e };
    return {
      ok: false,
      error: new ShalepointError("E_LAS_INTERNAL", `unexpected failure reading LAS: ${(e as Error)?.message ?? String(e)}`, {
        file: options.file,
        hint: "Please report this file; it is a reader bug.",
      }),
    };
  }
}
