/**
 * Solves many task files on a pool of worker threads (tasks in parallel). Each task is also
 * guarded from outside: a worker that overruns its time limit by a wide margin, or dies, is
 * replaced and the task reported as an error, so a batch never hangs or stops on one task. A
 * worker that runs out of heap stops only its task, with the reason `memory`.
 *
 * An abort signal (Ctrl-C) stops every worker at once; tasks still running are dropped (not
 * reported), so what was reported is exactly what finished.
 */
import { Worker } from 'node:worker_threads';
import type { SolveOptions } from '../search/solve.ts';
import { DEFAULT_MEMORY_CAP_MB, workerMemory } from './memory-cap.ts';
import { errorReport, outOfMemoryReport } from './solve-file.ts';
import type { TaskReport } from './task-report.ts';
import type { WorkerRequest } from './solve-worker.ts';
import type { PriorBits } from './solve-worker-settings.ts';

export interface BatchOptions {
  readonly jobs?: number;
  readonly solve?: Omit<SolveOptions, 'library' | 'maxStoreBytes'>;
  /** Primitive bits from a priors file (name → bits), handed to every worker; default: the records' bits. */
  readonly priors?: PriorBits;
  /** Memory cap per worker in megabytes (see memory-cap.ts; default 1500). */
  readonly memoryCapMb?: number;
  /** Called as each task finishes, in finishing order. If it throws, the batch stops and rejects with that error. */
  readonly onReport?: (report: TaskReport) => void;
  /** Stops the batch: workers are terminated and the tasks they were solving left unreported. */
  readonly signal?: AbortSignal;
}

/**
 * A large young generation for the workers: the search makes many short-lived grids, and with
 * the default (small) semi-spaces the collector copies survivors far more often; 192 MB (64 MB
 * semi-spaces) measured about a quarter more candidates per second (BENCHMARKS.md).
 */
const YOUNG_GENERATION_MB = 192;

const ENTRY = new URL('./worker-entry.js', import.meta.url);

/** Marks a task that was stopped by the abort signal. */
const STOPPED = Symbol('stopped');

/**
 * Reports in the order of `files`, of the tasks that finished (all of them unless the signal
 * stopped the batch).
 */
export async function solveFiles(files: readonly string[], options: BatchOptions = {}): Promise<TaskReport[]> {
  const jobs = Math.max(1, Math.min(options.jobs ?? 1, files.length || 1));
  const memory = workerMemory(options.memoryCapMb ?? DEFAULT_MEMORY_CAP_MB);
  const solve: Omit<SolveOptions, 'library'> = { ...options.solve, maxStoreBytes: memory.maxStoreBytes };
  // Timers take at most 2^31 - 1 ms (about 24 days); a longer wait would fire at once.
  const graceMs = Math.min(((solve.timeLimitSeconds ?? 20) + 30) * 1000, 2 ** 31 - 1);
  const reports = new Array<TaskReport | undefined>(files.length);
  const stop = new AbortController();
  const outer = options.signal;
  const onOuterAbort = () => stop.abort();
  if (outer?.aborted) stop.abort();
  else outer?.addEventListener('abort', onOuterAbort, { once: true });
  let failure: { error: unknown } | undefined;
  let next = 0;

  const runLane = async (): Promise<void> => {
    let worker: Worker | undefined;
    const fresh = (): Worker =>
      new Worker(ENTRY, { resourceLimits: { maxOldGenerationSizeMb: memory.heapMib, maxYoungGenerationSizeMb: YOUNG_GENERATION_MB } });
    try {
      while (next < files.length && !stop.signal.aborted) {
        const index = next++;
        const file = files[index]!;
        worker ??= fresh();
        const started = performance.now();
        const seconds = () => (performance.now() - started) / 1000;
        const report = await new Promise<TaskReport | typeof STOPPED>((resolve) => {
          const w = worker!;
          const retire = () => {
            void w.terminate();
            worker = undefined;
          };
          const timer = setTimeout(() => {
            cleanup();
            retire();
            resolve(errorReport(file, `${file}: the solver overran its time limit and was stopped`, 'overran', seconds()));
          }, graceMs);
          const onMessage = (message: { id: number; report: TaskReport }) => {
            if (message.id !== index) return;
            cleanup();
            resolve(message.report);
          };
          const onError = (error: Error & { code?: string }) => {
            cleanup();
            retire();
            if (error.code === 'ERR_WORKER_OUT_OF_MEMORY') {
              resolve(outOfMemoryReport(file, `${file}: the solver's worker ran out of heap (memory cap ${options.memoryCapMb ?? DEFAULT_MEMORY_CAP_MB} MB) and was stopped`, seconds()));
            } else {
              resolve(errorReport(file, `${file}: the solver's worker died: ${error.message}`, 'worker crashed', seconds()));
            }
          };
          const onExit = (code: number) => onError(new Error(`exit code ${code}`));
          const onStop = () => {
            cleanup();
            retire();
            resolve(STOPPED);
          };
          const cleanup = () => {
            clearTimeout(timer);
            w.off('message', onMessage);
            w.off('error', onError);
            w.off('exit', onExit);
            stop.signal.removeEventListener('abort', onStop);
          };
          w.on('message', onMessage);
          w.on('error', onError);
          w.on('exit', onExit);
          stop.signal.addEventListener('abort', onStop, { once: true });
          const request: WorkerRequest = { id: index, file, options: solve, ...(options.priors ? { priors: options.priors } : {}) };
          w.postMessage(request);
        });
        if (report === STOPPED) break;
        reports[index] = report;
        try {
          options.onReport?.(report);
        } catch (error) {
          failure ??= { error };
          stop.abort();
        }
      }
    } finally {
      if (worker) await worker.terminate();
    }
  };

  try {
    await Promise.all(Array.from({ length: jobs }, runLane));
  } finally {
    outer?.removeEventListener('abort', onOuterAbort);
  }
  if (failure) throw failure.error;
  return reports.filter((r): r is TaskReport => r !== undefined);
}
