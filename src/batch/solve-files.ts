/**
 * Solves many task files on a pool of worker processes (tasks in parallel). Each task is also
 * guarded from outside: a worker that overruns its time limit by a wide margin, or dies, is
 * replaced and the task reported as an error, so a batch never hangs or stops on one task. A
 * worker that runs out of heap stops only its task, with the reason `memory`.
 *
 * An abort signal (Ctrl-C) stops every worker at once; tasks still running are dropped (not
 * reported), so what was reported is exactly what finished.
 */
import { fork, type ChildProcess } from 'node:child_process';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
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
 * How a worker's V8 runs (BENCHMARKS.md has the figures):
 * - a large young generation: the search makes many short-lived grids, and with the default
 *   (small) semi-spaces the collector copies survivors far more often; 64 MB semi-spaces
 *   measured about a quarter more candidates per second;
 * - the collector on the worker's own thread: by default V8 also marks, sweeps and copies on
 *   helper threads, which with one worker per core take time from the other worker. The same
 *   work (12 training tasks to 2,000,000 candidates each, two workers) took 80.6 s against
 *   84.6 s with the collector's helper threads (three runs each, BENCHMARKS.md): about 5%.
 *   So when there are as many workers as cores, they run with `--single-threaded-gc`. A V8
 *   flag holds for a whole process, which is why the workers are processes, not threads.
 */
function workerFlags(heapMib: number, jobs: number): string[] {
  const flags = ['--max-semi-space-size=64', `--max-old-space-size=${heapMib}`];
  // With a core to spare, the helper threads take nothing from another worker and speed this one.
  if (jobs >= availableParallelism()) flags.unshift('--single-threaded-gc');
  return flags;
}

const ENTRY = fileURLToPath(new URL('./worker-entry.js', import.meta.url));

/** What V8 prints when a process's heap is full (it then aborts). */
const OUT_OF_HEAP = /heap limit|heap out of memory/i;

/** Keep at most this much of a worker's error output (for the report when it dies). */
const ERROR_TAIL = 4096;

interface WorkerProcess {
  readonly child: ChildProcess;
  /** The end of what the worker wrote on its error output. */
  errors: string;
}

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

  // Workers still running when the process exits (a second Ctrl-C) go with it.
  const live = new Set<ChildProcess>();
  const killLive = () => {
    for (const child of live) child.kill('SIGKILL');
  };
  process.on('exit', killLive);

  const runLane = async (): Promise<void> => {
    let worker: WorkerProcess | undefined;
    const fresh = (): WorkerProcess => {
      const child = fork(ENTRY, [], { execArgv: workerFlags(memory.heapMib, jobs), serialization: 'advanced', stdio: ['ignore', 'inherit', 'pipe', 'ipc'] });
      const made: WorkerProcess = { child, errors: '' };
      child.stderr!.setEncoding('utf8');
      child.stderr!.on('data', (text: string) => (made.errors = (made.errors + text).slice(-ERROR_TAIL)));
      // A worker that dies is seen through 'exit'; a failed send to it must not throw here.
      child.on('error', () => {});
      live.add(child);
      child.once('exit', () => live.delete(child));
      return made;
    };
    try {
      while (next < files.length && !stop.signal.aborted) {
        const index = next++;
        const file = files[index]!;
        if (worker && hasExited(worker.child)) worker = undefined;
        worker ??= fresh();
        const started = performance.now();
        const seconds = () => (performance.now() - started) / 1000;
        const report = await new Promise<TaskReport | typeof STOPPED>((resolve) => {
          const w = worker!;
          const retire = () => {
            w.child.kill('SIGKILL');
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
          const onExit = (code: number | null, signal: NodeJS.Signals | null) => {
            cleanup();
            worker = undefined;
            // Error output arrives on its own stream; wait until it has ended to read it.
            const decide = () => resolve(workerDeathReport(file, w.errors, code, signal, options.memoryCapMb ?? DEFAULT_MEMORY_CAP_MB, seconds()));
            if (w.child.stderr!.readableEnded) decide();
            else w.child.stderr!.once('end', decide);
          };
          const onStop = () => {
            cleanup();
            retire();
            resolve(STOPPED);
          };
          const cleanup = () => {
            clearTimeout(timer);
            w.child.off('message', onMessage);
            w.child.off('exit', onExit);
            stop.signal.removeEventListener('abort', onStop);
          };
          w.child.on('message', onMessage);
          w.child.on('exit', onExit);
          stop.signal.addEventListener('abort', onStop, { once: true });
          const request: WorkerRequest = { id: index, file, options: solve, ...(options.priors ? { priors: options.priors } : {}) };
          w.child.send(request);
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
      if (worker) await ended(worker.child);
    }
  };

  try {
    await Promise.all(Array.from({ length: jobs }, runLane));
  } finally {
    outer?.removeEventListener('abort', onOuterAbort);
    process.off('exit', killLive);
  }
  if (failure) throw failure.error;
  return reports.filter((r): r is TaskReport => r !== undefined);
}

/**
 * The report for a task whose worker died: `memory` when V8 said the heap was full (the
 * worker's heap limit stands for the memory cap), otherwise a crash naming how it ended and the
 * error it wrote on its error output.
 */
export function workerDeathReport(file: string, errors: string, code: number | null, signal: NodeJS.Signals | null, capMb: number, seconds: number): TaskReport {
  if (OUT_OF_HEAP.test(errors)) return outOfMemoryReport(file, `${file}: the solver's worker ran out of heap (memory cap ${capMb} MB) and was stopped`, seconds);
  // Node ends an uncaught error with its version line: name the error's own line instead.
  const lines = errors.split('\n').map((line) => line.trim()).filter((line) => line !== '');
  const said = lines.find((line) => /^[A-Za-z]*Error\b|^FATAL/.test(line)) ?? lines.pop();
  const how = signal ? `signal ${signal}` : `exit code ${code}`;
  return errorReport(file, `${file}: the solver's worker died (${how})${said ? `: ${said}` : ''}`, 'worker crashed', seconds);
}

/** True once the process has ended (by itself or by a signal). */
function hasExited(child: ChildProcess): boolean {
  return child.exitCode !== null || child.signalCode !== null;
}

/** Stops a worker that is waiting for work, and resolves once it has gone. */
function ended(child: ChildProcess): Promise<void> {
  if (hasExited(child)) return Promise.resolve();
  return new Promise((resolve) => {
    child.once('exit', () => resolve());
    child.kill('SIGKILL');
  });
}
