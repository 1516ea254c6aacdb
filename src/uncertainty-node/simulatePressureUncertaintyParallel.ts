/**
 * Monte Carlo pore pressure / fracture pressure uncertainty on several CPU cores.
 *
 * This folder is a Node edge (it uses node:worker_threads and node:os); the pure kernel stays
 * in src/uncertainty, which keeps no I/O and no Node APIs. The well's depth index is cut into
 * consecutive chunks (about 2048 depths) that start on multiples of 64
 * (MONTE_CARLO_DEPTH_BLOCK); the calling thread and the worker threads take chunks from one
 * shared counter (Atomics on a SharedArrayBuffer) until none is left, so a thread slowed by
 * other load on the machine takes fewer chunks instead of holding up the join. Every chunk
 * uses the same input and seed (so the same draws), and the chunks are joined in depth
 * order. Because each chunk restarts the depth-stepped trend state on a block boundary and
 * the quantiles are exact, the result is the single-thread result bit for bit.
 *
 * Results are estimates for trained engineers: calibrate them to measured data and have them
 * reviewed; local regulations and licensed practice govern.
 */
import os from "node:os";
import { Worker } from "node:worker_threads";
import { ShalepointError, type ErrorDetails } from "../errors.js";
import {
  MONTE_CARLO_DEPTH_BLOCK,
  joinPressureUncertaintyParts,
  simulatePressureUncertainty,
  simulatePressureUncertaintyPart,
  type PressureUncertaintyInput,
  type PressureUncertaintyResult,
} from "../uncertainty/simulatePressureUncertainty.js";

/** Fewest depths per part worth a thread (smaller wells run on the calling thread). */
export const MIN_DEPTHS_PER_THREAD = 4096;

/** Options of {@link simulatePressureUncertaintyParallel}. */
export interface ParallelUncertaintyOptions {
  /** Threads in all, calling thread included; integer ≥ 1; default min(2, available cores). */
  threads?: number;
  /** Worker script (compiled uncertaintyPartWorker.js); default: the sibling file. */
  workerUrl?: URL;
}

/** Depths per shared chunk (a multiple of 64): small enough to even out the threads' finish. */
const CHUNK_DEPTHS = 32 * MONTE_CARLO_DEPTH_BLOCK;

/** Chunk bounds of [0, n): starts on multiples of the block size, then n. */
function chunkBounds(n: number): number[] {
  const bounds: number[] = [];
  for (let s = 0; s < n; s += CHUNK_DEPTHS) bounds.push(s);
  bounds.push(n);
  return bounds;
}

/**
 * Idle workers per script URL, kept between calls so a repeated run pays neither thread
 * start-up nor a cold JIT; unref'd while idle, so they never hold the process open.
 */
const idleWorkers = new Map<string, Worker[]>();
let nextJobId = 1;

function takeWorker(url: URL): Worker {
  const idle = idleWorkers.get(url.href);
  let worker = idle?.pop();
  if (worker === undefined) {
    const fresh = new Worker(url);
    fresh.on("exit", () => {
      const list = idleWorkers.get(url.href);
      const at = list?.indexOf(fresh) ?? -1;
      if (list !== undefined && at >= 0) list.splice(at, 1);
    });
    worker = fresh;
  }
  worker.ref();
  return worker;
}

function releaseWorker(url: URL, worker: Worker): void {
  worker.unref();
  const list = idleWorkers.get(url.href) ?? [];
  list.push(worker);
  idleWorkers.set(url.href, list);
}

/**
 * Stop the idle Monte Carlo worker threads (they are unref'd and never keep a process
 * alive, so calling this is optional).
 *
 * @returns Promise resolved when every idle worker has stopped
 * @example await closeUncertaintyWorkers()
 */
export async function closeUncertaintyWorkers(): Promise<void> {
  const all = [...idleWorkers.values()].flat();
  idleWorkers.clear();
  await Promise.all(all.map((w) => w.terminate()));
}

type ChunkResult = { index: number; result: PressureUncertaintyResult };
type WorkerReply = { id: number; ok: boolean; chunks?: ChunkResult[]; code?: string; message?: string; details?: ErrorDetails };

