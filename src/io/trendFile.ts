/**
 * Trend files: normal compaction trends saved as small JSON, so a trend picked by hand or
 * fitted once is reusable by notebooks, the CLI and scripts.
 *
 * Format `shalepoint-trend`, version 1 (our own):
 * ```json
 * {
 *   "format": "shalepoint-trend",
 *   "version": 1,
 *   "kind": "sonicLogLinear",
 *   "segments": [
 *     { "topBmlFt": 0,
 *       "params": { "dtMudlineUsPerFt": 170, "log10SlopePerFt": -2.5e-5 },
 *       "fittedOn": { "method": "huber", "intervals": [{ "topBmlFt": 500, "baseBmlFt": 4000 }],
 *                     "n": 412, "rSquared": 0.93, "residualStd": 0.012,
 *                     "depthRange": { "topBmlFt": 510, "baseBmlFt": 3990 } } }
 *   ],
 *   "caution": "…"
 * }
 * ```
 * Depths are ft below the mudline; params use the units in their names (trend/trendTypes.ts).
 * `fittedOn` is null for a trend entered by hand. Unknown keys are refused (a typo in a
 * parameter name must not pass silently). Validated with zod; every error names the key path,
 * e.g. `segments[0].params.decayPerFt`.
 */
import { z } from "zod";
import { ShalepointError } from "../errors.js";
import type { CompactionTrend } from "../trend/trendTypes.js";

/** Format name written in every trend file. */
export const TREND_FILE_FORMAT = "shalepoint-trend";
/** Newest trend-file version this code reads and the one it writes. */
export const TREND_FILE_VERSION = 1;
/** Caution written into every trend file. */
export const TREND_FILE_CAUTION =
  "Normal compaction trends are interpretations. Pore pressures derived from them are estimates for trained engineers: calibrate to measured data and review; local regulations and licensed practice govern.";

const finite = z.number({ error: "must be a finite number" });
const interval = z
  .object({ topBmlFt: finite, baseBmlFt: finite })
  .strict()
  .refine((iv) => iv.topBmlFt < iv.baseBmlFt, { message: "topBmlFt must be less than baseBmlFt", path: ["baseBmlFt"] });
const fittedOn = z
  .object({
    method: z.enum(["leastSquares", "huber"]),
    intervals: z.array(interval).min(1),
    n: z.number().int().min(3, { message: "a fit uses at least 3 points" }),
    rSquared: finite.nullable(),
    residualStd: finite.nonnegative().nullable(),
    depthRange: z.object({ topBmlFt: finite, baseBmlFt: finite }).strict(),
  })
  .strict()
  .nullable();

const sonicExponentialParams = z
  .object({
    dtMatrixUsPerFt: finite.positive({ message: "must be > 0 us/ft" }),
    dtMudlineUsPerFt: finite.positive({ message: "must be > 0 us/ft" }),
    decayPerFt: finite.nonnegative({ message: "must be >= 0 per ft (a negative decay makes slowness grow without bound)" }),
  })
  .strict()
  .refine((p) => p.dtMudlineUsPerFt > p.dtMatrixUsPerFt, {
    message: "must exceed dtMatrixUsPerFt",
    path: ["dtMudlineUsPerFt"],
  });
const sonicLogLinearParams = z
  .object({ dtMudlineUsPerFt: finite.positive({ message: "must be > 0 us/ft" }), log10SlopePerFt: finite })
  .strict();
const resistivityLogLinearParams = z
  .object({ r0OhmM: finite.positive({ message: "must be > 0 ohm.m" }), growthPerFt: finite })
  .strict();

function segmentsOf<T extends z.ZodType>(params: T) {
  return z
    .array(z.object({ topBmlFt: finite, params, fittedOn }).strict())
    .min(1, { message: "needs at least one segment" })
    .superRefine((segs, ctx) => {
      for (let k = 1; k < segs.length; k++) {
        if (!(segs[k].topBmlFt > segs[k - 1].topBmlFt)) {
          ctx.addIssue({ code: "custom", message: "segment tops must increase with depth", path: [k, "topBmlFt"] });
        }
      }
    });
}

const header = {
  format: z.literal(TREND_FILE_FORMAT, { error: `must be "${TREND_FILE_FORMAT}"` }),
  version: z.literal(TREND_FILE_VERSION, {
    error: `must be ${TREND_FILE_VERSION} (files from a newer shalepoint need a newer reader)`,
  }),
  caution: z.string().optional(),
};

