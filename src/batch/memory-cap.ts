/**
 * The memory cap of a worker thread. One number, in megabytes (10^6 bytes), sets two limits
 * that must agree:
 *
 * - the search's own count: the bytes its value store holds (every kept value, with the cells
 *   of every grid, which live in typed arrays outside the JavaScript heap limit) plus what
 *   grids memoise while it runs (colour counts and the component cache). Reaching the cap stops
 *   the task with the reason `memory`;
 * - the worker's JavaScript heap limit (V8's old generation), set to the cap plus a fixed
 *   headroom for what the count leaves out: the code and the library, the level being built,
 *   and garbage not yet collected. The count is above the heap share of what it counts (the
 *   cells are outside the heap), so the search stops first; should the heap still fill, only
 *   that worker dies, and the task is reported with the reason `memory`.
 *
 * A run with `--jobs N` can so use about N × (cap + headroom) at most.
 */

/** Default cap per worker: 1500 MB, the search's default store cap of 1.5 × 10^9 bytes. */
export const DEFAULT_MEMORY_CAP_MB = 1500;

/** Heap headroom above the cap, in MiB (V8 counts its limits in MiB). */
export const HEAP_HEADROOM_MIB = 1024;

export interface WorkerMemory {
  /** The search's cap on the bytes it holds (SolveOptions.maxStoreBytes). */
  readonly maxStoreBytes: number;
  /** The worker's heap limit in MiB (resourceLimits.maxOldGenerationSizeMb). */
  readonly heapMib: number;
}

export function workerMemory(capMb: number): WorkerMemory {
  const maxStoreBytes = Math.round(capMb * 1e6);
  return { maxStoreBytes, heapMib: Math.ceil(maxStoreBytes / 2 ** 20) + HEAP_HEADROOM_MIB };
}
