/**
 * Guarded reading of study input files: size and binary checks before the text is read.
 */
import { closeSync, openSync, readSync, readFileSync, statSync } from "node:fs";
import { createHash } from "node:crypto";
import { ShalepointError } from "../errors.js";

/** Default largest input file read by a study or `inspect`: 500 MB. */
export const STUDY_MAX_INPUT_BYTES = 500_000_000;

/** How many leading bytes are scanned for a NUL byte (binary file). */
const BINARY_SCAN_BYTES = 65_536;

/** A text input file as read, with its SHA-256. */
export interface InputText {
  /** Absolute path. */
  path: string;
  text: string;
  /** SHA-256 of the raw bytes, hex. */
  sha256: string;
  sizeBytes: number;
}

/**
 * Read a text input file after checking, with `fs.stat` and a short read, that it is a
 * regular file no larger than `maxBytes` and that its first 64 KiB hold no NUL byte.
 *
 * A 2 GB or binary file is refused before it is read into memory.
 *
 * @param path file path
 * @param options.param key path or argument named in errors (e.g. `wells[0].las`)
 * @param options.maxBytes size limit in bytes (default {@link STUDY_MAX_INPUT_BYTES})
 * @returns `{ path, text, sha256, sizeBytes }`
 * @throws ShalepointError E_FILE_NOT_FOUND, E_FILE_TOO_LARGE, E_FILE_BINARY
 * @example readInputText("demo-logs/quillon-a1/pressure-tests.csv").text.slice(0, 6) // "tvd_ft"
 */
export function readInputText(path: string, options: { param?: string; maxBytes?: number } = {}): InputText {
  const maxBytes = options.maxBytes ?? STUDY_MAX_INPUT_BYTES;
  let size: number;
  try {
    const st = statSync(path);
    if (!st.isFile()) throw new Error("not a regular file");
    size = st.size;
  } catch {
    throw new ShalepointError("E_FILE_NOT_FOUND", "input file not found or not a regular file", { file: path, param: options.param });
  }
  if (size > maxBytes) {
    throw new ShalepointError("E_FILE_TOO_LARGE", "input file is larger than the limit and was not read", {
      file: path,
      param: options.param,
      value: size,
      unit: "bytes",
      allowed: `≤ ${maxBytes}`,
      hint: "Split the file, or raise the limit (--max-size-mb) if it really is a log file.",
    });
  }
  const fd = openSync(path, "r");
  try {
    const head = Buffer.alloc(Math.min(size, BINARY_SCAN_BYTES));
    readSync(fd, head, 0, head.length, 0);
    if (head.includes(0)) {
      throw new ShalepointError("E_FILE_BINARY", "input file looks binary (it holds NUL bytes); a text file is needed", {
        file: path,
        param: options.param,
        hint: "Give a LAS 2.0 or CSV text file.",
      });
    }
  } finally {
    closeSync(fd);
  }
  const bytes = readFileSync(path);
  return { path, text: bytes.toString("utf8"), sha256: createHash("sha256").update(bytes).digest("hex"), sizeBytes: size };
}
