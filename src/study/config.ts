/**
 * Study configuration: one JSON file per study, validated with zod.
 *
 * A study names its wells (LAS file, optional survey and CSV tables), the hydrostatic
 * gradient and datums, the normal compaction trends (fitted on depth intervals or read from
 * trend files), the pore-pressure methods and their parameters, the calibration data, the
 * fracture model, the mud-weight margins, optional Monte Carlo settings and the output
 * folder. Objects are strict: an unknown key is an error that names the key path and the
 * keys allowed there. Quantities with a unit are written `{ "value": 0.445, "unit": "psi/ft" }`
 * and converted to internal units (ft, psi, psi/ft) on load.
 *
 * Published defaults are documented in each key's `.describe()` text; they are the values
 * the study runner uses when a key is left out.
 */
import { createHash } from "node:crypto";
import { readFileSync, statSync } from "node:fs";
import { dirname, isAbsolute, resolve } from "node:path";
import { z } from "zod";
import { ShalepointError } from "../errors.js";
import { UNITS, type UnitId } from "../units/index.js";

/** Depth units a study file may use. */
export const STUDY_DEPTH_UNITS = ["ft", "m"] as const;
/** Gradient units a study file may use (EMW). */
export const STUDY_GRADIENT_UNITS = ["psi/ft", "kPa/m", "MPa/km", "ppg", "sg"] as const;
/** Pressure units a study file may use. */
export const STUDY_PRESSURE_UNITS = ["psi", "kPa", "MPa"] as const;
/** Velocity units a study file may use. */
export const STUDY_VELOCITY_UNITS = ["ft/s", "m/s"] as const;

const finite = z.number().finite();
const depthQuantity = z
  .strictObject({ value: finite.min(0), unit: z.enum(STUDY_DEPTH_UNITS).describe("ft or m") })
  .describe("a depth with its unit, e.g. { \"value\": 1500, \"unit\": \"ft\" }");
const gradientQuantity = z
  .strictObject({ value: finite.positive(), unit: z.enum(STUDY_GRADIENT_UNITS).describe("psi/ft, kPa/m, MPa/km, ppg or sg") })
  .describe("a pressure gradient (EMW) with its unit, e.g. { \"value\": 0.445, \"unit\": \"psi/ft\" }");
const velocityQuantity = z
  .strictObject({ value: finite.positive(), unit: z.enum(STUDY_VELOCITY_UNITS).describe("ft/s or m/s") })
  .describe("a velocity with its unit, e.g. { \"value\": 5000, \"unit\": \"ft/s\" }");
const pressureQuantity = z
  .strictObject({ value: finite.min(0), unit: z.enum(STUDY_PRESSURE_UNITS).describe("psi, kPa or MPa") })
  .describe("a pressure with its unit, e.g. { \"value\": 300, \"unit\": \"psi\" }");
const relPath = z.string().min(1).describe("file path, relative to the study file");

const bmlInterval = z
  .strictObject({
    top: finite.min(0).describe("top of the interval, depth below mudline"),
    base: finite.positive().describe("base of the interval, depth below mudline"),
    unit: z.enum(STUDY_DEPTH_UNITS).describe("ft or m"),
  })
  .refine((r) => r.base > r.top, { message: "base must be deeper than top", path: ["base"] })
  .describe("a depth interval below the mudline used to fit a normal compaction trend (hydrostatic shale)");

const trendChoice = z.union([
  z
    .strictObject({
      fitIntervals: z.array(bmlInterval).min(1).describe("intervals (below mudline) of normally pressured shale to fit on"),
      method: z
        .enum(["huber", "leastSquares"])
        .optional()
        .describe("fit method; default huber (Huber 1964, Ann. Math. Statist. 35(1):73–101, robust to outliers)"),
      dtMatrixUsPerFt: finite
        .gt(40)
        .lt(90)
        .optional()
        .describe("sonic trend only: matrix slowness Δtm, µs/ft; default 65 (Zhang 2011, Earth-Sci. Rev. 108:50–63, exponential trend)"),
    })
    .describe("fit the trend on shale points in the given intervals"),
  z.strictObject({ file: relPath.describe("a shalepoint trend file (JSON) saved by the trend-picking page") }),
]);

