/**
 * Interval velocity from a sonic slowness log, for Bowers' method.
 *
 * V = 10⁶ / Δt (V ft/s, Δt µs/ft), sample by sample through units' slownessToVelocity.
 * This is a unit identity (1 s = 10⁶ µs), not a published model.
 *
 * Imports: ../units/index.js only.
 */
import { slownessToVelocity } from "../units/index.js";

/**
 * Velocity log from a slowness log.
 *
 * V = 10⁶ / Δt. NaN, zero and negative slowness give NaN (missing), never Infinity.
 *
 * @param dtUsPerFt compressional slowness per sample, µs/ft (typical 50–200, e.g. 100)
 * @returns new Float64Array of velocity, ft/s (e.g. 10,000)
 * @throws never
 * @example velocityFromSlownessLog([100, 125, NaN]) // Float64Array [10000, 8000, NaN]
 */
export function velocityFromSlownessLog(dtUsPerFt: ArrayLike<number>): Float64Array {
  const out = new Float64Array(dtUsPerFt.length);
  for (let i = 0; i < out.length; i++) out[i] = slownessToVelocity(dtUsPerFt[i]);
  return out;
}
