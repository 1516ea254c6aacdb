/**
 * Typed CSV tables of measured and drilling data, validated with zod and converted to
 * internal units on read.
 *
 * ## Header convention (shalepoint's own)
 * Every numeric column name is `<name>_<unit>` in lower snake case; the unit suffix is
 * case-insensitive and one of:
 * - depth: `ft`, `m`
 * - pressure: `psi`, `kpa`, `mpa`, `bar`
 * - mud weight / EMW (a pressure gradient): `ppg`, `sg`, `psi_per_ft`, `kpa_per_m`
 * - angle: `deg`; gas reading: `units`
 * Text columns have no suffix. A `comment` column is allowed in every table and ignored.
 * Unknown columns are an error (they are usually a misspelt unit). Depths are TVD below the
 * rotary table, except the survey, whose depth is MD. Values are returned in internal units
 * (ft, psi, psi/ft, deg).
 *
 * | table | columns (required, [optional]) |
 * | --- | --- |
 * | formation-pressure tests | `tvd_*`, `pressure_*`, `quality` (good/fair/poor), [`fluid` (water/oil/gas/unknown)], [`sand`] |
 * | leak-off / integrity tests | `shoe_tvd_*`, `mud_weight_*`, `surface_pressure_*`, `test_type` (LOT/FIT/XLOT), [`closure_pressure_*`] |
 * | mud weights | (`tvd_*`) or (`tvd_from_*` and `tvd_to_*`), `mud_weight_*`, [`ecd_*`] |
 * | drilling events | `tvd_*`, `event` (kick/connection_gas/trip_gas/background_gas), [`emw_*`], [`gas_units`]; one of emw/gas needed |
 * | formation tops | `name`, `tvd_*` |
 * | directional survey | `md_*`, `inc_deg`, `azi_deg` |
 */
import { z } from "zod";
import { ShalepointError, type Warning } from "../errors.js";
import { UNITS, type UnitId } from "../units/index.js";
import { parseCsv } from "./csv.js";

type ColumnQuantity = "depth" | "pressure" | "gradient" | "angle" | "gas";

/** Accepted unit suffixes per quantity (lower case) → unit id. */
export const CSV_UNIT_SUFFIXES: Readonly<Record<ColumnQuantity, Readonly<Record<string, UnitId>>>> = {
  depth: { ft: "ft", m: "m" },
  pressure: { psi: "psi", kpa: "kPa", mpa: "MPa", bar: "bar" },
  gradient: { ppg: "ppg", sg: "sg", psi_per_ft: "psi/ft", kpa_per_m: "kPa/m" },
  angle: { deg: "deg" },
  gas: { units: "unit" },
};

interface NumCol {
  key: string;
  base: string;
  quantity: ColumnQuantity;
  required: boolean;
}
interface TextCol {
  key: string;
  name: string;
  required: boolean;
}
interface TableSpec {
  title: string;
  numeric: NumCol[];
  text: TextCol[];
}

/** Options of the table readers. */
export interface ReadTableOptions {
  /** File name for messages. */
  file?: string;
}

/** Traceability fields on every record. */
export interface RecordSource {
  /** 1-based data row (header excluded). */
  row: number;
  /** 1-based file line. */
  line: number;
}

/** Result of every table reader. */
export interface TableReadResult<T> {
  records: T[];
  /** Column header actually found for each field, e.g. `{ tvdFt: "tvd_m" }`. */
  columns: Record<string, string>;
  warnings: Warning[];
}

// ---- zod schemas (records in internal units) ------------------------------------------------

const depthFt = z.number().finite().min(0);
const positive = z.number().finite().positive();

/** Formation-pressure test point (sand), internal units. */
export const formationPressureTestSchema = z.object({
  tvdFt: depthFt,
  pressurePsi: positive,
  quality: z.enum(["good", "fair", "poor"]),
  fluid: z.enum(["water", "oil", "gas", "unknown"]).optional(),
  sand: z.string().min(1).optional(),
});
/** A formation-pressure test point: TVD (ft below RT), pressure (psi), quality flag. */
export type FormationPressureTest = z.infer<typeof formationPressureTestSchema> & RecordSource;

