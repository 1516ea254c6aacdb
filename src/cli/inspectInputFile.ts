/**
 * `shalepoint inspect`: read one LAS 2.0 or CSV file and say what was found and what is wrong.
 */
import { basename, extname } from "node:path";
import { ShalepointError, type Warning } from "../errors.js";
import { readLas } from "../io/readLas.js";
import { lasToWell } from "../io/loadWell.js";
import { parseCsv } from "../io/csv.js";
import {
  readDirectionalSurvey,
  readDrillingEvents,
  readFormationPressureTests,
  readFormationTops,
  readLeakOffTests,
  readMudWeights,
} from "../io/tables.js";
import { summarizeLogQc } from "../logs/summarizeLogQc.js";
import { readInputText } from "../study/readInputFile.js";

/** What `inspect` found: printable lines and whether the file is usable. */
export interface InspectReport {
  /** True when the file was read without an error. */
  ok: boolean;
  /** `las`, `csv`, or `unknown` (refused before reading). */
  kind: "las" | "csv" | "unknown";
  /** Lines to print, in order. */
  lines: string[];
  /** The error that stopped reading, if any. */
  error?: ShalepointError;
}

const fmt = (x: number, d = 2): string => (Number.isFinite(x) ? x.toFixed(d) : "–");

function warningLines(warnings: readonly Warning[]): string[] {
  if (warnings.length === 0) return ["Warnings: none"];
  return [`Warnings (${warnings.length}):`, ...warnings.map((w) => `  ${w.code}: ${w.message}`)];
}

function inspectLas(text: string, file: string): { lines: string[]; problem?: ShalepointError } {
  const { las, warnings } = readLas(text, { file });
  const lines: string[] = [];
  const item = (m: string): string | undefined => [...las.well, ...las.parameters].find((it) => it.mnemonic.toUpperCase() === m)?.value;
  lines.push(`LAS ${item("VERS") ?? las.version.find((v) => v.mnemonic === "VERS")?.value ?? "?"}, wrap ${las.wrap ? "YES" : "NO"}`);
  lines.push(`Well: ${item("WELL") ?? "(no WELL item)"}`);
  const idx = las.curves[0];
  const d = las.data[0];
  lines.push(`Index: ${idx.mnemonic} [${idx.unit || "no unit"}] from ${d[0]} to ${d[d.length - 1]}, ${d.length} rows`);
  const allWarnings: Warning[] = [...warnings];
  let problem: ShalepointError | undefined;
  try {
    const { well, roles, warnings: w2 } = lasToWell(las, { file });
    allWarnings.push(...w2);
    const dt = well.datums;
    lines.push(`Datums: rotary table ${fmt(dt.rtElevationFt, 1)} ft above sea level, water depth ${fmt(dt.waterDepthFt, 1)} ft, seawater ${fmt(dt.seawaterDensityGcc, 3)} g/cc`);
    const roleText = Object.entries(roles).map(([r, m]) => `${r}=${m}`).join(", ");
    lines.push(`Curve roles: ${roleText || "none recognised"}`);
  } catch (e) {
    if (!(e instanceof ShalepointError)) throw e;
    problem = e;
    lines.push(`Well model: not built: ${e.code}: ${e.message}`);
  }
  const curves: Record<string, Float64Array> = {};
  las.curves.forEach((c, j) => {
    if (j > 0) curves[c.mnemonic] = las.data[j];
  });
  const qc = summarizeLogQc({ depthFt: d, curves });
  lines.push("Curves (unit as in the file; depth in index units):");
  lines.push("  mnemonic      unit      nulls    min        max        longest gap");
  for (const c of qc.curves) {
    const unit = las.curves.find((x) => x.mnemonic === c.name)?.unit ?? "";
    lines.push(
      `  ${c.name.padEnd(12)}  ${(unit || "-").padEnd(8)}  ${(100 * c.nullFraction).toFixed(1).padStart(5)}%  ${fmt(c.min).padStart(9)}  ${fmt(c.max).padStart(9)}  ${c.longestGapSamples > 0 ? `${c.longestGapSamples} rows from ${fmt(c.longestGapFromFt, 1)}` : "none"}`,
    );
  }
  lines.push(...warningLines(allWarnings));
  return { lines, problem };
}

