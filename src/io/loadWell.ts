/**
 * Build a {@link Well} from a {@link LasFile}: every curve converted to internal units,
 * mnemonics mapped to the roles the pore-pressure stages use, datums from options or from
 * header items, MD index and TVD (vertical, a precomputed array, or a callback).
 */
import { ShalepointError, type Warning } from "../errors.js";
import { INTERNAL_UNIT, UNITS, parseLasUnit, type Quantity, type UnitId } from "../units/index.js";
import type { Curve, CurveRole, Datums, SurveyStation, Well } from "../well/types.js";
import type { LasFile, LasHeaderItem } from "./lasTypes.js";
import { readLas, type ReadLasOptions } from "./readLas.js";

/**
 * File mnemonics recognised for each role, in order of preference (upper case; a curve
 * named `DT:2` after de-duplication is matched on its base `DT`). The first present wins;
 * other candidates stay in the well under their own mnemonic, with a warning.
 */
export const CURVE_ROLE_MNEMONICS: Readonly<Record<CurveRole, readonly string[]>> = {
  gammaRay: ["GR", "GRC", "SGR", "CGR", "GAM", "GRD"],
  slowness: ["DTC", "DTCO", "DT", "DTCOMP", "AC", "DT4P", "SONIC"],
  density: ["RHOB", "RHOZ", "DEN", "ZDEN", "RHO", "DENS"],
  resistivity: ["RDEP", "RES_DEEP", "RT", "AT90", "ILD", "LLD", "RD", "RDEEP", "RILD"],
  caliper: ["CALI", "CAL", "HCAL", "CALX", "C1"],
  bitSize: ["BS", "BIT", "BITSIZE"],
};

/** Quantity each role must measure (its unit is checked against it). */
export const CURVE_ROLE_QUANTITY: Readonly<Record<CurveRole, Quantity>> = {
  gammaRay: "gammaRay",
  slowness: "slowness",
  density: "density",
  resistivity: "resistivity",
  caliper: "length",
  bitSize: "length",
};

/**
 * Header items (in ~W, then ~P) read for datums when the options do not give them. Each must
 * carry a unit the units table knows (a depth unit, or a density unit for the seawater).
 * - `rtElevationFt`: `EKB` (kelly bushing elevation), else `EDF` (drill floor elevation),
 *   else `ERT` (rotary table elevation) — above mean sea level.
 * - `waterDepthFt`: `WDEP`, else `WD` — sea level to mudline; 0 or absent onshore
 *   (absent is an error: it must be stated).
 * - `groundLevelFt`: `EGL` — ground elevation above sea level, onshore.
 * - `seawaterDensityGcc`: `SWDEN` — seawater density.
 */
export const DATUM_HEADER_MNEMONICS = {
  rtElevationFt: ["EKB", "EDF", "ERT"],
  waterDepthFt: ["WDEP", "WD"],
  groundLevelFt: ["EGL"],
  seawaterDensityGcc: ["SWDEN"],
} as const satisfies Record<keyof Datums, readonly string[]>;

/** How true vertical depth is obtained. */
export type TvdSource =
  | { kind: "vertical" }
  | { kind: "array"; tvdFt: ArrayLike<number> }
  | { kind: "callback"; tvdFromMd: (mdFt: Float64Array) => ArrayLike<number> };

/** Options of {@link lasToWell}. */
export interface LasToWellOptions {
  /** Well name; default the `~W WELL` value, else the file name, else "unnamed well". */
  name?: string;
  /** Datums; any field given here wins over the header items of {@link DATUM_HEADER_MNEMONICS}. */
  datums?: Partial<Datums>;
  /** Role → file mnemonic overrides, e.g. `{ resistivity: "AT10" }`; `null` = no curve for that role. */
  roles?: Partial<Record<CurveRole, string | null>>;
  /** TVD source; default `{ kind: "vertical" }` (TVD = MD). */
  tvd?: TvdSource;
  /** Directional survey to keep on the well (MD ft, degrees). */
  survey?: SurveyStation[];
  /** Curve mnemonics to leave out (e.g. a curve whose unit is unknown and not needed). */
  dropMnemonics?: string[];
  /** File name for messages. */
  file?: string;
}