const shaleSchema = z
  .strictObject({
    grCutoffApi: finite.gt(0).lt(300).describe("gamma-ray cutoff, API: samples at or above it are shale; typical 75–95"),
    minBedThicknessFt: finite.min(0).optional().describe("thinnest shale bed kept, ft; default 10"),
    pointSpacingFt: finite.positive().optional().describe("one shale point per this many ft; default 20"),
    maxGapFt: finite.positive().optional().describe("longest gap the shale line bridges, ft; default 1000"),
    exclude: z
      .array(z.strictObject({ top: finite.min(0), base: finite.min(0), unit: z.enum(STUDY_DEPTH_UNITS) }))
      .optional()
      .describe("TVD intervals (below rotary table) forced out of the shale set"),
  })
  .describe("how shale is picked from the gamma ray");

const methodsSchema = z
  .strictObject({
    shale: shaleSchema,
    sonicTrend: trendChoice.optional().describe("normal compaction trend of sonic slowness (needed by eatonSonic and equivalentDepth)"),
    resistivityTrend: trendChoice.optional().describe("normal compaction trend of deep resistivity (needed by eatonResistivity)"),
    eatonSonic: z
      .strictObject({
        exponent: finite.positive().max(10).optional().describe("Eaton sonic exponent; default 3.0 (Eaton 1975, SPE-5544)"),
      })
      .optional()
      .describe("Eaton (1975) pore pressure from sonic slowness"),
    eatonResistivity: z
      .strictObject({
        exponent: finite.positive().max(10).optional().describe("Eaton resistivity exponent; default 1.2 (Eaton 1975, SPE-5544)"),
      })
      .optional()
      .describe("Eaton (1975) pore pressure from deep resistivity"),
    bowers: z
      .strictObject({
        a: finite.positive().describe("Bowers A (V ft/s, σ psi); typical 10–20 (Bowers 1995, SPE Drill. & Compl. 10(2):89–95, eq. 1)"),
        b: finite.positive().max(2).describe("Bowers B; typical 0.7–0.85 (Bowers 1995, eq. 1)"),
        v0: velocityQuantity.optional().describe("velocity at zero effective stress; default 5000 ft/s (Bowers 1995)"),
        unloading: z
          .strictObject({
            onsetTvd: depthQuantity.describe("TVD below rotary table where unloading begins"),
            u: finite.min(1).max(20).describe("unloading exponent U ≥ 1; typical 3–8 (Bowers 1995, eq. 3)"),
          })
          .optional()
          .describe("unloading zone (Bowers 1995, eq. 3)"),
      })
      .optional()
      .describe("Bowers (1995) velocity–effective-stress pore pressure"),
    equivalentDepth: z.boolean().optional().describe("run the equivalent-depth method (Foster & Whalen 1966, JPT 18(2):165–171); default false"),
    primary: z
      .enum(["eatonSonic", "eatonResistivity", "bowers", "equivalentDepth"])
      .optional()
      .describe("method whose pore pressure feeds the fracture gradient and window; default bowers, else eatonSonic"),
  })
  .describe("pore-pressure methods and their parameters");

const calibrationSchema = z
  .strictObject({
    useQualities: z
      .array(z.enum(["good", "fair", "poor"]))
      .min(1)
      .optional()
      .describe("pressure-test qualities used as calibration points; default [\"good\"]"),
    fitEatonExponents: z.boolean().optional().describe("fit the Eaton exponents to the calibration points; default false"),
    fitBowers: z.boolean().optional().describe("fit Bowers A and B (and U) to the calibration points; default false"),
  })
  .describe("calibration of the pore-pressure methods to measured pressures");

const fractureSchema = z
  .discriminatedUnion("method", [
    z.strictObject({
      method: z.literal("eaton1969"),
      poissonRatio: finite.gt(0).lt(0.5).describe("Poisson's ratio ν in (0, 0.5); typical 0.40–0.47 in soft shale (Eaton 1969, JPT 21(10):1353–1360)"),
      calibrateToLeakOffTests: z.boolean().optional().describe("fit ν to the leak-off tests; default true"),
    }),
    z.strictObject({
      method: z.literal("stressRatio"),
      stressRatio: finite.gt(0).lt(1).describe("effective stress ratio K = (Shmin − Pp)/(Sv − Pp); Hubbert & Willis 1957 bounds 1/3–1/2"),
      calibrateToLeakOffTests: z.boolean().optional().describe("fit K to the leak-off tests; default true"),
    }),
    z.strictObject({ method: z.literal("hubbertWillisMin") }),
  ])
  .describe("fracture (least stress) model: eaton1969, stressRatio or hubbertWillisMin");

