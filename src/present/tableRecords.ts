/**
 * Table helpers: plain records (arrays of row objects) that a notebook can hand to a
 * danfojs DataFrame (`new dfd.DataFrame(rows)`), print, or render with
 * {@link recordsToHtmlTable}. No danfojs here: it loads TensorFlow.js, so notebooks import
 * it themselves.
 */
import { ShalepointError } from "../errors.js";
import type { LasFile, LasHeaderItem } from "../io/lasTypes.js";
import { UNITS } from "../units/index.js";
import type { Well } from "../well/types.js";
import { escapeHtml } from "./escapeHtml.js";

/** A table row: column name → value. Numbers may be NaN (missing). */
export type TableRecord = Record<string, string | number>;

/** One row of {@link wellHeaderRecords}. */
export interface WellHeaderRecord extends TableRecord {
  item: string;
  value: string | number;
  unit: string;
}

/**
 * The well's identity and datums as rows: name, rotary-table elevation, water depth,
 * seawater density, MD and TVD range, sample count, survey stations, then every free-form
 * header fact of the file (in file order).
 *
 * @param well the well
 * @returns rows `{ item, value, unit }`; values in internal units (ft, g/cc)
 * @example wellHeaderRecords(well)[0] // { item: "Well", value: "Quillon A-1", unit: "" }
 */
export function wellHeaderRecords(well: Well): WellHeaderRecord[] {
  const n = well.mdFt.length;
  const rows: WellHeaderRecord[] = [
    { item: "Well", value: well.name, unit: "" },
    { item: "Rotary table above sea level", value: well.datums.rtElevationFt, unit: "ft" },
    { item: "Water depth", value: well.datums.waterDepthFt, unit: "ft" },
    { item: "Seawater density", value: well.datums.seawaterDensityGcc, unit: "g/cc" },
    { item: "Top of log, MD", value: n > 0 ? well.mdFt[0] : NaN, unit: "ft" },
    { item: "Base of log, MD", value: n > 0 ? well.mdFt[n - 1] : NaN, unit: "ft" },
    { item: "Top of log, TVD below RT", value: n > 0 ? well.tvdFt[0] : NaN, unit: "ft" },
    { item: "Base of log, TVD below RT", value: n > 0 ? well.tvdFt[n - 1] : NaN, unit: "ft" },
    { item: "Samples", value: n, unit: "" },
    { item: "Survey stations", value: well.survey?.length ?? 0, unit: "" },
  ];
  if (well.datums.groundLevelFt !== undefined) {
    rows.splice(3, 0, { item: "Ground level above sea level", value: well.datums.groundLevelFt, unit: "ft" });
  }
  for (const [key, value] of Object.entries(well.header)) rows.push({ item: key, value, unit: "" });
  return rows;
}

/** One row of {@link curveSummaryRecords}. */
export interface CurveSummaryRecord extends TableRecord {
  curve: string;
  mnemonic: string;
  unit: string;
  description: string;
  samples: number;
  missing: number;
  minimum: number;
  maximum: number;
  mean: number;
  topMdFt: number;
  baseMdFt: number;
}

/**
 * Per-curve summary for QC: sample and missing counts, minimum, maximum, arithmetic mean of
 * the present (finite) samples, and the MD of the first and last present sample. NaN
 * samples are counted as missing and skipped; a curve with no present sample gets NaN
 * statistics.
 *
 * @param well the well; each curve must have as many samples as `well.mdFt`
 * @returns one row per curve, in `well.curves` order; values in the curve's internal unit
 * @throws ShalepointError `E_LENGTH_MISMATCH` when a curve's length differs from the depth index
 * @example curveSummaryRecords(well)[0].missing // e.g. 1 for a curve [80, NaN, 95]
 */