/** Leak-off / formation-integrity test, internal units. */
export const leakOffTestSchema = z.object({
  shoeTvdFt: z.number().finite().positive(),
  mudWeightPsiPerFt: positive,
  surfacePressurePsi: z.number().finite().min(0),
  testType: z.enum(["LOT", "FIT", "XLOT"]),
  closurePressurePsi: z.number().finite().min(0).optional(),
});
/**
 * A leak-off (LOT), formation-integrity (FIT) or extended leak-off (XLOT) test. Pressures
 * are surface readings; `emwPsiPerFt` = mud gradient + surface pressure / shoe TVD
 * (common practice, no source).
 */
export type LeakOffTest = z.infer<typeof leakOffTestSchema> & RecordSource & { emwPsiPerFt: number };

/** Mud weight used over a depth interval (or at one depth), internal units. */
export const mudWeightIntervalSchema = z
  .object({
    tvdFromFt: depthFt,
    tvdToFt: depthFt,
    mudWeightPsiPerFt: positive,
    ecdPsiPerFt: positive.optional(),
  })
  .refine((r) => r.tvdToFt >= r.tvdFromFt, { message: "tvd_to must not be shallower than tvd_from", path: ["tvdToFt"] });
/** Mud weight used while drilling, from `tvdFromFt` to `tvdToFt` (equal for a point). */
export type MudWeightInterval = z.infer<typeof mudWeightIntervalSchema> & RecordSource;

/** Kick or gas event, internal units. */
export const drillingEventSchema = z
  .object({
    tvdFt: depthFt,
    event: z.enum(["kick", "connection_gas", "trip_gas", "background_gas"]),
    emwPsiPerFt: positive.optional(),
    gasUnits: z.number().finite().min(0).optional(),
  })
  .refine((r) => r.emwPsiPerFt !== undefined || r.gasUnits !== undefined, {
    message: "give an EMW or a gas reading",
    path: ["emwPsiPerFt"],
  });
/** A kick (with the EMW that controlled it) or gas show (with gas units). */
export type DrillingEvent = z.infer<typeof drillingEventSchema> & RecordSource;

/** Formation top. */
export const formationTopSchema = z.object({ name: z.string().min(1), tvdFt: depthFt });
/** A formation top: name and TVD (ft below RT). */
export type FormationTop = z.infer<typeof formationTopSchema> & RecordSource;

/** Directional survey station (depth is MD). */
export const surveyStationSchema = z.object({
  mdFt: depthFt,
  incDeg: z.number().finite().min(0).max(180),
  aziDeg: z.number().finite().min(0).lt(360),
});
/** A survey station: MD (ft), inclination and azimuth (degrees). */
export type SurveyStationRecord = z.infer<typeof surveyStationSchema> & RecordSource;

// ---- generic reader ---------------------------------------------------------------------------

const DECIMAL_RE = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function accepted(col: NumCol): string {
  return Object.keys(CSV_UNIT_SUFFIXES[col.quantity]).map((u) => `${col.base}_${u}`).join(", ");
}

