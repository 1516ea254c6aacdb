/**
 * Raw little-endian float64 files for the numpy reference scripts (bench-only tooling,
 * shared by bench/exportBenchWell.mjs and bench/exportMonteCarloCase.mjs).
 */
import fs from "node:fs";
import path from "node:path";

/**
 * Write values as raw little-endian float64 to `<dir>/<name>.f64` (the platform byte order is
 * checked) and return the file name.
 */
export function writeRawFloat64(dir, name, values) {
  const a = Float64Array.from(values);
  if (new Uint8Array(new Float64Array([1]).buffer)[7] !== 0x3f) throw new Error("big-endian platform: byte swap needed");
  fs.writeFileSync(path.join(dir, `${name}.f64`), new Uint8Array(a.buffer, a.byteOffset, a.byteLength));
  return `${name}.f64`;
}