function runInWorker(url: URL, msg: { input: PressureUncertaintyInput; bounds: number[]; next: Int32Array }): { promise: Promise<ChunkResult[]>; stop: () => void } {
  const worker = takeWorker(url);
  const id = nextJobId++;
  let cleanup = (): void => undefined;
  const promise = new Promise<ChunkResult[]>((resolve, reject) => {
    const onMessage = (m: WorkerReply): void => {
      if (m.id !== id) return;
      cleanup();
      releaseWorker(url, worker);
      if (m.ok && m.chunks !== undefined) resolve(m.chunks);
      else reject(new ShalepointError(m.code ?? "E_INTERNAL", m.message ?? "worker failed", m.details ?? {}));
    };
    const onError = (e: Error): void => {
      cleanup();
      void worker.terminate();
      reject(new ShalepointError("E_INTERNAL", `uncertainty worker failed: ${e.message}`));
    };
    const onExit = (code: number): void => {
      cleanup();
      reject(new ShalepointError("E_INTERNAL", `uncertainty worker stopped with exit code ${code}`));
    };
    cleanup = () => {
      worker.off("message", onMessage);
      worker.off("error", onError);
      worker.off("exit", onExit);
    };
    worker.on("message", onMessage);
    worker.on("error", onError);
    worker.on("exit", onExit);
  });
  promise.catch(() => undefined); // a part that fails after another one already failed is not unhandled
  worker.postMessage({ id, ...msg });
  return {
    promise,
    stop: () => {
      cleanup();
      void worker.terminate();
    },
  };
}

/**
 * Parallel Monte Carlo uncertainty: the result of simulatePressureUncertainty, computed on
 * up to `threads` cores, identical bit for bit.
 *
 * Formula: as simulatePressureUncertainty (Eaton 1975 / Bowers 1995 pore pressure, Eaton 1969
 * or frictional-limit fracture pressure, type-7 P10/P50/P90 of Hyndman & Fan 1996).
 *
 * @param input see PressureUncertaintyInput (arrays are copied to the workers, not shared)
 * @param options.threads threads in all, integer in [1, 64], default min(2, cores); wells
 *   shorter than 2 × 4096 depths run on the calling thread alone
 * @param options.workerUrl compiled worker script, default the sibling uncertaintyPartWorker.js
 * @returns Promise of a PressureUncertaintyResult (psi arrays, probabilities, draws, warnings)
 * @throws (rejects) everything simulatePressureUncertainty throws; E_RANGE for a bad thread
 *   count; E_INTERNAL when a worker cannot start or stops
 * @example await simulatePressureUncertaintyParallel(input, { threads: 2 })
 * // deep-equals simulatePressureUncertainty(input)
 * @see simulatePressureUncertaintyPart, joinPressureUncertaintyParts in src/uncertainty
 */
export async function simulatePressureUncertaintyParallel(
  input: PressureUncertaintyInput,
  options: ParallelUncertaintyOptions = {},
): Promise<PressureUncertaintyResult> {
  const threads = options.threads ?? Math.min(2, os.availableParallelism());
  if (!(Number.isInteger(threads) && threads >= 1 && threads <= 64)) {
    throw new ShalepointError("E_RANGE", "threads must be an integer in [1, 64]", { param: "threads", value: threads, allowed: "[1, 64]" });
  }
  const n = input.tvdFt.length;
  const parts = Math.min(threads, Math.floor(n / MIN_DEPTHS_PER_THREAD));
  if (parts <= 1) return simulatePressureUncertainty(input);
  const bounds = chunkBounds(n);
  const last = bounds.length - 1;
  const next = new Int32Array(new SharedArrayBuffer(4));
  const url = options.workerUrl ?? new URL("./uncertaintyPartWorker.js", import.meta.url);
  const jobs = Array.from({ length: parts - 1 }, () => runInWorker(url, { input, bounds, next }));
  try {
    const byIndex: (PressureUncertaintyResult | undefined)[] = new Array(last);
    for (let k = Atomics.add(next, 0, 1); k < last; k = Atomics.add(next, 0, 1)) {
      byIndex[k] = simulatePressureUncertaintyPart({ input, startIndex: bounds[k], endIndex: bounds[k + 1] });
    }
    for (const chunks of await Promise.all(jobs.map((j) => j.promise))) for (const c of chunks) byIndex[c.index] = c.result;
    const ordered = byIndex.map((r, k) => {
      if (r === undefined) throw new ShalepointError("E_INTERNAL", `depth chunk ${k} was not computed`, { param: "chunk", value: k });
      return r;
    });
    return joinPressureUncertaintyParts({ parts: ordered });
  } catch (e) {
    jobs.forEach((j) => j.stop());
    throw e;
  }
}