function readTable<S extends z.ZodType>(
  text: string,
  spec: TableSpec,
  schema: S,
  options: ReadTableOptions,
): { records: (z.infer<S> & RecordSource)[]; columns: Record<string, string> } {
  const file = options.file;
  const table = parseCsv(text, { file });
  const lower = table.header.map((h) => h.toLowerCase());
  const used = new Set<number>();
  const numIdx = new Map<string, { index: number; unit: UnitId }>();
  const textIdx = new Map<string, number>();
  const columns: Record<string, string> = {};

  for (const col of spec.numeric) {
    const matches: { index: number; unit: UnitId }[] = [];
    lower.forEach((h, i) => {
      if (!h.startsWith(col.base + "_")) return;
      const suffix = h.slice(col.base.length + 1);
      const unit = CSV_UNIT_SUFFIXES[col.quantity][suffix];
      if (unit !== undefined) matches.push({ index: i, unit });
    });
    if (matches.length > 1) {
      throw new ShalepointError("E_CSV_DUPLICATE_COLUMN", `${spec.title}: ${col.base} is given twice`, {
        file,
        line: table.headerLine,
        column: matches.map((m) => table.header[m.index]).join(", "),
        hint: "Keep one column per quantity, in one unit.",
      });
    }
    if (matches.length === 1) {
      numIdx.set(col.key, matches[0]);
      used.add(matches[0].index);
      columns[col.key] = table.header[matches[0].index];
    }
  }
  for (const col of spec.text) {
    const i = lower.indexOf(col.name);
    if (i !== -1) {
      textIdx.set(col.key, i);
      used.add(i);
      columns[col.key] = table.header[i];
    }
  }
  // unknown columns (usually a misspelt or unsupported unit)
  lower.forEach((h, i) => {
    if (used.has(i) || h === "comment") return;
    const near = spec.numeric.find((c) => h.startsWith(c.base + "_") || h === c.base);
    throw new ShalepointError("E_CSV_UNKNOWN_COLUMN", `${spec.title}: unknown column ${table.header[i]}`, {
      file,
      line: table.headerLine,
      column: table.header[i],
      allowed: near ? accepted(near) : [...spec.numeric.map((c) => `${c.base}_<unit>`), ...spec.text.map((c) => c.name), "comment"].join(", "),
      hint: near ? `Units accepted for ${near.base}: ${Object.keys(CSV_UNIT_SUFFIXES[near.quantity]).join(", ")}.` : undefined,
    });
  });
  for (const col of spec.numeric) {
    if (col.required && !numIdx.has(col.key)) {
      throw new ShalepointError("E_CSV_MISSING_COLUMN", `${spec.title}: missing column ${col.base}_<unit>`, {
        file,
        line: table.headerLine,
        column: col.base,
        allowed: accepted(col),
      });
    }
  }
  for (const col of spec.text) {
    if (col.required && !textIdx.has(col.key)) {
      throw new ShalepointError("E_CSV_MISSING_COLUMN", `${spec.title}: missing column ${col.name}`, {
        file,
        line: table.headerLine,
        column: col.name,
      });
    }
  }

  const records: (z.infer<S> & RecordSource)[] = [];
  for (const r of table.rows) {
    const obj: Record<string, unknown> = {};
    for (const [key, { index, unit }] of numIdx) {
      const cell = r.fields[index];
      if (cell === "") continue;
      if (!DECIMAL_RE.test(cell)) {
        throw new ShalepointError("E_CSV_VALUE", `${spec.title}: not a number`, {
          file,
          line: r.line,
          row: r.row,
          column: table.header[index],
          value: cell,
        });
      }
      obj[key] = Number(cell) * UNITS[unit].factor;
    }
    for (const [key, index] of textIdx) {
      const cell = r.fields[index];
      if (cell !== "") obj[key] = cell;
    }
    const parsed = schema.safeParse(obj);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const key = String(issue.path[0] ?? "");
      const header = columns[key] ?? spec.numeric.find((c) => c.key === key)?.base ?? spec.text.find((c) => c.key === key)?.name ?? key;
      const index = table.header.indexOf(header);
      throw new ShalepointError("E_CSV_VALUE", `${spec.title}: ${issue.message}`, {
        file,
        line: r.line,
        row: r.row,
        column: header,
        value: index >= 0 ? r.fields[index] : undefined,
        param: key,
      });
    }
    records.push({ ...(parsed.data as object), row: r.row, line: r.line } as z.infer<S> & RecordSource);
  }
  return { records, columns };
}

// ---- table readers ------------------------------------------------------------------------------

/**
 * Read formation-pressure test points. Columns: `tvd_ft|m`, `pressure_psi|kpa|mpa|bar`,
 * `quality` (good/fair/poor), optional `fluid` (water/oil/gas/unknown), `sand`, `comment`.
 * @returns records with `tvdFt` (ft TVD below RT) and `pressurePsi` (psi)
 * @throws ShalepointError E_CSV_* with file, line, row and column
 * @example readFormationPressureTests("tvd_m,pressure_MPa,quality\n3000,35.30,good\n").records[0].pressurePsi // ≈ 5119.8
 */