const ucsSourceSchema = z
  .discriminatedUnion("source", [
    z.strictObject({ source: z.literal("horsrud2001") }).describe("Horsrud 2001 (SPE Drilling & Completion 16(2)) shale correlation on the shale-line slowness"),
    z.strictObject({ source: z.literal("lal1999") }).describe("Lal 1999 (SPE-54356) shale correlation on the shale-line slowness"),
    z.strictObject({
      source: z.literal("curve"),
      mnemonic: z.string().min(1).describe("LAS mnemonic of a UCS curve (its LAS unit must be a pressure unit: PSI, KPA, MPA)"),
    }),
    z.strictObject({
      source: z.literal("formula"),
      expression: z.string().min(1).max(500).describe("mathjs expression over LAS mnemonics in shalepoint's internal units (DT µs/ft, RHOB g/cc, …), e.g. \"0.77 * (304.8 / DT) ^ 2.93\""),
      unit: z.enum(["psi", "MPa"]).describe("unit the expression returns"),
    }),
  ])
  .describe("unconfined compressive strength: a published correlation, a curve, or a local formula");

const wellboreSchema = z
  .strictObject({
    shmaxFraction: finite
      .min(0)
      .max(1)
      .optional()
      .describe("assumed SHmax = Shmin + f·(Sv − Shmin); default 0 (equal horizontal stresses: common practice, no source, for a relaxed basin without breakout data)"),
    ucs: ucsSourceSchema.optional().describe("default horsrud2001"),
    internalFriction: finite.min(0).max(1.5).optional().describe("internal friction coefficient μi for Mohr–Coulomb breakout; default 0.6"),
    tensileStrength: pressureQuantity.optional().describe("rock tensile strength for breakdown; default 0 (conservative)"),
  })
  .describe("vertical-well collapse (breakout) and breakdown limits by Kirsch (1898); without it the window uses pore pressure and fracture pressure only");

const wellSchema = z
  .strictObject({
    id: z
      .string()
      .regex(/^[a-z0-9][a-z0-9-]*$/, "lower-case letters, digits and '-' only")
      .describe("short id used in output file names, e.g. quillon-a1"),
    las: relPath.describe("LAS 2.0 log file"),
    name: z.string().min(1).optional().describe("well name; default the LAS ~W WELL item"),
    survey: relPath.optional().describe("directional survey CSV (MD, inclination, azimuth); without it the well is vertical"),
    pressureTests: relPath.optional().describe("formation-pressure test CSV"),
    leakOffTests: relPath.optional().describe("leak-off / formation-integrity test CSV"),
    mudWeights: relPath.optional().describe("mud weights used CSV"),
    drillingEvents: relPath.optional().describe("kicks and gas events CSV"),
    formationTops: relPath.optional().describe("formation tops CSV"),
    unitSystem: z
      .enum(["oilfield", "metric"])
      .optional()
      .describe("unit system of the well's files, for the record; outputs are written in oilfield units (ft, psi, psi/ft)"),
    datums: z
      .strictObject({
        airGap: depthQuantity.optional().describe("rotary table above sea level; default LAS ~W ERT/EKB"),
        waterDepth: depthQuantity.optional().describe("water depth; default LAS ~W WDEP"),
        seawaterDensityGcc: finite.gt(0.9).lt(1.2).optional().describe("seawater density, g/cc; default LAS ~W SWDEN, typical 1.03"),
      })
      .optional()
      .describe("datum overrides; by default read from the LAS header"),
    hydrostaticGradient: gradientQuantity
      .optional()
      .describe("normal pore-fluid gradient from sea level; default LAS ~P HYDG; typical brine 0.44–0.465 psi/ft"),
    methods: methodsSchema,
    calibration: calibrationSchema.optional(),
    fracture: fractureSchema,
    wellbore: wellboreSchema.optional(),
    firstShoeBelowMudline: depthQuantity
      .optional()
      .describe("depth below mudline of the first (structural) casing shoe; casing points are chosen below it; default 1500 ft"),
  })
  .describe("one well of the study");

