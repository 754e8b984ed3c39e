/**
 * Solves many task files on a pool of worker threads (tasks in parallel). Each task is also
 * guarded from outside: a worker that overruns its time limit by a wide margin, or dies, is
 * replaced and the task reported as an error, so a batch never hangs or stops on one task.
 */
import { Worker } from 'node:worker_threads';
import type { SolveOptions } from '../search/solve.ts';
import { errorReport } from './solve-file.ts';
import type { TaskReport } from './task-report.ts';
import type { WorkerRequest } from './solve-worker.ts';
import type { PriorBits } from './solve-worker-settings.ts';

export interface BatchOptions {
  readonly jobs?: number;
  readonly solve?: Omit<SolveOptions, 'library'>;
  /** Primitive bits from a priors file (name → bits), handed to every worker; default: the records' bits. */
  readonly priors?: PriorBits;
  /** Heap cap per worker in megabytes (default 6144). */
  readonly workerMemoryMb?: number;
  /** Called as each task finishes, in finishing order. */
  readonly onReport?: (report: TaskReport) => void;
}

const ENTRY = new URL('./worker-entry.js', import.meta.url);

/** Reports in the order of `files`. */
export async function solveFiles(files: readonly string[], options: BatchOptions = {}): Promise<TaskReport[]> {
  const jobs = Math.max(1, Math.min(options.jobs ?? 1, files.length || 1));
  const solve = options.solve ?? {};
  const graceMs = ((solve.timeLimitSeconds ?? 20) + 30) * 1000;
  const reports = new Array<TaskReport>(files.length);
  let next = 0;

  const runLane = async (): Promise<void> => {
    let worker: Worker | undefined;
    const fresh = (): Worker =>
      new Worker(ENTRY, { resourceLimits: { maxOldGenerationSizeMb: options.workerMemoryMb ?? 6144 } });
    try {
      while (next < files.length) {
        const index = next++;
        const file = files[index]!;
        worker ??= fresh();
        const started = performance.now();
        const report = await new Promise<TaskReport>((resolve) => {
          const w = worker!;
          const timer = setTimeout(() => {
            cleanup();
            void w.terminate();
            worker = undefined;
            resolve(errorReport(file, `${file}: the solver overran its time limit and was stopped`, (performance.now() - started) / 1000));
          }, graceMs);
          const onMessage = (message: { id: number; report: TaskReport }) => {
            if (message.id !== index) return;
            cleanup();
            resolve(message.report);
          };
          const onError = (error: Error) => {
            cleanup();
            worker = undefined;
            resolve(errorReport(file, `${file}: the solver's worker died: ${error.message}`, (performance.now() - started) / 1000));
          };
          const onExit = (code: number) => onError(new Error(`exit code ${code}`));
          const cleanup = () => {
            clearTimeout(timer);
            w.off('message', onMessage);
            w.off('error', onError);
            w.off('exit', onExit);
          };
          w.on('message', onMessage);
          w.on('error', onError);
          w.on('exit', onExit);
          const request: WorkerRequest = { id: index, file, options: solve, ...(options.priors ? { priors: options.priors } : {}) };
          w.postMessage(request);
        });
        reports[index] = report;
        options.onReport?.(report);
      }
    } finally {
      if (worker) await worker.terminate();
    }
  };

  await Promise.all(Array.from({ length: jobs }, runLane));
  return reports;
}
