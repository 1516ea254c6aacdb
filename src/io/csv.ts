/**
 * A small CSV reader after RFC 4180 (Shafranovich 2005, "Common Format and MIME Type for
 * Comma-Separated Values (CSV) Files", IETF RFC 4180): fields separated by commas, fields in
 * double quotes may hold commas, line breaks and doubled quotes (`""`). Extensions: lines
 * whose first character is `#` are comments, blank lines are skipped, CRLF or LF endings,
 * blanks around unquoted fields are trimmed.
 */
import { ShalepointError } from "../errors.js";

/** One data row: its fields, its 1-based row number (header excluded) and first line. */
export interface CsvRow {
  fields: string[];
  /** 1-based data row number (the header is not counted). */
  row: number;
  /** 1-based line in the file where the row starts. */
  line: number;
}

/** Result of {@link parseCsv}. */
export interface CsvTable {
  /** Header names, trimmed. */
  header: string[];
  /** 1-based line of the header. */
  headerLine: number;
  rows: CsvRow[];
}

/** Options of {@link parseCsv}. */
export interface ParseCsvOptions {
  /** File name for messages. */
  file?: string;
}

/**
 * Parse CSV text into a header and rows.
 * @param text CSV content; first non-comment, non-blank line is the header
 * @param options `file` for messages
 * @returns `{ header, headerLine, rows }`
 * @throws ShalepointError `E_CSV_EMPTY` (no header), `E_CSV_QUOTE` (unterminated quote or
 *   text after a closing quote), `E_CSV_FIELD_COUNT` (row with a different number of fields
 *   from the header), `E_CSV_HEADER` (empty or repeated header name) — each with file and line
 * @example parseCsv('a,b\n1,"x, y"\n').rows[0].fields // ["1", "x, y"]
 * Reference: IETF RFC 4180 (2005).
 */
export function parseCsv(text: string, options: ParseCsvOptions = {}): CsvTable {
  const file = options.file;
  const records: { fields: string[]; line: number; raw: string }[] = [];
  const n = text.length;
  let p = 0;
  let line = 1;
  while (p < n) {
    // start of a line
    const lineStart = p;
    const startLine = line;
    let q = p;
    while (q < n && (text[q] === " " || text[q] === "\t")) q++;
    if (q >= n) break;
    if (text[q] === "\n" || text[q] === "\r") {
      p = text[q] === "\r" && text[q + 1] === "\n" ? q + 2 : q + 1;
      line++;
      continue;
    }
    if (text[q] === "#") {
      const nl = text.indexOf("\n", q);
      p = nl === -1 ? n : nl + 1;
      line++;
      continue;
    }
    const fields: string[] = [];
    let field = "";
    let quoted = false;
    let ended = false;
    while (!ended) {
      // one field
      field = "";
      quoted = false;
      while (p < n && (text[p] === " " || text[p] === "\t")) p++;
      if (text[p] === '"') {
        quoted = true;
        p++;
        const qLine = line;
        for (;;) {
          if (p >= n) {
            throw new ShalepointError("E_CSV_QUOTE", "quoted field is not closed", {
              file,
              line: qLine,
              rawLine: rawAt(text, lineStart),
              hint: 'Close the field with a double quote; write a quote inside a field as "".',
            });
          }
          const ch = text[p];
          if (ch === '"') {
            if (text[p + 1] === '"') {
              field += '"';
              p += 2;
              continue;
            }
            p++;
            break;
          }
          if (ch === "\n") line++;
          field += ch;
          p++;
        }
        while (p < n && (text[p] === " " || text[p] === "\t")) p++;
        if (p < n && text[p] !== "," && text[p] !== "\n" && text[p] !== "\r") {
          throw new ShalepointError("E_CSV_QUOTE", "text after a closing quote", {
            file,
            line,
            rawLine: rawAt(text, lineStart),
            hint: "A quoted field must be followed by a comma or the end of the line.",
          });
        }
      } else {
        const s = p;
        while (p < n && text[p] !== "," && text[p] !== "\n" && text[p] !== "\r") p++;
        field = text.slice(s, p).trim();
      }
      fields.push(quoted ? field : field);
      if (p < n && text[p] === ",") {
        p++;
        continue;
      }
      ended = true;
    }
    // end of record
    if (p < n && text[p] === "\r") p++;
    if (p < n && text[p] === "\n") p++;
    records.push({ fields, line: startLine, raw: rawAt(text, lineStart) });
    line++;
  }
  if (records.length === 0) {
    throw new ShalepointError("E_CSV_EMPTY", "CSV has no header line", { file, line: 1, hint: "The first non-comment line must name the columns." });
  }
  const head = records[0];
  const header = head.fields.map((h) => h.trim());
  const seen = new Set<string>();
  for (const h of header) {
    const key = h.toLowerCase();
    if (h.length === 0 || seen.has(key)) {
      throw new ShalepointError("E_CSV_HEADER", h.length === 0 ? "empty column name in header" : `column ${h} appears twice`, {
        file,
        line: head.line,
        rawLine: head.raw,
        column: h,
      });
    }
    seen.add(key);
  }
  const rows: CsvRow[] = [];
  for (let r = 1; r < records.length; r++) {
    const rec = records[r];
    if (rec.fields.length !== header.length) {
      throw new ShalepointError("E_CSV_FIELD_COUNT", `row has ${rec.fields.length} fields but the header has ${header.length}`, {
        file,
        line: rec.line,
        row: r,
        rawLine: rec.raw,
        value: rec.fields.length,
        allowed: String(header.length),
      });
    }
    rows.push({ fields: rec.fields, row: r, line: rec.line });
  }
  return { header, headerLine: head.line, rows };
}

function rawAt(text: string, start: number): string {
  let end = text.indexOf("\n", start);
  if (end === -1) end = text.length;
  return text.slice(start, end).replace(/\r$/, "");
}