const distributionSpread = z
  .strictObject({ std: finite.min(0).describe("standard deviation of a normal spread around the chosen value") })
  .describe("a normal spread around the value used in the deterministic run");

const uncertaintySchema = z
  .strictObject({
    realisations: z.number().int().min(10).max(100000).describe("Monte Carlo realisations; ≥ 10, 1000 or more for a report"),
    seed: z.number().int().min(0).max(4294967295).describe("random seed (same seed, same result)"),
    depthStepFt: finite.min(0.1).max(500).optional().describe("depth step of the Monte Carlo run, ft; results are interpolated onto the log index; default 10"),
    spreads: z
      .strictObject({
        eatonExponent: distributionSpread.optional().describe("spread of the Eaton sonic exponent; default std 0.3"),
        poissonRatio: distributionSpread.optional().describe("spread of ν; default std 0.02"),
        overburdenFactor: distributionSpread.optional().describe("spread of the overburden factor around 1; default std 0.02"),
      })
      .optional(),
  })
  .describe("Monte Carlo uncertainty on the Eaton sonic pore pressure and fracture gradient (P10/P50/P90)");

const marginsSchema = z
  .strictObject({
    tripPpg: finite.min(0).max(3).optional().describe("trip (swab) margin over pore pressure, ppg; default 0.3 (common practice, no source)"),
    kickPpg: finite.min(0).max(3).optional().describe("kick margin under fracture gradient, ppg; default 0.3 (common practice, no source)"),
    shoeSafetyPpg: finite.min(0).max(3).optional().describe("safety margin at a casing shoe, ppg; default 0.2 (common practice, no source)"),
    minWindowPpg: finite.min(0).max(5).optional().describe("narrowest acceptable window, ppg; default 0.5"),
  })
  .describe("mud-weight window margins");

/** The zod schema of a study file (strict: unknown keys are errors). */
export const studyConfigSchema = z
  .strictObject({
    title: z.string().min(1).max(200).describe("study title shown in the report"),
    output: z
      .strictObject({
        folder: relPath.describe("output folder, relative to the study file; created if missing; must not be a folder holding input files"),
        report: z.boolean().optional().describe("write report.html; default true"),
        chartPng: z.boolean().optional().describe("write pressure-chart.png with headless Chromium when available; default true"),
      })
      .describe("where and what to write"),
    wells: z.array(wellSchema).min(1).max(50).describe("the wells of the study (one or more)"),
    margins: marginsSchema.optional(),
    frictionCoefficient: finite.min(0).max(2).optional().describe("friction coefficient μ for stress bounds; default 0.6 (Zoback 2007, ch. 4)"),
    uncertainty: uncertaintySchema.optional(),
  })
  .describe("a shalepoint study");

/** The study file as written (units as given). */
export type StudyConfigFile = z.infer<typeof studyConfigSchema>;

/** A loaded study: the validated file, with every path absolute and the source text's hash. */
export interface StudyConfig {
  /** The validated file content (paths as written). */
  file: StudyConfigFile;
  /** Absolute path of the study file (or `<inline>`). */
  configPath: string;
  /** Folder that relative paths resolve against. */
  baseDir: string;
  /** SHA-256 of the study file text, hex. */
  configSha256: string;
  /** Output folder, absolute. */
  outDir: string;
  /** Per well, its input paths resolved (same order as `file.wells`). */
  wellPaths: StudyWellPaths[];
}

/** Absolute input paths of one well. */
export interface StudyWellPaths {
  las: string;
  survey?: string;
  pressureTests?: string;
  leakOffTests?: string;
  mudWeights?: string;
  drillingEvents?: string;
  formationTops?: string;
}

const WELL_FILE_KEYS = ["las", "survey", "pressureTests", "leakOffTests", "mudWeights", "drillingEvents", "formationTops"] as const;

/** Render a zod path as `wells[1].methods.eatonSonic.exponent`. */
export function formatKeyPath(path: ReadonlyArray<PropertyKey>): string {
  let out = "";
  for (const p of path) {
    if (typeof p === "number") out += `[${p}]`;
    else out += out === "" ? String(p) : `.${String(p)}`;
  }
  return out === "" ? "(top level)" : out;
}

// ---- schema walking (for "allowed keys" in messages) ------------------------------------------

