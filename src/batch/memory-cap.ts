/**
 * The memory cap of a worker process. One number, in megabytes (10^6 bytes), sets two limits
 * that must agree:
 *
 * - the search's own count: the bytes its value store holds (every kept value with the cells
 *   of every grid, which live in typed arrays outside the JavaScript heap limit) plus what
 *   grids memoise while it runs (colour counts and the component cache). At the cap the search
 *   keeps nothing more and tries only last steps on what it holds (src/search/enumerator.ts),
 *   stopping all the same when the real heap reaches 80% of the limit below; a task with nothing
 *   found then has the reason `memory`;
 * - the worker's JavaScript heap limit (V8's old generation). The count runs short of the heap
 *   it stands for: measured on tasks-demo/tallest-mast.json stopped by the cap, the heap held
 *   288 MB at a count of 200 MB and 870 MB at 600 MB (about 1.45 times the count, garbage
 *   included). So the heap limit is twice the cap plus a fixed 512 MiB for the code, the
 *   library and the level being built, and the search's count stops the task first. Should the
 *   heap fill all the same, only that worker dies, and its task is reported with the reason
 *   `memory` (never the process).
 *
 * A worker may so use up to about 2 × cap + 512 MiB of heap plus the grid cells (inside the
 * cap); a run with `--jobs N` N times that.
 */

/** Default cap per worker: 1500 MB, the search's default store cap of 1.5 × 10^9 bytes. */
export const DEFAULT_MEMORY_CAP_MB = 1500;

/** How many times the cap the heap limit allows (the count is about 1.45 times short, above). */
export const HEAP_PER_COUNTED_BYTE = 2;

/** Heap for what the count leaves out, in MiB (V8 counts its limits in MiB). */
export const HEAP_BASE_MIB = 512;

export interface WorkerMemory {
  /** The search's cap on the bytes it holds (SolveOptions.maxStoreBytes). */
  readonly maxStoreBytes: number;
  /** The worker's heap limit in MiB (its `--max-old-space-size`). */
  readonly heapMib: number;
}

export function workerMemory(capMb: number): WorkerMemory {
  const maxStoreBytes = Math.round(capMb * 1e6);
  return { maxStoreBytes, heapMib: Math.ceil((HEAP_PER_COUNTED_BYTE * maxStoreBytes) / 2 ** 20) + HEAP_BASE_MIB };
}
