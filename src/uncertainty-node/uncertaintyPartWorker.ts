/**
 * Worker-thread entry for {@link simulatePressureUncertaintyParallel}: for each message
 * `{ id, input, bounds, next }` takes depth chunks from the shared counter `next` (the same
 * counter the calling thread takes from), runs simulatePressureUncertaintyPart (the pure core
 * kernel) on each, and posts back `{ id, ok: true, chunks: [{ index, result }] }` (arrays
 * transferred, not copied) or `{ id, ok: false, code, message, details }`. The thread stays
 * up for the next message.
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

/** A job: the whole input, the chunk bounds and the shared counter of the next chunk to take. */
interface ChunkJob {
  id: number;
  input: Parameters<typeof simulatePressureUncertaintyPart>[0]["input"];
  /** Chunk k covers depth indices [bounds[k], bounds[k + 1]); every start a multiple of 64. */
  bounds: number[];
  /** Int32Array on a SharedArrayBuffer; slot 0 = next chunk index, taken with Atomics.add. */
  next: Int32Array;
}

parentPort?.on("message", (msg: ChunkJob) => {
  const id = msg.id;
  try {
    // Take chunks until none is left; the calling thread takes from the same counter, so a
    // thread slowed by other load simply takes fewer chunks.
    const chunks: { index: number; result: PressureUncertaintyResult }[] = [];
    const buffers: ArrayBuffer[] = [];
    const last = msg.bounds.length - 1;
    for (let k = Atomics.add(msg.next, 0, 1); k < last; k = Atomics.add(msg.next, 0, 1)) {
      const result = simulatePressureUncertaintyPart({ input: msg.input, startIndex: msg.bounds[k], endIndex: msg.bounds[k + 1] });
      chunks.push({ index: k, result });
      buffers.push(...transferList(result));
    }
    parentPort?.postMessage({ id, ok: true, chunks }, buffers);
  } catch (e) {
    const err = e instanceof ShalepointError ? e : new ShalepointError("E_INTERNAL", String((e as Error)?.message ?? e));
    parentPort?.postMessage({ id, ok: false, code: err.code, message: err.message, details: JSON.parse(JSON.stringify(err.details)) });
  }
});