interface ZodLike {
  _zod: { def: Record<string, unknown> & { type: string } };
}

/** True when the path names an existing regular file (a missing path or a folder gives false). */
function isExistingFile(path: string): boolean {
  try {
    return statSync(path).isFile();
  } catch {
    return false;
  }
}

function unwrap(s: ZodLike): ZodLike {
  let cur = s;
  for (let k = 0; k < 10; k++) {
    const d = cur._zod.def;
    if ((d.type === "optional" || d.type === "default" || d.type === "nullable" || d.type === "pipe") && d.innerType) cur = d.innerType as ZodLike;
    else if (d.type === "pipe" && d.in) cur = d.in as ZodLike;
    else break;
  }
  return cur;
}

function objectsAt(schema: ZodLike, path: ReadonlyArray<PropertyKey>, data: unknown): ZodLike[] {
  let cur: ZodLike[] = [unwrap(schema)];
  let value: unknown = data;
  for (const key of path) {
    const next: ZodLike[] = [];
    for (const s of cur) {
      const d = s._zod.def;
      if (d.type === "object" && typeof key === "string") {
        const shape = d.shape as Record<string, ZodLike>;
        if (shape[key]) next.push(unwrap(shape[key]));
      } else if (d.type === "array" && typeof key === "number") next.push(unwrap(d.element as ZodLike));
      else if (d.type === "union") {
        for (const o of d.options as ZodLike[]) next.push(...objectsAt(o, [key], value));
      }
    }
    value = value !== null && typeof value === "object" ? (value as Record<PropertyKey, unknown>)[key as string] : undefined;
    cur = next.flatMap((s) => expandUnion(s, value));
  }
  return cur.flatMap((s) => expandUnion(s, value));
}

function expandUnion(s: ZodLike, value: unknown): ZodLike[] {
  const d = s._zod.def;
  if (d.type !== "union") return [s];
  const options = (d.options as ZodLike[]).map(unwrap);
  // A discriminated union: keep the option whose literal matches the value's discriminator.
  const disc = d.discriminator as string | undefined;
  if (disc && value !== null && typeof value === "object") {
    const tag = (value as Record<string, unknown>)[disc];
    const hit = options.filter((o) => {
      const sh = o._zod.def.shape as Record<string, ZodLike> | undefined;
      const lit = sh?.[disc]?._zod.def;
      return lit && Array.isArray(lit.values) && (lit.values as unknown[]).includes(tag);
    });
    if (hit.length > 0) return hit;
  }
  return options;
}

function allowedKeysAt(path: ReadonlyArray<PropertyKey>, data: unknown): string {
  const keys = new Set<string>();
  for (const s of objectsAt(studyConfigSchema as unknown as ZodLike, path, data)) {
    if (s._zod.def.type === "object") for (const k of Object.keys(s._zod.def.shape as object)) keys.add(k);
  }
  return [...keys].join(", ");
}

function describeAt(path: ReadonlyArray<PropertyKey>, data: unknown): string | undefined {
  const parent = objectsAt(studyConfigSchema as unknown as ZodLike, path.slice(0, -1), data);
  const key = path[path.length - 1];
  for (const s of parent) {
    const d = s._zod.def;
    if (d.type === "object" && typeof key === "string") {
      const f = (d.shape as Record<string, { description?: string }>)[key];
      if (f?.description) return f.description;
    }
  }
  return undefined;
}

interface IssueLike {
  code: string;
  path: PropertyKey[];
  message: string;
  keys?: string[];
  values?: unknown[];
  expected?: string;
  minimum?: unknown;
  maximum?: unknown;
  inclusive?: boolean;
  errors?: IssueLike[][];
  input?: unknown;
}

function valueAt(data: unknown, path: ReadonlyArray<PropertyKey>): unknown {
  let v = data;
  for (const k of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[k as string];
  }
  return v;
}

/** Pick the most useful issue of a union: the option that got furthest. */
function deepestIssue(issue: IssueLike): IssueLike {
  if (issue.code !== "invalid_union" || !issue.errors || issue.errors.length === 0) return issue;
  let best: IssueLike | undefined;
  for (const branch of issue.errors) {
    for (const sub of branch) {
      const full = { ...sub, path: [...issue.path, ...sub.path] };
      const d = deepestIssue(full);
      if (!best || d.path.length > best.path.length) best = d;
    }
  }
  return best && best.path.length > issue.path.length ? best : issue;
}

