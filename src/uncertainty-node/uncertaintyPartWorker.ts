/**
 * Worker-thread entry for {@link simulatePressureUncertaintyParallel}: for each message
 * `{ id, input, startIndex, endIndex }` runs simulatePressureUncertaintyPart (the pure core
 * kernel) and posts back `{ id, ok: true, result }` (arrays transferred, not copied) or
 * `{ id, ok: false, code, message, details }`. The thread stays up for the next message.
 *
 * Node edge module (node:worker_threads); the computation itself stays in src/uncertainty.
 */
import { parentPort } from "node:worker_threads";
import { ShalepointError } from "../errors.js";
import { simulatePressureUncertaintyPart, type PressureUncertaintyResult } from "../uncertainty/simulatePressureUncertainty.js";

/** Buffers of every Float64Array in a result, to transfer them to the parent thread. */
function transferList(result: PressureUncertaintyResult): ArrayBuffer[] {
  const seen = new Set<ArrayBuffer>();
  for (const v of Object.values(result)) if (v instanceof Float64Array) seen.add(v.buffer as ArrayBuffer);
  for (const d of result.draws) seen.add(d.values.buffer as ArrayBuffer);
  return [...seen];
}

parentPort?.on("message", (msg: Parameters<typeof simulatePressureUncertaintyPart>[0] & { id: number }) => {
  const id = msg.id;
  try {
    const result = simulatePressureUncertaintyPart(msg);
    parentPort?.postMessage({ id, ok: true, result }, transferList(result));
  } catch (e) {
    const err = e instanceof ShalepointError ? e : new ShalepointError("E_INTERNAL", String((e as Error)?.message ?? e));
    parentPort?.postMessage({ id, ok: false, code: err.code, message: err.message, details: JSON.parse(JSON.stringify(err.details)) });
  }
});