/** zod schema of a trend file (version 1). */
export const trendFileSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ ...header, kind: z.literal("sonicExponential"), segments: segmentsOf(sonicExponentialParams) }).strict(),
    z.object({ ...header, kind: z.literal("sonicLogLinear"), segments: segmentsOf(sonicLogLinearParams) }).strict(),
    z.object({ ...header, kind: z.literal("resistivityLogLinear"), segments: segmentsOf(resistivityLogLinearParams) }).strict(),
  ],
  { error: "kind must be one of sonicExponential, sonicLogLinear, resistivityLogLinear" },
);

/** `segments[0].params.decayPerFt` from a zod path. */
function keyPath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const p of path) out += typeof p === "number" ? `[${p}]` : out === "" ? String(p) : `.${String(p)}`;
  return out === "" ? "(root)" : out;
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let v: unknown = root;
  for (const p of path) {
    if (v === null || typeof v !== "object") return undefined;
    v = (v as Record<PropertyKey, unknown>)[p];
  }
  return v;
}

function validate(data: unknown, file: string | undefined): CompactionTrend {
  const parsed = trendFileSchema.safeParse(data);
  if (!parsed.success) {
    const issues = parsed.error.issues;
    const first = issues[0];
    const path = keyPath(first.path);
    const listed = issues.slice(0, 5).map((i) => `${keyPath(i.path)}: ${i.message}`).join("; ");
    const more = issues.length > 5 ? `; and ${issues.length - 5} more` : "";
    const value = valueAt(data, first.path);
    throw new ShalepointError("E_TREND_FILE", `invalid trend file: ${listed}${more}`, {
      file,
      param: path,
      value: typeof value === "object" ? undefined : value,
      hint: "Fix the key named above; see the trend-file format in io/trendFile.ts.",
    });
  }
  const { kind, segments } = parsed.data;
  return {
    kind,
    segments: segments.map((s) => ({ topBmlFt: s.topBmlFt, params: { ...s.params }, fittedOn: s.fittedOn ? structuredClone(s.fittedOn) : null })),
  } as CompactionTrend;
}

/**
 * Read a trend file.
 *
 * @param text file contents (JSON)
 * @param file file name, for error messages
 * @returns the trend (plain data)
 * @throws ShalepointError E_TREND_FILE_JSON (not JSON; with the line when known),
 *   E_TREND_FILE (schema error; `param` is the key path, e.g. `segments[0].params.decayPerFt`)
 * @example parseTrendFile('{"format":"shalepoint-trend","version":1,"kind":"resistivityLogLinear","segments":[{"topBmlFt":0,"params":{"r0OhmM":0.8,"growthPerFt":1e-4},"fittedOn":null}]}')
 * // { kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 0.0001 }, fittedOn: null }] }
 */
export function parseTrendFile(text: string, file?: string): CompactionTrend {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    const pos = /position (\d+)/.exec(msg);
    const line = pos ? text.slice(0, Number(pos[1])).split("\n").length : undefined;
    throw new ShalepointError("E_TREND_FILE_JSON", `trend file is not valid JSON: ${msg}`, {
      file,
      line,
      rawLine: line !== undefined ? text.split("\n")[line - 1] : undefined,
      hint: "A trend file is JSON written by serializeTrendFile.",
    });
  }
  return validate(data, file);
}

/**
 * Non-throwing form of {@link parseTrendFile}.
 * @returns `{ ok: true, trend }` or `{ ok: false, error }`
 */
export function safeParseTrendFile(
  text: string,
  file?: string,
): { ok: true; trend: CompactionTrend } | { ok: false; error: ShalepointError } {
  try {
    return { ok: true, trend: parseTrendFile(text, file) };
  } catch (e) {
    if (e instanceof ShalepointError) return { ok: false, error: e };
    throw e;
  }
}

/**
 * Write a trend as a `shalepoint-trend` JSON file (2-space indent, trailing newline).
 * The trend is validated first, so an invalid trend is never written.
 *
 * @param trend the trend (plain data)
 * @returns JSON text
 * @throws ShalepointError E_TREND_FILE naming the key path of an invalid value (e.g. NaN)
 * @example serializeTrendFile({ kind: "resistivityLogLinear", segments: [{ topBmlFt: 0, params: { r0OhmM: 0.8, growthPerFt: 1e-4 }, fittedOn: null }] })
 * // '{\n  "format": "shalepoint-trend",\n  "version": 1,\n  "kind": "resistivityLogLinear", …'
 */
export function serializeTrendFile(trend: CompactionTrend): string {
  const doc = {
    format: TREND_FILE_FORMAT,
    version: TREND_FILE_VERSION,
    kind: trend.kind,
    segments: trend.segments.map((s) => ({ topBmlFt: s.topBmlFt, params: s.params, fittedOn: s.fittedOn })),
    caution: TREND_FILE_CAUTION,
  };
  validate(doc, undefined);
  return JSON.stringify(doc, null, 2) + "\n";
}