export function readFormationPressureTests(text: string, options: ReadTableOptions = {}): TableReadResult<FormationPressureTest> {
  const { records, columns } = readTable(
    text,
    {
      title: "formation-pressure tests",
      numeric: [
        { key: "tvdFt", base: "tvd", quantity: "depth", required: true },
        { key: "pressurePsi", base: "pressure", quantity: "pressure", required: true },
      ],
      text: [
        { key: "quality", name: "quality", required: true },
        { key: "fluid", name: "fluid", required: false },
        { key: "sand", name: "sand", required: false },
      ],
    },
    formationPressureTestSchema,
    options,
  );
  return { records, columns, warnings: [] };
}

/**
 * Read leak-off / formation-integrity tests. Columns: `shoe_tvd_ft|m`,
 * `mud_weight_ppg|sg|psi_per_ft|kpa_per_m`, `surface_pressure_psi|kpa|mpa|bar`, `test_type`
 * (LOT/FIT/XLOT), optional `closure_pressure_*` (surface reading).
 * Each record also gets `emwPsiPerFt = mudWeightPsiPerFt + surfacePressurePsi / shoeTvdFt`
 * (common practice, no source; EMW_LOT = MW + P_surface / (0.052 · D_shoe) in ppg).
 * @returns records in ft, psi/ft, psi
 * @throws ShalepointError E_CSV_* with file, line, row and column
 * @example // shoe 4000 ft, 10.0 ppg, 1040 psi → emw ≈ 15.005 ppg (15.00 with the 0.052 factor)
 */
export function readLeakOffTests(text: string, options: ReadTableOptions = {}): TableReadResult<LeakOffTest> {
  const { records, columns } = readTable(
    text,
    {
      title: "leak-off tests",
      numeric: [
        { key: "shoeTvdFt", base: "shoe_tvd", quantity: "depth", required: true },
        { key: "mudWeightPsiPerFt", base: "mud_weight", quantity: "gradient", required: true },
        { key: "surfacePressurePsi", base: "surface_pressure", quantity: "pressure", required: true },
        { key: "closurePressurePsi", base: "closure_pressure", quantity: "pressure", required: false },
      ],
      text: [{ key: "testType", name: "test_type", required: true }],
    },
    leakOffTestSchema,
    options,
  );
  return {
    records: records.map((r) => ({ ...r, emwPsiPerFt: r.mudWeightPsiPerFt + r.surfacePressurePsi / r.shoeTvdFt })),
    columns,
    warnings: [],
  };
}

/**
 * Read mud weights used while drilling. Columns: either `tvd_*` (a point) or `tvd_from_*`
 * and `tvd_to_*`; `mud_weight_*`; optional `ecd_*` (gradient units).
 * @returns records with `tvdFromFt`, `tvdToFt` (equal for a point), `mudWeightPsiPerFt`, `ecdPsiPerFt`
 * @throws ShalepointError E_CSV_* with file, line, row and column
 * @example readMudWeights("tvd_ft,mud_weight_ppg\n5000,10\n").records[0].mudWeightPsiPerFt // 0.5195 (10 × 12/231)
 */
export function readMudWeights(text: string, options: ReadTableOptions = {}): TableReadResult<MudWeightInterval> {
  const table = parseCsv(text, { file: options.file });
  const lower = table.header.map((h) => h.toLowerCase());
  const interval = lower.some((h) => h.startsWith("tvd_from_") || h.startsWith("tvd_to_"));
  if (!interval) {
    const { records, columns } = readTable(
      text,
      {
        title: "mud weights",
        numeric: [
          { key: "tvdFt", base: "tvd", quantity: "depth", required: true },
          { key: "mudWeightPsiPerFt", base: "mud_weight", quantity: "gradient", required: true },
          { key: "ecdPsiPerFt", base: "ecd", quantity: "gradient", required: false },
        ],
        text: [],
      },
      z.object({ tvdFt: depthFt, mudWeightPsiPerFt: positive, ecdPsiPerFt: positive.optional() }),
      options,
    );
    const out: MudWeightInterval[] = records.map(({ tvdFt, ...rest }) => ({ ...rest, tvdFromFt: tvdFt, tvdToFt: tvdFt }));
    return { records: out, columns: { ...columns, tvdFromFt: columns.tvdFt, tvdToFt: columns.tvdFt }, warnings: [] };
  }
  const { records, columns } = readTable(
    text,
    {
      title: "mud weights",
      numeric: [
        { key: "tvdFromFt", base: "tvd_from", quantity: "depth", required: true },
        { key: "tvdToFt", base: "tvd_to", quantity: "depth", required: true },
        { key: "mudWeightPsiPerFt", base: "mud_weight", quantity: "gradient", required: true },
        { key: "ecdPsiPerFt", base: "ecd", quantity: "gradient", required: false },
      ],
      text: [],
    },
    mudWeightIntervalSchema,
    options,
  );
  return { records, columns, warnings: [] };
}