/** Result of {@link lasToWell}. */
export interface LasToWellResult {
  well: Well;
  /** Which file mnemonic filled each role (undefined when none). */
  roles: Partial<Record<CurveRole, string>>;
  warnings: Warning[];
}

const ROLES = Object.keys(CURVE_ROLE_MNEMONICS) as CurveRole[];

function baseMnemonic(m: string): string {
  const i = m.indexOf(":");
  return (i === -1 ? m : m.slice(0, i)).toUpperCase();
}

function unitOf(item: LasHeaderItem, what: string, file: string | undefined): UnitId {
  const id = parseLasUnit(item.unit);
  if (id === undefined) {
    throw new ShalepointError("E_LAS_UNKNOWN_UNIT", `unknown unit '${item.unit}' on ${what}`, {
      file,
      line: item.line,
      param: item.mnemonic,
      value: item.unit,
      hint: "Use a unit listed in LAS_UNIT_ALIASES (units/index.ts), correct the file, or drop the curve with { dropMnemonics }.",
    });
  }
  return id;
}

function datumFromHeader(
  las: LasFile,
  key: keyof Datums,
  quantity: Quantity,
  file: string | undefined,
): number | undefined {
  for (const mnem of DATUM_HEADER_MNEMONICS[key]) {
    const item = [...las.well, ...las.parameters].find((it) => it.mnemonic.toUpperCase() === mnem);
    if (item === undefined) continue;
    const id = parseLasUnit(item.unit);
    if (id === undefined || item.unit.trim() === "" || UNITS[id].quantity !== quantity) {
      throw new ShalepointError("E_WELL_DATUM_UNIT", `${mnem} needs a ${quantity} unit`, {
        file,
        line: item.line,
        param: mnem,
        value: item.unit,
        allowed: quantity === "depth" ? "F, FT, M" : "G/C3, G/CC, K/M3, KG/M3",
        hint: "A datum without a unit is never guessed; add the unit after the dot.",
      });
    }
    const v = Number(item.value);
    if (item.value.trim() === "" || !Number.isFinite(v)) {
      throw new ShalepointError("E_WELL_DATUM_VALUE", `${mnem} must be a number`, { file, line: item.line, param: mnem, value: item.value });
    }
    return v * UNITS[id].factor;
  }
  return undefined;
}

/**
 * LAS file → Well (internal units, curves keyed by role).
 *
 * Every curve is converted to the internal unit of its quantity through `parseLasUnit` and
 * `UNITS` (internal = file value × factor); an unknown unit is an error naming the curve.
 * Roles are filled from {@link CURVE_ROLE_MNEMONICS} (first present wins) unless overridden;
 * a role's curve must measure {@link CURVE_ROLE_QUANTITY}. Curves with a role are keyed by
 * the role, the others by their mnemonic. The index (first curve) must be a depth (ft or m);
 * it becomes `mdFt`, reversed to increasing if the file runs upward. TVD: equal to MD
 * (vertical, default), a given array, or `tvdFromMd(mdFt)`; it must have the index's length,
 * be non-decreasing and not exceed MD (by more than 1e-6 ft).
 *
 * @param las a LAS file as read by readLas (not modified)
 * @param options name, datums, role overrides, TVD source, survey, curves to drop, file
 * @returns `{ well, roles, warnings }`
 * @throws ShalepointError `E_LAS_UNKNOWN_UNIT` (curve unit unknown), `E_WELL_ROLE_UNIT`
 *   (role curve of the wrong quantity), `E_WELL_ROLE_MNEMONIC` (override names no curve),
 *   `E_WELL_INDEX_UNIT` (index not a depth), `E_WELL_INDEX_NOT_MONOTONIC`,
 *   `E_WELL_DATUM_MISSING` / `E_WELL_DATUM_UNIT` / `E_WELL_DATUM_VALUE`, `E_WELL_TVD`
 * @example
 * // LAS with DEPT.M, DT.US/M 328.084 at 1000 m, EKB.M 25, WDEP.M 1000, SWDEN.G/CC 1.03
 * lasToWell(las).well.curves.slowness.values[0] // 100.0000 (us/ft); mdFt[0] 3280.84
 * Reference: unit factors in units/index.ts; LAS header items per CWLS LAS 2.0 (1992).
 */