function issueToError(raw: IssueLike, data: unknown, file: string): ShalepointError {
  const issue = deepestIssue(raw);
  const base = formatKeyPath(issue.path);
  const doc = describeAt(issue.path, data);
  switch (issue.code) {
    case "unrecognized_keys": {
      const keys = issue.keys ?? [];
      const param = issue.path.length ? `${base}.${keys[0]}` : keys[0];
      return new ShalepointError("E_CONFIG", `unknown key '${keys.join("', '")}' in ${base}`, {
        file,
        param,
        allowed: allowedKeysAt(issue.path, data),
        hint: "Check the spelling; keys are case-sensitive.",
      });
    }
    case "invalid_value":
      return new ShalepointError("E_CONFIG", `${base}: value not allowed`, {
        file,
        param: base,
        value: valueAt(data, issue.path),
        allowed: (issue.values ?? []).map((v) => JSON.stringify(v)).join(", "),
        hint: doc,
      });
    case "invalid_type": {
      const got = valueAt(data, issue.path);
      const missing = got === undefined;
      return new ShalepointError("E_CONFIG", missing ? `${base} is required` : `${base} must be ${article(issue.expected)}`, {
        file,
        param: base,
        value: missing ? undefined : got,
        allowed: issue.expected,
        hint: doc,
      });
    }
    case "too_small":
    case "too_big": {
      const bound = issue.code === "too_small" ? issue.minimum : issue.maximum;
      const op = issue.code === "too_small" ? (issue.inclusive ? "≥" : ">") : issue.inclusive ? "≤" : "<";
      const isArray = Array.isArray(valueAt(data, issue.path));
      return new ShalepointError("E_CONFIG", `${base} is ${issue.code === "too_small" ? "too small" : "too large"}`, {
        file,
        param: base,
        value: isArray ? `${(valueAt(data, issue.path) as unknown[]).length} entries` : valueAt(data, issue.path),
        allowed: isArray ? `${op} ${String(bound)} entries` : `${op} ${String(bound)}`,
        hint: doc,
      });
    }
    default:
      return new ShalepointError("E_CONFIG", `${base}: ${issue.message}`, {
        file,
        param: base,
        value: valueAt(data, issue.path),
        hint: doc,
      });
  }
}

function article(expected: string | undefined): string {
  if (!expected) return "of another type";
  return /^[aeiou]/.test(expected) ? `an ${expected}` : `a ${expected}`;
}

/**
 * Validate a parsed study object against {@link studyConfigSchema}.
 *
 * @param data parsed JSON
 * @param file file name for messages
 * @returns the validated study file
 * @throws ShalepointError E_CONFIG naming the first wrong key path and what is allowed there
 * @example parseStudyConfig({ title: "x" }, "study.json") // throws: output is required
 */
export function parseStudyConfig(data: unknown, file = "<inline>"): StudyConfigFile {
  const r = studyConfigSchema.safeParse(data);
  if (!r.success) throw issueToError(r.error.issues[0] as unknown as IssueLike, data, file);
  return r.data;
}

/**
 * Load, validate and resolve a study file.
 *
 * Relative paths resolve against the study file's folder. Every input file must exist (a
 * missing one is named by its key path); the output folder must not be a
 * folder that holds an input file (inputs are never written over).
 *
 * @param path study file (JSON)
 * @param options.outDir override of `output.folder` (absolute, or relative to the working directory)
 * @returns the {@link StudyConfig}
 * @throws ShalepointError E_CONFIG (bad JSON, bad key, missing file, output inside an input folder)
 * @example loadStudyConfig("demo-logs/demo-study.json").wellPaths[0].las // ".../demo-logs/quillon-a1/quillon-a1.las"
 */
export function loadStudyConfig(path: string, options: { outDir?: string } = {}): StudyConfig {
  const configPath = resolve(path);
  let text: string;
  try {
    const st = statSync(configPath);
    if (!st.isFile()) throw new Error("not a file");
    if (st.size > 1_000_000) {
      throw new ShalepointError("E_CONFIG", "study file is larger than 1 MB", { file: path, value: st.size, unit: "bytes", allowed: "≤ 1000000" });
    }
    text = readFileSync(configPath, "utf8");
  } catch (e) {
    if (e instanceof ShalepointError) throw e;
    throw new ShalepointError("E_CONFIG", "study file not found or unreadable", { file: path, hint: "Give the path of a study JSON file." });
  }
  return studyConfigFromText(text, configPath, options);
}

