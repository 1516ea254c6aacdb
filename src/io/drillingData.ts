/**
 * Drilling-data CSV (surface drilling parameters and gas, one row per depth), validated with
 * zod and returned as columns in internal units, ready for the d-exponent.
 *
 * Header convention: shalepoint's own `<name>_<unit>` (see tables.ts), case-insensitive.
 *
 * | column | units accepted | required |
 * | --- | --- | --- |
 * | `tvd_*` | ft, m | yes (TVD below the rotary table) |
 * | `md_*` | ft, m | no |
 * | `rop_*` (rate of penetration) | ft_per_h, m_per_h | yes |
 * | `rotary_speed_rpm` | rpm | yes |
 * | `wob_*` (weight on bit) | lbf, klbf, kn, tonne | yes |
 * | `bit_size_*` | in, mm | yes |
 * | `mud_weight_*` | ppg, sg, psi_per_ft, kpa_per_m | yes |
 * | `ecd_*` | same as mud weight | no |
 * | `background_gas_units`, `connection_gas_units` | units | no |
 * | `comment` | text, ignored | no |
 *
 * Depths must increase strictly down the file. An empty cell is a missing value (NaN) in
 * every column but depth; the d-exponent carries it through.
 */
import { z } from "zod";
import { ShalepointError } from "../errors.js";
import { UNITS, type UnitId } from "../units/index.js";
import { parseCsv } from "./csv.js";

interface DrillingColumn {
  key: keyof DrillingDataColumns;
  base: string;
  units: Readonly<Record<string, UnitId>>;
  required: boolean;
}

const GRADIENT_UNITS: Record<string, UnitId> = { ppg: "ppg", sg: "sg", psi_per_ft: "psi/ft", kpa_per_m: "kPa/m" };
const DEPTH_UNITS: Record<string, UnitId> = { ft: "ft", m: "m" };

/** Columns of the drilling-data table, in the order they are matched. */
export const DRILLING_DATA_COLUMNS: readonly DrillingColumn[] = [
  { key: "tvdFt", base: "tvd", units: DEPTH_UNITS, required: true },
  { key: "mdFt", base: "md", units: DEPTH_UNITS, required: false },
  { key: "ropFtPerH", base: "rop", units: { ft_per_h: "ft/h", m_per_h: "m/h" }, required: true },
  { key: "rotaryRpm", base: "rotary_speed", units: { rpm: "rpm" }, required: true },
  { key: "wobLbf", base: "wob", units: { lbf: "lbf", klbf: "klbf", kn: "kN", tonne: "tonne" }, required: true },
  { key: "bitIn", base: "bit_size", units: { in: "in", mm: "mm" }, required: true },
  { key: "mudWeightPsiPerFt", base: "mud_weight", units: GRADIENT_UNITS, required: true },
  { key: "ecdPsiPerFt", base: "ecd", units: GRADIENT_UNITS, required: false },
  { key: "backgroundGasUnits", base: "background_gas", units: { units: "unit" }, required: false },
  { key: "connectionGasUnits", base: "connection_gas", units: { units: "unit" }, required: false },
];

/** Drilling data as columns on one depth index, internal units; NaN = missing. */
export interface DrillingDataColumns {
  /** TVD below RT, ft, strictly increasing. */
  tvdFt: Float64Array;
  /** MD below RT, ft (NaN when the file has no MD column). */
  mdFt: Float64Array;
  /** Rate of penetration, ft/h. */
  ropFtPerH: Float64Array;
  /** Rotary speed, rpm. */
  rotaryRpm: Float64Array;
  /** Weight on bit, lbf. */
  wobLbf: Float64Array;
  /** Bit diameter, in. */
  bitIn: Float64Array;
  /** Mud weight in use, psi/ft. */
  mudWeightPsiPerFt: Float64Array;
  /** Equivalent circulating density, psi/ft (NaN when not given). */
  ecdPsiPerFt: Float64Array;
  /** Background gas, gas units. */
  backgroundGasUnits: Float64Array;
  /** Connection gas, gas units. */
  connectionGasUnits: Float64Array;
}

/** Result of {@link readDrillingData}. */
export interface DrillingDataReadResult {
  data: DrillingDataColumns;
  /** Header found for each field, e.g. `{ ropFtPerH: "rop_m_per_h" }`. */
  columns: Record<string, string>;
  /** 1-based file line of each row, for messages downstream. */
  lines: Int32Array;
}

/** A number passing `ok`, or NaN (an empty cell). */
const numberOrNaN = (ok: (v: number) => boolean, message: string) =>
  z.custom<number>((v) => typeof v === "number" && (Number.isNaN(v) || (Number.isFinite(v) && ok(v))), { message });
const nonNegativeOrNaN = numberOrNaN((v) => v >= 0, "must be ≥ 0 or empty");

/** One drilling-data row in internal units (NaN = empty cell), as validated. */
export const drillingDataRowSchema = z.object({
  tvdFt: z.number().finite().min(0),
  mdFt: nonNegativeOrNaN,
  ropFtPerH: numberOrNaN((v) => v > 0, "rate of penetration must be > 0 or empty"),
  rotaryRpm: numberOrNaN((v) => v > 0, "rotary speed must be > 0 or empty"),
  wobLbf: numberOrNaN((v) => v > 0, "weight on bit must be > 0 or empty"),
  bitIn: numberOrNaN((v) => v >= 3 && v <= 36, "bit size must be 3–36 in (check in vs mm)"),
  mudWeightPsiPerFt: numberOrNaN((v) => v >= 0.3 && v <= 1.2, "mud weight must be 0.3–1.2 psi/ft (5.8–23 ppg)"),
  ecdPsiPerFt: numberOrNaN((v) => v >= 0.3 && v <= 1.3, "ECD must be 0.3–1.3 psi/ft (5.8–25 ppg)"),
  backgroundGasUnits: nonNegativeOrNaN,
  connectionGasUnits: nonNegativeOrNaN,
});