export function lasToWell(las: LasFile, options: LasToWellOptions = {}): LasToWellResult {
  const file = options.file;
  const warnings: Warning[] = [];
  const drop = new Set((options.dropMnemonics ?? []).map((m) => m.toUpperCase()));

  // ---- index ------------------------------------------------------------------------------
  const indexItem = las.curves[0];
  const indexUnit = unitOf(indexItem, `index curve ${indexItem.mnemonic}`, file);
  if (UNITS[indexUnit].quantity !== "depth") {
    throw new ShalepointError("E_WELL_INDEX_UNIT", `index curve ${indexItem.mnemonic} is not a depth`, {
      file,
      line: indexItem.line,
      value: indexItem.unit,
      allowed: "F, FT, M",
    });
  }
  const n = las.data[0].length;
  const reverse = n > 1 && las.data[0][n - 1] < las.data[0][0];
  const take = (src: ArrayLike<number>, k: number): Float64Array => {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = src[reverse ? n - 1 - i : i] * k;
    return out;
  };
  const mdFt = take(las.data[0], UNITS[indexUnit].factor);
  for (let i = 1; i < n; i++) {
    if (!(mdFt[i] > mdFt[i - 1])) {
      throw new ShalepointError("E_WELL_INDEX_NOT_MONOTONIC", "measured depth must be strictly monotonic to build a well", {
        file,
        row: reverse ? n - i : i + 1,
        value: `${mdFt[i - 1]} then ${mdFt[i]}`,
        unit: "ft",
        hint: "Sort and de-duplicate the rows first.",
      });
    }
  }
  if (reverse) warnings.push({ code: "W_WELL_INDEX_REVERSED", message: "file depth decreases; rows reversed to increasing depth" });

  // ---- roles ------------------------------------------------------------------------------
  const present = las.curves.map((c, j) => ({ c, j })).filter(({ c, j }) => j > 0 && !drop.has(c.mnemonic.toUpperCase()));
  const roleOf = new Map<number, CurveRole>();
  const roles: Partial<Record<CurveRole, string>> = {};
  for (const role of ROLES) {
    const override = options.roles?.[role];
    if (override === null) continue;
    let pick: { c: LasHeaderItem; j: number } | undefined;
    if (override !== undefined) {
      pick = present.find(({ c }) => c.mnemonic.toUpperCase() === override.toUpperCase());
      if (pick === undefined) {
        throw new ShalepointError("E_WELL_ROLE_MNEMONIC", `role ${role}: no curve named ${override}`, {
          file,
          param: `roles.${role}`,
          value: override,
          allowed: present.map(({ c }) => c.mnemonic).join(", "),
        });
      }
    } else {
      const candidates = present.filter(({ c, j }) => !roleOf.has(j) && CURVE_ROLE_MNEMONICS[role].includes(baseMnemonic(c.mnemonic)));
      candidates.sort(
        (a, b) => CURVE_ROLE_MNEMONICS[role].indexOf(baseMnemonic(a.c.mnemonic)) - CURVE_ROLE_MNEMONICS[role].indexOf(baseMnemonic(b.c.mnemonic)) || a.j - b.j,
      );
      pick = candidates[0];
      if (candidates.length > 1) {
        warnings.push({
          code: "W_WELL_ROLE_AMBIGUOUS",
          message: `role ${role}: ${candidates.map(({ c }) => c.mnemonic).join(", ")} all match; using ${pick.c.mnemonic} (override with options.roles)`,
        });
      }
    }
    if (pick === undefined) continue;
    roleOf.set(pick.j, role);
    roles[role] = pick.c.mnemonic;
  }

  // ---- curves in internal units -------------------------------------------------------------
  const curves: Record<string, Curve> = {};
  for (const { c, j } of present) {
    const id = unitOf(c, `curve ${c.mnemonic}`, file);
    const quantity = UNITS[id].quantity;
    const role = roleOf.get(j);
    if (role !== undefined && quantity !== CURVE_ROLE_QUANTITY[role]) {
      throw new ShalepointError("E_WELL_ROLE_UNIT", `curve ${c.mnemonic} (role ${role}) has a ${quantity} unit`, {
        file,
        line: c.line,
        param: c.mnemonic,
        value: c.unit,
        allowed: `a ${CURVE_ROLE_QUANTITY[role]} unit`,
        hint: "Fix the unit in ~C, or map the role to another curve with options.roles.",
      });
    }
    const key = role ?? c.mnemonic;
    curves[key] = {
      mnemonic: c.mnemonic,
      unit: INTERNAL_UNIT[quantity],
      description: c.description,
      values: take(las.data[j], UNITS[id].factor),
    };
  }

  // ---- datums -----------------------------------------------------------------------------
  const given = options.datums ?? {};
  const datum = (key: keyof Datums, quantity: Quantity, required: boolean): number | undefined => {
    const v = given[key] ?? datumFromHeader(las, key, quantity, file);
    if (v === undefined && required) {
      throw new ShalepointError("E_WELL_DATUM_MISSING", `datum ${key} is not given`, {
        file,
        param: `datums.${key}`,
        hint: `Pass options.datums.${key}, or add one of ${DATUM_HEADER_MNEMONICS[key].join(", ")} with a unit to ~W or ~P.`,
      });
    }
    if (v !== undefined && !Number.isFinite(v)) {
      throw new ShalepointError("E_WELL_DATUM_VALUE", `datum ${key} must be finite`, { file, param: `datums.${key}`, value: v });
    }
    return v;
  };
  const datums: Datums = {
    rtElevationFt: datum("rtElevationFt", "depth", true)!,
    waterDepthFt: datum("waterDepthFt", "depth", true)!,
    seawaterDensityGcc: datum("seawaterDensityGcc", "density", true)!,
  };
  const gl = datum("groundLevelFt", "depth", false);
  if (gl !== undefined) datums.groundLevelFt = gl;

  // ---- TVD ----------------------------------------------------------------------------------
  const source = options.tvd ?? { kind: "vertical" };
  let tvdFt: Float64Array;
  if (source.kind === "vertical") tvdFt = mdFt.slice();
  else {
    const raw = source.kind === "array" ? source.tvdFt : source.tvdFromMd(mdFt.slice());
    if (raw.length !== n) {
      throw new ShalepointError("E_WELL_TVD", "TVD array length differs from the depth index", { param: "tvd", value: `${raw.length} vs ${n}` });
    }
    tvdFt = Float64Array.from(raw);
    if (source.kind === "array" && reverse) tvdFt.reverse();
  }
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(tvdFt[i]) || tvdFt[i] > mdFt[i] + 1e-6 || (i > 0 && tvdFt[i] < tvdFt[i - 1])) {
      throw new ShalepointError("E_WELL_TVD", "TVD must be finite, non-decreasing and not exceed MD", {
        param: "tvd",
        row: i + 1,
        value: `TVD ${tvdFt[i]} at MD ${mdFt[i]}`,
        unit: "ft",
      });
    }
  }

  // ---- header ------------------------------------------------------------------------------
  const header: Record<string, string> = {};
  for (const it of las.well) header[it.mnemonic] = it.value;
  for (const it of las.parameters) if (!(it.mnemonic in header)) header[it.mnemonic] = it.value;
  const wellItem = las.well.find((it) => it.mnemonic.toUpperCase() === "WELL");
  const name = options.name ?? (wellItem && wellItem.value !== "" ? wellItem.value : (file ?? "unnamed well"));

  const well: Well = { name, datums, mdFt, tvdFt, curves, header };
  if (options.survey !== undefined) well.survey = options.survey.map((s) => ({ ...s }));
  return { well, roles, warnings };
}

/**
 * Read a LAS 2.0 text and build a Well in one call ({@link readLas} then {@link lasToWell}).
 * @param text LAS file content
 * @param options reader options plus well options (`file` is shared)
 * @returns `{ well, roles, warnings, las }` (warnings of both steps)
 * @throws every error of readLas and lasToWell
 * @example readWellFromLas(text, { datums: { rtElevationFt: 82, waterDepthFt: 3000, seawaterDensityGcc: 1.03 } })
 */
export function readWellFromLas(
  text: string,
  options: LasToWellOptions & Omit<ReadLasOptions, "file"> = {},
): LasToWellResult & { las: LasFile } {
  const { las, warnings } = readLas(text, { file: options.file, policy: options.policy, maxSizeBytes: options.maxSizeBytes });
  const r = lasToWell(las, options);
  return { ...r, warnings: [...warnings, ...r.warnings], las };
}