/**
 * Read kicks and gas events. Columns: `tvd_*`, `event` (kick / connection_gas / trip_gas /
 * background_gas), optional `emw_*` (gradient units) and `gas_units`; each row needs one of them.
 * @returns records with `tvdFt`, `event`, `emwPsiPerFt?`, `gasUnits?`
 * @throws ShalepointError E_CSV_* with file, line, row and column
 * @example readDrillingEvents("tvd_ft,event,emw_ppg\n9000,kick,12.5\n").records[0].emwPsiPerFt // 0.6494
 */
export function readDrillingEvents(text: string, options: ReadTableOptions = {}): TableReadResult<DrillingEvent> {
  const { records, columns } = readTable(
    text,
    {
      title: "drilling events",
      numeric: [
        { key: "tvdFt", base: "tvd", quantity: "depth", required: true },
        { key: "emwPsiPerFt", base: "emw", quantity: "gradient", required: false },
        { key: "gasUnits", base: "gas", quantity: "gas", required: false },
      ],
      text: [{ key: "event", name: "event", required: true }],
    },
    drillingEventSchema,
    options,
  );
  return { records, columns, warnings: [] };
}

/**
 * Read formation tops. Columns: `name`, `tvd_*`.
 * @returns records `{ name, tvdFt }`
 * @throws ShalepointError E_CSV_* with file, line, row and column
 * @example readFormationTops("name,tvd_m\nVeyra Shale,2500\n").records[0].tvdFt // 8202.1
 */
export function readFormationTops(text: string, options: ReadTableOptions = {}): TableReadResult<FormationTop> {
  const { records, columns } = readTable(
    text,
    {
      title: "formation tops",
      numeric: [{ key: "tvdFt", base: "tvd", quantity: "depth", required: true }],
      text: [{ key: "name", name: "name", required: true }],
    },
    formationTopSchema,
    options,
  );
  return { records, columns, warnings: [] };
}

/**
 * Read a directional survey. Columns: `md_ft|m`, `inc_deg`, `azi_deg`. Depth is MD (not TVD).
 * MD must increase strictly from row to row.
 * @returns records `{ mdFt, incDeg, aziDeg }`
 * @throws ShalepointError E_CSV_* with file, line, row and column; `E_CSV_ORDER` when MD does not increase
 * @example readDirectionalSurvey("md_ft,inc_deg,azi_deg\n0,0,0\n1000,5,45\n").records.length // 2
 */
export function readDirectionalSurvey(text: string, options: ReadTableOptions = {}): TableReadResult<SurveyStationRecord> {
  const { records, columns } = readTable(
    text,
    {
      title: "directional survey",
      numeric: [
        { key: "mdFt", base: "md", quantity: "depth", required: true },
        { key: "incDeg", base: "inc", quantity: "angle", required: true },
        { key: "aziDeg", base: "azi", quantity: "angle", required: true },
      ],
      text: [],
    },
    surveyStationSchema,
    options,
  );
  for (let i = 1; i < records.length; i++) {
    if (!(records[i].mdFt > records[i - 1].mdFt)) {
      throw new ShalepointError("E_CSV_ORDER", "directional survey: MD must increase from row to row", {
        file: options.file,
        line: records[i].line,
        row: records[i].row,
        column: columns.mdFt,
        value: `${records[i - 1].mdFt} then ${records[i].mdFt}`,
        unit: "ft",
      });
    }
  }
  return { records, columns, warnings: [] };
}