const DECIMAL_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Read a drilling-data CSV into columns in internal units (ft, ft/h, rpm, lbf, in, psi/ft,
 * gas units).
 *
 * @param text CSV text (header on the first non-blank line)
 * @param options.file file name for messages
 * @returns {@link DrillingDataReadResult}
 * @throws ShalepointError E_CSV_MISSING_COLUMN, E_CSV_UNKNOWN_COLUMN, E_CSV_DUPLICATE_COLUMN,
 *   E_CSV_VALUE (not a number, out of range, depth not increasing) with file, line, row, column
 * @example
 * readDrillingData("tvd_ft,rop_ft_per_h,rotary_speed_rpm,wob_klbf,bit_size_in,mud_weight_ppg\n9000,30,120,35,8.5,10\n").data.wobLbf[0]
 * // 35000
 */
export function readDrillingData(text: string, options: { file?: string } = {}): DrillingDataReadResult {
  const file = options.file;
  const table = parseCsv(text, { file });
  const lower = table.header.map((h) => h.toLowerCase());
  const found = new Map<string, { index: number; unit: UnitId }>();
  const used = new Set<number>();
  const columns: Record<string, string> = {};
  for (const col of DRILLING_DATA_COLUMNS) {
    const hits: { index: number; unit: UnitId }[] = [];
    lower.forEach((h, i) => {
      if (!h.startsWith(col.base + "_")) return;
      const unit = col.units[h.slice(col.base.length + 1)];
      if (unit !== undefined) hits.push({ index: i, unit });
    });
    if (hits.length > 1) {
      throw new ShalepointError("E_CSV_DUPLICATE_COLUMN", `drilling data: ${col.base} is given twice`, {
        file,
        line: table.headerLine,
        column: hits.map((h) => table.header[h.index]).join(", "),
        hint: "Keep one column per quantity, in one unit.",
      });
    }
    if (hits.length === 1) {
      found.set(col.key, hits[0]);
      used.add(hits[0].index);
      columns[col.key] = table.header[hits[0].index];
    }
  }
  lower.forEach((h, i) => {
    if (used.has(i) || h === "comment") return;
    const near = DRILLING_DATA_COLUMNS.find((c) => h.startsWith(c.base + "_") || h === c.base);
    throw new ShalepointError("E_CSV_UNKNOWN_COLUMN", `drilling data: unknown column ${table.header[i]}`, {
      file,
      line: table.headerLine,
      column: table.header[i],
      allowed: near
        ? Object.keys(near.units).map((u) => `${near.base}_${u}`).join(", ")
        : [...DRILLING_DATA_COLUMNS.map((c) => `${c.base}_<unit>`), "comment"].join(", "),
      hint: near ? "The unit suffix is not one this column accepts." : undefined,
    });
  });

  for (const col of DRILLING_DATA_COLUMNS) {
    if (col.required && !found.has(col.key)) {
      throw new ShalepointError("E_CSV_MISSING_COLUMN", `drilling data: missing column ${col.base}_<unit>`, {
        file,
        line: table.headerLine,
        column: col.base,
        allowed: Object.keys(col.units).map((u) => `${col.base}_${u}`).join(", "),
      });
    }
  }
  const n = table.rows.length;
  const data = {} as DrillingDataColumns;
  for (const col of DRILLING_DATA_COLUMNS) data[col.key] = new Float64Array(n).fill(NaN);
  const lines = new Int32Array(n);
  let prevTvd = -Infinity;
  table.rows.forEach((r, k) => {
    const row: Record<string, number> = {};
    for (const col of DRILLING_DATA_COLUMNS) {
      const hit = found.get(col.key);
      const cell = hit ? r.fields[hit.index] ?? "" : "";
      if (cell === "") {
        row[col.key] = NaN;
        continue;
      }
      if (!DECIMAL_RE.test(cell)) {
        throw new ShalepointError("E_CSV_VALUE", "drilling data: not a number", { file, line: r.line, row: r.row, column: columns[col.key], value: cell });
      }
      row[col.key] = Number(cell) * UNITS[hit!.unit].factor;
    }
    const parsed = drillingDataRowSchema.safeParse(row);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const key = String(issue.path[0] ?? "");
      const hit = found.get(key);
      throw new ShalepointError("E_CSV_VALUE", `drilling data: ${issue.message}`, {
        file,
        line: r.line,
        row: r.row,
        column: columns[key] ?? key,
        value: hit ? r.fields[hit.index] : "",
        param: key,
      });
    }
    if (!(row.tvdFt > prevTvd)) {
      throw new ShalepointError("E_CSV_VALUE", "drilling data: depth must increase down the file", {
        file,
        line: r.line,
        row: r.row,
        column: columns.tvdFt,
        value: r.fields[found.get("tvdFt")!.index],
        allowed: `> ${prevTvd} ft`,
        hint: "Sort the rows by depth and drop repeated depths.",
      });
    }
    prevTvd = row.tvdFt;
    for (const col of DRILLING_DATA_COLUMNS) data[col.key][k] = row[col.key];
    lines[k] = r.line;
  });
  return { data, columns, lines };
}
