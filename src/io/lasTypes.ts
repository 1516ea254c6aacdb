/**
 * In-memory shape of a LAS 2.0 file (Canadian Well Logging Society, LAS 2.0, 1992),
 * as read and as written. Values are kept exactly as in the file: units are the file's
 * unit strings (converted to internal units only when a Well is built from it).
 */

/** One header line: `MNEM.UNIT  VALUE : DESCRIPTION`. */
export interface LasHeaderItem {
  mnemonic: string;
  /** Unit string as in the file (may be empty). */
  unit: string;
  value: string;
  description: string;
  /** 1-based line number in the source file, when read from a file. */
  line?: number;
}

/** A whole LAS 2.0 file. */
export interface LasFile {
  /** `~V` section items (VERS, WRAP, …). */
  version: LasHeaderItem[];
  /** `~W` section items (STRT, STOP, STEP, NULL, COMP, WELL, …). */
  well: LasHeaderItem[];
  /** `~C` section items; the first is the index (depth) curve. */
  curves: LasHeaderItem[];
  /** `~P` section items (may be empty). */
  parameters: LasHeaderItem[];
  /** `~O` section text, lines joined with `\n` (may be empty). */
  other: string;
  /** One array per curve, same order as `curves`; the file's NULL value becomes NaN. */
  data: Float64Array[];
  /** Whether the `~A` data was (or is to be) wrapped. */
  wrap: boolean;
  /** The NULL value written for NaN (read from `~W NULL`). */
  nullValue: number;
}
