/**
 * Typed errors and returned warnings shared by every stage.
 *
 * Errors are values a user can act on: each carries a machine-readable `code`, the
 * parameter or file position at fault, the bad value with its unit, the allowed range,
 * and a `hint` saying what to change. Core modules throw {@link ShalepointError}; they
 * never print. Warnings are returned as data ({@link Warning}), never logged.
 *
 * This file has no imports, so any core module can be copied with it into a script.
 */

/** Where an input file problem was found. `line` is 1-based. */
export interface FilePosition {
  file?: string;
  line?: number;
  rawLine?: string;
  column?: string;
  row?: number;
}

/** Everything an error says, apart from the human message. */
export interface ErrorDetails extends FilePosition {
  /** Name of the argument or key path at fault, e.g. `exponent` or `wells[0].datums.airGapFt`. */
  param?: string;
  /** The offending value, as given. */
  value?: unknown;
  /** Unit of `value`, e.g. `psi/ft`. */
  unit?: string;
  /** Allowed range or set, in words, e.g. `(0, 0.5)` or `one of F, FT, M`. */
  allowed?: string;
  /** What the user should do about it. */
  hint?: string;
}

/**
 * The one error class of shalepoint. `code` is stable and tested; `message` is for people.
 *
 * @example
 * throw new ShalepointError("E_RANGE", "Eaton exponent must be > 0", { param: "exponent", value: -1, allowed: "> 0" });
 */
export class ShalepointError extends Error {
  readonly code: string;
  readonly details: ErrorDetails;

  constructor(code: string, message: string, details: ErrorDetails = {}) {
    super(ShalepointError.compose(message, details));
    this.name = "ShalepointError";
    this.code = code;
    this.details = details;
  }

  private static compose(message: string, d: ErrorDetails): string {
    const where: string[] = [];
    if (d.file !== undefined) where.push(d.file);
    if (d.line !== undefined) where.push(`line ${d.line}`);
    if (d.row !== undefined) where.push(`row ${d.row}`);
    if (d.column !== undefined) where.push(`column ${d.column}`);
    let text = where.length > 0 ? `${where.join(", ")}: ${message}` : message;
    if (d.param !== undefined && !text.includes(d.param)) text += ` [${d.param}]`;
    if (d.value !== undefined) text += ` (got ${formatValue(d.value)}${d.unit ? " " + d.unit : ""})`;
    if (d.allowed !== undefined) text += `; allowed: ${d.allowed}`;
    if (d.rawLine !== undefined) text += `\n  > ${d.rawLine.slice(0, 200)}`;
    if (d.hint !== undefined) text += `\n  ${d.hint}`;
    return text;
  }
}

function formatValue(v: unknown): string {
  if (typeof v === "string") return JSON.stringify(v.slice(0, 80));
  if (typeof v === "number" || typeof v === "boolean") return String(v);
  try {
    return JSON.stringify(v)?.slice(0, 80) ?? String(v);
  } catch {
    return String(v);
  }
}

/**
 * A condition the caller should see but that did not stop the computation, e.g. pore
 * pressure clipped at overburden. Returned beside results, never printed by the core.
 */
export interface Warning {
  /** Stable code, e.g. `W_CLIPPED_AT_OVERBURDEN`. */
  code: string;
  message: string;
  /** Depth (ft, TVD below rotary table unless stated) where it applies, if one depth. */
  depthFt?: number;
  /** Sample index in the well's depth index, if one sample. */
  index?: number;
  /** Number of samples affected, when it applies to many. */
  count?: number;
}

/** Throw a range error for a scalar argument unless `ok`. */
export function requireRange(
  ok: boolean,
  param: string,
  value: number,
  allowed: string,
  unit?: string,
  hint?: string,
): void {
  if (!ok) {
    throw new ShalepointError("E_RANGE", `${param} is out of range`, { param, value, allowed, unit, hint });
  }
}

/** Throw unless two arrays have the same length. */
export function requireSameLength(a: ArrayLike<number>, b: ArrayLike<number>, nameA: string, nameB: string): void {
  if (a.length !== b.length) {
    throw new ShalepointError("E_LENGTH", `${nameA} and ${nameB} must have the same length`, {
      param: `${nameA}, ${nameB}`,
      value: `${a.length} vs ${b.length}`,
      hint: "Put both curves on the same depth index first.",
    });
  }
}
