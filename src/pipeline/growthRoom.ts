/**
 * Storage that grows in place, for the while-drilling updates (pore pressure and stress
 * window): per-sample arrays are views on buffers with room for more samples, so an update
 * writes the samples it recomputes instead of copying the whole well.
 *
 * Imports: ../errors.js.
 */
import { ShalepointError } from "../errors.js";

/**
 * The buffers a chain of while-drilling states grows into. Every per-sample array of a
 * state is a view of length n on a buffer allocated here with room for more samples, so an
 * update writes only the samples it recomputes instead of copying the whole well; a buffer
 * is re-allocated (1.5 times the samples) only when it is full. Only the latest state of
 * the chain may be extended: `latest` names it.
 */
export interface GrowthRoom {
  /** The state that may be extended next; null after an update that failed part-way. */
  latest: object | null;
  /** Buffers allocated for this chain (never a caller's buffer). */
  buffers: WeakSet<ArrayBufferLike>;
}

/** The typed arrays a room holds. */
export type SampleArray = Float64Array | Uint8Array | Int32Array;

/**
 * A view of length n on `a`'s buffer when that buffer is the room's and long enough (no
 * copy: samples below a.length are a's), otherwise a copy of a into a new room buffer with
 * room for 50 % more samples. Samples from a.length on are for the caller to write.
 *
 * @param room the chain's room
 * @param a the current array (a room view, or any typed array: then it is copied)
 * @param n samples wanted, n ≥ 0
 * @returns a view of length n whose first min(a.length, n) values are a's
 * @example extendInRoom({ latest: null, buffers: new WeakSet() }, Float64Array.of(1, 2), 3) // [1, 2, 0], with room for 4,099 values
 */
export function extendInRoom<T extends SampleArray>(room: GrowthRoom, a: T, n: number): T {
  const Ctor = a.constructor as { new (buffer: ArrayBufferLike, byteOffset: number, length: number): T; BYTES_PER_ELEMENT: number };
  if (room.buffers.has(a.buffer) && a.byteOffset === 0 && a.buffer.byteLength >= n * Ctor.BYTES_PER_ELEMENT) {
    return new Ctor(a.buffer, 0, n);
  }
  const capacity = n + Math.max(4096, n >> 1);
  const buffer = new ArrayBuffer(capacity * Ctor.BYTES_PER_ELEMENT);
  room.buffers.add(buffer);
  const out = new Ctor(buffer, 0, n);
  out.set(a.length > n ? a.subarray(0, n) : a);
  return out;
}


/**
 * The error for an update of a state that is no longer the latest of its chain.
 * @returns ShalepointError E_STATE_SUPERSEDED with what to do
 * @example throw supersededStateError()
 */
export function supersededStateError(): ShalepointError {
  return new ShalepointError("E_STATE_SUPERSEDED", "this while-drilling state was already extended (or an update of it failed part-way)", {
    param: "state",
    hint: "Pass the state returned by the last update, or start again (startWhileDrilling / startStressWindowWhileDrilling) on the well so far.",
  });
}