export function curveSummaryRecords(well: Well): CurveSummaryRecord[] {
  const n = well.mdFt.length;
  return Object.entries(well.curves).map(([key, curve]) => {
    const v = curve.values;
    if (v.length !== n) {
      throw new ShalepointError("E_LENGTH_MISMATCH", `curve ${key} and the depth index differ in length`, {
        param: `curves.${key}`,
        value: v.length,
        allowed: `${n} samples (mdFt.length)`,
      });
    }
    let count = 0;
    let sum = 0;
    let min = Infinity;
    let max = -Infinity;
    let first = -1;
    let last = -1;
    for (let i = 0; i < n; i++) {
      const x = v[i];
      if (!Number.isFinite(x)) continue;
      if (first < 0) first = i;
      last = i;
      count++;
      sum += x;
      if (x < min) min = x;
      if (x > max) max = x;
    }
    const unitLabel = Object.prototype.hasOwnProperty.call(UNITS, curve.unit) ? UNITS[curve.unit].label : String(curve.unit);
    return {
      curve: key,
      mnemonic: curve.mnemonic,
      unit: unitLabel,
      description: curve.description,
      samples: count,
      missing: n - count,
      minimum: count > 0 ? min : NaN,
      maximum: count > 0 ? max : NaN,
      mean: count > 0 ? sum / count : NaN,
      topMdFt: first >= 0 ? well.mdFt[first] : NaN,
      baseMdFt: last >= 0 ? well.mdFt[last] : NaN,
    };
  });
}

/** One row of {@link lasSectionRecords}. */
export interface LasItemRecord extends TableRecord {
  mnemonic: string;
  unit: string;
  value: string;
  description: string;
}

/**
 * One header section of a LAS 2.0 file as rows, values exactly as in the file.
 *
 * @param las a parsed LAS file
 * @param section `"version"` (~V), `"well"` (~W), `"curves"` (~C) or `"parameters"` (~P)
 * @returns rows `{ mnemonic, unit, value, description }` in file order
 * @example lasSectionRecords({ las, section: "well" })[0].mnemonic // "STRT"
 */
export function lasSectionRecords({
  las,
  section,
}: {
  las: LasFile;
  section: "version" | "well" | "curves" | "parameters";
}): LasItemRecord[] {
  const items: LasHeaderItem[] = las[section];
  return items.map((it) => ({ mnemonic: it.mnemonic, unit: it.unit, value: it.value, description: it.description }));
}

/**
 * Format a number for a table: integers as they are, others with `significantDigits`
 * significant digits (no exponent between 1e-4 and 1e9); NaN and ±Infinity as "—".
 * @example formatTableNumber(2.34567, 4) // "2.346"
 */
export function formatTableNumber(x: number, significantDigits = 4): string {
  if (!Number.isFinite(x)) return "—";
  if (Number.isInteger(x)) return String(x);
  const a = Math.abs(x);
  if (a >= 1e-4 && a < 1e9) return String(Number(x.toPrecision(significantDigits)));
  return x.toExponential(significantDigits - 1);
}

/**
 * Render rows as an HTML `<table>`: columns are the union of the rows' keys in first-seen
 * order; every header and cell is escaped; numbers pass through {@link formatTableNumber}
 * and are right-aligned.
 *
 * @param records the rows (plain objects)
 * @param caption optional caption (escaped)
 * @param significantDigits digits for non-integer numbers, default 4
 * @returns an HTML string
 * @example recordsToHtmlTable({ records: [{ a: 1, b: "<x>" }] })
 * // '<table class="shalepoint-table"><thead><tr><th>a</th><th>b</th></tr></thead><tbody><tr><td style="text-align:right">1</td><td>&lt;x&gt;</td></tr></tbody></table>'
 */
export function recordsToHtmlTable({
  records,
  caption,
  significantDigits = 4,
}: {
  records: readonly Readonly<Record<string, unknown>>[];
  caption?: string;
  significantDigits?: number;
}): string {
  const columns: string[] = [];
  const seen = new Set<string>();
  for (const r of records) {
    for (const k of Object.keys(r)) {
      if (!seen.has(k)) {
        seen.add(k);
        columns.push(k);
      }
    }
  }
  const cell = (v: unknown): string =>
    typeof v === "number"
      ? `<td style="text-align:right">${escapeHtml(formatTableNumber(v, significantDigits))}</td>`
      : `<td>${escapeHtml(v ?? "")}</td>`;
  const head = `<thead><tr>${columns.map((c) => `<th>${escapeHtml(c)}</th>`).join("")}</tr></thead>`;
  const body = `<tbody>${records.map((r) => `<tr>${columns.map((c) => cell(r[c])).join("")}</tr>`).join("")}</tbody>`;
  const cap = caption === undefined ? "" : `<caption>${escapeHtml(caption)}</caption>`;
  return `<table class="shalepoint-table">${cap}${head}${body}</table>`;
}
