/**
 * Worker process: solves the task files it is sent over the IPC channel, one at a time.
 *
 * The process that started it governs it: Ctrl-C and SIGTERM (which reach the whole process
 * group) are left to that process, which stops its workers itself; and when that process
 * goes away without stopping them (killed outright), the channel closes and the worker quits.
 */
import type { SolveOptions } from '../search/solve.ts';
import { errorReport, solveFile } from './solve-file.ts';
import { applyWorkerSettings, libraryWithPriors, type PriorBits } from './solve-worker-settings.ts';

applyWorkerSettings();

export interface WorkerRequest {
  readonly id: number;
  readonly file: string;
  readonly options: Omit<SolveOptions, 'library'>;
  readonly priors?: PriorBits;
}

process.on('SIGINT', () => {});
process.on('SIGTERM', () => {});
process.on('disconnect', () => process.exit(0));

process.on('message', (request: WorkerRequest) => {
  let report;
  try {
    report = solveFile(request.file, { ...request.options, library: libraryWithPriors(request.priors) });
  } catch (error) {
    report = errorReport(request.file, `${request.file}: the solver stopped with an internal error: ${(error as Error).message}`, 'internal error');
  }
  process.send!({ id: request.id, report });
});