/**
 * Validate and resolve a study from its JSON text (as {@link loadStudyConfig}, without reading the file).
 * @param text JSON text of the study
 * @param configPath path the text came from; relative paths resolve against its folder
 * @param options.outDir override of `output.folder`
 * @returns the {@link StudyConfig}
 * @throws ShalepointError E_CONFIG
 * @example studyConfigFromText(readFileSync("demo-logs/demo-study.json", "utf8"), "demo-logs/demo-study.json")
 */
export function studyConfigFromText(text: string, configPath: string, options: { outDir?: string } = {}): StudyConfig {
  const abs = resolve(configPath);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    throw new ShalepointError("E_CONFIG", `study file is not valid JSON: ${(e as Error).message}`, { file: configPath });
  }
  const file = parseStudyConfig(data, configPath);
  const baseDir = dirname(abs);
  const at = (p: string): string => (isAbsolute(p) ? p : resolve(baseDir, p));
  const inputDirs = new Set<string>();
  const ids = new Set<string>();
  const wellPaths = file.wells.map((w, i) => {
    if (ids.has(w.id)) {
      throw new ShalepointError("E_CONFIG", `wells[${i}].id repeats an earlier id`, { file: configPath, param: `wells[${i}].id`, value: w.id, allowed: "unique ids" });
    }
    ids.add(w.id);
    const out: StudyWellPaths = { las: "" };
    for (const key of WELL_FILE_KEYS) {
      const p = w[key];
      if (p === undefined) continue;
      const full = at(p);
      if (!isExistingFile(full)) {
        throw new ShalepointError("E_CONFIG", `wells[${i}].${key}: file not found`, {
          file: configPath,
          param: `wells[${i}].${key}`,
          value: p,
          hint: "Paths are relative to the study file's folder.",
        });
      }
      out[key] = full;
      inputDirs.add(dirname(full));
    }
    for (const trendKey of ["sonicTrend", "resistivityTrend"] as const) {
      const t = w.methods[trendKey];
      if (t && "file" in t) {
        const full = at(t.file);
        if (!isExistingFile(full)) {
          throw new ShalepointError("E_CONFIG", `wells[${i}].methods.${trendKey}.file: file not found`, {
            file: configPath,
            param: `wells[${i}].methods.${trendKey}.file`,
            value: t.file,
          });
        }
        inputDirs.add(dirname(full));
      }
    }
    return out;
  });
  const outDir = options.outDir !== undefined ? resolve(options.outDir) : at(file.output.folder);
  for (const d of inputDirs) {
    if (outDir === d) {
      throw new ShalepointError("E_CONFIG", "the output folder is a folder that holds input files", {
        file: configPath,
        param: options.outDir !== undefined ? "--out" : "output.folder",
        value: outDir,
        hint: "Choose an output folder apart from the input data; inputs are never written over.",
      });
    }
  }
  const configSha256 = createHash("sha256").update(text, "utf8").digest("hex");
  return { file, configPath: abs, baseDir, configSha256, outDir, wellPaths };
}

/** Convert a `{ value, unit }` depth to ft. */
export function studyDepthFt(q: { value: number; unit: (typeof STUDY_DEPTH_UNITS)[number] }): number {
  return q.value * UNITS[q.unit as UnitId].factor;
}

/** Convert a `{ value, unit }` gradient to psi/ft. */
export function studyGradientPsiPerFt(q: { value: number; unit: (typeof STUDY_GRADIENT_UNITS)[number] }): number {
  return q.value * UNITS[q.unit as UnitId].factor;
}

/** Convert a `{ value, unit }` pressure to psi. */
export function studyPressurePsi(q: { value: number; unit: (typeof STUDY_PRESSURE_UNITS)[number] }): number {
  return q.value * UNITS[q.unit as UnitId].factor;
}

/** Convert a `{ value, unit }` velocity to ft/s. */
export function studyVelocityFtPerS(q: { value: number; unit: (typeof STUDY_VELOCITY_UNITS)[number] }): number {
  return q.value * UNITS[q.unit as UnitId].factor;
}