function inspectCsv(text: string, file: string): string[] {
  const table = parseCsv(text, { file });
  const h = table.header.map((x) => x.toLowerCase());
  const has = (prefix: string): boolean => h.some((c) => c === prefix || c.startsWith(prefix + "_"));
  const lines = [`CSV with ${table.rows.length} rows; columns: ${table.header.join(", ")}`];
  let kind: string;
  let r: { records: unknown[]; columns: Record<string, string>; warnings: Warning[] };
  if (has("md") && has("inc")) [kind, r] = ["directional survey", readDirectionalSurvey(text, { file })];
  else if (has("shoe_tvd")) [kind, r] = ["leak-off tests", readLeakOffTests(text, { file })];
  else if (has("tvd_from")) [kind, r] = ["mud weights", readMudWeights(text, { file })];
  else if (h.includes("event")) [kind, r] = ["drilling events", readDrillingEvents(text, { file })];
  else if (has("pressure") && h.includes("quality")) [kind, r] = ["formation-pressure tests", readFormationPressureTests(text, { file })];
  else if (h.includes("name") && has("tvd")) [kind, r] = ["formation tops", readFormationTops(text, { file })];
  else {
    lines.push("Table kind: not recognised (expected pressure tests, leak-off tests, mud weights, drilling events, tops or survey)");
    lines.push("Hint: name columns <quantity>_<unit>, e.g. tvd_ft, pressure_psi, quality.");
    return lines;
  }
  lines.push(`Table kind: ${kind}; ${r.records.length} records valid`);
  lines.push(`Columns used: ${Object.entries(r.columns).map(([k, v]) => `${k}←${v}`).join(", ")}`);
  lines.push(...warningLines(r.warnings));
  return lines;
}

/**
 * Inspect one LAS 2.0 or CSV file (chosen by extension: `.las`, else CSV).
 *
 * The file is refused before reading when larger than `maxBytes` or when its first 64 KiB
 * hold a NUL byte. Errors are reported as lines (with file, line and column), not thrown.
 *
 * @param path file to inspect
 * @param options.maxBytes size limit, bytes (default 500 MB)
 * @returns the {@link InspectReport}
 * @throws nothing for input problems; unexpected errors pass through
 * @example inspectInputFile("demo-logs/quillon-a1/quillon-a1.las").ok // true
 */
export function inspectInputFile(path: string, options: { maxBytes?: number } = {}): InspectReport {
  const name = basename(path);
  const kind: InspectReport["kind"] = extname(path).toLowerCase() === ".las" ? "las" : "csv";
  const lines = [`File: ${name}`];
  try {
    const input = readInputText(path, { param: "file", maxBytes: options.maxBytes });
    lines.push(`Size: ${input.sizeBytes} bytes; SHA-256 ${input.sha256}`);
    if (kind === "las") {
      const r = inspectLas(input.text, name);
      lines.push(...r.lines);
      if (r.problem) {
        lines.push("Result: the LAS file reads, but a well cannot be built from it (see above)");
        return { ok: false, kind, lines, error: r.problem };
      }
    } else lines.push(...inspectCsv(input.text, name));
    lines.push("Result: readable");
    return { ok: true, kind, lines };
  } catch (e) {
    if (!(e instanceof ShalepointError)) throw e;
    lines.push(`Problem: ${e.code}: ${e.message}`);
    lines.push("Result: not usable as it is");
    return { ok: false, kind: e.code.startsWith("E_FILE") ? "unknown" : kind, lines, error: e };
  }
}
